package analysis

import (
	"math"

	"coilmemo/calc"
)

// SwitchOffParts is the unsuppressed switch-off spike of a driven coil
// block at the largest current the switch may open (calc.SwitchResult's
// WorstCurrent, or the operating current where that is larger), bounded
// two ways: by how fast the switch opens, the ramp estimate L·I/t_off on
// top of the supply (calc.SwitchOffSpike), and, however fast it opens, by
// the winding's self-capacitance taking up the stored energy, I·√(L/C_s)
// on top of the supply (calc.RingingPeak). The smaller governs. NaN where
// a figure is unknown (no current, no inductance, a form whose
// self-capacitance is not modelled).
type SwitchOffParts struct {
	// Current is the current the switch opens, A, and Capacitance the
	// winding's self-capacitance C_s, F (CoilKinds.SelfCapacitance).
	Current, Capacitance float64
	// Ringing is the capacitance-limited peak across the winding,
	// I √(L/C_s), V, and RingingSwitch the switch's, Supply + Ringing.
	Ringing, RingingSwitch float64
	// Crossover is √(L C_s), s: a switch that opens faster is held to
	// RingingSwitch (calc.RingingCrossover).
	Crossover float64
	// SwitchOff is the switch-off time the ramp is taken at, s: the stated
	// one, or AssumedSwitchOff when none is stated (Assumed).
	SwitchOff float64
	Assumed   bool
	// Ramp is L I/t_off + Supply at SwitchOff, V (switchVoltage).
	Ramp float64
	// Peak is the spike across the switch the memo and the safety finding
	// quote, V: the smaller of Ramp and RingingSwitch, Ramp where the
	// capacitance is unknown; Bounded says the capacitance governs
	// (RingingSwitch < Ramp).
	Peak    float64
	Bounded bool
}

// switchOffParts is the SwitchOffParts of coil block c with (cored)
// results cr and winding self-capacitance cs, F.
func switchOffParts(c calc.Coil, cr calc.CoilResult, cs float64) SwitchOffParts {
	n := math.NaN()
	s := cr.Switch
	p := SwitchOffParts{Current: n, Capacitance: n, Ringing: n, RingingSwitch: n, Crossover: n, SwitchOff: s.SwitchOff, Ramp: n, Peak: n}
	I := math.Max(math.Abs(cr.Current), math.Abs(s.WorstCurrent))
	if !(I > 0) || math.IsNaN(cr.Inductance) {
		return p
	}
	p.Current, p.Capacitance = I, cs
	if !(p.SwitchOff > 0) {
		p.SwitchOff, p.Assumed = AssumedSwitchOff, true
	}
	p.Ramp = switchVoltage(cr)
	p.Ringing = calc.RingingPeak(cr.Inductance, cs, I)
	p.RingingSwitch = s.Supply + p.Ringing
	p.Crossover = calc.RingingCrossover(cr.Inductance, cs)
	p.Peak = p.Ramp
	if p.RingingSwitch < p.Ramp {
		p.Peak, p.Bounded = p.RingingSwitch, true
	}
	return p
}
