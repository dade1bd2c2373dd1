// Package spec reads a coil spec: a CommonMark file whose prose becomes the
// memo's narrative and whose fenced parameter blocks (memo, coil,
// conditions, limits, probes, sweep) become a calc.Design in SI.
//
// Parse never stops at the first problem and never panics on bad input:
// every problem is returned as a Diagnostic naming the file and the line of
// the offending text.
package spec

import (
	"bytes"
	"fmt"
	"sort"
	"strings"
	"time"
	"unicode"
	"unicode/utf8"

	"coilmemo/calc"
	"coilmemo/calc/units"
	"coilmemo/doc"

	"github.com/yuin/goldmark"
	"github.com/yuin/goldmark/ast"
	"github.com/yuin/goldmark/extension"
	east "github.com/yuin/goldmark/extension/ast"
	"github.com/yuin/goldmark/text"
	"github.com/yuin/goldmark/util"
)

// Diagnostic is one problem found in a spec, at a 1-based line.
type Diagnostic struct {
	File string
	Line int
	Msg  string
}

// Error formats the diagnostic as "file:line: msg".
func (d Diagnostic) Error() string { return fmt.Sprintf("%s:%d: %s", d.File, d.Line, d.Msg) }

// Diagnostics is every problem found in a spec, sorted by line.
type Diagnostics []Diagnostic

// Error joins the diagnostics, one a line.
func (ds Diagnostics) Error() string {
	s := make([]string, len(ds))
	for i, d := range ds {
		s[i] = d.Error()
	}
	return strings.Join(s, "\n")
}

// Entry is one parameter as the spec wrote it, with its value normalised to
// SI for the memo's inputs table. Entries come in source order; entries for
// defaults the spec left out, and for coil dimensions derived from others
// (mean-diameter from inner- and outer-diameter), follow the entries of
// their block and have Default set and Raw empty.
type Entry struct {
	Block string // memo, coil, conditions, limits, probes, sweep
	Key   string // the key; for limits the quantity, for probes the probe name
	Raw   string // the value as written (comment removed); for limits "<= 120 degC"
	Line  int    // source line; for a default the block's opening fence, or 0 when the block is absent
	SI    string // e.g. "0.12 m", "AWG 28 (bare 0.321 mm)"; "" when the value was rejected

	Coil    string // for coil entries: the coil's name
	Default bool   // the value is a default, not written in the spec
	// Sized marks a coil entry of a key the size block leaves free: its
	// value is the search's choice (analysis.Sizing), not the one written.
	Sized bool
}

// Memo is the memo block: the title block of page 1.
type Memo struct {
	Title, Client, Project, DocumentID, Revision, Date, Author, Checker, Status string

	// Approver signs the memo off; the dates per role are ISO 8601 as
	// YYYY-MM-DD ("" when not given).
	Approver                                string
	PreparedDate, CheckedDate, ApprovedDate string

	// Previous names the previous revision's spec: a path relative to
	// this spec, or "git:REV" for this spec's file at that git revision.
	// PreviousLine is its source line.
	Previous     string
	PreviousLine int

	DateValue time.Time // Date parsed (UTC midnight for a plain date); zero when none

	// History is the revision history, one `history` line each, in the
	// order written.
	History []Revision
}

// IsIssued reports whether the memo block's status says the memo is
// issued (released to its client), not a draft.
func (m Memo) IsIssued() bool {
	return strings.EqualFold(strings.TrimSpace(m.Status), "issued")
}

// AfterDate reports whether date (YYYY-MM-DD, as the memo block keeps a
// role's date) lies after the memo's own date; false when either is
// missing.
func (m Memo) AfterDate(date string) bool {
	if date == "" || m.DateValue.IsZero() {
		return false
	}
	t, err := time.Parse("2006-01-02", date)
	return err == nil && t.After(m.DateValue.Truncate(24*time.Hour))
}

// Revision is one line of the memo's revision history:
//
//	history = B | 2026-11-30 | R. Okonkwo | raised the moment to 0.15 A m2
type Revision struct {
	Revision  string    // revision mark
	Date      string    // as written
	DateValue time.Time // parsed
	Author    string    // who made the revision
	Change    string    // what changed
	Line      int       // source line
}

// Sweep is the sweep block: one coil parameter stepped over a range.
type Sweep struct {
	Param string    // a coil key, e.g. "turns", "mean-diameter", "current"
	Coil  string    // the coil swept; "" sweeps the parameter on every coil
	From  float64   // SI (a fraction for duty, a count for turns)
	To    float64   // SI, included when the steps land on it
	Step  float64   // SI, > 0
	Dim   units.Dim // dimension of From, To and Step
	Line  int       // source line of the parameter
}

// Values returns the swept values From, From+Step, … up to To.
func (s Sweep) Values() []float64 {
	if !(s.Step > 0) || !(s.To >= s.From) {
		return nil
	}
	n := int((s.To-s.From)/s.Step*(1+1e-12) + 1e-9)
	v := make([]float64, 0, n+1)
	for i := 0; i <= n; i++ {
		v = append(v, s.From+float64(i)*s.Step)
	}
	return v
}

// Spec is a parsed coil spec.
type Spec struct {
	File      string
	Memo      Memo
	Narrative []doc.Block // the prose, parameter blocks removed
	// LeadIns are the narrative's top-level paragraphs that a parameter
	// block followed in the spec: Narrative index → the block's name
	// ("tolerances"), so that prose which introduced the block ("… as
	// follows.") can point to where the memo gives it.
	LeadIns map[int]string
	Design  calc.Design
	Entries []Entry
	Sweep   *Sweep // nil without a sweep block
	// Tolerances is the tolerances block; nil without one.
	Tolerances *Tolerances
	// Size is the size block; nil without one.
	Size *Size
	// CoilFences are the lines of the coil blocks' opening fences, in
	// order (the size command writes keys into them).
	CoilFences []int
	// Warnings are positioned remarks for the spec's author that do not
	// stop the memo (an issued memo without an approver); the command
	// line prints them, the memo shows the gap itself.
	Warnings Diagnostics
}

// Block names of parameter blocks.
const (
	blockMemo       = "memo"
	blockCoil       = "coil"
	blockConditions = "conditions"
	blockLimits     = "limits"
	blockProbes     = "probes"
	blockSweep      = "sweep"
	blockTolerances = "tolerances"
	blockSize       = "size"
)

var blockNames = []string{blockMemo, blockCoil, blockConditions, blockLimits, blockProbes, blockSweep, blockTolerances, blockSize}

func isBlockName(s string) bool {
	for _, b := range blockNames {
		if s == b {
			return true
		}
	}
	return false
}

// rawLine is one non-blank line of a parameter block, comment removed.
type rawLine struct {
	text string
	line int
}

// rawBlock is a parameter block as found in the Markdown.
type rawBlock struct {
	kind  string
	fence int // line of the opening fence
	lines []rawLine
}

type parser struct {
	file       string
	src        []byte
	lineStarts []int
	diags      Diagnostics
	blocks     []*rawBlock
	spec       *Spec
	firstH1    string
	rereads    int   // HTML blocks read again as Markdown
	size       *Size // the size block, read before the coil blocks
	// lines of the conditions' orientation and up keys (0: not given),
	// checked against each coil's axis once every block is read
	orientationLine, upLine int
}

// maxRereads bounds the HTML blocks read again as Markdown for the
// parameter blocks they swallowed (each costs a parse of the source up to
// it); a spec has far fewer parameter blocks than this.
const maxRereads = 64

func (p *parser) errf(line int, format string, args ...any) {
	if line < 1 {
		line = 1
	}
	p.diags = append(p.diags, Diagnostic{File: p.file, Line: line, Msg: fmt.Sprintf(format, args...)})
}

// warnf records a warning at line: the memo is still written.
func (p *parser) warnf(line int, format string, args ...any) {
	p.spec.Warnings = append(p.spec.Warnings, Diagnostic{File: p.file, Line: max(line, 1), Msg: fmt.Sprintf(format, args...)})
}

// lineOf returns the 1-based line holding byte offset off.
func (p *parser) lineOf(off int) int {
	// the number of line starts at or before off
	return sort.Search(len(p.lineStarts), func(i int) bool { return p.lineStarts[i] > off })
}

var markdown = goldmark.New(goldmark.WithExtensions(extension.Table))

// Parse reads a spec. It always returns a Spec (partly filled when there
// are problems) and the problems found; the spec is usable only when the
// Diagnostics are empty.
func Parse(file string, src []byte) (*Spec, Diagnostics) {
	p := &parser{file: file, spec: &Spec{File: file}}
	if len(src) > MaxSpecBytes {
		p.errf(1, "the spec is %d bytes, more than the %d bytes (%d kB) a spec may have", len(src), MaxSpecBytes, MaxSpecBytes/1000)
		return p.spec, p.diags
	}
	src = bytes.TrimPrefix(src, []byte(byteOrderMark))
	p.lineStarts = []int{0}
	for i, c := range src {
		if c == '\n' {
			p.lineStarts = append(p.lineStarts, i+1)
		}
	}
	p.src = p.checkText(src)
	root := markdown.Parser().Parse(text.NewReader(p.src))
	p.spec.Narrative = p.blocksOf(root, false)
	p.design()
	if p.spec.Memo.Title == "" {
		p.spec.Memo.Title = p.firstH1
	}
	sort.SliceStable(p.diags, func(i, j int) bool { return p.diags[i].Line < p.diags[j].Line })
	return p.spec, p.diags
}

// blocksOf converts the block children of n to document blocks, collecting
// parameter blocks on the way. inQuote turns headings into paragraphs.
// lastBlock is the last of bs, nil when there is none.
func lastBlock(bs []doc.Block) doc.Block {
	if len(bs) == 0 {
		return nil
	}
	return bs[len(bs)-1]
}

func (p *parser) blocksOf(n ast.Node, inQuote bool) []doc.Block {
	var out []doc.Block
	for c := n.FirstChild(); c != nil; c = c.NextSibling() {
		switch c := c.(type) {
		case *ast.Heading:
			spans := p.spans(c)
			t := spansText(spans)
			if inQuote {
				if t != "" {
					out = append(out, doc.Paragraph{Spans: []doc.Span{{Text: t, Strong: true}}})
				}
				continue
			}
			if c.Level == 1 && p.firstH1 == "" {
				p.firstH1 = t
			}
			out = append(out, doc.Heading{Level: c.Level, Text: t})
		case *ast.Paragraph, *ast.TextBlock:
			if spans := p.spans(c); len(spans) > 0 {
				out = append(out, doc.Paragraph{Spans: spans})
			}
		case *ast.List:
			l := doc.List{Ordered: c.IsOrdered()}
			for it := c.FirstChild(); it != nil; it = it.NextSibling() {
				l.Items = append(l.Items, p.blocksOf(it, inQuote))
			}
			out = append(out, l)
		case *ast.Blockquote:
			out = append(out, p.blocksOf(c, true)...)
		case *ast.FencedCodeBlock:
			if b := p.paramBlock(c); b != nil {
				p.blocks = append(p.blocks, b)
				if _, para := lastBlock(out).(doc.Paragraph); para && !inQuote && n.Kind() == ast.KindDocument {
					if p.spec.LeadIns == nil {
						p.spec.LeadIns = map[int]string{}
					}
					p.spec.LeadIns[len(out)-1] = b.kind
				}
				continue
			}
			out = append(out, doc.Code{Text: p.codeText(c)})
		case *ast.CodeBlock:
			out = append(out, doc.Code{Text: p.codeText(c)})
		case *east.Table:
			out = append(out, p.table(c))
		case *ast.HTMLBlock:
			// no counterpart in the memo, but a parameter block it
			// swallowed is read (see htmlBlock)
			out = append(out, p.htmlBlock(c, inQuote)...)
		case *ast.ThematicBreak:
			// no counterpart in the memo
		default:
			out = append(out, p.blocksOf(c, inQuote)...)
		}
	}
	return out
}

func (p *parser) codeText(n ast.Node) string {
	var b strings.Builder
	lines := n.Lines()
	for i := 0; i < lines.Len(); i++ {
		seg := lines.At(i)
		for j := 0; j < seg.Padding; j++ {
			b.WriteByte(' ')
		}
		b.Write(seg.Value(p.src))
	}
	return strings.TrimRight(strings.ReplaceAll(b.String(), "\r\n", "\n"), "\n")
}

// paramBlock returns the parameter block a fenced code block holds, or nil
// for an ordinary code block. A fence named like a block but for a stray
// plural or singular (coils, limit) is reported and dropped.
func (p *parser) paramBlock(c *ast.FencedCodeBlock) *rawBlock {
	if c.Info == nil {
		return nil
	}
	info := strings.Fields(string(c.Info.Segment.Value(p.src)))
	if len(info) == 0 {
		return nil
	}
	name := strings.ToLower(info[0])
	fence := p.lineOf(c.Info.Segment.Start)
	if !isBlockName(name) {
		for _, b := range blockNames {
			if name == b+"s" || name+"s" == b {
				p.errf(fence, "fenced block %q is not a parameter block; did you mean %q?", info[0], b)
				return &rawBlock{kind: ""}
			}
		}
		return nil
	}
	b := &rawBlock{kind: name, fence: fence}
	lines := c.Lines()
	for i := 0; i < lines.Len(); i++ {
		seg := lines.At(i)
		ln := p.lineOf(seg.Start)
		s := strings.TrimRight(string(seg.Value(p.src)), "\r\n")
		s, err := stripComment(s)
		if err != nil {
			p.errf(ln, "%v", err)
			continue
		}
		s = strings.TrimSpace(s)
		if s == "" {
			continue
		}
		b.lines = append(b.lines, rawLine{text: s, line: ln})
	}
	return b
}

// stripComment removes a # comment, except inside double quotes.
func stripComment(s string) (string, error) {
	i, open := commentStart(s)
	if open {
		return s, fmt.Errorf("unterminated quote in %q", strings.TrimSpace(s))
	}
	return s[:i], nil
}

// commentStart returns the offset of the # that starts a comment in s
// (len(s) when none), a # inside double quotes not counting, and whether
// a quote is left open.
func commentStart(s string) (int, bool) {
	in := false
	for i := 0; i < len(s); i++ {
		switch s[i] {
		case '"':
			in = !in
		case '#':
			if !in {
				return i, false
			}
		}
	}
	return len(s), in
}

func (p *parser) table(t *east.Table) doc.Table {
	var out doc.Table
	for _, a := range t.Alignments {
		switch a {
		case east.AlignRight:
			out.Align = append(out.Align, doc.Right)
		case east.AlignCenter:
			out.Align = append(out.Align, doc.Center)
		default:
			out.Align = append(out.Align, doc.Left)
		}
	}
	for r := t.FirstChild(); r != nil; r = r.NextSibling() {
		var cells []doc.Cell
		for c := r.FirstChild(); c != nil; c = c.NextSibling() {
			spans := p.spans(c)
			strong := len(spans) > 0
			for _, s := range spans {
				strong = strong && s.Strong
			}
			cells = append(cells, doc.Cell{Text: spansText(spans), Strong: strong})
		}
		if _, ok := r.(*east.TableHeader); ok {
			for _, c := range cells {
				out.Header = append(out.Header, c.Text)
			}
			continue
		}
		out.Rows = append(out.Rows, cells)
	}
	return out
}

// spans returns the inline content of n as styled runs, adjacent runs of
// the same style merged, outer white space trimmed.
func (p *parser) spans(n ast.Node) []doc.Span {
	var out []doc.Span
	add := func(t string, st doc.Span) {
		if t == "" {
			return
		}
		if k := len(out) - 1; k >= 0 && out[k].Emph == st.Emph && out[k].Strong == st.Strong && out[k].Code == st.Code {
			out[k].Text += t
			return
		}
		st.Text = t
		out = append(out, st)
	}
	var walk func(n ast.Node, st doc.Span)
	walk = func(n ast.Node, st doc.Span) {
		for c := n.FirstChild(); c != nil; c = c.NextSibling() {
			switch c := c.(type) {
			case *ast.Text:
				v := c.Segment.Value(p.src)
				if !c.IsRaw() {
					v = unescape(v)
				}
				add(string(v), st)
				if c.SoftLineBreak() || c.HardLineBreak() {
					add(" ", st)
				}
			case *ast.String:
				v := c.Value
				if !c.IsCode() && !c.IsRaw() {
					v = unescape(v)
				}
				add(string(v), st)
			case *ast.CodeSpan:
				var b strings.Builder
				for t := c.FirstChild(); t != nil; t = t.NextSibling() {
					if tx, ok := t.(*ast.Text); ok {
						b.Write(tx.Segment.Value(p.src))
					}
				}
				cs := st
				cs.Code = true
				add(strings.ReplaceAll(b.String(), "\n", " "), cs)
			case *ast.Emphasis:
				es := st
				if c.Level >= 2 {
					es.Strong = true
				} else {
					es.Emph = true
				}
				walk(c, es)
			case *ast.AutoLink:
				add(string(c.Label(p.src)), st)
			case *ast.RawHTML:
				// dropped: the memo is not HTML
			default:
				walk(c, st)
			}
		}
	}
	walk(n, doc.Span{})
	if len(out) > 0 {
		out[0].Text = strings.TrimLeft(out[0].Text, " \t")
		k := len(out) - 1
		out[k].Text = strings.TrimRight(out[k].Text, " \t")
		// drop runs the trimming emptied
		kept := out[:0]
		for _, s := range out {
			if s.Text != "" {
				kept = append(kept, s)
			}
		}
		out = kept
	}
	return out
}

func unescape(v []byte) []byte {
	return util.UnescapePunctuations(util.ResolveNumericReferences(util.ResolveEntityNames(v)))
}

func spansText(spans []doc.Span) string {
	var b strings.Builder
	for _, s := range spans {
		b.WriteString(s.Text)
	}
	return b.String()
}

// MaxSpecBytes bounds the size of a spec: a long design memo's spec is a
// few tens of kilobytes; a file this large is not one.
const MaxSpecBytes = 256_000

const byteOrderMark = "\uFEFF"

// maxTextDiags bounds the diagnostics about invalid bytes and control
// characters: a binary file would give one per byte.
const maxTextDiags = 20

// checkText reports every byte of src that is not UTF-8 and every control
// character other than tab and the line breaks, LF and CRLF (a lone CR
// is reported: the Markdown reader would take it for a line break that
// the line count does not see; all text of a spec is printed: prose in
// the memo, values in its inputs table), and returns src
// with each of them replaced by '?' so that the rest of the spec is read
// with its positions unchanged.
func (p *parser) checkText(src []byte) []byte {
	out, copied := src, false
	n := 0
	report := func(off int, format string, args ...any) {
		if !copied {
			out, copied = append([]byte(nil), src...), true
		}
		n++
		if n <= maxTextDiags {
			ln := p.lineOf(off)
			col := utf8.RuneCount(src[p.lineStarts[ln-1]:off]) + 1
			p.errf(ln, "column %d: %s", col, fmt.Sprintf(format, args...))
		}
	}
	for i := 0; i < len(src); {
		c := src[i]
		if c < utf8.RuneSelf {
			switch {
			case c == '\r' && (i+1 == len(src) || src[i+1] != '\n'):
				// a line break to the Markdown reader but not to the
				// line count, so positions would drift
				report(i, "carriage return without a line feed; save the spec with LF or CRLF line endings")
				out[i] = '?'
			case (c < 0x20 && c != '\t' && c != '\n' && c != '\r') || c == 0x7f:
				report(i, "control character U+%04X; a spec may hold no control characters other than tab", c)
				out[i] = '?'
			}
			i++
			continue
		}
		r, size := utf8.DecodeRune(src[i:])
		switch {
		case r == utf8.RuneError && size == 1:
			report(i, "byte 0x%02X is not UTF-8; save the spec as UTF-8", c)
			out[i] = '?'
		case unicode.IsControl(r):
			report(i, "control character U+%04X; a spec may hold no control characters other than tab", r)
			for k := 0; k < size; k++ {
				out[i+k] = '?'
			}
		}
		i += size
	}
	if n > maxTextDiags {
		p.errf(p.lineOf(len(src)-1), "%d more invalid bytes or control characters not listed", n-maxTextDiags)
	}
	return out
}

// fenceInfo returns the block name a line opening a fenced code block
// gives ("coil" for "```coil"), or "".
func fenceInfo(line []byte) string {
	t := bytes.TrimLeft(line, " ")
	if len(line)-len(t) > 3 {
		return ""
	}
	for _, f := range []string{"```", "~~~"} {
		if bytes.HasPrefix(t, []byte(f)) {
			info := strings.Fields(strings.TrimLeft(string(t), f[:1]))
			if len(info) > 0 {
				return strings.ToLower(info[0])
			}
		}
	}
	return ""
}

// htmlBlock looks into an HTML block for the opening fence of a parameter
// block. An HTML block that ends at a blank line (a <div> line, say)
// swallows a fence written right under it; that fence and everything after
// it in the block is read again as Markdown, so the parameter block counts.
// A fence inside an HTML block that ends only at its closing tag
// (<pre>, <script>, an unclosed <!-- comment) is not read, and is reported.
func (p *parser) htmlBlock(c *ast.HTMLBlock, inQuote bool) []doc.Block {
	lines := c.Lines()
	for i := 0; i < lines.Len(); i++ {
		seg := lines.At(i)
		name := fenceInfo(seg.Value(p.src))
		if !isBlockName(name) {
			continue
		}
		ln := p.lineOf(seg.Start)
		switch c.HTMLBlockType {
		case ast.HTMLBlockType6, ast.HTMLBlockType7:
			if p.rereads++; p.rereads > maxRereads {
				p.errf(ln, "the %s block here follows a line of HTML without a blank line between them; put a blank line before it", name)
				return nil
			}
			end := lines.At(lines.Len() - 1).Stop
			// the part of the source from the fence to the end of the
			// block, everything else blanked: offsets and lines stay
			sub := make([]byte, end)
			for k, b := range p.src[:end] {
				if b == '\n' || b == '\r' || (k >= seg.Start && k < end) {
					sub[k] = b
				} else {
					sub[k] = ' '
				}
			}
			return p.blocksOf(markdown.Parser().Parse(text.NewReader(sub)), inQuote)
		case ast.HTMLBlockType2:
			if c.HasClosure() {
				continue // a parameter block commented out on purpose
			}
			p.errf(ln, "the %s block here is inside an HTML comment that opens on line %d and is never closed (no -->), so it is not read",
				name, p.lineOf(lines.At(0).Start))
			return nil
		default:
			p.errf(ln, "the %s block here is inside the HTML block that opens on line %d, so it is not read; close the HTML before it, with a blank line between",
				name, p.lineOf(lines.At(0).Start))
			return nil
		}
	}
	return nil
}
