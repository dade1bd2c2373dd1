package memo

import (
	"regexp"
	"strings"
	"testing"

	"coilmemo/doc"
)

// Every relative margin in a memo's tables takes RelMargin's one form — a
// signed percentage to three figures, "< +0.001 %" / "> −0.001 %" below
// that, or a ratio — so the requirements table and the sizing tables of
// the sizing memo do not mix "< 0.05 %" with "+0.164 %".
func TestMarginsInOneForm(t *testing.T) {
	form := regexp.MustCompile(`^([+−]\d+(\.\d+)? %|[+−]\d+(\.\d+)?×10[⁰¹²³⁴⁵⁶⁷⁸⁹⁻]+ %|< \+0\.001 %|> −0\.001 %|0 %|\d+(\.\d+)?(×10[⁰¹²³⁴⁵⁶⁷⁸⁹]+)?-fold|∞|n/a|—)( of the rise)?$|^[+−]\d+\.\d K$`)
	seen := 0
	for _, file := range []string{"../examples/torque-coil-sizing.md", "../examples/calibration-pair.md", "../examples/torque-coil.md"} {
		j, _ := memoOf(t, file, true)
		var walk func([]doc.Block)
		walk = func(bs []doc.Block) {
			for _, b := range bs {
				tb, ok := b.(doc.Table)
				if !ok {
					continue
				}
				for col, h := range tb.Header {
					if !strings.Contains(strings.ToLower(h), "margin") {
						continue
					}
					for _, r := range tb.Rows {
						if col >= len(r) {
							continue
						}
						seen++
						s := r[col].Text
						if strings.HasSuffix(h, "(%)") && s != "—" && s != "n/a" {
							s += " %" // the unit stands in the column's header
						}
						if !form.MatchString(s) {
							t.Errorf("%s: %q: margin %q", file, tb.Caption, s)
						}
					}
				}
			}
		}
		walk(Document(j).Blocks)
	}
	t.Logf("%d margins", seen)
	if seen < 10 {
		t.Errorf("only %d margins seen", seen)
	}
}
