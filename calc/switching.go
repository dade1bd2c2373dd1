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
//     I·R_s, so R_s ≤ (V_max − V_supply)/I keeps it within a permitted
//     V_max; the standard value fitted is the E12 value at or below that
//     maximum (E12AtOrBelow), which leaves the switch a margin below V_max,
//     and the current decays with τ = L/(R + R_s), the resistor taking the
//     share R_s/(R + R_s) of the stored energy ½ L I².
//
// Diode forward drops (about 0.7 V) are neglected: they shorten the decay
// slightly and add to the switch voltage of the resistor–diode path.
//
// The suppression is sized at the largest current the switch can have to
// open: the switch-on current of the cold winding (V/R at the coldest
// winding temperature, OperatingPoint's SwitchOnCurrent) under voltage
// drive — a coil switched off before it has warmed carries more than its
// hot current —, the imposed current under current drive. The switch
// voltage with the suggested suppression at that current is given as a
// number, SwitchVoltage, and compared with the driver rating.

// SwitchResult is the switching behaviour of one coil block.
type SwitchResult struct {
	TimeConstant float64 // s, τ = L/R at the hot resistance
	RiseTime     float64 // s, t₉₀ = τ ln 10 after a voltage step
	Energy       float64 // J, ½ L I²
	// Current is I, A, the current the switch opens at the operating
	// point (an a.c. drive's peak, SwitchingFor).
	Current float64
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
	// Resistor–diode: ResistorMax is the largest series resistor that
	// keeps the switch within the clamp at WorstCurrent, (Clamp −
	// Supply)/WorstCurrent (NaN when the clamp is not above the supply),
	// and Resistor the standard one fitted, the E12 value at or below it
	// (E12AtOrBelow); with Resistor: its decay time constant and time to
	// 10 % and the energy it absorbs when opened at the operating point
	// (R, I); and, opened cold at the worst current, the (slower) decay
	// L/(R_w + R_s) and the energy ½ L I_w² R_s/(R_w + R_s).
	ResistorMax                                             float64
	Resistor, ResistorDecay, ResistorTime10, ResistorEnergy float64
	ResistorDecayCold, ResistorEnergyWorst                  float64

	// WorstCurrent is the largest current the switch opens, A (see the file
	// comment), and SpikeWorst the unsuppressed switch voltage at it,
	// L·I_w/t_off + Supply (NaN without a switch-off time), and
	// EnergyWorst the energy stored at it, ½ L I_w², J.
	WorstCurrent, SpikeWorst, EnergyWorst float64
	// SwitchVoltage is the voltage, V, across the opening switch at
	// WorstCurrent with the suggested suppression: Supply + I·R_s with the
	// resistor–diode path and the E12 resistor (at most the clamp, by
	// construction), the supply alone
	// with a bare freewheeling diode when no clamp above the supply is
	// known; NaN when nothing is known.
	SwitchVoltage float64
	// WithinRating says SwitchVoltage ≤ the driver rating (false when no
	// rating is given or SwitchVoltage is unknown); RatingMargin is
	// rating − SwitchVoltage, V (NaN without a rating).
	WithinRating bool
	RatingMargin float64
	// ColdResistance is the winding's resistance when the switch opens
	// WorstCurrent, Ω (the cold one under voltage drive): the resistance
	// the cold decay and the worst energy split are taken at.
	ColdResistance float64
}

// Switching returns the switching figures of a coil block of inductance L
// (H) and hot resistance R (Ω) carrying I (A) from a supply of V (V), with
// switch-off time tOff (s, 0: not given) and driver rating rating (V, 0:
// not given); stated says the supply voltage is a stated one (voltage
// drive) rather than I·R (current drive), and only a stated one sets the
// default clamp of twice the supply. The switch is taken to open the
// current I itself; SwitchingWorst sizes the suppression at a larger one.
// Unknown values are NaN.
func Switching(L, R, I, V, tOff, rating float64, stated bool) SwitchResult {
	return SwitchingWorst(L, R, R, I, I, V, tOff, rating, stated)
}

// SwitchingWorst is Switching with the suppression sized at the worst
// current Iw (A) the switch may open, the winding then at resistance Rw
// (Ω, the cold one): the unsuppressed spike L·Iw/t_off + V (SpikeWorst;
// Spike stays at the operating current I), the largest resistor
// (V_max − V)/Iw and the E12 resistor R_s at or below it, its cold decay
// L/(Rw + R_s) and energy ½ L Iw² · R_s/(Rw + R_s), and the switch
// voltage V + Iw·R_s compared with the rating. The time constant, rise time, freewheeling decay and the
// resistor's decay and energy at the operating point are those of (R, I). A worst current below I, or not a number, is
// replaced by I.
func SwitchingWorst(L, R, Rw, I, Iw, V, tOff, rating float64, stated bool) SwitchResult {
	n := math.NaN()
	s := SwitchResult{TimeConstant: n, RiseTime: n, Energy: n, Supply: math.Abs(V), Spike: n, Clamp: n,
		DiodeDecay: n, DiodeTime10: n, ResistorMax: n, Resistor: n, ResistorDecay: n, ResistorTime10: n, ResistorEnergy: n,
		SwitchVoltage: n, RatingMargin: n, SpikeWorst: n, ResistorDecayCold: n, ResistorEnergyWorst: n}
	I = math.Abs(I)
	Iw = math.Abs(Iw)
	if !(Iw >= I) {
		Iw, Rw = I, R
	}
	if !(Rw >= 0) || math.IsInf(Rw, 0) {
		Rw = R
	}
	s.WorstCurrent, s.Current = Iw, I
	s.Energy = L * I * I / 2
	s.EnergyWorst = L * Iw * Iw / 2
	if R > 0 && !math.IsInf(R, 0) {
		s.TimeConstant = L / R
		s.RiseTime = math.Ln10 * s.TimeConstant
		s.DiodeDecay, s.DiodeTime10 = s.TimeConstant, s.RiseTime
	}
	if tOff > 0 {
		s.SwitchOff = tOff
		s.Spike = L*I/tOff + s.Supply
		s.SpikeWorst = L*Iw/tOff + s.Supply
	}
	switch {
	case rating > 0:
		s.Clamp, s.ClampFromRating = rating, true
	case stated:
		s.Clamp = 2 * s.Supply
	}
	s.ColdResistance = Rw
	rs := n
	if s.Clamp > s.Supply && Iw > 0 && Rw >= 0 && !math.IsNaN(E12AtOrBelow((s.Clamp-s.Supply)/Iw)) {
		s.ResistorMax = (s.Clamp - s.Supply) / Iw
		rs = E12AtOrBelow(s.ResistorMax)
	}
	return s.WithResistor(L, R, rs)
}

// WithResistor returns s with the series resistor of the resistor–diode
// suppression fixed at Rs, Ω (NaN: none, a bare freewheeling diode), for a
// coil of inductance L (H) and hot resistance R (Ω): the resistor's decay
// L/(R + R_s), its time to 10 %, the energy it absorbs at the operating
// point and, opened cold at WorstCurrent, L/(R_w + R_s) and
// ½ L I_w² R_s/(R_w + R_s) (R_w = ColdResistance), the switch voltage
// Supply + I_w·R_s and its margin to the rating. ResistorMax, the largest
// resistor s itself allows, is kept: a resistor fitted for several
// operating points (the corners of a tolerance study) may lie below the E12
// value at or below it. With a resistor, the switch voltage is held to
// the clamp only against the last bit of rounding (Rs within a part in 10⁹
// of ResistorMax).
func (s SwitchResult) WithResistor(L, R, Rs float64) SwitchResult {
	n := math.NaN()
	s.Resistor, s.ResistorDecay, s.ResistorTime10, s.ResistorEnergy = n, n, n, n
	s.ResistorEnergyWorst, s.ResistorDecayCold = n, n
	s.SwitchVoltage, s.WithinRating, s.RatingMargin = n, false, n
	Iw, Rw := s.WorstCurrent, s.ColdResistance
	if Rs >= 0 && !math.IsInf(Rs, 0) && Iw > 0 {
		s.Resistor = Rs
		s.ResistorDecay = L / (R + Rs)
		s.ResistorTime10 = math.Ln10 * s.ResistorDecay
		s.ResistorEnergy = s.Energy * Rs / (R + Rs)
		s.ResistorEnergyWorst = L * Iw * Iw / 2 * Rs / (Rw + Rs)
		s.ResistorDecayCold = L / (Rw + Rs)
		s.SwitchVoltage = s.Supply + Iw*Rs
		if Rs <= s.ResistorMax*(1+1e-9) {
			// At most Supply + Iw·(Clamp − Supply)/Iw, the clamp; kept so
			// against the last bit of rounding when the maximum is itself
			// an E12 value.
			s.SwitchVoltage = math.Min(s.SwitchVoltage, s.Clamp)
		}
	} else if !math.IsNaN(s.Supply) && !math.IsInf(s.Supply, 0) && Iw >= 0 {
		// A freewheeling diode alone: the switch sees the supply.
		s.SwitchVoltage = s.Supply
	}
	if s.ClampFromRating {
		s.RatingMargin = s.Clamp - s.SwitchVoltage
		s.WithinRating = s.SwitchVoltage <= s.Clamp
	}
	return s
}
