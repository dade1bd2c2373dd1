package calc

import (
	"math"

	"gonum.org/v1/gonum/integrate/quad"
)

// Boltzmann is the Boltzmann constant k = 1.380649×10⁻²³ J/K (exact in the
// 2019 SI).
const Boltzmann = 1.380649e-23

// ThermalNoise returns the open-circuit thermal (Johnson–Nyquist) noise
// voltage density, V/√Hz, of a resistance R, Ω, at temperature T, K
// (Nyquist, "Thermal agitation of electric charge in conductors", Phys. Rev.
// 32 (1928) 110): e_n = √(4 k T R). NaN for R < 0 or T < 0.
func ThermalNoise(R, T float64) float64 {
	if !(R >= 0) || !(T >= 0) {
		return math.NaN()
	}
	return math.Sqrt(4 * Boltzmann * T * R)
}

// InductionSensitivity returns the e.m.f. per tesla, V/T, of a coil of
// effective area aEff, m² (flux linkage per tesla of a uniform field along
// its axis: ΣA for an air coil, CoreResult.EffectiveArea with a core), at
// frequency f, Hz, by Faraday's law for a sinusoidal field (Tumanski,
// "Induction coil sensors — a review", Meas. Sci. Technol. 18 (2007) R31,
// eq. 1; with a core, A_eff ≈ N A_core μapp):
//
//	S = 2π f A_eff
//
// the same for amplitudes and for rms values.
func InductionSensitivity(aEff, f float64) float64 {
	return 2 * math.Pi * f * aEff
}

// TerminalResponse returns the sensitivity, V/T, at the open terminals of a
// coil of e.m.f. sensitivity 2π f A_eff, series resistance R, Ω, and
// inductance L, H, shunted by capacitance C, F (the lumped model of a coil
// and its self-capacitance; e.g. Tumanski 2007, §4, eq. 20):
//
//	|V/B| = 2π f A_eff / |1 − ω² L C + j ω R C|,  ω = 2π f
//
// which peaks near 1/(2π√(LC)). The thermal noise of R is shaped by the
// same divider, so the noise-equivalent field √(4kTR)/(2π f A_eff) holds at
// every frequency the lumped model holds.
func TerminalResponse(aEff, R, L, C, f float64) float64 {
	w := 2 * math.Pi * f
	return w * aEff / math.Hypot(1-w*w*L*C, w*R*C)
}

// EvaluateReceiver returns the figures of coil c as a pick-up coil at
// c.Frequency: effective area aEff, m² (w.AreaSum for an air coil,
// CoreResult.EffectiveArea with a core), d.c. resistance rdc, Ω, and
// inductance L, H, at the winding temperature T, K. The resistance at
// frequency is Dowell's (ACResistance); the noise-equivalent field is
//
//	B_n = √(4 k T R_ac) / (2π f A_eff)      T/√Hz
//
// and over the band [c.BandLow, c.BandHigh] the rms noise field is
// √(∫ B_n(f)² df), by Gauss–Legendre quadrature in ln f. The capacitance is
// the winding's SelfCapacitance plus c.LoadCapacitance; the self-resonance
// 1/(2π√(LC)). Response holds the terminal sensitivity and B_n at 121
// frequencies spaced evenly in ln f over three decades either side of
// Frequency (or of the band's geometric mean), clipped at 3 f_sr.
func EvaluateReceiver(c Coil, w Winding, aEff, rdc, L, T float64) ReceiverResult {
	n := math.NaN()
	f := c.Frequency
	r := ReceiverResult{Frequency: f, EffectiveArea: aEff, Sensitivity: n, Resistance: n, NoiseVoltage: n,
		NoiseField: n, BandNoiseField: n}
	r.SelfCapacitance = SelfCapacitance(c, w)
	r.Capacitance = r.SelfCapacitance + math.Max(c.LoadCapacitance, 0)
	r.SelfResonance = SelfResonance(L, r.Capacitance)
	rac := func(f float64) float64 { return ACResistance(c, w, rdc, T, f).Rac }
	bn := func(f float64) float64 { return ThermalNoise(rac(f), T) / InductionSensitivity(aEff, f) }
	if f > 0 {
		r.Sensitivity = InductionSensitivity(aEff, f)
		r.Resistance = rac(f)
		r.NoiseVoltage = ThermalNoise(r.Resistance, T)
		r.NoiseField = r.NoiseVoltage / r.Sensitivity
		r.AboveResonance = AboveSelfResonance(f, r.SelfResonance)
	}
	if lo, hi := c.BandLow, c.BandHigh; lo > 0 && hi > lo {
		g := func(u float64) float64 { f := math.Exp(u); b := bn(f); return b * b * f }
		r.BandNoiseField = math.Sqrt(quad.Fixed(g, math.Log(lo), math.Log(hi), 64, quad.Legendre{}, 0))
	}
	centre := f
	if !(centre > 0) && c.BandLow > 0 && c.BandHigh > c.BandLow {
		centre = math.Sqrt(c.BandLow * c.BandHigh)
	}
	if centre > 0 {
		lo, hi := centre/1000, centre*1000
		if fsr := r.SelfResonance; fsr > 0 && hi > 3*fsr {
			hi = 3 * fsr
		}
		if hi > lo {
			for i := 0; i <= 120; i++ {
				fi := lo * math.Pow(hi/lo, float64(i)/120)
				r.Response = append(r.Response, ResponsePoint{
					Frequency:   fi,
					Sensitivity: TerminalResponse(aEff, rac(fi), L, r.Capacitance, fi),
					NoiseField:  bn(fi),
				})
			}
		}
	}
	r.WorkingBandTop = workingBandTop(r.Response, func(f float64) float64 {
		return TerminalResponse(aEff, rac(f), L, r.Capacitance, f) / InductionSensitivity(aEff, f)
	})
	return r
}

// WorkingBandTolerance is the departure of a pick-up coil's terminal
// sensitivity from the induction law 2π f A_eff that ends its working
// band: 10 %.
const WorkingBandTolerance = 0.1

// workingBandTop is ReceiverResult.WorkingBandTop of response pts, ratio
// the terminal sensitivity over the induction law's at a frequency: the
// first sampled departure beyond WorkingBandTolerance is bracketed by the
// sample below it and bisected in ln f to 10⁻⁶ of the frequency.
func workingBandTop(pts []ResponsePoint, ratio func(f float64) float64) float64 {
	if len(pts) == 0 {
		return math.NaN()
	}
	off := func(f float64) bool { return math.Abs(ratio(f)-1) > WorkingBandTolerance }
	for k, p := range pts {
		if !off(p.Frequency) {
			continue
		}
		if k == 0 {
			return 0
		}
		lo, hi := math.Log(pts[k-1].Frequency), math.Log(p.Frequency)
		for hi-lo > 1e-6 {
			mid := (lo + hi) / 2
			if off(math.Exp(mid)) {
				hi = mid
			} else {
				lo = mid
			}
		}
		return math.Exp(lo)
	}
	return math.Inf(1)
}
