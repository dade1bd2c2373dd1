package figures

import (
	"image/color"
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// ProfileData is a signed quantity along a coil's axis, for Profile: the
// near field of a solenoid's bore or a pair, or a pair's gradient.
type ProfileData struct {
	// Axis names the coil's axis for the abscissa (AxialLabel).
	Axis string
	Z    []float64 // m
	Y    []float64 // SI, in Unit
	// YName and Unit label the ordinate: "Axial flux density Bz", "T".
	YName, Unit string
	// CurveName is the curve's legend entry ("" for none).
	CurveName string
	// Marks are labelled vertical lines (m), e.g. a solenoid's ends.
	Marks []Mark
	// Windings are axial spans (m) shaded as the windings' positions,
	// each labelled WindingLabel above the data area.
	Windings     [][2]float64
	WindingLabel string
	// Levels are requirements, drawn as dashed horizontal lines in the
	// highlight colour with a legend entry each (Y in Unit, SI).
	Levels []Level
}

// Profile plots a quantity along a coil's axis on linear axes: from zero
// when it keeps one sign (a solenoid's or an aiding pair's field), about
// zero when it changes sign (an opposing pair's), with the windings
// shaded, the marks dotted and the requirements dashed. Units take the
// engineering prefix that suits the data.
func Profile(d ProfileData) DrawFunc {
	p, top, curves := profilePlot(d)
	return drawer(p, top, curves)
}

func profilePlot(d ProfileData) (*plot.Plot, vg.Length, []plotter.XYs) {
	zp := EngPrefix(d.Z...)
	if zp.Factor > 1 {
		zp = Prefix{"", 1}
	}
	all := append([]float64{}, d.Y...)
	for _, l := range d.Levels {
		all = append(all, l.Y)
	}
	yp := EngPrefix(all...)
	p := NewPlot(AxialLabel(d.Axis)+" ("+zp.Symbol+"m)", d.YName+" ("+yp.Symbol+d.Unit+")")
	lo, hi, ok := finiteRange(all)
	if !ok {
		return p, 0, nil
	}
	lo, hi = lo/yp.Factor, hi/yp.Factor
	switch {
	case lo >= 0:
		p.Y.Min, p.Y.Max = 0, hi*1.1
	case hi <= 0:
		p.Y.Min, p.Y.Max = lo*1.1, 0
	default:
		m := math.Max(-lo, hi) * 1.1
		p.Y.Min, p.Y.Max = -m, m
		p.Add(zeroLine{})
	}
	if !(p.Y.Max > p.Y.Min) {
		p.Y.Min, p.Y.Max = -1, 1
	}
	xlo, xhi, _ := finiteRange(d.Z)
	xlo, xhi = xlo/zp.Factor, xhi/zp.Factor
	if len(d.Windings) > 0 {
		p.Add(&spanPlot{spans: d.Windings, scale: zp.Factor})
	}
	segs := segments(d.Z, d.Y, zp.Factor, yp.Factor, false)
	// What the legend must keep clear of: the curve and every reference
	// line.
	avoid := append([]plotter.XYs{}, segs...)
	if l := addCurve(p, segs, lineStyle(Accent, LineWidth, nil)); l != nil && d.CurveName != "" {
		p.Legend.Add(d.CurveName, l)
	}
	for _, lv := range d.Levels {
		y := lv.Y / yp.Factor
		if lv.Local {
			m := &localLevel{z0: lv.Z0 / zp.Factor, z1: lv.Z1 / zp.Factor, y: y}
			p.Add(m)
			p.Legend.Add(lv.Label, m)
			// What the legend keeps clear of: the bar's stretch, at least
			// a twentieth of the axis.
			half := math.Max((m.z1-m.z0)/2, (xhi-xlo)/40)
			mid := (m.z0 + m.z1) / 2
			avoid = append(avoid, plotter.XYs{{X: mid - half, Y: y}, {X: mid + half, Y: y}})
			continue
		}
		line := plotter.XYs{{X: xlo, Y: y}, {X: xhi, Y: y}}
		if l := addCurve(p, []plotter.XYs{line}, lineStyle(Highlight, ThinWidth, Dashed)); l != nil {
			p.Legend.Add(lv.Label, l)
		}
		avoid = append(avoid, line)
	}
	p.X.Min, p.X.Max = xlo, xhi
	var marks []Mark
	marks = append(marks, d.Marks...)
	for _, s := range d.Windings {
		marks = append(marks, Mark{X: (s[0] + s[1]) / 2, Label: d.WindingLabel, NoLine: true})
	}
	top := vg.Length(0)
	if len(marks) > 0 {
		m := &markLines{marks: marks, scale: zp.Factor}
		p.Add(m)
		top = m.height()
		for _, mk := range d.Marks {
			x := mk.X / zp.Factor
			avoid = append(avoid, plotter.XYs{{X: x, Y: p.Y.Min}, {X: x, Y: p.Y.Max}})
		}
	}
	return p, top, avoid
}

// spanPlot shades axial spans (m, divided by scale) over the full height
// of the data area.
type spanPlot struct {
	spans [][2]float64
	scale float64
	fill  color.Color // spanFill when nil
}

var spanFill = color.NRGBA{R: 0xb0, G: 0x5a, B: 0x1c, A: 0x22}

func (s *spanPlot) Plot(c draw.Canvas, p *plot.Plot) {
	trX, _ := p.Transforms(&c)
	if s.fill != nil {
		c.SetColor(s.fill)
	} else {
		c.SetColor(spanFill)
	}
	for _, sp := range s.spans {
		a, b := math.Max(sp[0]/s.scale, p.X.Min), math.Min(sp[1]/s.scale, p.X.Max)
		if !(b > a) {
			continue
		}
		x0, x1 := trX(a), trX(b)
		if x1-x0 < vg.Points(1) {
			x1 = x0 + vg.Points(1)
		}
		var path vg.Path
		path.Move(vg.Point{X: x0, Y: c.Min.Y})
		path.Line(vg.Point{X: x1, Y: c.Min.Y})
		path.Line(vg.Point{X: x1, Y: c.Max.Y})
		path.Line(vg.Point{X: x0, Y: c.Max.Y})
		path.Close()
		c.Fill(path)
	}
}

// localLevel draws a level that applies at one axial position (z0 == z1)
// as a short solid bar centred there, LocalBarWidth long, with end ticks;
// or over a stretch as a solid line between end ticks. The axis units are
// the plot's.
type localLevel struct {
	z0, z1, y float64
}

// LocalBarWidth is the length of the bar that marks a level applying at
// one point of a profile.
const LocalBarWidth = vg.Length(24)

var localStyle = draw.LineStyle{Color: Highlight, Width: LineWidth}

// span is the bar's ends in canvas coordinates.
func (l *localLevel) span(c draw.Canvas, p *plot.Plot) (x0, x1, y vg.Length) {
	trX, trY := p.Transforms(&c)
	x0, x1, y = trX(l.z0), trX(l.z1), trY(l.y)
	if x1-x0 < LocalBarWidth {
		mid := (x0 + x1) / 2
		x0, x1 = mid-LocalBarWidth/2, mid+LocalBarWidth/2
	}
	return x0, x1, y
}

func (l *localLevel) Plot(c draw.Canvas, p *plot.Plot) {
	x0, x1, y := l.span(c, p)
	tk := vg.Points(3)
	c.StrokeLine2(localStyle, x0, y, x1, y)
	thin := draw.LineStyle{Color: Highlight, Width: ThinWidth}
	c.StrokeLine2(thin, x0, y-tk, x0, y+tk)
	c.StrokeLine2(thin, x1, y-tk, x1, y+tk)
}

// Thumbnail draws the legend's sample: the bar with its end ticks.
func (l *localLevel) Thumbnail(c *draw.Canvas) {
	y := c.Center().Y
	x0, x1 := c.Min.X+vg.Points(3), c.Max.X-vg.Points(3)
	tk := vg.Points(3)
	c.StrokeLine2(localStyle, x0, y, x1, y)
	thin := draw.LineStyle{Color: Highlight, Width: ThinWidth}
	c.StrokeLine2(thin, x0, y-tk, x0, y+tk)
	c.StrokeLine2(thin, x1, y-tk, x1, y+tk)
}
