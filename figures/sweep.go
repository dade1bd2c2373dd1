package figures

import (
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
)

// Sweep plots one result (y, in unit; NaN where a step has no result)
// against the swept parameter x (already in the unit of xLabel), with
// markers at the evaluated steps and each required value in limits drawn
// as a dashed horizontal line. SI units get an engineering prefix; °C and
// % are shown as they are.
func Sweep(xLabel string, x []float64, yName, unit string, y []float64, limits []float64) DrawFunc {
	p := Prefix{"", 1}
	if unit != "°C" && unit != "%" {
		p = EngPrefix(append(append([]float64(nil), y...), limits...)...)
	}
	pl := NewPlot(xLabel, yName+" ("+p.Symbol+unit+")")
	segs := segments(x, y, 1, p.Factor, false)
	var curves []plotter.XYs
	curves = append(curves, segs...)
	if lo, hi, ok := finiteRange(x); ok {
		pl.X.Min, pl.X.Max = lo, hi
		for _, l := range limits {
			line := plotter.XYs{{X: lo, Y: l / p.Factor}, {X: hi, Y: l / p.Factor}}
			if ln := addCurve(pl, []plotter.XYs{line}, lineStyle(Highlight, ThinWidth, Dashed)); ln != nil {
				pl.Legend.Add("requirement", ln)
			}
			curves = append(curves, line)
		}
	}
	if ln := addCurve(pl, segs, lineStyle(Accent, LineWidth, nil)); ln != nil {
		pl.Legend.Add(yName, ln)
	}
	for _, s := range segs {
		if sc, err := plotter.NewScatter(s); err == nil {
			sc.GlyphStyle.Color = Accent
			sc.GlyphStyle.Radius = vg.Points(1.8)
			pl.Add(sc)
		}
	}
	return Drawer(pl, curves...)
}
