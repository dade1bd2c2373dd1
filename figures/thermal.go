package figures

import (
	"math"

	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
)

// Level is a labelled horizontal reference line of a plot, in the plot's
// y unit (e.g. an insulation class in °C).
type Level struct {
	Y     float64
	Label string
	// Local marks a level that applies at one place or over one stretch
	// of the abscissa only, from Z0 to Z1 (m, in a profile's axial
	// position): a profile draws it as a short solid bar at Z0 when Z0 ==
	// Z1 (a requirement at the centre), else as a band over the stretch,
	// not across the whole plot.
	Local  bool
	Z0, Z1 float64
}

// Curve is one named temperature curve: times (s) and temperatures (°C).
type Curve struct {
	Name string
	T, Y []float64
}

// timeUnit picks seconds, minutes or hours for a time span in seconds.
func timeUnit(span float64) (label string, factor float64) {
	switch {
	case span > 3*3600:
		return "h", 3600
	case span > 180:
		return "min", 60
	}
	return "s", 1
}

// WarmUp plots winding temperature (°C) against time: the first curve as
// the primary line, a second (e.g. an on/off cycle) thinner in the
// secondary colour, and each level as a dashed horizontal line in the
// highlight colour (a dotted grey one when its label begins with "steady").
// The time axis is in s, min or h, whichever suits the span; the
// temperature axis starts at the lowest value shown.
func WarmUp(curves []Curve, levels ...Level) DrawFunc {
	var tmax float64
	var all []float64
	for _, c := range curves {
		if _, hi, ok := finiteRange(c.T); ok {
			tmax = math.Max(tmax, hi)
		}
		all = append(all, c.Y...)
	}
	unit, f := timeUnit(tmax)
	p := NewPlot("Time ("+unit+")", "Temperature (°C)")
	var drawn []plotter.XYs
	styles := []struct {
		w      vg.Length
		dashes []vg.Length
		first  bool
	}{{LineWidth, nil, true}, {ThinWidth, nil, false}, {ThinWidth, Dashed, false}}
	// Draw the secondary curves first so that the primary lies on top.
	type added struct {
		name string
		line *plotter.Line
	}
	var legend []added
	for i := len(curves) - 1; i >= 0; i-- {
		c := curves[i]
		st := styles[min(i, len(styles)-1)]
		col := Secondary
		if st.first {
			col = Accent
		}
		segs := segments(c.T, c.Y, f, 1, false)
		if ln := addCurve(p, segs, lineStyle(col, st.w, st.dashes)); ln != nil {
			legend = append([]added{{c.Name, ln}}, legend...)
		}
		drawn = append(drawn, segs...)
	}
	lo, hi, ok := finiteRange(all)
	for _, l := range levels {
		if !math.IsNaN(l.Y) {
			lo, hi = math.Min(lo, l.Y), math.Max(hi, l.Y)
		}
	}
	if ok && tmax > 0 {
		p.X.Min, p.X.Max = 0, tmax/f
		pad := 0.06 * (hi - lo)
		if !(pad > 0) {
			pad = 1
		}
		p.Y.Min, p.Y.Max = lo-pad, hi+pad
		for _, l := range levels {
			if math.IsNaN(l.Y) {
				continue
			}
			line := plotter.XYs{{X: 0, Y: l.Y}, {X: tmax / f, Y: l.Y}}
			col, dash := Highlight, Dashed
			if len(l.Label) >= 6 && l.Label[:6] == "steady" {
				col, dash = Muted, []vg.Length{vg.Points(1.5), vg.Points(1.5)}
			}
			if ln := addCurve(p, []plotter.XYs{line}, lineStyle(col, ThinWidth, dash)); ln != nil {
				legend = append(legend, added{l.Label, ln})
			}
			drawn = append(drawn, line)
		}
	}
	for _, a := range legend {
		p.Legend.Add(a.name, a.line)
	}
	return Drawer(p, drawn...)
}
