package memo

import (
	"os"
	"strings"
	"testing"

	"coilmemo/calc"
)

// A coil driven with an imposed current has no supply voltage: the
// voltage across it is what the current source must deliver, its
// compliance voltage, and every design driven so says that and never
// "the supply" (the general caution's "the coil and its supply", the
// equipment, aside).
func TestCurrentDriveComplianceWording(t *testing.T) {
	seen := 0
	for _, f := range designFiles(t) {
		j, text := memoOf(t, f, false)
		if j == nil {
			continue
		}
		current := true
		for i, co := range j.Spec.Design.Coils {
			current = current && co.Drive == calc.CurrentDrive && j.Results.Coils[i].Current != 0
		}
		if !current || len(j.Spec.Design.Coils) == 0 {
			continue
		}
		seen++
		rest := strings.ReplaceAll(strings.ReplaceAll(text, "the coil and its supply", ""), "the coils and their supply", "")
		src, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		prose := strings.Join(strings.Fields(string(src)), " ") // the author's own words are quoted as written
		for k := 0; ; {
			i := strings.Index(strings.ToLower(rest[k:]), "supply")
			if i < 0 {
				break
			}
			i += k
			k = i + 1
			if around := strings.Join(strings.Fields(rest[max(0, i-30):min(len(rest), i+20)]), " "); !strings.Contains(prose, around) {
				t.Errorf("%s: %q", f, rest[max(0, i-80):min(len(rest), i+40)])
			}
		}
		if !strings.Contains(text, "compliance voltage") {
			t.Errorf("%s: no compliance voltage", f)
		}
	}
	if seen == 0 {
		t.Fatal("no current-driven design")
	}
}
