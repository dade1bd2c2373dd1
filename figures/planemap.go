package figures

import (
	"image"
	"image/color"
	"math"
	"strconv"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// PlaneData is a signed field component over a plane, for PlaneMap: a
// panel coil's normal flux density over its plane of interest.
type PlaneData struct {
	X, Y []float64 // m, node positions, ascending
	// V holds the component, T, at node (X[ix], Y[iy]) at index
	// iy·len(X) + ix; NaN nodes are left blank.
	V []float64
	// Ref is the reference value (the centre's), T: the contours are at
	// the departures Steps from it and the colour bar is marked in them.
	Ref   float64
	Steps []float64 // e.g. ±0.01, ±0.05 (fractions of Ref)
	// Outline is the coil's mean turn projected on the plane, a closed
	// polygon drawn dashed (m).
	Outline [][2]float64
	// Points are the probes in the plane, marked and named.
	Points         []PlanePoint
	XLabel, YLabel string // quantities of the axes; the unit is added
	Quantity       string // the colour bar's title, e.g. "Bz"
}

// PlanePoint is a marked point of a PlaneMap.
type PlanePoint struct {
	X, Y  float64 // m
	Label string
}

// ContourSteps are the departures from the reference value at which a
// plane map draws contours: ±1, 2, 5, 10, 20, 50 % and +100, +200 %.
var ContourSteps = []float64{-0.5, -0.2, -0.1, -0.05, -0.02, -0.01, 0.01, 0.02, 0.05, 0.1, 0.2, 0.5, 1, 2}

// PlaneMap draws the component over the plane as a colour image (Viridis,
// linear between the smallest and largest value of the map, bilinear
// between the nodes), white contour lines at the departures Steps from
// Ref, the coil's outline dashed and the probes as white dots with their
// names, with a colour bar on the right: round values in teslas
// (BarTicks), the contour levels drawn across it in white, a clipped end
// as an arrowhead. Both lengths are drawn to one scale.
func PlaneMap(d PlaneData) DrawFunc {
	return func(c vg.Canvas, w, h vg.Length) { drawPlaneMap(c, w, h, d) }
}

// planeRange is the smallest and largest finite value of the map.
func planeRange(v []float64) (lo, hi float64, ok bool) {
	lo, hi = math.Inf(1), math.Inf(-1)
	for _, x := range v {
		if !math.IsNaN(x) && !math.IsInf(x, 0) {
			lo, hi = math.Min(lo, x), math.Max(hi, x)
		}
	}
	return lo, hi, hi >= lo
}

// colourRange is the range of the colour scale for values from lo to hi:
// beside a conductor the field runs far beyond the centre value, so the
// colours stop at ±ColourSpan of Ref and the region of interest keeps its
// shades (values beyond take the end colours); clipLo and clipHi say
// which end was cut; a cut end is a round value of the colour bar's ticks.
func (d PlaneData) colourRange(lo, hi float64) (a, b float64, clipLo, clipHi bool) {
	a, b = lo, hi
	if r := math.Abs(d.Ref); r > 0 {
		if v := d.Ref - ColourSpan*r; a < v {
			a, clipLo = v, true
		}
		if v := d.Ref + ColourSpan*r; b > v {
			b, clipHi = v, true
		}
	}
	// A clipped end is moved in to a round value of the bar's ticks, so
	// that its "≥" label reads as one.
	if (clipLo || clipHi) && b > a {
		step := BarTicks(a, b).Step
		if v := math.Floor(b/step+1e-9) * step; clipHi && v > a {
			b = v
		}
		if v := math.Ceil(a/step-1e-9) * step; clipLo && v < b {
			a = v
		}
	}
	return a, b, clipLo, clipHi
}

// ColourScale is the range of d's colour scale (T), and which of its ends
// is clipped: the values beyond take the end colour, and the colour bar
// marks the end with an arrowhead.
func (d PlaneData) ColourScale() (lo, hi float64, clipLo, clipHi bool) {
	lo, hi, ok := planeRange(d.V)
	if !ok {
		return math.NaN(), math.NaN(), false, false
	}
	return d.colourRange(lo, hi)
}

// PlaneLevels returns the contour levels of d, T: Ref·(1 + s) for each
// step s that falls strictly inside the map's range and its colour scale.
func (d PlaneData) PlaneLevels() []float64 {
	lo, hi, ok := planeRange(d.V)
	if !ok || d.Ref == 0 {
		return nil
	}
	lo, hi, _, _ = d.colourRange(lo, hi)
	var out []float64
	for _, s := range d.Steps {
		v := d.Ref * (1 + s)
		if v > lo && v < hi {
			out = append(out, v)
		}
	}
	return out
}

func drawPlaneMap(c vg.Canvas, w, h vg.Length, d PlaneData) {
	nx, ny := len(d.X), len(d.Y)
	if nx < 2 || ny < 2 || len(d.V) != nx*ny {
		return
	}
	lo, hi, ok := planeRange(d.V)
	if !ok {
		return
	}
	lo, hi, clipLo, clipHi := d.colourRange(lo, hi)
	if !(hi > lo) {
		hi = lo + math.Max(math.Abs(lo)*1e-3, 1e-12)
	}
	lp := EngPrefix(d.X[0], d.X[nx-1], d.Y[0], d.Y[ny-1])
	if lp.Factor > 1 {
		lp = Prefix{"", 1}
	}
	p := newAxes(d.XLabel+" ("+lp.Symbol+"m)", d.YLabel+" ("+lp.Symbol+"m)")
	p.X.Min, p.X.Max = d.X[0]/lp.Factor, d.X[nx-1]/lp.Factor
	p.Y.Min, p.Y.Max = d.Y[0]/lp.Factor, d.Y[ny-1]/lp.Factor
	p.X.Padding, p.Y.Padding = 0, 0
	p.Add(plotter.NewImage(planeImage(d, lo, hi), p.X.Min, p.Y.Min, p.X.Max, p.Y.Max))
	levels := d.PlaneLevels()
	p.Add(&planeOverlay{d: d, levels: levels, scale: lp.Factor})

	dc, ylabel, ysty := mapCanvas(c, w, h, p, 0)
	p.Draw(dc)
	da := p.DataCanvas(dc)
	ysty.Rotation = math.Pi / 2
	ysty.XAlign = draw.XCenter
	ysty.YAlign = draw.YBottom
	var tickW vg.Length
	for _, tk := range p.Y.Tick.Marker.Ticks(p.Y.Min, p.Y.Max) {
		if tk.Label != "" {
			tickW = max(tickW, p.Y.Tick.Label.Width(tk.Label))
		}
	}
	lx := da.Min.X - tickW - p.Y.Tick.Length - p.Y.Label.Padding - ysty.FontExtents().Descent
	dc.FillText(ysty, vg.Point{X: lx, Y: da.Center().Y}, ylabel)
	drawLinearBar(c, vg.Rectangle{
		Min: vg.Point{X: da.Max.X + vg.Points(10), Y: da.Min.Y},
		Max: vg.Point{X: da.Max.X + vg.Points(10) + vg.Length(barW)*vg.Millimeter, Y: da.Max.Y},
	}, d, lo, hi, levels, clipLo, clipHi)
}

// ColourSpan is how far from the reference value, as a fraction of it, a
// plane map's colour scale reaches at most.
const ColourSpan = 1.5

// planeImage renders the grid at about four pixels per node, linear in
// the value between lo and hi; a blank node takes its nearest neighbour's
// colour next to valued ones, else white.
func planeImage(d PlaneData, lo, hi float64) image.Image {
	nx, ny := len(d.X), len(d.Y)
	f := max(1, min(4, 600/max(nx, ny)))
	W, H := (nx-1)*f+1, (ny-1)*f+1
	img := image.NewNRGBA(image.Rect(0, 0, W, H))
	for py := range H {
		gy := float64(H-1-py) / float64(f)
		iy := min(int(gy), ny-2)
		ty := gy - float64(iy)
		for px := range W {
			gx := float64(px) / float64(f)
			ix := min(int(gx), nx-2)
			tx := gx - float64(ix)
			a, b := d.V[iy*nx+ix], d.V[iy*nx+ix+1]
			cc, dd := d.V[(iy+1)*nx+ix], d.V[(iy+1)*nx+ix+1]
			v := (1-ty)*((1-tx)*a+tx*b) + ty*((1-tx)*cc+tx*dd)
			if math.IsNaN(v) {
				jx, jy := ix+int(math.Round(tx)), iy+int(math.Round(ty))
				v = d.V[jy*nx+jx]
			}
			if math.IsNaN(v) {
				img.SetNRGBA(px, py, color.NRGBA{R: 0xff, G: 0xff, B: 0xff, A: 0xff})
				continue
			}
			img.SetNRGBA(px, py, Viridis((v-lo)/(hi-lo)))
		}
	}
	return img
}

// PlaneContours returns the contour polylines of d at level (T), by the
// marching squares of Contour on the linear value.
func PlaneContours(d PlaneData, level float64) [][][2]float64 {
	// contourLog contours its grid minus log10 of the level it is given:
	// handing it the values themselves and 10^level contours them at level.
	return contourLog(d.X, d.Y, d.V, math.Pow(10, level))
}

// planeOverlay draws a plane map's contours, outline and probes.
type planeOverlay struct {
	d      PlaneData
	levels []float64
	scale  float64
}

func (o *planeOverlay) Plot(c draw.Canvas, p *plot.Plot) {
	trX, trY := p.Transforms(&c)
	pt := func(q [2]float64) vg.Point { return vg.Point{X: trX(q[0] / o.scale), Y: trY(q[1] / o.scale)} }
	ls := draw.LineStyle{Color: contourInk, Width: vg.Points(0.5)}
	// The lines drawn, which the probes' names keep clear of.
	var lines [][]vg.Point
	for _, lv := range o.levels {
		for _, line := range PlaneContours(o.d, lv) {
			pts := make([]vg.Point, len(line))
			for i, q := range line {
				pts[i] = pt(q)
			}
			c.StrokeLines(ls, pts)
			lines = append(lines, pts)
		}
	}
	if n := len(o.d.Outline); n > 1 {
		pts := make([]vg.Point, 0, n+1)
		for _, q := range o.d.Outline {
			pts = append(pts, pt(q))
		}
		pts = append(pts, pts[0])
		c.StrokeLines(draw.LineStyle{Color: Copper, Width: vg.Points(1.1), Dashes: Dashed}, pts)
		lines = append(lines, pts)
	}
	sty := style(markLabelSize, Ink)
	sty.XAlign, sty.YAlign = draw.XLeft, draw.YBottom
	var dots []vg.Point
	for _, q := range o.d.Points {
		dots = append(dots, pt([2]float64{q.X, q.Y}))
	}
	labels := placePlaneLabels(o.d.Points, dots, lines, c.Rectangle, sty)
	for _, b := range labels {
		if b.leader {
			c.StrokeLine2(draw.LineStyle{Color: Ink, Width: vg.Points(0.4)}, b.dot.X, b.dot.Y, b.foot.X, b.foot.Y)
		}
	}
	for _, a := range dots {
		var path vg.Path
		r := vg.Points(2.2)
		path.Move(vg.Point{X: a.X + r, Y: a.Y})
		path.Arc(a, r, 0, 2*math.Pi)
		path.Close()
		c.SetColor(color.White)
		c.Fill(path)
		c.SetColor(Ink)
		c.SetLineWidth(vg.Points(0.6))
		c.SetLineDash(nil, 0)
		c.Stroke(path)
	}
	for _, b := range labels {
		// A white backing keeps the name legible over any colour.
		c.SetColor(color.NRGBA{R: 0xff, G: 0xff, B: 0xff, A: 0xd0})
		c.Fill(b.box.Path())
		c.FillText(sty, b.at, b.label)
	}
}

// planeLabel is where a probe's name is set on a plane map: its text's
// origin, its backing box, and a leader from the dot when it stands off.
type planeLabel struct {
	label     string
	at        vg.Point
	box       vg.Rectangle
	dot, foot vg.Point
	leader    bool
}

// placePlaneLabels sets each named probe's name beside its dot where its
// box, widened by a margin, crosses the fewest of the lines drawn (the
// contours and the outline), no other dot and no name already set, and
// stays inside the data area r: first close by in the eight directions
// (above right first), then farther off with a leader line.
func placePlaneLabels(pts []PlanePoint, dots []vg.Point, lines [][]vg.Point, r vg.Rectangle, sty text.Style) []planeLabel {
	const margin = 2.0
	// Points every pt along the lines.
	var along []vg.Point
	for _, l := range lines {
		for i := 0; i+1 < len(l); i++ {
			a, b := l[i], l[i+1]
			n := int(math.Ceil(float64(math.Hypot(float64(b.X-a.X), float64(b.Y-a.Y)))))
			n = min(max(n, 1), 4000)
			for k := 0; k < n; k++ {
				t := vg.Length(k) / vg.Length(n)
				along = append(along, vg.Point{X: a.X + (b.X-a.X)*t, Y: a.Y + (b.Y-a.Y)*t})
			}
		}
	}
	var out []planeLabel
	for i, q := range pts {
		if q.Label == "" {
			continue
		}
		a := dots[i]
		wd, ht := sty.Width(q.Label), sty.Height(q.Label)
		bw, bh := wd+vg.Points(1.6), ht+vg.Points(0.5)
		best, bestCost := planeLabel{}, math.Inf(1)
		for ring, d := range []vg.Length{vg.Points(3.5), vg.Points(9), vg.Points(16)} {
			// above right, right, below right, above, below, above left,
			// left, below left
			for _, dir := range [][2]float64{{1, 1}, {1, 0}, {1, -1}, {0, 1}, {0, -1}, {-1, 1}, {-1, 0}, {-1, -1}} {
				var box vg.Rectangle
				switch dir[0] {
				case 1:
					box.Min.X = a.X + d
				case 0:
					box.Min.X = a.X - bw/2
				default:
					box.Min.X = a.X - d - bw
				}
				switch dir[1] {
				case 1:
					box.Min.Y = a.Y + d*0.6
				case 0:
					box.Min.Y = a.Y - bh/2
				default:
					box.Min.Y = a.Y - d*0.6 - bh
				}
				box.Max = vg.Point{X: box.Min.X + bw, Y: box.Min.Y + bh}
				if box.Min.X < r.Min.X || box.Max.X > r.Max.X || box.Min.Y < r.Min.Y || box.Max.Y > r.Max.Y {
					continue
				}
				wide := vg.Rectangle{Min: vg.Point{X: box.Min.X - margin, Y: box.Min.Y - margin}, Max: vg.Point{X: box.Max.X + margin, Y: box.Max.Y + margin}}
				cost := 0.0
				for _, p := range along {
					if inRect(p, wide) {
						cost++
					}
				}
				for j, o := range dots {
					if j != i && inRect(o, wide) {
						cost += 100
					}
				}
				for _, o := range out {
					if overlaps(o.box, wide) {
						cost += 1000
					}
				}
				// Nearer rings first, among equally clear places.
				cost += 0.5 * float64(ring)
				if cost < bestCost {
					best, bestCost = planeLabel{label: q.Label, box: box, dot: a, leader: ring > 0}, cost
					best.at = vg.Point{X: box.Min.X + vg.Points(0.8), Y: box.Min.Y + vg.Points(0.5)}
					best.foot = vg.Point{X: max(box.Min.X, min(a.X, box.Max.X)), Y: max(box.Min.Y, min(a.Y, box.Max.Y))}
				}
			}
		}
		if math.IsInf(bestCost, 1) {
			// No room inside: beside the dot, as before.
			box := vg.Rectangle{Min: vg.Point{X: a.X + vg.Points(3) - vg.Points(0.8), Y: a.Y + vg.Points(2) - vg.Points(0.5)}}
			box.Max = vg.Point{X: box.Min.X + bw, Y: box.Min.Y + bh}
			best = planeLabel{label: q.Label, box: box, dot: a, at: vg.Point{X: a.X + vg.Points(3), Y: a.Y + vg.Points(2)}}
		}
		out = append(out, best)
	}
	return out
}

func inRect(p vg.Point, r vg.Rectangle) bool {
	return p.X >= r.Min.X && p.X <= r.Max.X && p.Y >= r.Min.Y && p.Y <= r.Max.Y
}

func overlaps(a, b vg.Rectangle) bool {
	return a.Min.X < b.Max.X && b.Min.X < a.Max.X && a.Min.Y < b.Max.Y && b.Min.Y < a.Max.Y
}

// drawLinearBar draws a plane map's colour bar in r: the gradient from lo
// (bottom) to hi, ticks at round values labelled in teslas (BarTicks), a
// clipped end marked by an arrowhead in its colour and labelled "≥" or
// "≤" its value, the contour levels as white lines across the bar (as
// they are drawn over the map) and the quantity above.
func drawLinearBar(c vg.Canvas, r vg.Rectangle, d PlaneData, lo, hi float64, levels []float64, clipLo, clipHi bool) {
	// The arrowheads take their room from the bar's length.
	top := r.Max.Y + vg.Points(4)
	if clipHi {
		r.Max.Y -= barArrowHeight(r)
	}
	if clipLo {
		r.Min.Y += barArrowHeight(r)
	}
	dc := drawBarGradient(c, r)
	yOf := func(v float64) vg.Length { return r.Min.Y + (r.Max.Y-r.Min.Y)*vg.Length((v-lo)/(hi-lo)) }
	line := draw.LineStyle{Color: contourInk, Width: vg.Points(0.6)}
	for _, v := range levels {
		dc.StrokeLine2(line, r.Min.X, yOf(v), r.Max.X, yOf(v))
	}
	sty := style(TickSize, Muted)
	sty.YAlign = draw.YCenter
	minGap := sty.Height("0") * 1.15
	tick := draw.LineStyle{Color: Ink, Width: vg.Points(0.5)}
	bt := BarTicks(lo, hi)
	var ends []vg.Length
	if clipHi {
		barArrow(c, r, true)
		dc.FillText(sty, vg.Point{X: r.Max.X + vg.Points(3.5), Y: r.Max.Y}, "≥ "+bt.Label(hi))
		ends = append(ends, r.Max.Y)
	}
	if clipLo {
		barArrow(c, r, false)
		dc.FillText(sty, vg.Point{X: r.Max.X + vg.Points(3.5), Y: r.Min.Y}, "≤ "+bt.Label(lo))
		ends = append(ends, r.Min.Y)
	}
	for _, v := range bt.Values {
		y := yOf(v)
		clear := true
		for _, u := range ends {
			clear = clear && math.Abs(float64(y-u)) >= float64(minGap)
		}
		if !clear {
			continue // the clipped end's label stands there
		}
		dc.StrokeLine2(tick, r.Max.X-vg.Points(1.5), y, r.Max.X+vg.Points(2), y)
		dc.FillText(sty, vg.Point{X: r.Max.X + vg.Points(3.5), Y: y}, bt.Label(v))
	}
	title := style(LabelSize, Ink)
	title.XAlign = draw.XCenter
	dc.FillText(title, vg.Point{X: (r.Min.X + r.Max.X) / 2, Y: top}, d.Quantity)
}

// barArrowHeight is the height of a colour bar's end arrowhead.
func barArrowHeight(r vg.Rectangle) vg.Length { return (r.Max.X - r.Min.X) * 0.8 }

// barArrow draws an arrowhead on the top (or bottom) end of the colour
// bar r, filled in the colour of that end: the values beyond the end take
// it.
func barArrow(c vg.Canvas, r vg.Rectangle, top bool) {
	h := barArrowHeight(r)
	y, tip, col := r.Max.Y, r.Max.Y+h, Viridis(1)
	if !top {
		y, tip, col = r.Min.Y, r.Min.Y-h, Viridis(0)
	}
	var path vg.Path
	path.Move(vg.Point{X: r.Min.X, Y: y})
	path.Line(vg.Point{X: (r.Min.X + r.Max.X) / 2, Y: tip})
	path.Line(vg.Point{X: r.Max.X, Y: y})
	path.Close()
	c.SetColor(col)
	c.Fill(path)
	c.SetColor(Muted)
	c.SetLineWidth(ThinWidth)
	c.SetLineDash(nil, 0)
	c.Stroke(path)
}

// LinearTicks are the labelled ticks of a linear colour bar: round
// values (multiples of Step, which is 1, 2, 2.5 or 5 times a power of
// ten) written with one SI prefix for all of them.
type LinearTicks struct {
	Values []float64
	Step   float64
	Prefix Prefix
	Unit   string
	prec   int
}

// Label writes v as the ticks are written: "−100 µT", "0 µT", "2.5 mT".
func (t LinearTicks) Label(v float64) string {
	x := v / t.Prefix.Factor
	if math.Abs(x) < 1e-9*t.Step/t.Prefix.Factor {
		x = 0
	}
	s := strconv.FormatFloat(x, 'f', t.prec, 64)
	if x < 0 {
		s = "−" + s[1:]
	}
	return s + " " + t.Prefix.Symbol + t.Unit
}

// BarTicks chooses a linear colour bar's ticks over [lo, hi] (T): the
// finest step of 1, 2, 2.5 or 5 times a power of ten that leaves at most
// six ticks on the bar, which for any range leaves at least three.
func BarTicks(lo, hi float64) LinearTicks {
	t := LinearTicks{Unit: "T", Prefix: Prefix{"", 1}}
	if !(hi > lo) || math.IsInf(hi-lo, 0) {
		return t
	}
	count := func(step float64) int {
		return int(math.Floor(hi/step+1e-9) - math.Ceil(lo/step-1e-9) + 1)
	}
	mag := math.Pow(10, math.Floor(math.Log10((hi-lo)/10)))
	t.Step = 10 * mag
search:
	for e := 0; e < 4; e++ {
		for _, f := range []float64{1, 2, 2.5, 5} {
			if s := f * mag * math.Pow(10, float64(e)); count(s) <= 6 {
				t.Step = s
				break search
			}
		}
	}
	for k := math.Ceil(lo/t.Step - 1e-9); k <= math.Floor(hi/t.Step+1e-9); k++ {
		t.Values = append(t.Values, k*t.Step)
	}
	m := 0.0
	for _, v := range t.Values {
		m = math.Max(m, math.Abs(v))
	}
	t.Prefix = EngPrefix(m)
	if m == 0 {
		t.Prefix = EngPrefix(t.Step)
	}
	st := t.Step / t.Prefix.Factor
	t.prec = int(math.Max(0, -math.Floor(math.Log10(st)+1e-9)))
	if p := math.Pow(10, float64(t.prec)); math.Abs(st*p-math.Round(st*p)) > 1e-6 {
		t.prec++
	}
	return t
}
