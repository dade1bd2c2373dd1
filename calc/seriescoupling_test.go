package calc

import (
	"math"
	"testing"
)

// TestSeriesCouplingMatchesTurnSum checks the coupling through a's
// exterior series (seriesCoupling) against the definition: Neumann's
// mutual inductance and the Lorentz force summed over every pair of turns
// (FilamentMutual, FilamentForce: the loop's elliptic-integral potential
// and field on 256 points), on the separated arrangements of the rules,
// where the series applies, with both blocks in either role.
func TestSeriesCouplingMatchesTurnSum(t *testing.T) {
	applied := 0
	for _, tc := range separatedCases() {
		for _, swap := range []bool{false, true} {
			a, b := tc.a, tc.b
			if swap {
				a, b = b, a
			}
			wa, wb := LayOut(a), LayOut(b)
			M, F, ok := seriesCoupling(a, wa, 0.7, b, wb, 0.3)
			if !ok {
				t.Logf("%s (swapped %v): the series does not reach b", tc.name, swap)
				continue
			}
			applied++
			ref, refF := turnSumCoupling(a, wa, b, wb)
			eM, eF := math.Abs(M-ref)/math.Abs(ref), F.Sub(refF).Norm()/refF.Norm()
			t.Logf("%s (swapped %v): M rel %.2g, F rel %.2g", tc.name, swap, eM, eF)
			if !(eM < 1e-8) {
				t.Errorf("%s (swapped %v): M = %.12g H, turn sum %.12g H: relative error %.2g", tc.name, swap, M, ref, eM)
			}
			if !(eF < 1e-8) {
				t.Errorf("%s (swapped %v): F = %v N, turn sum %v N: relative error %.2g", tc.name, swap, F, refF, eF)
			}
		}
	}
	if applied < 8 {
		t.Errorf("the series applied to only %d of the 12 arrangements", applied)
	}
}
