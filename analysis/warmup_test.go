package analysis

import (
	"math"
	"os"
	"testing"
)

// A duty cycle's warm-up is drawn until its periodic state: the peaks the
// integration in time reaches at the end of its last on period lie within
// 1 K of the periodic peak that the fixed-point search of the one-period
// map finds (calc.PeriodicCycle), the two found by different methods.
// The example's cycle (on 5 min, off 5 min, τ ≈ 10.6 min) takes more
// periods than five continuous time constants span.
func TestWarmUpRunsToPeriodicPeak(t *testing.T) {
	src, err := os.ReadFile("../examples/torque-coil.md")
	if err != nil {
		t.Fatal(err)
	}
	st := studyOf(t, string(src))
	cy := st.Results.Coils[0].Heat.Cycle
	wu := st.Coils[0].Heat.WarmUp
	if wu == nil || wu.CycleT == nil || !cy.Settled {
		t.Fatal("no cycle drawn")
	}
	if !wu.CycleReached {
		t.Errorf("the cycle drawn stops at %g s, before its periodic state (%g periods of %g s)", wu.End, cy.Periods, cy.On+cy.Off)
	}
	period := cy.On + cy.Off
	lastOn := math.Floor((wu.End-cy.On)/period)*period + cy.On // the last on period's end plotted
	peak := math.Inf(-1)
	for i, tm := range wu.CycleT {
		if tm > lastOn-period/2 && tm <= lastOn+1e-9*period {
			peak = math.Max(peak, wu.CycleHot[i])
		}
	}
	if d := math.Abs(peak - cy.PeakHot); !(d <= 1) {
		t.Errorf("last peak drawn %.2f K, periodic peak %.2f K: %.2f K apart, want within 1 K", peak, cy.PeakHot, d)
	}
	// Both curves cover the same span.
	if wu.T[len(wu.T)-1] != wu.End || math.Abs(wu.CycleT[len(wu.CycleT)-1]-wu.End) > 1e-9*wu.End {
		t.Errorf("curves end at %g and %g s, span %g s", wu.T[len(wu.T)-1], wu.CycleT[len(wu.CycleT)-1], wu.End)
	}
}
