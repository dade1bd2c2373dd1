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
	var tocTexts []string
	var tocPage int
	_, err := render(d, options{onText: func(p int, s string) {
		if p == 1 {
			tocTexts = append(tocTexts, s)
			tocPage = p
		}
		if strings.HasPrefix(s, "Part ") || strings.HasPrefix(s, "Detail ") {
			headingPage[s] = p // the last time it is set: the heading itself
		}
	}})
	if err != nil {
		t.Fatal(err)
	}
	if tocPage != 1 || len(headingPage) != 12 {
		t.Fatalf("headings found on pages %v", headingPage)
	}
	// In the contents, each entry's text is followed by its leader and its page.
	for i, s := range tocTexts {
		want, ok := headingPage[s]
		if !ok {
			continue
		}
		if i+2 >= len(tocTexts) || tocTexts[i+2] != fmt.Sprint(want) {
			t.Errorf("contents: %q then %q, want page %d", s, tocTexts[min(i+2, len(tocTexts)-1)], want)
		}
		delete(headingPage, s)
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
