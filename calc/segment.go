package calc

// SegmentField returns the field, T, at p of a straight filament from a to
// b carrying current I from a to b, by the closed form of the Biot–Savart
// integral over a finite segment (Hanson & Hirshman, "Compact expressions
// for the Biot–Savart fields of a filamentary segment", Phys. Plasmas 9,
// 4410 (2002), eq. 8), which avoids the cancellation of the usual
// (cos θ₁ − cos θ₂) form:
//
//	Rᵢ = p − a, R_f = p − b, L = b − a,
//	B = μ0 I/(4π) · 2 (|Rᵢ| + |R_f|) / (|Rᵢ| |R_f| ((|Rᵢ| + |R_f|)² − |L|²)) · L × Rᵢ
//
// On the segment itself the field is infinite and NaN results.
func SegmentField(a, b Vec, I float64, p Vec) Vec {
	ri, rf, l := p.Sub(a), p.Sub(b), b.Sub(a)
	Ri, Rf := ri.Norm(), rf.Norm()
	s := Ri + Rf
	L := l.Norm()
	if L == 0 || I == 0 {
		return Vec{}
	}
	f := Mu0 * I / (4 * 3.141592653589793) * 2 * s / (Ri * Rf * (s - L) * (s + L))
	return l.Cross(ri).Scale(f)
}

// RectangleField returns the field, T, at p of a rectangular filament of
// width w along fr.E1 and height h along fr.E2, centred on c, carrying
// current I counter-clockwise about fr.U (so that its moment I·w·h points
// along +U): the sum of SegmentField over its four sides.
func RectangleField(fr Frame, c Vec, w, h, I float64, p Vec) Vec {
	pt := func(x, y float64) Vec { return c.Add(fr.E1.Scale(x)).Add(fr.E2.Scale(y)) }
	k := [4]Vec{pt(w/2, -h/2), pt(w/2, h/2), pt(-w/2, h/2), pt(-w/2, -h/2)}
	var B Vec
	for i := range k {
		B = B.Add(SegmentField(k[i], k[(i+1)%4], I, p))
	}
	return B
}
