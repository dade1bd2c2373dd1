package analysis

import (
	"math"
	"runtime"
	"testing"

	"golang.org/x/tools/txtar"

	"coilmemo/calc"
	"coilmemo/spec"
)

// The map of all coils is computed on every core; it must be the same to
// the bit as on one core (every node computed alone), blanks included.
func TestAllCoilsMapSameOnOneCore(t *testing.T) {
	a, err := txtar.ParseFile("../testdata/golden/coupled-coils.txtar")
	if err != nil {
		t.Fatal(err)
	}
	var s *spec.Spec
	for _, f := range a.Files {
		if f.Name == "spec.md" {
			var diags spec.Diagnostics
			if s, diags = spec.Parse("coupled-coils.md", f.Data); len(diags) > 0 {
				t.Fatal(diags)
			}
		}
	}
	if s == nil {
		t.Fatal("no spec.md")
	}
	r := calc.Evaluate(s.Design)
	many := allCoilsMap(s.Design, r, 0)
	old := runtime.GOMAXPROCS(1)
	one := allCoilsMap(s.Design, r, 0)
	runtime.GOMAXPROCS(old)
	if many == nil || one == nil || len(many.B) != len(one.B) {
		t.Fatal("no map")
	}
	finite := 0
	for k := range one.B {
		if math.Float64bits(one.B[k]) != math.Float64bits(many.B[k]) && !(math.IsNaN(one.B[k]) && math.IsNaN(many.B[k])) {
			t.Fatalf("node %d: %g on one core, %g on %d", k, one.B[k], many.B[k], old)
		}
		if !math.IsNaN(one.B[k]) {
			finite++
		}
	}
	if finite == 0 {
		t.Fatal("the map is blank")
	}
}
