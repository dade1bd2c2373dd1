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
