package memo

import (
	"strings"
	"testing"

	"coilmemo/analysis"
	"coilmemo/spec"
)

// evaluate parses and analyses a spec as the command line does, with no
// build date from the environment.
func evaluate(file string, src []byte) (*analysis.Study, spec.Diagnostics) {
	return analysis.Run(file, src, analysis.Options{})
}

func mustEvaluate(t *testing.T, src string) *analysis.Study {
	t.Helper()
	j, diags := evaluate("test.md", []byte(src))
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	return j
}

// A check that fails shows on page 1.
func TestFailedCheckOnPageOne(t *testing.T) {
	j := mustEvaluate(t, "```coil\nname = s\nform = solenoid\nmean-diameter = 50 mm\nlength = 20 mm\nturns = 30\nwire = AWG 24\ncurrent = 1 A\n```\n")
	j.Checks[0].Pass = false
	p := (&composer{j: j}).verdict()
	found := false
	for _, s := range p.Spans {
		if s.Strong && strings.Contains(s.Text, "verification check(s) failed") {
			found = true
		}
	}
	if !found {
		t.Errorf("verdict does not report the failed check: %+v", p.Spans)
	}
}
