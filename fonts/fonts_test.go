package fonts

import (
	"testing"

	"golang.org/x/image/font/sfnt"
)

// Every glyph the memo relies on must be in every sans face.
func TestCoverage(t *testing.T) {
	const need = "µΩ°²³·≤≥×√±≈−–αβγδεθλμπρσφωΔΦΨΣ✓✗•◦→"
	for _, s := range All() {
		f, err := sfnt.Parse(s.TTF)
		if err != nil {
			t.Fatal(err)
		}
		var buf sfnt.Buffer
		for _, r := range need {
			if s.Family != "sans" && (r == '✓' || r == '✗' || r == '◦') {
				continue
			}
			g, err := f.GlyphIndex(&buf, r)
			if err != nil || g == 0 {
				t.Errorf("%s %q: no glyph for %q", s.Family, s.Style, r)
			}
		}
	}
}

func TestCollection(t *testing.T) {
	c := Collection()
	if len(c) != len(All()) {
		t.Fatalf("collection has %d faces, want %d", len(c), len(All()))
	}
	face := Cache().Lookup(Face(Sans, true, false, 10), 10)
	if face.Face == nil || face.Width("Ω") <= 0 {
		t.Fatal("bold sans lookup failed")
	}
	for _, s := range All() {
		fam, sty := ForFace(s.Font)
		if fam != s.Family || sty != s.Style {
			t.Errorf("ForFace(%v) = %s %q, want %s %q", s.Font, fam, sty, s.Family, s.Style)
		}
		if fam, sty, ok := ForOpentype(Cache().Lookup(s.Font, 10).Face); !ok || fam != s.Family || sty != s.Style {
			t.Errorf("ForOpentype(%s %q) = %s %q %v", s.Family, s.Style, fam, sty, ok)
		}
		if Lookup(s.Family, s.Style) == nil {
			t.Errorf("Lookup(%s, %q) = nil", s.Family, s.Style)
		}
	}
}
