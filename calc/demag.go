package calc

import (
	"math"
)

// This file holds the demagnetising factors of a magnetic core: the
// ellipsoid's exact factor, the cylinder's factors for a uniform
// magnetisation, and the apparent permeability they give. The cylinder's
// factors at a finite susceptibility come from the axial slice model in
// rodslices.go.

// SpheroidDemagFactor returns the demagnetising factor N (SI, the three
// factors of an ellipsoid sum to 1) along the symmetry axis of a spheroid of
// axis ratio p = c/a, c the semi-axis along the symmetry axis and a the
// equatorial one (Osborn, "Demagnetizing factors of the general ellipsoid",
// Phys. Rev. 67 (1945) 351, eqs. for the prolate and oblate spheroid;
// Stoner, Phil. Mag. 36 (1945) 803):
//
//	prolate, p > 1:  N = 1/(p² − 1) · [ p/√(p² − 1) · ln(p + √(p² − 1)) − 1 ]
//	oblate,  p < 1:  N = 1/(1 − p²) · [ 1 − p/√(1 − p²) · arccos p ]
//
// and N = 1/3 for the sphere; within 10⁻⁴ of p = 1 the first-order series
// 1/3 − (4/15)(p − 1) is used, where both forms lose digits to
// cancellation. NaN for p ≤ 0 or not finite.
func SpheroidDemagFactor(p float64) float64 {
	if !(p > 0) || math.IsInf(p, 1) {
		return math.NaN()
	}
	switch {
	case math.Abs(p-1) < 1e-4:
		return 1.0/3 - 4.0/15*(p-1)
	case p > 1:
		s := math.Sqrt(p*p - 1)
		return (p/s*math.Log(p+s) - 1) / (p*p - 1)
	default:
		s := math.Sqrt(1 - p*p)
		return (1 - p/s*math.Acos(p)) / (1 - p*p)
	}
}

// SpheroidDemagLongRod returns the leading terms of the prolate spheroid's
// factor for a long spheroid, p = c/a ≫ 1 (Osborn 1945, the limit of the
// prolate formula; also Bozorth, Ferromagnetism, 1951, ch. 19):
//
//	N ≈ (ln(2p) − 1) / p²
//
// whose relative error against the exact factor is of order ln(2p)/p².
func SpheroidDemagLongRod(p float64) float64 {
	if !(p > 0) {
		return math.NaN()
	}
	return (math.Log(2*p) - 1) / (p * p)
}

// CylinderDemagUniform returns the magnetometric and fluxmetric
// demagnetising factors Nm and Nf of a right circular cylinder of
// length-to-diameter ratio γ magnetised uniformly along its axis — the
// factors of zero susceptibility (Chen, Brug & Goldfarb, "Demagnetizing
// factors for cylinders", IEEE Trans. Magn. 27 (1991) 3601, §III, where they
// are computed exactly from inductance formulas). A uniform magnetisation M
// has the field of a current sheet of surface density M, so the volume
// average of B, μ0 M (1 − Nm), is the sheet's flux linkage over its volume,
// and the mid-plane average, μ0 M (1 − Nf), is its flux through its own
// mid-plane:
//
//	Nm = 1 − k_N(D/ℓ = 1/γ)                                 (Nagaoka's coefficient)
//	Nf = 1 − d/dh [ h · k_N(a, h) ] at h = ℓ/2,  a = D/2
//
// the second because the inductance of a sheet of length h, μ0 n² π a² h k_N,
// grows with h at twice the rate of the flux through its end turn, and the
// mid-plane of a sheet of length ℓ is the end of two sheets of length ℓ/2.
// The derivative is taken by a five-point central difference (relative
// error about 10⁻¹¹). NaN for γ ≤ 0.
func CylinderDemagUniform(gamma float64) (nm, nf float64) {
	if !(gamma > 0) || math.IsInf(gamma, 1) {
		return math.NaN(), math.NaN()
	}
	a := 0.5 // diameter 1: the length is γ
	nm = 1 - NagaokaCoefficient(a, gamma)
	g := func(h float64) float64 { return h * NagaokaCoefficient(a, h) }
	h := gamma / 2
	e := 1e-3 * h
	d := (-g(h+2*e) + 8*g(h+e) - 8*g(h-e) + g(h-2*e)) / (12 * e)
	nf = 1 - d
	return nm, nf
}

// ApparentPermeability returns the apparent (shape) permeability of a core
// of relative permeability μr and demagnetising factor N in a uniform
// applied field: the ratio of its magnetic induction to μ0 times the applied
// field (e.g. Bozorth, Ferromagnetism, 1951, ch. 19; Tumanski, "Induction coil
// sensors — a review", Meas. Sci. Technol. 18 (2007) R31, eq. 6):
//
//	μapp = μr / (1 + N (μr − 1))
//
// which tends to 1/N for μr ≫ 1/N. An infinite μr gives 1/N. NaN for μr < 1
// or N outside [0, 1].
func ApparentPermeability(mur, n float64) float64 {
	if !(mur >= 1) || !(n >= 0 && n <= 1) {
		return math.NaN()
	}
	if math.IsInf(mur, 1) {
		return 1 / n
	}
	return mur / (1 + n*(mur-1))
}
