package calc

import (
	"math"
	"testing"
)

// phase holds the internal lags at their driven values once they have
// settled; against integrating the whole stiff system step by step (still
// feasible for a period of 2 000 internal time constants) the end state and
// the hot spot agree within 10⁻⁴ of the rise above ambient (what is left
// out is the lag itself, of the order of τ/τ_thermal = 1.25×10⁻³ here),
// in fewer steps.
func TestPhaseSlavedLagsMatchFullIntegration(t *testing.T) {
	tp := baseThermal()
	tp.Alpha20 = Copper().Alpha20
	tp.Duty = 0.5
	tp.RiseMean, tp.RiseMax = 2, 5
	tp.InternalTau = 0.5
	C := 40.0 // J/K: thermal time constant C/(hA) = 400 s
	span := 1000.0
	for _, on := range []bool{true, false} {
		y0 := state{tp.Ambient + 30, 0, 0}
		if !on {
			p := tp.PowerOn(y0[0])
			y0 = state{y0[0], tp.extraRise() * p, tp.RiseMean * p}
		}
		steps := 0
		_, full := integrate(tp.rate(C, on), y0, span, span/8, nil, func(float64, state) { steps++ })
		slavedSteps := 0
		_, got := tp.phase(C, on, y0, span, span/8, nil, func(float64, state) { slavedSteps++ })
		tol := 1e-4 * (full[0] - tp.Ambient)
		if d := math.Abs(got[0] - full[0]); !(d < tol) {
			t.Errorf("on %v: mean %.9f K, full integration %.9f K", on, got[0], full[0])
		}
		if d := math.Abs(tp.hotSpot(got, on) - tp.hotSpot(full, on)); !(d < tol) {
			t.Errorf("on %v: hot spot %.9f K, full integration %.9f K", on, tp.hotSpot(got, on), tp.hotSpot(full, on))
		}
		if !(slavedSteps < steps) {
			t.Errorf("on %v: %d steps with the lags held, %d without", on, slavedSteps, steps)
		}
		t.Logf("on %v: %d steps against %d; mean %.9f against %.9f K", on, slavedSteps, steps, got[0], full[0])
	}
}

// A winding whose heat balance settles in microseconds (one turn of AWG 37
// on a 405 mm former) against a 405 s on period and a 1 % duty cycle: the
// period's peak is the steady temperature with the power on and its
// trough the ambient, and the search for the periodic state takes well
// under a second (it took 9 s of explicit steps before phase held a
// settled balance).
func TestPeriodicCycleOfAFastWinding(t *testing.T) {
	c := Coil{Name: "c1", Form: Solenoid, MeanDiameter: 0.08, Length: 0.405, Turns: 1, Wire: WireFromGauge(37, Copper()),
		Current: 0.02, Duty: 0.01, OnTime: 405, Axis: Vec{0, 0, 1}}
	w := LayOut(c)
	op := OperatingPoint(c, w, Conditions{Ambient: T20})
	h := Heating(c, w, op)
	cy := h.Cycle
	on := op.Thermal
	on.Duty = 1
	Ton, _ := SteadyTemperature(on)
	if !cy.Settled || math.Abs(cy.PeakMean-Ton) > 1e-6 || math.Abs(cy.Trough-on.Ambient) > 1e-6 {
		t.Errorf("peak %.9f K (steady on %.9f K), trough %.9f K (ambient %.9f K), settled %v", cy.PeakMean, Ton, cy.Trough, on.Ambient, cy.Settled)
	}
}
