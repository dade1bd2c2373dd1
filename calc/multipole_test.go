package calc

import (
	"math"
	"math/rand/v2"
	"testing"
)

// TestMultipoleWithinItsBound compares the series (Multipole.At) with the
// turn sum of the exact loop fields (CoilField: LoopField's elliptic
// integrals, Smythe 1950 §7.10, an independent method) at random points
// outside the sphere of every placement, for thin, single-layer,
// multilayer and pair windings, on tilted and shifted axes: the difference
// must stay within the bound At states (plus the turn sum's own rounding,
// 10⁻¹³ of the field), asked of it to 10⁻¹² of the field, and the bound must be met wherever q = R/r ≤ 0.5.
func TestMultipoleWithinItsBound(t *testing.T) {
	wire := Wire{Bare: 0.5e-3, Outer: 0.56e-3, Material: Copper()}
	coils := []Coil{
		{Form: Solenoid, MeanDiameter: 0.06, Length: 0.0185, RadialBuild: 0.018, Turns: 1000, Wire: wire},
		{Form: Solenoid, MeanDiameter: 0.02, Length: 0.2, Turns: 300, Wire: wire, Axis: Vec{1, 0, 0}},
		{Form: Loop, MeanDiameter: 0.1, Length: 3e-3, RadialBuild: 8e-3, Turns: 70, Wire: wire, Centre: Vec{0.1, -0.2, 0.05}},
		{Form: Pair, MeanDiameter: 0.12, Length: 0.01, RadialBuild: 0.0105, Spacing: 0.06, Turns: 300, Wire: wire, Axis: Vec{1, 2, 3}},
		{Form: Pair, MeanDiameter: 0.12, Length: 0.01, RadialBuild: 0.0105, Spacing: 0.1, Turns: 300, Wire: wire, Opposing: true},
		{Form: Loop, MeanDiameter: 0.08, Turns: 200, Wire: wire},
		// 40 layers of 400 turns: the lattice is summed by the 49-node rules
		{Form: Solenoid, MeanDiameter: 0.05, Length: 0.225, RadialBuild: 0.0225, Turns: 16000, Wire: wire},
	}
	rng := rand.New(rand.NewPCG(21, 22))
	for _, c := range coils {
		w := LayOut(c)
		if w.Overfull {
			t.Fatal(w.Problem)
		}
		const I = 1.3
		mps := NewCoilSource(c, w, I).Multipoles()
		want := 1
		if c.Form == Pair {
			want = 2
		}
		if len(mps) != want {
			t.Fatalf("form %d: %d series, want one per placement, %d", c.Form, len(mps), want)
		}
		fr := CoilFrame(c.Axis)
		worst, met := 0.0, 0
		for i := 0; i < 300; i++ {
			// a point 1.05 to 20 sphere radii from one placement's centre
			mp := mps[i%len(mps)]
			dir := Vec{rng.NormFloat64(), rng.NormFloat64(), rng.NormFloat64()}.Unit()
			if i%7 == 0 {
				dir = fr.U // on the axis
			}
			p := mp.centre.Add(dir.Scale(mp.R * (1.05 + 19*math.Pow(rng.Float64(), 2))))
			var sum Vec
			bound, ok := 0.0, true
			for _, m := range mps {
				b, e, good := m.At(p, 1e-12*CoilField(c, w, I, p).Norm())
				ok = ok && good
				sum, bound = sum.Add(b), bound+e
			}
			if !ok {
				if q := mp.R / p.Sub(mp.centre).Norm(); q <= 0.5 && len(mps) == 1 {
					t.Errorf("form %d at q = %.3f: the series did not meet its tolerance", c.Form, q)
				}
				continue
			}
			met++
			want := CoilField(c, w, I, p)
			diff := sum.Sub(want).Norm()
			if diff > bound+1e-13*want.Norm() {
				t.Errorf("form %d at %v: series %v, turn sum %v: |difference| %.3g T above the bound %.3g T", c.Form, p, sum, want, diff, bound)
			}
			worst = math.Max(worst, diff/want.Norm())
		}
		if met < 100 {
			t.Errorf("form %d: the series met its tolerance at only %d of 300 points", c.Form, met)
		}
		t.Logf("form %d, %d turns: %d points, worst relative difference %.2g", c.Form, c.Turns, met, worst)
	}
}

// TestMultipoleLeadingTermIsTheDipole: far from a winding (q ≈ 10⁻³) the
// series is the field of the point dipole of moment N·I·π a² summed over
// the turns (Jackson, Classical Electrodynamics, 3rd ed., eq. 5.56), to
// the next term's relative size, about q² here.
func TestMultipoleLeadingTermIsTheDipole(t *testing.T) {
	wire := Wire{Bare: 0.5e-3, Outer: 0.56e-3, Material: Copper()}
	c := Coil{Form: Solenoid, MeanDiameter: 0.04, Length: 0.02, RadialBuild: 0.006, Turns: 240, Wire: wire, Axis: Vec{0, 1, 0}}
	w := LayOut(c)
	mps := NewCoilSource(c, w, 0.7).Multipoles()
	var m float64
	for _, l := range w.Layers {
		m += 0.7 * math.Pi * l.Radius * l.Radius * float64(len(l.Z))
	}
	for _, dir := range []Vec{{0, 1, 0}, {1, 0, 0}, Vec{1, 1, 1}.Unit()} {
		p := dir.Scale(mps[0].R * 1e3)
		got, _, ok := mps[0].At(p, 1e-20)
		if !ok {
			t.Fatalf("at %v: no series", p)
		}
		want := DipoleField(Vec{0, m, 0}, p)
		if e := got.Sub(want).Norm() / want.Norm(); e > 1e-5 {
			t.Errorf("at %v: series %v, dipole %v (rel %.2g)", p, got, want, e)
		}
	}
}

// TestSeriesAtAsQuadrature: the field of a design of several blocks with
// the far ones from their series (FieldModel.SeriesAt, to 10⁻⁹ of each
// block's own field) against the same model by quadrature alone (At,
// within 10⁻⁹ of the turn sum), at points between, beside and far from
// the blocks: they agree to a few parts in 10⁹ of the sum of the blocks'
// field magnitudes, and the series is used at most points.
func TestSeriesAtAsQuadrature(t *testing.T) {
	wire := Wire{Bare: 0.4e-3, Outer: 0.45e-3, Material: Copper()}
	var d Design
	for i := range 6 {
		axis := Vec{0, 0, 1}
		if i%2 == 1 {
			axis = Vec{1, 0, 1}
		}
		d.Coils = append(d.Coils, Coil{Form: Solenoid, MeanDiameter: 0.03, Length: 0.02, RadialBuild: 0.004, Turns: 150,
			Wire: wire, Axis: axis, Centre: Vec{0.1 * float64(i%3), 0.12 * float64(i/3), 0}, Current: 0.4, Drive: CurrentDrive})
	}
	d.Coils = append(d.Coils, Coil{Form: Pair, MeanDiameter: 0.08, Length: 0.005, RadialBuild: 0.003, Turns: 40, Wire: wire,
		Spacing: 0.04, Opposing: true, Centre: Vec{0.3, 0, 0.1}, Current: 0.8, Drive: CurrentDrive})
	fm := NewFieldModel(d)
	rng := rand.New(rand.NewPCG(5, 6))
	used := 0
	for range 500 {
		p := Vec{-0.1 + 0.5*rng.Float64(), -0.1 + 0.35*rng.Float64(), -0.15 + 0.3*rng.Float64()}
		var scale float64
		for i := range d.Coils {
			scale += fm.CoilAt(i, p).Norm()
		}
		want, got := fm.At(p), fm.SeriesAt(p, 1e-9)
		if e := got.Sub(want).Norm() / scale; e > 3e-9 {
			t.Errorf("at %v: series %v, quadrature %v (%.2g of the blocks' fields)", p, got, want, e)
		}
		for i := range d.Coils {
			if _, ok := seriesSum(fm.series[i], p, 1e-9); ok {
				used++
			}
		}
	}
	if used < 500*len(d.Coils)/2 {
		t.Errorf("the series was used for only %d of %d block evaluations", used, 500*len(d.Coils))
	}
}
