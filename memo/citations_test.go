package memo

import (
	"bytes"
	"path/filepath"
	"strings"
	"testing"

	"coilmemo/calc"
	"coilmemo/doc"
)

// recallMarks are the words that say a value was recalled rather than
// read from its source: they belong beside the value in the code and its
// tests, never in a memo, which cites the published source.
var recallMarks = []string{"recalled", "from memory"}

// No memo carries a recall mark: every example and figure-test design, and
// a coil of each conductor on a former of each material the spec names
// (those cite their tables in the heating derivation).
func TestMemoCitesNoRecall(t *testing.T) {
	memos := map[string]string{}
	for _, f := range designFiles(t) {
		if j, text := memoOf(t, f, false); j != nil { // nil: a spec that needs its previous revision's file
			memos[filepath.Base(f)] = text
		}
	}
	for _, conductor := range []string{"copper", "aluminium"} {
		for _, m := range calc.FormerMaterials {
			j := mustEvaluate(t, "```coil\nname = x\nform = solenoid\nmean-diameter = 40 mm\nlength = 30 mm\nradial-build = 4 mm\nturns = 400\nwire = AWG 28\nconductor = "+conductor+
				"\ncurrent = 0.2 A\nformer-mass = 10 g\nformer-material = "+m.Name+"\n```\n")
			var buf bytes.Buffer
			if err := doc.WriteText(&buf, Document(j)); err != nil {
				t.Fatal(err)
			}
			text := buf.String()
			if !strings.Contains(text, m.Source) {
				t.Errorf("%s former: its source %q not in the memo", m.Name, m.Source)
			}
			if src := calc.Copper().SpecificHeatSource; conductor == "copper" && !strings.Contains(text, src) {
				t.Errorf("copper's specific heat source %q not in the memo", src)
			}
			memos[conductor+" on "+m.Name] = text
		}
	}
	if len(memos) < 20 {
		t.Fatalf("%d memos", len(memos))
	}
	for name, text := range memos {
		for _, w := range recallMarks {
			if i := strings.Index(text, w); i >= 0 {
				t.Errorf("%s: %q in the memo: …%s…", name, w, text[max(0, i-80):min(len(text), i+40)])
			}
		}
	}
}
