package analysis

import (
	"math"
	"os"
	"testing"

	"coilmemo/calc"
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

// e12Decade are the E12 values of one decade, IEC 60063:2015, Table 1.
var e12Decade = []float64{1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2}

// Where tolerances are stated, the series resistor of the suggested
// suppression is the largest E12 value that keeps the switch, which sees
// V_s + I·R_s as it opens the largest current I, within the driver rating
// at the nominal design and at every corner — each corner evaluated here
// in full by calc.Evaluate, the E12 values searched from the standard's
// table — and the study's switching, its JSON resistor, is that one.
func TestSuppressionOverCorners(t *testing.T) {
	st := exampleStudy(t, "torque-coil.md")
	d, tol := st.Spec.Design, st.Spec.Tolerances
	rating := d.Coils[0].DriverRating
	type opens struct{ V, I float64 }
	var at []opens
	for h := range 1 << len(tol.Items) {
		s := calc.Evaluate(CornerDesign(d, tol, uint32(h))).Coils[0].Switch
		at = append(at, opens{s.Supply, s.WorstCurrent})
	}
	nom := calc.Evaluate(d).Coils[0].Switch
	at = append(at, opens{nom.Supply, nom.WorstCurrent})
	holds := func(r float64) (bool, float64) {
		worst := 0.0
		for _, o := range at {
			worst = math.Max(worst, o.V+o.I*r)
		}
		return worst <= rating, worst
	}
	best := math.NaN()
	for _, dec := range []float64{1, 10, 100, 1000} {
		for _, v := range e12Decade {
			if ok, _ := holds(v * dec); ok {
				best = v * dec
			}
		}
	}
	s := st.Results.Coils[0].Switch
	p := st.WorstCase.Suppression[0]
	if p == nil || s.Resistor != best || p.Resistor != best {
		t.Fatalf("fitted %g Ω (suppression %+v), want %g Ω", s.Resistor, p, best)
	}
	_, worst := holds(best)
	if math.Abs(p.SwitchVoltage-worst) > 1e-12*worst || !p.Within || math.Abs(p.Margin-(rating-worst)) > 1e-9 {
		t.Errorf("switch voltage over the corners %g V, want %g V (%+v)", p.SwitchVoltage, worst, p)
	}
	// The value the nominal design alone allows fails at a cold corner.
	if ok, v := holds(nom.Resistor); ok || p.Nominal != nom.Resistor || math.Abs(p.NominalWorst-v) > 1e-12*v {
		t.Errorf("nominal resistor %g Ω at the corners: %g V, held %v (%+v)", nom.Resistor, v, ok, p)
	}
	cr := st.Results.Coils[0]
	if t10 := math.Ln10 * cr.Inductance / (cr.RHot + best); s.SwitchVoltage != nom.Supply+nom.WorstCurrent*best ||
		math.Abs(s.ResistorTime10-t10) > 1e-12*t10 || s.ResistorMax != nom.ResistorMax {
		t.Errorf("nominal switching with %g Ω: %+v", best, s)
	}
	// The derived corner carries the same resistor.
	if wk := st.WorstCase.Derived; wk == nil || wk.Results.Coils[0].Switch.Resistor != best {
		t.Errorf("derived corner's resistor: %+v", wk)
	}
	// Without tolerances the nominal sizing stands.
	st = exampleStudy(t, "valve-actuator.md")
	if st.WorstCase != nil || st.Coils[0].Suppression != nil || st.Results.Coils[0].Switch.Resistor != calc.E12AtOrBelow(st.Results.Coils[0].Switch.ResistorMax) {
		t.Errorf("valve actuator: %+v", st.Results.Coils[0].Switch)
	}
}
