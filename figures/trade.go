package figures

import (
	"image/color"
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// TradeSeries is one family of design choices in a trade-off figure (one
// wire over its turn counts, say): SI values, and which choices meet every
// requirement.
type TradeSeries struct {
	X, Y     []float64
	Feasible []bool
}

// TradeData is a trade-off figure: choices as points of one result (X)
// against another (Y), the required values drawn as dashed lines, and the
// chosen design marked.
type TradeData struct {
	XName, XUnit, YName, YUnit string
	Series                     []TradeSeries
	// Line draws each series as a line through its points (a front)
	// rather than as a trace with its feasible points marked.
	Line             bool
	XLimits, YLimits []float64 // SI
	ChosenX, ChosenY float64   // SI; NaN for none
	// FeasibleLabel and OtherLabel name the marked and the grey points in
	// the legend ("" leaves them out).
	FeasibleLabel, OtherLabel string
}

// Trade draws a trade-off figure. An axis whose values span more than a
// decade and a half is logarithmic, labelled at the decades; SI units get
// an engineering prefix.
func Trade(d TradeData) DrawFunc {
	d = grams(d)
	var xs, ys []float64
	for _, s := range d.Series {
		xs = append(xs, s.X...)
		ys = append(ys, s.Y...)
	}
	xs = append(append(xs, d.XLimits...), d.ChosenX)
	ys = append(append(ys, d.YLimits...), d.ChosenY)
	xp, yp := EngPrefix(xs...), EngPrefix(ys...)
	p := NewPlot(d.XName+" ("+xp.Symbol+d.XUnit+")", d.YName+" ("+yp.Symbol+d.YUnit+")")
	logX := logAxis(&p.X, xs, xp.Factor, d.XUnit)
	logY := logAxis(&p.Y, ys, yp.Factor, d.YUnit)
	// A log axis's ticks carry their unit: the label names the quantity.
	if logX {
		p.X.Label.Text = d.XName
	}
	if logY {
		p.Y.Label.Text = d.YName
	}
	var curves []plotter.XYs
	scaled := func(x, y []float64) []plotter.XYs { return segments(x, y, xp.Factor, yp.Factor, logX || logY) }
	var trace, mark *plotter.Scatter
	var traceLine *plotter.Line
	for _, s := range d.Series {
		segs := scaled(s.X, s.Y)
		curves = append(curves, segs...)
		if d.Line {
			if l := addCurve(p, segs, lineStyle(Accent, LineWidth, nil)); l != nil && traceLine == nil {
				traceLine = l
			}
			continue
		}
		if l := addCurve(p, segs, lineStyle(GridColor, vg.Points(0.8), nil)); l != nil && traceLine == nil {
			traceLine = l
		}
		var fx, fy, ox, oy []float64
		for i := range s.X {
			if i < len(s.Feasible) && s.Feasible[i] {
				fx, fy = append(fx, s.X[i]), append(fy, s.Y[i])
			} else {
				ox, oy = append(ox, s.X[i]), append(oy, s.Y[i])
			}
		}
		if sc := scatter(p, scaled(ox, oy), Secondary, 0.7); sc != nil && trace == nil {
			trace = sc
		}
		if sc := scatter(p, scaled(fx, fy), Accent, 1.4); sc != nil && mark == nil {
			mark = sc
		}
	}
	xlo, xhi, okx := finiteRange(xs)
	ylo, yhi, oky := finiteRange(ys)
	var req *plotter.Line
	if oky {
		for _, x := range d.XLimits {
			line := plotter.XYs{{X: x / xp.Factor, Y: p.Y.Min}, {X: x / xp.Factor, Y: p.Y.Max}}
			if !logY && !(p.Y.Max > p.Y.Min) {
				line = plotter.XYs{{X: x / xp.Factor, Y: ylo / yp.Factor}, {X: x / xp.Factor, Y: yhi / yp.Factor}}
			}
			if l := addCurve(p, []plotter.XYs{line}, lineStyle(Highlight, ThinWidth, Dashed)); l != nil && req == nil {
				req = l
			}
			curves = append(curves, line)
		}
	}
	if okx {
		for _, y := range d.YLimits {
			line := plotter.XYs{{X: p.X.Min, Y: y / yp.Factor}, {X: p.X.Max, Y: y / yp.Factor}}
			if !logX && !(p.X.Max > p.X.Min) {
				line = plotter.XYs{{X: xlo / xp.Factor, Y: y / yp.Factor}, {X: xhi / xp.Factor, Y: y / yp.Factor}}
			}
			if l := addCurve(p, []plotter.XYs{line}, lineStyle(Highlight, ThinWidth, Dashed)); l != nil && req == nil {
				req = l
			}
			curves = append(curves, line)
		}
	}
	var chosen *plotter.Scatter
	if !math.IsNaN(d.ChosenX) && !math.IsNaN(d.ChosenY) {
		pt := plotter.XYs{{X: d.ChosenX / xp.Factor, Y: d.ChosenY / yp.Factor}}
		if sc, err := plotter.NewScatter(pt); err == nil {
			sc.GlyphStyle.Color = Highlight
			sc.GlyphStyle.Radius = vg.Points(4)
			sc.GlyphStyle.Shape = draw.RingGlyph{}
			p.Add(sc)
			chosen = sc
			curves = append(curves, pt)
		}
	}
	switch {
	case d.Line && traceLine != nil && d.FeasibleLabel != "":
		p.Legend.Add(d.FeasibleLabel, traceLine)
	case !d.Line:
		if mark != nil && d.FeasibleLabel != "" {
			p.Legend.Add(d.FeasibleLabel, mark)
		}
		if trace != nil && d.OtherLabel != "" {
			p.Legend.Add(d.OtherLabel, trace)
		}
	}
	if req != nil {
		p.Legend.Add("requirement", req)
	}
	if chosen != nil {
		p.Legend.Add("chosen", chosen)
	}
	return Drawer(p, curves...)
}

// scatter adds the points of segs to p as dots of colour c; it returns
// the first (for a legend entry), nil when there are none.
func scatter(p *plot.Plot, segs []plotter.XYs, c color.Color, radius float64) *plotter.Scatter {
	var first *plotter.Scatter
	for _, s := range segs {
		sc, err := plotter.NewScatter(s)
		if err != nil {
			continue
		}
		sc.GlyphStyle.Color = c
		sc.GlyphStyle.Radius = vg.Points(radius)
		sc.GlyphStyle.Shape = draw.CircleGlyph{}
		p.Add(sc)
		if first == nil {
			first = sc
		}
	}
	return first
}

// logAxis makes ax logarithmic, over whole decades, when the positive
// values v span more than a decade and a half, and sets its range; it
// reports whether it did.
// A log axis's ticks are labelled in engineering units of unit.
func logAxis(ax *plot.Axis, v []float64, factor float64, unit string) bool {
	lo, hi, ok := positiveRange(v, nil)
	if !ok {
		return false
	}
	if hi/lo > math.Pow(10, 1.5) {
		ax.Scale = plot.LogScale{}
		ax.Tick.Marker = engDecadeTicks{unit: unit, factor: factor}
		ax.Min = math.Pow(10, math.Floor(math.Log10(lo/factor)))
		ax.Max = math.Pow(10, math.Ceil(math.Log10(hi/factor)))
		return true
	}
	flo, fhi, _ := finiteRange(v)
	pad := 0.06 * (fhi - flo)
	if pad == 0 {
		pad = 0.1 * math.Abs(fhi)
	}
	ax.Min, ax.Max = math.Max(0, flo-pad)/factor, (fhi+pad)/factor
	if flo < 0 {
		ax.Min = (flo - pad) / factor
	}
	return false
}

// grams rewrites masses in kilograms as grams, so that a prefix never
// lands on the kilogram ("mkg").
func grams(d TradeData) TradeData {
	scale := func(v []float64) []float64 {
		out := make([]float64, len(v))
		for i, x := range v {
			out[i] = x * 1e3
		}
		return out
	}
	if d.XUnit == "kg" {
		d.XUnit, d.ChosenX, d.XLimits = "g", d.ChosenX*1e3, scale(d.XLimits)
		var ss []TradeSeries
		for _, s := range d.Series {
			ss = append(ss, TradeSeries{X: scale(s.X), Y: s.Y, Feasible: s.Feasible})
		}
		d.Series = ss
	}
	if d.YUnit == "kg" {
		d.YUnit, d.ChosenY, d.YLimits = "g", d.ChosenY*1e3, scale(d.YLimits)
		var ss []TradeSeries
		for _, s := range d.Series {
			ss = append(ss, TradeSeries{X: s.X, Y: scale(s.Y), Feasible: s.Feasible})
		}
		d.Series = ss
	}
	return d
}
