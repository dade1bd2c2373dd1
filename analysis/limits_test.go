package analysis

import (
	"math"
	"os"
	"strings"
	"testing"

	"coilmemo/calc"
)

// A three-axis torquer set of thin loops at 0.1 A, nested without
// touching: X 150 turns on 80 mm (off the origin), Y 96 turns on 100 mm,
// Z 71 turns on 120 mm. Each coil alone: m = N I π R² (thin loop), 75.4 /
// 75.4 / 80.3 mA·m²; their vector sum 133 mA·m². The field of a thin loop at its own centre is μ0 N I / (2R)
// (Biot–Savart closed form for a circular loop, e.g. Griffiths,
// Introduction to Electrodynamics, 4th ed., Example 5.6).
const threeAxis = "```coil\nname = torquer X\nmean-diameter = 80 mm\nturns = 150\nwire = AWG 32\ncurrent = 0.1 A\naxis = x\ncentre = (50, 0, 0) mm\n```\n" +
	"```coil\nname = torquer Y\nmean-diameter = 100 mm\nturns = 96\nwire = AWG 32\ncurrent = 0.1 A\naxis = y\n```\n" +
	"```coil\nname = torquer Z\nmean-diameter = 120 mm\nturns = 71\nwire = AWG 32\ncurrent = 0.1 A\naxis = z\n```\n" +
	"```probes\nmagnetometer = (0, 0, 120) mm\n```\n" +
	"```limits\nmoment >= 100 mA m2\nmoment(torquer X) >= 100 mA m2\nmoment(torquer Z) >= 80 mA m2\nfield(magnetometer) <= 50 uT\nfield-center(torquer X) <= 1 mT\n```\n"

func TestLimitsPerSubject(t *testing.T) {
	st, diags := Run("set.md", []byte(threeAxis), Options{})
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	mX, mY, mZ := 150*0.1*math.Pi*0.04*0.04, 96*0.1*math.Pi*0.05*0.05, 71*0.1*math.Pi*0.06*0.06
	want := []struct {
		on      Tested
		value   float64
		pass    bool
		relTol  float64
		subject string
	}{
		{OnDesign, math.Sqrt(mX*mX + mY*mY + mZ*mZ), true, 1e-12, ""},
		{OnCoil, mX, false, 1e-12, "torquer X"},
		{OnCoil, mZ, true, 1e-12, "torquer Z"},
		{OnProbe, st.Results.Probes[0].B.Norm(), true, 0, "magnetometer"},
		{OnCoil, calc.Mu0 * 150 * 0.1 / (2 * 0.04), true, 1e-12, "torquer X"},
	}
	if len(st.Limits) != len(want) {
		t.Fatalf("%d limits judged, want %d", len(st.Limits), len(want))
	}
	for i, w := range want {
		l := st.Limits[i]
		if l.On != w.on || l.Limit.Subject != w.subject || l.Pass != w.pass || math.Abs(l.Computed-w.value) > w.relTol*w.value {
			t.Errorf("limit %d (%s %q): on %v computed %g pass %v; want on %v, %g, pass %v", i, l.Limit.Quantity, l.Limit.Subject, l.On, l.Computed, l.Pass, w.on, w.value, w.pass)
		}
	}
	// The set fails: one of five is not met, and the study says so.
	if lf, _ := st.Failed(); lf != 1 {
		t.Errorf("%d limits failed, want 1 (torquer X's own moment)", lf)
	}
	// coils[].FieldCentre is the coil alone at its own centre, off the
	// origin for torquer X; the design's FieldCentre is all coils at the
	// origin.
	if got, w := st.Results.Coils[0].FieldCentre.Norm(), calc.Mu0*150*0.1/(2*0.04); math.Abs(got-w) > 1e-12*w {
		t.Errorf("torquer X at its own centre: %g T, want μ0NI/(2R) = %g T", got, w)
	}
	fm := calc.NewFieldModel(st.Spec.Design)
	if got, w := st.Results.FieldCentre, fm.At(calc.Vec{}); got.Sub(w).Norm() > 1e-15*w.Norm() {
		t.Errorf("all coils at the origin: %v, want %v", got, w)
	}
}

// Limits the spec cannot judge are positioned errors with suggestions.
func TestLimitSubjectErrors(t *testing.T) {
	cases := []struct{ limit, msg string }{
		{"moment(torquer W) >= 1 mA m2", `unknown subject "torquer W"; did you mean "torquer X"?`},
		{"field(nowhere) <= 1 mT", `unknown subject "nowhere"`},
		{"moment(magnetometer) >= 1 mA m2", "moment is not said of a probe"},
		{"gradient(torquer X) >= 1 mT/m", "not an opposing pair"},
		{"uniform-radius >= 10 mm", "name the coil it is about"},
		{"moment(torquer X >= 1 mA m2", "malformed limit"},
		{"uniform-radius(torquer X, 150 %) >= 1 mm", "tolerance"},
	}
	base := strings.Split(threeAxis, "```limits")[0]
	for _, c := range cases {
		src := base + "```limits\n" + c.limit + "\n```\n"
		_, diags := Run("bad.md", []byte(src), Options{})
		line := strings.Count(base, "\n") + 2
		found := false
		for _, d := range diags {
			if d.Line == line && strings.Contains(d.Msg, c.msg) {
				found = true
			}
		}
		if !found {
			t.Errorf("%q: diagnostics %v; want line %d %q", c.limit, diags, line, c.msg)
		}
	}
}

// A runaway coil fails a temperature limit whatever its value (the
// temperature is unknown), and the other limits new to the vocabulary
// are computed from the results they name.
func TestLimitQuantities(t *testing.T) {
	src := "```coil\nname = hot\nmean-diameter = 50 mm\nturns = 50\nwire = AWG 36\ncurrent = 3 A\n```\n" +
		"```conditions\ncooling = h = 5 W/m2K\n```\n```limits\ntemperature <= 1000000 degC\n```\n"
	st, diags := Run("hot.md", []byte(src), Options{})
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	if !st.Results.Coils[0].Runaway || st.Limits[0].Pass {
		t.Errorf("runaway %v, temperature limit pass %v", st.Results.Coils[0].Runaway, st.Limits[0].Pass)
	}
	src = "```coil\nname = v\nform = solenoid\ninner-diameter = 10 mm\nradial-build = 8 mm\nlength = 20 mm\nturns = 1500\nwire = AWG 34\nvoltage = 24 V\nswitch-off = 10 us\nduty = 50 %\n```\n" +
		"```limits\npower-on <= 100 W\nswitch-off-voltage <= 60 V\ntime-constant <= 1 s\nsurface-temperature <= 200 degC\n```\n"
	st, diags = Run("v.md", []byte(src), Options{})
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	cr := st.Results.Coils[0]
	// the spike at the largest current the switch opens: the cold
	// switch-on current of this voltage drive, L·I₂₀/t_off + V
	if !(cr.Switch.WorstCurrent > 1.05*math.Abs(cr.Current)) {
		t.Errorf("switch-on current %g A not above the hot current %g A", cr.Switch.WorstCurrent, cr.Current)
	}
	for i, w := range []float64{cr.PowerOn, cr.Inductance*math.Max(math.Abs(cr.Current), cr.Switch.WorstCurrent)/10e-6 + 24, cr.Inductance / cr.RHot, st.Coils[0].Heat.SurfaceMax} {
		if got := st.Limits[i].Computed; math.Abs(got-w) > 1e-9*w {
			t.Errorf("%s: computed %g, want %g", st.Limits[i].Limit.Quantity, got, w)
		}
	}
	if !(cr.PowerOn > 1.9*cr.Power) {
		t.Errorf("power while energised %g W against the 50 %% duty average %g W", cr.PowerOn, cr.Power)
	}
}

// The 0.5 mT finding comes from the field next to every winding, not
// from where the spec's author put probes: the rectangular panel coil,
// its probes removed, still reaches more than 0.5 mT at its wire and
// beyond 10 mm from it (its field there is of the order of
// μ0·N·I/(2π d) of the side's bundle, 1.6 mT at d = 10 mm).
func TestImplantFindingWithoutProbes(t *testing.T) {
	src, err := os.ReadFile("../examples/panel-coil.md")
	if err != nil {
		t.Fatal(err)
	}
	text := string(src)
	if i := strings.Index(text, "```probes"); i >= 0 {
		j := strings.Index(text[i+3:], "```")
		text = text[:i] + text[i+3+j+3:]
	}
	text = strings.Replace(text, "field(module) >= 250 uT\n", "", 1) // the probe it names is gone
	st, diags := Run("panel.md", []byte(text), Options{})
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	if len(st.Spec.Design.Probes) != 0 {
		t.Fatal("probes not removed")
	}
	ir := st.Safety.Implant
	if !ir.Any() || len(ir.Windings) != 1 || !(ir.Windings[0].Surface > ImplantField) || !(ir.Windings[0].Distance > 0.010) {
		t.Errorf("implant reach %+v: want the winding's surface above 0.5 mT and the contour beyond 10 mm", ir)
	}
	// The contour lies where the field has fallen to the level.
	w := ir.Windings[0]
	t.Logf("panel coil: %.3g T at the surface, 0.5 mT at %.3g m from it", w.Surface, w.Distance)
}
