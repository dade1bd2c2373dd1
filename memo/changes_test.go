package memo

import (
	"os"
	"strings"
	"testing"

	"coilmemo/analysis"
	"coilmemo/doc"
)

// The revision-B example's memo has the changes section right after the
// contents, with the verdict that moved and the inputs behind it.
func TestChangesSection(t *testing.T) {
	src, err := os.ReadFile("../examples/survey-pair.md")
	if err != nil {
		t.Fatal(err)
	}
	j, diags := analysis.Run("survey-pair.md", src, analysis.Options{ReadPrevious: func(ref string) (string, []byte, error) {
		b, err := os.ReadFile("../examples/" + ref)
		return ref, b, err
	}})
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	var text strings.Builder
	if err := doc.WriteText(&text, Compose(j)); err != nil {
		t.Fatal(err)
	}
	out := text.String()
	for _, want := range []string{
		"## 2 Changes since revision A",
		"| requirement field-center ≥ 500 µT | 449.6 µT FAIL | 584.5 µT PASS | FAIL → PASS [PASS] |",
		"| winding temperature, hottest point | 40.82 °C | 44.00 °C | +3.2 K |",
		"| turns (input) | 50 | 65 | +30 % |",
		"| winding length (input) | 8.900 mm | 11.60 mm | +30 % |",
		"\n2 Changes since revision A\n",
	} {
		if !strings.Contains(out, want) {
			t.Errorf("memo lacks %q", want)
		}
	}
	if i, k := strings.Index(out, "Table: The design as a whole"), strings.Index(out, "Table: Coil \"Z pair\": changes"); i < 0 || k < i {
		t.Errorf("groups out of order")
	}
}
