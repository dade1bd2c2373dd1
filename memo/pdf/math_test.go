package pdf

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"coilmemo/doc"
	"coilmemo/memo/mathlayout"
)

func mathDoc(blocks ...doc.Block) *doc.Document {
	return &doc.Document{Meta: doc.Meta{Title: "Maths", DocID: "M-1", Revision: "A"}, Blocks: blocks}
}

type setText struct {
	page int
	s    string
}

func renderTexts(t *testing.T, d *doc.Document) []setText {
	t.Helper()
	var out []setText
	if _, err := render(d, options{onText: func(p int, s string) { out = append(out, setText{p, s}) }}); err != nil {
		t.Fatal(err)
	}
	return out
}

func TestEquationIsSet(t *testing.T) {
	eq := doc.Equation{Label: "5.8", Description: "Resistance at 20 °C", Result: true, Lines: []string{
		`R_{20} = \frac{\rho_{20}\,\ell_w}{A}`,
		`= \frac{1.7241×10⁻⁸\,\unit{Ω·m} \cdot 30.16\,\unit{m}}{0.1288\,\unit{mm^2}}`,
		`= 4.039\,\unit{Ω}`,
	}}
	texts := renderTexts(t, mathDoc(eq))
	var all []string
	for _, s := range texts {
		all = append(all, s.s)
	}
	joined := strings.Join(all, "|")
	for _, want := range []string{"R", "20", "ρ", "ℓ", "1.7241", "4.039", "Ω", "(5.8)", "Resistance at 20 °C"} {
		if !strings.Contains(joined, want) {
			t.Errorf("%q not set; set: %s", want, joined)
		}
	}
	if strings.Contains(joined, `\frac`) {
		t.Error("notation source set instead of mathematics")
	}
}

// Notation that cannot be read is set as its source, and the memo builds.
func TestBadNotationFallsBackInThePDF(t *testing.T) {
	src := `x = \frac{1}{`
	texts := renderTexts(t, mathDoc(doc.Equation{Label: "1.1", Description: "broken", Lines: []string{src}},
		doc.Paragraph{Spans: []doc.Span{{Text: "inline "}, {Text: `\sqrt{`, Math: true}}}))
	found, foundInline := false, false
	for _, s := range texts {
		found = found || s.s == src
		foundInline = foundInline || s.s == `\sqrt{`
	}
	if !found || !foundInline {
		t.Errorf("fallback text not set: %+v", texts)
	}
	if MathError(src) == nil || MathError(`\frac{a}{b}`) != nil {
		t.Error("MathError")
	}
}

// The typesetter measures with the advances the PDF's width arrays carry.
func TestMathMetricsMatchThePDF(t *testing.T) {
	for _, f := range []mathlayout.Face{{Family: "serif", Style: "I"}, {Family: "serif", Style: ""}, {Family: "sans", Style: ""}} {
		s := "Rρ20=ℓ_w·Aπd²"
		if f.Family == "serif" {
			s = "Rρ20=w·Aπd²"
		}
		got := mathlayout.TextWidth(f, 10, s)
		want := textWidthOf(f.Family, f.Style, 10, s)
		if math.Abs(got-want) > 1e-9 {
			t.Errorf("%v: typesetter %.4f pt, PDF %.4f pt", f, got, want)
		}
	}
}

// Inline mathematics is one unbreakable piece of its line.
func TestInlineMathStaysWhole(t *testing.T) {
	spans := []doc.Span{{Text: strings.Repeat("word ", 14)}, {Text: `\frac{\mu_0 I r_i^2}{2 (r_i^2 + z_i^2)^{3/2}}`, Math: true}, {Text: ", and more words after it."}}
	lines := layoutSpans(spans, styBody, 200, 200)
	n := 0
	for _, l := range lines {
		for _, f := range l.frags {
			if f.math != nil {
				n++
				if f.w <= 0 {
					t.Error("formula without width")
				}
			}
		}
	}
	if n != 1 {
		t.Errorf("formula in %d pieces", n)
	}
}

// An equation does not break across pages.
func TestEquationKeptTogether(t *testing.T) {
	var blocks []doc.Block
	for i := range 40 {
		blocks = append(blocks, doc.Equation{Label: fmt.Sprint(i + 1), Description: "step", Result: true,
			Lines: []string{fmt.Sprintf(`E_{%d} = \frac{a}{b}`, i), `= \frac{1.000\,\unit{m}}{2.000\,\unit{s}}`, `= 0.5000\,\unit{m/s}`}})
	}
	texts := renderTexts(t, mathDoc(blocks...))
	// each equation's result is on its number's page
	last := 0
	for i, s := range texts {
		if s.s == "0.5000" {
			// the label, set after the lines, belongs to the same equation
			for j := i; j < len(texts); j++ {
				if strings.HasPrefix(texts[j].s, "(") && strings.HasSuffix(texts[j].s, ")") {
					if texts[j].page != s.page {
						t.Errorf("equation %s split across pages %d and %d", texts[j].s, texts[j].page, s.page)
					}
					break
				}
			}
			last = s.page
		}
	}
	if last < 2 {
		t.Errorf("40 equations fit on %d page(s)?", last)
	}
}
