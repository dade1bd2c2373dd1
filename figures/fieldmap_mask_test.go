package figures

import (
	"math"
	"math/rand/v2"
	"testing"
)

// sectionMask is the node-by-node test of inSections, made once per grid:
// the two must agree at every node, for rectangles, round bundles (also in
// boxes taller or flatter than wide, where the circle leaves the box),
// sections reaching past the grid, degenerate and NaN sections, and grids
// whose positions are not ascending.
func TestSectionMaskMatchesInSections(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 2))
	grid := func(n int, lo, hi float64) []float64 {
		a := make([]float64, n)
		for i := range a {
			a[i] = lo + (hi-lo)*float64(i)/float64(n-1)
		}
		return a
	}
	for trial := range 200 {
		x, y := grid(41+trial%7, -1, 1), grid(37+trial%5, -0.8, 1.2)
		if trial%10 == 9 {
			rng.Shuffle(len(x), func(i, j int) { x[i], x[j] = x[j], x[i] })
		}
		var ss []Section
		for range 1 + trial%9 {
			cx, cy := 2.4*rng.Float64()-1.2, 2.4*rng.Float64()-1.2
			w, h := 0.5*rng.Float64(), 0.5*rng.Float64()
			s := Section{X0: cx - w, X1: cx + w, Y0: cy - h, Y1: cy + h, Round: rng.IntN(2) == 0}
			if rng.IntN(2) == 0 { // corners given in either order
				s.X0, s.X1 = s.X1, s.X0
			}
			ss = append(ss, s)
		}
		// Nodes exactly on a circle's edge and on a rectangle's side.
		ss = append(ss, Section{X0: x[3], X1: x[9], Y0: y[4], Y1: y[10], Round: true},
			Section{X0: x[20], X1: x[22], Y0: y[1], Y1: y[1]})
		if trial%20 == 0 {
			ss = append(ss, Section{X0: math.NaN(), X1: 0.3, Y0: 0, Y1: 0.2})
		}
		m := sectionMask(x, y, ss)
		for iy := range y {
			for ix := range x {
				if want := inSections(ss, x[ix], y[iy]); m[iy*len(x)+ix] != want {
					t.Fatalf("trial %d: node (%g, %g): mask %v, inSections %v", trial, x[ix], y[iy], m[iy*len(x)+ix], want)
				}
			}
		}
	}
}
