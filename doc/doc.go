// Package doc is the memo's document model: a flat list of typed blocks
// (headings, paragraphs, lists, tables, figures, cautions) with no knowledge
// of PDF, pages or fonts. Backends (memo/pdf for the memo itself, the text
// backend in this package for golden tests) walk the same model.
package doc

import (
	"fmt"
	"time"

	"gonum.org/v1/plot/vg"
)

// Document is one memo.
type Document struct {
	Meta   Meta
	Blocks []Block
}

// Meta is what every page and the PDF metadata carry.
type Meta struct {
	Title    string
	Subject  string
	Author   string
	Keywords string
	DocID    string // document id, printed on every page
	Revision string // printed on every page
	// Created is the build date written into the file; it comes from the
	// spec or SOURCE_DATE_EPOCH so the same spec gives the same bytes.
	Created time.Time
}

// Block is one element of the document body.
type Block interface{ isBlock() }

// Heading starts a section. Level 1 headings are numbered sections and
// become top-level PDF bookmarks; level 2 and 3 nest below them.
type Heading struct {
	Level int
	Text  string
}

// Paragraph is running text.
type Paragraph struct {
	Spans []Span
}

// Span is a run of inline text in one style. A Math span holds notation
// (see Equation) set as inline mathematics.
type Span struct {
	Text   string
	Emph   bool
	Strong bool
	Code   bool
	Math   bool
}

// Equation is displayed mathematics: one or more lines of notation set one
// under the other, e.g. the relation in symbols, the same with the numbers
// put in, and the result. A line that starts with a relation sign (=, ≈,
// ≤ …) continues the one above and lines up with its first relation sign.
//
// The notation is a compact TeX-like language: R_{20} = \frac{\rho_{20}
// \ell_w}{A}, \sqrt{…}, x^{2}, Greek by name, \vec{m}, \hat{r}, \cdot,
// \times, \left( … \right), \sum, and upright units in \unit{…} or words
// in \text{…}; memo/mathlayout documents it in full.
type Equation struct {
	Label       string   // the equation's number, e.g. "5.3"; "" for none
	Description string   // what the equation gives, in plain words
	Lines       []string // notation, one string a line
	Result      bool     // the last line is the result: backends emphasise it
}

// List is a bulleted or numbered list; each item is a sequence of blocks
// (in practice paragraphs and nested lists).
type List struct {
	Ordered bool
	Items   [][]Block
}

// Align is a table column's horizontal alignment.
type Align int

const (
	Left Align = iota
	Right
	Center
)

// Status marks a table cell as a check outcome so backends can colour it.
type Status int

const (
	NoStatus Status = iota
	Pass
	Fail
	Warn
)

// Cell is one table cell.
type Cell struct {
	Text   string
	Status Status
	Strong bool
}

// Table is a captioned grid. Widths are relative column weights (nil for
// equal columns); Align is per column (nil for all left).
type Table struct {
	Caption string
	Header  []string
	Rows    [][]Cell
	Widths  []float64
	Align   []Align
}

// Figure is a vector drawing. Draw paints into a canvas of the given size
// with the origin at the bottom left (gonum/plot's vg convention). Summary is
// a short plain-text description used by the text backend.
type Figure struct {
	Number  int
	Caption string
	Width   vg.Length
	Height  vg.Length
	Draw    func(c vg.Canvas, w, h vg.Length)
	Summary string
}

// Severity orders cautions.
type Severity int

const (
	Note Severity = iota
	Caution
	Warning
)

// Callout is a boxed remark: a safety caution, an assumption flag.
type Callout struct {
	Severity Severity
	Title    string
	Spans    []Span
}

// TitleBlock is the identification grid at the top of page 1.
type TitleBlock struct {
	Title  string
	Fields [][2]string // label, value
}

// Code is preformatted text carried over from the spec.
type Code struct {
	Text string
}

// PageBreak starts a new page. FirstPageOnly takes it only on the first
// page: a first page that closes there starts the rest on a fresh page,
// while one whose content ran over lets the rest follow on the page it
// ran onto rather than leave that page nearly blank.
type PageBreak struct {
	FirstPageOnly bool
}

// Contents is the table of contents: a title and one entry per heading of
// the document, in order. Backends that paginate add each heading's page
// and make the same entries the document's bookmarks, so the two agree.
type Contents struct {
	Title   string
	Entries []ContentsEntry
}

// ContentsEntry is one heading listed in the contents.
type ContentsEntry struct {
	Level  int
	Number string // the section number of a level-1 heading, "" below
	Text   string
}

// ContentsOf lists the headings among blocks in order, numbering the
// level-1 headings 1, 2, … as the backends do.
func ContentsOf(blocks []Block) []ContentsEntry {
	var out []ContentsEntry
	n := 0
	for _, b := range blocks {
		h, ok := b.(Heading)
		if !ok {
			if p, isPtr := b.(*Heading); isPtr && p != nil {
				h, ok = *p, true
			}
		}
		if !ok {
			continue
		}
		e := ContentsEntry{Level: max(h.Level, 1), Text: h.Text}
		if h.Level <= 1 {
			n++
			e.Number = fmt.Sprint(n)
		}
		out = append(out, e)
	}
	return out
}

func (Heading) isBlock()    {}
func (Paragraph) isBlock()  {}
func (List) isBlock()       {}
func (Table) isBlock()      {}
func (Figure) isBlock()     {}
func (Callout) isBlock()    {}
func (TitleBlock) isBlock() {}
func (Code) isBlock()       {}
func (Equation) isBlock()   {}
func (PageBreak) isBlock()  {}
func (Contents) isBlock()   {}

// Text is a convenience for a one-span plain paragraph.
func Text(s string) Paragraph { return Paragraph{Spans: []Span{{Text: s}}} }

// String returns a severity's label as printed in the memo.
func (s Severity) String() string {
	switch s {
	case Warning:
		return "WARNING"
	case Caution:
		return "CAUTION"
	}
	return "NOTE"
}

// String returns a status's label as printed in tables.
func (s Status) String() string {
	switch s {
	case Pass:
		return "PASS"
	case Fail:
		return "FAIL"
	case Warn:
		return "CHECK"
	}
	return ""
}
