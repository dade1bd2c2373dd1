package analysis

import (
	"fmt"
	"math"

	"coilmemo/calc"
	"coilmemo/calc/biotsavart"
	"coilmemo/format"
)

// rectangleChecks verifies a rectangular coil's field by independent
// means: the field at the centre and at an off-axis test point against a
// numerical Biot–Savart line integral along the four sides, and the far
// field against the dipole formula. (At the centre the design's sum of
// straight-segment closed forms is the rectangle's closed form
// B = 2 μ0 N I √(W² + H²)/(π W H) term by term, so that closed form would
// only repeat it.)
func rectangleChecks(c calc.Coil, cr calc.CoilResult) []Check {
	I := cr.Current
	N := float64(cr.Winding.TurnCount())
	if c.Form != calc.Rectangle || !(I != 0) || math.IsNaN(I) || !(c.Width > 0 && c.Height > 0) || N == 0 {
		return nil
	}
	fr := calc.CoilFrame(c.Axis)
	src := calc.NewCoilSource(c, cr.Winding, I)
	W, H := c.Width, c.Height
	var out []Check
	centre := src.At(c.Centre).Dot(fr.U)
	out = append(out, newCheck(c.Name, "field at coil centre",
		"Σ straight-segment Biot–Savart closed forms", "numerical Biot–Savart line integral (gonum quad)",
		centre, numericRectangleField(fr, c.Centre, W, H, N*I, c.Centre).Dot(fr.U), "T", 1e-8))
	p := c.Centre.Add(fr.E1.Scale(0.31 * W)).Add(fr.E2.Scale(-0.17 * H)).Add(fr.U.Scale(0.23 * math.Max(W, H)))
	exact := src.At(p)
	num := numericRectangleField(fr, c.Centre, W, H, N*I, p)
	off := newCheck(c.Name, "|B| at an off-axis test point",
		"Σ straight-segment Biot–Savart closed forms", "numerical Biot–Savart line integral (gonum quad)",
		exact.Norm(), num.Norm(), "T", 1e-8)
	off.Point = localPoint(fr, c.Centre, p)
	out = append(out, off)
	z := 20 * math.Hypot(W, H) / 2
	ex := src.At(c.Centre.Add(fr.U.Scale(z))).Norm()
	dip := calc.DipoleField(cr.Moment, fr.U.Scale(z)).Norm()
	out = append(out, newCheck(c.Name, fmt.Sprintf("on-axis field at %s", format.Eng(z, "m", 3)),
		"Σ straight-segment closed forms", "point dipole μ0·m/(2π z³)", ex, dip, "T", 0.01))
	return out
}

// numericRectangleField integrates dB = μ0 I/(4π) dl × r/|r|³ along the
// four sides of the rectangle W × H centred on ctr in frame fr (current
// counter-clockwise about U), 4 panels of 48-point Gauss–Legendre a side.
func numericRectangleField(fr calc.Frame, ctr calc.Vec, W, H, I float64, p calc.Vec) calc.Vec {
	pt := func(x, y float64) biotsavart.Vec { return ctr.Add(fr.E1.Scale(x)).Add(fr.E2.Scale(y)) }
	k := []biotsavart.Vec{pt(W/2, -H/2), pt(W/2, H/2), pt(-W/2, H/2), pt(-W/2, -H/2)}
	return biotsavart.Polygon(k, I, p, 4, 48)
}
