package mathlayout

import (
	"sync"

	"coilmemo/fonts"
)

// Face names an embedded font as fonts registers it with the PDF
// writer: family "serif" or "sans", style "", "I", "B" or "BI".
type Face struct{ Family, Style string }

// glyphMetrics are one character's metrics in ems.
type glyphMetrics struct {
	adv                    float64 // advance, rounded to 1/1000 em as the PDF's width arrays are
	xMin, xMax, yMin, yMax float64 // ink bounds, y up
	ok                     bool    // the face has the glyph
}

// glyph returns the metrics of r in face fc, from the embedded fonts'
// shared metrics (package fonts), in ems.
func glyph(fc Face, r rune) glyphMetrics {
	g, ok := fonts.Glyph(fc.Family, fc.Style, r)
	if !ok {
		return glyphMetrics{adv: 0.6, yMax: 0.7}
	}
	return glyphMetrics{adv: float64(g.Advance) / 1000,
		xMin: g.XMin, xMax: g.XMax, yMin: g.YMin, yMax: g.YMax, ok: g.OK}
}

// resolve picks the face that draws r: the serif face asked for, else the
// sans face of the same style (DejaVu Serif lacks a few signs, ℓ among
// them).
func resolve(fc Face, r rune) (Face, glyphMetrics) {
	if g := glyph(fc, r); g.ok || unicodeSpace(r) {
		return fc, g
	}
	alt := Face{"sans", fc.Style}
	if g := glyph(alt, r); g.ok {
		return alt, g
	}
	return fc, glyph(fc, r)
}

func unicodeSpace(r rune) bool { return r == ' ' || r == '\u00a0' || r == '\u2009' }

// Font-wide quantities of the upright serif, in ems.
var (
	fontOnce  sync.Once
	axisEm    float64 // height of the math axis: the minus sign's centre
	xHeightEm float64 // height of a lower-case x
)

func loadFontParams() {
	m := glyph(Face{"serif", ""}, '−')
	axisEm = (m.yMin + m.yMax) / 2
	xHeightEm = glyph(Face{"serif", ""}, 'x').yMax
	if !(axisEm > 0) {
		axisEm = 0.31
	}
	if !(xHeightEm > 0) {
		xHeightEm = 0.52
	}
}

// AxisHeight returns the height of the math axis above the baseline, in
// ems: fraction bars and the centres of growing brackets sit on it.
func AxisHeight() float64 {
	fontOnce.Do(loadFontParams)
	return axisEm
}

// XHeight returns the height of a lower-case x in ems.
func XHeight() float64 {
	fontOnce.Do(loadFontParams)
	return xHeightEm
}

// TextWidth returns the width of s set in face fc at size (points), with
// the advances the PDF writer uses; characters the face lacks are measured
// in the face that will draw them.
func TextWidth(fc Face, size float64, s string) float64 {
	w := 0.0
	for _, r := range s {
		_, g := resolve(fc, r)
		w += g.adv
	}
	return w * size
}
