package fonts

import "testing"

func TestGlyphMetrics(t *testing.T) {
	x, ok := Glyph("sans", "", 'x')
	if !ok || !x.OK {
		t.Fatal("sans face or its x missing")
	}
	H, _ := Glyph("sans", "", 'H')
	if !(x.YMax > 0.4 && x.YMax < H.YMax && H.YMax < 0.8) {
		t.Errorf("x-height %.3f em, cap height %.3f em: want 0.4 < x < H < 0.8", x.YMax, H.YMax)
	}
	// Monospace: every glyph the same advance.
	a, _ := Glyph("mono", "", 'i')
	b, _ := Glyph("mono", "", 'W')
	if a.Advance != b.Advance || a.Advance == 0 {
		t.Errorf("mono advances i %d, W %d: want equal and non-zero", a.Advance, b.Advance)
	}
	if _, ok := Glyph("nosuch", "", 'x'); ok {
		t.Error("an unknown face reported present")
	}
	if g, _ := Glyph("sans", "", '\U000F0000'); g.OK || g.Advance != 600 {
		t.Errorf("a private-use character: %+v, want missing with advance 600", g)
	}
}
