package analysis

import (
	"fmt"
	"math"

	"coilmemo/calc"
	"coilmemo/format"
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
// long rod as a bracket: the prolate spheroid of the same ratio (Osborn
// 1945) between the rod's fluxmetric and magnetometric factors. The
// core's reciprocity (its moment per ampere of winding current equals its
// share of the effective area) has no row: both are one expression of the
// slice model, so the comparison would repeat it. A pick-up coil adds the
// rows of receiverChecks, air-cored or not.
func kindChecks(d calc.Design, r calc.Results, kinds []CoilKinds) []Check {
	out := coreChecks(d, r, kinds)
	for i := range out {
		out[i].Core = true
	}
	for i, k := range kinds {
		if k.Receiver != nil && i < len(r.Coils) {
			out = append(out, receiverChecks(d.Coils[i], r.Coils[i], k)...)
		}
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
			// inside its ends: the spheroid of the same ratio (a closed
			// form, independent of the slice model) lies between the
			// rod's fluxmetric and magnetometric factors. The row is that
			// ordering, Nf < N_spheroid < Nm, and passes when it holds; its
			// tolerance (the bracket's width from Nm) is kept for calc
			// --json only.
			ell := k.Core.DemagEllipsoid
			ch := newCheck(c.Name, "core demagnetising factor, long rod", "Nf … Nm of the rod (slice model)",
				"prolate spheroid of the same ratio (Osborn 1945), to lie between Nf and Nm", nm, ell, "", (nm-nf)/ell)
			ch.Pass = nf < ell && ell < nm
			ch.Bracket, ch.Low, ch.High = true, nf, nm
			out = append(out, ch)
		}
		// No row of the core's reciprocity: the core's moment per ampere
		// and its share of the effective area are one expression of the
		// slice model read twice, so comparing them would only repeat it.
	}
	return out
}

// receiverChecks are the rows of a pick-up coil (c, its air-core result
// cr, its kinds k):
//
//   - the air winding's sensitivity 2π f ΣA, whose ΣA the Study's
//     sensitivity is built from (with a core, A_eff adds the core's
//     share), against the flux linkage found another way: the mutual
//     inductance M of every turn with a large coaxial loop of radius ρ,
//     each by Maxwell's formula for unequal circles (ringMutualAB, its
//     own arithmetic–geometric mean, not calc's elliptic integrals),
//     divided by the loop's centre field per ampere μ0/(2ρ). The field of
//     the loop departs from uniform over the winding by terms in
//     (size/ρ)²; ρ at 200 and 400 coil sizes and Richardson's
//     extrapolation remove them (remainder of order (size/ρ)⁴ ≈ 10⁻⁹);
//     10⁻⁶ is allowed for the rounding of the cancelling elliptic sum.
//   - the self-resonance, the Study's 1/(2π√(LC)), against the frequency
//     at which the phase of the lumped model's impedance
//     (R + jωL) ∥ 1/(jωC), computed in complex arithmetic, crosses zero,
//     found by bisection: it shares L, C and R_ac with the Study, not the
//     formula. With R the zero-phase frequency lies below 1/(2π√(LC)) by
//     about R²C/(2L) of it; the tolerance is R²C/L plus 10⁻⁶.
//   - the band's rms noise field, the Study's 64-point Gauss–Legendre
//     rule in ln f, against a composite Simpson rule in f over panels
//     doubling in width from the band's low end, of the same integrand
//     4kT R_ac(f)/(2π f A_eff)² (a check of the integration, not of
//     Nyquist's formula); 10⁻⁶ is allowed.
func receiverChecks(c calc.Coil, cr calc.CoilResult, k CoilKinds) []Check {
	rec := k.Receiver
	var out []Check
	w := cr.Winding
	if f := rec.Frequency; f > 0 && w.AreaSum > 0 {
		size := AxialSize(c)
		flux := func(rho float64) float64 {
			m := 0.0
			for _, l := range w.Layers {
				for _, z := range l.Z {
					m += ringMutualAB(l.Radius, rho, z)
				}
			}
			return m * 2 * rho / calc.Mu0
		}
		rho := 200 * size
		area := (4*flux(2*rho) - flux(rho)) / 3
		name := fmt.Sprintf("sensitivity at %s", format.Eng(f, "Hz", 3))
		if c.Core.Present() {
			name += " (winding alone, in air)"
		}
		out = append(out, newCheck(c.Name, name, "Faraday's law 2π f·Σ π rᵢ² over every turn",
			"2π f·M/(μ0/2ρ): mutual inductance with a coaxial loop of radius ρ ≫ coil (Maxwell's formula), extrapolated to ρ → ∞",
			calc.InductionSensitivity(w.AreaSum, f), calc.InductionSensitivity(area, f), "V/T", 1e-6))
	}
	L := cr.Inductance
	if k.Core != nil && !math.IsNaN(k.Core.InductanceAddedInitial) {
		L += k.Core.InductanceAddedInitial // as the Study's receiver takes it
	}
	C, fsr := rec.Capacitance, rec.SelfResonance
	if L > 0 && C > 0 && fsr > 0 {
		T := k.Temperature
		R := calc.ACResistance(c, w, cr.RHot, T, fsr).Rac
		im := func(f float64) float64 {
			jw := complex(0, 2*math.Pi*f)
			z := complex(R, 0) + jw*complex(L, 0)
			return imag(z / (1 + z*jw*complex(C, 0)))
		}
		lo, hi := math.Log(fsr/10), math.Log(fsr*10)
		if im(math.Exp(lo)) > 0 && im(math.Exp(hi)) < 0 {
			for range 200 {
				mid := (lo + hi) / 2
				if im(math.Exp(mid)) > 0 {
					lo = mid
				} else {
					hi = mid
				}
			}
			out = append(out, newCheck(c.Name, "self-resonance"+withCore(c), "1/(2π√(L·C)), C with the load",
				"zero crossing of the phase of (R + jωL) ∥ 1/(jωC) (complex arithmetic, bisection; the same L, C and a.c. resistance R)",
				fsr, math.Exp((lo+hi)/2), "Hz", 1e-6+R*R*C/L))
		}
	}
	if bl, bh := c.BandLow, c.BandHigh; bl > 0 && bh > bl && !math.IsNaN(rec.BandNoiseField) {
		T := k.Temperature
		g := func(f float64) float64 {
			b := calc.ThermalNoise(calc.ACResistance(c, w, cr.RHot, T, f).Rac, T) / calc.InductionSensitivity(rec.EffectiveArea, f)
			return b * b
		}
		sum := 0.0
		for a := bl; a < bh; a *= 2 {
			b := math.Min(2*a, bh)
			sum += simpson(g, a, b, 256)
		}
		out = append(out, newCheck(c.Name, "band noise field, rms"+withCore(c), "√∫ Bₙ² df: 64-point Gauss–Legendre in ln f",
			"the same integrand by composite Simpson's rule in f, panels doubling from the band's low end",
			rec.BandNoiseField, math.Sqrt(sum), "T", 1e-6))
	}
	return out
}

// withCore names a row of a cored pick-up coil whose figures include the
// core's inductance or effective area.
func withCore(c calc.Coil) string {
	if c.Core.Present() {
		return " (with the core's inductance and effective area)"
	}
	return ""
}

// simpson is the composite Simpson rule of f over [a, b] in n (even)
// intervals.
func simpson(f func(float64) float64, a, b float64, n int) float64 {
	h := (b - a) / float64(n)
	sum := f(a) + f(b)
	for i := 1; i < n; i++ {
		w := 2.0
		if i%2 == 1 {
			w = 4
		}
		sum += w * f(a+float64(i)*h)
	}
	return sum * h / 3
}

// ringMutualAB is Maxwell's mutual inductance of two coaxial circles of
// radii a and b whose planes are u apart (Maxwell, Treatise, 1873, §701),
//
//	M = μ0 √(ab) [(2/k − k) K − (2/k) E],  k² = 4ab/((a + b)² + u²),
//
// K and E by the arithmetic–geometric mean from the complementary modulus
// (Abramowitz and Stegun 17.6), as ringMutual does for equal circles.
func ringMutualAB(a, b, u float64) float64 {
	h := math.Sqrt((a+b)*(a+b) + u*u)
	k, kc := 2*math.Sqrt(a*b)/h, math.Sqrt((a-b)*(a-b)+u*u)/h
	an, bn := 1.0, kc
	sum := 0.5 * k * k
	pow := 0.5
	for range 40 {
		cn := (an - bn) / 2
		an, bn = (an+bn)/2, math.Sqrt(an*bn)
		pow *= 2
		sum += pow * cn * cn
		if cn < 1e-17*an {
			break
		}
	}
	K := math.Pi / (2 * an)
	E := K * (1 - sum)
	return calc.Mu0 * math.Sqrt(a*b) * ((2/k-k)*K - 2/k*E)
}
