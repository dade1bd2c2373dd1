package pdf

import (
	"strings"
	"sync"
	"unicode"
	"unicode/utf8"

	"coilmemo/doc"
	"coilmemo/memo/mathlayout"
)

// textStyle is the base style of a run of inline text.
type textStyle struct {
	size   float64
	lead   float64
	color  rgb
	bold   bool
	italic bool
	mono   bool
	math   bool // the text is notation, set as inline mathematics
}

// face returns the fpdf family and style for the style.
func (s textStyle) face() (string, string) {
	st := ""
	if s.bold {
		st += "B"
	}
	if s.mono {
		return "mono", st
	}
	if s.italic {
		st += "I"
	}
	return "sans", st
}

// frag is a piece of text in one face.
type frag struct {
	text  string
	fam   string
	sty   string
	size  float64
	color rgb
	w     float64
	math  *mathlayout.Box // inline mathematics, drawn instead of text
}

func (f frag) sameFace(g frag) bool {
	return f.math == nil && g.math == nil && f.fam == g.fam && f.sty == g.sty && f.size == g.size && f.color == g.color
}

// word is an unbreakable sequence of fragments followed by an optional
// break opportunity (a space of width space).
type word struct {
	frags []frag
	w     float64
	space frag // the space after the word; text "" if none
	glue  bool // no line break at the space after the word
}

// line is one laid-out line of text.
type line struct {
	frags []frag
	w     float64
}

// spanStyle returns the face of a span on top of a base style.
func spanStyle(base textStyle, sp doc.Span) textStyle {
	s := base
	if sp.Strong {
		s.bold = true
	}
	if sp.Emph {
		s.italic = true
	}
	if sp.Code {
		s.mono = true
		s.size = base.size * 0.92
	}
	if sp.Math {
		s.math = true
	}
	return s
}

func makeFrag(s textStyle, text string) frag {
	fam, sty := s.face()
	return frag{text: text, fam: fam, sty: sty, size: s.size, color: s.color, w: textWidthOf(fam, sty, s.size, text)}
}

// isBreakSpace reports whether r is a space at which a line may break.
func isBreakSpace(r rune) bool {
	return r == ' ' || r == '\t' || r == '\n' || r == '\r' || r == '\u2009'
}

// styled is a run of text in one style.
type styled struct {
	text string
	st   textStyle
}

// styleSpans resolves document spans against a base style.
func styleSpans(spans []doc.Span, base textStyle) []styled {
	out := make([]styled, len(spans))
	for i, sp := range spans {
		out[i] = styled{sp.Text, spanStyle(base, sp)}
	}
	return out
}

// words splits styled runs into words. Runs of break spaces collapse to one.
func words(runs []styled) []word {
	var (
		out []word
		cur word
	)
	flush := func(space frag) {
		if len(cur.frags) > 0 {
			cur.space = space
			out = append(out, cur)
			cur = word{}
		} else if len(out) > 0 && out[len(out)-1].space.text == "" {
			out[len(out)-1].space = space
		}
	}
	for _, run := range runs {
		st := run.st
		text := run.text
		if st.math {
			// a formula is one unbreakable piece of its word
			f := mathFrag(st, text)
			cur.frags = append(cur.frags, f)
			cur.w += f.w
			continue
		}
		for text != "" {
			i := strings.IndexFunc(text, isBreakSpace)
			if i < 0 {
				i = len(text)
			}
			if i > 0 {
				f := makeFrag(st, text[:i])
				cur.frags = append(cur.frags, f)
				cur.w += f.w
				text = text[i:]
				continue
			}
			// skip the run of spaces
			j := strings.IndexFunc(text, func(r rune) bool { return !isBreakSpace(r) })
			if j < 0 {
				j = len(text)
			}
			flush(makeFrag(st, " "))
			text = text[j:]
		}
	}
	flush(frag{})
	return out
}

// lines is layoutSpans for spans of the document, kept in the renderer's
// text cache: a paragraph is measured for keeping with its neighbours and
// then set, in both passes, from the same spans.
func (r *renderer) lines(spans []doc.Span, base textStyle, first, width float64) []line {
	if len(spans) == 0 || r.texts == nil {
		return layoutSpans(spans, base, first, width)
	}
	k := textKey{at: &spans[0], n: len(spans), base: base, first: first, width: width}
	if ls, ok := r.texts.get(k); ok {
		return ls
	}
	ls := layoutSpans(spans, base, first, width)
	r.texts.put(k, ls)
	return ls
}

// textKey is what the lines of document spans depend on: the spans (the
// document's, which do not change while it is set), the base style and
// the widths.
type textKey struct {
	at           *doc.Span
	n            int
	base         textStyle
	first, width float64
}

// textCache keeps the lines of the document's text laid out so far; the
// lines are read only once made. Safe for the two passes' concurrent use.
type textCache struct {
	mu sync.Mutex
	m  map[textKey][]line
}

func (c *textCache) get(k textKey) ([]line, bool) {
	c.mu.Lock()
	defer c.mu.Unlock()
	ls, ok := c.m[k]
	return ls, ok
}

func (c *textCache) put(k textKey, ls []line) {
	c.mu.Lock()
	defer c.mu.Unlock()
	c.m[k] = ls
}

// layoutSpans breaks document spans into lines (see layoutStyled).
func layoutSpans(spans []doc.Span, base textStyle, first, width float64) []line {
	return layoutStyled(styleSpans(spans, base), first, width)
}

// layoutStyled breaks runs into lines no wider than width (the first line
// no wider than first). Lines break at spaces, but not between a number
// and a short word after it ("61 °C", "12.57 mT", "8 layers") nor before
// a relation sign ("k =" stays together), unless a line holds nothing else.
func layoutStyled(runs []styled, first, width float64) []line {
	ws := fitWords(words(runs), min(first, width))
	setGlue(ws)
	var (
		lines []line
		start int
		lineW float64
		limit = first
	)
	emit := func(from, to int) { // words[from..to] inclusive
		var l line
		for j := from; j <= to; j++ {
			l.frags = append(l.frags, ws[j].frags...)
			l.w += ws[j].w
			if j < to && ws[j].space.text != "" {
				l.frags = append(l.frags, ws[j].space)
				l.w += ws[j].space.w
			}
		}
		l.frags = mergeFrags(l.frags)
		lines = append(lines, l)
	}
	for i := 0; i < len(ws); {
		add := ws[i].w
		if i > start {
			add += ws[i-1].space.w
		}
		if i > start && lineW+add > limit+0.01 {
			k := i - 1
			for k >= start && ws[k].glue {
				k--
			}
			if k < start {
				k = i - 1
			}
			emit(start, k)
			start, limit, lineW = k+1, width, 0
			for j := start; j < i; j++ {
				lineW += ws[j].w
				if j > start {
					lineW += ws[j-1].space.w
				}
			}
			continue
		}
		lineW += add
		i++
	}
	if start < len(ws) {
		emit(start, len(ws)-1)
	}
	if len(lines) == 0 {
		lines = append(lines, line{})
	}
	return lines
}

// fitWords splits words wider than width between characters.
func fitWords(ws []word, width float64) []word {
	var out []word
	for _, w := range ws {
		if w.w <= width+0.01 {
			out = append(out, w)
			continue
		}
		pieces := splitWord(w, width, width)
		for k := range pieces {
			if k == len(pieces)-1 {
				pieces[k].space = w.space
			}
			out = append(out, pieces[k])
		}
	}
	return out
}

// setGlue marks the spaces at which a line should not break.
func setGlue(ws []word) {
	for i := 0; i+1 < len(ws); i++ {
		if ws[i].space.text == "" {
			continue
		}
		prev, _ := utf8.DecodeLastRuneInString(ws[i].frags[len(ws[i].frags)-1].text)
		next := wordText(ws[i+1])
		r0, _ := utf8.DecodeRuneInString(next)
		switch {
		case unicode.IsNumber(prev) && !unicode.IsDigit(r0) && utf8.RuneCountInString(next) <= 6:
			ws[i].glue = true
		case isRelation(next):
			ws[i].glue = true
		}
	}
}

func wordText(w word) string {
	var b strings.Builder
	for _, f := range w.frags {
		b.WriteString(f.text)
	}
	return b.String()
}

func isRelation(s string) bool {
	switch s {
	case "=", "≈", "≤", "≥", "<", ">", "≠", "×", "·", "±", "+", "−", "→", "∝":
		return true
	}
	return false
}

// splitWord cuts an over-long word into pieces, the first at most first
// wide and the others at most width wide.
func splitWord(w word, first, width float64) []word {
	var (
		out   []word
		cur   word
		limit = first
	)
	for _, f := range w.frags {
		if f.math != nil {
			if cur.w+f.w > limit && len(cur.frags) > 0 {
				out = append(out, cur)
				cur = word{}
				limit = width
			}
			cur.frags = append(cur.frags, f)
			cur.w += f.w
			continue
		}
		rest := f.text
		for rest != "" {
			// take as many runes as fit
			n, used := 0, 0.0
			for n < len(rest) {
				r, size := utf8.DecodeRuneInString(rest[n:])
				rw := textWidthOf(f.fam, f.sty, f.size, string(r))
				if cur.w+used+rw > limit && (n > 0 || len(cur.frags) > 0) {
					break
				}
				n += size
				used += rw
			}
			if n > 0 {
				piece := f
				piece.text = rest[:n]
				piece.w = used
				cur.frags = append(cur.frags, piece)
				cur.w += used
				rest = rest[n:]
			}
			if rest != "" {
				out = append(out, cur)
				cur = word{}
				limit = width
			}
		}
	}
	if len(cur.frags) > 0 {
		out = append(out, cur)
	}
	return out
}

// mergeFrags joins neighbouring fragments of the same face.
func mergeFrags(fs []frag) []frag {
	var out []frag
	for _, f := range fs {
		if n := len(out); n > 0 && out[n-1].sameFace(f) {
			out[n-1].text += f.text
			out[n-1].w += f.w
			continue
		}
		out = append(out, f)
	}
	// a trailing space carries no ink
	if n := len(out); n > 0 && out[n-1].math == nil {
		t := strings.TrimRightFunc(out[n-1].text, unicode.IsSpace)
		if t != out[n-1].text {
			out[n-1].w = textWidthOf(out[n-1].fam, out[n-1].sty, out[n-1].size, t)
			out[n-1].text = t
		}
	}
	return out
}

func plainSpans(s string) []doc.Span { return []doc.Span{{Text: s}} }

// baselineOffset is the distance from the top of a line box to its
// baseline: the box's centre line sits half a cap height above the baseline.
func baselineOffset(size, lead float64) float64 {
	return lead/2 + 0.36*size
}

// drawLine sets one line with its left end at x and baseline at y.
func (r *renderer) drawLine(l line, x, y float64) {
	for _, f := range l.frags {
		switch {
		case f.math != nil:
			r.drawMath(*f.math, x, y, f.color)
		case f.text != "":
			r.text(f, x, y)
		}
		x += f.w
	}
}

// text sets one fragment.
func (r *renderer) text(f frag, x, y float64) {
	if r.dry {
		return
	}
	r.fonts.use(f.fam, f.sty, f.size)
	r.pdf.SetTextColor(f.color.r, f.color.g, f.color.b)
	r.pdf.Text(x, y, bmp(f.text))
	if r.onText != nil {
		r.onText(r.pdf.PageNo(), f.text)
	}
	if r.onPlace != nil {
		r.onPlace(r.pdf.PageNo(), x, y, f.text)
	}
}

// simpleText sets a plain string in one style.
func (r *renderer) simpleText(s string, st textStyle, x, y float64) float64 {
	f := makeFrag(st, s)
	r.text(f, x, y)
	return f.w
}
