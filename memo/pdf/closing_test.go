package pdf

import (
	"fmt"
	"testing"

	"coilmemo/doc"
)

// A memo's closing section is not split to leave the last page only its
// end: whatever the page it falls on, either the section ends on the page
// its heading starts, or the part on the last page is no short end, or
// moving the heading to the next page would leave its page more than
// closingBlank blank. A closing section that moves leaves its page no
// more than that blank; and the rule does move some.
func TestClosingSectionWhole(t *testing.T) {
	body := bodyBottom - bodyTop
	moved := 0
	for fill := 14; fill < 40; fill++ {
		d := &doc.Document{}
		for i := range fill {
			d.Blocks = append(d.Blocks, doc.Text(fmt.Sprintf("Line %d.", i)))
		}
		var rows [][]doc.Cell
		for i := range 6 {
			rows = append(rows, []doc.Cell{{Text: fmt.Sprint("Item ", i)}, {Text: "value"}})
		}
		closing := len(d.Blocks)
		d.Blocks = append(d.Blocks, doc.Heading{Level: 1, Text: "Record"}, doc.Table{Header: []string{"Item", "Value"}, Rows: rows},
			doc.Text("A closing remark of one line."),
			doc.Table{Caption: "History", Header: []string{"Rev.", "Change"}, Rows: rows[:3]})
		l, err := Measure(d)
		if err != nil {
			t.Fatal(err)
		}
		var head Box
		bottom := map[int]float64{}
		for _, b := range l.Boxes {
			if b.Block == closing && head.Page == 0 {
				head = b
			}
			bottom[b.Page] = max(bottom[b.Page], b.Bottom)
		}
		before := (bodyBottom - bottom[head.Page-1]) / body // the page before the heading's
		switch {
		case head.Page == l.Pages:
			if head.Top == bodyTop && head.Page > 1 {
				moved++
				if before > closingBlank {
					t.Errorf("fill %d: the closing section moved, leaving page %d %.0f %% blank", fill, head.Page-1, 100*before)
				}
			}
		default:
			tail := bottom[l.Pages] - bodyTop
			here := (bodyBottom - lastBottomBefore(l, closing, head.Page)) / body
			if tail < closingTail*body && here <= closingBlank {
				t.Errorf("fill %d: the closing section split with %.0f pt on the last page", fill, tail)
			}
		}
	}
	if moved == 0 {
		t.Error("no closing section set whole on the next page")
	}
}

// lastBottomBefore is the lowest point placed on page p by the blocks
// before block k.
func lastBottomBefore(l *Layout, k, p int) float64 {
	y := bodyTop
	for _, b := range l.Boxes {
		if b.Block < k && b.Page == p {
			y = max(y, b.Bottom)
		}
	}
	return y
}
