package figures

import (
	"testing"

	"gonum.org/v1/plot/vg"
)

// A crowded colour bar keeps its decades and its ends, and as many other
// labels as fit, none closer than the gap; an uncrowded one labels all.
func TestBarLabels(t *testing.T) {
	levels := []float64{2e-5, 5e-5, 1e-4, 2e-4, 5e-4, 1e-3}
	ys := []vg.Length{0, 6, 10, 16, 24, 30}
	got := barLabels(levels, ys, 7)
	has := map[int]bool{}
	for _, i := range got {
		has[i] = true
	}
	if !has[2] || !has[5] || !has[0] {
		t.Errorf("decades and ends not all labelled: %v", got)
	}
	for a := range got {
		for b := a + 1; b < len(got); b++ {
			if d := ys[got[b]] - ys[got[a]]; d < 7 {
				t.Errorf("labels %d and %d are %v apart", got[a], got[b], d)
			}
		}
	}
	if all := barLabels(levels, []vg.Length{0, 10, 20, 30, 40, 50}, 7); len(all) != len(levels) {
		t.Errorf("uncrowded bar labels %v", all)
	}
}
