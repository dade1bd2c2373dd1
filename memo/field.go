package memo

import (
	"coilmemo/analysis"
	"fmt"
	"math"
	"strconv"
	"strings"

	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/figures"
	"coilmemo/format"
	"coilmemo/templates"

	"gonum.org/v1/plot/vg"
)

// field reports the field: probes, then coil by coil the winding sketch,
// the on-axis profile, the field map, the dipole distances and, for
// pairs, the homogeneous region or the gradient.
func (c *composer) field() {
	c.heading(1, "Magnetic field")
	d := c.j.Spec.Design
	r := c.j.Results
	B0 := r.FieldCentre
	every := "every coil"
	if c.anyReceiver() {
		every = "every driven coil"
	}
	// a component of zero in the unit of the magnitude ("Bx = 0 µT"
	// beside "Bz = 433.0 µT"), every other in its own
	comp := func(v float64) string { return format.EngColumn([]float64{v}, B0.Norm(), "T", 4)[0] }
	c.para(fmt.Sprintf("With %s at its steady operating current, the flux density at the origin is |B| = %s (Bx = %s, By = %s, Bz = %s). The background field is not included in these figures.",
		every, Eng(B0.Norm(), "T", 4), comp(B0[0]), comp(B0[1]), comp(B0[2])))
	if p := c.pickUpNote(
		"it makes no field of its own and has no figures here; the field figures are the driven coils', and its response to a field is in the section Pick-up and a.c. figures",
		"they make no field of their own and have no figures here; the field figures are the driven coils', and their response to a field is in the section Pick-up and a.c. figures"); p != "" {
		c.para(p)
	}
	round, rect := false, false
	for _, co := range d.Coils {
		rect = rect || co.Form == calc.Rectangle
		round = round || co.Form != calc.Rectangle
	}
	from := "each circular turn (complete elliptic integrals) or of each straight side of a rectangle (closed-form Biot–Savart integral)"
	switch {
	case !rect:
		from = "each circular turn (complete elliptic integrals)"
	case !round:
		from = "each straight side of every rectangular turn (closed-form Biot–Savart integral)"
	}
	text := "Fields are computed from the exact field of " + from + ", superposed."
	layered := false // a circular winding of several layers, whose turns the maps group
	for i, co := range d.Coils {
		if i < len(r.Coils) && co.Form != calc.Rectangle && !r.Coils[i].Winding.Thin && r.Coils[i].Winding.LayerCount > 1 {
			layered = true
		}
	}
	if layered {
		text += " For maps and profiles the turns of a winding of several layers are grouped by Gauss quadrature over its cross-section, which reproduces the turn-by-turn sum to better than one part in 10⁹ and falls back to the individual turns near the winding."
	}
	c.para(text)
	if len(r.Probes) > 0 {
		// every field of the table in one unit, that of the largest, so
		// that a zero or a small component reads against the others
		var all []float64
		for _, p := range r.Probes {
			all = append(all, p.B[0], p.B[1], p.B[2], p.B.Norm())
		}
		txt := format.EngColumn(all, 0, "T", 4)
		var rows [][]doc.Cell
		for i, p := range r.Probes {
			b := txt[4*i : 4*i+4]
			rows = append(rows, []doc.Cell{{Text: p.Name},
				{Text: fmt.Sprintf("(%s, %s, %s) mm", mmNum(p.At[0]), mmNum(p.At[1]), mmNum(p.At[2]))},
				{Text: b[0]}, {Text: b[1]}, {Text: b[2]},
				{Text: b[3], Strong: true}})
		}
		c.add(doc.Table{Caption: "Flux density at the probe points (all coils)",
			Header: []string{"Probe", "Position", "Bx", "By", "Bz", "|B|"}, Rows: rows,
			Widths: []float64{1.3, 2, 1, 1, 1, 1.1},
			Align:  []doc.Align{doc.Left, doc.Left, doc.Right, doc.Right, doc.Right, doc.Right}})
	}
	for _, i := range c.drivenCoils() {
		if k := c.fieldTwin(i); k >= 0 {
			c.joinPart(k, strconv.Quote(d.Coils[i].Name), func(first, others string) string {
				return fmt.Sprintf("What follows is written for coil %s, in its own frame: positions along and across its own axis. It holds unchanged for %s, the same winding at the same current, each in its own frame.", first, others)
			})
			continue
		}
		c.coilPart(d.Coils[i].Name, func(names string) string { return "Field of " + names }, func() { c.coilField(i) })
	}
	c.axisSetFigure() // memo/axisset.go
	c.allCoilsMap()
}

// fieldTwin is the part of the field section that coil block i repeats
// in its own frame, -1 for none: an earlier coil's whose map it shares
// (the same winding at the same current, analysis), with the same
// figures chosen and nothing drawn on them that belongs to one coil
// alone (a plane of interest, a requirement line). A pair is never
// taken for another's twin.
func (c *composer) fieldTwin(i int) int {
	d := c.j.Spec.Design
	m := c.j.Coils[i].Map
	if m == nil || d.Coils[i].Form == calc.Pair || planeShown(c.j, i) != nil {
		return -1
	}
	if _, ok := c.centreRequirement(i); ok {
		return -1
	}
	for _, j := range c.drivenCoils() {
		if j >= i {
			break
		}
		if c.j.Coils[j].Map != m || figuresFor(c.j, j) != figuresFor(c.j, i) || planeShown(c.j, j) != nil {
			continue
		}
		if _, ok := c.centreRequirement(j); ok {
			continue
		}
		if k := c.partOf(d.Coils[j].Name); k >= 0 {
			return k
		}
	}
	return -1
}

// coilField is coil block i's part of the field section.
func (c *composer) coilField(i int) {
	d := c.j.Spec.Design
	r := c.j.Results
	co, cr := d.Coils[i], r.Coils[i]
	cs := &c.j.Coils[i]
	f := figuresFor(c.j, i) // which figures: memo/figsel.go
	c.crossSection(co, cr, cs, f)
	if co.Form == calc.Pair {
		c.pairRegion(co, cr, cs, i, f) // the pair's purpose first
	}
	switch f.Profile {
	case boreProfile:
		c.boreFigure(co, cs, i)
	case pairProfile:
		c.pairProfileFigure(co, cs)
	case nearProfile:
		c.nearFigure(co, cs, i)
	default:
		c.axisFigure(co, cr, cs)
	}
	pm := planeShown(c.j, i)
	if pm != nil {
		c.planeFigure(co, pm) // memo/plane.go
	}
	c.fieldMap(co, cr, cs, pm != nil)
	c.dipoleDistances(co, cr, cs)

}

// mmNum is a length in millimetres to 0.01 mm without trailing zeros or
// a signed zero, with a true minus sign: the probe positions all alike.
func mmNum(v float64) string {
	s := strings.TrimSuffix(mmText(v), " mm")
	if s == "-0" {
		return "0"
	}
	return strings.Replace(s, "-", "−", 1)
}

// mmText prints a length in millimetres to 0.01 mm without trailing zeros.
func mmText(v float64) string {
	s := strconv.FormatFloat(math.Round(v*1e5)/100, 'f', 2, 64)
	for s[len(s)-1] == '0' {
		s = s[:len(s)-1]
	}
	s = trimDot(s)
	return s + " mm"
}

func trimDot(s string) string {
	if s[len(s)-1] == '.' {
		return s[:len(s)-1]
	}
	return s
}

// crossSection adds the dimensioned sketch of the winding.
func (c *composer) crossSection(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, f coilFigures) {
	w := cr.Winding
	n := c.figure + 1
	if co.Form == calc.Rectangle {
		b := cs.Bundle
		c.para(fmt.Sprintf("Figure %d shows the coil in plan, to scale: %s in a bundle of about %s on a mean turn of %s × %s.",
			n, format.Count(co.Turns, "turn", "turns"), mmText(b), mmText(co.Width), mmText(co.Height)))
		c.fig(doc.Figure{Caption: fmt.Sprintf("Coil %q in plan, looking along its axis (to scale; dimensions to the mean turn)", co.Name),
			Width: figWidth, Height: 70 * vg.Millimeter,
			Draw: figures.RectangleSketch(figures.RectangleData{Width: co.Width, Height: co.Height, Bundle: b,
				WidthLabel: figures.LengthLabel(co.Width), HeightLabel: figures.LengthLabel(co.Height),
				Note: fmt.Sprintf("%s, bundle ≈ Ø %s", format.Count(co.Turns, "turn", "turns"), figures.LengthLabel(b))}),
			Summary: fmt.Sprintf("Plan: %s × %s mean turn, bundle ≈ %s.", mmText(co.Width), mmText(co.Height), mmText(b))})
		return
	}
	e := cs.Envelope
	if !(e.R1 > 0) || math.IsInf(e.R1, 0) {
		return // nothing to draw
	}
	if !f.Sketch {
		// At the coil's scale a thin coil's section is a dot: say it.
		c.para(fmt.Sprintf("The winding of coil %q is thin: %s in one round bundle about %s across on the mean diameter of %s, a section too small against the coil to be worth a sketch.",
			co.Name, allTurnsLie(co.Turns), mmText(e.R1-e.R0), mmText(co.MeanDiameter)))
		return
	}
	var sd figures.SketchData
	coreS, coreDims, coreDesc := coreSketch(co, cs, false) // the core, drawn under the winding: memo/core.go
	sd.Sections = append(sd.Sections, coreS...)
	for _, z := range cs.Placements {
		if cs.Underfilled { // the stated section in outline, the turns as laid in copper: memo/underfill.go
			sd.Sections = append(sd.Sections, figures.Section{X0: z + e.Z0, X1: z + e.Z1, Y0: e.R0, Y1: e.R1, Outline: true},
				figures.Section{X0: z + e.Z0, X1: z + e.Z1, Y0: cs.Laid.R0, Y1: cs.Laid.R1})
			continue
		}
		sd.Sections = append(sd.Sections, figures.Section{X0: z + e.Z0, X1: z + e.Z1, Y0: e.R0, Y1: e.R1, Round: e.Round})
	}
	rm := co.MeanDiameter / 2
	var desc string
	switch {
	case w.Thin:
		sd.Dimensions = append(sd.Dimensions, figures.Dimension{Kind: figures.Diameter, A: rm, Label: "Ø " + figures.LengthLabel(co.MeanDiameter) + " mean"})
		note := fmt.Sprintf("%s, bundle ≈ Ø %s", format.Count(co.Turns, "turn", "turns"), figures.LengthLabel(e.R1-e.R0))
		sd.Notes = append(sd.Notes, figures.Note{X: sd.Sections[len(sd.Sections)-1].X1, Y: e.R1, Text: note})
		desc = fmt.Sprintf("%s in one round bundle of about %s on the mean diameter", strings.TrimSuffix(strings.TrimSuffix(allTurnsLie(co.Turns), " lie"), " lies"), mmText(e.R1-e.R0))
	case co.RadialBuild <= 0:
		sd.Dimensions = append(sd.Dimensions,
			figures.Dimension{Kind: figures.Diameter, A: rm, Label: "Ø " + figures.LengthLabel(co.MeanDiameter) + " mean"},
			figures.Dimension{Kind: figures.Axial, A: e.Z0 + cs.Placements[0], B: e.Z1 + cs.Placements[0], Label: figures.LengthLabel(co.Length)})
		desc = fmt.Sprintf("%s in one layer over %s", format.Count(co.Turns, "turn", "turns"), mmText(co.Length))
	default:
		mean := figures.Dimension{Kind: figures.Diameter, A: rm, Label: "Ø " + figures.LengthLabel(co.MeanDiameter) + " mean"}
		if cs.Underfilled {
			// The turns lie nearer the bore than the stated mean diameter:
			// the dimension is that of the turns as laid, as the
			// assumptions' radial-build note gives their mean radius.
			mean = figures.Dimension{Kind: figures.Diameter, A: cs.MeanRadius, Label: "Ø " + figures.LengthLabel(2*cs.MeanRadius) + " turns' mean"}
		}
		sd.Dimensions = append(sd.Dimensions,
			figures.Dimension{Kind: figures.Diameter, A: e.R0, Label: "Ø " + figures.LengthLabel(2*e.R0) + " inner"},
			mean,
			figures.Dimension{Kind: figures.Diameter, A: e.R1, Label: "Ø " + figures.LengthLabel(2*e.R1) + " outer"},
			figures.Dimension{Kind: figures.Axial, A: e.Z0 + cs.Placements[0], B: e.Z1 + cs.Placements[0], Label: figures.LengthLabel(e.Z1 - e.Z0)},
			figures.Dimension{Kind: figures.Radial, A: e.R0, B: e.R1, Label: buildText(co.RadialBuild)})
		desc = fmt.Sprintf("%s in %s of up to %s, %s long with a radial build of %s",
			format.Count(co.Turns, "turn", "turns"), format.Count(w.LayerCount, "layer", "layers"), format.Count(w.TurnsPerLayer, "turn", "turns"), mmText(e.Z1-e.Z0), buildText(co.RadialBuild))
		if cs.Underfilled {
			used := cs.Laid.R1 - cs.Laid.R0
			sd.Dimensions[len(sd.Dimensions)-1].Label += ", turns " + buildText(used) // the radial build's
			desc += fmt.Sprintf(", of which the turns fill the inner %s (drawn in copper; the rest of the stated section in dashed outline)", buildText(used))
		}
	}
	sd.Dimensions = append(sd.Dimensions, coreDims...)
	desc += coreDesc
	if co.Form == calc.Pair {
		s := math.Abs(co.Spacing)
		sd.CentreLines = []float64{-s / 2, s / 2}
		sd.Dimensions = append(sd.Dimensions, figures.Dimension{Kind: figures.Axial, A: -s / 2, B: s / 2, Label: "spacing " + Eng(s, "m", 4)})
		// the spacing as the pair's section writes it ("60.00 mm apart")
		desc = "each of the two coils holds " + desc + fmt.Sprintf("; their centres are %s apart", Eng(s, "m", 4))
	}
	c.para(fmt.Sprintf("Figure %d shows the winding cross-section in the half-plane above the axis, to scale: %s.", n, desc))
	h := sketchHeight(co, e)
	c.fig(doc.Figure{Caption: fmt.Sprintf("Cross-section of coil %q in the plane through its axis (to scale; the axis at the bottom)", co.Name),
		Width: figWidth, Height: h, Draw: figures.CrossSection(sd),
		Summary: fmt.Sprintf("Cross-section: %s.", desc)})
}

// sketchHeight fits the sketch's height to its proportions.
func sketchHeight(co calc.Coil, e calc.Envelope) vg.Length {
	zs := e.Z1 - e.Z0
	if co.Form == calc.Pair {
		zs += math.Abs(co.Spacing)
	}
	zs = math.Max(zs, 0.6*e.R1)
	// Data width about 110 mm on the page.
	h := vg.Length(110*e.R1/zs)*vg.Millimeter + 22*vg.Millimeter
	top := 95 * vg.Millimeter
	if e.Round {
		top = 50 * vg.Millimeter // a bundle on a diameter: little to see
	}
	bottom := 50 * vg.Millimeter
	if co.RadialBuild <= 0 && co.Form != calc.Pair {
		// One layer, one diameter to dimension: a long, flat sketch needs
		// no more than its dimensions' room.
		bottom = 36 * vg.Millimeter
	}
	return max(min(h, top), bottom)
}

// axisFigure adds the on-axis profile with the dipole overlay.
func (c *composer) axisFigure(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy) {
	p := cs.Axis
	caption := fmt.Sprintf("Flux density on the axis of coil %q: exact field (solid) and point-dipole approximation (dashed)", co.Name)
	if cr.Moment.Norm() == 0 {
		caption = fmt.Sprintf("Flux density on the axis of coil %q (exact field; the coil has no dipole moment)", co.Name)
	}
	summary := fmt.Sprintf("|B| on axis from %s to %s; peak %s.", Eng(p.Z[0], "m", 3), Eng(p.Z[len(p.Z)-1], "m", 3), Eng(p.Peak, "T", 3))
	var marks []figures.Mark
	if !math.IsNaN(p.Dipole1pc) {
		marks = []figures.Mark{{X: -p.Dipole1pc, Label: "1 %"}, {X: p.Dipole1pc, Label: "1 %"}}
		caption += "; dotted lines: distance beyond which the dipole is within 1 %"
		summary += fmt.Sprintf(" Dipole within 1 %% beyond ±%s.", Eng(p.Dipole1pc, "m", 3))
	}
	n := c.figure + 1
	text := fmt.Sprintf("Figure %d shows the flux density along the axis of coil %q", n, co.Name)
	switch {
	case cr.Moment.Norm() > 0 && !math.IsNaN(p.Dipole1pc):
		near := "nearer the winding"
		if cs.Kinds.Core != nil {
			near = "nearer the winding and core"
		}
		switch p.DipoleNear {
		case 1:
			near += " the dipole overstates the field"
		case -1:
			near += " the dipole understates the field"
		default:
			near += " the two differ by more than 1 %"
		}
		text += fmt.Sprintf(", with the field of a point dipole of the coil's moment for comparison: the two curves merge beyond ±%s from the centre (dotted), where the dipole is within 1 %% of the exact field; %s.",
			Eng(p.Dipole1pc, "m", 3), near)
	case cr.Moment.Norm() > 0:
		text += ", with the field of a point dipole of the coil's moment for comparison; away from the winding the two curves merge."
	default:
		text += "; its two halves oppose, so it has no dipole moment."
	}
	if lo, hi := profileDecades(p.Exact); hi/lo > 100 {
		text += fmt.Sprintf(" The field falls from %s at its peak to %s at ±%s, so the flux density is on a logarithmic scale.",
			Eng(hi, "T", 3), Eng(lo, "T", 3), Eng(p.Z[len(p.Z)-1], "m", 3))
	}
	c.para(text)
	c.fig(doc.Figure{Caption: caption + frameNote(co), Width: figWidth, Height: figHeight,
		Draw: figures.OnAxis(axisName(co), p.Z, p.Exact, p.Dipole, marks...), Summary: summary})
}

// profileDecades is the smallest and largest positive value of a profile.
func profileDecades(v []float64) (lo, hi float64) {
	lo, hi = math.Inf(1), 0
	for _, x := range v {
		if x > 0 && !math.IsInf(x, 0) {
			lo, hi = math.Min(lo, x), math.Max(hi, x)
		}
	}
	return lo, hi
}

// boreFigure adds a solenoid's field over its bore, on linear axes, with
// its ends marked and a centre-field requirement drawn.
func (c *composer) boreFigure(co calc.Coil, cs *analysis.CoilStudy, i int) {
	bp := cs.Axis.Bore
	bs, _ := axialSymbol(co)
	n := c.figure + 1
	L := bp.Ends[len(bp.Ends)-1] - bp.Ends[0]
	text := fmt.Sprintf("Figure %d shows the axial flux density %s along the bore of coil %q, out to %s from the centre; the winding's ends are dotted.", n, bs, co.Name, Eng(bp.Z[len(bp.Z)-1], "m", 3)) + axialNote(co)
	if !math.IsNaN(bp.Flat) {
		text += fmt.Sprintf(" The field stays within 1 %% of its centre value, %s, over ±%s (%s %% of the winding's length)", Eng(bp.Centre, "T", 4), Eng(bp.Flat, "m", 3), Sig(200*bp.Flat/L, 2))
	}
	if !math.IsNaN(bp.EndRatio) {
		text += fmt.Sprintf(" and has fallen to %s %% of it at the ends.", Sig(100*bp.EndRatio, 2))
	}
	d := figures.ProfileData{Axis: axisName(co), Z: bp.Z, Y: bp.Bz, YName: "Axial flux density " + bs, Unit: "T",
		Marks: []figures.Mark{{X: bp.Ends[0], Label: "end"}, {X: bp.Ends[len(bp.Ends)-1], Label: "end"}}}
	caption := fmt.Sprintf("Axial flux density %s along the bore of coil %q (exact field; dotted: the winding's ends)", bs, co.Name)
	caption, text = c.drawCentreRequirement(i, bp.Centre, &d, caption, text)
	c.para(text)
	c.fig(doc.Figure{Caption: caption + frameNote(co), Width: figWidth, Height: figHeight * 0.85, Draw: figures.Profile(d),
		Summary: fmt.Sprintf("%s on axis: %s at the centre, within 1 %% over ±%s.", bs, Eng(bp.Centre, "T", 3), Eng(bp.Flat, "m", 3))})
}

// nearFigure adds a loop's or rectangle's field along its axis near its
// plane, on linear axes, with a centre-field requirement drawn.
func (c *composer) nearFigure(co calc.Coil, cs *analysis.CoilStudy, i int) {
	bp := cs.Axis.Bore
	bs, _ := axialSymbol(co)
	n := c.figure + 1
	edge := bp.Z[len(bp.Z)-1]
	text := fmt.Sprintf("Figure %d shows the axial flux density %s along the axis of coil %q on linear scales, out to %s on either side of its plane (dotted): it is %s at the centre",
		n, bs, co.Name, Eng(edge, "m", 3), Eng(bp.Centre, "T", 4))
	if !math.IsNaN(bp.Half) {
		text += fmt.Sprintf(", half of that at ±%s", Eng(bp.Half, "m", 3))
	}
	text += fmt.Sprintf(" and %s at ±%s.", Eng(bp.Bz[len(bp.Bz)-1], "T", 3), Eng(edge, "m", 3)) + axialNote(co)
	d := figures.ProfileData{Axis: axisName(co), Z: bp.Z, Y: bp.Bz, YName: "Axial flux density " + bs, Unit: "T",
		Marks: []figures.Mark{{X: 0, Label: "coil plane"}}}
	caption := fmt.Sprintf("Axial flux density %s along the axis of coil %q (exact field; dotted: the coil's plane)", bs, co.Name)
	caption, text = c.drawCentreRequirement(i, bp.Centre, &d, caption, text)
	c.para(text)
	c.fig(doc.Figure{Caption: caption + frameNote(co), Width: figWidth, Height: figHeight * 0.8, Draw: figures.Profile(d),
		Summary: fmt.Sprintf("%s on axis: %s at the centre, half of it at ±%s.", bs, Eng(bp.Centre, "T", 3), Eng(bp.Half, "m", 3))})
}

// drawCentreRequirement adds coil block i's centre-field requirement, if
// it has one, to a profile figure d (a dashed level with the sign of the
// centre field) and says in the caption and the text whether it is met.
func (c *composer) drawCentreRequirement(i int, centre float64, d *figures.ProfileData, caption, text string) (string, string) {
	req, ok := c.centreRequirement(i)
	if !ok {
		return caption, text
	}
	// The requirement holds at the centre: a short bar there, not a line
	// across the plot.
	d.Levels = append(d.Levels, figures.Level{Y: math.Copysign(req.Limit.Required, centre), Label: "required |B| " + relText(req.Limit) + " " + Eng(req.Limit.Required, "T", 3) + " at the centre", Local: true})
	caption += "; short bar at the centre: the required centre field"
	text += fmt.Sprintf(" The required centre field (the short bar at the centre) is %s.", map[bool]string{true: "met", false: "not met"}[req.Pass])
	return caption, text
}

// centreRequirement finds the centre-field requirement that applies to
// coil block i alone: one naming it, or one on the design when it is the
// only coil.
func (c *composer) centreRequirement(i int) (analysis.LimitResult, bool) {
	for _, l := range c.j.Limits {
		if l.Limit.Quantity != "field-center" {
			continue
		}
		if l.Coil == i || (l.Limit.Subject == "" && len(c.j.Spec.Design.Coils) == 1) {
			return l, true
		}
	}
	return analysis.LimitResult{}, false
}

// pairProfileFigure adds a pair's Bz along its axis across the pair, on
// linear axes, with the windings shaded.
func (c *composer) pairProfileFigure(co calc.Coil, cs *analysis.CoilStudy) {
	bp := cs.Axis.Bore
	bs, _ := axialSymbol(co)
	n := c.figure + 1
	var spans [][2]float64
	for k := 0; k+1 < len(bp.Ends); k += 2 {
		spans = append(spans, [2]float64{bp.Ends[k], bp.Ends[k+1]})
	}
	d := figures.ProfileData{Axis: axisName(co), Z: bp.Z, Y: bp.Bz, YName: "Axial flux density " + bs, Unit: "T",
		Windings: spans, WindingLabel: "coil"}
	var text string
	if co.Opposing {
		text = fmt.Sprintf("Figure %d shows the axial flux density %s along the axis of pair %q, through the pair and one radius beyond it; the windings are shaded. %s passes through zero at the centre, grows in proportion to the distance from it, peaks at %s at ±%s near the coils and falls away beyond them, reversed on the two sides.",
			n, bs, co.Name, bs, Eng(math.Abs(bp.Peak), "T", 3), Eng(bp.PeakZ, "m", 3))
	} else {
		text = fmt.Sprintf("Figure %d shows the axial flux density %s along the axis of pair %q, through the pair and one radius beyond it; the windings are shaded. Between the coils the field is a plateau at %s",
			n, bs, co.Name, Eng(bp.Centre, "T", 4))
		if !math.IsNaN(bp.Flat) {
			text += fmt.Sprintf(", within 1 %% over ±%s", Eng(bp.Flat, "m", 3))
		}
		text += "; beyond the coils it falls away."
	}
	text += axialNote(co)
	c.para(text)
	c.fig(doc.Figure{Caption: fmt.Sprintf("Axial flux density %s along the axis of pair %q (exact field; shaded: the windings)", bs, co.Name) + frameNote(co),
		Width: figWidth, Height: figHeight * 0.8, Draw: figures.Profile(d),
		Summary: fmt.Sprintf("%s on axis: %s at the centre; largest %s at %s.", bs, format.EngColumn([]float64{bp.Centre}, bp.Peak, "T", 3)[0], Eng(math.Abs(bp.Peak), "T", 3), Eng(bp.PeakZ, "m", 3))})
}

// fieldMap adds the map of |B| over the meridian plane; afterPlane says a
// plane map precedes it (memo/plane.go), and it is then drawn smaller.
func (c *composer) fieldMap(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, afterPlane bool) {
	m := cs.Map
	if m == nil {
		return // no extent to map
	}
	if d, ok := c.mapped[m]; ok {
		c.para(fmt.Sprintf("Coil %q has the same winding and current as coil %q: its map of |B| in its own frame is that of Figure %d.", co.Name, d.coil, d.figure))
		return
	}
	var sections []figures.Section
	// The map is in the coil's own frame: its axis named, z or not, and
	// the coordinates in the frame's letters (z and x for a coil along z,
	// else w and u), never two axes with one letter.
	along, across, _ := figures.FrameLetters(axisName(co))
	xLabel, yLabel, yName := figures.AxialLabel(axisName(co)), "Radial position ρ", "ρ"
	if co.Form == calc.Rectangle {
		b := cs.Bundle
		for _, x := range []float64{-co.Width / 2, co.Width / 2} {
			sections = append(sections, figures.Section{X0: -b / 2, X1: b / 2, Y0: x - b/2, Y1: x + b/2, Round: true})
		}
		yLabel, yName = "Position "+across+" across the width", across
	} else {
		e := cs.Envelope
		sections, _, _ = coreSketch(co, cs, true) // memo/core.go
		for _, z := range cs.Placements {
			for _, s := range []float64{1, -1} {
				if cs.Underfilled {
					// As the cross-section draws it (memo/underfill.go):
					// the stated section in dashed outline, the turns as
					// laid filled.
					sections = append(sections, figures.Section{X0: z + e.Z0, X1: z + e.Z1, Y0: s * e.R0, Y1: s * e.R1, Outline: true},
						figures.Section{X0: z + e.Z0, X1: z + e.Z1, Y0: s * cs.Laid.R0, Y1: s * cs.Laid.R1})
					continue
				}
				sections = append(sections, figures.Section{X0: z + e.Z0, X1: z + e.Z1, Y0: s * e.R0, Y1: s * e.R1, Round: e.Round})
			}
		}
	}
	xHalf, zHalf := m.XHalf, m.ZHalf
	// The figure's height follows the map's proportions (data width about
	// 118 mm between the axis labels and the colour bar).
	h := vg.Length(118*xHalf/zHalf)*vg.Millimeter + 24*vg.Millimeter
	h = max(min(h, 125*vg.Millimeter), 60*vg.Millimeter)
	if afterPlane {
		// The plane map above is the panel's main field figure: this one
		// takes less of the page, so that both share one.
		h = min(h, 100*vg.Millimeter)
	}
	// The figure's horizontal axis is z, its vertical the radial
	// coordinate.
	md := figures.MapData{X: m.Z, Y: m.X, B: m.B, Sections: sections,
		XLabel: xLabel, YLabel: yLabel}
	cored := cs.Kinds.Core != nil
	if cored && m.PeakCore {
		md.CorePeak = m.Peak
	}
	drawMap := figures.FieldMap(md)
	n := c.figure + 1
	if c.mapped == nil {
		c.mapped = map[*analysis.MapData]drawnMap{}
	}
	c.mapped[m] = drawnMap{coil: co.Name, figure: n}
	plane := "the meridian plane (through the axis)"
	if co.Form == calc.Rectangle {
		plane = "the plane through the axis and across the width"
	}
	// A winding whose turns do not fill the stated build is drawn as on
	// its cross-section (memo/underfill.go).
	underText, underCap := "", ""
	if cs.Underfilled && co.Form != calc.Rectangle {
		underText = fmt.Sprintf(", the turns as laid in copper (the inner %s of the radial build) and the rest of the stated section in dashed outline", buildText(cs.Laid.R1-cs.Laid.R0))
		underCap = "; dashed: the stated winding section beyond the turns"
	}
	text := fmt.Sprintf("Figure %d maps the magnitude of the flux density of coil %q alone over %s, on a logarithmic colour scale with contour lines at 1–2–5 steps per decade; the winding cross-sections are drawn in%s.",
		n, co.Name, plane, underText)
	if centre, edge, ok := mapLevels(m); ok {
		text += " " + mapPeakText(co, m, cored) + fmt.Sprintf("; it is %s at the centre and at most %s on the map's edge.", format.EngColumn([]float64{centre}, edge, "T", 3)[0], Eng(edge, "T", 3))
		// one block: its map is the design's field, whose largest value on
		// the winding's outer surface the Safety section's search found
		if ir := c.j.Safety.Implant; len(c.j.Spec.Design.Coils) == 1 && len(ir.Windings) == 1 && ir.Windings[0].Surface > 0 && !ir.Peak {
			text += fmt.Sprintf(" On the winding's outer surface, between the map's points, the search of the Safety section finds |B| up to %s.", Eng(ir.Windings[0].Surface, "T", 3))
		}
	}
	coreCap := ""
	if cored {
		text += " The core is drawn in grey, not in the colours of the scale"
		coreCap = "; grey: the core"
		if md.CoreAbove() {
			top := md.Scale().Hi
			text += fmt.Sprintf(": inside it |B| reaches %s, above the scale's top of %s, which the grey arrowhead atop the colour bar marks", Eng(m.Peak, "T", 3), Eng(top, "T", 3))
			coreCap = fmt.Sprintf("; grey: the core, whose |B| of up to %s lies above the colour scale, as the grey arrowhead atop the colour bar marks", Eng(m.Peak, "T", 3))
		}
		text += "."
	}
	c.para(text)
	c.fig(doc.Figure{
		Caption: fmt.Sprintf("|B| of coil %q over %s (coil frame%s; colour scale: viridis, van der Walt & Smith 2015, logarithmic; contours at the values marked on the colour bar%s%s)", co.Name, strings.Replace(plane, " (through the axis)", " through the axis", 1), frameNote(co), underCap, coreCap),
		Width:   figWidth, Height: h, Draw: drawMap,
		Summary: fmt.Sprintf("Map of |B|: %s from %s to %s, %s from %s to %s, %d × %d points.",
			along, Eng(-zHalf, "m", 3), Eng(zHalf, "m", 3), yName,
			Eng(-xHalf, "m", 3), Eng(xHalf, "m", 3), len(m.Z), len(m.X)),
	})
}

// dipoleDistances adds the table of distances beyond which the coil may be
// taken as a point dipole.
func (c *composer) dipoleDistances(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy) {
	dr := cr.Dipole
	if math.IsNaN(dr.Axis1) {
		if co.Form == calc.Pair && co.Opposing {
			c.para("The two coils oppose, so the pair has no net dipole moment: far away its field is that of a quadrupole and falls as 1/r⁴. The point-dipole description does not apply.")
		}
		return
	}
	R := co.MeanDiameter / 2
	ref, refName := R, "a" // a: the mean radius, as in the inductance steps (R is a resistance)
	if co.Form == calc.Rectangle {
		ref, refName = math.Sqrt(co.Width*co.Height/math.Pi), "a"
	}
	cell := func(v float64) doc.Cell {
		if math.IsNaN(v) {
			return doc.Cell{Text: "n/a"}
		}
		return doc.Cell{Text: fmt.Sprintf("%s (%s %s)", Eng(v, "m", 3), Sig(v/ref, 3), refName)}
	}
	plane := "In the plane of the coil"
	if co.Form == calc.Pair {
		plane = "In the mid-plane of the pair"
	}
	if co.Form == calc.Rectangle {
		plane += " (worst direction)"
	}
	good1, good01 := dr.Any1, dr.Any01
	if !c.farFieldUsed(co, cs.Kinds.Core != nil, dr) {
		// A bore or homogeneous-region design: the far field is a side
		// note, one sentence, not a table.
		c.para(fmt.Sprintf("Far from the winding the field of coil %q is that of a point dipole of moment |m| = %s at its centre, to within 1 %% beyond %s from its centre in any direction (0.1 %% beyond %s).",
			co.Name, Eng(cr.Moment.Norm(), "A·m²", 3), Eng(good1, "m", 3), Eng(good01, "m", 3)))
		return
	}
	refText := fmt.Sprintf("%s = %s is the mean radius", refName, Eng(R, "m", 3))
	if co.Form == calc.Rectangle {
		refText = fmt.Sprintf("%s = √(W·H/π) = %s is the radius of the circle of the same area", refName, Eng(ref, "m", 3))
	}
	c.para(fmt.Sprintf("Far from the winding the field of coil %q is that of a point dipole of moment |m| = %s at its centre:", co.Name, Eng(cr.Moment.Norm(), "A·m²", 3)))
	c.derive(Step{What: "Field of a point dipole m at distance r in the direction of the unit vector r̂",
		Symbolic: `\vec{B} = \frac{\mu_0}{4\pi}\, \frac{3 (\vec{m} \cdot \hat{r})\, \hat{r} - \vec{m}}{r^3}`})
	c.para(fmt.Sprintf("The table gives the distance from the centre beyond which that approximation stays within 1 %% and 0.1 %% of the exact field (vector difference; %s), along the axis, in the plane and — the largest over directions between them, in 10° steps — in any direction. The point-dipole description is good to 1 %% everywhere beyond %s from the centre of the coil, and to 0.1 %% beyond %s; nearer than that, use the exact field.",
		refText, Eng(good1, "m", 3), Eng(good01, "m", 3)))
	c.add(doc.Table{Caption: fmt.Sprintf("Distance beyond which the point-dipole field of coil %q is within tolerance", co.Name),
		Header: []string{"Direction from the centre", "Within 1 %", "Within 0.1 %"},
		Rows: [][]doc.Cell{
			{{Text: "Along the axis"}, cell(dr.Axis1), cell(dr.Axis01)},
			{{Text: plane}, cell(dr.Plane1), cell(dr.Plane01)},
			{{Text: "Any direction (largest)", Strong: true}, cell(dr.Any1), cell(dr.Any01)},
		},
		Widths: []float64{2.2, 1.6, 1.6},
		Align:  []doc.Align{doc.Left, doc.Right, doc.Right}})
}

// farFieldUsed reports whether a coil's far field serves the design, so
// that the point-dipole distances get their table: a moment or torque
// design (a requirement on either, a moment objective, a background
// field to turn in, a cored rod), or a probe at least as far from the
// coil's centre as the dipole holds to 1 % along its axis or plane.
func (c *composer) farFieldUsed(co calc.Coil, cored bool, dr calc.DipoleReach) bool {
	d := c.j.Spec.Design
	if momentDesign(c.j) || d.Conditions.BackgroundField.Norm() > 0 || cored {
		return true
	}
	near := math.Min(dr.Axis1, dr.Plane1)
	for _, p := range d.Probes {
		if p.At.Sub(co.Centre).Norm() >= near {
			return true
		}
	}
	return false
}

// pairRegion reports a pair's centre field and homogeneous region, or its
// gradient and linear region.
func (c *composer) pairRegion(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, i int, f coilFigures) {
	pr := cr.Pair
	R := pr.Radius // the turns' mean radius as laid
	s := math.Abs(co.Spacing)
	pc := cs.Pair
	if pc == nil {
		return
	}
	B0 := pc.B0
	rel := fmt.Sprintf("The coil centres are %s apart, %s times the mean radius a = %s", Eng(s, "m", 4), Sig(pr.SpacingRatio, 4), Eng(R, "m", 4))
	if math.Abs(R/(co.MeanDiameter/2)-1) > 1e-4 {
		rel += fmt.Sprintf(" of the turns as laid (the stated mean radius is %s)", Eng(co.MeanDiameter/2, "m", 4))
	}
	pct := format.Tolerance(calc.HelmholtzTolerance) // the one form of a tolerance, as the verification table
	if !co.Opposing {
		var cond string
		if pr.Helmholtz {
			cond = fmt.Sprintf("; the Helmholtz condition (spacing = radius, within ±%s) is met. For thin coils this spacing cancels the second derivative of the axial field at the centre, which makes the field there as flat as two coils can make it.", pct)
		} else {
			cond = fmt.Sprintf("; the Helmholtz condition (spacing = radius, within ±%s) is not met: the Helmholtz spacing for this radius would be %s.", pct, Eng(R, "m", 4))
		}
		c.para(rel + cond)
		c.para(fmt.Sprintf("At the centre of the pair the flux density is %s along the axis. The table gives how far from the centre the field stays within ±1 %% and ±0.1 %% of that value (|B − B0| ≤ tol · |B0|), along the axis and radially in the mid-plane.",
			Eng(B0, "T", 4)))
		c.add(doc.Table{Caption: fmt.Sprintf("Homogeneous region of pair %q, distances from its centre", co.Name),
			Header: []string{"Tolerance", "Along the axis (±)", "Radially in the mid-plane"},
			Rows: [][]doc.Cell{
				{{Text: "±1 %"}, {Text: fmt.Sprintf("%s (%s a)", Eng(pr.Axial1, "m", 3), Sig(pr.Axial1/R, 3)), Strong: true}, {Text: fmt.Sprintf("%s (%s a)", Eng(pr.Radial1, "m", 3), Sig(pr.Radial1/R, 3)), Strong: true}},
				{{Text: "±0.1 %"}, {Text: fmt.Sprintf("%s (%s a)", Eng(pr.Axial01, "m", 3), Sig(pr.Axial01/R, 3))}, {Text: fmt.Sprintf("%s (%s a)", Eng(pr.Radial01, "m", 3), Sig(pr.Radial01/R, 3))}},
			},
			Widths: []float64{1.2, 2, 2},
			Align:  []doc.Align{doc.Left, doc.Right, doc.Right}})
		if !f.Homogeneity {
			return
		}
		pos, ax, ra := pc.Pos, pc.Axial, pc.Radial
		n := c.figure + 1
		dd := figures.DeviationData{Pos: pos, Axial: ax, Radial: ra, Quantity: "B", Bands: []float64{0.01, 0.001}}
		text := fmt.Sprintf("Figure %d plots the departure of the field from its centre value against the distance from the centre, along the axis and radially in the mid-plane, on linear scales: the field stays within 1 %% of its centre value out to %s along the axis and %s radially, and within 0.1 %% out to %s and %s.",
			n, Eng(pr.Axial1, "m", 3), Eng(pr.Radial1, "m", 3), Eng(pr.Axial01, "m", 3), Eng(pr.Radial01, "m", 3))
		caption := fmt.Sprintf("Homogeneity of pair %q: B(z)/B(0) − 1 along the axis and B(ρ)/B(0) − 1 radially in the mid-plane, axial components, with the ±1 %% and ±0.1 %% (shaded) bands", co.Name)
		if r, tol, ok := uniformRequirement(c.j, i); ok {
			if tol != 0.01 && tol != 0.001 {
				dd.Bands = append(dd.Bands, tol)
			}
			tolText := strconv.FormatFloat(100*tol, 'f', -1, 64) + " %"
			dd.Required, dd.RequiredLabel = r, "required "+Eng(r, "m", 3)
			caption += fmt.Sprintf("; dotted: the required uniform radius, %s within %s", Eng(r, "m", 3), tolText)
			reach := c.uniformReach(i)
			verdict := "so the requirement is met"
			if !(reach >= r) {
				verdict = "so the requirement is not met"
			}
			text += fmt.Sprintf(" The requirement (dotted) is a region of radius %s within %s; the field holds that tolerance out to %s in the worse direction, %s.", Eng(r, "m", 3), tolText, Eng(reach, "m", 3), verdict)
		}
		c.para(text)
		c.fig(doc.Figure{Caption: caption,
			Width: figWidth, Height: figHeight * 0.85,
			Draw: figures.DeviationPlot(dd),
			Summary: fmt.Sprintf("Within ±1 %%: ±%s axially, %s radially; within ±0.1 %%: ±%s axially, %s radially.",
				Eng(pr.Axial1, "m", 3), Eng(pr.Radial1, "m", 3), Eng(pr.Axial01, "m", 3), Eng(pr.Radial01, "m", 3))})
		return
	}
	maxwell := ""
	if pr.Maxwell {
		maxwell = fmt.Sprintf(" The spacing is √3 times the mean radius (within ±%s): for thin coils this cancels the cubic term of the axial field at the centre, which makes the gradient as uniform as two coils can make it.", pct)
	}
	c.para(rel + ". The currents oppose: the field vanishes at the centre and grows linearly away from it, which makes the pair a gradient coil." + maxwell)
	G := pr.Gradient
	_, as := axialSymbol(co)
	c.para(fmt.Sprintf("The axial gradient at the centre is %s = %s (the radial gradient is −½ of it, since ∇·B = 0). The local gradient stays within ±%s of the centre value up to %s from the centre along the axis and %s radially in the mid-plane: inside that region B ≈ G·(%s %s − ρ/2 ρ̂) with G the centre gradient and ρ the distance from the axis.",
		gradientSymbol(co), Eng(G, "T/m", 4), format.Tolerance(calc.GradientTolerance), Eng(pr.LinearAxial, "m", 3), Eng(pr.LinearRadial, "m", 3), as, unitVector[as]))
	c.add(doc.Table{Caption: fmt.Sprintf("Gradient of pair %q and its linear region", co.Name),
		Header: []string{"Quantity", "Value"},
		Rows: [][]doc.Cell{
			{{Text: "Axial gradient at the centre, " + gradientSymbol(co)}, {Text: Eng(G, "T/m", 4), Strong: true}},
			{{Text: "Gradient within ±1 %: along the axis (±)"}, {Text: fmt.Sprintf("%s (%s a)", Eng(pr.LinearAxial, "m", 3), Sig(pr.LinearAxial/R, 3))}},
			{{Text: "Gradient within ±1 %: radially in the mid-plane"}, {Text: fmt.Sprintf("%s (%s a)", Eng(pr.LinearRadial, "m", 3), Sig(pr.LinearRadial/R, 3))}},
		},
		Widths: []float64{3, 1.6},
		Align:  []doc.Align{doc.Left, doc.Right}})
	if !f.Gradient {
		return
	}
	bp := cs.Axis.Bore
	n := c.figure + 1
	var spans [][2]float64
	for k := 0; k+1 < len(bp.Ends); k += 2 {
		spans = append(spans, [2]float64{bp.Ends[k], bp.Ends[k+1]})
	}
	grad := gradientSymbol(co)
	d := figures.ProfileData{Axis: axisName(co), Z: bp.Z, Y: bp.Gz, YName: "Axial gradient " + grad, Unit: "T/m",
		Windings: spans, WindingLabel: "coil",
		Marks: []figures.Mark{{X: -pr.LinearAxial, Label: "±1 %"}, {X: pr.LinearAxial, Label: "±1 %"}}}
	text := fmt.Sprintf("Figure %d shows the axial gradient %s along the axis of pair %q on linear scales: it holds at %s within 1 %% out to ±%s from the centre (dotted), then weakens, and reverses beyond the coils (shaded).",
		n, grad, co.Name, Eng(G, "T/m", 4), Eng(pr.LinearAxial, "m", 3))
	caption := fmt.Sprintf("Axial gradient %s along the axis of gradient pair %q (dotted: where it departs by 1 %% from the centre value; shaded: the windings)", grad, co.Name)
	if g, rel, ok := gradientRequirement(c.j, i); ok {
		l := calc.Limit{Relation: rel}
		// The requirement is on the magnitude; the line is drawn on the
		// side of the curve, and its label says so.
		d.Levels = append(d.Levels, figures.Level{Y: math.Copysign(g, G), Label: "required |" + grad + "| " + relText(l) + " " + Eng(g, "T/m", 3) + " at the centre", Local: true})
		caption += "; short bar at the centre: the required gradient"
		met := (rel == calc.AtLeast && math.Abs(G) >= g) || (rel == calc.AtMost && math.Abs(G) <= g)
		text += fmt.Sprintf(" The required gradient, %s %s (the short bar at the centre), is %s at the centre.", relText(l), Eng(g, "T/m", 3), map[bool]string{true: "met", false: "not met"}[met])
	}
	c.para(text)
	c.fig(doc.Figure{Caption: caption + frameNote(co), Width: figWidth, Height: figHeight * 0.85, Draw: figures.Profile(d),
		Summary: fmt.Sprintf("Gradient %s; within ±1 %%: ±%s axially, %s radially.", Eng(G, "T/m", 4), Eng(pr.LinearAxial, "m", 3), Eng(pr.LinearRadial, "m", 3))})
}

// uniformReach is the computed value of coil block i's uniform-radius
// requirement (the smaller of its axial and radial reach), NaN without
// one.
func (c *composer) uniformReach(i int) float64 {
	for _, l := range c.j.Limits {
		if l.Limit.Quantity == "uniform-radius" && l.Coil == i {
			return l.Computed
		}
	}
	return math.NaN()
}

// Figure size in the memo: the text width of an A4 page with our margins.
const (
	figWidth  = 165 * vg.Millimeter
	figHeight = 85 * vg.Millimeter
)

// asDesigned is the torque vector with the field as stated, or, for a
// field stated as a magnitude (whose direction is not known), what stands
// in its place.
func asDesigned(cond calc.Conditions, t calc.Vec) string {
	if cond.BackgroundMagnitudeOnly {
		return "The field is stated as a magnitude, so its direction against the moment is the design angle's; no torque vector is given."
	}
	return fmt.Sprintf("As designed, τ = (%s, %s, %s).", Eng(t[0], "N·m", 3), Eng(t[1], "N·m", 3), Eng(t[2], "N·m", 3))
}

// torqueAngleText says at which angle between moment and field the torque
// is reported (calc.DesignAngle), as a phrase before "it is".
func torqueAngleText(cond calc.Conditions, theta float64) string {
	deg := Sig(theta*180/math.Pi, 3) + "°"
	switch {
	case cond.DesignAngleStated:
		return "at the stated design angle of " + deg
	case cond.BackgroundMagnitudeOnly:
		return "at the design angle of " + deg + ", taken for a field of unknown direction,"
	}
	return "at the angle between moment and field as designed, " + deg + ","
}

// torque reports τ = m × B in the background field.
func (c *composer) torque() {
	d := c.j.Spec.Design
	r := c.j.Results
	Bb := d.Conditions.BackgroundField
	if Bb.Norm() == 0 {
		return
	}
	c.heading(1, "Torque in the background field")
	c.para(templates.Text("torque", map[string]string{
		"B":          Eng(Bb.Norm(), "T", 3),
		"M":          Eng(r.Moment.Norm(), "A·m²", 4),
		"Max":        Eng(r.TorqueMax, "N·m", 4),
		"AtAngle":    torqueAngleText(d.Conditions, r.TorqueAngle),
		"Design":     Eng(r.TorqueDesign, "N·m", 4),
		"AsDesigned": asDesigned(d.Conditions, r.Torque),
	}))
	// No figure: |τ| against the angle is the sine m B sin θ for every
	// design, its peak and design-angle value given above (memo/figsel.go).
	c.para("At other angles θ between moment and field the torque is |τ| = m B sin θ, between zero along the field and the largest value above at right angles to it.")
}

// mapPeakText says where a coil's own map is strongest, as the analysis
// found it (analysis.MapData.Peak and its node).
func mapPeakText(co calc.Coil, m *analysis.MapData, cored bool) string {
	winding := "the winding"
	if cored {
		winding = "the winding or core"
	}
	var where string
	switch {
	case m.PeakCore:
		where = "inside the core"
	case m.PeakBore && m.PeakNear:
		where = "in the bore next to " + winding
	case m.PeakBore:
		where = "in the bore"
	case m.PeakNear:
		where = "next to " + winding
	default:
		where = "away from " + winding
	}
	z := "at the centre plane"
	if m.PeakZ != 0 {
		z = Eng(m.PeakZ, "m", 3) + " along the axis from the centre"
		if m.PeakMirrored {
			z = "±" + z
		}
	}
	across := "on the axis"
	if m.PeakX != 0 {
		across = Eng(math.Abs(m.PeakX), "m", 3) + " from the axis"
		if co.Form == calc.Rectangle {
			across = Eng(math.Abs(m.PeakX), "m", 3) + " from the axis towards a side"
		}
	}
	return fmt.Sprintf("Of the map's points the field is strongest %s, %s: %s, %s", where, Eng(m.Peak, "T", 3), z, across)
}

// mapLevels reads a coil's map: |B| at its centre node and the largest
// |B| on its edge (ok false when either is unknown).
func mapLevels(m *analysis.MapData) (centre, edge float64, ok bool) {
	nx, nz := len(m.X), len(m.Z)
	if nx < 3 || nz < 3 || len(m.B) != nx*nz {
		return 0, 0, false
	}
	centre = m.B[(nx/2)*nz+nz/2]
	edge = math.Inf(-1)
	for ix := range nx {
		for iz := range nz {
			if ix == 0 || ix == nx-1 || iz == 0 || iz == nz-1 {
				if v := m.B[ix*nz+iz]; !math.IsNaN(v) {
					edge = math.Max(edge, v)
				}
			}
		}
	}
	return centre, edge, !math.IsNaN(centre) && !math.IsInf(edge, 0)
}

// allTurnsLie words where a thin winding's turns lie: "all 30 turns lie",
// or "its single turn lies".
func allTurnsLie(n int) string {
	if n == 1 {
		return "its single turn lies"
	}
	return "all " + format.Digits(n) + " turns lie"
}
