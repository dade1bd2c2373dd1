package memo

import (
	"os"
	"regexp"
	"strings"
	"testing"
)

// A coil under the surface people touch (enclosure = covered): the
// Heating section says no convection is counted and why, the thermal table
// names radiation alone, and the hot-surface caution speaks of the surface
// over the winding. The panel coil of the examples at 3 A, without the
// heat-transfer coefficient it states, runs its winding surface above
// 60 °C.
func TestCoveredCoilWording(t *testing.T) {
	src, err := os.ReadFile("../examples/panel-coil.md")
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(string(src), "enclosure = covered") {
		t.Fatal("the panel coil is not stated covered")
	}
	spec := strings.Replace(string(src), "current          = 2 A", "current          = 3 A", 1)
	spec = regexp.MustCompile(`(?m)^h +=.*\n`).ReplaceAllString(spec, "")
	j := mustEvaluate(t, spec)
	if !j.Cooling.Covered || j.Results.Coils[0].Heat.Steady.Convected != 0 {
		t.Fatalf("cooling %+v, convected %g W", j.Cooling, j.Results.Coils[0].Heat.Steady.Convected)
	}
	sec := sectionsByName(t, j)
	if h := sec["heating"]; !strings.Contains(h, "no convection is counted") || !strings.Contains(h, "radiation only (covered") || strings.Contains(h, "Heat carried away by convection") {
		t.Errorf("heating section:\n%s", h)
	}
	s := sec["safety"]
	if !strings.Contains(s, "Hot surface") || !strings.Contains(s, "lies under or behind a surface that people touch") {
		t.Errorf("safety section:\n%s", s)
	}
}
