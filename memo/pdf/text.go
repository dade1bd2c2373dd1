package pdf

import (
	"strings"
	"unicode"
	"unicode/utf8"

	"coilmemo/memo/doc"
)

// textStyle is the base style of a run of inline text.
type textStyle struct {
	size   float64
	lead   float64
	color  rgb
	bold   bool
	italic bool
	mono   bool
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
}

func (f frag) sameFace(g frag) bool {
	return f.fam == g.fam && f.sty == g.sty && f.size == g.size && f.color == g.color
}

// word is an unbreakable sequence of fragments followed by an optional
// break opportunity (a space of width space).
type word struct {
	frags []frag
	w     float64
	space frag // the space after the word; text "" if none
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

// layoutSpans breaks document spans into lines (see layoutStyled).
func layoutSpans(spans []doc.Span, base textStyle, first, width float64) []line {
	return layoutStyled(styleSpans(spans, base), first, width)
}

// layoutStyled breaks runs into lines no wider than width. The first line
// may have a different width (first), for hanging labels.
func layoutStyled(runs []styled, first, width float64) []line {
	ws := words(runs)
	var (
		lines []line
		cur   line
		limit = first
		// pending space between the last word on the line and the next
		gap frag
	)
	finish := func() {
		lines = append(lines, cur)
		cur = line{}
		limit = width
		gap = frag{}
	}
	for _, w := range ws {
		need := w.w
		if len(cur.frags) > 0 {
			need += gap.w
		}
		if len(cur.frags) > 0 && cur.w+need > limit+0.01 {
			finish()
		}
		if len(cur.frags) == 0 && w.w > limit+0.01 {
			// A word wider than the line: break it between characters.
			for _, piece := range splitWord(w, limit, width) {
				if len(cur.frags) > 0 {
					finish()
				}
				cur.frags = append(cur.frags, piece.frags...)
				cur.w = piece.w
			}
			gap = w.space
			continue
		}
		if len(cur.frags) > 0 && gap.text != "" {
			cur.frags = append(cur.frags, gap)
			cur.w += gap.w
		}
		cur.frags = append(cur.frags, w.frags...)
		cur.w += w.w
		gap = w.space
	}
	if len(cur.frags) > 0 || len(lines) == 0 {
		lines = append(lines, cur)
	}
	for i := range lines {
		lines[i].frags = mergeFrags(lines[i].frags)
	}
	return lines
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
	if n := len(out); n > 0 {
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
		if f.text != "" {
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
	r.pdf.Text(x, y, f.text)
	if r.onText != nil {
		r.onText(r.pdf.PageNo(), f.text)
	}
}

// simpleText sets a plain string in one style.
func (r *renderer) simpleText(s string, st textStyle, x, y float64) float64 {
	f := makeFrag(st, s)
	r.text(f, x, y)
	return f.w
}
