package calc

import (
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/integrate/quad"
)

// biotSavartCircle integrates the Biot–Savart law
// B = μ0 I/(4π) ∮ dl × (p − l)/|p − l|³ numerically over a circle of radius
// a centred on c in the plane spanned by e1, e2 (current from e1 towards
// e2), by Gauss–Legendre quadrature on 8 panels of n nodes each. It shares
// no code with LoopField.
func biotSavartCircle(c, e1, e2 Vec, a, I float64, p Vec, n int) Vec {
	var B Vec
	for k := range 3 {
		f := func(phi float64) float64 {
			s, co := math.Sincos(phi)
			l := c.Add(e1.Scale(a * co)).Add(e2.Scale(a * s))
			dl := e1.Scale(-a * s).Add(e2.Scale(a * co))
			r := p.Sub(l)
			d := r.Norm()
			return dl.Cross(r)[k] / (d * d * d)
		}
		for j := range 8 {
			lo, hi := float64(j)*math.Pi/4, float64(j+1)*math.Pi/4
			B[k] += quad.Fixed(f, lo, hi, n, quad.Legendre{}, 0)
		}
	}
	return B.Scale(Mu0 * I / (4 * math.Pi))
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
