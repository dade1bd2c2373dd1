package memo

import (
	"bytes"
	"math"
	"os"
	"regexp"
	"strings"
	"testing"

	"coilmemo/doc"
)

func cautionsFor(t *testing.T, coil, conditions string) []doc.Callout {
	t.Helper()
	src := "# T\n\n```coil\n" + coil + "```\n"
	if conditions != "" {
		src += "\n```conditions\n" + conditions + "```\n"
	}
	j, diags := evaluate("t.md", []byte(src))
	if len(diags) > 0 {
		t.Fatalf("spec problems: %v", diags)
	}
	return Cautions(j)
}

func hasCaution(cs []doc.Callout, sev doc.Severity, word string) bool {
	for _, c := range cs {
		if c.Severity == sev && strings.Contains(strings.ToLower(c.Title), word) {
			return true
		}
	}
	return false
}

// Cautions follow from the results, and the memo always closes them by
// deferring to local codes and licensed practice.
func TestCautionsFromResults(t *testing.T) {
	// 2 A through AWG 30 in a 60-turn thin loop: far beyond what still air
	// carries away (≈ 0.34 Ω/m · 11 m · 4 A² ≈ 15 W into a few cm²).
	hot := cautionsFor(t, "mean-diameter = 60 mm\nturns = 60\nwire = AWG 30\ncurrent = 2 A\n", "")
	if !hasCaution(hot, doc.Warning, "runaway") && !hasCaution(hot, doc.Warning, "insulation") {
		t.Errorf("an overdriven coil raises no thermal warning: %v", titles(hot))
	}
	// 100 V across a coil: above the 60 V d.c. extra-low-voltage bound.
	hv := cautionsFor(t, "mean-diameter = 200 mm\nturns = 2000\nwire = AWG 30\nvoltage = 100 V\n", "")
	if !hasCaution(hv, doc.Warning, "hazardous") {
		t.Errorf("100 V supply raises no voltage warning: %v", titles(hv))
	}
	// A strong small coil: the 0.5 mT region extends beyond the winding.
	strong := cautionsFor(t, "mean-diameter = 50 mm\nlength = 20 mm\nradial-build = 15 mm\nturns = 500\nwire = AWG 22\ncurrent = 1 A\n", "")
	if !hasCaution(strong, doc.Warning, "0.5 mt") {
		t.Errorf("a 12 mT coil raises no implant warning: %v", titles(strong))
	}
	// A gentle coil raises none of these, but still closes with the
	// general cautions.
	calm := cautionsFor(t, "mean-diameter = 100 mm\nturns = 10\nwire = AWG 20\ncurrent = 0.1 A\n", "")
	for _, w := range []string{"runaway", "insulation", "hazardous", "0.5 mt", "hot"} {
		if hasCaution(calm, doc.Warning, w) || hasCaution(calm, doc.Caution, w) {
			t.Errorf("a 10 mA·m² coil raises a %q caution: %v", w, titles(calm))
		}
	}
	for _, cs := range [][]doc.Callout{hot, hv, strong, calm} {
		last := cs[len(cs)-1]
		text := ""
		for _, s := range last.Spans {
			text += s.Text
		}
		if !strings.Contains(text, "licensed") || !strings.Contains(text, "local codes") {
			t.Errorf("the last caution does not defer to local codes and licensed practice: %q", text)
		}
	}
}

func titles(cs []doc.Callout) []string {
	var out []string
	for _, c := range cs {
		out = append(out, c.Severity.String()+": "+c.Title)
	}
	return out
}

// Three coils too hot to touch, each at its own temperature: one "Hot
// surface" caution naming all three, each coil's temperature given once
// with its name, the shared advice once; and page 1 lists the cautions in
// the order the Safety section gives them (most severe first).
func TestOneCautionPerHazard(t *testing.T) {
	src := "# Three hot coils\n\n"
	for i, c := range []struct{ name, axis, current string }{{"x coil", "x", "0.8 A"}, {"y coil", "y", "0.9 A"}, {"z coil", "z", "1 A"}} {
		src += "```coil\nname = " + c.name + "\naxis = " + c.axis + "\nmean-diameter = " + []string{"100", "120", "140"}[i] +
			" mm\nturns = 100\nwire = AWG 28\ncurrent = " + c.current + "\n```\n\n"
	}
	j, diags := evaluate("t.md", []byte(src))
	if len(diags) > 0 {
		t.Fatalf("spec problems: %v", diags)
	}
	cs := Cautions(j)
	var hot []doc.Callout
	for _, c := range cs {
		if strings.HasPrefix(c.Title, "Hot surface") {
			hot = append(hot, c)
		}
	}
	if len(hot) != 1 {
		t.Fatalf("%d hot-surface cautions, want 1: %v", len(hot), titles(cs))
	}
	text := spanText(hot[0].Spans)
	for i, name := range []string{"x coil", "y coil", "z coil"} {
		if !strings.Contains(hot[0].Title, `"`+name+`"`) {
			t.Errorf("title %q does not name %q", hot[0].Title, name)
		}
		ts := j.Coils[i].Heat.SurfaceMax
		want := `Coil "` + name + `": The winding surface reaches ` + Eng(Celsius(ts), "°C", 3) + "."
		if !strings.Contains(text, want) {
			t.Errorf("the caution does not say %q:\n%s", want, text)
		}
	}
	if n := strings.Count(text, "allow it to cool"); n != 1 {
		t.Errorf("the shared advice is given %d times:\n%s", n, text)
	}
	// Page 1's list against the Safety section's order.
	c := &composer{j: j, cautions: cs}
	var listed, given []string
	for _, it := range c.cautionList().Items {
		p := it[0].(doc.Paragraph)
		listed = append(listed, p.Spans[1].Text)
	}
	for _, co := range cs {
		if co.Severity == doc.Warning || co.Severity == doc.Caution {
			given = append(given, co.Title)
		}
	}
	if strings.Join(listed, "|") != strings.Join(given, "|") {
		t.Errorf("page 1 lists\n%q\nthe Safety section gives\n%q", listed, given)
	}
	for i := 1; i < len(cs); i++ {
		if cs[i].Severity > cs[i-1].Severity {
			t.Errorf("%s after %s", titles(cs)[i], titles(cs)[i-1])
		}
	}
}

// A sentence split keeps abbreviations and decimals inside sentences.
func TestSentences(t *testing.T) {
	got := sentences("At 50 kHz the a.c. resistance is 2.5 times the d.c. one. 3 V is e.g. Low. Done.")
	want := []string{"At 50 kHz the a.c. resistance is 2.5 times the d.c. one.", "3 V is e.g. Low.", "Done."}
	if strings.Join(got, "|") != strings.Join(want, "|") {
		t.Errorf("got %q, want %q", got, want)
	}
}

// The valve actuator is within its class on its 25 % duty cycle, but left
// energised its hottest point settles above the class (155 °C): a winding
// held past its class is damaged and a fire risk, so the fault is a
// WARNING — in the Safety section and in page 1's list — not a caution.
func TestLeftEnergisedPastTheClassIsAWarning(t *testing.T) {
	src, err := os.ReadFile("../examples/valve-actuator.md")
	if err != nil {
		t.Fatal(err)
	}
	j := mustEvaluate(t, string(src))
	co, on := j.Spec.Design.Coils[0], j.Coils[0].Heat.Continuous
	if !(j.Results.Coils[0].Temperature <= co.InsulationClass) || !(on.HotSpot > co.InsulationClass) {
		t.Fatalf("the example no longer shows the case: %g K on the duty cycle, %g K continuously, class %g K",
			j.Results.Coils[0].Temperature, on.HotSpot, co.InsulationClass)
	}
	if cs := Cautions(j); !hasCaution(cs, doc.Warning, "if left energised") || hasCaution(cs, doc.Caution, "if left energised") {
		t.Errorf("left energised: %v", titles(cs))
	}
	var buf bytes.Buffer
	if err := doc.WriteText(&buf, Document(j)); err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(buf.String(), "**WARNING **Insulation class if left energised") {
		t.Error("page 1 does not list the left-energised fault as a WARNING")
	}
}

// The 0.5 mT caution gives two figures, each in one form of words: the
// reach along the axis "from the origin" (analysis Axial), and the reach
// "from the outer surface" of the windings (each block's Distance, the
// axial reach's far end's AxialClear, and the bound Distance beyond which
// the field stays below the level). No other length is said to be "from"
// anything, and the old "from it along its axis" wording, which measured
// along a search line, is gone. Checked over every design.
func TestImplantReachWordedOnce(t *testing.T) {
	num := regexp.MustCompile(`([0-9][0-9.]*) (mm|m|µm) from (the origin|the outer surface|its outer surface|their outer surfaces)`)
	any := regexp.MustCompile(`[0-9][0-9.]* (mm|m|µm) from `)
	for _, f := range designFiles(t) {
		st, text := memoOf(t, f, false)
		if st == nil {
			continue
		}
		ir := st.Safety.Implant
		var caution string
		for _, c := range Cautions(st) {
			if strings.HasPrefix(c.Title, "Field above 0.5 mT") {
				caution = spanText(c.Spans)
			}
		}
		if caution == "" {
			if ir.Any() {
				t.Errorf("%s: the level is reached but no caution says so", f)
			}
			continue
		}
		if !strings.Contains(text, caution) {
			t.Errorf("%s: caution not in the memo", f)
		}
		if strings.Contains(caution, "from it along") || strings.Contains(caution, "from the origin in") {
			t.Errorf("%s: a reach measured along a search line: %s", f, caution)
		}
		// reaches from a surface are stated to three figures (two below
		// 10 mm) rounded up (a keep-out distance is never understated)
		up2 := func(v float64) string {
			if !(v > 0) {
				return Eng(v, "m", 2)
			}
			figs := 3
			if v < 0.01 {
				figs = 2
			}
			e := math.Pow(10, math.Floor(math.Log10(v))-float64(figs-1))
			return Eng(math.Ceil(v/e-1e-9)*e, "m", figs)
		}
		surface := map[string]bool{up2(ir.AxialClear): true, up2(ir.Distance): true, "1 mm": ir.Distance < 1e-3}
		for _, w := range ir.Windings {
			surface[up2(w.Distance)] = true
		}
		for _, m := range num.FindAllStringSubmatch(caution, -1) {
			v := m[1] + " " + m[2]
			if m[3] == "the origin" && v != Eng(math.Ceil(ir.Axial/roundStep(ir.Axial)-1e-9)*roundStep(ir.Axial), "m", 3) {
				t.Errorf("%s: %q, but the axial reach is %s (to three figures rounded up)", f, m[0], Eng(ir.Axial, "m", 4))
			}
			if m[3] != "the origin" && !surface[v] {
				t.Errorf("%s: %q is none of the reaches from the windings' surfaces %v", f, m[0], surface)
			}
		}
		if n, k := len(any.FindAllString(caution, -1)), len(num.FindAllString(caution, -1)); n != k {
			t.Errorf("%s: %d lengths said to be from something, %d of them in the two forms: %s", f, n, k, caution)
		}
		if ir.Distance >= 1e-3 && !strings.Contains(caution, "Farther than "+up2(ir.Distance)+" from the outer surface of every winding") {
			t.Errorf("%s: the bound %s is not stated: %s", f, up2(ir.Distance), caution)
		}
		if ir.AxialBore && !strings.Contains(caution, "inside the bore") {
			t.Errorf("%s: the axial reach ends in the bore, not said: %s", f, caution)
		}
	}
}

// A caution written once for several like coils speaks of each of them,
// not of "the coil".
func TestMergedCautionSpeaksOfEachCoil(t *testing.T) {
	j, _ := memoOf(t, "../testdata/figures/three-axis-set.md", true)
	found := false
	for _, c := range Cautions(j) {
		if !strings.Contains(c.Title, ", coils ") {
			continue
		}
		found = true
		text := spanText(c.Spans)
		for _, bad := range []string{"The coil ", " the coil ", " the coil,", " the coil."} {
			if strings.Contains(text, bad) {
				t.Errorf("%s: %q in %q", c.Title, bad, text)
			}
		}
	}
	if !found {
		t.Fatal("no caution of the three like coils is written once for all of them")
	}
}

// TestAxialReachNamesItsSides: a coil off the origin reaches 0.5 mT
// farther on one side of the origin along its axis than on the other; the
// caution names the side of the distance it gives and the other side's
// own distance, and a symmetric design's says "on either side".
func TestAxialReachNamesItsSides(t *testing.T) {
	spec := func(z string) string {
		return "# Reach sides\n\n```coil\nname = off loop\nform = loop\nmean-diameter = 60 mm\nradial-build = 8 mm\nlength = 8 mm\nturns = 180\nwire = AWG 24\ncurrent = 1 A\ncentre = (0, 0, " + z + ")\n```\n"
	}
	cases := []struct{ z, want, not string }{
		{"20 mm", " on the +z side", " on either side"},
		{"-20 mm", " on the −z side", " on either side"},
		{"0 mm", " on either side", "the farther point"},
	}
	for _, c := range cases {
		j, diags := evaluate("sides.md", []byte(spec(c.z)))
		if len(diags) > 0 {
			t.Fatal(diags)
		}
		ir := j.Safety.Implant
		var text string
		for _, k := range Cautions(j) {
			if strings.Contains(k.Title, "implanted") {
				text = spanText(k.Spans)
			}
		}
		if !strings.Contains(text, c.want) || strings.Contains(text, c.not) {
			t.Errorf("centre z = %s (reach %g m up, %g m down): want %q and not %q in %q", c.z, ir.AxialUp, ir.AxialDown, c.want, c.not, text)
		}
		if c.z != "0 mm" && ir.AxialUp > 0 && ir.AxialDown > 0 && !strings.Contains(text, " side and ") {
			t.Errorf("centre z = %s: both sides reach the level (%g m, %g m) but the caution gives one: %q", c.z, ir.AxialUp, ir.AxialDown, text)
		}
	}
}

// roundStep is the step of the third significant figure of v > 0.
func roundStep(v float64) float64 { return math.Pow(10, math.Floor(math.Log10(v))-2) }
