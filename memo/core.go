package memo

import (
	"fmt"
	"math"

	"coilmemo/analysis"
	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/figures"
)

// core writes up the soft-magnetic cores: demagnetising factor, apparent
// permeability, moment, flux density and saturation, inductance, mass and
// residual moment, every number from the Study.
func (c *composer) core() {
	d := c.j.Spec.Design
	first := true
	for i, co := range d.Coils {
		k := c.j.Coils[i].Kinds
		if k.Core == nil {
			continue
		}
		if first {
			c.heading(1, "Core")
			c.para("The rod is modelled as axial slices magnetised by the winding's field and by each other; the demagnetising factors of the whole rod follow from the same model in a uniform field. A core with a relative permeability of 1 gives the air coil's figures exactly.")
			first = false
		}
		r := k.Core
		cr := c.j.Results.Coils[i]
		c.heading(2, fmt.Sprintf("Coil %q", co.Name))
		if r.Problem != "" {
			c.para("The core model reports: " + r.Problem + ".")
		}
		kc := co.Core
		steps := []Step{
			{What: "Aspect ratio of the core", Symbolic: `\gamma = \frac{\ell_c}{D_c}`,
				Numbers: fmt.Sprintf(`\frac{%s}{%s}`, Q(kc.Length, "m", 4), Q(kc.Diameter, "m", 4)), Result: N(r.AspectRatio, 4)},
			{What: "Magnetometric demagnetising factor of the cylinder at its permeability (axial slice model; Chen, Brug & Goldfarb, IEEE Trans. Magn. 27 (1991) 3601)",
				Symbolic: `N_m = N_m(\gamma, \mu_r)`, Numbers: fmt.Sprintf(`N_m(%s, %s)`, N(r.AspectRatio, 4), N(kc.Permeability, 4)), Result: N(r.DemagMagnetometric, 4)},
			{What: "Cross-check: the prolate spheroid of the same ratio (Osborn, Phys. Rev. 67 (1945) 351)",
				Symbolic: `N_e = \frac{1}{\gamma^2 - 1} \left( \frac{\gamma}{\sqrt{\gamma^2 - 1}} \ln\left(\gamma + \sqrt{\gamma^2 - 1}\right) - 1 \right)`,
				Numbers:  fmt.Sprintf(`\frac{1}{%[1]s^2 - 1} \left( \frac{%[1]s}{\sqrt{%[1]s^2 - 1}} \ln\left(%[1]s + \sqrt{%[1]s^2 - 1}\right) - 1 \right)`, N(r.AspectRatio, 4)),
				Result:   N(r.DemagEllipsoid, 4)},
			{What: "Apparent permeability of the core", Symbolic: `\mu_{app} = \frac{\mu_r}{1 + N_m (\mu_r - 1)}`,
				Numbers: fmt.Sprintf(`\frac{%s}{1 + %s \cdot (%s - 1)}`, N(kc.Permeability, 4), N(r.DemagMagnetometric, 4), N(kc.Permeability, 4)),
				Result:  N(r.ApparentPermeability, 4)},
		}
		if cr.Current != 0 {
			steps = append(steps,
				Step{What: "Moment of winding and core (the core's moment is the sum of its slices' magnetisation times volume)",
					Symbolic: `m = I \sum A + \sum_j M_j V_j`,
					Numbers:  fmt.Sprintf(`%s + %s`, Q(k.AirMoment.Norm(), "A·m²", 4), Q(r.CoreMoment, "A·m²", 4)), Result: Q(r.Moment, "A·m²", 4)},
				Step{What: "Peak flux density in the core, at the slice j where the field Hⱼ and the magnetisation Mⱼ sum to the most",
					Symbolic: `B_{pk} = \mu_0 \max_j (H_j + M_j)`,
					Numbers:  fmt.Sprintf(`\mu_0 \left(%s + %s\right)`, Q(r.PeakH, "A/m", 4), Q(r.PeakM, "A/m", 4)), Result: Q(r.FluxDensityPeak, "T", 4)})
			if kc.Saturation > 0 {
				steps = append(steps, Step{What: "Margin to saturation: the peak flux density the core would carry at this current if it stayed linear, against its saturation flux density",
					Symbolic: `1 - \frac{B_{lin}}{B_s}`, Numbers: fmt.Sprintf(`1 - \frac{%s}{%s}`, Q(r.FluxDensityLinear, "T", 4), Q(kc.Saturation, "T", 3)),
					Result: N(r.SaturationMargin, 3)},
					Step{What: "Current at which the core reaches saturation", Symbolic: `I_s = I \frac{B_s}{B_{lin}}`,
						Numbers: fmt.Sprintf(`%s \cdot \frac{%s}{%s}`, Q(math.Abs(cr.Current), "A", 4), Q(kc.Saturation, "T", 3), Q(r.FluxDensityLinear, "T", 4)),
						Result:  Q(r.SaturationCurrent, "A", 3)})
			}
			steps = append(steps, Step{What: "Inductance with the core: the air-core value plus the core's flux linkage per ampere",
				Symbolic: `L = L_{air} + \Delta L`, Numbers: fmt.Sprintf(`%s + %s`, Q(k.AirInductance, "H", 4), Q(r.InductanceAdded, "H", 4)),
				Result: Q(cr.Inductance, "H", 4)})
		} else { // a pick-up coil: what the core does for reception
			steps = append(steps,
				Step{What: "Effective area: the winding's turn areas plus the core's flux linkage per tesla of a uniform axial field (by reciprocity, the core's moment per ampere)",
					Symbolic: `A_{eff} = \sum A + \sum_j \frac{M_j}{H_0} V_j \frac{h_{0,j}}{I}`,
					Numbers:  fmt.Sprintf(`%s + %s`, Q(cr.Winding.AreaSum, "m²", 4), Q(r.EffectiveArea-cr.Winding.AreaSum, "m²", 4)), Result: Q(r.EffectiveArea, "m²", 4)},
				Step{What: "Gain of the core in reception", Symbolic: `\frac{A_{eff}}{\sum A}`,
					Numbers: fmt.Sprintf(`\frac{%s}{%s}`, Q(r.EffectiveArea, "m²", 4), Q(cr.Winding.AreaSum, "m²", 4)), Result: N(r.EffectiveArea/cr.Winding.AreaSum, 4)},
				Step{What: "Small-signal inductance with the core: the air-core value plus the core's flux linkage per ampere at vanishing current",
					Symbolic: `L = L_{air} + \Delta L_0`, Numbers: fmt.Sprintf(`%s + %s`, Q(k.AirInductance, "H", 4), Q(r.InductanceAddedInitial, "H", 4)),
					Result: Q(cr.Inductance, "H", 4)})
		}
		if !math.IsNaN(r.Mass) {
			steps = append(steps, Step{What: "Mass of the core", Symbolic: `m_c = \rho_c \frac{\pi D_c^2}{4} \ell_c`,
				Numbers: fmt.Sprintf(`%s \cdot \frac{\pi \cdot %s^2}{4} \cdot %s`, Q(kc.Density, "kg/m³", 4), Paren(Q(kc.Diameter, "m", 4)), Q(kc.Length, "m", 4)),
				Result:  Q(r.Mass, "kg", 4)})
		}
		if !math.IsNaN(r.ResidualMoment) {
			if r.ResidualBound {
				steps = append(steps, Step{What: "Residual moment after switch-off, upper bound from the remanence alone (no coercivity given)",
					Symbolic: `m_r \le \frac{B_r V}{\mu_0}`,
					Numbers:  fmt.Sprintf(`\frac{%s \cdot %s}{\mu_0}`, Q(kc.Remanence, "T", 4), Q(r.Volume, "m³", 4)), Result: Q(r.ResidualMoment, "A·m²", 3)})
			} else {
				steps = append(steps, Step{What: "Residual moment after switch-off: the remanence on the rod's own load line",
					Symbolic: `m_r = \frac{B_r V}{\mu_0 (1 - N_m) + B_r N_m / H_c}`,
					Numbers: fmt.Sprintf(`\frac{%[1]s \cdot %[2]s}{\mu_0 (1 - %[3]s) + %[1]s \cdot %[3]s / %[4]s}`,
						Q(kc.Remanence, "T", 4), Q(r.Volume, "m³", 4), N(r.DemagMagnetometric, 4), Q(kc.Coercivity, "A/m", 4)),
					Result: Q(r.ResidualMoment, "A·m²", 3)})
			}
		}
		c.derive(steps...)
		if cr.Current != 0 && !math.IsNaN(r.PoleSeparation) && !math.IsNaN(k.EndField) {
			c.para(fmt.Sprintf("The core's magnetisation, and with it its poles, is spread along the rod (the axial slices above), and the field near the rod is computed from that spread: on the axis %s beyond the core's end the flux density is %s, %s of it the core's and %s the winding's. "+
				"Each half of the core holds a pole strength of %s, the centroids of the two halves %s apart: two point poles of that strength and spacing have the core's moment, %s, and so give its field beyond a few rod lengths, the dipole field of the moment. "+
				"They are not used near the rod: they sit short of its end faces, which the spread poles reach, and at the same point the pair would give %s in place of the core's %s.",
				Eng(analysis.RodEndPoint*kc.Diameter, "m", 2), Eng(k.EndField, "T", 3), Eng(k.EndFieldCore, "T", 3), Eng(k.EndFieldWinding, "T", 3),
				Eng(r.PoleStrength, "A·m", 4), Eng(r.PoleSeparation, "m", 4), Eng(r.CoreMoment, "A·m²", 3),
				Eng(k.EndFieldTwoPole, "T", 3), Eng(k.EndFieldCore, "T", 3)))
		}
	}
}

// kindCautions words the findings of cored, pick-up and a.c. coils.
func kindCautions(j *analysis.Study, f analysis.Finding) []doc.Callout {
	co := j.Spec.Design.Coils[f.Coil]
	name := fmt.Sprintf("coil %q", co.Name)
	k := j.Coils[f.Coil].Kinds
	switch f.Kind {
	case analysis.RodNearField:
		return []doc.Callout{{Severity: doc.Warning, Title: "Strong field at the rod's ends, " + name, Spans: []doc.Span{{Text: fmt.Sprintf(
			"The core concentrates the field at its ends: %s on the axis %s beyond the end face, far above the 0.5 mT at which implanted medical devices may be affected. Keep the rod's ends clear of people and of magnetic tools, and mark it.",
			Eng(f.Value, "T", 3), Eng(analysis.RodEndPoint*co.Core.Diameter, "m", 2))}}}}
	case analysis.CoreSaturated:
		return []doc.Callout{{Severity: doc.Warning, Title: "Core saturated, " + name, Spans: []doc.Span{{Text: fmt.Sprintf(
			"The core's peak flux density, %s, reaches its saturation flux density %s: more current adds little moment and much heat. Saturation begins at %s.",
			Eng(f.Value, "T", 3), Eng(co.Core.Saturation, "T", 3), Eng(k.Core.SaturationCurrent, "A", 3))}}}}
	case analysis.CoreNearSat:
		return []doc.Callout{{Severity: doc.Caution, Title: "Core near saturation, " + name, Spans: []doc.Span{{Text: fmt.Sprintf(
			"The core's peak flux density, %s, is within 10 %% of saturation (%s); the moment grows less than in proportion above %s.",
			Eng(f.Value, "T", 3), Eng(co.Core.Saturation, "T", 3), Eng(k.Core.SaturationCurrent, "A", 3))}}}}
	case analysis.CoreProblem:
		return []doc.Callout{{Severity: doc.Caution, Title: "Core model, " + name, Spans: []doc.Span{{Text: "The core model reports: " + k.Core.Problem + "."}}}}
	case analysis.AboveResonance:
		return []doc.Callout{{Severity: doc.Warning, Title: "Above self-resonance, " + name, Spans: []doc.Span{{Text: fmt.Sprintf(
			"The frequency %s is at or above the winding's self-resonance, %s: the coil no longer behaves as an inductance, and no impedance is quoted. Use fewer turns, a sectioned winding or a lower frequency.",
			Eng(co.Frequency, "Hz", 3), Eng(f.Value, "Hz", 3))}}}}
	case analysis.NearResonance:
		return []doc.Callout{{Severity: doc.Caution, Title: "Near self-resonance, " + name, Spans: []doc.Span{{Text: fmt.Sprintf(
			"The frequency %s is above a third of the self-resonance, %s: the winding's capacitance already raises its apparent inductance by more than 12 %%, and the figures of the lumped model lose accuracy.",
			Eng(co.Frequency, "Hz", 3), Eng(f.Value, "Hz", 3))}}}}
	case analysis.ProximityLosses:
		return []doc.Callout{{Severity: doc.Caution, Title: "Proximity losses, " + name, Spans: []doc.Span{{Text: fmt.Sprintf(
			"At %s the a.c. resistance is %s times the d.c. resistance (Dowell's method): the winding dissipates %s where the d.c. resistance alone would give %s. The power and temperatures of this memo include it. Use stranded (litz) wire or fewer layers.",
			Eng(co.Frequency, "Hz", 3), fmt.Sprintf("%.3g", f.Value), Eng(k.ACPower, "W", 3), Eng(k.ACPower/f.Value, "W", 3))}}}}
	}
	return nil
}

// coreSketch is a cored coil block's core for its figures: the rod's
// section (in the half-plane above the axis, or for a map mirrored below it
// too), centred on the coil, drawn under the winding; for the sketch also
// its diameter and length dimensions and a phrase for the figure's text.
// Nothing for an air coil (cs.Kinds.Core nil).
func coreSketch(co calc.Coil, cs *analysis.CoilStudy, mirrored bool) ([]figures.Section, []figures.Dimension, string) {
	k := co.Core
	if cs == nil || cs.Kinds.Core == nil || !(k.Diameter > 0) || !(k.Length > 0) {
		return nil, nil, ""
	}
	a, h := k.Diameter/2, k.Length/2
	y0 := 0.0
	if mirrored {
		y0 = -a
	}
	s := []figures.Section{{X0: -h, X1: h, Y0: y0, Y1: a, Core: true}}
	dims := []figures.Dimension{
		{Kind: figures.Diameter, A: a, Label: "Ø " + figures.LengthLabel(k.Diameter) + " core"},
		{Kind: figures.Axial, A: -h, B: h, Label: figures.LengthLabel(k.Length) + " core"},
	}
	return s, dims, fmt.Sprintf("; the core, Ø %s × %s, in grey", mmText(k.Diameter), mmText(k.Length))
}
