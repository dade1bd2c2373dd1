package memo

import (
	"slices"
	"strings"

	"coilmemo/analysis"
	"coilmemo/doc"
	"coilmemo/templates"
)

// verification is the section "Verification": every check of this
// design's results against an independent method or a published table.
func (c *composer) verification() {
	c.heading(1, "Verification")
	c.para(templates.Text("verification", nil))
	if coreChecks(c.j.Checks) > 0 {
		recip := ""
		if slices.ContainsFunc(c.j.Checks, func(k analysis.Check) bool { return k.Core && strings.Contains(k.Name, "reciprocity") }) {
			recip = " and its reciprocity (the core's moment per ampere against its share of the effective area)"
		}
		c.para("A cored coil's rows of its winding are those of the winding in air. The rows of its core check the core's model: its demagnetising factor against closed forms (the uniform cylinder in the limit of a vanishing susceptibility and, for a long rod, the prolate spheroid of the same ratio)" + recip +
			". The figures with the core at the operating point rest on that model; no row recomputes them by an independent method.")
	}
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
