package calc

import "math"

// HeatResult is the thermal detail of one coil block (see thermal.go,
// convection.go and warmup.go).
type HeatResult struct {
	Problem      ThermalProblem
	Steady       ThermalState // steady state with the duty-averaged power
	Conductivity float64      // W/(m·K), effective across the turns, as used
	HeatCapacity float64      // J/K, conductor and former
	// TimeToLimit is the time, s, in which the hot spot of the coil
	// energised continuously from ambient reaches the insulation class;
	// NaN when it never does (or no class is given).
	TimeToLimit float64
	// Cycle is the periodic state of the on/off cycle when an on-time is
	// given with a duty below 100 % (NaN figures otherwise).
	Cycle Cycle
	// ColdMoment is |m| at the cold (20 °C) current; under voltage drive the
	// difference from the hot moment is the moment lost to heating.
	ColdMoment float64
}

// PracticeDensity is the current density, A/m², above which a winding in
// still air on continuous duty usually runs hot: 4 A/mm², the upper end of
// the 2–4 A/mm² commonly used for small air-cooled coils (common practice,
// not a published limit).
const PracticeDensity = 4e6

// Heating returns the thermal detail of coil block c with winding w in the
// given conditions at operating point op: the steady state, the heat
// capacity, the time to reach the insulation class when energised
// continuously, the periodic state of an on/off cycle (Coil.OnTime with
// Duty < 1) and the moment at the cold current.
func Heating(c Coil, w Winding, op Operating) HeatResult {
	n := math.NaN()
	h := HeatResult{Problem: op.Thermal, Steady: op.State, Conductivity: WindingConductivity(c),
		TimeToLimit: n, Cycle: Cycle{PeakMean: n, PeakHot: n, PeakSurface: n, Trough: n, Periods: n, AveragePow: n}, ColdMoment: n}
	h.HeatCapacity = HeatCapacity(c, w)
	h.ColdMoment = MagneticMoment(c, w, op.ColdCurrent).Norm()
	tp := op.Thermal
	if !(h.HeatCapacity > 0) || !(tp.R20 > 0) || math.IsInf(tp.R20, 0) {
		return h
	}
	if c.InsulationClass > tp.Ambient {
		h.TimeToLimit = tp.TimeToReach(h.HeatCapacity, c.InsulationClass, limitHorizon(tp, h.HeatCapacity, c.InsulationClass))
	}
	if c.OnTime > 0 && tp.Duty > 0 && tp.Duty < 1 {
		h.Cycle = tp.PeriodicCycle(h.HeatCapacity, c.OnTime)
	}
	return h
}

// limitHorizon is how long TimeToReach integrates: twenty time constants
// of the continuously energised coil when it settles, else a thousand
// times the adiabatic time to the limit from ambient.
func limitHorizon(tp ThermalProblem, C, limit float64) float64 {
	on := tp
	on.Duty = 1
	if s := on.Steady(); s.Settled {
		if tau := on.ThermalTimeConstant(C, s.Mean); tau > 0 {
			return 20 * tau
		}
	}
	p := on.PowerOn(tp.Ambient)
	if !(p > 0) {
		return math.NaN()
	}
	return 1000 * C * (limit - tp.Ambient) / p
}
