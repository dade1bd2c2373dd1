package calc

import "math"

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
// a circular winding are used — the field at −x is the mirror image of the
// field at x (Bx odd, Bz even), and when the winding is symmetric about its
// mid-plane (always for LayOut's windings) the field at −z follows from the
// field at z (Bz even and Bx odd for a coil or an aiding pair; the reverse
// for an opposing pair) — so a grid symmetric about the axis and the
// mid-plane costs a quarter of its points.
func FieldMap(c Coil, w Winding, I float64, x, z []float64) FieldGrid {
	return NewCoilSource(c, w, I).Map(x, z)
}

// Map is FieldMap on a prepared source.
func (s *CoilSource) Map(x, z []float64) FieldGrid {
	nx, nz := len(x), len(z)
	g := FieldGrid{X: append([]float64(nil), x...), Z: append([]float64(nil), z...),
		BX: make([]float64, nx*nz), BZ: make([]float64, nx*nz)}
	circular := s.coil.Form != Rectangle
	xm := mirror(x)
	zm := mirror(z)
	parity := s.zParity()
	if !circular {
		xm, parity = nil, 0
	}
	if parity == 0 {
		zm = nil
	}
	done := make([]bool, nx*nz)
	for iz := range nz {
		for ix := range nx {
			k := iz*nx + ix
			if done[k] {
				continue
			}
			bx, bz := s.Local(x[ix], z[iz])
			set := func(jx, jz int, bx, bz float64) {
				k := jz*nx + jx
				g.BX[k], g.BZ[k], done[k] = bx, bz, true
			}
			set(ix, iz, bx, bz)
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
		}
	}
	return g
}

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
