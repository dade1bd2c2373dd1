package pdf

import (
	"fmt"
	"strings"
	"testing"

	"coilmemo/doc"
)

// The contents give every heading the page it is set on, and the outline
// has the same entries as the contents.
func TestContentsPagesMatchHeadings(t *testing.T) {
	blocks := []doc.Block{doc.Heading{Level: 1, Text: "First"}, doc.Contents{}}
	for i := range 6 {
		blocks = append(blocks, doc.Heading{Level: 1, Text: fmt.Sprintf("Part %c", 'A'+i)})
		for range 25 {
			blocks = append(blocks, doc.Text(strings.Repeat("Words to fill the page with running text. ", 6)))
		}
		blocks = append(blocks, doc.Heading{Level: 2, Text: fmt.Sprintf("Detail %c", 'A'+i)}, doc.Text("End."))
	}
	blocks[1] = doc.Contents{Title: "Contents", Entries: doc.ContentsOf(blocks)}
	d := &doc.Document{Meta: doc.Meta{Title: "T", DocID: "X-1", Revision: "A"}, Blocks: blocks}

	headingPage := map[string]int{}
	type placed struct {
		x, y float64
		s    string
	}
	var toc []placed // the strings set on page 1, the contents' page
	_, err := render(d, options{onPlace: func(p int, x, y float64, s string) {
		if p == 1 {
			toc = append(toc, placed{x, y, s})
		}
		if strings.HasPrefix(s, "Part ") || strings.HasPrefix(s, "Detail ") {
			headingPage[s] = p // the last time it is set: the heading itself
		}
	}})
	if err != nil {
		t.Fatal(err)
	}
	if len(headingPage) != 12 {
		t.Fatalf("headings found on pages %v", headingPage)
	}
	// In the contents, each entry's page is the number set last on its
	// baseline (set when the layout is complete, after the rest of the
	// page; a level-1 entry also has its section number at the left).
	for _, e := range toc {
		want, ok := headingPage[e.s]
		if !ok {
			continue
		}
		page, right := "", e.x
		for _, o := range toc {
			if o.y == e.y && o.x > right && strings.Trim(o.s, "0123456789") == "" {
				page, right = o.s, o.x
			}
		}
		if page != fmt.Sprint(want) {
			t.Errorf("contents: %q with page %q, want page %d", e.s, page, want)
		}
		delete(headingPage, e.s)
	}
	if len(headingPage) > 0 {
		t.Errorf("not in the contents: %v", headingPage)
	}

	// The outline: every contents entry plus the contents itself.
	r := newRenderer(d, options{}, 0, true)
	if err := r.run(); err != nil {
		t.Fatal(err)
	}
	if got, want := len(r.headPages), len(doc.ContentsOf(blocks)); got != want {
		t.Errorf("%d headings set, %d in the contents", got, want)
	}
}
