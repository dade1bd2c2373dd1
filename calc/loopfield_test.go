package calc

import (
	"coilmemo/calc/biotsavart"
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/integrate/quad"
)

// biotSavartCircle is the independent numerical Biot–Savart integral
// round a circle (package biotsavart), on 8 panels of n nodes: it shares no
// code with LoopField.
func biotSavartCircle(c, e1, e2 Vec, a, I float64, p Vec, n int) Vec {
	return biotsavart.Circle(c, e1, e2, a, I, p, 8, n)
}

func TestLoopFieldOnAxisLimit(t *testing.T) {
	const a, I = 0.05, 2.0
	for _, z := range []float64{-0.2, -0.03, 0, 0.01, 0.07} {
		on := LoopFieldOnAxis(a, I, z)
		br, bz := LoopField(a, I, 0, z)
		if br != 0 || bz != on {
			t.Errorf("ρ = 0: (%g, %g), want (0, %g)", br, bz, on)
		}
		for _, rho := range []float64{1e-12 * a, 1e-9 * a, 1e-6 * a} {
			br, bz := LoopField(a, I, rho, z)
			// Off-axis Bz → on-axis closed form, error O(ρ²).
			checkRel(t, "Bz near axis", bz, on, 1e-10)
			// ∇·B = 0 near the axis gives Bρ = −(ρ/2) ∂Bz/∂z with
			// ∂Bz/∂z = −3 μ0 I a² z / (2 (a² + z²)^{5/2}) (from the closed form).
			want := rho / 2 * 3 * Mu0 * I * a * a * z / (2 * math.Pow(a*a+z*z, 2.5))
			if z == 0 {
				if math.Abs(br) > 1e-30 {
					t.Errorf("Bρ in the plane near the axis = %g, want 0", br)
				}
				continue
			}
			checkRel(t, "Bρ near axis vs −(ρ/2)∂Bz/∂z", br, want, 1e-9)
		}
	}
	// The closed form itself, at the centre: μ0 I/(2a).
	checkRel(t, "centre field", LoopFieldOnAxis(a, I, 0), Mu0*I/(2*a), 1e-15)
}

func TestLoopFieldContinuityAtSeriesSwitch(t *testing.T) {
	// Choose ρ so that m = 4aρ/((a+ρ)² + z²) crosses 0.1 between two
	// neighbouring points; the field must not jump.
	const a, I, z = 0.05, 1.0, 0.2
	// Solve m(ρ) = 0.1 by bisection.
	m := func(rho float64) float64 { return 4 * a * rho / ((a+rho)*(a+rho) + z*z) }
	lo, hi := 0.0, a
	for range 200 {
		mid := (lo + hi) / 2
		if m(mid) < smallM {
			lo = mid
		} else {
			hi = mid
		}
	}
	if !(m(lo) < smallM && m(hi) >= smallM) {
		t.Fatalf("bracket failed: %g %g", m(lo), m(hi))
	}
	br1, bz1 := LoopField(a, I, lo, z)
	br2, bz2 := LoopField(a, I, hi, z)
	checkRel(t, "Bρ across the switch", br1, br2, 1e-12)
	checkRel(t, "Bz across the switch", bz1, bz2, 1e-12)
}

func TestLoopFieldVsBiotSavartQuadrature(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 2))
	const a, I = 0.04, 1.5
	e1, e2 := Vec{1, 0, 0}, Vec{0, 1, 0}
	worst := 0.0
	for i := 0; i < 150; {
		rho := rng.Float64() * 4 * a
		z := (rng.Float64() - 0.5) * 6 * a
		// Keep 0.1 a from the wire so that the quadrature converges.
		if math.Hypot(rho-a, z) < 0.1*a {
			continue
		}
		i++
		phi := rng.Float64() * 2 * math.Pi
		p := Vec{rho * math.Cos(phi), rho * math.Sin(phi), z}
		want := biotSavartCircle(Vec{}, e1, e2, a, I, p, 64)
		br, bz := LoopField(a, I, rho, z)
		got := Vec{br * math.Cos(phi), br * math.Sin(phi), bz}
		e := vecRelErr(got, want)
		worst = math.Max(worst, e)
		if e > 1e-8 {
			t.Errorf("ρ=%g z=%g: got %v, quadrature %v, rel %g", rho, z, got, want, e)
		}
	}
	t.Logf("worst relative difference over 150 points: %.2g", worst)
}

func TestLoopFieldMaxwellEquations(t *testing.T) {
	// Away from the wire the field is divergence- and curl-free:
	// (1/ρ)∂(ρBρ)/∂ρ + ∂Bz/∂z = 0 and ∂Bρ/∂z − ∂Bz/∂ρ = 0
	// (central differences, step h; error O(h²)).
	const a, I, h = 0.05, 1.0, 1e-5
	for _, pt := range [][2]float64{{0.01, 0.02}, {0.03, -0.01}, {0.08, 0.04}, {0.2, 0.3}, {0.004, 0.2}} {
		rho, z := pt[0], pt[1]
		brp, _ := LoopField(a, I, rho+h, z)
		brm, _ := LoopField(a, I, rho-h, z)
		_, bzp := LoopField(a, I, rho, z+h)
		_, bzm := LoopField(a, I, rho, z-h)
		br0, bz0 := LoopField(a, I, rho, z)
		div := ((rho+h)*brp-(rho-h)*brm)/(2*h)/rho + (bzp-bzm)/(2*h)
		brzp, _ := LoopField(a, I, rho, z+h)
		brzm, _ := LoopField(a, I, rho, z-h)
		_, bzrp := LoopField(a, I, rho+h, z)
		_, bzrm := LoopField(a, I, rho-h, z)
		curl := (brzp-brzm)/(2*h) - (bzrp-bzrm)/(2*h)
		scale := math.Hypot(br0, bz0) / math.Hypot(rho-a, z)
		if math.Abs(div) > 1e-6*scale || math.Abs(curl) > 1e-6*scale {
			t.Errorf("(ρ,z)=(%g,%g): div %g curl %g (scale %g)", rho, z, div, curl, scale)
		}
	}
}

func TestLoopFieldFarFieldIsDipole(t *testing.T) {
	// Far from a loop the exact field tends to the dipole field of
	// m = I π a² (Jackson §5.6); the relative error falls as (a/r)².
	const a, I = 0.05, 1.0
	m := Vec{0, 0, I * math.Pi * a * a}
	dir := Vec{0.3, 0.2, 0.9}.Unit()
	var prev float64
	for i, r := range []float64{10 * a, 20 * a, 40 * a, 80 * a, 160 * a} {
		p := dir.Scale(r)
		rho := math.Hypot(p[0], p[1])
		br, bz := LoopField(a, I, rho, p[2])
		exact := Vec{br * p[0] / rho, br * p[1] / rho, bz}
		e := vecRelErr(DipoleField(m, p), exact)
		if i > 0 {
			ratio := prev / e
			if math.Abs(ratio-4) > 0.1 {
				t.Errorf("r = %g a: error ratio on doubling r = %.4g, want ≈ 4", r/a, ratio)
			}
		}
		prev = e
	}
	if prev > 1e-4 {
		t.Errorf("at 160 a the dipole error is %g", prev)
	}
	// On axis the 1 % distance of a thin loop: (1 + a²/z²)^{3/2} = 1.01.
	c := Coil{Form: Loop, MeanDiameter: 2 * a, Turns: 1, Wire: WireFromGauge(20, Copper())}
	w := LayOut(c)
	want := a / math.Sqrt(math.Pow(1.01, 2.0/3)-1)
	checkRel(t, "1 % dipole distance of a loop", DipoleRange(c, w, I, 0.01), want, 1e-7)
}

func TestDipoleField(t *testing.T) {
	// On the axis of m: B = μ0 m/(2π r³); in the equatorial plane:
	// B = −μ0 m/(4π r³) (Jackson eq. 5.56).
	m := Vec{0, 0, 2}
	checkRel(t, "axial", DipoleField(m, Vec{0, 0, 3})[2], Mu0*2/(2*math.Pi*27), 1e-15)
	checkRel(t, "equatorial", DipoleField(m, Vec{3, 0, 0})[2], -Mu0*2/(4*math.Pi*27), 1e-15)
	if !DipoleField(m, Vec{}).IsNaN() {
		t.Error("dipole at r = 0 must be NaN")
	}
}

func BenchmarkLoopField(b *testing.B) {
	rng := rand.New(rand.NewPCG(3, 4))
	pts := make([][2]float64, 1024)
	for i := range pts {
		pts[i] = [2]float64{rng.Float64() * 0.2, (rng.Float64() - 0.5) * 0.2}
	}
	b.ResetTimer()
	var s float64
	for i := 0; i < b.N; i++ {
		p := pts[i&1023]
		br, bz := LoopField(0.05, 1, p[0], p[1])
		s += br + bz
	}
	_ = s
}

func legendre(f func(float64) float64, lo, hi float64) float64 {
	return quad.Fixed(f, lo, hi, 64, quad.Legendre{}, 0)
}

// multipoleLoopField returns the field (Bρ, Bz) of the loop of LoopField
// at a point beyond its radius (r = √(ρ² + z²) > a) from the Legendre
// expansion of its scalar potential: the on-axis field μ0 I a²/(2(a² + z²)^{3/2})
// expanded binomially in (a/z)² fixes the coefficients of Φ = Σ A_l r^{−(l+1)} P_l(cos θ)
// (Jackson, Classical Electrodynamics, 3rd ed., §3.3 and §5.5), so that
//
//	B_r = μ0 I a²/2 Σₙ cₙ a²ⁿ r^{−(2n+3)} P_{2n+1}(cos θ)
//	B_θ = μ0 I a²/2 Σₙ cₙ/(2n+2) a²ⁿ r^{−(2n+3)} sin θ P'_{2n+1}(cos θ)
//	cₙ = (−1)ⁿ (2n+1)!!/(2ⁿ n!)
//
// A method independent of the elliptic integrals; the first term is the
// dipole field.
func multipoleLoopField(a, I, rho, z float64) (brho, bz float64) {
	r := math.Hypot(rho, z)
	x, s := z/r, rho/r // cos θ, sin θ
	q := (a / r) * (a / r)
	var br, bt float64
	c := 1.0              // cₙ
	qn := 1 / (r * r * r) // a²ⁿ r^{−(2n+3)}
	// Legendre P_l(x) and P'_l(x) by the three-term recurrence, two
	// degrees at a time.
	p0, p1 := 1.0, x   // P_{l−1}, P_l at l = 1
	d0, d1 := 0.0, 1.0 // P'_{l−1}, P'_l
	for n := 0; n < 200; n++ {
		l := float64(2*n + 1)
		tr := c * qn * p1
		tt := c / (2*float64(n) + 2) * qn * s * d1
		br += tr
		bt += tt
		if math.Abs(tr)+math.Abs(tt) < 1e-18*(math.Abs(br)+math.Abs(bt)) {
			break
		}
		// Advance l by 2.
		for range 2 {
			p2 := ((2*l+1)*x*p1 - l*p0) / (l + 1)
			d2 := (l+1)*p1 + x*d1
			p0, p1, d0, d1 = p1, p2, d1, d2
			l++
		}
		_ = d0
		c *= -float64(2*n+3) / (2 * float64(n+1))
		qn *= q
	}
	k := Mu0 * I * a * a / 2
	br, bt = k*br, k*bt
	return br*s + bt*x, br*x - bt*s
}

// TestLoopFieldFar checks the filament field far away, where the Bz
// bracket of the direct formula cancels, against the multipole expansion
// and on the axis against the closed form: at 10⁵ and 2·10⁵ radii, in every
// direction, every digit but the last few must stay.
func TestLoopFieldFar(t *testing.T) {
	const a, I = 0.05, 1.3
	worst := 0.0
	for _, rr := range []float64{3, 10, 100, 1e3, 1e5, 2e5} {
		for _, th := range []float64{0, 1e-12, 1e-8, 1e-4, 0.01, 0.3, 0.9553166181245093, 1.2, math.Pi / 2, 2.5, math.Pi - 1e-9} {
			r := rr * a
			rho, z := r*math.Sin(th), r*math.Cos(th)
			br, bz := LoopField(a, I, rho, z)
			wr, wz := multipoleLoopField(a, I, rho, z)
			e := math.Hypot(br-wr, bz-wz) / math.Hypot(wr, wz)
			worst = math.Max(worst, e)
			if e > 1e-13 {
				t.Errorf("r = %g a, θ = %g: (%g, %g), multipole (%g, %g), rel %.2g", rr, th, br, bz, wr, wz, e)
			}
		}
	}
	t.Logf("largest relative difference from the multipole series: %.2g", worst)
	// Near the axis the axial component alone against the closed form
	// (its ρ² correction, −(3/4)(ρ/z)²… relative, is below 10⁻²⁰ here).
	for _, zr := range []float64{1e5, 2e5} {
		z := zr * a
		want := LoopFieldOnAxis(a, I, z)
		for _, rho := range []float64{1e-16 * z, 1e-12 * z, 1e-11 * z} {
			_, bz := LoopField(a, I, rho, z)
			checkRel(t, "far on-axis Bz", bz, want, 1e-14)
		}
	}
}

// TestCoilFieldFarOnTiltedAxis: a probe on the axis of a tilted coil, 10⁵
// radii out, is a hair off the axis after rounding; the field must still be
// the closed form.
func TestCoilFieldFarOnTiltedAxis(t *testing.T) {
	u := Vec{1, 2, 3}.Unit()
	c := Coil{Form: Loop, MeanDiameter: 0.1, Turns: 7, Wire: WireFromGauge(24, Copper()), Axis: u, Centre: Vec{0.01, -0.02, 0.03}}
	w := LayOut(c)
	for _, zr := range []float64{1e5, 2e5} {
		z := zr * 0.05
		p := c.Centre.Add(u.Scale(z))
		want := 7 * LoopFieldOnAxis(0.05, 0.9, z)
		for _, B := range []Vec{CoilField(c, w, 0.9, p), NewCoilSource(c, w, 0.9).At(p)} {
			checkRel(t, "axial component", B.Dot(u), want, 1e-13)
			if off := B.Sub(u.Scale(B.Dot(u))).Norm(); off > 1e-10*want {
				t.Errorf("off-axis component %g at %g radii", off, zr)
			}
		}
	}
}
