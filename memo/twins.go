package memo

import (
	"fmt"
	"hash"
	"hash/fnv"
	"image"
	"image/color"
	"math"
	"regexp"
	"slices"
	"strconv"
	"strings"

	"coilmemo/doc"

	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/vg"
)

// A set of like coils — three torquers of one winding on three axes —
// would repeat the same derivation coil by coil. A coil's part of a
// section that repeats an earlier coil's part of it word for word,
// number for number and drawing for drawing, its name, figure and
// equation numbers aside, is not written again: the earlier part's
// heading names both coils and a sentence under it says so. Whether
// parts repeat is decided from what they say, not from the inputs, so
// a difference anywhere (a mounting, a drive, an orientation that
// changes the convection) keeps them apart.

// coilPart is one coil's part of the section being written.
type coilPart struct {
	head  int      // index in c.blocks of the part's heading
	end   int      // index in c.blocks just past the part
	names []string // the coils it stands for, quoted
	title func(names string) string
	key   string // the part's text, normalised (partKey)
	draws []uint64
	figs  int // its figure count
}

// coilPart writes coil name's part of the current section: a level-2
// heading title(`coil "name"`) and what write adds after it, unless the
// part repeats one written earlier in the section, which then stands
// for both.
func (c *composer) coilPart(name string, title func(names string) string, write func()) {
	quoted := strconv.Quote(name)
	start, fig0 := len(c.blocks), c.figure
	c.heading(2, title("coil "+quoted))
	write()
	part := c.blocks[start:]
	key, figs := partKey(part, quoted)
	for k := range c.parts {
		q := &c.parts[k]
		if q.key != key || q.figs != len(figs) {
			continue
		}
		if q.draws == nil {
			q.draws = drawPrints(c.blocks[q.head:q.end])
		}
		if !slices.Equal(q.draws, drawPrints(part)) {
			continue
		}
		c.blocks = c.blocks[:start]
		c.figure = fig0
		c.joinPart(k, quoted, func(first, others string) string {
			return fmt.Sprintf("What follows is written for coil %s and holds unchanged for %s: the same winding at the same drive gives the same results here.", first, others)
		})
		return
	}
	c.parts = append(c.parts, coilPart{head: start, end: len(c.blocks), names: []string{quoted}, title: title, key: key, figs: len(figs)})
}

// joinPart makes part k of the section stand for coil quoted too: its
// heading names every coil it stands for, and the sentence under it
// (note, given the first coil and the others) says so.
func (c *composer) joinPart(k int, quoted string, note func(first, others string) string) {
	q := &c.parts[k]
	q.names = append(q.names, quoted)
	c.blocks[q.head] = doc.Heading{Level: 2, Text: q.title("coils " + joinAnd(q.names))}
	p := doc.Text(note(q.names[0], coilList(q.names[1:])))
	if len(q.names) > 2 {
		c.blocks[q.head+1] = p
		return
	}
	c.blocks = slices.Insert(c.blocks, q.head+1, doc.Block(p))
	q.end++
	for m := k + 1; m < len(c.parts); m++ {
		c.parts[m].head++
		c.parts[m].end++
	}
}

// partOf is the index in c.parts of the part written for coil name.
func (c *composer) partOf(name string) int {
	return slices.IndexFunc(c.parts, func(p coilPart) bool { return p.names[0] == strconv.Quote(name) })
}

// coilList is "coil "a"" or "coils "a", "b" and "c"".
func coilList(quoted []string) string {
	if len(quoted) == 1 {
		return "coil " + quoted[0]
	}
	return "coils " + joinAnd(quoted)
}

var figureRef, number = regexp.MustCompile(`Figures? \d+((–|, | and )\d+)*`), regexp.MustCompile(`\d+`)

// partKey is a part's text with its coil's quoted name, its equations'
// labels and the numbers of its own figures replaced by placeholders, and
// the part's figure numbers in order.
func partKey(part []doc.Block, quoted string) (string, []int) {
	var figs []int
	for _, b := range part {
		if f, ok := b.(doc.Figure); ok {
			figs = append(figs, f.Number)
		}
	}
	var s strings.Builder
	for _, b := range part[1:] { // the heading names the coil alone
		switch v := b.(type) {
		case doc.Equation:
			v.Label = "#"
			b = v
		case doc.Figure:
			v.Number = 0
			b = v
		}
		t := strings.ReplaceAll(doc.BlockText(b), quoted, "\x00")
		t = figureRef.ReplaceAllStringFunc(t, func(ref string) string {
			return number.ReplaceAllStringFunc(ref, func(n string) string {
				v, _ := strconv.Atoi(n)
				if k := slices.Index(figs, v); k >= 0 {
					return "#" + strconv.Itoa(k)
				}
				return n
			})
		})
		s.WriteString(t)
	}
	return s.String(), figs
}

// drawPrints are fingerprints of the drawings of a part's figures.
func drawPrints(part []doc.Block) []uint64 {
	out := []uint64{}
	for _, b := range part {
		if f, ok := b.(doc.Figure); ok && f.Draw != nil {
			h := printCanvas{fnv.New64a()}
			f.Draw(h, f.Width, f.Height)
			out = append(out, h.Sum64())
		}
	}
	return out
}

// printCanvas is a vg.Canvas that only hashes what is drawn on it.
type printCanvas struct{ hash.Hash64 }

func (p printCanvas) put(vs ...float64) {
	for _, v := range vs {
		p.putU(math.Float64bits(v))
	}
}

func (p printCanvas) putU(u uint64) {
	var b [8]byte
	for i := range b {
		b[i] = byte(u >> (8 * i))
	}
	p.Write(b[:])
}

func (p printCanvas) path(op string, pa vg.Path) {
	p.Write([]byte(op))
	for _, c := range pa {
		p.put(float64(c.Type), float64(c.Pos.X), float64(c.Pos.Y), float64(c.Radius), c.Start, c.Angle)
		for _, q := range c.Control {
			p.put(float64(q.X), float64(q.Y))
		}
	}
}

func (p printCanvas) SetLineWidth(w vg.Length) { p.Write([]byte("w")); p.put(float64(w)) }
func (p printCanvas) SetLineDash(d []vg.Length, o vg.Length) {
	p.Write([]byte("d"))
	for _, x := range d {
		p.put(float64(x))
	}
	p.put(float64(o))
}
func (p printCanvas) SetColor(c color.Color) {
	p.Write([]byte("c"))
	if c != nil {
		r, g, b, a := c.RGBA()
		p.put(float64(r), float64(g), float64(b), float64(a))
	}
}
func (p printCanvas) Rotate(a float64) { p.Write([]byte("r")); p.put(a) }
func (p printCanvas) Translate(pt vg.Point) {
	p.Write([]byte("t"))
	p.put(float64(pt.X), float64(pt.Y))
}
func (p printCanvas) Scale(x, y float64) { p.Write([]byte("s")); p.put(x, y) }
func (p printCanvas) Push()              { p.Write([]byte("(")) }
func (p printCanvas) Pop()               { p.Write([]byte(")")) }
func (p printCanvas) Stroke(pa vg.Path)  { p.path("S", pa) }
func (p printCanvas) Fill(pa vg.Path)    { p.path("F", pa) }
func (p printCanvas) FillString(f font.Face, pt vg.Point, text string) {
	p.Write([]byte("T" + f.Name() + text))
	p.put(float64(f.Font.Size), float64(pt.X), float64(pt.Y))
}
func (p printCanvas) DrawImage(r vg.Rectangle, img image.Image) {
	p.Write([]byte("I"))
	p.put(float64(r.Min.X), float64(r.Min.Y), float64(r.Max.X), float64(r.Max.Y))
	bd := img.Bounds()
	for y := bd.Min.Y; y < bd.Max.Y; y++ {
		for x := bd.Min.X; x < bd.Max.X; x++ {
			r, g, b, a := img.At(x, y).RGBA()
			p.putU(uint64(r)<<48 | uint64(g)<<32 | uint64(b)<<16 | uint64(a))
		}
	}
}
