package analysis

import (
	"math"

	"coilmemo/calc"
	"coilmemo/spec"
)

// SweepStep is the whole design evaluated with the swept parameter at one
// value. A step whose winding does not fit is kept, marked infeasible.
type SweepStep struct {
	Value    float64 // SI
	Feasible bool
	Problem  string
	Results  calc.Results
	Limits   []LimitResult // the requirements judged at this step
	// Hottest is the hottest winding temperature over the coils, K (NaN
	// when one runs away), Power the total power, W, Current the largest
	// coil current, A, and Met the number of limits met.
	Hottest, Power, Current float64
	Met                     int
}

// RunSweep evaluates the design at every value of the spec's sweep.
func RunSweep(s *spec.Spec) []SweepStep {
	if s.Sweep == nil {
		return nil
	}
	var steps []SweepStep
	for _, v := range s.Sweep.Values() {
		d := s.Design
		d.Coils = append([]calc.Coil(nil), s.Design.Coils...)
		st := SweepStep{Value: v, Feasible: true}
		for i := range d.Coils {
			if s.Sweep.Coil != "" && d.Coils[i].Name != s.Sweep.Coil {
				continue
			}
			spec.SetCoilKey(&d.Coils[i], s.Sweep.Param, v)
			if err := calc.CheckWinding(d.Coils[i]); err != nil {
				st.Feasible, st.Problem = false, err.Error()
			}
		}
		if st.Feasible {
			st.Results = WithCores(d, calc.Evaluate(d))
			st.Limits = JudgeLimits(d, st.Results)
			st.Hottest = math.Inf(-1)
			for _, cr := range st.Results.Coils {
				st.Hottest = math.Max(st.Hottest, cr.Temperature)
				st.Power += cr.Power
				st.Current = math.Max(st.Current, math.Abs(cr.Current))
			}
			for _, l := range st.Limits {
				if l.Pass {
					st.Met++
				}
			}
		}
		steps = append(steps, st)
	}
	return steps
}
