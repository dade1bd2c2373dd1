package memo

import (
	"bytes"
	"strings"
	"testing"

	"coilmemo/doc"
)

// A coil with the same winding and current as an earlier one gets no
// second copy of the same figures: its field part is the earlier one's,
// under a heading naming both; where something on a figure belongs to
// one coil alone (here a requirement on its centre field), the second
// coil keeps its own part and one sentence points back to the map.
func TestRepeatedMapRefersBack(t *testing.T) {
	coil := func(name, axis, centre string) string {
		return "```coil\nname = " + name + "\nform = solenoid\ninner-diameter = 30 mm\nouter-diameter = 40 mm\nlength = 20 mm\nturns = 200\nwire = AWG 26\ncurrent = 0.5 A" +
			"\naxis = " + axis + "\ncentre = " + centre + "\n```\n\n"
	}
	text := func(src string) string {
		j := mustEvaluate(t, src)
		var buf bytes.Buffer
		if err := doc.WriteText(&buf, Document(j)); err != nil {
			t.Fatal(err)
		}
		return buf.String()
	}
	two := "# Array\n\n" + coil("east", "z", "(0, 0, 0) mm") + coil("west", "x", "(150, 0, 0) mm")
	merged := text(two)
	if n := strings.Count(merged, "maps the magnitude of the flux density of coil"); n != 1 {
		t.Errorf("%d per-coil maps drawn, want 1 for two like coils", n)
	}
	if n := strings.Count(merged, `: Cross-section of coil "`); n != 1 {
		t.Errorf("%d cross-sections drawn, want 1 for two like coils", n)
	}
	if strings.Contains(merged, `all 2 coil`) {
		t.Error(`"all 2 coil blocks" for two`)
	}
	if !strings.Contains(merged, `### Field of coils "east" and "west"`) || !strings.Contains(merged, `It holds unchanged for coil "west"`) {
		t.Error("the field part of the like coils is not one part naming both")
	}
	apart := text(two + "```limits\nfield-center(west) >= 1 mT\n```\n")
	if n := strings.Count(apart, "maps the magnitude of the flux density of coil"); n != 1 {
		t.Errorf("%d per-coil maps drawn, want 1 for two like coils", n)
	}
	if !strings.Contains(apart, `Coil "west" has the same winding and current as coil "east": its map of |B| in its own frame is that of Figure`) {
		t.Error("no reference back to the first coil's map")
	}
}
