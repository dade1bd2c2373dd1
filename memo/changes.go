package memo

import (
	"fmt"

	"coilmemo/analysis"
	"coilmemo/doc"
	"coilmemo/format"
)

// changes writes "Changes since revision X" when the memo block names the
// previous revision: per coil (the design as a whole first), the headline
// results that moved, the requirements whose value or verdict moved, and
// the inputs changed, from analysis.Compare.
func (c *composer) changes() {
	ch := c.j.Changes
	if ch == nil {
		return
	}
	c.heading(1, "Changes since revision "+ch.From)
	if len(ch.Groups) == 0 {
		c.para(fmt.Sprintf("Nothing changed since revision %s: the inputs, the headline results and the requirements' verdicts are the same.", ch.From))
		return
	}
	intro := fmt.Sprintf("What moved from revision %s to this revision, coil by coil: headline results, then requirements, then the inputs that caused them. Temperatures change in kelvin, other results by their relative change.", ch.From)
	c.para(intro)
	if ch.Regressed {
		c.add(doc.Paragraph{Spans: []doc.Span{{Text: "A requirement met in revision " + ch.From + " is not met in this revision.", Strong: true}}})
	}
	for _, g := range ch.Groups {
		title := "The design as a whole"
		if g.Coil != "" {
			title = fmt.Sprintf("Coil %q", g.Coil)
		}
		var rows [][]doc.Cell
		for _, r := range g.Results {
			from, to, d := format.Change(r.Old, r.New, r.Unit)
			rows = append(rows, []doc.Cell{{Text: r.Quantity}, {Text: from}, {Text: to}, {Text: d}})
		}
		for _, l := range g.Limits {
			rows = append(rows, limitChangeRow(l, ch.From))
		}
		for _, in := range g.Inputs {
			rows = append(rows, inputChangeRow(in))
		}
		c.add(doc.Table{Caption: title + ": changes since revision " + ch.From,
			Header: []string{"Quantity", "Revision " + ch.From, "This revision", "Change"},
			Rows:   rows, Widths: []float64{2.6, 1.6, 1.6, 1.1},
			Align: []doc.Align{doc.Left, doc.Right, doc.Right, doc.Right}})
	}
}

func verdictWord(pass bool) string {
	if pass {
		return "PASS"
	}
	return "FAIL"
}

func limitChangeRow(l analysis.LimitChange, from string) []doc.Cell {
	unit := format.Unit(l.Unit)
	name := "requirement " + l.Stated() + " " + format.Eng(displayValue(l.Required, unit), unit, 3)
	st := doc.NoStatus // coloured only where the verdict moved
	switch {
	case !l.NewPass && (!l.InOld || l.OldPass):
		st = doc.Fail
	case l.NewPass && l.InOld && !l.OldPass:
		st = doc.Pass
	}
	if !l.InOld {
		_, to, _ := format.Change(l.New, l.New, unit)
		return []doc.Cell{{Text: name}, {Text: "(not stated)"}, {Text: to + " " + verdictWord(l.NewPass)}, {Text: "new", Status: st}}
	}
	a, b, d := format.Change(l.Old, l.New, unit)
	change := d
	if l.OldPass != l.NewPass {
		change = verdictWord(l.OldPass) + " → " + verdictWord(l.NewPass)
	}
	return []doc.Cell{{Text: name}, {Text: a + " " + verdictWord(l.OldPass)}, {Text: b + " " + verdictWord(l.NewPass)}, {Text: change, Status: st}}
}

// displayValue converts a value in SI to what Eng prints in unit (°C from
// kelvin).
func displayValue(v float64, unit string) float64 {
	if unit == "°C" {
		return Celsius(v)
	}
	return v
}

// inputChangeRow is the row of a changed input: a coil's input under the
// quantity name the memo gives it elsewhere (the table is the coil's),
// another block's with its block, both marked as inputs.
func inputChangeRow(in analysis.InputChange) []doc.Cell {
	from, to, change := in.Columns()
	name := inputWords(in.Key)
	if in.Block != "coil" {
		name = in.Block + " " + name
	}
	return []doc.Cell{{Text: name + " (input)"}, {Text: from}, {Text: to}, {Text: change}}
}

// inputWords is a spec key as the quantity the memo names elsewhere:
// "winding length" for a coil's length, else the key in words.
func inputWords(key string) string {
	switch key {
	case "length":
		return "winding length"
	}
	return keyWords(key)
}
