package figures

import (
	"math"

	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
)

// Sensitivity draws a horizontal grouped bar chart: for each result (a
// row, named in results) one bar per tolerance (named in tolerances, one
// colour each from Viridis) of swing[r][t], in per cent. NaN bars are
// left out.
func Sensitivity(results, tolerances []string, swing [][]float64) DrawFunc {
	pl := NewPlot("Change from the tolerance's low to its high end (% of nominal)", "")
	n := len(tolerances)
	width := vg.Points(math.Min(3, 11/float64(max(n, 1))))
	var curves []plotter.XYs
	for t := range n {
		v := make(plotter.Values, len(results))
		for r := range results {
			x := swing[r][t]
			if math.IsNaN(x) || math.IsInf(x, 0) {
				x = 0
			}
			v[len(results)-1-r] = x
			curves = append(curves, plotter.XYs{{X: x, Y: float64(len(results) - 1 - r)}})
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
	return Drawer(pl, curves...)
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
