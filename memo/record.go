package memo

import (
	"fmt"
	"path/filepath"

	"coilmemo/doc"
	"coilmemo/templates"
)

func (c *composer) record() {
	c.heading(1, "Record")
	s := c.j.Spec
	date := c.j.Created.Format("2006-01-02")
	switch c.j.DateSource {
	case "SOURCE_DATE_EPOCH":
		date += " (from SOURCE_DATE_EPOCH)"
	case "memo date":
		date += " (the memo's date)"
	}
	if !c.j.Dated {
		date = "not stated"
	}
	rows := [][]doc.Cell{
		{{Text: "Spec file"}, {Text: filepath.Base(s.File)}},
		{{Text: "Spec SHA-256"}, {Text: c.j.SHA256}},
		{{Text: "Tool"}, {Text: "coilmemo " + Version}},
		{{Text: "Build date"}, {Text: date}},
		{{Text: "Document / revision"}, {Text: fmt.Sprintf("%s / %s", orDash(s.Memo.DocumentID), orDash(s.Memo.Revision))}},
	}
	c.add(doc.Table{Header: []string{"Item", "Value"}, Rows: rows, Widths: []float64{1, 3}})
	c.para(templates.Text("record", nil))
	if len(s.Memo.History) == 0 {
		c.para("No revision history is recorded for this document.")
		return
	}
	var hist [][]doc.Cell
	for _, r := range s.Memo.History {
		cur := r.Revision == s.Memo.Revision
		hist = append(hist, []doc.Cell{{Text: r.Revision, Strong: cur}, {Text: r.DateValue.Format("2006-01-02")},
			{Text: r.Author}, {Text: r.Change}})
	}
	c.add(doc.Table{Caption: "Revision history (from the spec's memo block)", Header: []string{"Rev.", "Date", "By", "Change"},
		Rows: hist, Widths: []float64{0.5, 1, 1.3, 4}})
}

// orDash stands in a dash for a value the spec does not give.
func orDash(s string) string {
	if s == "" {
		return "—"
	}
	return s
}
