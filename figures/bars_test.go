package figures

import "testing"

// TestBarsTrivial: three equal bars, one per group, say nothing a sentence
// does not; bars of different lengths, or a group with two bars standing
// out of zero (a moment leaning off its axis), carry information.
func TestBarsTrivial(t *testing.T) {
	const tol = 0.03
	for _, c := range []struct {
		name string
		v    [][]float64
		want bool
	}{
		{"square set, equal moments", [][]float64{{34.6e-3, 0, 0}, {0, 34.6e-3, 1e-9}, {0, 0, 34.6e-3}}, true},
		{"equal within 2 %, signs differ", [][]float64{{1, 0, 0}, {0, -0.98, 0}, {0, 0, 1.01}}, true},
		{"one moment 20 % smaller", [][]float64{{1, 0, 0}, {0, 0.8, 0}, {0, 0, 1}}, false},
		{"a moment leaning off its axis", [][]float64{{0.9, 0.3, 0}, {0, 1, 0}, {0, 0, 1}}, false},
		{"no bars", nil, true},
	} {
		if got := (BarGroups{Values: c.v}).Trivial(tol); got != c.want {
			t.Errorf("%s: Trivial = %v, want %v", c.name, got, c.want)
		}
	}
}
