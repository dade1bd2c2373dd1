package analysis

import (
	"math"

	"coilmemo/calc"
)

// The hazards of cored, pick-up and a.c. coils, after the kinds of
// safety.go.
const (
	RodNearField    FindingKind = iota + 100 // the rod's pole field next to its ends exceeds ImplantField
	CoreSaturated                            // the core is saturated at the current (the moment has stopped growing)
	CoreNearSat                              // within 10 % of saturation
	AboveResonance                           // at or above the self-resonance: no impedance is quoted
	NearResonance                            // above a third of the self-resonance
	CoreProblem                              // the core model reports a doubt (Finding.Value NaN; the text is the CoreResult's)
	ProximityLosses                          // R_ac/R_dc above 1.5: heating quoted at R_ac
)

// RodEndPoint is the distance beyond a rod's end face, in core diameters,
// at which its near field is stated: one diameter (a hand on the rod's
// end), a reporting choice of ours.
const RodEndPoint = 1.0

// RodEndField returns |B|, T, of a cored coil's core (pole model) and
// winding together on the axis one core diameter beyond the core's end.
func RodEndField(c calc.Coil, cr calc.CoilResult, k calc.CoreResult) float64 {
	fr := calc.CoilFrame(c.Axis)
	p := c.Centre.Add(fr.U.Scale(c.Core.Length/2 + RodEndPoint*c.Core.Diameter))
	b := calc.CorePoleField(c, k, p).Add(calc.CoilField(c, cr.Winding, cr.Current, p))
	return b.Norm()
}

// kindFindings are the findings of the cored, pick-up and a.c. coils,
// added to the others.
func kindFindings(d calc.Design, r calc.Results, kinds []CoilKinds, in []Finding) []Finding {
	out := append([]Finding(nil), in...)
	for i, k := range kinds {
		c := d.Coils[i]
		add := func(kind FindingKind, sev Severity, v float64) {
			out = append(out, Finding{Kind: kind, Severity: sev, Coil: i, Value: v})
		}
		if k.Core != nil {
			if k.Core.Problem != "" {
				add(CoreProblem, Caution, math.NaN())
			}
			if r.Coils[i].Current != 0 {
				if b := k.EndField; b >= ImplantField {
					add(RodNearField, Warning, b)
				}
			}
			switch m := k.Core.SaturationMargin; {
			case k.Core.Saturated || m < 0:
				add(CoreSaturated, Warning, k.Core.FluxDensityPeak)
			case m < 0.1:
				add(CoreNearSat, Caution, k.Core.FluxDensityPeak)
			}
		}
		f := c.Frequency
		switch {
		case k.AboveResonance:
			add(AboveResonance, Warning, k.SelfResonance)
		case f > 0 && calc.NearSelfResonance(f, k.SelfResonance):
			add(NearResonance, Caution, k.SelfResonance)
		}
		if k.AC != nil && k.AC.Factor > 1.5 && !IsReceiver(c) {
			add(ProximityLosses, Caution, k.AC.Factor)
		}
	}
	return out
}

// kindChecks are the verification rows of the cored coils: the slice
// model's demagnetising factor at a vanishing susceptibility against the
// exact uniform-magnetisation factor of the cylinder (Chen, Brug &
// Goldfarb 1991, from Nagaoka's coefficient); the cylinder's factor for a
// long rod against the prolate spheroid of the same ratio (Osborn 1945),
// which it approaches as the ratio grows; and reciprocity: the core's
// moment per ampere of winding current equals the core's share of the
// effective area (flux linkage per tesla of a uniform field).
func kindChecks(d calc.Design, r calc.Results, kinds []CoilKinds) []Check {
	out := coreChecks(d, r, kinds)
	for i := range out {
		out[i].Core = true
	}
	return out
}

func coreChecks(d calc.Design, r calc.Results, kinds []CoilKinds) []Check {
	var out []Check
	for i, k := range kinds {
		if k.Core == nil || math.IsNaN(k.Core.AspectRatio) {
			continue
		}
		c := d.Coils[i]
		g := k.Core.AspectRatio
		nm0, _ := calc.CylinderDemagUniform(g)
		nmS, _ := calc.CylinderDemag(g, 1e-6)
		out = append(out, newCheck(c.Name, "core demagnetising factor, χ → 0", "axial slice model, χ = 10⁻⁶",
			"exact uniform cylinder (Chen, Brug & Goldfarb 1991, via Nagaoka)", nmS, nm0, "", 0.02))
		if nm, nf := k.Core.DemagMagnetometric, k.Core.DemagFluxmetric; g >= 10 && c.Core.Permeability >= 100 && nm > nf {
			// A long rod of high permeability concentrates its poles
			// inside its ends: the spheroid of the same ratio lies between
			// the rod's fluxmetric and magnetometric factors. The row
			// passes when it does (tolerance: the bracket's width from Nm).
			ell := k.Core.DemagEllipsoid
			ch := newCheck(c.Name, "core demagnetising factor, long rod", "Nm of the rod (slice model)",
				"prolate spheroid of the same ratio (Osborn 1945), between Nf and Nm", nm, ell, "", (nm-nf)/ell)
			ch.Pass = nf < ell && ell < nm
			out = append(out, ch)
		}
		w := r.Coils[i].Winding
		one := calc.EvaluateCore(c, w, 1e-6)
		if one.Problem == "" && !math.IsNaN(one.CoreMoment) {
			out = append(out, newCheck(c.Name, "core reciprocity", "core moment per ampere",
				"core's share of the effective area (uniform field)", one.CoreMoment/1e-6, one.EffectiveArea-w.AreaSum, "m²", 1e-3))
		}
	}
	return out
}
