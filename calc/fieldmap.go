package calc

import (
	"math"
	"runtime"
	"sync"
	"sync/atomic"
)

// FieldGrid is the field of one coil block over a rectangular grid of its
// meridian plane: the plane through its axis U and its E1 direction (for a
// Rectangle, the plane of its axis and its width).
type FieldGrid struct {
	X, Z []float64 // m, coil-local: X along E1, Z along U, from the centre
	// BX, BZ are the field components along E1 and U, T, at (X[ix], Z[iz])
	// stored at index iz·len(X) + ix. NaN on a filament.
	BX, BZ []float64
}

// Magnitude returns |B|, T, at grid node (ix, iz).
func (g FieldGrid) Magnitude(ix, iz int) float64 {
	k := iz*len(g.X) + ix
	return math.Hypot(g.BX[k], g.BZ[k])
}

// FieldMap evaluates the field of coil block c (winding w, current I) over
// the grid x × z of its meridian plane (coil-local coordinates, m). The work
// is shared across the grid: the winding is prepared once (NewCoilSource:
// quadrature panels, each point summing a few quadrature filaments for
// distant panels and the turns themselves only for near ones), every point
// is taken in the coil's own cylindrical coordinates, and the symmetries of
// the winding are used — the field at −x is the mirror image of the field
// at x (Bx odd, Bz even: a circular winding by its axial symmetry, a
// Rectangle by its mirror plane through the axis across its width), and
// when the winding is symmetric about its mid-plane (always for LayOut's
// windings and for a Rectangle) the field at −z follows from the field at z
// (Bz even and Bx odd for a coil or an aiding pair; the reverse for an
// opposing pair) — so a grid symmetric about the axis and the mid-plane
// costs a quarter of its points. The points left are computed on every
// core (runtime.GOMAXPROCS); each is computed alone and stored in its own
// place, so the map is the same to the bit however they are scheduled.
func FieldMap(c Coil, w Winding, I float64, x, z []float64) FieldGrid {
	return NewCoilSource(c, w, I).Map(x, z)
}

// Map is FieldMap on a prepared source.
func (s *CoilSource) Map(x, z []float64) FieldGrid {
	return s.MapOutside(x, z, nil)
}

// MapOutside is Map with the nodes where skip(x, z) holds left
// uncomputed, NaN (nil skip computes every node): for the nodes inside a
// winding's own cross-section, which its map figure masks, and where the
// filament model's field has no meaning below the scale of a wire. skip
// must be symmetric as the winding is (the same at ±x, and at ±z when the
// winding is symmetric about its mid-plane), as a node's mirror images
// take its value.
func (s *CoilSource) MapOutside(x, z []float64, skip func(x, z float64) bool) FieldGrid {
	nx, nz := len(x), len(z)
	g := FieldGrid{X: append([]float64(nil), x...), Z: append([]float64(nil), z...),
		BX: make([]float64, nx*nz), BZ: make([]float64, nx*nz)}
	xm, zm := mirror(x), mirror(z)
	parity := s.zParity()
	if parity == 0 {
		zm = nil
	}
	// The nodes to compute: the first of each set of mirror images in
	// index order (a deterministic list).
	done := make([]bool, nx*nz)
	var todo []int
	for iz := range nz {
		for ix := range nx {
			k := iz*nx + ix
			if done[k] {
				continue
			}
			todo = append(todo, k)
			done[k] = true
			if xm != nil {
				done[iz*nx+xm[ix]] = true
			}
			if zm != nil {
				done[zm[iz]*nx+ix] = true
				if xm != nil {
					done[zm[iz]*nx+xm[ix]] = true
				}
			}
		}
	}
	parallel(len(todo), func(i int) {
		k := todo[i]
		if skip != nil && skip(x[k%nx], z[k/nx]) {
			g.BX[k], g.BZ[k] = math.NaN(), math.NaN()
			return
		}
		g.BX[k], g.BZ[k] = s.Local(x[k%nx], z[k/nx])
	})
	for _, k := range todo {
		ix, iz := k%nx, k/nx
		bx, bz := g.BX[k], g.BZ[k]
		set := func(jx, jz int, bx, bz float64) {
			j := jz*nx + jx
			g.BX[j], g.BZ[j] = bx, bz
		}
		if xm != nil {
			set(xm[ix], iz, -bx, bz)
		}
		if zm != nil {
			p := float64(parity)
			set(ix, zm[iz], -p*bx, p*bz)
			if xm != nil {
				set(xm[ix], zm[iz], p*bx, p*bz)
			}
		}
		set(ix, iz, bx, bz) // a node on a mirror line is its own image
	}
	return g
}

// parallel calls f(i) for every i < n on up to runtime.GOMAXPROCS
// goroutines, handing out indices in blocks; it returns when all are done.
// f must only write to places that belong to its own index.
func parallel(n int, f func(i int)) {
	ParallelBlocks(n, parallelBlock, f)
}

// ParallelBlocks is parallel with blocks of the given size (1 for tasks
// that are each large, such as a pair of coils or a coil's study). It is
// the one worker pool of the project: the analysis stage uses it too.
func ParallelBlocks(n, block int, f func(i int)) {
	parallelBlock := block
	workers := min(runtime.GOMAXPROCS(0), (n+parallelBlock-1)/parallelBlock)
	if workers <= 1 {
		for i := range n {
			f(i)
		}
		return
	}
	var next atomic.Int64
	var wg sync.WaitGroup
	for range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for {
				i0 := int(next.Add(int64(parallelBlock))) - parallelBlock
				if i0 >= n {
					return
				}
				for i := i0; i < min(i0+parallelBlock, n); i++ {
					f(i)
				}
			}
		}()
	}
	wg.Wait()
}

// parallelBlock is the number of consecutive indices a worker of parallel
// takes at a time.
const parallelBlock = 64

// mirror returns, for a grid symmetric about 0 (v[i] = −v[n−1−i] to
// 10⁻¹² of its span), the index of each node's mirror image; nil otherwise.
func mirror(v []float64) []int {
	n := len(v)
	span := 0.0
	for _, x := range v {
		span = math.Max(span, math.Abs(x))
	}
	for i := range v {
		if math.Abs(v[i]+v[n-1-i]) > 1e-12*span {
			return nil
		}
	}
	m := make([]int, n)
	for i := range m {
		m[i] = n - 1 - i
	}
	return m
}

// zParity is +1 when the source's current distribution is symmetric under
// z → −z in its frame, −1 when antisymmetric (an opposing pair), 0 when
// neither.
func (s *CoilSource) zParity() int {
	if s.coil.Form == Rectangle {
		return 1 // one thin rectangle in the plane z = 0
	}
	for _, l := range s.lattices {
		mid := l.z0 + float64(l.nz-1)*l.dz/2
		if math.Abs(mid) > 1e-12*math.Max(math.Abs(l.z0), math.Abs(l.dz)) && mid != 0 {
			return 0
		}
	}
	switch len(s.coils) {
	case 1:
		if s.coils[0].dz != 0 {
			return 0
		}
		return 1
	case 2:
		a, b := s.coils[0], s.coils[1]
		if a.dz != -b.dz {
			return 0
		}
		if a.I == b.I {
			return 1
		}
		if a.I == -b.I {
			return -1
		}
	}
	return 0
}
