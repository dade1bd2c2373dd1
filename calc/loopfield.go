package calc

import "math"

// LoopField returns the field (Bρ, Bz), T, of a circular filament of radius
// a (m) carrying current I (A, positive counter-clockwise seen from +z, so
// that Bz > 0 at the centre) lying in the plane z = 0 centred on the axis, at
// the point of cylindrical coordinates (ρ, z). Exact, for a filament of
// negligible cross-section (Smythe, Static and Dynamic Electricity, 1950,
// §7.10; Jackson, Classical Electrodynamics, 3rd ed., §5.5):
//
//	D = (a + ρ)² + z²,  m = k² = 4aρ/D,  1 − m = ((a − ρ)² + z²)/D
//	Bz = μ0 I / (2π√D) · [K(m) + (a² − ρ² − z²)/((a − ρ)² + z²) · E(m)]
//	Bρ = μ0 I z / (2π ρ √D) · R(m),  R = [(1 − m/2) E(m) − (1 − m) K(m)] / (1 − m)
//
// with K, E the complete elliptic integrals of parameter m, evaluated once
// per call from one pair of rational approximations (ellipticBD: K = B + D,
// E = B + (1 − m) D, R = (m/2)(B − (1 − m) D)/(1 − m)).
//
// Far from the filament (m < 0.1) the Bz bracket cancels: K ≈ E and the
// coefficient of E tends to −1, so that at 10⁵ radii on the axis ten digits
// would be lost. There the identity (from 2aρ = mD/2 and
// (a − ρ)² + z² = D(1 − m), substituted into the bracket)
//
//	K + (a² − ρ² − z²)/((a − ρ)² + z²) · E = 2a² E/((a − ρ)² + z²) − R(m)
//
// is used, with E and R summed from their Maclaurin series (loopSeries; R is
// O(m²), leading term 3π m²/32): no term cancels, and on the axis it is the
// closed form μ0 I a²/(2 (a² + z²)^{3/2}) exactly. (Near the filament the
// same identity would cancel instead, which is why the forms switch at
// m = 0.1, where both keep all but the last digit.) ρ = 0 gives Bρ = 0 and
// the on-axis closed form. A negative ρ is read as the point on the other
// side of the axis (Bρ changes sign). On the filament itself the field is
// infinite; NaN is returned.
func LoopField(a, I, rho, z float64) (brho, bz float64) {
	if !(a > 0) || I == 0 {
		return 0, 0
	}
	sign := 1.0
	if rho < 0 {
		rho, sign = -rho, -1
	}
	if rho == 0 {
		return 0, LoopFieldOnAxis(a, I, z)
	}
	D := (a+rho)*(a+rho) + z*z
	dm := (a-rho)*(a-rho) + z*z // D(1 − m), without cancellation
	if dm == 0 || math.IsInf(D, 0) {
		if math.IsInf(D, 0) {
			return 0, 0
		}
		return math.NaN(), math.NaN()
	}
	mc := dm / D
	m := 4 * a * rho / D
	if m >= 1 { // only by rounding, a hair from the filament
		m = math.Nextafter(1, 0)
	}
	sqD := math.Sqrt(D)
	pre := Mu0 * I / (2 * math.Pi * sqD)
	var r float64
	if m < smallM {
		var e float64
		e, r = loopSeries(m, mc)
		bz = pre * (2*a*a*e/dm - r)
	} else {
		b, d := ellipticBD(m)
		K, E := b+d, b+mc*d
		r = m / 2 * (b - mc*d) / mc
		bz = pre * (K + (a*a-rho*rho-z*z)/dm*E)
	}
	brho = sign * pre * z / rho * r
	return brho, bz
}

// LoopFieldOnAxis returns the axial field, T, of a circular filament of
// radius a carrying current I at distance z from its plane on its axis
// (Biot–Savart law; e.g. Jackson, Classical Electrodynamics, 3rd ed., §5.5):
//
//	Bz = μ0 I a² / (2 (a² + z²)^{3/2})
func LoopFieldOnAxis(a, I, z float64) float64 {
	if !(a > 0) {
		return 0
	}
	s := a*a + z*z
	return Mu0 * I * a * a / (2 * s * math.Sqrt(s))
}
