package memo

import (
	"coilmemo/analysis"
	"fmt"
	"math"
	"strings"
	"unicode"
	"unicode/utf8"

	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/templates"
)

func wireName(w calc.Wire) string {
	if w.Gauge != calc.NoGauge {
		return fmt.Sprintf("AWG %d %s", w.Gauge, w.Material.Name)
	}
	return Eng(w.Bare, "m", 3) + " " + w.Material.Name
}

// assumptions lists the modelling assumptions, then the validity flags
// this design raises — thin-wire ratio, dipole distance, d.c. against the
// drive frequency, thermal-model range, Helmholtz condition — each with its
// figure for this design and what it means for the results. A flag whose
// model is stretched opens with "Check:".
func (c *composer) assumptions() {
	c.heading(1, "Assumptions and validity")
	d := c.j.Spec.Design
	r := c.j.Results
	var items [][]doc.Block
	item := func(lead string, flagged bool, text string) {
		sp := []doc.Span{{Text: lead + ". ", Strong: true}}
		if flagged {
			sp = append(sp, doc.Span{Text: "Check: ", Strong: true})
		}
		sp = append(sp, mathSpans(capitalise(text))...)
		items = append(items, []doc.Block{doc.Paragraph{Spans: sp}})
	}
	general := func(lead, text string) {
		// a template that opens with its own "Lead: " keeps it as the lead
		if l, rest, ok := strings.Cut(text, ": "); ok && !strings.ContainsAny(l, ".;,") && len(l) < 40 {
			lead, text = l, rest
		}
		item(lead, false, text)
	}
	general("Filament model", templates.Text("assume-filament", nil))
	general("Cooling", coolingAssumption(d, c.j.Cooling))
	general("Thermal model", templates.Text("assume-thermal", nil))
	c.add(doc.List{Items: items})
	items = nil
	for i, co := range d.Coils {
		if i >= len(r.Coils) {
			break
		}
		cr := r.Coils[i]
		for _, f := range validityFlags(co, cr, &c.j.Coils[i], d) {
			item(fmt.Sprintf("%s, %s", f.what, co.Name), f.flagged, f.text)
		}
	}
	if len(items) > 0 {
		c.para("Validity of the models for this design, coil by coil:")
		c.add(doc.List{Items: items})
	}
}

type validity struct {
	what    string
	flagged bool
	text    string
}

// validityFlags are one coil block's validity flags.
func validityFlags(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, d calc.Design) []validity {
	var out []validity
	w := cr.Winding
	R := co.MeanDiameter / 2
	// Thin-wire ratio: the winding's cross-section against its diameter.
	if co.Form != calc.Rectangle && R > 0 && co.Wire.Outer > 0 {
		depth := co.Wire.Outer
		what := "wire diameter"
		switch {
		case w.Thin:
			depth, what = cs.Bundle, "bundle diameter"
		case co.RadialBuild > 0:
			depth, what = math.Max(co.RadialBuild, co.Length), "winding depth"
		}
		ratio := depth / (2 * R)
		v := validity{what: "Thin-wire ratio"}
		if ratio > 0.1 {
			v.flagged = true
			v.text = fmt.Sprintf("%s / coil diameter = %s, more than 0.1. The turns are laid out one by one, so the field everywhere outside the winding is exact; within about one winding depth of the conductors the field of round wires differs from that of filaments.", what, Sig(ratio, 2))
		} else {
			v.text = fmt.Sprintf("%s / coil diameter = %s (below 0.1): each turn is well represented by a filament; the field differs from the filament field only within a wire's width of the conductors.", what, Sig(ratio, 2))
		}
		out = append(out, v)
	}
	// A multilayer winding whose turns do not fill the stated radial build
	// sits nearer the bore than its stated mean diameter says.
	if co.RadialBuild > 0 && !w.Thin && w.LayerCount > 0 && co.Wire.Outer > 0 {
		used := float64(w.LayerCount) * co.Wire.Outer
		if used < 0.95*co.RadialBuild {
			out = append(out, validity{what: "Radial build", flagged: true, text: fmt.Sprintf(
				"the %d turns lie in %d layers %s deep, less than the stated radial build of %s; the turns' mean radius is %s against the stated %s. All results use the turns as laid out; state the radial build the coil will really have, or the turns that fill it.",
				co.Turns, w.LayerCount, Eng(used, "m", 3), Eng(co.RadialBuild, "m", 3), Eng(cs.MeanRadius, "m", 4), Eng(R, "m", 4))})
		}
	}
	if co.Wire.OuterEstimated {
		out = append(out, validity{what: "Wire build", flagged: true, text: fmt.Sprintf(
			"the wire's overall diameter (%s over %s bare) is an estimate for heavy-build enamelled wire. The winding's length, layers, surface and so its temperature follow from it; state wire-outer-diameter from the wire maker's data sheet.",
			Eng(co.Wire.Outer, "m", 3), Eng(co.Wire.Bare, "m", 3))})
	}
	// Dipole distance.
	if co.Form != calc.Rectangle && !(co.Form == calc.Pair && co.Opposing) && R > 0 {
		if dr := cr.Dipole.Axis1; !math.IsNaN(dr) && dr > 0 {
			text := fmt.Sprintf("on the axis the point-dipole field $B = \\mu_0 m/(2\\pi z^3)$ is within 1 %% of the exact field beyond %s from the centre (%s mean radii)",
				Eng(dr, "m", 3), Sig(dr/R, 3))
			if p := cr.Dipole.Plane1; p > 0 && !math.IsNaN(p) {
				text += fmt.Sprintf(", and in the coil's plane beyond %s", Eng(p, "m", 3))
			}
			text += ". This memo uses the exact field everywhere; the dipole figure is for estimates and for the far field, such as a magnetometer's reading of the coil."
			var inside []string
			for _, pr := range d.Probes {
				switch dist := pr.At.Sub(co.Centre).Norm(); {
				case dist == 0:
					inside = append(inside, fmt.Sprintf("%q (at the centre)", pr.Name))
				case dist < dr:
					inside = append(inside, fmt.Sprintf("%q (%s away)", pr.Name, Eng(dist, "m", 3)))
				}
			}
			switch len(inside) {
			case 0:
			case 1:
				text += " Probe " + inside[0] + " lies inside that distance: there only the exact field is valid."
			default:
				text += " Probes " + strings.Join(inside[:len(inside)-1], ", ") + " and " + inside[len(inside)-1] + " lie inside that distance: there only the exact field is valid."
			}
			out = append(out, validity{what: "Dipole distance", text: text})
		}
	}
	// D.c. against the drive frequency.
	switch ac := cr.AC; {
	case ac.Frequency > 0:
		v := validity{what: "Frequency"}
		parts := []string{fmt.Sprintf("driven at %s: reactance $X = 2\\pi f L$ = %s against $R$ = %s ($X/R$ = %s)",
			Eng(ac.Frequency, "Hz", 3), Eng(ac.Reactance, "Ω", 3), Eng(cr.RHot, "Ω", 3), Sig(ac.Reactance/cr.RHot, 2))}
		if ac.Reactive {
			v.flagged = true
			parts = append(parts, fmt.Sprintf("the current is set by the impedance |Z| = %s, not by R alone: the d.c. current, moment and field of this memo are upper bounds, the a.c. values are lower", Eng(ac.Impedance, "Ω", 3)))
		} else {
			parts = append(parts, "the reactance is negligible and the d.c. figures hold")
		}
		if ac.SkinLimited {
			v.flagged = true
			parts = append(parts, fmt.Sprintf("the skin depth $\\delta$ = %s is less than the wire radius %s, so the a.c. resistance and heating exceed the d.c. figures", Eng(ac.SkinDepth, "m", 3), Eng(ac.WireRadius, "m", 3)))
		} else if !math.IsNaN(ac.SkinDepth) {
			parts = append(parts, fmt.Sprintf("the skin depth $\\delta$ = %s exceeds the wire radius %s: no skin effect", Eng(ac.SkinDepth, "m", 3), Eng(ac.WireRadius, "m", 3)))
		}
		v.text = strings.Join(parts, "; ") + "."
		out = append(out, v)
	case cr.TimeConstant > 0 && !math.IsInf(cr.TimeConstant, 0):
		out = append(out, validity{what: "Direct current", text: fmt.Sprintf(
			"the results are steady d.c. values. After switch-on the current rises with the time constant $\\tau = L/R$ = %s and is within 1 %% of its final value after $4.6\\,\\tau$ = %s; faster switching or an a.c. drive (give frequency) changes current, field and heating.",
			Eng(cr.TimeConstant, "s", 3), Eng(4.6*cr.TimeConstant, "s", 3))})
	default:
		out = append(out, validity{what: "Direct current", text: templates.Text("assume-dc", nil)})
	}
	// Thermal-model range.
	if st := cr.Heat.Steady; st.Settled && !cr.Runaway {
		v := validity{what: "Thermal model"}
		text := fmt.Sprintf("the resistance follows the winding's mean temperature %s linearly ($\\alpha_{20}$ of %s); heat crosses the turns with an effective conductivity of %s, so the hottest point is %s above the surface (%s); the insulation is judged at the hottest point",
			Eng(Celsius(st.Mean), "°C", 3), co.Wire.Material.Name, Eng(cr.Heat.Conductivity, "W/(m·K)", 2), Eng(st.HotSpot-st.Surface, "K", 2), Eng(Celsius(st.Surface), "°C", 3))
		if cv := st.Convection; cv.Ra > 0 {
			if cv.InRange {
				text += fmt.Sprintf("; the natural-convection correlation is used within its range (Rayleigh number %s)", Sci(cv.Ra, 2))
			} else {
				v.flagged = true
				text += fmt.Sprintf("; the natural-convection correlation is outside its range (Rayleigh number %s, film temperature %s), so the convective loss, and with it the temperature, is uncertain", Sci(cv.Ra, 2), Eng(Celsius(cv.Film), "°C", 3))
			}
		}
		if cr.ThermalTau > 0 && !math.IsInf(cr.ThermalTau, 0) {
			text += fmt.Sprintf(". The steady temperature is reached after about three thermal time constants, $3\\tau_{\\mathrm{th}}$ = %s; a shorter on-time leaves the winding cooler", Duration(3*cr.ThermalTau, 2))
		}
		v.text = text + "."
		out = append(out, v)
	} else if cr.Runaway {
		out = append(out, validity{what: "Thermal model", flagged: true, text: "no steady temperature exists (thermal runaway): the electrical figures at the steady state are not defined; see the Safety section."})
	}
	// Helmholtz condition and the pair's useful region.
	if co.Form == calc.Pair && R > 0 {
		ratio := co.Spacing / R
		v := validity{what: "Helmholtz condition"}
		pr := cr.Pair
		switch {
		case co.Opposing:
			v.what = "Gradient pair"
			v.text = fmt.Sprintf("opposing pair at spacing %s R", Sig(ratio, 3))
			if !math.IsNaN(pr.Gradient) {
				v.text += fmt.Sprintf(": centre gradient %s, linear within 1 %% for %s along the axis and %s radially", Eng(pr.Gradient, "T/m", 3), pmEng(pr.LinearAxial), pmEng(pr.LinearRadial))
			}
			v.text += "."
		case math.Abs(ratio-1) <= calc.HelmholtzTolerance:
			v.text = fmt.Sprintf("spacing / mean radius $s/R$ = %s: a Helmholtz pair, whose centre field is flat to the fourth order", Sig(ratio, 4))
			if !math.IsNaN(pr.Axial1) {
				v.text += fmt.Sprintf("; the field stays within 1 %% of its centre value for %s along the axis and %s radially", pmEng(pr.Axial1), pmEng(pr.Radial1))
			}
			v.text += "."
		default:
			v.flagged = true
			shape := "a dip at the centre (spacing wider than the radius)"
			if ratio < 1 {
				shape = "a peak at the centre (spacing narrower than the radius)"
			}
			v.text = fmt.Sprintf("spacing / mean radius $s/R$ = %s, not 1: the field on the axis has %s", Sig(ratio, 3), shape)
			if !math.IsNaN(pr.Axial1) {
				v.text += fmt.Sprintf("; it stays within 1 %% of its centre value for %s along the axis and %s radially", pmEng(pr.Axial1), pmEng(pr.Radial1))
			}
			v.text += fmt.Sprintf(". Spacing the coils at %s would make it a Helmholtz pair.", Eng(R, "m", 3))
		}
		out = append(out, v)
	}
	return out
}

// mathSpans splits text at "$" signs into plain spans and inline
// mathematics: "the field $B_0$ at" is three spans, the middle one
// notation.
func mathSpans(text string) []doc.Span {
	var out []doc.Span
	for i, part := range strings.Split(text, "$") {
		if part == "" {
			continue
		}
		out = append(out, doc.Span{Text: part, Math: i%2 == 1})
	}
	return out
}

// capitalise upper-cases the first letter of a sentence.
func capitalise(s string) string {
	r, n := utf8.DecodeRuneInString(s)
	return string(unicode.ToUpper(r)) + s[n:]
}

// pmEng writes a ± distance, "n/a" when unknown.
func pmEng(v float64) string {
	if math.IsNaN(v) {
		return "n/a"
	}
	return "±" + Eng(v, "m", 2)
}

// coolingAssumption states how the winding sheds heat.
func coolingAssumption(d calc.Design, cool calc.Cooling) string {
	mount := ""
	if m := d.Conditions.MountResistance; m > 0 && !math.IsInf(m, 1) {
		mount = fmt.Sprintf(", and by conduction through the stated thermal resistance of %s to a mount at the ambient temperature", Eng(m, "K/W", 3))
	}
	switch {
	case cool.Vacuum:
		return templates.Text("assume-vacuum", map[string]string{"Emissivity": Sig(cool.Emissivity, 2)})
	case d.Conditions.Cooling.HGiven:
		return fmt.Sprintf("convection with the heat-transfer coefficient stated in the spec, h = %s, plus radiation with surface emissivity %s to surroundings at the ambient temperature%s.",
			Eng(cool.H, "W/(m²·K)", 3), Sig(cool.Emissivity, 2), mount)
	}
	return fmt.Sprintf("natural convection in still air, the heat-transfer coefficient h from a published correlation for the coil's outer shape at its surface temperature (so it rises as the coil warms), plus radiation with surface emissivity %s to surroundings at the ambient temperature%s.",
		Sig(cool.Emissivity, 2), mount)
}

// method gives, coil by coil, each result as a numbered equation — the
// relation in symbols, the numbers put in, the result — in the order of
// derivation.
func (c *composer) method() {
	c.heading(1, "Method and results")
	c.para(templates.Text("method", nil))
	d := c.j.Spec.Design
	r := c.j.Results
	for i, co := range d.Coils {
		if i >= len(r.Coils) {
			break
		}
		c.heading(2, fmt.Sprintf("Coil %q (%s, %d turns, %s)", co.Name, analysis.FormName(co), co.Turns, wireName(co.Wire)))
		c.derive(coilSteps(co, r.Coils[i], &c.j.Coils[i])...)
	}
}

// coilSteps derives one coil block's results: wire and winding, resistance,
// temperature and operating point, moment and field (the inductance and the
// heat balance follow in sections of their own).
func coilSteps(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy) []Step {
	w := cr.Winding
	mat := co.Wire.Material
	var steps []Step
	add := func(s ...Step) { steps = append(steps, s...) }
	if co.Wire.Gauge != calc.NoGauge {
		n := co.Wire.Gauge
		add(Step{What: fmt.Sprintf("Bare wire diameter of AWG %d (ASTM B258 rule)", n),
			Symbolic: `d = 0.127\,\unit{mm} \cdot 92^{(36 - n)/39}`,
			Numbers:  fmt.Sprintf(`0.127\,\unit{mm} \cdot 92^{(36 - %s)/39}`, N(float64(n), 2)),
			Result:   Q(co.Wire.Bare, "m", 4)})
	}
	A := cs.ConductorArea
	add(Step{What: "Conductor cross-section", Symbolic: `A = \frac{\pi d^2}{4}`,
		Numbers: fmt.Sprintf(`\frac{\pi \cdot %s^2}{4}`, Paren(Q(co.Wire.Bare, "m", 4))), Result: Q(A, "m²", 4)})
	outer := "Overall wire diameter over the insulation, as specified"
	if co.Wire.OuterEstimated {
		outer = "Overall wire diameter over the insulation (heavy-build estimate, see Assumptions)"
	}
	add(Step{What: outer, Symbolic: `d_o = ` + Q(co.Wire.Outer, "m", 3)})
	series := cs.Series
	total := co.Turns * series
	pair := ""
	if series == 2 {
		pair = `2 \cdot `
	}
	R := co.MeanDiameter / 2
	switch {
	case co.Form == calc.Rectangle:
		add(Step{What: "Wire length: N turns round the rectangle", Symbolic: `\ell_w = N \cdot 2 (W + H)`,
			Numbers: fmt.Sprintf(`%d \cdot 2 \left(%s + %s\right)`, co.Turns, Q(co.Width, "m", 4), Q(co.Height, "m", 4)),
			Result:  Q(cr.Length, "m", 4)})
	case w.Thin:
		add(Step{What: "Thin winding: every turn on the mean diameter", Symbolic: `r_i = \frac{\bar{D}}{2}`,
			Numbers: fmt.Sprintf(`\frac{%s}{2}`, Q(co.MeanDiameter, "m", 4)), Result: Q(R, "m", 4)})
		add(Step{What: "Wire length, every turn", Symbolic: `\ell_w = ` + pair + `\sum_{i=1}^{N} 2\pi r_i`,
			Numbers: fmt.Sprintf(`%s%d \cdot 2\pi \cdot %s`, pair, co.Turns, Q(R, "m", 4)), Result: Q(cr.Length, "m", 4)})
	case w.LayerCount <= 1:
		add(Step{What: "Single layer: turn pitch along the winding length", Symbolic: `p = \frac{\ell}{N}`,
			Numbers: fmt.Sprintf(`\frac{%s}{%d}`, Q(co.Length, "m", 4), co.Turns), Result: Q(co.Length/float64(max(co.Turns, 1)), "m", 4)})
		add(Step{What: "Wire length, every turn on the mean diameter", Symbolic: `\ell_w = ` + pair + `\sum_{i=1}^{N} 2\pi r_i`,
			Numbers: fmt.Sprintf(`%s%d \cdot 2\pi \cdot %s`, pair, co.Turns, Q(R, "m", 4)), Result: Q(cr.Length, "m", 4)})
	default:
		add(Step{What: "Turns per layer: touching turns along the winding length", Symbolic: `n_l = \left\lfloor \frac{\ell}{d_o} \right\rfloor`,
			Numbers: fmt.Sprintf(`\left\lfloor \frac{%s}{%s} \right\rfloor`, Q(co.Length, "m", 4), Q(co.Wire.Outer, "m", 3)),
			Result:  fmt.Sprint(w.TurnsPerLayer)})
		add(Step{What: "Layers", Symbolic: `n_L = \left\lceil \frac{N}{n_l} \right\rceil`,
			Numbers: fmt.Sprintf(`\left\lceil \frac{%d}{%d} \right\rceil`, co.Turns, w.TurnsPerLayer), Result: fmt.Sprint(w.LayerCount)})
		if !math.IsNaN(w.FillFactor) && co.RadialBuild > 0 && co.Length > 0 {
			add(Step{What: "Copper fill factor of the winding cross-section", Symbolic: `\lambda = \frac{N A}{\ell\, b}`,
				Numbers: fmt.Sprintf(`\frac{%d \cdot %s}{%s \cdot %s}`, co.Turns, Q(A, "m²", 4), Q(co.Length, "m", 4), Q(co.RadialBuild, "m", 4)),
				Result:  N(w.FillFactor, 3)})
		}
		sumR := 0.0
		for _, l := range w.Layers {
			sumR += float64(len(l.Z)) * l.Radius
		}
		add(Step{What: fmt.Sprintf("Wire length, layer by layer: nₖ turns at radius rₖ, Σ nₖrₖ = %s", Eng(sumR, "m", 5)), Symbolic: `\ell_w = ` + pair + `\sum_{k=1}^{n_L} n_k\, 2\pi r_k`,
			Numbers: fmt.Sprintf(`%s2\pi \cdot %s`, pair, Q(sumR, "m", 5)), Result: Q(cr.Length, "m", 4)})
	}
	if total > 0 {
		add(Step{What: "Mean turn length", Symbolic: `\ell_t = \frac{\ell_w}{` + map[bool]string{true: "2N", false: "N"}[series == 2] + `}`,
			Numbers: fmt.Sprintf(`\frac{%s}{%d}`, Q(cr.Length, "m", 4), total), Result: Q(cr.Length/float64(total), "m", 4)})
	}
	add(Step{What: "Conductor mass, density " + Eng(mat.Density, "kg/m³", 4), Symbolic: `m_c = \rho_m A \ell_w`,
		Numbers: fmt.Sprintf(`%s \cdot %s \cdot %s`, Q(mat.Density, "kg/m³", 4), Q(A, "m²", 4), Q(cr.Length, "m", 4)),
		Result:  Q(cr.Mass, "kg", 3)})
	add(Step{What: fmt.Sprintf("Resistance at 20 °C, resistivity of %s %s", mat.Name, Eng(mat.Rho20, "Ω·m", 5)),
		Symbolic: `R_{20} = \frac{\rho_{20}\, \ell_w}{A}`,
		Numbers:  fmt.Sprintf(`\frac{%s \cdot %s}{%s}`, Q(mat.Rho20, "Ω·m", 5), Q(cr.Length, "m", 4), Q(A, "m²", 4)),
		Result:   Q(cr.R20, "Ω", 4)})
	add(thermalSteps(co, cr)...)
	if !cr.Runaway && !math.IsNaN(cr.RHot) {
		// the temperature the resistance was taken at (the winding's mean)
		T := Celsius(cr.Heat.Steady.Mean)
		add(Step{What: fmt.Sprintf("Resistance at the mean winding temperature, temperature coefficient %s /K", Sig(mat.Alpha20, 3)),
			Symbolic: `R(T) = R_{20} \left[ 1 + \alpha_{20} (T - 20\,\unit{°C}) \right]`,
			Numbers:  fmt.Sprintf(`%s \left[ 1 + %s\,\unit{K^{-1}} \cdot (%s - 20\,\unit{°C}) \right]`, Q(cr.R20, "Ω", 4), N(mat.Alpha20, 3), Q(T, "°C", 3)),
			Result:   Q(cr.RHot, "Ω", 4)})
	}
	if co.Drive == calc.VoltageDrive {
		add(Step{What: "Current under voltage drive, at the hot resistance", Symbolic: `I = \frac{V}{R(T)}`,
			Numbers: fmt.Sprintf(`\frac{%s}{%s}`, Q(co.Voltage, "V", 4), Q(cr.RHot, "Ω", 4)), Result: Q(cr.Current, "A", 4)})
		add(Step{What: "Current when cold (switch-on)", Symbolic: `I_{20} = \frac{V}{R_{20}}`,
			Numbers: fmt.Sprintf(`\frac{%s}{%s}`, Q(co.Voltage, "V", 4), Q(cr.R20, "Ω", 4)), Result: Q(cr.ColdCurrent, "A", 4)})
	} else {
		add(Step{What: "Voltage under current drive, at the hot resistance", Symbolic: `V = I\, R(T)`,
			Numbers: fmt.Sprintf(`%s \cdot %s`, Q(cr.Current, "A", 4), Q(cr.RHot, "Ω", 4)), Result: Q(cr.Voltage, "V", 4)})
	}
	pOn := cr.PowerOn
	add(Step{What: "Power while energised", Symbolic: `P = I^2 R(T)`,
		Numbers: fmt.Sprintf(`%s^2 \cdot %s`, Paren(Q(cr.Current, "A", 4)), Q(cr.RHot, "Ω", 4)), Result: Q(pOn, "W", 4)})
	if duty := cr.Duty; duty < 1 {
		add(Step{What: "Power averaged over the duty cycle δ", Symbolic: `\bar{P} = \delta P`,
			Numbers: fmt.Sprintf(`%s \cdot %s`, N(duty, 3), Q(pOn, "W", 4)), Result: Q(cr.Power, "W", 4)})
	}
	add(Step{What: "Current density in the conductor", Symbolic: `J = \frac{I}{A}`,
		Numbers: fmt.Sprintf(`\frac{%s}{%s}`, Q(cr.Current, "A", 4), Q(A, "m²", 4)), Result: Q(cr.Density, "A/m²", 3)})
	add(momentSteps(co, cr)...)
	// The inductance is derived in the Inductance and switching section.
	return steps
}

// thermalSteps give the steady mean winding temperature that the
// resistance follows. The heat balance that yields it is derived step by
// step in the Heating section; here it enters the chain of derivation.
func thermalSteps(co calc.Coil, cr calc.CoilResult) []Step {
	if cr.Runaway || math.IsNaN(cr.RHot) {
		return []Step{{What: "Steady winding temperature: none exists, the winding runs away thermally (see the Heating and Safety sections)",
			Symbolic: `T = ` + Words("no steady state")}}
	}
	// The mean temperature is the one the hot resistance was taken at.
	mean := Celsius(cr.Heat.Steady.Mean)
	return []Step{{What: "Steady mean winding temperature, from the heat balance of the winding's surface derived in the Heating section",
		Symbolic: `T = ` + Q(mean, "°C", 3)}}
}

// momentSteps derive the magnetic moment and the field at the centre.
func momentSteps(co calc.Coil, cr calc.CoilResult) []Step {
	w := cr.Winding
	I := Q(cr.Current, "A", 4)
	m := Q(cr.Moment.Norm(), "A·m²", 4)
	R := co.MeanDiameter / 2
	switch {
	case co.Form == calc.Rectangle:
		return []Step{{What: "Magnetic moment of N rectangular turns", Symbolic: `m = N I W H`,
			Numbers: fmt.Sprintf(`%d \cdot %s \cdot %s \cdot %s`, co.Turns, I, Q(co.Width, "m", 4), Q(co.Height, "m", 4)), Result: m}}
	case co.Form == calc.Pair && co.Opposing:
		return []Step{{What: "Magnetic moment of an opposing pair: the two coils' moments cancel", Symbolic: `m = I \sum_i \pi r_i^2 - I \sum_i \pi r_i^2 = 0`}}
	}
	pair := ""
	if co.Form == calc.Pair {
		pair = `2 \cdot `
	}
	var steps []Step
	mom := Step{What: "Magnetic moment: current times the area of every turn", Symbolic: `m = ` + pair + `I \sum_{i=1}^{N} \pi r_i^2`, Result: m}
	if w.Thin || w.LayerCount <= 1 {
		mom.Numbers = fmt.Sprintf(`%s%d \cdot %s \cdot \pi \cdot %s^2`, pair, co.Turns, I, Paren(Q(R, "m", 4)))
	} else {
		mom.What = fmt.Sprintf("Magnetic moment: current times the area of every turn, Σπrᵢ² = %s over the %d turns", Eng(w.AreaSum, "m²", 5), co.Turns)
		mom.Numbers = fmt.Sprintf(`%s%s \cdot %s`, pair, I, Q(w.AreaSum, "m²", 5))
	}
	steps = append(steps, mom)
	if co.Centre.Norm() != 0 {
		return steps
	}
	B := Q(cr.FieldCentre.Norm(), "T", 4)
	switch {
	case w.Thin && co.Form == calc.Pair:
		z := co.Spacing / 2
		steps = append(steps, Step{What: "Field at the centre of the pair, on the axis, both coils", Symbolic: `B_0 = 2 \cdot \frac{\mu_0 N I r^2}{2 \left( r^2 + (s/2)^2 \right)^{3/2}}`,
			Numbers: fmt.Sprintf(`2 \cdot \frac{\mu_0 \cdot %d \cdot %s \cdot %s^2}{2 \left( %s^2 + %s^2 \right)^{3/2}}`, co.Turns, I, Paren(Q(R, "m", 4)), Paren(Q(R, "m", 4)), Paren(Q(z, "m", 4))),
			Result:  B})
	case w.Thin:
		steps = append(steps, Step{What: "Field at the centre of a thin coil", Symbolic: `B_0 = \frac{\mu_0 N I}{2 r}`,
			Numbers: fmt.Sprintf(`\frac{\mu_0 \cdot %d \cdot %s}{2 \cdot %s}`, co.Turns, I, Q(R, "m", 4)), Result: B})
	default:
		steps = append(steps, Step{What: "Field at the centre: the on-axis field of every turn (radius rᵢ, axial distance zᵢ from the centre), summed",
			Symbolic: `B_0 = \sum_{i} \frac{\mu_0 I r_i^2}{2 \left( r_i^2 + z_i^2 \right)^{3/2}}`, Result: B})
	}
	return steps
}
