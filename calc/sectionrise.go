package calc

import "math"

// SectionRise returns the rises, K/W, of the volume-mean and of the hottest
// temperature above the surface of a multilayer winding's section — the
// annulus ri ≤ r ≤ ro (ri ≥ 0), |z| ≤ ℓ/2 of a coil — in which heat is
// generated uniformly, q = P/(π (ro² − ri²) ℓ), and conducted with the
// effective conductivity k, taken isotropic in the r–z plane (both
// directions cross the turns), out through the outer cylinder and both end
// faces, held at the surface temperature; the bore, on the former, is
// adiabatic. With θ = T − T_s and z from the mid-plane the steady
// conduction equation (1/r) ∂/∂r (r ∂θ/∂r) + ∂²θ/∂z² = −q/k is solved by
// the eigenfunction series in z whose radial parts are modified Bessel
// functions of order 0 (Carslaw & Jaeger, Conduction of Heat in Solids,
// 2nd ed., 1959, §8.3 for the cylinder; the method of §5.2 and §8.2):
//
//	θ(r, z) = (q/k) [ (ℓ²/4 − z²)/2 − Σ_{n≥0} (c_n/λ_n²) F_n(r) cos λ_n z ]
//	λ_n = (2n+1)π/ℓ,  c_n = 4(−1)ⁿ/((2n+1)π)
//	F_n(r) = [I0(λ_n r) + ρ_n K0(λ_n r)] / [I0(λ_n ro) + ρ_n K0(λ_n ro)],  ρ_n = I1(λ_n ri)/K1(λ_n ri)
//
// — the plane slab between the cooled end faces, less the part the
// cooled outer cylinder removes; each term satisfies the equation, is zero
// at r = ro and on the ends, and has ∂/∂r = 0 at the bore (I0′ = I1,
// K0′ = −K1); ρ_n = 0 for a solid section (ri = 0). The hottest point is
// on the bore in the mid-plane, and the volume mean follows from
// ∫ r I0 = r I1/λ, ∫ r K0 = −r K1/λ:
//
//	ΔT_max  = (q/k) [ℓ²/8  − Σ (c_n/λ_n²) F_n(ri)]
//	ΔT_mean = (q/k) [ℓ²/12 − Σ (c_n²/(2λ_n²)) F̄_n],
//	F̄_n = (2 ro/(λ_n (ro² − ri²))) [I1(λ_n ro) − ρ_n K1(λ_n ro)] / [I0(λ_n ro) + ρ_n K0(λ_n ro)]
//
// The Bessel functions are taken scaled (bessel.go), so no term overflows.
// The hot-spot terms fall off as e^(−λ_n (ro − ri)) and are summed until
// they fall below 10⁻¹⁶ of the sum; the mean's as (2n+1)⁻⁵, and they are
// summed until the neglected tail, bounded by F̄_n ≤ 2 ro/(λ_n (ro² −
// ri²)), falls below 10⁻¹¹ of the mean. Longer than SectionLongRatio
// depths, the section is its long-winding limit less the end faces'
// share: the hottest point is AnnulusRise's (the ends' effect at the
// mid-plane falls off as e^(−π ℓ/(4 (ro − ri))), below 10⁻²¹ there), and
// the mean falls short of AnnulusRise's by 2E/ℓ, E the end faces'
// integrated deficit, taken from the series at SectionLongRatio depths
// (the two ends' interaction falls off as e^(−π ℓ/(2 (ro − ri)))). As
// ℓ → ∞ both tend to AnnulusRise. NaN for bad data.
//
// Reference: H. S. Carslaw and J. C. Jaeger, Conduction of Heat in
// Solids, 2nd ed., Oxford, 1959, §8.3 (steady temperatures in the finite
// cylinder by series of I0 and cos λz); modified Bessel functions from
// Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, ch. 9.
func SectionRise(ri, ro, l, k float64) (mean, max float64) {
	if !(ri >= 0) || !(ro > ri) || !(l > 0) || !(k > 0) || math.IsInf(ro, 0) || math.IsInf(l, 0) {
		return math.NaN(), math.NaN()
	}
	gm, gx := sectionShape(ri, ro, l)
	q := 1 / (math.Pi * (ro*ro - ri*ri) * l) // per watt
	return q / k * gm, q / k * gx
}

// SectionLongRatio is the length, in depths ro − ri, beyond which
// SectionRise takes a section as its long-winding limit less the end
// faces' share.
const SectionLongRatio = 64

// annulusShape returns k/q times AnnulusRise's mean and hottest rise, m².
func annulusShape(ri, ro float64) (mean, max float64) {
	a2 := ro*ro - ri*ri
	lg := 0.0
	if ri > 0 {
		lg = math.Log(ro / ri)
	}
	max = (a2 - 2*ri*ri*lg) / 4
	mean = (a2*a2/4 - ri*ri*a2/2 + ri*ri*ri*ri*lg) / (2 * a2)
	return mean, max
}

// sectionShape returns k/q times SectionRise's mean and hottest rise, m².
func sectionShape(ri, ro, l float64) (mean, max float64) {
	d := ro - ri
	if L := SectionLongRatio * d; l > L {
		am, ax := annulusShape(ri, ro)
		sm, _ := sectionSeries(ri, ro, L)
		return am - (am-sm)*L/l, ax
	}
	return sectionSeries(ri, ro, l)
}

// sectionTerm returns, for λ = λ_n, F_n(r) (at r ≥ ri) and F̄_n of
// SectionRise.
func sectionTerm(ri, ro, lam, r float64) (f, fbar float64) {
	d := ro - ri
	xo := lam * ro
	e2 := math.Exp(-2 * lam * d) // e^(−2λ(ro−ri)): K against I over the depth
	// Where e2 is below 10⁻²⁰ the bore's terms, ρ_n K(λ ro) e2 against
	// I(λ ro) (both ratios of order one), are far below the last bit of
	// the sums at ro; only F_n inside the section still needs ρ_n.
	bore := ri > 0 && (e2 >= 1e-20 || r < ro)
	rho := 0.0 // ρ_n e^(−2λ ri), the scaled ratio
	if bore {
		rho = besselIe(1, lam*ri) / besselKe(1, lam*ri)
	}
	den := besselIe(0, xo)
	num := besselIe(1, xo)
	if rho > 0 && e2 > 0 {
		den += rho * besselKe(0, xo) * e2
		num -= rho * besselKe(1, xo) * e2
	}
	fbar = 2 * ro / (lam * (ro*ro - ri*ri)) * num / den
	if r >= ro {
		return 1, fbar // F_n(ro) = 1 by its definition
	}
	if er := math.Exp(-lam * (ro - r)); er > 0 {
		top := besselIe(0, lam*r)
		if rho > 0 {
			top += rho * besselKe(0, lam*r) * math.Exp(-2*lam*(r-ri))
		}
		f = er * top / den
	}
	return f, fbar
}

// sectionWave is term n of SectionRise's series over a section ℓ long:
// its wave number λ_n = (2n+1)π/ℓ and coefficient c_n = 4(−1)ⁿ/((2n+1)π).
func sectionWave(n int, l float64) (lam, c float64) {
	m := float64(2*n + 1)
	c = 4 / (m * math.Pi)
	if n%2 == 1 {
		c = -c
	}
	return m * math.Pi / l, c
}

// sectionSeries sums SectionRise's series: k/q times the mean and the
// hottest rise, m².
func sectionSeries(ri, ro, l float64) (mean, max float64) {
	a2 := ro*ro - ri*ri
	d := ro - ri
	sumMax, sumMean := 0.0, 0.0
	tail := 2 * ro * l * l * l / (math.Pow(math.Pi, 5) * a2) // × M⁻⁴: bound of the mean's neglected tail
	maxDone := false
	for n := 0; n < 1_000_000; n++ {
		lam, c := sectionWave(n, l)
		var fi, fbar float64
		if maxDone {
			_, fbar = sectionTerm(ri, ro, lam, ro) // F_n(ri) no longer needed
		} else {
			fi, fbar = sectionTerm(ri, ro, lam, ri)
		}
		tMax := c / (lam * lam) * fi
		sumMax += tMax
		sumMean += c * c / (2 * lam * lam) * fbar
		max, mean = l*l/8-sumMax, l*l/12-sumMean
		if !maxDone && lam*d > 2 && math.Abs(tMax) <= 1e-16*max {
			maxDone = true
		}
		if m := float64(2*n + 1); maxDone && tail/(m*m*m*m) <= 1e-11*mean {
			break
		}
	}
	return mean, max
}

// sectionRiseAt returns the rise θ(r, z), K/W, at (r, z) of SectionRise's
// section (z from the mid-plane), by its series summed until the terms,
// which fall off as e^(−λ_n (ro − r)) (2n+1)⁻³, are below 10⁻¹⁷ of ℓ² or
// after 20000 of them.
func sectionRiseAt(ri, ro, l, k, r, z float64) float64 {
	sum := 0.0
	for n := 0; n < 20000; n++ {
		lam, c := sectionWave(n, l)
		f, _ := sectionTerm(ri, ro, lam, r)
		t := c / (lam * lam) * f * math.Cos(lam*z)
		sum += t
		if lam*(ro-r) > 2 && math.Abs(c/(lam*lam)*f) < 1e-17*l*l {
			break
		}
	}
	q := 1 / (math.Pi * (ro*ro - ri*ri) * l)
	return q / k * ((l*l/4-z*z)/2 - sum)
}
