package calc

import "math"

// Modified Bessel functions of the first and second kind, orders 0 and 1,
// scaled so that they neither overflow nor underflow at large arguments:
//
//	besselI0e(x) = e^(−x) I0(x),  besselI1e(x) = e^(−x) I1(x),
//	besselK0e(x) = e^(x) K0(x),   besselK1e(x) = e^(x) K1(x),   x > 0.
//
// Each is evaluated by the method that is accurate to about 10⁻¹⁵ of
// itself where it is used (Abramowitz & Stegun, Handbook of Mathematical
// Functions, 1964):
//
//   - I0, I1 for x ≤ 20 by their ascending series (9.6.10), whose terms are
//     all positive; above 20 by the asymptotic expansion (9.7.1), whose
//     neglected part is of relative order e^(−2x) < 10⁻¹⁷ there.
//   - K0, K1 for x ≤ 2 by their ascending series (9.6.13, 9.6.11), whose
//     cancellation costs at most a factor e^(2x) ≤ 55 in precision; for
//     2 < x ≤ 20 by the integral K_ν(x) = ∫₀^∞ e^(−x cosh t) cosh(νt) dt
//     (9.6.24) taken by the trapezoidal rule, which converges geometrically
//     in the step for this integrand analytic in a strip (step 1/8, summed
//     until the terms fall below 10⁻¹⁸ of the sum); above 20 by the
//     asymptotic expansion (9.7.2), accurate to e^(−2x) likewise.
//
// The asymptotic series are summed until their terms fall below 10⁻¹⁷ or
// stop decreasing. NaN for x < 0 or NaN; the K are +Inf at 0.

const besselSwitch = 20.0

// besselIe returns e^(−x) I_ν(x), ν = 0 or 1.
func besselIe(nu int, x float64) float64 {
	switch {
	case math.IsNaN(x) || x < 0:
		return math.NaN()
	case math.IsInf(x, 1):
		return 0
	case x <= besselSwitch:
		// I_ν(x) = Σ (x/2)^(2k+ν) / (k! (k+ν)!)
		y := x * x / 4
		term := 1.0
		if nu == 1 {
			term = x / 2
		}
		sum := term
		for k := 1; k < 200; k++ {
			term *= y / (float64(k) * float64(k+nu))
			sum += term
			if term < 1e-17*sum {
				break
			}
		}
		return sum * math.Exp(-x)
	}
	return besselAsymptotic(nu, x, -1) / math.Sqrt(2*math.Pi*x)
}

// besselKe returns e^(x) K_ν(x), ν = 0 or 1.
func besselKe(nu int, x float64) float64 {
	switch {
	case math.IsNaN(x) || x < 0:
		return math.NaN()
	case x == 0:
		return math.Inf(1)
	case math.IsInf(x, 1):
		return 0
	case x <= 2:
		return besselKSeries(nu, x) * math.Exp(x)
	case x <= besselSwitch:
		// e^x K_ν(x) = ∫₀^∞ e^(−x (cosh t − 1)) cosh(νt) dt, trapezoidal rule.
		const h = 1.0 / 8
		sum := 0.5 // the t = 0 end: half of e^0 cosh 0
		for j := 1; j < 2000; j++ {
			t := float64(j) * h
			f := math.Exp(-x * (math.Cosh(t) - 1))
			if nu == 1 {
				f *= math.Cosh(t)
			}
			sum += f
			if f < 1e-18*sum {
				break
			}
		}
		return sum * h
	}
	return besselAsymptotic(nu, x, 1) * math.Sqrt(math.Pi/(2*x))
}

// besselAsymptotic sums 1 + Σ_k s^k a_k(ν)/x^k with a_k = (μ−1)(μ−9)…(μ−(2k−1)²)/(k! 8^k),
// μ = 4ν²: s = −1 for I_ν (9.7.1), s = +1 for K_ν (9.7.2).
func besselAsymptotic(nu int, x, s float64) float64 {
	mu := 4 * float64(nu*nu)
	sum, term := 1.0, 1.0
	prev := math.Inf(1)
	for k := 1; k < 60; k++ {
		odd := float64(2*k - 1)
		next := term * s * (mu - odd*odd) / (float64(k) * 8 * x)
		if math.Abs(next) >= prev {
			break // the asymptotic series has begun to diverge
		}
		term, prev = next, math.Abs(next)
		sum += term
		if math.Abs(term) < 1e-17*math.Abs(sum) {
			break
		}
	}
	return sum
}

// besselKSeries returns K_ν(x), ν = 0 or 1, by the ascending series
// (Abramowitz & Stegun 9.6.13 and 9.6.11):
//
//	K0(x) = −(ln(x/2) + γ) I0(x) + Σ_{k≥1} H_k (x²/4)^k / (k!)²
//	K1(x) = 1/x + ln(x/2) I1(x) − (x/4) Σ_{k≥0} [ψ(k+1) + ψ(k+2)] (x²/4)^k / (k! (k+1)!)
//
// with H_k the harmonic numbers and ψ(k+1) = H_k − γ.
func besselKSeries(nu int, x float64) float64 {
	const euler = 0.57721566490153286061
	y := x * x / 4
	lg := math.Log(x / 2)
	i := besselIe(nu, x) * math.Exp(x)
	if nu == 0 {
		sum, term, hk := 0.0, 1.0, 0.0
		for k := 1; k < 100; k++ {
			term *= y / float64(k*k)
			hk += 1 / float64(k)
			sum += hk * term
			if term < 1e-18 {
				break
			}
		}
		return -(lg+euler)*i + sum
	}
	sum, term := 0.0, 1.0
	hk, hk1 := 0.0, 1.0 // H_k and H_(k+1)
	for k := 0; k < 100; k++ {
		if k > 0 {
			term *= y / (float64(k) * float64(k+1))
			hk += 1 / float64(k)
			hk1 += 1 / float64(k+1)
		}
		sum += (hk + hk1 - 2*euler) * term
		if k > 0 && term < 1e-18 {
			break
		}
	}
	return 1/x + lg*i - x/4*sum
}
