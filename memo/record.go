package memo

import (
	"fmt"
	"path/filepath"

	"coilmemo/memo/doc"
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
		Widths: []float64{1.7, 2.2, 2.2, 0.8, 0.7, 0.8},
		Align:  []doc.Align{doc.Left, doc.Left, doc.Left, doc.Right, doc.Right, doc.Center}})
}

func (c *composer) record() {
	c.heading(1, "Record")
	s := c.j.Spec
	date := c.j.Created.Format("2006-01-02")
	if !c.j.Dated {
		date = "not stated (give the memo a date, or set SOURCE_DATE_EPOCH)"
	}
	rows := [][]doc.Cell{
		{{Text: "Spec file"}, {Text: filepath.Base(s.File)}},
		{{Text: "Spec SHA-256"}, {Text: c.j.SHA256}},
		{{Text: "Tool"}, {Text: "coilmemo " + Version}},
		{{Text: "Build date"}, {Text: date}},
		{{Text: "Document / revision"}, {Text: fmt.Sprintf("%s / %s", s.Memo.DocumentID, s.Memo.Revision)}},
	}
	c.add(doc.Table{Header: []string{"Item", "Value"}, Rows: rows, Widths: []float64{1, 3}})
	c.para(templates.Text("record", nil))
}
