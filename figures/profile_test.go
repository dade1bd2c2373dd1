package figures

import (
	"gonum.org/v1/plot/plotter"
	"image/color"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/recorder"
)

func drawnTexts(f DrawFunc, w, h vg.Length) string {
	var c recorder.Canvas
	f(&c, w, h)
	var out []string
	for _, a := range c.Actions {
		if fs, ok := a.(*recorder.FillString); ok {
			out = append(out, fs.String)
		}
	}
	return strings.Join(out, "|")
}

// A profile that changes sign is drawn about zero; one that keeps its sign
// from zero; marks, windings and requirements carry their labels.
func TestProfile(t *testing.T) {
	var z, bz, g []float64
	for i := 0; i <= 100; i++ {
		x := -0.2 + 0.4*float64(i)/100
		z = append(z, x)
		bz = append(bz, 1e-3/(1+math.Pow(x/0.1, 8)))
		g = append(g, -0.02*x*math.Exp(-x*x/0.01))
	}
	d := ProfileData{Axis: "x", Z: z, Y: bz, YName: "Axial flux density Bx", Unit: "T",
		Marks:  []Mark{{X: -0.1, Label: "end"}, {X: 0.1, Label: "end"}},
		Levels: []Level{{Y: 0.8e-3, Label: "required ≥ 800 µT"}}}
	p, _, _ := profilePlot(d)
	if p.Y.Min != 0 || !(p.Y.Max > 1) {
		t.Errorf("one-signed profile: y from %g to %g mT, want from 0", p.Y.Min, p.Y.Max)
	}
	all := drawnTexts(Profile(d), 400, 220)
	for _, want := range []string{"Axial position w along the coil's axis x (mm)", "Axial flux density Bx (mT)", "end", "required ≥ 800 µT"} {
		if !strings.Contains(all, want) {
			t.Errorf("profile lacks %q: %s", want, all)
		}
	}
	gd := ProfileData{Axis: "z", Z: z, Y: g, YName: "Axial gradient ∂Bz/∂z", Unit: "T/m",
		Windings: [][2]float64{{-0.12, -0.1}, {0.1, 0.12}}, WindingLabel: "coil"}
	p, _, _ = profilePlot(gd)
	if !(p.Y.Min < 0 && math.Abs(p.Y.Min+p.Y.Max) < 1e-12) {
		t.Errorf("signed profile: y from %g to %g, want symmetric about zero", p.Y.Min, p.Y.Max)
	}
	if all := drawnTexts(Profile(gd), 400, 220); strings.Count(all, "coil") != 2 || !strings.Contains(all, "Axial gradient ∂Bz/∂z (µT/m)") {
		t.Errorf("gradient profile text %s", all)
	}
}

// The legend keeps clear of a requirement line as of a curve: a curve
// rising to the right leaves the top left and the bottom right free, and
// a requirement line along the top takes the top left away.
func TestLegendAvoidsRequirement(t *testing.T) {
	var z, y []float64
	for i := 0; i <= 60; i++ {
		x := float64(i) / 60
		z = append(z, x)
		y = append(y, x*x)
	}
	d := ProfileData{Z: z, Y: y, YName: "B", Unit: "T", CurveName: "field",
		Levels: []Level{{Y: 1.0, Label: "required ≥ 1 T"}}}
	p, top, avoid := profilePlot(d)
	var c recorder.Canvas
	drawer(p, top, avoid)(&c, 400, 220)
	if p.Legend.Top || p.Legend.Left {
		t.Errorf("legend top=%v left=%v, want bottom right", p.Legend.Top, p.Legend.Left)
	}
}

// A uniform-radius requirement is drawn as a labelled line, even beyond
// the curves; a band below 0.1 % turns the axis to ppm.
func TestDeviationRequirement(t *testing.T) {
	var d DeviationData
	for i := 0; i <= 40; i++ {
		x := 0.02 * float64(i) / 40
		d.Pos = append(d.Pos, x)
		d.Axial = append(d.Axial, -math.Pow(x/0.02, 4)*0.02)
		d.Radial = append(d.Radial, -math.Pow(x/0.02, 4)*0.01)
	}
	d.Bands, d.Required, d.RequiredLabel = []float64{0.01, 0.001}, 0.03, "required 30 mm"
	all := drawnTexts(DeviationPlot(d), 400, 220)
	for _, want := range []string{"required 30 mm", "B/B(0) − 1 (%)", "|30|"} {
		if !strings.Contains(all, want) {
			t.Errorf("deviation plot lacks %q: %s", want, all)
		}
	}
	d.Bands = []float64{0.001, 0.0001}
	if all := drawnTexts(DeviationPlot(d), 400, 220); !strings.Contains(all, "B/B(0) − 1 (ppm)") || !strings.Contains(all, "|1000|") {
		t.Errorf("tight bands not in ppm: %s", all)
	}
}

// A requirement that applies at the centre is drawn as a short bar there,
// not across the plot; a level without a place still spans the whole
// axis. Measured on the strokes drawn in the requirement's colour and
// width (the legend's sample lies beyond the data's right half).
func TestProfileLocalRequirement(t *testing.T) {
	var z, bz []float64
	for i := 0; i <= 100; i++ {
		x := -0.2 + 0.4*float64(i)/100
		z = append(z, x)
		bz = append(bz, 1e-3/(1+math.Pow(x/0.1, 8)))
	}
	spans := func(lv Level) [][2]vg.Length {
		d := ProfileData{Axis: "z", Z: z, Y: bz, YName: "Axial flux density Bz", Unit: "T", Levels: []Level{lv}}
		var c recorder.Canvas
		Profile(d)(&c, 400, 220)
		var out [][2]vg.Length
		var col color.Color
		var width vg.Length
		for _, a := range c.Actions {
			switch a := a.(type) {
			case *recorder.SetColor:
				col = a.Color
			case *recorder.SetLineWidth:
				width = a.Width
			case *recorder.Stroke:
				if col != Highlight || (width != LineWidth && width != ThinWidth) {
					continue
				}
				lo, hi := vg.Length(math.Inf(1)), vg.Length(math.Inf(-1))
				ys := map[vg.Length]bool{}
				for _, cp := range a.Path {
					lo, hi = min(lo, cp.Pos.X), max(hi, cp.Pos.X)
					ys[cp.Pos.Y] = true
				}
				if len(ys) == 1 && hi > lo { // horizontal strokes only
					out = append(out, [2]vg.Length{lo, hi})
				}
			}
		}
		return out
	}
	full := spans(Level{Y: 0.8e-3, Label: "required"})
	widest := vg.Length(0)
	for _, s := range full {
		widest = max(widest, s[1]-s[0])
	}
	if widest < 300 {
		t.Errorf("a level without a place spans %v of a 400-wide figure", widest)
	}
	local := spans(Level{Y: 0.8e-3, Label: "required at the centre", Local: true})
	if len(local) < 2 {
		t.Fatalf("local level: %d horizontal strokes, want the bar and its legend sample", len(local))
	}
	for _, s := range local {
		if w := s[1] - s[0]; w > LocalBarWidth+1e-9 {
			t.Errorf("local level drawn %v wide, want at most %v", w, LocalBarWidth)
		}
	}
	found := false
	for _, s := range local {
		mid := (s[0] + s[1]) / 2
		if math.Abs(float64(s[1]-s[0]-LocalBarWidth)) < 1e-9 && mid > 150 && mid < 260 {
			found = true
		}
	}
	if !found {
		t.Errorf("no bar of %v near the middle of the figure: %v", LocalBarWidth, local)
	}
}

// A requirement line along the very top of the data area (the axis range
// ending at it, as a sweep's temperature limit does) counts as under a
// top-corner legend: the legend is drawn on the data area widened by the
// axis padding, so it would stand over the line.
func TestLegendAvoidsLineAtTheEdge(t *testing.T) {
	var z, y []float64
	for i := 0; i <= 60; i++ {
		x := float64(i) / 60
		z = append(z, x)
		y = append(y, 0.9*x*x)
	}
	pl := NewPlot("x", "y")
	curve := make(plotter.XYs, len(z))
	for i := range z {
		curve[i] = plotter.XY{X: z[i], Y: y[i]}
	}
	limit := plotter.XYs{{X: 0, Y: 1}, {X: 1, Y: 1}}
	if ln := addCurve(pl, []plotter.XYs{limit}, lineStyle(Highlight, ThinWidth, Dashed)); ln != nil {
		pl.Legend.Add("requirement", ln)
	}
	if ln := addCurve(pl, []plotter.XYs{curve}, lineStyle(Accent, LineWidth, nil)); ln != nil {
		pl.Legend.Add("curve", ln)
	}
	pl.X.Min, pl.X.Max, pl.Y.Min, pl.Y.Max = 0, 1, 0, 1
	var c recorder.Canvas
	drawer(pl, 0, []plotter.XYs{curve, limit})(&c, 400, 220)
	if pl.Legend.Top {
		t.Errorf("legend top=%v left=%v: over the requirement along the top", pl.Legend.Top, pl.Legend.Left)
	}
}
