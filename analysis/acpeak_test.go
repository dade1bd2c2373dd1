package analysis

import (
	"math"
	"testing"
)

// An a.c. coil's 0.5 mT region is that of the peak of its current: the
// field is linear in the current (Biot–Savart law), so a 50 Hz coil at
// 2 A r.m.s. must have the region of the same coil at the 2√2 A d.c. peak,
// and reach farther than at 20 A d.c. Far along the axis the field is the
// dipole's, B = μ0 m/(2π z³) (e.g. J. D. Jackson, Classical
// Electrodynamics, 3rd ed., Wiley 1999, eq. 5.56), so the axial reach
// grows as the cube root of the current: by 2^(1/6) for a factor √2.
func TestImplantRegionAtTheACPeak(t *testing.T) {
	coil := func(current, extra string) string {
		return "```coil\nname = s\nform = solenoid\nmean-diameter = 40 mm\nlength = 20 mm\nradial-build = 8 mm\nturns = 400\nwire = AWG 24\ncurrent = " + current + "\n" + extra + "```\n"
	}
	ac := studyOf(t, coil("20 A", "frequency = 50 Hz\n")).Safety.Implant
	dc := studyOf(t, coil("20 A", "")).Safety.Implant
	pk := studyOf(t, coil("28.284271 A", "")).Safety.Implant
	if !ac.Peak || dc.Peak || pk.Peak {
		t.Fatalf("Peak: a.c. %v, d.c. %v, %v; want only the a.c. coil's set", ac.Peak, dc.Peak, pk.Peak)
	}
	near := func(what string, got, want, tol float64) {
		t.Helper()
		if !(math.Abs(got/want-1) <= tol) {
			t.Errorf("%s: %g, want %g (±%g)", what, got, want, tol)
		}
	}
	near("axial reach, a.c. against the d.c. peak", ac.Axial, pk.Axial, 1e-6)
	near("distance from the winding, a.c. against the d.c. peak", ac.Distance, pk.Distance, 1e-6)
	near("|B| at the origin, a.c. against the d.c. peak", ac.Origin, pk.Origin, 1e-7)
	near("surface |B|, a.c. against the d.c. peak", ac.Windings[0].Surface, pk.Windings[0].Surface, 1e-6)
	// the reach is several coil diameters: the dipole's law to a few per cent
	if !(dc.Axial > 0.15) {
		t.Fatalf("d.c. axial reach %g m, not in the dipole region", dc.Axial)
	}
	near("axial reach, peak against r.m.s.", ac.Axial/dc.Axial, math.Pow(2, 1.0/6), 0.02)
}
