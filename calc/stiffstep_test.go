package calc

import (
	"math"
	"testing"
)

// The stiff steps against closed-form solutions of stiff scalar problems.
//
// Riccati relaxation dT/dt = −k (T² − a²), T(0) = T₀ > a, whose solution is
// T(t) = a coth(a k t + arcoth(T₀/a)) (separation of variables; e.g.
// Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, 4.5.20
// for coth), with a k = 10⁶ s⁻¹ against a span of 10³ s: a
// time constant 10⁹ times shorter than the span, which explicit steps
// could only cross in some 10⁹ steps.
func TestStiffStepsMatchClosedForm(t *testing.T) {
	const a, k, T0, span = 300.0, 1e6 / 300, 900.0, 1e3
	exact := func(s float64) float64 {
		x := a*k*s + math.Atanh(a/T0) // arcoth(T₀/a) = artanh(a/T₀)
		return a / math.Tanh(x)
	}
	f := func(T float64) float64 { return -k * (T*T - a*a) }
	// The relaxation is over by t = 10⁻³ s (10³ time constants); after it
	// the step grows to its bound instead of staying near the time constant.
	steps, tail, worst := 0, 0, 0.0
	tEnd, TEnd := integrateScalar(f, T0, span, span/8, nil, func(s, T float64) {
		steps++
		if s > 1e-3 {
			tail++
		}
		worst = math.Max(worst, math.Abs(T-exact(s)))
	})
	if tEnd != span || math.Abs(TEnd-a) > 1e-9 {
		t.Errorf("end (%g s, %.12f K), want (%g s, %g K)", tEnd, TEnd, span, a)
	}
	// Local error 10⁻⁶ K per step; the relaxation damps what earlier
	// steps left, so the global error stays of that order.
	if worst > 1e-5 {
		t.Errorf("largest error %.3g K along the way", worst)
	}
	if tail > 40 {
		t.Errorf("%d steps after the relaxation", tail)
	}
	t.Logf("%d steps (%d after the relaxation), largest error %.3g K", steps, tail, worst)

	// An early stop where T falls to 450 K: at a k t = arcoth(450/300) − arcoth(3).
	stop := func(T float64) bool { return T <= 450 }
	ts, Ts := integrateScalar(f, T0, span, span/8, stop, nil)
	want := (math.Atanh(a/450) - math.Atanh(a/T0)) / (a * k)
	if math.Abs(ts-want) > 1e-6*want || math.Abs(Ts-450) > 1e-3 {
		t.Errorf("stopped at (%.9g s, %.6f K), want (%.9g s, 450 K)", ts, Ts, want)
	}
}

// Linear relaxation dT/dt = (T∞ − T)/τ, T = T∞ + (T₀ − T∞) e^(−t/τ), as
// integrateMean takes it: explicit steps within their budget and stiff
// steps after; the visits follow the exponential throughout.
func TestIntegrateMeanHandsOverToStiffSteps(t *testing.T) {
	const tau, Tinf, T0, span = 1e-4, 350.0, 293.15, 50.0
	f := func(y state) state { return state{(Tinf - y[0]) / tau, 0, 0} }
	lift := func(T float64) state { return state{T, 1, 2} }
	worst, n := 0.0, 0
	last := 0.0
	tEnd, y := integrateMean(f, lift, state{T0, 1, 2}, span, span/8, nil, func(s float64, v state) {
		if !(s > last) {
			t.Fatalf("visit at %g s after %g s", s, last)
		}
		last = s
		n++
		worst = math.Max(worst, math.Abs(v[0]-(Tinf+(T0-Tinf)*math.Exp(-s/tau))))
	})
	if tEnd != span || math.Abs(y[0]-Tinf) > 1e-9 || y[1] != 1 || y[2] != 2 {
		t.Errorf("end (%g s, %v)", tEnd, y)
	}
	if worst > 1e-5 {
		t.Errorf("largest error %.3g K", worst)
	}
	t.Logf("%d steps, largest error %.3g K", n, worst)
}

// An overdriven fine winding (236 turns of AWG 30 on a 6.86 mm former,
// 94.1 V, 7 % of an 872 s on period): its heat balance settles in a
// fraction of a second, so the period's peak is its steady temperature
// with the power on, and the off period cools it to the ambient.
func TestPeriodicCycleOfAnOverdrivenWinding(t *testing.T) {
	c := Coil{Name: "c1", Form: Solenoid, MeanDiameter: 6.86e-3, Length: 0.872, RadialBuild: 6e-3, Turns: 236,
		Wire: WireFromGauge(30, Copper()), Drive: VoltageDrive, Voltage: 94.1, Duty: 0.07, OnTime: 872, Axis: Vec{0, 0, 1}}
	w := LayOut(c)
	op := OperatingPoint(c, w, Conditions{Ambient: T20})
	cy := Heating(c, w, op).Cycle
	on := op.Thermal
	on.Duty = 1
	Ton, runaway := SteadyTemperature(on)
	if runaway || !cy.Settled || math.Abs(cy.PeakMean-Ton) > 1e-6 || math.Abs(cy.Trough-on.Ambient) > 1e-3 {
		t.Errorf("peak %.9f K (steady on %.9f K, runaway %v), trough %.9f K (ambient %.9f K), settled %v", cy.PeakMean, Ton, runaway, cy.Trough, on.Ambient, cy.Settled)
	}
}
