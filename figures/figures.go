// Package figures draws the memo's plots with gonum/plot. Each function
// returns a drawing function with the signature of doc.Figure.Draw, so the
// memo backend decides where and how large a plot is placed; the plot is
// laid out for exactly that size.
//
// All text is set in the embedded DejaVu family (memo/fonts), which is also
// what the PDF embeds, so labels are measured with the glyphs that are
// drawn. The house style: thin lines, the accent colour for the primary
// curve, grey dashes for approximations, a light grid and a legend placed
// in whichever corner of the data area the curves leave free.
package figures

import (
	"image/color"
	"math"
	"sync"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"

	"coilmemo/fonts"
)

// DrawFunc paints a figure of size w×h into c (origin bottom left).
type DrawFunc = func(c vg.Canvas, w, h vg.Length)

// Colours and sizes of the house style.
var (
	Accent    = color.NRGBA{R: 0x17, G: 0x5c, B: 0x66, A: 0xff}
	Secondary = color.NRGBA{R: 0x80, G: 0x86, B: 0x8c, A: 0xff}
	Ink       = color.NRGBA{R: 0x1c, G: 0x22, B: 0x27, A: 0xff}
	Muted     = color.NRGBA{R: 0x5b, G: 0x66, B: 0x70, A: 0xff}
	GridColor = color.NRGBA{R: 0xdd, G: 0xe2, B: 0xe5, A: 0xff}
	Highlight = color.NRGBA{R: 0xb0, G: 0x5a, B: 0x1c, A: 0xff}

	LabelSize  = vg.Points(8.5)
	TickSize   = vg.Points(7.5)
	LegendSize = vg.Points(7.5)
	LineWidth  = vg.Points(1.2)
	ThinWidth  = vg.Points(0.6)
)

// Dashed is the dash pattern of approximations and reference lines.
var Dashed = []vg.Length{vg.Points(4), vg.Points(2.5)}

func style(size vg.Length, c color.Color) text.Style {
	return restyle(text.Style{}, size, c)
}

// restyle sets font, size and colour of a text style, keeping its
// alignment and rotation.
func restyle(s text.Style, size vg.Length, c color.Color) text.Style {
	s.Color = c
	s.Font = fonts.Face(fonts.Sans, false, false, size)
	s.Handler = fonts.Handler()
	return s
}

// NewPlot returns a plot in the house style with the given axis labels.
func NewPlot(xLabel, yLabel string) *plot.Plot {
	p := newAxes(xLabel, yLabel)
	g := plotter.NewGrid()
	g.Vertical.Color = GridColor
	g.Vertical.Width = vg.Points(0.4)
	g.Horizontal.Color = GridColor
	g.Horizontal.Width = vg.Points(0.4)
	p.Add(g)
	return p
}

// newAxes is NewPlot without the grid.
func newAxes(xLabel, yLabel string) *plot.Plot {
	p := plot.New()
	h := fonts.Handler()
	p.TextHandler = h
	p.BackgroundColor = nil
	p.Title.TextStyle = restyle(p.Title.TextStyle, LabelSize, Ink)
	for _, ax := range []*plot.Axis{&p.X, &p.Y} {
		ax.Label.TextStyle = restyle(ax.Label.TextStyle, LabelSize, Ink)
		ax.Tick.Label = restyle(ax.Tick.Label, TickSize, Muted)
		ax.LineStyle.Width = ThinWidth
		ax.LineStyle.Color = Muted
		ax.Tick.LineStyle.Width = ThinWidth
		ax.Tick.LineStyle.Color = Muted
		ax.Tick.Length = vg.Points(3.5)
		ax.Padding = vg.Points(3)
		ax.Tick.Marker = niceTicks{}
	}
	p.X.Label.Text = xLabel
	p.Y.Label.Text = yLabel
	p.X.Label.Padding = vg.Points(4)
	p.Y.Label.Padding = vg.Points(4)
	p.Legend.TextStyle = restyle(p.Legend.TextStyle, LegendSize, Ink)
	p.Legend.ThumbnailWidth = vg.Points(22)
	p.Legend.Padding = vg.Points(2)
	return p
}

// Drawer returns a DrawFunc that draws p at the canvas size, first moving
// the legend into the corner of the data area that covers the fewest of
// the given curves (in data coordinates).
func Drawer(p *plot.Plot, curves ...plotter.XYs) DrawFunc {
	return drawer(p, 0, curves)
}

// drawer is Drawer with top points kept free above the data area (for
// labels that plotters set there).
//
// The y-axis label is set here rather than by gonum/plot, which reserves
// room for it at the arithmetic midpoint of the axis range — far off
// centre on a log axis — and so squeezes the data area.
//
// The returned function may be called any number of times, at any sizes,
// from any goroutine: the plot's legend backdrop is added once, here, and
// set per call, and calls take turns, since each sets the plot's legend
// and y label for its size (the memo's figures drawn ahead on one
// goroutine may meet the same figure drawn on the spot on another).
func drawer(p *plot.Plot, top vg.Length, curves []plotter.XYs) DrawFunc {
	return drawerClear(p, top, curves, true)
}

// drawerClear is drawer; with clear set, a legend that would cover some
// of the curves in every corner of the data area stands instead outside
// it, where it covers nothing: to the right, or below when beside the
// data it would take more than a quarter of the width.
func drawerClear(p *plot.Plot, top vg.Length, curves []plotter.XYs, clear bool) DrawFunc {
	backdrop := &legendBackdrop{}
	p.Add(backdrop)
	var mu sync.Mutex
	return func(c vg.Canvas, w, h vg.Length) {
		mu.Lock()
		defer mu.Unlock()
		dc := draw.Canvas{Canvas: c, Rectangle: vg.Rectangle{Max: vg.Point{X: w, Y: h}}}
		// Keep a little room so the outermost tick labels are not clipped.
		dc = draw.Crop(dc, vg.Points(1), -vg.Points(8), vg.Points(1), -vg.Points(4)-top)
		label := p.Y.Label.Text
		sty := p.Y.Label.TextStyle
		var lw vg.Length
		if label != "" {
			lw = sty.Height(label) + sty.FontExtents().Descent + p.Y.Label.Padding
			p.Y.Label.Text = ""
			defer func() { p.Y.Label.Text = label }()
			dc = draw.Crop(dc, lw, 0, 0, 0)
		}
		dc, outside := placeLegendClear(p, dc, curves, clear)
		// Outside the data area there are no grid lines to clear.
		backdrop.on = !outside && p.Legend.Rectangle(dc).Size().X > 0
		if label != "" {
			da := p.DataCanvas(dc)
			sty.Rotation = math.Pi / 2
			sty.XAlign = draw.XCenter
			sty.YAlign = draw.YBottom
			x := dc.Min.X - lw + sty.Height(label)
			dc.FillText(sty, vg.Point{X: x - sty.FontExtents().Descent, Y: da.Center().Y}, label)
		}
		p.Draw(dc)
	}
}

// placeLegendClear places p's legend on dc (placeLegend) and returns the
// canvas to draw p on and whether the legend stands outside the data
// area: dc, or, with clear set and some of the curves under the legend
// in every corner, dc less room where the legend then stands outside the
// data area — on the right when that takes at most a quarter of the
// width (sideShare), else below, under the x-axis label, from the data
// area's left edge, so that the data area keeps its width.
func placeLegendClear(p *plot.Plot, dc draw.Canvas, curves []plotter.XYs, clear bool) (draw.Canvas, bool) {
	if n := placeLegend(p, dc, curves); !clear || n == 0 {
		return dc, false
	}
	// The legend is laid out from the data area's left edge, less the
	// axis padding.
	const gap = 8
	size := p.Legend.Rectangle(dc).Size()
	if room := size.X + vg.Points(gap); room <= sideShare*dc.Size().X {
		dc = draw.Crop(dc, 0, -room, 0, 0)
		da := p.DataCanvas(dc)
		p.Legend.Top, p.Legend.Left = true, true
		p.Legend.XOffs = da.Max.X - da.Min.X + 2*p.X.Padding + vg.Points(gap)
		p.Legend.YOffs = 0
		return dc, true
	}
	// Below: the legend's canvas reaches the top of dc, so it is set from
	// there, its foot on dc's.
	// The last entry's descenders reach below its thumbnail's foot.
	const below = 6
	full := dc
	h := size.Y + p.Legend.TextStyle.FontExtents().Descent
	dc = draw.Crop(dc, 0, 0, h+vg.Points(below), 0)
	da := p.DataCanvas(dc)
	// From the data area's left edge, or as far left as keeps it inside
	// the figure.
	x := max(dc.Min.X, min(da.Min.X, dc.Max.X-size.X))
	p.Legend.Top, p.Legend.Left = true, true
	p.Legend.XOffs = x - (da.Min.X - p.X.Padding)
	p.Legend.YOffs = full.Min.Y + h - full.Max.Y
	return dc, true
}

// sideShare is the largest share of a figure's width that a legend
// beside the data area may take; a wider one goes below it.
const sideShare = 0.25

// legendBackdrop clears the area behind the legend (grid lines) just
// before the legend is drawn, when on; it must be the last plotter added.
type legendBackdrop struct{ on bool }

func (b *legendBackdrop) Plot(c draw.Canvas, p *plot.Plot) {
	if !b.on {
		return
	}
	r := legendBox(p, legendCanvas(p, c))
	const m = 2
	r.Max = vg.Point{X: r.Max.X + m, Y: r.Max.Y + m}
	r.Min = vg.Point{X: r.Min.X - m, Y: r.Min.Y - m}
	c.SetColor(color.White)
	c.Fill(r.Path())
}

// legendCanvas is the canvas p's legend is laid out on: the data area c
// widened by the axis padding, which the legend ignores.
func legendCanvas(p *plot.Plot, c draw.Canvas) draw.Canvas {
	c.Min.X -= p.X.Padding
	c.Max.X += p.X.Padding
	c.Min.Y -= p.Y.Padding
	c.Max.Y += p.Y.Padding
	return c
}

// legendBox is where p's legend is drawn on lc, the data area widened by
// the axis padding (legendCanvas).
func legendBox(p *plot.Plot, lc draw.Canvas) vg.Rectangle {
	l := p.Legend
	size := l.Rectangle(lc).Size()
	var r vg.Rectangle
	if l.Left {
		r.Min.X = lc.Min.X + l.XOffs
	} else {
		r.Min.X = lc.Max.X + l.XOffs - size.X
	}
	if l.Top {
		r.Min.Y = lc.Max.Y + l.YOffs - size.Y
	} else {
		r.Min.Y = lc.Min.Y + l.YOffs
	}
	r.Max = vg.Point{X: r.Min.X + size.X, Y: r.Min.Y + size.Y}
	return r
}

// placeLegend picks the legend corner with the least data under it and
// returns how many of the curves' points (every 2 pt along a line) lie
// under it there.
func placeLegend(p *plot.Plot, dc draw.Canvas, curves []plotter.XYs) int {
	da := p.DataCanvas(dc)
	size := p.Legend.Rectangle(da).Size()
	if size.X == 0 {
		return 0
	}
	trX, trY := p.Transforms(&da)
	var pts []vg.Point
	inRange := func(x, y float64) bool {
		if math.IsNaN(x) || math.IsNaN(y) || math.IsInf(x, 0) || math.IsInf(y, 0) {
			return false
		}
		if _, ok := p.Y.Scale.(plot.LogScale); ok && y <= 0 {
			return false
		}
		if _, ok := p.X.Scale.(plot.LogScale); ok && x <= 0 {
			return false
		}
		return true
	}
	for _, xy := range curves {
		for i := range xy {
			if !inRange(xy[i].X, xy[i].Y) {
				continue
			}
			a := vg.Point{X: trX(xy[i].X), Y: trY(xy[i].Y)}
			pts = append(pts, a)
			if i+1 < len(xy) && inRange(xy[i+1].X, xy[i+1].Y) {
				// Points every 2 pt along the segment, so that a line
				// counts by its length under the legend, however few
				// its data points (a requirement line has two).
				b := vg.Point{X: trX(xy[i+1].X), Y: trY(xy[i+1].Y)}
				n := int(math.Ceil(float64(math.Hypot(float64(b.X-a.X), float64(b.Y-a.Y)) / 2)))
				n = min(max(n, 1), 2000)
				for k := 1; k < n; k++ {
					t := vg.Length(k) / vg.Length(n)
					pts = append(pts, vg.Point{X: a.X + (b.X-a.X)*t, Y: a.Y + (b.Y-a.Y)*t})
				}
			}
		}
	}
	const inset = 5
	type corner struct{ top, left bool }
	best, bestN := corner{true, false}, -1
	for _, k := range []corner{{true, false}, {true, true}, {false, false}, {false, true}} {
		var r vg.Rectangle
		if k.left {
			r.Min.X = da.Min.X + inset
		} else {
			r.Min.X = da.Max.X - inset - size.X
		}
		if k.top {
			r.Min.Y = da.Max.Y - inset - size.Y
		} else {
			r.Min.Y = da.Min.Y + inset
		}
		r.Max = vg.Point{X: r.Min.X + size.X, Y: r.Min.Y + size.Y}
		n := 0
		// the legend is drawn on the data area widened by the axis
		// padding (legendCanvas), so the box may stand that much farther
		// out: a line along the data area's edge is under it too
		mx, my := 4+p.X.Padding, 4+p.Y.Padding
		for _, q := range pts {
			if q.X >= r.Min.X-mx && q.X <= r.Max.X+mx && q.Y >= r.Min.Y-my && q.Y <= r.Max.Y+my {
				n++
			}
		}
		if bestN < 0 || n < bestN {
			best, bestN = k, n
		}
	}
	p.Legend.Top, p.Legend.Left = best.top, best.left
	p.Legend.XOffs = -inset
	if best.left {
		p.Legend.XOffs = inset
	}
	p.Legend.YOffs = inset
	if best.top {
		p.Legend.YOffs = -inset
	}
	return bestN
}

// Prefix is an SI prefix with its factor.
type Prefix struct {
	Symbol string
	Factor float64
}

var prefixes = []Prefix{
	{"G", 1e9}, {"M", 1e6}, {"k", 1e3}, {"", 1},
	{"m", 1e-3}, {"µ", 1e-6}, {"n", 1e-9}, {"p", 1e-12},
}

// EngPrefix returns the SI prefix under which the largest magnitude in v
// reads between 1 and 1000. NaNs and infinities are ignored.
func EngPrefix(v ...float64) Prefix {
	m := 0.0
	for _, x := range v {
		if !math.IsNaN(x) && !math.IsInf(x, 0) {
			m = math.Max(m, math.Abs(x))
		}
	}
	if m == 0 {
		return Prefix{"", 1}
	}
	for _, p := range prefixes {
		if m >= p.Factor*0.9995 {
			return p
		}
	}
	return prefixes[len(prefixes)-1]
}

// segments splits x/y into runs of finite points (and positive y if
// positive is set); NaN marks a gap.
func segments(x, y []float64, sx, sy float64, positive bool) []plotter.XYs {
	var out []plotter.XYs
	var cur plotter.XYs
	n := min(len(x), len(y))
	for i := 0; i < n; i++ {
		ok := !math.IsNaN(x[i]) && !math.IsNaN(y[i]) && !math.IsInf(x[i], 0) && !math.IsInf(y[i], 0)
		if positive && !(y[i] > 0) {
			ok = false
		}
		if !ok {
			if len(cur) > 0 {
				out = append(out, cur)
				cur = nil
			}
			continue
		}
		cur = append(cur, plotter.XY{X: x[i] / sx, Y: y[i] / sy})
	}
	if len(cur) > 0 {
		out = append(out, cur)
	}
	return out
}

// lineStyle is a solid (dashes nil) or dashed line style.
func lineStyle(c color.Color, w vg.Length, dashes []vg.Length) draw.LineStyle {
	return draw.LineStyle{Color: c, Width: w, Dashes: dashes}
}

// addCurve adds the segments as lines in one style and returns the first
// line (for a legend entry), or nil if there was nothing to draw.
func addCurve(p *plot.Plot, segs []plotter.XYs, ls draw.LineStyle) *plotter.Line {
	var first *plotter.Line
	for _, s := range segs {
		l, err := plotter.NewLine(s)
		if err != nil {
			continue
		}
		l.LineStyle = ls
		p.Add(l)
		if first == nil {
			first = l
		}
	}
	return first
}

func finiteRange(vs ...[]float64) (lo, hi float64, ok bool) {
	lo, hi = math.Inf(1), math.Inf(-1)
	for _, v := range vs {
		for _, x := range v {
			if math.IsNaN(x) || math.IsInf(x, 0) {
				continue
			}
			lo, hi, ok = math.Min(lo, x), math.Max(hi, x), true
		}
	}
	return lo, hi, ok
}
