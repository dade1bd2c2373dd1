package calc

import "math"

// NagaokaCoefficient returns Nagaoka's coefficient k_N of a current sheet
// (single-layer solenoid) of radius a and length ℓ, the factor by which its
// inductance falls short of the infinitely long solenoid's (Nagaoka, "The
// inductance coefficients of solenoids", J. Coll. Sci. Tokyo 27 (1909);
// tabulated in Grover, Inductance Calculations, 1946, Table 36). With the
// modulus k² = 4a²/(4a² + ℓ²) = m and k'² = 1 − m,
//
//	k_N = 4/(3π k') · [ (k'²/k²) (K(m) − E(m)) + E(m) − k ]
//
// which tends to 1 − 8a/(3πℓ) for a long coil. NaN for ℓ ≤ 0 or a ≤ 0.
func NagaokaCoefficient(a, l float64) float64 {
	if !(a > 0) || !(l > 0) {
		return math.NaN()
	}
	d2 := 4 * a * a
	m := d2 / (d2 + l*l)
	mc := l * l / (d2 + l*l)
	k, kc := math.Sqrt(m), math.Sqrt(mc)
	return 4 / (3 * math.Pi * kc) * (mc*kMinusEOverM(m) + ellipticE(m) - k)
}

// SolenoidInductance returns the self-inductance, H, of a single-layer
// solenoid of N turns, radius a (to the wire centres) and length ℓ taken as
// a current sheet, by Lorenz's formula in Nagaoka's form (Grover, 1946,
// eq. 114):
//
//	L = μ0 π a² N² k_N / ℓ
//
// It neglects the round-wire corrections (Rosa 1906), a few per cent for
// widely spaced turns.
func SolenoidInductance(a, l float64, N int) float64 {
	n := float64(N)
	return Mu0 * math.Pi * a * a * n * n * NagaokaCoefficient(a, l) / l
}

// WheelerInductance returns Wheeler's approximation, H, to the same
// single-layer solenoid (Wheeler, "Simple inductance formulas for radio
// coils", Proc. IRE 16 (1928) 1398), L = a² N²/(9a + 10ℓ) μH with a, ℓ in
// inches, i.e. in SI
//
//	L = μ0 π a² N² / (ℓ + 0.9 a)
//
// (k_N ≈ 1/(1 + 0.9 a/ℓ)); Wheeler states it is within 1 % for ℓ > 0.8 a.
// Used as a cross-check of SolenoidInductance.
func WheelerInductance(a, l float64, N int) float64 {
	n := float64(N)
	return Mu0 * math.Pi * a * a * n * n / (l + 0.9*a)
}

// RingInductance returns the self-inductance, H, of a thin circular coil of
// N turns on mean radius a whose winding is a round bundle of radius b ≪ a
// carrying a uniformly distributed current (Rosa, "The self and mutual
// inductances of linear conductors", Bull. Bur. Standards 4 (1908); Grover,
// Inductance Calculations, 1946, ch. 13; the single-wire case is Jackson's
// ln(8a/b) − 7/4):
//
//	L = μ0 N² a [ln(8a/b) − 2 + Y/4],  Y = 1 (uniform current: −7/4)
//
// The error is of order (b/a)²·ln(8a/b). NaN when b ≥ a or when the result
// is not positive (the formula has left its range).
func RingInductance(a, b float64, N int) float64 {
	if !(a > 0) || !(b > 0) || b >= a {
		return math.NaN()
	}
	n := float64(N)
	L := Mu0 * n * n * a * (math.Log(8*a/b) - 1.75)
	if !(L > 0) {
		return math.NaN()
	}
	return L
}

// MutualInductance returns the mutual inductance, H, of two coaxial circular
// filaments of radii a and b whose planes are d apart, by Maxwell's formula
// (Maxwell, A Treatise on Electricity and Magnetism, 1873, §701; Grover,
// 1946, eq. 77):
//
//	M = μ0 √(ab) [(2/k − k) K(m) − (2/k) E(m)],  m = k² = 4ab/((a + b)² + d²)
//
// The bracket, k⁻¹[(2 − m)K − 2E], cancels to O(k³) for distant circles; it
// is summed as a series for m < 0.1, so that M tends smoothly to
// μ0 π a² b²/(2 d³) at large d. +Inf for coincident circles.
func MutualInductance(a, b, d float64) float64 {
	if !(a > 0) || !(b > 0) {
		return 0
	}
	D := (a+b)*(a+b) + d*d
	if math.IsInf(D, 0) {
		return 0
	}
	m := 4 * a * b / D
	if (a-b)*(a-b)+d*d == 0 {
		return math.Inf(1)
	}
	if m >= 1 {
		m = math.Nextafter(1, 0)
	}
	return Mu0 * math.Sqrt(a*b) * maxwellBracket(m) / math.Sqrt(m)
}

// TurnSelfInductance returns the self-inductance, H, of one circular turn of
// round wire of radius r on radius a, low frequency (uniform current):
// L = μ0 a (ln(8a/r) − 7/4) (Rosa 1908; Jackson, Classical Electrodynamics,
// 3rd ed., problem 5.32).
func TurnSelfInductance(a, r float64) float64 {
	if !(a > 0) || !(r > 0) {
		return math.NaN()
	}
	return Mu0 * a * (math.Log(8*a/r) - 1.75)
}
