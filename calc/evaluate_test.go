package calc

import (
	"math"
	"math/rand/v2"
	"reflect"
	"testing"
)

// sampleDesign is an invented test design: a thin torque coil, a
// voltage-driven single-layer solenoid, a multilayer coil, an aiding pair
// and a rectangle.
func sampleDesign() Design {
	cu := Copper()
	return Design{
		Coils: []Coil{
			{Name: "torquer", Form: Loop, MeanDiameter: 0.08, Turns: 200, Wire: WireFromGauge(30, cu),
				Drive: CurrentDrive, Current: 0.1, Duty: 1, InsulationClass: CelsiusToKelvin(155), Axis: Vec{0, 0, 1}},
			{Name: "probe", Form: Solenoid, MeanDiameter: 0.02, Length: 0.05, Turns: 80, Wire: WireFromGauge(26, cu),
				Drive: VoltageDrive, Voltage: 0.5, Duty: 0.5, Axis: Vec{1, 0, 0}, Centre: Vec{0.3, 0, 0}},
			{Name: "magnet", Form: Solenoid, MeanDiameter: 0.03, Length: 0.02, RadialBuild: 0.006, Turns: 150,
				Wire: WireFromGauge(22, Aluminium()), Drive: CurrentDrive, Current: 0.3, Duty: 1, Axis: Vec{0, 1, 0}, Centre: Vec{0, -0.4, 0}},
			{Name: "helmholtz", Form: Pair, MeanDiameter: 0.3, Turns: 40, Spacing: 0.15, Wire: WireFromGauge(20, cu),
				Drive: CurrentDrive, Current: 0.2, Duty: 1, Axis: Vec{0, 0, 1}, Centre: Vec{0, 0, 1}},
			{Name: "frame", Form: Rectangle, Width: 0.1, Height: 0.06, Turns: 30, Wire: WireFromGauge(28, cu),
				Drive: CurrentDrive, Current: 0.05, Duty: 1, Axis: Vec{0, 0, 1}, Centre: Vec{0, 0, -1}},
		},
		Conditions: Conditions{Ambient: T20, BackgroundField: Vec{0, 3e-5, 0}, DesignAngle: math.Pi / 6, DesignAngleStated: true, Cooling: StillAir()},
		Probes:     []Probe{{Name: "sensor", At: Vec{0, 0, 0.12}}},
	}
}

// nanFields lists the float fields of v (recursively through structs, not
// slices) that are NaN.
func nanFields(prefix string, v reflect.Value, out *[]string) {
	switch v.Kind() {
	case reflect.Float64:
		if math.IsNaN(v.Float()) {
			*out = append(*out, prefix)
		}
	case reflect.Struct:
		for i := range v.NumField() {
			nanFields(prefix+"."+v.Type().Field(i).Name, v.Field(i), out)
		}
	case reflect.Array:
		for i := range v.Len() {
			nanFields(prefix, v.Index(i), out)
		}
	}
}

func TestEvaluateSample(t *testing.T) {
	d := sampleDesign()
	d.Limits = []Limit{
		{Quantity: "moment", Relation: AtLeast, Required: 0.05},                     // ≈ 0.1 A·m²: PASS
		{Quantity: "temperature", Relation: AtMost, Required: CelsiusToKelvin(120)}, // PASS
		{Quantity: "power", Relation: AtMost, Required: 1e-3},                       // ≈ 0.4 W: FAIL
		{Quantity: "mass", Relation: AtMost, Required: 10},                          // PASS
		{Quantity: "inductance", Relation: AtMost, Required: 1e-9},                  // ≈ mH: FAIL
		{Quantity: "torque", Relation: AtLeast, Required: 1e-6},                     // ≈ 3e-6: PASS
		{Quantity: "no-such-thing", Relation: AtMost, Required: 1},                  // FAIL
	}
	r := Evaluate(d)
	// Known-unknowns: thin-coil fill factor, the insulation margin of coils
	// without a class, homogeneity of anything but a pair. Nothing else may
	// be NaN.
	allowed := map[string]bool{
		"torquer.Winding.FillFactor": true, "helmholtz.Winding.FillFactor": true, "frame.Winding.FillFactor": true,
	}
	for _, n := range []string{"torquer", "probe", "magnet", "frame"} {
		allowed[n+".HomogeneityAxial"], allowed[n+".HomogeneityRadial"] = true, true
		// The pair figures of anything but a pair.
		for _, f := range []string{"SpacingRatio", "Axial1", "Radial1", "Axial01", "Radial01", "Gradient", "LinearAxial", "LinearRadial"} {
			allowed[n+".Pair."+f] = true
		}
	}
	// An aiding pair has no gradient at its centre.
	for _, f := range []string{"Gradient", "LinearAxial", "LinearRadial"} {
		allowed["helmholtz.Pair."+f] = true
	}
	// Figures of inputs the sample does not state: an on/off cycle without
	// on-time, a switch-off voltage without switch-off time, a.c. figures
	// without frequency, a gradient force without gradient, a time to a
	// limit that is never reached or not given.
	for _, n := range []string{"torquer", "probe", "magnet", "helmholtz", "frame"} {
		for _, f := range []string{"Heat.Cycle.PeakMean", "Heat.Cycle.PeakHot", "Heat.Cycle.PeakSurface", "Heat.Cycle.Trough", "Heat.Cycle.Periods",
			"Heat.Cycle.AveragePow", "Switch.Spike", "Switch.SpikeWorst", "AC.Reactance", "AC.Impedance", "AC.Phase", "AC.Current",
			"AC.Voltage", "AC.SkinDepth", "AC.Resistance", "GradientForce", "Heat.TimeToLimit",
			// current drive without a driver rating: no clamp to size a resistor for
			"Switch.Clamp", "Switch.ResistorMax", "Switch.Resistor", "Switch.ResistorDecay", "Switch.ResistorTime10", "Switch.ResistorEnergy", "Switch.ResistorDecayCold", "Switch.ResistorEnergyWorst",
			// no driver rating: no margin to it
			"Switch.RatingMargin"} {
			allowed[n+"."+f] = true
		}
	}
	for _, c := range r.Coils {
		var nans []string
		nanFields(c.Name, reflect.ValueOf(c), &nans)
		for _, n := range nans {
			isClassless := c.Name != "torquer" && n == c.Name+".InsulationMargin"
			if !allowed[n] && !isClassless {
				t.Errorf("unexpected NaN: %s", n)
			}
		}
	}
	var nans []string
	nanFields("results", reflect.ValueOf(struct {
		F, M, T Vec
		A, B    float64
	}{r.FieldCentre, r.Moment, r.Torque, r.TorqueMax, r.TorqueDesign}), &nans)
	if len(nans) > 0 {
		t.Errorf("NaN totals: %v", nans)
	}
	// Thin torquer: m = N I π R², moment along z; the cross-check agrees.
	tq := r.Coils[0]
	checkRel(t, "torquer moment", tq.Moment[2], 200*0.1*math.Pi*0.04*0.04, 1e-14)
	checkRel(t, "torquer mean-area moment", tq.MomentMeanArea, tq.Moment[2], 1e-14)
	// Resistance: R'20(AWG 30) × N × 2πR.
	checkRel(t, "torquer R20", tq.R20, ResistancePerLength(AWGDiameter(30), Copper(), T20)*200*2*math.Pi*0.04, 1e-14)
	checkRel(t, "torquer V = I R", tq.Voltage, tq.Current*tq.RHot, 1e-14)
	// Pair block: both coils in series.
	hh := r.Coils[3]
	checkRel(t, "pair length", hh.Length, 2*40*math.Pi*0.3, 1e-14)
	checkRel(t, "pair moment", hh.Moment[2], 2*40*0.2*math.Pi*0.15*0.15, 1e-14)
	// Voltage drive with 50 % duty: P = duty × V²/R_hot.
	pr := r.Coils[1]
	checkRel(t, "probe current", pr.Current, 0.5/pr.RHot, 1e-14)
	checkRel(t, "probe power", pr.Power, 0.5*0.5*0.5/pr.RHot, 1e-14)
	if !(pr.ColdCurrent > pr.Current) || !(pr.Temperature > T20) {
		t.Error("voltage-driven coil should lose current as it warms")
	}
	// Totals.
	sum := Vec{}
	for _, c := range r.Coils {
		sum = sum.Add(c.Moment)
	}
	if r.Moment != sum {
		t.Errorf("total moment %v vs sum %v", r.Moment, sum)
	}
	checkRel(t, "torque max", r.TorqueMax, r.Moment.Norm()*3e-5, 1e-14)
	checkRel(t, "torque design at 30°", r.TorqueDesign, r.TorqueMax/2, 1e-14)
	if vecRelErr(r.Torque, r.Moment.Cross(Vec{0, 3e-5, 0})) > 1e-15 {
		t.Error("torque vector")
	}
	// Probe = FieldAt.
	if len(r.Probes) != 1 || vecRelErr(r.Probes[0].B, FieldAt(d, Vec{0, 0, 0.12})) > 1e-15 {
		t.Errorf("probe %v", r.Probes)
	}
}

func TestEvaluateNeverPanics(t *testing.T) {
	weird := []float64{0, -1, math.NaN(), math.Inf(1), 1e-9, 0.01, 1, 1e6}
	rng := rand.New(rand.NewPCG(13, 14))
	pick := func() float64 { return weird[rng.IntN(len(weird))] }
	designs := []Design{{}, {Coils: []Coil{{}}}, {Coils: []Coil{{Form: Pair}}}, {Coils: []Coil{{Form: Rectangle, Turns: 3}}}}
	for range 300 {
		c := Coil{
			Form: Form(rng.IntN(5)), MeanDiameter: pick(), InnerDiameter: pick(), Length: pick(), RadialBuild: pick(),
			Width: pick(), Height: pick(), Turns: []int{-5, 0, 1, 7, 300}[rng.IntN(5)],
			Wire:  Wire{Gauge: NoGauge, Bare: pick(), Outer: pick(), Material: Copper()},
			Drive: Drive(rng.IntN(2)), Current: pick(), Voltage: pick(), Duty: pick(), InsulationClass: pick(),
			Spacing: pick(), Opposing: rng.IntN(2) == 0, Axis: Vec{pick(), pick(), pick()}, Centre: Vec{pick(), 0, 0},
		}
		designs = append(designs, Design{
			Coils:      []Coil{c},
			Conditions: Conditions{Ambient: pick(), BackgroundField: Vec{pick(), 0, 0}, Cooling: Cooling{H: pick(), Emissivity: pick(), Vacuum: rng.IntN(2) == 0}},
			Probes:     []Probe{{At: Vec{pick(), pick(), pick()}}},
			Limits:     []Limit{{Quantity: "temperature", Required: pick()}},
		})
	}
	for i, d := range designs {
		func() {
			defer func() {
				if p := recover(); p != nil {
					t.Fatalf("design %d panicked: %v\n%+v", i, p, d)
				}
			}()
			Evaluate(d)
		}()
	}
}

func TestEvaluateZeroCases(t *testing.T) {
	// No current: no field, no power, ambient temperature, all known.
	c := Coil{Name: "off", Form: Loop, MeanDiameter: 0.05, Turns: 10, Wire: WireFromGauge(30, Copper())}
	r := Evaluate(Design{Coils: []Coil{c}})
	cr := r.Coils[0]
	if cr.Power != 0 || cr.Temperature != T20 || cr.FieldCentre != (Vec{}) || cr.Moment != (Vec{}) {
		t.Errorf("zero current: %+v", cr)
	}
	// No turns.
	c.Turns, c.Current = 0, 1
	r = Evaluate(Design{Coils: []Coil{c}})
	if r.Coils[0].FieldCentre != (Vec{}) || r.Coils[0].Length != 0 {
		t.Errorf("zero turns: %+v", r.Coils[0])
	}
	// No coils.
	r = Evaluate(Design{Limits: []Limit{{Quantity: "moment", Relation: AtMost, Required: 1}}})
	if len(r.Coils) != 0 || r.Moment != (Vec{}) {
		t.Errorf("empty design: %+v", r)
	}
}
