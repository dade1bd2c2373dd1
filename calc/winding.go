package calc

import (
	"errors"
	"fmt"
	"math"
	"sync"
)

// LayOut places every turn of one coil (one coil of a pair) and derives the
// winding's geometry. Three cases, by the coil's dimensions:
//
// Thin coil (Length == 0 and RadialBuild == 0, and always for a Rectangle):
// all N turns are taken on the mean diameter. Layers holds one Layer whose Z
// lists N coincident turns (all z = 0), so that every entry of every Layer is
// exactly one turn and field sums need no weights; TurnsPerLayer and
// LayerCount are 1 as for a single filament bundle. For a Rectangle the
// Layer's Radius is half the Width (the conductor's distance from the axis
// along the width direction).
//
// Single-layer coil (Length > 0, RadialBuild == 0): N turns evenly spaced over
// Length at the mean radius, pitch p = Length/N, the first and last turn
// p/2 inside the ends. TurnsPerLayer is N. If p is less than the wire's
// overall diameter the winding cannot be made: Overfull is set and Problem
// says why.
//
// Multilayer coil (RadialBuild > 0): turns touch along the axis, so the turns
// per layer are tpl = ⌊Length/d_outer⌋ (at least 1; Length == 0 is a flat
// pancake, one turn per layer), layers = ⌈N/tpl⌉, layer k (from 0) has its
// wire centres at radius r_k = r_in + d_outer/2 + k·d_outer, with r_in half
// the InnerDiameter when given, else the mean radius less half the
// RadialBuild. Every layer is centred on z = 0 and the last may be partial.
// If the layers need more depth than RadialBuild the winding is Overfull.
//
// When the overall diameter is not given (Wire.Outer ≤ 0) the bare diameter
// stands in for it. Dimensions that are not positive finite numbers count as
// not given. A radial build deeper than the mean radius is reported as a
// Problem (the inner radius is then taken as 0). More than MaxTurns turns
// are not laid out: the Winding is empty, its figures NaN, with a Problem.
//
// Layers share their Z slices where the positions are the same (every
// full layer of a multilayer winding; a thin coil's zeros): they are read
// only.
//
// Derived quantities, each over the turns as laid out: WireLength = Σ 2π r_i
// (Rectangle: N × 2(W + H)), MeanTurn = WireLength/N, AreaSum = Σ π r_i²
// (Rectangle: N·W·H), FillFactor = N (π d_bare²/4) / (winding cross-section:
// Length × d_outer for one layer, Length × RadialBuild for several; NaN for a
// thin coil), Mass = density × π d_bare²/4 × WireLength.
//
// SurfaceArea is the area assumed to shed heat (the thermal model's A):
// a thin coil is a torus whose tube is the round bundle of N wires
// hexagonally packed, d_bundle = d_outer √(N/0.9069) (0.9069 = π/(2√3), the
// densest packing), so A = π d_bundle × MeanTurn (Rectangle likewise along
// its perimeter); a single-layer coil sheds heat from its outer cylinder
// only, A = π D_out Length with D_out = mean diameter + d_outer (the bore
// side sits on the former); a multilayer coil from its outer cylinder and
// both end annuli, A = π D_out L + 2 π (R_out² − R_in²), R_out = R_in +
// RadialBuild.
func LayOut(c Coil) Winding {
	n := c.Turns
	if n < 0 {
		n = 0
	}
	if n > MaxTurns {
		return Winding{
			MeanTurn: math.NaN(), WireLength: math.NaN(), AreaSum: math.NaN(), FillFactor: math.NaN(),
			SurfaceArea: math.NaN(), Mass: math.NaN(), Overfull: true,
			Problem: fmt.Sprintf("%d turns: more than the %d turns that are laid out one by one", n, MaxTurns),
		}
	}
	// Dimensions that are not positive finite numbers count as not given.
	c.MeanDiameter, c.InnerDiameter = dim(c.MeanDiameter), dim(c.InnerDiameter)
	c.Length, c.RadialBuild = dim(c.Length), dim(c.RadialBuild)
	c.Width, c.Height = dim(c.Width), dim(c.Height)
	bare := dim(c.Wire.Bare)
	outer := dim(c.Wire.Outer)
	if !(outer > 0) {
		outer = bare
	}
	rm := c.MeanDiameter / 2
	cond := ConductorArea(bare)
	dens := c.Wire.Material.Density
	var w Winding

	thin := c.Form == Rectangle || (c.Length <= 0 && c.RadialBuild <= 0)
	switch {
	case thin:
		w.Thin = true
		w.TurnsPerLayer, w.LayerCount = 1, 1
		r := rm
		turn := 2 * math.Pi * rm
		area := math.Pi * rm * rm
		if c.Form == Rectangle {
			r = c.Width / 2
			turn = 2 * (c.Width + c.Height)
			area = c.Width * c.Height
		}
		w.Layers = []Layer{{Radius: r, Z: zeros(n)}}
		w.MeanTurn = turn
		w.WireLength = float64(n) * turn
		w.AreaSum = float64(n) * area
		w.FillFactor = math.NaN()
		w.SurfaceArea = math.Pi * BundleDiameter(outer, n) * turn
	case c.RadialBuild <= 0: // single layer
		pitch := c.Length / float64(max(n, 1))
		z := make([]float64, n)
		for i := range z {
			z[i] = -c.Length/2 + pitch*(float64(i)+0.5)
		}
		w.Layers = []Layer{{Radius: rm, Z: z}}
		w.TurnsPerLayer, w.LayerCount = n, 1
		if n > 0 && pitch < outer*(1-1e-9) {
			w.Overfull = true
			w.Problem = fmt.Sprintf("%d turns of %.4g mm wire need %.4g mm of length, more than the %.4g mm given",
				n, outer*1e3, float64(n)*outer*1e3, c.Length*1e3)
		}
		w.MeanTurn = 2 * math.Pi * rm
		w.WireLength = float64(n) * w.MeanTurn
		w.AreaSum = float64(n) * math.Pi * rm * rm
		w.FillFactor = float64(n) * cond / (c.Length * outer)
		w.SurfaceArea = math.Pi * (2*rm + outer) * c.Length
	default: // multilayer
		rin := rm - c.RadialBuild/2
		if c.InnerDiameter > 0 {
			rin = c.InnerDiameter / 2
		}
		if rin < 0 {
			w.Overfull = true
			w.Problem = fmt.Sprintf("a radial build of %.4g mm does not fit inside a mean diameter of %.4g mm",
				c.RadialBuild*1e3, c.MeanDiameter*1e3)
			rin = 0
		}
		length := c.Length
		tpl, layers := LayersFor(n, length, outer)
		if length > 0 && outer > 0 && length/outer+1e-9 < 1 {
			w.Overfull = true
			w.Problem = fmt.Sprintf("winding length %.4g mm is shorter than one wire (%.4g mm)", length*1e3, outer*1e3)
		}
		if length <= 0 {
			length = outer // flat pancake: one wire wide
		}
		w.TurnsPerLayer, w.LayerCount = tpl, layers
		w.Layers = make([]Layer, layers)
		left := n
		var wl, as float64
		var full []float64 // the positions of a full layer, shared by all of them
		for k := range w.Layers {
			nk := min(tpl, left)
			left -= nk
			r := rin + outer/2 + float64(k)*outer
			var z []float64
			if nk == tpl && full != nil {
				z = full
			} else {
				z = make([]float64, nk)
				for j := range z {
					z[j] = (float64(j) - float64(nk-1)/2) * outer
				}
				if nk == tpl {
					full = z
				}
			}
			w.Layers[k] = Layer{Radius: r, Z: z}
			wl += float64(nk) * 2 * math.Pi * r
			as += float64(nk) * math.Pi * r * r
		}
		if float64(layers)*outer > c.RadialBuild*(1+1e-9) && !w.Overfull {
			w.Overfull = true
			w.Problem = fmt.Sprintf("%d turns at %d per layer need %d layers of %.4g mm wire = %.4g mm, more than the radial build of %.4g mm",
				n, tpl, layers, outer*1e3, float64(layers)*outer*1e3, c.RadialBuild*1e3)
		}
		w.WireLength = wl
		w.MeanTurn = 2 * math.Pi * rm
		if n > 0 {
			w.MeanTurn = wl / float64(n)
		}
		w.AreaSum = as
		w.FillFactor = float64(n) * cond / (length * c.RadialBuild)
		rout := rin + c.RadialBuild
		w.SurfaceArea = math.Pi*2*rout*length + 2*math.Pi*(rout*rout-rin*rin)
	}
	w.Mass = dens * cond * w.WireLength
	return w
}

// zeroTurns backs the positions of thin coils' turns (all at z = 0),
// shared read-only; it grows under zeroMu.
var (
	zeroMu    sync.Mutex
	zeroTurns []float64
)

// zeros returns n zeros from the shared backing (capacity n, so an append
// copies).
func zeros(n int) []float64 {
	zeroMu.Lock()
	defer zeroMu.Unlock()
	if len(zeroTurns) < n {
		zeroTurns = make([]float64, max(n, 2*len(zeroTurns)))
	}
	return zeroTurns[:n:n]
}

// LayersFor returns the turns per layer and the layers of a multilayer
// winding of n turns of wire of overall diameter outer over an axial
// length: turns touch along the axis, tpl = ⌊length/outer⌋, at least 1
// and at most n (1 for a flat pancake, length ≤ 0), and layers = ⌈n/tpl⌉.
// The radial build the turns need is layers × outer.
func LayersFor(n int, length, outer float64) (tpl, layers int) {
	tpl = 1
	if outer > 0 && length > 0 {
		tpl = int(math.Min(math.Floor(length/outer+1e-9), float64(max(n, 1))))
	}
	if tpl < 1 {
		tpl = 1
	}
	return tpl, (max(n, 0) + tpl - 1) / tpl
}

// MaxTurns is the most turns LayOut places one by one; a coil with more
// gets an empty Winding with NaN figures and a Problem.
const MaxTurns = 1_000_000

// dim returns x when it is a positive finite number, else 0 (not given).
func dim(x float64) float64 {
	if x > 0 && !math.IsInf(x, 1) {
		return x
	}
	return 0
}

// BundleDiameter returns the diameter of a round bundle of n wires of overall
// diameter d packed hexagonally: d_bundle = d √(n / 0.9069), the bundle's
// area being the wires' total area over the densest-packing fraction
// π/(2√3) ≈ 0.9069. One wire is its own bundle (d).
func BundleDiameter(d float64, n int) float64 {
	if n <= 1 {
		return d
	}
	return d * math.Sqrt(float64(n)/hexPacking)
}

// ErrOverfull is wrapped by CheckWinding when the turns do not fit.
var ErrOverfull = errors.New("winding overfull")

// CheckWinding lays out the coil and returns nil when its turns fit in the
// space given, or an error wrapping ErrOverfull that says by how much they
// do not, for the spec reader to report against the coil block.
func CheckWinding(c Coil) error {
	w := LayOut(c)
	if w.Overfull {
		return fmt.Errorf("%w: %s", ErrOverfull, w.Problem)
	}
	return nil
}

// TurnCount returns the number of turns laid out in w.
func (w Winding) TurnCount() int {
	n := 0
	for _, l := range w.Layers {
		n += len(l.Z)
	}
	return n
}

// MeanTurnRadius is the turn-weighted mean radius of the turns as laid
// out, Σ nₖ rₖ / Σ nₖ over the layers (nₖ turns at radius rₖ); 0 for no
// turns. A winding that does not fill its stated radial build sits nearer
// the bore than the stated mean diameter says.
func (w Winding) MeanTurnRadius() float64 {
	var n, sum float64
	for _, l := range w.Layers {
		n += float64(len(l.Z))
		sum += float64(len(l.Z)) * l.Radius
	}
	if n == 0 {
		return 0
	}
	return sum / n
}
