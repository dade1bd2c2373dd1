package pdf

import (
	"bytes"
	"crypto/sha256"
	"encoding/hex"
	"image"
	"image/color"
	"image/png"
	"math"

	"github.com/go-pdf/fpdf"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/vg"

	"coilmemo/fonts"
)

// affine is a 2-D affine map in the PDF convention:
//
//	x' = a·x + c·y + e
//	y' = b·x + d·y + f
type affine struct{ a, b, c, d, e, f float64 }

// then returns the map that applies n first and m after it (m∘n). Canvas
// transforms are post-multiplied: a Translate followed by a Rotate rotates
// about the translated origin, as in every vg backend.
func (m affine) then(n affine) affine {
	return affine{
		a: m.a*n.a + m.c*n.b,
		b: m.b*n.a + m.d*n.b,
		c: m.a*n.c + m.c*n.d,
		d: m.b*n.c + m.d*n.d,
		e: m.a*n.e + m.c*n.f + m.e,
		f: m.b*n.e + m.d*n.f + m.f,
	}
}

func (m affine) apply(x, y float64) (float64, float64) {
	return m.a*x + m.c*y + m.e, m.b*x + m.d*y + m.f
}

// scale is the factor by which the map changes lengths on average; it is
// used for line widths and dash lengths, which have no direction.
func (m affine) scale() float64 { return math.Sqrt(math.Abs(m.a*m.d - m.b*m.c)) }

type canvasState struct {
	m      affine
	width  vg.Length
	dash   []vg.Length
	offset vg.Length
	color  color.Color
}

// Canvas is a gonum/plot vg.Canvas that draws into a page of the memo's own
// fpdf document, so figures end up as vector graphics in the memo.
//
// The canvas keeps its own affine matrix stack and transforms every point
// itself: the canvas origin is the bottom-left corner of the figure box, y
// points up and lengths are in points, as gonum/plot expects. Text and
// images, which need the matrix applied to their glyphs or pixels, are
// placed with a PDF cm operator built from the same matrix.
type Canvas struct {
	pdf   *fpdf.Fpdf
	fonts *fontSet
	pageH float64 // page height in points
	w, h  vg.Length
	st    canvasState
	stack []canvasState

	// last values sent to fpdf, to keep the content stream small
	sentWidth float64
	sentDash  string
	sentRGB   [3]int
	sentAlpha float64
	primed    bool
}

var _ vg.CanvasSizer = (*Canvas)(nil)

// NewCanvas returns a canvas over the rectangle of the current page of pdf
// whose top-left corner is at (x, y) in fpdf's page coordinates (points,
// y down from the top edge), w wide and h high. The document must use
// points as its unit. Drawing is not clipped; call Begin and End around
// the drawing to isolate the graphics state and clip to the rectangle.
func NewCanvas(pdf *fpdf.Fpdf, x, y float64, w, h vg.Length) *Canvas {
	_, pageH := pdf.GetPageSize()
	return newCanvas(pdf, &fontSet{pdf: pdf}, pageH, x, y, w, h)
}

func newCanvas(pdf *fpdf.Fpdf, fs *fontSet, pageH, x, y float64, w, h vg.Length) *Canvas {
	c := &Canvas{pdf: pdf, fonts: fs, pageH: pageH, w: w, h: h}
	// Figure origin in PDF user space (y up from the page's bottom edge).
	c.st = canvasState{
		m:     affine{a: 1, d: 1, e: x, f: pageH - y - h.Points()},
		width: 1,
		color: color.Black,
	}
	return c
}

// Begin saves the PDF graphics state and clips to the canvas rectangle.
func (c *Canvas) Begin() {
	x0, y0 := c.st.m.apply(0, 0)
	c.pdf.ClipRect(x0, c.pageH-y0-c.h.Points(), c.w.Points(), c.h.Points(), false)
}

// End restores the graphics state saved by Begin.
func (c *Canvas) End() {
	c.pdf.ClipEnd()
	c.primed = false
}

// Size returns the canvas size.
func (c *Canvas) Size() (vg.Length, vg.Length) { return c.w, c.h }

// SetLineWidth implements vg.Canvas.
func (c *Canvas) SetLineWidth(w vg.Length) { c.st.width = w }

// SetLineDash implements vg.Canvas.
func (c *Canvas) SetLineDash(pattern []vg.Length, offset vg.Length) {
	c.st.dash = append([]vg.Length(nil), pattern...)
	c.st.offset = offset
}

// SetColor implements vg.Canvas; nil means black.
func (c *Canvas) SetColor(col color.Color) {
	if col == nil {
		col = color.Black
	}
	c.st.color = col
}

// Rotate implements vg.Canvas (radians, counter-clockwise).
func (c *Canvas) Rotate(rad float64) {
	s, co := math.Sincos(rad)
	c.st.m = c.st.m.then(affine{a: co, b: s, c: -s, d: co})
}

// Translate implements vg.Canvas.
func (c *Canvas) Translate(pt vg.Point) {
	c.st.m = c.st.m.then(affine{a: 1, d: 1, e: pt.X.Points(), f: pt.Y.Points()})
}

// Scale implements vg.Canvas.
func (c *Canvas) Scale(x, y float64) {
	c.st.m = c.st.m.then(affine{a: x, d: y})
}

// Push implements vg.Canvas.
func (c *Canvas) Push() {
	s := c.st
	s.dash = append([]vg.Length(nil), c.st.dash...)
	c.stack = append(c.stack, s)
}

// Pop implements vg.Canvas.
func (c *Canvas) Pop() {
	if len(c.stack) == 0 {
		return
	}
	c.st = c.stack[len(c.stack)-1]
	c.stack = c.stack[:len(c.stack)-1]
}

// toPage maps a canvas point to PDF user space (points, y up).
func (c *Canvas) toPage(p vg.Point) (float64, float64) {
	return c.st.m.apply(p.X.Points(), p.Y.Points())
}

// toFpdf maps a canvas point to fpdf's page coordinates (y down).
func (c *Canvas) toFpdf(p vg.Point) (float64, float64) {
	x, y := c.toPage(p)
	return x, c.pageH - y
}

func (c *Canvas) applyColor(stroke bool) {
	n := color.NRGBAModel.Convert(c.st.color).(color.NRGBA)
	rgb := [3]int{int(n.R), int(n.G), int(n.B)}
	alpha := float64(n.A) / 255
	if !c.primed || rgb != c.sentRGB {
		c.pdf.SetDrawColor(rgb[0], rgb[1], rgb[2])
		c.pdf.SetFillColor(rgb[0], rgb[1], rgb[2])
		c.pdf.SetTextColor(rgb[0], rgb[1], rgb[2])
		c.sentRGB = rgb
	}
	if !c.primed || alpha != c.sentAlpha {
		if c.primed || alpha != 1 {
			c.pdf.SetAlpha(math.Round(alpha*1000)/1000, "Normal")
		}
		c.sentAlpha = alpha
	}
	if stroke {
		s := c.st.m.scale()
		w := c.st.width.Points() * s
		if !c.primed || w != c.sentWidth {
			c.pdf.SetLineWidth(w)
			c.sentWidth = w
		}
		dash := make([]float64, len(c.st.dash))
		key := ""
		for i, d := range c.st.dash {
			dash[i] = d.Points() * s
			key += formatNum(dash[i]) + " "
		}
		key += "/" + formatNum(c.st.offset.Points()*s)
		if !c.primed || key != c.sentDash {
			c.pdf.SetDashPattern(dash, c.st.offset.Points()*s)
			c.sentDash = key
		}
	}
	c.primed = true
}

// Stroke implements vg.Canvas.
func (c *Canvas) Stroke(p vg.Path) {
	if c.st.width <= 0 || len(p) == 0 {
		return
	}
	c.applyColor(true)
	if c.path(p) {
		c.pdf.DrawPath("D")
	}
}

// Fill implements vg.Canvas.
func (c *Canvas) Fill(p vg.Path) {
	if len(p) == 0 {
		return
	}
	c.applyColor(false)
	if c.path(p) {
		c.pdf.DrawPath("F")
	}
}

// path emits the path's segments and reports whether anything was emitted.
func (c *Canvas) path(p vg.Path) bool {
	var (
		started bool
		cur     vg.Point
		start   vg.Point
	)
	for _, comp := range p {
		switch comp.Type {
		case vg.MoveComp:
			c.pdf.MoveTo(c.toFpdf(comp.Pos))
			cur, start, started = comp.Pos, comp.Pos, true
		case vg.LineComp:
			if !started {
				c.pdf.MoveTo(c.toFpdf(comp.Pos))
				start, started = comp.Pos, true
			} else {
				c.pdf.LineTo(c.toFpdf(comp.Pos))
			}
			cur = comp.Pos
		case vg.ArcComp:
			segs := arcToCubics(comp.Pos, comp.Radius, comp.Start, comp.Angle)
			p0 := arcPoint(comp.Pos, comp.Radius, comp.Start)
			if !started {
				c.pdf.MoveTo(c.toFpdf(p0))
				start, started = p0, true
			} else {
				c.pdf.LineTo(c.toFpdf(p0))
			}
			for _, s := range segs {
				x1, y1 := c.toFpdf(s[0])
				x2, y2 := c.toFpdf(s[1])
				x3, y3 := c.toFpdf(s[2])
				c.pdf.CurveBezierCubicTo(x1, y1, x2, y2, x3, y3)
			}
			cur = arcPoint(comp.Pos, comp.Radius, comp.Start+comp.Angle)
		case vg.CurveComp:
			if !started {
				c.pdf.MoveTo(c.toFpdf(cur))
				started = true
			}
			switch len(comp.Control) {
			case 1:
				// Raise the quadratic to a cubic.
				q := comp.Control[0]
				c1 := vg.Point{X: cur.X + 2*(q.X-cur.X)/3, Y: cur.Y + 2*(q.Y-cur.Y)/3}
				c2 := vg.Point{X: comp.Pos.X + 2*(q.X-comp.Pos.X)/3, Y: comp.Pos.Y + 2*(q.Y-comp.Pos.Y)/3}
				x1, y1 := c.toFpdf(c1)
				x2, y2 := c.toFpdf(c2)
				x3, y3 := c.toFpdf(comp.Pos)
				c.pdf.CurveBezierCubicTo(x1, y1, x2, y2, x3, y3)
			case 2:
				x1, y1 := c.toFpdf(comp.Control[0])
				x2, y2 := c.toFpdf(comp.Control[1])
				x3, y3 := c.toFpdf(comp.Pos)
				c.pdf.CurveBezierCubicTo(x1, y1, x2, y2, x3, y3)
			default:
				c.pdf.LineTo(c.toFpdf(comp.Pos))
			}
			cur = comp.Pos
		case vg.CloseComp:
			if started {
				c.pdf.ClosePath()
				cur = start
			}
		}
	}
	return started
}

func arcPoint(center vg.Point, r vg.Length, angle float64) vg.Point {
	s, co := math.Sincos(angle)
	return vg.Point{X: center.X + r*vg.Length(co), Y: center.Y + r*vg.Length(s)}
}

// arcToCubics approximates a circular arc by cubic Béziers of at most a
// quarter turn each; each element is {control 1, control 2, end}.
func arcToCubics(center vg.Point, r vg.Length, start, sweep float64) [][3]vg.Point {
	if sweep == 0 || r == 0 {
		return nil
	}
	n := int(math.Ceil(math.Abs(sweep) / (math.Pi / 2)))
	step := sweep / float64(n)
	k := 4.0 / 3.0 * math.Tan(step/4)
	out := make([][3]vg.Point, 0, n)
	a0 := start
	for i := 0; i < n; i++ {
		a1 := a0 + step
		s0, c0 := math.Sincos(a0)
		s1, c1 := math.Sincos(a1)
		rr := r.Points()
		p0x, p0y := center.X.Points()+rr*c0, center.Y.Points()+rr*s0
		p3x, p3y := center.X.Points()+rr*c1, center.Y.Points()+rr*s1
		out = append(out, [3]vg.Point{
			{X: vg.Length(p0x - k*rr*s0), Y: vg.Length(p0y + k*rr*c0)},
			{X: vg.Length(p3x + k*rr*s1), Y: vg.Length(p3y - k*rr*c1)},
			{X: vg.Length(p3x), Y: vg.Length(p3y)},
		})
		a0 = a1
	}
	return out
}

// FillString implements vg.Canvas: pt is the left end of the baseline.
// A face parsed by package fonts is set in exactly that font; any other
// typeface is set in the embedded family with the weight, slant and
// mono/serif variant of its descriptor, so plots built with
// fonts.Collection measure exactly what is drawn.
func (c *Canvas) FillString(f font.Face, pt vg.Point, s string) {
	if f.Font.Size == 0 || s == "" {
		return
	}
	fam, sty, ok := fonts.ForOpentype(f.Face)
	if !ok {
		fam, sty = fonts.ForFace(f.Font)
	}
	c.applyColor(false)
	c.fonts.use(fam, sty, f.Font.Size.Points())
	m := c.st.m.then(affine{a: 1, d: 1, e: pt.X.Points(), f: pt.Y.Points()})
	c.pdf.TransformBegin()
	c.pdf.Transform(fpdf.TransformMatrix{A: m.a, B: m.b, C: m.c, D: m.d, E: m.e, F: m.f})
	c.pdf.Text(0, c.pageH, bmp(s))
	c.pdf.TransformEnd()
}

// imageEncoder is the PNG encoder of DrawImage. The PDF carries the PNG's
// compressed data as it is (an opaque image's IDAT stream becomes the image
// XObject), so its level sets both the encoding time and the memo's size.
// Measured on the eight examples' |B| map rasters (BenchmarkMapImagePNG in
// package memo, docs/performance.md): zlib's fastest level encodes them in
// about a third of the default level's time, at 413 kB against 264 kB for
// the eight; the best level saves only 8 % more than the default at four
// times its cost. A map raster is one of a memo's few large objects, so
// speed wins: BestSpeed.
var imageEncoder = png.Encoder{CompressionLevel: png.BestSpeed}

// DrawImage implements vg.Canvas. The image is embedded as a PNG under a
// name derived from its content, so equal images are stored once and the
// output does not depend on drawing order.
func (c *Canvas) DrawImage(rect vg.Rectangle, img image.Image) {
	enc, err := encodeImage(img)
	c.placeImage(rect, enc, err)
}

// encodedImage is an image PNG-encoded for the PDF, with its name.
type encodedImage struct {
	name string
	png  []byte
}

// encodeImage encodes img as DrawImage embeds it.
func encodeImage(img image.Image) (encodedImage, error) {
	b, err := encodePNG(img)
	if err != nil {
		return encodedImage{}, err
	}
	sum := sha256.Sum256(b)
	return encodedImage{name: "img" + hex.EncodeToString(sum[:12]), png: b}, nil
}

// placeImage draws an encoded image (or records the encoding's error).
func (c *Canvas) placeImage(rect vg.Rectangle, im encodedImage, err error) {
	if err != nil {
		c.pdf.SetError(err)
		return
	}
	opt := fpdf.ImageOptions{ImageType: "PNG"}
	if c.pdf.GetImageInfo(im.name) == nil {
		c.pdf.RegisterImageOptionsReader(im.name, opt, bytes.NewReader(im.png))
	}
	sz := rect.Size()
	m := c.st.m.then(affine{a: sz.X.Points(), d: sz.Y.Points(), e: rect.Min.X.Points(), f: rect.Min.Y.Points()})
	c.pdf.TransformBegin()
	c.pdf.Transform(fpdf.TransformMatrix{A: m.a, B: m.b, C: m.c, D: m.d, E: m.e, F: m.f})
	c.pdf.ImageOptions(im.name, 0, c.pageH-1, 1, 1, false, opt, 0, "")
	c.pdf.TransformEnd()
}

func vgLen(v float64) vg.Length { return vg.Length(v) }
