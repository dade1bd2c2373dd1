package calc

import (
	"math"
	"testing"
)

// The memoised geometry results equal fresh computations: the inductance
// to the bit, the dipole distances of a coil off the origin at its own
// current to the search's rounding; a second coil that differs only in
// place and current gets the same distances.
func TestGeometryCacheMatchesFresh(t *testing.T) {
	c := Coil{Form: Solenoid, MeanDiameter: 0.05, Length: 0.03, RadialBuild: 0.006, Turns: 300,
		Wire: WireFromGauge(28, Copper()), Axis: Vec{0, 1, 0}, Centre: Vec{0.2, 0.1, 0}}
	w := LayOut(c)
	if L, fresh := coilInductance(c, w), CoilInductance(c, w); math.Float64bits(L) != math.Float64bits(fresh) {
		t.Errorf("inductance %v, fresh %v", L, fresh)
	}
	got, fresh := dipoleDistances(c, w, 0.37), DipoleDistances(c, w, 0.37)
	pairs := [][2]float64{{got.Axis1, fresh.Axis1}, {got.Axis01, fresh.Axis01}, {got.Plane1, fresh.Plane1},
		{got.Plane01, fresh.Plane01}, {got.Any1, fresh.Any1}, {got.Any01, fresh.Any01}}
	for i, p := range pairs {
		if !(math.Abs(p[0]-p[1]) <= 1e-6*p[1]) {
			t.Errorf("distance %d: cached %v, fresh %v", i, p[0], p[1])
		}
	}
	d := c
	d.Centre = Vec{-1, 0, 3}
	if again := dipoleDistances(d, LayOut(d), 2.5); again != got {
		t.Errorf("a like coil elsewhere at 2.5 A: %+v, want %+v", again, got)
	}
	if z := dipoleDistances(c, w, 0); !math.IsNaN(z.Axis1) {
		t.Errorf("no current: %+v, want NaN (no moment)", z)
	}
}
