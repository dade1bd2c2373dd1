package calc

import "math"

// Switching of an inductive load (e.g. Horowitz & Hill, The Art of
// Electronics, 3rd ed., §1.7 and §3.5 on inductive kickback; any circuit
// text on the RL transient). A coil of inductance L and resistance R
// switched onto a voltage V carries i(t) = (V/R)(1 − e^(−t/τ)), τ = L/R: it
// reaches 90 % of its final current after t₉₀ = τ ln 10. Opened by a switch
// in the time t_off, the current must still fall by I, so the coil drives
// the switch to about L·I/t_off above the supply — far beyond the ratings
// of semiconductor drivers unless a path is given to the current:
//
//   - a freewheeling diode across the coil: the switch sees only the supply
//     (plus a diode drop) and the current decays through the coil's own
//     resistance with τ = L/R, to 10 % in τ ln 10;
//   - a diode with a series resistor R_s: the switch sees the supply plus
//     I·R_s, so R_s = (V_max − V_supply)/I keeps it at a permitted V_max,
//     and the current decays with τ = L/(R + R_s), the resistor taking the
//     share R_s/(R + R_s) of the stored energy ½ L I².
//
// Diode forward drops (about 0.7 V) are neglected: they shorten the decay
// slightly and add to the switch voltage of the resistor–diode path.

// SwitchResult is the switching behaviour of one coil block.
type SwitchResult struct {
	TimeConstant float64 // s, τ = L/R at the hot resistance
	RiseTime     float64 // s, t₉₀ = τ ln 10 after a voltage step
	Energy       float64 // J, ½ L I²
	// Supply is the supply voltage taken, V: the stated voltage under
	// voltage drive, I·R at the hot resistance under current drive (the
	// least compliance a current source needs).
	Supply float64
	// SwitchOff is the stated switch-off time, s (0: not given), and Spike
	// the voltage, V, across the unsuppressed switch, L·I/t_off + Supply
	// (NaN without a switch-off time).
	SwitchOff, Spike float64
	// Clamp is the switch voltage the suppression must respect, V: the
	// driver rating when given (ClampFromRating), else twice a stated
	// supply voltage; NaN when neither is known (a current source whose
	// compliance is not stated).
	Clamp           float64
	ClampFromRating bool
	// Freewheel diode: decay time constant L/R and time to 10 %.
	DiodeDecay, DiodeTime10 float64
	// Resistor–diode: series resistor R_s (NaN when the clamp is not above
	// the supply), its decay time constant and time to 10 %, the energy it
	// absorbs.
	Resistor, ResistorDecay, ResistorTime10, ResistorEnergy float64
}

// Switching returns the switching figures of a coil block of inductance L
// (H) and hot resistance R (Ω) carrying I (A) from a supply of V (V), with
// switch-off time tOff (s, 0: not given) and driver rating rating (V, 0:
// not given); stated says the supply voltage is a stated one (voltage
// drive) rather than I·R (current drive), and only a stated one sets the
// default clamp of twice the supply. Unknown values are NaN.
func Switching(L, R, I, V, tOff, rating float64, stated bool) SwitchResult {
	n := math.NaN()
	s := SwitchResult{TimeConstant: n, RiseTime: n, Energy: n, Supply: math.Abs(V), Spike: n, Clamp: n,
		DiodeDecay: n, DiodeTime10: n, Resistor: n, ResistorDecay: n, ResistorTime10: n, ResistorEnergy: n}
	I = math.Abs(I)
	s.Energy = L * I * I / 2
	if R > 0 && !math.IsInf(R, 0) {
		s.TimeConstant = L / R
		s.RiseTime = math.Ln10 * s.TimeConstant
		s.DiodeDecay, s.DiodeTime10 = s.TimeConstant, s.RiseTime
	}
	if tOff > 0 {
		s.SwitchOff = tOff
		s.Spike = L*I/tOff + s.Supply
	}
	switch {
	case rating > 0:
		s.Clamp, s.ClampFromRating = rating, true
	case stated:
		s.Clamp = 2 * s.Supply
	}
	if s.Clamp > s.Supply && I > 0 && R >= 0 {
		s.Resistor = (s.Clamp - s.Supply) / I
		s.ResistorDecay = L / (R + s.Resistor)
		s.ResistorTime10 = math.Ln10 * s.ResistorDecay
		s.ResistorEnergy = s.Energy * s.Resistor / (R + s.Resistor)
	}
	return s
}
