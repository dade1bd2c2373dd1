package memo

import (
	"bytes"
	"strings"
	"testing"

	"coilmemo/analysis"
	"coilmemo/doc"
)

// A design of pick-up coils alone gets no field, torque, switching or
// heating section (all at 0 A), and page 1 states the receiver's own
// headline figures; its safety findings come from its results: no thermal
// or switching hazard at no current, and the resonance caution when the
// design frequency is near the self-resonance.
func TestReceiverMemoSections(t *testing.T) {
	src := "```coil\nname = pick\nform = solenoid\ninner-diameter = 20 mm\nouter-diameter = 40 mm\nlength = 50 mm\nturns = 2000\nwire = AWG 36\nfrequency = 100 Hz\nband = 10 Hz .. 1 kHz\n```\n"
	j := mustEvaluate(t, src)
	var buf bytes.Buffer
	if err := doc.WriteText(&buf, Compose(j)); err != nil {
		t.Fatal(err)
	}
	text := buf.String()
	for _, h := range []string{"Magnetic field", "Heating", "Inductance and switching", "Torque"} {
		if strings.Contains(text, " "+h+"\n") {
			t.Errorf("a pick-up coil's memo has the section %q", h)
		}
	}
	page1 := text[:strings.Index(text, "---- page break ----")]
	for _, w := range []string{"Headline results of the pick-up coils", "Sensitivity", "Noise-equivalent field", "Self-resonance", "rms over the band"} {
		if !strings.Contains(page1, w) {
			t.Errorf("page 1 lacks %q", w)
		}
	}
	if strings.Contains(page1, "Magnetic moment") {
		t.Error("page 1 states a moment for a pick-up coil")
	}
	for _, f := range j.Safety.Findings {
		switch f.Kind {
		case analysis.SwitchOffVoltage, analysis.Runaway, analysis.ClassExceeded, analysis.HotSurfaceFound, analysis.HazardousVoltage:
			t.Errorf("pick-up coil with a drive finding %v", f.Kind)
		}
	}

	// At a frequency near its self-resonance (a third of it or more) the
	// caution is raised.
	fsr := j.Coils[0].Kinds.SelfResonance
	near := mustEvaluate(t, strings.Replace(src, "frequency = 100 Hz", "frequency = "+strings.TrimSpace(Eng(fsr/2, "Hz", 3)), 1))
	found := false
	for _, f := range near.Safety.Findings {
		found = found || f.Kind == analysis.NearResonance
	}
	if !found {
		t.Errorf("no resonance caution at %g Hz, self-resonance %g Hz", fsr/2, fsr)
	}

	// A driven coil keeps its sections.
	driven := mustEvaluate(t, "```coil\nname = d\nform = solenoid\nmean-diameter = 30 mm\nlength = 80 mm\nturns = 100\nwire = AWG 24\ncurrent = 1 A\n```\n")
	buf.Reset()
	if err := doc.WriteText(&buf, Compose(driven)); err != nil {
		t.Fatal(err)
	}
	for _, h := range []string{"Magnetic field", "Heating", "Inductance and switching"} {
		if !strings.Contains(buf.String(), " "+h+"\n") {
			t.Errorf("a driven coil's memo lacks %q", h)
		}
	}
}
