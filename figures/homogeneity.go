package figures

import (
	"image/color"
	"math"
	"strconv"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// DeviationData is the relative departure of a field quantity from its
// value at the centre of a pair, along the axis and radially in the
// mid-plane, for DeviationPlot.
type DeviationData struct {
	Pos    []float64 // m, distance from the centre, ascending from 0
	Axial  []float64 // relative deviation along the axis (0.01 = 1 %)
	Radial []float64 // relative deviation in the mid-plane
	// Quantity names what deviates, e.g. "B" or "∂Bz/∂z": the y axis reads
	// "<Quantity>/<Quantity>(0) − 1 (%)".
	Quantity string
	// Bands are tolerances drawn as ± lines, e.g. 0.01 and 0.001; the
	// tightest is shaded.
	Bands []float64
	// Required is a required distance from the centre (m), e.g. a
	// uniform-radius requirement, drawn as a labelled vertical line; 0 for
	// none.
	Required      float64
	RequiredLabel string
}

// deviationUnit is the unit of a deviation plot's ordinate: per cent, or
// parts per million when the tightest band is below 0.1 % (a band of
// 100 ppm would read 0.01 %).
func deviationUnit(bands []float64) (name string, factor float64) {
	tight := math.Inf(1)
	for _, b := range bands {
		tight = math.Min(tight, b)
	}
	if tight < 0.001 {
		return "ppm", 1e6
	}
	return "%", 100
}

// DeviationPlot plots the axial (solid, accent) and radial (solid,
// highlight) deviations in per cent against distance from the centre, with
// the tolerance bands as dashed lines (the tightest shaded) and the y range
// a little beyond the widest band.
func DeviationPlot(d DeviationData) DrawFunc {
	pp := EngPrefix(d.Pos...)
	if pp.Factor > 1 {
		pp = Prefix{"", 1}
	}
	q := d.Quantity
	if q == "" {
		q = "B"
	}
	unit, f := deviationUnit(d.Bands)
	p := NewPlot("Distance from the centre ("+pp.Symbol+"m)", q+"/"+q+"(0) − 1 ("+unit+")")
	wide, tight := 0.0, math.Inf(1)
	for _, b := range d.Bands {
		wide, tight = math.Max(wide, b), math.Min(tight, b)
	}
	if wide == 0 {
		wide, tight = 0.01, 0.01
	}
	ylim := f * wide * 2.2
	p.Add(&bandPlot{bands: d.Bands, tight: tight, factor: f})
	pct := func(v []float64) []float64 {
		out := make([]float64, len(v))
		for i, x := range v {
			out[i] = f * x
		}
		return out
	}
	ax := segments(d.Pos, pct(d.Axial), pp.Factor, 1, false)
	ra := segments(d.Pos, pct(d.Radial), pp.Factor, 1, false)
	if l := addCurve(p, ax, lineStyle(Accent, LineWidth, nil)); l != nil {
		p.Legend.Add("Along the axis", l)
	}
	if l := addCurve(p, ra, lineStyle(Highlight, LineWidth, nil)); l != nil {
		p.Legend.Add("Radially, mid-plane", l)
	}
	// The ranges are set after the curves, which would widen them: the
	// curves leave the plot once well outside the widest band.
	p.Y.Min, p.Y.Max = -ylim, ylim
	if lo, hi, ok := finiteRange(d.Pos); ok {
		p.X.Min, p.X.Max = lo/pp.Factor, hi/pp.Factor
	}
	if d.Required > 0 {
		// The requirement is drawn even beyond the curves' reach.
		p.X.Max = math.Max(p.X.Max, 1.1*d.Required/pp.Factor)
	}
	p.Y.Tick.Marker = percentTicks{bands: d.Bands, factor: f}
	// The legend keeps clear of the curves and of the band lines.
	avoid := append(append([]plotter.XYs{}, ax...), ra...)
	for _, b := range d.Bands {
		for _, s := range []float64{-1, 1} {
			avoid = append(avoid, plotter.XYs{{X: p.X.Min, Y: s * f * b}, {X: p.X.Max, Y: s * f * b}})
		}
	}
	top := vg.Length(0)
	if d.Required > 0 {
		m := &markLines{marks: []Mark{{X: d.Required, Label: d.RequiredLabel}}, scale: pp.Factor}
		p.Add(m)
		top = m.height()
		x := d.Required / pp.Factor
		avoid = append(avoid, plotter.XYs{{X: x, Y: -ylim}, {X: x, Y: ylim}})
	}
	return drawer(p, top, avoid)
}

// bandPlot shades ±tight and draws every band as dashed lines at ±b.
type bandPlot struct {
	bands  []float64
	tight  float64
	factor float64 // 100 for per cent, 1e6 for ppm
}

var bandFill = color.NRGBA{R: 0x17, G: 0x5c, B: 0x66, A: 0x1c}

func (b *bandPlot) Plot(c draw.Canvas, p *plot.Plot) {
	_, trY := p.Transforms(&c)
	if b.tight > 0 && !math.IsInf(b.tight, 0) {
		y0, y1 := trY(-b.factor*b.tight), trY(b.factor*b.tight)
		var path vg.Path
		path.Move(vg.Point{X: c.Min.X, Y: y0})
		path.Line(vg.Point{X: c.Max.X, Y: y0})
		path.Line(vg.Point{X: c.Max.X, Y: y1})
		path.Line(vg.Point{X: c.Min.X, Y: y1})
		path.Close()
		c.SetColor(bandFill)
		c.Fill(path)
	}
	ls := draw.LineStyle{Color: Secondary, Width: vg.Points(0.6), Dashes: Dashed}
	zero := draw.LineStyle{Color: Muted, Width: vg.Points(0.5)}
	c.StrokeLine2(zero, c.Min.X, trY(0), c.Max.X, trY(0))
	for _, v := range b.bands {
		for _, s := range []float64{-1, 1} {
			y := trY(s * b.factor * v)
			c.StrokeLine2(ls, c.Min.X, y, c.Max.X, y)
		}
	}
}

// percentTicks labels zero, the bands and the round values between, on
// an axis in units of 1/factor (100: per cent, 1e6: ppm).
type percentTicks struct {
	bands  []float64
	factor float64
}

func (t percentTicks) Ticks(min, max float64) []plot.Tick {
	ticks := niceTicks{}.Ticks(min, max)
	for _, b := range t.bands {
		for _, s := range []float64{-1, 1} {
			v := s * t.factor * b
			if v < min || v > max {
				continue
			}
			dup := false
			for i := range ticks {
				if math.Abs(ticks[i].Value-v) < 1e-9 {
					ticks[i].Label = strconv.FormatFloat(v, 'f', -1, 64)
					dup = true
				}
			}
			if !dup {
				ticks = append(ticks, plot.Tick{Value: v, Label: strconv.FormatFloat(v, 'f', -1, 64)})
			}
		}
	}
	// Drop labels that would crowd another: band labels win over round
	// values, and zero over a band label too close to it.
	isBand := func(v float64) bool {
		for _, b := range t.bands {
			if math.Abs(math.Abs(v)-t.factor*b) < 1e-9 {
				return true
			}
		}
		return false
	}
	gap := (max - min) / 20
	for i := range ticks {
		if ticks[i].Label == "" {
			continue
		}
		for j := range ticks {
			if i == j || ticks[j].Label == "" {
				continue
			}
			d := math.Abs(ticks[i].Value - ticks[j].Value)
			if d >= gap {
				continue
			}
			// Keep zero, then bands, then round values.
			rank := func(v float64) int {
				switch {
				case v == 0:
					return 2
				case isBand(v):
					return 1
				}
				return 0
			}
			if rank(ticks[i].Value) < rank(ticks[j].Value) || (rank(ticks[i].Value) == rank(ticks[j].Value) && math.Abs(ticks[i].Value) < math.Abs(ticks[j].Value)) {
				ticks[i].Label = ""
				break
			}
		}
	}
	return ticks
}
