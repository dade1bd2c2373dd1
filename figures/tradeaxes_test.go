package figures

import (
	"math"
	"testing"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/recorder"
)

// sizingTrade is a trade figure shaped as a sizing search's: one trace per
// wire, the thinner wires at less moment, each trace spanning a decade or
// two of power over its turns, with a moment and a power requirement
// (dashed lines across the whole figure) and a choice.
func sizingTrade(wires int, spread float64) TradeData {
	d := TradeData{XName: "Magnetic moment |m|", XUnit: "A·m²", YName: "Power", YUnit: "W",
		XLimits: []float64{0.2}, YLimits: []float64{1}, ChosenX: 0.23, ChosenY: 0.47,
		FeasibleLabel: "meets", OtherLabel: "excluded"}
	for g := range wires {
		m0 := 0.03 * math.Pow(10, spread*float64(g)/float64(wires))
		var s TradeSeries
		for k := range 40 {
			s.X = append(s.X, m0*(1+0.02*float64(k)))
			s.Y = append(s.Y, 0.008*math.Pow(1.15, float64(k))*math.Pow(10, 0.1*float64(g)))
			s.Feasible = append(s.Feasible, s.X[k] > 0.2 && s.Y[k] < 1)
		}
		d.Series = append(d.Series, s)
	}
	return d
}

// The axes of a trade figure reach just past what it plots — the points,
// the requirements and the choice — on both sides: no point on or beyond
// the frame, and no more than a tenth of the span empty at either end
// (whole decades left blank on a log axis used to be the rule).
func TestTradeAxesFitData(t *testing.T) {
	d := sizingTrade(17, 1.7)
	p, _ := tradePlot(d)
	var xs, ys []float64
	for _, s := range d.Series {
		xs, ys = append(xs, s.X...), append(ys, s.Y...)
	}
	xs = append(append(xs, d.XLimits...), d.ChosenX)
	ys = append(append(ys, d.YLimits...), d.ChosenY)
	check := func(name string, ax plot.Axis, v []float64, factor float64) {
		lo, hi, _ := positiveRange(v, nil)
		lo, hi = lo/factor, hi/factor
		f := func(x float64) float64 { return x }
		if _, ok := ax.Scale.(plot.LogScale); ok {
			f = math.Log10
		} else {
			t.Errorf("%s axis not logarithmic over %g…%g", name, lo, hi)
		}
		span := f(hi) - f(lo)
		below, above := f(lo)-f(ax.Min), f(ax.Max)-f(hi)
		if below <= 0 || above <= 0 {
			t.Errorf("%s axis %g…%g clips the data %g…%g", name, ax.Min, ax.Max, lo, hi)
		}
		if below > 0.1*span || above > 0.1*span {
			t.Errorf("%s axis %g…%g leaves more than a tenth of the data's span %g…%g empty", name, ax.Min, ax.Max, lo, hi)
		}
	}
	check("moment", p.X, xs, EngPrefix(xs...).Factor)
	check("power", p.Y, ys, EngPrefix(ys...).Factor)
}

// A trade figure's legend covers no point, requirement line, label anchor
// or choice: in a free corner when there is one, else beside the data
// area.
func TestTradeLegendClear(t *testing.T) {
	for _, tc := range []struct {
		name   string
		d      TradeData
		inside bool
	}{
		{"a corner free", sizingTrade(17, 1.7), true},
		// Traces over the whole width and height: no corner is free.
		{"no corner free", func() TradeData {
			d := sizingTrade(17, 1.7)
			// A trace zigzagging over the whole figure.
			var s TradeSeries
			for i := range 200 {
				s.X = append(s.X, 0.02*math.Pow(10, 2*float64(i)/200))
				s.Y = append(s.Y, 0.004*math.Pow(10, 4.6*float64(i%10)/9))
				s.Feasible = append(s.Feasible, false)
			}
			d.Series = append(d.Series, s)
			return d
		}(), false},
	} {
		t.Run(tc.name, func(t *testing.T) {
			p, curves := tradePlot(tc.d)
			var rc recorder.Canvas
			dc := draw.Canvas{Canvas: &rc, Rectangle: vg.Rectangle{Max: vg.Point{X: 400, Y: 240}}}
			pc, _ := placeLegendClear(p, dc, curves, true)
			da := p.DataCanvas(pc)
			box := legendBox(p, legendCanvas(p, da))
			if in := box.Min.X < da.Max.X; in != tc.inside {
				t.Errorf("legend inside the data area %v, want %v", in, tc.inside)
			}
			trX, trY := p.Transforms(&da)
			n := 0
			for _, c := range curves {
				for i := range c {
					pts := []plotter.XY{c[i]}
					if i+1 < len(c) {
						for k := 1; k < 50; k++ {
							f := float64(k) / 50
							pts = append(pts, plotter.XY{X: c[i].X + (c[i+1].X-c[i].X)*f, Y: c[i].Y + (c[i+1].Y-c[i].Y)*f})
						}
					}
					for _, q := range pts {
						x, y := trX(q.X), trY(q.Y)
						if x >= box.Min.X && x <= box.Max.X && y >= box.Min.Y && y <= box.Max.Y {
							n++
						}
					}
				}
			}
			if n > 0 {
				t.Errorf("%d points of the data under the legend", n)
			}
			// Trade draws it so (the same placement on its own canvas,
			// less the y-axis label's room).
			chosenAt := func(f DrawFunc) vg.Point {
				var rc recorder.Canvas
				f(&rc, 400, 240)
				for _, a := range rc.Actions {
					if fs, ok := a.(*recorder.FillString); ok && fs.String == "chosen" {
						return fs.Point
					}
				}
				t.Fatal("no legend entry for the choice")
				return vg.Point{}
			}
			p2, c2 := tradePlot(tc.d)
			if got, want := chosenAt(Trade(tc.d)), chosenAt(drawerClear(p2, 0, c2, true)); got != want {
				t.Errorf("Trade sets the legend entry at %v, the clear placement at %v", got, want)
			}
		})
	}
}
