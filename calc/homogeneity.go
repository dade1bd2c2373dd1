package calc

import "math"

// Homogeneity returns the extent of the region about a coil block's centre
// over which its field stays within the relative tolerance tol of the
// centre field B0 (|B − B0| ≤ tol |B0|): axial, the distance from the
// centre along the axis, and radial, the distance from the centre in the
// mid-plane (along the frame's E1), to the first point where the deviation
// exceeds tol. Each is found by stepping outwards in 100 steps up to the
// coil's extent (coilExtent) and refining the crossing by bisection. This is
// the usual figure of merit of a Helmholtz or calibration pair (e.g. the
// 1 % region). NaN when the centre field is zero or unknown; the extent
// itself when the field never leaves the tolerance inside it.
func Homogeneity(c Coil, w Winding, I, tol float64) (axial, radial float64) {
	return homogeneity(NewCoilSource(c, w, I), w, tol)
}

func homogeneity(s *CoilSource, w Winding, tol float64) (axial, radial float64) {
	c := s.coil
	fr := s.frame
	B0 := s.At(c.Centre)
	size := coilExtent(c, w)
	if B0.Norm() == 0 || B0.IsNaN() || !(size > 0) || !(tol > 0) {
		return math.NaN(), math.NaN()
	}
	reach := func(dir Vec) float64 {
		return firstExceed(func(d float64) float64 {
			return s.At(c.Centre.Add(dir.Scale(d))).Sub(B0).Norm() / B0.Norm()
		}, size, tol)
	}
	return reach(fr.U), reach(fr.E1)
}

// firstExceed returns the distance d ≤ size at which dev(d) first exceeds
// tol, stepping out from 0 in 100 steps and bisecting the crossing 60
// times; size when it never does.
func firstExceed(dev func(float64) float64, size, tol float64) float64 {
	const steps = 100
	prev := 0.0
	for i := 1; i <= steps; i++ {
		s := size * float64(i) / steps
		if !(dev(s) <= tol) {
			lo, hi := prev, s
			for range 60 {
				mid := (lo + hi) / 2
				if dev(mid) <= tol {
					lo = mid
				} else {
					hi = mid
				}
			}
			return lo
		}
		prev = s
	}
	return size
}

// HelmholtzTolerance is the relative departure of a pair's spacing from its
// mean radius within which the memo calls it a Helmholtz pair.
const HelmholtzTolerance = 0.01

// PairRegion describes the useful region of a pair of coils. For an aiding
// pair: the homogeneous region, within which |B − B0| ≤ tol |B0| (B0 the
// centre field), along the axis and radially in the mid-plane, for
// tol = 1 % and 0.1 %. For an opposing pair: the axial gradient at the
// centre and its linear region, within which the local gradient ∂Bz/∂z
// stays within 1 % of the centre value, along the axis and radially in the
// mid-plane. Distances are from the centre, m; NaN where they do not apply.
type PairRegion struct {
	SpacingRatio float64 // spacing / Radius
	// Radius is the mean radius of the turns as laid (MeanTurnRadius),
	// the stated mean radius for a winding without turns: the radius a
	// Helmholtz or Maxwell spacing is judged against.
	Radius    float64
	Helmholtz bool // aiding and |SpacingRatio − 1| ≤ HelmholtzTolerance
	// Maxwell is set for an opposing pair at √3 times the mean radius
	// (within HelmholtzTolerance), the spacing at which the cubic term of
	// the axial field of two thin opposed coils vanishes, making the
	// gradient most uniform.
	Maxwell bool

	// Dip is set for an aiding pair whose axial field is weaker at the
	// centre than a tenth of the radius along the axis from it (spacing
	// wider than the flat one); clear for a peak at the centre.
	Dip bool

	Axial1, Radial1   float64 // 1 % homogeneous region (aiding)
	Axial01, Radial01 float64 // 0.1 % homogeneous region (aiding)

	Gradient                  float64 // T/m, ∂Bz/∂z at the centre (opposing)
	LinearAxial, LinearRadial float64 // ±1 % gradient region (opposing)
}

// GradientTolerance bounds the linear region of an opposing pair.
const GradientTolerance = 0.01

// AnalysePair returns the PairRegion of pair c with winding w at current
// I; for other forms every figure is NaN.
//
// The centre gradient is summed exactly from the on-axis field of every
// turn, ∂Bz/∂z = −3 μ0 I a² ζ / (2 (a² + ζ²)^{5/2}) for a turn of radius a
// at axial distance ζ (the derivative of the loop's on-axis field, Jackson,
// Classical Electrodynamics, 3rd ed., §5.5). Along the axis the local
// gradient is that same sum; off the axis it is a central difference of Bz
// with a step of 10⁻⁴ of the mean radius (error ~10⁻⁸ of the gradient).
func AnalysePair(c Coil, w Winding, I float64) PairRegion {
	nan := math.NaN()
	p := PairRegion{SpacingRatio: nan, Axial1: nan, Radial1: nan, Axial01: nan, Radial01: nan,
		Gradient: nan, LinearAxial: nan, LinearRadial: nan}
	if c.Form != Pair {
		return p
	}
	R := w.MeanTurnRadius()
	if !(R > 0) {
		R = c.MeanDiameter / 2
	}
	p.Radius = R
	if R > 0 {
		p.SpacingRatio = math.Abs(c.Spacing) / R
	}
	s := NewCoilSource(c, w, I)
	if !c.Opposing {
		p.Helmholtz = math.Abs(p.SpacingRatio-1) <= HelmholtzTolerance
		if R > 0 {
			fr := CoilFrame(c.Axis)
			p.Dip = math.Abs(s.At(c.Centre.Add(fr.U.Scale(R/10))).Dot(fr.U)) > math.Abs(s.At(c.Centre).Dot(fr.U))
		}
		p.Axial1, p.Radial1 = homogeneity(s, w, 0.01)
		p.Axial01, p.Radial01 = homogeneity(s, w, 0.001)
		return p
	}
	p.Maxwell = math.Abs(p.SpacingRatio/math.Sqrt(3)-1) <= HelmholtzTolerance
	size := coilExtent(c, w)
	G := s.axialGradientOnAxis(0)
	if G == 0 || math.IsNaN(G) || !(size > 0) || !(R > 0) {
		return p
	}
	p.Gradient = G
	p.LinearAxial = firstExceed(func(d float64) float64 {
		return math.Abs(s.axialGradientOnAxis(d)-G) / math.Abs(G)
	}, size, GradientTolerance)
	h := 1e-4 * R
	p.LinearRadial = firstExceed(func(d float64) float64 {
		_, up := s.Local(d, h)
		_, dn := s.Local(d, -h)
		return math.Abs((up-dn)/(2*h)-G) / math.Abs(G)
	}, size, GradientTolerance)
	return p
}

// PairGradient returns the axial gradient ∂Bz/∂z, T/m, at the centre of
// an opposing pair c with winding w at current I, summed exactly over its
// turns as AnalysePair sums it; NaN for another form.
func PairGradient(c Coil, w Winding, I float64) float64 {
	if c.Form != Pair || !c.Opposing {
		return math.NaN()
	}
	return NewCoilSource(c, w, I).axialGradientOnAxis(0)
}

// axialGradientOnAxis returns ∂Bz/∂z, T/m, on the axis at z (coil-local),
// summed over every turn of every placement of the source.
func (s *CoilSource) axialGradientOnAxis(z float64) float64 {
	g := 0.0
	for _, cp := range s.coils {
		for _, l := range s.lattices {
			for i := range l.nr {
				a := l.r0 + float64(i)*l.dr
				for j := range l.nz {
					zeta := z - cp.dz - (l.z0 + float64(j)*l.dz)
					q := a*a + zeta*zeta
					g += -3 * Mu0 * cp.I * l.mult * a * a * zeta / (2 * q * q * math.Sqrt(q))
				}
			}
		}
	}
	return g
}
