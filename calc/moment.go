package calc

import "math"

// MagneticMoment returns the magnetic moment, A·m², of one coil block at
// current I: m = I Σᵢ Aᵢ U, the current times the sum of the areas enclosed
// by every turn as laid out (AreaSum), along the coil axis U (Jackson,
// Classical Electrodynamics, 3rd ed., eq. 5.57, m = I·A for a plane loop,
// superposed over turns). A Pair aiding has twice that; a Pair opposing has
// none.
func MagneticMoment(c Coil, w Winding, I float64) Vec {
	m := I * w.AreaSum
	if c.Form == Pair {
		if c.Opposing {
			m = 0
		} else {
			m *= 2
		}
	}
	return CoilFrame(c.Axis).U.Scale(m)
}

// MomentMeanArea returns the moment magnitude, A·m², of one coil (one coil
// of a pair) taken as N turns all enclosing the mean-diameter area,
// N I π R_mean² (Rectangle: N I W H) — the hand-calculation cross-check of
// MagneticMoment. It differs from I·ΣA for a multilayer coil, since the mean
// of r² exceeds the square of the mean radius.
func MomentMeanArea(c Coil, I float64) float64 {
	n := float64(max(c.Turns, 0))
	if c.Form == Rectangle {
		return n * I * c.Width * c.Height
	}
	r := c.MeanDiameter / 2
	return n * I * math.Pi * r * r
}
