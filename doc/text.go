package doc

import (
	"bufio"
	"fmt"
	"io"
	"strings"
	"unicode/utf8"
)

// WriteText writes a plain-text rendering of the document: every block's
// content in order, without layout. It is the backend of the golden tests,
// so memo content can be reviewed and diffed without comparing PDF bytes.
func WriteText(w io.Writer, d *Document) error {
	b := bufio.NewWriter(w)
	fmt.Fprintf(b, "# %s\n", d.Meta.Title)
	fmt.Fprintf(b, "document %s, revision %s\n", d.Meta.DocID, d.Meta.Revision)
	section := 0
	for _, blk := range d.Blocks {
		b.WriteString("\n")
		writeBlock(b, blk, "", &section)
	}
	return b.Flush()
}

// BlockText is one block's plain-text rendering, as WriteText gives it
// (a level-1 heading unnumbered).
func BlockText(blk Block) string {
	var s strings.Builder
	b := bufio.NewWriter(&s)
	section := -1
	writeBlock(b, blk, "", &section)
	b.Flush()
	return s.String()
}

func writeBlock(b *bufio.Writer, blk Block, indent string, section *int) {
	switch v := blk.(type) {
	case Heading:
		if v.Level == 1 {
			*section++
			fmt.Fprintf(b, "%s %d %s\n", strings.Repeat("#", v.Level+1), *section, v.Text)
		} else {
			fmt.Fprintf(b, "%s %s\n", strings.Repeat("#", v.Level+1), v.Text)
		}
	case Paragraph:
		fmt.Fprintf(b, "%s%s\n", indent, spansText(v.Spans))
	case List:
		for i, item := range v.Items {
			mark := "- "
			if v.Ordered {
				mark = fmt.Sprintf("%d. ", i+1)
			}
			for j, sub := range item {
				prefix := indent + strings.Repeat(" ", len(mark))
				if j == 0 {
					b.WriteString(indent + mark)
					prefix = indent + strings.Repeat(" ", len(mark))
					if p, ok := sub.(Paragraph); ok {
						fmt.Fprintf(b, "%s\n", spansText(p.Spans))
						continue
					}
					b.WriteString("\n")
				}
				writeBlock(b, sub, prefix, section)
			}
		}
	case Table:
		if v.Caption != "" {
			fmt.Fprintf(b, "Table: %s\n", v.Caption)
		}
		if len(v.Header) > 0 {
			fmt.Fprintf(b, "| %s |\n", strings.Join(v.Header, " | "))
		}
		for _, row := range v.Rows {
			cells := make([]string, len(row))
			for i, c := range row {
				cells[i] = c.Text
				if c.Status != NoStatus && c.Text != c.Status.String() {
					cells[i] += " [" + c.Status.String() + "]"
				}
			}
			fmt.Fprintf(b, "| %s |\n", strings.Join(cells, " | "))
		}
	case Figure:
		fmt.Fprintf(b, "[Figure %d: %s]\n", v.Number, v.Caption)
		if v.Summary != "" {
			fmt.Fprintf(b, "%s\n", v.Summary)
		}
	case Callout:
		title := v.Severity.String()
		if v.Title != "" {
			title += " – " + v.Title
		}
		fmt.Fprintf(b, "%s[%s] %s\n", indent, title, spansText(v.Spans))
	case TitleBlock:
		fmt.Fprintf(b, "== %s ==\n", v.Title)
		for _, f := range v.Fields {
			fmt.Fprintf(b, "%s: %s\n", f[0], f[1])
		}
	case Code:
		for _, line := range strings.Split(strings.TrimRight(v.Text, "\n"), "\n") {
			fmt.Fprintf(b, "%s    %s\n", indent, line)
		}
	case Equation:
		writeEquation(b, v, indent)
	case PageBreak:
		b.WriteString("---- page break ----\n")
	case Contents:
		fmt.Fprintf(b, "== %s ==\n", v.Title)
		for _, e := range v.Entries {
			pad := strings.Repeat("  ", max(e.Level-1, 0))
			if e.Number != "" {
				fmt.Fprintf(b, "%s%s %s\n", pad, e.Number, e.Text)
			} else {
				fmt.Fprintf(b, "%s%s\n", pad, e.Text)
			}
		}
	default:
		fmt.Fprintf(b, "%s<unknown block %T>\n", indent, blk)
	}
}

// spansText flattens spans, marking emphasis the Markdown way.
func spansText(spans []Span) string {
	var s strings.Builder
	for _, sp := range spans {
		switch {
		case sp.Math:
			s.WriteString("$" + sp.Text + "$")
		case sp.Code:
			s.WriteString("`" + sp.Text + "`")
		case sp.Strong:
			s.WriteString("**" + sp.Text + "**")
		case sp.Emph:
			s.WriteString("*" + sp.Text + "*")
		default:
			s.WriteString(sp.Text)
		}
	}
	return s.String()
}

// writeEquation prints an equation's notation as written, one line under
// the other, a continuation line's leading relation sign under the first
// relation sign of the line above:
//
//	(5.3) Resistance at 20 °C
//	      R_{20} = \frac{\rho_{20} \ell_w}{A}
//	             = 4.039\,\unit{Ω}  ◀
//
// The last line of a result is marked ◀.
func writeEquation(b *bufio.Writer, e Equation, indent string) {
	head := ""
	if e.Label != "" {
		head = "(" + e.Label + ") "
	}
	fmt.Fprintf(b, "%s%s%s\n", indent, head, e.Description)
	pad := indent + strings.Repeat(" ", max(utf8.RuneCountInString(head), 4))
	col := -1
	for i, l := range e.Lines {
		l = strings.TrimSpace(l)
		prefix := pad
		if r := relationAt(l); r == 0 && col >= 0 {
			prefix += strings.Repeat(" ", col)
		} else if col < 0 && r >= 0 {
			col = r
		}
		mark := ""
		if e.Result && i == len(e.Lines)-1 {
			mark = "  ◀"
		}
		fmt.Fprintf(b, "%s%s%s\n", prefix, l, mark)
	}
}

// relationAt returns the rune column of the first relation sign of a line
// of notation outside braces, or -1.
func relationAt(l string) int {
	depth, col := 0, 0
	for _, r := range l {
		switch r {
		case '{':
			depth++
		case '}':
			depth--
		case '=', '≈', '≤', '≥', '<', '>', '≠', '∝', '→':
			if depth == 0 {
				return col
			}
		}
		col++
	}
	return -1
}
