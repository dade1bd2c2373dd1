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
	fr := CoilFrame(c.Axis)
	B0 := CoilField(c, w, I, c.Centre)
	size := coilExtent(c, w)
	if B0.Norm() == 0 || B0.IsNaN() || !(size > 0) || !(tol > 0) {
		return math.NaN(), math.NaN()
	}
	reach := func(dir Vec) float64 {
		dev := func(s float64) float64 {
			return CoilField(c, w, I, c.Centre.Add(dir.Scale(s))).Sub(B0).Norm() / B0.Norm()
		}
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
	return reach(fr.U), reach(fr.E1)
}
