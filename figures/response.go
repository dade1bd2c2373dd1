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

// Response plots a pick-up coil's terminal sensitivity, V/T, against
// frequency, Hz, both on logarithmic axes, with the stated band (Hz, low
// and high; none when not both positive) shaded and labelled bandLabel
// above the plot, and marks (e.g. the design frequency and the
// self-resonance) as labelled vertical lines in Hz.
func Response(f, sens []float64, band [2]float64, bandLabel string, marks ...Mark) DrawFunc {
	// Both axes are logarithmic, their ticks in engineering units.
	p := NewPlot("Frequency f", "Sensitivity |V/B|")
	p.X.Scale, p.Y.Scale = plot.LogScale{}, plot.LogScale{}
	p.X.Tick.Marker, p.Y.Tick.Marker = engDecadeTicks{unit: "Hz", factor: 1}, engDecadeTicks{unit: "V/T", factor: 1}
	segs := segments(f, sens, 1, 1, true)
	if lo, hi, ok := positiveRange(sens, nil); ok {
		p.Y.Min = math.Pow(10, math.Floor(math.Log10(lo)))
		p.Y.Max = math.Pow(10, math.Ceil(math.Log10(hi)))
	}
	if lo, hi, ok := positiveRange(f, nil); ok {
		p.X.Min, p.X.Max = lo, hi
	}
	var named *spanLabel
	if lo, hi := math.Max(band[0], p.X.Min), math.Min(band[1], p.X.Max); band[0] > 0 && band[1] > band[0] && hi > lo {
		p.Add(&spanPlot{spans: [][2]float64{{lo, hi}}, scale: 1, fill: bandFill})
		if bandLabel != "" {
			named = &spanLabel{lo: lo, hi: hi, label: bandLabel, curve: segs}
		}
	}
	// One curve, named by the axis: no legend (whose backdrop would cut
	// the band's shading).
	addCurve(p, segs, lineStyle(Accent, LineWidth, nil))
	top := vg.Length(0)
	if len(marks) > 0 {
		m := &markLines{marks: marks, scale: 1}
		p.Add(m)
		top = m.height()
	}
	if named != nil {
		p.Add(named) // over the marks' lines, on its backing
	}
	return drawer(p, top, segs)
}

// spanLabel names a shaded span of the abscissa inside the data area,
// centred on it (geometrically, on a log axis), at the bottom or the top,
// whichever the curve leaves free in the middle of the span; a label
// wider than the span is set above the data area instead, among the
// marks' first row.
type spanLabel struct {
	lo, hi float64
	label  string
	curve  []plotter.XYs
}

func (s *spanLabel) Plot(c draw.Canvas, p *plot.Plot) {
	trX, trY := p.Transforms(&c)
	sty := style(markLabelSize, Accent)
	sty.XAlign = draw.XCenter
	x0, x1 := trX(s.lo), trX(s.hi)
	x := (x0 + x1) / 2
	w, h := sty.Width(s.label), sty.Height(s.label)
	if w > x1-x0-vg.Points(4) {
		sty.YAlign = draw.YBottom
		c.FillText(sty, vg.Point{X: min(max(x, c.Min.X+w/2), c.Max.X-w/2), Y: c.Max.Y + vg.Points(2)}, s.label)
		return
	}
	// Does the curve pass through the bottom (or top) strip under the
	// label?
	hits := func(y0, y1 vg.Length) bool {
		for _, seg := range s.curve {
			for _, q := range seg {
				if qx := trX(q.X); qx >= x-w/2-vg.Points(2) && qx <= x+w/2+vg.Points(2) {
					if qy := trY(q.Y); qy >= y0 && qy <= y1 {
						return true
					}
				}
			}
		}
		return false
	}
	pad := vg.Points(3)
	if !hits(c.Min.Y, c.Min.Y+h+2*pad) {
		s.backed(c, sty, vg.Point{X: x, Y: c.Min.Y + pad}, w, h)
		return
	}
	s.backed(c, sty, vg.Point{X: x, Y: c.Max.Y - pad - h}, w, h)
}

// backed sets the label with its bottom centre at at, on a pale backing
// that keeps it legible over the marks' lines.
func (s *spanLabel) backed(c draw.Canvas, sty text.Style, at vg.Point, w, h vg.Length) {
	bg := vg.Rectangle{Min: vg.Point{X: at.X - w/2 - vg.Points(1), Y: at.Y - vg.Points(0.5)},
		Max: vg.Point{X: at.X + w/2 + vg.Points(1), Y: at.Y + h}}
	c.SetColor(color.NRGBA{R: 0xff, G: 0xff, B: 0xff, A: 0xd0})
	c.Fill(bg.Path())
	sty.YAlign = draw.YBottom
	c.FillText(sty, at, s.label)
}
