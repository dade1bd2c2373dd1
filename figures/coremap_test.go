package figures

import (
	"strings"
	"testing"

	"gonum.org/v1/plot/vg/recorder"
)

// A core's field above the colour scale's top (the core is drawn grey,
// its nodes out of the scale) is marked on the colour bar with its value;
// one inside the scale is not, and neither is an air coil's.
func TestFieldMapMarksCoreAboveScale(t *testing.T) {
	var x []float64
	for k := range 21 {
		x = append(x, -1+0.1*float64(k))
	}
	core := Section{X0: -0.3, X1: 0.3, Y0: -0.2, Y1: 0.2, Core: true}
	d := MapData{X: x, Y: x, Sections: []Section{core}}
	for _, yv := range x {
		for _, xv := range x {
			v := 1e-3 / (1 + 4*(xv*xv+yv*yv)) // 1 mT at the centre, 0.2 mT at the edge
			if inSections(d.Sections, xv, yv) {
				v = 0.17 // the core's field
			}
			d.B = append(d.B, v)
		}
	}
	labels := func(d MapData) []string {
		var c recorder.Canvas
		FieldMap(d)(&c, 500, 300)
		var out []string
		for _, a := range c.Actions {
			if fs, ok := a.(*recorder.FillString); ok && strings.HasPrefix(fs.String, "core") {
				out = append(out, fs.String)
			}
		}
		return out
	}
	if got := labels(d); len(got) != 0 {
		t.Errorf("without CorePeak given: %q", got)
	}
	d.CorePeak = 0.17
	if !d.CoreAbove() {
		t.Errorf("a core at 170 mT over a scale topped at %g T is not above it", d.Scale().Hi)
	}
	if got := labels(d); len(got) != 1 || got[0] != "core 170 mT" {
		t.Errorf("core label %q, want [\"core 170 mT\"]", got)
	}
	d.CorePeak = 0.5e-3 // inside the scale
	if d.CoreAbove() || len(labels(d)) != 0 {
		t.Error("a core field inside the colour scale is marked as above it")
	}
}
