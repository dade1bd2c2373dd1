package figures

import (
	"image/color"
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// BarGroups is a grouped bar chart, for GroupedBars: one group per item
// (a coil), one bar per series (a component) in each.
type BarGroups struct {
	Groups []string    // group names, along the horizontal axis
	Series []string    // series names, in the legend
	Values [][]float64 // Values[g][s], SI, in Unit; NaN draws no bar
	YName  string      // the ordinate's quantity, e.g. "Moment component"
	Unit   string      // e.g. "A·m²"; "" for a plain number (no prefix)
}

// barColours are the series' fills, in order.
var barColours = []color.Color{Accent, Highlight, Secondary,
	color.NRGBA{R: 0x5a, G: 0x7d, B: 0x2a, A: 0xff}}

// GroupedBars draws signed bars from zero, the groups side by side along
// the horizontal axis (named under it), the series in the house colours
// with a legend placed clear of the bars, and the ordinate in the
// engineering prefix that suits the values.
func GroupedBars(d BarGroups) DrawFunc {
	var all []float64
	for _, g := range d.Values {
		all = append(all, g...)
	}
	yp := EngPrefix(all...)
	label := d.YName + " (" + yp.Symbol + d.Unit + ")"
	if d.Unit == "" {
		yp, label = Prefix{"", 1}, d.YName
	}
	p := NewPlot("", label)
	lo, hi, ok := finiteRange(all)
	if !ok {
		return Drawer(p)
	}
	lo, hi = math.Min(lo/yp.Factor, 0), math.Max(hi/yp.Factor, 0)
	span := hi - lo
	if !(span > 0) {
		span = 1
	}
	p.Y.Min, p.Y.Max = lo-0.06*span*b2f(lo < 0), hi+0.3*span
	ns := len(d.Series)
	width := 0.8 / float64(max(ns, 1))
	var avoid []plotter.XYs
	for s := range ns {
		col := barColours[s%len(barColours)]
		var bars plotter.XYs
		for g := range d.Groups {
			v := math.NaN()
			if s < len(d.Values[g]) {
				v = d.Values[g][s] / yp.Factor
			}
			if math.IsNaN(v) {
				continue
			}
			x := float64(g) + (float64(s)-float64(ns-1)/2)*width
			bars = append(bars, plotter.XY{X: x, Y: v})
			avoid = append(avoid, plotter.XYs{{X: x, Y: 0}, {X: x, Y: v}})
		}
		bp := &barPlot{bars: bars, width: width * 0.92, fill: col}
		p.Add(bp)
		p.Legend.Add(d.Series[s], bp)
	}
	p.Add(zeroLine{})
	p.X.Min, p.X.Max = -0.6, float64(len(d.Groups))-0.4
	var ticks []plot.Tick
	for g, name := range d.Groups {
		ticks = append(ticks, plot.Tick{Value: float64(g), Label: name})
	}
	p.X.Tick.Marker = plot.ConstantTicks(ticks)
	p.X.Tick.Length = 0
	return Drawer(p, avoid...)
}

func b2f(b bool) float64 {
	if b {
		return 1
	}
	return 0
}

// barPlot draws bars of the given width (data units) from zero to each
// point's Y at its X; it is also its own legend thumbnail.
type barPlot struct {
	bars  plotter.XYs
	width float64
	fill  color.Color
}

func (b *barPlot) Plot(c draw.Canvas, p *plot.Plot) {
	trX, trY := p.Transforms(&c)
	for _, q := range b.bars {
		x0, x1 := trX(q.X-b.width/2), trX(q.X+b.width/2)
		y0, y1 := trY(0), trY(q.Y)
		if y1 < y0 {
			y0, y1 = y1, y0
		}
		if y1-y0 < vg.Points(0.6) {
			y1 = y0 + vg.Points(0.6) // a zero component still shows
		}
		r := vg.Rectangle{Min: vg.Point{X: x0, Y: y0}, Max: vg.Point{X: x1, Y: y1}}
		c.SetColor(b.fill)
		c.Fill(r.Path())
	}
}

// Thumbnail implements plot.Thumbnailer: a filled square.
func (b *barPlot) Thumbnail(c *draw.Canvas) {
	s := math.Min(float64(c.Max.X-c.Min.X), float64(c.Max.Y-c.Min.Y))
	cx, cy := (c.Min.X+c.Max.X)/2, (c.Min.Y+c.Max.Y)/2
	h := vg.Length(s) / 2
	r := vg.Rectangle{Min: vg.Point{X: cx - h, Y: cy - h}, Max: vg.Point{X: cx + h, Y: cy + h}}
	c.SetColor(b.fill)
	c.Fill(r.Path())
}

// Trivial reports whether a grouped bar chart would show nothing beyond
// what a sentence gives: every group has at most one bar that stands out
// of zero (none longer than tol of the longest bar of the chart), and those
// bars are all of the same length within tol of the longest. Such a chart
// of a set of square coils of equal moments is three equal bars. A chart
// with no finite bar is trivial too.
func (d BarGroups) Trivial(tol float64) bool {
	top := 0.0
	for _, g := range d.Values {
		for _, v := range g {
			if !math.IsNaN(v) {
				top = math.Max(top, math.Abs(v))
			}
		}
	}
	if !(top > 0) {
		return true
	}
	lo, hi := math.Inf(1), 0.0
	for _, g := range d.Values {
		n := 0
		for _, v := range g {
			if a := math.Abs(v); a > tol*top {
				n++
				lo, hi = math.Min(lo, a), math.Max(hi, a)
			}
		}
		if n > 1 {
			return false
		}
	}
	return hi-lo <= tol*top
}
