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
