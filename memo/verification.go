package memo

import (
	"fmt"
	"math"
	"slices"
	"strings"

	"coilmemo/analysis"
	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/format"
	"coilmemo/templates"
)

// verification is the section "Verification": every check of this
// design's results against an independent method or a published table.
func (c *composer) verification() {
	c.heading(1, "Verification")
	c.para(templates.Text("verification", nil))
	if coreChecks(c.j.Checks) > 0 {
		withCore := ""
		if slices.ContainsFunc(c.j.Checks, func(k analysis.Check) bool { return !k.Core && strings.Contains(k.Name, "with the core's") }) {
			withCore = " (a pick-up coil's rows marked with the core's inductance and effective area check the figures computed from them, not them)"
		}
		c.para("A cored coil's rows of its winding are those of the winding in air. The rows of its core check the core's model: its demagnetising factor against closed forms (the uniform cylinder in the limit of a vanishing susceptibility and, for a long rod, the prolate spheroid of the same ratio, which must lie between the rod's fluxmetric and magnetometric factors). The figures with the core at the operating point rest on that model; no row recomputes them by an independent method" + withCore + ".")
	}
	if len(c.j.Checks) == 0 {
		c.para("No independent check applies to this design's forms.")
		return
	}
	groups := checkGroups(c.j.Checks)
	var rows [][]doc.Cell
	var shared []string
	for _, g := range groups {
		if len(g.coils) > 1 {
			shared = append(shared, joinAnd(g.coils))
		}
		for _, r := range g.rows {
			name := r[0].Text
			if len(g.coils) > 0 {
				name = joinAnd(g.coils) + ": " + name
			}
			rows = append(rows, append([]doc.Cell{{Text: name}}, r[1:]...))
		}
	}
	c.add(doc.Table{Caption: "Independent checks of this design's results (relative difference against tolerance)",
		Header: []string{"Check", "This memo", "Independent", "Rel. diff.", "Tol.", "Status"}, Rows: rows,
		Widths: []float64{1.5, 1.95, 1.95, 1.15, 1.15, 0.75},
		Align:  []doc.Align{doc.Left, doc.Left, doc.Left, doc.Right, doc.Right, doc.Center}})
	for _, names := range shared {
		c.para(names + " give the same figures in every check, so their rows are written once.")
	}
}

// checkGroup is the rows of one coil's checks (without the coil's name)
// and every coil whose rows read the same; coils is empty for the
// design's own checks.
type checkGroup struct {
	coils []string
	rows  [][]doc.Cell
}

// checkGroups gathers the checks by coil, in the order the coils first
// appear, and merges a coil whose rows print exactly as an earlier
// coil's into that coil's group: like coils (a three-axis set) give one
// set of rows naming them all.
func checkGroups(ks []analysis.Check) []checkGroup {
	var groups []checkGroup
	at := map[string]int{}
	for _, k := range ks {
		st := doc.Pass
		if !k.Pass {
			st = doc.Fail
		}
		row := []doc.Cell{
			{Text: k.Name + checkPointWords(k.Point)}, {Text: k.Method + " → " + Eng(k.Value, k.Unit, 6)},
			{Text: k.Reference + " → " + Eng(k.Expected, k.Unit, 6)},
			{Text: format.CheckDiff(k.RelDiff, k.Tolerance)}, {Text: format.Tolerance(k.Tolerance)},
			{Text: st.String(), Status: st, Strong: true},
		}
		if k.Bracket {
			// an ordering, not a difference against a tolerance
			row[1].Text = k.Method + " → " + Eng(k.Low, k.Unit, 6) + " … " + Eng(k.High, k.Unit, 6)
			row[3].Text = "in range"
			row[4].Text = "bracket"
		}
		key := "\x00design"
		if k.Coil != "" {
			key = k.Coil
		}
		i, ok := at[key]
		if !ok {
			i = len(groups)
			at[key] = i
			g := checkGroup{}
			if k.Coil != "" {
				g.coils = []string{k.Coil}
			}
			groups = append(groups, g)
		}
		groups[i].rows = append(groups[i].rows, row)
	}
	var out []checkGroup
	for _, g := range groups {
		j := slices.IndexFunc(out, func(o checkGroup) bool {
			return len(o.coils) > 0 && len(g.coils) > 0 && sameRows(o.rows, g.rows)
		})
		if j < 0 {
			out = append(out, g)
			continue
		}
		out[j].coils = append(out[j].coils, g.coils...)
	}
	return out
}

// checkPointWords say where a check at a point is taken, in the coil's
// own frame from its centre: off a round coil's axis and along it, or a
// rectangle's coordinates across its width and height and along its axis;
// "" for a check not at a point.
func checkPointWords(p *calc.Vec) string {
	if p == nil {
		return ""
	}
	if math.Abs(p[1]) <= 1e-9*p.Norm() { // a round coil's point lies in the plane of E1
		return fmt.Sprintf(", %s from the axis and %s along it from the centre", Eng(p[0], "m", 3), Eng(p[2], "m", 3))
	}
	return fmt.Sprintf(", (%s, %s, %s) from the centre across the width, across the height and along the axis", Eng(p[0], "m", 3), Eng(p[1], "m", 3), Eng(p[2], "m", 3))
}

// sameRows reports whether two coils' check rows print the same, cell by
// cell and status by status.
func sameRows(a, b [][]doc.Cell) bool {
	return slices.EqualFunc(a, b, func(x, y []doc.Cell) bool {
		return slices.EqualFunc(x, y, func(p, q doc.Cell) bool { return p.Text == q.Text && p.Status == q.Status })
	})
}
