package memo

import (
	"bytes"
	"strconv"
	"strings"
	"testing"

	"coilmemo/doc"
)

// Every form and sense builds a complete PDF, the field section refers to
// each figure before it and numbers them in order.
func TestFieldSectionForms(t *testing.T) {
	coils := map[string]string{
		"thin loop":     "form = loop\nmean-diameter = 60 mm\nturns = 30\nwire = AWG 26\ncurrent = 0.2 A",
		"multilayer":    "form = solenoid\nmean-diameter = 40 mm\nlength = 10 mm\nradial-build = 4 mm\nturns = 120\nwire = AWG 26\nwire-outer-diameter = 0.45 mm\ncurrent = 0.2 A",
		"single layer":  "form = solenoid\nmean-diameter = 20 mm\nlength = 60 mm\nturns = 100\nwire = AWG 26\ncurrent = 0.2 A",
		"rectangle":     "form = rectangle\nwidth = 80 mm\nheight = 50 mm\nturns = 20\nwire = AWG 26\ncurrent = 0.2 A",
		"aiding pair":   "form = pair\nmean-diameter = 100 mm\nspacing = 50 mm\nturns = 20\nwire = AWG 26\ncurrent = 0.2 A",
		"opposing pair": "form = pair\nmean-diameter = 100 mm\nspacing = 87 mm\nsense = opposing\nturns = 20\nwire = AWG 26\ncurrent = 0.2 A",
	}
	for name, body := range coils {
		t.Run(name, func(t *testing.T) {
			t.Parallel()
			src := "# T\n\n```memo\ndate = 2026-01-02\n```\n\n```coil\nname = c\n" + body + "\n```\n"
			j, diags := evaluate("spec.md", []byte(src))
			if len(diags) > 0 {
				t.Fatalf("spec problems: %v", diags)
			}
			d := Document(j)
			// Each figure of the field section is announced in a paragraph
			// before it, and figures are numbered 1, 2, … in order.
			seen := map[int]bool{}
			last := 0
			for _, b := range d.Blocks {
				switch b := b.(type) {
				case doc.Paragraph:
					for _, s := range b.Spans {
						for n := last + 1; n < last+4; n++ {
							if strings.Contains(s.Text, "Figure "+strconv.Itoa(n)) || strings.Contains(s.Text, "Figures "+strconv.Itoa(n)) {
								seen[n] = true
							}
						}
					}
				case doc.Figure:
					if b.Number != last+1 {
						t.Errorf("figure %d follows %d", b.Number, last)
					}
					last = b.Number
					if !seen[b.Number] {
						t.Errorf("figure %d (%s) not referred to before it", b.Number, b.Caption)
					}
				}
			}
			pdf, err := PDF(j)
			if err != nil || !bytes.HasPrefix(pdf, []byte("%PDF-")) {
				t.Fatalf("PDF: %v", err)
			}
		})
	}
}
