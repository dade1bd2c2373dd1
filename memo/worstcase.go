package memo

import (
	"coilmemo/format"
	"fmt"
	"math"
	"strings"

	"coilmemo/analysis"
	"coilmemo/calc"
	"coilmemo/calc/units"
	"coilmemo/doc"
	"coilmemo/figures"
	"coilmemo/spec"

	"gonum.org/v1/plot/vg"
)

// worstNames are the headline results of the worst case as the memo names
// them.
var worstNames = map[string]string{
	"moment": "Magnetic moment |m|", "torque": "Maximum torque", "field-center": "|B| at the origin",
	"current": "Current", "voltage": "Voltage", "power": "Power", "temperature": "Hottest winding temperature",
	"resistance": "Hot resistance", "switch-off-voltage": "Switch-off voltage",
}

// worstName is headline result q as the memo names it: the power, the
// "power" limit quantity's, is averaged over the duty cycle, and says so
// where some coil runs on one.
func (c *composer) worstName(q string) string {
	if q == "power" {
		return powerLabel(c.j.Results)
	}
	return worstNames[q]
}

// worstValue formats an SI value of a limit quantity in its display unit.
func worstValue(q string, v float64, sig int) string {
	unit := displayUnit(spec.LimitQuantities[q].Unit)
	if unit == "°C" {
		v = Celsius(v)
	}
	return Eng(v, unit, sig)
}

// cornerCode writes corner h as one sign per tolerance line, in the order
// of the tolerance table: − for the low end, + for the high end;
// "nominal" for the nominal design.
func cornerCode(wc *analysis.WorstCase, h int) string {
	if h < 0 || h >= len(wc.Corners) {
		return "nominal"
	}
	var b strings.Builder
	for i := range wc.Tolerances.Items {
		if wc.Corners[h].High&(1<<i) != 0 {
			b.WriteString("+")
		} else {
			b.WriteString("−")
		}
	}
	return b.String()
}

// tolEnds writes a tolerance line's two ends as the corners take them.
func tolEnds(t spec.Tolerance, d calc.Design) (lo, hi string) {
	switch t.Mode {
	case spec.Relative:
		return fmt.Sprintf("−%s %%", Sig(-t.Lo*100, 3)), fmt.Sprintf("+%s %%", Sig(t.Hi*100, 3))
	case spec.Offset:
		if t.Key == "turns" {
			return fmt.Sprintf("−%g turns", -t.Lo), fmt.Sprintf("+%g turns", t.Hi)
		}
		if unit := map[units.Dim]string{units.Length: "m", units.Time: "s", units.Frequency: "Hz"}[t.Dim]; unit != "" {
			return "−" + Eng(-t.Lo, unit, 3), "+" + Eng(t.Hi, unit, 3)
		}
		return fmt.Sprintf("−%g", -t.Lo), fmt.Sprintf("+%g", t.Hi)
	case spec.Range:
		if t.Key == "ambient" {
			return Eng(Celsius(t.Lo), "°C", 3), Eng(Celsius(t.Hi), "°C", 3)
		}
		return Eng(t.Lo, "T", 3), Eng(t.Hi, "T", 3)
	case spec.Standard:
		var l, h []string
		for _, co := range d.Coils {
			if a, b, ok := spec.WireTolerance(co.Wire.Gauge); ok {
				l, h = append(l, Eng(a, "m", 3)), append(h, Eng(b, "m", 3))
			}
		}
		return strings.Join(l, ", "), strings.Join(h, ", ")
	}
	return "", ""
}

// worstCase writes the Worst case section: nothing without a tolerances
// block.
func (c *composer) worstCase() {
	wc := c.j.WorstCase
	if wc == nil {
		return
	}
	d := c.j.Spec.Design
	t := wc.Tolerances
	c.heading(1, "Worst case")
	c.para(fmt.Sprintf("The design is evaluated at every combination of the extremes of its %s: %d corners, each a complete evaluation — winding, steady temperature with the resistance following it, operating point, moment, field, switching and every requirement. Temperature stays coupled: a hot winding has more resistance, so under voltage drive less current and moment; a cold one draws more current and gives a larger switch-off spike. A corner is written as one sign per tolerance line in the order of the table below (− low end, + high end). The corners bound a result where it moves monotonically with each tolerance over its range.",
		format.Count(len(t.Items), "tolerance line", "tolerance lines"), len(wc.Corners)))
	var rows [][]doc.Cell
	for _, it := range t.Items {
		lo, hi := tolEnds(it, d)
		src := ""
		if it.Mode == spec.Standard {
			src = " (" + spec.WireToleranceSource + ")"
		}
		rows = append(rows, []doc.Cell{{Text: it.Key}, {Text: it.Raw + src}, {Text: lo}, {Text: hi}})
	}
	c.add(doc.Table{Caption: "Tolerances (the tolerances block, line by line)", Header: []string{"Parameter", "As written", "Low end (−)", "High end (+)"},
		Rows: rows, Widths: []float64{1.3, 3.2, 1.3, 1.3}, Align: []doc.Align{doc.Left, doc.Left, doc.Right, doc.Right}})

	rows = nil
	for _, r := range wc.Results {
		rows = append(rows, []doc.Cell{{Text: c.worstName(r.Quantity)},
			{Text: worstValue(r.Quantity, r.Min, 4)}, {Text: cornerCode(wc, r.CornerMin)},
			{Text: worstValue(r.Quantity, r.Nominal, 4)},
			{Text: worstValue(r.Quantity, r.Max, 4)}, {Text: cornerCode(wc, r.CornerMax)}})
	}
	c.add(doc.Table{Caption: "Headline results over the corners", Header: []string{"Result", "Minimum", "at corner", "Nominal", "Maximum", "at corner"},
		Rows: rows, Widths: []float64{2.2, 1.2, 0.9, 1.2, 1.2, 0.9}, Align: []doc.Align{doc.Left, doc.Right, doc.Center, doc.Right, doc.Right, doc.Center}})

	if len(c.j.Limits) > 0 {
		rows = nil
		for i, l := range c.j.Limits {
			wl := wc.Limits[i]
			q := l.Limit.Quantity
			st := doc.Pass
			if !l.Pass {
				st = doc.Fail
			}
			rows = append(rows, []doc.Cell{{Text: limitName(l)}, {Text: worstValue(q, l.Computed, 4)},
				{Text: worstValue(q, wl.Worst, 4)}, {Text: cornerCode(wc, wl.Corner)},
				{Text: fmt.Sprintf("%d of %d", wl.Failing, len(wc.Corners))}, {Text: st.String(), Status: st, Strong: true}})
		}
		c.add(doc.Table{Caption: "Requirements at every corner (PASS only when met at nominal and at every corner)",
			Header: []string{"Requirement", "Nominal", "Worst", "at corner", "Corners missed", "Status"},
			Rows:   rows, Widths: []float64{1.8, 1.2, 1.2, 0.9, 1.1, 0.8}, Align: []doc.Align{doc.Left, doc.Right, doc.Right, doc.Center, doc.Right, doc.Center}})
	}
	c.worstSuppression()
	c.sensitivity(wc)
	c.monteCarlo(wc)
	c.worstDerivation(wc)
}

// worstSuppression tabulates the switch voltage with the suggested
// suppression over the corners, for every coil block whose series
// resistor is sized over them (analysis.Suppression).
func (c *composer) worstSuppression() {
	d := c.j.Spec.Design
	var rows [][]doc.Cell
	var why []string
	for i, co := range d.Coils {
		fo := fittedOverOf(c.j, i)
		if fo == nil || i >= len(c.j.Results.Coils) {
			continue
		}
		s := c.j.Results.Coils[i].Switch
		st := doc.Pass
		if !fo.Within {
			st = doc.Fail
		}
		rs := "none"
		if !math.IsNaN(fo.Resistor) {
			rs = Eng(fo.Resistor, "Ω", 2)
		}
		rows = append(rows, []doc.Cell{{Text: co.Name}, {Text: rs}, {Text: Eng(s.SwitchVoltage, "V", 4)},
			{Text: Eng(fo.SwitchVoltage, "V", 4)}, {Text: fo.worstAt}, {Text: Eng(fo.Clamp, "V", 3)}, {Text: st.String(), Status: st, Strong: true}})
		if fo.Nominal > fo.Resistor || math.IsNaN(fo.Resistor) {
			w := fmt.Sprintf("for coil %q the %s the nominal design alone would take puts the switch at %s at corner %s, above %s", co.Name,
				Eng(fo.Nominal, "Ω", 2), Eng(fo.NominalWorst, "V", 3), cornerOf(fo, fo.NominalCorner), Eng(fo.Clamp, "V", 3))
			if math.IsNaN(fo.Resistor) {
				w += ", and no resistor leaves room above that voltage at every corner: a bare freewheeling diode is suggested"
			} else {
				w += fmt.Sprintf(", so the lower %s is fitted", Eng(fo.Resistor, "Ω", 2))
			}
			why = append(why, w)
		}
	}
	if len(rows) == 0 {
		return
	}
	text := "The series resistor of the suggested resistor–diode suppression (Inductance and switching) is sized over the corners: the switch sees the supply (under current drive, the voltage the current source must deliver across the coil) plus the current it opens times the resistor, and a cold corner's winding draws the most current, so the resistor fitted is the E12 value at or below the smallest (Vₘₐₓ − Vₛ)/I over the nominal design and every corner, and the switch voltage with it is judged at every corner (the diode drop of about 0.7 V is neglected)."
	if len(why) > 0 {
		text += " " + capitalise(strings.Join(why, "; ")) + "."
	}
	c.para(text)
	c.add(doc.Table{Caption: "Switch voltage with the suggested suppression at every corner (PASS when within the limit at nominal and at every corner)",
		Header: []string{"Coil", "Resistor fitted", "Nominal", "Worst", "at corner", "Limit", "Status"},
		Rows:   rows, Widths: []float64{1.5, 1.0, 1.0, 1.0, 0.9, 0.8, 0.8}, Align: []doc.Align{doc.Left, doc.Right, doc.Right, doc.Right, doc.Center, doc.Right, doc.Center}})
}

// sensitivity tabulates and plots each tolerance's swing of each result,
// the others at nominal, in per cent of the nominal value.
func (c *composer) sensitivity(wc *analysis.WorstCase) {
	t := wc.Tolerances
	var names []string
	for _, it := range t.Items {
		names = append(names, it.Key)
	}
	header := append([]string{"Result"}, names...)
	var rows [][]doc.Cell
	var fd figures.SensitivityData
	fd.Tolerances = names
	for r, res := range wc.Results {
		row := []doc.Cell{{Text: c.worstName(res.Quantity)}}
		if res.Quantity == "temperature" {
			// A swing in K against the nominal in °C would mislead: the
			// temperature's swings stay in kelvin, on an axis of their own.
			for i := range t.Items {
				row = append(row, doc.Cell{Text: signed(wc.Swing[r][i], "K")})
			}
			rows = append(rows, row)
			fd.Kelvin = append(fd.Kelvin, c.worstName(res.Quantity))
			fd.KelvinSwing = append(fd.KelvinSwing, wc.Swing[r])
			continue
		}
		var pct []float64
		for i := range t.Items {
			p := 100 * wc.Swing[r][i] / math.Abs(res.Nominal)
			pct = append(pct, p)
			row = append(row, doc.Cell{Text: signed(p, "%")})
		}
		rows = append(rows, row)
		fd.Results = append(fd.Results, c.worstName(res.Quantity))
		fd.Swing = append(fd.Swing, pct)
	}
	widths := []float64{2.2}
	align := []doc.Align{doc.Left}
	for range t.Items {
		widths, align = append(widths, 1), append(align, doc.Right)
	}
	c.para("Each tolerance moved alone from its low to its high end, the others at nominal, changes each result by the amount below (per cent of the nominal value; the temperature in kelvin). The largest entry in a row is the tolerance that moves that result most.")
	c.add(doc.Table{Caption: "Sensitivity: change of each result over each tolerance's range", Header: header, Rows: rows, Widths: widths, Align: align})
	if len(fd.Results)+len(fd.Kelvin) == 0 {
		return
	}
	text := fmt.Sprintf("Figure %d shows the same swings as bars, one group per result and one bar per tolerance, in the legend's order from the top of each group; a bar right of zero is a result that rises from the tolerance's low end to its high end.", c.figure+1)
	what, hold := longestBars(fd.Results, names, fd.Swing, "%")
	if what != "" {
		text += " " + what + ": " + hold + "."
	}
	if kw, kh := longestBars(fd.Kelvin, names, fd.KelvinSwing, "K"); kw != "" {
		text += " Below, in kelvin: " + lowerFirst(kw)
		if kh != hold {
			text += ": " + kh
		}
		text += "."
	}
	c.para(text)
	caption := "Sensitivity of each result to each tolerance (swing from low to high end, % of nominal"
	if len(fd.Kelvin) > 0 {
		caption += "; the temperature below, in K"
	}
	caption += "; one colour per tolerance, as in the legend; right of zero: the result rises with the tolerance)"
	c.fig(doc.Figure{Caption: caption,
		Width: figWidth, Height: figHeight * vg.Length(0.8+0.15*float64(len(fd.Kelvin))), Draw: figures.SensitivityFigure(fd),
		Summary: fmt.Sprintf("Bars for %s and %s.", format.Count(len(fd.Results)+len(fd.Kelvin), "result", "results"), format.Count(len(names), "tolerance", "tolerances"))})
}

// longestBars says which bars of a sensitivity figure's panel are the
// longest: every swing (results[r] over tolerance names[j]) that reads as
// the longest at the three figures the sensitivity table shows, so that
// bars of one length are named together rather than one of them picked;
// and, in hold, which tolerance to hold or design for. "" without a bar.
func longestBars(results, names []string, swing [][]float64, unit string) (what, hold string) {
	big := 0.0
	for _, row := range swing {
		for j, v := range row {
			if j < len(names) && !math.IsNaN(v) {
				big = math.Max(big, math.Abs(v))
			}
		}
	}
	if !(big > 0) {
		return "", ""
	}
	shown := Sig(big, 3)
	// The tied results, per tolerance, tolerances in table order.
	var tols []int
	of := map[int][]string{}
	n := 0
	for j := range names {
		for i, row := range swing {
			if j < len(row) && !math.IsNaN(row[j]) && Sig(math.Abs(row[j]), 3) == shown {
				if len(of[j]) == 0 {
					tols = append(tols, j)
				}
				of[j] = append(of[j], lowerFirst(results[i]))
				n++
			}
		}
	}
	var parts, others []string
	ambient := false
	for _, j := range tols {
		parts = append(parts, fmt.Sprintf("of the %s over the %s tolerance", joinAnd(of[j]), names[j]))
		if names[j] == "ambient" {
			ambient = true
		} else {
			others = append(others, names[j])
		}
	}
	var h []string
	switch len(others) {
	case 0:
	case 1:
		h = append(h, "the "+others[0]+" tolerance is the one to hold tightest")
	default:
		h = append(h, "the "+joinAnd(others)+" tolerances are the ones to hold tightest")
	}
	if ambient {
		h = append(h, "the ambient range is set by where the coil works, not by how it is made, so it cannot be held tighter: the design has to meet its requirements over the whole of it")
	}
	hold = strings.Join(h, "; ")
	if n == 1 {
		return fmt.Sprintf("The longest bar is the swing %s, %s %s", parts[0], shown, unit), hold
	}
	return fmt.Sprintf("The longest bars tie at %s %s each (to the three figures of the table): the swings %s",
		shown, unit, joinAnd(parts)), hold
}

// lowerFirst lowers a result name's first letter ("Current" → "current"),
// leaving a symbol ("|B| at the origin") as it is.
func lowerFirst(s string) string {
	if s == "" {
		return s
	}
	return strings.ToLower(s[:1]) + s[1:]
}

// signed writes a swing in the sensitivity table to three significant
// figures with its sign: none on a zero ("0 %", a result the tolerance
// does not move), and "< 0.001" for a swing smaller than that, never a
// power of ten.
func signed(v float64, unit string) string {
	switch {
	case v == 0:
		return "0 " + unit
	case math.Abs(v) < 1e-3:
		return "< 0.001 " + unit
	}
	s := Sig(math.Abs(v), 3)
	if v < 0 {
		s = "−" + s
	} else {
		s = "+" + s
	}
	return s + " " + unit
}

// monteCarlo writes the sampled distribution and the yield.
func (c *composer) monteCarlo(wc *analysis.WorstCase) {
	mc := wc.MC
	if mc == nil {
		return
	}
	c.heading(2, "Monte Carlo")
	c.para(fmt.Sprintf("%d designs are drawn with every tolerance independent and uniformly distributed over its range (turns uniformly over the whole numbers of theirs), from a PCG generator with a fixed seed, so the memo is the same at every build. Each sample is evaluated as a corner is, except that the rise of an on/off cycle's peak above the steady duty-averaged temperature is interpolated between its values at the corners instead of being integrated for every sample. %s of the samples meet every requirement.",
		mc.Samples, Sig(100*mc.Yield, 4)+" %"))
	var rows [][]doc.Cell
	for r, res := range wc.Results {
		v := mc.Values[r]
		row := []doc.Cell{{Text: c.worstName(res.Quantity)}}
		for _, p := range []float64{5, 50, 95} {
			row = append(row, doc.Cell{Text: worstValue(res.Quantity, analysis.Percentile(v, p), 4)})
		}
		rows = append(rows, row)
	}
	c.add(doc.Table{Caption: fmt.Sprintf("Percentiles of the headline results over %d samples (nearest rank)", mc.Samples),
		Header: []string{"Result", "5th", "50th (median)", "95th"}, Rows: rows,
		Widths: []float64{2.4, 1.3, 1.3, 1.3}, Align: []doc.Align{doc.Left, doc.Right, doc.Right, doc.Right}})
	if len(wc.Results) > 0 && wc.Results[0].Quantity == "moment" && len(mc.Values[0]) > 0 {
		var req []float64
		for _, l := range c.j.Spec.Design.Limits {
			if l.Quantity == "moment" && l.Subject == "" {
				req = append(req, l.Required)
			}
		}
		v := mc.Values[0]
		text := fmt.Sprintf("Figure %d shows how the magnetic moment spreads over the samples: from %s to %s, 90 %% of them between %s and %s.",
			c.figure+1, Eng(v[0], "A·m²", 3), Eng(v[len(v)-1], "A·m²", 3), Eng(analysis.Percentile(v, 5), "A·m²", 3), Eng(analysis.Percentile(v, 95), "A·m²", 3))
		if len(req) > 0 {
			below := 0
			for _, x := range v {
				if x < req[0] {
					below++
				}
			}
			text += fmt.Sprintf(" The required moment (dashed) is %s; %s of the samples fall short of it.", Eng(req[0], "A·m²", 3), Sig(100*float64(below)/float64(len(v)), 2)+" %")
		}
		c.para(text)
		c.fig(doc.Figure{Caption: "Distribution of the magnetic moment over the Monte Carlo samples", Width: figWidth, Height: figHeight * 0.7,
			Draw:    figures.Histogram("Magnetic moment |m|", "A·m²", mc.Values[0], req),
			Summary: fmt.Sprintf("Moment from %s to %s.", Eng(mc.Values[0][0], "A·m²", 3), Eng(mc.Values[0][len(mc.Values[0])-1], "A·m²", 3))})
	}
}

// worstDerivation derives the results at one corner as the Method
// section derives them at nominal.
func (c *composer) worstDerivation(wc *analysis.WorstCase) {
	wk := wc.Derived
	if wk == nil || len(wk.Design.Coils) == 0 {
		return
	}
	why := fmt.Sprintf("the corner at which the %s requirement is missed", wk.Reason)
	if !wk.Failing {
		why = "the corner of the least " + strings.ToLower(c.worstName(wk.Reason))
	}
	c.heading(2, "Derivation at corner "+cornerCode(wc, wk.Corner))
	c.para(fmt.Sprintf("The results at %s (%s), derived as at nominal in the Method section, with the corner's inputs:", why, wc.CornerName(wk.Corner)))
	co := wk.Design.Coils[0]
	cr := wk.Results.Coils[0]
	cs := wk.Coils[0]
	var steps []Step
	steps = append(steps, Step{What: "Ambient at this corner", Symbolic: `T_a = ` + Q(Celsius(wk.Design.Conditions.Ambient), "°C", 3)})
	if co.Wire.Gauge != calc.NoGauge {
		steps = append(steps, Step{What: "Bare wire diameter at this corner", Symbolic: `d = ` + Q(co.Wire.Bare, "m", 4)})
		co.Wire.Gauge = calc.NoGauge // the ASTM B258 rule gives the nominal diameter, not the corner's
	}
	c.derive(steps...)
	c.derive(coilSteps(co, cr, &cs)...) // resistance, temperature, current, power, moment, field
	if cr.Switch.SwitchOff > 0 {
		fo := fittedOverOf(c.j, 0)
		if fo != nil {
			fo.inCorner = true
		}
		c.derive(switchingSteps(co, cr, nil, fo)...) // the corner's L·I/t_off, as its limit is judged
	}
}

// worstVerdict is page 1's sentence on the worst case; "" without one.
func (c *composer) worstVerdict() string {
	wc := c.j.WorstCase
	if wc == nil || len(c.j.Limits) == 0 {
		return ""
	}
	for i, l := range c.j.Limits {
		if wl := wc.Limits[i]; !l.Pass && wl.NominalPass {
			return fmt.Sprintf("Over the tolerances, %s fails at corner %s (%s). ", limitName(l), cornerCode(wc, wl.Corner), wc.CornerName(wl.Corner))
		}
	}
	if f, _ := c.j.Failed(); f == 0 {
		return fmt.Sprintf("Every requirement is met at every corner of the tolerances (%d corners). ", len(wc.Corners))
	}
	return ""
}
