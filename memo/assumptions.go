package memo

import (
	"coilmemo/format"
	"fmt"
	"math"
	"strings"
	"unicode"
	"unicode/utf8"

	"coilmemo/analysis"
	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/templates"
)

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
	forms := map[string]bool{"Rect": false, "Round": false, "Cored": false}
	for i, co := range d.Coils {
		forms[map[bool]string{true: "Rect", false: "Round"}[co.Form == calc.Rectangle]] = true
		forms["Cored"] = forms["Cored"] || (i < len(c.j.Coils) && c.j.Coils[i].Kinds.Core != nil)
	}
	filament := templates.Text("assume-filament", forms)
	for _, co := range d.Coils {
		if co.UnmodelledCore != "" {
			// the surroundings are non-magnetic but for the part the
			// designer leaves out (unmodelled-core)
			filament = strings.TrimSuffix(strings.TrimSpace(filament), ".") + fmt.Sprintf(" — except the %[1]s of coil %[2]q, which sits in its bore in service and is not modelled (unmodelled-core): its inductance, stored energy, switching times and field are those of the coil without the %[1]s, lower bounds for the assembly.", co.UnmodelledCore, co.Name)
		}
	}
	general("Filament model", filament)
	if !c.receiverOnly() { // a pick-up coil is not heated
		cooling := coolingAssumption(d, c.j.Cooling)
		for _, t := range c.nestedTexts() {
			cooling += " " + t
		}
		general("Cooling", cooling)
		general("Thermal model", templates.Text("assume-thermal", thermalMassWords(d, c.j.Coils)))
	}
	c.add(doc.List{Items: items})
	items = nil
	// A flag that reads the same for several coils (like coils of a set)
	// is given once, naming them all.
	type group struct {
		f     validity
		names []string
	}
	var groups []*group
	for i, co := range d.Coils {
		if i >= len(r.Coils) {
			break
		}
		cr := r.Coils[i]
		flags := validityFlags(co, cr, &c.j.Coils[i], d)
		if c.pickUp(i) {
			flags = pickUpFlags(co, cr, &c.j.Coils[i], d) // memo/receiver.go
		}
	next:
		for _, f := range flags {
			for _, g := range groups {
				if g.f == f {
					g.names = append(g.names, co.Name)
					continue next
				}
			}
			groups = append(groups, &group{f: f, names: []string{co.Name}})
		}
	}
	for _, g := range groups {
		item(fmt.Sprintf("%s, %s", g.f.what, joinAnd(g.names)), g.f.flagged, g.f.text)
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

// validityFlags are one coil block's validity flags, in the order of
// validityChecks.
func validityFlags(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, d calc.Design) []validity {
	var out []validity
	for _, f := range validityChecks {
		out = append(out, f(co, cr, cs, d)...)
	}
	return out
}

// validityChecks are the validity flags a coil block may raise.
var validityChecks = []func(calc.Coil, calc.CoilResult, *analysis.CoilStudy, calc.Design) []validity{
	thinWireFlag, radialBuildFlag, wireBuildFlag, dipoleFlag, driveFlag, thermalFlag, pairFlag,
}

// thinWireFlag flags the thin-wire ratio: the winding's cross-section against its diameter.
func thinWireFlag(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, d calc.Design) []validity {
	var out []validity
	w := cr.Winding
	R := co.MeanDiameter / 2
	// Thin-wire ratio: a filament's conductor against the coil's diameter.
	if co.Form != calc.Rectangle && R > 0 && co.Wire.Outer > 0 {
		depth := co.Wire.Outer
		what := "wire diameter"
		// Laid-out turns (a solenoid, a multilayer winding) are filaments
		// each of its own wire, so the wire's diameter is the ratio's
		// length; a thin coil's turns lie in one bundle.
		if w.Thin {
			depth, what = cs.Bundle, "bundle diameter"
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
	return out
}

// radialBuildFlag flags a multilayer winding whose turns do not fill the stated radial build.
func radialBuildFlag(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, d calc.Design) []validity {
	var out []validity
	w := cr.Winding
	R := co.MeanDiameter / 2
	// A multilayer winding whose turns do not fill the stated radial build
	// sits nearer the bore than its stated mean diameter says.
	if cs.Underfilled {
		used := cs.Laid.R1 - cs.Laid.R0
		{
			out = append(out, validity{what: "Radial build", flagged: true, text: fmt.Sprintf(
				"the %s lie in %s %s deep, less than the stated radial build of %s; the turns' mean radius is %s against the stated %s. The resistance, field, moment and inductance are those of the turns as laid from the bore%s. A coil wound to fill the stated build would have more turns or a larger mean radius than these results assume.",
				format.Count(co.Turns, "turn", "turns"), format.Count(w.LayerCount, "layer", "layers"), buildText(used), buildText(co.RadialBuild), Eng(cs.MeanRadius, "m", 4), Eng(R, "m", 4), heatLeaves(co))})
		}
	}
	return out
}

// wireBuildFlag flags an estimated wire build.
func wireBuildFlag(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, d calc.Design) []validity {
	var out []validity

	if co.Wire.OuterEstimated {
		out = append(out, validity{what: "Wire build", flagged: true, text: fmt.Sprintf(
			"the wire's overall diameter (%s over %s bare) is an estimate for heavy-build enamelled wire. The winding's length, layers, surface and so its temperature follow from it; the overall diameter of the wire bought, on its maker's data sheet, is to be checked against it.",
			Eng(co.Wire.Outer, "m", 3), Eng(co.Wire.Bare, "m", 3))})
	}
	return out
}

// dipoleFlag flags the distance beyond which the point dipole holds.
func dipoleFlag(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, d calc.Design) []validity {
	var out []validity
	R := co.MeanDiameter / 2
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
	return out
}

// driveFlag flags the d.c. model against the drive frequency.
func driveFlag(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, d calc.Design) []validity {
	var out []validity
	// D.c. against the drive frequency.
	switch ac := cr.AC; {
	case ac.Frequency > 0:
		v := validity{what: "Frequency"}
		parts := []string{fmt.Sprintf("driven at %s: reactance $X = 2\\pi f L$ = %s against $R$ = %s ($X/R$ = %s)",
			Eng(ac.Frequency, "Hz", 3), Eng(ac.Reactance, "Ω", 3), Eng(cr.RHot, "Ω", 3), Sig(ac.Reactance/cr.RHot, 2))}
		if ac.Reactive {
			v.flagged = true
			if co.Drive == calc.VoltageDrive {
				parts = append(parts, fmt.Sprintf("the current is set by the impedance |Z| = %s, not by R alone, and this memo takes it so throughout: current, moment, field and heating are r.m.s. values at V/|Z| (the d.c. current V/R would be higher)", Eng(ac.Impedance, "Ω", 3)))
			} else {
				parts = append(parts, fmt.Sprintf("the imposed current needs the voltage |Z|·I across the impedance |Z| = %s, not R·I: the d.c. voltage of this memo is a lower bound for the driver; the current, moment and field are as stated", Eng(ac.Impedance, "Ω", 3)))
			}
		} else {
			parts = append(parts, "the reactance is negligible and the d.c. figures hold")
		}
		if ac.SkinLimited {
			v.flagged = true
			parts = append(parts, fmt.Sprintf("the skin depth $\\delta$ = %s is less than the wire radius %s, so the a.c. resistance and heating exceed the d.c. figures", Eng(ac.SkinDepth, "m", 3), Eng(ac.WireRadius, "m", 3)))
		} else if !math.IsNaN(ac.SkinDepth) {
			s := fmt.Sprintf("the skin depth $\\delta$ = %s exceeds the wire radius %s", Eng(ac.SkinDepth, "m", 3), Eng(ac.WireRadius, "m", 3))
			if f := acFactor(cs); f >= 1.01 {
				// the layers' field crowds the current even so
				s += fmt.Sprintf(", but the field of the other layers crowds the current in each wire (proximity effect): Dowell's method gives $R_{ac}/R_{dc}$ = %s, and the heat and impedance%s are taken at $R_{ac}$", Sig(f, 3), map[bool]string{true: " and the current", false: ""}[co.Drive == calc.VoltageDrive])
			} else {
				s += ": no skin effect"
			}
			parts = append(parts, s)
		}
		v.text = strings.Join(parts, "; ") + "."
		out = append(out, v)
	case cr.TimeConstant > 0 && !math.IsInf(cr.TimeConstant, 0):
		rise := "After switch-on the current rises with the time constant"
		if co.Drive == calc.CurrentDrive {
			rise = "After switch-on, if the current source applies no more than its compliance voltage I·R, the current rises with the time constant"
		}
		out = append(out, validity{what: "Direct current", text: fmt.Sprintf(
			"the results are steady d.c. values. %s $\\tau = L/R$ = %s and is within 1 %% of its final value after $4.6\\,\\tau$ = %s; faster switching or an a.c. drive changes current, field and heating.",
			rise, Eng(cr.TimeConstant, "s", 3), Eng(4.6*cr.TimeConstant, "s", 3))})
	default:
		out = append(out, validity{what: "Direct current", text: templates.Text("assume-dc", nil)})
	}
	return out
}

// heatLeaves is the underfill note's clause on where a driven coil's heat
// leaves; "" for a pick-up coil, which carries no current to heat it.
func heatLeaves(co calc.Coil) string {
	if analysis.IsReceiver(co) {
		return ""
	}
	return "; the heat is taken to leave through the outside of the stated section (a former, potting or a loose outer layer filling it)"
}

// thermalFlag flags the range of the thermal model.
func thermalFlag(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, d calc.Design) []validity {
	var out []validity

	// Thermal-model range.
	if st := cr.Heat.Steady; st.Settled && !cr.Verdict.NoSolution {
		v := validity{what: "Thermal model"}
		text := fmt.Sprintf("the resistance follows the winding's mean temperature %s linearly ($\\alpha_{20}$ of %s); heat crosses the turns with an effective conductivity of %s, so the hottest point is %s above the surface (surface %s, hottest point %s); the insulation is judged at the hottest point",
			Eng(Celsius(st.Mean), "°C", 3), co.Wire.Material.Name, Eng(cr.Heat.Conductivity, "W/(m·K)", 2), Eng(st.HotSpot-st.Surface, "K", 3), Eng(Celsius(st.Surface), "°C", 4), Eng(Celsius(st.HotSpot), "°C", 4))
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
	} else if cr.Verdict.NoSolution {
		out = append(out, validity{what: "Thermal model", flagged: true, text: "no steady temperature exists (thermal runaway): the electrical figures at the steady state are not defined; see the Safety section."})
	}
	return out
}

// pairFlag flags the Helmholtz condition and the pair's useful region.
func pairFlag(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, d calc.Design) []validity {
	var out []validity
	// Helmholtz condition and the pair's useful region, judged against
	// the turns' mean radius as laid.
	if co.Form == calc.Pair && cr.Pair.Radius > 0 {
		ratio := cr.Pair.SpacingRatio
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
			v.text = fmt.Sprintf("spacing / mean radius $s/a$ = %s: a Helmholtz pair, whose centre field is flat to the fourth order", Sig(ratio, 4))
			if !math.IsNaN(pr.Axial1) {
				v.text += fmt.Sprintf("; the field stays within 1 %% of its centre value for %s along the axis and %s radially", pmEng(pr.Axial1), pmEng(pr.Radial1))
			}
			v.text += "."
		default:
			v.flagged = true
			shape := "a peak at the centre"
			if pr.Dip {
				shape = "a dip at the centre"
			}
			v.text = fmt.Sprintf("spacing / mean radius of the turns $s/a$ = %s, not 1: the field on the axis has %s", Sig(ratio, 4), shape)
			if !math.IsNaN(pr.Axial1) {
				v.text += fmt.Sprintf("; it stays within 1 %% of its centre value for %s along the axis and %s radially", pmEng(pr.Axial1), pmEng(pr.Radial1))
			}
			v.text += fmt.Sprintf(". Spacing the coils at %s would make it a Helmholtz pair.", Eng(cr.Pair.Radius, "m", 4))
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

// capitalise upper-cases the first letter of a sentence or heading.
func capitalise(s string) string {
	if s == "" {
		return s
	}
	r, n := utf8.DecodeRuneInString(s)
	return string(unicode.ToUpper(r)) + s[n:]
}

// pmEng writes a ± distance, "n/a" when unknown.
func pmEng(v float64) string {
	if math.IsNaN(v) {
		return "n/a"
	}
	return "±" + Eng(v, "m", 3)
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
		return fmt.Sprintf("convection with the heat-transfer coefficient stated for this design, h = %s, plus radiation with surface emissivity %s to surroundings at the ambient temperature%s.",
			Eng(cool.H, "W/(m²·K)", 3), Sig(cool.Emissivity, 2), mount)
	case cool.Covered:
		return fmt.Sprintf("radiation with surface emissivity %s to surroundings at the ambient temperature%s, and no convection: the coils lie under or behind a surface that people touch (enclosure = covered), where the open-air correlations do not hold — on the hot side for the convection left out.",
			Sig(cool.Emissivity, 2), mount)
	}
	return fmt.Sprintf("natural convection in still air, the heat-transfer coefficient h from a published correlation for the coil's outer shape at its surface temperature (so it rises as the coil warms), plus radiation with surface emissivity %s to surroundings at the ambient temperature%s.",
		Sig(cool.Emissivity, 2), mount)
}

// acFactor is Dowell's R_ac/R_dc of coil study cs, 1 where it has none.
func acFactor(cs *analysis.CoilStudy) float64 {
	if cs == nil || cs.Kinds.AC == nil || !(cs.Kinds.AC.Factor >= 1) {
		return 1
	}
	return cs.Kinds.AC.Factor
}

// thermalMassWords fill the thermal-model assumption for design d: what
// the warm-up lumps into one thermal mass (the conductor, with a former
// or a core where one is lumped with it, analysis.HeatParts), and the duty
// cycle's sentence where a coil states a duty below 100 % without an
// on-time.
func thermalMassWords(d calc.Design, coils []analysis.CoilStudy) map[string]string {
	former, core, duty := false, false, false
	for i, co := range d.Coils {
		former = former || co.Former.Mass > 0 || co.Former.HeatCapacity > 0
		core = core || (i < len(coils) && coils[i].Heat.CoreHeatCapacity > 0)
		duty = duty || (co.Duty > 0 && co.Duty < 1 && !(co.OnTime > 0))
	}
	mass := "the conductor"
	switch {
	case former && core:
		mass = "the conductor, its former and its core, where stated,"
	case former:
		mass = "the conductor and its former, where stated,"
	case core:
		mass = "the conductor and its core"
	}
	out := map[string]string{"Mass": mass, "Duty": ""}
	if duty {
		out["Duty"] = " A stated duty cycle without an on-time enters as the average power."
	}
	return out
}
