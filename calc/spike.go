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
