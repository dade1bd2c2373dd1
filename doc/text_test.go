package doc

import (
	"bytes"
	"strings"
	"testing"
)

// The text backend prints notation as written, continuation lines under
// the first relation sign, the result marked, inline formulas in $…$.
func TestWriteTextEquation(t *testing.T) {
	d := &Document{Meta: Meta{Title: "T", DocID: "D", Revision: "A"}, Blocks: []Block{
		Equation{Label: "5.8", Description: "Resistance at 20 °C", Result: true, Lines: []string{
			`R_{20} = \frac{\rho_{20} \ell_w}{A}`, `= \frac{1.7241×10⁻⁸ \cdot 30.16}{0.1288}`, `= 4.039\,\unit{Ω}`}},
		Equation{Description: "Definition", Lines: []string{`{a=b} + c = d`, `= e`}},
		Paragraph{Spans: []Span{{Text: "the field "}, {Text: `B_0`, Math: true}, {Text: " at the centre"}}},
	}}
	var b bytes.Buffer
	if err := WriteText(&b, d); err != nil {
		t.Fatal(err)
	}
	want := `
(5.8) Resistance at 20 °C
      R_{20} = \frac{\rho_{20} \ell_w}{A}
             = \frac{1.7241×10⁻⁸ \cdot 30.16}{0.1288}
             = 4.039\,\unit{Ω}  ◀

Definition
    {a=b} + c = d
              = e

the field $B_0$ at the centre
`
	if got := b.String(); !strings.HasSuffix(got, want) {
		t.Errorf("text backend:\n%s\nwant the end to be:\n%s", got, want)
	}
}
