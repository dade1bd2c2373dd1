package analysis

import (
	"math"

	"coilmemo/calc"
)

// AxisSet is what the memo shows of a set of driven coils whose axes are
// not all parallel (a three-axis magnetorquer set, say): each coil's
// moment vector and the coupling coefficients between them.
//
// Coils are the indexes of the driven coil blocks, in spec order;
// Moments[k] is the moment vector of Coils[k] alone at its operating
// current, A·m². K[a][b] is the coupling coefficient
// k = M/√(L_a L_b) of Coils[a] and Coils[b] (calc.Coupling.K: exact for
// coaxial circles, Neumann's double line integral for others), NaN where
// none is computed (a rectangle, overlapping windings) and 1 on the
// diagonal. Skew[a][b] is the angle between the two moments, degrees.
// Cross is the largest |k| off the diagonal (NaN when none is known).
type AxisSet struct {
	Coils   []int
	Moments []calc.Vec
	K       [][]float64
	Skew    [][]float64
	Cross   float64
}

// parallelAxes is the tolerance on |cos| of the angle between two axes
// taken as parallel (or opposite).
const parallelAxes = 1e-9

// axisSet returns the AxisSet of d's driven coils, nil unless there are
// two or more with axes not all parallel.
func axisSet(d calc.Design, r calc.Results) *AxisSet {
	var idx []int
	for i, co := range d.Coils {
		if i < len(r.Coils) && !IsReceiver(co) {
			idx = append(idx, i)
		}
	}
	if len(idx) < 2 {
		return nil
	}
	skew := false
	u0 := d.Coils[idx[0]].Axis.Unit()
	if u0 == (calc.Vec{}) {
		u0 = calc.Vec{0, 0, 1}
	}
	for _, i := range idx[1:] {
		u := d.Coils[i].Axis.Unit()
		if u == (calc.Vec{}) {
			u = calc.Vec{0, 0, 1}
		}
		if math.Abs(math.Abs(u.Dot(u0))-1) > parallelAxes {
			skew = true
		}
	}
	if !skew {
		return nil
	}
	n := len(idx)
	as := &AxisSet{Coils: idx, Cross: math.NaN()}
	pos := map[int]int{}
	for k, i := range idx {
		pos[i] = k
		as.Moments = append(as.Moments, r.Coils[i].Moment)
	}
	as.K, as.Skew = make([][]float64, n), make([][]float64, n)
	for a := range n {
		as.K[a], as.Skew[a] = make([]float64, n), make([]float64, n)
		for b := range n {
			as.K[a][b] = math.NaN()
			ma, mb := as.Moments[a], as.Moments[b]
			as.Skew[a][b] = math.NaN()
			if na, nb := ma.Norm(), mb.Norm(); na > 0 && nb > 0 {
				c := math.Max(-1, math.Min(1, ma.Dot(mb)/(na*nb)))
				as.Skew[a][b] = math.Acos(c) * 180 / math.Pi
			}
		}
		as.K[a][a] = 1
	}
	for _, cp := range r.Couplings {
		a, okA := pos[cp.A]
		b, okB := pos[cp.B]
		if !okA || !okB {
			continue
		}
		as.K[a][b], as.K[b][a] = cp.K, cp.K
		if !math.IsNaN(cp.K) && !(math.Abs(cp.K) <= as.Cross) {
			as.Cross = math.Abs(cp.K)
		}
	}
	return as
}
