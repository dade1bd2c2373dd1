package memo

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"coilmemo/doc"
)

// designsForTests returns every example and figure-test design that
// analyses on its own (a spec that needs its previous revision's file is
// left out), by base name.
func designsForTests(t *testing.T) map[string][]byte {
	t.Helper()
	files, _ := filepath.Glob("../examples/*.md")
	more, _ := filepath.Glob("../testdata/figures/*.md")
	files = append(files, more...)
	if len(files) == 0 {
		t.Fatal("no designs")
	}
	out := map[string][]byte{}
	for _, f := range files {
		src, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		out[filepath.Base(f)] = src
	}
	return out
}

// unsubstituted lists the derived equations that may show a result with
// no line of numbers, each by the start of its description, with the
// reason the reader needs no numbers there.
var unsubstituted = map[string]string{
	// The right side is a tabulated coefficient (an elliptic-integral
	// expression of k², whose value is the line above): the coefficient
	// is the result.
	"Nagaoka's coefficient": "tabulated coefficient of the k² above",
	// A sum of N−1 terms of a tabulated function f(k): the result is the
	// coefficient of the table.
	"Rosa's correction B": "tabulated correction, a sum over a table",
	// The root of the heat balance derived just before it, whose numbers
	// are put in there (the heat shed at this surface temperature).
	"Surface temperature at the steady state": "root of the balance above",
}

// Every derived equation of the memo (one with a result) shows the
// numbers put into it, so that a checker can follow it, except the
// listed few; over every example and figure-test design.
func TestDerivedEquationsShowTheirNumbers(t *testing.T) {
	used := map[string]bool{}
	for name, src := range designsForTests(t) {
		j, diags := evaluate(name, src)
		if len(diags) > 0 {
			continue
		}
		walkBlocks(Document(j).Blocks, func(b doc.Block) {
			e, ok := b.(doc.Equation)
			if !ok || !e.Result {
				return
			}
			if len(e.Lines) >= 3 || (len(e.Lines) == 2 && strings.HasPrefix(e.Lines[1], `\Rightarrow`)) {
				return // symbols, numbers, result; or a relation solved for its unknown
			}
			for what := range unsubstituted {
				if strings.HasPrefix(e.Description, what) {
					used[what] = true
					return
				}
			}
			t.Errorf("%s: equation %s %q shows no numbers: %q", name, e.Label, e.Description, e.Lines)
		})
	}
	for what := range unsubstituted {
		if !used[what] {
			t.Errorf("the exception %q matches no equation of any design: drop it", what)
		}
	}
}
