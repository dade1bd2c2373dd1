package memo

import "coilmemo/doc"

// contents opens page 2: the approval block (who prepared, checked and
// approved the memo, and when) and the table of contents. The contents'
// entries are filled in by compose once every section is written.
func (c *composer) contents() {
	m := c.j.Spec.Memo
	dash := func(s string) string {
		if s == "" {
			return "—"
		}
		return s
	}
	prepared := m.PreparedDate
	if prepared == "" {
		prepared = m.Date
	}
	// the gaps shown as they are: an issued memo whose approver is not
	// named, a date after the memo's own
	approver := dash(approvedBy(m))
	date := func(d string) string {
		if m.AfterDate(d) {
			return d + " (after the memo's date)"
		}
		return dash(d)
	}
	c.add(doc.Paragraph{Spans: []doc.Span{{Text: "Approval", Strong: true}}})
	c.add(doc.Table{
		Header: []string{"Role", "Name", "Date", "Signature"},
		Rows: [][]doc.Cell{
			{{Text: "Prepared by"}, {Text: dash(m.Author)}, {Text: date(prepared)}, {}},
			{{Text: "Checked by"}, {Text: dash(m.Checker)}, {Text: date(m.CheckedDate)}, {}},
			{{Text: "Approved by"}, {Text: approver}, {Text: date(m.ApprovedDate)}, {}},
		},
		Widths: []float64{1.2, 2, 1.2, 2},
		Align:  []doc.Align{doc.Left, doc.Left, doc.Left, doc.Left},
	})
	c.add(doc.Contents{Title: "Contents"})
}

// fillContents lists every heading of the memo in its contents block.
func fillContents(blocks []doc.Block) {
	entries := doc.ContentsOf(blocks)
	for i, b := range blocks {
		if t, ok := b.(doc.Contents); ok {
			t.Entries = entries
			blocks[i] = t
		}
	}
}
