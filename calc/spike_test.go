package calc

import (
	"math"
	"testing"
)

// ringingByODE integrates the winding after the switch has opened — the
// inductance L in series with its resistance R, the self-capacitance C
// across both — from the current I and the capacitance charged to the
// steady drop v0, by the classical fourth-order Runge–Kutta method with
// 40 000 steps per undamped period, over the first half-period: the
// largest voltage of reverse sign across the winding (the kick).
//
//	L di/dt = v − R i,   C dv/dt = −i
func ringingByODE(L, R, C, I, v0 float64) float64 {
	T := 2 * math.Pi * math.Sqrt(L*C)
	n := 20000 // a half-period
	h := T / 40000
	f := func(i, v float64) (float64, float64) { return (v - R*i) / L, -i / C }
	i, v := I, v0
	peak := 0.0
	for k := 0; k < n+n/10; k++ {
		a1, b1 := f(i, v)
		a2, b2 := f(i+h/2*a1, v+h/2*b1)
		a3, b3 := f(i+h/2*a2, v+h/2*b2)
		a4, b4 := f(i+h*a3, v+h*b3)
		i += h / 6 * (a1 + 2*a2 + 2*a3 + a4)
		v += h / 6 * (b1 + 2*b2 + 2*b3 + b4)
		peak = math.Max(peak, -v)
	}
	return peak
}

func TestRingingPeakAgainstTheCircuit(t *testing.T) {
	// Lossless: the energy ½ L I² reappears whole as ½ C V².
	L, C, I := 50e-3, 25e-12, 0.45
	Z0 := math.Sqrt(L / C)
	checkRel(t, "lossless ringing peak", ringingByODE(L, 0, C, I, 0), RingingPeak(L, C, I), 1e-7)
	checkRel(t, "½ C V² = ½ L I²", 0.5*C*math.Pow(RingingPeak(L, C, I), 2), 0.5*L*I*I, 1e-14)
	// Lightly damped (Q = √(L/C)/R = 1000), the capacitance charged to the
	// steady drop I R before the switch opens: within 0.1 % of the bound,
	// below it, and short of it by about (π/4) R/√(L/C).
	R := Z0 / 1000
	got := ringingByODE(L, R, C, I, I*R)
	bound := RingingPeak(L, C, I)
	if !(got <= bound) {
		t.Errorf("lightly damped peak %.6g V above the bound %.6g V", got, bound)
	}
	checkRel(t, "lightly damped peak (Q = 1000)", got, bound, 1e-3)
	checkRel(t, "shortfall (π/4) R/Z0", 1-got/bound, math.Pi/4*R/Z0, 0.05)
	// Heavily damped (Q = 3): well below the bound.
	R = Z0 / 3
	if got := ringingByODE(L, R, C, I, I*R); !(got < 0.9*bound) {
		t.Errorf("Q = 3: peak %.4g V, bound %.4g V", got, bound)
	}
	// The sign of the current does not matter.
	checkRel(t, "negative current", RingingPeak(L, C, -I), bound, 0)
	for _, bad := range [][2]float64{{0, C}, {L, 0}, {-L, C}, {L, math.NaN()}, {math.Inf(1), C}} {
		if !math.IsNaN(RingingPeak(bad[0], bad[1], I)) || !math.IsNaN(RingingCrossover(bad[0], bad[1])) {
			t.Errorf("L = %g, C = %g: want NaN", bad[0], bad[1])
		}
	}
}

// At t_off = √(L C) the ramp estimate and the ringing peak agree; a faster
// switch's ramp estimate is the larger, a slower one's the smaller.
func TestRingingCrossover(t *testing.T) {
	L, C, I := 6.9e-3, 24e-12, 0.18
	tx := RingingCrossover(L, C)
	checkRel(t, "L I/t× = I √(L/C)", SwitchOffSpike(L, I, tx, 0), RingingPeak(L, C, I), 1e-14)
	if !(SwitchOffSpike(L, I, tx/2, 0) > RingingPeak(L, C, I)) || !(SwitchOffSpike(L, I, 2*tx, 0) < RingingPeak(L, C, I)) {
		t.Error("the ramp estimate does not cross the ringing peak at t×")
	}
}
