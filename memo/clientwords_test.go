package memo

import (
	"bytes"
	"os"
	"path/filepath"
	"regexp"
	"slices"
	"strings"
	"testing"

	"coilmemo/calc"
	"coilmemo/doc"
)

// specKeyInProse is a hyphenated coil key followed by its value.
var specKeyInProse = regexp.MustCompile(`\b(radial-build|mean-diameter|inner-diameter|outer-diameter|wire-outer-diameter|switch-off|on-time|driver-rating) [0-9]`)

// The memo speaks to its client: no remark in it tells the spec's author
// which key to add (those go to the terminal). Checked over every example
// and figure-test design.
func TestNoRemarksToTheAuthor(t *testing.T) {
	for _, f := range designFiles(t) {
		j, text := memoOf(t, f, false)
		if j == nil {
			continue // a spec that needs its previous revision's file
		}
		for _, p := range []string{"(give ", "state the ", "State the ", "(switch-off)", "(driver-rating)", "state wire-", "SOURCE_DATE_EPOCH", "stated in the spec", "The spec gives", "No former is stated",
			"is not given", "which is not given", "No switch-off time is stated",
			"test plane of the spec", "(a coil's own with a subject)", "data sheet value would replace the estimate"} {
			if i := strings.Index(text, p); i >= 0 {
				t.Errorf("%s: %q in the memo: …%s…", filepath.Base(f), p, text[max(0, i-60):min(len(text), i+60)])
			}
		}
		// a spec key with its value in prose ("radial-build 2.901 mm"),
		// outside the inputs table that lists the keys as written
		for _, line := range strings.Split(text, "\n") {
			if strings.HasPrefix(line, "|") {
				continue
			}
			if m := specKeyInProse.FindString(line); m != "" {
				t.Errorf("%s: spec key %q in prose: %s", filepath.Base(f), m, line)
			}
		}
	}
}

// A background field given as a magnitude has no direction: the memo
// gives no torque vector for it, and gives one for a field stated as a
// vector.
func TestTorqueVectorOnlyForAStatedDirection(t *testing.T) {
	coil := "```coil\nname = x\nform = loop\nmean-diameter = 100 mm\nturns = 50\nwire = AWG 26\ncurrent = 0.2 A\naxis = x\n```\n"
	text := func(field string) string {
		j := mustEvaluate(t, coil+"```conditions\nbackground-field = "+field+"\n```\n")
		var buf bytes.Buffer
		if err := doc.WriteText(&buf, Document(j)); err != nil {
			t.Fatal(err)
		}
		return buf.String()
	}
	if s := text("50 uT"); strings.Contains(s, "As designed, τ =") || !strings.Contains(s, "stated as a magnitude") {
		t.Error("a magnitude field got a torque vector")
	}
	if s := text("(0, 0, 50) uT"); !strings.Contains(s, "As designed, τ =") {
		t.Error("a vector field got no torque vector")
	}
}

// A memo whose coils are all energised continuously speaks of no duty
// cycle: no "duty-averaged" steady state, no power "averaged over the
// duty cycle". Checked over every example and figure-test design.
func TestNoDutyWordsAtFullDuty(t *testing.T) {
	files, _ := filepath.Glob("../examples/*.md")
	more, _ := filepath.Glob("../testdata/figures/*.md")
	checked := 0
	for _, f := range append(files, more...) {
		src, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		j, diags := evaluate(filepath.Base(f), src)
		if len(diags) > 0 {
			continue
		}
		full := true
		for _, cr := range j.Results.Coils {
			full = full && cr.Duty >= 1
		}
		if !full {
			continue
		}
		checked++
		var buf bytes.Buffer
		if err := doc.WriteText(&buf, Document(j)); err != nil {
			t.Fatal(err)
		}
		for _, p := range []string{"duty-averaged", "averaged over the duty cycle"} {
			if i := strings.Index(buf.String(), p); i >= 0 {
				t.Errorf("%s: %q at 100 %% duty: …%s…", filepath.Base(f), p, buf.String()[max(0, i-60):min(buf.Len(), i+60)])
			}
		}
	}
	if checked == 0 {
		t.Fatal("no design at 100 % duty among the examples")
	}
}

// A gradient pair names its gradient along its own axis everywhere in the
// memo (page 1, the field section, its table and figure): ∂By/∂y for a
// pair along y, never ∂Bz/∂z.
func TestGradientSymbolFollowsTheAxis(t *testing.T) {
	j := mustEvaluate(t, "```coil\nname = g\nform = pair\nsense = opposing\nmean-diameter = 50 mm\nspacing = 40 mm\nturns = 60\nwire = AWG 24\ncurrent = 1 A\naxis = y\n```\n")
	var buf bytes.Buffer
	if err := doc.WriteText(&buf, Document(j)); err != nil {
		t.Fatal(err)
	}
	text := buf.String()
	if n := strings.Count(text, "∂By/∂y"); n < 3 || strings.Contains(text, "∂Bz/∂z") || !strings.Contains(text, "G·(y ŷ") {
		t.Errorf("∂By/∂y %d times, ∂Bz/∂z %v, G·(y ŷ %v", n, strings.Contains(text, "∂Bz/∂z"), strings.Contains(text, "G·(y ŷ"))
	}
}

// A warm-up said to have settled ends at the steady temperature the
// figure draws as its level, to the figure the memo prints: not 44.8 °C
// "settled" beside a 45.0 °C level. Checked over every example and
// figure-test design.
func TestSettledWarmUpEndsAtTheLevel(t *testing.T) {
	files := designFiles(t)
	lead := regexp.MustCompile(`warm-up of coil "([^"]*)": energised continuously, its hottest point climbs from [^ ]+ °C to ([^ ]+ °C) in [^,]*, where it has settled`)
	seen := 0
	for _, f := range files {
		j, text := memoOf(t, f, false)
		if j == nil {
			continue
		}
		for _, m := range lead.FindAllStringSubmatch(text, -1) {
			i := slices.IndexFunc(j.Spec.Design.Coils, func(co calc.Coil) bool { return co.Name == m[1] })
			if i < 0 {
				t.Fatalf("%s: no coil %q", f, m[1])
			}
			seen++
			if want := Eng(Celsius(j.Coils[i].Heat.Continuous.HotSpot), "°C", 3); m[2] != want {
				t.Errorf("%s, coil %q: settled at %s, steady level %s", filepath.Base(f), m[1], m[2], want)
			}
		}
	}
	if seen == 0 {
		t.Error("no settled warm-up found: the test reads nothing")
	}
}

// A rectangle is not described as circular filaments, nor a circular
// coil as straight ones.
func TestFilamentWordsFollowTheForms(t *testing.T) {
	for _, tc := range []struct{ file, must, not string }{
		{"../testdata/figures/rectangle.md", "Each rectangular turn is four straight filaments", "circular"},
		{"../examples/bench-solenoid.md", "Each circular turn is a closed circular filament", "rectangular turn"},
	} {
		_, text := memoOf(t, tc.file, true)
		a := strings.Index(text, "## 4 Assumptions")
		f := strings.Index(text, "superposed.")
		if a < 0 || f < 0 {
			t.Fatalf("%s: sections not found", tc.file)
		}
		model := text[a:strings.Index(text[a:], "Non-magnetic")+a] + text[strings.LastIndex(text[:f], "Fields are computed"):f]
		if !strings.Contains(model, tc.must) || strings.Contains(model, tc.not) {
			t.Errorf("%s: filament wording %q", tc.file, model)
		}
	}
}

// Prose carries no notation source: no "A_eff" or "x_{1}" outside the
// mathematics (paragraphs, cautions, table cells, captions and equation
// descriptions). Checked over every example and figure-test design.
func TestNoNotationInProse(t *testing.T) {
	files := designFiles(t)
	raw := regexp.MustCompile(`[A-Za-zα-ω]_[{A-Za-z0-9]|\\[a-z]+\{`)
	for _, f := range files {
		j, _ := memoOf(t, f, false)
		if j == nil {
			continue
		}
		var texts []string
		spans := func(ss []doc.Span) {
			for _, s := range ss {
				if !s.Math && !s.Code {
					texts = append(texts, s.Text)
				}
			}
		}
		var walk func(bs []doc.Block)
		walk = func(bs []doc.Block) {
			for _, b := range bs {
				switch v := b.(type) {
				case doc.Paragraph:
					spans(v.Spans)
				case doc.Callout:
					spans(v.Spans)
				case doc.List:
					for _, it := range v.Items {
						walk(it)
					}
				case doc.Table:
					texts = append(texts, v.Caption)
					for _, r := range v.Rows {
						for _, c := range r {
							texts = append(texts, c.Text)
						}
					}
				case doc.Figure:
					texts = append(texts, v.Caption)
				case doc.Equation:
					texts = append(texts, v.Description)
				}
			}
		}
		walk(Document(j).Blocks)
		for _, s := range texts {
			if m := raw.FindStringIndex(s); m != nil {
				t.Errorf("%s: notation in prose: …%s…", filepath.Base(f), s[max(0, m[0]-40):min(len(s), m[1]+40)])
			}
		}
	}
}
