package memo

import (
	"fmt"
	"math"
	"strings"

	"coilmemo/analysis"
	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/figures"
	"coilmemo/format"
)

// receiver writes up the pick-up coils (sensitivity, noise, capacitance,
// self-resonance, the response figure) and the a.c. resistance of driven
// windings with a frequency (Dowell), every number from the Study.
func (c *composer) receiver() {
	d := c.j.Spec.Design
	first := true
	for i, co := range d.Coils {
		k := c.j.Coils[i].Kinds
		// A driven winding is written up here only where the a.c.
		// resistance differs from the d.c. one by 1 % or more.
		if k.Receiver == nil && (k.AC == nil || k.AC.Factor < 1.01) {
			continue
		}
		if first {
			title, intro := c.receiverIntro()
			c.heading(1, title)
			c.para(intro)
			first = false
		}
		c.heading(2, fmt.Sprintf("Coil %q", co.Name))
		if r := k.Receiver; r != nil {
			c.para(pickUpText(co, r, k))
		} else {
			steps := acLossSteps(co, c.j.Results.Coils[i], *k.AC)
			if !math.IsNaN(k.ACPower) {
				steps = append(steps, Step{What: "Heating at the a.c. resistance (duty-averaged)", Symbolic: `P_{ac} = F_R P_{dc}`,
					Numbers: fmt.Sprintf(`%s \cdot %s`, N(k.AC.Factor, 4), Q(k.DCPower, "W", 4)), Result: Q(k.ACPower, "W", 4)})
			}
			if !math.IsNaN(k.SelfResonance) {
				cs := &c.j.Coils[i]
				where := " (derived in Inductance and switching)"
				if math.IsNaN(cs.SwitchOff.Ringing) {
					where = " (above)"
					steps = append(steps, capacitanceSteps(co, k.Capacitance, cs.Envelope.Round)...)
				}
				steps = append(steps, Step{What: "Self-resonant frequency: the inductance with the winding's own capacitance Cₛ" + where, Symbolic: `f_{sr} = \frac{1}{2 \pi \sqrt{L C_s}}`,
					Numbers: fmt.Sprintf(`\frac{1}{2 \pi \sqrt{%s \cdot %s}}`, Q(k.ResonanceInductance, "H", 4), Q(k.SelfCapacitance, "F", 3)), Result: Q(k.SelfResonance, "Hz", 3)})
			}
			c.derive(steps...)
		}
		if k.AboveResonance {
			c.para("The frequency is at or above the self-resonance: the series R–L model does not hold there, and no impedance is quoted.")
		}
		if r := k.Receiver; r != nil && len(r.Response) > 1 {
			var f, s []float64
			for _, p := range r.Response {
				f, s = append(f, p.Frequency), append(s, p.Sensitivity)
			}
			var marks []figures.Mark
			var dotted []string
			if r.Frequency > 0 {
				marks = append(marks, figures.Mark{X: r.Frequency, Label: "f " + Eng(r.Frequency, "Hz", 3)})
				dotted = append(dotted, "the design frequency f")
			}
			if fsr := r.SelfResonance; fsr > 0 && fsr <= f[len(f)-1] {
				marks = append(marks, figures.Mark{X: fsr, Label: "self-resonance " + Eng(fsr, "Hz", 3)})
				dotted = append(dotted, "the self-resonance")
			}
			// The stated band, shaded where it lies in the range plotted.
			var band [2]float64
			var bandLabel, shaded string
			if lo, hi := co.BandLow, co.BandHigh; lo > 0 && hi > lo && hi > f[0] && lo < f[len(f)-1] {
				band = [2]float64{lo, hi}
				bandLabel = "stated band, " + Eng(lo, "Hz", 3) + " to " + Eng(hi, "Hz", 3)
				shaded = fmt.Sprintf("; shaded: the stated band, %s to %s", Eng(lo, "Hz", 3), Eng(hi, "Hz", 3))
				if lo < f[0] || hi > f[len(f)-1] {
					shaded += ", as far as it lies in the range plotted"
				}
			}
			n := c.figure + 1
			reading, lead := responseLeadIn(n, r, f, s)
			if reading != "" {
				c.para(reading)
			}
			if band[0] > 0 {
				lead += fmt.Sprintf(" The stated band, %s to %s, is shaded.", Eng(band[0], "Hz", 3), Eng(band[1], "Hz", 3))
			}
			c.para(lead)
			caption := fmt.Sprintf("Terminal sensitivity of coil %q against frequency (lumped R–L–C model%s", co.Name, shaded)
			if len(dotted) > 0 {
				caption += "; dotted: " + joinAnd(dotted)
			}
			c.fig(doc.Figure{Caption: caption + ")",
				Width: figWidth, Height: figHeight * 0.85, Draw: figures.Response(f, s, band, bandLabel, marks...),
				Summary: fmt.Sprintf("Peak near %s.", Eng(r.SelfResonance, "Hz", 3))})
		}
	}
}

// receiverIntro is the title of the section on pick-up and a.c. figures
// ("A.c. figures" without a pick-up coil) and its opening, which says what
// it states: a pick-up coil's figures where the design has a pick-up coil,
// a driven winding's a.c. resistance where one is written up here.
func (c *composer) receiverIntro() (title, intro string) {
	var pickUp, driven bool
	for i, co := range c.j.Spec.Design.Coils {
		if i >= len(c.j.Coils) {
			break
		}
		k := c.j.Coils[i].Kinds
		switch {
		case analysis.IsReceiver(co) && k.Receiver != nil:
			pickUp = true
		case k.AC != nil && k.AC.Factor >= 1.01:
			driven = true
		}
	}
	var s []string
	if pickUp {
		s = append(s, "A pick-up coil is stated by its sensitivity to a field along its axis, the thermal noise of its winding and the field that noise is equivalent to, and its self-resonance, above which the lumped model does not hold.")
	}
	if driven {
		s = append(s, "A winding driven at a frequency is stated by its a.c. resistance, which includes the skin and proximity effects of its layers by Dowell's method and sets its heating, and by its self-resonance, below which its series R–L model holds.")
	} else {
		s = append(s, "An a.c. winding's resistance includes the skin and proximity effects of its layers by Dowell's method.")
	}
	title = "A.c. figures"
	if pickUp {
		title = "Pick-up and a.c. figures"
	}
	return title, strings.Join(s, " ")
}

// responseLeadIn says what to read from the response figure n of
// pick-up coil r (frequencies f, terminal sensitivities s): reading, the
// band where the coil follows the induction law 2π f A (within
// 10 %), and lead, the figure's short lead-in naming the straight rise,
// the resonance peak and where the lumped model stops.
func responseLeadIn(n int, r *calc.ReceiverResult, f, s []float64) (reading, lead string) {
	lead = fmt.Sprintf("Figure %d shows the sensitivity at the terminals against frequency, both on logarithmic scales.", n)
	a := r.EffectiveArea
	if !(a > 0) {
		return "", lead
	}
	var b strings.Builder
	// ratio is the terminal sensitivity over the induction law's.
	ratio := func(k int) float64 { return s[k] / (2 * math.Pi * f[k] * a) }
	top := r.WorkingBandTop
	law := fmt.Sprintf("in proportion to frequency, as the induction law 2π f A gives for its effective area A (2π A = %s per hertz)", Eng(2*math.Pi*a, "V/T", 3))
	switch {
	case math.IsNaN(top):
	case math.IsInf(top, 1):
		fmt.Fprintf(&b, "Over the whole range plotted the terminal sensitivity rises %s, within 10 %%: that is the coil's working band.", law)
	case top == 0:
		fmt.Fprintf(&b, "Already at %s the terminal sensitivity departs from the induction law 2π f A by more than 10 %%.", Eng(f[0], "Hz", 3))
	default:
		fmt.Fprintf(&b, "Up to about %s the terminal sensitivity rises %s, within 10 %%: that is the coil's working band.", Eng(top, "Hz", 2), law)
	}
	if r.Frequency > 0 && !math.IsNaN(top) {
		if r.Frequency < top {
			b.WriteString(" The design frequency lies in it.")
		} else {
			b.WriteString(" The design frequency lies beyond it, where the capacitance already shapes the response.")
		}
	}
	pk := 0
	for k := range s {
		if s[k] > s[pk] {
			pk = k
		}
	}
	fsr := r.SelfResonance
	switch {
	case pk < len(s)-1 && pk > 0:
		fr := ""
		if fsr > 0 {
			fr = fmt.Sprintf(" (%s, dotted)", Eng(fsr, "Hz", 3))
		}
		lead += fmt.Sprintf(" The straight rise is the working band; the peak, %s times the induction law near %s, is the self-resonance%s. Above it the lumped R–L–C model no longer describes the winding: the curve there is a trend, not values to use.",
			Sig(ratio(pk), 2), Eng(f[pk], "Hz", 3), fr)
	case fsr > 0:
		lead += fmt.Sprintf(" The straight rise is the working band; the self-resonance, %s, lies beyond the range plotted.", Eng(fsr, "Hz", 3))
	default:
		lead += " The straight rise is the working band."
	}
	return b.String(), lead
}

// pickUpText sums up a pick-up coil's figures for the section on pick-up
// coils; they are derived in the Method and results section.
func pickUpText(co calc.Coil, r *calc.ReceiverResult, k analysis.CoilKinds) string {
	var b strings.Builder
	fmt.Fprintf(&b, "The figures of pick-up coil %q are derived in the Method and results section. ", co.Name)
	if r.Frequency > 0 {
		fmt.Fprintf(&b, "At %s it gives %s per tesla of field along its axis (open circuit), and the thermal noise of its winding equals a field of %s. ",
			Eng(r.Frequency, "Hz", 3), Eng(r.Sensitivity, "V", 4), Eng(r.NoiseField, "T/√Hz", 3))
	}
	if !math.IsNaN(r.BandNoiseField) {
		fmt.Fprintf(&b, "Over the band %s to %s that noise is %s rms. ", Eng(co.BandLow, "Hz", 3), Eng(co.BandHigh, "Hz", 3), Eng(r.BandNoiseField, "T", 3))
	}
	if fsr := r.SelfResonance; fsr > 0 {
		fmt.Fprintf(&b, "With its load it resonates at %s, above which the lumped model does not hold.", Eng(fsr, "Hz", 3))
	} else {
		b.WriteString("Its self-resonance is not computed for this form.")
	}
	return strings.TrimSpace(b.String())
}

// acLossSteps derive a winding's a.c. resistance at its frequency by
// Dowell's method, at the hot resistance of cr.
func acLossSteps(co calc.Coil, cr calc.CoilResult, a calc.ACLoss) []Step {
	return []Step{
		{What: fmt.Sprintf("Equivalent foil thickness over the skin depth for %s of round wire (Dowell, Proc. IEE 113 (1966) 1387, §4)", format.Count(a.Layers, "layer", "layers")),
			Symbolic: `\Delta = \frac{\sqrt{\pi}}{2} \frac{d}{\delta} \sqrt{\eta}`,
			Numbers:  fmt.Sprintf(`\frac{\sqrt{\pi}}{2} \cdot \frac{%s}{%s} \cdot \sqrt{%s}`, Q(co.Wire.Bare, "m", 4), Q(a.SkinDepth, "m", 4), N(a.Porosity, 4)),
			Result:   N(a.Delta, 4)},
		{What: "Ratio of a.c. to d.c. resistance (Dowell 1966, eq. 21 over the layers)",
			Symbolic: `F_R = \Delta \left( \varsigma_1(\Delta) + \frac{2}{3} (p^2 - 1) \varsigma_2(\Delta) \right)`,
			Numbers:  fmt.Sprintf(`F_R(%s, p = %d)`, N(a.Delta, 4), a.Layers), Result: N(a.Factor, 4)},
		{What: "A.c. resistance at the winding temperature", Symbolic: `R_{ac} = F_R R_{dc}`,
			Numbers: fmt.Sprintf(`%s \cdot %s`, N(a.Factor, 4), Q(cr.RHot, "Ω", 4)), Result: Q(a.Rac, "Ω", 4)},
	}
}

// pickUpSteps derive pick-up coil i's figures for the Method and results
// section: wire and winding, the resistance at the ambient temperature (no
// current heats it) and at the design frequency (Dowell), the effective
// area, sensitivity and thermal noise, the inductance, the self-capacitance
// by the formula that suits the winding, and the self-resonance with the
// load — every number from the Study.
func (c *composer) pickUpSteps(i int) []Step {
	co := c.j.Spec.Design.Coils[i]
	cr := c.j.Results.Coils[i]
	cs := &c.j.Coils[i]
	k := cs.Kinds
	r := k.Receiver
	steps := windingSteps(co, cr, cs) // memo/method.go
	add := func(s ...Step) { steps = append(steps, s...) }
	if r == nil {
		return steps
	}
	add(Step{What: "Winding temperature: a pick-up coil carries no current, so its winding is at the ambient temperature; its resistance and thermal noise are taken there",
		Symbolic: `T = ` + Q(Celsius(k.Temperature), "°C", 3)})
	for _, st := range hotResistanceStep(co, cr) {
		st.What = strings.Replace(st.What, "at the mean winding temperature", "at the winding temperature", 1)
		add(st)
	}
	if a := k.AC; a != nil {
		add(acLossSteps(co, cr, *a)...)
	}
	if k.Core != nil {
		add(Step{What: "Effective area, the flux linkage per tesla of a uniform axial field, with the core (derived in the Core section)",
			Symbolic: `A_{eff} = ` + Q(r.EffectiveArea, "m²", 4)})
	} else {
		st := Step{What: "Effective area, the flux linkage per tesla of a uniform axial field: the area of every turn, summed",
			Symbolic: `A_{eff} = \sum_{i=1}^{N} \pi r_i^2`, Result: Q(r.EffectiveArea, "m²", 4)}
		if w := cr.Winding; w.Thin || w.LayerCount <= 1 {
			st.Numbers = fmt.Sprintf(`%d \cdot \pi \cdot %s^2`, co.Turns, Paren(Q(co.MeanDiameter/2, "m", 4)))
		} else {
			st.What += fmt.Sprintf(": N turns of mean square radius ⟨r²⟩ = %s", Eng(cs.MeanSquareRadius, "m²", 4))
			st.Symbolic += ` = N \pi \langle r^2 \rangle`
			st.Numbers = fmt.Sprintf(`%d \cdot \pi \cdot %s`, co.Turns, Q(cs.MeanSquareRadius, "m²", 4))
		}
		add(st)
	}
	if r.Frequency > 0 {
		add(Step{What: "Sensitivity by Faraday's law (Tumanski, Meas. Sci. Technol. 18 (2007) R31, eq. 1)",
			Symbolic: `S = 2 \pi f A_{eff}`, Numbers: fmt.Sprintf(`2\pi \cdot %s \cdot %s`, Q(r.Frequency, "Hz", 4), Q(r.EffectiveArea, "m²", 4)),
			Result: Q(r.Sensitivity, "V/T", 4)})
		R, name := `R_{ac}`, "a.c. resistance"
		if k.AC == nil {
			R, name = `R(T)`, "resistance"
		}
		add(Step{What: fmt.Sprintf("Thermal noise of the winding's %s (Nyquist, Phys. Rev. 32 (1928) 110)", name), Symbolic: `e_n = \sqrt{4 k T ` + R + `}`,
			Numbers: fmt.Sprintf(`\sqrt{4 k \cdot %s \cdot %s}`, Q(k.Temperature, "K", 5), Q(r.Resistance, "Ω", 4)), Result: Q(r.NoiseVoltage, "V/√Hz", 3)},
			Step{What: "Noise-equivalent field: the field whose e.m.f. equals the thermal noise", Symbolic: `B_n = \frac{e_n}{S}`,
				Numbers: fmt.Sprintf(`\frac{%s}{%s}`, Q(r.NoiseVoltage, "V/√Hz", 3), Q(r.Sensitivity, "V/T", 4)), Result: Q(r.NoiseField, "T/√Hz", 3)})
	}
	if !math.IsNaN(r.BandNoiseField) {
		add(Step{What: fmt.Sprintf("Noise-equivalent field over the band %s to %s, with the resistance at each frequency (Gauss–Legendre quadrature in ln f); near the self-resonance too, since the induced voltage and the thermal noise are both in series with the winding and the capacitance divides them alike", Eng(co.BandLow, "Hz", 3), Eng(co.BandHigh, "Hz", 3)),
			Symbolic: `B_{rms} = \sqrt{\int_{f_1}^{f_2} \left( \frac{\sqrt{4 k T R_{ac}(f)}}{2 \pi f A_{eff}} \right)^2 df}`,
			Numbers: fmt.Sprintf(`\sqrt{\int_{%s}^{%s} \left( \frac{\sqrt{4 k \cdot %s \cdot R_{ac}(f)}}{2 \pi f \cdot %s} \right)^2 df}`,
				Q(co.BandLow, "Hz", 3), Q(co.BandHigh, "Hz", 3), Q(k.Temperature, "K", 5), Q(r.EffectiveArea, "m²", 4)),
			Result: Q(r.BandNoiseField, "T", 3)})
	}
	add(selfInductanceSteps(co, cr, cs)...) // memo/electrical.go
	if k.Core != nil {
		add(Step{What: "Small-signal inductance with the core (derived in the Core section)", Symbolic: `L = ` + Q(cr.Inductance, "H", 4)})
	}
	add(capacitanceSteps(co, k.Capacitance, cs.Envelope.Round)...)
	add(Step{What: "Capacitance across the terminals: the winding's own plus the load", Symbolic: `C = C_s + C_{load}`,
		Numbers: fmt.Sprintf(`%s + %s`, Q(r.SelfCapacitance, "F", 3), Q(co.LoadCapacitance, "F", 3)), Result: Q(r.Capacitance, "F", 3)})
	if !math.IsNaN(r.SelfResonance) {
		add(Step{What: "Self-resonant frequency: the parallel resonance of the inductance and the capacitance across it (Terman, Radio Engineers' Handbook, 1943, §3)",
			Symbolic: `f_{sr} = \frac{1}{2 \pi \sqrt{L C}}`,
			Numbers:  fmt.Sprintf(`\frac{1}{2 \pi \sqrt{%s \cdot %s}}`, Q(cr.Inductance, "H", 4), Q(r.Capacitance, "F", 3)),
			Result:   Q(r.SelfResonance, "Hz", 3)})
	}
	return steps
}

// layersWords names the layers the capacitance model counts: a thin
// coil's round bundle (round) is taken as that many layers of its turns.
func layersWords(round bool, n int) string {
	if round {
		return "the bundle taken as " + format.Count(n, "layer", "layers") + " of its turns"
	}
	return format.Count(n, "layer", "layers")
}

// capacitanceSteps derive a winding's self-capacitance by the formula the
// analysis chose (calc.SelfCapacitanceParts).
func capacitanceSteps(co calc.Coil, p calc.CapacitanceParts, round bool) []Step {
	switch {
	case math.IsNaN(p.Capacitance):
		return []Step{{What: "Self-capacitance of the winding: not modelled for this form", Symbolic: `C_s = ` + Words("not computed")}}
	case p.Layered:
		return []Step{
			{What: fmt.Sprintf("Capacitance between adjacent layers: the turn-to-turn capacitances of the turns facing the next layer, through the enamel (relative permittivity %s, common practice) and the air beside the contact, summed (Massarini & Kazimierczuk, IEEE Trans. Power Electron. 12 (1997) 671), the mean over the %s: the capacitance per metre of two touching turns times the length of the turns of a layer that face the next",
				Sig(calc.EnamelPermittivity, 2), format.Count(p.Layers-1, "gap", "gaps")),
				Symbolic: `C_l = \sum C_{tt} = c_{tt}\, \ell_f`,
				Numbers:  fmt.Sprintf(`%s \cdot %s`, Q(p.PerLength, "F/m", 4), Q(p.Facing, "m", 4)),
				Result:   Q(p.LayerCapacitance, "F", 3)},
			{What: fmt.Sprintf("Self-capacitance of %s wound back and forth, by the energy stored in the gaps (Dalessandro, Cavalcante & Kolar, IEEE Trans. Power Electron. 22 (2007) 2081)", layersWords(round, p.Layers)),
				Symbolic: `C_s = \frac{4}{3} C_l \frac{p - 1}{p^2}`,
				Numbers:  fmt.Sprintf(`\frac{4}{3} \cdot %s \cdot \frac{%d - 1}{%d^2}`, Q(p.LayerCapacitance, "F", 3), p.Layers, p.Layers),
				Result:   Q(p.Capacitance, "F", 3)},
		}
	}
	return []Step{{What: "Self-capacitance of a single-layer solenoid of diameter D and length ℓ, Medhurst's measured shape factor as fitted (Medhurst, Wireless Engineer 24 (1947) 35 and 80)",
		Symbolic: `C_s = D \left( 0.1126 \frac{\ell}{D} + 0.08 + 0.27 \sqrt{\frac{D}{\ell}} \right) \cdot 100\,\unit{pF/m}`,
		Numbers: fmt.Sprintf(`%s \left( 0.1126 \cdot \frac{%s}{%s} + 0.08 + 0.27 \sqrt{\frac{%s}{%s}} \right) \cdot 100\,\unit{pF/m}`,
			Q(p.Diameter, "m", 4), Q(p.Length, "m", 4), Q(p.Diameter, "m", 4), Q(p.Diameter, "m", 4), Q(p.Length, "m", 4)),
		Result: Q(p.Capacitance, "F", 3)}}
}

// pickUpFlags are a pick-up coil's validity flags: those of its winding
// and wire, and in place of the drive and thermal ones (no current flows)
// the range of its lumped model.
func pickUpFlags(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, d calc.Design) []validity {
	var out []validity
	for _, f := range []func(calc.Coil, calc.CoilResult, *analysis.CoilStudy, calc.Design) []validity{thinWireFlag, radialBuildFlag, wireBuildFlag} {
		out = append(out, f(co, cr, cs, d)...)
	}
	k := cs.Kinds
	v := validity{what: "Pick-up coil", text: fmt.Sprintf("no current flows, so the winding is not heated and stays at the ambient temperature, %s, at which its resistance and thermal noise are taken. ", Eng(Celsius(k.Temperature), "°C", 3))}
	if fsr := k.SelfResonance; fsr > 0 {
		v.text += fmt.Sprintf("Its response is that of a lumped series R–L with the capacitance across the terminals, which holds well below the self-resonance, %s; the thermal noise of any amplifier it feeds is not included.", Eng(fsr, "Hz", 3))
		v.flagged = k.AboveResonance
	} else {
		v.text += "Its self-resonance is not computed for this form; its response is that of a lumped series R–L, and the thermal noise of any amplifier it feeds is not included."
	}
	return append(out, v)
}

// receiverOnly says whether every coil block of the design is a pick-up
// coil: the design then has no drive, and the sections that state a
// driven coil's field, torque, switching and heating (all zero, or
// meaningless, at no current) are not written; the receiver section and
// page 1 state the receiver's own figures instead.
func (c *composer) receiverOnly() bool {
	d := c.j.Spec.Design
	if len(d.Coils) == 0 {
		return false
	}
	for _, co := range d.Coils {
		if !analysis.IsReceiver(co) {
			return false
		}
	}
	return true
}

// anyReceiver says whether some coil block is a pick-up coil.
func (c *composer) anyReceiver() bool {
	for _, co := range c.j.Spec.Design.Coils {
		if analysis.IsReceiver(co) {
			return true
		}
	}
	return false
}

// drivenCoils are the indices of the coil blocks that are not pick-up
// coils, in spec order: the coils whose current, field, switching and
// heating the memo writes up.
func (c *composer) drivenCoils() []int {
	var idx []int
	for i, co := range c.j.Spec.Design.Coils {
		if i < len(c.j.Results.Coils) && !analysis.IsReceiver(co) {
			idx = append(idx, i)
		}
	}
	return idx
}

// pickUp says whether coil block i is a pick-up coil.
func (c *composer) pickUp(i int) bool {
	d := c.j.Spec.Design
	return i < len(d.Coils) && analysis.IsReceiver(d.Coils[i])
}

// pickUpNote names the pick-up coils of a design that also has driven
// ones, for a section about the driven coils: "Coil "S" is a pick-up coil
// (no drive) and carries no current: " followed by one (for one pick-up
// coil) or many (for several), and a full stop; "" without pick-up coils
// or without driven ones (the section is then not written).
func (c *composer) pickUpNote(one, many string) string {
	if c.receiverOnly() {
		return ""
	}
	var names []string
	for i, co := range c.j.Spec.Design.Coils {
		if c.pickUp(i) {
			names = append(names, fmt.Sprintf("%q", co.Name))
		}
	}
	switch len(names) {
	case 0:
		return ""
	case 1:
		return fmt.Sprintf("Coil %s is a pick-up coil (no drive) and carries no current: %s.", names[0], one)
	}
	return fmt.Sprintf("Coils %s are pick-up coils (no drive) and carry no current: %s.", joinAnd(names), many)
}

// driven wraps a section that is about driven coils: it writes nothing
// for a design of pick-up coils only (receiverOnly).
func driven(fn func(*composer)) func(*composer) {
	return func(c *composer) {
		if c.receiverOnly() {
			return
		}
		fn(c)
	}
}

// bandShortfalls are page 1's sentences on the pick-up coils whose
// working band ends below the top of their stated band: there the
// sensitivity is no longer the induction law's, so the coil does not
// serve the whole band it is stated for.
func (c *composer) bandShortfalls() []string {
	var out []string
	for i, co := range c.j.Spec.Design.Coils {
		if i >= len(c.j.Coils) || c.j.Coils[i].Kinds.Receiver == nil {
			continue
		}
		r := c.j.Coils[i].Kinds.Receiver
		top := r.WorkingBandTop
		if !(co.BandHigh > 0) || math.IsNaN(top) || math.IsInf(top, 1) || top >= co.BandHigh {
			continue
		}
		if top == 0 {
			out = append(out, fmt.Sprintf("Coil %q does not cover its stated band of %s to %s: its sensitivity departs from the induction law 2π f A (A its effective area) by more than 10 %% already at %s, the lowest frequency computed.",
				co.Name, Eng(co.BandLow, "Hz", 3), Eng(co.BandHigh, "Hz", 3), Eng(r.Response[0].Frequency, "Hz", 3)))
			continue
		}
		out = append(out, fmt.Sprintf("Coil %q does not cover its stated band of %s to %s: its sensitivity follows the induction law 2π f A (A its effective area) within 10 %% only up to about %s, so from there to %s it is shaped by the winding's capacitance (self-resonance %s with the load) and cannot be taken as 2π f A.",
			co.Name, Eng(co.BandLow, "Hz", 3), Eng(co.BandHigh, "Hz", 3), Eng(top, "Hz", 2), Eng(co.BandHigh, "Hz", 3), Eng(r.SelfResonance, "Hz", 3)))
	}
	return out
}

// receiverSummary is page 1's table of the pick-up coils: sensitivity,
// noise-equivalent field at the design frequency and over the band,
// self-resonance with the load, resistance, inductance and capacitance.
func (c *composer) receiverSummary() doc.Table {
	d := c.j.Spec.Design
	var idx []int
	head := []string{"Result"}
	for i, co := range d.Coils {
		if i < len(c.j.Coils) && c.j.Coils[i].Kinds.Receiver != nil {
			idx = append(idx, i)
			head = append(head, co.Name)
		}
	}
	row := func(name string, f func(i int) string) []doc.Cell {
		cells := []doc.Cell{{Text: name}}
		for _, i := range idx {
			cells = append(cells, doc.Cell{Text: f(i)})
		}
		return cells
	}
	rec := func(i int) calc.ReceiverResult { return *c.j.Coils[i].Kinds.Receiver }
	orDash := func(v float64, unit string, sig int) string {
		if math.IsNaN(v) {
			return "—"
		}
		return Eng(v, unit, sig)
	}
	rows := [][]doc.Cell{
		row("Design frequency", func(i int) string { return orDash(nonZero(rec(i).Frequency), "Hz", 3) }),
		row("Sensitivity (open circuit, at the design frequency)", func(i int) string { return orDash(nonZero(rec(i).Sensitivity), "V/T", 4) }),
		row("Noise-equivalent field at the design frequency", func(i int) string { return orDash(nonZero(rec(i).NoiseField), "T/√Hz", judged) }),
		row("Noise-equivalent field, rms over the band", func(i int) string {
			co := d.Coils[i]
			if math.IsNaN(rec(i).BandNoiseField) {
				return "—"
			}
			return fmt.Sprintf("%s (%s to %s)", Eng(rec(i).BandNoiseField, "T", judged), Eng(co.BandLow, "Hz", 3), Eng(co.BandHigh, "Hz", 3))
		}),
		row("Self-resonance, with the load", func(i int) string { return orDash(rec(i).SelfResonance, "Hz", judged) }),
		row("Working band: sensitivity within 10 % of 2π f A", func(i int) string {
			switch top := rec(i).WorkingBandTop; {
			case math.IsNaN(top):
				return "—"
			case math.IsInf(top, 1):
				return "over the whole response"
			case top == 0:
				return "none"
			default:
				return "up to " + Eng(top, "Hz", 2)
			}
		}),
		row("Resistance, a.c. at the design frequency", func(i int) string { return orDash(rec(i).Resistance, "Ω", 3) }),
		row(smallSignalLabel(c.j, idx), func(i int) string { return orDash(c.j.Results.Coils[i].Inductance, "H", 3) }),
		row("Capacitance across the terminals (winding + load)", func(i int) string { return orDash(rec(i).Capacitance, "F", 3) }),
		row("Effective area (flux linkage per tesla)", func(i int) string { return orDash(rec(i).EffectiveArea, "m²", 3) }),
		row("Wire length / conductor mass", func(i int) string {
			return Eng(c.j.Results.Coils[i].Length, "m", 3) + " / " + Eng(c.j.Coils[i].Kinds.AirMass, "kg", judged)
		}),
	}
	anyCore := false
	for _, i := range idx {
		anyCore = anyCore || c.j.Coils[i].Kinds.Core != nil
	}
	if anyCore {
		rows = append(rows, row("Core mass / total mass (conductor and core)", func(i int) string {
			k := c.j.Coils[i].Kinds.Core
			switch {
			case k == nil:
				return "—"
			case math.IsNaN(k.Mass):
				return "no core density stated"
			}
			return Eng(k.Mass, "kg", 3) + " / " + Eng(c.j.Results.Coils[i].Mass, "kg", 3)
		}))
	}
	align, widths := perCoilColumns(len(idx), 2.2, 1.5)
	return doc.Table{Caption: "Headline results of the pick-up coils (no drive)", Header: head, Rows: rows, Align: align, Widths: widths}
}

// nonZero is v, or NaN for 0 (a figure that needs a design frequency).
func nonZero(v float64) float64 {
	if v == 0 {
		return math.NaN()
	}
	return v
}

// smallSignalLabel names the pick-up table's inductance row: with the core
// for cored coils, said only where one of them has a core.
func smallSignalLabel(j *analysis.Study, idx []int) string {
	switch cored := coredCount(j, idx); {
	case cored == 0:
		return "Inductance (small signal)"
	case cored == len(idx):
		return "Inductance (small signal, with the core)"
	}
	return "Inductance (small signal; a cored coil's with its core)"
}
