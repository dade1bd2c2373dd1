package memo

import (
	"coilmemo/analysis"
	"fmt"
	"math"
	"slices"
	"strconv"
	"strings"

	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/figures"
	"coilmemo/format"
	"coilmemo/templates"
)

// heating is the section "Heating": the thermal model, then coil by coil
// the heat balance at the winding surface (convection by its correlation,
// radiation, the mount), the rise inside the winding to its hottest point,
// the margin to the insulation class, the warm-up from cold with the time
// to reach the class, the periodic state of an on/off cycle, and a table
// of the thermal results.
func (c *composer) heating() {
	d := c.j.Spec.Design
	r := c.j.Results
	if len(r.Coils) == 0 {
		return
	}
	c.heading(1, "Heating")
	cool := c.j.Cooling
	var env string
	switch {
	case cool.Vacuum:
		mount := "No mount resistance is stated, so no heat is taken to be conducted to the structure, which errs on the hot side."
		if R := d.Conditions.MountResistance; R > 0 {
			who := "It also conducts"
			if len(c.drivenCoils()) > 1 {
				who = "Each coil also conducts"
			}
			mount = fmt.Sprintf("%s heat to a mount held at the ambient temperature through a thermal resistance of %s, as stated.", who, Eng(R, "K/W", 3))
		}
		winding := "the winding"
		if len(c.drivenCoils()) > 1 {
			winding = "each winding"
		}
		env = templates.Text("heating-vacuum", map[string]string{"Emissivity": Sig(cool.Emissivity, 2), "Mount": mount, "Winding": winding})
	case cool.HGiven:
		env = templates.Text("heating-given-h", map[string]string{"H": Eng(cool.H, "W/(m²·K)", 3), "Emissivity": Sig(cool.Emissivity, 2)})
		if cool.Covered {
			env += " The coils lie under or behind a surface that people touch (enclosure = covered); the stated h is taken as that of the enclosure."
		}
	case cool.Covered:
		lie, mount := "The coils lie", ""
		if len(c.drivenCoils()) == 1 {
			lie = "The coil lies"
		}
		if R := d.Conditions.MountResistance; R > 0 {
			mount = fmt.Sprintf(", and by conduction to a mount held at the ambient temperature through a thermal resistance of %s, as stated", Eng(R, "K/W", 3))
		}
		env = templates.Text("heating-covered", map[string]string{"Emissivity": Sig(cool.Emissivity, 2), "Lie": lie, "Mount": mount})
	default:
		shapes, n := c.convectionShapes()
		plural, singular := "s", ""
		if n == 1 {
			plural, singular = "", "s"
		}
		ends := ""
		if c.anyShedsEnds() {
			ends = " The correlation for the outer shape is applied to the whole heat-shedding surface, end faces included."
		}
		env = templates.Text("heating-still-air", map[string]string{"Emissivity": Sig(cool.Emissivity, 2), "Placement": c.stillAirPlacement(),
			"RaMax": "10¹²", "Table": calc.AirTableSource, "Shapes": shapes, "Plural": plural, "Singular": singular, "Ends": ends})
	}
	c.para(env)
	if R := d.Conditions.MountResistance; R > 0 && !cool.Vacuum && !(cool.Covered && !cool.HGiven) {
		// in vacuum and under a cover the environment's words state the mount
		c.para(fmt.Sprintf("Each coil is also taken to conduct heat to a mount held at the ambient temperature through a thermal resistance of %s, as stated.", Eng(R, "K/W", 3)))
	}
	c.para(templates.Text("heating-model", map[string]string{"Conduction": c.conductionWords()}))
	for _, t := range c.nestedTexts() {
		c.para(t)
	}
	for i, co := range d.Coils {
		if i >= len(r.Coils) {
			break
		}
		cr := r.Coils[i]
		if !(cr.R20 > 0) || math.IsInf(cr.R20, 0) || analysis.IsReceiver(co) {
			continue
		}
		cs := &c.j.Coils[i]
		c.coilPart(co.Name, capitalise, func() {
			c.derive(heatSteps(co, cr, cs, c.j.Cooling)...)
			if p := warmUpText(co, cr, cs); p != "" {
				c.para(p)
			}
			c.warmUpFigure(co, cr, cs)
		})
	}
	c.add(c.thermalTable())
}

// heatSteps derive one coil block's steady thermal state: the surface
// that sheds the heat, the convection coefficient, the heat balance, the
// rise inside the winding and the margin to the class, the moment lost to
// heating under voltage drive, and the heat capacity.
func heatSteps(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, cool calc.Cooling) []Step {
	steps := heatSurfaceSteps(co, cr, cs, cool)
	if !cr.Heat.Steady.Settled {
		return append(steps, Step{What: "Steady heat balance: no solution — the heat generated outgrows the heat shed at every temperature up to " + Eng(Celsius(calc.TempSearchMax), "°C", 3),
			Symbolic: `\delta P(T) = Q_{\mathrm{out}}(T_s)`, Result: Words("no steady state")})
	}
	for _, part := range []func(calc.Coil, calc.CoilResult, *analysis.CoilStudy, calc.Cooling) []Step{
		convectionSteps, heatShedSteps, conductionSteps, coldMomentSteps, heatCapacitySteps} {
		steps = append(steps, part(co, cr, cs, cool)...)
	}
	return steps
}

// seriesFactor is the factor "2 ·" the notation writes before a pair's
// per-coil term, "" for one coil.
func seriesFactor(series int) string {
	if series == 2 {
		return `2 \cdot `
	}
	return ""
}

// Heat models of a winding's inside, as conductionSteps derive them.
const (
	sectionModel = iota // multilayer: across the section, out through the outer cylinder and end faces
	layerModel          // single layer: radially across its one wire's depth, ends adiabatic
	bundleModel         // thin coil: radially in the round bundle
)

// heatModelOf is the model of coil study cs's rise inside its winding.
func heatModelOf(cs *analysis.CoilStudy) int {
	switch {
	case cs.Heat.EndsCooled:
		return sectionModel
	case cs.Heat.RiseInner > 0:
		return layerModel
	}
	return bundleModel
}

// shedsEnds says whether a winding's heat-shedding surface includes its
// end faces (heatSurfaceSteps' multilayer case).
func shedsEnds(co calc.Coil, w calc.Winding) bool {
	return !w.Thin && !(w.LayerCount <= 1 && co.RadialBuild <= 0)
}

// anyShedsEnds says whether a driven coil's heat-shedding surface
// includes end faces.
func (c *composer) anyShedsEnds() bool {
	for _, i := range c.drivenCoils() {
		if shedsEnds(c.j.Spec.Design.Coils[i], c.j.Results.Coils[i].Winding) {
			return true
		}
	}
	return false
}

// conductionWords state the model of the rise inside the windings for
// the models the design's driven coils use, each once.
func (c *composer) conductionWords() string {
	var used []int
	for _, i := range c.drivenCoils() {
		if m := heatModelOf(&c.j.Coils[i]); !slices.Contains(used, m) {
			used = append(used, m)
		}
	}
	slices.Sort(used)
	lead := map[int]string{
		sectionModel: "Inside a multilayer winding the heat has to cross the turns to reach the surface",
		layerModel:   "Inside a single-layer winding the heat has to cross the wire's depth to reach the surface",
		bundleModel:  "Inside a thin coil's round bundle the heat has to cross the turns to reach the bundle's surface",
	}
	how := map[int]string{
		sectionModel: "across the winding's section, out through the outer cylinder and both end faces (which shed heat too), the bore on the former taken as adiabatic",
		layerModel:   "radially out through the outer cylinder, with the bore on the former and the ends taken as adiabatic",
		bundleModel:  "radially from the bundle's centre to its surface",
	}
	in := map[int]string{sectionModel: "in a multilayer winding", layerModel: "in a single layer", bundleModel: "in a thin coil's round bundle"}
	const found = ", so the hottest point lies above the surface temperature. It is found from conduction with uniform heating through an effective conductivity of the winding"
	switch len(used) {
	case 0:
		return "Inside a winding the heat has to cross the turns to reach the surface" + found + "."
	case 1:
		return lead[used[0]] + found + ", " + how[used[0]] + "."
	}
	var parts []string
	for _, m := range used {
		parts = append(parts, in[m]+" "+how[m])
	}
	return "Inside a winding the heat has to cross the turns to reach the surface" + found + ": " + strings.Join(parts, "; ") + "."
}

// heatSurfaceSteps derive the heat-shedding surface of the winding.
func heatSurfaceSteps(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, cool calc.Cooling) []Step {
	var steps []Step
	add := func(s ...Step) { steps = append(steps, s...) }
	h := cr.Heat
	tp := h.Problem
	w := cr.Winding
	hp := cs.Heat
	series := cs.Series
	two := seriesFactor(series)
	ri := hp.ShedInner
	ro := hp.ShedOuter
	length := hp.ShedLength
	switch {
	case w.Thin:
		db := hp.BundleDiameter
		add(Step{What: "Heat-shedding surface: the tube of the round winding bundle along the mean turn",
			Symbolic: `A_s = ` + two + `\pi d_b \ell_t`,
			Numbers:  fmt.Sprintf(`%s\pi \cdot %s \cdot %s`, two, Q(db, "m", 4), Q(w.MeanTurn, "m", 4)), Result: Q(tp.Area, "m²", 4)})
	case w.LayerCount <= 1 && co.RadialBuild <= 0:
		add(Step{What: "Heat-shedding surface: the outer cylinder of the winding (none through the bore, taken as adiabatic)",
			Symbolic: `A_s = ` + two + `\pi D_o \ell`,
			Numbers:  fmt.Sprintf(`%s\pi \cdot %s \cdot %s`, two, Q(2*ro, "m", 4), Q(co.Length, "m", 4)), Result: Q(tp.Area, "m²", 4)})
	default:
		add(Step{What: "Heat-shedding surface: the outer cylinder and both end faces of the winding (none through the bore, taken as adiabatic)",
			Symbolic: `A_s = ` + two + `\left[ \pi D_o \ell + 2\pi \left( r_o^2 - r_i^2 \right) \right]`,
			Numbers: fmt.Sprintf(`%s\left[ \pi \cdot %s \cdot %s + 2\pi \left( %s^2 - %s^2 \right) \right]`, two, Q(2*ro, "m", 4), Q(length, "m", 4),
				Paren(Q(ro, "m", 4)), Paren(Q(ri, "m", 4))),
			Result: Q(tp.Area, "m²", 4)})
	}
	return steps
}

// convectionSteps derive the convective heat-transfer coefficient by its correlation.
func convectionSteps(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, cool calc.Cooling) []Step {
	var steps []Step
	add := func(s ...Step) { steps = append(steps, s...) }
	h := cr.Heat
	tp := h.Problem
	st := h.Steady
	w := cr.Winding
	hp := cs.Heat
	Ts := st.Surface
	Ta := tp.Ambient
	if nc := tp.Convection; nc != nil {
		cs := st.Convection
		nu, k, pr := hp.AirViscosity, hp.AirConductivity, hp.AirPrandtl
		shape := convectionWords[convectionShapeOf(nc, w)].rayleigh
		add(Step{What: "Film temperature, at which the air's properties are taken", Symbolic: `T_f = \frac{T_s + T_a}{2}`,
			Numbers: fmt.Sprintf(`\frac{%s + %s}{2}`, Q(Ts, "K", 5), Q(Ta, "K", 5)), Result: Q(cs.Film, "K", 5)})
		add(Step{What: fmt.Sprintf("Air at the film temperature (%s, interpolated): kinematic viscosity ν = %s×10⁻⁵ m²/s, thermal conductivity kₐ = %s, Prandtl number Pr = %s; the expansion coefficient of an ideal gas and the thermal diffusivity",
			calc.AirTableSource, Sig(nu*1e5, 4), Eng(k, "W/(m·K)", 3), Sig(pr, 3)),
			Symbolic: `\beta = \frac{1}{T_f},\qquad \alpha = \frac{\nu}{\mathrm{Pr}}`})
		add(Step{What: fmt.Sprintf("Rayleigh number on the %s L = %s (g = 9.80665 m/s²)", shape, Eng(nc.Length, "m", 3)),
			Symbolic: `\mathrm{Ra} = \frac{g \beta (T_s - T_a) L^3}{\nu \alpha}`,
			Numbers: fmt.Sprintf(`\frac{9.807 \cdot %s^{-1} \cdot %s \cdot %s^3}{%s \cdot %s}`, Paren(Q(cs.Film, "K", 5)), Q(Ts-Ta, "K", 4), Paren(Q(nc.Length, "m", 4)),
				sciQ(nu, "m²/s", 4), sciQ(nu/pr, "m²/s", 4)),
			Result: N(cs.Ra, 4)})
		if nc.Shape == calc.VerticalSurface {
			add(Step{What: "Nusselt number of a vertical surface in free convection (Churchill & Chu, Int. J. Heat Mass Transfer 18, 1975, 1323; laminar and turbulent range)",
				Symbolic: `\mathrm{Nu} = \left\{ 0.825 + \frac{0.387\, \mathrm{Ra}^{1/6}}{\left[ 1 + (0.492/\mathrm{Pr})^{9/16} \right]^{8/27}} \right\}^2`,
				Numbers:  fmt.Sprintf(`\left\{ 0.825 + \frac{0.387 \cdot %s^{1/6}}{\left[ 1 + (0.492/%s)^{9/16} \right]^{8/27}} \right\}^2`, Paren(N(cs.Ra, 4)), N(pr, 3)),
				Result:   N(cs.Nu, 4)})
		} else {
			add(Step{What: "Nusselt number of a horizontal cylinder in free convection (Churchill & Chu, Int. J. Heat Mass Transfer 18, 1975, 1049; for Ra ≤ 10¹²)",
				Symbolic: `\mathrm{Nu} = \left\{ 0.60 + \frac{0.387\, \mathrm{Ra}^{1/6}}{\left[ 1 + (0.559/\mathrm{Pr})^{9/16} \right]^{8/27}} \right\}^2`,
				Numbers:  fmt.Sprintf(`\left\{ 0.60 + \frac{0.387 \cdot %s^{1/6}}{\left[ 1 + (0.559/%s)^{9/16} \right]^{8/27}} \right\}^2`, Paren(N(cs.Ra, 4)), N(pr, 3)),
				Result:   N(cs.Nu, 4)})
		}
		add(Step{What: "Convective heat-transfer coefficient", Symbolic: `h = \frac{\mathrm{Nu}\, k_a}{L}`,
			Numbers: fmt.Sprintf(`\frac{%s \cdot %s}{%s}`, N(cs.Nu, 4), Q(k, "W/(m·K)", 3), Q(nc.Length, "m", 4)), Result: Q(cs.H, "W/(m²·K)", 3)})
	}
	return steps
}

// heatShedSteps derive the heat shed by convection, radiation and the mount, and the steady balance.
func heatShedSteps(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, cool calc.Cooling) []Step {
	var steps []Step
	add := func(s ...Step) { steps = append(steps, s...) }
	h := cr.Heat
	tp := h.Problem
	st := h.Steady
	hp := cs.Heat
	series := cs.Series
	Ts := st.Surface
	Ta := tp.Ambient
	hval := hp.H
	var parts []string
	var nums []string
	if !cool.Vacuum && (!cool.Covered || cool.HGiven) {
		add(Step{What: "Heat carried away by convection", Symbolic: `Q_c = h A_s (T_s - T_a)`,
			Numbers: fmt.Sprintf(`%s \cdot %s \cdot %s`, Q(hval, "W/(m²·K)", 3), Q(tp.Area, "m²", 4), Q(Ts-Ta, "K", 4)), Result: Q(st.Convected, "W", 4)})
		parts, nums = append(parts, "Q_c"), append(nums, Q(st.Convected, "W", 4))
	}
	add(Step{What: fmt.Sprintf("Heat radiated to surroundings at the ambient temperature, emissivity %s (Stefan–Boltzmann law)", Sig(tp.Emissivity, 2)),
		Symbolic: `Q_r = \varepsilon \sigma A_s \left( T_s^4 - T_a^4 \right)`,
		Numbers: fmt.Sprintf(`%s \cdot \sigma \cdot %s \left( %s^4 - %s^4 \right)`, N(tp.Emissivity, 2), Q(tp.Area, "m²", 4),
			Paren(Q(Ts, "K", 5)), Paren(Q(Ta, "K", 5))),
		Result: Q(st.Radiated, "W", 4)})
	parts, nums = append(parts, "Q_r"), append(nums, Q(st.Radiated, "W", 4))
	if tp.Mount > 0 {
		add(Step{What: "Heat conducted to the mount", Symbolic: `Q_m = \frac{T_s - T_a}{R_m}`,
			Numbers: fmt.Sprintf(`\frac{%s}{%s}`, Q(Ts-Ta, "K", 4), Q(float64(series)/tp.Mount, "K/W", 3)), Result: Q(st.Mounted, "W", 4)})
		parts, nums = append(parts, "Q_m"), append(nums, Q(st.Mounted, "W", 4))
	}
	generated := "heat generated"
	if cr.Duty < 1 {
		generated = "duty-averaged heat generated"
	}
	what := "Steady state: the surface temperature Tₛ at which the heat shed equals the " + generated + " (solved numerically, with the resistance at the winding's mean temperature)"
	add(Step{What: what, Symbolic: `\bar{P} = ` + strings.Join(parts, " + "),
		Numbers: strings.Join(nums, " + "), Result: Q(st.Power, "W", 4)})
	add(Step{What: "Surface temperature at the steady state", Symbolic: `T_s`, Result: Q(Celsius(Ts), "°C", 4)})
	return steps
}

// conductionSteps derive the rise inside the winding to its hottest point and the margin to the insulation class.
func conductionSteps(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, cool calc.Cooling) []Step {
	var steps []Step
	add := func(s ...Step) { steps = append(steps, s...) }
	h := cr.Heat
	st := h.Steady
	hp := cs.Heat
	series := cs.Series
	ri := hp.RiseInner
	ro := hp.RiseOuter
	length := hp.RiseLength
	Ts := st.Surface
	kw := h.Conductivity
	src := "as stated"
	if co.WindingConductivity <= 0 {
		src = "common practice for round enamelled wire without impregnation, no published source"
	}
	pc := st.Power / float64(series)
	q := pc / (math.Pi * (ro*ro - ri*ri) * length)
	var notes []string
	occupied := ""
	if cs.Underfilled {
		occupied = fmt.Sprintf(", over the inner %s of the stated %s radial build that its turns occupy", buildText(cs.Laid.R1-cs.Laid.R0), buildText(cs.Envelope.R1-cs.Envelope.R0))
		notes = append(notes, "the empty outer part generates no heat; the heat leaves through the stated outline's surface")
	}
	if series == 2 {
		notes = append(notes, "each coil of the pair carries half the power")
	}
	each := ""
	if len(notes) > 0 {
		each = " (" + strings.Join(notes, "; ") + ")"
	}
	if ri > 0 || hp.EndsCooled {
		add(Step{What: "Heat generated per unit volume of the winding" + occupied + each, Symbolic: `q = \frac{\bar{P}}{\pi \left( r_o^2 - r_i^2 \right) \ell}`,
			Numbers: fmt.Sprintf(`\frac{%s}{\pi \left( %s^2 - %s^2 \right) \cdot %s}`, Q(pc, "W", 4), Paren(Q(ro, "m", 4)), Paren(Q(ri, "m", 4)), Q(length, "m", 4)),
			Result:  Q(q, "W/m³", 4)})
	} else {
		add(Step{What: "Heat generated per unit volume of the round bundle along the mean turn" + each, Symbolic: `q = \frac{\bar{P}}{\pi r_b^2 \ell_t}`,
			Numbers: fmt.Sprintf(`\frac{%s}{\pi \cdot %s^2 \cdot %s}`, Q(pc, "W", 4), Paren(Q(ro, "m", 4)), Q(length, "m", 4)),
			Result:  Q(q, "W/m³", 4)})
	}
	rise := st.HotSpot - st.Surface
	radial := `\frac{q}{4 k_w} \left[ r_o^2 - r_i^2 - 2 r_i^2 \ln\frac{r_o}{r_i} \right]`
	radialNumbers := func() string {
		return fmt.Sprintf(`\frac{%s}{4 \cdot %s} \left[ %s^2 - %s^2 - 2 \cdot %s^2 \ln\frac{%s}{%s} \right]`, Q(q, "W/m³", 4), Q(kw, "W/(m·K)", 2),
			Paren(Q(ro, "m", 4)), Paren(Q(ri, "m", 4)), Paren(Q(ri, "m", 4)), Q(ro, "m", 4), Q(ri, "m", 4))
	}
	// The series sums are written with the figures their difference from
	// ℓ²/8 or ℓ²/12 needs to keep four of its own (long windings: the two
	// are close).
	sumDigits := func(whole, sum float64) int {
		d := 4
		if diff := whole - sum; diff > 0 && whole > diff {
			d += int(math.Ceil(math.Log10(whole / diff)))
		}
		return min(d, 12)
	}
	if hp.EndsCooled {
		add(Step{What: fmt.Sprintf("For comparison, the long-winding limit: the rise of the hottest point (at the bore) above the surface if all the heat left by radial conduction through the outer cylinder, bore and ends adiabatic, effective conductivity across the turns %s (%s)", Eng(kw, "W/(m·K)", 2), src),
			Symbolic: `\Delta T_{\mathrm{r}} = ` + radial, Numbers: radialNumbers(), Result: Q(hp.RadialMax, "K", 3)})
		add(Step{What: "The series' axial wave numbers, coefficients and radial ratios (I and K the modified Bessel functions)",
			Symbolic: `\lambda_n = \frac{(2n+1)\pi}{\ell},\qquad c_n = \frac{4 (-1)^n}{(2n+1)\pi},\qquad \rho_n = \frac{I_1(\lambda_n r_i)}{K_1(\lambda_n r_i)}`})
		add(Step{What: fmt.Sprintf("Rise of the hottest point (on the bore, in the mid-plane) above the surface: the end faces shed heat too (the heat-shedding surface above), so the heat is conducted across the winding's section radially and axially, out through the outer cylinder and both end faces, taken at the surface temperature; the bore is adiabatic, and the conductivity the same radially and axially (both cross the turns). The solution is a series of axial cosines with modified Bessel functions of order 0 radially, summed until its terms are negligible (Carslaw & Jaeger, Conduction of Heat in Solids, 2nd ed., 1959, §8.3); %s of the long-winding limit",
			Sig(rise/hp.RadialMax, 3)),
			Symbolic: `\Delta T_{\mathrm{max}} = \frac{q}{k_w} \left[ \frac{\ell^2}{8} - \sum_{n \ge 0} \frac{c_n}{\lambda_n^2} \frac{I_0(\lambda_n r_i) + \rho_n K_0(\lambda_n r_i)}{I_0(\lambda_n r_o) + \rho_n K_0(\lambda_n r_o)} \right]`,
			Numbers:  fmt.Sprintf(`\frac{%s}{%s} \left[ \frac{%s^2}{8} - %s \right]`, Q(q, "W/m³", 4), Q(kw, "W/(m·K)", 2), Paren(Q(length, "m", 4)), Q(hp.SeriesMax, "m²", sumDigits(length*length/8, hp.SeriesMax))),
			Result:   Q(rise, "K", 3)})
		add(Step{What: "Rise of the winding's mean temperature above the surface, at which its resistance is taken: the volume mean of the same solution",
			Symbolic: `\Delta T_{\mathrm{mean}} = \frac{q}{k_w} \left[ \frac{\ell^2}{12} - \sum_{n \ge 0} \frac{c_n^2}{2 \lambda_n^2} \frac{2 r_o}{\lambda_n \left( r_o^2 - r_i^2 \right)} \frac{I_1(\lambda_n r_o) - \rho_n K_1(\lambda_n r_o)}{I_0(\lambda_n r_o) + \rho_n K_0(\lambda_n r_o)} \right]`,
			Numbers:  fmt.Sprintf(`\frac{%s}{%s} \left[ \frac{%s^2}{12} - %s \right]`, Q(q, "W/m³", 4), Q(kw, "W/(m·K)", 2), Paren(Q(length, "m", 4)), Q(hp.SeriesMean, "m²", sumDigits(length*length/12, hp.SeriesMean))),
			Result:   Q(st.Mean-st.Surface, "K", 3)})
	} else if ri > 0 {
		add(Step{What: fmt.Sprintf("Rise of the hottest point (at the bore) above the surface: radial conduction out through the outer cylinder, bore and ends taken as adiabatic, effective conductivity across the turns %s (%s)", Eng(kw, "W/(m·K)", 2), src),
			Symbolic: `\Delta T_{\mathrm{max}} = ` + radial, Numbers: radialNumbers(), Result: Q(rise, "K", 3)})
	} else {
		add(Step{What: fmt.Sprintf("Rise of the hottest point (the bundle's centre) above its surface: radial conduction in a round bundle, effective conductivity across the turns %s (%s)", Eng(kw, "W/(m·K)", 2), src),
			Symbolic: `\Delta T_{\mathrm{max}} = \frac{q r_b^2}{4 k_w}`,
			Numbers:  fmt.Sprintf(`\frac{%s \cdot %s^2}{4 \cdot %s}`, Q(q, "W/m³", 4), Paren(Q(ro, "m", 4)), Q(kw, "W/(m·K)", 2)),
			Result:   Q(rise, "K", 3)})
	}
	add(Step{What: "Hottest winding temperature at the steady state", Symbolic: `T_{\mathrm{max}} = T_s + \Delta T_{\mathrm{max}}`,
		Numbers: fmt.Sprintf(`%s + %s`, Q(Celsius(Ts), "°C", 4), Q(rise, "K", 3)), Result: Q(Celsius(st.HotSpot), "°C", 4)})
	if co.InsulationClass > 0 {
		margin := co.InsulationClass - st.HotSpot
		what := "Margin to the insulation thermal class (IEC 60085)"
		if cr.Temperature > st.HotSpot {
			// the duty cycle's peak is the temperature judged: this margin
			// is the steady state's, not the one the tables give
			what = "Margin of the duty-averaged steady state to the insulation thermal class (IEC 60085); the hotter peak of the duty cycle is compared with the class further on"
		}
		add(Step{What: what, Symbolic: `T_{\mathrm{class}} - T_{\mathrm{max}}`,
			Numbers: fmt.Sprintf(`%s - %s`, Q(Celsius(co.InsulationClass), "°C", 4), Q(Celsius(st.HotSpot), "°C", 4)), Result: Q(margin, "K", 3)})
	}
	return steps
}

// coldMomentSteps derive the moment lost to heating under voltage drive.
func coldMomentSteps(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, cool calc.Cooling) []Step {
	var steps []Step
	add := func(s ...Step) { steps = append(steps, s...) }
	h := cr.Heat
	if co.Drive == calc.VoltageDrive && h.ColdMoment > 0 {
		add(Step{What: "Voltage drive limits itself: the current, and with it the moment, falls as the winding warms. Moment when cold (at the 20 °C current)",
			Symbolic: `m_{20} = m \frac{I_{20}}{I}`,
			Numbers:  fmt.Sprintf(`%s \cdot \frac{%s}{%s}`, Q(cr.Moment.Norm(), "A·m²", 4), Q(cr.ColdCurrent, "A", 4), Q(cr.Current, "A", 4)),
			Result:   Q(h.ColdMoment, "A·m²", 4)})
		add(Step{What: "Moment lost to heating", Symbolic: `1 - \frac{m}{m_{20}}`,
			Numbers: fmt.Sprintf(`1 - \frac{%s}{%s}`, Q(cr.Moment.Norm(), "A·m²", 4), Q(h.ColdMoment, "A·m²", 4)), Result: Q(100*(1-cr.Moment.Norm()/h.ColdMoment), "%", 3)})
	}
	return steps
}

// heatCapacitySteps derive the heat capacity and the thermal time constant.
func heatCapacitySteps(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy, cool calc.Cooling) []Step {
	var steps []Step
	add := func(s ...Step) { steps = append(steps, s...) }
	h := cr.Heat
	w := cr.Winding
	series := cs.Series
	two := seriesFactor(series)
	mat := co.Wire.Material
	former := ""
	fnum := ""
	if fc := co.Former.Capacity(); fc > 0 {
		former = ` + ` + two + `C_f`
		fnum = ` + ` + two + Q(fc, "J/K", 3)
	}
	conductor := Q(w.Mass, "kg", 3)
	if series == 2 {
		conductor = `2 \cdot ` + conductor
	}
	hp := cs.Heat
	core, cnum := "", ""
	if hp.CoreHeatCapacity > 0 {
		core = ` + m_k c_k`
		cnum = fmt.Sprintf(` + %s \cdot %s`, Q(hp.CoreMass, "kg", 3), Q(hp.CoreSpecificHeat, "J/(kg·K)", 3))
	}
	add(Step{What: fmt.Sprintf("Heat capacity of the winding (specific heat of %s %s, %s)%s%s", mat.Name, Eng(mat.SpecificHeat, "J/(kg·K)", 3), specificHeatSource(mat), formerWords(co, cs.Heat.FormerSource), coreHeatWords(hp)),
		Symbolic: `C = m_c c_p` + former + core,
		Numbers:  fmt.Sprintf(`%s \cdot %s%s%s`, conductor, Q(mat.SpecificHeat, "J/(kg·K)", 3), fnum, cnum), Result: Q(h.HeatCapacity, "J/K", 3)})
	if !math.IsNaN(cr.ThermalTau) {
		add(Step{What: "Thermal time constant of the approach to the steady state (the heat balance linearised there)",
			Symbolic: `\tau_{th} = \frac{C}{d(Q_{\mathrm{out}} - \bar{P})/dT}`,
			Numbers:  fmt.Sprintf(`\frac{%s}{%s}`, Q(h.HeatCapacity, "J/K", 3), Q(cs.Heat.LossSlope, "W/K", 4)), Result: durationQ(cr.ThermalTau)})
	}
	return steps
}

func specificHeatSource(m calc.Material) string {
	return m.SpecificHeatSource
}

func formerWords(co calc.Coil, source string) string {
	f := co.Former
	switch {
	case f.HeatCapacity > 0:
		return fmt.Sprintf(", with the former's stated heat capacity of %s", Eng(f.HeatCapacity, "J/K", 3))
	case f.Mass > 0:
		src := ""
		if source != "" {
			src = "; " + source
		}
		return fmt.Sprintf(", with the former: %s of %s at %s%s", Eng(f.Mass, "kg", 3), formerName(f.Material), Eng(f.SpecificHeat, "J/(kg·K)", 3), src)
	}
	return ""
}

// coreHeatWords says how a cored coil's rod enters the heat capacity: its
// mass and specific heat, and the assumption that it warms with the
// winding; or that it is left out for want of a density; "" without a core.
func coreHeatWords(hp analysis.HeatParts) string {
	switch {
	case hp.CoreHeatCapacity > 0:
		src := "as stated"
		if hp.CoreSpecificHeatSource != "" {
			src = hp.CoreSpecificHeatSource
		}
		return fmt.Sprintf(", with the core: %s of rod at %s (%s), warming with the winding as one mass",
			Eng(hp.CoreMass, "kg", 3), Eng(hp.CoreSpecificHeat, "J/(kg·K)", 3), src)
	case hp.CoreLeftOut:
		return "; the core is left out, no core density being stated (its mass is unknown), which makes the warm-up faster than the coil's"
	}
	return ""
}

// sciQ writes a quantity whose unit takes no prefix (m²/s: a prefix would
// apply to the metre, squared) as a mantissa times a power of ten.
func sciQ(v float64, unit string, sig int) string {
	if math.IsNaN(v) || v == 0 {
		return Q(v, unit, sig)
	}
	e := int(math.Floor(math.Log10(math.Abs(v))))
	return fmt.Sprintf(`%s \times 10^{%d}\,\unit{%s}`, N(v/math.Pow(10, float64(e)), sig), e, unitNotation(unit))
}

// formerName writes a former material as the trade does: PEEK, PTFE,
// FR-4, stainless steel.
func formerName(m string) string {
	switch m {
	case "peek", "ptfe":
		return strings.ToUpper(m)
	case "fr4":
		return "FR-4"
	case "stainless-steel":
		return "stainless steel"
	}
	return m
}

// duration writes a time in s, min or h as suits it.
func duration(t float64) string { return format.Duration(t, 3) }

// durationQ is duration in the notation.
func durationQ(t float64) string {
	switch {
	case math.IsNaN(t):
		return `\text{n/a}`
	case t >= 2*3600:
		return N(t/3600, 3) + `\,\unit{h}`
	case t >= 120:
		return N(t/60, 3) + `\,\unit{min}`
	}
	return Q(t, "s", 3)
}

// warmUpText says how the coil warms from cold: the time to reach its
// insulation class when energised continuously, and the periodic state
// of its on/off cycle.
func warmUpText(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy) string {
	h := cr.Heat
	var b strings.Builder
	if co.InsulationClass > 0 {
		class := format.InsulationClass(co.InsulationClass)
		if !math.IsNaN(h.TimeToLimit) {
			fmt.Fprintf(&b, "Energised continuously from the ambient temperature, the hottest point of the winding reaches its insulation %s after %s (the lumped heat balance integrated in time). ",
				class, duration(h.TimeToLimit))
		} else {
			fmt.Fprintf(&b, "Energised continuously, the winding never reaches its insulation %s: its steady hottest point stays below it. ", class)
		}
	}
	if co.Former.Capacity() <= 0 {
		what := "the conductor alone"
		if cs.Heat.CoreHeatCapacity > 0 {
			what = "the conductor and the core"
		}
		b.WriteString("The warm-up counts " + what + ", without a former or bobbin, so it runs somewhat faster than a coil on a former will. ")
	}
	if cs.Heat.CoreHeatCapacity > 0 {
		src := ""
		if cs.Heat.CoreSpecificHeatSource != "" {
			src = " The core's specific heat is that of pure iron; the nickel–iron and silicon–iron of soft-magnetic cores lie close to it, while a ferrite has more (about 700–800 J/(kg·K)), so for a ferrite rod the warm-up runs slower than computed — state core-specific-heat for it."
		}
		b.WriteString("The core is taken to be in thermal contact with the winding's bore and to warm with the winding as one mass (an assumption: the contact is not modelled). A rod held apart from the winding (by an air gap or a thick insulating former) warms later, and the winding then faster than computed." + src + " ")
	}
	if cy := h.Cycle; cy.On > 0 {
		if cy.Settled {
			fmt.Fprintf(&b, "On the stated duty cycle — on for %s, off for %s, repeated — the winding settles into a periodic state whose hottest point peaks at %s at the end of each on period and cools to %s at the end of each off period",
				duration(cy.On), duration(cy.Off), Eng(Celsius(cy.PeakHot), "°C", 3), Eng(Celsius(cy.Trough), "°C", 3))
			if !math.IsNaN(cy.Periods) {
				fmt.Fprintf(&b, "; from cold it takes some %s periods to get there", Sig(math.Max(cy.Periods, 1), 2))
			}
			b.WriteString(". The hotter of this peak and the duty-averaged steady state is the temperature compared with the insulation class and the requirements.")
		} else {
			fmt.Fprintf(&b, "On the stated duty cycle (on for %s, off for %s) no periodic state exists below %s: the winding heats up cycle after cycle.",
				duration(cy.On), duration(cy.Off), Eng(Celsius(calc.TempSearchMax), "°C", 3))
		}
	} else if co.Duty > 0 && co.Duty < 1 {
		fmt.Fprintf(&b, "The duty cycle of %s %% enters as the average power, which holds when each on period is short against the thermal time constant of %s; give on-time for the peak of a slower cycle.",
			strconv.FormatFloat(100*co.Duty, 'g', 3, 64), duration(cr.ThermalTau))
	}
	return strings.TrimSpace(b.String())
}

// warmUpFigure plots the warm-up from cold: energised continuously, and on
// the duty cycle when an on-time is given.
func (c *composer) warmUpFigure(co calc.Coil, cr calc.CoilResult, cs *analysis.CoilStudy) {
	h := cr.Heat
	tp := h.Problem
	wu := cs.Heat.WarmUp
	if wu == nil {
		return
	}
	steady := cs.Heat.Continuous
	t, hot := wu.T, wu.Hot
	curves := []figures.Curve{{Name: "energised continuously", T: t, Y: celsiusAll(hot)}}
	var levels []figures.Level
	top := hot[len(hot)-1]
	for _, v := range hot {
		top = math.Max(top, v)
	}
	if top-tp.Ambient < 1 {
		// A rise of a fraction of a kelvin is no curve worth a figure.
		c.para(fmt.Sprintf("Energised continuously from cold, coil %q warms by only %s at its hottest point, so no warm-up curve is drawn.", co.Name, Eng(top-tp.Ambient, "K", 2)))
		return
	}
	farBelow := false
	if co.InsulationClass > 0 {
		// The class is drawn unless it lies so far above the curve that the
		// curve would be squashed flat; the caption then says where it is.
		if co.InsulationClass-tp.Ambient <= 3*(top-tp.Ambient) {
			levels = append(levels, figures.Level{Y: Celsius(co.InsulationClass), Label: "insulation " + format.InsulationClass(co.InsulationClass)})
		} else {
			farBelow = true
		}
	}
	if steady.Settled && (co.InsulationClass <= 0 || steady.HotSpot < co.InsulationClass*1.5) {
		levels = append(levels, figures.Level{Y: Celsius(steady.HotSpot), Label: "steady, continuous: " + Eng(Celsius(steady.HotSpot), "°C", 3)})
	}
	cy := h.Cycle
	caption := fmt.Sprintf("Warm-up of coil %q from %s: hottest winding temperature against time when energised continuously", co.Name, Eng(Celsius(tp.Ambient), "°C", 3))
	summary := fmt.Sprintf("Continuous: %s after %s.", Eng(Celsius(hot[len(hot)-1]), "°C", 3), duration(t[len(t)-1]))
	if cy.On > 0 && cy.Settled {
		if wu.CycleT != nil {
			ct, chot := wu.CycleT, wu.CycleHot
			curves = append(curves, figures.Curve{Name: "on/off cycle", T: ct, Y: celsiusAll(chot)})
			// The periodic peak as a level too: the curve's peaks climb to it.
			levels = append(levels, figures.Level{Y: Celsius(cy.PeakHot), Label: "steady, cycle peak: " + Eng(Celsius(cy.PeakHot), "°C", 3)})
			caption += fmt.Sprintf(", and on the duty cycle (on %s, off %s), its periodic peak as a level", duration(cy.On), duration(cy.Off))
		} else {
			levels = append(levels, figures.Level{Y: Celsius(cy.PeakHot), Label: "steady, cycle peak: " + Eng(Celsius(cy.PeakHot), "°C", 3)})
			caption += "; the periodic peak of the duty cycle, whose periods are too short to draw, as a level"
		}
		summary += fmt.Sprintf(" Cycle peak %s.", Eng(Celsius(cy.PeakHot), "°C", 3))
	}
	switch {
	case farBelow:
		caption += fmt.Sprintf("; dotted: steady states; the insulation %s lies far above", format.InsulationClass(co.InsulationClass))
	case len(levels) > 0:
		caption += "; dashed: insulation class, dotted: steady states"
	}
	n := c.figure + 1
	lead := fmt.Sprintf("Figure %d shows the warm-up of coil %q: energised continuously, its hottest point climbs from %s to %s in %s",
		n, co.Name, Eng(Celsius(tp.Ambient), "°C", 3), Eng(Celsius(hot[len(hot)-1]), "°C", 3), duration(t[len(t)-1]))
	switch {
	case steady.Settled && Eng(Celsius(steady.HotSpot), "°C", 3) == Eng(Celsius(hot[len(hot)-1]), "°C", 3):
		lead += ", where it has settled: the curve's plateau is the steady state"
	case steady.Settled && math.Abs(steady.HotSpot-hot[len(hot)-1]) < 0.5:
		// The same figures as the level drawn, not a rounded "settled".
		lead += fmt.Sprintf(", close to its steady %s (the dotted level), which the curve's plateau approaches",
			Eng(Celsius(steady.HotSpot), "°C", 3))
	case steady.Settled:
		lead += fmt.Sprintf(", on its way to the steady %s", Eng(Celsius(steady.HotSpot), "°C", 3))
	}
	if cy.On > 0 && cy.Settled {
		lead += fmt.Sprintf("; on the duty cycle it peaks at %s", Eng(Celsius(cy.PeakHot), "°C", 3))
		switch {
		case wu.CycleT != nil && wu.CycleReached:
			lead += " (the dotted level of the cycle's peak, which the curve's peaks reach within the time plotted)"
		case wu.CycleT != nil:
			lead += " (the dotted level of the cycle's peak, which the curve's peaks approach)"
		}
	}
	c.para(lead + ".")
	c.fig(doc.Figure{Caption: caption, Width: figWidth, Height: figHeight * 0.85,
		Draw: figures.WarmUp(curves, levels...), Summary: summary})
}

func celsiusAll(k []float64) []float64 {
	out := make([]float64, len(k))
	for i, v := range k {
		out[i] = Celsius(v)
	}
	return out
}

// thermalTable lists the thermal results of every coil.
func (c *composer) thermalTable() doc.Table {
	d := c.j.Spec.Design
	r := c.j.Results
	idx := c.drivenCoils() // a pick-up coil is not heated
	head := []string{"Result"}
	for _, i := range idx {
		head = append(head, r.Coils[i].Name)
	}
	row := func(name string, f func(co calc.Coil, cr calc.CoilResult) string) []doc.Cell {
		cells := []doc.Cell{{Text: name}}
		for _, i := range idx {
			cells = append(cells, doc.Cell{Text: f(d.Coils[i], r.Coils[i])})
		}
		return cells
	}
	temp := func(v float64) string { return Eng(Celsius(v), "°C", 3) }
	cool := c.j.Cooling
	rows := [][]doc.Cell{
		row("Cooling", func(co calc.Coil, cr calc.CoilResult) string {
			tp := cr.Heat.Problem
			s := "radiation"
			switch {
			case cool.Vacuum:
			case cool.Covered && !cool.HGiven:
				s = "radiation only (covered: no convection counted)"
			case tp.Convection != nil:
				s = fmt.Sprintf("natural convection, h = %s; radiation", Eng(cr.Heat.Steady.Convection.H, "W/(m²·K)", 3))
			default:
				s = fmt.Sprintf("h = %s (stated); radiation", Eng(tp.H, "W/(m²·K)", 3))
			}
			if tp.Mount > 0 {
				s += "; mount"
			}
			return s
		}),
		row("Heat shed: convection / radiation / mount", func(co calc.Coil, cr calc.CoilResult) string {
			s := cr.Heat.Steady
			return Eng(s.Convected, "W", 3) + " / " + Eng(s.Radiated, "W", 3) + " / " + Eng(s.Mounted, "W", 3)
		}),
		row(surfaceLabel(r), func(co calc.Coil, cr calc.CoilResult) string { return temp(cr.Heat.Steady.Surface) }),
		row("Mean winding temperature", func(co calc.Coil, cr calc.CoilResult) string { return temp(cr.Heat.Steady.Mean) }),
		row(hotSpotLabel(r), func(co calc.Coil, cr calc.CoilResult) string { return temp(cr.Heat.Steady.HotSpot) }),
	}
	anyCycle := false
	for _, cr := range r.Coils {
		anyCycle = anyCycle || cr.Heat.Cycle.On > 0
	}
	if anyCycle {
		rows = append(rows, row("Duty cycle: peak / trough", func(co calc.Coil, cr calc.CoilResult) string {
			cy := cr.Heat.Cycle
			if !(cy.On > 0) {
				return "—"
			}
			if !cy.Settled {
				return "no periodic state"
			}
			return temp(cy.PeakHot) + " / " + temp(cy.Trough)
		}))
		rows = append(rows, row("Duty cycle: hottest surface", func(co calc.Coil, cr calc.CoilResult) string {
			if cy := cr.Heat.Cycle; cy.On > 0 && cy.Settled {
				return temp(cy.PeakSurface)
			}
			return "—"
		}))
	}
	rows = append(rows,
		row("Insulation class / margin", func(co calc.Coil, cr calc.CoilResult) string {
			if co.InsulationClass <= 0 {
				return "—"
			}
			m := "runaway"
			if !math.IsNaN(cr.InsulationMargin) {
				m = Eng(cr.InsulationMargin, "K", 3)
				if cr.Temperature > cr.Heat.Steady.HotSpot {
					m += " at the cycle peak"
				}
			}
			return format.InsulationClass(co.InsulationClass) + " / " + m
		}),
		row("Time to the class, energised continuously", func(co calc.Coil, cr calc.CoilResult) string {
			if math.IsNaN(cr.Heat.TimeToLimit) {
				return "not reached"
			}
			return duration(cr.Heat.TimeToLimit)
		}),
		row("Thermal time constant / heat capacity", func(co calc.Coil, cr calc.CoilResult) string {
			return duration(cr.ThermalTau) + " / " + Eng(cr.Heat.HeatCapacity, "J/K", 3)
		}),
		row(densityLabel(r, c.j.Cooling), func(co calc.Coil, cr calc.CoilResult) string {
			return Eng(math.Abs(cr.Density), "A/m²", 3)
		}),
	)
	anyVoltage := false
	for _, co := range d.Coils {
		anyVoltage = anyVoltage || co.Drive == calc.VoltageDrive
	}
	if anyVoltage {
		rows = append(rows, row("Moment hot / cold (voltage drive)", func(co calc.Coil, cr calc.CoilResult) string {
			if co.Drive != calc.VoltageDrive {
				return "—"
			}
			return Eng(cr.Moment.Norm(), "A·m²", 3) + " / " + Eng(cr.Heat.ColdMoment, "A·m²", 3)
		}))
	}
	align, widths := perCoilColumns(len(idx), 2.4, 1.6)
	return doc.Table{Caption: "Thermal results at the steady operating point", Header: head, Rows: rows, Align: align, Widths: widths}
}

// densityLabel names the current-density row of the thermal table, with
// the still-air rule of thumb only where it speaks to the design: a coil
// energised continuously, open to still air (not in vacuum, nor under or
// behind a surface, enclosure = covered, where the air cannot rise past it).
func densityLabel(r calc.Results, cool calc.Cooling) string {
	if cool.Vacuum || cool.Covered {
		return "Current density"
	}
	for _, cr := range r.Coils {
		if cr.Duty >= 1 {
			return "Current density (common practice, still air, continuous: 2–4 A/mm²)"
		}
	}
	return "Current density"
}

// runawayText is the runaway caution with this coil's numbers.
func runawayText(co calc.Coil, cr calc.CoilResult) string {
	st := cr.Heat.Steady
	cy := cr.Heat.Cycle
	class := "its insulation class"
	if co.InsulationClass > 0 {
		class = "its insulation " + format.InsulationClass(co.InsulationClass)
	}
	var where string
	switch {
	case cy.On > 0 && !cy.Settled:
		where = "On the stated duty cycle no periodic state exists: the winding heats up cycle after cycle."
	case cy.On > 0 && cy.PeakHot > co.InsulationClass && st.Settled && st.HotSpot <= co.InsulationClass:
		where = fmt.Sprintf("On the stated duty cycle the periodic peak of the hottest point reaches %s.", Eng(Celsius(cy.PeakHot), "°C", 3))
	case st.Settled:
		where = fmt.Sprintf("The heat balance closes only at %s at the hottest point, far beyond what the insulation survives.", Eng(Celsius(st.HotSpot), "°C", 3))
	default:
		where = fmt.Sprintf("The heat balance does not close at any temperature below %s.", Eng(Celsius(calc.TempSearchMax), "°C", 3))
	}
	return templates.Text("caution-runaway", map[string]string{"Class": class, "Where": where, "Time": classTimeText(cr)})
}

// classTimeText says how soon a continuously energised coil reaches its
// insulation class, as a sentence, or "" when it never does.
func classTimeText(cr calc.CoilResult) string {
	t := cr.Heat.TimeToLimit
	if math.IsNaN(t) {
		return ""
	}
	return fmt.Sprintf("Energised continuously from cold, the hottest point of the winding reaches the class after %s.", duration(t))
}

// leftOnText is the caution for a coil that is within its class on its
// duty cycle but would pass it if left energised, or "".
func leftOnText(co calc.Coil, cr calc.CoilResult, on calc.ThermalState) string {
	h := cr.Heat
	settle := "would not settle below it"
	if on.Settled {
		settle = "would settle at " + Eng(Celsius(on.HotSpot), "°C", 3)
	}
	return templates.Text("caution-left-on", map[string]string{"Duty": strconv.FormatFloat(100*cr.Duty, 'g', 3, 64) + " %",
		"Class": format.InsulationClass(co.InsulationClass), "Time": duration(h.TimeToLimit), "Settle": settle})
}

// surfaceLabel names the steady surface row: duty-averaged only where
// some coil has a duty cycle.
func surfaceLabel(r calc.Results) string {
	if anyDuty(r) {
		return "Surface temperature, duty-averaged steady state"
	}
	return "Surface temperature"
}

// hotSpotLabel names the steady hottest-point row: duty-averaged only
// where some coil has a duty cycle.
func hotSpotLabel(r calc.Results) string {
	if anyDuty(r) {
		return "Hottest point, duty-averaged steady state"
	}
	return "Hottest point, steady state"
}

// convectionShape is the key of a winding's outer shape for natural
// convection, the one switch behind both the environment paragraph and
// each coil's derivation.
type convectionShape int

const (
	shapeCylinder convectionShape = iota // horizontal cylinder of the outer diameter
	shapeVertical                        // vertical surface as high as the winding
	shapeRing                            // ring-shaped winding, a tube of the section's perimeter
	shapeBundle                          // thin coil's round bundle, a tube of its diameter
)

// convectionShapeOf is the shape key of convection model nc of winding w.
func convectionShapeOf(nc *calc.NaturalConvection, w calc.Winding) convectionShape {
	switch {
	case nc.Shape == calc.VerticalSurface:
		return shapeVertical
	case nc.Ring:
		return shapeRing
	case w.Thin:
		return shapeBundle
	}
	return shapeCylinder
}

// convectionWords names each shape: in the Rayleigh step (before its
// length L) and in the environment paragraph's list of correlations.
var convectionWords = map[convectionShape]struct{ rayleigh, correlation string }{
	shapeCylinder: {"horizontal cylinder of diameter",
		"the horizontal-cylinder correlation of Churchill and Chu (1975) on the winding's outer diameter"},
	shapeVertical: {"vertical surface of height",
		"the vertical-surface correlation of Churchill and Chu (1975) on the winding's length, its axis being vertical"},
	shapeRing: {"ring-shaped winding, a tube whose perimeter equals the winding section's, diameter",
		"the horizontal-cylinder correlation of Churchill and Chu (1975) for a ring-shaped winding, taken as a tube whose perimeter equals the winding section's"},
	shapeBundle: {"round winding bundle, a tube of diameter",
		"the horizontal-cylinder correlation of Churchill and Chu (1975) for a thin coil's round bundle, taken as a tube of the bundle's diameter"},
}

// convectionShapes names the free-convection correlations the design's
// coils use, each once: only the shapes present, not every case the
// model knows.
func (c *composer) convectionShapes() (string, int) {
	var shapes []string
	for _, i := range c.drivenCoils() {
		cr := c.j.Results.Coils[i]
		nc := cr.Heat.Problem.Convection
		if nc == nil {
			continue
		}
		if s := convectionWords[convectionShapeOf(nc, cr.Winding)].correlation; !slices.Contains(shapes, s) {
			shapes = append(shapes, s)
		}
	}
	if len(shapes) == 0 {
		return "the free-convection correlations of Churchill and Chu (1975)", 2
	}
	return joinAnd(shapes), len(shapes)
}

// stillAirPlacement says where the driven coils sit and which way each
// axis points, coil by coil where they differ: "The coil sits in still
// air at the ambient temperature, its axis vertical".
func (c *composer) stillAirPlacement() string {
	idx := c.drivenCoils()
	var names [2][]string // horizontal, vertical
	for _, i := range idx {
		v := 0
		if c.j.Coils[i].Heat.AxisVertical {
			v = 1
		}
		names[v] = append(names[v], c.j.Spec.Design.Coils[i].Name)
	}
	word := [2]string{"horizontal", "vertical"}
	if len(idx) == 1 {
		v := 0
		if len(names[1]) == 1 {
			v = 1
		}
		return "The coil sits in still air at the ambient temperature, its axis " + word[v]
	}
	for v := range names {
		if len(names[v]) == len(idx) {
			return "The coils sit in still air at the ambient temperature, their axes " + word[v]
		}
	}
	var parts []string
	for v, ns := range names {
		axes := "their axes "
		if len(ns) == 1 {
			axes = "its axis "
		}
		parts = append(parts, joinAnd(ns)+" with "+axes+word[v])
	}
	return "The coils sit in still air at the ambient temperature: " + strings.Join(parts, ", ")
}
