package calc

import "math"

// e12 are the twelve values of a decade of the E12 series, ×10 so that
// they are exact integers: 1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7,
// 5.6, 6.8 and 8.2, repeated in every decade (IEC 60063, Preferred number
// series for resistors and capacitors, the E12 series).
var e12 = [12]float64{10, 12, 15, 18, 22, 27, 33, 39, 47, 56, 68, 82}

// E12AtOrBelow returns the largest value of the E12 series, in any
// decade, that is not above x: the standard resistor a designer fits where
// x is the most that may be fitted. x within a part in 10⁹ of an E12
// value counts as that value (the last bits of a computed figure). NaN
// for x ≤ 0, NaN or ±Inf.
//
// Reference: IEC 60063:2015, Preferred number series for resistors and
// capacitors, Table 1 (the E12 column).
func E12AtOrBelow(x float64) float64 {
	if !(x > 0) || math.IsInf(x, 0) {
		return math.NaN()
	}
	d := int(math.Floor(math.Log10(x))) - 1 // x/10^d in [10, 100)
	scale := func(v float64, d int) float64 {
		if d < 0 {
			return v / math.Pow10(-d) // a correctly rounded 0.68, not 68 × 0.01
		}
		return v * math.Pow10(d)
	}
	// The decade above, in case the logarithm rounded down across a decade
	// boundary; then down through the values.
	for _, dd := range []int{d + 1, d, d - 1} {
		for k := len(e12) - 1; k >= 0; k-- {
			if v := scale(e12[k], dd); v <= x*(1+1e-9) {
				return v
			}
		}
	}
	return math.NaN()
}
