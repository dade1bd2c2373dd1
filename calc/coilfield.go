package calc

import (
	"math"
	"sync"
)

// CoilField returns the field, T, at the global point p of one coil block
// (a Pair: both its coils) with its winding w laid out by LayOut and current
// I in every turn. The point is taken into the coil's frame (CoilFrame of
// its Axis, origin at its Centre), the field of every turn filament is
// summed there with LoopField (superposition; coincident turns of a thin
// coil are counted once and multiplied), and the local (Bρ, Bz) are turned
// back into global components: B = Bz U + Bρ ρ̂.
//
// A Pair's coils sit at Centre ∓ (Spacing/2) U; when Opposing, the second
// (at +Spacing/2) carries the current reversed. A Rectangle takes all its
// turns as one thin rectangle Width × Height (RectangleField × N).
func CoilField(c Coil, w Winding, I float64, p Vec) Vec {
	if I == 0 {
		return Vec{}
	}
	if math.IsNaN(I) {
		return nanVec()
	}
	fr := CoilFrame(c.Axis)
	if c.Form == Rectangle {
		return RectangleField(fr, c.Centre, c.Width, c.Height, I*float64(w.TurnCount()), p)
	}
	if c.Form == Pair {
		s := fr.U.Scale(c.Spacing / 2)
		I2 := I
		if c.Opposing {
			I2 = -I
		}
		return windingField(fr, c.Centre.Sub(s), w, I, p).Add(windingField(fr, c.Centre.Add(s), w, I2, p))
	}
	return windingField(fr, c.Centre, w, I, p)
}

// windingField sums the turn filaments of w centred on centre in frame fr.
func windingField(fr Frame, centre Vec, w Winding, I float64, p Vec) Vec {
	r := p.Sub(centre)
	z := r.Dot(fr.U)
	radial := r.Sub(fr.U.Scale(z))
	rho := radial.Norm()
	var br, bz float64
	for _, l := range w.Layers {
		zs := l.Z
		for i := 0; i < len(zs); {
			j := i + 1
			for j < len(zs) && zs[j] == zs[i] {
				j++
			}
			dr, dz := LoopField(l.Radius, I, rho, z-zs[i])
			k := float64(j - i)
			br += k * dr
			bz += k * dz
			i = j
		}
	}
	B := fr.U.Scale(bz)
	if rho > 0 {
		B = B.Add(radial.Scale(br / rho))
	}
	return B
}

// FieldModel is a design made ready for many field evaluations: every
// coil's winding laid out and its steady operating current found once.
type FieldModel struct {
	Coils    []Coil
	Windings []Winding
	Currents []float64 // A, the steady operating current of each coil block

	// sources are the coils prepared for quadrature (NewCoilSource), set
	// by NewFieldModel; a model built by hand sums every turn instead.
	sources []*CoilSource

	// series are the sources' exterior series (Multipoles), made on the
	// first call of SeriesAt.
	seriesOnce *sync.Once
	series     [][]Multipole
}

// NewFieldModel lays out every coil of d and finds its steady operating
// current (OperatingPoint: the imposed current, or for voltage drive the
// voltage over the hot resistance). The field is that of the energised
// coil; the duty cycle does not reduce it.
func NewFieldModel(d Design) *FieldModel {
	return newFieldModel(d, nil)
}

// FieldModelAt is NewFieldModel with the current of every coil block
// given, A (currents[i] for d.Coils[i]), in place of its operating point:
// the field of results already found, or of their currents scaled (the
// peak of an a.c. drive). A block without a current in currents has NaN.
func FieldModelAt(d Design, currents []float64) *FieldModel {
	if currents == nil {
		currents = []float64{}
	}
	return newFieldModel(d, currents)
}

func newFieldModel(d Design, currents []float64) *FieldModel {
	f := &FieldModel{seriesOnce: new(sync.Once)}
	for i, c := range d.Coils {
		w := LayOut(c)
		I := math.NaN()
		switch {
		case currents == nil:
			I = OperatingPoint(c, w, d.Conditions).Current
		case i < len(currents):
			I = currents[i]
		}
		f.Coils = append(f.Coils, c)
		f.Windings = append(f.Windings, w)
		f.Currents = append(f.Currents, I)
		f.sources = append(f.sources, NewCoilSource(c, w, I))
	}
	return f
}

// ForMaps returns f with its coils summed to the maps' target
// (CoilSource.ForMaps; a copy, f is unchanged). A model assembled by hand
// is returned as it is.
func (f *FieldModel) ForMaps() *FieldModel {
	m := *f
	m.seriesOnce, m.series = new(sync.Once), nil
	m.sources = make([]*CoilSource, len(f.sources))
	for i, s := range f.sources {
		m.sources[i] = s.ForMaps()
	}
	return &m
}

// At returns the field, T, of all coils at the global point p (the
// background field is not included). A model from NewFieldModel evaluates
// each coil by quadrature over its winding (CoilSource, relative error
// below 10⁻⁹); one assembled by hand sums every turn (CoilField).
func (f *FieldModel) At(p Vec) Vec {
	var B Vec
	if len(f.sources) == len(f.Coils) {
		for _, s := range f.sources {
			B = B.Add(s.At(p))
		}
		return B
	}
	for i, c := range f.Coils {
		B = B.Add(CoilField(c, f.Windings[i], f.Currents[i], p))
	}
	return B
}

// CoilAt returns the field, T, of coil i alone at the global point p, as
// At evaluates it.
func (f *FieldModel) CoilAt(i int, p Vec) Vec {
	if len(f.sources) == len(f.Coils) {
		return f.sources[i].At(p)
	}
	return CoilField(f.Coils[i], f.Windings[i], f.Currents[i], p)
}

// SeriesAt is At with every circular coil block taken from its exterior
// series (Multipole) where the series meets rel of the size of its leading
// term there (G q³, about the block's own field at p), and from its
// quadrature elsewhere (near and inside the winding, and for rectangles).
// Each block's error is then at most rel of its own field's scale, on top
// of the quadrature's where that is used.
func (f *FieldModel) SeriesAt(p Vec, rel float64) Vec {
	if len(f.sources) != len(f.Coils) {
		return f.At(p)
	}
	f.seriesOnce.Do(func() {
		f.series = make([][]Multipole, len(f.sources))
		for i, s := range f.sources {
			f.series[i] = s.Multipoles()
		}
	})
	var B Vec
	for i, s := range f.sources {
		if b, ok := seriesSum(f.series[i], p, rel); ok {
			B = B.Add(b)
			continue
		}
		B = B.Add(s.At(p))
	}
	return B
}

// seriesSum is SeriesSum with each series to rel of its leading term's
// size (G q³).
func seriesSum(mps []Multipole, p Vec, rel float64) (Vec, bool) {
	return sumSeries(mps, p, 0, rel)
}

// SeriesSum is the sum of the series mps (one block's placements) at p,
// each to the tolerance tol, T; false when there are none or one does not
// meet it.
func SeriesSum(mps []Multipole, p Vec, tol float64) (Vec, bool) {
	return sumSeries(mps, p, tol, 0)
}

func sumSeries(mps []Multipole, p Vec, tol, rel float64) (Vec, bool) {
	if len(mps) == 0 {
		return Vec{}, false
	}
	var B Vec
	for k := range mps {
		b, _, _, ok := mps[k].sum(p, tol, rel, false)
		if !ok {
			return Vec{}, false
		}
		B = B.Add(b)
	}
	return B, true
}

// Multipoles returns the exterior series of coil i (CoilSource.Multipoles)
// at its operating current; nil for a model built by hand.
func (f *FieldModel) Multipoles(i int) []Multipole {
	if len(f.sources) != len(f.Coils) {
		return nil
	}
	return f.sources[i].Multipoles()
}

// FieldAt returns the field, T, of all coils of d at the global point p,
// each at its steady operating current (see NewFieldModel), summed turn by
// turn (CoilField) as Evaluate does for the probes. For many points build
// the model once.
func FieldAt(d Design, p Vec) Vec {
	f := NewFieldModel(d)
	f.sources = nil
	return f.At(p)
}
