package figures

import (
	"testing"
	"unicode/utf8"
)

// A log axis over many decades gets a few short labels, not one long
// decimal per decade.
func TestDecadeTicks(t *testing.T) {
	labels := func(min, max float64) []string {
		var out []string
		for _, tk := range (decadeTicks{}).Ticks(min, max) {
			if tk.Label != "" {
				out = append(out, tk.Label)
			}
		}
		return out
	}
	wide := labels(1e-17, 10)
	if len(wide) > 7 || len(wide) < 3 {
		t.Errorf("18 decades: %d labels %q, want 3 to 7", len(wide), wide)
	}
	for _, l := range wide {
		if utf8.RuneCountInString(l) > 5 {
			t.Errorf("long label %q", l)
		}
	}
	if got := labels(0.01, 1000); len(got) != 6 || got[0] != "0.01" || got[5] != "1000" {
		t.Errorf("5 decades: %q", got)
	}
	if got := decadeLabel(-6); got != "10⁻⁶" {
		t.Errorf("decadeLabel(-6) = %q", got)
	}
	if got := decadeLabel(4); got != "10⁴" {
		t.Errorf("decadeLabel(4) = %q", got)
	}
}
