package analysis

import "testing"

// Two solenoids, the second's bore larger than the first's outside
// diameter: placed concentric the first lies in the second's bore (wholly
// when no longer, partly when it runs out of it); moved apart along the
// axis, or side by side, neither is nested.
func TestNestings(t *testing.T) {
	pair := func(innerLength, outerCentre string) string {
		return "```coil\nname = in\nform = solenoid\ninner-diameter = 40 mm\nradial-build = 4 mm\nlength = " + innerLength +
			"\nturns = 600\nwire = 0.5 mm\ncurrent = 2 A\n```\n" +
			"```coil\nname = out\nform = solenoid\ninner-diameter = 60 mm\nradial-build = 4 mm\nlength = 80 mm\nturns = 400\nwire = 0.5 mm\ncurrent = 2 A\ncentre = " +
			outerCentre + "\n```\n"
	}
	for _, c := range []struct {
		name          string
		length, at    string
		nested, whole bool
	}{
		{"concentric, equal lengths", "80 mm", "(0, 0, 0) mm", true, true},
		{"concentric, shorter", "50 mm", "(0, 0, 0) mm", true, true},
		{"concentric, runs out of the bore", "160 mm", "(0, 0, 0) mm", true, false},
		{"end to end", "80 mm", "(0, 0, 100) mm", false, false},
		{"side by side", "80 mm", "(100, 0, 0) mm", false, false},
	} {
		st := studyOf(t, pair(c.length, c.at))
		n := st.Design.Nested
		if !c.nested {
			if len(n) != 0 {
				t.Errorf("%s: nestings %+v, want none", c.name, n)
			}
			continue
		}
		if len(n) != 1 || n[0].Inner != 0 || n[0].Outer != 1 || n[0].Whole != c.whole {
			t.Errorf("%s: nestings %+v, want in (0) in out (1), whole %v", c.name, n, c.whole)
		}
	}
}
