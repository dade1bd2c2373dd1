package calc

import (
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/integrate/quad"
)

func TestNagaokaGroverTable(t *testing.T) {
	// Grover, Inductance Calculations (1946), Table 36, k_N against l/D.
	for _, c := range []struct{ lD, k float64 }{
		{0.10, 0.203324},
		{0.50, 0.525510},
		{1.00, 0.688423},
	} {
		got := NagaokaCoefficient(0.5, c.lD) // D = 1
		if math.Abs(got-c.k) > 1e-5 {
			t.Errorf("k_N(l/D = %g) = %.7f, Grover Table 36: %.6f", c.lD, got, c.k)
		}
	}
	// Long coil: k_N → 1 − 8a/(3πℓ) (leading term of Nagaoka's expansion,
	// Grover 1946 ch. 16); the next term is O((a/ℓ)²).
	for _, l := range []float64{100, 1000} {
		a := 1.0
		got := NagaokaCoefficient(a, l)
		want := 1 - 8*a/(3*math.Pi*l)
		if math.Abs(got-want) > 1/(l*l) {
			t.Errorf("long coil ℓ/a = %g: k_N = %.12f, asymptote %.12f", l, got, want)
		}
	}
	if !math.IsNaN(NagaokaCoefficient(1, 0)) {
		t.Error("zero length must give NaN")
	}
}

func TestWheelerAgreesWithNagaoka(t *testing.T) {
	// Wheeler (Proc. IRE 1928) claims 1 % for ℓ > 0.8 a.
	for _, l := range []float64{0.8, 1, 2, 5, 20} {
		a := 1.0
		checkRel(t, "Wheeler vs Nagaoka", WheelerInductance(a, l, 10), SolenoidInductance(a, l, 10), 0.01)
	}
}

func TestMaxwellMutual(t *testing.T) {
	// Against the Neumann double line integral, reduced for coaxial
	// circles to M = μ0 a b/2 ∫₀^{2π} cos φ / √(a² + b² + d² − 2ab cos φ) dφ
	// (Neumann 1845; Jackson problem 5.33), by quadrature.
	rng := rand.New(rand.NewPCG(11, 12))
	for range 50 {
		a, b := 0.01+rng.Float64()*0.1, 0.01+rng.Float64()*0.1
		d := 0.005 + rng.Float64()*0.3
		q := 0.0
		for j := range 8 {
			q += quad.Fixed(func(phi float64) float64 {
				return math.Cos(phi) / math.Sqrt(a*a+b*b+d*d-2*a*b*math.Cos(phi))
			}, float64(j)*math.Pi/4, float64(j+1)*math.Pi/4, 64, quad.Legendre{}, 0)
		}
		q *= Mu0 * a * b / 2
		checkRel(t, "Maxwell vs Neumann integral", MutualInductance(a, b, d), q, 1e-10)
	}
	// Distant circles: M → μ0 π a² b²/(2 d³) (two dipoles on a common
	// axis), relative error O((a² + b²)/d²).
	a, b := 0.03, 0.05
	for _, d := range []float64{1, 10, 100, 1e4} {
		want := Mu0 * math.Pi * a * a * b * b / (2 * d * d * d)
		checkRel(t, "Maxwell far limit", MutualInductance(a, b, d), want, 2*(a*a+b*b)/(d*d)+1e-13)
	}
	// Symmetric, and smooth across the series switch.
	checkRel(t, "M(a,b) = M(b,a)", MutualInductance(a, b, 0.02), MutualInductance(b, a, 0.02), 1e-15)
}

func TestTurnSumVsRosaCorrection(t *testing.T) {
	// Rosa's round-wire correction of the current sheet (Rosa 1906; Grover,
	// Inductance Calculations, 1946, ch. 16): L = L_s − μ0 a N (A + B) with
	// A = 5/4 − ln(2p/d) for pitch p and bare diameter d, and B a function
	// of N tabulated by Grover (1946, p. 150; values as reproduced in
	// D. W. Knight's notes on Rosa's correction): B(2) = 0.1137,
	// B(10) = 0.2664, B(50) = 0.3182, B(100) = 0.3269. The correction
	// neglects curvature, so a large radius (p/a ≈ 10⁻³) is used; the table
	// is to four decimals.
	const p, d, R = 1.2e-3, 1e-3, 1.0
	for _, c := range []struct {
		n int
		B float64
	}{{2, 0.1137}, {10, 0.2664}, {50, 0.3182}, {100, 0.3269}} {
		coil := Coil{Form: Solenoid, MeanDiameter: 2 * R, Length: float64(c.n) * p, Turns: c.n,
			Wire: Wire{Bare: d, Outer: p, Material: Copper()}}
		w := LayOut(coil)
		ts := TurnSumInductance(w, d/2)
		ls := SolenoidInductance(R, coil.Length, c.n)
		A := 1.25 - math.Log(2*p/d)
		B := (ls-ts)/(Mu0*R*float64(c.n)) - A
		if math.Abs(B-c.B) > 2e-4 {
			t.Errorf("N = %d: turn sum implies B = %.5f, Grover's table %.4f", c.n, B, c.B)
		}
	}
}

func TestMultilayerInductance(t *testing.T) {
	// A thin coil of square cross-section c × c: L = μ0 N² a (ln(8a/g) − 2)
	// with g the geometric mean distance of the square from itself,
	// g = 0.44705 c (Maxwell, Treatise, 1873, §692; Grover 1946 ch. 13;
	// recalled from memory), valid for c ≪ a.
	const c, N = 0.02, 400
	coil := Coil{Form: Solenoid, MeanDiameter: 2.0, Length: c, RadialBuild: c, Turns: N,
		Wire: Wire{Bare: 0.9e-3, Outer: 1e-3, Material: Copper()}}
	w := LayOut(coil)
	if w.LayerCount != 20 || w.TurnsPerLayer != 20 || w.Overfull {
		t.Fatalf("layout %d×%d overfull=%v", w.LayerCount, w.TurnsPerLayer, w.Overfull)
	}
	want := Mu0 * N * N * 1.0 * (math.Log(8*1.0/(0.44705*c)) - 2)
	checkRel(t, "square-section coil vs GMD formula", CoilInductance(coil, w), want, 5e-4)
	// Wheeler's multilayer formula (Proc. IRE 1928; recalled from memory):
	// L = 0.8 a² N² / (6a + 9b + 10c) μH, dimensions in inches, quoted to
	// about 1 % when the three denominator terms are comparable.
	coil.MeanDiameter = 0.1
	w = LayOut(coil)
	in := 1 / Inch
	a := 0.05 * in
	wh := 0.8 * a * a * N * N / (6*a + 9*c*in + 10*c*in) * 1e-6
	checkRel(t, "multilayer vs Wheeler", CoilInductance(coil, w), wh, 0.015)
}

func TestPairAndRingInductance(t *testing.T) {
	// A single-wire ring equals a single turn's self-inductance.
	checkRel(t, "ring N=1", RingInductance(0.1, 1e-3, 1), TurnSelfInductance(0.1, 1e-3), 1e-15)
	// Thin circular coil: N² scaling with the bundle radius.
	c := Coil{Form: Loop, MeanDiameter: 0.2, Turns: 100, Wire: WireFromGauge(26, Copper())}
	w := LayOut(c)
	b := BundleDiameter(c.Wire.Outer, 100) / 2
	checkRel(t, "thin coil", CoilInductance(c, w), Mu0*1e4*0.1*(math.Log(0.8/b)-1.75), 1e-14)
	// A pair: L = 2L₁ ± 2M; far apart, 2L₁.
	c.Form, c.Spacing = Pair, 0.1
	L1 := RingInductance(0.1, b, 100)
	M := 1e4 * MutualInductance(0.1, 0.1, 0.1)
	checkRel(t, "pair aiding", CoilInductance(c, w), 2*L1+2*M, 1e-14)
	c.Opposing = true
	checkRel(t, "pair opposing", CoilInductance(c, w), 2*L1-2*M, 1e-14)
	c.Spacing = 1e6
	checkRel(t, "pair far apart", CoilInductance(c, w), 2*L1, 1e-12)
	// Single-layer pair uses the turn-by-turn mutual.
	s := Coil{Form: Pair, MeanDiameter: 0.1, Length: 0.02, Turns: 40, Spacing: 0.05, Wire: WireFromGauge(24, Copper())}
	ws := LayOut(s)
	Ls := RoundWireSolenoidInductance(0.05, 0.02, 40, s.Wire.Bare)
	Ms := WindingMutual(ws, ws, 0.05)
	checkRel(t, "single-layer pair", CoilInductance(s, ws), 2*Ls+2*Ms, 1e-14)
	// The mutual by rows equals the plain double sum over turns.
	direct := 0.0
	for _, zi := range ws.Layers[0].Z {
		for _, zj := range ws.Layers[0].Z {
			direct += MutualInductance(0.05, 0.05, 0.05+zj-zi)
		}
	}
	checkRel(t, "row sum vs direct double sum", Ms, direct, 1e-12)
	// Rectangle: N² times the single-turn formula with the bundle radius.
	r := Coil{Form: Rectangle, Width: 0.1, Height: 0.1, Turns: 10, Wire: WireFromGauge(24, Copper())}
	br := BundleDiameter(r.Wire.Outer, 10) / 2
	checkRel(t, "rectangle coil", CoilInductance(r, LayOut(r)), RectangleInductance(0.1, 0.1, br, 10), 1e-15)
}

func TestRectangleInductance(t *testing.T) {
	// Square of side s in round wire of radius ρ, uniform current:
	// L = 2μ0 s/π (ln(s/ρ) − 0.77401 + 1/4) (Grover 1946, square of round
	// wire, −0.77401 being the constant without the internal-inductance term
	// Y/4; recalled from memory).
	s, rho := 0.2, 5e-4
	checkRel(t, "square", RectangleInductance(s, s, rho, 1), 2*Mu0*s/math.Pi*(math.Log(s/rho)-0.77401+0.25), 2e-6)
	// The mutual inductance of two parallel wires ℓ long, d apart, that the
	// formula subtracts, against the Neumann double integral
	// μ0/(4π) ∫∫ dx dx' / √((x − x')² + d²) by quadrature.
	l, d := 0.15, 0.08
	q := 0.0
	for i := range 4 {
		for j := range 4 {
			lo1, hi1 := float64(i)*l/4, float64(i+1)*l/4
			lo2, hi2 := float64(j)*l/4, float64(j+1)*l/4
			q += quad.Fixed(func(x float64) float64 {
				return quad.Fixed(func(y float64) float64 { return 1 / math.Hypot(x-y, d) }, lo2, hi2, 32, quad.Legendre{}, 0)
			}, lo1, hi1, 32, quad.Legendre{}, 0)
		}
	}
	q *= Mu0 / (4 * math.Pi)
	checkRel(t, "parallel-wire mutual", Mu0/(2*math.Pi)*(l*math.Asinh(l/d)-math.Hypot(l, d)+d), q, 1e-12)
	// Rectangle = 2 L(w) + 2 L(h) − 2 M(w at h) − 2 M(h at w), each part as
	// stated in the doc comment.
	w, h := 0.15, 0.08
	self := func(l float64) float64 { return Mu0*l/(2*math.Pi)*(math.Log(2*l/rho)-1) + Mu0*l/(8*math.Pi) }
	mut := func(l, d float64) float64 { return Mu0 / (2 * math.Pi) * (l*math.Asinh(l/d) - math.Hypot(l, d) + d) }
	checkRel(t, "rectangle parts", RectangleInductance(w, h, rho, 3), 9*(2*self(w)+2*self(h)-2*mut(w, h)-2*mut(h, w)), 1e-13)
	if !math.IsNaN(RectangleInductance(0.1, 0.1, 0.06, 1)) {
		t.Error("bundle wider than the coil: NaN expected")
	}
}

func TestTurnSumEqualsDirectDoubleSum(t *testing.T) {
	// A multilayer coil with a partial last layer (23 turns, 5 per layer):
	// the row-wise sum must equal Σᵢ Σⱼ over every pair of turns.
	c := Coil{Form: Solenoid, MeanDiameter: 0.03, Length: 5.5e-3, RadialBuild: 5e-3, Turns: 23,
		Wire: Wire{Bare: 0.9e-3, Outer: 1e-3, Material: Copper()}}
	w := LayOut(c)
	if w.TurnsPerLayer != 5 || w.LayerCount != 5 || len(w.Layers[4].Z) != 3 {
		t.Fatalf("layout: %d per layer, %d layers", w.TurnsPerLayer, w.LayerCount)
	}
	type turn struct{ r, z float64 }
	var ts []turn
	for _, l := range w.Layers {
		for _, z := range l.Z {
			ts = append(ts, turn{l.Radius, z})
		}
	}
	direct := 0.0
	for i, a := range ts {
		for j, b := range ts {
			if i == j {
				direct += TurnSelfInductance(a.r, 0.45e-3)
			} else {
				direct += MutualInductance(a.r, b.r, b.z-a.z)
			}
		}
	}
	checkRel(t, "turn sum", TurnSumInductance(w, 0.45e-3), direct, 1e-13)
}

func TestCellMethodApproximatesTurnSum(t *testing.T) {
	// The coarse cell method against the exact turn sum on a 60 × 60 coil.
	c := Coil{Form: Solenoid, MeanDiameter: 0.2, Length: 0.06, RadialBuild: 0.06, Turns: 3600,
		Wire: Wire{Bare: 0.9e-3, Outer: 1e-3, Material: Copper()}}
	w := LayOut(c)
	exact := TurnSumInductance(w, 0.45e-3)
	for _, g := range []int{2, 3, 6} {
		checkRel(t, "cell method", CellInductance(w, 1e-3, g), exact, 1e-3)
	}
	exactM := WindingMutual(w, w, 0.1)
	checkRel(t, "cell mutual", CellMutual(w, 1e-3, 3, 0.1), exactM, 1e-3)
}

// Two circles a hair apart: Maxwell's formula keeps its digits and tends to
// the logarithmic limit of nearly coincident circles,
// M ≈ μ0 a [ln(8a/c) − 2] for a separation c ≪ a (Maxwell 1873, §705;
// Grover 1946, eq. 80, with the radii equal and c the distance between
// the circles), whose error is of order (c/a)² ln(a/c).
func TestMutualInductanceNearlyCoincident(t *testing.T) {
	a := 0.05
	for _, u := range []float64{1e-3, 1e-5, 1e-7, 1e-9} {
		c := u * a
		got := MutualInductance(a, a, c)
		want := Mu0 * a * (math.Log(8*a/c) - 2)
		if rel := math.Abs(got-want) / want; rel > 10*u*u*math.Log(1/u)+1e-12 {
			t.Errorf("c/a = %g: M = %.12g H, log limit %.12g H (rel %.2g)", u, got, want, rel)
		}
	}
}
