package figures

import (
	"math"
	"strconv"
	"strings"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// Mark is a labelled vertical reference line at an abscissa in the data's
// own unit (metres for OnAxis), e.g. a winding end or a limit distance.
type Mark struct {
	X     float64
	Label string
	// NoLine sets the label alone, without the line (e.g. over a shaded
	// winding).
	NoLine bool
}

// OnAxis plots the axial flux density |B| against axial position: the
// exact solution (z in m, exact in T) and the dipole approximation (T; NaN
// where it is not drawn, e.g. inside the winding) overlaid. The y axis is
// logarithmic when the data span more than two decades. Units get the
// engineering prefix that suits the data (mm, mT, µT, …).
//
// axis names the coil's axis for the abscissa's label (AxialLabel): "z"
// for a coil along z, "x" for one along x, a direction for a tilted one.
// On a log axis every labelled tick carries its unit ("10 µT"), so the
// axis label has none.
func OnAxis(axis string, z, exact, dipole []float64, marks ...Mark) DrawFunc {
	p, top, curves := onAxisPlot(axis, z, exact, dipole, marks)
	return drawer(p, top, curves)
}

// AxialLabel is the label of an abscissa along a coil's axis: "Axial
// position z" for a coil whose axis is z; for any other the coordinate is
// the coil frame's w, from the coil's centre, and the axis is named when
// it is one of the global axes: "Axial position w along the coil's axis
// x"; for a direction (a tilted coil, "(0.71, 0.71, 0)") "Axial position
// w along the coil's axis", the caption giving the direction (a second
// parenthesised group before the unit's would read badly).
func AxialLabel(axis string) string {
	switch {
	case axis == "" || axis == "z":
		return "Axial position z"
	case strings.HasPrefix(axis, "("):
		return "Axial position w along the coil's axis"
	}
	return "Axial position w along the coil's axis " + axis
}

// FrameLetters are the coordinate letters of a coil-frame figure of a
// coil whose axis is axis (as AxialLabel takes it): along the axis, across
// the width (or radially) and along the height. A coil along z keeps the
// global letters z, x, y (its frame's directions); any other takes w, u,
// v, so that no two axes of a figure carry the same letter and none
// reads as a global coordinate it is not.
func FrameLetters(axis string) (along, width, height string) {
	if axis == "" || axis == "z" {
		return "z", "x", "y"
	}
	return "w", "u", "v"
}

func onAxisPlot(axis string, z, exact, dipole []float64, marks []Mark) (*plot.Plot, vg.Length, []plotter.XYs) {
	zp := EngPrefix(z...)
	if zp.Factor > 1 {
		zp = Prefix{"", 1} // no km of coil axis
	}
	bp := EngPrefix(exact...)

	lo, hi, ok := positiveRange(exact, dipole)
	logY := ok && hi/lo > 100

	yLabel := "Flux density |B| (" + bp.Symbol + "T)"
	if logY {
		yLabel = "Flux density |B|"
	}
	p := NewPlot(AxialLabel(axis)+" ("+zp.Symbol+"m)", yLabel)
	exSegs := segments(z, exact, zp.Factor, bp.Factor, logY)
	diSegs := segments(z, dipole, zp.Factor, bp.Factor, logY)

	if logY {
		p.Y.Scale = plot.LogScale{}
		p.Y.Tick.Marker = engDecadeTicks{unit: "T", factor: bp.Factor}
		// Decades enclosing the exact curve; the approximation is clipped
		// to them rather than stretching the axis.
		elo, ehi, _ := positiveRange(exact, nil)
		p.Y.Min = math.Pow(10, math.Floor(math.Log10(math.Max(elo, lo)/bp.Factor)))
		p.Y.Max = math.Pow(10, math.Ceil(math.Log10(ehi/bp.Factor)))
		// Six decades below the top are as far as a reader looks; a field
		// that cancels (an opposing pair's centre) would otherwise pull
		// the axis down to rounding noise.
		p.Y.Min = math.Max(p.Y.Min, p.Y.Max*1e-6)
	} else {
		_, ehi, _ := finiteRange(exact)
		p.Y.Min = 0
		p.Y.Max = ehi / bp.Factor * 1.08
	}
	// The approximation is drawn under the exact curve, but listed after it.
	di := addCurve(p, diSegs, lineStyle(Secondary, vg.Points(1), Dashed))
	ex := addCurve(p, exSegs, lineStyle(Accent, LineWidth, nil))
	if ex != nil {
		p.Legend.Add("Exact (finite winding)", ex)
	}
	if di != nil {
		p.Legend.Add("Dipole approximation", di)
	}

	if xlo, xhi, ok := finiteRange(z); ok {
		p.X.Min, p.X.Max = xlo/zp.Factor, xhi/zp.Factor
	}
	top := vg.Length(0)
	avoid := append(exSegs, diSegs...)
	if len(marks) > 0 {
		m := &markLines{marks: marks, scale: zp.Factor}
		p.Add(m)
		top = m.height()
		// The legend keeps clear of the marks' lines too.
		for _, mk := range marks {
			if !mk.NoLine {
				avoid = append(avoid, plotter.XYs{{X: mk.X / zp.Factor, Y: p.Y.Min}, {X: mk.X / zp.Factor, Y: p.Y.Max}})
			}
		}
	}
	return p, top, avoid
}

func positiveRange(a, b []float64) (lo, hi float64, ok bool) {
	lo, hi = math.Inf(1), 0
	for _, v := range [][]float64{a, b} {
		for _, x := range v {
			if x > 0 && !math.IsInf(x, 0) {
				lo, hi, ok = math.Min(lo, x), math.Max(hi, x), true
			}
		}
	}
	return lo, hi, ok
}

// decadeTicks labels the decades of a log axis — every one, or every
// second, third … so that at most seven carry a label — and marks 2…9
// between them when the axis spans few decades. Labels are short: 0.01 …
// 1000 written out, beyond that a power of ten (10⁻⁶, 10⁴).
type decadeTicks struct{}

func (decadeTicks) Ticks(min, max float64) []plot.Tick {
	var ticks []plot.Tick
	e0 := int(math.Floor(math.Log10(min) + 1e-9))
	e1 := int(math.Ceil(math.Log10(max) - 1e-9))
	every := (e1 - e0 + 6) / 7
	every = int(math.Max(1, float64(every)))
	for e := e0; e <= e1; e++ {
		d := math.Pow(10, float64(e))
		for k := 1; k < 10; k++ {
			if k > 1 && every > 1 {
				break // many decades: no minor marks
			}
			v := d * float64(k)
			if v < min*(1-1e-9) || v > max*(1+1e-9) {
				continue
			}
			t := plot.Tick{Value: v}
			if k == 1 && ((e-e0)%every == 0) {
				t.Label = decadeLabel(e)
			}
			ticks = append(ticks, t)
		}
	}
	return ticks
}

// engDecadeTicks are decadeTicks labelled in engineering units: the axis
// holds values in units of factor·unit, and each labelled decade is
// written with the prefix under which it reads 1, 10 or 100 ("100 nT",
// "1 µT").
type engDecadeTicks struct {
	unit   string
	factor float64
}

func (t engDecadeTicks) Ticks(min, max float64) []plot.Tick {
	ticks := decadeTicks{}.Ticks(min, max)
	for i := range ticks {
		if ticks[i].Label != "" {
			ticks[i].Label = EngLabel(ticks[i].Value*t.factor, t.unit)
		}
	}
	return ticks
}

// tickPrefixes extend the prefixes down to femto, for the foot of a log
// axis.
var tickPrefixes = append(append([]Prefix{}, prefixes...), Prefix{"f", 1e-15})

// EngLabel writes a tick value v (SI) with the SI prefix under which it
// reads from 1 to below 1000, and the unit: 2e-5 T is "20 µT".
func EngLabel(v float64, unit string) string {
	if v == 0 || math.IsNaN(v) || math.IsInf(v, 0) {
		return "0 " + unit
	}
	pf := tickPrefixes[len(tickPrefixes)-1]
	for _, q := range tickPrefixes {
		if math.Abs(v) >= q.Factor*0.9995 {
			pf = q
			break
		}
	}
	m := math.Round(v/pf.Factor*1000) / 1000
	return strconv.FormatFloat(m, 'f', -1, 64) + " " + pf.Symbol + unit
}

// decadeLabel writes 10^e the short way.
func decadeLabel(e int) string {
	if e >= -2 && e <= 3 {
		return strconv.FormatFloat(math.Pow(10, float64(e)), 'f', -1, 64)
	}
	const sup = "⁰¹²³⁴⁵⁶⁷⁸⁹"
	digits := []rune(sup)
	var b strings.Builder
	b.WriteString("10")
	if e < 0 {
		b.WriteString("⁻")
		e = -e
	}
	for _, c := range strconv.Itoa(e) {
		b.WriteRune(digits[c-'0'])
	}
	return b.String()
}

// zeroLine draws the y = 0 line of a plot whose data change sign.
type zeroLine struct{}

func (zeroLine) Plot(c draw.Canvas, p *plot.Plot) {
	_, trY := p.Transforms(&c)
	y := trY(0)
	c.StrokeLine2(draw.LineStyle{Color: Muted, Width: vg.Points(0.6)}, c.Min.X, y, c.Max.X, y)
}

// markLines draws labelled vertical reference lines; the labels sit above
// the data area, in up to two rows so that neighbours do not collide.
type markLines struct {
	marks []Mark
	scale float64
}

const markLabelSize = vg.Length(6.8)

func (m *markLines) labelStyle() text.Style {
	sty := style(markLabelSize, Highlight)
	sty.XAlign = draw.XCenter
	sty.YAlign = draw.YBottom
	return sty
}

// height is the room the labels need above the data area.
func (m *markLines) height() vg.Length {
	return 2*m.labelStyle().Height("0") + vg.Points(4)
}

func (m *markLines) Plot(c draw.Canvas, p *plot.Plot) {
	trX, _ := p.Transforms(&c)
	ls := draw.LineStyle{Color: Highlight, Width: vg.Points(0.6), Dashes: []vg.Length{vg.Points(1.5), vg.Points(1.5)}}
	sty := m.labelStyle()
	rowH := sty.Height("0")
	// right ends of the labels set so far, per row
	ends := []vg.Length{vg.Length(math.Inf(-1)), vg.Length(math.Inf(-1))}
	for _, mk := range m.marks {
		v := mk.X / m.scale
		if v < p.X.Min || v > p.X.Max || math.IsNaN(v) {
			continue
		}
		x := trX(v)
		if !mk.NoLine {
			c.StrokeLine2(ls, x, c.Min.Y, x, c.Max.Y)
		}
		if mk.Label == "" {
			continue
		}
		w := sty.Width(mk.Label)
		// A label near an end of the axis is kept over the data area.
		x = min(max(x, c.Min.X+w/2), c.Max.X-w/2)
		row := 0
		if x-w/2 < ends[0]+vg.Points(4) {
			row = 1
		}
		ends[row] = x + w/2
		c.FillText(sty, vg.Point{X: x, Y: c.Max.Y + vg.Points(2) + vg.Length(row)*rowH}, mk.Label)
	}
}

// niceTicks labels round values, about seven per axis, with unlabelled
// minor ticks between them.
type niceTicks struct{}

func (niceTicks) Ticks(min, max float64) []plot.Tick {
	if !(max > min) {
		return plot.DefaultTicks{}.Ticks(min, max)
	}
	raw := (max - min) / 7
	mag := math.Pow(10, math.Floor(math.Log10(raw)))
	var step float64
	minor := 5
	for _, f := range []float64{1, 2, 2.5, 5, 10} {
		step = f * mag
		if step >= raw {
			if f == 2.5 || f == 5 {
				minor = 5
			}
			if f == 2 {
				minor = 4
			}
			break
		}
	}
	prec := int(math.Max(0, -math.Floor(math.Log10(step)+1e-9)))
	if math.Abs(step*math.Pow(10, float64(prec))-math.Round(step*math.Pow(10, float64(prec)))) > 1e-9 {
		prec++
	}
	var ticks []plot.Tick
	first := math.Ceil(min/step-1e-9) * step
	for k := -1; ; k++ {
		v := first + float64(k)*step
		if v > max+step*1e-9 {
			break
		}
		if v >= min-step*1e-9 {
			if math.Abs(v) < step*1e-9 {
				v = 0
			}
			ticks = append(ticks, plot.Tick{Value: v, Label: strconv.FormatFloat(v, 'f', prec, 64)})
		}
		for j := 1; j < minor; j++ {
			mv := v + float64(j)*step/float64(minor)
			if mv >= min && mv <= max {
				ticks = append(ticks, plot.Tick{Value: mv})
			}
		}
	}
	return ticks
}
