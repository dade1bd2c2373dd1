package memo

import (
	"strings"
	"testing"

	"coilmemo/analysis"
)

// The switching section says the winding's own capacitance bounds the
// unsuppressed spike only where the memo estimates that capacitance: a
// solenoid's, not a pair's or a rectangle's, whose spikes it then says
// are those of the switch's speed alone.
func TestSpikeBoundWording(t *testing.T) {
	for _, c := range []struct {
		name, src string
		bounded   bool
	}{
		{"solenoid", "```coil\nname = s\nform = solenoid\nmean-diameter = 30 mm\nlength = 30 mm\nradial-build = 4 mm\nturns = 300\nwire = AWG 28\nvoltage = 12 V\n```\n", true},
		{"pair", "```coil\nname = p\nform = pair\nmean-diameter = 200 mm\nspacing = 100 mm\nlength = 10 mm\nradial-build = 6 mm\nturns = 60\nwire = AWG 22\ncurrent = 2 A\n```\n", false},
		{"rectangle", "```coil\nname = r\nform = rectangle\nwidth = 300 mm\nheight = 200 mm\nturns = 40\nwire = AWG 22\ncurrent = 2 A\n```\n", false},
	} {
		j := mustEvaluate(t, c.src)
		p := j.Coils[0].SwitchOff
		text := memoText(t, j)
		says := strings.Contains(text, "the winding's own capacitance enters only as the bound it sets on the unsuppressed spike")
		if says != c.bounded || (p.Capacitance > 0) != c.bounded {
			t.Errorf("%s: capacitance %g F, the memo claims its bound: %v", c.name, p.Capacitance, says)
		}
		if !c.bounded && !strings.Contains(text, "is not estimated for a "+c.name) {
			t.Errorf("%s: the memo does not say the capacitance is not estimated", c.name)
		}
	}
}

// The spike the Safety section's switch-off caution quotes is the one the
// Inductance and switching section derives or states: over every example
// and golden design, the caution's figure appears in that section.
func TestSwitchOffFigureInTheBody(t *testing.T) {
	checked := 0
	for name, src := range specsForTests(t) {
		j, diags := evaluate(name, src)
		if len(diags) > 0 {
			continue // a revision that needs its previous file
		}
		body := sectionsByName(t, j)["electrical"]
		for _, f := range j.Safety.Findings {
			if f.Kind != analysis.SwitchOffVoltage {
				continue
			}
			checked++
			if v := Eng(f.Value, "V", 3); !strings.Contains(body, v) {
				t.Errorf("%s: the caution's spike %s is not in the switching section", name, v)
			}
		}
	}
	if checked < 3 {
		t.Fatalf("only %d switch-off cautions checked", checked)
	}
}
