package figures

import (
	"fmt"
	"math"
	"testing"

	"gonum.org/v1/plot/vg/recorder"
)

// Every trace of a trade figure carries its label once, and labels set
// close together are moved apart rather than over each other.
func TestTradeLabelsEverySeries(t *testing.T) {
	d := TradeData{XName: "Magnetic moment |m|", XUnit: "A·m²", YName: "Power", YUnit: "W",
		ChosenX: math.NaN(), ChosenY: math.NaN()}
	want := map[string]bool{}
	for g := 24; g <= 40; g++ {
		// Thinner wire: less moment; the traces' tops side by side, closer
		// than a label's width.
		m0 := 2 * math.Pow(10, -float64(g-24)/40)
		var s TradeSeries
		for k := range 30 {
			s.X = append(s.X, m0*(1+0.01*float64(k)))
			s.Y = append(s.Y, 0.01*math.Pow(1.2, float64(k)))
			s.Feasible = append(s.Feasible, k%2 == 0)
		}
		s.Label = fmt.Sprint(g)
		want[s.Label] = true
		d.Series = append(d.Series, s)
	}
	var c recorder.Canvas
	Trade(d)(&c, 260, 240)
	got := map[string]int{}
	for _, a := range c.Actions {
		if fs, ok := a.(*recorder.FillString); ok && want[fs.String] {
			got[fs.String]++
		}
	}
	for l := range want {
		if got[l] != 1 {
			t.Errorf("label %q drawn %d times, want once", l, got[l])
		}
	}
	// Set apart: no two labels' boxes overlap.
	sty := seriesLabelStyle()
	type box struct{ x0, y0, x1, y1 float64 }
	var boxes []box
	for _, a := range c.Actions {
		if fs, ok := a.(*recorder.FillString); ok && want[fs.String] {
			w, h := float64(sty.Width(fs.String)), float64(sty.Height(fs.String))
			boxes = append(boxes, box{float64(fs.Point.X), float64(fs.Point.Y), float64(fs.Point.X) + w, float64(fs.Point.Y) + h})
		}
	}
	for i := range boxes {
		for j := i + 1; j < len(boxes); j++ {
			a, b := boxes[i], boxes[j]
			if a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1-1e-6 && b.y0 < a.y1-1e-6 {
				t.Errorf("labels overlap: %v and %v", a, b)
			}
		}
	}
}
