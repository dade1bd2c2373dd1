package calc

import "math"

// Mutual inductance and force between two circular filaments in any
// relative position (axes inclined, centres offset). Neumann's formula
// M = μ0/(4π) ∮∮ dl₁·dl₂ / |r₁ − r₂| is reduced to a single integral by
// doing the integral over the first circle in closed form: it is the
// vector potential of that circle (Smythe, Static and Dynamic Electricity,
// 3rd ed., 1968, §7.10; Jackson, Classical Electrodynamics, 3rd ed.,
// eq. 5.37), azimuthal about its axis,
//
//	A_φ(ρ, z) = μ0 I / (π k) · √(a/ρ) · [(1 − k²/2) K(k²) − E(k²)],  k² = 4aρ / ((a + ρ)² + z²)
//
// so that M = ∮₂ A₁·dl₂ / I₁ (the reduction Babic et al. use for inclined
// filaments, IEEE Trans. Magn. 46 (2010) 3591). The force on the second
// filament is the Lorentz integral F = I₂ ∮₂ dl₂ × B₁ with the exact field
// of the first (LoopField). Both integrands are smooth and periodic on the
// second circle, so the trapezoidal rule on neumannPoints points converges
// geometrically (Trefethen & Weideman, SIAM Review 56 (2014) 385).

// neumannPoints is the number of trapezoidal points on the second circle.
const neumannPoints = 256

// Filament is a circular filament: centre (m), unit normal (its axis, the
// current's sense by the right-hand rule) and radius (m).
type Filament struct {
	Centre, Axis Vec
	Radius       float64
}

// loopPotential returns A_φ (T·m) of a filament of radius a carrying 1 A at
// cylindrical (ρ, z) about its centre and axis.
func loopPotential(a, rho, z float64) float64 {
	if !(rho > 0) {
		return 0
	}
	D := (a+rho)*(a+rho) + z*z
	m := 4 * a * rho / D
	if m >= 1 {
		return math.Inf(1)
	}
	k := math.Sqrt(m)
	var br float64
	if m < smallM {
		// (1 − m/2) K − E = π/2 Σ … cancels for small m: its series.
		br = ellipticSeries(m, func(_ int, kn, kp, en, ep float64) float64 { return kn - kp/2 - en })
	} else {
		br = (1-m/2)*ellipticK(m) - ellipticE(m)
	}
	return Mu0 / (math.Pi * k) * math.Sqrt(a/rho) * br
}

// atTrig returns the point and tangent dl/dθ of filament f at angle θ,
// given its frame fr (CoilFrame of its axis), cos θ and sin θ: the frame
// and the trigonometry are computed once for a loop over many angles.
func (f Filament) atTrig(fr Frame, c, s float64) (p, t Vec) {
	p = f.Centre.Add(fr.E1.Scale(f.Radius * c)).Add(fr.E2.Scale(f.Radius * s))
	t = fr.E1.Scale(-f.Radius * s).Add(fr.E2.Scale(f.Radius * c))
	return p, t
}

// neumannTrig holds cos θᵢ and sin θᵢ at the trapezoidal points
// θᵢ = i·2π/neumannPoints, computed once for every pair of filaments.
var neumannTrig = func() (t [neumannPoints][2]float64) {
	h := 2 * math.Pi / neumannPoints
	for i := range t {
		th := h * float64(i)
		t[i] = [2]float64{math.Cos(th), math.Sin(th)}
	}
	return t
}()

// FilamentMutual returns the mutual inductance, H, of circular filaments f1
// and f2 in any position (see the file comment). NaN when the filaments
// touch or the data are not usable.
func FilamentMutual(f1, f2 Filament) float64 {
	return filamentMutual(f1, f2, neumannTrig[:])
}

// filamentMutual is FilamentMutual by the trapezoidal rule on the points
// of trig (cos θᵢ, sin θᵢ at θᵢ = i·2π/len(trig)).
func filamentMutual(f1, f2 Filament, trig [][2]float64) float64 {
	if !(f1.Radius > 0) || !(f2.Radius > 0) {
		return math.NaN()
	}
	fr := CoilFrame(f1.Axis)
	h := 2 * math.Pi / float64(len(trig))
	s := 0.0
	fr2 := CoilFrame(f2.Axis)
	for _, cs := range trig {
		p, t := f2.atTrig(fr2, cs[0], cs[1])
		l := fr.ToLocal(p.Sub(f1.Centre))
		rho := math.Hypot(l[0], l[1])
		if !(rho > 0) {
			continue // on the axis: A = 0
		}
		phi := Vec{-l[1] / rho, l[0] / rho, 0}
		A := loopPotential(f1.Radius, rho, l[2])
		s += A * fr.ToLocal(t).Dot(phi)
	}
	M := s * h
	if math.IsInf(M, 0) || math.IsNaN(M) {
		return math.NaN()
	}
	return M
}

// FilamentForce returns the force, N, on filament f2 (current I2) in the
// field of filament f1 (current I1): F = I₂ ∮₂ dl₂ × B₁ (Lorentz), B₁ the
// exact field of f1 (LoopField). NaN vector when the filaments touch.
func FilamentForce(f1 Filament, I1 float64, f2 Filament, I2 float64) Vec {
	return filamentForce(f1, I1, f2, I2, neumannTrig[:])
}

// filamentForce is FilamentForce by the trapezoidal rule on the points of
// trig (see filamentMutual).
func filamentForce(f1 Filament, I1 float64, f2 Filament, I2 float64, trig [][2]float64) Vec {
	if !(f1.Radius > 0) || !(f2.Radius > 0) {
		return nanVec()
	}
	fr := CoilFrame(f1.Axis)
	h := 2 * math.Pi / float64(len(trig))
	var F Vec
	fr2 := CoilFrame(f2.Axis)
	for _, cs := range trig {
		p, t := f2.atTrig(fr2, cs[0], cs[1])
		l := fr.ToLocal(p.Sub(f1.Centre))
		rho := math.Hypot(l[0], l[1])
		br, bz := LoopField(f1.Radius, I1, rho, l[2])
		var B Vec
		if rho > 0 {
			B = fr.ToGlobal(Vec{br * l[0] / rho, br * l[1] / rho, bz})
		} else {
			B = fr.ToGlobal(Vec{0, 0, bz})
		}
		F = F.Add(t.Cross(B))
	}
	F = F.Scale(I2 * h)
	for _, x := range F {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return nanVec()
		}
	}
	return F
}

// neumannCells bounds the cells per coil of a block in NeumannMutual and
// LorentzForceBetween.
const neumannCells = 16

// blockFilaments returns the filaments of coil block c with winding w, each
// carrying weight turns (negative for a pair's opposing coil): the turns
// grouped into cells of g × g (cellsOf) with g chosen for at most about
// neumannCells cells per coil, each cell a filament at its centroid. The
// error of the grouping is of the order of (cell size / distance)².
func blockFilaments(c Coil, w Winding) (fs []Filament, weight []float64) {
	n := w.TurnCount()
	if n == 0 {
		return nil, nil
	}
	g := max(1, int(math.Ceil(math.Sqrt(float64(n)/neumannCells))))
	u := CoilFrame(c.Axis).U
	for _, sc := range subCoils(c) {
		for _, cl := range cellsOf(w, outerOf(c), g) {
			fs = append(fs, Filament{Centre: sc.centre.Add(u.Scale(cl.z)), Axis: u, Radius: cl.r})
			weight = append(weight, sc.sign*cl.n)
		}
	}
	return fs, weight
}

// NeumannMutual returns the mutual inductance, H, of circular coil blocks a
// and b in any position: Σ nᵢ nⱼ FilamentMutual over their filaments
// (blockFilaments). NaN for a rectangle, or when turns touch.
func NeumannMutual(a Coil, wa Winding, b Coil, wb Winding) float64 {
	if a.Form == Rectangle || b.Form == Rectangle {
		return math.NaN()
	}
	if M, ok := ruleMutual(a, wa, b, wb); ok {
		return M
	}
	fa, na := blockFilaments(a, wa)
	fb, nb := blockFilaments(b, wb)
	if len(fa) == 0 || len(fb) == 0 {
		return math.NaN()
	}
	M := 0.0
	for i, f := range fa {
		for j, g := range fb {
			M += na[i] * nb[j] * FilamentMutual(f, g)
		}
	}
	return M
}

// LorentzForceBetween returns the force, N, on circular block b (current
// Ib) from circular block a (current Ia): Σ nᵢ nⱼ FilamentForce over their
// filaments, the exact Lorentz integral F = I_b ∮ dl × B_a per filament.
// NaN vector for a rectangle or touching turns.
func LorentzForceBetween(a Coil, wa Winding, Ia float64, b Coil, wb Winding, Ib float64) Vec {
	if a.Form == Rectangle || b.Form == Rectangle {
		return nanVec()
	}
	if F, ok := ruleForce(a, wa, Ia, b, wb, Ib); ok {
		return F
	}
	fa, na := blockFilaments(a, wa)
	fb, nb := blockFilaments(b, wb)
	if len(fa) == 0 || len(fb) == 0 {
		return nanVec()
	}
	var F Vec
	for i, f := range fa {
		for j, g := range fb {
			F = F.Add(FilamentForce(f, Ia*na[i], g, Ib*nb[j]))
		}
	}
	return F
}
