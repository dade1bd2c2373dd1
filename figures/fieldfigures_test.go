package figures

import (
	"fmt"
	"image"
	"image/color"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/recorder"
)

func TestViridisTable(t *testing.T) {
	// Ends and middle of the published table (entries 0, 128 and 255:
	// #440154, #21918c, #fde725 as the map's authors list them — recalled).
	for _, c := range []struct {
		t    float64
		want color.NRGBA
	}{
		{0, color.NRGBA{0x44, 0x01, 0x54, 0xff}},
		{128.0 / 255, color.NRGBA{0x21, 0x91, 0x8c, 0xff}},
		{1, color.NRGBA{0xfd, 0xe7, 0x25, 0xff}},
		{-3, color.NRGBA{0x44, 0x01, 0x54, 0xff}},
		{math.NaN(), color.NRGBA{0x44, 0x01, 0x54, 0xff}},
		{7, color.NRGBA{0xfd, 0xe7, 0x25, 0xff}},
	} {
		if got := Viridis(c.t); got != c.want {
			t.Errorf("Viridis(%g) = %v, want %v", c.t, got, c.want)
		}
	}
	// The map's design property: lightness rises monotonically. Relative
	// luminance (ITU-R BT.709 weights on linearised sRGB) of every entry
	// exceeds that of the one before.
	lin := func(c float64) float64 {
		if c <= 0.04045 {
			return c / 12.92
		}
		return math.Pow((c+0.055)/1.055, 2.4)
	}
	prev := -1.0
	for i, e := range viridis {
		y := 0.2126*lin(e[0]) + 0.7152*lin(e[1]) + 0.0722*lin(e[2])
		if y <= prev {
			t.Fatalf("luminance falls at entry %d", i)
		}
		prev = y
	}
}

func TestContourCircle(t *testing.T) {
	// f = 1/r on a grid: the contour at level 1/r0 is the circle of
	// radius r0, to within the linear interpolation of log f along a cell
	// edge (second order in the cell size h: below h²/r0 here).
	n := 81
	x := make([]float64, n)
	for i := range x {
		x[i] = -2 + 4*float64(i)/float64(n-1)
	}
	v := make([]float64, n*n)
	for iy, y := range x {
		for ix, xx := range x {
			v[iy*n+ix] = 1 / math.Hypot(xx, y)
		}
	}
	h := x[1] - x[0]
	for _, r0 := range []float64{0.5, 1, 1.7} {
		lines := Contour(x, x, v, 1/r0, nil)
		if len(lines) != 1 {
			t.Fatalf("r0 = %g: %d polylines, want one closed ring", r0, len(lines))
		}
		l := lines[0]
		if l[0] != l[len(l)-1] {
			t.Errorf("r0 = %g: ring not closed", r0)
		}
		for _, p := range l {
			if d := math.Abs(math.Hypot(p[0], p[1]) - r0); d > h*h/r0 {
				t.Fatalf("r0 = %g: point %v off the circle by %g", r0, p, d)
			}
		}
	}
	// A section masks its cells: the contour through it is cut open.
	lines := Contour(x, x, v, 1, []Section{{X0: 0.8, X1: 1.2, Y0: -0.2, Y1: 0.2}})
	if len(lines) != 1 || lines[0][0] == lines[0][len(lines[0])-1] {
		t.Errorf("masked contour: %d lines", len(lines))
	}
}

func sampleMap() MapData {
	n := 41
	d := MapData{XLabel: "Axial position z", YLabel: "Radial position ρ", Decades: 2}
	for i := range n {
		d.X = append(d.X, -0.05+0.1*float64(i)/float64(n-1))
		d.Y = append(d.Y, -0.04+0.08*float64(i)/float64(n-1))
	}
	for _, y := range d.Y {
		for _, x := range d.X {
			d.B = append(d.B, 1e-3/(1+(x*x+y*y)/4e-4))
		}
	}
	d.Sections = []Section{{X0: -0.004, X1: 0.004, Y0: 0.02, Y1: 0.028}, {X0: -0.004, X1: 0.004, Y0: -0.028, Y1: -0.02, Round: true}}
	return d
}

func TestMapScale(t *testing.T) {
	d := sampleMap()
	s := d.Scale()
	// The top is the largest value outside the sections (the centre),
	// the bottom two decades below it or the smallest value if higher.
	if math.Abs(s.Hi-1e-3) > 1e-12 {
		t.Errorf("top %g", s.Hi)
	}
	lo := math.Inf(1)
	for _, v := range d.B {
		lo = math.Min(lo, v)
	}
	if math.Abs(s.Lo-lo) > 1e-15 {
		t.Errorf("bottom %g, want %g", s.Lo, lo)
	}
	for _, l := range s.Levels {
		m := l / math.Pow(10, math.Floor(math.Log10(l)+1e-9))
		if l <= s.Lo || l >= s.Hi || (math.Abs(m-1) > 1e-9 && math.Abs(m-2) > 1e-9 && math.Abs(m-5) > 1e-9) {
			t.Errorf("level %g", l)
		}
	}
}

func TestFieldMapDraws(t *testing.T) {
	var c recorder.Canvas
	FieldMap(sampleMap())(&c, 400, 260)
	var texts []string
	images := 0
	var mapImg image.Image
	for _, a := range c.Actions {
		switch a := a.(type) {
		case *recorder.FillString:
			texts = append(texts, a.String)
		case *recorder.DrawImage:
			images++
			if a.Image.Bounds().Dx() > 1 {
				mapImg = a.Image
				// Equal scales: the image's aspect is the data's (0.1 by 0.08).
				sz := a.Rectangle.Size()
				if r := float64(sz.X/sz.Y) / (0.1 / 0.08); math.Abs(r-1) > 0.01 {
					t.Errorf("map aspect off by %g", r)
				}
			}
		}
	}
	all := strings.Join(texts, "|")
	for _, want := range []string{"Axial position z (mm)", "Radial position ρ (mm)", "|B|", "500 µT", "100 µT", "|40|"} {
		if !strings.Contains(all, want) {
			t.Errorf("map text lacks %q: %s", want, all)
		}
	}
	if images != 2 || mapImg == nil {
		t.Fatalf("%d images (map and colour bar expected)", images)
	}
	// The centre pixel carries the top colour; a pixel inside a section is
	// blank.
	b := mapImg.Bounds()
	if got := color.NRGBAModel.Convert(mapImg.At(b.Dx()/2, b.Dy()/2)); got != Viridis(1) {
		t.Errorf("centre colour %v", got)
	}
	if got := color.NRGBAModel.Convert(mapImg.At(b.Dx()/2, b.Dy()*1/5)); got != (color.NRGBA{0xff, 0xff, 0xff, 0xff}) {
		t.Errorf("section colour %v", got)
	}
}

func TestCrossSectionLabels(t *testing.T) {
	d := SketchData{
		Sections: []Section{{X0: -0.04, X1: -0.03, Y0: 0.045, Y1: 0.055}, {X0: 0.03, X1: 0.04, Y0: 0.045, Y1: 0.055}},
		Dimensions: []Dimension{
			{Kind: Diameter, A: 0.045, Label: "Ø 90 mm inner"},
			{Kind: Diameter, A: 0.05, Label: "Ø 100 mm mean"},
			{Kind: Axial, A: 0.03, B: 0.04, Label: "10 mm"},
			{Kind: Radial, A: 0.045, B: 0.055, Label: "10 mm build"},
			{Kind: Axial, A: -0.035, B: 0.035, Label: "spacing 70 mm"},
		},
		CentreLines: []float64{-0.035, 0.035},
		Notes:       []Note{{X: 0.04, Y: 0.05, Text: "20 turns"}},
	}
	var c recorder.Canvas
	CrossSection(d)(&c, 460, 200)
	var texts []string
	fills := 0
	rotated := 0 // depth of pushed states that rotate
	var stack []bool
	for _, a := range c.Actions {
		switch a := a.(type) {
		case *recorder.Push:
			stack = append(stack, false)
		case *recorder.Pop:
			if stack[len(stack)-1] {
				rotated--
			}
			stack = stack[:len(stack)-1]
		case *recorder.Rotate:
			if len(stack) > 0 && !stack[len(stack)-1] {
				stack[len(stack)-1] = true
				rotated++
			}
		case *recorder.FillString:
			texts = append(texts, a.String)
			// Every level label inside the canvas (rotated ones are set
			// in their own frame).
			if rotated == 0 && (a.Point.X < 0 || a.Point.X > 460 || a.Point.Y < 0 || a.Point.Y > 200) {
				t.Errorf("label %q at %v outside the figure", a.String, a.Point)
			}
		case *recorder.Fill:
			fills++
		}
	}
	all := strings.Join(texts, "|")
	for _, dm := range d.Dimensions {
		if !strings.Contains(all, dm.Label) {
			t.Errorf("sketch lacks %q: %s", dm.Label, all)
		}
	}
	for _, want := range []string{"axis", "20 turns"} {
		if !strings.Contains(all, want) {
			t.Errorf("sketch lacks %q", want)
		}
	}
	// Two sections and an arrowhead per dimension end (diameters have one).
	if want := 2 + 2 + 3*2; fills != want {
		t.Errorf("%d filled shapes, want %d", fills, want)
	}
	var r recorder.Canvas
	RectangleSketch(RectangleData{Width: 0.4, Height: 0.25, Bundle: 0.007, WidthLabel: "400 mm", HeightLabel: "250 mm", Note: "40 turns"})(&r, 460, 200)
	texts = texts[:0]
	for _, a := range r.Actions {
		if fs, ok := a.(*recorder.FillString); ok {
			texts = append(texts, fs.String)
		}
	}
	if all := strings.Join(texts, "|"); !strings.Contains(all, "400 mm") || !strings.Contains(all, "250 mm") || !strings.Contains(all, "40 turns") {
		t.Errorf("rectangle sketch text %s", all)
	}
}

func TestDeviationPlot(t *testing.T) {
	var d DeviationData
	for i := 0; i <= 40; i++ {
		x := 0.05 * float64(i) / 40
		d.Pos = append(d.Pos, x)
		d.Axial = append(d.Axial, -1.15*math.Pow(x/0.1, 4))
		d.Radial = append(d.Radial, -0.43*math.Pow(x/0.1, 4))
	}
	d.Bands = []float64{0.01, 0.001}
	var c recorder.Canvas
	DeviationPlot(d)(&c, 400, 220)
	var texts []string
	for _, a := range c.Actions {
		if fs, ok := a.(*recorder.FillString); ok {
			texts = append(texts, fs.String)
		}
	}
	all := strings.Join(texts, "|")
	for _, want := range []string{"B/B(0) − 1 (%)", "Distance from the centre (mm)", "Along the axis", "Radially, mid-plane", "|1|", "|-1|", "|0|"} {
		if !strings.Contains(all, want) {
			t.Errorf("deviation plot lacks %q: %s", want, all)
		}
	}
}

// No dimension text of a sketch is struck through by a line: a pair's
// winding-length label centred on a mid-plane moves beside its
// dimension; a multilayer coil's labels stay clear too.
func TestCrossSectionLabelsClear(t *testing.T) {
	pair := SketchData{
		Sections: []Section{{X0: -0.04, X1: -0.03, Y0: 0.045, Y1: 0.055}, {X0: 0.03, X1: 0.04, Y0: 0.045, Y1: 0.055}},
		Dimensions: []Dimension{
			{Kind: Axial, A: -0.04, B: -0.03, Label: "10 mm"},
			{Kind: Axial, A: -0.035, B: 0.035, Label: "spacing 70 mm"},
		},
		CentreLines: []float64{-0.035, 0.035},
	}
	thick := SketchData{
		Sections: []Section{{X0: -0.0125, X1: 0.0125, Y0: 0.0065, Y1: 0.01475}},
		Dimensions: []Dimension{
			{Kind: Diameter, A: 0.0065, Label: "Ø 13 mm inner"},
			{Kind: Diameter, A: 0.0106, Label: "Ø 21.25 mm mean"},
			{Kind: Diameter, A: 0.01475, Label: "Ø 29.5 mm outer"},
			{Kind: Axial, A: -0.0125, B: 0.0125, Label: "25 mm"},
			{Kind: Radial, A: 0.0065, B: 0.01475, Label: "8.25 mm"},
		},
	}
	thinPair := SketchData{
		Sections: []Section{{X0: -0.076, X1: -0.074, Y0: 0.099, Y1: 0.101, Round: true}, {X0: 0.074, X1: 0.076, Y0: 0.099, Y1: 0.101, Round: true}},
		Dimensions: []Dimension{
			{Kind: Diameter, A: 0.1, Label: "Ø 200 mm mean"},
			{Kind: Axial, A: -0.075, B: 0.075, Label: "spacing 150 mm"},
		},
		CentreLines: []float64{-0.075, 0.075},
		Notes:       []Note{{X: 0.076, Y: 0.101, Text: "30 turns, bundle ≈ Ø 2 mm"}},
	}
	for name, d := range map[string]SketchData{"pair": pair, "thick": thick, "thin pair": thinPair} {
		for _, n := range sketchCrossings(d, 460, 200) {
			t.Errorf("%s: %s", name, n)
		}
	}
}

// sketchCrossings draws a sketch and lists every label (set upright)
// that a straight line of the drawing strikes through.
func sketchCrossings(d SketchData, w, h vg.Length) []string {
	var c recorder.Canvas
	CrossSection(d)(&c, w, h)
	type seg struct{ a, b vg.Point }
	var segs []seg
	type box struct {
		text           string
		x0, x1, y0, y1 vg.Length
	}
	var boxes []box
	lab := style(TickSize, Ink)
	type state struct {
		off     vg.Point
		rotated bool
	}
	var stack []state
	cur := state{}
	for _, a := range c.Actions {
		switch a := a.(type) {
		case *recorder.Push:
			stack = append(stack, cur)
		case *recorder.Pop:
			cur, stack = stack[len(stack)-1], stack[:len(stack)-1]
		case *recorder.Translate:
			cur.off = vg.Point{X: cur.off.X + a.Point.X, Y: cur.off.Y + a.Point.Y}
		case *recorder.Rotate:
			cur.rotated = cur.rotated || a.Angle != 0
		case *recorder.Stroke:
			var prev vg.Point
			for i, pc := range a.Path {
				if i > 0 && pc.Type == vg.LineComp {
					segs = append(segs, seg{prev, pc.Pos})
				}
				prev = pc.Pos
			}
		case *recorder.FillString:
			if cur.rotated {
				continue
			}
			p := vg.Point{X: cur.off.X + a.Point.X, Y: cur.off.Y + a.Point.Y}
			e := lab.FontExtents()
			boxes = append(boxes, box{a.String, p.X, p.X + lab.Width(a.String), p.Y - e.Descent, p.Y + e.Ascent})
		}
	}
	var out []string
	for _, b := range boxes {
		for _, s := range segs {
			// A vertical or horizontal line through the box's inside.
			switch {
			case math.Abs(float64(s.a.X-s.b.X)) < 0.01:
				x, y0, y1 := s.a.X, min(s.a.Y, s.b.Y), max(s.a.Y, s.b.Y)
				if x > b.x0+0.5 && x < b.x1-0.5 && y1 > b.y0+0.5 && y0 < b.y1-0.5 {
					out = append(out, fmt.Sprintf("label %q struck by the vertical line at x = %.1f pt", b.text, x))
				}
			case math.Abs(float64(s.a.Y-s.b.Y)) < 0.01:
				y, x0, x1 := s.a.Y, min(s.a.X, s.b.X), max(s.a.X, s.b.X)
				if y > b.y0+1 && y < b.y1-1 && x1 > b.x0+0.5 && x0 < b.x1-0.5 {
					out = append(out, fmt.Sprintf("label %q struck by the horizontal line at y = %.1f pt", b.text, y))
				}
			}
		}
	}
	return out
}

// TestViridisInterpolation: on a dense grid of t, Viridis is the linear
// interpolation of the table rounded to nearest, as the defining formula
// 255·(a + f(b − a)) with math.Round gives it.
func TestViridisInterpolation(t *testing.T) {
	for k := 0; k <= 200000; k++ {
		tt := float64(k) / 200000
		x := tt * 255
		i := min(int(math.Floor(x)), 254)
		f := x - float64(i)
		var want [3]uint8
		for c := range 3 {
			v := viridis[i][c] + f*(viridis[i+1][c]-viridis[i][c])
			want[c] = uint8(math.Round(255 * math.Max(0, math.Min(1, v))))
		}
		if got := Viridis(tt); [3]uint8{got.R, got.G, got.B} != want {
			t.Fatalf("Viridis(%g) = %v, want %v", tt, got, want)
		}
	}
}
