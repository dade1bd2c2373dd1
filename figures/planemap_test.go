package figures

import (
	"image/color"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg"
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

// A linear colour bar's ticks are round values, three to six of them,
// inside the bar, each labelled with its unit; the labels are distinct.
func TestBarTicks(t *testing.T) {
	ranges := [][2]float64{
		{-114e-6, 366e-6}, {-30.7e-6, 163e-6}, {0.9, 2.5}, {1.000e-4, 1.003e-4},
		{-5e-3, -1e-3}, {0, 1e-9}, {-1, 1}, {3.3e-6, 9.9e-6}, {0.1, 0.12}, {17, 1e4},
	}
	for _, r := range ranges {
		bt := BarTicks(r[0], r[1])
		if n := len(bt.Values); n < 3 || n > 6 {
			t.Errorf("[%g, %g]: %d ticks %v, want 3 to 6", r[0], r[1], n, bt.Values)
		}
		m := bt.Step / math.Pow(10, math.Floor(math.Log10(bt.Step)+1e-12))
		if round := math.Abs(m-1) < 1e-9 || math.Abs(m-2) < 1e-9 || math.Abs(m-2.5) < 1e-9 || math.Abs(m-5) < 1e-9; !round {
			t.Errorf("[%g, %g]: step %g is not 1, 2, 2.5 or 5 times a power of ten", r[0], r[1], bt.Step)
		}
		seen := map[string]bool{}
		for _, v := range bt.Values {
			if v < r[0]-1e-12*math.Abs(r[1]-r[0]) || v > r[1]+1e-12*math.Abs(r[1]-r[0]) {
				t.Errorf("[%g, %g]: tick %g outside the bar", r[0], r[1], v)
			}
			if k := v / bt.Step; math.Abs(k-math.Round(k)) > 1e-6 {
				t.Errorf("[%g, %g]: tick %g is not a multiple of the step %g", r[0], r[1], v, bt.Step)
			}
			l := bt.Label(v)
			if !strings.HasSuffix(l, "T") || seen[l] {
				t.Errorf("[%g, %g]: label %q (without unit, or repeated)", r[0], r[1], l)
			}
			seen[l] = true
		}
	}
	bt := BarTicks(-114e-6, 366e-6)
	var got []string
	for _, v := range bt.Values {
		got = append(got, bt.Label(v))
	}
	if want := "−100 µT,0 µT,100 µT,200 µT,300 µT"; strings.Join(got, ",") != want {
		t.Errorf("labels %q, want %q", strings.Join(got, ","), want)
	}
}

// The plane map's colour bar carries its round ticks and no label
// without a unit.
func TestPlaneMapBarLabels(t *testing.T) {
	x := []float64{-1, -0.5, 0, 0.5, 1}
	d := PlaneData{X: x, Y: x, Ref: 3e-4, Steps: ContourSteps, Quantity: "Bz"}
	for _, yv := range x {
		for _, xv := range x {
			d.V = append(d.V, 3e-4*(1-0.3*(xv*xv+yv*yv))-1e-4*xv*xv*yv*yv)
		}
	}
	var c recorder.Canvas
	PlaneMap(d)(&c, 400, 300)
	bar := map[string]bool{}
	for _, a := range c.Actions {
		if fs, ok := a.(*recorder.FillString); ok && strings.HasSuffix(fs.String, "T") && !strings.HasSuffix(fs.String, "m)") {
			bar[fs.String] = true
		}
		if fs, ok := a.(*recorder.FillString); ok && strings.HasSuffix(fs.String, "%") {
			t.Errorf("bar label %q: the ticks are in teslas", fs.String)
		}
	}
	lo, hi, _ := planeRange(d.V)
	bt := BarTicks(lo, hi)
	for _, v := range bt.Values {
		if !bar[bt.Label(v)] {
			t.Errorf("tick %q not drawn (drawn: %v)", bt.Label(v), bar)
		}
	}
}

// A probe's name stands clear of the lines drawn: over a panel whose
// field falls steeply at its edge (a crowded contour band there) a probe
// on the edge itself, one inside and one at the centre each have a name
// whose box, with a margin, crosses no contour and not the dashed outline.
func TestPlaneLabelsClearOfLines(t *testing.T) {
	var x []float64
	for k := range 61 {
		x = append(x, -0.3+0.01*float64(k))
	}
	const ref = 3e-4
	d := PlaneData{X: x, Y: x, Ref: ref, Steps: ContourSteps, Quantity: "Bz",
		Outline: [][2]float64{{-0.2, -0.12}, {0.2, -0.12}, {0.2, 0.12}, {-0.2, 0.12}},
		Points:  []PlanePoint{{X: 0.2, Y: 0, Label: "panel edge"}, {X: 0.06, Y: 0.04, Label: "module, corner"}, {X: 0, Y: 0, Label: "module"}}}
	edge := func(v, a float64) float64 { return 1 / (1 + math.Exp((math.Abs(v)-a)/0.008)) }
	for _, yv := range x {
		for _, xv := range x {
			d.V = append(d.V, ref*(1+0.02*(xv*xv+yv*yv)/0.04)*edge(xv, 0.19)*edge(yv, 0.11))
		}
	}
	var c recorder.Canvas
	PlaneMap(d)(&c, 420, 260)
	var col color.Color
	var lines [][]vg.Point
	texts := map[string]vg.Point{}
	for _, a := range c.Actions {
		switch a := a.(type) {
		case *recorder.SetColor:
			col = a.Color
		case *recorder.Stroke:
			if col != contourInk && col != Copper {
				continue
			}
			var l []vg.Point
			for _, cp := range a.Path {
				l = append(l, cp.Pos)
			}
			lines = append(lines, l)
		case *recorder.FillString:
			texts[a.String] = a.Point
		}
	}
	if len(lines) < 5 {
		t.Fatalf("%d lines drawn, want the contours and the outline", len(lines))
	}
	sty := style(markLabelSize, Ink)
	for _, q := range d.Points {
		at, ok := texts[q.Label]
		if !ok {
			t.Fatalf("%q not drawn", q.Label)
		}
		// The name's extent and 1.5 pt round it: clear, not touching.
		const m = 1.5
		box := vg.Rectangle{Min: vg.Point{X: at.X - m, Y: at.Y - m}, Max: vg.Point{X: at.X + sty.Width(q.Label) + m, Y: at.Y + sty.Height(q.Label) + m}}
		n := 0
		for _, l := range lines {
			for i := 0; i+1 < len(l); i++ {
				for k := range 40 {
					f := vg.Length(k) / 40
					p := vg.Point{X: l[i].X + (l[i+1].X-l[i].X)*f, Y: l[i].Y + (l[i+1].Y-l[i].Y)*f}
					if p.X >= box.Min.X && p.X <= box.Max.X && p.Y >= box.Min.Y && p.Y <= box.Max.Y {
						n++
					}
				}
			}
		}
		if n > 0 {
			t.Errorf("%q at %v: %d points of the lines under its name", q.Label, at, n)
		}
	}
}
