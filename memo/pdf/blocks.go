package pdf

import (
	"fmt"
	"math"
	"strings"

	"coilmemo/doc"
)

var (
	styBody    = textStyle{size: sizeBody, lead: leadBody, color: colInk}
	styCaption = textStyle{size: sizeCaption, lead: leadCaption, color: colInk}
	styTable   = textStyle{size: sizeTable, lead: leadTable, color: colInk}
	styCode    = textStyle{size: sizeCode, lead: leadCode, color: colInk, mono: true}
	styMarker  = textStyle{size: sizeBody, lead: leadBody, color: colAccent}
)

// ---- headings ----

type headingStyle struct {
	st          textStyle
	before      float64
	after       float64
	rule        bool
	numberWidth float64
}

func headingStyleFor(level int) headingStyle {
	switch level {
	case 1:
		return headingStyle{st: textStyle{size: sizeH1, lead: 17, color: colAccent, bold: true}, before: 20, after: 8, rule: true, numberWidth: 28}
	case 2:
		return headingStyle{st: textStyle{size: sizeH2, lead: 14.5, color: colInk, bold: true}, before: 14, after: 5}
	default:
		return headingStyle{st: textStyle{size: sizeH3, lead: 13, color: colInk, bold: true, italic: true}, before: 10, after: 3}
	}
}

const headingRuleGap = 3.5

type headingLayout struct {
	hs     headingStyle
	number string
	lines  []line
	h      float64
}

func (r *renderer) layoutHeading(h doc.Heading, number int) headingLayout {
	hs := headingStyleFor(h.Level)
	hl := headingLayout{hs: hs}
	indent := 0.0
	if h.Level <= 1 {
		hl.number = fmt.Sprint(number)
		fam, sty := hs.st.face()
		indent = max(hs.numberWidth, textWidthOf(fam, sty, hs.st.size, hl.number)+8)
		hl.hs.numberWidth = indent
	}
	hl.lines = layoutSpans(plainSpans(h.Text), hs.st, r.w-indent, r.w-indent)
	hl.h = float64(len(hl.lines)) * hs.st.lead
	if hs.rule {
		hl.h += headingRuleGap
	}
	return hl
}

func (r *renderer) heading(h doc.Heading, next doc.Block) {
	number := r.h1
	if h.Level <= 1 {
		number++
	}
	hl := r.layoutHeading(h, number)
	if hl.h+hl.hs.after > (bodyBottom-bodyTop)/2 {
		// Too long to keep on a page with what follows: its lines flow
		// over the pages like a paragraph's.
		r.longHeading(h, hl, number)
		return
	}
	// Keep the heading with the start of what follows it (with a lead-in
	// and its figure both, when that is what follows), and never start
	// one in the bottom 15 % of the text area.
	keep := r.minHeight(next)
	if r.depth == 0 && len(r.rest) > 0 {
		keep = r.keepFrom(0)
	}
	floor := bodyTop + headingFloor*(bodyBottom-bodyTop)
	// The headings right below it start no lower than the floor either.
	below := r.y + max(r.space, hl.hs.before) + hl.h + hl.hs.after
	for k := 0; r.depth == 0 && k+1 < len(r.rest); k++ {
		hn, ok := r.rest[k].(doc.Heading)
		if !ok {
			break
		}
		nl := r.layoutHeading(hn, 0)
		if below+nl.hs.before > floor {
			below = math.Inf(1)
			break
		}
		below += nl.hs.before + nl.h + nl.hs.after
	}
	if !r.fresh && (hl.h+hl.hs.after+keep > r.room(hl.hs.before) ||
		r.y+max(r.space, hl.hs.before) > floor || math.IsInf(below, 1) || r.closingWhole(h, hl)) {
		r.newPage()
	}
	r.need(hl.hs.before, hl.h)
	r.headingBookmark(h, hl, number)
	y := r.y
	x := r.x
	if hl.number != "" {
		r.simpleText(hl.number, hl.hs.st, x, y+baselineOffset(hl.hs.st.size, hl.hs.st.lead))
		x += hl.hs.numberWidth
	}
	for _, l := range hl.lines {
		r.drawLine(l, x, y+baselineOffset(hl.hs.st.size, hl.hs.st.lead))
		y += hl.hs.st.lead
	}
	if hl.hs.rule {
		r.rule(r.x, y+1.5, r.x+r.w, 0.5, colRule)
		y += headingRuleGap
	}
	r.y = y
	r.after(hl.hs.after)
}

func (r *renderer) headingBookmark(h doc.Heading, hl headingLayout, number int) {
	r.headPages = append(r.headPages, r.pdf.PageNo())
	r.place("heading", r.y, r.y+hl.h)
	if h.Level <= 1 {
		r.h1 = number
		r.bookmark(hl.number+" "+h.Text, 0)
	} else {
		r.bookmark(h.Text, h.Level-1)
	}
}

// longHeading sets a heading taller than half a page, its number (if any)
// beside its first line, breaking pages between its lines.
func (r *renderer) longHeading(h doc.Heading, hl headingLayout, number int) {
	if !r.fresh && r.room(hl.hs.before) < 3*hl.hs.st.lead {
		r.newPage()
	}
	r.need(hl.hs.before, 0)
	r.headingBookmark(h, hl, number)
	ox, ow := r.x, r.w
	if hl.number != "" {
		st := hl.hs.st
		r.marker = &marker{text: hl.number, right: r.x + textWidthOf("sans", "B", st.size, hl.number), st: &st}
		r.x += hl.hs.numberWidth
		r.w -= hl.hs.numberWidth
	}
	r.flowLines(hl.lines, hl.hs.st, 0, hl.hs.after)
	r.x, r.w = ox, ow
}

// closingWhole reports whether heading h (laid out as hl) opens the
// document's closing section — a level-1 heading with none after it —
// that is to start the next page so as to be set whole: the section fits
// on a page but not in the rest of this one, and split it would leave the
// last page only its short end (under closingTail of the text area),
// while ending this page here leaves it no more than closingBlank blank.
// The section is measured by laying it out alone on a fresh page, in a
// dry renderer continuing this one's numbering.
func (r *renderer) closingWhole(h doc.Heading, hl headingLayout) bool {
	if r.measuring || r.depth > 0 || h.Level > 1 {
		return false
	}
	for _, b := range r.rest {
		if n, ok := b.(doc.Heading); ok && n.Level <= 1 {
			return false
		}
		if _, ok := b.(doc.PageBreak); ok {
			return false
		}
	}
	body := bodyBottom - bodyTop
	if (bodyBottom-r.y)/body > closingBlank {
		return false
	}
	m := newRenderer(&doc.Document{Meta: r.meta, Blocks: append([]doc.Block{h}, r.rest...)}, options{}, 0, true)
	m.measuring = true
	m.eqs, m.texts = r.eqs, r.texts
	m.h1, m.fig, m.tab = r.h1, r.fig, r.tab
	if err := m.run(); err != nil || m.pdf.PageNo() > 1 {
		return false
	}
	tall := m.y - bodyTop
	room := r.room(hl.hs.before)
	return tall > room && tall-room < closingTail*body
}

// closingTail is the part of the text area below which the end of a
// closing section split over two pages is too short to be a memo's last
// page; closingBlank is how much of the page before it may be left blank
// to set the section whole instead.
const (
	closingTail  = 0.25
	closingBlank = 0.40
)

// headingFloor is the fraction of the text area below which no heading
// starts.
const headingFloor = 0.85

// leadInLines is the longest paragraph that counts as a figure's lead-in:
// kept on the page of the figure it introduces.
const leadInLines = 5

// keepFrom is the height that must follow a heading whose next block is
// r.rest[k]: keepAfterHeading's, or for a heading right below it (a
// section's first subsection) that heading and what it keeps, so that
// neither is left alone at a page foot.
func (r *renderer) keepFrom(k int) float64 {
	if k >= len(r.rest) {
		return 0
	}
	if hn, ok := r.rest[k].(doc.Heading); ok && k+1 < len(r.rest) {
		nl := r.layoutHeading(hn, 0)
		return nl.hs.before + nl.h + nl.hs.after + r.keepFrom(k+1)
	}
	return r.keepAfterHeading(r.rest[k], r.rest[k+1:])
}

// keepAfterHeading is the height that must follow a heading on its page:
// the least of the next block, or, when that block is a figure's short
// lead-in, the lead-in and the figure (shrunk as far as figure allows).
func (r *renderer) keepAfterHeading(next doc.Block, after []doc.Block) float64 {
	if p, ok := next.(doc.Paragraph); ok && len(after) > 0 {
		n := len(r.lines(p.Spans, styBody, r.w, r.w))
		if n <= leadInLines {
			switch b := after[0].(type) {
			case doc.Figure:
				return float64(n)*leadBody + 6.5 + 8 + r.leastFigure(b)
			case doc.Table, doc.Callout, doc.List, doc.Equation:
				// A heading, its short introduction and the start of what
				// it introduces (the table of Verification, the first
				// caution of Safety): not a heading and one line.
				return float64(n)*leadBody + 6.5 + r.minHeight(b)
			}
		}
	}
	return r.minHeight(next)
}

// minHeight is the least of a block that must follow a heading on the
// same page.
func (r *renderer) minHeight(b doc.Block) float64 {
	switch b := b.(type) {
	case *doc.Paragraph:
		return r.minHeight(*b)
	case *doc.List:
		return r.minHeight(*b)
	case *doc.Table:
		return r.minHeight(*b)
	case *doc.Figure:
		return r.minHeight(*b)
	case *doc.Callout:
		return r.minHeight(*b)
	case *doc.Code:
		return r.minHeight(*b)
	case *doc.TitleBlock:
		return r.minHeight(*b)
	case *doc.Heading:
		return r.minHeight(*b)
	case *doc.Equation:
		return r.minHeight(*b)
	case doc.Equation:
		return r.layoutEquation(b).h
	case doc.Paragraph:
		n := len(r.lines(b.Spans, styBody, r.w, r.w))
		return float64(min(n, 2)) * leadBody
	case doc.List:
		return 2 * leadBody
	case doc.Table:
		// laid out with the number it will carry: "Table 12 – …" may
		// wrap where an unnumbered caption does not
		n := 0
		if b.Caption != "" {
			n = r.tab + 1
		}
		return 8 + tableStart(r.layoutTable(b, n))
	case doc.Figure:
		fl := r.layoutFigure(b)
		return fl.total
	case doc.Callout:
		// A boxed caution is not split: the whole box follows, unless it
		// is too long for a page and flows as paragraphs (callout).
		if h := r.layoutCallout(b).h; h <= bodyBottom-bodyTop {
			return h
		}
		return 3 * leadBody
	case doc.Code:
		return 3*leadCode + 2*codePad
	case doc.TitleBlock:
		return r.layoutTitleBlock(b).h
	case doc.Heading:
		return r.layoutHeading(b, 0).h + 2*leadBody
	}
	return 0
}

// ---- paragraphs and lists ----

func (r *renderer) paragraph(p doc.Paragraph) {
	lines := r.lines(p.Spans, styBody, r.w, r.w)
	after := 6.5
	if r.depth > 0 {
		after = 2.5
	}
	// A short paragraph right before a figure is its lead-in: the two
	// share a page. If the figure, shrunk as far as figure allows, does
	// not fit below the paragraph, both start the next page.
	if r.depth == 0 && !r.fresh && len(r.rest) > 0 && len(lines) <= leadInLines {
		if f, ok := r.rest[0].(doc.Figure); ok {
			need := float64(len(lines))*leadBody + after + 8 + r.leastFigure(f)
			if need > r.room(0) {
				r.newPage()
			}
			r.leadFloor = figureFloor(r.room(0))
		} else if _, table := r.rest[0].(doc.Table); table || leadsIn(p) {
			// A short paragraph right before a table, or ending in a colon
			// before a list or an equation, introduces what follows: it
			// keeps the start of it — a table's caption, header and first
			// row, a list's first three items — on its page.
			need := float64(len(lines))*leadBody + after + r.minHeight(r.rest[0])
			if l, ok := r.rest[0].(doc.List); ok {
				need = float64(len(lines))*leadBody + after + r.listStart(l, 3)
			}
			if need > r.room(0) {
				r.newPage()
			}
		}
	}
	// A longer paragraph before a table that fits here while the table's
	// start does not: its last two lines go over with the table, so that
	// the table is not left without its introduction.
	// So too before a figure: its last two lines go over with the figure
	// (shrunk as far as figure allows) where that does not fit below it.
	if r.depth == 0 && !r.fresh && len(r.rest) > 0 && len(lines) > leadInLines {
		var least float64
		switch b := r.rest[0].(type) {
		case doc.Table:
			least = r.minHeight(b)
		case doc.Figure:
			least = 8 + r.leastFigure(b)
		}
		body := float64(len(lines)) * leadBody
		if least > 0 && body <= r.room(0) && body+after+least > r.room(0) {
			r.flowLines(lines[:len(lines)-2], styBody, 0, 0)
			r.newPage()
			r.flowLines(lines[len(lines)-2:], styBody, 0, after)
			if _, fig := r.rest[0].(doc.Figure); fig {
				r.leadFloor = figureFloor(r.room(0))
			}
			return
		}
	}
	r.flowLines(lines, styBody, 0, after)
}

// leadsIn reports whether a paragraph ends in a colon: it introduces the
// block after it.
func leadsIn(p doc.Paragraph) bool {
	if len(p.Spans) == 0 {
		return false
	}
	return strings.HasSuffix(strings.TrimSpace(p.Spans[len(p.Spans)-1].Text), ":")
}

// listStart is the height of the first n items of a list whose items
// begin with a paragraph (the first two lines of each), or two lines.
func (r *renderer) listStart(l doc.List, n int) float64 {
	h := 0.0
	for _, it := range l.Items[:min(n, len(l.Items))] {
		if len(it) == 0 {
			continue
		}
		if p, ok := it[0].(doc.Paragraph); ok {
			h += float64(min(len(r.lines(p.Spans, styBody, r.w-15, r.w-15)), 2))*leadBody + 2.5
			continue
		}
		h += 2 * leadBody
	}
	return max(h, 2*leadBody)
}

// flowLines sets lines at the cursor, breaking pages between lines with
// no single first line at the foot of a page and no single last line at
// the head of the next.
func (r *renderer) flowLines(lines []line, st textStyle, before, after float64) {
	first := true
	for i := 0; i < len(lines); {
		rest := len(lines) - i
		gap := 0.0
		if first {
			gap = before
		}
		n := int((r.room(gap) + 0.01) / st.lead)
		if n < rest {
			if first && n < 2 && !r.fresh {
				r.newPage()
				continue
			}
			if rest-n == 1 && n >= 2 && len(lines) >= 3 {
				n--
			}
			n = max(n, 1)
		} else {
			n = rest
		}
		r.need(gap, float64(n)*st.lead)
		for _, l := range lines[i : i+n] {
			base := r.y + baselineOffset(st.size, st.lead)
			if r.marker != nil {
				r.drawMarker(base)
			}
			r.drawLine(l, r.x, base)
			r.y += st.lead
		}
		i += n
		first = false
		if i < len(lines) {
			r.newPage()
		}
	}
	r.after(after)
}

func (r *renderer) drawMarker(baseline float64) {
	m := r.marker
	r.marker = nil
	st := styMarker
	if m.st != nil {
		st = *m.st
	}
	f := makeFrag(st, m.text)
	r.text(f, m.right-f.w, baseline)
}

// pendingMarker sets a list marker whose item does not start with text on
// a line of its own.
func (r *renderer) pendingMarker() {
	if r.marker == nil {
		return
	}
	r.need(0, leadBody)
	r.drawMarker(r.y + baselineOffset(sizeBody, leadBody))
	r.y += leadBody
}

func listMarker(ordered bool, depth, i int) string {
	if !ordered {
		return [...]string{"•", "–", "◦"}[depth%3]
	}
	switch depth % 3 {
	case 1:
		return string(rune('a'+i%26)) + ")"
	case 2:
		return roman(i+1) + "."
	}
	return fmt.Sprintf("%d.", i+1)
}

func roman(n int) string {
	vals := []int{1000, 900, 500, 400, 100, 90, 50, 40, 10, 9, 5, 4, 1}
	syms := []string{"m", "cm", "d", "cd", "c", "xc", "l", "xl", "x", "ix", "v", "iv", "i"}
	var b strings.Builder
	for i, v := range vals {
		for n >= v {
			b.WriteString(syms[i])
			n -= v
		}
	}
	return b.String()
}

// maxListIndentDepth is the nesting depth beyond which lists indent no
// further.
const maxListIndentDepth = 8

func (r *renderer) list(l doc.List) {
	indent := 15.0
	if l.Ordered {
		widest := 0.0
		for i := range l.Items {
			widest = max(widest, textWidthOf("sans", "", sizeBody, listMarker(true, r.depth, i)))
		}
		indent = max(indent, widest+6)
	}
	// Nested lists indent up to a depth, and never below half the text
	// width; deeper ones set their markers in the same column.
	indent = min(indent, textWidth/4)
	if r.depth >= maxListIndentDepth || r.w-indent < textWidth/2 {
		indent = 0
	}
	for i, item := range l.Items {
		ox, ow := r.x, r.w
		r.x += indent
		r.w -= indent
		r.marker = &marker{text: listMarker(l.Ordered, r.depth, i), right: r.x - 4.5}
		r.depth++
		for j, b := range item {
			if _, ok := b.(doc.Paragraph); !ok {
				if _, ok := b.(*doc.Paragraph); !ok {
					r.pendingMarker()
				}
			}
			var next doc.Block
			if j+1 < len(item) {
				next = item[j+1]
			}
			r.block(b, next)
		}
		r.pendingMarker()
		r.depth--
		r.x, r.w = ox, ow
	}
	if r.depth == 0 {
		r.after(6.5)
	} else {
		r.after(2.5)
	}
}

// ---- tables ----

const (
	cellPadX = 4.5
	cellPadY = 3.2
)

type cellBox struct {
	lines  []line
	status doc.Status
}

type tableLayout struct {
	widths []float64
	align  []doc.Align
	head   []cellBox
	headH  float64
	rows   [][]cellBox
	rowH   []float64
	cap    []line
	capH   float64
	label  string
}

func statusColors(s doc.Status) (fg, bg rgb) {
	switch s {
	case doc.Pass:
		return colPass, colPassBg
	case doc.Fail:
		return colFail, colFailBg
	case doc.Warn:
		return colWarn, colWarnBg
	}
	return colInk, colWhite
}

// cellRuns is the styled text of a cell. A status cell always shows its
// status word, so the outcome never rests on colour alone.
func cellRuns(c doc.Cell) []styled {
	st := styTable
	if c.Strong {
		st.bold = true
	}
	if c.Status == doc.NoStatus {
		return []styled{{c.Text, st}}
	}
	fg, _ := statusColors(c.Status)
	st.color = fg
	label := c.Status.String()
	bold := st
	bold.bold = true
	text := strings.TrimSpace(c.Text)
	switch {
	case text == "":
		return []styled{{label, bold}}
	case strings.Contains(strings.ToUpper(text), label):
		return []styled{{text, bold}}
	}
	return []styled{{label + " ", bold}, {text, st}}
}

func headRuns(s string) []styled {
	st := styTable
	st.bold = true
	return []styled{{s, st}}
}

// naturalWidths returns, per run list, the single-line width and the widest
// unbreakable word.
func naturalWidths(runs []styled) (nat, minw float64) {
	for _, w := range words(runs) {
		minw = max(minw, w.w)
		nat += w.w
		if w.space.text != "" {
			nat += w.space.w
		}
	}
	return nat, minw
}

func (r *renderer) layoutTable(t doc.Table, number int) *tableLayout {
	ncol := len(t.Header)
	for _, row := range t.Rows {
		ncol = max(ncol, len(row))
	}
	tl := &tableLayout{}
	if ncol == 0 {
		return tl
	}
	headRunList := make([][]styled, 0)
	if len(t.Header) > 0 {
		for j := 0; j < ncol; j++ {
			h := ""
			if j < len(t.Header) {
				h = t.Header[j]
			}
			headRunList = append(headRunList, headRuns(h))
		}
	}
	rowRuns := make([][][]styled, len(t.Rows))
	statuses := make([][]doc.Status, len(t.Rows))
	for i, row := range t.Rows {
		for j := 0; j < ncol; j++ {
			c := doc.Cell{}
			if j < len(row) {
				c = row[j]
			}
			rowRuns[i] = append(rowRuns[i], cellRuns(c))
			statuses[i] = append(statuses[i], c.Status)
		}
	}

	// Column widths: the natural (one-line) and least (widest word) width
	// of every column's content.
	W := r.w
	nat := make([]float64, ncol)
	mins := make([]float64, ncol)
	measure := func(j int, runs []styled) {
		n, m := naturalWidths(runs)
		nat[j] = max(nat[j], n+2*cellPadX)
		mins[j] = max(mins[j], m+2*cellPadX)
	}
	for j, runs := range headRunList {
		measure(j, runs)
	}
	for _, row := range rowRuns {
		for j, runs := range row {
			measure(j, runs)
		}
	}
	for j := range nat {
		nat[j] = max(nat[j], 3*cellPadX)
		mins[j] = max(mins[j], 3*cellPadX)
	}
	if len(t.Widths) == ncol && positive(t.Widths) {
		sum := 0.0
		for _, v := range t.Widths {
			sum += v
		}
		tl.widths = make([]float64, ncol)
		for j, v := range t.Widths {
			tl.widths[j] = W * v / sum
		}
	} else {
		tl.widths = autoWidths(nat, mins, W)
	}
	tl.widths = keepWordsWhole(tl.widths, mins, W)
	tl.align = make([]doc.Align, ncol)
	copy(tl.align, t.Align)

	box := func(runs []styled, j int, s doc.Status) cellBox {
		inner := tl.widths[j] - 2*cellPadX
		return cellBox{lines: layoutStyled(runs, inner, inner), status: s}
	}
	height := func(cells []cellBox) float64 {
		n := 1
		for _, c := range cells {
			n = max(n, len(c.lines))
		}
		return float64(n)*leadTable + 2*cellPadY
	}
	for j, runs := range headRunList {
		tl.head = append(tl.head, box(runs, j, doc.NoStatus))
	}
	if len(tl.head) > 0 {
		tl.headH = height(tl.head)
	}
	var headRow []cellBox
	if tl.headH > (bodyBottom-bodyTop)/4 {
		// a header this tall is not repeated on every page: it becomes
		// the first row
		headRow, tl.head, tl.headH = tl.head, nil, 0
		tl.rows = append(tl.rows, headRow)
		tl.rowH = append(tl.rowH, height(headRow))
	}
	for i, row := range rowRuns {
		cells := make([]cellBox, ncol)
		for j, runs := range row {
			cells[j] = box(runs, j, statuses[i][j])
		}
		tl.rows = append(tl.rows, cells)
		tl.rowH = append(tl.rowH, height(cells))
	}
	if number > 0 {
		tl.label = fmt.Sprintf("Table %d", number)
	}
	if t.Caption != "" {
		tl.cap = captionLines(tl.label, t.Caption, r.w)
		tl.capH = float64(len(tl.cap))*leadCaption + 3
	}
	return tl
}

// autoWidths shares the width W among columns by their content: natural
// widths if they fit (stretched to W), else at least every column's widest
// word with the rest shared by how much more each would like.
func autoWidths(nat, mins []float64, W float64) []float64 {
	out := make([]float64, len(nat))
	sumNat, sumMin := 0.0, 0.0
	for j := range nat {
		sumNat += nat[j]
		sumMin += mins[j]
	}
	switch {
	case sumNat <= W:
		for j := range nat {
			out[j] = nat[j] * W / sumNat
		}
	case sumMin >= W:
		for j := range nat {
			out[j] = mins[j] * W / sumMin
		}
	default:
		slack := sumNat - sumMin
		for j := range nat {
			out[j] = mins[j] + (W-sumMin)*(nat[j]-mins[j])/slack
		}
	}
	return out
}

// keepWordsWhole widens columns narrower than their widest word, taking
// the room from columns with width to spare, so that numbers such as
// "7.5×10⁻⁹" are not split between characters. If the words cannot all
// fit, the widths are left as they are.
func keepWordsWhole(w, mins []float64, W float64) []float64 {
	need, spare := 0.0, 0.0
	for j := range w {
		if w[j] < mins[j] {
			need += mins[j] - w[j]
		} else {
			spare += w[j] - mins[j]
		}
	}
	if need == 0 || spare < need {
		return w
	}
	out := make([]float64, len(w))
	for j := range w {
		if w[j] < mins[j] {
			out[j] = mins[j]
		} else {
			out[j] = w[j] - (w[j]-mins[j])*need/spare
		}
	}
	return out
}

func positive(v []float64) bool {
	for _, x := range v {
		if !(x > 0) {
			return false
		}
	}
	return true
}

// captionLines lays out "Label – caption" with the label in bold.
func captionLines(label, caption string, width float64) []line {
	bold := styCaption
	bold.bold = true
	var runs []styled
	if label != "" {
		runs = append(runs, styled{label, bold}, styled{" – ", styCaption})
	}
	runs = append(runs, styled{caption, styCaption})
	return layoutStyled(runs, width, width)
}

func (r *renderer) table(t doc.Table) {
	number := 0
	if t.Caption != "" {
		r.tab++
		number = r.tab
	}
	tl := r.layoutTable(t, number)
	if len(tl.widths) == 0 {
		return
	}
	if tl.capH > (bodyBottom-bodyTop)/3 {
		// a caption this long flows on its own above the table
		kind := r.kind
		r.kind = "table caption"
		r.flowLines(tl.cap, styCaption, 8, 3)
		r.kind = kind
		tl.cap, tl.capH = nil, 0
	}
	// The start kept together (caption, header, first rows) is recorded
	// as such, and every row as a "table" box of its own.
	kind := r.kind
	r.kind = "table start"
	r.need(8, tableStart(tl))
	r.kind = kind
	y := r.y
	for _, l := range tl.cap {
		r.drawLine(l, r.x, y+baselineOffset(sizeCaption, leadCaption))
		y += leadCaption
	}
	if len(tl.cap) > 0 {
		y += 3
	}
	y = r.tableHead(tl, y)
	onPage := 0
	// a row taller than this is split between its lines across pages
	tall := bodyBottom - bodyTop - leadCaption - 3 - tl.headH
	for i, cells := range tl.rows {
		h := tl.rowH[i]
		if h > tall {
			y, onPage = r.splitRow(tl, cells, y, onPage)
			continue
		}
		// Break before this row if it does not fit, or if it is the
		// last but one and the last would be left alone on the next page.
		last := i == len(tl.rows)-2 && onPage > 1 && y+h <= bodyBottom &&
			y+h+tl.rowH[i+1] > bodyBottom && tl.rowH[i+1] <= tall
		if onPage > 0 && (y+h > bodyBottom || last) {
			y = r.tableContinued(tl, y)
			onPage = 0
		}
		if onPage > 0 {
			r.rule(r.x, y, r.x+r.w, 0.3, colRule)
		}
		r.tableRow(tl, cells, y, h)
		r.place("table", y, y+h)
		y += h
		onPage++
	}
	r.rule(r.x, y, r.x+r.w, 0.9, colAccent)
	r.y = y
	r.fresh = false
	r.after(11)
}

// tableContinued closes the table at y at the foot of the page and opens
// it again on the next, under a "(continued)" line and the header; it
// returns the cursor below the header.
func (r *renderer) tableContinued(tl *tableLayout, y float64) float64 {
	r.rule(r.x, y, r.x+r.w, 0.9, colAccent)
	r.newPage()
	r.fresh = false
	y = r.y
	cont := "(continued)"
	if tl.label != "" {
		cont = tl.label + " (continued)"
	}
	st := styCaption
	st.color = colMuted
	st.italic = true
	r.simpleText(cont, st, r.x, y+baselineOffset(sizeCaption, leadCaption))
	top := y
	y += leadCaption + 3
	y = r.tableHead(tl, y)
	r.place("table head", top, y)
	return y
}

// splitRow sets a row too tall for a page in slices of its lines, each
// slice as much as fits on the page, the table continued on the next page
// between them. It returns the cursor and the rows on the last page.
func (r *renderer) splitRow(tl *tableLayout, cells []cellBox, y float64, onPage int) (float64, int) {
	n := 0
	for _, c := range cells {
		n = max(n, len(c.lines))
	}
	for start := 0; start < n; {
		k := int((bodyBottom - y - 2*cellPadY + 0.01) / leadTable)
		if k < 2 && onPage > 0 {
			y = r.tableContinued(tl, y)
			onPage = 0
			continue
		}
		k = max(1, min(k, n-start))
		slice := make([]cellBox, len(cells))
		for j, c := range cells {
			slice[j].status = c.status
			if start < len(c.lines) {
				slice[j].lines = c.lines[start:min(start+k, len(c.lines))]
			}
		}
		if onPage > 0 {
			r.rule(r.x, y, r.x+r.w, 0.3, colRule)
		}
		h := float64(k)*leadTable + 2*cellPadY
		r.tableRow(tl, slice, y, h)
		r.place("table", y, y+h)
		y += h
		onPage++
		start += k
		if start < n {
			y = r.tableContinued(tl, y)
			onPage = 0
		}
	}
	return y, onPage
}

func (r *renderer) tableHead(tl *tableLayout, y float64) float64 {
	r.rule(r.x, y, r.x+r.w, 0.9, colAccent)
	if len(tl.head) == 0 {
		return y
	}
	r.fillRect(r.x, y+0.45, r.w, tl.headH-0.45, colAccentBg)
	r.tableRow(tl, tl.head, y, tl.headH)
	y += tl.headH
	r.rule(r.x, y, r.x+r.w, 0.5, colAccent)
	return y
}

func (r *renderer) tableRow(tl *tableLayout, cells []cellBox, y, h float64) {
	x := r.x
	for j, c := range cells {
		w := tl.widths[j]
		if c.status != doc.NoStatus {
			_, bg := statusColors(c.status)
			r.fillRect(x+0.8, y+0.8, w-1.6, h-1.6, bg)
		}
		ty := y + cellPadY
		for _, l := range c.lines {
			ax := x + cellPadX
			inner := w - 2*cellPadX
			switch tl.align[j] {
			case doc.Right:
				ax += inner - l.w
			case doc.Center:
				ax += (inner - l.w) / 2
			}
			r.drawLine(l, ax, ty+baselineOffset(sizeTable, leadTable))
			ty += leadTable
		}
		x += w
	}
}

// ---- title block ----

const (
	tbPad       = 7.0
	tbLabelSize = 6.6
	tbLabelLead = 9.5
	tbValueLead = 12.4
	tbTitleLead = 21.0
)

type titleLayout struct {
	title  []line
	titleH float64
	cols   int
	cells  [][]tbCell // rows of cells
	rowH   []float64
	h      float64
}

type tbCell struct {
	label string
	value []line
	span  int
}

func (r *renderer) layoutTitleBlock(tb doc.TitleBlock) titleLayout {
	tl := titleLayout{}
	tst := textStyle{size: sizeTitle, lead: tbTitleLead, color: colInk, bold: true}
	tl.title = layoutSpans(plainSpans(tb.Title), tst, r.w-2*tbPad, r.w-2*tbPad)
	tl.titleH = float64(len(tl.title))*tbTitleLead + 2*tbPad + 12
	n := len(tb.Fields)
	switch {
	case n >= 5:
		tl.cols = 3
	case n >= 2:
		tl.cols = 2
	default:
		tl.cols = 1
	}
	colW := r.w / float64(tl.cols)
	vst := textStyle{size: sizeBody, lead: tbValueLead, color: colInk}
	for i := 0; i < n; i += tl.cols {
		var row []tbCell
		end := min(i+tl.cols, n)
		hmax := 0.0
		for k := i; k < end; k++ {
			span := 1
			if k == end-1 {
				span = tl.cols - (end - 1 - i)
			}
			inner := colW*float64(span) - 2*tbPad
			c := tbCell{label: tb.Fields[k][0], value: layoutSpans(plainSpans(tb.Fields[k][1]), vst, inner, inner), span: span}
			row = append(row, c)
			hmax = max(hmax, tbPad-1+tbLabelLead+float64(len(c.value))*tbValueLead+tbPad-2)
		}
		tl.cells = append(tl.cells, row)
		tl.rowH = append(tl.rowH, hmax)
	}
	tl.h = tl.titleH
	for _, h := range tl.rowH {
		tl.h += h
	}
	return tl
}

func (r *renderer) titleBlock(tb doc.TitleBlock) {
	tl := r.layoutTitleBlock(tb)
	if tl.h > bodyBottom-bodyTop {
		r.longTitleBlock(tb, tl)
		return
	}
	r.need(0, tl.h)
	x, y, w := r.x, r.y, r.w
	// Title band.
	r.fillRect(x, y, w, tl.titleH, colAccentBg)
	kicker := textStyle{size: tbLabelSize + 0.4, lead: tbLabelLead, color: colAccent, bold: true}
	r.simpleText("CALCULATION MEMO", kicker, x+tbPad, y+tbPad+7)
	ty := y + tbPad + 12
	for _, l := range tl.title {
		r.drawLine(l, x+tbPad, ty+baselineOffset(sizeTitle, tbTitleLead))
		ty += tbTitleLead
	}
	gy := y + tl.titleH
	r.rule(x, gy, x+w, 0.8, colAccent)
	colW := w / float64(tl.cols)
	lst := textStyle{size: tbLabelSize, lead: tbLabelLead, color: colMuted, bold: true}
	for i, row := range tl.cells {
		h := tl.rowH[i]
		cx := x
		for k, c := range row {
			cw := colW * float64(c.span)
			if k > 0 {
				r.vrule(cx, gy, gy+h, 0.4, colRule)
			}
			r.simpleText(strings.ToUpper(c.label), lst, cx+tbPad, gy+tbPad-1+7)
			vy := gy + tbPad - 1 + tbLabelLead
			for _, l := range c.value {
				r.drawLine(l, cx+tbPad, vy+baselineOffset(sizeBody, tbValueLead))
				vy += tbValueLead
			}
			cx += cw
		}
		if i+1 < len(tl.cells) {
			r.rule(x, gy+h, x+w, 0.4, colRule)
		}
		gy += h
	}
	r.strokeRect(x, y, w, tl.h, 1.0, colAccent)
	r.y = y + tl.h
	r.after(16)
}

// longTitleBlock sets a title block too tall for a page without its box:
// the title, then each field's label and value, breaking pages between
// lines.
func (r *renderer) longTitleBlock(tb doc.TitleBlock, tl titleLayout) {
	kicker := textStyle{size: tbLabelSize + 0.4, lead: tbLabelLead, color: colAccent, bold: true}
	r.flowLines(layoutSpans(plainSpans("CALCULATION MEMO"), kicker, r.w, r.w), kicker, 0, 2)
	tst := textStyle{size: sizeTitle, lead: tbTitleLead, color: colInk, bold: true}
	r.flowLines(tl.title, tst, 0, 8)
	lst := textStyle{size: tbLabelSize, lead: tbLabelLead, color: colMuted, bold: true}
	vst := textStyle{size: sizeBody, lead: tbValueLead, color: colInk}
	for _, f := range tb.Fields {
		r.flowLines(layoutSpans(plainSpans(strings.ToUpper(f[0])), lst, r.w, r.w), lst, 4, 0)
		r.flowLines(layoutSpans(plainSpans(f[1]), vst, r.w, r.w), vst, 0, 4)
	}
	r.rule(r.x, r.y+2, r.x+r.w, 0.8, colAccent)
	r.after(16)
}

// ---- figures ----

type figureLayout struct {
	w, h  float64
	cap   []line
	total float64
}

const figureCaptionGap = 6

func (r *renderer) layoutFigure(f doc.Figure) figureLayout {
	num := f.Number
	if num == 0 {
		num = r.fig + 1
	}
	return layoutFigureIn(f, num, r.w)
}

// layoutFigureIn lays out figure f, numbered num, in a column colW wide.
func layoutFigureIn(f doc.Figure, num int, colW float64) figureLayout {
	w, h := f.Width.Points(), f.Height.Points()
	if w <= 0 {
		w = colW
	}
	if h <= 0 {
		h = w * 0.62
	}
	if w > colW {
		h *= colW / w
		w = colW
	}
	fl := figureLayout{w: w, h: h}
	if f.Caption != "" {
		fl.cap = captionLines(fmt.Sprintf("Figure %d", num), f.Caption, min(colW, max(w, 0.75*colW)))
	}
	maxH := bodyBottom - bodyTop - float64(len(fl.cap))*leadCaption - figureCaptionGap
	if fl.h > maxH {
		fl.w *= maxH / fl.h
		fl.h = maxH
	}
	fl.total = fl.h + figureCaptionGap + float64(len(fl.cap))*leadCaption
	return fl
}

// leastFigure is the least height figure f takes on a page: its drawing
// shrunk as far as minFigureScale allows, with its caption (which does not
// shrink) — what figure places it in.
func (r *renderer) leastFigure(f doc.Figure) float64 {
	fl := r.layoutFigure(f)
	return figureFloor(r.room(0))*fl.h + (fl.total - fl.h)
}

// deepFigureScale is how far a figure may shrink when moving it to the
// next page would leave more than blankRoom of this page's text area
// blank (a cross-section followed by a profile and its lead-in).
const (
	deepFigureScale = 0.64
	blankRoom       = 0.30
)

// figureFloor is the least scale of a figure set in room.
func figureFloor(room float64) float64 {
	if room > blankRoom*(bodyBottom-bodyTop) {
		return deepFigureScale
	}
	return minFigureScale
}

// tableStart is the height of a table's start that stays together: the
// caption, the header and the first row (or the first lines of a row too
// tall for a page), and the second row too when both are short, so that
// no table starts with a single row at a page foot; a short table of three
// rows, which cannot be split with two on each page, stays whole.
func tableStart(tl *tableLayout) float64 {
	first := tl.capH + tl.headH
	if len(tl.rowH) > 0 {
		// the whole first row where it is short enough to keep the second
		// with it, else its first three lines (the rest may follow over)
		if r0 := tl.rowH[0]; len(tl.rowH) > 1 && r0+tl.rowH[1] < (bodyBottom-bodyTop)/4 {
			first += r0
		} else {
			first += min(r0, 3*leadTable+2*cellPadY)
		}
	}
	if len(tl.rowH) > 1 && tl.rowH[0]+tl.rowH[1] < (bodyBottom-bodyTop)/4 {
		first += tl.rowH[1]
		if len(tl.rowH) == 3 && tl.rowH[0]+tl.rowH[1]+tl.rowH[2] < (bodyBottom-bodyTop)/2 {
			first += tl.rowH[2]
		}
	}
	return first
}

// minFigureScale is how far a figure may shrink to fit the rest of a page
// rather than leave the space blank and move to the next.
const minFigureScale = 0.72

func (r *renderer) figure(f doc.Figure) {
	fl := r.layoutFigure(f)
	if f.Number > 0 {
		r.fig = f.Number
	} else {
		r.fig++
	}
	floor := figureFloor(r.room(8))
	if r.leadFloor > 0 {
		floor = min(floor, r.leadFloor)
		r.leadFloor = 0
	}
	if room := r.room(8); !r.fresh && fl.total > room {
		capH := fl.total - fl.h
		if k := (room - capH) / fl.h; k >= floor {
			fl.w *= k
			fl.h *= k
			fl.total = fl.h + capH
		}
	}
	r.need(8, fl.total)
	x := r.x + (r.w-fl.w)/2
	if r.dry {
		r.ahead.submit(f, fl.w, fl.h)
	}
	if !r.dry && f.Draw != nil {
		c := newCanvas(r.pdf, r.fonts, pageH, x, r.y, vgLen(fl.w), vgLen(fl.h))
		c.Begin()
		if t := r.ahead.take(f, fl.w, fl.h); t != nil {
			t.replay(c)
		} else {
			f.Draw(c, vgLen(fl.w), vgLen(fl.h))
		}
		c.End()
		// The figure's graphics state ended with its clip; bring fpdf's
		// idea of the current state back in line with the page's.
		r.pdf.SetDashPattern([]float64{}, 0)
		r.pdf.SetAlpha(1, "Normal")
		r.pdf.SetDrawColor(colInk.r, colInk.g, colInk.b)
		r.pdf.SetFillColor(colInk.r, colInk.g, colInk.b)
		r.pdf.SetTextColor(colInk.r, colInk.g, colInk.b)
		r.pdf.SetLineWidth(1)
	}
	y := r.y + fl.h + figureCaptionGap
	for _, l := range fl.cap {
		r.drawLine(l, r.x+(r.w-l.w)/2, y+baselineOffset(sizeCaption, leadCaption))
		y += leadCaption
	}
	r.y = y
	r.after(14)
}

// ---- callouts ----

const (
	calloutPad = 7.0
	calloutBar = 3.0
)

type calloutLayout struct {
	head  []line
	body  []line
	h     float64
	fg    rgb
	bg    rgb
	inner float64
}

func severityColors(s doc.Severity) (fg, bg rgb) {
	switch s {
	case doc.Warning:
		return colFail, colFailBg
	case doc.Caution:
		return colWarn, colWarnBg
	}
	return colAccent, colAccentBg
}

func (r *renderer) layoutCallout(c doc.Callout) calloutLayout {
	cl := calloutLayout{}
	cl.fg, cl.bg = severityColors(c.Severity)
	cl.inner = r.w - calloutBar - 2*calloutPad
	label := c.Severity.String()
	if c.Severity != doc.Note {
		label = "⚠ " + label
	}
	lst := textStyle{size: sizeSmall + 0.5, lead: leadBody, color: cl.fg, bold: true}
	tst := textStyle{size: sizeBody, lead: leadBody, color: colInk, bold: true}
	runs := []styled{{label, lst}}
	if c.Title != "" {
		runs = append(runs, styled{"  " + c.Title, tst})
	}
	cl.head = layoutStyled(runs, cl.inner, cl.inner)
	cl.body = r.lines(c.Spans, styBody, cl.inner, cl.inner)
	if len(c.Spans) == 0 {
		cl.body = nil
	}
	cl.h = 2*calloutPad + float64(len(cl.head)+len(cl.body))*leadBody
	return cl
}

func (r *renderer) callout(c doc.Callout) {
	cl := r.layoutCallout(c)
	if cl.h > bodyBottom-bodyTop {
		// Too long to box on one page: set it as plain paragraphs.
		r.flowLines(cl.head, styBody, 8, 0)
		r.flowLines(cl.body, styBody, 0, 8)
		return
	}
	r.need(8, cl.h)
	x, y := r.x, r.y
	r.fillRect(x, y, r.w, cl.h, cl.bg)
	r.fillRect(x, y, calloutBar, cl.h, cl.fg)
	ty := y + calloutPad
	tx := x + calloutBar + calloutPad
	for _, l := range append(append([]line(nil), cl.head...), cl.body...) {
		r.drawLine(l, tx, ty+baselineOffset(sizeBody, leadBody))
		ty += leadBody
	}
	r.y = y + cl.h
	r.after(10)
}

// ---- code ----

const codePad = 6.0

func codeLines(text string, width float64) []line {
	text = strings.TrimRight(strings.ReplaceAll(text, "\t", "    "), "\n")
	var out []line
	for _, raw := range strings.Split(text, "\n") {
		raw = strings.TrimRight(raw, " \r")
		if raw == "" {
			out = append(out, line{})
			continue
		}
		// Hard-wrap: keep every space, break between characters.
		f := makeFrag(styCode, raw)
		w := word{frags: []frag{f}, w: f.w}
		for _, piece := range splitWord(w, width, width) {
			out = append(out, line{frags: piece.frags, w: piece.w})
		}
	}
	return out
}

func (r *renderer) code(c doc.Code) {
	lines := codeLines(c.Text, r.w-2*codePad)
	for i := 0; i < len(lines); {
		n := int((r.room(6) - 2*codePad + 0.01) / leadCode)
		if n < min(3, len(lines)-i) && !r.fresh {
			r.newPage()
			continue
		}
		n = max(1, min(n, len(lines)-i))
		h := float64(n)*leadCode + 2*codePad
		r.need(6, h)
		r.fillRect(r.x, r.y, r.w, h, colCodeBg)
		r.vrule(r.x, r.y, r.y+h, 1.2, colRule)
		y := r.y + codePad
		for _, l := range lines[i : i+n] {
			r.drawLine(l, r.x+codePad, y+baselineOffset(sizeCode, leadCode))
			y += leadCode
		}
		r.y += h
		i += n
		if i < len(lines) {
			r.newPage()
		}
	}
	r.after(8)
}
