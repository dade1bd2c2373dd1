package memo

import (
	"fmt"
	"math"
	"sort"
	"strconv"
	"strings"

	"coilmemo/analysis"
	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/figures"

	"gonum.org/v1/plot/vg"
)

// planeFigure adds the map of a panel coil's normal field over its plane
// of interest (memo/figsel.go says which coils get one).
func (c *composer) planeFigure(co calc.Coil, pm *analysis.PlaneMap) {
	bs, _ := axialSymbol(co)
	// The plane's coordinates are the coil frame's, from the foot of the
	// axis: x and y for a coil along z, else u and v (the global
	// direction, where it is one, in the caption).
	_, u, v := figures.FrameLetters(axisName(co))
	frame := fmt.Sprintf("coil frame from where the axis crosses the plane: %s along the width, %s along the height", u, v)
	if u != "x" {
		gu, gv := axisName(calc.Coil{Axis: pm.E1}), axisName(calc.Coil{Axis: pm.E2})
		if !strings.HasPrefix(gu, "(") && !strings.HasPrefix(gv, "(") {
			frame = fmt.Sprintf("coil frame from where the axis crosses the plane: %s along the width, in the global %s direction, and %s along the height, in the global %s direction", u, gu, v, gv)
		}
	}
	var pts []figures.PlanePoint
	for _, p := range pm.Probes {
		pts = append(pts, figures.PlanePoint{X: p.U, Y: p.V, Label: p.Name})
	}
	w, h := co.Width/2, co.Height/2
	d := figures.PlaneData{X: pm.U, Y: pm.V, V: pm.Bn, Ref: pm.Centre, Steps: figures.ContourSteps,
		Outline: [][2]float64{{-w, -h}, {w, -h}, {w, h}, {-w, h}}, Points: pts,
		XLabel: "Position " + u + " along the width", YLabel: "Position " + v + " along the height", Quantity: bs}
	n := c.figure + 1
	where := fmt.Sprintf("the plane %s from it along its axis", Eng(math.Abs(pm.Dist), "m", 3))
	if pm.Dist == 0 {
		where = "its own plane"
	}
	var which string
	switch ps := c.j.Spec.Design.Probes; {
	case co.HasTestPlane:
		which = "the design's test plane"
		switch {
		case pm.InPlane == 1 && len(pm.Probes) == 1:
			which += fmt.Sprintf(", in which the probe %q lies", pm.Probes[0].Name)
		case pm.InPlane > 0:
			which += fmt.Sprintf(", in which %s of the design's probes %s", countWord(pm.InPlane), map[bool]string{true: "lies", false: "lie"}[pm.InPlane == 1])
		}
	case !pm.AllInIt:
		which = fmt.Sprintf("through the first probe, %q (%s of the design's probes lie in it)", ps[0].Name, countWord(pm.InPlane))
	case pm.InPlane == 1:
		which = fmt.Sprintf("in which the probe %q lies", ps[0].Name)
	default:
		which = fmt.Sprintf("in which the %d probes lie", pm.InPlane)
	}
	levels := stepsText(d.PlaneLevels(), pm.Centre)
	// First what the plane shows, then the lead-in (kept short, so that
	// the page keeps it with its figure).
	over := fmt.Sprintf("the plane %s from coil %q along its axis", Eng(math.Abs(pm.Dist), "m", 3), co.Name)
	if pm.Dist == 0 {
		over = fmt.Sprintf("the plane of coil %q", co.Name)
	}
	text := fmt.Sprintf("Over %s, %s, the flux density normal to the coil, %s, is %s where the coil's axis crosses the plane", over, which, bs, Eng(pm.Centre, "T", 4))
	var within []string
	for _, r := range pm.Within {
		tol := strconv.FormatFloat(100*r.Tol, 'f', -1, 64) + " %"
		switch {
		case r.Full:
			within = append(within, fmt.Sprintf("within ±%s of it over the whole map, %s", tol, sizeText(2*pm.UHalf, 2*pm.VHalf)))
		case r.U > 0:
			within = append(within, fmt.Sprintf("within ±%s over %s (%s %% of the coil's sides)", tol, sizeText(2*r.U, 2*r.V), Sig(100*r.U/w, 2)))
		default:
			within = append(within, fmt.Sprintf("leaves ±%s at once", tol))
		}
	}
	if len(within) > 0 {
		text += "; it stays " + strings.Join(within, " and ")
	}
	text += "."
	if len(pm.Probes) > 1 {
		lo, hi := math.Inf(1), math.Inf(-1)
		for _, p := range pm.Probes {
			lo, hi = math.Min(lo, p.Bn/pm.Centre-1), math.Max(hi, p.Bn/pm.Centre-1)
		}
		on := ""
		if len(pm.Probes) < pm.InPlane {
			on = " on the map"
		}
		text += fmt.Sprintf(" Over the probes%s it runs from %s to %s of the centre value.", on, planePercent(lo), planePercent(hi))
	} else if len(pm.Probes) == 1 && (pm.Probes[0].U != 0 || pm.Probes[0].V != 0) {
		p := pm.Probes[0]
		text += fmt.Sprintf(" At the probe it is %s of the centre value.", planePercent(p.Bn/pm.Centre-1))
	}
	if far := pm.InPlane - len(pm.Probes); far == 1 {
		text += " One probe in the plane lies more than twice the coil's size from its axis, beyond the map."
	} else if far > 1 {
		text += fmt.Sprintf(" %s probes in the plane lie more than twice the coil's size from its axis, beyond the map.", strings.ToUpper(countWord(far)[:1])+countWord(far)[1:])
	}
	c.para(text)
	// The tightest band drawn: the contours nearest the centre value.
	tight := math.Inf(1)
	for _, lv := range d.PlaneLevels() {
		tight = math.Min(tight, math.Abs(lv/pm.Centre-1))
	}
	read := ""
	if !math.IsInf(tight, 0) {
		read = fmt.Sprintf(": inside the contours nearest the centre the field is within %s %% of its centre value", strconv.FormatFloat(math.Round(1000*tight)/10, 'f', -1, 64))
	}
	marked, dots := "The coil's mean turn is dashed.", ""
	if len(pts) > 0 {
		marked, dots = "The coil's mean turn is dashed and the probes are marked.", "; dots: probes"
		if len(pts) == 1 {
			marked, dots = "The coil's mean turn is dashed and the probe is marked.", "; dot: the probe"
		}
	}
	contours := fmt.Sprintf(", with contour lines at %s of the centre value%s", levels, read)
	contoursCap := fmt.Sprintf("; white contours at %s of the centre value, drawn across the colour bar too", levels)
	if len(d.PlaneLevels()) == 0 {
		var all []float64
		for _, st := range figures.ContourSteps {
			all = append(all, 1+st)
		}
		contours = fmt.Sprintf(", without contour lines: none of the departures from the centre value they are drawn at (%s) falls inside the map's range", stepsText(all, 1))
		contoursCap = ""
	}
	c.para(fmt.Sprintf("Figure %d maps %s of coil %q alone over that plane on a linear colour scale%s. %s",
		n, bs, co.Name, contours, marked))
	// A clipped end of the colour scale: the values beyond it take its
	// colour (an arrowhead on the bar).
	var clipped string
	switch lo, hi, clipLo, clipHi := d.ColourScale(); {
	case clipLo && clipHi:
		clipped = fmt.Sprintf(", clipped at %s and %s, beyond which the end colours stand (arrowheads)", Eng(lo, "T", 3), Eng(hi, "T", 3))
	case clipHi:
		clipped = fmt.Sprintf(", clipped at %s: above it the top colour (arrowhead)", Eng(hi, "T", 3))
	case clipLo:
		clipped = fmt.Sprintf(", clipped at %s: below it the bottom colour (arrowhead)", Eng(lo, "T", 3))
	}
	// The height follows the map's proportions, as the meridian map's.
	fh := vg.Length(100*pm.VHalf/pm.UHalf)*vg.Millimeter + 22*vg.Millimeter
	fh = max(min(fh, 110*vg.Millimeter), 55*vg.Millimeter)
	c.fig(doc.Figure{
		Caption: fmt.Sprintf("%s of coil %q over %s (%s; colour scale: viridis, van der Walt & Smith 2015, linear%s%s; dashed: the coil's mean turn%s)", bs, co.Name, where, frame, clipped, contoursCap, dots),
		Width:   figWidth, Height: fh, Draw: figures.PlaneMap(d),
		Summary: fmt.Sprintf("Map of %s over %s: %s at the centre, from %s to %s over %s, %d × %d points.",
			bs, where, Eng(pm.Centre, "T", 3), Eng(pm.Min, "T", 3), Eng(pm.Max, "T", 3), sizeText(2*pm.UHalf, 2*pm.VHalf), len(pm.U), len(pm.V)),
	})
}

// planePercent writes a departure as a signed percentage to two
// significant figures, "0 %" within 0.05 % of zero: "+5.0 %", "−0.30 %".
func planePercent(f float64) string {
	p := 100 * f
	s := Sig(math.Abs(p), 2)
	if math.Abs(p) < 0.05 {
		return "0 %" // within rounding of the centre value
	}
	if p < 0 {
		return "−" + s + " %"
	}
	return "+" + s + " %"
}

// sizeText is a rectangle's sides in millimetres to three significant
// figures: "120 × 80.5 mm".
func sizeText(a, b float64) string {
	mm := func(x float64) string {
		if !(x > 0) {
			return "0"
		}
		dec := max(0, 2-int(math.Floor(math.Log10(x*1000))))
		s := strconv.FormatFloat(x*1000, 'f', dec, 64)
		if strings.Contains(s, ".") {
			s = strings.TrimRight(strings.TrimRight(s, "0"), ".")
		}
		return s
	}
	return mm(a) + " × " + mm(b) + " mm"
}

// stepsText names the contour levels as departures from ref, a pair of
// opposite ones as one: "±1 %, ±2 %, +100 %".
func stepsText(levels []float64, ref float64) string {
	type step struct{ plus, minus bool }
	var order []float64
	seen := map[float64]*step{}
	for _, lv := range levels {
		d := math.Round(1000*(lv/ref-1)) / 10 // %
		a := math.Abs(d)
		st, ok := seen[a]
		if !ok {
			st = &step{}
			seen[a] = st
			order = append(order, a)
		}
		if d > 0 {
			st.plus = true
		} else {
			st.minus = true
		}
	}
	sort.Float64s(order)
	var out []string
	for _, a := range order {
		sign := "±"
		switch st := seen[a]; {
		case st.plus && !st.minus:
			sign = "+"
		case st.minus && !st.plus:
			sign = "−"
		}
		out = append(out, sign+strconv.FormatFloat(a, 'f', -1, 64)+" %")
	}
	return strings.Join(out, ", ")
}

// countWord is a count in words for small numbers: "one", "two", … "9".
func countWord(n int) string {
	w := []string{"none", "one", "two", "three", "four", "five", "six", "seven", "eight", "nine"}
	if n >= 0 && n < len(w) {
		return w[n]
	}
	return fmt.Sprint(n)
}
