package spec

import (
	"fmt"
	"math"
	"os"
	"path/filepath"
	"reflect"
	"strings"
	"testing"
	"unicode"
	"unicode/utf8"

	"coilmemo/calc"
	"coilmemo/doc"
)

// coil is a valid coil block body; tests splice broken lines into it.
const coilBody = "mean-diameter = 40 mm\nturns = 100\nwire = AWG 28\ncurrent = 0.5 A\n"

func fenced(kind, body string) string { return "```" + kind + "\n" + body + "```\n" }

func TestBroken(t *testing.T) {
	cases := []struct {
		name string
		src  string
		line int
		msg  string
	}{
		{"overfull single layer", fenced("coil", "form = solenoid\nmean-diameter = 32 mm\nlength = 120 mm\nturns = 300\nwire = AWG 26\nwire-outer-diameter = 0.45 mm\ncurrent = 1 A\n"), 5,
			`coil "coil 1": winding overfull: 300 turns of 0.45 mm wire need 135 mm of length, more than the 120 mm given`},
		{"overfull multilayer", fenced("coil", "form = solenoid\ninner-diameter = 20 mm\nlength = 10 mm\nradial-build = 1 mm\nturns = 100\nwire = 0.5 mm\nwire-outer-diameter = 0.55 mm\ncurrent = 1 A\n"), 6,
			`coil "coil 1": winding overfull`},
		{"misspelt key", fenced("coil", coilBody+"mean-diamter = 41 mm\n"), 6,
			`unknown key "mean-diamter" in coil block; did you mean "mean-diameter"?`},
		{"center", fenced("coil", coilBody+"center = (0, 0, 1) mm\n"), 6,
			`unknown key "center" in coil block; did you mean "centre"?`},
		{"key of another block", fenced("coil", coilBody+"ambient = 20 degC\n"), 6,
			`key "ambient" belongs in the conditions block, not the coil block`},
		{"emissivity in coil", fenced("coil", coilBody+"emissivity = 0.9\n"), 6,
			`emissivity belongs in the conditions block`},
		{"turns with unit", fenced("coil", "mean-diameter = 40 mm\nturns = 100 mm\nwire = AWG 28\ncurrent = 1 A\n"), 3,
			`turns: want a whole number without a unit, not "100 mm"`},
		{"turns not integer", fenced("coil", "mean-diameter = 40 mm\nturns = 100.5\nwire = AWG 28\ncurrent = 1 A\n"), 3,
			`turns: 100.5 is not a whole number`},
		{"turns zero", fenced("coil", "mean-diameter = 40 mm\nturns = 0\nwire = AWG 28\ncurrent = 1 A\n"), 3,
			`turns: 0 must be at least 1`},
		{"length as current", fenced("coil", "mean-diameter = 40 mm\nturns = 100\nwire = AWG 28\ncurrent = 120 mm\n"), 5,
			`current: 120 mm is a length; want a current (A)`},
		{"missing unit", fenced("coil", "mean-diameter = 40\nturns = 100\nwire = AWG 28\ncurrent = 1 A\n"), 2,
			`mean-diameter: no unit given: 40 (expected a length such as mm)`},
		{"unknown unit", fenced("coil", "mean-diameter = 40 mmm\nturns = 100\nwire = AWG 28\ncurrent = 1 A\n"), 2,
			`mean-diameter: unknown unit "mmm"`},
		{"unknown form", fenced("coil", coilBody+"form = helix\n"), 6,
			`form = helix: want one of loop, solenoid, rectangle, pair`},
		{"negative size", fenced("coil", "mean-diameter = -40 mm\nturns = 100\nwire = AWG 28\ncurrent = 1 A\n"), 2,
			`mean-diameter: -40 mm must be greater than zero`},
		{"two drives", fenced("coil", coilBody+"voltage = 5 V\n"), 6,
			`both current and voltage given`},
		{"no drive", "# Title\n\n" + fenced("coil", "mean-diameter = 40 mm\nturns = 100\nwire = AWG 28\n"), 3,
			`coil "coil 1": no drive: give current or voltage`},
		{"duplicate key", fenced("coil", coilBody+"turns = 120\n"), 6,
			`duplicate key "turns" in coil block (first given on line 3)`},
		{"missing turns", "\n" + fenced("coil", "mean-diameter = 40 mm\nwire = AWG 28\ncurrent = 1 A\n"), 2,
			`missing turns`},
		{"missing wire", fenced("coil", "mean-diameter = 40 mm\nturns = 10\ncurrent = 1 A\n"), 1,
			`missing wire`},
		{"missing diameter", fenced("coil", "turns = 10\nwire = AWG 28\ncurrent = 1 A\n"), 1,
			`missing mean-diameter (or inner-diameter + outer-diameter)`},
		{"inner >= outer", fenced("coil", "inner-diameter = 50 mm\nouter-diameter = 40 mm\nturns = 100\nwire = AWG 28\ncurrent = 1 A\n"), 3,
			`inner-diameter 50 mm is not less than outer-diameter 40 mm`},
		{"mean with inner", fenced("coil", coilBody+"inner-diameter = 30 mm\n"), 6,
			`give either mean-diameter or inner-diameter + outer-diameter, not both`},
		{"inner alone", fenced("coil", "inner-diameter = 30 mm\nturns = 100\nwire = AWG 28\ncurrent = 1 A\n"), 2,
			`inner-diameter alone does not fix the winding: add outer-diameter or radial-build`},
		{"inconsistent build", fenced("coil", "inner-diameter = 30 mm\nouter-diameter = 40 mm\nradial-build = 4 mm\nturns = 100\nwire = AWG 28\ncurrent = 1 A\n"), 4,
			`radial-build 4 mm disagrees with (outer-diameter − inner-diameter)/2 = 0.005 m`},
		{"build too deep", fenced("coil", coilBody+"radial-build = 50 mm\n"), 6,
			`radial-build 50 mm is not less than mean-diameter 40 mm`},
		{"solenoid without length", "text\n\n" + fenced("coil", coilBody+"form = solenoid\n"), 3,
			`a solenoid needs length`},
		{"rectangle without width", fenced("coil", "form = rectangle\nheight = 40 mm\nturns = 100\nwire = AWG 28\ncurrent = 1 A\n"), 1,
			`a rectangle needs width`},
		{"rectangle with diameter", fenced("coil", "form = rectangle\nwidth = 40 mm\nheight = 40 mm\nmean-diameter = 40 mm\nturns = 100\nwire = AWG 28\ncurrent = 1 A\n"), 5,
			`mean-diameter does not apply to form = rectangle`},
		{"pair without spacing", fenced("coil", coilBody+"form = pair\n"), 1,
			`a pair needs spacing`},
		{"spacing on a loop", fenced("coil", coilBody+"spacing = 20 mm\n"), 6,
			`spacing applies only to form = pair (this coil is a loop)`},
		{"test plane on a loop", fenced("coil", coilBody+"test-plane = 20 mm\n"), 6,
			`test-plane applies only to form = rectangle (this coil is a loop)`},
		{"test plane not a length", fenced("coil", "form = rectangle\nwidth = 40 mm\nheight = 40 mm\nturns = 10\nwire = AWG 28\ncurrent = 1 A\ntest-plane = 2 A\n"), 8,
			`test-plane: 2 A is a current; want a length`},
		{"malformed line", fenced("coil", coilBody+"turns 200\n"), 6,
			`malformed line "turns 200" in coil block: want key = value`},
		{"bad vector", fenced("coil", coilBody+"centre = (0, 0) mm\n"), 6,
			`centre: bad vector "(0, 0) mm": want three components (x, y, z), found 2`},
		{"vector without unit", fenced("coil", coilBody+"centre = (0, 0, 5)\n"), 6,
			`centre: no unit given: (0, 0, 5) (expected a length such as mm)`},
		{"axis without direction", fenced("coil", coilBody+"axis = (0, 0, 0)\n"), 6,
			`axis: (0, 0, 0) has no direction`},
		{"bad axis", fenced("coil", coilBody+"axis = w\n"), 6,
			`axis: "w": want x, y, z`},
		{"duty over 100", fenced("coil", coilBody+"duty = 150 %\n"), 6,
			`duty: 150 % is outside 0..100 %`},
		{"duty without percent", fenced("coil", coilBody+"duty = 0.5\n"), 6,
			`duty: no unit given: 0.5 (expected a percentage such as 50 %)`},
		{"unknown conductor", fenced("coil", coilBody+"conductor = gold\n"), 6,
			`conductor = gold: want copper or aluminium`},
		{"awg out of range", fenced("coil", "mean-diameter = 40 mm\nturns = 100\nwire = AWG 60\ncurrent = 1 A\n"), 4,
			`wire: AWG 60 is outside the gauge range AWG 4/0 … AWG 56`},
		{"wire bare number", fenced("coil", "mean-diameter = 40 mm\nturns = 100\nwire = 24\ncurrent = 1 A\n"), 4,
			`for a gauge write AWG 24`},
		{"outer over bare", fenced("coil", coilBody+"wire-outer-diameter = 0.2 mm\n"), 6,
			`wire-outer-diameter 0.2 mm is not more than the bare diameter 0.`},
		{"insulation class", fenced("coil", coilBody+"insulation-class = Q\n"), 6,
			`insulation-class: "Q": want a temperature such as 155 degC, or a class letter`},
		{"insulation no unit", fenced("coil", coilBody+"insulation-class = 150\n"), 6,
			`insulation-class: no unit given: 150`},
		{"unterminated quote", fenced("coil", coilBody+"name = \"X coil\n"), 6,
			`unterminated quote`},
		{"no value", fenced("coil", coilBody+"name =\n"), 6, `name: no value after "="`},
		{"handling ambient without unit", fenced("coil", coilBody) + fenced("conditions", "ambient = 60 degC\nhandling-ambient = 25\n"), 9,
			`handling-ambient: no unit given: 25`},
		{"handling ambient too hot", fenced("coil", coilBody) + fenced("conditions", "handling-ambient = 600 degC\n"), 8,
			`handling-ambient: 600 degC is more than 500 degC`},
		{"unmodelled core as a figure", fenced("coil", coilBody+"unmodelled-core = 5000\n"), 6,
			`unmodelled-core = 5000: name the part that sits in the bore unmodelled (e.g. plunger), not a figure`},
		{"unmodelled core name too long", fenced("coil", coilBody+"unmodelled-core = "+strings.Repeat("plunger ", 9)+"\n"), 6,
			`unmodelled-core: the part's name is 71 characters long; give at most 60`},
		{"unmodelled core empty", fenced("coil", coilBody+"unmodelled-core =\n"), 6, `unmodelled-core: no value after "="`},
		{"duplicate coil name", fenced("coil", coilBody+"name = X\n") + fenced("coil", coilBody+"name = X\n"), 13,
			`coil name "X" is already used by the coil block on line 1`},
		{"no coil block", "# Nothing here\n\nJust prose.\n", 1, `no coil block`},
		{"bad date", fenced("memo", "title = T\ndate = 14/03/2025\n") + fenced("coil", coilBody), 3,
			`date: "14/03/2025" is not an ISO 8601 date`},
		{"unknown memo key", fenced("memo", "titel = T\n") + fenced("coil", coilBody), 2,
			`unknown key "titel" in memo block; did you mean "title"?`},
		{"second memo block", fenced("memo", "title = A\n") + fenced("coil", coilBody) + fenced("memo", "title = B\n"), 10,
			`second memo block (the first is on line 1)`},
		{"unknown limit quantity", fenced("coil", coilBody) + fenced("limits", "momnet >= 0.2 A m2\n"), 8,
			`unknown limit quantity "momnet"; did you mean "moment"?`},
		{"bad relation", fenced("coil", coilBody) + fenced("limits", "moment > 0.2 A m2\n"), 8,
			`bad relation ">" in "moment > 0.2 A m2": want <= (at most) or >= (at least)`},
		{"equal relation", fenced("coil", coilBody) + fenced("limits", "power = 2 W\n"), 8,
			`bad relation "="`},
		{"limit dimension", fenced("coil", coilBody) + fenced("limits", "moment >= 0.2 T\n"), 8,
			`limit moment: 0.2 T is a flux density; want a magnetic moment (A·m²)`},
		{"limit without relation", fenced("coil", coilBody) + fenced("limits", "moment 0.2 A m2\n"), 8,
			`malformed limit "moment 0.2 A m2"`},
		{"duplicate limit", fenced("coil", coilBody) + fenced("limits", "power <= 2 W\npower <= 3 W\n"), 9,
			`duplicate limit power <= (first given on line 8)`},
		{"probe without unit", fenced("coil", coilBody) + fenced("probes", "sensor = (0, 0, 120)\n"), 8,
			`probe sensor: no unit given`},
		{"unknown cooling", fenced("coil", coilBody) + fenced("conditions", "cooling = fan\n"), 8,
			`cooling = fan: want one of still-air, vacuum, h = <value> W/m2K`},
		{"h in vacuum", fenced("coil", coilBody) + fenced("conditions", "cooling = vacuum\nh = 5 W/m2K\n"), 9,
			`cooling = vacuum takes no convective coefficient h`},
		{"h wrong dimension", fenced("coil", coilBody) + fenced("conditions", "h = 5 W/m2\n"), 8,
			`h: 5 W/m2 has dimension kg·s⁻³; want a heat-transfer coefficient (W/(m²·K))`},
		{"ambient in celsius spelt C", fenced("coil", coilBody) + fenced("conditions", "ambient = 25 C\n"), 8,
			`ambient: unknown unit "C" (for degrees Celsius write degC or °C)`},
		{"design angle without unit", fenced("coil", coilBody) + fenced("conditions", "design-angle = 90\n"), 8,
			`design-angle: no unit given: 90 (expected an angle such as deg)`},
		{"emissivity range", fenced("coil", coilBody) + fenced("conditions", "emissivity = 1.5\n"), 8,
			`emissivity: 1.5 is outside 0..1`},
		{"near-miss block name", fenced("coils", coilBody) + fenced("coil", coilBody), 1,
			`fenced block "coils" is not a parameter block; did you mean "coil"?`},
		{"sweep backwards", fenced("coil", coilBody) + fenced("sweep", "turns = 100 .. 50 step 10\n"), 8,
			`sweep turns: 100 .. 50: the end must be greater than the start`},
		{"sweep unknown coil", fenced("coil", coilBody) + fenced("sweep", "turns = 100 .. 500 step 100\ncoil = Z\n"), 9,
			`sweep: no coil named "Z" (coils: "coil 1")`},
		{"sweep form", fenced("coil", coilBody) + fenced("sweep", "form = loop .. pair step 1\n"), 8,
			`cannot sweep "form"`},
		{"sweep two parameters", fenced("coil", coilBody) + fenced("sweep", "turns = 100 .. 500 step 100\ncurrent = 1 .. 2 A step 0.5\n"), 9,
			`a sweep steps one parameter; "current" is a second one`},
		{"sweep against the drive", fenced("coil", coilBody) + fenced("sweep", "voltage = 1 .. 5 V step 1 V\n"), 8,
			`sweep voltage: coil "coil 1" is driven by current`},
		{"sweep without step", fenced("coil", coilBody) + fenced("sweep", "turns = 100 .. 500\n"), 8,
			`missing step`},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			_, ds := Parse("t.md", []byte(c.src))
			for _, d := range ds {
				if d.Line == c.line && strings.Contains(d.Msg, c.msg) {
					if d.File != "t.md" {
						t.Errorf("file %q", d.File)
					}
					return
				}
			}
			t.Errorf("want line %d: %q; got\n%s", c.line, c.msg, ds.Error())
		})
	}
}

// Every problem is reported, in line order, not only the first.
func TestAllProblemsReported(t *testing.T) {
	src := fenced("coil", "mean-diamter = 40 mm\nturns = 1.5\nwire = AWG 99\ncurrent = 2 m\n") +
		fenced("limits", "moment ~ 1\n")
	_, ds := Parse("s.md", []byte(src))
	var lines []int
	for _, d := range ds {
		lines = append(lines, d.Line)
	}
	want := []int{1, 2, 3, 4, 5, 8}
	if !reflect.DeepEqual(lines, want) {
		t.Errorf("lines %v, want %v:\n%s", lines, want, ds.Error())
	}
	if !strings.HasPrefix(ds.Error(), "s.md:1: ") {
		t.Errorf("Error() = %q", ds.Error())
	}
}

func near(a, b float64) bool { return math.Abs(a-b) <= 1e-9*math.Max(math.Abs(a), math.Abs(b)) }

func TestGoodSpec(t *testing.T) {
	src, err := os.ReadFile("testdata/good.md")
	if err != nil {
		t.Fatal(err)
	}
	s, ds := Parse("good.md", src)
	if len(ds) > 0 {
		t.Fatalf("diagnostics:\n%s", ds.Error())
	}
	m := s.Memo
	if m.Title != "Kestrel-3 X-axis magnetorquer" || m.Client != "Northfield Orbital Ltd" ||
		m.DocumentID != "NO-K3-CALC-014" || m.Revision != "B" || m.Status != "For review #2" ||
		m.DateValue.Format("2006-01-02") != "2025-03-14" {
		t.Errorf("memo %+v", m)
	}
	d := s.Design
	if len(d.Coils) != 1 {
		t.Fatalf("%d coils", len(d.Coils))
	}
	c := d.Coils[0]
	checks := []struct {
		name      string
		got, want float64
	}{
		{"mean diameter", c.MeanDiameter, 0.075},
		{"inner", c.InnerDiameter, 0.070},
		{"outer", c.OuterDiameter, 0.080},
		{"radial build", c.RadialBuild, 0.005},
		{"length", c.Length, 0.006},
		{"bare AWG 32", c.Wire.Bare, 0.127e-3 * math.Pow(92, 4.0/39)},
		{"voltage", c.Voltage, 5},
		{"duty", c.Duty, 0.5},
		{"insulation F", c.InsulationClass, 428.15},
		{"ambient", d.Conditions.Ambient, 313.15},
		{"Bx", d.Conditions.BackgroundField[0], 20e-6},
		{"Bz", d.Conditions.BackgroundField[2], 45e-6},
		{"design angle", d.Conditions.DesignAngle, math.Pi / 2},
		{"emissivity", d.Conditions.Cooling.Emissivity, 0.9},
	}
	for _, k := range checks {
		if !near(k.got, k.want) {
			t.Errorf("%s = %v, want %v", k.name, k.got, k.want)
		}
	}
	if c.Name != "X torquer" || c.Form != calc.Loop || c.Turns != 200 || c.Wire.Gauge != 32 ||
		c.Drive != calc.VoltageDrive || c.Axis != (calc.Vec{1, 0, 0}) || c.Centre != (calc.Vec{0, 0, 0.01}) ||
		c.Wire.Material.Name != "copper" || !c.Wire.OuterEstimated || !(c.Wire.Outer > c.Wire.Bare) {
		t.Errorf("coil %+v", c)
	}
	if !d.Conditions.Cooling.Vacuum || d.Conditions.Cooling.H != 0 {
		t.Errorf("cooling %+v", d.Conditions.Cooling)
	}
	wantLimits := []calc.Limit{
		{Quantity: "moment", Relation: calc.AtLeast, Required: 0.2, Line: 59},
		{Quantity: "temperature", Relation: calc.AtMost, Required: 393.15, Line: 60},
		{Quantity: "mass", Relation: calc.AtMost, Required: 0.05, Line: 61},
		{Quantity: "current-density", Relation: calc.AtMost, Required: 4e6, Line: 62},
	}
	if len(d.Limits) != len(wantLimits) {
		t.Fatalf("limits %+v", d.Limits)
	}
	for i, l := range d.Limits {
		w := wantLimits[i]
		if l.Quantity != w.Quantity || l.Relation != w.Relation || !near(l.Required, w.Required) || l.Line != w.Line {
			t.Errorf("limit %d = %+v, want %+v", i, l, w)
		}
	}
	wantProbes := []calc.Probe{{Name: "magnetometer", At: calc.Vec{0, 0.06, 0}}, {Name: "star tracker", At: calc.Vec{0, -0.08, 0.02}}}
	if !reflect.DeepEqual(d.Probes, wantProbes) {
		t.Errorf("probes %+v", d.Probes)
	}
	if s.Sweep == nil || s.Sweep.Param != "turns" || s.Sweep.From != 100 || s.Sweep.To != 400 || s.Sweep.Step != 50 {
		t.Errorf("sweep %+v", s.Sweep)
	} else if v := s.Sweep.Values(); len(v) != 7 || v[6] != 400 {
		t.Errorf("sweep values %v", v)
	}
	// entries: as written, with SI
	find := func(block, key string) Entry {
		for _, e := range s.Entries {
			if e.Block == block && e.Key == key {
				return e
			}
		}
		t.Errorf("no entry %s/%s", block, key)
		return Entry{}
	}
	for _, w := range []Entry{
		{Block: "coil", Key: "inner-diameter", Raw: "70 mm", Line: 37, SI: "0.07 m", Coil: "X torquer"},
		{Block: "coil", Key: "wire", Raw: "AWG 32", Line: 41, SI: "AWG 32 (bare 0.202 mm)", Coil: "X torquer"},
		{Block: "conditions", Key: "ambient", Raw: "40 degC", Line: 51, SI: "313.15 K"},
		{Block: "limits", Key: "moment", Raw: ">= 0.2 A m2", Line: 59, SI: ">= 0.2 A·m²"},
		{Block: "probes", Key: "star tracker", Raw: "(0 mm, -80 mm, 20 mm)", Line: 67, SI: "(0, -0.08, 0.02) m"},
	} {
		if got := find(w.Block, w.Key); got != w {
			t.Errorf("entry %+v, want %+v", got, w)
		}
	}
	if e := find("coil", "mean-diameter"); !e.Default || !strings.HasPrefix(e.SI, "0.075 m") {
		t.Errorf("derived mean-diameter entry %+v", e)
	}
	// lines in order for the entries written in the spec
	last := 0
	for _, e := range s.Entries {
		if e.Default {
			continue
		}
		if e.Line <= last {
			t.Errorf("entry %s/%s on line %d after line %d", e.Block, e.Key, e.Line, last)
		}
		last = e.Line
	}
}

func TestDefaults(t *testing.T) {
	s, ds := Parse("d.md", []byte(fenced("coil", coilBody)+fenced("coil", coilBody+"centre = (0, 0, 100) mm\n")))
	if len(ds) > 0 {
		t.Fatal(ds.Error())
	}
	c := s.Design.Coils[0]
	if c.Name != "coil 1" || s.Design.Coils[1].Name != "coil 2" || c.Form != calc.Loop || c.Duty != 1 ||
		c.InsulationClass != 403.15 || c.Axis != (calc.Vec{0, 0, 1}) || c.Drive != calc.CurrentDrive ||
		c.Current != 0.5 || c.Wire.Material.Name != "copper" || c.MeanDiameter != 0.04 || c.RadialBuild != 0 {
		t.Errorf("coil %+v", c)
	}
	cond := s.Design.Conditions
	if cond.Ambient != 293.15 || cond.DesignAngle != math.Pi/2 || cond.Cooling.Vacuum ||
		cond.Cooling.H != 10 || cond.Cooling.HGiven || cond.Cooling.Emissivity != 0.85 || cond.BackgroundField != (calc.Vec{}) {
		t.Errorf("conditions %+v", cond)
	}
	if s.Sweep != nil || len(s.Design.Limits) != 0 || len(s.Design.Probes) != 0 {
		t.Errorf("unexpected sweep/limits/probes")
	}
	n := 0
	for _, e := range s.Entries {
		if e.Default && e.Block == "conditions" {
			n++
			if e.Line != 0 {
				t.Errorf("default of absent block on line %d", e.Line)
			}
			if e.Key == "handling-ambient" && !strings.Contains(e.SI, "the ambient") {
				t.Errorf("handling-ambient default in still air: %q, want the ambient", e.SI)
			}
		}
	}
	if n != 7 {
		t.Errorf("%d condition defaults, want 7", n)
	}
	if cond.HandlingAmbient != 0 {
		t.Errorf("handling-ambient unstated, read as %g K", cond.HandlingAmbient)
	}
}

func TestForms(t *testing.T) {
	src := "# Bench\n\n" +
		fenced("coil", "name = Helmholtz\nform = pair\nmean-diameter = 300 mm\nspacing = 150 mm\nsense = opposing\nturns = 50\nwire = 1.2 mm\nwire-outer-diameter = 1.3 mm\nconductor = aluminium\ncurrent = 2 A\naxis = (1, 1, 0)\n") +
		fenced("coil", "name = frame\nform = rectangle\nwidth = 1 ft\nheight = 8 in\nturns = 10\nwire = AWG 4/0\nvoltage = 12 V\ninsulation-class = 180 degC\ncentre = (0, 0, 1) m\n") +
		fenced("coil", "name = sol\nform = solenoid\nouter-diameter = 30 mm\nradial-build = 5 mm\nlength = 60 mm\nturns = 400\nwire = 20 mil\ncurrent = 300 mA\n") +
		fenced("conditions", "background-field = 50 uT\ncooling = h = 12 W/(m2 K)\nambient = 300 K\n") +
		fenced("sweep", "current = 1 .. 3 A step 500 mA\ncoil = Helmholtz\n")
	s, ds := Parse("f.md", []byte(src))
	if len(ds) > 0 {
		t.Fatal(ds.Error())
	}
	if s.Memo.Title != "Bench" {
		t.Errorf("title from heading: %q", s.Memo.Title)
	}
	p, r, sol := s.Design.Coils[0], s.Design.Coils[1], s.Design.Coils[2]
	if p.Form != calc.Pair || !p.Opposing || p.Spacing != 0.15 || p.Wire.Gauge != calc.NoGauge ||
		p.Wire.Bare != 1.2e-3 || p.Wire.Outer != 1.3e-3 || p.Wire.OuterEstimated || p.Wire.Material.Name != "aluminium" ||
		!near(p.Axis[0], math.Sqrt(0.5)) || !near(p.Axis[1], math.Sqrt(0.5)) || p.Axis[2] != 0 {
		t.Errorf("pair %+v", p)
	}
	if r.Form != calc.Rectangle || !near(r.Width, 0.3048) || !near(r.Height, 0.2032) || r.Wire.Gauge != -3 ||
		!near(r.Wire.Bare, 11.684e-3) || r.Drive != calc.VoltageDrive || r.Voltage != 12 || r.InsulationClass != 453.15 || r.MeanDiameter != 0 {
		t.Errorf("rectangle %+v", r)
	}
	if sol.Form != calc.Solenoid || !near(sol.MeanDiameter, 0.025) || sol.OuterDiameter != 0.03 || sol.InnerDiameter != 0 ||
		!near(sol.Wire.Bare, 0.508e-3) || !near(sol.Current, 0.3) {
		t.Errorf("solenoid %+v", sol)
	}
	cond := s.Design.Conditions
	if cond.BackgroundField != (calc.Vec{50e-6, 0, 0}) || cond.Cooling.H != 12 || !cond.Cooling.HGiven || cond.Ambient != 300 {
		t.Errorf("conditions %+v", cond)
	}
	if sw := s.Sweep; sw == nil || sw.Coil != "Helmholtz" || sw.From != 1 || sw.To != 3 || sw.Step != 0.5 || len(sw.Values()) != 5 {
		t.Errorf("sweep %+v", s.Sweep)
	}
}

func TestAWG(t *testing.T) {
	cases := map[string]int{"AWG 24": 24, "awg24": 24, "24 AWG": 24, "AWG 4/0": -3, "AWG 0000": -3,
		"AWG 2/0": -1, "AWG 00": -1, "AWG 1/0": 0, "AWG 0": 0, "AWG 56": 56, "AWG #10": 10}
	for in, want := range cases {
		g, bare, err := parseWire(in)
		if err != nil || g != want || !near(bare, calc.AWGDiameter(want)) {
			t.Errorf("parseWire(%q) = %d, %v, %v; want %d", in, g, bare, err, want)
		}
	}
	for _, in := range []string{"AWG", "AWG 57", "AWG 5/0", "AWG 00000", "AWG x", "AWG 024"} {
		if _, _, err := parseWire(in); err == nil {
			t.Errorf("parseWire(%q) accepted", in)
		}
	}
	// AWG 36 is 0.005 in and AWG 4/0 is 0.46 in by definition.
	if !near(calc.AWGDiameter(36), 0.005*0.0254) || !near(calc.AWGDiameter(-3), 0.46*0.0254) {
		t.Error("AWG anchors")
	}
	if s := gaugeName(28); s != "AWG 28" {
		t.Error(s)
	}
	if s := gaugeName(-3); s != "AWG 4/0" {
		t.Error(s)
	}
}

func TestNarrative(t *testing.T) {
	src := `# Purpose

Size the *bench* coil with **care** and ` + "`code`" + `, see [notes](http://x.invalid) \*here\*
and &amp; there.

## Steps

1. first
2. second
   - nested *a*
   - nested b

> quoted **text**

| A | B |
|---|--:|
| 1 | **2** |

` + "```" + `
raw code
  indented
` + "```" + `

` + fenced("coil", coilBody) + `
<!-- a comment -->

---
Closing.
`
	s, ds := Parse("n.md", []byte(src))
	if len(ds) > 0 {
		t.Fatal(ds.Error())
	}
	want := []doc.Block{
		doc.Heading{Level: 1, Text: "Purpose"},
		doc.Paragraph{Spans: []doc.Span{
			{Text: "Size the "}, {Text: "bench", Emph: true}, {Text: " coil with "}, {Text: "care", Strong: true},
			{Text: " and "}, {Text: "code", Code: true}, {Text: ", see notes *here* and & there."},
		}},
		doc.Heading{Level: 2, Text: "Steps"},
		doc.List{Ordered: true, Items: [][]doc.Block{
			{doc.Text("first")},
			{doc.Text("second"), doc.List{Items: [][]doc.Block{
				{doc.Paragraph{Spans: []doc.Span{{Text: "nested "}, {Text: "a", Emph: true}}}},
				{doc.Text("nested b")},
			}}},
		}},
		doc.Paragraph{Spans: []doc.Span{{Text: "quoted "}, {Text: "text", Strong: true}}},
		doc.Table{Header: []string{"A", "B"}, Rows: [][]doc.Cell{{{Text: "1"}, {Text: "2", Strong: true}}},
			Align: []doc.Align{doc.Left, doc.Right}},
		doc.Code{Text: "raw code\n  indented"},
		doc.Text("Closing."),
	}
	if !reflect.DeepEqual(s.Narrative, want) {
		t.Errorf("narrative\n got %#v\nwant %#v", s.Narrative, want)
	}
}

func TestSuggest(t *testing.T) {
	cases := []struct{ in, want string }{
		{"mean-diamter", "mean-diameter"}, {"center", "centre"}, {"tunrs", "turns"},
		{"mean diameter", "mean-diameter"}, {"wrie", "wire"}, {"xyzzy", ""}, {"coolant", ""},
	}
	for _, c := range cases {
		if got := nearest(c.in, coilKeys); got != c.want {
			t.Errorf("nearest(%q) = %q, want %q", c.in, got, c.want)
		}
	}
	if EditDistance("ab", "ba") != 1 || EditDistance("", "abc") != 3 || EditDistance("kitten", "sitting") != 3 {
		t.Error("distance")
	}
}

func TestCRLF(t *testing.T) {
	src := strings.ReplaceAll("# T\n\n"+fenced("coil", coilBody+"centre = (0, 0, 1) mm # above the board\n"), "\n", "\r\n")
	s, ds := Parse("c.md", []byte(src))
	if len(ds) > 0 {
		t.Fatal(ds.Error())
	}
	if s.Design.Coils[0].Centre != (calc.Vec{0, 0, 0.001}) {
		t.Errorf("centre %v", s.Design.Coils[0].Centre)
	}
}

// brokenSeeds are spec fragments for the fuzz corpus.
func brokenSeeds() []string {
	return []string{
		fenced("coil", coilBody+"mean-diamter = 41 mm\n"),
		fenced("coil", "turns = 1.5\nwire = AWG 99\ncurrent = 2 m\n") + fenced("limits", "moment ~ 1\n"),
		fenced("coil", coilBody+"form = pair\ncentre = (0, 0\n") + fenced("sweep", "turns = 1 .. step\n"),
		fenced("conditions", "cooling = h = \nbackground-field = (1, 2, 3, 4) uT\n"),
		"```coil\nname = \"x\n",
		"> ```coil\n> turns = 3\n",
		"- ```limits\n  power <= 3 W\n  ```\n",
	}
}

// FuzzParse: whatever the text, the reader returns a spec and positioned
// messages (a line of the file, valid UTF-8, nothing unprintable), the
// same ones each time; a spec it accepts holds only valid, printable text
// (what reaches the PDF writer) and entries on lines of the file.
func FuzzParse(f *testing.F) {
	if good, err := os.ReadFile("testdata/good.md"); err == nil {
		f.Add(string(good))
	}
	examples, _ := filepath.Glob("../examples/*.md")
	for _, p := range examples {
		if b, err := os.ReadFile(p); err == nil {
			f.Add(string(b))
		}
	}
	for _, s := range brokenSeeds() {
		f.Add(s)
	}
	for _, s := range []string{
		"\ufeff# Title\n\n" + fenced("coil", coilBody),
		"# Bad \xff byte\n\nSome \xff prose\n\n" + fenced("coil", coilBody),
		"<div>\n" + fenced("limits", "power <= 1 W\n") + fenced("coil", coilBody),
		fenced("coil", coilBody+"duty = 50 %\non-time = 2 h\n"),
		fenced("coil", coilBody) + fenced("sweep", "current = 1 .. -1 A step 0.5 A\n"),
		fenced("coil", coilBody) + fenced("tolerances", "supply = ±5 %\nturns = ±2\n"),
		fenced("memo", "title = a\x01b\nhistory = A | 2026-01-01 | me | x\n") + fenced("coil", coilBody),
	} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, src string) {
		s, ds := Parse("f.md", []byte(src))
		if s == nil {
			t.Fatal("nil spec")
		}
		lines := strings.Count(src, "\n") + 1
		for i, d := range ds {
			if d.Line < 1 || d.Line > lines || d.File != "f.md" || d.Msg == "" {
				t.Errorf("bad diagnostic %+v (the file has %d lines)", d, lines)
			}
			if !printable(d.Msg, false) {
				t.Errorf("diagnostic message not printable: %q", d.Msg)
			}
			if i > 0 && ds[i-1].Line > d.Line {
				t.Errorf("diagnostics out of order")
			}
		}
		_, again := Parse("f.md", []byte(src))
		if !reflect.DeepEqual(ds, again) {
			t.Errorf("two readings differ:\n%v\n%v", ds, again)
		}
		if len(ds) > 0 {
			return
		}
		walkStrings(reflect.ValueOf(s), "spec", 0, func(path, v string) {
			if !printable(v, true) {
				t.Errorf("%s = %q reaches the memo", path, v)
			}
		})
		for _, e := range s.Entries {
			if !e.Default && (e.Line < 1 || e.Line > lines) {
				t.Errorf("entry %s at line %d of %d", e.Key, e.Line, lines)
			}
		}
	})
}

// printable reports whether s is valid UTF-8 without control characters
// other than tab (and, with multiline, line breaks).
func printable(s string, multiline bool) bool {
	if !utf8.ValidString(s) {
		return false
	}
	for _, r := range s {
		if r == '\t' || multiline && (r == '\n' || r == '\r') {
			continue
		}
		if unicode.IsControl(r) {
			return false
		}
	}
	return true
}

// walkStrings calls fn with every string reachable from v.
func walkStrings(v reflect.Value, path string, depth int, fn func(path, v string)) {
	if depth > 40 || !v.IsValid() {
		return
	}
	switch v.Kind() {
	case reflect.String:
		fn(path, v.String())
	case reflect.Pointer, reflect.Interface:
		if !v.IsNil() {
			walkStrings(v.Elem(), path, depth+1, fn)
		}
	case reflect.Struct:
		for i := 0; i < v.NumField(); i++ {
			if v.Type().Field(i).IsExported() {
				walkStrings(v.Field(i), path+"."+v.Type().Field(i).Name, depth+1, fn)
			}
		}
	case reflect.Slice, reflect.Array:
		for i := 0; i < v.Len(); i++ {
			walkStrings(v.Index(i), fmt.Sprintf("%s[%d]", path, i), depth+1, fn)
		}
	case reflect.Map:
		it := v.MapRange()
		for it.Next() {
			walkStrings(it.Key(), path+"{key}", depth+1, fn)
			walkStrings(it.Value(), path+"{value}", depth+1, fn)
		}
	}
}

func TestInsulationAndCooling(t *testing.T) {
	for in, want := range map[string]float64{"F": 428.15, "class F": 428.15, "Class h": 453.15, "155": 428.15,
		"155 degC": 428.15, "155 °C": 428.15, "428.15 K": 428.15, "B": 403.15, "N": 473.15} {
		got, _, err := parseInsulation(in)
		if err != nil || !near(got, want) {
			t.Errorf("parseInsulation(%q) = %v, %v; want %v", in, got, err, want)
		}
	}
	cases := []struct {
		body   string
		h      float64
		given  bool
		vacuum bool
		si     string
	}{
		{"cooling = still-air\n", 10, false, false, "still-air (natural convection, Churchill–Chu)"},
		{"cooling = still-air\nh = 6 W/m2K\n", 6, true, false, "still-air"},
		{"h = 25 W/(m2 K)\n", 25, true, false, ""},
		{"cooling = h = 12 W/m2K\n", 12, true, false, "h = 12 W/(m²·K)"},
		{"cooling = vacuum\n", 0, false, true, "vacuum (radiation only)"},
	}
	for _, c := range cases {
		s, ds := Parse("c.md", []byte(fenced("coil", coilBody)+fenced("conditions", c.body)))
		if len(ds) > 0 {
			t.Errorf("%q: %s", c.body, ds.Error())
			continue
		}
		co := s.Design.Conditions.Cooling
		if co.H != c.h || co.HGiven != c.given || co.Vacuum != c.vacuum {
			t.Errorf("%q: cooling %+v", c.body, co)
		}
		for _, e := range s.Entries {
			if e.Key == "cooling" && !e.Default && e.SI != c.si {
				t.Errorf("%q: cooling entry SI %q, want %q", c.body, e.SI, c.si)
			}
		}
	}
}
