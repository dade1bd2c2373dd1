package memo

import (
	"fmt"
	"math"

	"coilmemo/analysis"
	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/figures"
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
			c.heading(1, "Pick-up and a.c. figures")
			c.para("A pick-up coil is stated by its sensitivity to a field along its axis, the thermal noise of its winding and the field that noise is equivalent to, and its self-resonance, above which the lumped model does not hold. An a.c. winding's resistance includes the skin and proximity effects of its layers by Dowell's method.")
			first = false
		}
		c.heading(2, fmt.Sprintf("Coil %q", co.Name))
		var steps []Step
		if a := k.AC; a != nil {
			cr := c.j.Results.Coils[i]
			steps = append(steps,
				Step{What: fmt.Sprintf("Equivalent foil thickness over the skin depth for %d layer(s) of round wire (Dowell, Proc. IEE 113 (1966) 1387, §4)", a.Layers),
					Symbolic: `\Delta = \frac{\sqrt{\pi}}{2} \frac{d}{\delta} \sqrt{\eta}`,
					Numbers:  fmt.Sprintf(`\frac{\sqrt{\pi}}{2} \cdot \frac{%s}{%s} \cdot \sqrt{%s}`, Q(co.Wire.Bare, "m", 4), Q(a.SkinDepth, "m", 4), N(a.Porosity, 4)),
					Result:   N(a.Delta, 4)},
				Step{What: "Ratio of a.c. to d.c. resistance (Dowell 1966, eq. 21 over the layers)",
					Symbolic: `F_R = \Delta \left( \varsigma_1(\Delta) + \frac{2}{3} (p^2 - 1) \varsigma_2(\Delta) \right)`,
					Numbers:  fmt.Sprintf(`F_R(%s, p = %d)`, N(a.Delta, 4), a.Layers), Result: N(a.Factor, 4)},
				Step{What: "A.c. resistance at the winding temperature", Symbolic: `R_{ac} = F_R R_{dc}`,
					Numbers: fmt.Sprintf(`%s \cdot %s`, N(a.Factor, 4), Q(cr.RHot, "Ω", 4)), Result: Q(a.Rac, "Ω", 4)})
			if !math.IsNaN(k.ACPower) {
				steps = append(steps, Step{What: "Heating at the a.c. resistance (duty-averaged)", Symbolic: `P_{ac} = F_R P_{dc}`,
					Numbers: fmt.Sprintf(`%s \cdot %s`, N(a.Factor, 4), Q(cr.PowerOn*co.Duty, "W", 4)), Result: Q(k.ACPower, "W", 4)})
			}
		}
		if r := k.Receiver; r != nil {
			if r.Frequency > 0 {
				steps = append(steps,
					Step{What: "Sensitivity by Faraday's law (Tumanski, Meas. Sci. Technol. 18 (2007) R31, eq. 1), effective area including the core",
						Symbolic: `S = 2 \pi f A_{eff}`, Numbers: fmt.Sprintf(`2\pi \cdot %s \cdot %s`, Q(r.Frequency, "Hz", 4), Q(r.EffectiveArea, "m²", 4)),
						Result: Q(r.Sensitivity, "V/T", 4)},
					Step{What: "Thermal noise of the winding (Nyquist, Phys. Rev. 32 (1928) 110)", Symbolic: `e_n = \sqrt{4 k T R_{ac}}`,
						Numbers: fmt.Sprintf(`\sqrt{4 k \cdot %s \cdot %s}`, Q(noiseTemperature(c.j.Results.Coils[i].Temperature), "K", 4), Q(r.Resistance, "Ω", 4)), Result: Q(r.NoiseVoltage, "V/√Hz", 3)},
					Step{What: "Noise-equivalent field", Symbolic: `B_n = \frac{e_n}{S}`,
						Numbers: fmt.Sprintf(`\frac{%s}{%s}`, Q(r.NoiseVoltage, "V/√Hz", 3), Q(r.Sensitivity, "V/T", 4)), Result: Q(r.NoiseField, "T/√Hz", 3)})
			}
			if !math.IsNaN(r.BandNoiseField) {
				steps = append(steps, Step{What: fmt.Sprintf("Noise-equivalent field over the band %s to %s", Eng(co.BandLow, "Hz", 3), Eng(co.BandHigh, "Hz", 3)),
					Symbolic: `B_{rms} = \sqrt{\int B_n(f)^2 \, df}`, Result: Q(r.BandNoiseField, "T", 3)})
			}
			if k.Core == nil {
				steps = append(steps, Step{What: "Inductance of the winding (the verification section compares it with an independent formula)",
					Symbolic: `L`, Result: Q(c.j.Results.Coils[i].Inductance, "H", 4)})
			}
			steps = append(steps, Step{What: "Capacitance across the terminals: the winding's own plus the load", Symbolic: `C = C_s + C_{load}`,
				Numbers: fmt.Sprintf(`%s + %s`, Q(r.SelfCapacitance, "F", 3), Q(co.LoadCapacitance, "F", 3)), Result: Q(r.Capacitance, "F", 3)})
		}
		if !math.IsNaN(k.SelfResonance) {
			steps = append(steps, Step{What: "Self-resonant frequency", Symbolic: `f_{sr} = \frac{1}{2 \pi \sqrt{L C}}`, Result: Q(k.SelfResonance, "Hz", 3)})
		}
		c.derive(steps...)
		if k.AboveResonance {
			c.para("The frequency is at or above the self-resonance: the series R–L model does not hold there, and no impedance is quoted.")
		}
		if r := k.Receiver; r != nil && len(r.Response) > 1 {
			var f, s []float64
			for _, p := range r.Response {
				f, s = append(f, p.Frequency), append(s, p.Sensitivity)
			}
			var marks []figures.Mark
			if r.Frequency > 0 {
				marks = append(marks, figures.Mark{X: r.Frequency, Label: "f"})
			}
			if fsr := r.SelfResonance; fsr > 0 && fsr <= f[len(f)-1] {
				marks = append(marks, figures.Mark{X: fsr, Label: "f_sr"})
			}
			n := c.figure + 1
			c.para(fmt.Sprintf("Figure %d shows the sensitivity at the terminals against frequency.", n))
			c.fig(doc.Figure{Caption: fmt.Sprintf("Terminal sensitivity of coil %q against frequency (lumped R–L–C model)", co.Name),
				Width: figWidth, Height: figHeight * 0.85, Draw: figures.Response(f, s, marks...),
				Summary: fmt.Sprintf("Peak near %s.", Eng(r.SelfResonance, "Hz", 3))})
		}
	}
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
		row("Noise-equivalent field at the design frequency", func(i int) string { return orDash(nonZero(rec(i).NoiseField), "T/√Hz", 3) }),
		row("Noise-equivalent field, rms over the band", func(i int) string {
			co := d.Coils[i]
			if math.IsNaN(rec(i).BandNoiseField) {
				return "—"
			}
			return fmt.Sprintf("%s (%s to %s)", Eng(rec(i).BandNoiseField, "T", 3), Eng(co.BandLow, "Hz", 3), Eng(co.BandHigh, "Hz", 3))
		}),
		row("Self-resonance, with the load", func(i int) string { return orDash(rec(i).SelfResonance, "Hz", 3) }),
		row("Resistance, a.c. at the design frequency", func(i int) string { return orDash(rec(i).Resistance, "Ω", 3) }),
		row("Inductance (with the core, small signal)", func(i int) string { return orDash(c.j.Results.Coils[i].Inductance, "H", 3) }),
		row("Capacitance across the terminals (winding + load)", func(i int) string { return orDash(rec(i).Capacitance, "F", 3) }),
		row("Effective area (flux linkage per tesla)", func(i int) string { return orDash(rec(i).EffectiveArea, "m²", 3) }),
		row("Wire length / conductor mass", func(i int) string {
			return Eng(c.j.Results.Coils[i].Length, "m", 3) + " / " + Eng(c.j.Coils[i].Kinds.AirMass, "kg", 3)
		}),
	}
	align, widths := perCoilColumns(len(idx), 2.2, 1.5)
	return doc.Table{Caption: "Headline results of the pick-up coils (no drive)", Header: head, Rows: rows, Align: align, Widths: widths}
}

// noiseTemperature is the winding temperature the thermal noise is taken
// at, K: the coil's, or 20 °C where it is unknown (as the analysis takes it).
func noiseTemperature(t float64) float64 {
	if math.IsNaN(t) {
		return 293.15
	}
	return t
}

// nonZero is v, or NaN for 0 (a figure that needs a design frequency).
func nonZero(v float64) float64 {
	if v == 0 {
		return math.NaN()
	}
	return v
}
