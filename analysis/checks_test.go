package analysis

import (
	"math"
	"strings"
	"testing"
)

// 236 turns of AWG 30 with a 6 mm radial build and an 872 mm length fill
// one layer over 69 mm of it, laid from the inner diameter: the centre
// field's current-sheet check takes that layer's own extent (236 wire
// pitches), not the stated length, and so agrees with the loop sum; long
// solenoid, B ≈ μ0 N I / ℓ (Ampère's law) within the ends' few per cent.
func TestCentreFieldCheckOfAPartLayer(t *testing.T) {
	j := evaluateSpec(t, "```coil\nname = c1\nform = solenoid\nmean-diameter = 6.86 mm\nlength = 872 mm\nradial-build = 6 mm\nturns = 236\nwire = AWG 30\ncurrent = 1 A\n```\n")
	w := j.Results.Coils[0].Winding
	if w.LayerCount != 1 {
		t.Fatalf("%d layers", w.LayerCount)
	}
	l := w.Layers[0]
	ext := (l.Z[len(l.Z)-1] - l.Z[0]) * 236 / 235
	ampere := 4e-7 * math.Pi * 236 / ext
	for _, c := range j.Checks {
		if !strings.Contains(c.Name, "field at coil centre") {
			continue
		}
		if !c.Pass || math.Abs(c.Value/ampere-1) > 0.01 {
			t.Errorf("%s: loops %.6g T, sheet %.6g T, Ampère %.6g T, pass %v", c.Name, c.Value, c.Expected, ampere, c.Pass)
		}
		return
	}
	t.Fatal("no centre-field check")
}
