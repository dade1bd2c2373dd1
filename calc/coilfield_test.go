package calc

import (
	"coilmemo/calc/biotsavart"
	"math"
	"math/rand/v2"
	"testing"
)

// rotationTaking returns a rotation matrix (as a function) that takes ẑ to
// u, built independently of CoilFrame by Rodrigues' formula about ẑ × u.
func rotationTaking(u Vec) func(Vec) Vec {
	z := Vec{0, 0, 1}
	k := z.Cross(u)
	s := k.Norm()
	c := z.Dot(u)
	if s < 1e-15 {
		if c > 0 {
			return func(v Vec) Vec { return v }
		}
		return func(v Vec) Vec { return Vec{v[0], -v[1], -v[2]} } // π about x
	}
	k = k.Scale(1 / s)
	return func(v Vec) Vec {
		// v cosθ + (k × v) sinθ + k (k·v)(1 − cosθ)
		return v.Scale(c).Add(k.Cross(v).Scale(s)).Add(k.Scale(k.Dot(v) * (1 - c)))
	}
}

func sampleMultilayer() Coil {
	return Coil{
		Name: "ml", Form: Solenoid, MeanDiameter: 0.03, Length: 0.012, RadialBuild: 0.004,
		Turns: 60, Wire: WireFromGauge(22, Copper()), Drive: CurrentDrive, Current: 0.5, Axis: Vec{0, 0, 1},
	}
}

func TestCoilFieldRotatedEqualsZAxisRotated(t *testing.T) {
	rng := rand.New(rand.NewPCG(5, 6))
	base := sampleMultilayer()
	w := LayOut(base)
	for i := 0; i < 20; i++ {
		u := Vec{rng.NormFloat64(), rng.NormFloat64(), rng.NormFloat64()}.Unit()
		centre := Vec{rng.Float64() - 0.5, rng.Float64() - 0.5, rng.Float64() - 0.5}.Scale(0.2)
		q := Vec{rng.Float64() - 0.5, rng.Float64() - 0.5, rng.Float64() - 0.5}.Scale(0.1)
		R := rotationTaking(u)
		c := base
		c.Axis = u.Scale(2.5) // not unit: must be normalised
		c.Centre = centre
		for _, form := range []Form{Solenoid, Pair} {
			c.Form, base.Form = form, form
			c.Spacing, base.Spacing = 0.03, 0.03
			c.Opposing, base.Opposing = i%2 == 1, i%2 == 1
			want := R(CoilField(base, w, 0.5, q))
			got := CoilField(c, w, 0.5, centre.Add(R(q)))
			if e := vecRelErr(got, want); e > 1e-12 {
				t.Errorf("axis %v form %d: rotated %v, want %v (rel %g)", u, form, got, want, e)
			}
		}
	}
}

func TestCoilFieldVsBiotSavartOffAxisFrames(t *testing.T) {
	// A thin 3-turn coil on an arbitrary axis and centre, against direct
	// quadrature of the Biot–Savart integral over its circle in 3-D.
	rng := rand.New(rand.NewPCG(7, 8))
	c := Coil{Form: Loop, MeanDiameter: 0.1, Turns: 3, Wire: WireFromGauge(20, Copper()),
		Axis: Vec{1, -2, 0.5}, Centre: Vec{0.01, 0.02, -0.03}}
	w := LayOut(c)
	fr := CoilFrame(c.Axis)
	for i := 0; i < 100; {
		p := Vec{rng.Float64() - 0.5, rng.Float64() - 0.5, rng.Float64() - 0.5}.Scale(0.3)
		l := fr.ToLocal(p.Sub(c.Centre))
		if math.Hypot(math.Hypot(l[0], l[1])-0.05, l[2]) < 0.005 {
			continue
		}
		i++
		want := biotSavartCircle(c.Centre, fr.E1, fr.E2, 0.05, 3*1.2, p, 64)
		got := CoilField(c, w, 1.2, p)
		if e := vecRelErr(got, want); e > 1e-8 {
			t.Errorf("p=%v: %v vs quadrature %v (rel %g)", p, got, want, e)
		}
	}
	// Frame conventions stated in CoilFrame's doc comment.
	for _, tc := range []struct{ axis, e1, e2 Vec }{
		{Vec{0, 0, 1}, Vec{1, 0, 0}, Vec{0, 1, 0}},
		{Vec{1, 0, 0}, Vec{0, 1, 0}, Vec{0, 0, 1}},
		{Vec{0, 1, 0}, Vec{1, 0, 0}, Vec{0, 0, -1}},
		{Vec{}, Vec{1, 0, 0}, Vec{0, 1, 0}},
	} {
		f := CoilFrame(tc.axis)
		if f.E1 != tc.e1 || f.E2 != tc.e2 {
			t.Errorf("frame of %v: %v %v", tc.axis, f.E1, f.E2)
		}
	}
}

func TestHelmholtzPairCentre(t *testing.T) {
	// Two thin coils of radius R at spacing R: B(0) = (4/5)^{3/2} μ0 N I / R
	// (Helmholtz pair; e.g. Purcell, Electricity and Magnetism, problem 6.x —
	// follows from the on-axis loop field at z = ±R/2). Opposing: B(0) = 0
	// and the gradient at the centre is 2·∂Bz/∂z of one coil at z = R/2.
	const R, N, I = 0.1, 50, 0.8
	c := Coil{Form: Pair, MeanDiameter: 2 * R, Turns: N, Spacing: R, Wire: WireFromGauge(24, Copper())}
	w := LayOut(c)
	B := CoilField(c, w, I, Vec{})
	checkRel(t, "Helmholtz centre", B[2], math.Pow(0.8, 1.5)*Mu0*N*I/R, 1e-14)
	c.Opposing = true
	B = CoilField(c, w, I, Vec{})
	if B.Norm() > 1e-20 {
		t.Errorf("opposing pair centre field %v", B)
	}
	h := 1e-6
	g := (CoilField(c, w, I, Vec{0, 0, h})[2] - CoilField(c, w, I, Vec{0, 0, -h})[2]) / (2 * h)
	// The coil at −R/2 sees the centre at z = +R/2, where
	// ∂Bz/∂z = −3μ0NIR²z/(2(R²+z²)^{5/2}); the reversed coil at +R/2 gives
	// the same, doubling it.
	z := R / 2
	want := -2 * 3 * Mu0 * N * I * R * R * z / (2 * math.Pow(R*R+z*z, 2.5))
	checkRel(t, "anti-Helmholtz gradient", g, want, 1e-6)
}

func TestSolenoidFields(t *testing.T) {
	// Long solenoid: the centre field tends to μ0 n I (Ampère's law);
	// the current-sheet formula differs by 1/√(1 + 4R²/L²).
	const R, L, N, I = 0.01, 10.0, 100000, 0.3
	n := N / L
	checkRel(t, "long solenoid centre", SolenoidAxisField(R, L, N, I, 0), Mu0*n*I, 3e-6)
	// End of a long solenoid: half the centre field.
	checkRel(t, "long solenoid end", SolenoidAxisField(R, L, N, I, L/2), Mu0*n*I/2, 1e-5)
	// A single-layer winding summed turn by turn (LoopField) approaches the
	// current sheet; the midpoint rule errs by O((pitch/R)²) near the axis.
	c := Coil{Form: Solenoid, MeanDiameter: 0.04, Length: 0.1, Turns: 300, Wire: WireFromGauge(30, Copper())}
	w := LayOut(c)
	if w.Overfull {
		t.Fatal(w.Problem)
	}
	for _, z := range []float64{0, 0.02, 0.05, 0.09} {
		sum := CoilField(c, w, I, Vec{0, 0, z})[2]
		sheet := SolenoidAxisField(0.02, 0.1, 300, I, z)
		checkRel(t, "turn sum vs current sheet", sum, sheet, 5e-5)
	}
}

func TestRectangleField(t *testing.T) {
	// Centre of a rectangle w × h: each side is a finite straight wire,
	// B = μ0 I/(4π s) (sin θ₂ − sin θ₁) (Griffiths, Introduction to
	// Electrodynamics, 4th ed., Example 5.5), s the distance to the side.
	const wd, ht, I = 0.08, 0.05, 2.0
	side := func(length, s float64) float64 {
		st := (length / 2) / math.Hypot(length/2, s)
		return Mu0 * I / (4 * math.Pi * s) * 2 * st
	}
	want := 2*side(wd, ht/2) + 2*side(ht, wd/2)
	c := Coil{Form: Rectangle, Width: wd, Height: ht, Turns: 1, Wire: WireFromGauge(20, Copper()), Axis: Vec{0, 0, 1}}
	w := LayOut(c)
	B := CoilField(c, w, I, Vec{})
	checkRel(t, "rectangle centre", B[2], want, 1e-14)
	// Off-centre points against quadrature of Biot–Savart along the sides.
	rng := rand.New(rand.NewPCG(9, 10))
	fr := CoilFrame(c.Axis)
	for range 100 {
		p := Vec{rng.Float64() - 0.5, rng.Float64() - 0.5, rng.Float64()*0.5 + 0.01}.Scale(0.2)
		got := CoilField(c, w, I, p)
		wantV := biotSavartPolygon(rectCorners(fr, Vec{}, wd, ht), I, p)
		if e := vecRelErr(got, wantV); e > 1e-8 {
			t.Errorf("p=%v: %v vs quadrature %v (rel %g)", p, got, wantV, e)
		}
	}
	// Far away: the dipole of m = N I w h.
	p := Vec{0.3, 0.4, 2}
	e := vecRelErr(CoilField(c, w, I, p), DipoleField(Vec{0, 0, I * wd * ht}, p))
	if e > 1e-3 {
		t.Errorf("rectangle far field vs dipole: rel %g", e)
	}
}

func rectCorners(fr Frame, c Vec, w, h float64) []Vec {
	pt := func(x, y float64) Vec { return c.Add(fr.E1.Scale(x)).Add(fr.E2.Scale(y)) }
	return []Vec{pt(w/2, -h/2), pt(w/2, h/2), pt(-w/2, h/2), pt(-w/2, -h/2)}
}

// biotSavartPolygon is the independent numerical Biot–Savart integral
// along a closed polygon (package biotsavart), 4 panels of 64 nodes a side.
func biotSavartPolygon(k []Vec, I float64, p Vec) Vec {
	pts := make([]biotsavart.Vec, len(k))
	for i, v := range k {
		pts[i] = v
	}
	return biotsavart.Polygon(pts, I, p, 4, 64)
}
