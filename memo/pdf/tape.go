package pdf

import (
	"image"
	"image/color"
	"sync"
	"sync/atomic"

	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/vg"

	"coilmemo/doc"
)

// Figures drawn ahead. Building a plot (ticks, labels measured, contours
// traced, a map's raster coloured and PNG-encoded) costs far more than
// sending the finished strokes to the page, and does not depend on the
// page. While the set pass lays out the text, one goroutine draws the
// figures, in the order the dry pass places them, into tapes: vg.Canvas
// recordings of every call with its arguments copied, the images already
// encoded. When the set pass reaches a figure it replays the tape onto
// the page's Canvas: the same calls in the same order, so the bytes are
// those of drawing on the spot. A figure the worker has not begun yet is
// drawn on the spot as before. A figure's Draw must therefore give the
// same drawing however often it is called.

// tape is a vg.Canvas that records the calls made on it.
type tape struct {
	w, h vg.Length
	ops  []func(c *Canvas)
}

var _ vg.CanvasSizer = (*tape)(nil)

func (t *tape) Size() (vg.Length, vg.Length) { return t.w, t.h }

func (t *tape) SetLineWidth(w vg.Length) {
	t.ops = append(t.ops, func(c *Canvas) { c.SetLineWidth(w) })
}

func (t *tape) SetLineDash(pattern []vg.Length, offset vg.Length) {
	p := append([]vg.Length(nil), pattern...)
	t.ops = append(t.ops, func(c *Canvas) { c.SetLineDash(p, offset) })
}

func (t *tape) SetColor(col color.Color) {
	t.ops = append(t.ops, func(c *Canvas) { c.SetColor(col) })
}

func (t *tape) Rotate(rad float64) { t.ops = append(t.ops, func(c *Canvas) { c.Rotate(rad) }) }

func (t *tape) Translate(pt vg.Point) { t.ops = append(t.ops, func(c *Canvas) { c.Translate(pt) }) }

func (t *tape) Scale(x, y float64) { t.ops = append(t.ops, func(c *Canvas) { c.Scale(x, y) }) }

func (t *tape) Push() { t.ops = append(t.ops, (*Canvas).Push) }

func (t *tape) Pop() { t.ops = append(t.ops, (*Canvas).Pop) }

func (t *tape) Stroke(p vg.Path) {
	q := append(vg.Path(nil), p...)
	t.ops = append(t.ops, func(c *Canvas) { c.Stroke(q) })
}

func (t *tape) Fill(p vg.Path) {
	q := append(vg.Path(nil), p...)
	t.ops = append(t.ops, func(c *Canvas) { c.Fill(q) })
}

func (t *tape) FillString(f font.Face, pt vg.Point, s string) {
	t.ops = append(t.ops, func(c *Canvas) { c.FillString(f, pt, s) })
}

// DrawImage encodes the image now (the costly part) and places it on
// replay.
func (t *tape) DrawImage(rect vg.Rectangle, img image.Image) {
	enc, err := encodeImage(img)
	t.ops = append(t.ops, func(c *Canvas) { c.placeImage(rect, enc, err) })
}

// replay makes the recorded calls on c.
func (t *tape) replay(c *Canvas) {
	for _, op := range t.ops {
		op(c)
	}
}

// figureKey identifies a figure of a document and the size it is drawn
// at (points).
type figureKey struct {
	number  int
	caption string
	w, h    float64
}

// drawn is one figure drawn ahead: claimed by whoever draws it first
// (the worker, or the set pass when the worker has not begun it); done is
// closed when the worker has finished with it, t nil if its Draw failed.
type drawn struct {
	f       doc.Figure
	w, h    float64
	claimed atomic.Bool
	done    chan struct{}
	t       *tape
}

// ahead is the figures of one document drawn ahead. The dry pass, which
// runs well ahead of the set pass and places every figure exactly where
// and at the size the set pass will, submits each figure as it places it;
// one worker draws them in that order; the set pass takes them.
type ahead struct {
	mu   sync.Mutex
	m    map[figureKey]*drawn
	jobs chan *drawn
}

// newAhead returns the drawing-ahead of a document with up to n figures
// and starts its worker, which ends when the submissions are closed.
func newAhead(n int) *ahead {
	a := &ahead{m: map[figureKey]*drawn{}, jobs: make(chan *drawn, n)}
	go func() {
		for d := range a.jobs {
			if !d.claimed.CompareAndSwap(false, true) {
				continue // the set pass got there first
			}
			d.t = record(d.f, d.w, d.h)
			close(d.done)
		}
	}()
	return a
}

// countFigures is the number of figures in blocks, lists included.
func countFigures(blocks []doc.Block) int {
	n := 0
	for _, b := range blocks {
		switch b := b.(type) {
		case doc.Figure:
			n++
		case doc.List:
			for _, it := range b.Items {
				n += countFigures(it)
			}
		}
	}
	return n
}

// submit asks for figure f to be drawn at w × h points (a numbered
// figure with a drawing, once per key, while there is room).
func (a *ahead) submit(f doc.Figure, w, h float64) {
	if a == nil || f.Number <= 0 || f.Draw == nil {
		return
	}
	k := figureKey{f.Number, f.Caption, w, h}
	a.mu.Lock()
	defer a.mu.Unlock()
	if _, ok := a.m[k]; ok {
		return
	}
	d := &drawn{f: f, w: w, h: h, done: make(chan struct{})}
	select {
	case a.jobs <- d:
		a.m[k] = d
	default:
	}
}

// close ends the submissions.
func (a *ahead) close() {
	if a != nil {
		close(a.jobs)
	}
}

// record draws f into a tape of w × h points; nil if Draw panics (the set
// pass then draws it on the spot and reports the failure itself).
func record(f doc.Figure, w, h float64) (t *tape) {
	defer func() {
		if p := recover(); p != nil {
			t = nil
		}
	}()
	t = &tape{w: vgLen(w), h: vgLen(h)}
	f.Draw(t, t.w, t.h)
	return t
}

// take returns the tape of figure f drawn at w × h points, waiting for the
// worker if it is drawing it, or nil when the set pass must draw it: not
// submitted, not begun by the worker (it is then left to the set pass), or
// failed.
func (a *ahead) take(f doc.Figure, w, h float64) *tape {
	if a == nil {
		return nil
	}
	a.mu.Lock()
	d, ok := a.m[figureKey{f.Number, f.Caption, w, h}]
	a.mu.Unlock()
	if !ok || d.claimed.CompareAndSwap(false, true) {
		return nil
	}
	<-d.done
	return d.t
}
