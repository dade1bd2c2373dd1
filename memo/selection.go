package memo

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"coilmemo/analysis"
	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/figures"
	"coilmemo/format"
	"coilmemo/spec"
)

// selection writes the Design selection section of a spec with a size
// block: what was left free and required, the feasible region, the front
// of the objective against the binding constraint, the best choices with
// their margins, why the choice wins, and the figure of merit.
func (c *composer) selection() {
	sz := c.j.Sizing
	if sz == nil {
		return
	}
	d := c.j.Spec.Design
	c.heading(1, "Design selection")
	var names []string
	for _, i := range sz.Size.Targets {
		names = append(names, fmt.Sprintf("%q", d.Coils[i].Name))
	}
	coils := "coil " + names[0]
	if len(names) > 1 {
		coils = "coils " + strings.Join(names, ", ") + " (all alike)"
	}
	c.para(fmt.Sprintf("The design fixes everything but %s of %s, which are chosen here for %s. Every whole turn count with every wire was searched: %s, %s of them meeting every requirement that the winding's layout and heat balance decide; %s evaluated in full, best first, to confirm the choice. The rest of this memo is the chosen design's.",
		freeList(sz), coils, sz.Objective, format.Count(sz.Discrete, "choice", "choices"), format.Digits(sz.Feasible), format.Count(sz.Full, "was", "were")))
	c.add(c.requirementTable(sz))
	c.tradeFigure(sz)
	c.frontFigure(sz)
	c.add(c.choiceTable(sz))
	c.para(c.whyText(sz))
	if t := edgeText(sz); t != "" {
		c.para(t)
	}
	if t := c.cornerText(); t != "" {
		c.para(t)
	}
	c.meritText(sz)
}

// freeList names the free keys with their ranges.
func freeList(sz *analysis.Sizing) string {
	s := sz.Size
	var parts []string
	if s.TurnsLine > 0 {
		parts = append(parts, fmt.Sprintf("the turns (%d to %d)", s.TurnsLo, s.TurnsHi))
	}
	if s.WireLine > 0 {
		parts = append(parts, fmt.Sprintf("the wire (%s, %s to %s)", format.Count(len(s.Wires), "wire", "wires"), s.Wires[0].Name(), s.Wires[len(s.Wires)-1].Name()))
	}
	for _, r := range s.Ranges {
		parts = append(parts, fmt.Sprintf("the %s (%s to %s)", keyWords(r.Key), rangeValueOf(r, r.Lo), rangeValueOf(r, r.Hi)))
	}
	switch len(parts) {
	case 1:
		return parts[0]
	case 2:
		return parts[0] + " and " + parts[1]
	}
	return strings.Join(parts[:len(parts)-1], ", ") + " and " + parts[len(parts)-1]
}

// requirementTable lists what the choice had to meet, how many choices
// each excluded, and the margin left at the choice.
func (c *composer) requirementTable(sz *analysis.Sizing) doc.Table {
	var rows [][]doc.Cell
	for k, con := range sz.Constraints {
		what, at := "", "met"
		switch con.Name {
		case "fits":
			what = "the turns fit the coil's length and radial build"
		case "buildable":
			what = "the winding can be wound and lies within the models (thin bundle ≤ a fifth of the diameter, a pair's coils apart)"
		case "apart":
			if len(c.j.Spec.Design.Coils) < 2 {
				continue
			}
			what = "the windings of different coils do not meet"
		case "thermal":
			what = "a steady temperature exists, within the insulation class"
			at = fmt.Sprintf("hottest %s °C", Sig(Celsius(sz.Chosen.Temperature), 4))
		default:
			l := c.j.Spec.Design.Limits[con.Limit]
			what = limitName(analysis.LimitResult{LimitResult: calc.LimitResult{Limit: l}}) + " " + relText(l) + " " + worstValue(l.Quantity, l.Required, 3)
			if m := k - analysis.ConsPhysical; m < len(sz.Chosen.Margins) {
				at = marginText(l, sz.Chosen.Margins[m], quantityAt(sz.Chosen, k))
			}
		}
		if !con.Cheap {
			what += " (judged in full evaluation only)"
		}
		if v := c.constraintValue(sz, k); v != "" {
			at = v + ", " + at
		}
		rows = append(rows, []doc.Cell{{Text: what}, {Text: format.Digits(con.Excluded)}, {Text: constraintRole(sz, k)}, {Text: at}})
	}
	return doc.Table{Caption: "Requirements the choice must meet: the choices each excludes, which requirement binds the choice, and the value and margin left at the choice" + ratioNote(rows, "; "),
		Header: []string{"Requirement", "Choices excluded", "Binds", "At the choice"},
		Rows:   rows, Widths: []float64{2.8, 0.9, 1.0, 2.4},
		Align: []doc.Align{doc.Left, doc.Right, doc.Left, doc.Right}}
}

// constraintRole says whether constraint k binds the choice: the binding
// one (it stops the most of the choices better than the chosen, as the
// text after the choice table counts), the next to bind (the least margin
// besides it), or neither ("—").
func constraintRole(sz *analysis.Sizing, k int) string {
	switch k {
	case sz.Binding:
		return "binding"
	case sz.Next:
		return "next to bind"
	}
	return "—"
}

// constraintValue is the value the choice reaches on constraint k, a
// requirement's quantity in its display unit; "" for a physical one.
func (c *composer) constraintValue(sz *analysis.Sizing, k int) string {
	con := sz.Constraints[k]
	if con.Limit < 0 || k >= len(sz.Chosen.Quantity) || math.IsNaN(sz.Chosen.Quantity[k]) {
		return ""
	}
	l := c.j.Spec.Design.Limits[con.Limit]
	return worstValue(l.Quantity, sz.Chosen.Quantity[k], 4)
}

func relText(l calc.Limit) string {
	if l.Relation == calc.AtMost {
		return "≤"
	}
	return "≥"
}

// marginText writes a margin m, relative to the requirement, as every
// table of margins does (format.RelMargin), and a temperature's as the
// difference in kelvin between the requirement and the value v (K).
func marginText(l calc.Limit, m, v float64) string {
	if l.Quantity == "temperature" || l.Quantity == "surface-temperature" {
		if math.IsNaN(v) {
			return "—"
		}
		d := l.Required - v
		if l.Relation == calc.AtLeast {
			d = -d
		}
		return format.Margin(d, "K")
	}
	if math.IsNaN(m) {
		return "—"
	}
	return format.RelMargin(m)
}

// ratioNote is sep and format.RatioMarginNote when a cell of rows holds a
// margin written as a ratio ("×73", "72.74 kV/T, ×73"), "" otherwise.
func ratioNote(rows [][]doc.Cell, sep string) string {
	for _, r := range rows {
		for _, c := range r {
			if strings.HasPrefix(c.Text, "×") || strings.Contains(c.Text, ", ×") {
				return sep + format.RatioMarginNote
			}
		}
	}
	return ""
}

// quantityAt is the value candidate cd reaches on constraint k (SI), NaN
// when undecided.
func quantityAt(cd analysis.Candidate, k int) float64 {
	if k < 0 || k >= len(cd.Quantity) {
		return math.NaN()
	}
	return cd.Quantity[k]
}

// limitConstraint is the constraint of sz that judges limit k, -1 for
// none.
func limitConstraint(sz *analysis.Sizing, k int) int {
	for i, con := range sz.Constraints {
		if i >= analysis.ConsPhysical && con.Limit == k {
			return i
		}
	}
	return -1
}

// tradeFigure plots every choice, moment against power (or conductor
// mass, for a mass objective), one trace per wire, with the requirements
// on them and the choice marked.
func (c *composer) tradeFigure(sz *analysis.Sizing) {
	yName, yUnit, yq := "Power", "W", "power"
	y := func(s analysis.SizeCurve, i int) float64 { return s.Power[i] }
	chosenY := sz.Chosen.Power
	if sz.Objective == spec.MinimumMass {
		yName, yUnit, yq = "Conductor mass", "kg", "mass"
		y = func(s analysis.SizeCurve, i int) float64 { return s.Mass[i] }
		chosenY = sz.Chosen.Mass
	}
	td := figures.TradeData{XName: "Magnetic moment |m|", XUnit: "A·m²", YName: yName, YUnit: yUnit,
		ChosenX: sz.Chosen.Moment, ChosenY: chosenY,
		FeasibleLabel: "meets the layout and heat requirements", OtherLabel: "excluded"}
	moment := false
	// Each trace is labelled with its wire: the gauge number alone when
	// every wire is a gauge (the caption says AWG), else the wire's name.
	gauges := true
	for _, s := range sz.Curves {
		gauges = gauges && s.Wire.Gauge != calc.NoGauge
	}
	for _, s := range sz.Curves {
		ts := figures.TradeSeries{Feasible: s.Feasible, Label: s.Wire.Name()}
		if gauges {
			ts.Label = strconv.Itoa(s.Wire.Gauge)
		}
		for i := range s.Turns {
			ts.X = append(ts.X, s.Moment[i])
			ts.Y = append(ts.Y, y(s, i))
			moment = moment || s.Moment[i] > 0
		}
		td.Series = append(td.Series, ts)
	}
	if !moment {
		return // no moment to trade (an opposing pair)
	}
	for _, l := range c.j.Spec.Design.Limits {
		if l.Subject != "" {
			continue
		}
		switch l.Quantity {
		case "moment":
			td.XLimits = append(td.XLimits, l.Required)
		case yq:
			td.YLimits = append(td.YLimits, l.Required)
		}
	}
	c.para(fmt.Sprintf("Figure %d shows every choice searched, one trace per wire over its turn counts, labelled with the wire at its top: its magnetic moment across and its %s up. With the drive fixed, the wire chiefly sets the moment and the turns the %s; the dots are the choices that meet every requirement the layout and heat balance decide, the dashed lines the requirements, and the ring the choice.",
		c.figure+1, strings.ToLower(yName), strings.ToLower(yName)))
	named := "each trace labelled with its wire at its top"
	if gauges {
		named = "each trace labelled with its wire gauge, AWG, at its top"
	}
	c.fig(doc.Figure{Caption: fmt.Sprintf("The choices searched: %s against moment, per wire (%s)", strings.ToLower(yName), named),
		Width: figWidth, Height: figHeight * 0.8, Draw: figures.Trade(td)})
}

// frontFigure plots the Pareto front of the objective against the
// binding constraint's quantity.
func (c *composer) frontFigure(sz *analysis.Sizing) {
	if len(sz.Front) < 2 || sz.Binding < analysis.ConsPhysical {
		return
	}
	con := sz.Constraints[sz.Binding]
	l := c.j.Spec.Design.Limits[con.Limit]
	q := spec.LimitQuantities[l.Quantity]
	oName, oUnit := objectiveAxis(sz.Objective)
	td := figures.TradeData{XName: limitName(analysis.LimitResult{LimitResult: calc.LimitResult{Limit: l}}), XUnit: displayUnit(q.Unit),
		YName: oName, YUnit: oUnit, Line: true, XLimits: []float64{l.Required},
		ChosenX: sz.Chosen.Quantity[sz.Binding], ChosenY: sz.Chosen.Objective, FeasibleLabel: "best " + strings.ToLower(oName) + " reachable"}
	if q.Unit == "degC" {
		return // a temperature front reads better in the table
	}
	var ts figures.TradeSeries
	for _, p := range sz.Front {
		ts.X = append(ts.X, p.Quantity)
		ts.Y = append(ts.Y, p.Objective)
		ts.Feasible = append(ts.Feasible, true)
	}
	td.Series = []figures.TradeSeries{ts}
	c.para(fmt.Sprintf("Figure %d is the front of the trade: the best %s any choice reaches at each value of %s, among the choices that meet every other requirement the layout and heat balance decide. The requirement (dashed) cuts the front where the choice sits; relaxing it moves the choice along the front.",
		c.figure+1, strings.ToLower(oName), l.Quantity))
	c.fig(doc.Figure{Caption: fmt.Sprintf("Best %s against %s", strings.ToLower(oName), l.Quantity),
		Width: figWidth, Height: figHeight * 0.7, Draw: figures.Trade(td)})
}

func objectiveAxis(o spec.Objective) (name, unit string) {
	switch o {
	case spec.MinimumPower:
		return "Power", "W"
	case spec.MinimumMass:
		return "Conductor mass", "kg"
	case spec.MaximumMoment:
		return "Magnetic moment", "A·m²"
	}
	return "Moment per power", "A·m²/W"
}

// objectiveValue writes an objective's value.
func objectiveValue(o spec.Objective, v float64) string {
	_, unit := objectiveAxis(o)
	return Eng(v, unit, 4)
}

// choiceTable lists the choice and the runners-up with their margins.
func (c *composer) choiceTable(sz *analysis.Sizing) doc.Table {
	ls := c.j.Spec.Design.Limits
	head := []string{"Choice", "Wire", "Turns"}
	for _, r := range sz.Size.Ranges {
		head = append(head, capitalise(keyWords(r.Key)))
	}
	oName, _ := objectiveAxis(sz.Objective)
	head = append(head, oName)
	for _, l := range ls {
		head = append(head, capitalise(keyWords(l.Quantity))+" margin")
	}
	var rows [][]doc.Cell
	all := append([]analysis.Candidate{sz.Chosen}, sz.RunnersUp...)
	for i, cd := range all {
		label := "chosen"
		if i > 0 {
			label = fmt.Sprintf("runner-up %d", i)
		}
		row := []doc.Cell{{Text: label, Strong: i == 0}, {Text: cd.Wire.Name()}, {Text: fmt.Sprint(cd.Turns)}}
		for k, r := range sz.Size.Ranges {
			row = append(row, doc.Cell{Text: rangeValueOf(r, cd.Values[k])})
		}
		row = append(row, doc.Cell{Text: objectiveValue(sz.Objective, cd.Objective)})
		for k, l := range ls {
			m := math.NaN()
			if k < len(cd.Margins) {
				m = cd.Margins[k]
			}
			row = append(row, doc.Cell{Text: marginText(l, m, quantityAt(cd, limitConstraint(sz, k)))})
		}
		rows = append(rows, row)
	}
	align := []doc.Align{doc.Left, doc.Left}
	for range head[2:] {
		align = append(align, doc.Right)
	}
	head, rows = unitsToHeader(head, rows, 2)
	// The units in the headers keep the values short enough for one line
	// each; the headers may take two or three.
	widths := []float64{1.25, 0.95, 0.7}
	for range head[3:] {
		widths = append(widths, 1)
	}
	return doc.Table{Caption: "The choice and the best choice of each other wire that meets every requirement, with the margin left on each requirement (a temperature's in kelvin" + ratioNote(rows, "; ") + ")",
		Header: head, Rows: rows, Widths: widths, Align: align}
}

// unitsToHeader moves a unit shared by every cell of a column, from
// column from on, into its header ("Power (mW)"), so that the cells hold
// numbers alone and the column stays narrow.
func unitsToHeader(head []string, rows [][]doc.Cell, from int) ([]string, [][]doc.Cell) {
	for j := from; j < len(head); j++ {
		unit := ""
		for i, row := range rows {
			if j >= len(row) {
				unit = ""
				break
			}
			k := strings.LastIndex(row[j].Text, " ")
			u := ""
			if k > 0 {
				u = row[j].Text[k+1:]
			}
			if u == "" || strings.ContainsAny(u, "0123456789") || (i > 0 && u != unit) {
				unit = ""
				break
			}
			unit = u
		}
		if unit == "" || len(rows) == 0 {
			continue
		}
		head[j] += " (" + unit + ")"
		for _, row := range rows {
			row[j].Text = strings.TrimSuffix(row[j].Text, " "+unit)
		}
	}
	return head, rows
}

func rangeValueOf(r spec.FreeRange, v float64) string {
	if v == 0 {
		return "0"
	}
	if u := map[string]string{"current": "A", "voltage": "V", "switch-off": "s", "on-time": "s", "frequency": "Hz"}[r.Key]; u != "" {
		return Eng(v, u, 4)
	}
	if r.Key == "radial-build" {
		return buildText(v) // as the cross-section and page 1 write it
	}
	return Eng(v, "m", 4)
}

// whyText says why the choice wins and what binds next.
func (c *composer) whyText(sz *analysis.Sizing) string {
	ch := sz.Chosen
	var b strings.Builder
	word, what := "least", strings.TrimPrefix(sz.Objective.String(), "minimum ")
	if sz.Objective.Maximise() {
		word, what = "most", strings.TrimPrefix(sz.Objective.String(), "maximum ")
	}
	fmt.Fprintf(&b, "The choice, %s with %s, has the %s %s of all the choices that meet every requirement: %s.",
		ch.Wire.Name(), format.Count(ch.Turns, "turn", "turns"), word, what, objectiveValue(sz.Objective, ch.Objective))
	if len(sz.RunnersUp) > 0 {
		r := sz.RunnersUp[0]
		fmt.Fprintf(&b, " The best of the other wires, %s with %s, reaches %s.", r.Wire.Name(), format.Count(r.Turns, "turn", "turns"), objectiveValue(sz.Objective, r.Objective))
	}
	if sz.Binding >= 0 {
		con := sz.Constraints[sz.Binding]
		fmt.Fprintf(&b, " Each of the %s with a better %s fails a requirement; the one that stops most of them (%s) is %s.",
			format.Count(sz.Better, "choice", "choices"), strings.ToLower(oName(sz.Objective)), format.Digits(sz.BindingCount), c.constraintName(con, sz.Binding))
	}
	if sz.Next >= 0 {
		con := sz.Constraints[sz.Next]
		l := c.j.Spec.Design.Limits[con.Limit]
		fmt.Fprintf(&b, " The next requirement to bind is %s, with %s left.", c.constraintName(con, sz.Next), marginText(l, sz.Chosen.Margins[sz.Next-analysis.ConsPhysical], quantityAt(sz.Chosen, sz.Next)))
	}
	return b.String()
}

func oName(o spec.Objective) string { n, _ := objectiveAxis(o); return n }

func (c *composer) constraintName(con analysis.Constraint, k int) string {
	switch con.Name {
	case "fits":
		return "the fit of the turns in the winding space"
	case "buildable":
		return "a buildable winding"
	case "apart":
		return "the space between the coils"
	case "thermal":
		return "the insulation class"
	}
	l := c.j.Spec.Design.Limits[con.Limit]
	return limitName(analysis.LimitResult{LimitResult: calc.LimitResult{Limit: l}}) + " " + relText(l) + " " + worstValue(l.Quantity, l.Required, 3)
}

// meritText states the figure of merit of an air-core winding and its
// derivation.
func (c *composer) meritText(sz *analysis.Sizing) {
	if math.IsNaN(sz.Merit) {
		return
	}
	c.para("Which choices matter: with N turns of conductor section a carrying I, the moment is m = I ΣA, the power P = I² ρ Σℓ / a and the conductor mass M = ρm a Σℓ (ΣA the areas the turns enclose, Σℓ their length, ρ the resistivity at the winding's temperature, ρm the conductor's density). The current, the turn count and the section cancel from m²/(P·M):")
	co := c.j.Spec.Design.Coils[sz.Size.Targets[0]]
	w := c.j.Results.Coils[sz.Size.Targets[0]].Winding
	c.derive(Step{What: "Figure of merit of an air-core winding (m = I·A of each turn, Jackson, Classical Electrodynamics, 3rd ed., §5.6; R = ρℓ/a), over the turns of one coil",
		Symbolic: `\frac{m^2}{P\,M} = \frac{(\sum A / \sum \ell)^2}{\rho\,\rho_m}`,
		Numbers: fmt.Sprintf(`\frac{(%s / %s)^2}{%s \cdot %s}`, Q(w.AreaSum, "m²", 4), Q(w.WireLength, "m", 4),
			Q(sz.MeritResistivity, "Ω·m", 4), Q(co.Wire.Material.Density, "kg/m³", 4)),
		Result: Q(sz.Merit, "A²·m⁴/(W·kg)", 4)})
	c.para(fmt.Sprintf("It depends on the geometry of the turns alone. Turns and wire only trade current against voltage at the same merit, so once the winding space is fixed, the moment a given power and copper mass buy is fixed too: m = √(%s × P × M). More moment for the same power and mass needs larger turns (the merit grows as the square of their radius) or a conductor with a smaller ρ ρm.",
		Eng(sz.Merit, "A²·m⁴/(W·kg)", 4)))
}

// keyPhrase names a coil key in words, with its article: "a radial
// build" for radial-build, "an inner diameter" for inner-diameter.
func keyPhrase(key string) string {
	words := keyWords(key)
	if strings.ContainsRune("aeiou", rune(words[0])) {
		return "an " + words
	}
	return "a " + words
}

// keyWords is a spec key or limit quantity as words: "radial build".
func keyWords(key string) string { return strings.ReplaceAll(key, "-", " ") }

// sizingSummary is page 1's line on a sized design: what was chosen, for
// what, out of how many choices.
func (c *composer) sizingSummary() (doc.Paragraph, bool) {
	sz := c.j.Sizing
	if sz == nil {
		return doc.Paragraph{}, false
	}
	ch := sz.Chosen
	var vals []string
	for k, r := range sz.Size.Ranges {
		vals = append(vals, keyPhrase(r.Key)+" of "+rangeValueOf(r, ch.Values[k]))
	}
	what := ch.Wire.Name() + ", " + format.Count(ch.Turns, "turn", "turns")
	if len(vals) > 0 {
		what += ", " + strings.Join(vals, ", ")
	}
	return doc.Paragraph{Spans: []doc.Span{{Text: "Sized for " + sz.Objective.String() + ": ", Strong: true},
		{Text: fmt.Sprintf("%s (%s), the best that meets every requirement of the %s searched; see Design selection.",
			what, objectiveValue(sz.Objective, ch.Objective), format.Count(sz.Discrete, "choice", "choices"))}}}, true
}

// cornerText says, for a spec with tolerances, that the search judged the
// nominal design, and which requirements the choice then fails at a
// tolerance corner.
func (c *composer) cornerText() string {
	wc := c.j.WorstCase
	if wc == nil {
		return ""
	}
	var failing []string
	for i, l := range c.j.Limits {
		if i < len(wc.Limits) && wc.Limits[i].NominalPass && !l.Pass {
			failing = append(failing, limitName(l)+" "+relText(l.Limit)+" "+worstValue(l.Limit.Quantity, l.Limit.Required, 3))
		}
	}
	if len(failing) == 0 {
		return "The search judges each choice at its nominal values; the chosen design also meets every requirement at every corner of the tolerances (see Worst case)."
	}
	return fmt.Sprintf("The search judges each choice at its nominal values. At the corners of the tolerances the chosen design fails %s (see Worst case): size it again with that requirement tightened by the spread the Worst case section shows.",
		strings.Join(failing, " and "))
}

// edgeText says when the choice sits at an end of a free range, where a
// wider range may hold a better design.
func edgeText(sz *analysis.Sizing) string {
	s, ch := sz.Size, sz.Chosen
	var ends []string
	if s.TurnsLine > 0 {
		switch ch.Turns {
		case s.TurnsHi:
			ends = append(ends, fmt.Sprintf("the most turns allowed (%d)", ch.Turns))
		case s.TurnsLo:
			ends = append(ends, fmt.Sprintf("the fewest turns allowed (%d)", ch.Turns))
		}
	}
	if s.WireLine > 0 && len(s.Wires) > 1 {
		switch ch.WireIndex {
		case 0:
			ends = append(ends, "the thickest wire listed ("+ch.Wire.Name()+")")
		case len(s.Wires) - 1:
			ends = append(ends, "the thinnest wire listed ("+ch.Wire.Name()+")")
		}
	}
	for k, r := range s.Ranges {
		v, tol := ch.Values[k], 1e-3*(r.Hi-r.Lo)
		switch {
		case v >= r.Hi-tol:
			ends = append(ends, fmt.Sprintf("the top of the %s range (%s)", keyWords(r.Key), rangeValueOf(r, r.Hi)))
		case v <= r.Lo+tol && r.Key != "radial-build":
			ends = append(ends, fmt.Sprintf("the bottom of the %s range (%s)", keyWords(r.Key), rangeValueOf(r, r.Lo)))
		}
	}
	if len(ends) == 0 {
		return ""
	}
	return "The choice sits at " + strings.Join(ends, " and at ") + ": a design beyond that end may be better still, so widen the range there if the build allows it."
}
