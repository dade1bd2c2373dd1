package analysis

import (
	"strings"
	"testing"
)

// A winding of more turns than the off-axis check integrates one by one
// is checked over every k-th layer, said in the check's name, and the two
// methods still agree; a small winding is checked whole.
func TestOffAxisCheckLargeWinding(t *testing.T) {
	big := studyOf(t, "```coil\nname = big\nform = solenoid\ninner-diameter = 40 mm\nlength = 60 mm\nradial-build = 20 mm\nturns = 100000\nwire = AWG 40\ncurrent = 5 mA\n```\n")
	small := studyOf(t, "```coil\nname = small\nform = solenoid\ninner-diameter = 40 mm\nlength = 60 mm\nradial-build = 2 mm\nturns = 1000\nwire = AWG 30\ncurrent = 0.1 A\n```\n")
	find := func(st *Study) Check {
		for _, c := range st.Checks {
			if strings.HasPrefix(c.Name, "|B| at an off-axis test point") {
				return c
			}
		}
		t.Fatal("no off-axis check")
		return Check{}
	}
	b, s := find(big), find(small)
	if !strings.Contains(b.Name, "layer:") || !strings.Contains(b.Name, "of the 100\u2009000 turns") || !b.Pass {
		t.Errorf("large winding: %q, pass %v", b.Name, b.Pass)
	}
	if s.Name != "|B| at an off-axis test point" || !s.Pass {
		t.Errorf("small winding: %q, pass %v", s.Name, s.Pass)
	}
}
