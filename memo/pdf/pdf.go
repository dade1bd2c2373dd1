// Package pdf typesets a memo document (package doc) as an A4 PDF.
//
// The house style: DejaVu type embedded as subsets, one accent colour (a
// deep teal) on neutral greys, numbered level-1 headings, a bordered title
// block on page 1, a running header (title, document id) and footer
// (revision, date, "Page X of Y") on every page, and a PDF outline built
// from the headings. Figures are drawn as vector graphics straight into the
// page through a vg.Canvas implementation (Canvas).
//
// The output is deterministic: the same Document gives the same bytes. All
// dates come from Meta.Created, resources are written in sorted order and
// nothing depends on map iteration order or the clock.
package pdf

import (
	"bytes"
	"fmt"
	"slices"
	"strings"
	"time"

	"github.com/go-pdf/fpdf"

	"coilmemo/doc"
)

// Render typesets d and returns the PDF file.
func Render(d *doc.Document) ([]byte, error) {
	return render(d, options{compress: true})
}

// RenderOnePass is Render in one layout pass: the same bytes, without the
// dry pass that lets the figures be drawn ahead on another core. It is
// for builds that already keep every core busy with other documents,
// where drawing ahead gains nothing and the dry pass only costs.
func RenderOnePass(d *doc.Document) ([]byte, error) {
	return render(d, options{compress: true, onePass: true})
}

type options struct {
	compress bool
	// onText, if set, sees every string set on a page (tests).
	onText func(page int, s string)
	// onPlace, if set, sees every string set on a page with the left end
	// of its baseline, points from the top-left corner (tests).
	onPlace func(page int, x, y float64, s string)
	// onSpot draws every figure where it is placed, none ahead (tests).
	onSpot bool
	// onePass lays the document out once, without the dry pass and so
	// without figures drawn ahead (RenderOnePass).
	onePass bool
	// fpdfDeflate leaves the page contents' compression to fpdf instead of
	// deflatePages (tests: the two must give the same bytes).
	fpdfDeflate bool
}

func render(d *doc.Document, o options) (out []byte, err error) {
	defer func() {
		if p := recover(); p != nil {
			out, err = nil, fmt.Errorf("pdf: render: %v", p)
		}
	}()
	r, err := layOutTwice(d, o)
	if err != nil {
		return nil, err
	}
	var buf bytes.Buffer
	if err := r.pdf.Output(&buf); err != nil {
		return nil, fmt.Errorf("pdf: %w", err)
	}
	if o.compress && !o.fpdfDeflate {
		return deflatePages(buf.Bytes())
	}
	return buf.Bytes(), nil
}

// layOutTwice runs the two layout passes at the same time, each on its
// own fpdf document. The set pass sets everything; what depends on the
// whole layout — "Page X of Y" in every footer (right-aligned with the
// true width of Y) and the page numbers of the contents — it writes into
// its pages when they are all laid out (finishPages), from its own page
// count and heading pages. The dry pass lays the document out without
// setting any text and, being several times faster, runs ahead: it hands
// each figure it places, at its size on the page, to the worker that
// draws the figures ahead (tape.go); at the end its page count and heading
// pages must equal the set pass's. Nothing the set pass writes depends on
// the timing, so the bytes are those of the passes run one after the
// other.
func layOutTwice(d *doc.Document, o options) (*renderer, error) {
	if o.onePass {
		r := newRenderer(d, o, 0, false)
		if err := r.setAll(); err != nil {
			return nil, err
		}
		return r, nil
	}
	type result struct {
		pages int
		heads []int // the page of every heading
		err   error
	}
	done := make(chan result, 1)
	eqs := &eqCache{m: map[eqKey]eqLayout{}} // shared by both passes
	texts := &textCache{m: map[textKey][]line{}}
	var figs *ahead // figures drawn ahead (tape.go)
	if !o.onSpot {
		figs = newAhead(countFigures(d.Blocks))
	}
	go func() {
		var res result
		defer func() {
			if p := recover(); p != nil {
				res = result{err: fmt.Errorf("pdf: render: %v", p)}
			}
			done <- res
		}()
		defer figs.close()
		dry := newRenderer(d, options{}, 0, true)
		dry.eqs, dry.texts = eqs, texts
		dry.ahead = figs // the dry pass submits the figures it places
		res.err = dry.run()
		res.pages, res.heads = dry.pdf.PageNo(), dry.headPages
	}()
	r := newRenderer(d, o, 0, false)
	r.eqs, r.texts = eqs, texts
	r.ahead = figs
	err := func() (err error) {
		defer func() { // a panic in the set pass: wait for the dry pass, then re-raise
			if p := recover(); p != nil {
				<-done
				panic(p)
			}
		}()
		return r.setAll()
	}()
	if dry := <-done; dry.err != nil {
		return nil, dry.err
	} else if err != nil {
		return nil, err
	} else if r.pdf.PageNo() != dry.pages || !slices.Equal(r.headPages, dry.heads) {
		return nil, fmt.Errorf("pdf: layout passes disagree: %d pages with headings on %v, then %d with %v", dry.pages, dry.heads, r.pdf.PageNo(), r.headPages)
	}
	return r, nil
}

// setAll is the set pass: it sets the document, leaving the footers and
// the contents' page numbers to finishPages, which follows.
func (r *renderer) setAll() error {
	r.late = true
	if err := r.run(); err != nil {
		return err
	}
	r.finishPages()
	return r.pdf.Error()
}

// finishPages writes into every page of the set pass what needed the
// whole layout: the footers with the page count and the contents' page
// numbers. Each string is set with its font, size and colour sent to the
// page again (lateText), as the page's own content may have left others
// in force.
func (r *renderer) finishPages() {
	n := r.pdf.PageNo()
	r.total = n
	r.late = false
	for p := 1; p <= n; p++ {
		r.pdf.SetPage(p)
		r.footerText()
	}
	for _, e := range r.lateNums {
		if e.index >= len(r.headPages) {
			continue
		}
		r.pdf.SetPage(e.page)
		page := fmt.Sprint(r.headPages[e.index])
		fam, sty := e.st.face()
		pw := textWidthOf(fam, sty, e.st.size, page)
		r.lateText(page, e.st, e.right-pw, e.base)
	}
	r.pdf.SetPage(n)
	r.finished = true
}

// lateText is simpleText on a page set before: the font and colour are
// sent to the page whatever fpdf last sent elsewhere.
func (r *renderer) lateText(s string, st textStyle, x, y float64) {
	f := makeFrag(st, s)
	r.fonts.use(f.fam, f.sty, f.size)
	r.pdf.SetFontSize(f.size) // sends Tf always
	r.pdf.SetFillColor(f.color.r, f.color.g, f.color.b)
	r.text(f, x, y)
}

// epoch stands in for a missing creation date so output stays reproducible.
var epoch = time.Date(2000, 1, 1, 0, 0, 0, 0, time.UTC)

type renderer struct {
	// leadFloor is the least scale of the figure a lead-in just set
	// introduces, judged by the room above the lead-in (0: none).
	leadFloor float64

	pdf    *fpdf.Fpdf
	fonts  *fontSet
	meta   doc.Meta
	blocks []doc.Block
	total  int  // page count, 0 while unknown
	dry    bool // lay out only
	// measuring: a layout of part of the document to measure it
	// (closingWhole), which measures nothing itself.
	measuring bool
	// late: the footers and the contents' page numbers are left to
	// finishPages (the set pass of layOutTwice); finished once it has run.
	late, finished bool
	lateNums       []lateNum
	onText         func(page int, s string)
	eqs            *eqCache   // equation layouts, shared with the other pass
	texts          *textCache // lines of the document's text, likewise; nil: none kept
	ahead          *ahead     // figures drawn ahead (tape.go); nil: on the spot
	onPlace        func(page int, x, y float64, s string)

	x, w  float64 // current column
	y     float64 // cursor, points from the top edge
	fresh bool    // nothing placed on this page yet
	space float64 // pending vertical space before the next block

	h1, fig, tab int
	depth        int     // list nesting
	marker       *marker // list marker waiting for its item's first line
	outline      int     // level of the last bookmark, -1 before the first

	headPages []int // the page of every heading, in order
	boxes     []Box // placement records
	kind      string
	index     int         // the top-level block being set
	rest      []doc.Block // the top-level blocks after it
}

// Box is one placement record of the layout: a block's kind and the
// vertical extent it took on a page, points from the top edge.
type Box struct {
	Page  int
	Block int // index of the top-level block it belongs to
	// Kind is "heading", "paragraph", "figure", … A table gives a "table
	// start" box (its caption, header and first rows, kept together), a
	// "table" box for every row (or slice of a row split over pages) and
	// a "table head" box for its header repeated on a page it continues on.
	Kind        string
	Top, Bottom float64
}

// Layout is what the layout engine placed where, for tests of the page
// rules: no measurement of pixels, only the engine's own records.
type Layout struct {
	Pages int
	// BodyTop and BodyBottom bound the text area of every page.
	BodyTop, BodyBottom float64
	Boxes               []Box
	// Broken lists the pages ended by an explicit page break.
	Broken []int
}

// Measure lays d out without drawing and returns the placements.
func Measure(d *doc.Document) (l *Layout, err error) {
	defer func() {
		if p := recover(); p != nil {
			l, err = nil, fmt.Errorf("pdf: layout: %v", p)
		}
	}()
	r := newRenderer(d, options{}, 0, true)
	if err := r.run(); err != nil {
		return nil, err
	}
	l = &Layout{Pages: r.pdf.PageNo(), BodyTop: bodyTop, BodyBottom: bodyBottom, Boxes: r.boxes}
	for _, b := range r.boxes {
		if b.Kind == "break" {
			l.Broken = append(l.Broken, b.Page)
		}
	}
	return l, nil
}

// place records that kind took top..bottom on the current page.
func (r *renderer) place(kind string, top, bottom float64) {
	r.boxes = append(r.boxes, Box{Page: r.pdf.PageNo(), Block: r.index, Kind: kind, Top: top, Bottom: bottom})
}

type marker struct {
	text  string
	right float64    // right edge of the marker
	st    *textStyle // nil: the list marker style
}

func newRenderer(d *doc.Document, o options, total int, dry bool) *renderer {
	// The dry pass sets no text and needs no faces; the set pass takes a
	// document with the common faces registered (warm.go).
	var fs *fontSet
	var pdf *fpdf.Fpdf
	if dry {
		pdf = fpdf.NewCustom(&fpdf.InitType{OrientationStr: "P", UnitStr: "pt", SizeStr: "A4"})
		fs = &fontSet{pdf: pdf}
	} else {
		p := takePrepared()
		pdf, fs = p.pdf, &fontSet{pdf: p.pdf, added: p.added}
	}
	r := &renderer{
		pdf:     pdf,
		fonts:   fs,
		meta:    d.Meta,
		blocks:  d.Blocks,
		total:   total,
		dry:     dry,
		onText:  o.onText,
		onPlace: o.onPlace,
		outline: -1,
		eqs:     &eqCache{m: map[eqKey]eqLayout{}},
	}
	created := d.Meta.Created
	if created.IsZero() {
		created = epoch
	}
	created = created.UTC()
	pdf.SetCompression(o.compress && o.fpdfDeflate) // else deflatePages compresses the pages
	pdf.SetCatalogSort(true)
	pdf.SetCreationDate(created)
	pdf.SetModificationDate(created)
	pdf.SetTitle(bmp(d.Meta.Title), true)
	pdf.SetSubject(bmp(d.Meta.Subject), true)
	pdf.SetAuthor(bmp(d.Meta.Author), true)
	pdf.SetKeywords(bmp(d.Meta.Keywords), true)
	pdf.SetCreator("coilmemo", true)
	pdf.SetProducer("coilmemo", true)
	pdf.SetDisplayMode("fullwidth", "OneColumn")
	pdf.SetMargins(marginLeft, bodyTop, marginRight)
	pdf.SetAutoPageBreak(false, 0)
	pdf.SetHeaderFuncMode(r.header, false)
	pdf.SetFooterFunc(r.footer)
	return r
}

func (r *renderer) run() error {
	r.x, r.w = marginLeft, textWidth
	r.newPage()
	r.blockList(r.blocks)
	return r.pdf.Error()
}

// newPage starts a page; the current column (list indentation) carries on.
// pageBreak starts a new page unless the page is fresh or, for a break
// taken only on the first page, the first page has been left.
func (r *renderer) pageBreak(b doc.PageBreak) {
	if r.fresh || (b.FirstPageOnly && r.pdf.PageNo() > 1) {
		return
	}
	r.place("break", r.y, r.y)
	r.newPage()
}

func (r *renderer) newPage() {
	r.pdf.AddPage()
	r.y = bodyTop
	r.fresh = true
	r.space = 0
}

// need places the cursor for a block of height h that wants gap points of
// space above it, starting a new page if the block does not fit. Space is
// collapsed with the previous block's space below and dropped at the top of
// a page.
func (r *renderer) need(gap, h float64) {
	if r.space < gap {
		r.space = gap
	}
	if r.fresh {
		r.space = 0
	}
	if !r.fresh && r.y+r.space+h > bodyBottom+0.01 {
		r.newPage()
	}
	r.y += r.space
	r.space = 0
	r.fresh = false
	r.place(r.kind, r.y, r.y+h)
}

// room is the height left on the page after the pending space.
func (r *renderer) room(gap float64) float64 {
	if r.fresh {
		return bodyBottom - r.y
	}
	return bodyBottom - r.y - max(r.space, gap)
}

func (r *renderer) after(gap float64) { r.space = gap }

func (r *renderer) blockList(bs []doc.Block) {
	var order []int // the blocks' indices in bs as given, once floatFigure reorders
	for i := 0; i < len(bs); i++ {
		if r.depth == 0 {
			if k := r.floatFigure(bs, i); k > i+2 {
				if order == nil {
					order = make([]int, len(bs))
					for n := range order {
						order[n] = n
					}
				}
				bs = slices.Concat(bs[:i], bs[i+2:k], bs[i:i+2], bs[k:])
				order = slices.Concat(order[:i], order[i+2:k], order[i:i+2], order[k:])
			}
		}
		b := bs[i]
		r.index = i
		if order != nil {
			r.index = order[i]
		}
		r.kind = kindOf(b)
		r.rest = bs[i+1:]
		var next doc.Block
		if i+1 < len(bs) {
			next = bs[i+1]
		}
		r.block(b, next)
	}
}

// floatBlank is the part of the text area a figure's lead-in and figure
// that move to the next page may leave blank before floatFigure lets the
// text after them fill it.
const floatBlank = 0.25

// floatFigure returns k > i+2 when bs[i] is the short lead-in of figure
// bs[i+1] that, with the figure shrunk as far as figure allows, does not
// fit in the rest of the page, leaving more than floatBlank of it blank:
// the text blocks bs[i+2:k] that follow the figure (paragraphs, equations,
// tables and lists, up to the next heading, figure or the lead-in of the
// next figure) are then set first, and the lead-in and its figure after
// them, as a figure floats in typesetting. Otherwise it returns i.
func (r *renderer) floatFigure(bs []doc.Block, i int) int {
	if r.fresh || i+2 >= len(bs) {
		return i
	}
	p, ok := bs[i].(doc.Paragraph)
	if !ok {
		return i
	}
	f, ok := bs[i+1].(doc.Figure)
	if !ok {
		return i
	}
	n := len(r.lines(p.Spans, styBody, r.w, r.w))
	if n > leadInLines {
		return i
	}
	room := r.room(0)
	if float64(n)*leadBody+6.5+8+r.leastFigure(f) <= room || room < floatBlank*(bodyBottom-bodyTop) {
		return i
	}
	k := i + 2
	for ; k < len(bs); k++ {
		switch bs[k].(type) {
		case doc.Paragraph, doc.Equation, doc.Table, doc.List:
			if _, fig := bs[k].(doc.Paragraph); fig && k+1 < len(bs) {
				if _, next := bs[k+1].(doc.Figure); next {
					return k
				}
			}
			continue
		}
		break
	}
	return k
}

// kindOf names a block's kind in the placement records.
func kindOf(b doc.Block) string {
	switch b.(type) {
	case doc.Heading, *doc.Heading:
		return "heading"
	case doc.Paragraph, *doc.Paragraph:
		return "paragraph"
	case doc.Figure, *doc.Figure:
		return "figure"
	case doc.Table, *doc.Table:
		return "table"
	case doc.Equation, *doc.Equation:
		return "equation"
	}
	return "block"
}

func (r *renderer) block(b doc.Block, next doc.Block) {
	switch b := b.(type) {
	case doc.Heading:
		r.heading(b, next)
	case *doc.Heading:
		r.heading(*b, next)
	case doc.Paragraph:
		r.paragraph(b)
	case *doc.Paragraph:
		r.paragraph(*b)
	case doc.List:
		r.list(b)
	case *doc.List:
		r.list(*b)
	case doc.Table:
		r.table(b)
	case *doc.Table:
		r.table(*b)
	case doc.Figure:
		r.figure(b)
	case *doc.Figure:
		r.figure(*b)
	case doc.Callout:
		r.callout(b)
	case *doc.Callout:
		r.callout(*b)
	case doc.TitleBlock:
		r.titleBlock(b)
	case *doc.TitleBlock:
		r.titleBlock(*b)
	case doc.Code:
		r.code(b)
	case *doc.Code:
		r.code(*b)
	case doc.Equation:
		r.equation(b)
	case *doc.Equation:
		r.equation(*b)
	case doc.PageBreak:
		r.pageBreak(b)
	case *doc.PageBreak:
		r.pageBreak(*b)
	case doc.Contents:
		r.contents(b)
	case *doc.Contents:
		r.contents(*b)
	case nil:
	default:
		r.pdf.SetError(fmt.Errorf("pdf: unknown block type %T", b))
	}
}

// ---- running header and footer ----

var (
	styHeader     = textStyle{size: 7.5, lead: 9, color: colMuted}
	styHeaderBold = textStyle{size: 7.5, lead: 9, color: colAccent, bold: true}
)

func (r *renderer) header() {
	if r.dry {
		return
	}
	base := mm(12.2)
	// The id takes at most half the line when there is a title beside it.
	idRoom := textWidth
	if r.meta.Title != "" {
		idRoom = textWidth / 2
	}
	id := fit(r.meta.DocID, styHeaderBold, idRoom)
	idW := 0.0
	if id != "" {
		idW = textWidthOf("sans", "B", styHeaderBold.size, id)
		r.simpleText(id, styHeaderBold, pageW-marginRight-idW, base)
	}
	title := fit(r.meta.Title, styHeader, textWidth-idW-mm(8))
	if title != "" {
		r.simpleText(title, styHeader, marginLeft, base)
	}
	r.rule(marginLeft, mm(14.2), pageW-marginRight, 0.6, colAccent)
}

// footer is fpdf's footer callback: the footer is set here only by a
// renderer told its page count beforehand (newRenderer's total); the set
// pass of layOutTwice sets every footer in finishPages.
func (r *renderer) footer() {
	if r.dry || r.late || r.finished {
		return
	}
	r.footerText()
}

// footerText sets the current page's footer: the document id, revision
// and date, and "Page X of Y".
func (r *renderer) footerText() {
	r.rule(marginLeft, pageH-mm(14.5), pageW-marginRight, 0.35, colRule)
	base := pageH - mm(10.8)
	var left []string
	if r.meta.DocID != "" {
		left = append(left, r.meta.DocID)
	}
	if r.meta.Revision != "" {
		left = append(left, "Revision "+r.meta.Revision)
	}
	if !r.meta.Created.IsZero() {
		left = append(left, r.meta.Created.UTC().Format("2006-01-02"))
	}
	page := fmt.Sprintf("Page %d of %d", r.pdf.PageNo(), r.total)
	w := textWidthOf("sans", "", styHeader.size, page)
	if len(left) > 0 {
		if s := fit(strings.Join(left, "  ·  "), styHeader, textWidth-w-mm(8)); s != "" {
			r.lateText(s, styHeader, marginLeft, base)
		}
	}
	r.lateText(page, styHeader, pageW-marginRight-w, base)
}

// fit shortens s with an ellipsis until it is at most w wide: one cut,
// found in one pass over the characters' widths.
func fit(s string, st textStyle, w float64) string {
	fam, sty := st.face()
	s = bmp(s)
	if textWidthOf(fam, sty, st.size, s) <= w {
		return s
	}
	ell := textWidthOf(fam, sty, st.size, "…")
	if ell > w {
		return ""
	}
	return strings.TrimRight(s[:prefixFitting(fam, sty, st.size, s, w-ell)], " ") + "…"
}

// ---- drawing helpers ----

func (r *renderer) rule(x0, y, x1, width float64, c rgb) {
	if r.dry {
		return
	}
	r.pdf.SetLineWidth(width)
	r.pdf.SetDrawColor(c.r, c.g, c.b)
	r.pdf.Line(x0, y, x1, y)
}

func (r *renderer) vrule(x, y0, y1, width float64, c rgb) {
	if r.dry {
		return
	}
	r.pdf.SetLineWidth(width)
	r.pdf.SetDrawColor(c.r, c.g, c.b)
	r.pdf.Line(x, y0, x, y1)
}

func (r *renderer) fillRect(x, y, w, h float64, c rgb) {
	if r.dry {
		return
	}
	r.pdf.SetFillColor(c.r, c.g, c.b)
	r.pdf.Rect(x, y, w, h, "F")
}

func (r *renderer) strokeRect(x, y, w, h, width float64, c rgb) {
	if r.dry {
		return
	}
	r.pdf.SetLineWidth(width)
	r.pdf.SetDrawColor(c.r, c.g, c.b)
	r.pdf.Rect(x, y, w, h, "D")
}

// bookmark adds an outline entry at the cursor.
func (r *renderer) bookmark(text string, level int) {
	if level > r.outline+1 {
		level = r.outline + 1
	}
	r.outline = level
	if r.dry {
		return
	}
	r.fonts.use("sans", "", sizeBody) // the outline text is UTF-16 only with a UTF-8 font current
	r.pdf.Bookmark(bmp(text), level, r.y)
}
