package figures

import (
	"math"
	"testing"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/recorder"
)

// A legend too wide to stand beside the data area without squeezing it —
// a requirement entry in full words, on a curve that leaves no corner
// free — stands below it: the data area (measured on the grid lines drawn)
// keeps at least three quarters of the figure's width, and the entry is
// drawn inside the figure, below the data area.
func TestWideLegendKeepsDataWidth(t *testing.T) {
	// An opposing pair's gradient: flat at the centre, peaks near the
	// coils.
	var z, g []float64
	for i := 0; i <= 200; i++ {
		x := -0.2 + 0.4*float64(i)/200
		z = append(z, x)
		g = append(g, -0.024*(1-math.Pow(x/0.09, 2))*math.Exp(-math.Pow(x/0.09, 2)*0.6))
	}
	for _, lv := range []Level{
		{Y: -0.010, Label: "required |∂Bz/∂z| ≥ 10.0 mT/m at the centre", Local: true},
		{Y: -0.010, Label: "required |∂Bz/∂z| ≥ 10.0 mT/m over the whole region of interest"},
	} {
		d := ProfileData{Axis: "z", Z: z, Y: g, YName: "Axial gradient ∂Bz/∂z", Unit: "T/m",
			Levels: []Level{lv}, Windings: [][2]float64{{-0.09, -0.08}, {0.08, 0.09}}, WindingLabel: "coil",
			// Dotted over the whole height near the centre, as a pair's
			// ±1 % region is: a legend in any corner would cover them.
			Marks: []Mark{{X: -0.03, Label: "±1 %"}, {X: 0.03, Label: "±1 %"}}}
		for _, w := range []vg.Length{300, 400, 480} {
			const h = 220
			var c recorder.Canvas
			Profile(d)(&c, w, h)
			var col any
			lo, hi := vg.Length(math.Inf(1)), vg.Length(math.Inf(-1))
			bottom := vg.Length(math.Inf(1))
			var entry *recorder.FillString
			for _, a := range c.Actions {
				switch a := a.(type) {
				case *recorder.SetColor:
					col = a.Color
				case *recorder.Stroke:
					if col != GridColor {
						continue
					}
					for _, cp := range a.Path {
						lo, hi = min(lo, cp.Pos.X), max(hi, cp.Pos.X)
						bottom = min(bottom, cp.Pos.Y)
					}
				case *recorder.FillString:
					if a.String == lv.Label {
						entry = a
					}
				}
			}
			if !(hi > lo) {
				t.Fatalf("%v wide: no grid drawn", w)
			}
			if hi-lo < 0.75*w {
				t.Errorf("%q, %v wide: data area %.0f wide, %.0f %% of the figure, want ≥ 75 %%", lv.Label, w, hi-lo, 100*(hi-lo)/w)
			}
			if entry == nil {
				t.Fatalf("%v wide: legend entry %q not drawn", w, lv.Label)
			}
			tw := style(LegendSize, Ink).Width(entry.String)
			if entry.Point.Y >= bottom || entry.Point.Y < 0 || entry.Point.X < 0 || entry.Point.X+tw > w {
				t.Errorf("%v wide: legend entry at %v (%.0f wide), want below the data area (foot %.0f) inside the figure", w, entry.Point, tw, bottom)
			}
		}
	}
}
