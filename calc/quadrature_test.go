package calc

import (
	"math"
	"math/rand/v2"
	"testing"
)

func TestDiscreteGaussRule(t *testing.T) {
	// The n-point rule on {0, …, g−1} integrates every polynomial of degree
	// up to 2n − 1 exactly against the point sum (Gauss's property).
	for _, g := range []int{2, 5, 13, 64, 333} {
		for _, n := range []int{1, 2, 3, 5, 8, 10} {
			if n > g {
				continue
			}
			r := discreteGauss(g, n)
			for deg := 0; deg <= 2*n-1; deg++ {
				// Scaled to [0, 1] so that high powers stay representable.
				f := func(x float64) float64 { return math.Pow(x/float64(g-1), float64(deg)) }
				want := 0.0
				for i := range g {
					want += f(float64(i))
				}
				got := 0.0
				for k := range r.x {
					got += r.w[k] * f(r.x[k])
				}
				if relErr(got, want) > 1e-12 {
					t.Errorf("g=%d n=%d degree %d: %.15g vs %.15g", g, n, deg, got, want)
				}
			}
		}
	}
	// n = g is the sum itself.
	r := discreteGauss(4, 4)
	for i := range 4 {
		if r.x[i] != float64(i) || r.w[i] != 1 {
			t.Errorf("exact rule %v", r)
		}
	}
	// Many points: the rule tends to Gauss–Legendre on the extent. Two
	// nodes on [0, 1]: 1/2 ∓ 1/(2√3) (Abramowitz & Stegun 25.4.29).
	r = discreteGauss(100001, 2)
	checkRel(t, "2-node rule, first node", r.x[0]/100000, 0.5-0.5/math.Sqrt(3), 1e-4) // differs by O(1/g)
}

// TestCoilSourceMatchesTurnSum checks the stated accuracy of the quadrature
// over the cross-section: within 10⁻⁹ of the exact turn-by-turn sum at
// 2000 random points at least one wire diameter from every conductor, from
// inside the winding's envelope to 50 times its size.
func TestCoilSourceMatchesTurnSum(t *testing.T) {
	matchTurnSum(t, func(s *CoilSource) *CoilSource { return s }, 1e-9)
}

// TestMapSourceMatchesTurnSum checks the maps' stated accuracy (MapEps):
// within 2×10⁻⁷ of the turn sum at the same points.
func TestMapSourceMatchesTurnSum(t *testing.T) {
	matchTurnSum(t, (*CoilSource).ForMaps, 2e-7)
}

// matchTurnSum compares mk(NewCoilSource(…)) with the turn sum over the
// windings and points of TestCoilSourceMatchesTurnSum, failing beyond
// the relative difference bound.
func matchTurnSum(t *testing.T, mk func(*CoilSource) *CoilSource, bound float64) {
	t.Helper()
	wire := Wire{Bare: 0.5e-3, Outer: 0.56e-3, Material: Copper()}
	coils := []Coil{
		// 1000 turns, 33 per layer, the last layer partial.
		{Form: Solenoid, MeanDiameter: 0.06, Length: 0.0185, RadialBuild: 0.018, Turns: 1000, Wire: wire},
		{Form: Solenoid, MeanDiameter: 0.02, Length: 0.2, Turns: 300, Wire: wire},
		{Form: Loop, MeanDiameter: 0.1, Length: 3e-3, RadialBuild: 8e-3, Turns: 70, Wire: wire},
		{Form: Pair, MeanDiameter: 0.12, Length: 0.01, RadialBuild: 0.0105, Spacing: 0.06, Turns: 300, Wire: wire},
		{Form: Pair, MeanDiameter: 0.12, Length: 0.01, RadialBuild: 0.0105, Spacing: 0.1, Turns: 300, Wire: wire, Opposing: true},
		{Form: Loop, MeanDiameter: 0.08, Turns: 200, Wire: wire},
	}
	rng := rand.New(rand.NewPCG(11, 12))
	for _, c := range coils {
		w := LayOut(c)
		if w.Overfull {
			t.Fatal(w.Problem)
		}
		src := mk(NewCoilSource(c, w, 1.1))
		size := coilExtent(c, w)
		worst := 0.0
		for i := 0; i < 2000/len(coils); {
			// Half the points in and near the winding, half out to 50 sizes.
			scale := 1.3 * size
			if i%2 == 1 {
				scale = size * math.Pow(50, rng.Float64())
			}
			p := Vec{rng.Float64() * scale, 0, (rng.Float64()*2 - 1) * scale}
			if nearestFilament(c, w, p) < wire.Outer {
				continue
			}
			i++
			want := CoilField(c, w, 1.1, p)
			got := src.At(p)
			// An opposing pair's field vanishes at its centre: there the
			// error is measured against the field one coil alone makes.
			ref := want.Norm()
			if c.Opposing {
				ref = math.Max(ref, CoilField(Coil{Form: Loop, MeanDiameter: c.MeanDiameter, Length: c.Length,
					RadialBuild: c.RadialBuild, Turns: c.Turns, Wire: wire}, w, 1.1, Vec{}).Norm()*1e-3)
			}
			e := got.Sub(want).Norm() / ref
			worst = math.Max(worst, e)
			if e > bound {
				t.Errorf("%v at %v: quadrature %v, turn sum %v (rel %.3g)", c.Form, p, got, want, e)
			}
		}
		t.Logf("form %d, %d turns: worst relative difference %.2g", c.Form, c.Turns, worst)
	}
}

func TestCoilSourceGeneralLayouts(t *testing.T) {
	// Windings not made by LayOut: uneven layers and turns, which fall back
	// to single-turn lattices.
	w := Winding{Layers: []Layer{
		{Radius: 0.02, Z: []float64{-0.002, 0, 0.0025}},
		{Radius: 0.021, Z: []float64{-0.001, 0.001}},
		{Radius: 0.0235, Z: []float64{0}},
	}}
	c := Coil{Form: Loop, MeanDiameter: 0.043}
	src := NewCoilSource(c, w, 2)
	for _, p := range []Vec{{0, 0, 0}, {0.01, 0.003, 0.02}, {0.05, 0, -0.01}, {0.03, 0.02, 0.001}} {
		if e := vecRelErr(src.At(p), CoilField(c, w, 2, p)); e > 1e-12 {
			t.Errorf("at %v: rel %g", p, e)
		}
	}
	// No current, NaN current, an empty winding.
	if NewCoilSource(c, w, 0).At(Vec{0, 0, 0.1}) != (Vec{}) {
		t.Error("no current, no field")
	}
	if !NewCoilSource(c, w, math.NaN()).At(Vec{0, 0, 0.1}).IsNaN() {
		t.Error("unknown current, unknown field")
	}
	if NewCoilSource(c, Winding{}, 1).At(Vec{0, 0, 0.1}) != (Vec{}) {
		t.Error("no turns, no field")
	}
}
