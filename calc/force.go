package calc

import "math"

// MutualInductanceGradient returns ∂M/∂d, H/m, the rate of change of
// Maxwell's mutual inductance of two coaxial circular filaments (radii a, b,
// planes d apart) with their distance; the axial force between them is
// F = I₁ I₂ ∂M/∂d (on the second filament, along the line from the first to
// the second; negative: attraction). Differentiating Maxwell's formula
// (Grover, Inductance Calculations, 1946, ch. 17 on forces; Smythe 1950
// §8.02):
//
//	∂M/∂d = −μ0 d k / (4 √(ab)) · [(2 − m) E(m) / (1 − m) − 2 K(m)],  m = k² = 4ab/((a + b)² + d²)
//
// The bracket cancels to O(m²) for distant circles (leading term
// 3π m²/16); it is summed as a series for m < 0.1, so that the force tends
// to the dipole–dipole value −3 μ0 π a² b² I₁ I₂ / (2 d⁴). NaN for
// coincident circles.
func MutualInductanceGradient(a, b, d float64) float64 {
	if !(a > 0) || !(b > 0) || d == 0 {
		return 0
	}
	D := (a+b)*(a+b) + d*d
	dm := (a-b)*(a-b) + d*d
	if dm == 0 {
		return math.NaN()
	}
	if math.IsInf(D, 0) {
		return 0
	}
	m := 4 * a * b / D
	mc := dm / D
	if m >= 1 {
		m = math.Nextafter(1, 0)
	}
	var f float64 // (2 − m)E − 2(1 − m)K
	if m < smallM {
		f = ellipticSeries(m, func(_ int, kn, kp, en, ep float64) float64 {
			return 2*en - ep - 2*kn + 2*kp
		})
	} else {
		f = (2-m)*ellipticE(m) - 2*mc*ellipticK(m)
	}
	return -Mu0 * d * math.Sqrt(m) / (4 * math.Sqrt(a*b)) * f / mc
}

// CoaxialForce returns the axial force, N, on winding w2 (current I2) from
// the coaxial winding w1 (current I1) when w2 is displaced by dz along the
// axis: F = I₁ I₂ Σᵢ Σⱼ ∂M/∂d (rᵢ, rⱼ, zⱼ + dz − zᵢ), summed over all pairs
// of turns (coincident thin turns grouped). Positive pushes w2 towards +z.
func CoaxialForce(w1 Winding, I1 float64, w2 Winding, I2, dz float64) float64 {
	r1, r2 := rowsOf(w1), rowsOf(w2)
	F := 0.0
	for _, p := range r1 {
		for _, q := range r2 {
			F += rowSum(p, q, dz, MutualInductanceGradient)
		}
	}
	return I1 * I2 * F
}

// PairForce returns the axial force, N, between the two coils of a Pair at
// current I: positive when they repel (push apart), negative when they
// attract. Aiding coils attract, opposing ones repel. 0 for other forms.
func PairForce(c Coil, w Winding, I float64) float64 {
	if c.Form != Pair {
		return 0
	}
	I2 := I
	if c.Opposing {
		I2 = -I
	}
	// Force on the second coil (at +Spacing/2) along +U: positive = apart.
	return CoaxialForce(w, I, w, I2, math.Abs(c.Spacing))
}

// DipoleForce returns the force, N, on a small magnetic dipole of moment m
// (A·m², held fixed) at p in the field B(·) of external sources:
// F = ∇(m·B) (Jackson, Classical Electrodynamics, 3rd ed., eq. 5.69), by
// central differences of step h (m) in each direction; the error is
// O(h²·∂³B).
func DipoleForce(m Vec, B func(Vec) Vec, p Vec, h float64) Vec {
	var F Vec
	for i := range 3 {
		var e Vec
		e[i] = h
		F[i] = (m.Dot(B(p.Add(e))) - m.Dot(B(p.Sub(e)))) / (2 * h)
	}
	return F
}
