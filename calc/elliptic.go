package calc

import (
	"math"

	"gonum.org/v1/gonum/mathext"
)

// Complete elliptic integrals. gonum's mathext.CompleteK and CompleteE take
// the PARAMETER m = k² (not the modulus k):
//
//	K(m) = ∫₀^{π/2} dθ / √(1 − m sin²θ),   E(m) = ∫₀^{π/2} √(1 − m sin²θ) dθ
//
// (Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, 17.3.1–2).
// Several field and inductance formulas need combinations of K and E that
// cancel to O(m²) as m → 0; those are summed here from the Maclaurin series
//
//	K(m) = π/2 Σ κₙ mⁿ,  E(m) = π/2 Σ κₙ mⁿ/(1 − 2n),  κₙ = [(2n−1)!!/(2n)!!]²
//
// (A&S 17.3.11–12), with κₙ = κₙ₋₁ ((2n−1)/(2n))².

// smallM is the parameter below which the cancelling combinations are summed
// as series rather than formed from K and E (at m = 0.1 the K/E form has
// lost only about three digits, and the series needs about fifteen terms).
const smallM = 0.1

// ellipticK is K(m), parameter m = k².
func ellipticK(m float64) float64 { return mathext.CompleteK(m) }

// ellipticE is E(m), parameter m = k².
func ellipticE(m float64) float64 { return mathext.CompleteE(m) }

// ellipticSeries sums π/2 Σ_{n≥2} cₙ mⁿ where cₙ = coef(n, κₙ, κₙ₋₁, eₙ,
// eₙ₋₁) with eₙ = κₙ/(1−2n). The n = 0 and n = 1 terms of all combinations
// used here vanish. m must be in [0, smallM].
func ellipticSeries(m float64, coef func(n int, kn, kp, en, ep float64) float64) float64 {
	kp, ep := 0.25, -0.25 // κ₁, e₁
	sum := 0.0
	mn := m // m^(n−1)
	for n := 2; n < 80; n++ {
		r := float64(2*n-1) / float64(2*n)
		kn := kp * r * r
		en := kn / float64(1-2*n)
		mn *= m
		t := coef(n, kn, kp, en, ep) * mn
		sum += t
		if math.Abs(t) <= 1e-18*math.Abs(sum) {
			break
		}
		kp, ep = kn, en
	}
	return math.Pi / 2 * sum
}

// loopRadialBracket returns [(1 − m/2) E(m) − (1 − m) K(m)] / (1 − m), the
// combination in the radial field of a circular filament; it is O(m²)
// (leading term 3π m²/32). mc = 1 − m is passed separately so that it can be
// formed without cancellation by the caller.
func loopRadialBracket(m, mc float64) float64 {
	if m < smallM {
		f := ellipticSeries(m, func(_ int, kn, kp, en, ep float64) float64 {
			return en - ep/2 - kn + kp
		})
		return f / mc
	}
	return ((1-m/2)*ellipticE(m) - mc*ellipticK(m)) / mc
}

// maxwellBracket returns (2 − m) K(m) − 2 E(m), the combination in Maxwell's
// mutual inductance of coaxial circles; it is O(m²) (leading term π m²/16).
func maxwellBracket(m float64) float64 {
	if m < smallM {
		return ellipticSeries(m, func(_ int, kn, kp, en, _ float64) float64 {
			return 2*kn - kp - 2*en
		})
	}
	return (2-m)*ellipticK(m) - 2*ellipticE(m)
}

// kMinusEOverM returns (K(m) − E(m))/m, which tends to π/4 as m → 0.
func kMinusEOverM(m float64) float64 {
	if m < smallM {
		// (K − E)/m = π/2 Σ_{n≥1} (κₙ − eₙ) m^(n−1); the n = 1 term is 1/2.
		rest := ellipticSeries(m, func(_ int, kn, _, en, _ float64) float64 {
			return kn - en
		}) // π/2 Σ_{n≥2} (κₙ − eₙ) mⁿ
		if m == 0 {
			return math.Pi / 4
		}
		return math.Pi/4 + rest/m
	}
	return (ellipticK(m) - ellipticE(m)) / m
}

// ellipticBD returns Fukushima's associate complete integrals
//
//	B(m) = ∫₀^{π/2} cos²θ dθ / √(1 − m sin²θ),  D(m) = ∫₀^{π/2} sin²θ dθ / √(1 − m sin²θ)
//
// (mathext.CompleteB and CompleteD, parameter m = k²; Fukushima, J. Comput.
// Appl. Math. 282 (2015) 71), from which K = B + D, E = B + (1 − m) D and
// (K − E)/m = D (DLMF 19.2.9 with the definitions above): one pair of
// rational approximations gives K, E and their cancelling difference.
func ellipticBD(m float64) (b, d float64) { return mathext.CompleteB(m), mathext.CompleteD(m) }

// loopSeriesTerms is the number of Maclaurin coefficients tabulated for
// loopSeries: at m = smallM the n-th term is below 10⁻¹⁸ of the sum from
// n = 20 on.
const loopSeriesTerms = 40

// loopSeriesE and loopSeriesR are the Maclaurin coefficients of E(m) and of
// (1 − m)·R(m) = (1 − m/2) E(m) − (1 − m) K(m), each with its factor π/2
// (A&S 17.3.11–12: cₙ = π/2 eₙ and π/2 (eₙ − eₙ₋₁/2 − κₙ + κₙ₋₁); the
// terms n = 0, 1 of the second vanish).
var loopSeriesE, loopSeriesR = func() (e, r [loopSeriesTerms]float64) {
	kp, ep := 1.0, 1.0 // κ₀, e₀
	e[0] = math.Pi / 2
	for n := 1; n < loopSeriesTerms; n++ {
		q := float64(2*n-1) / float64(2*n)
		kn := kp * q * q
		en := kn / float64(1-2*n)
		e[n] = math.Pi / 2 * en
		if n >= 2 {
			r[n] = math.Pi / 2 * (en - ep/2 - kn + kp)
		}
		kp, ep = kn, en
	}
	return e, r
}()

// loopSeries returns E(m) and R(m) = [(1 − m/2) E(m) − (1 − m) K(m)]/(1 − m)
// summed from their Maclaurin series (see above) for 0 ≤ m < smallM; mc =
// 1 − m is passed by the caller, formed without cancellation. R is O(m²)
// (leading term 3π m²/32), so the series keeps every digit that the
// difference of K and E would lose.
func loopSeries(m, mc float64) (e, r float64) {
	e = loopSeriesE[0] + loopSeriesE[1]*m
	mn := m
	for n := 2; n < loopSeriesTerms; n++ {
		mn *= m
		te, tr := loopSeriesE[n]*mn, loopSeriesR[n]*mn
		e += te
		r += tr
		if tr <= 1e-18*r { // the R terms decrease no faster than the E terms
			break
		}
	}
	return e, r / mc
}
