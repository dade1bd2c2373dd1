package figures

import (
	"fmt"
	"image"
	"image/color"
	"math"
	"slices"
	"sort"
	"strconv"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// Section is a winding cross-section drawn into a map or sketch, in the
// data's own coordinates (m): the rectangle (X0, Y0)–(X1, Y1), or when
// Round the circle inscribed in it (a thin coil's round bundle).
type Section struct {
	X0, Y0, X1, Y1 float64
	Round          bool
	// Core marks a soft-magnetic core's section, drawn in steel grey
	// (draw it before the windings, which then lie over it).
	Core bool
	// Outline marks a section drawn as a dashed outline only, unfilled:
	// a stated winding section the turns do not fill.
	Outline bool
}

// MapData is a scalar field over a rectangular grid, for FieldMap.
type MapData struct {
	X, Y []float64 // m, grid node positions, horizontal and vertical, ascending
	// B holds |B|, T, at node (X[ix], Y[iy]) at index iy·len(X) + ix; NaN
	// or non-positive values are left blank.
	B        []float64
	Sections []Section // winding cross-sections drawn over the map
	XLabel   string    // quantity of the horizontal axis, e.g. "Axial position z"; the unit is added
	YLabel   string
	// Decades is the span of the colour scale below its top (the largest
	// |B| outside the sections); 3 when 0.
	Decades float64
	// CorePeak is the largest |B| inside the core (T; 0 when none is
	// given). The core is drawn in grey over the map, so its field takes
	// no colour; when CorePeak lies above the colour scale's top the
	// colour bar ends in a grey arrowhead labelled "core" and the value.
	CorePeak float64
}

// Winding fill and outline in maps and sketches.
var (
	Copper     = color.NRGBA{R: 0xc9, G: 0x8e, B: 0x62, A: 0xff}
	CoreSteel  = color.NRGBA{R: 0x9a, G: 0xa1, B: 0xa8, A: 0xff} // a core's section
	CoreEdge   = color.NRGBA{R: 0x4a, G: 0x50, B: 0x56, A: 0xff}
	CopperEdge = color.NRGBA{R: 0x6e, G: 0x3f, B: 0x1c, A: 0xff}
	contourInk = color.NRGBA{R: 0xff, G: 0xff, B: 0xff, A: 0xc0}
)

// MapScale is the colour scale of a map: log10 |B| from Lo to Hi (T) and
// the contour levels (T), 1–2–5 steps per decade inside it.
type MapScale struct {
	Lo, Hi float64
	Levels []float64
}

// Scale returns the colour scale FieldMap uses for d: the top is the
// largest |B| at nodes outside the sections, the bottom Decades below it
// (or the smallest value, if higher).
func (d MapData) Scale() MapScale {
	return d.scale(sectionMask(d.X, d.Y, d.Sections))
}

// scale is Scale with the nodes inside the sections given (sectionMask).
func (d MapData) scale(inside []bool) MapScale {
	hi, lo := 0.0, math.Inf(1)
	for iy := range d.Y {
		for ix := range d.X {
			v := d.B[iy*len(d.X)+ix]
			if !(v > 0) || math.IsInf(v, 0) || inside[iy*len(d.X)+ix] {
				continue
			}
			hi = math.Max(hi, v)
			lo = math.Min(lo, v)
		}
	}
	if !(hi > 0) {
		return MapScale{Lo: 1, Hi: 10}
	}
	dec := d.Decades
	if !(dec > 0) {
		dec = 3
	}
	lo = math.Max(lo, hi*math.Pow(10, -dec))
	if hi/lo < 1.5 {
		lo = hi / 1.5
	}
	s := MapScale{Lo: lo, Hi: hi}
	for e := math.Floor(math.Log10(lo)); e <= math.Ceil(math.Log10(hi)); e++ {
		for _, m := range []float64{1, 2, 5} {
			v := m * math.Pow(10, e)
			if v > lo && v < hi {
				s.Levels = append(s.Levels, v)
			}
		}
	}
	return s
}

// sectionMask reports for every node of the grid (x, y), at index
// iy·len(x) + ix, whether it lies inside one of the sections: the test of
// inSections, made once per grid rather than once per use and per node.
// Each section visits only the nodes of its bounding box (found by binary
// search in the ascending node positions, widened by one node on each
// side so that rounding at a circle's edge cannot drop a node); grids
// whose positions are not ascending are tested node by node.
func sectionMask(x, y []float64, ss []Section) []bool {
	m := make([]bool, len(x)*len(y))
	if len(ss) == 0 {
		return m
	}
	if !sort.Float64sAreSorted(x) || !sort.Float64sAreSorted(y) {
		for iy, yv := range y {
			for ix, xv := range x {
				m[iy*len(x)+ix] = inSections(ss, xv, yv)
			}
		}
		return m
	}
	span := func(a []float64, lo, hi float64) (int, int) {
		i := max(sort.SearchFloat64s(a, lo)-1, 0)
		j := min(sort.SearchFloat64s(a, hi)+1, len(a))
		return i, j
	}
	for k := range ss {
		one := ss[k : k+1]
		s := ss[k]
		x0, x1 := math.Min(s.X0, s.X1), math.Max(s.X0, s.X1)
		y0, y1 := math.Min(s.Y0, s.Y1), math.Max(s.Y0, s.Y1)
		if s.Round {
			r := (x1 - x0) / 2
			cy := (y0 + y1) / 2
			y0, y1 = cy-r, cy+r
		}
		if math.IsNaN(x0) || math.IsNaN(x1) || math.IsNaN(y0) || math.IsNaN(y1) {
			continue // inSections holds no node inside such a section
		}
		ix0, ix1 := span(x, x0, x1)
		iy0, iy1 := span(y, y0, y1)
		for iy := iy0; iy < iy1; iy++ {
			for ix := ix0; ix < ix1; ix++ {
				if k := iy*len(x) + ix; !m[k] && inSections(one, x[ix], y[iy]) {
					m[k] = true
				}
			}
		}
	}
	return m
}

// inSections reports whether (x, y) lies in one of the sections drawn
// filled: an outline (a stated section the turns do not fill) holds free
// space, whose field the map shows.
func inSections(ss []Section, x, y float64) bool {
	for _, s := range ss {
		if s.Outline {
			continue
		}
		x0, x1 := math.Min(s.X0, s.X1), math.Max(s.X0, s.X1)
		y0, y1 := math.Min(s.Y0, s.Y1), math.Max(s.Y0, s.Y1)
		if s.Round {
			r := (x1 - x0) / 2
			if math.Hypot(x-(x0+x1)/2, y-(y0+y1)/2) <= r {
				return true
			}
			continue
		}
		if x >= x0 && x <= x1 && y >= y0 && y <= y1 {
			return true
		}
	}
	return false
}

// FieldMap draws |B| over the grid of d as a colour image (the Viridis
// map, logarithmic in |B|, bilinear between the nodes), contour lines at
// the 1–2–5 levels of its scale, the winding cross-sections in copper, and
// a colour bar on the right with the contour levels marked. Horizontal and
// vertical lengths are drawn to the same scale.
func FieldMap(d MapData) DrawFunc {
	return func(c vg.Canvas, w, h vg.Length) {
		drawFieldMap(c, w, h, d)
	}
}

func drawFieldMap(c vg.Canvas, w, h vg.Length, d MapData) {
	if len(d.X) < 2 || len(d.Y) < 2 || len(d.B) != len(d.X)*len(d.Y) {
		return
	}
	inside := sectionMask(d.X, d.Y, d.Sections)
	sc := d.scale(inside)
	lp := EngPrefix(d.X[0], d.X[len(d.X)-1], d.Y[0], d.Y[len(d.Y)-1])
	if lp.Factor > 1 {
		lp = Prefix{"", 1}
	}
	p := newAxes(d.XLabel+" ("+lp.Symbol+"m)", d.YLabel+" ("+lp.Symbol+"m)")
	p.X.Min, p.X.Max = d.X[0]/lp.Factor, d.X[len(d.X)-1]/lp.Factor
	p.Y.Min, p.Y.Max = d.Y[0]/lp.Factor, d.Y[len(d.Y)-1]/lp.Factor
	p.X.Padding, p.Y.Padding = 0, 0

	logv := logGrid(d.B, inside)
	img := mapImage(d, sc, logv)
	p.Add(plotter.NewImage(img, p.X.Min, p.Y.Min, p.X.Max, p.Y.Max))
	p.Add(&contourPlot{d: d, logv: logv, levels: sc.Levels, scale: lp.Factor})
	p.Add(&sectionPlot{sections: d.Sections, scale: lp.Factor})

	var labelW vg.Length
	if d.CorePeak > sc.Hi {
		labelW = style(TickSize, Muted).Width(coreLabel(d.CorePeak))
	}
	dc, ylabel, ysty := mapCanvas(c, w, h, p, labelW)
	p.Draw(dc)
	da := p.DataCanvas(dc)
	p.Y.Label.Text = ylabel
	ysty.Rotation = math.Pi / 2
	ysty.XAlign = draw.XCenter
	ysty.YAlign = draw.YBottom
	ytl := p.Y.Tick.Label
	var tickW vg.Length
	for _, tk := range p.Y.Tick.Marker.Ticks(p.Y.Min, p.Y.Max) {
		if tk.Label != "" {
			tickW = max(tickW, ytl.Width(tk.Label))
		}
	}
	lx := da.Min.X - tickW - p.Y.Tick.Length - p.Y.Label.Padding - ysty.FontExtents().Descent
	c.Push()
	dc.FillText(ysty, vg.Point{X: lx, Y: da.Center().Y}, ylabel)
	c.Pop()
	drawColourBar(c, vg.Rectangle{
		Min: vg.Point{X: da.Max.X + vg.Points(10), Y: da.Min.Y},
		Max: vg.Point{X: da.Max.X + vg.Points(10) + vg.Length(barW)*vg.Millimeter, Y: da.Max.Y},
	}, sc, d.CorePeak)
}

// CoreAbove reports whether the core's field lies above the colour
// scale's top, which the colour bar then marks (MapData.CorePeak).
func (d MapData) CoreAbove() bool {
	return d.CorePeak > d.Scale().Hi
}

// mapImage renders the grid as an image at about three pixels per node
// (at most 600 across), interpolating log10 |B| bilinearly.
// logv is logGrid of the map.
func mapImage(d MapData, sc MapScale, logv []float64) image.Image {
	nx, ny := len(d.X), len(d.Y)
	f := max(1, min(3, 600/max(nx, ny)))
	W, H := (nx-1)*f+1, (ny-1)*f+1
	img := image.NewNRGBA(image.Rect(0, 0, W, H))
	l0, l1 := math.Log10(sc.Lo), math.Log10(sc.Hi)
	for py := range H {
		gy := float64(H-1-py) / float64(f) // row 0 is the top
		iy := min(int(gy), ny-2)
		ty := gy - float64(iy)
		for px := range W {
			gx := float64(px) / float64(f)
			ix := min(int(gx), nx-2)
			tx := gx - float64(ix)
			a, b := logv[iy*nx+ix], logv[iy*nx+ix+1]
			cc, dd := logv[(iy+1)*nx+ix], logv[(iy+1)*nx+ix+1]
			v := (1-ty)*((1-tx)*a+tx*b) + ty*((1-tx)*cc+tx*dd)
			if math.IsNaN(v) {
				// Next to a blank node: the nearest node's value.
				jx, jy := ix+int(math.Round(tx)), iy+int(math.Round(ty))
				v = logv[jy*nx+jx]
			}
			if math.IsNaN(v) {
				img.SetNRGBA(px, py, color.NRGBA{R: 0xff, G: 0xff, B: 0xff, A: 0xff})
				continue
			}
			img.SetNRGBA(px, py, Viridis((v-l0)/(l1-l0)))
		}
	}
	return img
}

// logGrid returns log10 |B| at every node, NaN where the node is blank:
// a value that is NaN, infinite or not positive, or a node inside a
// section (inside, from sectionMask).
func logGrid(b []float64, inside []bool) []float64 {
	logv := make([]float64, len(b))
	for k, v := range b {
		if !(v > 0) || math.IsInf(v, 0) || inside[k] {
			logv[k] = math.NaN()
			continue
		}
		logv[k] = math.Log10(v)
	}
	return logv
}

// contourPlot draws the contour lines of a map.
type contourPlot struct {
	d      MapData
	logv   []float64 // logGrid of the map
	levels []float64
	scale  float64
}

func (cp *contourPlot) Plot(c draw.Canvas, p *plot.Plot) {
	trX, trY := p.Transforms(&c)
	ls := draw.LineStyle{Color: contourInk, Width: vg.Points(0.45)}
	for _, lv := range cp.levels {
		for _, line := range contourLog(cp.d.X, cp.d.Y, cp.logv, lv) {
			pts := make([]vg.Point, len(line))
			for i, q := range line {
				pts[i] = vg.Point{X: trX(q[0] / cp.scale), Y: trY(q[1] / cp.scale)}
			}
			c.StrokeLines(ls, pts)
		}
	}
}

// Contour returns the polylines where the grid function v (index
// iy·len(x) + ix) crosses level, by marching squares on log10 v with
// linear interpolation along the cell edges (saddles resolved by the cell
// mean). Cells with a blank corner (NaN, non-positive, inside a section)
// are skipped. Segments are joined into polylines through shared edges.
func Contour(x, y, v []float64, level float64, sections []Section) [][][2]float64 {
	if len(x) < 2 || len(y) < 2 || !(level > 0) {
		return nil
	}
	return contourLog(x, y, logGrid(v, sectionMask(x, y, sections)), level)
}

// contourLog is Contour over logv, log10 of the grid function with its
// blank nodes NaN (logGrid).
func contourLog(x, y, logv []float64, level float64) [][][2]float64 {
	nx, ny := len(x), len(y)
	if nx < 2 || ny < 2 || !(level > 0) {
		return nil
	}
	lv := math.Log10(level)
	g := make([]float64, len(logv))
	for k, l := range logv {
		g[k] = l - lv // NaN stays NaN
	}
	// An edge is identified by its lower-left node and direction
	// (0: towards +x, 1: towards +y).
	type edge struct{ ix, iy, dir int }
	point := func(e edge) [2]float64 {
		a := g[e.iy*nx+e.ix]
		var b float64
		var p0, p1 [2]float64
		p0 = [2]float64{x[e.ix], y[e.iy]}
		if e.dir == 0 {
			b = g[e.iy*nx+e.ix+1]
			p1 = [2]float64{x[e.ix+1], y[e.iy]}
		} else {
			b = g[(e.iy+1)*nx+e.ix]
			p1 = [2]float64{x[e.ix], y[e.iy+1]}
		}
		t := a / (a - b)
		return [2]float64{p0[0] + t*(p1[0]-p0[0]), p0[1] + t*(p1[1]-p0[1])}
	}
	var segs [][2]edge
	for iy := 0; iy < ny-1; iy++ {
		for ix := 0; ix < nx-1; ix++ {
			c0, c1 := g[iy*nx+ix], g[iy*nx+ix+1]
			c2, c3 := g[(iy+1)*nx+ix+1], g[(iy+1)*nx+ix]
			if math.IsNaN(c0) || math.IsNaN(c1) || math.IsNaN(c2) || math.IsNaN(c3) {
				continue
			}
			idx := 0
			for i, cv := range []float64{c0, c1, c2, c3} {
				if cv > 0 {
					idx |= 1 << i
				}
			}
			if idx == 0 || idx == 15 {
				continue
			}
			bot, right := edge{ix, iy, 0}, edge{ix + 1, iy, 1}
			top, left := edge{ix, iy + 1, 0}, edge{ix, iy, 1}
			mean := (c0 + c1 + c2 + c3) / 4
			switch idx {
			case 1, 14:
				segs = append(segs, [2]edge{left, bot})
			case 2, 13:
				segs = append(segs, [2]edge{bot, right})
			case 3, 12:
				segs = append(segs, [2]edge{left, right})
			case 4, 11:
				segs = append(segs, [2]edge{right, top})
			case 6, 9:
				segs = append(segs, [2]edge{bot, top})
			case 7, 8:
				segs = append(segs, [2]edge{left, top})
			case 5: // corners 0 and 2 above
				if mean > 0 {
					segs = append(segs, [2]edge{left, top}, [2]edge{bot, right})
				} else {
					segs = append(segs, [2]edge{left, bot}, [2]edge{right, top})
				}
			case 10: // corners 1 and 3 above
				if mean > 0 {
					segs = append(segs, [2]edge{left, bot}, [2]edge{right, top})
				} else {
					segs = append(segs, [2]edge{left, top}, [2]edge{bot, right})
				}
			}
		}
	}
	// Join segments through shared edges.
	at := map[edge][]int{}
	for i, s := range segs {
		at[s[0]] = append(at[s[0]], i)
		at[s[1]] = append(at[s[1]], i)
	}
	used := make([]bool, len(segs))
	next := func(e edge) int {
		for _, j := range at[e] {
			if !used[j] {
				return j
			}
		}
		return -1
	}
	var out [][][2]float64
	for i := range segs {
		if used[i] {
			continue
		}
		used[i] = true
		chain := []edge{segs[i][0], segs[i][1]}
		// Extend forwards, then backwards.
		for dir := 0; dir < 2; dir++ {
			for {
				end := chain[len(chain)-1]
				j := next(end)
				if j < 0 {
					break
				}
				used[j] = true
				if segs[j][0] == end {
					chain = append(chain, segs[j][1])
				} else {
					chain = append(chain, segs[j][0])
				}
			}
			for a, b := 0, len(chain)-1; a < b; a, b = a+1, b-1 {
				chain[a], chain[b] = chain[b], chain[a]
			}
		}
		line := make([][2]float64, len(chain))
		for k, e := range chain {
			line[k] = point(e)
		}
		out = append(out, line)
	}
	return out
}

// sectionPlot draws winding cross-sections in copper with a dark edge.
type sectionPlot struct {
	sections []Section
	scale    float64
}

func (sp *sectionPlot) Plot(c draw.Canvas, p *plot.Plot) {
	trX, trY := p.Transforms(&c)
	for _, s := range sp.sections {
		x0, x1 := trX(s.X0/sp.scale), trX(s.X1/sp.scale)
		y0, y1 := trY(s.Y0/sp.scale), trY(s.Y1/sp.scale)
		drawSection(c.Canvas, x0, y0, x1, y1, s)
	}
}

// drawSection fills and outlines one cross-section given in canvas
// coordinates; a round one is drawn as a circle of at least 1.6 pt radius.
func drawSection(c vg.Canvas, x0, y0, x1, y1 vg.Length, s Section) {
	round := s.Round
	if x0 > x1 {
		x0, x1 = x1, x0
	}
	if y0 > y1 {
		y0, y1 = y1, y0
	}
	// A section too thin to see is widened to 1.5 pt about its centre line.
	if !round {
		if d := vg.Points(1.5) - (x1 - x0); d > 0 {
			x0, x1 = x0-d/2, x1+d/2
		}
		if d := vg.Points(1.5) - (y1 - y0); d > 0 {
			y0, y1 = y0-d/2, y1+d/2
		}
	}
	var path vg.Path
	if round {
		r := max((x1-x0)/2, (y1-y0)/2, vg.Points(1.6))
		cx, cy := (x0+x1)/2, (y0+y1)/2
		path.Move(vg.Point{X: cx + r, Y: cy})
		path.Arc(vg.Point{X: cx, Y: cy}, r, 0, 2*math.Pi)
		path.Close()
	} else {
		path.Move(vg.Point{X: x0, Y: y0})
		path.Line(vg.Point{X: x1, Y: y0})
		path.Line(vg.Point{X: x1, Y: y1})
		path.Line(vg.Point{X: x0, Y: y1})
		path.Close()
	}
	if s.Outline {
		c.SetColor(CopperEdge)
		c.SetLineWidth(vg.Points(0.5))
		c.SetLineDash([]vg.Length{vg.Points(3), vg.Points(2)}, 0)
		c.Stroke(path)
		c.SetLineDash(nil, 0)
		return
	}
	fill, edge := Copper, CopperEdge
	if s.Core {
		fill, edge = CoreSteel, CoreEdge
	}
	c.SetColor(fill)
	c.Fill(path)
	c.SetColor(edge)
	c.SetLineWidth(vg.Points(0.5))
	c.SetLineDash(nil, 0)
	c.Stroke(path)
}

// drawColourBar draws the scale's gradient in r with log ticks and labels
// on its right and the quantity above it; a core field above the scale's
// top (corePeak, T) ends the bar in an arrowhead in the core's grey,
// labelled with it.
func drawColourBar(c vg.Canvas, r vg.Rectangle, sc MapScale, corePeak float64) {
	titleY := r.Max.Y + vg.Points(4)
	over := corePeak > sc.Hi
	if over {
		r.Max.Y -= barArrowHeight(r) // the arrowhead takes its room from the bar
	}
	dc := drawBarGradient(c, r)
	l0, l1 := math.Log10(sc.Lo), math.Log10(sc.Hi)
	yOf := func(v float64) vg.Length {
		return r.Min.Y + (r.Max.Y-r.Min.Y)*vg.Length((math.Log10(v)-l0)/(l1-l0))
	}
	sty := style(TickSize, Muted)
	sty.YAlign = draw.YCenter
	tick := draw.LineStyle{Color: Ink, Width: vg.Points(0.5)}
	ys := make([]vg.Length, len(sc.Levels))
	for i, v := range sc.Levels {
		ys[i] = yOf(v)
		dc.StrokeLine2(tick, r.Min.X, ys[i], r.Max.X+vg.Points(2), ys[i])
	}
	minGap := sty.Height("0") * 1.15
	capY := r.Max.Y + barArrowHeight(r)/2
	for _, i := range barLabels(sc.Levels, ys, minGap) {
		if over && capY-ys[i] < minGap {
			continue // the core's label stands there
		}
		dc.FillText(sty, vg.Point{X: r.Max.X + vg.Points(3.5), Y: ys[i]}, engLabel(sc.Levels[i], "T"))
	}
	if over {
		h := barArrowHeight(r)
		var path vg.Path
		path.Move(vg.Point{X: r.Min.X, Y: r.Max.Y})
		path.Line(vg.Point{X: (r.Min.X + r.Max.X) / 2, Y: r.Max.Y + h})
		path.Line(vg.Point{X: r.Max.X, Y: r.Max.Y})
		path.Close()
		c.SetColor(CoreSteel)
		c.Fill(path)
		c.SetColor(CoreEdge)
		c.SetLineWidth(ThinWidth)
		c.SetLineDash(nil, 0)
		c.Stroke(path)
		dc.FillText(sty, vg.Point{X: r.Max.X + vg.Points(3.5), Y: capY}, coreLabel(corePeak))
	}
	title := style(LabelSize, Ink)
	title.XAlign = draw.XCenter
	dc.FillText(title, vg.Point{X: (r.Min.X + r.Max.X) / 2, Y: titleY}, "|B|")
}

// coreLabel is the colour bar's label of a core's field above its scale.
func coreLabel(corePeak float64) string { return "core " + engLabel(corePeak, "T") }

// barLabels chooses which of a colour bar's levels (at heights ys) get a
// label at least minGap from every other label: all of them when they fit;
// else the decades first, then the two ends, then the rest from the
// bottom, each where it still has room, so that a crowded bar keeps as
// many labels as fit and always its decades and ends where they can be
// set. It returns their indices in order.
func barLabels(levels []float64, ys []vg.Length, minGap vg.Length) []int {
	var order []int
	decade := func(v float64) bool { return math.Abs(math.Log10(v)-math.Round(math.Log10(v))) < 1e-9 }
	for i, v := range levels {
		if decade(v) {
			order = append(order, i)
		}
	}
	if n := len(levels); n > 0 {
		order = append(order, 0, n-1)
	}
	for i := range levels {
		order = append(order, i)
	}
	var chosen []int
	taken := make([]bool, len(levels))
	for _, i := range order {
		if taken[i] {
			continue
		}
		ok := true
		for _, j := range chosen {
			if d := ys[i] - ys[j]; d < minGap && d > -minGap {
				ok = false
				break
			}
		}
		if ok {
			chosen = append(chosen, i)
			taken[i] = true
		}
	}
	slices.Sort(chosen)
	return chosen
}

// engLabel formats v with the SI prefix under which it reads 1…999, to at
// most three significant figures: 200 µT, 1 mT, 1.5 T.
func engLabel(v float64, unit string) string {
	p := EngPrefix(v)
	s := strconv.FormatFloat(v/p.Factor, 'g', 3, 64)
	return fmt.Sprintf("%s %s%s", s, p.Symbol, unit)
}

// barW is the width of a map's colour bar, mm.
const barW = 4.5

// mapCanvas is the canvas a map plot p draws on within w × h: room for a
// colour bar on the right, for the y-axis label (set by the caller, as
// gonum/plot keeps room for it about the axis's midpoint, which on a flat
// map — a long solenoid's — would squeeze the data area to a sliver), and
// equal horizontal and vertical scales, the canvas shrunk in the direction
// with room to spare and kept centred. labelW is the widest label the
// colour bar needs room for beyond its usual ones (0 for none). It returns
// the y label's text and style, cleared from p.
func mapCanvas(c vg.Canvas, w, h vg.Length, p *plot.Plot, labelW vg.Length) (draw.Canvas, string, text.Style) {
	barRoom := vg.Length(barW)*vg.Millimeter + max(vg.Points(44), labelW+vg.Points(12))
	dc := draw.Canvas{Canvas: c, Rectangle: vg.Rectangle{Max: vg.Point{X: w, Y: h}}}
	dc = draw.Crop(dc, vg.Points(1), -vg.Points(6)-barRoom, vg.Points(1), -vg.Points(14))
	ylabel, ysty := p.Y.Label.Text, p.Y.Label.TextStyle
	lw := ysty.Height(ylabel) + ysty.FontExtents().Descent + p.Y.Label.Padding
	p.Y.Label.Text = ""
	dc = draw.Crop(dc, lw, 0, 0, 0)
	for range 3 {
		da := p.DataCanvas(dc)
		sx := da.Size().X / vg.Length(p.X.Max-p.X.Min)
		sy := da.Size().Y / vg.Length(p.Y.Max-p.Y.Min)
		switch {
		case sx > sy*1.0005:
			cut := da.Size().X - sy*vg.Length(p.X.Max-p.X.Min)
			dc = draw.Crop(dc, cut/2, -cut/2, 0, 0)
		case sy > sx*1.0005:
			cut := da.Size().Y - sx*vg.Length(p.Y.Max-p.Y.Min)
			dc = draw.Crop(dc, 0, 0, cut/2, -cut/2)
		}
	}
	return dc, ylabel, ysty
}

// drawBarGradient draws a colour bar's Viridis gradient in r (bottom to
// top) with a thin edge round it, and returns the canvas of r for its
// ticks and labels.
func drawBarGradient(c vg.Canvas, r vg.Rectangle) draw.Canvas {
	const n = 256
	img := image.NewNRGBA(image.Rect(0, 0, 1, n))
	for i := range n {
		img.SetNRGBA(0, n-1-i, Viridis(float64(i)/(n-1)))
	}
	c.DrawImage(r, img)
	dc := draw.Canvas{Canvas: c, Rectangle: r}
	edge := draw.LineStyle{Color: Muted, Width: ThinWidth}
	dc.StrokeLines(edge, []vg.Point{r.Min, {X: r.Max.X, Y: r.Min.Y}, r.Max, {X: r.Min.X, Y: r.Max.Y}, r.Min})
	return dc
}
