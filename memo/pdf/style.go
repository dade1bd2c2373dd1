package pdf

import (
	"bytes"
	"strconv"

	"github.com/go-pdf/fpdf"

	"coilmemo/fonts"
)

// rgb is a colour of the house style.
type rgb struct{ r, g, b int }

// The house palette: one accent (a deep teal) and neutrals; the status
// colours are used only together with the status word.
var (
	colInk      = rgb{0x1c, 0x22, 0x27}
	colMuted    = rgb{0x5b, 0x66, 0x70}
	colRule     = rgb{0xc9, 0xd1, 0xd6}
	colAccent   = rgb{0x17, 0x5c, 0x66}
	colAccentBg = rgb{0xe7, 0xf0, 0xf1}
	colCodeBg   = rgb{0xf3, 0xf5, 0xf6}
	colWhite    = rgb{0xff, 0xff, 0xff}

	colPass   = rgb{0x1d, 0x6b, 0x35}
	colPassBg = rgb{0xdf, 0xf1, 0xe4}
	colFail   = rgb{0xa3, 0x1d, 0x1d}
	colFailBg = rgb{0xf8, 0xdf, 0xdd}
	colWarn   = rgb{0x8a, 0x5a, 0x00}
	colWarnBg = rgb{0xfb, 0xef, 0xd2}
)

const ptPerMM = 72 / 25.4

func mm(v float64) float64 { return v * ptPerMM }

// Page geometry in points (A4 portrait).
var (
	pageW, pageH = 595.28, 841.89
	marginLeft   = mm(20)
	marginRight  = mm(20)
	bodyTop      = mm(22)
	bodyBottom   = pageH - mm(19)
	textWidth    = pageW - marginLeft - marginRight
)

// Type sizes and leadings in points.
const (
	sizeBody    = 9.5
	leadBody    = 13.4
	sizeSmall   = 8
	leadSmall   = 10.6
	sizeTable   = 8.5
	leadTable   = 11.4
	sizeCode    = 7.8
	leadCode    = 10.4
	sizeH1      = 13.5
	sizeH2      = 11
	sizeH3      = 9.5
	sizeTitle   = 17
	sizeCaption = 8.3
	leadCaption = 11
)

// fontSet registers embedded fonts with the document on first use, so a
// memo only carries the faces it actually sets text in.
type fontSet struct {
	pdf   *fpdf.Fpdf
	added map[string]bool
}

func (fs *fontSet) use(family, style string, size float64) {
	key := family + "/" + style
	if !fs.added[key] {
		s := fonts.Lookup(family, style)
		if s == nil {
			s = fonts.Lookup("sans", "")
			family, style = "sans", ""
			key = "sans/"
		}
		if !fs.added[key] {
			addFace(fs.pdf, s)
			if fs.added == nil {
				fs.added = map[string]bool{}
			}
			fs.added[key] = true
		}
	}
	fs.pdf.SetFont(family, style, size)
}

// addFace registers an embedded face with a document, giving it its own
// copy of the font file. fpdf (v0.9.0, utf8FontFile.getMetrics) appends
// to a sub-slice of the bytes it was given while it subsets a face, which
// writes two bytes into them (the side bearing of the last full metric of
// DejaVu Sans Mono, for one); on the shared bytes that made every memo
// depend on the memos built before it in the same process, and changed the
// bytes the typesetter and the plots measure while they read them. The
// copy costs about 0.1 ms a face (TestFaceBytesUntouched).
func addFace(pdf *fpdf.Fpdf, s *fonts.Style) {
	pdf.AddUTF8FontFromBytes(s.Family, s.Style, bytes.Clone(s.TTF))
}

func formatNum(v float64) string { return strconv.FormatFloat(v, 'f', 3, 64) }
