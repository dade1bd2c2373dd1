package mathlayout

// Box is laid-out mathematics. Lengths are points; coordinates have their
// origin at the left end of the baseline, x to the right and y upwards.
type Box struct {
	Width   float64
	Ascent  float64 // extent above the baseline
	Descent float64 // extent below the baseline (positive)
	Items   []Item
	// Align is the x of the first relation sign (=, ≈, ≤ …) of the top
	// level, where the lines of a derivation line up; -1 without one.
	Align float64
}

// Kind is the kind of a drawing item.
type Kind int

const (
	// Glyphs is a run of text in one face: Face, Size, Text, with the left
	// end of its baseline at (X, Y).
	Glyphs Kind = iota
	// Rule is a filled rectangle with its lower left corner at (X, Y),
	// W wide and H high: fraction bars, overbars.
	Rule
	// Path is a drawn sign (a root, a growing bracket, an accent): Segs in
	// absolute coordinates, stroked with line width Stroke or filled.
	Path
)

// Item is one thing to draw.
type Item struct {
	Kind   Kind
	X, Y   float64
	W, H   float64
	Face   Face
	Size   float64
	Text   string
	Segs   []Seg
	Stroke float64 // line width of a stroked path; 0 for a filled one
}

// Seg is a path segment: 'M' move to (X, Y), 'L' line to (X, Y), 'C' cubic
// Bézier curve through controls (X1, Y1), (X2, Y2) to (X, Y), 'Z' close.
type Seg struct {
	Op             byte
	X, Y           float64
	X1, Y1, X2, Y2 float64
}

// box is a box under construction, with what the layout of its
// neighbours needs to know.
type box struct {
	w, h, d float64
	items   []Item
	ic      float64 // italic correction: how far the ink leans past the advance
	char    bool    // a single character (scripts attach to it closely)
	inkL    float64 // a single character's ink: left and right edges
	inkR    float64
	italic  bool
}

// place appends b's items moved by (dx, dy).
func (o *box) place(b box, dx, dy float64) {
	for _, it := range b.items {
		it.X += dx
		it.Y += dy
		if len(it.Segs) > 0 {
			segs := make([]Seg, len(it.Segs))
			for i, s := range it.Segs {
				s.X += dx
				s.Y += dy
				s.X1 += dx
				s.Y1 += dy
				s.X2 += dx
				s.Y2 += dy
				segs[i] = s
			}
			it.Segs = segs
		}
		o.items = append(o.items, it)
	}
}

// Translate returns the box's items moved by (dx, dy), for a backend that
// wants them placed.
func (b Box) Translate(dx, dy float64) []Item {
	var o box
	o.place(box{items: b.Items}, dx, dy)
	return o.items
}
