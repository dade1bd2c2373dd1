package memo

import (
	"os"
	"strings"
	"testing"

	"coilmemo/analysis"
)

// Like coils' checks are written once, naming every coil they cover; a
// coil whose figures differ keeps its own rows.
func TestLikeCoilsShareTheirCheckRows(t *testing.T) {
	src, err := os.ReadFile("../testdata/figures/three-axis-set.md")
	if err != nil {
		t.Fatal(err)
	}
	rowsFor := func(src string) (map[string]int, *analysis.Study) {
		j := mustEvaluate(t, src)
		c := &composer{j: j}
		c.verification()
		names := map[string]int{}
		for _, g := range checkGroups(j.Checks) {
			names[joinAnd(g.coils)] += len(g.rows)
		}
		return names, j
	}
	names, j := rowsFor(string(src))
	per := len(j.Checks) / 3
	if len(j.Checks) != 3*per || per == 0 {
		t.Fatalf("%d checks for three like coils", len(j.Checks))
	}
	if names["X coil, Y coil and Z coil"] != per || len(names) != 1 {
		t.Errorf("three like coils: rows by coil group %v, want %d rows for all three", names, per)
	}
	// Z at another current: its field and heating figures differ.
	other := strings.Replace(string(src), "centre        = (0 mm, 0 mm, -40 mm)\ncurrent       = 60 mA", "centre        = (0 mm, 0 mm, -40 mm)\ncurrent       = 80 mA", 1)
	if other == string(src) {
		t.Fatal("three-axis-set.md no longer has the Z coil's current line")
	}
	names, _ = rowsFor(other)
	if names["X coil and Y coil"] != per || names["Z coil"] != per || len(names) != 2 {
		t.Errorf("Z at 80 mA: rows by coil group %v, want %d for X and Y together and %d for Z", names, per, per)
	}
}
