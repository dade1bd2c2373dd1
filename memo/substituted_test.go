package memo

import (
	"os"
	"path/filepath"
	"regexp"
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
	"Rosa's second correction": "tabulated correction, a sum over a table",
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

// The inputs table writes a default or derived value to at most three
// significant figures, as the memo uses it ("1.09 mm (heavy-build
// estimate)", as in the Assumptions' "1.09 mm over 1.02 mm bare", not
// "1.09122 mm" nor "1.091 mm"), and the author's own values as written.
func TestInputsDefaultsToThreeFigures(t *testing.T) {
	digits := regexp.MustCompile(`^[−-]?([0-9]+(?:\.[0-9]+)?)`)
	for name, src := range designsForTests(t) {
		j, diags := evaluate(name, src)
		if len(diags) > 0 {
			continue
		}
		c := &composer{j: j}
		c.inputs()
		for _, b := range c.blocks {
			tb, ok := b.(doc.Table)
			if !ok {
				continue
			}
			for _, row := range tb.Rows {
				if row[2].Text != "(default)" {
					continue
				}
				si := strings.TrimPrefix(strings.TrimPrefix(row[3].Text, "("), ">= ")
				m := digits.FindStringSubmatch(si)
				if m == nil || strings.Contains(si, " K") {
					continue // words, or kelvin (an exact conversion of °C)
				}
				if n := len(strings.TrimLeft(strings.ReplaceAll(m[1], ".", ""), "0")); n > 3 {
					t.Errorf("%s: %s %s default written to %d figures: %q", name, row[0].Text, row[1].Text, n, row[3].Text)
				}
			}
		}
	}
	j := mustEvaluate(t, "```coil\nname = p\nform = rectangle\nwidth = 400 mm\nheight = 250 mm\nturns = 40\nwire = AWG 18\ncurrent = 2 A\n```\n")
	c := &composer{j: j}
	c.inputs()
	found := false
	for _, b := range c.blocks {
		if tb, ok := b.(doc.Table); ok {
			for _, row := range tb.Rows {
				if row[1].Text == "wire-outer-diameter" {
					found = true
					if row[3].Text != "1.09 mm (heavy-build estimate)" {
						t.Errorf("AWG 18's default outer diameter: %q", row[3].Text)
					}
				}
			}
		}
	}
	if !found {
		t.Error("no default outer diameter in the inputs table")
	}
	var text strings.Builder
	if err := doc.WriteText(&text, Compose(j)); err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(text.String(), "(1.09 mm over 1.02 mm bare)") {
		t.Error("the Assumptions do not write the outer diameter as the inputs table does")
	}
}
