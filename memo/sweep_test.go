package memo

import (
	"math"
	"strings"
	"testing"

	"coilmemo/doc"
)

// A switch-off sweep shows the unsuppressed spike, which falls as the
// switch opens more slowly (V ≈ L·I/t_off + supply), and plots it.
func TestSweepSwitchOff(t *testing.T) {
	src := "# S\n\n```coil\nform = solenoid\ninner-diameter = 10 mm\nradial-build = 8 mm\nlength = 20 mm\nturns = 1500\nwire = AWG 34\nvoltage = 24 V\nswitch-off = 10 us\n```\n\n```sweep\nswitch-off = 5 us .. 25 us step 10 us\n```\n"
	j, diags := evaluate("s.md", []byte(src))
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	var text strings.Builder
	if err := doc.WriteText(&text, Document(j)); err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{"| switch-off (µs) |", "Unsuppressed spike", "Switch-off spike across the sweep"} {
		if !strings.Contains(text.String(), want) {
			t.Errorf("memo lacks %q", want)
		}
	}
	prev := math.Inf(1)
	for _, st := range j.Sweep {
		cr := st.Results.Coils[0]
		want := cr.Inductance*cr.Current/st.Value + cr.Switch.Supply
		if v := cr.Switch.Spike; !(v < prev) || math.Abs(v-want) > 1e-9*want {
			t.Errorf("t_off %g s: spike %g V, want L·I/t_off + supply = %g V, falling", st.Value, v, want)
		}
		prev = cr.Switch.Spike
	}
}
