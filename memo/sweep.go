package memo

import (
	"fmt"
	"math"
	"slices"
	"strconv"
	"strings"

	"coilmemo/calc"
	"coilmemo/calc/units"
	"coilmemo/doc"
	"coilmemo/figures"
	"coilmemo/format"
	"coilmemo/spec"
)

// sweepUnit is the unit the swept values are shown in.
func sweepUnit(sw *spec.Sweep) (unit string, scale float64) {
	switch {
	case sw.Param == "turns":
		return "", 1
	case sw.Param == "duty":
		return "%", 100
	case sw.Dim == units.Length:
		return "mm", 1e3
	case sw.Dim == units.Current:
		return "A", 1
	case sw.Dim == units.Voltage:
		return "V", 1
	case sw.Dim == units.Time:
		switch top := math.Max(math.Abs(sw.From), math.Abs(sw.To)); {
		case top < 1e-3:
			return "µs", 1e6
		case top < 1:
			return "ms", 1e3
		case top < 600:
			return "s", 1
		}
		return "min", 1.0 / 60
	case sw.Dim == units.Frequency:
		switch top := math.Max(math.Abs(sw.From), math.Abs(sw.To)); {
		case top < 1e3:
			return "Hz", 1
		case top < 1e6:
			return "kHz", 1e-3
		}
		return "MHz", 1e-6
	}
	return "", 1
}

// sweepNum writes a swept value (in the shown unit) with the one number
// of decimals that the start, end and step need, so that the column of
// swept values and the text agree: 0.1, 0.2, … 1.0, never "1" beside
// "0.9".
func sweepNum(sw *spec.Sweep, scale float64) func(float64) string {
	dec := 0
	for _, v := range []float64{sw.From * scale, sw.To * scale, sw.Step * scale} {
		for dec < 6 {
			p := math.Pow(10, float64(dec))
			if math.Abs(v*p-math.Round(v*p)) <= 1e-9*math.Max(1, math.Abs(v*p)) {
				break
			}
			dec++
		}
	}
	return func(v float64) string {
		s := strconv.FormatFloat(v, 'f', dec, 64)
		if strings.Trim(s, "-0.") == "" {
			s = strings.TrimPrefix(s, "-")
		}
		return strings.Replace(s, "-", "−", 1)
	}
}

// sweepView is what a sweep shows besides the standard columns: a column
// for a parameter whose effect they do not show (the swept coil's, or the
// first coil's when the sweep covers every coil), and the quantity its
// first figure plots with the limit drawn on it.
type sweepView struct {
	extraHead                     string
	extra                         func(calc.Results) string
	plotName, plotUnit, plotLimit string
	plotValue                     func(calc.Results) float64
}

func sweepViewOf(sw *spec.Sweep, d calc.Design) sweepView {
	v := sweepView{extra: func(calc.Results) string { return "" },
		plotName: "Magnetic moment |m|", plotUnit: "A·m²", plotLimit: "moment",
		plotValue: func(r calc.Results) float64 { return r.Moment.Norm() }}
	// A design judged by its field, not its moment, has its field plotted:
	// the quantity the requirement is on.
	moment, field := false, false
	for _, l := range d.Limits {
		moment = moment || l.Quantity == "moment"
		field = field || (l.Quantity == "field-center" && l.Subject == "")
	}
	if field && !moment {
		v.plotName, v.plotUnit, v.plotLimit = "|B| at the origin", "T", "field-center"
		v.plotValue = func(r calc.Results) float64 { return r.FieldCentre.Norm() }
	}
	swept := 0
	for i, co := range d.Coils {
		if sw.Coil == co.Name {
			swept = i
		}
	}
	switch sw.Param {
	case "switch-off":
		v.extraHead = "Unsuppressed spike"
		v.extra = func(r calc.Results) string { return Eng(r.Coils[swept].Switch.Spike, "V", 3) }
		v.plotName, v.plotUnit, v.plotLimit = "Switch-off spike", "V", ""
		v.plotValue = func(r calc.Results) float64 { return r.Coils[swept].Switch.Spike }
	case "frequency":
		v.extraHead = "|Z| / a.c. current"
		v.extra = func(r calc.Results) string {
			ac := r.Coils[swept].AC
			return Eng(ac.Impedance, "Ω", 3) + " / " + Eng(ac.Current, "A", 3)
		}
		v.plotName, v.plotUnit, v.plotLimit = "Impedance |Z|", "Ω", ""
		v.plotValue = func(r calc.Results) float64 { return r.Coils[swept].AC.Impedance }
	}
	return v
}

// sweepFigures plots the first quantity of the sweep and the hottest
// winding temperature against the swept value, with the stated limits.
func (c *composer) sweepFigures(label string, x, first, temp []float64, v sweepView) {
	limit := func(q string) []float64 {
		var out []float64
		for _, l := range c.j.Spec.Design.Limits {
			if l.Quantity == q && l.Subject == "" {
				v := l.Required
				if q == "temperature" {
					v = Celsius(v)
				}
				out = append(out, v)
			}
		}
		return out
	}
	n := c.figure + 1
	what := "the " + strings.ToLower(v.plotName[:1]) + v.plotName[1:]
	switch v.plotLimit {
	case "moment":
		what = "the total moment"
	case "field-center":
		what = "the flux density at the origin"
	}
	text := fmt.Sprintf("Figures %d and %d show %s and the hottest winding temperature across the sweep, with the stated requirements as dashed lines.", n, n+1, what)
	for _, q := range []string{v.plotLimit, "temperature"} {
		vals := first
		if q == "temperature" {
			vals = temp
		}
		if t := c.sweepMet(q, label, x, vals); t != "" {
			text += " " + t
		}
	}
	c.para(text)
	var req []float64
	if v.plotLimit != "" {
		req = limit(v.plotLimit)
	}
	c.fig(doc.Figure{Caption: v.plotName + " across the sweep", Width: figWidth, Height: figHeight * 0.7,
		Draw:    figures.Sweep(label, x, v.plotName, v.plotUnit, first, req),
		Summary: fmt.Sprintf("%s from %s to %s.", v.plotName, Eng(first[0], v.plotUnit, 3), Eng(first[len(first)-1], v.plotUnit, 3))})
	c.fig(doc.Figure{Caption: "Hottest winding temperature across the sweep", Width: figWidth, Height: figHeight * 0.7,
		Draw:    figures.Sweep(label, x, "Winding temperature", "°C", temp, limit("temperature")),
		Summary: fmt.Sprintf("Temperature from %s to %s.", Eng(temp[0], "°C", 3), Eng(temp[len(temp)-1], "°C", 3))})
}

func (c *composer) sweep() {
	sw := c.j.Spec.Sweep
	if sw == nil || len(c.j.Sweep) == 0 {
		return
	}
	unit, scale := sweepUnit(sw)
	label := sw.Param
	if unit != "" {
		label += " (" + unit + ")"
	}
	target := "every coil"
	if sw.Coil != "" {
		target = fmt.Sprintf("coil %q", sw.Coil)
	}
	c.heading(1, "Parameter sweep")
	num := sweepNum(sw, scale)
	withUnit := func(v float64) string {
		if unit == "" {
			return num(v)
		}
		if unit == "%" {
			return num(v) + " %"
		}
		return num(v) + " " + unit
	}
	c.para(fmt.Sprintf("The design is re-evaluated with %s of %s from %s to %s in steps of %s, every other input as specified. Each row is a complete evaluation: winding, steady temperature, operating point and field.",
		sw.Param, target, withUnit(sw.From*scale), withUnit(sw.To*scale), withUnit(sw.Step*scale)))
	v := sweepViewOf(sw, c.j.Spec.Design)
	extraHead, extra, plotValue := v.extraHead, v.extra, v.plotValue
	var rows [][]doc.Cell
	var x, first, temp []float64
	// the value columns, each written in one unit (format.EngColumn)
	var colRows []int
	var cols [4][]float64
	marked := false // a temperature above a coil's insulation class
	for _, st := range c.j.Sweep {
		cells := []doc.Cell{{Text: num(st.Value * scale)}}
		if !st.Feasible {
			cells = append(cells, doc.Cell{Text: "winding does not fit"}, doc.Cell{}, doc.Cell{}, doc.Cell{}, doc.Cell{}, doc.Cell{Text: "—"})
			if extraHead != "" {
				cells = append(cells[:len(cells)-1], doc.Cell{}, cells[len(cells)-1])
			}
			rows = append(rows, cells)
			continue
		}
		r := st.Results
		hot, pw, cur, met := st.Hottest, st.Power, st.Current, st.Met
		status := doc.Cell{Text: fmt.Sprintf("%d/%d", met, len(st.Limits))}
		if len(st.Limits) > 0 {
			status.Status = doc.Pass
			if met < len(st.Limits) {
				status.Status = doc.Fail
			}
		}
		tText := Eng(Celsius(hot), "°C", 3)
		if math.IsNaN(hot) {
			tText = "runaway"
		} else if slices.ContainsFunc(r.Coils, func(cr calc.CoilResult) bool { return cr.Verdict.AboveMelting }) {
			tText = "above melting" // no steady state below the conductor's melting point
		} else if slices.ContainsFunc(r.Coils, func(cr calc.CoilResult) bool { return cr.InsulationMargin < 0 }) {
			tText += " †"
			marked = true
		}
		cells = append(cells,
			doc.Cell{Text: Eng(r.Moment.Norm(), "A·m²", 3)},
			doc.Cell{Text: Eng(r.FieldCentre.Norm(), "T", 3)},
			doc.Cell{Text: Eng(cur, "A", 3)},
			doc.Cell{Text: Eng(pw, "W", 3)},
			doc.Cell{Text: tText})
		if extraHead != "" {
			cells = append(cells, doc.Cell{Text: extra(r)})
		}
		cells = append(cells, status)
		colRows = append(colRows, len(rows))
		for k, v := range []float64{r.Moment.Norm(), r.FieldCentre.Norm(), cur, pw} {
			cols[k] = append(cols[k], v)
		}
		rows = append(rows, cells)
		x = append(x, st.Value*scale)
		first = append(first, plotValue(r))
		temp = append(temp, Celsius(hot))
	}
	for k, unit := range []string{"A·m²", "T", "A", "W"} {
		for i, txt := range format.EngColumn(cols[k], 0, unit, 3) {
			rows[colRows[i]][1+k].Text = txt
		}
	}
	header := []string{label, "|m|", "|B| at origin", "Current", "Power", "Hottest winding"}
	align := []doc.Align{doc.Right, doc.Right, doc.Right, doc.Right, doc.Right, doc.Right}
	widths := []float64{1, 1.2, 1.1, 1, 1, 1.1}
	if extraHead != "" {
		header, align, widths = append(header, extraHead), append(align, doc.Right), append(widths, 1.4)
	}
	header, align, widths = append(header, "Limits met"), append(align, doc.Center), append(widths, 1)
	if sw.Param == "current" {
		// the swept value is the current: no second column of it
		const col = 3
		header = append(header[:col:col], header[col+1:]...)
		align = append(align[:col:col], align[col+1:]...)
		widths = append(widths[:col:col], widths[col+1:]...)
		for i, r := range rows {
			if len(r) > col {
				rows[i] = append(r[:col:col], r[col+1:]...)
			}
		}
	}
	c.add(doc.Table{Caption: "Results at each step of the sweep",
		Header: header,
		Rows:   rows,
		Align:  align, Widths: widths})
	if marked {
		c.para("† Above the insulation class of a coil: its insulation would fail before the winding got there, so the temperature is the steady heat balance carried past the point where the model (and the coil) stops holding, not a temperature the coil would run at.")
	}
	if len(x) >= 2 {
		c.sweepFigures(label, x, first, temp, v)
	}
}

// sweepMet says over which swept values the design-wide requirement on
// quantity q is met, judged on the plotted values ("" without one).
func (c *composer) sweepMet(q, label string, x, vals []float64) string {
	if q == "" {
		return ""
	}
	for _, l := range c.j.Spec.Design.Limits {
		if l.Quantity != q || l.Subject != "" {
			continue
		}
		req := l.Required
		if q == "temperature" {
			req = Celsius(req)
		}
		var met []float64
		for i, v := range vals {
			if (l.Relation == calc.AtLeast && v >= req) || (l.Relation == calc.AtMost && v <= req) {
				met = append(met, x[i])
			}
		}
		what := map[string]string{"field-center": "centre-field", "moment": "moment", "temperature": "temperature"}[q]
		name := strings.SplitN(label, " (", 2)[0]
		_, scale := sweepUnit(c.j.Spec.Sweep)
		num := sweepNum(c.j.Spec.Sweep, scale)
		unit := ""
		if i := strings.Index(label, "("); i >= 0 {
			unit = " " + strings.TrimSuffix(label[i+1:], ")")
		}
		switch {
		case len(met) == 0:
			return fmt.Sprintf("The %s requirement is met nowhere in the sweep.", what)
		case len(met) == len(vals):
			return fmt.Sprintf("The %s requirement is met over the whole sweep.", what)
		case met[0] == x[0]:
			return fmt.Sprintf("The %s requirement is met up to %s = %s%s.", what, name, num(met[len(met)-1]), unit)
		default:
			return fmt.Sprintf("The %s requirement is met from %s = %s%s.", what, name, num(met[0]), unit)
		}
	}
	return ""
}
