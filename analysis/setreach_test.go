package analysis

import (
	"math"
	"testing"

	"coilmemo/calc"
)

// diagonalSet is three air coils of different sizes on x, y and z, all
// centred on the origin and driven from 12 V: a set whose fields add most
// along a diagonal, away from every coil's meridian planes.
const diagonalSet = "```coil\nname = X loop\nform = loop\nmean-diameter = 120 mm\nturns = 60\nwire = AWG 26\naxis = x\nvoltage = 12 V\n```\n" +
	"```coil\nname = Y solenoid\nform = solenoid\nmean-diameter = 90 mm\nlength = 50 mm\nturns = 80\nwire = AWG 24\naxis = y\nvoltage = 12 V\n```\n" +
	"```coil\nname = Z coil\nform = loop\nmean-diameter = 160 mm\nlength = 6 mm\nradial-build = 4 mm\nturns = 40\nwire = AWG 22\naxis = z\nvoltage = 12 V\n```\n" +
	"```conditions\nambient = 20 degC\nh = 8 W/(m2 K)\n```\n"

// The bound the implant caution states — farther than the largest
// winding distance from every winding, |B| < 0.5 mT — is checked by
// brute force: along 1200 directions spread evenly over the sphere
// (a Fibonacci lattice), every 1 mm from the origin out to 400 mm, no
// point farther than the bound from every outline reaches the level.
func TestImplantBoundHoldsOffTheMeridianPlanes(t *testing.T) {
	st := studyOf(t, diagonalSet)
	ir := st.Safety.Implant
	bound := 0.0
	for _, w := range ir.Windings {
		bound = math.Max(bound, w.Distance)
	}
	if !(bound > 0) {
		t.Fatalf("no distance found: %+v", ir.Windings)
	}
	fm := implantField(st.Spec.Design, st.Coils)
	os := outlines(st.Spec.Design, st.Coils)
	const n = 1200
	worst, at := 0.0, calc.Vec{}
	golden := math.Pi * (3 - math.Sqrt(5))
	for k := range n {
		z := 1 - (2*float64(k)+1)/n
		s := math.Sqrt(1 - z*z)
		u := calc.Vec{s * math.Cos(golden*float64(k)), s * math.Sin(golden*float64(k)), z}
		for r := 0.001; r <= 0.4; r += 0.001 {
			p := u.Scale(r)
			if d, _, _ := nearestOutline(os, p); d <= bound*(1+1e-3) {
				continue
			}
			if b := fm(p).Norm(); b > worst {
				worst, at = b, p
			}
		}
	}
	if worst >= ImplantField {
		d, c, _ := nearestOutline(os, at)
		t.Errorf("|B| = %.4g mT at %v mm, %.4g mm from coil %d, beyond the stated bound %.4g mm", worst*1e3, at.Scale(1e3), d*1e3, c, bound*1e3)
	}
}

// The surface field the caution quotes for a winding is the largest |B|
// on its outer surface outside the other coils' windings: the end face of
// the Z coil, taken across its bore, passes through the conductors of
// the X loop and the Y solenoid, where the field of a filament model
// has no bound. On each winding the largest |B| cannot exceed that of a
// long straight wire carrying the coil's whole ampere-turns at the
// distance of the thinnest bundle's half-width (Ampère's law, a loose
// bound: μ0 N I / (2π a) with a the bundle's half-thickness).
func TestSurfacePeakSkipsOtherWindings(t *testing.T) {
	st := studyOf(t, diagonalSet)
	top := 0.0
	for i, co := range st.Spec.Design.Coils {
		e := st.Coils[i].Envelope
		a := math.Min(e.R1-e.R0, e.Z1-e.Z0) / 2
		top = math.Max(top, calc.Mu0*float64(co.Turns)*math.Abs(st.Results.Coils[i].Current)/(2*math.Pi*a))
	}
	for i, w := range st.Safety.Implant.Windings {
		if !(w.Surface > 0) || w.Surface > top {
			t.Errorf("coil %d: surface |B| %.4g T, want above 0 and at most %.4g T", i, w.Surface, top)
		}
	}
}
