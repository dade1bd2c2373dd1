package doc

import (
	"bufio"
	"fmt"
	"io"
	"strings"
)

// WriteMarkdown writes the document as CommonMark with GitHub-style
// tables, for a terminal or a code host to render: headings, paragraphs
// with emphasis, lists, tables (a header row and a delimiter row, "|"
// escaped in cells), cautions as block quotes, equations and code as
// fenced blocks, figures as their caption in italics. The title block
// becomes a heading and a two-column table; page breaks and the contents
// are left out.
func WriteMarkdown(w io.Writer, d *Document) error {
	b := bufio.NewWriter(w)
	section := 0
	first := true
	for _, blk := range d.Blocks {
		var s strings.Builder
		markdownBlock(&s, blk, "", &section)
		if s.Len() == 0 {
			continue
		}
		if !first {
			b.WriteString("\n")
		}
		first = false
		b.WriteString(s.String())
	}
	return b.Flush()
}

var mdEscaper = strings.NewReplacer(`\`, `\\`, "*", `\*`, "_", `\_`, "`", "\\`", "[", `\[`, "]", `\]`, "<", `\<`, "#", `\#`)

// mdText escapes the characters Markdown would read as markup.
func mdText(s string) string { return mdEscaper.Replace(s) }

// mdCell is cell text: escaped, with "|" escaped too and no line breaks.
func mdCell(s string) string {
	return strings.ReplaceAll(strings.ReplaceAll(mdText(s), "|", `\|`), "\n", " ")
}

// mdSpans writes inline text; emphasis markers hug their text (spaces
// moved outside them), so that "**WARNING **" cannot occur.
func mdSpans(spans []Span) string {
	var s strings.Builder
	for _, sp := range spans {
		core := strings.TrimSpace(sp.Text)
		if core == "" {
			s.WriteString(sp.Text)
			continue
		}
		lead := sp.Text[:strings.Index(sp.Text, core)]
		trail := sp.Text[len(lead)+len(core):]
		s.WriteString(lead)
		switch {
		case sp.Math, sp.Code:
			fence := "`"
			if strings.Contains(core, "`") {
				fence = "`` "
				s.WriteString(fence + core + " ``")
				break
			}
			s.WriteString(fence + core + fence)
		case sp.Strong:
			s.WriteString("**" + mdText(core) + "**")
		case sp.Emph:
			s.WriteString("*" + mdText(core) + "*")
		default:
			s.WriteString(mdText(core))
		}
		s.WriteString(trail)
	}
	return strings.TrimRight(s.String(), " ")
}

func mdTable(s *strings.Builder, header []string, rows [][]string, align []Align) {
	n := len(header)
	for _, r := range rows {
		n = max(n, len(r))
	}
	if n == 0 {
		return
	}
	row := func(cells []string) {
		s.WriteString("|")
		for j := range n {
			c := ""
			if j < len(cells) {
				c = cells[j]
			}
			s.WriteString(" " + c + " |")
		}
		s.WriteString("\n")
	}
	head := make([]string, n)
	for j := range head {
		if j < len(header) {
			head[j] = mdCell(header[j])
		}
	}
	row(head)
	s.WriteString("|")
	for j := range n {
		a := Left
		if j < len(align) {
			a = align[j]
		}
		switch a {
		case Right:
			s.WriteString(" ---: |")
		case Center:
			s.WriteString(" :---: |")
		default:
			s.WriteString(" --- |")
		}
	}
	s.WriteString("\n")
	for _, r := range rows {
		row(r)
	}
}

func markdownBlock(s *strings.Builder, blk Block, indent string, section *int) {
	switch v := blk.(type) {
	case Heading:
		text := mdText(v.Text)
		if v.Level <= 1 {
			*section++
			text = fmt.Sprintf("%d %s", *section, text)
		}
		fmt.Fprintf(s, "%s %s\n", strings.Repeat("#", min(v.Level+1, 6)), text)
	case Paragraph:
		fmt.Fprintf(s, "%s%s\n", indent, mdSpans(v.Spans))
	case List:
		for i, item := range v.Items {
			mark := "- "
			if v.Ordered {
				mark = fmt.Sprintf("%d. ", i+1)
			}
			sub := indent + strings.Repeat(" ", len(mark))
			for j, b := range item {
				var inner strings.Builder
				markdownBlock(&inner, b, sub, section)
				text := inner.String()
				if j == 0 {
					text = indent + mark + strings.TrimPrefix(text, sub)
				}
				s.WriteString(text)
			}
		}
	case Table:
		if v.Caption != "" {
			fmt.Fprintf(s, "*Table: %s*\n\n", mdText(v.Caption))
		}
		var rows [][]string
		for _, r := range v.Rows {
			cells := make([]string, len(r))
			for i, c := range r {
				t := c.Text
				if c.Status != NoStatus && !strings.Contains(strings.ToUpper(t), c.Status.String()) {
					t = strings.TrimSpace(c.Status.String() + " " + t)
				}
				cells[i] = mdCell(t)
				if (c.Strong || c.Status != NoStatus) && cells[i] != "" {
					cells[i] = "**" + cells[i] + "**"
				}
			}
			rows = append(rows, cells)
		}
		mdTable(s, v.Header, rows, v.Align)
	case Figure:
		fmt.Fprintf(s, "*Figure %d: %s*\n", v.Number, mdText(v.Caption))
	case Callout:
		title := v.Severity.String()
		if v.Title != "" {
			title += " – " + v.Title
		}
		fmt.Fprintf(s, "%s> **%s** %s\n", indent, mdText(title), mdSpans(v.Spans))
	case TitleBlock:
		fmt.Fprintf(s, "# %s\n\n", mdText(v.Title))
		var rows [][]string
		for _, f := range v.Fields {
			rows = append(rows, []string{mdCell(f[0]), mdCell(f[1])})
		}
		mdTable(s, []string{"Item", "Value"}, rows, nil)
	case Code:
		fmt.Fprintf(s, "%s```\n", indent)
		for _, l := range strings.Split(strings.TrimRight(v.Text, "\n"), "\n") {
			fmt.Fprintf(s, "%s%s\n", indent, l)
		}
		fmt.Fprintf(s, "%s```\n", indent)
	case Equation:
		if v.Description != "" {
			fmt.Fprintf(s, "%s%s\n\n", indent, mdText(v.Description))
		}
		fmt.Fprintf(s, "%s```\n", indent)
		for _, l := range v.Lines {
			fmt.Fprintf(s, "%s%s\n", indent, strings.TrimSpace(l))
		}
		fmt.Fprintf(s, "%s```\n", indent)
	case PageBreak, Contents:
	default:
		fmt.Fprintf(s, "%s\n", mdText(fmt.Sprintf("<unknown block %T>", blk)))
	}
}
