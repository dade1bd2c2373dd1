package analysis

import (
	"math"
	"testing"
)

// Coils with the same winding and current share one map (computed once),
// equal node for node to the map computed for the coil alone; a coil that
// differs only in its current gets its own. The nodes inside the winding
// section are left NaN and every other node is a finite field.
func TestIdenticalCoilsShareTheirMap(t *testing.T) {
	coil := func(name, axis, centre, current string) string {
		return "```coil\nname = " + name + "\nform = solenoid\ninner-diameter = 30 mm\nouter-diameter = 40 mm\nlength = 20 mm\nturns = 200\nwire = AWG 26\ncurrent = " + current +
			"\naxis = " + axis + "\ncentre = " + centre + "\n```\n\n"
	}
	st := studyOf(t, coil("a", "z", "(0, 0, 0) mm", "0.5 A")+coil("b", "x", "(150, 0, 0) mm", "0.5 A")+coil("c", "z", "(0, 150, 0) mm", "0.4 A"))
	a, b, c := st.Coils[0].Map, st.Coils[1].Map, st.Coils[2].Map
	if a == nil || a != b {
		t.Fatalf("coils a and b (same winding and current, other place and axis) do not share a map: %p %p", a, b)
	}
	if c == a {
		t.Fatal("coil c, at 0.4 A, shares the 0.5 A map")
	}
	alone := coilMap(st.Spec.Design.Coils[1], st.Results.Coils[1], st.Coils[1], 0)
	nan, inside := 0, 0
	for k := range alone.B {
		x, z := alone.X[k/len(alone.Z)], alone.Z[k%len(alone.Z)]
		in := inWinding(st.Coils[1], x, z)
		if in {
			inside++
		}
		switch {
		case math.IsNaN(alone.B[k]):
			nan++
			if !in {
				t.Fatalf("node (%g, %g) outside the winding is NaN", x, z)
			}
		case in:
			t.Fatalf("node (%g, %g) inside the winding was computed", x, z)
		case !(alone.B[k] > 0) || math.IsInf(alone.B[k], 0):
			t.Fatalf("node (%g, %g): |B| = %g", x, z, alone.B[k])
		}
		if math.Float64bits(alone.B[k]) != math.Float64bits(b.B[k]) && !(math.IsNaN(alone.B[k]) && math.IsNaN(b.B[k])) {
			t.Fatalf("node %d: shared map %g, the coil's own %g", k, b.B[k], alone.B[k])
		}
	}
	if inside == 0 || nan != inside {
		t.Errorf("%d nodes inside the winding, %d NaN", inside, nan)
	}
}
