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
	c.add(doc.Paragraph{Spans: []doc.Span{{Text: "Approval", Strong: true}}})
	c.add(doc.Table{
		Header: []string{"Role", "Name", "Date", "Signature"},
		Rows: [][]doc.Cell{
			{{Text: "Prepared by"}, {Text: dash(m.Author)}, {Text: dash(prepared)}, {}},
			{{Text: "Checked by"}, {Text: dash(m.Checker)}, {Text: dash(m.CheckedDate)}, {}},
			{{Text: "Approved by"}, {Text: dash(m.Approver)}, {Text: dash(m.ApprovedDate)}, {}},
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
