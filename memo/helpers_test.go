package memo

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"coilmemo/analysis"
	"coilmemo/doc"
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
		if s.Strong && strings.Contains(s.Text, "1 verification check failed") {
			found = true
		}
	}
	if !found {
		t.Errorf("verdict does not report the failed check: %+v", p.Spans)
	}
}

func TestRequirementsVerdict(t *testing.T) {
	for _, c := range []struct {
		n, failed int
		want      string
	}{
		{1, 0, "The stated requirement is met."}, {2, 0, "Both stated requirements are met."},
		{3, 0, "All 3 stated requirements are met."}, {1, 1, "The stated requirement is NOT met."},
		{2, 2, "Neither stated requirement is met."}, {4, 1, "1 of the 4 stated requirements is NOT met."},
		{4, 2, "2 of the 4 stated requirements are NOT met."}, {3, 3, "None of the 3 stated requirements is met."},
	} {
		if got := requirementsVerdict(c.n, c.failed); got != c.want {
			t.Errorf("%d, %d failed: %q, want %q", c.n, c.failed, got, c.want)
		}
	}
}

// designFiles are every example and figure-test design.
func designFiles(t *testing.T) []string {
	t.Helper()
	files, _ := filepath.Glob("../examples/*.md")
	more, _ := filepath.Glob("../testdata/figures/*.md")
	if len(files) == 0 || len(more) == 0 {
		t.Fatal("no example or figure-test designs")
	}
	return append(files, more...)
}

// memoOf is the study of the spec in file and its memo's text; nil and ""
// for a spec that does not evaluate alone (one that needs its previous
// revision's file), or a fatal error when must is set.
func memoOf(t *testing.T, file string, must bool) (*analysis.Study, string) {
	t.Helper()
	src, err := os.ReadFile(file)
	if err != nil {
		t.Fatal(err)
	}
	j, diags := evaluate(filepath.Base(file), src)
	if len(diags) > 0 {
		if must {
			t.Fatal(diags)
		}
		return nil, ""
	}
	var buf bytes.Buffer
	if err := doc.WriteText(&buf, Document(j)); err != nil {
		t.Fatal(err)
	}
	return j, buf.String()
}
