package calc

import (
	"math"

	"gonum.org/v1/gonum/mathext"
)

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
	near := (a-b)*(a-b) + d*d
	if near == 0 {
		return math.Inf(1)
	}
	if m > 0.9 {
		// Nearly coincident circles: 1 − m loses its digits when formed
		// from m, so K and E come from the complementary parameter
		// m₁ = ((a − b)² + d²)/D, exact as written, through Carlson's
		// symmetric integrals (DLMF 19.25.1): K = R_F(0, m₁, 1),
		// E = R_F(0, m₁, 1) − (m/3) R_D(0, m₁, 1).
		m1 := near / D
		rf := mathext.EllipticRF(0, m1, 1)
		K, E := rf, rf-m/3*mathext.EllipticRD(0, m1, 1)
		return Mu0 * math.Sqrt(a*b) * ((2-m)*K - 2*E) / math.Sqrt(m)
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

// RosaA returns Rosa's correction A for the self-inductance of a turn of
// round wire against a strip of the current sheet: A = 5/4 − ln(2p/d) for
// winding pitch p and bare wire diameter d (Rosa, "The self and mutual
// inductances of linear conductors", Bull. Bur. Standards 4 (1908) 301;
// Grover, Inductance Calculations, 1946, ch. 16). It is the difference of
// the logarithms of the geometric mean distances of a strip of width p
// from itself, p·e^(−3/2), and of a round wire from itself, (d/2)·e^(−1/4).
// NaN when p or d is not positive.
func RosaA(p, d float64) float64 {
	if !(p > 0) || !(d > 0) {
		return math.NaN()
	}
	return 1.25 - math.Log(2*p/d)
}

// RosaB returns Rosa's correction B(N) for the mutual inductances of the
// N round turns of a single-layer winding against those of the N strips of
// the current sheet (same sources as RosaA):
//
//	B(N) = (2/N) Σ_{k=1}^{N−1} (N − k) f(k),
//	f(k) = ln k + 3/2 − [(k+1)² ln(k+1) + (k−1)² ln(k−1) − 2k² ln k]/2
//
// where f(k) is ln(k·p/g_k), g_k being the geometric mean distance of two
// strips of width p whose centres are k·p apart. Grover tabulates B(N)
// (B(2) = 0.1137, B(10) = 0.2664, B(100) = 0.3269). The closed form of
// f(k) cancels badly for large k, so from k = 10 on its series
// f(k) = Σ_{j≥1} 2/((2j)(2j+1)(2j+2) k^{2j}) = 1/(12k²) + 1/(60k⁴) + …
// (Rosa 1906) is summed instead.
func RosaB(N int) float64 {
	if N < 2 {
		return 0
	}
	n := float64(N)
	s := 0.0
	for k := 1; k < N; k++ {
		s += (n - float64(k)) * rosaF(float64(k))
	}
	return 2 * s / n
}

// rosaF is f(k) of RosaB.
func rosaF(k float64) float64 {
	if k < 10 {
		lg := func(x float64) float64 {
			if x == 0 {
				return 0
			}
			return x * x * math.Log(x)
		}
		return math.Log(k) + 1.5 - (lg(k+1)+lg(k-1)-2*lg(k))/2
	}
	x := 1 / (k * k)
	f, xp := 0.0, 1.0
	for j := 1; j <= 8; j++ {
		xp *= x
		t := 2 / float64(2*j*(2*j+1)*(2*j+2)) * xp
		f += t
		if t < 1e-18*f {
			break
		}
	}
	return f
}

// RoundWireSolenoidInductance returns the self-inductance, H, of a
// single-layer solenoid of N turns of round wire (bare diameter d) at pitch
// p on radius a (to the wire centres), length ℓ = N p: Lorenz's
// current-sheet value (SolenoidInductance) less Rosa's round-wire
// correction (Rosa 1906, "The self-inductance of a single-layer coil",
// Bull. Bur. Standards 2, 161; Grover, Inductance Calculations, 1946,
// ch. 16):
//
//	L = L_s − μ0 a N (A + B),  A = RosaA(p, d),  B = RosaB(N)
//
// A corrects each turn's self-inductance from a strip to a round wire, B
// the mutual inductances of the turns; both neglect the curvature of the
// turns, so the formula is good for pitches small against the radius.
// NaN where SolenoidInductance or RosaA is.
func RoundWireSolenoidInductance(a, l float64, N int, d float64) float64 {
	if N < 1 {
		return math.NaN()
	}
	p := l / float64(N)
	return SolenoidInductance(a, l, N) - RosaCorrection(a, p, d, N)
}

// RosaCorrection returns μ0 a N (A + B), H, the amount by which Rosa's
// round-wire correction lowers the current-sheet inductance (a negative
// value raises it: widely spaced thin wire has more inductance than the
// sheet).
func RosaCorrection(a, p, d float64, N int) float64 {
	return Mu0 * a * float64(N) * (RosaA(p, d) + RosaB(N))
}

// WheelerValidRatio is the smallest length-to-diameter ratio for which
// Wheeler (1928) states his single-layer formula is within about 1 %:
// ℓ > 0.8 a, i.e. ℓ/D > 0.4.
const WheelerValidRatio = 0.4

// MultilayerByCells reports whether CoilInductance sums the multilayer
// winding w over cells of turns (CellInductance) rather than turn by turn.
func MultilayerByCells(w Winding) bool {
	rs := rowsOf(w)
	return rowPairCost(rs, rs, true) > turnSumBudget
}

// WheelerMultilayerInductance returns Wheeler's approximation, H, to the
// inductance of a multilayer coil of N turns, mean radius a, winding
// length b and radial build c (Wheeler, "Simple inductance formulas for
// radio coils", Proc. IRE 16, 1928; recalled from memory):
// L = 0.8 a² N²/(6a + 9b + 10c) µH with the lengths in inches, i.e. in SI
//
//	L = (0.8 µH / 1 in) · a² N² / (6a + 9b + 10c)
//
// quoted to about 1 % when the three terms of the denominator are
// comparable. NaN for non-positive dimensions.
func WheelerMultilayerInductance(a, b, c float64, N int) float64 {
	if !(a > 0) || !(b > 0) || !(c > 0) {
		return math.NaN()
	}
	n := float64(N)
	return 0.8e-6 / Inch * a * a * n * n / (6*a + 9*b + 10*c)
}
