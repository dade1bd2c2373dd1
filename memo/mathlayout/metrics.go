package mathlayout

import (
	"math"
	"sync"

	"golang.org/x/image/font"
	"golang.org/x/image/font/sfnt"
	"golang.org/x/image/math/fixed"

	"coilmemo/memo/fonts"
)

// Face names an embedded font as memo/fonts registers it with the PDF
// writer: family "serif" or "sans", style "", "I", "B" or "BI".
type Face struct{ Family, Style string }

// glyphMetrics are one character's metrics in ems.
type glyphMetrics struct {
	adv                    float64 // advance, rounded to 1/1000 em as the PDF's width arrays are
	xMin, xMax, yMin, yMax float64 // ink bounds, y up
	ok                     bool    // the face has the glyph
}

type faceData struct {
	mu   sync.Mutex
	f    *sfnt.Font
	upem float64
	buf  sfnt.Buffer
	m    map[rune]glyphMetrics
}

var (
	facesOnce sync.Once
	faces     map[Face]*faceData
)

func loadFaces() {
	faces = map[Face]*faceData{}
	for _, s := range fonts.All() {
		if s.Family != "serif" && s.Family != "sans" {
			continue
		}
		f, err := sfnt.Parse(s.TTF)
		if err != nil {
			continue
		}
		faces[Face{s.Family, s.Style}] = &faceData{f: f, upem: float64(f.UnitsPerEm()), m: map[rune]glyphMetrics{}}
	}
}

// glyph returns the metrics of r in face fc.
func glyph(fc Face, r rune) glyphMetrics {
	facesOnce.Do(loadFaces)
	fd := faces[fc]
	if fd == nil {
		return glyphMetrics{adv: 0.6, yMax: 0.7}
	}
	fd.mu.Lock()
	defer fd.mu.Unlock()
	if g, ok := fd.m[r]; ok {
		return g
	}
	g := glyphMetrics{adv: 0.6}
	idx, err := fd.f.GlyphIndex(&fd.buf, r)
	if err == nil && idx != 0 {
		ppem := fixed.Int26_6(fd.f.UnitsPerEm())
		b, adv, err := fd.f.GlyphBounds(&fd.buf, idx, ppem, font.HintingNone)
		if err == nil {
			g = glyphMetrics{
				adv:  math.Round(1000*float64(adv)/fd.upem) / 1000,
				xMin: float64(b.Min.X) / fd.upem, xMax: float64(b.Max.X) / fd.upem,
				yMin: -float64(b.Max.Y) / fd.upem, yMax: -float64(b.Min.Y) / fd.upem,
				ok: true,
			}
		}
	}
	fd.m[r] = g
	return g
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
