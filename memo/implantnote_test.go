package memo

import (
	"strings"
	"testing"

	"coilmemo/analysis"
	"coilmemo/doc"
)

// TestImplantNoteAgrees: where the field of the coils stays below 0.5 mT
// up to every winding's surface (the thin loop: 1 A-turn; the field of a
// straight conductor, μ0 N I/(2π r), is 0.5 mT only 0.4 mm from the
// bundle's centre line, inside the bundle), the note says the level is
// reached nowhere a person can be and does not then tell the reader to
// keep a device away from the winding.
func TestImplantNoteAgrees(t *testing.T) {
	j, d := figureDesign(t, "thin-loop")
	ir := j.Safety.Implant
	if !ir.Searched || ir.Any() {
		t.Fatalf("thin loop: implant reach %+v; want searched and nowhere at 0.5 mT", ir)
	}
	for _, w := range ir.Windings {
		if w.Surface >= analysis.ImplantField {
			t.Fatalf("thin loop: %g T at the winding's surface", w.Surface)
		}
	}
	var note string
	for _, b := range d.Blocks {
		if c, ok := b.(doc.Callout); ok && c.Title == "Field near the winding" {
			for _, s := range c.Spans {
				note += s.Text
			}
		}
	}
	if note == "" {
		t.Fatal("thin loop: no note on the field near the winding")
	}
	for _, bad := range []string{"do not place", "stay outside", "lies within the winding"} {
		if strings.Contains(note, bad) {
			t.Errorf("the note says the field is below 0.5 mT at the surface, yet %q: %q", bad, note)
		}
	}
	if !strings.Contains(note, "right up to its outer surface") {
		t.Errorf("the note does not say the surface is included: %q", note)
	}
}
