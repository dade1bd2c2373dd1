package pdf

import (
	"math"
	"sync"

	"golang.org/x/image/font"
	"golang.org/x/image/font/sfnt"
	"golang.org/x/image/math/fixed"

	"coilmemo/memo/fonts"
)

// Text is measured here rather than through fpdf, whose measuring needs the
// font to be selected (and so writes a font switch into the page for every
// measurement). Widths are rounded to thousandths of an em exactly as the
// PDF's /W arrays are, so measured and displayed widths agree.

type faceMetrics struct {
	mu     sync.Mutex
	f      *sfnt.Font
	upem   float64
	widths map[rune]int
	buf    sfnt.Buffer
}

var (
	metricsOnce sync.Once
	metricsByID map[string]*faceMetrics
)

func loadMetrics() {
	metricsByID = map[string]*faceMetrics{}
	for _, s := range fonts.All() {
		f, err := sfnt.Parse(s.TTF)
		if err != nil {
			panic(err)
		}
		metricsByID[s.Family+"/"+s.Style] = &faceMetrics{f: f, upem: float64(f.UnitsPerEm()), widths: map[rune]int{}}
	}
}

func metricsFor(family, style string) *faceMetrics {
	metricsOnce.Do(loadMetrics)
	if m := metricsByID[family+"/"+style]; m != nil {
		return m
	}
	return metricsByID["sans/"]
}

// units returns the advance of r in thousandths of an em.
func (m *faceMetrics) units(r rune) int {
	if w, ok := m.widths[r]; ok {
		return w
	}
	w := 600
	g, err := m.f.GlyphIndex(&m.buf, r)
	if err == nil && g != 0 {
		adv, err := m.f.GlyphAdvance(&m.buf, g, fixed.Int26_6(m.f.UnitsPerEm()), font.HintingNone)
		if err == nil {
			w = int(math.Round(1000 * float64(adv) / m.upem))
		}
	}
	m.widths[r] = w
	return w
}

// textWidth returns the width in points of s set in the given face.
func textWidthOf(family, style string, size float64, s string) float64 {
	m := metricsFor(family, style)
	m.mu.Lock()
	defer m.mu.Unlock()
	n := 0
	for _, r := range s {
		n += m.units(r)
	}
	return float64(n) * size / 1000
}
