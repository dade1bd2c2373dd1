package calc

import (
	"math"
	"sync"
)

// Results that depend on a coil block's geometry alone — its
// self-inductance and the distances beyond which it is a point dipole —
// are kept for the blocks seen recently, so that sweep steps, worst-case
// corners, sizing candidates and the like coils of an array that share a
// winding compute them once. The cache is a memo of pure functions: the
// inductance is the bits a fresh computation gives; the dipole distances
// are found with the coil at the origin at 1 A, so they do not depend on
// which of several like coils came first (a fresh search at the coil's
// place and current differs from them only by rounding).

// geomKey is what LayOut, CoilInductance and DipoleDistances read of a
// coil: form, dimensions, turns and wire (with the axis for the dipole
// distances, whose directions are taken in the coil's frame).
type geomKey struct {
	form                                    Form
	mean, inner, outer, length, build, w, h float64
	turns, gauge                            int
	bare, wireOuter                         float64
	spacing                                 float64
	opposing                                bool
	axis                                    Vec
}

func keyOf(c Coil, withAxis bool) geomKey {
	k := geomKey{form: c.Form, mean: c.MeanDiameter, inner: c.InnerDiameter, outer: c.OuterDiameter,
		length: c.Length, build: c.RadialBuild, w: c.Width, h: c.Height, turns: c.Turns,
		gauge: c.Wire.Gauge, bare: c.Wire.Bare, wireOuter: c.Wire.Outer,
		spacing: c.Spacing, opposing: c.Opposing}
	if withAxis {
		k.axis = c.Axis
	}
	return k
}

// geomCacheSize bounds each cache; a full cache is emptied (a sizing
// search may pass through many geometries once each).
const geomCacheSize = 4096

type geomCache[V any] struct {
	mu  sync.Mutex
	m   map[geomKey]V
	cap int // entries kept (geomCacheSize when 0)
}

func (g *geomCache[V]) get(k geomKey, compute func() V) V {
	g.mu.Lock()
	v, ok := g.m[k]
	g.mu.Unlock()
	if ok {
		return v
	}
	v = compute()
	g.mu.Lock()
	size := g.cap
	if size == 0 {
		size = geomCacheSize
	}
	if g.m == nil || len(g.m) >= size {
		g.m = map[geomKey]V{}
	}
	g.m[k] = v
	g.mu.Unlock()
	return v
}

var (
	inductanceCache geomCache[float64]
	dipoleCache     geomCache[DipoleReach]
	latticeCache    = geomCache[latticeEntry]{cap: 64}
)

// latticeEntry is a winding's panel tree with the fingerprint of the
// winding it was built from.
type latticeEntry struct {
	print [6]float64
	ls    []*lattice
}

// fingerprint sums up a winding: its turns, layers and the first and last
// layers' radius and first turn. Windings laid out from one geometry share
// it; a winding assembled otherwise (a test's, or one edited) that happened
// to share its coil's key would not.
func fingerprint(w Winding) [6]float64 {
	f := [6]float64{float64(w.TurnCount()), float64(len(w.Layers))}
	if n := len(w.Layers); n > 0 {
		a, b := w.Layers[0], w.Layers[n-1]
		f[2], f[3] = a.Radius, b.Radius
		if len(a.Z) > 0 {
			f[4] = a.Z[0]
		}
		if len(b.Z) > 0 {
			f[5] = b.Z[len(b.Z)-1]
		}
	}
	return f
}

// latticesOf is lattices(w), memoised for windings laid out from coil c's
// geometry: the panel tree of a large winding costs as much as many field
// evaluations, and couplings, maps and searches each want it. The tree is
// read only once built. A winding whose fingerprint differs from the one
// cached under c's key is built afresh.
func latticesOf(c Coil, w Winding) []*lattice {
	fp := fingerprint(w)
	e := latticeCache.get(keyOf(c, false), func() latticeEntry { return latticeEntry{fp, lattices(w)} })
	if e.print != fp {
		return lattices(w)
	}
	return e.ls
}

// coilInductance is CoilInductance(c, w) for w = LayOut(c), memoised.
func coilInductance(c Coil, w Winding) float64 {
	return inductanceCache.get(keyOf(c, false), func() float64 { return CoilInductance(c, w) })
}

// dipoleDistances is DipoleDistances(c, w, I) for w = LayOut(c),
// memoised: the distances are ratios of the exact to the dipole field,
// independent of the current, so they are found at 1 A for every
// non-zero finite current.
func dipoleDistances(c Coil, w Winding, I float64) DipoleReach {
	if I == 0 || math.IsNaN(I) || math.IsInf(I, 0) {
		return DipoleDistances(c, w, I)
	}
	at := c
	at.Centre = Vec{}
	return dipoleCache.get(keyOf(c, true), func() DipoleReach { return DipoleDistances(at, w, 1) })
}
