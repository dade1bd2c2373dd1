package memo

import (
	"coilmemo/analysis"
	"coilmemo/format"
	"fmt"
	"math"
	"strings"

	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/templates"
)

// electrical is the section "Inductance and switching": coil by coil, how
// the self-inductance was found and the independent formula beside it; the
// time constant, rise time and stored energy; the voltage across an
// unsuppressed switch and a suggested suppression; the figures at a drive
// frequency; then the mutual inductances and forces between the coils and
// the force in a stated field gradient.
func (c *composer) electrical() {
	d := c.j.Spec.Design
	r := c.j.Results
	if len(r.Coils) == 0 {
		return
	}
	c.heading(1, "Inductance and switching")
	c.para(templates.Text("electrical", map[string]string{"Capacitance": c.capacitanceWords(), "Rise": c.riseWords()}))
	if p := c.pickUpNote("it has no switching transient, stored energy or drive figures, and its inductance is derived with its other figures in the Method and results section",
		"they have no switching transient, stored energy or drive figures, and their inductances are derived with their other figures in the Method and results section"); p != "" {
		c.para(p)
	}
	for i, co := range d.Coils {
		if i >= len(r.Coils) {
			break
		}
		cr := r.Coils[i]
		if math.IsNaN(cr.Inductance) || cr.Winding.TurnCount() == 0 {
			continue
		}
		if c.pickUp(i) {
			continue // no current: no switching or drive figures (the note above)
		}
		c.coilPart(co.Name, capitalise, func() { c.coilSwitching(i) })
	}
	c.couplings()
	c.gradientForce()
}

// riseWords name in the section's opening what the time constant gives
// for the design's drives: the rise after a voltage step for d.c., the
// settling after switch-on for an a.c. drive.
func (c *composer) riseWords() string {
	var dc, ac bool
	for _, i := range c.drivenCoils() {
		if c.j.Spec.Design.Coils[i].Frequency > 0 {
			ac = true
		} else {
			dc = true
		}
	}
	switch {
	case ac && dc:
		return "the rise time after a voltage step (for an a.c. drive, the time its current takes to settle after switch-on)"
	case ac:
		return "the time the a.c. current takes to settle after switch-on"
	}
	return "the rise time after a voltage step"
}

// capacitanceWords end the section's opening on the winding's own
// capacitance: the bound it sets on the unsuppressed spike where it is
// estimated (analysis.SwitchOffParts.Capacitance), and the forms for which
// it is not (pairs, rectangles), whose spike figures it then does not cap.
func (c *composer) capacitanceWords() string {
	var with, without []string
	forms := map[string]bool{}
	for i, co := range c.j.Spec.Design.Coils {
		if i >= len(c.j.Coils) || c.pickUp(i) || i >= len(c.j.Results.Coils) || math.IsNaN(c.j.Results.Coils[i].Inductance) {
			continue
		}
		if p := c.j.Coils[i].SwitchOff; p.Capacitance > 0 {
			with = append(with, fmt.Sprintf("%q", co.Name))
		} else {
			without = append(without, fmt.Sprintf("%q", co.Name))
			switch co.Form {
			case calc.Pair:
				forms["a pair"] = true
			case calc.Rectangle:
				forms["a rectangle"] = true
			default:
				forms["this winding"] = true
			}
		}
	}
	var kinds []string
	for _, k := range []string{"a pair", "a rectangle", "this winding"} {
		if forms[k] {
			kinds = append(kinds, k)
		}
	}
	const bound = "the winding's own capacitance enters only as the bound it sets on the unsuppressed spike"
	switch {
	case len(without) == 0:
		return bound + "."
	case len(with) == 0:
		return "the winding's own capacitance, which would bound the unsuppressed spike, is not estimated for " + strings.Join(kinds, " or ") + " (no published formula for it is applied here), so the spike figures below are those of the switch's speed alone."
	}
	coil := "coil " + joinAnd(without) + ", whose"
	if len(without) > 1 {
		coil = "coils " + joinAnd(without) + ", whose"
	}
	return bound + "; it is not estimated for " + coil + " spike figures are those of the switch's speed alone."
}

// coilSwitching is coil block i's part of the section: its
// self-inductance, switching and drive figures.
func (c *composer) coilSwitching(i int) {
	co, cr := c.j.Spec.Design.Coils[i], c.j.Results.Coils[i]
	c.derive(selfInductanceSteps(co, cr, &c.j.Coils[i])...)
	if co.Form == calc.Pair && !math.IsNaN(cr.PairForce) && cr.PairForce != 0 {
		how := "they attract"
		if cr.PairForce > 0 {
			how = "they repel"
		}
		ip := c.j.Coils[i].Inductance
		c.derive(Step{What: fmt.Sprintf("Axial force between the two coils of the pair (%s): the current squared times the rate of change of their mutual inductance with the spacing s, ∂M/∂s = %s", how, Eng(ip.Slope, "H/m", 4)),
			Symbolic: `|F| = I^2 \left| \frac{\partial M}{\partial s} \right|`,
			Numbers:  fmt.Sprintf(`%s^2 \cdot %s`, Paren(Q(math.Abs(cr.Current), "A", 4)), Q(math.Abs(ip.Slope), "H/m", 4)),
			Result:   Q(math.Abs(cr.PairForce), "N", 3)})
	}
	fo := fittedOverOf(c.j, i)
	c.derive(switchingSteps(co, cr, &c.j.Coils[i], fo)...)
	c.para(suppressionText(co, cr, c.j.Coils[i].SwitchOff, fo))
	if cr.AC.Frequency > 0 {
		c.derive(acSteps(co, cr)...)
		c.para(acText(co, cr, c.j.Coils[i].Kinds))
	}

}

// selfInductanceSteps derive the self-inductance by the method used for
// the winding, with the independent formula beside it where one applies.
func selfInductanceSteps(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy) []Step {
	w := cr.Winding
	ip := cs.Inductance
	var steps []Step
	add := func(s ...Step) { steps = append(steps, s...) }
	L1, M := ip.L1, ip.M
	n := co.Turns
	a := co.MeanDiameter / 2
	one := ""
	if co.Form == calc.Pair {
		one = ", one coil of the pair"
	}
	outer := cs.Outer
	switch {
	case co.Form == calc.Rectangle:
		rb := ip.BundleRadius
		add(Step{What: "Radius of the round bundle of N wires, hexagonally packed",
			Symbolic: `r_b = \frac{d_o}{2} \sqrt{\frac{N}{0.9069}}`,
			Numbers:  fmt.Sprintf(`\frac{%s}{2} \sqrt{\frac{%d}{0.9069}}`, Q(outer, "m", 4), n), Result: Q(rb, "m", 4)})
		add(Step{What: "Self-inductance of N rectangular turns of round wire bundled to a round section: N² times the single turn's, from the partial inductances of its four sides (Grover, Inductance Calculations, 1946)",
			Symbolic: `L = N^2 L_{\mathrm{rect}}(W, H, r_b)`,
			Numbers:  fmt.Sprintf(`%d^2 \cdot %s`, n, Q(ip.Turn, "H", 4)), Result: Q(cr.Inductance, "H", 4)})
		return steps
	case w.Thin:
		rb := ip.BundleRadius
		add(Step{What: "Radius of the round bundle of N wires, hexagonally packed",
			Symbolic: `r_b = \frac{d_o}{2} \sqrt{\frac{N}{0.9069}}`,
			Numbers:  fmt.Sprintf(`\frac{%s}{2} \sqrt{\frac{%d}{0.9069}}`, Q(outer, "m", 4), n), Result: Q(rb, "m", 4)})
		add(Step{What: "Self-inductance of a thin circular coil of round section, uniform current (Rosa 1908; Grover 1946, ch. 13)" + one,
			Symbolic: `L_1 = \mu_0 N^2 a \left[ \ln\frac{8a}{r_b} - \frac{7}{4} \right]`,
			Numbers:  fmt.Sprintf(`\mu_0 \cdot %d^2 \cdot %s \left[ \ln\frac{8 \cdot %s}{%s} - \frac{7}{4} \right]`, n, Q(a, "m", 4), Q(a, "m", 4), Q(rb, "m", 4)),
			Result:   Q(L1, "H", 4)})
	case w.LayerCount <= 1 && co.RadialBuild <= 0:
		l := co.Length
		D := 2 * a
		p := l / float64(n)
		m, kN, Ls, A, B := ip.K2, ip.Nagaoka, ip.Sheet, ip.RosaA, ip.RosaB
		add(Step{What: "Modulus of the complete elliptic integrals of the current sheet (radius a to the wire centres, length ℓ)",
			Symbolic: `k^2 = \frac{4a^2}{4a^2 + \ell^2}`,
			Numbers:  fmt.Sprintf(`\frac{4 \cdot %s^2}{4 \cdot %s^2 + %s^2}`, Paren(Q(a, "m", 4)), Paren(Q(a, "m", 4)), Paren(Q(l, "m", 4))), Result: N(m, 5)})
		add(Step{What: fmt.Sprintf("Nagaoka's coefficient for ℓ/D = %s (Nagaoka 1909; tabulated by Grover 1946, Table 36)", Sig(l/D, 3)),
			Symbolic: `k_N = \frac{4}{3\pi k'} \left[ \frac{{k'}^2}{k^2} (K - E) + E - k \right]`, Result: N(kN, 5)})
		add(Step{What: "Self-inductance of the current sheet (Lorenz's formula in Nagaoka's form; Grover 1946, eq. 114)",
			Symbolic: `L_s = \frac{\mu_0 \pi a^2 N^2 k_N}{\ell}`,
			Numbers:  fmt.Sprintf(`\frac{\mu_0 \pi \cdot %s^2 \cdot %d^2 \cdot %s}{%s}`, Paren(Q(a, "m", 4)), n, N(kN, 5), Q(l, "m", 4)),
			Result:   Q(Ls, "H", 4)})
		add(Step{What: "Rosa's first correction: a round wire of bare diameter d against a strip of the sheet one pitch p wide (Rosa 1906; Grover 1946, ch. 16)",
			Symbolic: `A_{\mathrm{R}} = \frac{5}{4} - \ln\frac{2p}{d}`,
			Numbers:  fmt.Sprintf(`\frac{5}{4} - \ln\frac{2 \cdot %s}{%s}`, Q(p, "m", 4), Q(co.Wire.Bare, "m", 4)), Result: N(A, 4)})
		add(Step{What: fmt.Sprintf("Rosa's second correction, for the mutual inductances of %s against the sheet's strips (Rosa 1906; tabulated by Grover 1946)", format.Count(n, "round turn", "round turns")),
			Symbolic: `B_{\mathrm{R}} = \frac{2}{N} \sum_{k=1}^{N-1} (N - k)\, f(k)`, Result: N(B, 4)})
		add(Step{What: "Self-inductance of the single-layer winding" + one,
			Symbolic: `L_1 = L_s - \mu_0 a N (A_{\mathrm{R}} + B_{\mathrm{R}})`,
			Numbers:  fmt.Sprintf(`%s - \mu_0 \cdot %s \cdot %d \cdot \left(%s + %s\right)`, Q(Ls, "H", 4), Q(a, "m", 4), n, N(A, 4), N(B, 4)),
			Result:   Q(L1, "H", 4)})
		wh := ip.Wheeler
		rng := fmt.Sprintf("inside its range, so it should agree within about 1 %%; it differs by %s %%", Sig(100*(wh/Ls-1), 2))
		if l/D < calc.WheelerValidRatio {
			rng = fmt.Sprintf("outside its range, so it is no check here (it differs by %s %%)", Sig(100*(wh/Ls-1), 2))
		}
		add(Step{What: fmt.Sprintf("Cross-check of the current sheet by Wheeler's formula (Wheeler, Proc. IRE 16 (1928) 1398–1400), stated within about 1 %% for ℓ > 0.4 D: here ℓ/D = %s, %s", Sig(l/D, 3), rng),
			Symbolic: `L_W = \frac{\mu_0 \pi a^2 N^2}{\ell + 0.9 a}`,
			Numbers:  fmt.Sprintf(`\frac{\mu_0 \pi \cdot %s^2 \cdot %d^2}{%s + 0.9 \cdot %s}`, Paren(Q(a, "m", 4)), n, Q(l, "m", 4), Q(a, "m", 4)),
			Result:   Q(wh, "H", 4)})
	default:
		method := "every pair of turns summed"
		if ip.ByCells {
			method = "so many turns that they are grouped into cells of g × g turns, each cell a filament at its centroid with the self-inductance of a square section of its size (accurate to about 10⁻³)"
		}
		pairs := "the pairs of distinct turns give the rest"
		if ip.ByCells {
			pairs = "the pairs of distinct turns, summed by cells, give the rest"
		}
		add(Step{What: fmt.Sprintf("Self-inductance of the multilayer winding (%s of up to %s): Maxwell's mutual inductance of every pair of turn filaments i ≠ j, and each turn's own round-wire inductance μ0 r (ln(8r/ρ) − 7/4) for i = j (Maxwell 1873; Grover 1946, ch. 1); %s%s. The N turns' own inductances come to %s; %s",
			format.Count(w.LayerCount, "layer", "layers"), format.Count(w.TurnsPerLayer, "turn", "turns"), method, one, Eng(ip.SelfTerms, "H", 4), pairs),
			Symbolic: `L_1 = \sum_{i=1}^{N} \sum_{j=1}^{N} M_{ij} = \sum_{i} M_{ii} + \sum_{i \ne j} M_{ij}`,
			Numbers:  fmt.Sprintf(`%s + %s`, Q(ip.SelfTerms, "H", 4), Q(L1-ip.SelfTerms, "H", 4)), Result: Q(L1, "H", 4)})
		b := co.Length
		if lw := ip.WheelerMultilayer; !math.IsNaN(lw) {
			a, cb := ip.WheelerRadius, ip.WheelerBuild // the turns as laid
			terms := []float64{6 * a, 9 * b, 10 * cb}
			lo, hi := math.Min(terms[0], math.Min(terms[1], terms[2])), math.Max(terms[0], math.Max(terms[1], terms[2]))
			rng := "its three terms 6a, 9b and 10c are comparable, so about 1 % is expected"
			if hi > 3*lo {
				rng = "its three terms 6a, 9b and 10c differ by more than a factor of 3, so its 1 % need not hold"
			}
			if 9*b > 3*(6*a+10*cb) {
				// b ≫ a, c: 0.8 a²N²/(9b) against the long solenoid's a²N²/(10b)
				rng += "; for a winding far longer than it is deep it tends to 8/9 of the long solenoid's μ0πa²N²/b, some 11 % low"
			}
			add(Step{What: fmt.Sprintf("Cross-check by Wheeler's multilayer formula, 0.8 a²N²/(6a + 9b + 10c) µH with the lengths in inches (Wheeler, Proc. IRE 16 (1928) 1398–1400), with mean radius a, length b, radial build c%s: %s; it differs by %s %%",
				laidWords(cs), rng, Sig(100*(lw/L1-1), 2)),
				Symbolic: `L_W = \frac{31.50\,\unit{µH/m} \cdot a^2 N^2}{6a + 9b + 10c}`,
				Numbers:  fmt.Sprintf(`\frac{31.50\,\unit{µH/m} \cdot %s^2 \cdot %d^2}{6 \cdot %s + 9 \cdot %s + 10 \cdot %s}`, Paren(Q(a, "m", 4)), n, Q(a, "m", 4), Q(b, "m", 4), Q(cb, "m", 4)),
				Result:   Q(lw, "H", 4)})
		}
	}
	if co.Form == calc.Pair {
		sign, word := "+", "aiding"
		if co.Opposing {
			sign, word = "-", "opposing"
		}
		add(Step{What: fmt.Sprintf("Mutual inductance of the two coils %s apart, every pair of turns by Maxwell's formula: N² pairs of a turn of one coil and a turn of the other, whose mutual inductance is %s on average", Eng(co.Spacing, "m", 3), Eng(ip.MeanMutual, "H", 4)),
			Symbolic: `M = \sum_{i} \sum_{j} M(r_i, r_j, s + z_j - z_i) = N^2 \bar{M}_{ij}`,
			Numbers:  fmt.Sprintf(`%d^2 \cdot %s`, n, Q(ip.MeanMutual, "H", 4)), Result: Q(M, "H", 4)})
		add(Step{What: fmt.Sprintf("Self-inductance of the pair, its two coils in series, %s", word),
			Symbolic: `L = 2 L_1 ` + sign + ` 2 M`,
			Numbers:  fmt.Sprintf(`2 \cdot %s %s 2 \cdot %s`, Q(L1, "H", 4), sign, Q(M, "H", 4)), Result: Q(cr.Inductance, "H", 4)})
	}
	return steps
}

// fittedOver is a coil block's series resistor sized over the
// tolerances' corners, with the codes of the corners it names.
type fittedOver struct {
	*analysis.Suppression
	corners        int    // how many corners
	maxAt, worstAt string // MaxCorner and Corner as cornerCode writes them
	// maxName and worstName name the same corners by their values
	// (WorstCase.CornerName), for where a code is first used
	maxName, worstName string
	// inCorner is set for a corner's derivation: the resistor is the one
	// sized over every corner, given, not derived again, and the limit is
	// the nominal design's (the corner's switching as the analysis fits
	// it, WorstCase.Derivation).
	inCorner bool
}

// fittedOver is coil block i's resistor sized over the corners; nil
// without a tolerances block or where no resistor is sized.
func fittedOverOf(j *analysis.Study, i int) *fittedOver {
	wc := j.WorstCase
	if wc == nil || i >= len(wc.Suppression) || wc.Suppression[i] == nil {
		return nil
	}
	p := wc.Suppression[i]
	return &fittedOver{Suppression: p, corners: len(wc.Corners), maxAt: cornerCode(wc, p.MaxCorner), worstAt: cornerCode(wc, p.Corner),
		maxName: wc.CornerName(p.MaxCorner), worstName: wc.CornerName(p.Corner)}
}

// switchingSteps derive the time constant, rise time, energy, the
// unsuppressed switch-off voltage and the suppression figures; with the
// coil's study cs (nil: not derived) also the winding's self-capacitance
// and the bound it sets on the unsuppressed spike (ringingSteps); with fo
// (nil: no tolerances) the series resistor sized over the corners and the
// switch voltage with it at the worst one.
func switchingSteps(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, fo *fittedOver) []Step {
	s := cr.Switch
	L, R, I := Q(cr.Inductance, "H", 4), Q(cr.RHot, "Ω", 4), Q(math.Abs(cr.Current), "A", 4)
	var steps []Step
	if math.IsNaN(s.TimeConstant) {
		return nil
	}
	full := "at full current"
	if ac := co.Frequency > 0; ac {
		// an a.c. drive may be cut at the peak of its sine (calc.SwitchingFor)
		I, full = Q(s.Current, "A", 4), "at the peak of the a.c. current, √2 × the r.m.s. value"
	}
	supply := "the supply Vₛ (the stated supply voltage)"
	if co.Drive == calc.CurrentDrive {
		supply = "the voltage Vₛ the current source must deliver across the coil (I·R, its least compliance voltage)"
	}
	steps = append(steps,
		Step{What: "Electrical time constant at the hot resistance", Symbolic: `\tau = \frac{L}{R}`,
			Numbers: fmt.Sprintf(`\frac{%s}{%s}`, L, R), Result: Q(s.TimeConstant, "s", 3)},
		Step{What: riseWhat(co), Symbolic: riseSymbol(co) + ` = \tau \ln 10`,
			Numbers: fmt.Sprintf(`%s \cdot \ln 10`, Q(s.TimeConstant, "s", 3)), Result: Q(s.RiseTime, "s", 3)},
		Step{What: "Magnetic energy stored " + full, Symbolic: `W = \frac{1}{2} L I^2`,
			Numbers: fmt.Sprintf(`\frac{1}{2} \cdot %s \cdot %s^2`, L, Paren(I)), Result: Q(s.Energy, "J", 3)})
	if s.SwitchOff > 0 {
		if cold := math.Abs(s.WorstCurrent); cold > math.Abs(s.Current) {
			// A voltage-driven coil switched off while still cold opens its
			// larger switch-on current: the worst spike.
			steps = append(steps, Step{What: fmt.Sprintf("Voltage across a switch that opens in %s with no suppression, at the cold switch-on current (the worst case; at the hot current it is %s): the coil's L·di/dt on top of %s", Eng(s.SwitchOff, "s", 3), Eng(s.Spike, "V", 3), supply),
				Symbolic: `V_{sw} = \frac{L I_c}{t_{\mathrm{off}}} + V_s`,
				Numbers:  fmt.Sprintf(`\frac{%s \cdot %s}{%s} + %s`, L, Q(cold, "A", 4), Q(s.SwitchOff, "s", 3), Q(s.Supply, "V", 3)),
				Result:   Q(s.SpikeWorst, "V", 3)})
		} else {
			steps = append(steps, Step{What: fmt.Sprintf("Voltage across a switch that opens in %s with no suppression: the coil's L·di/dt on top of %s", Eng(s.SwitchOff, "s", 3), supply),
				Symbolic: `V_{sw} = \frac{L I}{t_{\mathrm{off}}} + V_s`,
				Numbers:  fmt.Sprintf(`\frac{%s \cdot %s}{%s} + %s`, L, I, Q(s.SwitchOff, "s", 3), Q(s.Supply, "V", 3)),
				Result:   Q(s.Spike, "V", 3)})
		}
	}
	if cs != nil {
		steps = append(steps, ringingSteps(co, cr, cs)...)
	}
	if co.Frequency > 0 {
		return steps // a diode would rectify an a.c. drive: the caution words its suppression
	}
	steps = append(steps, Step{What: "Freewheeling diode across the coil: the switch sees about " + sourceOf(co) + "; the current decays through the coil's own resistance to 10 %",
		Symbolic: `t_{10} = \frac{L}{R} \ln 10`, Numbers: fmt.Sprintf(`%s \cdot \ln 10`, Q(s.DiodeDecay, "s", 3)), Result: Q(s.DiodeTime10, "s", 3)})
	if !math.IsNaN(s.Resistor) {
		vmax := "twice the supply, taken as the driver's limit"
		if fo != nil && fo.inCorner {
			vmax = "twice the nominal supply, taken as the driver's limit at every corner"
		}
		if s.ClampFromRating {
			vmax = "the stated driver rating"
		}
		rs := Q(s.Resistor, "Ω", 2) // an E12 value: two figures are exact
		steps = append(steps,
			Step{What: fmt.Sprintf("Diode with a series resistor Rₛ: the largest resistor, the one that would hold the switch at %s (%s) when it opens the largest current, %s", Eng(s.Clamp, "V", 3), vmax, largestCurrent(co)),
				Symbolic: `R_{s,\max} = \frac{V_{\mathrm{max}} - V_s}{I_c}`,
				Numbers:  fmt.Sprintf(`\frac{%s - %s}{%s}`, Q(s.Clamp, "V", 3), Q(s.Supply, "V", 3), Q(math.Abs(s.WorstCurrent), "A", 4)), Result: Q(s.ResistorMax, "Ω", 3)},
		)
		switch {
		case fo != nil && fo.inCorner:
			steps = append(steps, Step{What: "Resistor fitted: the E12 value sized over every corner (above)", Symbolic: `R_s = ` + rs})
		case fo == nil:
			steps = append(steps, Step{What: "Resistor fitted: the standard value of the E12 series (IEC 60063) at or below the largest, so that the switch keeps a margin below its limit",
				Symbolic: `R_s`, Numbers: Words("E12 value at or below") + `\ ` + Q(s.ResistorMax, "Ω", 3), Result: rs})
		default:
			a := fo.MaxAt
			steps = append(steps,
				Step{What: fmt.Sprintf("Largest resistor over the tolerances: the same quotient is smallest at corner %s of the %d (%s; signs as in the Worst case section: one per tolerance line, − its low end, + its high end), where the switch opens %s from %s", fo.maxAt, fo.corners, fo.maxName, Eng(a.Current, "A", 4), Eng(a.Supply, "V", 3)),
					Symbolic: `R_{s,\mathrm{tol}} = \min \frac{V_{\mathrm{max}} - V_s}{I_c}`,
					Numbers:  fmt.Sprintf(`\frac{%s - %s}{%s}`, Q(fo.Clamp, "V", 3), Q(a.Supply, "V", 3), Q(a.Current, "A", 4)), Result: Q(fo.ResistorMax, "Ω", 3)},
				Step{What: fittedWords(fo), Symbolic: `R_s`, Numbers: Words("E12 value at or below") + `\ ` + Q(fo.ResistorMax, "Ω", 3), Result: rs})
		}
		steps = append(steps,
			Step{What: switchRatingWords(s, largestCurrent(co)), Symbolic: `V_{sw} = V_s + I_c R_s`,
				Numbers: fmt.Sprintf(`%s + %s \cdot %s`, Q(s.Supply, "V", 3), Q(math.Abs(s.WorstCurrent), "A", 4), rs), Result: Q(s.SwitchVoltage, "V", 3)})
		if fo != nil && !fo.inCorner {
			steps = append(steps, Step{What: cornerRatingWords(fo), Symbolic: `V_{sw} = V_s + I_c R_s`,
				Numbers: fmt.Sprintf(`%s + %s \cdot %s`, Q(fo.Supply, "V", 3), Q(fo.Current, "A", 4), rs), Result: Q(fo.SwitchVoltage, "V", 3)})
		}
		steps = append(steps,
			Step{What: "Decay to 10 % through the resistor and diode", Symbolic: `t_{10} = \frac{L}{R + R_s} \ln 10`,
				Numbers: fmt.Sprintf(`\frac{%s}{%s + %s} \ln 10`, L, R, rs), Result: Q(s.ResistorTime10, "s", 3)},
			Step{What: "Energy the resistor absorbs at each switch-off (the rest is spent in the coil's own resistance)", Symbolic: `W_{R_s} = W \frac{R_s}{R + R_s}`,
				Numbers: fmt.Sprintf(`%s \cdot \frac{%s}{%s + %s}`, Q(s.Energy, "J", 3), rs, R, rs), Result: Q(s.ResistorEnergy, "J", 3)})
	}
	return steps
}

// ringingSteps derive the winding's self-capacitance and the most an
// unsuppressed switch can see however fast it opens, the energy stored at
// the current it opens passing into that capacitance
// (analysis.SwitchOffParts), and say whether that bound or the switch's
// speed governs; none where the self-capacitance is not modelled.
func ringingSteps(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy) []Step {
	p := cs.SwitchOff
	if math.IsNaN(p.Ringing) {
		return nil
	}
	s := cr.Switch
	Ic, at := `I`, "½ L I² at full current"
	if math.Abs(s.WorstCurrent) > math.Abs(s.Current) {
		Ic, at = `I_c`, "½ L I² at the cold switch-on current"
	}
	steps := capacitanceSteps(co, cs.Kinds.Capacitance, cs.Envelope.Round) // memo/receiver.go
	steps = append(steps, Step{What: fmt.Sprintf("Peak across the winding however fast the switch opens: with the circuit open the current can only charge the winding's own capacitance, so the stored %s passes into ½ Cₛ V² (energy conservation; the winding's resistance damps the ringing, keeping the first peak a little below this)", at),
		Symbolic: `V_{pk} = ` + Ic + ` \sqrt{\frac{L}{C_s}}`,
		Numbers:  fmt.Sprintf(`%s \cdot \sqrt{\frac{%s}{%s}}`, Q(p.Current, "A", 4), Q(cr.Inductance, "H", 4), Q(p.Capacitance, "F", 3)),
		Result:   Q(p.Ringing, "V", 3)})
	tx := Eng(p.Crossover, "s", 3)
	var what string
	switch {
	case p.Assumed:
		what = fmt.Sprintf("The most an unsuppressed switch can see, however fast it opens; a switch opening in a time t longer than √(L Cₛ) = %s sees less, about L·I/t above %s", tx, sourceOf(co))
	case p.Bounded:
		what = fmt.Sprintf("The most an unsuppressed switch can see: below the estimate for a switch that opens in %s, which is faster than √(L Cₛ) = %s, so this bound governs the spike", Eng(p.SwitchOff, "s", 3), tx)
	default:
		what = fmt.Sprintf("The most an unsuppressed switch can see, however fast it opens: above the estimate for a switch that opens in %s, slower than √(L Cₛ) = %s, so the switch's speed governs the spike", Eng(p.SwitchOff, "s", 3), tx)
	}
	return append(steps, Step{What: what, Symbolic: `V_{sw,\max} = V_s + V_{pk}`,
		Numbers: fmt.Sprintf(`%s + %s`, Q(s.Supply, "V", 3), Q(p.Ringing, "V", 3)), Result: Q(p.RingingSwitch, "V", 3)})
}

// suppressionText is the suggested suppression in words.
func suppressionText(co calc.Coil, cr calc.CoilResult, p analysis.SwitchOffParts, fo *fittedOver) string {
	s := cr.Switch
	var b strings.Builder
	ring := !math.IsNaN(p.RingingSwitch)
	switch {
	case !p.Assumed && p.Bounded:
		fmt.Fprintf(&b, "Unsuppressed, a switch opening in %s would see about %s: the winding's own capacitance holds the spike to that, below the %s that L·I/t alone would give. ",
			Eng(p.SwitchOff, "s", 3), Eng(p.Peak, "V", 3), Eng(p.Ramp, "V", 3))
	case !p.Assumed && ring:
		fmt.Fprintf(&b, "Unsuppressed, a switch opening in %s would see about %s; however fast it opened, the winding's own capacitance would hold it to %s. ",
			Eng(p.SwitchOff, "s", 3), Eng(p.Peak, "V", 3), Eng(p.RingingSwitch, "V", 3))
	case !p.Assumed:
		fmt.Fprintf(&b, "Unsuppressed, a switch opening in %s would see about %s. ", Eng(p.SwitchOff, "s", 3), Eng(p.Peak, "V", 3))
	case ring:
		fast := "" // the figure the Safety section quotes, where the capacitance does not cap it
		if !p.Bounded {
			fast = fmt.Sprintf(" (some %s for a fast semiconductor switch opening in %s)", Eng(p.Ramp, "V", 3), Eng(p.SwitchOff, "s", 1))
		}
		fmt.Fprintf(&b, "The unsuppressed spike depends on how fast the switch opens: about L·I/t above %s for a switch opening in t%s, and never more than about %s, where the winding's own capacitance takes up the stored energy (reached by a switch opening faster than %s). ",
			sourceOf(co), fast, Eng(p.RingingSwitch, "V", 3), Eng(p.Crossover, "s", 3))
	default:
		fmt.Fprintf(&b, "The unsuppressed spike depends on how fast the switch opens: about L·I/t above %s for a switch opening in t, some %s for a fast semiconductor switch opening in %s. ",
			sourceOf(co), Eng(p.Ramp, "V", 3), Eng(p.SwitchOff, "s", 1))
	}
	if co.Frequency > 0 { // the drive is cut at the peak of its sine (calc.SwitchingFor)
		b.WriteString("Suggested suppression: " + acSuppressor(co, s.Supply, "the "+Eng(s.Energy, "J", 3)+" stored at the current's peak", true))
		return b.String()
	}
	fmt.Fprintf(&b, "Suggested suppression: a freewheeling diode across the coil rated for at least %s continuous, which keeps the switch near %s and lets the current decay to 10 %% in %s",
		Eng(math.Max(math.Abs(cr.Current), math.Abs(s.WorstCurrent)), "A", 3), sourceAt(co, s.Supply), Eng(s.DiodeTime10, "s", 3))
	switch {
	case !math.IsNaN(s.Resistor):
		fmt.Fprintf(&b, "; where a faster release matters, a resistor in series with the diode — %s; the E12 value %s is chosen — shortens the decay to %s and holds the switch at %s, within %s (the diode drop of about 0.7 V is neglected).",
			resistorBound(s, fo), Eng(s.Resistor, "Ω", 2), Eng(s.ResistorTime10, "s", 3), switchHeldAt(s, fo), Eng(s.Clamp, "V", 3))
	case math.IsNaN(s.Clamp):
		fmt.Fprintf(&b, ". A resistor Rₛ in series with the diode would speed the decay; %s", unratedResistor(co, s))
	default:
		b.WriteString(".")
	}
	return b.String()
}

// acSteps derive the figures at the drive frequency.
func acSteps(co calc.Coil, cr calc.CoilResult) []Step {
	a := cr.AC
	f := Q(a.Frequency, "Hz", 4)
	steps := []Step{
		{What: "Reactance at the drive frequency", Symbolic: `X = 2 \pi f L`,
			Numbers: fmt.Sprintf(`2\pi \cdot %s \cdot %s`, f, Q(cr.Inductance, "H", 4)), Result: Q(a.Reactance, "Ω", 4)},
		impedanceStep(cr),
	}
	if co.Drive == calc.VoltageDrive {
		steps = append(steps, Step{What: "Current at the stated (rms) voltage", Symbolic: `I_{ac} = \frac{V}{|Z|}`,
			Numbers: fmt.Sprintf(`\frac{%s}{%s}`, Q(a.Voltage, "V", 4), Q(a.Impedance, "Ω", 4)), Result: Q(a.Current, "A", 4)})
	} else {
		steps = append(steps, Step{What: "Voltage needed for the stated (rms) current", Symbolic: `V_{ac} = I |Z|`,
			Numbers: fmt.Sprintf(`%s \cdot %s`, Q(a.Current, "A", 4), Q(a.Impedance, "Ω", 4)), Result: Q(a.Voltage, "V", 4)})
	}
	rho := co.Wire.Material.Rho20 * cr.RHot / cr.R20
	steps = append(steps, Step{What: fmt.Sprintf("Skin depth in %s at the winding temperature (Jackson, Classical Electrodynamics, §8.1), against the wire radius %s", co.Wire.Material.Name, Eng(a.WireRadius, "m", 3)),
		Symbolic: `\delta = \sqrt{\frac{\rho}{\pi f \mu_0}}`,
		Numbers:  fmt.Sprintf(`\sqrt{\frac{%s}{\pi \cdot %s \cdot \mu_0}}`, Q(rho, "Ω·m", 4), f), Result: Q(a.SkinDepth, "m", 3)})
	return steps
}

// acText says where the d.c. model stops holding at the drive frequency.
// factorText writes a ratio near 1 with the digits that show its
// departure from 1 (1.0001), others to three figures.
func factorText(f float64) string {
	if f < 1.1 {
		return Sig(f, 5)
	}
	return Sig(f, 3)
}

func acText(co calc.Coil, cr calc.CoilResult, k analysis.CoilKinds) string {
	a := cr.AC
	var b strings.Builder
	ratio := a.Reactance / cr.RHot
	switch {
	case a.Reactive && co.Drive == calc.VoltageDrive:
		fmt.Fprintf(&b, "At %s the reactance is %s times the resistance: it is not negligible, and the current follows the impedance, V/|Z|, as this memo takes it throughout (current, moment, field and heating). ",
			Eng(a.Frequency, "Hz", 3), Sig(ratio, 2))
	case a.Reactive:
		fmt.Fprintf(&b, "At %s the reactance is %s times the resistance: the imposed current sets the moment, field and heating, but the driver must supply the voltage across the impedance, well above the resistive drop. ",
			Eng(a.Frequency, "Hz", 3), Sig(ratio, 2))
	default:
		fmt.Fprintf(&b, "At %s the reactance is only %s of the resistance, so the d.c. figures hold to within about half a per cent. ", Eng(a.Frequency, "Hz", 3), Sig(ratio, 2))
	}
	F := cr.Heat.Problem.ACFactor
	switch {
	case F > 1 && k.AC != nil:
		fmt.Fprintf(&b, "The skin depth is %s against a wire radius of %s; over the winding's %s Dowell's method gives R_ac/R_dc = %s for skin and proximity effects together, and the power and temperatures of this memo are at that a.c. resistance. ",
			Eng(a.SkinDepth, "m", 3), Eng(a.WireRadius, "m", 3), format.Count(k.AC.Layers, "layer", "layers"), factorText(F))
	case a.SkinLimited:
		fmt.Fprintf(&b, "The skin depth %s is less than the wire radius %s: the current crowds to the wire's surface and the a.c. resistance exceeds the d.c. value (the proximity effect of neighbouring turns raises it further; no layered model applies to this form), so the losses are higher than computed here. ",
			Eng(a.SkinDepth, "m", 3), Eng(a.WireRadius, "m", 3))
	default:
		fmt.Fprintf(&b, "The skin depth %s exceeds the wire radius %s, so the skin effect in a single wire is small; the proximity effect of neighbouring turns is not assessed for this form. ",
			Eng(a.SkinDepth, "m", 3), Eng(a.WireRadius, "m", 3))
	}
	if fsr := k.SelfResonance; fsr > 0 {
		fmt.Fprintf(&b, "The series R–L model leaves out the winding's capacitance and holds only well below its self-resonance, %s.", Eng(fsr, "Hz", 3))
	} else {
		b.WriteString("The series R–L model leaves out the winding's capacitance and holds only well below its self-resonant frequency, which is not computed for this form.")
	}
	return b.String()
}

// couplings reports the mutual inductance and force of every pair of coil
// blocks.
func (c *composer) couplings() {
	d := c.j.Spec.Design
	r := c.j.Results
	if len(r.Couplings) == 0 {
		return
	}
	c.heading(2, "Between the coils")
	c.para(templates.Text("couplings", nil))
	var rows [][]doc.Cell
	anyCoaxial := false
	for _, cp := range r.Couplings {
		a, b := d.Coils[cp.A], d.Coils[cp.B]
		arr := "not coaxial"
		M, k := "n/a (not coaxial)", "—"
		F := "n/a"
		method := "dipole approximation"
		switch {
		case cp.Overlap:
			arr, M, method = "coaxial, turns coincide", "n/a (windings overlap)", "—"
		case cp.Coaxial:
			anyCoaxial = true
			arr = "coaxial"
			M = Eng(cp.Mutual, "H", 4)
			k = Sig(cp.K, 3)
			method = "exact, I₁I₂ ∂M/∂z"
		case cp.Exact:
			M = Eng(cp.Mutual, "H", 4)
			k = Sig(cp.K, 3)
			method = "Lorentz integral I₂∮dl × B₁ (Neumann's M)"
		}
		switch pa, pb := c.pickUp(cp.A), c.pickUp(cp.B); {
		case cp.Overlap:
		case pa || pb:
			name := a.Name
			if pb {
				name = b.Name
			}
			F = fmt.Sprintf("none: %q carries no current", name)
		case !cp.Force.IsNaN():
			F = forceText(cp, a, b)
		}
		rows = append(rows, []doc.Cell{{Text: a.Name + " → " + b.Name}, {Text: arr}, {Text: Eng(cp.Distance, "m", 3)},
			{Text: M}, {Text: k}, {Text: F}, {Text: method}})
	}
	c.add(doc.Table{Caption: "Mutual inductance and force between the coils (force on the second coil, from the first, at the operating currents)",
		Header: []string{"Coils", "Arrangement", "Centres apart", "Mutual inductance", "Coupling k", "Force", "Method"},
		Rows:   rows, Widths: []float64{1.6, 1.1, 0.9, 1.2, 0.8, 1.6, 1.3},
		Align: []doc.Align{doc.Left, doc.Left, doc.Right, doc.Right, doc.Right, doc.Left, doc.Left}})
	c.coredCouplingNote()
	if anyCoaxial {
		c.derive(
			Step{What: "Mutual inductance of two coaxial windings: Maxwell's formula for every pair of turns (radii rᵢ, rⱼ, planes zⱼ − zᵢ apart), with the senses of the currents",
				Symbolic: `M = \sum_{i} \sum_{j} \mu_0 \sqrt{r_i r_j} \left[ \left( \frac{2}{k} - k \right) K(k^2) - \frac{2}{k} E(k^2) \right]`},
			Step{What: "Axial force on the second winding at constant currents: the derivative of the co-energy ½L₁I₁² + ½L₂I₂² + M I₁I₂ with its position",
				Symbolic: `F_z = I_1 I_2 \frac{\partial M}{\partial z}`})
	}
}

// forceText writes the force on coil b from coil a: its size and whether
// it pulls b towards a or pushes it away.
func forceText(cp calc.Coupling, a, b calc.Coil) string {
	mag := cp.Force.Norm()
	if mag == 0 {
		return "0 N"
	}
	sep := b.Centre.Sub(a.Centre)
	if sep.Norm() == 0 {
		return Eng(mag, "N", 3)
	}
	along := cp.Force.Dot(sep.Unit())
	word := "towards"
	if along > 0 {
		word = "away from"
	}
	if math.Abs(along) < 0.01*mag {
		return Eng(mag, "N", 3) + ", across the line of centres"
	}
	return fmt.Sprintf("%s, %s the first", Eng(mag, "N", 3), word)
}

// gradientForce reports the force on each moment in the stated gradient.
func (c *composer) gradientForce() {
	d := c.j.Spec.Design
	r := c.j.Results
	G := d.Conditions.FieldGradient
	if !(G > 0) {
		return
	}
	c.heading(2, "Force in the stated field gradient")
	c.para(fmt.Sprintf("The background field is stated to have a gradient of %s. A moment m feels the force F = ∇(m·B) (Jackson, Classical Electrodynamics, eq. 5.69); with the field component along the moment changing at G along the moment, F = m·G. It is the largest such force when G is the largest rate of change of that component in any direction.",
		Eng(G, "T/m", 3)))
	driven := c.drivenCoils()
	for _, i := range driven {
		co, cr := d.Coils[i], r.Coils[i]
		c.derive(Step{What: fmt.Sprintf("Force on the moment of coil %q", co.Name), Symbolic: `F = m G`,
			Numbers: fmt.Sprintf(`%s \cdot %s`, Q(cr.Moment.Norm(), "A·m²", 4), Q(G, "T/m", 3)), Result: Q(cr.GradientForce, "N", 3)})
	}
	if p := c.pickUpNote("it has no moment and feels no such force", "they have no moment and feel no such force"); p != "" {
		c.para(p)
	}
	if len(driven) > 1 {
		c.derive(Step{What: "Force on the total moment of all coils", Symbolic: `F = |\vec{m}| G`,
			Numbers: fmt.Sprintf(`%s \cdot %s`, Q(r.Moment.Norm(), "A·m²", 4), Q(G, "T/m", 3)), Result: Q(r.GradientForce, "N", 3)})
	}
}

// switchRatingWords says what the switch voltage with the suggested
// resistor is compared with.
// fittedWords says which resistor is fitted over the tolerances, and why
// where the nominal design alone would fit a larger one.
func fittedWords(fo *fittedOver) string {
	w := "Resistor fitted: the standard value of the E12 series (IEC 60063) at or below the largest over the tolerances, so that the switch stays within its limit at every corner"
	if fo.Nominal > fo.Resistor {
		w += fmt.Sprintf("; the %s fitted for the nominal design alone would put the switch at %s at corner %s, above %s", Eng(fo.Nominal, "Ω", 2), Eng(fo.NominalWorst, "V", 3), cornerOf(fo, fo.NominalCorner), Eng(fo.Clamp, "V", 3))
	}
	return w
}

// cornerOf writes corner h of fo's study: its code, or "nominal".
func cornerOf(fo *fittedOver, h int) string {
	switch h {
	case fo.MaxCorner:
		return fo.maxAt
	case fo.Corner:
		return fo.worstAt
	}
	return "nominal"
}

// cornerRatingWords words the switch voltage with the fitted resistor at
// the corner where it is largest.
func cornerRatingWords(fo *fittedOver) string {
	where := fmt.Sprintf("at corner %s, where it is largest", fo.worstAt)
	if fo.Corner != fo.MaxCorner {
		where = fmt.Sprintf("at corner %s (%s), where it is largest", fo.worstAt, fo.worstName)
	}
	if fo.Corner < 0 {
		where = "largest at the nominal design, above every corner's"
	}
	limit := Eng(fo.Clamp, "V", 3) + ", twice the supply"
	if fo.ClampFromRating {
		limit = "the driver rating of " + Eng(fo.Clamp, "V", 3)
	}
	if fo.Within {
		return fmt.Sprintf("Voltage across the switch with the diode and resistor, %s: within %s (margin %s)", where, limit, Eng(fo.Margin, "V", 2))
	}
	return fmt.Sprintf("Voltage across the switch with the diode and resistor, %s: ABOVE %s", where, limit)
}

func switchRatingWords(s calc.SwitchResult, at string) string {
	switch {
	case !s.ClampFromRating:
		return "Voltage across the switch with the diode and resistor, at " + at
	case s.WithinRating:
		return fmt.Sprintf("Voltage across the switch with the diode and resistor, at %s: within the driver rating of %s (margin %s)", at, Eng(s.Clamp, "V", 3), Eng(s.RatingMargin, "V", 2))
	}
	return fmt.Sprintf("Voltage across the switch with the diode and resistor, at %s: ABOVE the driver rating of %s", at, Eng(s.Clamp, "V", 3))
}

// switchOffCaution words the finding of an unsuppressed switch-off spike
// with the remedies the analysis sized.
func switchOffCaution(f analysis.Finding, co calc.Coil, cr calc.CoilResult, p analysis.SwitchOffParts, fo *fittedOver, name string) doc.Callout {
	s := cr.Switch
	spike := fmt.Sprintf("A fast semiconductor switch, opening in about %s with no suppression, would see about %s", Eng(f.SwitchOff, "s", 1), Eng(f.Value, "V", 3))
	if !f.Assumed {
		spike = fmt.Sprintf("A switch that opens in %s with no suppression would see about %s", Eng(f.SwitchOff, "s", 3), Eng(f.Value, "V", 3))
	}
	if p.Bounded {
		spike += fmt.Sprintf(", the most the winding's own capacitance allows as it takes up the stored energy (L·I/t alone would give %s)", Eng(p.Ramp, "V", 3))
	}
	spike += "."
	diode := fmt.Sprintf("A freewheeling diode across the coil, rated for at least %s, keeps the switch near %s; the current then decays to 10 %% in %s.",
		Eng(math.Max(math.Abs(cr.Current), math.Abs(s.WorstCurrent)), "A", 3), sourceAt(co, s.Supply), Eng(s.DiodeTime10, "s", 3))
	resistor := ""
	if math.IsNaN(s.Clamp) {
		resistor = "A resistor Rₛ in series with the diode speeds the decay; " + unratedResistor(co, s)
	}
	if !math.IsNaN(s.Resistor) {
		resistor = fmt.Sprintf("For a faster release, a resistor in series with the diode — %s; the E12 value %s is chosen — holds the switch at %s, within %s, and shortens the decay to %s.",
			resistorBound(s, fo), Eng(s.Resistor, "Ω", 2), switchHeldAt(s, fo), Eng(s.Clamp, "V", 3), Eng(s.ResistorTime10, "s", 3))
	}
	energy := storedText(s)
	if co.Frequency > 0 {
		// an a.c. drive: cut at the peak of its sine (calc.SwitchingFor);
		// a diode across the coil would conduct every other half-cycle
		energy = Eng(s.Energy, "J", 3) + " in its magnetic field at the peak of its a.c. current (" + Eng(s.Current, "A", 3) + ", √2 × the r.m.s. value), where the drive may be interrupted"
		diode = acSuppressor(co, s.Supply, "that energy", false)
		resistor = ""
	}
	return doc.Callout{Severity: doc.Caution, Title: "Switch-off voltage, " + name,
		Spans: []doc.Span{{Text: templates.Text("caution-inductive", map[string]string{
			"Energy": energy, "Spike": spike, "Diode": diode, "Resistor": resistor, "Unmodelled": unmodelledSwitching(co)})}}}
}

// acSuppressor is the suppression of an a.c.-driven coil: a diode across
// it would conduct every other half-cycle, so a bidirectional clamp above
// the drive's peak (supply, V: √2 × the stated r.m.s. voltage, or the
// peak current times |Z| under current drive; calc.ACPeak), sized for
// energy (words). suggest words it as the memo body's suggestion, which
// follows "Suggested suppression: ".
func acSuppressor(co calc.Coil, supply float64, energy string, suggest bool) string {
	peak := "√2 × the stated r.m.s. voltage"
	if co.Drive == calc.CurrentDrive {
		peak = "the peak current times the impedance |Z|"
	}
	clamp := fmt.Sprintf("a pair of TVS diodes or a varistor that clamps above the drive's peak of %s (%s) and below the driver's rating, or an RC snubber", Eng(supply, "V", 3), peak)
	if suggest {
		return fmt.Sprintf("a bidirectional suppressor across the coil — %s — sized for %s; a freewheeling diode would conduct on every other half-cycle and short the drive.", clamp, energy)
	}
	return fmt.Sprintf("A freewheeling diode would conduct on every other half-cycle and short the drive: across an a.c. coil fit a bidirectional suppressor instead — %s — sized for %s.", clamp, energy)
}

// unmodelledSwitching is the switch-off caution's word on a part in the
// bore that the memo leaves out (unmodelled-core): it raises the
// inductance, so the stored energy, the unsuppressed spike and the decay
// times are lower bounds; the voltage a diode or resistor holds the switch
// at is the supply plus the current times the resistance, which the part
// does not change. "" without one.
func unmodelledSwitching(co calc.Coil) string {
	if co.UnmodelledCore == "" {
		return ""
	}
	return fmt.Sprintf("These figures are for the coil without its %[1]s, which sits in its bore in service and is not modelled (unmodelled-core): the %[1]s raises the inductance, so the stored energy, the unsuppressed spike and the decay times are lower bounds for the assembly with it; the voltages the suppression holds the switch at follow from the current and stand. Measure the assembly's inductance before the suppression is finalised.", co.UnmodelledCore)
}

// resistorBound words the most the series resistor may be: the nominal
// design's, and with tolerances the smaller that holds at every corner.
func resistorBound(s calc.SwitchResult, fo *fittedOver) string {
	if fo == nil {
		return "at most " + Eng(s.ResistorMax, "Ω", 3)
	}
	return fmt.Sprintf("at most %s at nominal and %s at corner %s of the tolerances (%s)", Eng(s.ResistorMax, "Ω", 3), Eng(fo.ResistorMax, "Ω", 3), fo.maxAt, fo.maxName)
}

// switchHeldAt words the switch voltage with the fitted resistor: at
// nominal, and with tolerances at the worst corner.
func switchHeldAt(s calc.SwitchResult, fo *fittedOver) string {
	if fo == nil || fo.Corner < 0 {
		return Eng(s.SwitchVoltage, "V", 3)
	}
	return fmt.Sprintf("%s (%s at corner %s)", Eng(s.SwitchVoltage, "V", 3), Eng(fo.SwitchVoltage, "V", 3), fo.worstAt)
}

// largestCurrent names the largest current the switch opens: the cold
// switch-on current under voltage drive, the imposed one under current
// drive.
func largestCurrent(co calc.Coil) string {
	if co.Drive == calc.CurrentDrive {
		return "the imposed current"
	}
	return "the cold switch-on current"
}

// riseWhat describes the rise-time step: after a voltage step for voltage
// drive; for a current source, the rise a step of its compliance voltage
// gives, the slowest it can be (a source that forces the current faster
// sets its own rise).
func riseWhat(co calc.Coil) string {
	if co.Frequency > 0 {
		// an a.c. drive has no final d.c. current to rise to: what τ sets
		// is how soon the sine settles after it is switched on
		return "Settling after switch-on of the a.c. drive: a sine switched on at the worst instant of its cycle starts with a d.c. offset of up to the steady amplitude, which decays as exp(−t/τ) while the current settles to its steady sine; the time for that offset to fall to 10 %"
	}
	if co.Drive == calc.CurrentDrive {
		return "Rise time to 90 % of the final current if the current source applies a step of its compliance voltage I·R (the slowest rise; a source that drives harder sets its own), i(t) = I (1 − exp(−t/τ))"
	}
	return "Rise time to 90 % of the final current after a voltage step, i(t) = I (1 − exp(−t/τ))"
}

// unratedResistor words the bound on a series resistor where no driver
// rating is known to size it (a current source, whose compliance voltage
// is no rating): the switch sees the source's voltage Vₛ plus I·Rₛ, so
// the bound with Vₛ and the current substituted, for the rating of the
// driver chosen. The memo body and the switch-off caution both use it.
func unratedResistor(co calc.Coil, s calc.SwitchResult) string {
	return fmt.Sprintf("the switch then sees %s plus I·Rₛ, so with a driver that withstands Vₘₐₓ, Rₛ is at most (Vₘₐₓ − %s)/%s; the E12 value at or below that is fitted, and the driver's rating is the figure the resistor needs.",
		sourceOf(co), Eng(s.Supply, "V", 3), Eng(math.Abs(s.WorstCurrent), "A", 3))
}

// riseSymbol is the rise-time step's symbol: t₉₀ for the rise to 90 %
// of a d.c. current, t_s for an a.c. drive's settling.
func riseSymbol(co calc.Coil) string {
	if co.Frequency > 0 {
		return `t_s`
	}
	return `t_{90}`
}

// sourceOf names the voltage the switch sees beside the coil's own
// L·di/dt: the supply under voltage drive; under current drive the
// voltage the current source must deliver across the coil, its
// compliance voltage.
func sourceOf(co calc.Coil) string {
	if co.Drive == calc.CurrentDrive {
		return "the current source's compliance voltage"
	}
	return "the supply"
}

// sourceAt is sourceOf with its value v, V.
func sourceAt(co calc.Coil, v float64) string {
	if co.Drive == calc.CurrentDrive {
		return fmt.Sprintf("the %s the current source must deliver across the coil (its compliance voltage)", Eng(v, "V", 3))
	}
	return fmt.Sprintf("the %s supply", Eng(v, "V", 3))
}

// storedText is the energy the coil stores at full current, and at the
// cold switch-on current when that is larger (the switch may open it).
func storedText(s calc.SwitchResult) string {
	t := Eng(s.Energy, "J", 3) + " in its magnetic field at full current"
	if s.EnergyWorst > s.Energy*(1+1e-9) {
		t += " (" + Eng(s.EnergyWorst, "J", 3) + " at the cold switch-on current)"
	}
	return t
}

// coredCouplingNote says, for every cored coil with a row in the coupling
// table, that the row is its winding's in air and how much the core's
// moment exceeds the winding's: the core raises the coupling to a distant
// coil by about that ratio, so the air figures are the lower bound.
func (c *composer) coredCouplingNote() {
	var parts []string
	for i, cs := range c.j.Coils {
		k := cs.Kinds
		if k.Core == nil || i >= len(c.j.Results.Coils) {
			continue
		}
		air := k.AirMoment.Norm()
		cored := c.j.Results.Coils[i].Moment.Norm()
		if !(air > 0) || !(cored > 0) {
			continue
		}
		parts = append(parts, fmt.Sprintf("coil %q (moment %s with its core against %s for the winding alone, %s×)",
			c.j.Spec.Design.Coils[i].Name, Eng(cored, "A·m²", 3), Eng(air, "A·m²", 3), Sig(cored/air, 3)))
	}
	if len(parts) == 0 {
		return
	}
	c.para("The rows of a cored coil are those of its winding in air: " + strings.Join(parts, "; ") +
		". The core carries more of the flux, which raises the mutual inductance and the force to a distant coil by about the ratio of the moments and more near the rod's ends, so these figures are lower bounds there.")
}

// impedanceStep is the series R–L impedance at the drive frequency, with
// the resistance it takes: R_ac where Dowell's factor raises it (the
// resistance the heat and a voltage drive's current were solved at),
// else the d.c. resistance at the winding temperature.
func impedanceStep(cr calc.CoilResult) Step {
	a := cr.AC
	what, sym := "Impedance of the series R–L model (d.c. resistance at the winding temperature)", `|Z| = \sqrt{R^2 + X^2}`
	if a.Resistance > cr.RHot*(1+1e-9) {
		what, sym = "Impedance of the series R–L model (a.c. resistance R_ac at the winding temperature, skin and proximity effect included)", `|Z| = \sqrt{R_{ac}^2 + X^2}`
	}
	return Step{What: what, Symbolic: sym,
		Numbers: fmt.Sprintf(`\sqrt{%s^2 + %s^2}`, Paren(Q(a.Resistance, "Ω", 4)), Paren(Q(a.Reactance, "Ω", 4))), Result: Q(a.Impedance, "Ω", 4)}
}
