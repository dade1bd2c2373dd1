package memo

import (
	"regexp"
	"strings"
	"testing"

	"coilmemo/doc"
)

// The memo's numbers and counts, over every example and figure-test
// design: no power of ten on a percentage, no signed zero, no raw SI in
// exponent form or in ten-thousandths of a metre, no "All 2" or "All 1"
// counts, no plural after a count of one nor a hedged "(s)", and probe
// positions written alike.
func TestNumberForms(t *testing.T) {
	bad := map[string]*regexp.Regexp{
		"power of ten on a percentage": regexp.MustCompile(`×10[⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+ ?%`),
		"signed zero":                  regexp.MustCompile(`[−+-]0(\.0+)? (%|K|°C)`),
		"raw SI exponent":              regexp.MustCompile(`\b\d(\.\d+)?e-?\d+ [a-zA-Z]`),
		"raw SI small metres":          regexp.MustCompile(`\b0\.000\d+ m\b`),
		"count grammar":                regexp.MustCompile(`All [12] |(^|[^0-9.,×])1 (requirements|checks|turns|layers|coils|corners|samples|cautions|warnings|tolerances|gaps|probes|choices|wires)\b|[a-z]\(s\)`),
		"position with trailing zeros": regexp.MustCompile(`\(\S*\.\d*0, .*\) mm`),
	}
	designs := designsForTests(t)
	for f, src := range designs {
		j, diags := evaluate(f, src)
		if len(diags) > 0 {
			t.Fatal(f, diags)
		}
		var text strings.Builder
		if err := doc.WriteText(&text, Compose(j)); err != nil {
			t.Fatal(err)
		}
		for _, line := range strings.Split(text.String(), "\n") {
			if strings.HasPrefix(line, "    ") || strings.Contains(line, "\\") {
				continue // carried-over code, equation notation
			}
			for what, re := range bad {
				if m := re.FindString(line); m != "" {
					t.Errorf("%s: %s %q in %q", f, what, m, line)
				}
			}
		}
	}
}
