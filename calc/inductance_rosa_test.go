package calc

import (
	"math"
	"testing"
)

func TestRosaBAgainstGroverTable(t *testing.T) {
	// Rosa's B correction as tabulated by Grover, Inductance Calculations
	// (1946), ch. 16 (values recalled from memory, four decimals; the same
	// values stand in TestTurnSumVsRosaCorrection).
	for _, c := range []struct {
		n int
		B float64
	}{{1, 0}, {2, 0.1137}, {10, 0.2664}, {50, 0.3182}, {100, 0.3269}} {
		if got := RosaB(c.n); math.Abs(got-c.B) > 6e-5 {
			t.Errorf("B(%d) = %.5f, Grover's table %.4f", c.n, got, c.B)
		}
	}
	// Limit: B grows towards 2 Σ f(k) ≈ 0.3379 and never passes it.
	prev := 0.0
	for _, n := range []int{10, 100, 1000, 10000, 100000} {
		b := RosaB(n)
		if !(b > prev && b < 0.33790) {
			t.Errorf("B(%d) = %.6f not increasing below 0.3379", n, b)
		}
		prev = b
	}
	// The series and the closed form of f(k) agree where both are good.
	lg := func(x float64) float64 { return x * x * math.Log(x) }
	for _, k := range []float64{10, 12, 20} {
		closed := math.Log(k) + 1.5 - (lg(k+1)+lg(k-1)-2*lg(k))/2
		checkRel(t, "f(k) series vs closed form", rosaF(k), closed, 1e-9)
	}
	if !math.IsNaN(RosaA(0, 1e-3)) || !math.IsNaN(RosaA(1e-3, 0)) {
		t.Error("RosaA needs positive pitch and diameter")
	}
}

func TestRoundWireSolenoidAgainstTurnSum(t *testing.T) {
	// Lorenz's current sheet less Rosa's correction against the independent
	// turn-by-turn sum of Maxwell's mutual inductances with each turn's own
	// round-wire self-inductance (TurnSumInductance). Rosa neglects the
	// curvature of the turns, so the agreement is to a few 10⁻⁴ for pitches
	// up to a tenth of the radius.
	for _, c := range []struct {
		a, l   float64
		n      int
		d, out float64
	}{
		{0.03025, 0.3, 500, 0.5e-3, 0.56e-3}, // long bench solenoid
		{0.01, 0.01, 20, 0.4e-3, 0.45e-3},    // ℓ = D/2
		{0.05, 0.005, 10, 0.4e-3, 0.45e-3},   // short and wide
		{0.005, 0.05, 100, 0.4e-3, 0.45e-3},  // long and thin
		{0.02, 0.02, 10, 0.5e-3, 0.55e-3},    // spaced: the sheet is too low
	} {
		coil := Coil{Form: Solenoid, MeanDiameter: 2 * c.a, Length: c.l, Turns: c.n,
			Wire: Wire{Bare: c.d, Outer: c.out, Material: Copper()}}
		w := LayOut(coil)
		checkRel(t, "Lorenz − Rosa vs turn sum", RoundWireSolenoidInductance(c.a, c.l, c.n, c.d), TurnSumInductance(w, c.d/2), 5e-4)
		checkRel(t, "CoilInductance single layer", CoilInductance(coil, w), RoundWireSolenoidInductance(c.a, c.l, c.n, c.d), 1e-15)
	}
	// Widely spaced thin wire: the correction is negative (A < 0 when
	// 2p/d > e^{5/4}), the real coil has more inductance than the sheet.
	if !(RosaCorrection(0.02, 2e-3, 0.5e-3, 10) < 0) {
		t.Error("spaced fine wire should raise the inductance above the sheet")
	}
}

func TestWheelerRange(t *testing.T) {
	// Wheeler, "Simple inductance formulas for radio coils", Proc. IRE 16
	// (1928): within about 1 % of the current sheet for ℓ > 0.4 D.
	for _, lD := range []float64{0.4, 0.5, 0.8, 1, 2, 5, 10} {
		checkRel(t, "Wheeler in range", WheelerInductance(0.5, lD, 30), SolenoidInductance(0.5, lD, 30), 0.01)
	}
	// Outside its range it is measurably off: at ℓ/D = 0.1 Wheeler's
	// implied coefficient 1/(1 + 0.9·5) = 0.1818 is about 10 % below
	// Nagaoka's 0.203324 (Grover 1946, Table 36).
	lo := WheelerInductance(0.5, 0.1, 30)/SolenoidInductance(0.5, 0.1, 30) - 1
	if !(lo < -0.09 && lo > -0.12) {
		t.Errorf("Wheeler at ℓ/D = 0.1: %.4f relative to Nagaoka, want about −0.106", lo)
	}
}

func TestBrooksCoil(t *testing.T) {
	// The Brooks coil — square winding section of side c on mean radius
	// 3c/2 (inner diameter 2c, outer 4c), the proportions that give the most
	// inductance for a given length of wire — has L = 0.025491 c N² µH with
	// c in cm (Brooks and Turner, Univ. Illinois Eng. Exp. Station Bull. 53,
	// 1912; Grover, Inductance Calculations, 1946, ch. 16; constant recalled
	// from memory). That is a uniform current density over the section; the
	// multilayer turn sum of 40 × 40 turns approaches it to 10⁻⁴.
	const c, nl = 0.01, 40
	d := c / nl
	coil := Coil{Form: Solenoid, MeanDiameter: 3 * c, Length: c, RadialBuild: c, Turns: nl * nl,
		Wire: Wire{Bare: 0.999 * d, Outer: d, Material: Copper()}}
	w := LayOut(coil)
	if w.LayerCount != nl || w.TurnsPerLayer != nl || w.Overfull {
		t.Fatalf("layout %d × %d overfull %v", w.LayerCount, w.TurnsPerLayer, w.Overfull)
	}
	N := float64(nl * nl)
	want := 0.025491e-6 * (c * 100) * N * N
	checkRel(t, "Brooks coil: multilayer method vs Grover's constant", CoilInductance(coil, w), want, 5e-4)
}

func TestWheelerMultilayerForm(t *testing.T) {
	// The SI form against Wheeler's inch form, L = 0.8 a² N²/(6a + 9b + 10c)
	// µH, at a = 1 in, b = c = 0.5 in, N = 100.
	want := 0.8 * 1 * 1e4 / (6 + 4.5 + 5) * 1e-6
	checkRel(t, "Wheeler multilayer in SI", WheelerMultilayerInductance(Inch, Inch/2, Inch/2, 100), want, 1e-14)
	// A 20 × 20 winding is summed turn by turn.
	small := Coil{Form: Solenoid, MeanDiameter: 0.2, Length: 0.02, RadialBuild: 0.02, Turns: 400,
		Wire: Wire{Bare: 0.9e-3, Outer: 1e-3, Material: Copper()}}
	if MultilayerByCells(LayOut(small)) {
		t.Error("400 turns should be summed turn by turn")
	}
}
