package fonts

import (
	"math"
	"sync"

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

// faceMetrics caches one face's parsed font and measured characters.
type faceMetrics struct {
	mu   sync.Mutex
	f    *sfnt.Font
	upem float64
	buf  sfnt.Buffer
	m    map[rune]GlyphMetrics
}

var (
	metricsOnce sync.Once
	metricsBy   map[[2]string]*faceMetrics
)

func loadMetrics() {
	metricsBy = map[[2]string]*faceMetrics{}
	for _, s := range All() {
		f, err := sfnt.Parse(s.TTF)
		if err != nil {
			panic("fonts: embedded font " + s.Family + s.Style + ": " + err.Error())
		}
		metricsBy[[2]string{s.Family, s.Style}] = &faceMetrics{f: f, upem: float64(f.UnitsPerEm()), m: map[rune]GlyphMetrics{}}
	}
}

// Glyph returns the metrics of r in the embedded face family/style (as
// Lookup names them); ok is false when there is no such face. Safe for
// concurrent use; results are cached.
func Glyph(family, style string, r rune) (g GlyphMetrics, ok bool) {
	metricsOnce.Do(loadMetrics)
	fm := metricsBy[[2]string{family, style}]
	if fm == nil {
		return GlyphMetrics{Advance: 600}, false
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
	return g, true
}
