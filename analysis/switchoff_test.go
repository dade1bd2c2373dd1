package analysis

import (
	"math"
	"os"
	"testing"
)

func exampleStudy(t *testing.T, name string) *Study {
	t.Helper()
	src, err := os.ReadFile("../examples/" + name)
	if err != nil {
		t.Fatal(err)
	}
	return studyOf(t, string(src))
}

// The switch-off spike of a driven coil is held to the smaller of the
// switch's ramp, L·I/t_off + V_s, and the winding's capacitance-limited
// peak, V_s + I √(L/C_s), with C_s the self-capacitance the study found
// for the winding; the safety finding quotes that smaller figure.
func TestSwitchOffSpikeBounds(t *testing.T) {
	rel := func(what string, got, want, tol float64) {
		t.Helper()
		if !(math.Abs(got-want) <= tol*math.Abs(want)) {
			t.Errorf("%s = %.6g, want %.6g", what, got, want)
		}
	}
	// The valve actuator opens in a stated 10 µs, slower than √(L C_s):
	// the ramp governs, as before.
	st := exampleStudy(t, "valve-actuator.md")
	cr, p := st.Results.Coils[0], st.Coils[0].SwitchOff
	I := cr.Switch.WorstCurrent
	rel("C_s", p.Capacitance, st.Coils[0].Kinds.SelfCapacitance, 0)
	rel("ringing peak", p.Ringing, I*math.Sqrt(cr.Inductance/p.Capacitance), 1e-12)
	rel("crossover", p.Crossover, math.Sqrt(cr.Inductance*p.Capacitance), 1e-12)
	if p.Assumed || p.Bounded || p.Peak != cr.Switch.SpikeWorst || !(p.Crossover < 10e-6) {
		t.Errorf("valve actuator: %+v, L·I/t %g V", p, cr.Switch.SpikeWorst)
	}
	// The torque rod states no switch-off time: at the assumed 1 µs, faster
	// than its √(L C_s), the capacitance governs, and the finding says so.
	st = exampleStudy(t, "torque-rod.md")
	cr, p = st.Results.Coils[0], st.Coils[0].SwitchOff
	ramp := cr.Inductance*math.Abs(cr.Current)/AssumedSwitchOff + cr.Switch.Supply
	rel("ramp at 1 µs", p.Ramp, ramp, 1e-12)
	rel("bounded peak", p.Peak, cr.Switch.Supply+math.Abs(cr.Current)*math.Sqrt(cr.Inductance/st.Coils[0].Kinds.SelfCapacitance), 1e-12)
	if !p.Assumed || !p.Bounded || !(p.Peak < ramp) || !(p.Crossover > AssumedSwitchOff) {
		t.Errorf("torque rod: %+v", p)
	}
	found := false
	for _, f := range st.Safety.Findings {
		if f.Kind == SwitchOffVoltage {
			found = true
			rel("finding", f.Value, p.Peak, 0)
		}
	}
	if !found {
		t.Error("torque rod: no switch-off finding")
	}
	// A rectangle's self-capacitance is not modelled: the ramp alone.
	st = studyOf(t, "```coil\nname = r\nform = rectangle\nwidth = 200 mm\nheight = 100 mm\nturns = 40\nwire = AWG 22\ncurrent = 1 A\n```\n")
	if p := st.Coils[0].SwitchOff; !math.IsNaN(p.RingingSwitch) || p.Bounded || p.Peak != p.Ramp || !(p.Ramp > 0) {
		t.Errorf("rectangle: %+v", p)
	}
	// A pick-up coil carries no current: nothing to bound.
	st = exampleStudy(t, "search-coil.md")
	if p := st.Coils[0].SwitchOff; !math.IsNaN(p.Peak) || !math.IsNaN(p.Ringing) {
		t.Errorf("pick-up coil: %+v", p)
	}
}
