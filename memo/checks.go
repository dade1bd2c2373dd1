package memo

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/integrate/quad"

	"coilmemo/calc"
)

// Check is one verification of a headline result of this very design
// against an independent method or a published table.
type Check struct {
	Coil      string  // coil block name, "" for the whole design
	Name      string  // what is checked
	Method    string  // the design's method
	Reference string  // the independent method or published source
	Value     float64 // the design's figure, SI
	Expected  float64 // the independent figure, SI
	Unit      string
	RelDiff   float64 // |Value − Expected| / |Expected|
	Tolerance float64 // relative
	Pass      bool
}

func newCheck(coil, name, method, ref string, v, e float64, unit string, tol float64) Check {
	rd := math.Abs(v-e) / math.Abs(e)
	if e == 0 && v == 0 {
		rd = 0
	}
	return Check{Coil: coil, Name: name, Method: method, Reference: ref, Value: v, Expected: e,
		Unit: unit, RelDiff: rd, Tolerance: tol, Pass: rd <= tol}
}

// Verify recomputes headline results of every circular coil by independent
// means: the moment from the mean turn area, the centre field by a current
// sheet closed form, the field at an off-axis point by numerical
// integration of the Biot–Savart law, the far field by the dipole formula,
// and the wire's resistance per length against the published copper table.
func Verify(d calc.Design, r calc.Results) []Check {
	var out []Check
	for i, c := range d.Coils {
		if i >= len(r.Coils) {
			break
		}
		cr := r.Coils[i]
		w := cr.Winding
		I := cr.Current
		if c.Form == calc.Rectangle || !(I != 0) || math.IsNaN(I) {
			out = append(out, wireCheck(c)...)
			continue
		}
		series := float64(calc.SeriesCoils(c))
		// Moment: Σ over turns against N·I·π·R̄². They differ for a thick
		// winding by the spread of turn areas, (b/D)²/3 at most for radial
		// build b on mean diameter D, so that is the tolerance.
		if c.Form != calc.Pair || !c.Opposing {
			b := c.RadialBuild / c.MeanDiameter
			out = append(out, newCheck(c.Name, "magnetic moment",
				"m = I·ΣA over every turn", "N·I·π·R̄² at the mean diameter",
				cr.Moment.Norm(), series*cr.MomentMeanArea, "A·m²", 1e-9+b*b/3))
		}
		// Centre field against the current-sheet closed form per layer.
		if c.Form != calc.Pair {
			fr := calc.CoilFrame(c.Axis)
			exact := calc.CoilField(c, w, I, c.Centre).Dot(fr.U)
			var sheet float64
			method := "current sheet on axis, per layer"
			for _, l := range w.Layers {
				n := len(l.Z)
				if w.Thin || c.Length == 0 {
					sheet += float64(n) * calc.LoopFieldOnAxis(l.Radius, I, 0)
					method = "N·μ0·I/(2R) closed form"
				} else {
					sheet += calc.SolenoidAxisField(l.Radius, c.Length*float64(n)/float64(w.TurnsPerLayer), n, I, 0)
				}
			}
			// A sheet smears N discrete turns: the difference at the centre
			// is of order (pitch/length)², well under 1 % for real windings.
			out = append(out, newCheck(c.Name, "field at coil centre",
				"Σ exact loop fields (elliptic integrals)", method, exact, sheet, "T", 0.01))
		}
		// Off-axis point by direct numerical Biot–Savart integration
		// (gonum Gauss–Legendre quadrature round every turn).
		fr := calc.CoilFrame(c.Axis)
		R := c.MeanDiameter / 2
		p := c.Centre.Add(fr.E1.Scale(0.37 * R)).Add(fr.U.Scale(0.29*R + c.Length/2 + c.RadialBuild))
		if c.Form == calc.Pair {
			p = p.Add(fr.U.Scale(c.Spacing/2 + R))
		}
		exact := calc.CoilField(c, w, I, p)
		num := numericCoilField(c, w, I, p)
		out = append(out, newCheck(c.Name, "|B| at an off-axis test point",
			"Σ exact loop fields (elliptic integrals)", "numerical Biot–Savart line integral (gonum quad)",
			exact.Norm(), num.Norm(), "T", 1e-8))
		// Far field: the dipole formula at 20 times the coil's size.
		if c.Form != calc.Pair || !c.Opposing {
			size := math.Max(R+c.RadialBuild/2, c.Length/2)
			if c.Form == calc.Pair {
				size = math.Max(size, c.Spacing/2+c.Length/2)
			}
			z := 20 * size
			pf := c.Centre.Add(fr.U.Scale(z))
			ex := calc.CoilField(c, w, I, pf).Norm()
			dip := calc.DipoleField(cr.Moment, fr.U.Scale(z)).Norm()
			out = append(out, newCheck(c.Name, fmt.Sprintf("on-axis field at %s", Eng(z, "m", 3)),
				"Σ exact loop fields", "point dipole μ0·m/(2π z³)", ex, dip, "T", 0.01))
		}
		out = append(out, wireCheck(c)...)
	}
	return out
}

// wireCheck compares the copper wire's resistance per length with the
// published table when the gauge is listed there.
func wireCheck(c calc.Coil) []Check {
	want, ok := nbsCopper20C[c.Wire.Gauge]
	if !ok || c.Wire.Material.Name != calc.Copper().Name {
		return nil
	}
	got := calc.ResistancePerLength(c.Wire.Bare, c.Wire.Material, calc.T20)
	// The table gives four significant figures: allow half a unit in the
	// last place plus the diameter rule's rounding, 0.2 %.
	return []Check{newCheck(c.Name, fmt.Sprintf("AWG %d resistance per metre at 20 °C", c.Wire.Gauge),
		"ASTM B258 diameter, IEC 60028 resistivity", nbsSource,
		got, want*ohmsPer1000ftToSI, "Ω/m", 0.002)}
}

// numericCoilField integrates dB = μ0 I/(4π) dl × r/|r|³ round every turn
// of the winding with 96-point Gauss–Legendre quadrature: a method
// independent of the elliptic-integral closed form.
func numericCoilField(c calc.Coil, w calc.Winding, I float64, p calc.Vec) calc.Vec {
	fr := calc.CoilFrame(c.Axis)
	var B calc.Vec
	centres := []calc.Vec{c.Centre}
	currents := []float64{I}
	if c.Form == calc.Pair {
		s := fr.U.Scale(c.Spacing / 2)
		centres = []calc.Vec{c.Centre.Sub(s), c.Centre.Add(s)}
		I2 := I
		if c.Opposing {
			I2 = -I
		}
		currents = []float64{I, I2}
	}
	for k, ctr := range centres {
		for _, l := range w.Layers {
			// Coincident turns (a thin coil) are integrated once and counted.
			for i := 0; i < len(l.Z); {
				j := i + 1
				for j < len(l.Z) && l.Z[j] == l.Z[i] {
					j++
				}
				b := loopIntegral(fr, ctr.Add(fr.U.Scale(l.Z[i])), l.Radius, currents[k], p)
				B = B.Add(b.Scale(float64(j - i)))
				i = j
			}
		}
	}
	return B
}

func loopIntegral(fr calc.Frame, ctr calc.Vec, a, I float64, p calc.Vec) calc.Vec {
	var B calc.Vec
	for comp := 0; comp < 3; comp++ {
		f := func(phi float64) float64 {
			s, co := math.Sincos(phi)
			pos := ctr.Add(fr.E1.Scale(a * co)).Add(fr.E2.Scale(a * s))
			dl := fr.E1.Scale(-a * s).Add(fr.E2.Scale(a * co))
			r := p.Sub(pos)
			n := r.Norm()
			return dl.Cross(r)[comp] / (n * n * n)
		}
		B[comp] = calc.Mu0 * I / (4 * math.Pi) * quad.Fixed(f, 0, 2*math.Pi, 96, quad.Legendre{}, 0)
	}
	return B
}
