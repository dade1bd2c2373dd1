package memo

import (
	"coilmemo/format"
	"fmt"
	"math"
	"strings"

	"coilmemo/analysis"
	"coilmemo/calc"
	"coilmemo/templates"
)

func wireName(w calc.Wire) string {
	if w.Gauge != calc.NoGauge {
		return fmt.Sprintf("AWG %d %s", w.Gauge, w.Material.Name)
	}
	return Eng(w.Bare, "m", 3) + " " + w.Material.Name
}

// method gives, coil by coil, each result as a numbered equation — the
// relation in symbols, the numbers put in, the result — in the order of
// derivation.
func (c *composer) method() {
	c.heading(1, "Method and results")
	switch {
	case c.receiverOnly():
		c.para(templates.Text("method-pickup", map[string]bool{"Only": true}))
	case c.anyReceiver():
		c.para(templates.Text("method", nil))
		c.para(templates.Text("method-pickup", map[string]bool{"Only": false}))
	default:
		c.para(templates.Text("method", nil))
	}
	d := c.j.Spec.Design
	r := c.j.Results
	for i, co := range d.Coils {
		if i >= len(r.Coils) {
			break
		}
		what := analysis.FormName(co)
		if c.pickUp(i) {
			what += ", pick-up"
		}
		title := func(names string) string {
			return fmt.Sprintf("%s (%s, %s, %s)", capitalise(names), what, format.Count(co.Turns, "turn", "turns"), wireName(co.Wire))
		}
		c.coilPart(co.Name, title, func() {
			if c.pickUp(i) {
				c.derive(c.pickUpSteps(i)...) // memo/receiver.go
				return
			}
			c.derive(coilSteps(co, r.Coils[i], &c.j.Coils[i])...)
		})
	}
}

// coldCurrentSteps derives a voltage-driven winding's current when cold:
// at 20 °C, the reference the moment lost to heating is taken from, which
// in an ambient at or above 20 °C bounds the switch-on current (the
// resistance only rises with temperature) and rates the switch; in a
// colder ambient the switch-on current at the ambient's resistance
// follows, the larger one. Under an a.c. drive the current is V over the
// impedance at 20 °C, √(R20² + (ωL)²) (calc.OperatingPoint).
func coldCurrentSteps(co calc.Coil, cr calc.CoilResult) []Step {
	Ta := cr.Heat.Problem.Ambient
	what := "Current when cold (switch-on), the winding at 20 °C"
	switch amb := Eng(Celsius(Ta), "°C", 3); {
	case Ta > calc.T20+0.05:
		what = "Current with the winding at 20 °C: its resistance rises with temperature, so this bounds the switch-on current in the " + amb + " ambient, and the switch and its suppression are rated on it"
	case Ta < calc.T20-0.05:
		what = "Current at 20 °C, the reference for the moment lost to heating"
	default:
		what += ", its ambient"
	}
	sym, num := `I_{20} = \frac{V}{R_{20}}`, fmt.Sprintf(`\frac{%s}{%s}`, Q(co.Voltage, "V", 4), Q(cr.R20, "Ω", 4))
	if cr.Reactance > 0 { // an a.c. drive: the impedance at 20 °C
		sym = `I_{20} = \frac{V}{\sqrt{R_{20}^2 + (\omega L)^2}}`
		num = fmt.Sprintf(`\frac{%s}{\sqrt{%s^2 + %s^2}}`, Q(co.Voltage, "V", 4), Paren(Q(cr.R20, "Ω", 4)), Paren(Q(cr.Reactance, "Ω", 4)))
	}
	steps := []Step{{What: what, Symbolic: sym, Numbers: num, Result: Q(cr.ColdCurrent, "A", 4)}}
	if Ta < calc.T20-0.05 && cr.Reactance == 0 && cr.Switch.ColdResistance > 0 {
		steps = append(steps, Step{What: "Current at switch-on in the " + Eng(Celsius(Ta), "°C", 3) + " ambient, at the winding's resistance there: the largest current the switch opens",
			Symbolic: `I_c = \frac{V}{R(T_a)}`,
			Numbers:  fmt.Sprintf(`\frac{%s}{%s}`, Q(co.Voltage, "V", 4), Q(cr.Switch.ColdResistance, "Ω", 4)), Result: Q(cr.SwitchOnCurrent, "A", 4)})
	}
	return steps
}

// coilSteps derives one coil block's results: wire and winding, resistance,
// temperature and operating point, moment and field (the inductance and the
// heat balance follow in sections of their own).
func coilSteps(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy) []Step {
	steps := windingSteps(co, cr, cs)
	add := func(s ...Step) { steps = append(steps, s...) }
	add(thermalSteps(co, cr)...)
	add(hotResistanceStep(co, cr)...)
	A := cs.ConductorArea
	// An a.c. drive heats at R_ac = F_R R(T) (Dowell's factor at the mean
	// temperature) and a voltage drive's current is V/|Z|.
	F := cr.Heat.Problem.ACFactor
	ac := F > 1 || cr.Reactance > 0
	if !(F > 1) {
		F = 1
	}
	switch {
	case co.Drive == calc.VoltageDrive && ac:
		add(Step{What: "Current under a.c. voltage drive: the impedance of the a.c. resistance F_R R(T) (Dowell's factor at the mean temperature) and the reactance ωL",
			Symbolic: `I = \frac{V}{\sqrt{(F_R R(T))^2 + (\omega L)^2}}`,
			Numbers:  fmt.Sprintf(`\frac{%s}{\sqrt{(%s \cdot %s)^2 + %s^2}}`, Q(co.Voltage, "V", 4), N(F, 5), Q(cr.RHot, "Ω", 4), Paren(Q(cr.Reactance, "Ω", 4))),
			Result:   Q(cr.Current, "A", 4)})
		add(coldCurrentSteps(co, cr)...)
	case co.Drive == calc.VoltageDrive:
		add(Step{What: "Current under voltage drive, at the hot resistance", Symbolic: `I = \frac{V}{R(T)}`,
			Numbers: fmt.Sprintf(`\frac{%s}{%s}`, Q(co.Voltage, "V", 4), Q(cr.RHot, "Ω", 4)), Result: Q(cr.Current, "A", 4)})
		add(coldCurrentSteps(co, cr)...)
	default:
		add(Step{What: "Voltage under current drive, at the hot resistance", Symbolic: `V = I\, R(T)`,
			Numbers: fmt.Sprintf(`%s \cdot %s`, Q(cr.Current, "A", 4), Q(cr.RHot, "Ω", 4)), Result: Q(cr.Voltage, "V", 4)})
	}
	pOn := cr.PowerOn
	if F > 1 {
		add(Step{What: "Power while energised, at the a.c. resistance F_R R(T): Dowell's factor for skin and proximity losses at the mean temperature",
			Symbolic: `P = I^2 F_R R(T)`,
			Numbers:  fmt.Sprintf(`%s^2 \cdot %s \cdot %s`, Paren(Q(cr.Current, "A", 4)), N(F, 5), Q(cr.RHot, "Ω", 4)), Result: Q(pOn, "W", 4)})
	} else {
		add(Step{What: "Power while energised", Symbolic: `P = I^2 R(T)`,
			Numbers: fmt.Sprintf(`%s^2 \cdot %s`, Paren(Q(cr.Current, "A", 4)), Q(cr.RHot, "Ω", 4)), Result: Q(pOn, "W", 4)})
	}
	if duty := cr.Duty; duty < 1 {
		add(Step{What: "Power averaged over the duty cycle δ", Symbolic: `\bar{P} = \delta P`,
			Numbers: fmt.Sprintf(`%s \cdot %s`, N(duty, 3), Q(pOn, "W", 4)), Result: Q(cr.Power, "W", 4)})
	}
	add(Step{What: "Current density in the conductor", Symbolic: `J = \frac{I}{A}`,
		Numbers: fmt.Sprintf(`\frac{%s}{%s}`, Q(cr.Current, "A", 4), Q(A, "m²", 4)), Result: Q(cr.Density, "A/m²", 3)})
	add(momentSteps(co, cr, cs)...)
	// The inductance is derived in the Inductance and switching section.
	return steps
}

// conductorMass is a coil block's conductor mass, kg: a cored coil's
// results add the core's to it (the study keeps the conductor's apart).
func conductorMass(cr calc.CoilResult, cs *analysis.CoilStudy) float64 {
	if cs.Kinds.Core != nil {
		return cs.Kinds.AirMass
	}
	return cr.Mass
}

// hotResistanceStep is the resistance at the winding's mean temperature.
func hotResistanceStep(co calc.Coil, cr calc.CoilResult) []Step {
	if cr.Verdict.NoSolution || math.IsNaN(cr.RHot) {
		return nil
	}
	mat := co.Wire.Material
	// the temperature the resistance was taken at (the winding's mean)
	T := Celsius(cr.Heat.Steady.Mean)
	return []Step{{What: fmt.Sprintf("Resistance at the mean winding temperature, temperature coefficient %s /K", Sig(mat.Alpha20, 3)),
		Symbolic: `R(T) = R_{20} \left[ 1 + \alpha_{20} (T - 20\,\unit{°C}) \right]`,
		Numbers:  fmt.Sprintf(`%s \left[ 1 + %s\,\unit{K^{-1}} \cdot (%s - 20\,\unit{°C}) \right]`, Q(cr.R20, "Ω", 4), N(mat.Alpha20, 3), Q(T, "°C", 3)),
		Result:   Q(cr.RHot, "Ω", 4)}}
}

// windingSteps derive the wire and winding of one coil block: wire
// diameter and section, layout, wire length, conductor mass and the
// resistance at 20 °C.
func windingSteps(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy) []Step {
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
			add(Step{What: "Copper fill factor of the stated winding cross-section", Symbolic: `\lambda = \frac{N A}{\ell\, b}`,
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
		Result:  Q(conductorMass(cr, cs), "kg", 3)})
	add(Step{What: fmt.Sprintf("Resistance at 20 °C, resistivity of %s %s", mat.Name, Eng(mat.Rho20, "Ω·m", 5)),
		Symbolic: `R_{20} = \frac{\rho_{20}\, \ell_w}{A}`,
		Numbers:  fmt.Sprintf(`\frac{%s \cdot %s}{%s}`, Q(mat.Rho20, "Ω·m", 5), Q(cr.Length, "m", 4), Q(A, "m²", 4)),
		Result:   Q(cr.R20, "Ω", 4)})
	return steps
}

// thermalSteps give the steady mean winding temperature that the
// resistance follows. The heat balance that yields it is derived step by
// step in the Heating section; here it enters the chain of derivation.
func thermalSteps(co calc.Coil, cr calc.CoilResult) []Step {
	if cr.Verdict.NoSolution || math.IsNaN(cr.RHot) {
		return []Step{{What: "Steady winding temperature: none exists, the winding runs away thermally (see the Heating and Safety sections)",
			Symbolic: `T = ` + Words("no steady state")}}
	}
	// The mean temperature is the one the hot resistance was taken at.
	mean := Celsius(cr.Heat.Steady.Mean)
	return []Step{{What: "Steady mean winding temperature, from the heat balance of the winding's surface derived in the Heating section",
		Symbolic: `T = ` + Q(mean, "°C", 3)}}
}

// momentSteps derive the magnetic moment and the field at the centre.
//
// For a cored coil the sums are the winding's own (the air values of
// cs.Kinds), and a step each adds the core's share, derived in the core's
// section, to give the results.
func momentSteps(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy) []Step {
	w := cr.Winding
	I := Q(cr.Current, "A", 4)
	m := Q(cr.Moment.Norm(), "A·m²", 4)
	core := cs.Kinds.Core
	if core != nil {
		m = Q(cs.Kinds.AirMoment.Norm(), "A·m²", 4) // the winding's
	}
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
		mom.What = fmt.Sprintf("Magnetic moment: current times the area of every turn, Σπrᵢ² = %s over the %s", Eng(w.AreaSum, "m²", 5), format.Count(co.Turns, "turn", "turns"))
		mom.Numbers = fmt.Sprintf(`%s%s \cdot %s`, pair, I, Q(w.AreaSum, "m²", 5))
	}
	if core != nil {
		mom.What = strings.Replace(mom.What, "Magnetic moment:", "Magnetic moment of the winding alone:", 1)
		mom.Symbolic = strings.Replace(mom.Symbolic, "m = ", "m_w = ", 1)
	}
	steps = append(steps, mom)
	if core != nil {
		mw := cs.Kinds.AirMoment.Norm()
		steps = append(steps, Step{What: "Magnetic moment of winding and core, the core's own moment at this current derived in the core's section",
			Symbolic: `m = m_w + m_c`, Numbers: fmt.Sprintf(`%s + %s`, Q(mw, "A·m²", 4), Q(cr.Moment.Norm()-mw, "A·m²", 4)),
			Result: Q(cr.Moment.Norm(), "A·m²", 4)})
	}
	if co.Centre.Norm() != 0 {
		return steps
	}
	B := Q(cr.FieldCentre.Norm(), "T", 4)
	if core != nil {
		B = Q(cs.Kinds.AirField.Norm(), "T", 4) // the winding's; the core's is added below
	}
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
		turns := "the " + format.Count(co.Turns, "turn", "turns")
		if co.Form == calc.Pair {
			turns = "the " + format.Count(2*co.Turns, "turn", "turns") + " of both coils"
		}
		steps = append(steps, Step{What: fmt.Sprintf("Field at the centre: the on-axis field of every turn (radius rᵢ, axial distance zᵢ from the centre), summed; Σ rᵢ²/(2 (rᵢ² + zᵢ²)·√(rᵢ² + zᵢ²)) = %s m⁻¹ over %s", Sig(cs.CentreSum, 5), turns),
			Symbolic: `B_0 = \sum_{i} \frac{\mu_0 I r_i^2}{2 \left( r_i^2 + z_i^2 \right)^{3/2}}`,
			Numbers:  fmt.Sprintf(`\mu_0 \cdot %s \cdot %s\,\unit{m⁻¹}`, I, N(cs.CentreSum, 5)), Result: B})
	}
	if core != nil {
		last := &steps[len(steps)-1] // the winding's own field at the centre
		last.Symbolic = strings.Replace(last.Symbolic, "B_0 = ", "B_w = ", 1)
		last.What = strings.Replace(last.What, "Field at the centre", "Field of the winding alone at the centre", 1)
		bw := cs.Kinds.AirField.Norm()
		steps = append(steps, Step{What: "Field at the centre with the core: the winding's (above) plus the core's from the slice model's spread poles (core section)",
			Symbolic: `B_0 = B_w + B_c`, Numbers: fmt.Sprintf(`%s + %s`, Q(bw, "T", 4), Q(cr.FieldCentre.Norm()-bw, "T", 4)),
			Result: Q(cr.FieldCentre.Norm(), "T", 4)})
	}
	return steps
}
