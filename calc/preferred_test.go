package calc

import (
	"math"
	"testing"
)

// The E12 series of IEC 60063:2015, Preferred number series for resistors
// and capacitors, Table 1, E12 column (values recalled from memory): one
// decade.
var iecE12 = []float64{1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2}

func TestE12AtOrBelow(t *testing.T) {
	for _, decade := range []float64{0.01, 1, 10, 100, 1e3, 1e6} {
		for k, v := range iecE12 {
			x := v * decade
			// A series value is its own choice.
			checkRel(t, "E12 value itself", E12AtOrBelow(x), x, 1e-15)
			// Just below it, the value before (the last of the decade below
			// for 1.0).
			below := iecE12[len(iecE12)-1] * decade / 10
			if k > 0 {
				below = iecE12[k-1] * decade
			}
			checkRel(t, "just below an E12 value", E12AtOrBelow(x*(1-1e-6)), below, 1e-15)
			// Halfway to the next value, still this one.
			next := 10 * decade
			if k+1 < len(iecE12) {
				next = iecE12[k+1] * decade
			}
			checkRel(t, "between two E12 values", E12AtOrBelow((x+next)/2), x, 1e-15)
		}
	}
	// The valve actuator's computed maximum, (60 V − 24 V)/0.4457 A =
	// 80.8 Ω: 68 Ω (82 Ω would exceed it).
	checkRel(t, "80.8 Ω", E12AtOrBelow(36/0.4457), 68, 0)
	// Over six decades every choice is a series value at or below its
	// argument, with no series value between the two.
	for x := 0.013; x < 2e4; x *= 1.0137 {
		got := E12AtOrBelow(x)
		if !(got <= x) {
			t.Errorf("E12AtOrBelow(%g) = %g, above it", x, got)
		}
		listed := false
		for _, decade := range []float64{0.001, 0.01, 0.1, 1, 10, 100, 1e3, 1e4, 1e5} {
			for _, v := range iecE12 {
				listed = listed || relErr(got, v*decade) < 1e-12
				if w := v * decade; w > got*(1+1e-12) && w <= x {
					t.Errorf("E12AtOrBelow(%g) = %g, but %g lies between", x, got, w)
				}
			}
		}
		if !listed {
			t.Errorf("E12AtOrBelow(%g) = %g is not an E12 value", x, got)
		}
	}
	for _, bad := range []float64{0, -5, math.NaN(), math.Inf(1)} {
		if !math.IsNaN(E12AtOrBelow(bad)) {
			t.Errorf("E12AtOrBelow(%g) is not NaN", bad)
		}
	}
}
