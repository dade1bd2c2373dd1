package calc

import (
	"math"
	"sync"
)

// Multipole is the field outside a sphere of a set of coaxial circular
// filaments, as its exterior zonal (axisymmetric) multipole series: with
// the field B = −∇Φ of the scalar potential
//
//	Φ = Σ_{l≥1} A_l P_l(cos θ) / r^{l+1}   (r > R, every filament inside
//	                                         the sphere of radius R)
//
// and the gradients of the solid harmonics, ∂z[P_l/r^{l+1}] =
// −(l+1) P_{l+1}/r^{l+2} and ∂ρ[P_l/r^{l+1}] = P¹_{l+1}/r^{l+2}, the
// components in the filaments' frame are, with m = l + 1, u = cos θ = z/r,
// s = sin θ = ρ/r,
//
//	Bz = Σ_{m≥2} m A_{m−1} P_m(u) / r^{m+1},
//	Bρ = Σ_{m≥2} A_{m−1} s P′_m(u) / r^{m+1}.
//
// The coefficients follow from the field on the axis. A filament of radius
// a at height z_t carrying I gives there, for z > R_t = √(a² + z_t²),
//
//	Bz(z) = μ0 I a² / (2 (z² − 2 z z_t + R_t²)^{3/2})
//	      = μ0 I a²/2 · Σ_n C_n^{(3/2)}(z_t/R_t) R_t^n / z^{n+3}
//
// by the generating function of the Gegenbauer polynomials,
// (1 − 2xt + t²)^{−3/2} = Σ C_n^{(3/2)}(x) tⁿ; matching the axis value of
// Φ's series, Σ (l+1) A_l / z^{l+2}, term by term gives
//
//	A_{n+1} = μ0 I a² C_n^{(3/2)}(z_t/R_t) R_t^n / (2 (n + 2)).
//
// The first term (m = 2) is the field of the point dipole of moment
// I·πa². The coefficients are stored scaled, Ã_m = A_{m−1}/R^{m+1}, so
// that a term is Ã_m q^{m+1} with q = R/r < 1.
//
// Error bound: |P_m| ≤ 1 and |s P′_m(cos θ)| = |d P_m(cos θ)/dθ| ≤ m
// (Bernstein's inequality for the trigonometric polynomial P_m(cos θ) of
// degree m) bound a term by 2m |Ã_m| q^{m+1}. With h_k = max |Ã_m| over
// k ≤ m ≤ MultipoleOrder = N, the terms after the M-th up to N are at
// most
//
//	2 h_{M+1} Σ_{m>M} m q^{m+1} = 2 h_{M+1} q^{M+2} ((M+1) − M q)/(1 − q)²,
//
// and beyond N, where the coefficients are not kept, |C_n^{(3/2)}(x)| ≤
// C_n^{(3/2)}(1) = (n+1)(n+2)/2 on |x| ≤ 1 and R_t ≤ R give
// |Ã_m| ≤ G (m − 1), G = μ0 Σ |I| a² / (4 R³), so that the terms after
// the N-th, whose ratio is at most ϱ = q (N + 2)/N, are at most
//
//	2 G N (N + 1) q^{N+2} / (1 − ϱ).
//
// At adds to these the rounding, bounded generously: of the sum, roundSum
// of the sum of the terms' bounds, at most 2 h_2 q³ (2 − q)/(1 − q)² (the
// Legendre recurrences are forward stable on |u| ≤ 1, their error growing
// as m units of 10⁻¹⁶); and of the coefficients, whose recurrence errs by
// about n units of 10⁻¹⁶ of the envelope G (m − 1), roundCoef·2m²(m−1)·G·
// q^{m+1} a term, at most 2 roundCoef G q² ((1 + 4q + q²)/(1 − q)⁴ − 1)
// in all (Σ_{m≥1} m³ xᵐ = x (1 + 4x + x²)/(1 − x)⁴, less its first term). TestMultipoleWithinItsBound
// checks the whole bound against the turn sum.
//
// Reference: J. D. Jackson, Classical Electrodynamics, 3rd ed., Wiley
// 1999, §5.5 (the loop's axial field and its expansion in Legendre
// polynomials, eq. 5.36 ff.) and §3.3 (the exterior series);
// M. Abramowitz and I. A. Stegun, Handbook of Mathematical Functions, NBS
// AMS 55, 1964, 22.9.3 (the Gegenbauer generating function), 22.7.3 and
// 22.7.10 (the Legendre and Gegenbauer recurrences), 22.14.13
// (|C_n^{(λ)}(x)| ≤ C_n^{(λ)}(1)).
type Multipole struct {
	centre Vec
	fr     Frame
	R      float64   // radius of the sphere about centre that holds every filament
	a      []float64 // Ã_m at index m (a[0], a[1] unused)
	h      []float64 // h_m = max |Ã_k| over m ≤ k ≤ MultipoleOrder (h[MultipoleOrder+1] = 0)
	g      float64   // G of the bound, T
}

// MultipoleOrder is the highest term m the series keeps.
const MultipoleOrder = 96 // Multipole.sum's q^{N+2} is written out for it

// roundSum and roundCoef are the rounding allowances of Multipole.At
// (relative, per unit of the bounds they multiply).
const (
	roundSum  = 2e-15
	roundCoef = 1e-15
)

// multipoleNodes is the number of quadrature nodes per direction that sums
// a lattice exactly for every term up to MultipoleOrder: the m-th
// coefficient is a polynomial of degree m in the filament's radius and
// m − 2 in its height, and the n-node discrete Gauss rule on a lattice's
// rows is exact to degree 2n − 1 (see discreteGauss).
const multipoleNodes = MultipoleOrder/2 + 1

// unitSeries is the scaled series of a lattice at 1 A per turn about the
// origin of its coordinates, computed once per lattice.
type unitSeries struct {
	once sync.Once
	R, g float64
	a    []float64
}

// series returns the lattice's coefficients Ã_m (scaled by its own R),
// G and R at 1 A per turn.
func (l *lattice) series() *unitSeries {
	u := &l.unit
	u.once.Do(func() {
		rr := discreteGauss(l.nr, multipoleNodes)
		rz := discreteGauss(l.nz, multipoleNodes)
		rmax := math.Max(math.Abs(l.r0), math.Abs(l.r0+float64(l.nr-1)*l.dr))
		zmax := math.Max(math.Abs(l.z0), math.Abs(l.z0+float64(l.nz-1)*l.dz))
		u.R = math.Hypot(rmax, zmax)
		u.a = make([]float64, MultipoleOrder+1)
		if !(u.R > 0) {
			return
		}
		R := u.R
		R3 := R * R * R
		d := make([]float64, MultipoleOrder-1) // D_n = C_n(x) (R_t/R)^n
		for i, xr := range rr.x {
			a := l.r0 + xr*l.dr
			for j, xz := range rz.x {
				z := l.z0 + xz*l.dz
				w := rr.w[i] * rz.w[j] * l.mult
				xt, t2 := z/R, (a*a+z*z)/(R*R)
				d[0] = 1
				if len(d) > 1 {
					d[1] = 3 * xt
				}
				for n := 2; n < len(d); n++ {
					fn := float64(n)
					d[n] = (2*xt*(fn+0.5)*d[n-1] - (fn+1)*t2*d[n-2]) / fn
				}
				c := w * Mu0 * a * a / (2 * R3)
				for n, dn := range d {
					u.a[n+2] += c * dn / float64(n+2)
				}
				u.g += w * Mu0 * a * a / (4 * R3)
			}
		}
	})
	return u
}

// Multipoles returns the series of s's winding, one per placement (one,
// or the two coils of a pair) about its own centre, at s's current; nil
// for a rectangle or a coil without current.
func (s *CoilSource) Multipoles() []Multipole {
	if s.coil.Form == Rectangle || s.current == 0 || math.IsNaN(s.current) || math.IsInf(s.current, 0) || len(s.lattices) == 0 {
		return nil
	}
	var R float64
	for _, l := range s.lattices {
		R = math.Max(R, l.series().R)
	}
	if !(R > 0) || math.IsInf(R, 0) {
		return nil
	}
	var out []Multipole
	for _, cp := range s.coils {
		m := Multipole{centre: s.coil.Centre.Add(s.frame.U.Scale(cp.dz)), fr: s.frame, R: R, a: make([]float64, MultipoleOrder+1)}
		for _, l := range s.lattices {
			u := l.series()
			// rescale the lattice's own R to the placement's: Ã_m ∝ R^−(m+1)
			ratio := u.R / R
			k := cp.I * ratio * ratio
			for mm := 2; mm <= MultipoleOrder; mm++ {
				k *= ratio
				m.a[mm] += k * u.a[mm]
			}
			m.g += math.Abs(cp.I) * u.g * math.Pow(u.R/R, 3)
		}
		m.h = make([]float64, MultipoleOrder+2)
		for mm := MultipoleOrder; mm >= 2; mm-- {
			m.h[mm] = math.Max(m.h[mm+1], math.Abs(m.a[mm]))
		}
		out = append(out, m)
	}
	return out
}

// At returns the series' field at the global point p, T, summed until the
// bound on the terms left out (and the rounding) is at most tol, and that
// bound. ok is false where the series cannot meet tol with
// MultipoleOrder terms (p inside or too near the sphere of radius R).
func (mp *Multipole) At(p Vec, tol float64) (B Vec, bound float64, ok bool) {
	B, _, bound, ok = mp.sum(p, tol, 0, false)
	return B, bound, ok
}

// sum is the series at p to the tolerance tol + rel·G·q³, and, when pot
// is set, the vector potential A, T·m, of the same series,
//
//	A_φ = Σ_{m≥2} A_{m−1} s P′_{m−1}(u) / ((m − 1) r^m)
//
// (the curl of A_φ φ̂ is the field of each term; for m = 2 the point
// dipole's μ0 m sin θ/(4π r²)). A term of A is at most r times the bound
// of the same term of B, so r·bound bounds A's error.
//
// Reference: Jackson, Classical Electrodynamics, 3rd ed., §5.5 (eq. 5.37
// and the expansion of A_φ that follows it).
func (mp *Multipole) sum(p Vec, tol, rel float64, pot bool) (B, A Vec, bound float64, ok bool) {
	r := p.Sub(mp.centre)
	z := r.Dot(mp.fr.U)
	radial := r.Sub(mp.fr.U.Scale(z))
	// lengths of a design's size: √ of the sums of squares needs no
	// guard against overflow (a non-finite one fails q < 1)
	rho2 := radial.Dot(radial)
	rho, rr := math.Sqrt(rho2), math.Sqrt(rho2+z*z)
	q := mp.R / rr
	if !(q < 1) {
		return Vec{}, Vec{}, math.Inf(1), false
	}
	tol += rel * mp.g * q * q * q
	const N = MultipoleOrder
	g, w := mp.g, 1-q
	rhoN := q * (N + 2) / N
	if !(rhoN < 1) {
		return Vec{}, Vec{}, math.Inf(1), false
	}
	// the bound's parts that do not depend on where the sum stops
	q2 := q * q
	q4 := q2 * q2
	q8 := q4 * q4
	q32 := q8 * q8 * q8 * q8
	qN2 := q32 * q32 * q32 * q2 // q^{N+2} = q^98
	fixed := 2*g*N*(N+1)*qN2/(1-rhoN) +
		roundSum*2*mp.h[2]*q*q*q*(2-q)/(w*w) +
		2*roundCoef*g*q*q*((1+4*q+q*q)/(w*w*w*w)-1)
	if fixed > tol {
		return Vec{}, Vec{}, math.Inf(1), false
	}
	u, s := z/rr, rho/rr
	qp := q2 * q // q^{m+1} at m = 2
	// P_m, P′_m at m = 2 from P_1 = u, P′_1 = 1, P_0 = 1, P′_0 = 0
	p0, p1 := 1.0, u
	d0, d1 := 0.0, 1.0
	var bz, br, aphi float64
	for m := 2; m <= N; m++ {
		fm := float64(m)
		pm := ((2*fm-1)*u*p1 - (fm-1)*p0) / fm
		dm := d0 + (2*fm-1)*p1
		t := mp.a[m] * qp
		bz += fm * t * pm
		br += t * s * dm
		if pot {
			aphi += t * s * d1 / (fm - 1)
		}
		p0, p1, d0, d1 = p1, pm, d1, dm
		qp *= q
		if m%4 == 0 || m == N {
			// qp is now q^{m+2}
			tail := fixed
			if m < N {
				tail += 2 * mp.h[m+1] * qp * ((fm + 1) - fm*q) / (w * w)
			}
			if tail <= tol {
				bound = tail
				ok = true
				break
			}
		}
	}
	if !ok {
		return Vec{}, Vec{}, math.Inf(1), false
	}
	B = mp.fr.U.Scale(bz)
	if rho > 0 {
		B = B.Add(radial.Scale(br / rho))
		if pot {
			A = mp.fr.U.Cross(radial).Scale(aphi * rr / rho)
		}
	}
	return B, A, bound, true
}
