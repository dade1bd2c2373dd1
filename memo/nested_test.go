package memo

import (
	"strings"
	"testing"
)

// A winding in another's bore: page 1 and the heating section say the
// stand-alone heat balances understate both temperatures; windings apart
// carry no such sentence.
func TestNestedWindingsCaveat(t *testing.T) {
	spec := func(centre string) string {
		return "```coil\nname = in\nform = solenoid\ninner-diameter = 40 mm\nradial-build = 4 mm\nlength = 80 mm\nturns = 600\nwire = 0.5 mm\ncurrent = 2 A\n```\n" +
			"```coil\nname = out\nform = solenoid\ninner-diameter = 60 mm\nradial-build = 4 mm\nlength = 80 mm\nturns = 400\nwire = 0.5 mm\ncurrent = 2 A\ncentre = " + centre + "\n```\n"
	}
	const s = `Coil "in" lies in the bore of coil "out"`
	nested := memoText(t, mustEvaluate(t, spec("(0, 0, 0) mm")))
	if n := strings.Count(nested, s); n < 2 {
		t.Errorf("nested windings: the caveat appears %d times, want page 1 and the heating section", n)
	}
	apart := memoText(t, mustEvaluate(t, spec("(200, 0, 0) mm")))
	if strings.Contains(apart, "lies in the bore of") {
		t.Error("windings apart carry the nesting caveat")
	}
}
