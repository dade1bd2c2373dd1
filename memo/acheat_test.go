package memo

import (
	"math"
	"strings"
	"testing"
)

// acWinding is a three-layer air winding driven at 50 kHz, where Dowell's
// factor is about 1.9.
const acWinding = "```coil\nname = drive coil\nform = solenoid\ninner-diameter = 30 mm\nradial-build = 3 mm\nlength = 20 mm\nturns = 120\nwire = AWG 26\nwire-outer-diameter = 0.5 mm\ncurrent = 0.5 A\nfrequency = 50 kHz\n```\n" +
	"```conditions\nambient = 20 degC\nh = 10 W/(m2 K)\nemissivity = 0.85\n```\n"

// The a.c. heating step multiplies Dowell's factor by the d.c. power, the
// r.m.s. current's I² R(T) — not by the a.c. power it results in.
func TestACHeatingStepTakesTheDCPower(t *testing.T) {
	j, diags := evaluate("ac.md", []byte(acWinding))
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	k := j.Coils[0].Kinds
	if k.AC == nil || !(k.AC.Factor > 1.5) {
		t.Fatalf("no a.c. factor: %+v", k.AC)
	}
	cr := j.Results.Coils[0]
	if dc := cr.Current * cr.Current * cr.RHot; !(k.DCPower > 0) || math.Abs(k.DCPower/dc-1) > 1e-12 || math.Abs(k.ACPower/(k.AC.Factor*k.DCPower)-1) > 1e-9 {
		t.Errorf("d.c. power %g W (I²R %g W), a.c. %g W, F_R %g", k.DCPower, dc, k.ACPower, k.AC.Factor)
	}
	text := memoText(t, j)
	i := strings.Index(text, `P_{ac} = F_R P_{dc}`)
	if i < 0 {
		t.Fatal("no a.c. heating step")
	}
	line := text[i:min(len(text), i+200)]
	if want := Q(k.DCPower, "W", 4); !strings.Contains(line, want) {
		t.Errorf("a.c. heating step %q does not show the d.c. power %s", line, want)
	}
}

// An a.c. coil's implant caution says its region is that of the peak of
// the current, √2 times the r.m.s., and points to the time-varying caution,
// which gives the ICNIRP (2010) levels at its frequency; a d.c. coil's
// says neither.
func TestImplantCautionOfAnACCoil(t *testing.T) {
	dc := strings.Replace(acWinding, "frequency = 50 kHz\n", "", 1)
	for _, c := range []struct {
		src string
		ac  bool
	}{{acWinding, true}, {dc, false}} {
		j, diags := evaluate("ac.md", []byte(c.src))
		if len(diags) > 0 {
			t.Fatal(diags)
		}
		var implant, exposure string
		for _, co := range Cautions(j) {
			switch {
			case strings.HasPrefix(co.Title, "Field above 0.5 mT"):
				implant = spanText(co.Spans)
			case strings.HasPrefix(co.Title, "Time-varying field"):
				exposure = spanText(co.Spans)
			}
		}
		if implant == "" {
			t.Fatalf("ac %v: no implant caution", c.ac)
		}
		if got := strings.Contains(implant, "at the peak of the current, √2 times the r.m.s."); got != c.ac {
			t.Errorf("ac %v: implant caution notes the alternating field: %v", c.ac, got)
		}
		if got := strings.Contains(exposure, "27.0 µT") && strings.Contains(exposure, "100 µT"); got != c.ac {
			t.Errorf("ac %v: time-varying caution with the 50 kHz levels: %v (%q)", c.ac, got, exposure)
		}
	}
}

// A voltage-driven a.c. coil is written up as computed: its cold current
// is V over the impedance at 20 °C, |Z| = √(R20² + (2πfL)²) (the series
// R–L circuit's impedance of any circuits text, e.g. Hughes Electrical
// and Electronic Technology, 10th ed. — chapter recalled from memory), the
// equation shown with the reactance; the
// body suggests the same bidirectional suppression as the Safety section
// (no freewheeling diode across an a.c. coil); and the frequency
// assumption does not call the memo's current a d.c. bound.
func TestACVoltageCoilWriteUp(t *testing.T) {
	src := "```coil\nname = ex\nform = solenoid\ninner-diameter = 20 mm\nouter-diameter = 30 mm\nlength = 20 mm\nturns = 300\nwire = AWG 26\nvoltage = 20 V\nfrequency = 10 kHz\n```\n" +
		"```conditions\nambient = 25 degC\n```\n"
	j := mustEvaluate(t, src)
	cr := j.Results.Coils[0]
	X := 2 * math.Pi * 10e3 * cr.Inductance
	if want := 20 / math.Hypot(cr.R20, X); math.Abs(cr.ColdCurrent/want-1) > 1e-9 {
		t.Errorf("cold current %g A, want V/|Z(20 °C)| = %g A", cr.ColdCurrent, want)
	}
	text := memoText(t, j)
	if !strings.Contains(text, `I_{20} = \frac{V}{\sqrt{R_{20}^2 + (\omega L)^2}}`) {
		t.Error("the cold current of an a.c. coil is not shown over the impedance")
	}
	if strings.Contains(text, `I_{20} = \frac{V}{R_{20}}`) {
		t.Error("the cold current of an a.c. coil is shown as V/R20")
	}
	if strings.Contains(text, "a freewheeling diode across the coil rated") || !strings.Contains(text, "Suggested suppression: a bidirectional suppressor") {
		t.Error("the body's suggested suppression of an a.c. coil is not the bidirectional suppressor")
	}
	if strings.Contains(text, "are upper bounds, the a.c. values are lower") {
		t.Error("the frequency assumption calls the memo's a.c. figures d.c. bounds")
	}
}
