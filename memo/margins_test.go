package memo

import (
	"regexp"
	"strings"
	"testing"

	"coilmemo/doc"
	"coilmemo/format"
)

// Every relative margin in a memo's tables takes RelMargin's one form — a
// signed percentage to three figures, "< +0.001 %" / "> −0.001 %" below
// that, or a ratio "×73" beyond +900 %, which the table's caption then
// explains — and a temperature's is a difference in kelvin, never a
// percentage; so the requirements table and the sizing tables of the
// sizing memo do not mix "< 0.05 %" with "+0.164 %".
func TestMarginsInOneForm(t *testing.T) {
	form := regexp.MustCompile(`^([+−]\d+(\.\d+)? %|[+−]\d+(\.\d+)?×10[⁰¹²³⁴⁵⁶⁷⁸⁹⁻]+ %|< \+0\.001 %|> −0\.001 %|0 %|×\d+(\.\d+)?(×10[⁰¹²³⁴⁵⁶⁷⁸⁹]+)?|∞|n/a|—)$|^([+−]\d+\.\d|0\.0) K$`)
	seen, ratios := 0, 0
	for _, file := range []string{"../examples/torque-coil-sizing.md", "../examples/calibration-pair.md", "../examples/torque-coil.md", "../examples/search-coil.md"} {
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
						for _, u := range []string{"%", "K"} {
							if strings.HasSuffix(h, "("+u+")") && s != "—" && s != "n/a" {
								s += " " + u // the unit stands in the column's header
							}
						}
						if !form.MatchString(s) {
							t.Errorf("%s: %q: margin %q", file, tb.Caption, s)
						}
						temp := strings.Contains(strings.ToLower(r[0].Text), "temperature") || strings.HasPrefix(strings.ToLower(h), "temperature")
						if temp && !strings.HasSuffix(s, " K") && s != "—" && s != "n/a" {
							t.Errorf("%s: %q: a temperature's margin %q is no difference in kelvin", file, tb.Caption, s)
						}
						if strings.HasPrefix(s, "×") {
							ratios++
							if !strings.Contains(tb.Caption, format.RatioMarginNote) {
								t.Errorf("%s: %q: margin %q as a ratio, not explained by the caption", file, tb.Caption, s)
							}
						}
					}
				}
			}
		}
		walk(Document(j).Blocks)
	}
	t.Logf("%d margins", seen)
	if seen < 10 || ratios == 0 {
		t.Errorf("only %d margins seen, %d of them ratios", seen, ratios)
	}
}
