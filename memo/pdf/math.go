package pdf

import (
	"fmt"
	"strings"
	"sync"

	"coilmemo/doc"
	"coilmemo/memo/mathlayout"
)

// Mathematics is typeset by memo/mathlayout and drawn here: glyph runs as
// text in the embedded serif faces, bars as filled rectangles, roots,
// growing brackets and accents as vector paths.

const (
	sizeMath       = 10.2 // displayed equations
	sizeMathInline = 10.0 // inline mathematics in 9.5 pt running text
	eqDescShare    = 0.3  // description column, share of the text width
	eqGap          = 12.0 // between the description and the equation
	eqLabelW       = 40.0 // room for the equation number at the right
	eqLineGap      = 4.0  // least white between two lines of an equation
	eqBefore       = 7.0
	eqAfter        = 8.0
)

var styEqDesc = textStyle{size: sizeSmall + 0.3, lead: leadSmall + 0.4, color: colMuted}

// drawMath draws a laid-out formula with its baseline's left end at (x, base).
func (r *renderer) drawMath(b mathlayout.Box, x, base float64, c rgb) {
	if r.dry {
		return
	}
	for _, it := range b.Items {
		switch it.Kind {
		case mathlayout.Glyphs:
			r.text(frag{text: it.Text, fam: it.Face.Family, sty: it.Face.Style, size: it.Size, color: c}, x+it.X, base-it.Y)
		case mathlayout.Rule:
			r.fillRect(x+it.X, base-it.Y-it.H, it.W, it.H, c)
		case mathlayout.Path:
			r.mathPath(it, x, base, c)
		}
	}
}

func (r *renderer) mathPath(it mathlayout.Item, x, base float64, c rgb) {
	p := r.pdf
	for _, s := range it.Segs {
		switch s.Op {
		case 'M':
			p.MoveTo(x+s.X, base-s.Y)
		case 'L':
			p.LineTo(x+s.X, base-s.Y)
		case 'C':
			p.CurveBezierCubicTo(x+s.X1, base-s.Y1, x+s.X2, base-s.Y2, x+s.X, base-s.Y)
		case 'Z':
			p.ClosePath()
		}
	}
	if it.Stroke > 0 {
		p.SetDrawColor(c.r, c.g, c.b)
		p.SetLineWidth(it.Stroke)
		p.SetLineCapStyle("round")
		p.SetLineJoinStyle("round")
		p.DrawPath("D")
		p.SetLineCapStyle("butt")
		p.SetLineJoinStyle("miter")
		return
	}
	p.SetFillColor(c.r, c.g, c.b)
	p.DrawPath("F")
}

// ---- displayed equations ----

// eqPart is one source line of an equation as set: a whole line, a
// continuation set on the line above, or one piece of a broken line.
type eqPart struct {
	box    mathlayout.Box
	x      float64 // offset from the equation column's left edge
	result bool
}

// eqLine is one line of an equation as set.
type eqLine struct {
	parts  []eqPart
	base   float64 // baseline below the block's top
	asc    float64
	desc   float64
	broken bool // a piece of a line too long for the column
}

type eqLayout struct {
	desc    []line
	descTop bool    // description above the equation, not beside it
	mathX   float64 // equation column, from the column's left edge
	lines   []eqLine
	label   string
	h       float64
	errs    []error
}

// layoutEquation sets an equation's lines in a column beside its
// description; when a line will not fit there even when broken, the
// description goes above and the equation takes the full width.
func (r *renderer) layoutEquation(e doc.Equation) eqLayout {
	k := eqKey{w: r.w, label: e.Label, desc: e.Description, lines: strings.Join(e.Lines, "\x00"), result: e.Result}
	if el, ok := r.eqs.get(k); ok {
		return el
	}
	el, ok := r.layoutEquationIn(e, false)
	if !ok {
		el, _ = r.layoutEquationIn(e, true)
	}
	r.eqs.put(k, el)
	return el
}

// eqKey is what an equation's layout depends on: its text and the
// column's width (the fonts' metrics are fixed).
type eqKey struct {
	w                  float64
	label, desc, lines string
	result             bool
}

// eqCache keeps the layouts of the equations set so far; each is
// measured, then set, in both passes, and a memo of many like coils
// repeats equations. The layouts are read only once made. Safe for the
// two passes' concurrent use.
type eqCache struct {
	mu sync.Mutex
	m  map[eqKey]eqLayout
}

func (c *eqCache) get(k eqKey) (eqLayout, bool) {
	c.mu.Lock()
	defer c.mu.Unlock()
	el, ok := c.m[k]
	return el, ok
}

func (c *eqCache) put(k eqKey, el eqLayout) {
	c.mu.Lock()
	defer c.mu.Unlock()
	c.m[k] = el
}

// layoutEquationIn sets the lines: a line that starts with a relation sign
// continues the one above, on the same line when both fit (as a hand
// calculation runs on: A = πd²/4 = … = 0.032 mm²), else on a line of its
// own with its sign under the first line's relation sign. A line too wide
// for the column is broken before a sign.
func (r *renderer) layoutEquationIn(e doc.Equation, stacked bool) (eqLayout, bool) {
	el := eqLayout{descTop: stacked}
	if e.Label != "" {
		el.label = "(" + e.Label + ")"
	}
	W := r.w
	descW := eqDescShare * W
	mathX := descW + eqGap
	if stacked {
		mathX = 14
		descW = W - eqLabelW
	}
	mathW := W - mathX - eqLabelW
	if e.Description != "" {
		el.desc = layoutSpans(plainSpans(e.Description), styEqDesc, descW, descW)
	}
	el.mathX = mathX
	opt := mathlayout.Options{Size: sizeMath, Display: true}
	em := sizeMath
	relGap := 5.0 / 18 * em // the space before a relation sign
	fits := true
	align := -1.0 // x of the first line's relation sign
	for i, src := range e.Lines {
		result := e.Result && i == len(e.Lines)-1
		whole, err := mathlayout.Layout(src, opt)
		if err != nil {
			el.errs = append(el.errs, err)
		}
		cont := i > 0 && whole.Align == 0
		// run on: the line above ends with room for this one
		if cont && len(el.lines) > 0 && !el.lines[len(el.lines)-1].broken {
			last := &el.lines[len(el.lines)-1]
			end := last.parts[len(last.parts)-1]
			x := end.x + end.box.Width + relGap
			if x+whole.Width <= mathW {
				last.parts = append(last.parts, eqPart{box: whole, x: x, result: result})
				continue
			}
		}
		x := 0.0
		if cont {
			x = 2 * em
			if align >= 0 {
				x = align
			}
		}
		boxes := []mathlayout.Box{whole}
		if x+whole.Width > mathW && err == nil {
			boxes, _ = mathlayout.Lines(src, opt, mathW-x)
		}
		for k, b := range boxes {
			bx := x
			if k > 0 {
				// a broken line's continuation: a relation lines up with
				// the relation signs, a binary sign goes further in
				if b.Align >= 0 && b.Align < em {
					bx = max(x, align)
				} else {
					bx = max(x, align) + 1.5*em
				}
			}
			if bx+b.Width > mathW+0.01 {
				fits = false
			}
			el.lines = append(el.lines, eqLine{parts: []eqPart{{box: b, x: bx, result: result}}, broken: len(boxes) > 1})
		}
		if i == 0 && whole.Align >= 0 {
			align = whole.Align
		}
	}
	if !fits && !stacked {
		return el, false
	}
	// Baselines.
	y := 0.0
	if stacked && len(el.desc) > 0 {
		y = float64(len(el.desc))*styEqDesc.lead + 2
	}
	for i := range el.lines {
		l := &el.lines[i]
		for _, p := range l.parts {
			l.asc = max(l.asc, p.box.Ascent)
			l.desc = max(l.desc, p.box.Descent)
		}
		if i == 0 {
			y += max(l.asc, 0.75*em)
		} else {
			y += max(el.lines[i-1].desc+eqLineGap+l.asc, 1.45*em)
		}
		l.base = y
	}
	h := y
	if n := len(el.lines); n > 0 {
		h += max(el.lines[n-1].desc, 0.25*em)
	}
	if !stacked && len(el.desc) > 0 && len(el.lines) > 0 {
		// the description's first baseline on the first line's
		top := el.lines[0].base - baselineOffset(styEqDesc.size, styEqDesc.lead)
		h = max(h, top+float64(len(el.desc))*styEqDesc.lead)
	}
	el.h = h
	return el, true
}

func (r *renderer) equation(e doc.Equation) {
	el := r.layoutEquation(e)
	r.need(eqBefore, el.h)
	top := r.y
	x0 := r.x
	if len(el.desc) > 0 {
		y := top
		if !el.descTop && len(el.lines) > 0 {
			y = top + el.lines[0].base - baselineOffset(styEqDesc.size, styEqDesc.lead)
		}
		for _, l := range el.desc {
			r.drawLine(l, x0, y+baselineOffset(styEqDesc.size, styEqDesc.lead))
			y += styEqDesc.lead
		}
	}
	for _, l := range el.lines {
		for _, p := range l.parts {
			c := colInk
			if p.result {
				c = colAccent
			}
			r.drawMath(p.box, x0+el.mathX+p.x, top+l.base, c)
		}
	}
	if el.label != "" && len(el.lines) > 0 {
		st := textStyle{size: sizeSmall + 0.5, lead: leadSmall, color: colMuted}
		w := textWidthOf("sans", "", st.size, el.label)
		r.simpleText(el.label, st, x0+r.w-w, top+el.lines[0].base)
	}
	r.y = top + el.h
	r.after(eqAfter)
}

// ---- inline mathematics ----

// mathFrag lays out inline notation as one unbreakable fragment.
func mathFrag(st textStyle, src string) frag {
	size := sizeMathInline * st.size / sizeBody
	b, _ := mathlayout.Layout(src, mathlayout.Options{Size: size})
	return frag{size: st.size, color: st.color, w: b.Width, math: &b}
}

// MathError reports whether notation cannot be read, for tests of the
// documents the memo composes.
func MathError(src string) error {
	_, err := mathlayout.Layout(src, mathlayout.Options{Size: sizeMath})
	if err != nil {
		return fmt.Errorf("%q: %w", src, err)
	}
	return nil
}
