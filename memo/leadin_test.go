package memo

import (
	"strings"
	"testing"
)

// Prose that introduced a parameter block ("… as follows.") is not left
// pointing at nothing: the memo reproduces the prose, not the block, so it
// says where the block's values are given. Prose before a block that does
// not introduce it is left as written.
func TestNarrativeLeadInPointsToTheInputs(t *testing.T) {
	src := "# Bench coil\n\nThe coil is judged over the supply's range, as follows.\n\n" +
		"```tolerances\nsupply = ±5 %\n```\n\nIt is wound on a nylon former.\n\n" +
		"```coil\nname = s\nform = solenoid\nmean-diameter = 30 mm\nlength = 30 mm\nturns = 80\nwire = AWG 28\nvoltage = 12 V\n```\n"
	j := mustEvaluate(t, src)
	if got := j.Spec.LeadIns; len(got) != 2 {
		t.Fatalf("lead-ins %v, want the two paragraphs before the blocks", got)
	}
	text := memoText(t, j)
	if !strings.Contains(text, "as follows. (The spec's tolerances block is given with every input in the Inputs section.)") {
		t.Error("the lead-in to the tolerances block does not point to the Inputs section")
	}
	if strings.Contains(text, "nylon former. (The spec's") {
		t.Error("a paragraph that does not introduce the coil block was given a pointer")
	}
}

// The thermal-model assumption names what the warm-up lumps (the
// conductor, a former or a core only where the design has one) and speaks
// of a duty cycle without an on-time only where a coil states one; the
// heat-shedding surface says the bore is taken as adiabatic rather than
// naming a former the design may not have.
func TestThermalAssumptionFitsDesign(t *testing.T) {
	coil := "```coil\nname = s\nform = solenoid\nmean-diameter = 30 mm\nlength = 30 mm\nradial-build = 4 mm\nturns = 300\nwire = AWG 28\nvoltage = 12 V\n"
	bare := memoText(t, mustEvaluate(t, coil+"```\n"))
	if !strings.Contains(bare, "The warm-up treats the conductor as one thermal mass.") || strings.Contains(bare, "without an on-time") || strings.Contains(bare, "sits on the former") {
		t.Error("a coil without former or duty: the thermal assumption names them")
	}
	both := memoText(t, mustEvaluate(t, coil+"former-mass = 8 g\nformer-material = nylon\nduty = 50 %\n```\n"))
	if !strings.Contains(both, "the conductor and its former, where stated, as one thermal mass") || !strings.Contains(both, "A stated duty cycle without an on-time enters as the average power.") {
		t.Error("a coil with a former and a duty without on-time: the thermal assumption leaves them out")
	}
}
