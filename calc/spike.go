package calc

import "math"

// SwitchOffSpike is the voltage across a switch that interrupts current I
// in inductance L within tOff with no suppression, the current falling
// linearly to zero: the coil's back-e.m.f. L·|I|/t_off on top of the
// supply,
//
//	V = L |I| / t_off + V_supply.
//
// Reference: Faraday's law for an inductor, v = L di/dt (any circuits
// text, e.g. Horowitz & Hill, The Art of Electronics, 3rd ed., §1.5 and
// §1.6.7 on inductive kick).
func SwitchOffSpike(L, I, tOff, supply float64) float64 {
	return L*math.Abs(I)/tOff + supply
}

// RingingPeak is the largest voltage, V, that can build up across a
// winding of inductance L (H) and self-capacitance C (F) when a switch
// interrupts its current I (A) with no suppression, however fast the
// switch opens. With the circuit open the winding's current has no path
// but through its own capacitance, and the magnetic energy passes into
// it, so at the peak
//
//	½ L I² = ½ C V²   →   V_peak = |I| √(L/C),
//
// the amplitude of the open-circuit L–C ringing: the current times the
// characteristic impedance √(L/C). The winding's resistance R damps the
// ringing, so the first peak stays below the bound (by about
// (π/4) R/√(L/C) for light damping); the energy ½ C (I R)² the capacitance
// holds before the switch opens, a fraction (R/√(L/C))² of the magnetic
// energy, is neglected. Across the switch the supply adds to it. The
// ramp estimate L|I|/t_off of SwitchOffSpike exceeds this bound when
// t_off < √(L C) (RingingCrossover). NaN unless L > 0 and C > 0.
//
// Reference: conservation of energy between the inductance and the
// capacitance in the natural response of a parallel RLC circuit (Nilsson
// & Riedel, Electric Circuits, the chapter on the natural and step
// responses of RLC circuits; chapter recalled from memory).
func RingingPeak(L, C, I float64) float64 {
	if !(L > 0) || !(C > 0) || math.IsInf(L, 0) || math.IsInf(C, 0) {
		return math.NaN()
	}
	return math.Abs(I) * math.Sqrt(L/C)
}

// RingingCrossover is the switch-off time, s, at which the ramp estimate
// L I/t_off (SwitchOffSpike) equals the capacitance-limited peak
// I √(L/C) (RingingPeak):
//
//	t_× = √(L C);
//
// a switch that opens faster than t_× is held to the ringing peak. NaN
// unless L > 0 and C > 0.
//
// Reference: the two estimates of SwitchOffSpike and RingingPeak set
// equal (the same sources).
func RingingCrossover(L, C float64) float64 {
	if !(L > 0) || !(C > 0) || math.IsInf(L, 0) || math.IsInf(C, 0) {
		return math.NaN()
	}
	return math.Sqrt(L * C)
}
