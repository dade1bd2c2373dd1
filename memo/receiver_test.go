package memo

import (
	"bytes"
	"os"
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

// sectionsByName is the memo's text, section by section, keyed by the
// names of Sections.
func sectionsByName(t *testing.T, j *analysis.Study) map[string]string {
	t.Helper()
	texts, err := sectionTexts(j)
	if err != nil {
		t.Fatal(err)
	}
	out := map[string]string{}
	for i, s := range Sections {
		out[s.Name()] = texts[i]
	}
	return out
}

// tableOf returns the first table of a section whose caption starts with
// prefix.
func tableOf(t *testing.T, j *analysis.Study, section, prefix string) doc.Table {
	t.Helper()
	_, parts := ComposeSections(j)
	for i, s := range Sections {
		if s.Name() != section {
			continue
		}
		for _, b := range parts[i] {
			if tb, ok := b.(doc.Table); ok && strings.HasPrefix(tb.Caption, prefix) {
				return tb
			}
		}
	}
	t.Fatalf("section %s has no table %q", section, prefix)
	return doc.Table{}
}

// zeroDrive are the marks of a driven coil's figures written at no
// current: a pick-up coil's write-up must not have them.
var zeroDrive = []string{`0\,\unit{A}`, `0\,\unit{V}`, `0\,\unit{W}`, `0\,\unit{J}`, " 0 A ", " 0 A.", "0 A·m²", "Heating section", "switch-off", "freewheeling"}

const helmholtzWithPickUp = "```coil\nname = Z pair\nform = pair\nmean-diameter = 300 mm\nlength = 11.6 mm\nradial-build = 4.45 mm\nturns = 65\nspacing = 150 mm\n" +
	"wire = AWG 20\nwire-outer-diameter = 0.89 mm\ncurrent = 1.5 A\n```\n" +
	"```coil\nname = S\nform = solenoid\ninner-diameter = 12 mm\nouter-diameter = 18 mm\nlength = 20 mm\nturns = 400\nwire = AWG 38\nfrequency = 1 kHz\nload-capacitance = 100 pF\n```\n"

// A driven Helmholtz pair with a pick-up coil at its centre: the field,
// switching and heating write up the pair alone and name the pick-up coil;
// page 1's drive table has no column for it; its method derives its own
// figures (no operating point, no heating); nothing speaks of 0 A for it.
func TestMixedPickUpSections(t *testing.T) {
	j := mustEvaluate(t, helmholtzWithPickUp)
	sec := sectionsByName(t, j)
	note := `Coil "S" is a pick-up coil (no drive) and carries no current`
	for _, name := range []string{"field", "electrical"} {
		s := sec[name]
		if !strings.Contains(s, note) {
			t.Errorf("section %s does not name the pick-up coil:\n%s", name, s)
		}
		if strings.Contains(s, `Coil "S"`+"\n") || strings.Contains(s, `Field of coil "S"`) {
			t.Errorf("section %s writes up the pick-up coil as a driven one", name)
		}
		if !strings.Contains(s, `"Z pair"`) {
			t.Errorf("section %s lacks the driven pair", name)
		}
	}
	for _, w := range []string{" 0 A continuous", " 0 V supply", "no dipole moment", "its two halves oppose"} {
		for name, s := range sec {
			if strings.Contains(s, w) {
				t.Errorf("section %s has %q", name, w)
			}
		}
	}
	// The force on a coil that carries no current is not quoted as 0 N.
	cp := tableOf(t, j, "electrical", "Mutual inductance and force")
	if f := cp.Rows[0][5].Text; !strings.Contains(f, "carries no current") {
		t.Errorf("force on the pick-up coil written %q", f)
	}
	// Page 1 and the heating table: columns for the driven coil only.
	for _, tb := range []doc.Table{tableOf(t, j, "summary", "Headline results at the steady operating point"), tableOf(t, j, "heating", "Thermal results")} {
		if len(tb.Header) != 2 || tb.Header[1] != "Z pair" {
			t.Errorf("table %q has columns %q, want the driven pair's only", tb.Caption, tb.Header)
		}
	}
	// The pick-up coil's derivation.
	m := sec["method"]
	own := m[strings.Index(m, `Coil "S" (solenoid, pick-up`):]
	for _, w := range zeroDrive {
		if strings.Contains(own, w) {
			t.Errorf("the pick-up coil's method has %q", w)
		}
	}
	for _, w := range []string{"Sensitivity by Faraday's law", "Thermal noise", "Noise-equivalent field", "Self-capacitance of 3 layers", "Self-resonant frequency", "Capacitance across the terminals", "ambient temperature"} {
		if !strings.Contains(own, w) {
			t.Errorf("the pick-up coil's method lacks %q", w)
		}
	}
	a := sec["assumptions"]
	if strings.Contains(a, "Frequency, S") || strings.Contains(a, "Thermal model, S") || !strings.Contains(a, "Pick-up coil, S") {
		t.Errorf("assumptions for the pick-up coil:\n%s", a)
	}
}

// A design of one pick-up coil: no section speaks of 0 A, heating,
// switching or an operating point; the method derives its figures with the
// self-capacitance of a single layer by Medhurst's fit, and the results
// equal the receiver's.
func TestPickUpAloneMethod(t *testing.T) {
	j := mustEvaluate(t, "```coil\nname = R\nform = solenoid\nmean-diameter = 20 mm\nlength = 30 mm\nturns = 100\nwire = AWG 30\nfrequency = 2 kHz\nband = 100 Hz .. 5 kHz\n```\n")
	sec := sectionsByName(t, j)
	for name, s := range sec {
		for _, w := range append(zeroDrive, "Heating", "heat balance", "operating point", "Cooling") {
			if name != "record" && strings.Contains(s, w) {
				t.Errorf("section %s has %q", name, w)
			}
		}
	}
	m := sec["method"]
	r := j.Coils[0].Kinds.Receiver
	for _, w := range []string{"Medhurst", Q(r.SelfCapacitance, "F", 3), Q(r.Sensitivity, "V/T", 4), Q(r.NoiseField, "T/√Hz", 3), Q(r.SelfResonance, "Hz", 3), Q(r.BandNoiseField, "T", 3)} {
		if !strings.Contains(m, w) {
			t.Errorf("the method lacks %q", w)
		}
	}
	if rc := sec["receiver"]; !strings.Contains(rc, "derived in the Method and results section") || strings.Contains(rc, "Nyquist") {
		t.Errorf("the pick-up section repeats the derivation or does not point to it:\n%s", rc)
	}
}

// Page 1 states a cored coil's conductor and core masses apart, with their
// total: the study's numbers, the conductor's without the core.
func TestCoredMassOnPageOne(t *testing.T) {
	src := "```coil\nname = rod\nform = solenoid\nmean-diameter = 12 mm\nlength = 60 mm\nradial-build = 2 mm\nturns = 1000\nwire = AWG 32\ncurrent = 120 mA\n" +
		"core-permeability = 5000\ncore-length = 70 mm\ncore-diameter = 6 mm\ncore-density = 8700 kg/m3\n```\n"
	j := mustEvaluate(t, src)
	k := j.Coils[0].Kinds
	cr := j.Results.Coils[0]
	tb := tableOf(t, j, "summary", "Headline results")
	cells := map[string]string{}
	for _, row := range tb.Rows {
		cells[row[0].Text] = row[1].Text
	}
	if got, want := cells["Wire length / conductor mass"], Eng(cr.Length, "m", 3)+" / "+Eng(k.AirMass, "kg", judged); got != want {
		t.Errorf("conductor mass cell %q, want %q", got, want)
	}
	if got, want := cells["Core mass / total mass (conductor and core)"], Eng(k.Core.Mass, "kg", judged)+" / "+Eng(cr.Mass, "kg", judged); got != want {
		t.Errorf("core mass cell %q, want %q", got, want)
	}
	// The method's conductor mass is the conductor's too.
	if m := sectionsByName(t, j)["method"]; !strings.Contains(m, "= "+Q(k.AirMass, "kg", 3)) || strings.Contains(m, "= "+Q(cr.Mass, "kg", 3)) {
		t.Errorf("the method's conductor mass is not %s (total %s)", Q(k.AirMass, "kg", 3), Q(cr.Mass, "kg", 3))
	}
}

// A pick-up coil whose working band ends below the top of its stated band
// says so on page 1, with both frequencies from the study; one whose band
// lies inside its working band says nothing of it. The limits are judged
// as before.
func TestBandShortfallOnPageOne(t *testing.T) {
	src, err := os.ReadFile("../examples/search-coil.md")
	if err != nil {
		t.Fatal(err)
	}
	page1 := func(src string) (string, *analysis.Study) {
		j := mustEvaluate(t, src)
		var b strings.Builder
		for _, s := range (&composer{j: j}).verdict().Spans {
			b.WriteString(s.Text)
		}
		return b.String(), j
	}
	text, j := page1(string(src))
	co, r := j.Spec.Design.Coils[0], j.Coils[0].Kinds.Receiver
	if !(r.WorkingBandTop > 0 && r.WorkingBandTop < co.BandHigh) {
		t.Fatalf("search coil: working band to %g Hz, band to %g Hz", r.WorkingBandTop, co.BandHigh)
	}
	for _, want := range []string{"does not cover its stated band", "only up to about " + Eng(r.WorkingBandTop, "Hz", 2), "from there to " + Eng(co.BandHigh, "Hz", 3)} {
		if !strings.Contains(text, want) {
			t.Errorf("page 1 lacks %q:\n%s", want, text)
		}
	}
	narrow := strings.Replace(string(src), "band              = 10 Hz .. 10 kHz", "band              = 10 Hz .. 2 kHz", 1)
	if narrow == string(src) {
		t.Fatal("the band line was not found")
	}
	text, j2 := page1(narrow)
	if strings.Contains(text, "does not cover") {
		t.Errorf("a band inside the working band: %s", text)
	}
	if len(j2.Limits) != len(j.Limits) {
		t.Errorf("limits %d, want %d", len(j2.Limits), len(j.Limits))
	}
}
