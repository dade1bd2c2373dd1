package analysis

import (
	"math"
	"testing"

	"coilmemo/calc"
	"coilmemo/spec"
)

const sweepSpec = "# S\n\n```coil\nform = solenoid\nmean-diameter = 30 mm\nlength = 50 mm\nturns = 50\nwire = 0.5 mm\nwire-outer-diameter = 0.55 mm\ncurrent = 1 A\n```\n\n```sweep\nturns = 50 .. 110 step 20\n```\n"

// Steps whose turns no longer fit the length are kept and flagged; the
// moment of a single-layer coil at fixed current grows as N (m = N·I·π·R²).
func TestSweepTurns(t *testing.T) {
	j, diags := Run("s.md", []byte(sweepSpec), Options{})
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	if len(j.Sweep) != 4 {
		t.Fatalf("%d steps, want 4 (50, 70, 90, 110)", len(j.Sweep))
	}
	// 50 mm / 0.55 mm holds 90 turns: 110 does not fit.
	for i, want := range []bool{true, true, true, false} {
		if j.Sweep[i].Feasible != want {
			t.Errorf("step %g: feasible %v, want %v (%s)", j.Sweep[i].Value, j.Sweep[i].Feasible, want, j.Sweep[i].Problem)
		}
	}
	R := 0.015
	for _, st := range j.Sweep[:3] {
		want := st.Value * 1 * math.Pi * R * R
		if got := st.Results.Moment.Norm(); math.Abs(got-want) > 1e-12*want {
			t.Errorf("turns %g: moment %g, want N·I·π·R² = %g", st.Value, got, want)
		}
	}
}

// Sweeping a dimension re-derives the dependent ones: the bore stays put
// when the radial build grows.
func TestSetParamRadialBuild(t *testing.T) {
	c := calc.Coil{MeanDiameter: 0.05, RadialBuild: 0.01, InnerDiameter: 0.04, OuterDiameter: 0.06}
	spec.SetCoilKey(&c, "radial-build", 0.02)
	if math.Abs(c.InnerDiameter-0.04) > 1e-15 || math.Abs(c.MeanDiameter-0.06) > 1e-15 || math.Abs(c.OuterDiameter-0.08) > 1e-15 {
		t.Errorf("after radial-build 20 mm: inner %g mean %g outer %g; want 0.04, 0.06, 0.08", c.InnerDiameter, c.MeanDiameter, c.OuterDiameter)
	}
	spec.SetCoilKey(&c, "inner-diameter", 0.03)
	if math.Abs(c.MeanDiameter-0.05) > 1e-15 || math.Abs(c.OuterDiameter-0.07) > 1e-15 {
		t.Errorf("after inner 30 mm: mean %g outer %g; want 0.05, 0.07", c.MeanDiameter, c.OuterDiameter)
	}
}

// An on-time sweep of a duty-cycled coil: the cycle's peak temperature
// rises with the on-time at a fixed duty, and lies above the steady state
// of the duty-averaged power, which short on-times approach.
func TestSweepOnTime(t *testing.T) {
	src := "# S\n\n```coil\nmean-diameter = 80 mm\nturns = 200\nwire = AWG 32\nvoltage = 5 V\nduty = 50 %\non-time = 5 min\n```\n\n```conditions\ncooling = vacuum\n```\n\n```sweep\non-time = 1 min .. 9 min step 4 min\n```\n"
	j, diags := Run("s.md", []byte(src), Options{})
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	if len(j.Sweep) != 3 || j.Sweep[0].Value != 60 || j.Sweep[2].Value != 540 {
		t.Fatalf("steps %+v, want 60, 300, 540 s", j.Sweep)
	}
	prev := 0.0
	for _, st := range j.Sweep {
		T := st.Results.Coils[0].Temperature
		if !(T > prev) {
			t.Errorf("on-time %g s: peak %g K, not above the shorter on-time's %g K", st.Value, T, prev)
		}
		prev = T
	}
	avg := j.Results.Coils[0].Heat.Steady.HotSpot
	first := j.Sweep[0].Results.Coils[0].Temperature
	if !(first > avg && prev > avg) || !(first-avg < (prev-avg)/4) {
		t.Errorf("peaks %g K (1 min on) and %g K (9 min on) against the duty-averaged steady state %g K", first, prev, avg)
	}
}

// The moment check compares the area sum with the far field's dipole
// moment: it passes for the design as computed and fails when the moment
// is off by 0.01 %, as a miscounted turn of a 10 000-turn coil would make it.
func TestMomentCheckIsIndependent(t *testing.T) {
	c := calc.Coil{Name: "m", Form: calc.Solenoid, MeanDiameter: 0.06, Length: 0.02, RadialBuild: 0.01, Turns: 300,
		Wire: calc.WireFromGauge(28, calc.Copper()), Drive: calc.CurrentDrive, Current: 0.5, Axis: calc.Vec{1, 1, 0}, Centre: calc.Vec{0.1, 0, 0}}
	r := calc.Evaluate(calc.Design{Coils: []calc.Coil{c}, Conditions: calc.Conditions{Ambient: calc.T20, Cooling: calc.StillAir()}})
	cr := r.Coils[0]
	ok := momentCheck(c, cr)
	if len(ok) != 1 || !ok[0].Pass {
		t.Fatalf("moment check of the computed moment: %+v", ok)
	}
	cr.Moment = cr.Moment.Scale(1 + 1e-4)
	if bad := momentCheck(c, cr); bad[0].Pass {
		t.Errorf("a moment 0.01 %% off passes: %+v", bad[0])
	}
}
