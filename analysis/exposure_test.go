package analysis

import (
	"math"
	"testing"
)

// A 50 kHz three-layer drive coil at 0.5 A r.m.s.: its field against the
// ICNIRP (2010) reference levels at 50 kHz, 27 µT (public) and 100 µT
// (occupational). Each distance is checked by brute force round the
// winding: along 400 directions from its centre (a Fibonacci lattice),
// every 0.5 mm out to 1 m, no point farther than the stated distance from
// the winding reaches the level, and some point within it does.
func TestACExposureDistances(t *testing.T) {
	st := studyOf(t, "```coil\nname = drive coil\nform = solenoid\ninner-diameter = 30 mm\nradial-build = 3 mm\nlength = 20 mm\nturns = 120\nwire = AWG 26\nwire-outer-diameter = 0.5 mm\ncurrent = 0.5 A\nfrequency = 50 kHz\n```\n"+
		"```conditions\nambient = 20 degC\nh = 10 W/(m2 K)\n```\n")
	if len(st.Safety.Exposure) != 1 {
		t.Fatalf("%d exposure findings, want 1", len(st.Safety.Exposure))
	}
	e := st.Safety.Exposure[0]
	if e.Public != 27e-6 || e.Occupational != 100e-6 {
		t.Errorf("levels %g, %g T; want 27 µT and 100 µT at 50 kHz", e.Public, e.Occupational)
	}
	if !(e.PublicDistance > e.OccupationalDistance && e.OccupationalDistance > 0) {
		t.Fatalf("distances %g m (public), %g m (occupational)", e.PublicDistance, e.OccupationalDistance)
	}
	fm := implantField(st.Spec.Design, st.Results, st.Coils)
	os := outlines(st.Spec.Design, st.Coils)
	for _, c := range []struct {
		level, dist float64
	}{{e.Public, e.PublicDistance}, {e.Occupational, e.OccupationalDistance}} {
		beyond, within := 0.0, 0.0
		for _, u := range fibonacciSphere(400) {
			for r := 0.0005; r <= 1; r += 0.0005 {
				p := u.Scale(r)
				d, _, _ := nearestOutline(os, p)
				if d == 0 {
					continue
				}
				b := fm(p).Norm()
				if d > c.dist*(1+1e-3) {
					beyond = math.Max(beyond, b)
				} else {
					within = math.Max(within, b)
				}
			}
		}
		if beyond >= c.level || within < c.level {
			t.Errorf("level %g T at %.4g mm: largest |B| %.4g T beyond, %.4g T within", c.level, c.dist*1e3, beyond, within)
		}
	}
}
