package figures

import (
	"image/color"
	"math"
	"testing"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/recorder"
)

// Every bar of the sensitivity figure ends clear of the data area's frame
// (read off the figure's own grid lines), and the legend stands beside
// the data area, not over the bars.
func TestSensitivityBarsFit(t *testing.T) {
	results := []string{"Magnetic moment |m|", "Current", "Power (averaged over the duty cycle)", "Hot resistance"}
	tols := []string{"supply", "ambient", "wire-diameter", "resistivity", "turns"}
	swing := [][]float64{
		{9, -26.8, 4.8, -1.9, math.NaN()},
		{9, -26.9, 4.8, -1.9, -1.9},
		{19, -26.8, 4.8, -1.9, -1.9},
		{1, 26.9, -4.6, 1.9, 1.9},
	}
	const w, h = 460, 220
	var c recorder.Canvas
	Sensitivity(results, tols, swing)(&c, w, h)
	var col color.Color
	type box struct{ x0, x1, y0, y1 vg.Length }
	var bars []box
	gx0, gx1 := vg.Length(math.Inf(1)), vg.Length(math.Inf(-1)) // data area, from the grid
	gy0, gy1 := vg.Length(math.Inf(1)), vg.Length(math.Inf(-1))
	legendX := vg.Length(math.Inf(1))
	names := map[string]bool{}
	for _, n := range tols {
		names[n] = true
	}
	barColour := map[color.Color]bool{}
	for k := range tols {
		barColour[Viridis(0.1+0.8*float64(k)/float64(len(tols)-1))] = true
	}
	for _, a := range c.Actions {
		switch a := a.(type) {
		case *recorder.SetColor:
			col = a.Color
		case *recorder.Fill:
			if !barColour[col] {
				continue
			}
			b := box{vg.Length(math.Inf(1)), vg.Length(math.Inf(-1)), vg.Length(math.Inf(1)), vg.Length(math.Inf(-1))}
			for _, cp := range a.Path {
				if cp.Type == vg.MoveComp || cp.Type == vg.LineComp {
					b.x0, b.x1 = min(b.x0, cp.Pos.X), max(b.x1, cp.Pos.X)
					b.y0, b.y1 = min(b.y0, cp.Pos.Y), max(b.y1, cp.Pos.Y)
				}
			}
			bars = append(bars, b)
		case *recorder.Stroke:
			if col == color.Color(GridColor) && len(a.Path) == 2 {
				p, q := a.Path[0].Pos, a.Path[1].Pos
				gx0, gx1 = min(gx0, p.X, q.X), max(gx1, p.X, q.X)
				gy0, gy1 = min(gy0, p.Y, q.Y), max(gy1, p.Y, q.Y)
			}
		case *recorder.FillString:
			if names[a.String] {
				legendX = min(legendX, a.Point.X)
			}
		}
	}
	if len(bars) < 15 {
		t.Fatalf("%d bars found", len(bars))
	}
	margin := 0.02 * (gx1 - gx0)
	for _, b := range bars {
		// The legend's own swatches lie right of the data area.
		if b.x0 > gx1 {
			continue
		}
		if b.x0 < gx0+margin || b.x1 > gx1-margin {
			t.Errorf("bar from %.1f to %.1f reaches the frame (%.1f to %.1f)", b.x0, b.x1, gx0, gx1)
		}
		if b.y0 < gy0 || b.y1 > gy1 {
			t.Errorf("bar from y %.1f to %.1f leaves the data area (%.1f to %.1f)", b.y0, b.y1, gy0, gy1)
		}
	}
	if !(legendX > gx1) || legendX > w {
		t.Errorf("legend at x %.1f, want right of the data area (%.1f) and inside the figure (%v)", legendX, gx1, w)
	}
	if lo, hi := SwingRange(-26.9, 26.9); !(lo < -26.9*1.05 && hi > 26.9*1.05) {
		t.Errorf("SwingRange(−26.9, 26.9) = %g, %g", lo, hi)
	}
}
