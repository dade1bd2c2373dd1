package calc

import "math"

// DipoleField returns the field, T, at displacement r from a point magnetic
// dipole of moment m, A·m² (Jackson, Classical Electrodynamics, 3rd ed.,
// eq. 5.56, without the contact term):
//
//	B = μ0/(4π) · (3 (m·r̂) r̂ − m) / |r|³
//
// At r = 0 the field is undefined and NaN results.
func DipoleField(m, r Vec) Vec {
	d := r.Norm()
	if d == 0 {
		return nanVec()
	}
	u := r.Scale(1 / d)
	k := Mu0 / (4 * math.Pi) / (d * d * d)
	return u.Scale(3 * m.Dot(u)).Sub(m).Scale(k)
}

// DipoleRange returns the distance, m, from the centre of the coil block
// along its axis beyond which the dipole field of its moment agrees with
// the exact field within the relative tolerance tol (e.g. 0.01), found by
// bisection between the winding's outer extent and 10⁴ times it. The
// on-axis error of a loop falls as (3/2)(a/z)², so for one thin loop the
// 1 % distance is about 12.2 a. NaN when no current flows or the coil has
// no extent.
func DipoleRange(c Coil, w Winding, I, tol float64) float64 {
	m := MagneticMoment(c, w, I)
	size := coilExtent(c, w)
	if !(size > 0) || m.Norm() == 0 || m.IsNaN() || !(tol > 0) {
		return math.NaN()
	}
	fr := CoilFrame(c.Axis)
	relErr := func(d float64) float64 {
		p := c.Centre.Add(fr.U.Scale(d))
		ex := CoilField(c, w, I, p)
		dp := DipoleField(m, fr.U.Scale(d))
		return dp.Sub(ex).Norm() / ex.Norm()
	}
	lo, hi := size, 1e4*size
	if relErr(lo) <= tol {
		return lo
	}
	if !(relErr(hi) <= tol) {
		return math.NaN()
	}
	for range 100 {
		mid := math.Sqrt(lo * hi)
		if relErr(mid) <= tol {
			hi = mid
		} else {
			lo = mid
		}
		if hi-lo <= 1e-9*hi {
			break
		}
	}
	return hi
}

// coilExtent is the largest distance of a turn from the block's centre.
func coilExtent(c Coil, w Winding) float64 {
	if c.Form == Rectangle {
		return math.Hypot(c.Width, c.Height) / 2
	}
	e := 0.0
	off := 0.0
	if c.Form == Pair {
		off = math.Abs(c.Spacing) / 2
	}
	for _, l := range w.Layers {
		for _, z := range l.Z {
			e = math.Max(e, math.Hypot(l.Radius, math.Abs(z)+off))
		}
	}
	return e
}
