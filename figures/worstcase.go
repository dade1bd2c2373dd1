package figures

import (
	"image/color"
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// toleranceHues are the CIE LCh hue angles of a sensitivity figure's
// tolerance colours, darkest first: navy, crimson, green, orange, violet,
// yellow. Cyan and sky blue are left out: at one L* their luma (the grey
// a printer's plain conversion gives) falls well below the others'.
var toleranceHues = []float64{265, 25, 140, 65, 300, 95}

// ToleranceColours are the bar colours of n tolerances, darkest first:
// CIE L* evenly from 20 to 90 (so that the bars still differ when printed
// in grey) and the hues toleranceHues spread over them (so that no two
// neighbours share a hue), each as saturated as sRGB allows up to a
// chroma of 45. Past six the colours repeat.
func ToleranceColours(n int) []color.NRGBA {
	const k = 6
	m := min(n, k)
	out := make([]color.NRGBA, n)
	for i := range out {
		r := i % k
		l, h := 55.0, toleranceHues[0]
		if m > 1 {
			l = 20 + 70*float64(r)/float64(m-1)
			h = toleranceHues[int(math.Round(float64(r*(k-1))/float64(m-1)))]
		}
		out[i] = lchColour(l, 45, h)
	}
	return out
}

// lchColour is the sRGB colour of CIE L*, chroma c and hue angle h
// (degrees; D65 white), with the chroma lowered until the colour lies in
// the sRGB gamut. Reference: CIE 15:2004, §8.2.1 (L*a*b*); IEC 61966-2-1
// (sRGB primaries and transfer function).
func lchColour(l, c, h float64) color.NRGBA {
	for ; c >= 0; c -= 0.5 {
		a, b := c*math.Cos(h*math.Pi/180), c*math.Sin(h*math.Pi/180)
		fy := (l + 16) / 116
		fx, fz := fy+a/500, fy-b/200
		inv := func(f float64) float64 {
			if f > 6.0/29 {
				return f * f * f
			}
			return 3 * (6.0 / 29) * (6.0 / 29) * (f - 4.0/29)
		}
		x, y, z := 0.95047*inv(fx), inv(fy), 1.08883*inv(fz)
		rgb := [3]float64{
			3.2406*x - 1.5372*y - 0.4986*z,
			-0.9689*x + 1.8758*y + 0.0415*z,
			0.0557*x - 0.2040*y + 1.0570*z,
		}
		ok := true
		var v [3]uint8
		for i, lin := range rgb {
			if lin < -1e-4 || lin > 1+1e-4 {
				ok = false
				break
			}
			lin = math.Min(math.Max(lin, 0), 1)
			g := 12.92 * lin
			if lin > 0.0031308 {
				g = 1.055*math.Pow(lin, 1/2.4) - 0.055
			}
			v[i] = uint8(math.Round(255 * g))
		}
		if ok {
			return color.NRGBA{R: v[0], G: v[1], B: v[2], A: 0xff}
		}
	}
	return color.NRGBA{A: 0xff}
}

// SensitivityData is a sensitivity figure: for each result one bar per
// tolerance of its swing from the tolerance's low to its high end, the
// others at nominal.
type SensitivityData struct {
	Tolerances []string
	// Results are swung in per cent of their nominal value (Swing[r][t]);
	// Kelvin results, temperatures, in kelvin (KelvinSwing[r][t]), on an
	// axis of their own below.
	Results     []string
	Swing       [][]float64
	Kelvin      []string
	KelvinSwing [][]float64
}

// Sensitivity draws a sensitivity figure of results in per cent alone.
func Sensitivity(results, tolerances []string, swing [][]float64) DrawFunc {
	return SensitivityFigure(SensitivityData{Tolerances: tolerances, Results: results, Swing: swing})
}

// SensitivityFigure draws a horizontal grouped bar chart: for each result
// (a row) one bar per tolerance, in the legend's order from the top of
// the group, each tolerance in its colour (ToleranceColours), outlined.
// NaN bars are left out. The per-cent results and the kelvin results
// stand in two panels, one above the other, each with its swing axis and
// their data areas aligned; each swing axis reaches past the longest bar
// on either side of zero, and the legend stands to the right of the bars,
// outside the data areas, so that no bar runs into the frame or under the
// legend.
func SensitivityFigure(d SensitivityData) DrawFunc {
	var panels []*plot.Plot
	var rows []int
	if len(d.Results) > 0 {
		panels = append(panels, sensitivityPanel("Change from the tolerance's low to its high end (% of nominal)", d.Results, d.Tolerances, d.Swing, true))
		rows = append(rows, len(d.Results))
	}
	if len(d.Kelvin) > 0 {
		panels = append(panels, sensitivityPanel("Change from the tolerance's low to its high end (K)", d.Kelvin, d.Tolerances, d.KelvinSwing, len(panels) == 0))
		rows = append(rows, len(d.Kelvin))
	}
	return func(c vg.Canvas, w, h vg.Length) {
		if len(panels) == 0 {
			return
		}
		dc := draw.Canvas{Canvas: c, Rectangle: vg.Rectangle{Max: vg.Point{X: w, Y: h}}}
		dc = draw.Crop(dc, vg.Points(1), -vg.Points(4), vg.Points(1), -vg.Points(4))
		// The legend's room on the right, outside the data area: set just
		// past the data area's right edge (the legend is laid out from the
		// data area's left edge, less the axis padding).
		const gap = 10
		top := panels[0]
		room := top.Legend.Rectangle(dc).Size().X + vg.Points(gap)
		pc := draw.Crop(dc, 0, -room, 0, 0)
		// Each panel's height: its axis, and its share of the rows.
		const axis = 34 // pt: tick labels and the axis label
		const between = 6
		total := 0
		for _, n := range rows {
			total += n
		}
		free := pc.Max.Y - pc.Min.Y - vg.Points(axis*float64(len(panels))+between*float64(len(panels)-1))
		cs := make([]draw.Canvas, len(panels))
		y := pc.Max.Y
		for i, n := range rows {
			ph := vg.Points(axis) + free*vg.Length(n)/vg.Length(total)
			cs[i] = pc
			cs[i].Max.Y, cs[i].Min.Y = y, y-ph
			y -= ph + vg.Points(between)
		}
		// The data areas share their edges: the narrower tick labels'
		// panel is moved in on the left, the one with less padding for its
		// end tick labels on the right.
		left, right := vg.Length(math.Inf(-1)), vg.Length(math.Inf(1))
		for i, pl := range panels {
			da := pl.DataCanvas(cs[i])
			left, right = max(left, da.Min.X), min(right, da.Max.X)
		}
		for i, pl := range panels {
			cs[i] = fitDataArea(pl, cs[i], left, right)
		}
		da := top.DataCanvas(cs[0])
		top.Legend.Top, top.Legend.Left = true, true
		top.Legend.XOffs = da.Max.X - da.Min.X + 2*top.X.Padding + vg.Points(gap)
		top.Legend.YOffs = 0
		for i, pl := range panels {
			pl.Draw(cs[i])
		}
	}
}

// fitDataArea crops c at its sides so that pl's data area on it runs
// from left to right. gonum/plot pads the data area for the glyphs at its
// ends by an amount that follows the canvas's width, so the crops are
// found by Newton's method on the two edges (the padding is piecewise
// linear in them: a step or two).
func fitDataArea(pl *plot.Plot, c draw.Canvas, left, right vg.Length) draw.Canvas {
	at := func(l, r vg.Length) (vg.Length, vg.Length) {
		da := pl.DataCanvas(draw.Crop(c, l, r, 0, 0))
		return da.Min.X, da.Max.X
	}
	var cl, cr vg.Length
	for range 8 {
		x0, x1 := at(cl, cr)
		el, er := left-x0, right-x1
		if math.Abs(float64(el)) < 0.01 && math.Abs(float64(er)) < 0.01 {
			break
		}
		a0, a1 := at(cl+1, cr)
		b0, b1 := at(cl, cr+1)
		j11, j21, j12, j22 := a0-x0, a1-x1, b0-x0, b1-x1
		det := j11*j22 - j12*j21
		if det == 0 {
			break
		}
		cl += (j22*el - j12*er) / det
		cr += (j11*er - j21*el) / det
	}
	return draw.Crop(c, cl, cr, 0, 0)
}

// sensitivityPanel is one panel of a sensitivity figure, with the legend
// when legend is set (the top panel's).
func sensitivityPanel(xLabel string, results, tolerances []string, swing [][]float64, legend bool) *plot.Plot {
	pl := NewPlot(xLabel, "")
	n := len(tolerances)
	width := vg.Points(math.Min(3, 11/float64(max(n, 1))))
	lo, hi := 0.0, 0.0
	cols := ToleranceColours(n)
	for t := range n {
		v := make(plotter.Values, len(results))
		for r := range results {
			x := math.NaN()
			if r < len(swing) && t < len(swing[r]) {
				x = swing[r][t]
			}
			if math.IsNaN(x) || math.IsInf(x, 0) {
				x = 0
			}
			v[len(results)-1-r] = x
			lo, hi = math.Min(lo, x), math.Max(hi, x)
		}
		b, err := plotter.NewBarChart(v, width)
		if err != nil {
			continue
		}
		b.Horizontal = true
		b.Color = cols[t]
		b.LineStyle.Color = Ink
		b.LineStyle.Width = vg.Points(0.3)                      // a pale bar keeps its edge on white paper
		b.Offset = width * vg.Length(float64(n-1)/2-float64(t)) // the first tolerance on top, as in the legend
		pl.Add(b)
		if legend {
			pl.Legend.Add(tolerances[t], b)
		}
	}
	rev := make([]string, len(results))
	for i, r := range results {
		rev[len(results)-1-i] = r
	}
	pl.NominalY(rev...)
	pl.X.Min, pl.X.Max = SwingRange(lo, hi)
	// Each row's group of bars within its own unit of height.
	pl.Y.Min, pl.Y.Max = -0.5, float64(len(results))-0.5
	return pl
}

// SwingRange is the swing axis of a Sensitivity figure for bars from lo
// ≤ 0 to hi ≥ 0 (per cent): zero and both ends, each widened by a tenth
// of the span, so that the longest bars end clear of the frame.
func SwingRange(lo, hi float64) (min, max float64) {
	lo, hi = math.Min(lo, 0), math.Max(hi, 0)
	span := hi - lo
	if !(span > 0) {
		return -1, 1
	}
	pad := 0.1 * span
	min, max = lo-pad, hi+pad
	if lo == 0 {
		min = -pad / 2 // bars one way: zero stays near the frame
	}
	if hi == 0 {
		max = pad / 2
	}
	return min, max
}

// Histogram draws the distribution of samples of quantity, SI in unit, as
// a histogram of counts, with each value in marks as a dashed vertical
// line (a requirement). The axis takes the engineering prefix the memo's
// text gives the largest sample ("Magnetic moment |m| (mA·m²)").
func Histogram(quantity, unit string, samples []float64, marks []float64) DrawFunc {
	px := EngPrefix(samples...)
	pl := NewPlot(quantity+" ("+px.Symbol+unit+")", "Samples")
	v := make(plotter.Values, 0, len(samples))
	for _, s := range samples {
		if !math.IsNaN(s) && !math.IsInf(s, 0) {
			v = append(v, s/px.Factor)
		}
	}
	scaled := make([]float64, len(marks))
	for i, m := range marks {
		scaled[i] = m / px.Factor
	}
	marks = scaled
	bins := int(math.Max(5, math.Min(40, math.Sqrt(float64(len(v))))))
	var curves []plotter.XYs
	if h, err := plotter.NewHist(v, bins); err == nil {
		h.FillColor = Accent
		h.LineStyle.Color = Ink
		h.LineStyle.Width = vg.Points(0.3)
		pl.Add(h)
		top := 0.0
		for _, b := range h.Bins {
			top = math.Max(top, b.Weight)
			curves = append(curves, plotter.XYs{{X: (b.Min + b.Max) / 2, Y: b.Weight}})
		}
		for _, m := range marks {
			line := plotter.XYs{{X: m, Y: 0}, {X: m, Y: top * 1.05}}
			if ln := addCurve(pl, []plotter.XYs{line}, lineStyle(Highlight, LineWidth, Dashed)); ln != nil {
				pl.Legend.Add("requirement", ln)
			}
			curves = append(curves, line)
		}
	}
	return Drawer(pl, curves...)
}
