package pdf

import (
	"strings"

	"coilmemo/fonts"
)

// Text is measured here rather than through fpdf, whose measuring needs the
// font to be selected (and so writes a font switch into the page for every
// measurement). Widths are rounded to thousandths of an em exactly as the
// PDF's /W arrays are, so measured and displayed widths agree.

// textWidthOf returns the width in points of s set in the given face (the
// upright sans face when there is no such face).
func textWidthOf(family, style string, size float64, s string) float64 {
	if _, ok := fonts.Glyph(family, style, ' '); !ok {
		family, style = "sans", ""
	}
	n := 0
	for _, r := range bmp(s) {
		g, _ := fonts.Glyph(family, style, r)
		n += g.Advance
	}
	return float64(n) * size / 1000
}

// bmp replaces the characters outside the Basic Multilingual Plane (emoji,
// rare CJK) with U+FFFD: the PDF writer's font tables index 16-bit code
// points, and the embedded fonts hold none of those characters anyway.
func bmp(s string) string {
	for _, r := range s {
		if r > 0xFFFF {
			return strings.Map(func(r rune) rune {
				if r > 0xFFFF {
					return '\uFFFD'
				}
				return r
			}, s)
		}
	}
	return s
}
