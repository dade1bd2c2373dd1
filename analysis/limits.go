package analysis

import (
	"math"

	"coilmemo/calc"
)

// Tested says what a limit was judged on.
type Tested int

// What a limit can be judged on.
const (
	OnDesign Tested = iota // all coils together (a total, the largest, or the vector sum)
	OnCoil                 // one coil block alone
	OnProbe                // the field of all coils at one probe
)

// LimitResult is one requirement judged: its computed value, SI, and what
// it was computed for.
type LimitResult struct {
	calc.LimitResult
	On    Tested
	Coil  int // index of the coil block for OnCoil, else −1
	Probe int // index of the probe for OnProbe, else −1
}

// JudgeLimits computes every requirement's value (LimitValue) and judges
// it: AtLeast passes when computed ≥ required, AtMost when computed ≤
// required. An unknown (NaN) computed value never passes.
func JudgeLimits(d calc.Design, r calc.Results) []LimitResult {
	var out []LimitResult
	for _, l := range d.Limits {
		lr := LimitResult{LimitResult: calc.LimitResult{Limit: l}, Coil: -1, Probe: -1}
		lr.On, lr.Coil, lr.Probe = subjectOf(l, d)
		v := LimitValue(l, d, r)
		switch l.Relation {
		case calc.AtLeast:
			lr.Pass = v >= l.Required
		case calc.AtMost:
			lr.Pass = v <= l.Required
		}
		lr.Computed = v
		out = append(out, lr)
	}
	return out
}

// subjectOf finds what limit l is about: a coil block, a probe or the
// design. A limit that needs one coil (gradient, uniform radius) is about
// the only coil of a one-coil design.
func subjectOf(l calc.Limit, d calc.Design) (Tested, int, int) {
	if l.Subject == "" {
		if (l.Quantity == "gradient" || l.Quantity == "uniform-radius") && len(d.Coils) == 1 {
			return OnCoil, 0, -1
		}
		return OnDesign, -1, -1
	}
	for i, c := range d.Coils {
		if c.Name == l.Subject {
			return OnCoil, i, -1
		}
	}
	for i, p := range d.Probes {
		if p.Name == l.Subject {
			return OnProbe, -1, i
		}
	}
	return OnDesign, -1, -1
}

// LimitValue returns the computed value, SI, of limit l's quantity for its
// subject. For the design as a whole: moment |Σ m| (A·m²); field-center
// and field |B(0)| of all coils (T); power and power-on the sums (W);
// temperature and surface-temperature the hottest (K, absolute); current,
// voltage, resistance (hot), wire-length, current-density, inductance,
// time-constant and switch-off-voltage the largest over the coil blocks;
// mass the total (kg); torque TorqueMax (N·m). For one coil block, the
// same quantity of that block alone (field-center and field at its own
// centre; torque of its moment in the background field); for a probe, |B|
// of all coils there. A quantity unknown for any coil it covers (NaN, e.g.
// a runaway temperature) makes the value NaN. The quantities of cored and
// pick-up coils and a.c. windings are KindLimitValue's. r are the results
// with the cores (WithCores).
func LimitValue(l calc.Limit, d calc.Design, r calc.Results) float64 {
	if v, ok := kindLimit(l, d, r); ok { // cored and pick-up quantities: analysis/core.go
		return v
	}
	on, ci, pi := subjectOf(l, d)
	if on == OnProbe {
		if l.Quantity == "field" && pi < len(r.Probes) {
			return r.Probes[pi].B.Norm()
		}
		return math.NaN()
	}
	coils := r.Coils
	if on == OnCoil {
		if ci >= len(r.Coils) {
			return math.NaN()
		}
		coils = r.Coils[ci : ci+1]
	}
	maxOf := func(f func(calc.CoilResult) float64) float64 {
		v := math.Inf(-1)
		if len(coils) == 0 {
			return 0
		}
		for _, c := range coils {
			x := f(c)
			if math.IsNaN(x) {
				return math.NaN()
			}
			v = math.Max(v, x)
		}
		return v
	}
	sumOf := func(f func(calc.CoilResult) float64) float64 {
		s := 0.0
		for _, c := range coils {
			s += f(c)
		}
		return s
	}
	switch l.Quantity {
	case "moment":
		if on == OnCoil {
			return coils[0].Moment.Norm()
		}
		return r.Moment.Norm()
	case "field-center", "field":
		if on == OnCoil {
			return coils[0].FieldCentre.Norm()
		}
		return r.FieldCentre.Norm()
	case "torque":
		if on == OnCoil {
			return calc.TorqueMax(coils[0].Moment, d.Conditions.BackgroundField)
		}
		return r.TorqueMax
	case "gradient":
		if on != OnCoil {
			return math.NaN()
		}
		return math.Abs(coils[0].Pair.Gradient)
	case "uniform-radius":
		if on != OnCoil {
			return math.NaN()
		}
		cr := coils[0]
		ax, ra := calc.Homogeneity(d.Coils[ci], cr.Winding, cr.Current, l.Tolerance)
		return math.Min(ax, ra)
	case "power":
		return sumOf(func(c calc.CoilResult) float64 { return c.Power })
	case "power-on":
		return sumOf(func(c calc.CoilResult) float64 { return c.PowerOn })
	case "temperature":
		return maxOf(func(c calc.CoilResult) float64 { return c.Temperature })
	case "surface-temperature":
		return maxOf(func(c calc.CoilResult) float64 {
			if c.Verdict.NoSolution {
				return math.NaN()
			}
			return surfaceMax(c.Heat)
		})
	case "current":
		return maxOf(func(c calc.CoilResult) float64 { return math.Abs(c.Current) })
	case "voltage":
		return maxOf(func(c calc.CoilResult) float64 { return math.Abs(c.Voltage) })
	case "resistance":
		return maxOf(func(c calc.CoilResult) float64 { return c.RHot })
	case "mass":
		return sumOf(func(c calc.CoilResult) float64 { return c.Mass })
	case "wire-length":
		return maxOf(func(c calc.CoilResult) float64 { return c.Length })
	case "current-density":
		return maxOf(func(c calc.CoilResult) float64 { return math.Abs(c.Density) })
	case "inductance":
		return maxOf(func(c calc.CoilResult) float64 { return c.Inductance })
	case "time-constant":
		return maxOf(func(c calc.CoilResult) float64 { return c.TimeConstant })
	case "switch-off-voltage":
		return maxOf(func(c calc.CoilResult) float64 { return switchVoltage(c) })
	}
	return math.NaN()
}

// surfaceMax is the hottest surface temperature of a coil block: the
// steady one, or the hottest over the periodic state of its on/off cycle
// (calc.Cycle.PeakSurface), K.
func surfaceMax(h calc.HeatResult) float64 {
	ts, _ := surfaceMaxOf(h)
	return ts
}

// surfaceMaxOf is surfaceMax, and whether the on/off cycle's periodic
// state gives it.
func surfaceMaxOf(h calc.HeatResult) (ts float64, cycle bool) {
	ts = h.Steady.Surface
	if cy := h.Cycle; cy.On > 0 && cy.Settled && cy.PeakSurface > ts {
		return cy.PeakSurface, true
	}
	return ts, false
}

// switchVoltage is the voltage across the switch when the coil is switched
// off with no suppression: at the stated switch-off time, or at
// AssumedSwitchOff when none is stated; the supply alone for a coil with
// no inductance.
func switchVoltage(c calc.CoilResult) float64 {
	s := c.Switch
	if s.SwitchOff > 0 {
		if !math.IsNaN(s.SpikeWorst) {
			return s.SpikeWorst // at the largest current the switch may open
		}
		return s.Spike
	}
	if math.IsNaN(c.Inductance) {
		return math.NaN()
	}
	I := c.Current
	if w := s.WorstCurrent; w > math.Abs(I) {
		I = w
	}
	return calc.SwitchOffSpike(c.Inductance, I, AssumedSwitchOff, s.Supply)
}
