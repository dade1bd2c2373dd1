package memo

import (
	"fmt"
	"math"

	"coilmemo/calc"
	"coilmemo/memo/doc"
	"coilmemo/templates"
)

func formName(c calc.Coil) string {
	switch c.Form {
	case calc.Solenoid:
		return "solenoid"
	case calc.Rectangle:
		return "rectangle"
	case calc.Pair:
		if c.Opposing {
			return "pair, opposing"
		}
		return "pair, aiding"
	}
	return "loop"
}

func wireName(w calc.Wire) string {
	if w.Gauge != calc.NoGauge {
		return fmt.Sprintf("AWG %d %s", w.Gauge, w.Material.Name)
	}
	return Eng(w.Bare, "m", 3) + " " + w.Material.Name
}

// assumptions lists the modelling assumptions and the validity flags that
// this design raises, each with what it means for the results.
func (c *composer) assumptions() {
	c.heading(1, "Assumptions and validity")
	d := c.j.Spec.Design
	r := c.j.Results
	var items [][]doc.Block
	item := func(s string) { items = append(items, []doc.Block{doc.Text(s)}) }
	item(templates.Text("assume-dc", nil))
	item(templates.Text("assume-filament", nil))
	for i, co := range d.Coils {
		cr := r.Coils[i]
		w := cr.Winding
		name := co.Name
		R := co.MeanDiameter / 2
		if co.Form != calc.Rectangle && R > 0 && co.Wire.Outer > 0 {
			bundle := co.Wire.Outer
			if w.Thin {
				bundle = calc.BundleDiameter(co.Wire.Outer, co.Turns)
			} else if co.RadialBuild > 0 {
				bundle = math.Max(co.RadialBuild, co.Length)
			} else {
				bundle = co.Wire.Outer
			}
			ratio := bundle / (2 * R)
			flag := "the filament model is accurate"
			if ratio > 0.1 {
				flag = "the winding is not thin compared with its diameter: the field within about one winding depth of the conductors is approximate, the field elsewhere is not affected"
			}
			item(fmt.Sprintf("%s: winding depth / diameter = %s; %s.", name, Sig(ratio, 2), flag))
		}
		if co.Wire.OuterEstimated {
			item(fmt.Sprintf("%s: the wire's overall diameter (%s over %s bare) is an estimate for heavy-build enamelled wire; state wire-outer-diameter from the wire maker's data sheet for the actual build.",
				name, Eng(co.Wire.Outer, "m", 3), Eng(co.Wire.Bare, "m", 3)))
		}
		if co.Form != calc.Rectangle && !(co.Form == calc.Pair && co.Opposing) {
			if dr := calc.DipoleRange(co, w, cr.Current, 0.01); !math.IsNaN(dr) {
				item(fmt.Sprintf("%s: on its axis the point-dipole field is within 1 %% of the exact field beyond %s from the coil centre (%s times the mean radius); nearer than that, use the exact field.",
					name, Eng(dr, "m", 3), Sig(dr/R, 3)))
			}
		}
	}
	cool := calc.EffectiveCooling(d.Conditions.Cooling)
	if cool.Vacuum {
		item(templates.Text("assume-vacuum", map[string]string{"Emissivity": Sig(cool.Emissivity, 2)}))
	} else {
		src := "as stated in the spec"
		if !d.Conditions.Cooling.HGiven {
			src = "a common-practice figure for natural convection in still air around small bodies"
		}
		item(templates.Text("assume-convection", map[string]string{
			"H": Sig(cool.H, 3), "Source": src, "Emissivity": Sig(cool.Emissivity, 2)}))
	}
	item(templates.Text("assume-thermal", nil))
	c.add(doc.List{Items: items})
}

// eqRow is one line of a derivation table: quantity, relation, value.
func eqRow(q, rel, val string) []doc.Cell {
	return []doc.Cell{{Text: q}, {Text: rel}, {Text: val, Strong: true}}
}

// method gives, coil by coil, each result with the relation that yields it
// and the value, in the order of derivation.
func (c *composer) method() {
	c.heading(1, "Method and results")
	c.para(templates.Text("method", nil))
	d := c.j.Spec.Design
	r := c.j.Results
	for i, co := range d.Coils {
		cr := r.Coils[i]
		w := cr.Winding
		c.heading(2, fmt.Sprintf("Coil %q (%s, %d turns, %s)", co.Name, formName(co), co.Turns, wireName(co.Wire)))
		var rows [][]doc.Cell
		if co.Wire.Gauge != calc.NoGauge {
			rows = append(rows, eqRow("Bare diameter, AWG n = "+fmt.Sprint(co.Wire.Gauge),
				"d = 0.127 mm · 92^((36 − n)/39)  (ASTM B258)", Eng(co.Wire.Bare, "m", 4)))
		}
		A := calc.ConductorArea(co.Wire.Bare)
		rows = append(rows,
			eqRow("Conductor area", "A = π d²/4", Eng(A, "m²", 4)),
			eqRow("Overall wire diameter", "d₀ (insulated)", Eng(co.Wire.Outer, "m", 3)))
		switch {
		case w.Thin:
			rows = append(rows, eqRow("Winding", "all N turns on the mean diameter D̄", fmt.Sprintf("D̄ = %s", Eng(co.MeanDiameter, "m", 4))))
		default:
			rows = append(rows,
				eqRow("Turns per layer", "n_l = ⌊ℓ/d₀⌋ (or N for one layer)", fmt.Sprint(w.TurnsPerLayer)),
				eqRow("Layers", "⌈N/n_l⌉", fmt.Sprint(w.LayerCount)))
			if !math.IsNaN(w.FillFactor) {
				rows = append(rows, eqRow("Copper fill factor", "N·A / winding cross-section", Sig(w.FillFactor, 3)))
			}
		}
		series := calc.SeriesCoils(co)
		wl := "ℓ_w = Σ 2π rᵢ over every turn"
		if series == 2 {
			wl += ", × 2 coils"
		}
		rows = append(rows,
			eqRow("Mean turn length", "ℓ_t = ℓ_w / N", Eng(w.MeanTurn, "m", 4)),
			eqRow("Wire length", wl, Eng(cr.Length, "m", 4)),
			eqRow("Conductor mass", "m_c = ρ_m · A · ℓ_w", Eng(cr.Mass, "kg", 3)),
			eqRow("Resistance at 20 °C", fmt.Sprintf("R₂₀ = ρ₂₀ ℓ_w / A,  ρ₂₀ = %s Ω·m", Sig(co.Wire.Material.Rho20, 5)), Eng(cr.R20, "Ω", 4)))
		if cr.Runaway {
			rows = append(rows, eqRow("Winding temperature", "P(T) = h A (T − T_a) + ε σ A (T⁴ − T_a⁴)", "no solution: runaway"))
		} else {
			rows = append(rows,
				eqRow("Winding temperature", "I² R(T) · duty = h A (T − T_a) + ε σ A (T⁴ − T_a⁴)", Eng(Celsius(cr.Temperature), "°C", 3)),
				eqRow("Hot resistance", fmt.Sprintf("R = R₂₀ [1 + α₂₀ (T − 20 °C)],  α₂₀ = %s /K", Sig(co.Wire.Material.Alpha20, 3)), Eng(cr.RHot, "Ω", 4)))
		}
		if co.Drive == calc.VoltageDrive {
			rows = append(rows,
				eqRow("Current (voltage drive)", "I = V / R(T)", Eng(cr.Current, "A", 4)),
				eqRow("Current when cold", "I₂₀ = V / R₂₀", Eng(cr.ColdCurrent, "A", 4)))
		} else {
			rows = append(rows, eqRow("Voltage (current drive)", "V = I · R(T)", Eng(cr.Voltage, "V", 4)))
		}
		rows = append(rows,
			eqRow("Power while energised", "P = I² R(T)", Eng(cr.Current*cr.Current*cr.RHot, "W", 4)),
			eqRow("Power, duty-averaged", fmt.Sprintf("P̄ = P · duty,  duty = %s %%", Sig(100*calc.Duty(co), 3)), Eng(cr.Power, "W", 4)),
			eqRow("Current density", "J = I / A", Eng(cr.Density, "A/m²", 3)))
		if co.Form != calc.Rectangle {
			rows = append(rows,
				eqRow("Magnetic moment", "m = I · Σ π rᵢ² over every turn", Eng(cr.Moment.Norm(), "A·m²", 4)),
				eqRow("Field at the coil centre", "B = Σ μ0 I rᵢ² / (2 (rᵢ² + zᵢ²)^(3/2))", Eng(cr.FieldCentre.Norm(), "T", 4)))
		} else {
			rows = append(rows, eqRow("Magnetic moment", "m = N I W H", Eng(cr.Moment.Norm(), "A·m²", 4)))
		}
		if !math.IsNaN(cr.Inductance) {
			rows = append(rows, eqRow("Self-inductance", inductanceRelation(co, w), Eng(cr.Inductance, "H", 3)))
		}
		c.add(doc.Table{Header: []string{"Quantity", "Relation", "Value"}, Rows: rows,
			Widths: []float64{1.6, 3.2, 1.2}, Align: []doc.Align{doc.Left, doc.Left, doc.Right}})
	}
}

func inductanceRelation(co calc.Coil, w calc.Winding) string {
	switch {
	case co.Form == calc.Solenoid && co.RadialBuild == 0:
		return "L = μ0 π a² N² k_N / ℓ − μ0 a N (A + B)  (Lorenz; Nagaoka coefficient k_N; Rosa round-wire correction)"
	case w.Thin:
		return "L = μ0 N² a [ln(8a/r_b) − 7/4]  (thin loop, bundle radius r_b)"
	}
	return "L = Σᵢ Σⱼ Mᵢⱼ over turn filaments (Maxwell)"
}
