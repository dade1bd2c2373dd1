package calc

import (
	"fmt"
	"math"
)

// EvaluateCore returns the figures of coil c (winding w, current I, A) with
// its soft-magnetic rod c.Core, by the axial slice model of the rod
// (rodModel):
//
// The winding's own field drives the rod: h0_j, the winding's axial field on
// the axis averaged over slice j, each layer taken as a current sheet over
// its turns (a thin coil as N coincident loops), in closed form,
//
//	∫ Hz dz = (n/2) [ √(r² + (z − u1)²) − √(r² + (z − u2)²) ]      (sheet of n turns/m on [u1, u2], radius r)
//
// The rod's magnetisation then solves h0_j = H_j + Σ_i D_ji M_i with
// M_j = M(H_j) from the material: linear, M = (μr − 1) H; with a saturation
// flux density Bs the ideal curve B = μ0 μr H up to Bs and
// B = Bs + μ0 (H − Hs) beyond; or the piecewise-linear B–H curve given
// (slope μ0 past its last point). The non-linear equations are solved by
// Newton's method with a halving line search, the current ramped up from
// the onset of saturation in steps of 20 %. From the magnetisation:
//
//	m = I ΣA + Σ_j M_j V_j                          (moment, winding plus core)
//	ΔL = μ0 Σ_j M_j V_j (h0_j / I) / I              (the core's share of L: its flux linkage, by reciprocity, over I)
//	A_eff = ΣA + Σ_j (M_j/H0) V_j (h0_j / I)         (reception in a uniform H0)
//	B_j = μ0 (H_j + M_j),  margin = 1 − B_peak,lin / Bs
//
// (Jackson, Classical Electrodynamics, 3rd ed., §5.8 and §5.17 for the
// magnetisation's field and flux linkage; for a long rod filled by a
// uniform winding these reduce to the textbook m = I ΣA + χapp N I A_core
// and ΔL = μ0 χapp N² A_core/ℓ with χapp = χ/(1 + Nm χ), which is
// (μapp − 1)/(1 − Nm)). With μr = 1 the core adds nothing
// and every figure is the air coil's. The drive is the field on the axis, so
// a core much thinner than the bore is the model's best case; a core filling
// the bore sees it exactly only inside a long winding.
//
// The residual moment after switch-off is the load-line intersection of
// the second-quadrant line B = Br (1 + H/Hc) with B = μ0 M (1 − Nm),
// H = −Nm M (the permeance construction, e.g. Cullity & Graham, Introduction
// to Magnetic Materials, 2nd ed., 2009, ch. 14):
//
//	M_r = Br / (μ0 (1 − Nm) + Br Nm / Hc)    → Hc/Nm for a soft core
//
// or the bound Br/μ0 when no coercivity is given.
//
// Only Loop and Solenoid forms take a core; others get a Problem.
func EvaluateCore(c Coil, w Winding, I float64) CoreResult {
	n := math.NaN()
	r := CoreResult{
		AspectRatio: n, DemagMagnetometric: n, DemagFluxmetric: n, DemagEllipsoid: n,
		ApparentPermeability: n, ApparentPermeabilityMid: n, CoreMoment: n, Moment: n, MomentLinear: n,
		FluxDensityPeak: n, FluxDensityLinear: n, SaturationMargin: n, SaturationCurrent: n,
		InductanceAdded: n, InductanceAddedInitial: n, EffectiveArea: n, Mass: n, ResidualMoment: n,
		PoleStrength: n, PoleSeparation: n, PeakH: n, PeakM: n, Volume: n,
	}
	k := c.Core
	switch {
	case !k.Present():
		r.Problem = "no core: give its permeability (≥ 1), length and diameter"
		return r
	case c.Form != Loop && c.Form != Solenoid:
		r.Problem = "a core is modelled only in a single circular coil (loop or solenoid)"
		return r
	case w.TurnCount() == 0:
		r.Problem = "the winding has no turns"
		return r
	}
	rod := newRod(k.Diameter, k.Length, rodSlices)
	K := len(rod.w)
	vol := rod.volumes()
	V := math.Pi * k.Diameter * k.Diameter / 4 * k.Length
	r.AspectRatio = k.Length / k.Diameter
	r.Volume = V
	chi0 := k.Permeability - 1
	r.DemagEllipsoid = SpheroidDemagFactor(r.AspectRatio)
	if k.Density > 0 {
		r.Mass = k.Density * V
	}
	if bore := windingBore(c, w); k.Diameter > bore*(1+1e-9) {
		r.Problem = fmt.Sprintf("the core (%.4g mm) is wider than the winding's bore (%.4g mm)", k.Diameter*1e3, bore*1e3)
	}
	h0 := coreDrive(c, w, rod) // A/m per ampere
	ones := make([]float64, K)
	for j := range ones {
		ones[j] = 1
	}
	air := I * w.AreaSum
	if chi0 == 0 { // μr = 1: the air coil exactly
		r.DemagMagnetometric, r.DemagFluxmetric = CylinderDemagUniform(r.AspectRatio)
		r.ApparentPermeability, r.ApparentPermeabilityMid = 1, 1
		r.CoreMoment, r.Moment, r.MomentLinear = 0, air, air
		r.FluxDensityPeak, r.FluxDensityLinear = 0, 0
		r.PeakH, r.PeakM = 0, 0
		r.InductanceAdded, r.InductanceAddedInitial = 0, 0
		r.EffectiveArea = w.AreaSum
		r.Z, r.Charge = append([]float64(nil), rod.z...), make([]float64, K+1)
		r.PoleStrength, r.ResidualMoment, r.Converged = 0, 0, true
		return r
	}
	chi := make([]float64, K)
	for j := range chi {
		chi[j] = chi0
	}
	nm, nf, err := rod.uniform(chi0)
	if err != nil {
		r.Problem = err.Error()
		return r
	}
	r.DemagMagnetometric, r.DemagFluxmetric = nm, nf
	r.ApparentPermeability = ApparentPermeability(k.Permeability, nm)
	r.ApparentPermeabilityMid = ApparentPermeability(k.Permeability, nf)

	// Linear solutions: per ampere of winding current, and per A/m of a
	// uniform applied field.
	mPerA, err1 := rod.solveLinear(chi, h0)
	mUni, err2 := rod.solveLinear(chi, ones)
	if err1 != nil || err2 != nil {
		r.Problem = errRodSingular.Error()
		return r
	}
	var coreLin, dL0, aEff, bLin float64
	for j := range mPerA {
		coreLin += mPerA[j] * vol[j]
		dL0 += Mu0 * mPerA[j] * vol[j] * h0[j]
		aEff += mUni[j] * vol[j] * h0[j]
		b := math.Abs(Mu0 * mPerA[j] * k.Permeability / chi0)
		bLin = math.Max(bLin, b)
	}
	r.InductanceAddedInitial = dL0
	r.EffectiveArea = w.AreaSum + aEff
	r.MomentLinear = air + coreLin*I
	r.FluxDensityLinear = bLin * math.Abs(I)
	bs := k.Saturation
	if bs <= 0 && len(k.Curve) > 0 {
		bs = k.Curve[len(k.Curve)-1].B
	}
	if bs > 0 {
		r.SaturationMargin = 1 - r.FluxDensityLinear/bs
		r.SaturationCurrent = bs / bLin
		r.Saturated = r.FluxDensityLinear > bs
	}

	// At the current: the material's curve.
	curve := coreCurve(k)
	var M, H []float64
	if curve == nil || I == 0 {
		M = make([]float64, K)
		H = make([]float64, K)
		for j := range M {
			M[j] = mPerA[j] * I
			H[j] = M[j] / chi0
		}
		r.Converged = true
	} else {
		M, H, r.Converged = rod.solveCurveRamp(curve, h0, mPerA, I, chi0, r.SaturationCurrent)
		if !r.Converged {
			r.Problem = "the saturating core's equations did not settle; the figures are the last iterate"
		}
	}
	var coreM, dL, bPeak float64
	r.PeakH, r.PeakM = 0, 0
	for j := range M {
		coreM += M[j] * vol[j]
		dL += Mu0 * M[j] * vol[j] * h0[j]
		if b := math.Abs(Mu0 * (H[j] + M[j])); b > bPeak {
			bPeak = b
			sign := math.Copysign(1, H[j]+M[j])
			r.PeakH, r.PeakM = sign*H[j], sign*M[j]
		}
	}
	r.CoreMoment = coreM
	r.Moment = air + coreM
	r.FluxDensityPeak = bPeak
	if I != 0 {
		r.InductanceAdded = dL / I
	} else {
		r.InductanceAdded = dL0
	}

	// Poles: the jumps of M at the nodes, in A·m.
	area := math.Pi * k.Diameter * k.Diameter / 4
	r.Z = append([]float64(nil), rod.z...)
	r.Charge = make([]float64, K+1)
	var q, qz float64
	for p := 0; p <= K; p++ {
		var below, above float64
		if p > 0 {
			below = M[p-1]
		}
		if p < K {
			above = M[p]
		}
		r.Charge[p] = (below - above) * area
		if r.Z[p] > 0 {
			q += r.Charge[p]
			qz += r.Charge[p] * r.Z[p]
		}
	}
	r.PoleStrength = q
	if q != 0 {
		r.PoleSeparation = 2 * qz / q
	}

	// Residual moment after switch-off.
	if k.Remanence > 0 {
		if k.Coercivity > 0 {
			mr := k.Remanence / (Mu0*(1-nm) + k.Remanence*nm/k.Coercivity)
			r.ResidualMoment = mr * V
		} else {
			r.ResidualMoment = k.Remanence / Mu0 * V
			r.ResidualBound = true
		}
	}
	return r
}

// CoredMoment returns the moment vector, A·m², of coil c with its core:
// the winding's MagneticMoment plus the core's along the axis.
func CoredMoment(c Coil, w Winding, I float64, r CoreResult) Vec {
	return MagneticMoment(c, w, I).Add(CoilFrame(c.Axis).U.Scale(r.CoreMoment))
}

// CorePoleField returns the field, T, at the global point p of the core's
// magnetisation alone (add the winding's CoilField for the whole coil), by
// the pole model of the slice solution: the magnetisation's jump at each
// node z_p of the rod, charge q_p (A·m) spread uniformly over the rod's
// cross-section of radius a there (surface charge q_p/(π a²)), not
// concentrated on the axis. Outside the rod the field of these face charges
// is that of the equivalent surface currents M_j on each slice's side
// (Jackson, Classical Electrodynamics, 3rd ed., §5.8–5.9); summed by parts
// over the slices, each node contributes the field of a semi-infinite
// current sheet in closed form (Derby & Olbert, "Cylindrical magnets and
// ideal solenoids", Am. J. Phys. 78 (2010) 229, eqs. 5–6):
//
//	Bρ = −(μ0/π) Σ_p (q_p/(π a²)) α_p C(k_p, 1, 1, −1)
//	Bz = −(μ0/π) Σ_p (q_p/(π a²)) (a/(a + ρ)) β_p C(k_p, γ², 1, γ)
//	u = z − z_p, α = a/√(u² + (a+ρ)²), β = u/√(u² + (a+ρ)²),
//	γ = (a − ρ)/(a + ρ), k = √((u² + (a−ρ)²)/(u² + (a+ρ)²))
//
// with C Bulirsch's complete elliptic integral (cel). Inside the rod the same
// sum is B = μ0 (H + M), the flux density in the core. Far away it tends to
// the dipole field of the core's moment Σ q_p z_p. NaN on the rod's surface
// at a node (k = 0), where the sheet's field is not defined.
func CorePoleField(c Coil, r CoreResult, p Vec) Vec {
	a := c.Core.Diameter / 2
	if !(a > 0) {
		return nanVec()
	}
	fr := CoilFrame(c.Axis)
	l := fr.ToLocal(p.Sub(c.Centre))
	rho := math.Hypot(l[0], l[1])
	area := math.Pi * a * a
	g := (a - rho) / (a + rho)
	var br, bz float64
	for i, q := range r.Charge {
		if q == 0 {
			continue
		}
		u := l[2] - r.Z[i]
		den := math.Sqrt(u*u + (a+rho)*(a+rho))
		kc := math.Sqrt(u*u+(a-rho)*(a-rho)) / den
		if kc == 0 {
			return nanVec()
		}
		sig := -q / area // the jump M above − M below
		br += sig * a / den * cel(kc, 1, 1, -1)
		bz += sig * a / (a + rho) * u / den * cel(kc, g*g, 1, g)
	}
	br *= Mu0 / math.Pi
	bz *= Mu0 / math.Pi
	var v Vec
	if rho > 0 {
		v = Vec{br * l[0] / rho, br * l[1] / rho, bz}
	} else {
		v = Vec{0, 0, bz}
	}
	return fr.ToGlobal(v)
}

// cel is Bulirsch's general complete elliptic integral
//
//	C(kc, p, c, s) = ∫₀^{π/2} (c cos²φ + s sin²φ) / ((cos²φ + p sin²φ) √(cos²φ + kc² sin²φ)) dφ
//
// by his algorithm (Bulirsch, Numer. Math. 13 (1969) 305, "cel"; in the
// form of Derby & Olbert, Am. J. Phys. 78 (2010) 229, appendix), to full
// double precision. C(kc, 1, 1, 1) = K(1 − kc²) and C(kc, 1, 1, kc²) =
// E(1 − kc²). NaN for kc = 0.
func cel(kc, p, c, s float64) float64 {
	if kc == 0 {
		return math.NaN()
	}
	const tol = 1e-15
	k := math.Abs(kc)
	pp, cc, ss := p, c, s
	em := 1.0
	if p > 0 {
		pp = math.Sqrt(p)
		ss = s / pp
	} else {
		f := kc * kc
		q := 1 - f
		g := 1 - pp
		f -= pp
		q *= ss - c*pp
		pp = math.Sqrt(f / g)
		cc = (c - ss) / g
		ss = -q/(g*g*pp) + cc*pp
	}
	f := cc
	cc += ss / pp
	g := k / pp
	ss = 2 * (ss + f*g)
	pp += g
	g = em
	em += k
	kk := k
	for it := 0; math.Abs(g-k) > g*tol && it < 60; it++ {
		k = 2 * math.Sqrt(kk)
		kk = k * em
		f = cc
		cc += ss / pp
		g = kk / pp
		ss = 2 * (ss + f*g)
		pp += g
		g = em
		em += k
	}
	return math.Pi / 2 * (ss + cc*em) / (em * (em + pp))
}

// corePointPoles is the field, T, at the global point p of magnetic point
// charges q_p, A·m, on coil c's axis at local z_p: B = μ0/(4π) Σ_p q_p
// (r − r_p)/|r − r_p|³ (Jackson, 3rd ed., §5.9).
func corePointPoles(c Coil, z, q []float64, p Vec) Vec {
	fr := CoilFrame(c.Axis)
	l := fr.ToLocal(p.Sub(c.Centre))
	var h Vec
	for i, qi := range q {
		if qi == 0 {
			continue
		}
		d := l.Sub(Vec{0, 0, z[i]})
		n := d.Norm()
		if n == 0 {
			return nanVec()
		}
		h = h.Add(d.Scale(qi / (n * n * n)))
	}
	return fr.ToGlobal(h.Scale(Mu0 / (4 * math.Pi)))
}

// CoreTwoPoleField is the two-pole form of CorePoleField: charges ±Q
// (PoleStrength) at ±s/2 on the axis, s the PoleSeparation, which have the
// core's moment Q·s exactly, as point charges on the axis (Bozorth,
// Ferromagnetism, 1951, ch. 19, the effective poles of a rod).
func CoreTwoPoleField(c Coil, r CoreResult, p Vec) Vec {
	return corePointPoles(c, []float64{-r.PoleSeparation / 2, r.PoleSeparation / 2}, []float64{-r.PoleStrength, r.PoleStrength}, p)
}

// windingBore returns the diameter of the winding's bore: the inner
// diameter of the innermost layer's wire.
func windingBore(c Coil, w Winding) float64 {
	outer := c.Wire.Outer
	if !(outer > 0) {
		outer = c.Wire.Bare
	}
	if len(w.Layers) == 0 {
		return c.MeanDiameter
	}
	return 2*w.Layers[0].Radius - outer
}

// coreDrive returns the winding's axial field on the axis per ampere,
// A/m, averaged over each slice of the rod (see EvaluateCore).
func coreDrive(c Coil, w Winding, rod *rodModel) []float64 {
	outer := c.Wire.Outer
	if !(outer > 0) {
		outer = c.Wire.Bare
	}
	h := make([]float64, len(rod.w))
	for _, layer := range w.Layers {
		nt := len(layer.Z)
		if nt == 0 {
			continue
		}
		r := layer.Radius
		lo, hi := layer.Z[0], layer.Z[0]
		for _, z := range layer.Z {
			lo, hi = math.Min(lo, z), math.Max(hi, z)
		}
		var prim func(z float64) float64 // ∫ Hz dz per ampere
		if hi-lo < 1e-12 && (w.Thin || nt == 1) {
			z0 := lo
			prim = func(z float64) float64 {
				u := z - z0
				return float64(nt) / 2 * u / math.Hypot(r, u)
			}
		} else {
			pitch := outer
			if nt > 1 {
				pitch = (hi - lo) / float64(nt-1)
			}
			u1, u2 := lo-pitch/2, hi+pitch/2
			dens := float64(nt) / (u2 - u1)
			prim = func(z float64) float64 {
				return dens / 2 * (math.Hypot(r, z-u1) - math.Hypot(r, z-u2))
			}
		}
		for j := range h {
			h[j] += (prim(rod.z[j+1]) - prim(rod.z[j])) / rod.w[j]
		}
	}
	return h
}

// coreCurve returns M(H) and dM/dH of the core's material, odd in H, or nil
// for a linear core (no saturation and no curve).
func coreCurve(k Core) func(h float64) (m, dm float64) {
	var bh func(h float64) (b, db float64) // for h ≥ 0
	switch {
	case len(k.Curve) > 0:
		pts := append([]BHPoint{{0, 0}}, k.Curve...)
		bh = func(h float64) (float64, float64) {
			for i := 1; i < len(pts); i++ {
				if h <= pts[i].H {
					s := (pts[i].B - pts[i-1].B) / (pts[i].H - pts[i-1].H)
					return pts[i-1].B + s*(h-pts[i-1].H), s
				}
			}
			last := pts[len(pts)-1]
			return last.B + Mu0*(h-last.H), Mu0
		}
	case k.Saturation > 0:
		mu := Mu0 * k.Permeability
		hs := k.Saturation / mu
		bh = func(h float64) (float64, float64) {
			if h <= hs {
				return mu * h, mu
			}
			return k.Saturation + Mu0*(h-hs), Mu0
		}
	default:
		return nil
	}
	return func(h float64) (float64, float64) {
		s := 1.0
		if h < 0 {
			s, h = -1, -h
		}
		b, db := bh(h)
		return s * (b/Mu0 - h), db/Mu0 - 1
	}
}

// solveCurveRamp solves the saturating core at current I by continuation:
// from the linear solution at the current where the core begins to saturate
// (exact there), the current rises by at most rampRatio a step, each step
// solved by solveCurve from the last.
func (r *rodModel) solveCurveRamp(curve func(float64) (float64, float64), h0, mPerA []float64, I, chi0, isat float64) (M, H []float64, ok bool) {
	K := len(r.w)
	start := math.Abs(I)
	if isat > 0 && isat < start {
		start = 0.999 * isat
	}
	steps := 1
	if start < math.Abs(I) {
		steps = int(math.Ceil(math.Log(math.Abs(I)/start) / math.Log(rampRatio)))
	}
	sign := math.Copysign(1, I)
	H = make([]float64, K)
	for j := range H {
		H[j] = mPerA[j] * sign * start / chi0
	}
	for s := 1; s <= steps; s++ {
		cur := sign * start * math.Pow(math.Abs(I)/start, float64(s)/float64(steps))
		hI := make([]float64, K)
		for j := range hI {
			hI[j] = h0[j] * cur
		}
		M, H, ok = r.solveCurve(curve, hI, H)
	}
	return M, H, ok
}

// solveCurve solves h0_j = H_j + Σ_i D_ji M(H_i) for the slice fields H by
// Newton's method, J ΔH = −G with J = I + D diag(dM/dH), halving the step
// while the residual's Euclidean norm grows (the descent direction of
// ½|G|² wherever the curve is smooth). It starts from the slice fields start.
func (r *rodModel) solveCurve(curve func(float64) (float64, float64), h0, start []float64) (M, H []float64, ok bool) {
	K := len(r.w)
	H = append([]float64(nil), start...)
	resid := func(h []float64) ([]float64, []float64, float64) {
		m := make([]float64, K)
		for j := range h {
			m[j], _ = curve(h[j])
		}
		g := make([]float64, K)
		var norm float64
		raw := r.d.RawMatrix()
		for j := 0; j < K; j++ {
			s := h[j] - h0[j]
			row := raw.Data[j*raw.Stride : j*raw.Stride+K]
			for i, dji := range row {
				s += dji * m[i]
			}
			g[j] = s
			norm += s * s
		}
		return g, m, math.Sqrt(norm)
	}
	scale := 0.0
	for _, v := range h0 {
		scale = math.Max(scale, math.Abs(v))
	}
	g, m, norm := resid(H)
	for it := 0; it < 50; it++ {
		if norm <= 1e-10*scale*math.Sqrt(float64(K)) {
			return m, H, true
		}

		// J = I + D diag(dM/dH), solved as a dense system.
		jac := make([]float64, K*K)
		dm := make([]float64, K)
		for i := range dm {
			_, dm[i] = curve(H[i])
		}
		raw := r.d.RawMatrix()
		for j := 0; j < K; j++ {
			row := raw.Data[j*raw.Stride : j*raw.Stride+K]
			for i, dji := range row {
				jac[j*K+i] = dji * dm[i]
			}
			jac[j*K+j]++
		}
		step, err := solveDense(K, jac, g)
		if err != nil {
			return m, H, false
		}
		t := 1.0
		for ls := 0; ls < 40; ls++ {
			trial := make([]float64, K)
			for j := range trial {
				trial[j] = H[j] - t*step[j]
			}
			g2, m2, n2 := resid(trial)
			if n2 < norm || ls == 39 {
				H, g, m, norm = trial, g2, m2, n2
				break
			}
			t /= 2
		}
	}
	return m, H, norm <= 1e-8*scale*math.Sqrt(float64(K))
}

// rampRatio is the largest factor by which solveCurveRamp raises the
// current from one step to the next.
const rampRatio = 1.2

// CoredDipoleDistances is DipoleDistances for coil c (winding w, current
// I) with its core r: the exact field is the winding's plus the core's
// (CorePoleField), the dipole that of the cored moment (CoredMoment), and
// the search starts beyond the larger of the winding's and the rod's
// extents. Zero moment gives NaN distances.
func CoredDipoleDistances(c Coil, w Winding, I float64, r CoreResult) DipoleReach {
	s := NewCoilSource(c, w, I)
	fr := CoilFrame(c.Axis)
	m := CoredMoment(c, w, I, r)
	size := math.Max(coilExtent(c, w), math.Hypot(c.Core.Length/2, c.Core.Diameter/2))
	rng := func(dirs []Vec, tol float64) float64 {
		if !(size > 0) || m.Norm() == 0 || m.IsNaN() {
			return math.NaN()
		}
		out := 0.0
		for _, u := range dirs {
			relErr := func(d float64) float64 {
				p := c.Centre.Add(u.Scale(d))
				ex := s.At(p).Add(CorePoleField(c, r, p))
				return DipoleField(m, u.Scale(d)).Sub(ex).Norm() / ex.Norm()
			}
			d := dipoleBeyond(relErr, size, tol)
			if math.IsNaN(d) {
				return d
			}
			out = math.Max(out, d)
		}
		return out
	}
	axis, plane := []Vec{fr.U}, []Vec{fr.E1}
	var between []Vec
	for k := 1; k < 9; k++ {
		sn, co := math.Sincos(float64(k) * math.Pi / 18)
		between = append(between, fr.U.Scale(co).Add(fr.E1.Scale(sn)))
	}
	d := DipoleReach{Axis1: rng(axis, 0.01), Axis01: rng(axis, 0.001), Plane1: rng(plane, 0.01), Plane01: rng(plane, 0.001)}
	d.Any1 = math.Max(math.Max(d.Axis1, d.Plane1), rng(between, 0.01))
	d.Any01 = math.Max(math.Max(d.Axis01, d.Plane01), rng(between, 0.001))
	return d
}
