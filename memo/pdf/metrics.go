package pdf

import (
	"strings"
	"unicode"
	"unicode/utf8"

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

// bmp makes s safe to hand to the PDF writer, whose UTF-8 decoder reads
// past the end of a string on invalid bytes and whose font tables index
// 16-bit code points: every invalid byte and every character outside the
// Basic Multilingual Plane (emoji, rare CJK; the embedded fonts hold none)
// becomes U+FFFD, a tab or line break a space, and any other control
// character U+FFFD. Text that needs none of this is returned as it is.
func bmp(s string) string {
	if printable(s) {
		return s
	}
	var b strings.Builder
	b.Grow(len(s))
	for i := 0; i < len(s); {
		r, size := utf8.DecodeRuneInString(s[i:])
		i += size
		switch {
		case r == '\t' || r == '\n' || r == '\r':
			b.WriteByte(' ')
		case (r == utf8.RuneError && size == 1) || r > 0xFFFF || unicode.IsControl(r):
			b.WriteRune('\uFFFD')
		default:
			b.WriteRune(r)
		}
	}
	return b.String()
}

// printable reports whether s is valid UTF-8 of Basic Multilingual Plane
// characters with no control characters.
func printable(s string) bool {
	for i := 0; i < len(s); {
		c := s[i]
		if c < utf8.RuneSelf {
			if c < 0x20 || c == 0x7f {
				return false
			}
			i++
			continue
		}
		r, size := utf8.DecodeRuneInString(s[i:])
		if (r == utf8.RuneError && size == 1) || r > 0xFFFF || unicode.IsControl(r) {
			return false
		}
		i += size
	}
	return true
}

// prefixFitting returns the length in bytes of the longest prefix of s
// (text the writer accepts, see bmp) at most w wide in the given face,
// measuring each character once.
func prefixFitting(family, style string, size float64, s string, w float64) int {
	if _, ok := fonts.Glyph(family, style, ' '); !ok {
		family, style = "sans", ""
	}
	limit := w * 1000 / size
	n := 0
	for i, r := range s {
		g, _ := fonts.Glyph(family, style, r)
		if float64(n+g.Advance) > limit {
			return i
		}
		n += g.Advance
	}
	return len(s)
}
