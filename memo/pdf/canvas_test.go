package pdf

import (
	"bytes"
	"fmt"
	"image"
	"image/color"
	"math"
	"strings"
	"testing"

	"github.com/go-pdf/fpdf"
	"gonum.org/v1/plot/vg"

	"coilmemo/fonts"
)

func newTestPDF() *fpdf.Fpdf {
	p := fpdf.New("P", "pt", "A4", "")
	p.SetCompression(false)
	p.AddPage()
	return p
}

func near(a, b float64) bool { return math.Abs(a-b) < 1e-9 }

func TestCanvasTransform(t *testing.T) {
	p := newTestPDF()
	_, ph := p.GetPageSize()
	// A 200×100 figure whose top-left corner is 50 pt from the left edge
	// and 300 pt from the top edge: its origin (bottom left) lies at
	// x = 50, y = ph − 400 in PDF user space.
	c := NewCanvas(p, 50, 300, 200, 100)
	check := func(name string, pt vg.Point, wx, wy float64) {
		t.Helper()
		x, y := c.toPage(pt)
		if !near(x, wx) || !near(y, wy) {
			t.Errorf("%s: (%g, %g) ↦ (%g, %g), want (%g, %g)", name, pt.X, pt.Y, x, y, wx, wy)
		}
	}
	check("origin", vg.Point{}, 50, ph-400)
	check("top right", vg.Point{X: 200, Y: 100}, 250, ph-300)
	fx, fy := c.toFpdf(vg.Point{X: 0, Y: 100})
	if !near(fx, 50) || !near(fy, 300) {
		t.Errorf("top-left corner in fpdf coordinates: (%g, %g), want (50, 300)", fx, fy)
	}

	c.Push()
	c.Translate(vg.Point{X: 10, Y: 20})
	check("translated", vg.Point{X: 1, Y: 2}, 61, ph-400+22)
	c.Rotate(math.Pi / 2) // about the translated origin, counter-clockwise
	check("rotated x axis", vg.Point{X: 5}, 60, ph-400+25)
	check("rotated y axis", vg.Point{Y: 5}, 55, ph-400+20)
	c.Scale(2, 3)
	check("scaled", vg.Point{X: 1, Y: 1}, 60-3, ph-400+20+2)
	if s := c.st.m.scale(); !near(s, math.Sqrt(6)) {
		t.Errorf("length scale %g, want √6", s)
	}
	c.Push()
	c.Translate(vg.Point{X: 1})
	c.Pop()
	check("after inner pop", vg.Point{X: 1, Y: 1}, 57, ph-400+22)
	c.Pop()
	check("after outer pop", vg.Point{X: 1, Y: 2}, 51, ph-400+2)
	c.Pop() // unbalanced: ignored
	check("extra pop", vg.Point{}, 50, ph-400)
}

func TestAffineThen(t *testing.T) {
	tr := affine{a: 1, d: 1, e: 3, f: 4}
	rot := affine{a: 0, b: 1, c: -1, d: 0}
	m := tr.then(rot) // rotate first, then translate
	x, y := m.apply(1, 0)
	if !near(x, 3) || !near(y, 5) {
		t.Errorf("translate∘rotate (1,0) = (%g,%g), want (3,5)", x, y)
	}
	m = rot.then(tr)
	x, y = m.apply(1, 0)
	if !near(x, -4) || !near(y, 4) {
		t.Errorf("rotate∘translate (1,0) = (%g,%g), want (-4,4)", x, y)
	}
}

func TestArcToCubics(t *testing.T) {
	center := vg.Point{X: 10, Y: -5}
	for _, sweep := range []float64{math.Pi / 3, math.Pi, -3 * math.Pi / 2, 2 * math.Pi} {
		segs := arcToCubics(center, 7, 0.3, sweep)
		if want := int(math.Ceil(math.Abs(sweep) / (math.Pi / 2))); len(segs) != want {
			t.Errorf("sweep %g: %d segments, want %d", sweep, len(segs), want)
		}
		p0 := arcPoint(center, 7, 0.3)
		for _, s := range segs {
			// Points on the Bézier stay within 0.03 % of the radius.
			for _, u := range []float64{0.25, 0.5, 0.75} {
				v := 1 - u
				bx := v*v*v*float64(p0.X) + 3*v*v*u*float64(s[0].X) + 3*v*u*u*float64(s[1].X) + u*u*u*float64(s[2].X)
				by := v*v*v*float64(p0.Y) + 3*v*v*u*float64(s[0].Y) + 3*v*u*u*float64(s[1].Y) + u*u*u*float64(s[2].Y)
				r := math.Hypot(bx-10, by+5)
				if math.Abs(r-7)/7 > 3e-4 {
					t.Errorf("sweep %g: radius %g at u=%g", sweep, r, u)
				}
			}
			p0 = s[2]
		}
		end := arcPoint(center, 7, 0.3+sweep)
		if math.Hypot(float64(p0.X-end.X), float64(p0.Y-end.Y)) > 1e-9 {
			t.Errorf("sweep %g: ends at %v, want %v", sweep, p0, end)
		}
	}
}

// The canvas writes ordinary path operators in page coordinates.
func TestCanvasOutput(t *testing.T) {
	p := newTestPDF()
	_, ph := p.GetPageSize()
	c := NewCanvas(p, 100, 100, 50, 50)
	c.Begin()
	c.SetColor(color.RGBA{R: 255, A: 255})
	c.SetLineWidth(2)
	c.SetLineDash([]vg.Length{3, 1}, 0)
	var path vg.Path
	path.Move(vg.Point{X: 0, Y: 0})
	path.Line(vg.Point{X: 50, Y: 50})
	path.Arc(vg.Point{X: 25, Y: 25}, 10, 0, math.Pi)
	path.Close()
	c.Stroke(path)
	c.Fill(path)
	face := fonts.Cache().Lookup(fonts.Face(fonts.Sans, false, false, 10), 10)
	c.Rotate(math.Pi / 2)
	c.FillString(face, vg.Point{X: 5, Y: 0}, "µΩ°")
	img := image.NewGray(image.Rect(0, 0, 2, 2))
	c.DrawImage(vg.Rectangle{Max: vg.Point{X: 10, Y: 10}}, img)
	c.DrawImage(vg.Rectangle{Max: vg.Point{X: 20, Y: 20}}, img)
	c.End()
	var buf bytes.Buffer
	if err := p.Output(&buf); err != nil {
		t.Fatal(err)
	}
	out := buf.String()
	for _, want := range []string{
		"1.000 0.000 0.000 RG",
		"2.00 w",
		"[3.00 1.00] 0.00 d",
		// move to the figure origin, line to its top-right corner
		formatPt(100, ph-150) + " m",
		formatPt(150, ph-100) + " l",
		" c\n", // the arc as Béziers
		"cm",   // text and image placement
		"/I",   // the image XObject
	} {
		if !strings.Contains(out, want) {
			t.Errorf("content lacks %q", want)
		}
	}
	// Two draws of one image share one XObject.
	if n := strings.Count(out, "/Subtype /Image"); n != 1 {
		t.Errorf("%d image objects, want 1", n)
	}
}

// formatPt formats a point as fpdf's path operators do.
func formatPt(x, y float64) string { return fmt.Sprintf("%.2f %.2f", x, y) }
