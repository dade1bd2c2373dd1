package memo

import (
	"os"
	"regexp"
	"strings"
	"testing"

	"coilmemo/analysis"
	"coilmemo/doc"
)

// acDrivenSpec is a multilayer coil driven from a 10 kHz voltage: a
// driven a.c. coil, no pick-up coil in the design.
const acDrivenSpec = "```coil\nname = excitation coil\nform = solenoid\ninner-diameter = 20 mm\nouter-diameter = 30 mm\nlength = 20 mm\nturns = 300\nwire = AWG 26\ninsulation-class = F\nvoltage = 20 V\nfrequency = 10 kHz\n```\n\n```conditions\nambient = 25 degC\ncooling = still-air\n```\n"

// wordingStudies are the studies of every example, figure-test and golden
// design that evaluates alone, and of the a.c.-driven coil above, by name.
func wordingStudies(t *testing.T) map[string]*analysis.Study {
	t.Helper()
	out := map[string]*analysis.Study{}
	srcs := specsForTests(t)
	for _, f := range designFiles(t) {
		b, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		srcs[f] = b
	}
	srcs["a.c.-driven coil"] = []byte(acDrivenSpec)
	for name, src := range srcs {
		if j, diags := evaluate("test.md", src); len(diags) == 0 {
			out[name] = j
		}
	}
	return out
}

// sectionText is the text of the memo section that opens with the level-1
// heading title ("" when the memo has none).
func sectionText(text, title string) string {
	i := regexp.MustCompile(`(?m)^## \d+ ` + regexp.QuoteMeta(title) + `$`).FindStringIndex(text)
	if i == nil {
		return ""
	}
	rest := text[i[1]:]
	if k := regexp.MustCompile(`(?m)^## \d+ `).FindStringIndex(rest); k != nil {
		rest = rest[:k[0]]
	}
	return rest
}

// The boilerplate fits the design: pick-up wording only where a coil is a
// pick-up coil; an a.c. drive's time constant is not written up as a d.c.
// rise to a final current; the heat-model text names only the models the
// design's windings take, end faces only where a winding sheds heat
// through them, never the old "thick winding" wording.
func TestBoilerplateFitsDesign(t *testing.T) {
	sawAC, sawThin, sawPickUp := false, false, false
	for name, j := range wordingStudies(t) {
		text := memoText(t, j)
		receiver, dc, ac := false, false, false
		for _, co := range j.Spec.Design.Coils {
			switch {
			case analysis.IsReceiver(co):
				receiver = true
			case co.Frequency > 0:
				ac = true
			default:
				dc = true
			}
		}
		if got := strings.Contains(text, "A pick-up coil is stated by its sensitivity"); got != receiver {
			t.Errorf("%s: pick-up wording %v, a pick-up coil in the design %v", name, got, receiver)
		}
		sawPickUp = sawPickUp || receiver
		if ac && !dc {
			sawAC = true
			for _, bad := range []string{"Rise time to 90 % of the final current", "the rise time after a voltage step"} {
				if strings.Contains(text, bad) {
					t.Errorf("%s: an a.c.-driven design's memo has %q", name, bad)
				}
			}
			if !strings.Contains(text, "Settling after switch-on of the a.c. drive") {
				t.Errorf("%s: no settling after switch-on for the a.c. drive", name)
			}
		}
		heating := sectionText(text, "Heating")
		if strings.Contains(heating, "thick winding") || strings.Contains(sectionText(text, "Assumptions"), "inside a thick winding") {
			t.Errorf("%s: the heat model still speaks of a thick winding", name)
		}
		if heating == "" {
			continue
		}
		intro := heating
		if k := strings.Index(intro, "\n### "); k >= 0 {
			intro = intro[:k]
		}
		section, ends, thin := false, false, false
		for i, co := range j.Spec.Design.Coils {
			if analysis.IsReceiver(co) || i >= len(j.Results.Coils) {
				continue
			}
			section = section || j.Coils[i].Heat.EndsCooled
			ends = ends || shedsEnds(co, j.Results.Coils[i].Winding)
			thin = thin || j.Results.Coils[i].Winding.Thin
		}
		if got := strings.Contains(intro, "both end faces"); got != section {
			t.Errorf("%s: heat model names the end faces %v, a multilayer section model %v", name, got, section)
		}
		if got := strings.Contains(intro, "end faces included"); got != ends && !j.Cooling.HGiven && !j.Cooling.Covered && !j.Cooling.Vacuum {
			t.Errorf("%s: \"end faces included\" %v, a winding shedding heat through end faces %v", name, got, ends)
		}
		if got := strings.Contains(intro, "round bundle"); got != thin {
			t.Errorf("%s: heat model names the round bundle %v, a thin coil %v", name, got, thin)
		}
		sawThin = sawThin || thin && !section
	}
	if !sawAC || !sawThin || !sawPickUp {
		t.Errorf("no a.c.-driven (%v), thin-only (%v) or pick-up (%v) design among the cases", sawAC, sawThin, sawPickUp)
	}
}

// The a.c.-driven coil's section on a.c. figures is titled and opened for
// a driven winding and its self-resonance is written with its numbers.
func TestACDrivenSectionWording(t *testing.T) {
	j := mustEvaluate(t, acDrivenSpec)
	text := memoText(t, j)
	if !regexp.MustCompile(`(?m)^## \d+ A\.c\. figures$`).MatchString(text) || strings.Contains(text, "Pick-up and a.c. figures") {
		t.Errorf("the a.c. section of a driven coil is not titled \"A.c. figures\"")
	}
	if !strings.Contains(text, "A winding driven at a frequency is stated by its a.c. resistance") {
		t.Errorf("the a.c. section does not open for a driven winding")
	}
}

// No derived result is left without its numbers: the self-resonance
// (f_sr = 1/(2π√(LC))) is written with L and C substituted wherever it is
// derived, in every design.
func TestSelfResonanceSubstituted(t *testing.T) {
	seen := 0
	for name, j := range wordingStudies(t) {
		walkBlocks(Document(j).Blocks, func(b doc.Block) {
			e, ok := b.(doc.Equation)
			if !ok || len(e.Lines) == 0 || !strings.HasPrefix(e.Lines[0], `f_{sr}`) {
				return
			}
			seen++
			if len(e.Lines) < 3 || !regexp.MustCompile(`\\sqrt\{[0-9.]+\\,\\unit\{[^}]*H\} \\cdot [0-9.]+\\,\\unit\{[^}]*F\}\}`).MatchString(e.Lines[1]) {
				t.Errorf("%s: (%s) %s without L and C substituted: %q", name, e.Label, e.Description, e.Lines)
			}
		})
	}
	if seen == 0 {
		t.Fatal("no self-resonance derived in any design")
	}
}

// A check at a point says where the point is: every verification row of
// an off-axis test point gives its distances.
func TestCheckPointsLocated(t *testing.T) {
	seen := 0
	for name, j := range wordingStudies(t) {
		for _, line := range strings.Split(sectionText(memoText(t, j), "Verification"), "\n") {
			if !strings.Contains(line, "off-axis test point") {
				continue
			}
			seen++
			if !regexp.MustCompile(`off-axis test point[^|]*, (\d[\d.]* [µm]?m from the axis and −?\d[\d.]* [µm]?m along it from the centre|\(−?\d[\d.]* [µm]?m, −?\d[\d.]* [µm]?m, −?\d[\d.]* [µm]?m\) from the centre)`).MatchString(line) {
				t.Errorf("%s: test point without its place: %s", name, line)
			}
		}
	}
	if seen == 0 {
		t.Fatal("no off-axis check printed")
	}
}

// Wording said once and meaning what it says: the mount's thermal
// resistance stated once in the Heating section's opening, a corner's sign
// code named by its values where a memo first uses it, and none of the
// phrases a checking engineer found unclear.
func TestWordingSaidOnce(t *testing.T) {
	code := regexp.MustCompile(`corner ([+−]+)`)
	named := regexp.MustCompile(`^corner [+−]+( of the (\d+|tolerances))? \([a-z-]+ `)
	mounts, corners := 0, 0
	for name, j := range wordingStudies(t) {
		text := memoText(t, j)
		for _, bad := range []string{"as stated below", "which the design cannot hold", "input coil:"} {
			if strings.Contains(text, bad) {
				t.Errorf("%s: %q in the memo", name, bad)
			}
		}
		if R := j.Spec.Design.Conditions.MountResistance; R > 0 {
			mounts++
			heating := sectionText(text, "Heating")
			if n := strings.Count(heating, "through a thermal resistance of "+Eng(R, "K/W", 3)); n != 1 {
				t.Errorf("%s: the mount's thermal resistance stated %d times in Heating", name, n)
			}
		}
		first := map[string]bool{}
		for _, m := range code.FindAllStringSubmatchIndex(text, -1) {
			c := text[m[2]:m[3]]
			if first[c] {
				continue
			}
			first[c] = true
			corners++
			if !named.MatchString(text[m[0]:min(len(text), m[1]+200)]) {
				t.Errorf("%s: corner %s first used without its values: …%s…", name, c, text[m[0]:min(len(text), m[1]+80)])
			}
		}
	}
	if mounts == 0 || corners == 0 {
		t.Fatalf("no design with a mount (%d) or a corner code (%d)", mounts, corners)
	}
}

// Safety and closing wording speaks of the coils where the design drives
// several (a pair counts as two) and of the coil where it drives one.
func TestSafetyWordsCountCoils(t *testing.T) {
	saw := map[bool]bool{}
	for name, j := range wordingStudies(t) {
		text := memoText(t, j)
		several := severalCoils(j)
		saw[several] = true
		singular := []string{"while the coil is energised", "The coil works in vacuum", "on the built coil ", "where the coil is built"}
		plural := []string{"while any of the coils is energised", "The coils work in vacuum", "on the built coils ", "where the coils are built"}
		wrong := plural
		if several {
			wrong = singular
		}
		for _, w := range wrong {
			if strings.Contains(text, w) {
				t.Errorf("%s (several coils %v): %q", name, several, w)
			}
		}
	}
	if !saw[true] || !saw[false] {
		t.Fatalf("designs of one coil (%v) and of several (%v) not both among the cases", saw[false], saw[true])
	}
}

// Counts read in the singular for one: a one-turn loop, a single-layer
// solenoid and a design with a single tolerance line never print "1
// turns", "1 layers", "1 tolerance lines" and the like, in any section.
func TestCountsOfOne(t *testing.T) {
	specs := map[string]string{
		"one-turn loop":         "```coil\nname = ring\nform = loop\nmean-diameter = 100 mm\nturns = 1\nwire = AWG 12\ncurrent = 5 A\n```\n",
		"single-layer solenoid": "```coil\nname = sheet\nform = solenoid\nmean-diameter = 40 mm\nlength = 30 mm\nturns = 40\nwire = AWG 26\ncurrent = 0.5 A\n```\n",
		"one tolerance line": "```coil\nname = trial loop\nform = loop\nmean-diameter = 60 mm\nturns = 150\nwire = AWG 30\nvoltage = 3.3 V\nswitch-off = 5 us\n```\n\n" +
			"```conditions\nambient = 20 degC\ncooling = vacuum\nmount-resistance = 80 K/W\n```\n\n```tolerances\nsupply = ±5 %\n```\n",
	}
	plural := regexp.MustCompile(`\b1 (turns|layers|tolerance lines|lines|wires|gaps|results|tolerances|round turns|checks|coils)\b`)
	for name, src := range specs {
		j := mustEvaluate(t, src)
		text := memoText(t, j)
		if strings.Contains(text, "all 1 turn") {
			t.Errorf("%s: \"all 1 turn\" for a single turn", name)
		}
		if m := plural.FindAllStringIndex(text, -1); len(m) > 0 {
			for _, k := range m {
				t.Errorf("%s: …%s…", name, text[max(0, k[0]-60):min(len(text), k[1]+20)])
			}
		}
		switch name {
		case "one-turn loop":
			if !strings.Contains(text, "1 turn") {
				t.Errorf("%s: the memo never says \"1 turn\"", name)
			}
		case "single-layer solenoid":
			if w := j.Results.Coils[0].Winding; w.LayerCount != 1 {
				t.Fatalf("%s: %d layers, want one", name, w.LayerCount)
			}
		case "one tolerance line":
			if !strings.Contains(text, "its 1 tolerance line:") {
				t.Errorf("%s: the worst case does not count its single tolerance line", name)
			}
		}
	}
}
