package analysis

import (
	"fmt"
	"math"
	"os"
	"strconv"
	"strings"
	"testing"

	"coilmemo/calc"
)

// One number per quantity: a probe placed at a point of a coil's on-axis
// profile reads the profile's value there. The profile sums the winding by
// Gauss quadrature over its cross-section (calc.CoilSource), the probe turn
// by turn (calc.FieldModel), and a cored rod adds its pole model to both;
// they agree to 10⁻⁹. Checked at the profile's ends, centre and between,
// for the cored rod (also tilted off the x axis and moved off the origin)
// and for air designs of each form; the profile's end is the point the memo
// names, its reach written to three significant figures.
func TestProbeAtProfilePoint(t *testing.T) {
	rod, err := os.ReadFile("../examples/torque-rod.md")
	if err != nil {
		t.Fatal(err)
	}
	moved := strings.Replace(string(rod), "axis              = x\n", "axis              = (1, 2, -1)\ncentre            = (10, -20, 30) mm\n", 1)
	if moved == string(rod) {
		t.Fatal("torque-rod.md: no axis line to move")
	}
	designs := map[string]string{"torque rod": string(rod), "torque rod, tilted and moved": moved}
	for _, f := range []string{"../examples/valve-actuator.md", "../testdata/figures/aiding-pair.md", "../testdata/figures/rectangle.md", "../testdata/figures/thin-loop.md"} {
		b, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		designs[f] = string(b)
	}
	for name, src := range designs {
		st, ds := Run("t.md", []byte(src), Options{})
		if len(ds) > 0 || len(st.Coils) != 1 || len(st.Spec.Design.Probes) > 0 {
			t.Fatalf("%s: %v, %d coils, %d probes", name, ds, len(st.Coils), len(st.Spec.Design.Probes))
		}
		co := st.Spec.Design.Coils[0]
		p := st.Coils[0].Axis
		n := len(p.Z)
		if n < 10 {
			t.Fatalf("%s: %d profile points", name, n)
		}
		if name == "torque rod" && st.Coils[0].Kinds.Core == nil {
			t.Fatal("the torque rod has no core")
		}
		// The profile ends where the memo says it does: at its reach
		// written to three significant figures.
		if end, err := strconv.ParseFloat(strconv.FormatFloat(p.Z[n-1], 'g', 3, 64), 64); err != nil || math.Abs(end-p.Z[n-1]) > 1e-12*end || p.Z[0] != -p.Z[n-1] {
			t.Errorf("%s: the profile ends at %.17g m, not at a value of three significant figures", name, p.Z[n-1])
		}
		u := calc.CoilFrame(co.Axis).U
		idx := []int{0, n / 5, n / 2, n/2 + 3, n - 2, n - 1}
		var b strings.Builder
		b.WriteString("\n```probes\n")
		for k, i := range idx {
			at := co.Centre.Add(u.Scale(p.Z[i]))
			fmt.Fprintf(&b, "p%d = (%.17g, %.17g, %.17g) m\n", k, at[0], at[1], at[2])
		}
		b.WriteString("```\n")
		withProbes, ds := Run("t.md", []byte(src+b.String()), Options{})
		if len(ds) > 0 {
			t.Fatalf("%s with probes: %v", name, ds)
		}
		for k, i := range idx {
			got, want := withProbes.Results.Probes[k].B.Norm(), p.Exact[i]
			if !(math.Abs(got-want) <= 1e-9*want) {
				t.Errorf("%s: probe at z = %.6g m reads %.10g T, the profile %.10g T (%.2g)", name, p.Z[i], got, want, got/want-1)
			}
		}
	}
}
