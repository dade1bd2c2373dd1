package calc

import (
	"math"
	"runtime"
	"testing"
)

func grid(lo, hi float64, n int) []float64 {
	v := make([]float64, n)
	for i := range v {
		v[i] = lo + (hi-lo)*float64(i)/float64(n-1)
	}
	return v
}

// TestFieldMapSymmetries checks that the map built with the mirror
// symmetries equals point-by-point evaluation, for a coil, an aiding and an
// opposing pair, a rectangle, and an asymmetric grid.
func TestFieldMapSymmetries(t *testing.T) {
	wire := Wire{Bare: 0.5e-3, Outer: 0.56e-3, Material: Copper()}
	for _, c := range []Coil{
		{Form: Solenoid, MeanDiameter: 0.04, Length: 0.01, RadialBuild: 0.006, Turns: 150, Wire: wire, Axis: Vec{0, 1, 0}},
		{Form: Pair, MeanDiameter: 0.1, Spacing: 0.05, Turns: 20, Wire: wire},
		{Form: Pair, MeanDiameter: 0.1, Spacing: 0.08, Turns: 20, Wire: wire, Opposing: true},
		{Form: Rectangle, Width: 0.1, Height: 0.06, Turns: 10, Wire: wire},
	} {
		w := LayOut(c)
		src := NewCoilSource(c, w, 0.8)
		fr := CoilFrame(c.Axis)
		for _, g := range [][2][]float64{
			{grid(-0.09, 0.09, 31), grid(-0.07, 0.07, 25)}, // symmetric both ways
			{grid(-0.05, 0.09, 17), grid(-0.02, 0.07, 12)}, // neither
		} {
			m := src.Map(g[0], g[1])
			for iz, z := range m.Z {
				for ix, x := range m.X {
					p := c.Centre.Add(fr.E1.Scale(x)).Add(fr.U.Scale(z))
					want := CoilField(c, w, 0.8, p)
					k := iz*len(m.X) + ix
					got := fr.E1.Scale(m.BX[k]).Add(fr.U.Scale(m.BZ[k]))
					if math.IsNaN(m.BX[k]) && want.IsNaN() {
						continue
					}
					if e := got.Sub(want).Norm(); e > 1e-9*math.Max(want.Norm(), 1e-6) {
						t.Fatalf("form %d at (%g, %g): map %v, field %v", c.Form, x, z, got, want)
					}
					// The field has no component out of the meridian
					// plane for a circular coil.
					if c.Form != Rectangle && math.Abs(want.Dot(fr.E2)) > 1e-12*want.Norm() {
						t.Fatalf("out-of-plane field %v", want)
					}
					if mg := m.Magnitude(ix, iz); math.Abs(mg-got.Norm()) > 1e-15*mg {
						t.Fatal("magnitude")
					}
				}
			}
		}
	}
}

// benchCoil is the 1000-turn multilayer coil of the map benchmark: 60 mm
// mean diameter, 18.5 mm long, 18 mm radial build, 0.56 mm wire — 33 turns
// a layer in 31 layers.
func benchCoil() (Coil, Winding) {
	c := Coil{Form: Solenoid, MeanDiameter: 0.06, Length: 0.0185, RadialBuild: 0.018, Turns: 1000,
		Wire: Wire{Bare: 0.5e-3, Outer: 0.56e-3, Material: Copper()}}
	return c, LayOut(c)
}

// BenchmarkFieldMap200 times a 200 × 200 map of the meridian plane, ±80 mm
// by ±80 mm about the 1000-turn coil (grid symmetric about the axis and the
// mid-plane).
func BenchmarkFieldMap200(b *testing.B) {
	c, w := benchCoil()
	x, z := grid(-0.08, 0.08, 200), grid(-0.08, 0.08, 200)
	for b.Loop() {
		FieldMap(c, w, 1, x, z)
	}
}

// BenchmarkFieldMap200Asymmetric is the same map on a grid that no
// symmetry shortens (0…80 mm by −80…+60 mm, every point computed).
func BenchmarkFieldMap200Asymmetric(b *testing.B) {
	c, w := benchCoil()
	x, z := grid(0, 0.08, 200), grid(-0.08, 0.06, 200)
	for b.Loop() {
		FieldMap(c, w, 1, x, z)
	}
}

// BenchmarkFieldMap200TurnByTurn is the asymmetric map summed over every
// turn at every point (CoilField), the cost the quadrature avoids.
func BenchmarkFieldMap200TurnByTurn(b *testing.B) {
	c, w := benchCoil()
	x, z := grid(0, 0.08, 200), grid(-0.08, 0.06, 200)
	for b.Loop() {
		for _, zz := range z {
			for _, xx := range x {
				CoilField(c, w, 1, Vec{xx, 0, zz})
			}
		}
	}
}

// TestFieldMapDeterministic: the map computed on one core and on several is
// the same to the bit.
func TestFieldMapDeterministic(t *testing.T) {
	c, w := benchCoil()
	x, z := grid(0, 0.08, 41), grid(-0.08, 0.06, 37)
	prev := runtime.GOMAXPROCS(1)
	one := FieldMap(c, w, 1, x, z)
	runtime.GOMAXPROCS(max(4, prev))
	many := FieldMap(c, w, 1, x, z)
	runtime.GOMAXPROCS(prev)
	for k := range one.BX {
		if math.Float64bits(one.BX[k]) != math.Float64bits(many.BX[k]) || math.Float64bits(one.BZ[k]) != math.Float64bits(many.BZ[k]) {
			t.Fatalf("node %d: one core (%v, %v), several (%v, %v)", k, one.BX[k], one.BZ[k], many.BX[k], many.BZ[k])
		}
	}
}

// BenchmarkFieldMapRectangle200 times a 200 × 200 map about a 100 × 60 mm
// rectangular coil, symmetric about its axis and its plane.
func BenchmarkFieldMapRectangle200(b *testing.B) {
	c := Coil{Form: Rectangle, Width: 0.1, Height: 0.06, Turns: 50, Wire: Wire{Bare: 0.5e-3, Outer: 0.56e-3, Material: Copper()}}
	w := LayOut(c)
	x, z := grid(-0.08, 0.08, 200), grid(-0.05, 0.05, 200)
	for b.Loop() {
		FieldMap(c, w, 1, x, z)
	}
}
