package memo

import (
	"bytes"
	"strings"
	"testing"

	"coilmemo/doc"
)

// A coil with the same winding and current as an earlier one gets no
// second copy of the same map: one sentence points back to the figure.
func TestRepeatedMapRefersBack(t *testing.T) {
	coil := func(name, axis, centre string) string {
		return "```coil\nname = " + name + "\nform = solenoid\ninner-diameter = 30 mm\nouter-diameter = 40 mm\nlength = 20 mm\nturns = 200\nwire = AWG 26\ncurrent = 0.5 A" +
			"\naxis = " + axis + "\ncentre = " + centre + "\n```\n\n"
	}
	j := mustEvaluate(t, "# Array\n\n"+coil("east", "z", "(0, 0, 0) mm")+coil("west", "x", "(150, 0, 0) mm"))
	var buf bytes.Buffer
	if err := doc.WriteText(&buf, Document(j)); err != nil {
		t.Fatal(err)
	}
	text := buf.String()
	if n := strings.Count(text, "maps the magnitude of the flux density of coil"); n != 1 {
		t.Errorf("%d per-coil maps drawn, want 1 for two like coils", n)
	}
	if !strings.Contains(text, `Coil "west" has the same winding and current as coil "east": its map of |B| in its own frame is that of Figure`) {
		t.Error("no reference back to the first coil's map")
	}
}
