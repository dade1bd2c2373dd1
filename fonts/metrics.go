package fonts

import (
	"math"
	"sync"
	"sync/atomic"

	"golang.org/x/image/font"
	"golang.org/x/image/font/sfnt"
	"golang.org/x/image/math/fixed"
)

// GlyphMetrics are one character's metrics in a face.
type GlyphMetrics struct {
	// Advance is in thousandths of an em, rounded exactly as the PDF's /W
	// width arrays are, so measured and displayed widths agree. A
	// character the face lacks measures 600.
	Advance int
	// Ink bounds in ems, y up from the baseline.
	XMin, XMax, YMin, YMax float64
	// OK reports that the face has the glyph.
	OK bool
}

// denseRunes is the range of characters whose measured metrics a face
// keeps in an array read without a lock: Latin, Greek, punctuation,
// super- and subscripts, letterlike symbols, arrows and the mathematical
// operators — nearly every character a memo sets.
const denseRunes = 0x2400

// faceMetrics caches one face's parsed font and measured characters.
type faceMetrics struct {
	family, style string
	mu            sync.Mutex // guards f, buf and m
	f             *sfnt.Font
	upem          float64
	buf           sfnt.Buffer
	m             map[rune]GlyphMetrics
	dense         [denseRunes]atomic.Pointer[GlyphMetrics]
}

var (
	metricsOnce sync.Once
	metricsBy   []*faceMetrics
)

func loadMetrics() {
	for _, s := range All() {
		f, err := sfnt.Parse(s.TTF)
		if err != nil {
			panic("fonts: embedded font " + s.Family + s.Style + ": " + err.Error())
		}
		metricsBy = append(metricsBy, &faceMetrics{family: s.Family, style: s.Style, f: f, upem: float64(f.UnitsPerEm()), m: map[rune]GlyphMetrics{}})
	}
}

// face is the metrics of the embedded face family/style, nil if there is
// none.
func face(family, style string) *faceMetrics {
	metricsOnce.Do(loadMetrics)
	for _, fm := range metricsBy {
		if fm.family == family && fm.style == style {
			return fm
		}
	}
	return nil
}

// Glyph returns the metrics of r in the embedded face family/style (as
// Lookup names them); ok is false when there is no such face. Safe for
// concurrent use; results are cached.
func Glyph(family, style string, r rune) (g GlyphMetrics, ok bool) {
	fm := face(family, style)
	if fm == nil {
		return GlyphMetrics{Advance: 600}, false
	}
	dense := r >= 0 && r < denseRunes
	if dense {
		if p := fm.dense[r].Load(); p != nil {
			return *p, true
		}
	}
	fm.mu.Lock()
	defer fm.mu.Unlock()
	if g, ok := fm.m[r]; ok {
		return g, true
	}
	g = GlyphMetrics{Advance: 600}
	idx, err := fm.f.GlyphIndex(&fm.buf, r)
	if err == nil && idx != 0 {
		ppem := fixed.Int26_6(fm.f.UnitsPerEm())
		b, adv, err := fm.f.GlyphBounds(&fm.buf, idx, ppem, font.HintingNone)
		if err == nil {
			g = GlyphMetrics{
				Advance: int(math.Round(1000 * float64(adv) / fm.upem)),
				XMin:    float64(b.Min.X) / fm.upem, XMax: float64(b.Max.X) / fm.upem,
				YMin: -float64(b.Max.Y) / fm.upem, YMax: -float64(b.Min.Y) / fm.upem,
				OK: true,
			}
		}
	}
	fm.m[r] = g
	if dense {
		kept := g
		fm.dense[r].Store(&kept)
	}
	return g, true
}
