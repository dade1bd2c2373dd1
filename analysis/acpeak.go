package analysis

import (
	"math"
	"slices"

	"coilmemo/calc"
)

// resultCurrents are the currents, A, that r gives the coil blocks of d
// (NaN for a block r does not hold).
func resultCurrents(d calc.Design, r calc.Results) []float64 {
	currents := make([]float64, len(d.Coils))
	for i := range currents {
		currents[i] = math.NaN()
		if i < len(r.Coils) {
			currents[i] = r.Coils[i].Current
		}
	}
	return currents
}

// acPeakResults are the results the 0.5 mT level is searched at: r with
// the current and moment of every a.c.-driven coil block that carries one
// set to their peak, √2 times the r.m.s. (calc.ACPeak), and coils with the
// pole charges of such a block's core scaled alike (the core taken as
// linear: one driven into saturation gives less, so the search stays on
// the safe side). The blocks' fields are so taken at one instant, as from
// one source in phase; peak reports whether any block was scaled. r and
// coils themselves are left unchanged.
func acPeakResults(d calc.Design, r calc.Results, coils []CoilStudy) (calc.Results, []CoilStudy, bool) {
	peak := false
	var rc []calc.CoilResult
	var cs []CoilStudy
	for i, co := range d.Coils {
		if i >= len(r.Coils) || IsReceiver(co) {
			continue
		}
		cr := r.Coils[i]
		I, _, _ := calc.ACPeak(co, cr.Current, cr.Current, 0, 0, 0)
		if I == cr.Current || cr.Current == 0 || math.IsNaN(I) {
			continue
		}
		if !peak {
			peak = true
			rc = slices.Clone(r.Coils)
			cs = slices.Clone(coils)
		}
		s := I / cr.Current
		rc[i].Current, rc[i].Moment = I, cr.Moment.Scale(s)
		if i < len(cs) && cs[i].Kinds.Core != nil {
			k := *cs[i].Kinds.Core
			k.Charge = slices.Clone(k.Charge)
			for j := range k.Charge {
				k.Charge[j] *= s
			}
			cs[i].Kinds.Core = &k
		}
	}
	if !peak {
		return r, coils, false
	}
	r.Coils = rc
	return r, cs, true
}
