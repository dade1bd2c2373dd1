package calc

import (
	"math"
	"testing"
)

// The Churchill–Chu correlations take their powers by roots; they agree
// with math.Pow (an independent general-purpose computation) to rounding
// over Ra from 10⁻³ to 10¹³ and Pr over gases and liquids.
func TestChurchillChuRoots(t *testing.T) {
	for e := -3.0; e <= 13; e += 0.25 {
		x := math.Pow(10, e)
		if err := relErr(sixthRoot(x), math.Pow(x, 1.0/6)); err > 1e-15 {
			t.Errorf("sixthRoot(%g): relative error %g", x, err)
		}
	}
	for pr := 0.01; pr <= 1000; pr *= 1.3 {
		for _, c := range []float64{0.559, 0.492} {
			x := c / pr
			if err := relErr(prandtlFactor(x), math.Pow(1+math.Pow(x, 9.0/16), 8.0/27)); err > 1e-15 {
				t.Errorf("prandtlFactor(%g): relative error %g", x, err)
			}
		}
	}
}
