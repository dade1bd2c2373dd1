package memo

import (
	"fmt"
	"path/filepath"

	"coilmemo/doc"
	"coilmemo/templates"
)

func (c *composer) verification() {
	c.heading(1, "Verification")
	c.para(templates.Text("verification", nil))
	if len(c.j.Checks) == 0 {
		c.para("No independent check applies to this design's forms.")
		return
	}
	var rows [][]doc.Cell
	for _, k := range c.j.Checks {
		st := doc.Pass
		if !k.Pass {
			st = doc.Fail
		}
		name := k.Name
		if k.Coil != "" {
			name = k.Coil + ": " + name
		}
		rows = append(rows, []doc.Cell{
			{Text: name}, {Text: k.Method + " → " + Eng(k.Value, k.Unit, 6)},
			{Text: k.Reference + " → " + Eng(k.Expected, k.Unit, 6)},
			{Text: Percent(k.RelDiff)}, {Text: Percent(k.Tolerance)},
			{Text: st.String(), Status: st, Strong: true},
		})
	}
	c.add(doc.Table{Caption: "Independent checks of this design's results (relative difference against tolerance)",
		Header: []string{"Check", "This memo", "Independent", "Rel. diff.", "Tol.", "Status"}, Rows: rows,
		Widths: []float64{1.5, 1.95, 1.95, 1.15, 1.15, 0.75},
		Align:  []doc.Align{doc.Left, doc.Left, doc.Left, doc.Right, doc.Right, doc.Center}})
}

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
		date = "not stated (give the memo a date, or set SOURCE_DATE_EPOCH)"
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
