package memo

import (
	"math"
	"strings"
	"testing"
)

// acWinding is a three-layer air winding driven at 50 kHz, where Dowell's
// factor is about 1.9.
const acWinding = "```coil\nname = drive coil\nform = solenoid\ninner-diameter = 30 mm\nradial-build = 3 mm\nlength = 20 mm\nturns = 120\nwire = AWG 26\nwire-outer-diameter = 0.5 mm\ncurrent = 0.5 A\nfrequency = 50 kHz\n```\n" +
	"```conditions\nambient = 20 degC\nh = 10 W/(m2 K)\nemissivity = 0.85\n```\n"

// The a.c. heating step multiplies Dowell's factor by the d.c. power, the
// r.m.s. current's I² R(T) — not by the a.c. power it results in.
func TestACHeatingStepTakesTheDCPower(t *testing.T) {
	j, diags := evaluate("ac.md", []byte(acWinding))
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	k := j.Coils[0].Kinds
	if k.AC == nil || !(k.AC.Factor > 1.5) {
		t.Fatalf("no a.c. factor: %+v", k.AC)
	}
	cr := j.Results.Coils[0]
	if dc := cr.Current * cr.Current * cr.RHot; !(k.DCPower > 0) || math.Abs(k.DCPower/dc-1) > 1e-12 || math.Abs(k.ACPower/(k.AC.Factor*k.DCPower)-1) > 1e-9 {
		t.Errorf("d.c. power %g W (I²R %g W), a.c. %g W, F_R %g", k.DCPower, dc, k.ACPower, k.AC.Factor)
	}
	text := memoText(t, j)
	i := strings.Index(text, `P_{ac} = F_R P_{dc}`)
	if i < 0 {
		t.Fatal("no a.c. heating step")
	}
	line := text[i:min(len(text), i+200)]
	if want := Q(k.DCPower, "W", 4); !strings.Contains(line, want) {
		t.Errorf("a.c. heating step %q does not show the d.c. power %s", line, want)
	}
}

// An a.c. coil's implant caution says its region is that of the peak of
// the current, √2 times the r.m.s., and points to the time-varying caution,
// which gives the ICNIRP (2010) levels at its frequency; a d.c. coil's
// says neither.
func TestImplantCautionOfAnACCoil(t *testing.T) {
	dc := strings.Replace(acWinding, "frequency = 50 kHz\n", "", 1)
	for _, c := range []struct {
		src string
		ac  bool
	}{{acWinding, true}, {dc, false}} {
		j, diags := evaluate("ac.md", []byte(c.src))
		if len(diags) > 0 {
			t.Fatal(diags)
		}
		var implant, exposure string
		for _, co := range Cautions(j) {
			switch {
			case strings.HasPrefix(co.Title, "Field above 0.5 mT"):
				implant = spanText(co.Spans)
			case strings.HasPrefix(co.Title, "Time-varying field"):
				exposure = spanText(co.Spans)
			}
		}
		if implant == "" {
			t.Fatalf("ac %v: no implant caution", c.ac)
		}
		if got := strings.Contains(implant, "at the peak of the current, √2 times the r.m.s."); got != c.ac {
			t.Errorf("ac %v: implant caution notes the alternating field: %v", c.ac, got)
		}
		if got := strings.Contains(exposure, "27.0 µT") && strings.Contains(exposure, "100 µT"); got != c.ac {
			t.Errorf("ac %v: time-varying caution with the 50 kHz levels: %v (%q)", c.ac, got, exposure)
		}
	}
}
