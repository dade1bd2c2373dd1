package memo

import (
	"bytes"
	"strings"
	"testing"

	"coilmemo/doc"
)

// A coupling row of a cored coil is its winding's in air, and the memo
// says so with the moments that bound how much the core raises it.
func TestCoredCouplingSaysAir(t *testing.T) {
	src := "```coil\nname = rod\nform = solenoid\nmean-diameter = 12 mm\nlength = 120 mm\nturns = 400\nwire = AWG 30\ncurrent = 0.1 A\n" +
		"core-length = 140 mm\ncore-diameter = 8 mm\ncore-density = 7800 kg/m3\ncore-permeability = 2000\n```\n\n" +
		"```coil\nname = loop\nform = loop\nmean-diameter = 60 mm\nturns = 20\nwire = AWG 26\ncurrent = 0.2 A\ncentre = (0, 0, 200) mm\n```\n"
	j := mustEvaluate(t, src)
	var buf bytes.Buffer
	if err := doc.WriteText(&buf, Document(j)); err != nil {
		t.Fatal(err)
	}
	text := buf.String()
	if !strings.Contains(text, `The rows of a cored coil are those of its winding in air: coil "rod" (moment`) {
		t.Error("no statement that the cored coil's couplings are the air winding's")
	}
	air, cored := j.Coils[0].Kinds.AirMoment.Norm(), j.Results.Coils[0].Moment.Norm()
	if !(cored > 2*air) {
		t.Errorf("cored moment %g not above the air moment %g", cored, air)
	}
}
