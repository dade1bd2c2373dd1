package analysis

import "math"

// nbsCopper20C is the resistance of annealed copper wire at 20 °C in ohms
// per 1000 ft by AWG size, from NBS Handbook 100, Copper Wire Tables (1966),
// Table 1. AWG 24 and 30 are as quoted in the project's requirements; the
// other entries are recalled from memory of that table and were
// cross-checked against the ASTM B258 diameter rule with the IEC 60028
// resistivity (they agree to the table's four figures).
var nbsCopper20C = map[int]float64{
	10: 0.9989,
	12: 1.588,
	14: 2.525,
	16: 4.016,
	18: 6.385,
	20: 10.15,
	22: 16.14,
	24: 25.67,
	26: 40.81,
	28: 64.90,
	30: 103.2,
	32: 164.1,
	34: 260.9,
	36: 414.8,
	38: 659.6,
	40: 1049,
}

const nbsSource = "NBS Handbook 100 (1966), Table 1"

// ohmsPer1000ftToSI converts Ω/1000 ft to Ω/m (1 ft = 0.3048 m exactly).
const ohmsPer1000ftToSI = 1 / 304.8

// groverNagaoka is Nagaoka's coefficient k_N of a single-layer coil
// (current sheet) against its length/diameter ratio ℓ/D = 0, 0.01, …, 1.00:
// the second part of Table 36 of F. W. Grover, Inductance Calculations:
// Working Formulas and Tables (1946; Dover reprint 1962/1973), whose
// argument is b/2a (length over diameter), six decimals as printed. The
// values are copied from the printed table, not recalled from memory and
// not computed here; the first part of the table (argument
// 2a/b, for coils longer than their diameter) is not embedded.
// TestGroverTableAgreesWithNagaoka checks every entry against
// calc.NagaokaCoefficient: they agree within two units of the sixth
// decimal (Grover's last place is not always exact).
var groverNagaoka = [101]float64{
	0.000000, 0.034960, 0.061098, 0.083907, 0.104562, 0.123615, 0.141395, 0.158119, 0.173942, 0.188980, // 0.00–0.09
	0.203324, 0.217044, 0.230200, 0.242842, 0.255011, 0.266744, 0.278070, 0.289019, 0.299614, 0.309876, // 0.10–0.19
	0.319825, 0.329479, 0.338852, 0.347960, 0.356816, 0.365432, 0.373818, 0.381986, 0.389944, 0.397703, // 0.20–0.29
	0.405269, 0.412650, 0.419856, 0.426890, 0.433762, 0.440474, 0.447036, 0.453450, 0.459724, 0.465860, // 0.30–0.39
	0.471865, 0.477742, 0.483496, 0.489129, 0.494646, 0.500052, 0.505348, 0.510539, 0.515628, 0.520617, // 0.40–0.49
	0.525510, 0.530310, 0.535018, 0.539637, 0.544170, 0.548620, 0.552988, 0.557278, 0.561491, 0.565628, // 0.50–0.59
	0.569691, 0.573683, 0.577606, 0.581462, 0.585252, 0.588976, 0.592638, 0.596239, 0.599780, 0.603263, // 0.60–0.69
	0.606689, 0.610060, 0.613376, 0.616639, 0.619850, 0.623011, 0.626122, 0.629185, 0.632200, 0.635170, // 0.70–0.79
	0.638094, 0.640974, 0.643811, 0.646605, 0.649358, 0.652070, 0.654743, 0.657376, 0.659972, 0.662532, // 0.80–0.89
	0.665054, 0.667540, 0.669991, 0.672408, 0.674792, 0.677142, 0.679460, 0.681747, 0.684003, 0.686228, // 0.90–0.99
	0.688423, // 1.00
}

const groverSource = "Grover (1946), Table 36"

// groverStep is the spacing of groverNagaoka's argument ℓ/D.
const groverStep = 0.01

// groverPrecision is the absolute uncertainty of a table entry: two units
// of the sixth decimal.
const groverPrecision = 2e-6

// groverInterpolate returns k_N at ℓ/D = x from groverNagaoka by
// three-point (quadratic) interpolation, and an estimate of the
// interpolation error (its difference from two-point linear
// interpolation). ok is false outside the table (x < 0.02 or x > 1, the
// bottom of the table being too curved to interpolate).
func groverInterpolate(x float64) (k, errEst float64, ok bool) {
	if !(x >= 2*groverStep) || x > 1 {
		return 0, 0, false
	}
	t := x / groverStep
	i := int(math.Floor(t))
	if i >= len(groverNagaoka)-1 {
		i = len(groverNagaoka) - 2
	}
	// nodes i-1, i, i+1 (i+1 ≤ 100)
	j := max(i, 1)
	if j+1 > len(groverNagaoka)-1 {
		j = len(groverNagaoka) - 2
	}
	y0, y1, y2 := groverNagaoka[j-1], groverNagaoka[j], groverNagaoka[j+1]
	u := t - float64(j) // in [-1, 1]
	k = y1 + u*(y2-y0)/2 + u*u*(y2-2*y1+y0)/2
	f := t - float64(i)
	lin := groverNagaoka[i] + f*(groverNagaoka[i+1]-groverNagaoka[i])
	return k, math.Abs(k - lin), true
}
