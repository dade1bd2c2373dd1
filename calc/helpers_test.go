package calc

import (
	"math"
	"testing"
)

// relErr returns |got − want| / |want| (|got − want| when want is 0).
func relErr(got, want float64) float64 {
	if want == 0 {
		return math.Abs(got)
	}
	return math.Abs(got-want) / math.Abs(want)
}

// vecRelErr returns |got − want| / |want|.
func vecRelErr(got, want Vec) float64 {
	n := want.Norm()
	if n == 0 {
		return got.Norm()
	}
	return got.Sub(want).Norm() / n
}

func checkRel(t *testing.T, what string, got, want, tol float64) {
	t.Helper()
	if e := relErr(got, want); !(e <= tol) {
		t.Errorf("%s = %.15g, want %.15g (relative error %.3g > %.3g)", what, got, want, e, tol)
	}
}
