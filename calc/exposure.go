package calc

import "math"

// ExposureReference returns the ICNIRP reference level for exposure to a
// time-varying magnetic field of frequency f (Hz): the unperturbed r.m.s.
// magnetic flux density, T, for the general public or, with occupational
// set, for workers (ICNIRP, "Guidelines for limiting exposure to
// time-varying electric and magnetic fields (1 Hz to 100 kHz)", Health
// Physics 99 (2010) 818, Tables 3 and 4):
//
//	general public   1–8 Hz: 0.04/f²   8–25 Hz: 5×10⁻³/f   25–400 Hz: 2×10⁻⁴
//	                 400 Hz–3 kHz: 0.08/f   3 kHz–10 MHz: 2.7×10⁻⁵
//	occupational     1–8 Hz: 0.2/f²    8–25 Hz: 2.5×10⁻²/f  25–300 Hz: 1×10⁻³
//	                 300 Hz–3 kHz: 0.3/f    3 kHz–10 MHz: 1×10⁻⁴
//
// The levels join at the band edges (the public one steps by 1.2 % at 3 kHz,
// as tabulated: 0.08/f gives 26.7 µT there). Above 100 kHz the
// radio-frequency guidelines apply as well (the table's note). NaN
// outside 1 Hz–10 MHz, where these guidelines give no level (below 1 Hz
// the static guidelines, ICNIRP 2009, apply).
//
// Reference: ICNIRP (2010), Health Phys. 99(6):818–836, Table 3
// (occupational) and Table 4 (general public).
func ExposureReference(f float64, occupational bool) float64 {
	if !(f >= 1) || f > 10e6 {
		return math.NaN()
	}
	if occupational {
		switch {
		case f < 8:
			return 0.2 / (f * f)
		case f < 25:
			return 2.5e-2 / f
		case f < 300:
			return 1e-3
		case f < 3e3:
			return 0.3 / f
		default:
			return 1e-4
		}
	}
	switch {
	case f < 8:
		return 0.04 / (f * f)
	case f < 25:
		return 5e-3 / f
	case f < 400:
		return 2e-4
	case f < 3e3:
		return 0.08 / f
	default:
		return 2.7e-5
	}
}
