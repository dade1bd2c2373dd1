package figures

import (
	"image/color"
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// TradeSeries is one family of design choices in a trade-off figure (one
// wire over its turn counts, say): SI values, and which choices meet every
// requirement.
type TradeSeries struct {
	X, Y     []float64
	Feasible []bool
	// Label names the series at its top end (its largest Y), e.g. the
	// wire's gauge; "" for none.
	Label string
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
//
// The legend goes to a corner of the data area that no point, line or
// label takes, or, where every corner holds some, to the right of the
// data area.
func Trade(d TradeData) DrawFunc {
	p, curves := tradePlot(d)
	return drawerClear(p, 0, curves, true)
}

// tradePlot is Trade's plot and the curves (points, requirement lines,
// labels' anchors and the choice, in data coordinates) its legend keeps
// clear of.
func tradePlot(d TradeData) (*plot.Plot, []plotter.XYs) {
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
	labels := &seriesLabels{}
	for _, s := range d.Series {
		segs := scaled(s.X, s.Y)
		curves = append(curves, segs...)
		if at, ok := topPoint(segs); ok && s.Label != "" {
			labels.at = append(labels.at, at)
			labels.text = append(labels.text, s.Label)
		}
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
	if len(labels.text) > 0 {
		p.Add(labels)
		for _, at := range labels.at {
			// The legend keeps clear of the labels too (a point above each
			// anchor on a log axis is near enough).
			curves = append(curves, plotter.XYs{at})
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
	return p, curves
}

// topPoint is the point of largest Y of segs.
func topPoint(segs []plotter.XYs) (plotter.XY, bool) {
	var best plotter.XY
	ok := false
	for _, s := range segs {
		for _, q := range s {
			if !ok || q.Y > best.Y {
				best, ok = q, true
			}
		}
	}
	return best, ok
}

// seriesLabels names each series of a trade figure just above its top
// point, centred on it; a label that would overlap one set before it is
// moved up a row at a time (at most three rows), and one that would leave
// the data area at the top is set below its point instead.
type seriesLabels struct {
	at   []plotter.XY
	text []string
}

func (sl *seriesLabels) Plot(c draw.Canvas, p *plot.Plot) {
	for _, r := range sl.boxes(c, p) {
		sty := seriesLabelStyle()
		c.FillText(sty, r.Min, r.text)
	}
}

// seriesLabelBox is a placed label: its text and box (Min is where the
// text is set, bottom left).
type seriesLabelBox struct {
	vg.Rectangle
	text string
}

func seriesLabelStyle() text.Style {
	sty := style(markLabelSize, Ink)
	sty.XAlign, sty.YAlign = draw.XLeft, draw.YBottom
	return sty
}

// boxes places the labels (seriesLabels' rule) in canvas coordinates.
func (sl *seriesLabels) boxes(c draw.Canvas, p *plot.Plot) []seriesLabelBox {
	trX, trY := p.Transforms(&c)
	sty := seriesLabelStyle()
	rowH := sty.Height("0")
	var placed []seriesLabelBox
	overlaps := func(r vg.Rectangle) bool {
		for _, q := range placed {
			if r.Min.X < q.Max.X+vg.Points(1) && q.Min.X < r.Max.X+vg.Points(1) && r.Min.Y < q.Max.Y && q.Min.Y < r.Max.Y {
				return true
			}
		}
		return false
	}
	for i, at := range sl.at {
		x, y := trX(at.X), trY(at.Y)
		w := sty.Width(sl.text[i])
		x0 := min(max(x-w/2, c.Min.X), c.Max.X-w)
		box := func(y0 vg.Length) vg.Rectangle {
			return vg.Rectangle{Min: vg.Point{X: x0, Y: y0}, Max: vg.Point{X: x0 + w, Y: y0 + rowH}}
		}
		r := box(y + vg.Points(2))
		for k := 0; k < 3 && overlaps(r); k++ {
			r = box(r.Min.Y + rowH)
		}
		if r.Max.Y > c.Max.Y {
			r = box(y - vg.Points(2) - rowH)
			for k := 0; k < 3 && overlaps(r); k++ {
				r = box(r.Min.Y - rowH)
			}
		}
		placed = append(placed, seriesLabelBox{Rectangle: r, text: sl.text[i]})
	}
	return placed
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

// logAxis makes ax logarithmic when the positive values v span more than
// a decade and a half, and sets its range; it reports whether it did.
// The range is the values' own, widened by tradeMargin of its span on
// either side (of the logarithm's span on a log axis), so that no point
// sits on the frame and no decade is left empty.
// A log axis's ticks are labelled in engineering units of unit.
func logAxis(ax *plot.Axis, v []float64, factor float64, unit string) bool {
	lo, hi, ok := positiveRange(v, nil)
	if !ok {
		return false
	}
	if hi/lo > math.Pow(10, 1.5) {
		ax.Scale = plot.LogScale{}
		ax.Tick.Marker = tradeLogTicks{unit: unit, factor: factor}
		pad := tradeMargin * math.Log10(hi/lo)
		ax.Min = math.Pow(10, math.Log10(lo/factor)-pad)
		ax.Max = math.Pow(10, math.Log10(hi/factor)+pad)
		return true
	}
	flo, fhi, _ := finiteRange(v)
	pad := tradeMargin * (fhi - flo)
	if pad == 0 {
		pad = 0.1 * math.Abs(fhi)
	}
	ax.Min, ax.Max = math.Max(0, flo-pad)/factor, (fhi+pad)/factor
	if flo < 0 {
		ax.Min = (flo - pad) / factor
	}
	return false
}

// tradeMargin is the share of the data's span a trade figure's axis
// reaches beyond the data on either side.
const tradeMargin = 0.06

// tradeLogTicks are engDecadeTicks over a range that need not start or end
// at a decade: where fewer than two decades fall in it, the marks at 2 and
// 5 times a decade are labelled too, so that the axis always reads.
type tradeLogTicks struct {
	unit   string
	factor float64
}

func (t tradeLogTicks) Ticks(min, max float64) []plot.Tick {
	ticks := engDecadeTicks(t).Ticks(min, max)
	labelled := 0
	for _, tk := range ticks {
		if tk.Label != "" {
			labelled++
		}
	}
	if labelled >= 2 {
		return ticks
	}
	for i, tk := range ticks {
		m := tk.Value / math.Pow(10, math.Floor(math.Log10(tk.Value)+1e-9))
		if math.Abs(m-2) < 1e-6 || math.Abs(m-5) < 1e-6 {
			ticks[i].Label = EngLabel(tk.Value*t.factor, t.unit)
		}
	}
	return ticks
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
			ss = append(ss, TradeSeries{X: scale(s.X), Y: s.Y, Feasible: s.Feasible, Label: s.Label})
		}
		d.Series = ss
	}
	if d.YUnit == "kg" {
		d.YUnit, d.ChosenY, d.YLimits = "g", d.ChosenY*1e3, scale(d.YLimits)
		var ss []TradeSeries
		for _, s := range d.Series {
			ss = append(ss, TradeSeries{X: s.X, Y: scale(s.Y), Feasible: s.Feasible, Label: s.Label})
		}
		d.Series = ss
	}
	return d
}
