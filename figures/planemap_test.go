package figures

import (
	"math"
	"testing"

	"gonum.org/v1/plot/vg/recorder"
)

// A plane map contours the value itself, linearly: over a plane where
// V = x − y − 0.2 (signed values included) the level 0.5 is the straight
// line y = x − 0.7, found exactly by linear interpolation along the cell
// edges.
func TestPlaneContoursLinear(t *testing.T) {
	var x, y []float64
	for k := range 11 {
		x = append(x, -1+0.2*float64(k))
		y = append(y, -1+0.2*float64(k))
	}
	d := PlaneData{X: x, Y: y, Ref: 2, Steps: []float64{0.25, -0.9, 5}}
	for _, yv := range y {
		for _, xv := range x {
			d.V = append(d.V, xv-yv-0.2) // from −2.2 to 1.8: negative too
		}
	}
	lines := PlaneContours(d, 0.5)
	if len(lines) != 1 {
		t.Fatalf("%d contour lines, want 1", len(lines))
	}
	for _, q := range lines[0] {
		if math.Abs(q[1]-(q[0]-0.7)) > 1e-12 {
			t.Errorf("contour point (%g, %g) is off the line y = x − 0.7", q[0], q[1])
		}
	}
	// Levels: Ref·(1+s) inside the map's range only (2.5 is above its
	// top, 0.2 inside, 12 far above).
	if lv := d.PlaneLevels(); len(lv) != 1 || math.Abs(lv[0]-0.2) > 1e-12 {
		t.Errorf("levels %v, want [0.2]", lv)
	}
	// It draws, and names its probes.
	d.Points = []PlanePoint{{X: 0.1, Y: 0.2, Label: "p1"}}
	d.Quantity = "Bz"
	var c recorder.Canvas
	PlaneMap(d)(&c, 400, 300)
	found := false
	for _, a := range c.Actions {
		if fs, ok := a.(*recorder.FillString); ok && fs.String == "p1" {
			found = true
		}
	}
	if !found {
		t.Error("the probe's name is not drawn")
	}
}

func TestPercentLabel(t *testing.T) {
	for f, want := range map[float64]string{0.05: "+5 %", -0.01: "−1 %", 0.005: "+0.5 %", -0.5: "−50 %"} {
		if got := percentLabel(f); got != want {
			t.Errorf("percentLabel(%g) = %q, want %q", f, got, want)
		}
	}
}

// Beside a conductor the value runs far beyond the reference: the colour
// scale stops at ±ColourSpan of it, the bar says so, and no contour is
// drawn beyond it.
func TestPlaneMapClipsColours(t *testing.T) {
	x := []float64{-1, 0, 1}
	d := PlaneData{X: x, Y: x, Ref: 1, Steps: ContourSteps, Quantity: "Bz",
		V: []float64{0.9, 1, 0.95, 1, 1, 1, 1.1, 1, 40}}
	for _, lv := range d.PlaneLevels() {
		if lv >= 1+ColourSpan {
			t.Errorf("contour at %g beyond the colour scale's top %g", lv, 1+ColourSpan)
		}
	}
	var c recorder.Canvas
	PlaneMap(d)(&c, 400, 300)
	top := false
	for _, a := range c.Actions {
		if fs, ok := a.(*recorder.FillString); ok && fs.String == "≥ 2.5 T" {
			top = true
		}
	}
	if !top {
		t.Error(`the clipped top is not labelled "≥ 2.5 T"`)
	}
}
