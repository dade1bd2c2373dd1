package figures

import (
	"image/color"
	"math"
	"sort"

	"coilmemo/format"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// DimKind says what a dimension of a sketch measures.
type DimKind int

const (
	// Diameter: from the axis to radius A; drawn as a half-section
	// diameter dimension (one arrowhead, the line carried across the axis).
	Diameter DimKind = iota
	// Axial: between axial positions A and B, drawn above the windings.
	Axial
	// Radial: between radii A and B, drawn to the right of the windings.
	Radial
)

// Dimension is one dimension line of a sketch. A and B are in metres in
// the sketch's coordinates; Label is printed as given.
type Dimension struct {
	Kind  DimKind
	A, B  float64
	Label string
}

// LengthLabel writes a length (m) for a dimension label of a sketch, in
// millimetres to three significant figures ("25.0 mm", "8.25 mm",
// "0.950 mm"), and to 0.1 mm from 100 mm up ("304.5 mm"), where three
// figures would hide a build of a few millimetres between two diameters:
// every dimension of the cross-section and of the plan read alike,
// whatever the spec wrote.
func LengthLabel(v float64) string {
	if math.Abs(v) >= 0.1 {
		return format.Sig(v*1e3, 4) + " mm"
	}
	return format.Sig(v*1e3, 3) + " mm"
}

// Note is a short text with a leader to a point (m) of the sketch.
type Note struct {
	X, Y float64
	Text string
}

// SketchData describes a winding cross-section in the meridian half-plane:
// horizontal the axial position z, vertical the radius ρ ≥ 0, the axis
// along the bottom. Sections are the winding cross-sections (Section.X
// axial, Section.Y radial).
type SketchData struct {
	Sections   []Section
	Dimensions []Dimension
	Notes      []Note
	// CentreLines are axial positions (m) of coil mid-planes, drawn as
	// chain lines through their sections.
	CentreLines []float64
}

// Sketch style.
var (
	dimInk   = Ink
	dimWidth = vg.Points(0.45)
	chain    = []vg.Length{vg.Points(7), vg.Points(2), vg.Points(1.2), vg.Points(2)}
	arrowLen = vg.Points(5)
	arrowW   = vg.Points(1.6)
	dimGap   = vg.Points(13) // distance between stacked dimension lines
)

// CrossSection draws a dimensioned sketch of the winding(s) to scale: the
// sections in copper, the axis as a chain line, mid-planes as chain lines,
// diameters stacked to the left of the windings, axial dimensions stacked
// above them and radial ones to their right, each with extension lines,
// arrowheads and its label.
func CrossSection(d SketchData) DrawFunc {
	return func(c vg.Canvas, w, h vg.Length) { drawCrossSection(c, w, h, d) }
}

func drawCrossSection(c vg.Canvas, w, h vg.Length, d SketchData) {
	if len(d.Sections) == 0 {
		return
	}
	lab := style(TickSize, Ink)
	// Data extent.
	z0, z1 := math.Inf(1), math.Inf(-1)
	r1 := 0.0
	for _, s := range d.Sections {
		z0 = math.Min(z0, math.Min(s.X0, s.X1))
		z1 = math.Max(z1, math.Max(s.X0, s.X1))
		r1 = math.Max(r1, math.Max(s.Y0, s.Y1))
	}
	var nDia, nAx, nRad int
	var radLabel vg.Length
	for _, dm := range d.Dimensions {
		switch dm.Kind {
		case Diameter:
			nDia++
		case Axial:
			nAx++
		case Radial:
			nRad++
			radLabel = max(radLabel, lab.Width(dm.Label))
		}
	}
	// Margins in points around the data box.
	left := vg.Length(nDia)*dimGap + vg.Points(18)
	right := vg.Length(nRad)*dimGap + radLabel + vg.Points(12)
	top := vg.Length(nAx)*dimGap + vg.Points(8)
	bottom := vg.Points(14)
	for _, n := range d.Notes {
		right = max(right, lab.Width(n.Text)+vg.Points(24))
	}
	zs := z1 - z0
	if zs <= 0 {
		zs = r1
	}
	// A very short winding is drawn no wider than its radius allows: keep
	// at least 0.6 of the radius across so the sketch is not a sliver.
	zs = math.Max(zs, r1*0.6)
	scale := func(left vg.Length) float64 {
		return math.Min(float64(w-left-right)/zs, float64(h-top-bottom)/r1) // points per metre
	}
	k := scale(left)
	// Diameter labels are set along their lines; where a line is too short
	// for its label they are set level, left of the lines, with leaders.
	level := false
	var levelW vg.Length
	for _, dm := range d.Dimensions {
		if dm.Kind == Diameter {
			levelW = max(levelW, lab.Width(dm.Label))
			if lab.Width(dm.Label)+vg.Points(8) > vg.Length(k*dm.A) {
				level = true
			}
		}
	}
	if level {
		left += levelW + vg.Points(6)
		k = scale(left)
	}
	if !(k > 0) || math.IsInf(k, 0) {
		return
	}
	aw := w - left - right
	ah := h - top - bottom
	// Centre the drawing in the free width and height.
	used := vg.Length(k * (z1 - z0))
	x0 := left + (aw-used)/2
	bottom += (ah - vg.Length(k*r1)) / 2
	X := func(z float64) vg.Length { return x0 + vg.Length(k*(z-z0)) }
	Y := func(r float64) vg.Length { return bottom + vg.Length(k*r) }
	dc := draw.Canvas{Canvas: c, Rectangle: vg.Rectangle{Max: vg.Point{X: w, Y: h}}}

	// Axis and mid-planes.
	axis := draw.LineStyle{Color: Muted, Width: vg.Points(0.5), Dashes: chain}
	mid := (X(z0) + X(z1)) / 2
	ax0 := min(x0-vg.Length(nDia)*dimGap-vg.Points(8), mid-vg.Length(k*zs/2))
	ax1 := min(max(X(z1)+vg.Length(nRad)*dimGap+vg.Points(16), mid+vg.Length(k*zs/2)), w-vg.Points(1))
	dc.StrokeLine2(axis, ax0, Y(0), ax1, Y(0))
	al := style(TickSize, Muted)
	al.XAlign = draw.XRight
	al.YAlign = draw.YTop
	dc.FillText(al, vg.Point{X: ax1, Y: Y(0) - vg.Points(2)}, "axis")
	for _, zc := range d.CentreLines {
		dc.StrokeLine2(axis, X(zc), Y(0)-vg.Points(4), X(zc), Y(r1)+vg.Points(6))
	}
	for _, s := range d.Sections {
		drawSection(c, X(s.X0), Y(s.Y0), X(s.X1), Y(s.Y1), s)
	}

	ls := draw.LineStyle{Color: dimInk, Width: dimWidth}
	ext := draw.LineStyle{Color: dimInk, Width: vg.Points(0.3)}
	iDia, iAx, iRad := 0, 0, 0
	type levelLabel struct {
		tip  vg.Point
		y    vg.Length
		text string
	}
	var levelLabels []levelLabel
	topOf := func(za, zb float64) float64 {
		// Highest section edge over the axial span (for extension lines).
		t := 0.0
		for _, s := range d.Sections {
			if math.Max(s.X0, s.X1) >= math.Min(za, zb)-1e-12 && math.Min(s.X0, s.X1) <= math.Max(za, zb)+1e-12 {
				t = math.Max(t, math.Max(s.Y0, s.Y1))
			}
		}
		return t
	}
	leftAt := func(r float64) float64 {
		// Leftmost section edge at or around radius r.
		z := math.Inf(1)
		for _, s := range d.Sections {
			if r >= math.Min(s.Y0, s.Y1)-1e-12 && r <= math.Max(s.Y0, s.Y1)+1e-12 {
				z = math.Min(z, math.Min(s.X0, s.X1))
			}
		}
		if math.IsInf(z, 1) {
			z = z0
		}
		return z
	}
	// The vertical lines above the sections — mid-planes and the axial
	// dimensions' extension lines — which no axial label may cross.
	type vline struct{ x, y0, y1 vg.Length }
	var vlines []vline
	for _, zc := range d.CentreLines {
		vlines = append(vlines, vline{X(zc), Y(0) - vg.Points(4), Y(r1) + vg.Points(6)})
	}
	{
		k := 0
		for _, dm := range d.Dimensions {
			if dm.Kind != Axial {
				continue
			}
			k++
			ya := Y(topOf(dm.A, dm.B)) + vg.Points(1.5)
			y := Y(r1) + vg.Length(k)*dimGap - vg.Points(3) + vg.Points(2)
			vlines = append(vlines, vline{X(dm.A), ya, y}, vline{X(dm.B), ya, y})
		}
	}
	// clear reports whether a label box [x0, x1] × [y0, y1] stays clear
	// of every vertical line, and within the figure.
	clear := func(x0, x1, y0, y1 vg.Length) bool {
		if x0 < 0 || x1 > w {
			return false
		}
		for _, v := range vlines {
			if v.x > x0-vg.Points(1.5) && v.x < x1+vg.Points(1.5) && v.y1 > y0 && v.y0 < y1 {
				return false
			}
		}
		return true
	}
	for _, dm := range d.Dimensions {
		switch dm.Kind {
		case Diameter:
			iDia++
			x := x0 - vg.Length(iDia)*dimGap
			y := Y(dm.A)
			// Extension line from the section to just past the dimension line.
			dc.StrokeLine2(ext, X(leftAt(dm.A))-vg.Points(1.5), y, x-vg.Points(2), y)
			dc.StrokeLine2(ls, x, Y(0)-vg.Points(5), x, y)
			arrow(dc, vg.Point{X: x, Y: y}, 0, 1)
			if level {
				levelLabels = append(levelLabels, levelLabel{tip: vg.Point{X: x, Y: y}, text: dm.Label})
				continue
			}
			sty := lab
			sty.Rotation = math.Pi / 2
			sty.XAlign = draw.XCenter
			sty.YAlign = draw.YBottom
			dc.FillText(sty, vg.Point{X: x - vg.Points(1.5), Y: (Y(0) + y) / 2}, dm.Label)
		case Axial:
			iAx++
			ya := Y(topOf(dm.A, dm.B))
			y := Y(r1) + vg.Length(iAx)*dimGap - vg.Points(3)
			xa, xb := X(dm.A), X(dm.B)
			dc.StrokeLine2(ext, xa, ya+vg.Points(1.5), xa, y+vg.Points(2))
			dc.StrokeLine2(ext, xb, ya+vg.Points(1.5), xb, y+vg.Points(2))
			sty := lab
			sty.XAlign = draw.XCenter
			sty.YAlign = draw.YBottom
			lw := lab.Width(dm.Label)
			if xb-xa >= 2*arrowLen+vg.Points(2) {
				dc.StrokeLine2(ls, xa, y, xb, y)
				arrow(dc, vg.Point{X: xa, Y: y}, -1, 0)
				arrow(dc, vg.Point{X: xb, Y: y}, 1, 0)
			} else {
				// Too short for arrows inside: arrows outside pointing in.
				dc.StrokeLine2(ls, xa-arrowLen-vg.Points(4), y, xb+arrowLen+vg.Points(4), y)
				arrow(dc, vg.Point{X: xa, Y: y}, 1, 0)
				arrow(dc, vg.Point{X: xb, Y: y}, -1, 0)
			}
			lx := (xa + xb) / 2
			lh := lab.Height(dm.Label)
			// Over the line, centred, when it fits there clear of other
			// lines; else beside the dimension, right or left, level with
			// it (a short dimension's label, or one a mid-plane or
			// another dimension's extension line would strike through).
			if lw <= xb-xa+2*arrowLen && clear(lx-lw/2, lx+lw/2, y+vg.Points(1.5), y+vg.Points(1.5)+lh) {
				dc.FillText(sty, vg.Point{X: lx, Y: y + vg.Points(1.5)}, dm.Label)
				continue
			}
			sty.YAlign = draw.YCenter
			right := xb + arrowLen + vg.Points(6)
			if xb-xa >= 2*arrowLen+vg.Points(2) {
				right = xb + vg.Points(4) // arrows inside: the line ends at xb
			}
			left := xa - (right - xb)
			switch {
			case clear(right, right+lw, y-lh/2, y+lh/2):
				sty.XAlign = draw.XLeft
				lx = right
			case clear(left-lw, left, y-lh/2, y+lh/2):
				sty.XAlign = draw.XRight
				lx = left
			default:
				// No clear place: over the line, the lines behind it
				// broken by a white ground.
				sty.YAlign = draw.YBottom
				ly := y + vg.Points(1.5)
				dc.SetColor(color.White)
				var bg vg.Path
				bg.Move(vg.Point{X: lx - lw/2 - 1, Y: ly})
				bg.Line(vg.Point{X: lx + lw/2 + 1, Y: ly})
				bg.Line(vg.Point{X: lx + lw/2 + 1, Y: ly + lh})
				bg.Line(vg.Point{X: lx - lw/2 - 1, Y: ly + lh})
				bg.Close()
				dc.Fill(bg)
				dc.FillText(sty, vg.Point{X: lx, Y: ly}, dm.Label)
				continue
			}
			dc.FillText(sty, vg.Point{X: lx, Y: y}, dm.Label)
		case Radial:
			iRad++
			za := z1
			x := X(za) + vg.Length(iRad)*dimGap
			ya, yb := Y(dm.A), Y(dm.B)
			dc.StrokeLine2(ext, X(za)+vg.Points(1.5), ya, x+vg.Points(2), ya)
			dc.StrokeLine2(ext, X(za)+vg.Points(1.5), yb, x+vg.Points(2), yb)
			sty := lab
			sty.XAlign = draw.XLeft
			sty.YAlign = draw.YCenter
			if yb-ya >= 2*arrowLen+vg.Points(2) {
				dc.StrokeLine2(ls, x, ya, x, yb)
				arrow(dc, vg.Point{X: x, Y: ya}, 0, -1)
				arrow(dc, vg.Point{X: x, Y: yb}, 0, 1)
			} else {
				dc.StrokeLine2(ls, x, ya-arrowLen-vg.Points(4), x, yb+arrowLen+vg.Points(4))
				arrow(dc, vg.Point{X: x, Y: ya}, 0, 1)
				arrow(dc, vg.Point{X: x, Y: yb}, 0, -1)
			}
			dc.FillText(sty, vg.Point{X: x + vg.Points(3), Y: (ya + yb) / 2}, dm.Label)
		}
	}
	if len(levelLabels) > 0 {
		// Level labels right-aligned left of the leftmost line, each at
		// its arrow's height, pushed apart upwards where they would touch,
		// with a leader to the arrow.
		xl := x0 - vg.Length(nDia)*dimGap - vg.Points(6)
		sort.Slice(levelLabels, func(i, j int) bool { return levelLabels[i].tip.Y < levelLabels[j].tip.Y })
		gap := lab.Height("0") * 1.25
		y := vg.Length(math.Inf(-1))
		for i := range levelLabels {
			y = max(levelLabels[i].tip.Y, y+gap)
			levelLabels[i].y = y
		}
		if over := y + gap/2 - h; over > 0 {
			for i := range levelLabels {
				levelLabels[i].y -= over
			}
		}
		sty := lab
		sty.XAlign = draw.XRight
		sty.YAlign = draw.YCenter
		for _, l := range levelLabels {
			dc.StrokeLines(ext, []vg.Point{{X: xl + vg.Points(1.5), Y: l.y}, {X: l.tip.X - vg.Points(3), Y: l.y}, {X: l.tip.X - vg.Points(0.3), Y: l.tip.Y - vg.Points(2)}})
			dc.FillText(sty, vg.Point{X: xl, Y: l.y}, l.text)
		}
	}
	for _, n := range d.Notes {
		// A horizontal leader from the point to the text on its right (or
		// its left when the right has no room).
		p := vg.Point{X: X(n.X) + vg.Points(1), Y: Y(n.Y)}
		sty := lab
		sty.YAlign = draw.YCenter
		q := vg.Point{X: p.X + vg.Points(16), Y: p.Y}
		if q.X+vg.Points(3)+sty.Width(n.Text) > w {
			p.X -= vg.Points(2)
			q = vg.Point{X: p.X - vg.Points(16), Y: p.Y}
			sty.XAlign = draw.XRight
			dc.StrokeLine2(ext, p.X, p.Y, q.X, q.Y)
			dc.FillText(sty, vg.Point{X: q.X - vg.Points(3), Y: q.Y}, n.Text)
			continue
		}
		dc.StrokeLine2(ext, p.X, p.Y, q.X, q.Y)
		dc.FillText(sty, vg.Point{X: q.X + vg.Points(3), Y: q.Y}, n.Text)
	}
}

// arrow draws a filled arrowhead with its tip at p pointing along (dx, dy)
// (a unit axis direction).
func arrow(dc draw.Canvas, p vg.Point, dx, dy float64) {
	ux, uy := vg.Length(dx), vg.Length(dy)
	base := vg.Point{X: p.X - ux*arrowLen, Y: p.Y - uy*arrowLen}
	var path vg.Path
	path.Move(p)
	path.Line(vg.Point{X: base.X - uy*arrowW, Y: base.Y + ux*arrowW})
	path.Line(vg.Point{X: base.X + uy*arrowW, Y: base.Y - ux*arrowW})
	path.Close()
	dc.SetColor(dimInk)
	dc.Fill(path)
}

// RectangleData describes a rectangular coil seen along its axis: its
// mean-turn Width × Height and the bundle thickness (m), with labels.
type RectangleData struct {
	Width, Height, Bundle   float64
	WidthLabel, HeightLabel string
	Note                    string // printed inside the opening, e.g. turns and wire
}

// RectangleSketch draws a rectangular coil in plan to scale: the winding
// band in copper centred on the mean turn, its axis as a cross-hair at the
// centre (axis out of the page), and the width and height dimensioned to
// the mean turn.
func RectangleSketch(d RectangleData) DrawFunc {
	return func(c vg.Canvas, w, h vg.Length) {
		if !(d.Width > 0 && d.Height > 0) {
			return
		}
		lab := style(TickSize, Ink)
		b := math.Max(d.Bundle, 0)
		left, right := vg.Points(12), dimGap+lab.Width(d.HeightLabel)+vg.Points(10)
		bottom, top := dimGap+vg.Points(10), vg.Points(8)
		k := math.Min(float64(w-left-right)/(d.Width+b), float64(h-bottom-top)/(d.Height+b))
		if !(k > 0) {
			return
		}
		cx := left + (w-left-right)/2
		cy := bottom + (h-bottom-top)/2
		X := func(x float64) vg.Length { return cx + vg.Length(k*x) }
		Y := func(y float64) vg.Length { return cy + vg.Length(k*y) }
		dc := draw.Canvas{Canvas: c, Rectangle: vg.Rectangle{Max: vg.Point{X: w, Y: h}}}
		hw, hh := d.Width/2, d.Height/2
		t := math.Max(b/2, 0.8/k) // at least 1.6 pt wide on paper
		band := func(ox, oy float64) vg.Path {
			var p vg.Path
			p.Move(vg.Point{X: X(-ox), Y: Y(-oy)})
			p.Line(vg.Point{X: X(ox), Y: Y(-oy)})
			p.Line(vg.Point{X: X(ox), Y: Y(oy)})
			p.Line(vg.Point{X: X(-ox), Y: Y(oy)})
			p.Close()
			return p
		}
		outer, inner := band(hw+t, hh+t), band(hw-t, hh-t)
		c.SetColor(Copper)
		c.Fill(outer)
		c.SetColor(color.White)
		c.Fill(inner)
		c.SetColor(CopperEdge)
		c.SetLineWidth(vg.Points(0.5))
		c.SetLineDash(nil, 0)
		c.Stroke(outer)
		c.Stroke(inner)
		// Mean turn as a chain line, axis as a cross-hair with a dot.
		mean := draw.LineStyle{Color: Muted, Width: vg.Points(0.4), Dashes: chain}
		dc.StrokeLines(mean, []vg.Point{{X: X(-hw), Y: Y(-hh)}, {X: X(hw), Y: Y(-hh)}, {X: X(hw), Y: Y(hh)}, {X: X(-hw), Y: Y(hh)}, {X: X(-hw), Y: Y(-hh)}})
		axis := draw.LineStyle{Color: Muted, Width: vg.Points(0.5), Dashes: chain}
		dc.StrokeLine2(axis, X(-hw*0.3), Y(0), X(hw*0.3), Y(0))
		dc.StrokeLine2(axis, X(0), Y(-hh*0.3), X(0), Y(hh*0.3))
		al := style(TickSize, Muted)
		al.XAlign = draw.XLeft
		al.YAlign = draw.YBottom
		dc.FillText(al, vg.Point{X: X(0) + vg.Points(3), Y: Y(0) + vg.Points(3)}, "axis ⊙")
		if d.Note != "" {
			nl := style(TickSize, Ink)
			nl.XAlign = draw.XCenter
			nl.YAlign = draw.YTop
			dc.FillText(nl, vg.Point{X: X(0), Y: Y(-hh * 0.45)}, d.Note)
		}
		ls := draw.LineStyle{Color: dimInk, Width: dimWidth}
		ext := draw.LineStyle{Color: dimInk, Width: vg.Points(0.3)}
		// Width, below.
		y := Y(-hh-t) - dimGap
		dc.StrokeLine2(ext, X(-hw), Y(-hh-t)-vg.Points(1.5), X(-hw), y-vg.Points(2))
		dc.StrokeLine2(ext, X(hw), Y(-hh-t)-vg.Points(1.5), X(hw), y-vg.Points(2))
		dc.StrokeLine2(ls, X(-hw), y, X(hw), y)
		arrow(dc, vg.Point{X: X(-hw), Y: y}, -1, 0)
		arrow(dc, vg.Point{X: X(hw), Y: y}, 1, 0)
		ws := lab
		ws.XAlign = draw.XCenter
		ws.YAlign = draw.YBottom
		dc.FillText(ws, vg.Point{X: X(0), Y: y + vg.Points(1.5)}, d.WidthLabel)
		// Height, right.
		x := X(hw+t) + dimGap
		dc.StrokeLine2(ext, X(hw+t)+vg.Points(1.5), Y(-hh), x+vg.Points(2), Y(-hh))
		dc.StrokeLine2(ext, X(hw+t)+vg.Points(1.5), Y(hh), x+vg.Points(2), Y(hh))
		dc.StrokeLine2(ls, x, Y(-hh), x, Y(hh))
		arrow(dc, vg.Point{X: x, Y: Y(-hh)}, 0, -1)
		arrow(dc, vg.Point{X: x, Y: Y(hh)}, 0, 1)
		hs := lab
		hs.XAlign = draw.XLeft
		hs.YAlign = draw.YCenter
		dc.FillText(hs, vg.Point{X: x + vg.Points(3), Y: Y(0)}, d.HeightLabel)
	}
}
