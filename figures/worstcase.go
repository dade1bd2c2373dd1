package figures

import (
	"math"

	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// Sensitivity draws a horizontal grouped bar chart: for each result (a
// row, named in results) one bar per tolerance (named in tolerances, one
// colour each from Viridis) of swing[r][t], in per cent. NaN bars are
// left out. The swing axis reaches past the longest bar on either side
// of zero, and the legend stands to the right of the bars, outside the
// data area, so that no bar runs into the frame or under the legend.
func Sensitivity(results, tolerances []string, swing [][]float64) DrawFunc {
	pl := NewPlot("Change from the tolerance's low to its high end (% of nominal)", "")
	n := len(tolerances)
	width := vg.Points(math.Min(3, 11/float64(max(n, 1))))
	lo, hi := 0.0, 0.0
	for t := range n {
		v := make(plotter.Values, len(results))
		for r := range results {
			x := swing[r][t]
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
		c := Viridis(0.1 + 0.8*float64(t)/float64(max(n-1, 1)))
		b.Color = c
		b.LineStyle.Width = 0
		b.Offset = width * vg.Length(float64(n-1)/2-float64(t)) // the first tolerance on top, as in the legend
		pl.Add(b)
		pl.Legend.Add(tolerances[t], b)
	}
	rev := make([]string, len(results))
	for i, r := range results {
		rev[len(results)-1-i] = r
	}
	pl.NominalY(rev...)
	pl.X.Min, pl.X.Max = SwingRange(lo, hi)
	// Each row's group of bars within its own unit of height.
	pl.Y.Min, pl.Y.Max = -0.5, float64(len(results))-0.5
	return func(c vg.Canvas, w, h vg.Length) {
		dc := draw.Canvas{Canvas: c, Rectangle: vg.Rectangle{Max: vg.Point{X: w, Y: h}}}
		dc = draw.Crop(dc, vg.Points(1), -vg.Points(4), vg.Points(1), -vg.Points(4))
		// The legend's room on the right, outside the data area: set just
		// past the data area's right edge (the legend is laid out from the
		// data area's left edge, less the axis padding).
		const gap = 10
		room := pl.Legend.Rectangle(dc).Size().X + vg.Points(gap)
		pc := draw.Crop(dc, 0, -room, 0, 0)
		da := pl.DataCanvas(pc)
		pl.Legend.Top, pl.Legend.Left = true, true
		pl.Legend.XOffs = da.Max.X - da.Min.X + 2*pl.X.Padding + vg.Points(gap)
		pl.Legend.YOffs = 0
		pl.Draw(pc)
	}
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
