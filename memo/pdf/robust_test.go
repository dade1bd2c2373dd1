package pdf

import (
	"fmt"
	"strings"
	"testing"
	"time"
	"unicode/utf8"

	"coilmemo/doc"
)

// numbered returns n distinct words w1 … wn, joined by spaces.
func numbered(prefix string, n int) string {
	ws := make([]string, n)
	for i := range ws {
		ws[i] = fmt.Sprintf("%s%d", prefix, i+1)
	}
	return strings.Join(ws, " ")
}

// placed is one string set on a page, at the left end of its baseline.
type placed struct {
	page int
	x, y float64
	s    string
}

// renderPlaced renders d and returns every string set with its position.
func renderPlaced(t *testing.T, d *doc.Document) []placed {
	t.Helper()
	var out []placed
	if _, err := render(d, options{compress: true, onPlace: func(p int, x, y float64, s string) {
		out = append(out, placed{p, x, y, s})
	}}); err != nil {
		t.Fatal(err)
	}
	return out
}

// bodyWords counts the words set inside the body area of the pages (the
// text column between the running header and the footer). A word set
// below the footer rule, above the header or off the right edge is not
// counted: it is lost to the reader.
func bodyWords(ps []placed) map[string]int {
	n := map[string]int{}
	for _, p := range ps {
		w := textWidthOf("sans", "", sizeBody, p.s)
		inside := p.y > bodyTop && p.y <= bodyBottom+0.01 && p.x >= marginLeft-30 && p.x+w*0.5 <= pageW-marginRight+1
		if !inside {
			continue
		}
		for _, f := range strings.Fields(p.s) {
			n[f]++
		}
	}
	return n
}

// lost lists the words of want (space-separated) not set in the body.
func lost(want string, got map[string]int) []string {
	var out []string
	need := map[string]int{}
	for _, w := range strings.Fields(want) {
		need[w]++
	}
	for w, k := range need {
		if got[w] < k {
			out = append(out, w)
		}
	}
	return out
}

// Words in against words out: every word of an over-long title, heading,
// table cell and deeply nested list reaches the body of some page.
func TestNoTextLost(t *testing.T) {
	deep := func(depth int, text string) doc.List {
		l := doc.List{Items: [][]doc.Block{{doc.Text(text)}}}
		for i := 1; i < depth; i++ {
			l = doc.List{Items: [][]doc.Block{{doc.Text(fmt.Sprintf("level%d", depth-i)), l}}}
		}
		return l
	}
	cases := []struct {
		name  string
		words string // every word that must be set
		d     *doc.Document
	}{
		{"long title", numbered("t", 1250), &doc.Document{Blocks: []doc.Block{
			doc.TitleBlock{Title: numbered("t", 1250), Fields: [][2]string{{"Client", "Acme"}, {"Author", "R. Okonkwo"}}},
			doc.Text("after the title"),
		}}},
		{"long title field", numbered("f", 1500), &doc.Document{Blocks: []doc.Block{
			doc.TitleBlock{Title: "Short", Fields: [][2]string{{"Client", numbered("f", 1500)}, {"Author", "B"}}},
		}}},
		{"long heading", numbered("h", 1250), &doc.Document{Blocks: []doc.Block{
			doc.Heading{Level: 1, Text: numbered("h", 1250)}, doc.Text("body after"),
		}}},
		{"long level-3 heading", numbered("k", 1250), &doc.Document{Blocks: []doc.Block{
			doc.Text("before"), doc.Heading{Level: 3, Text: numbered("k", 1250)},
		}}},
		{"tall table row", numbered("c", 3000) + " " + numbered("d", 40), &doc.Document{Blocks: []doc.Block{
			doc.Table{Header: []string{"Key", "Value"}, Rows: [][]doc.Cell{
				{{Text: "r1"}, {Text: "short"}},
				{{Text: numbered("d", 40)}, {Text: numbered("c", 3000)}},
				{{Text: "r3"}, {Text: "tail"}},
			}},
		}}},
		{"deep list", "bottom " + numbered("level", 59), &doc.Document{Blocks: []doc.Block{deep(60, "bottom")}}},
	}
	for _, c := range cases {
		start := time.Now()
		ps := renderPlaced(t, c.d)
		if miss := lost(c.words, bodyWords(ps)); len(miss) > 0 {
			nw := len(strings.Fields(c.words))
			t.Errorf("%s: %d of %d words lost, e.g. %v", c.name, len(miss), nw, miss[:min(5, len(miss))])
		}
		if el := time.Since(start); el > 5*time.Second {
			t.Errorf("%s: %v to render", c.name, el)
		}
	}
}

// A table row taller than a page is split across pages, the header set
// again at the top of each continuation page.
func TestTallRowSplitsWithHeader(t *testing.T) {
	d := &doc.Document{Blocks: []doc.Block{doc.Table{Header: []string{"Station", "Notes"}, Rows: [][]doc.Cell{
		{{Text: "one"}, {Text: numbered("n", 3000)}},
	}}}}
	ps := renderPlaced(t, d)
	pages, heads := 0, map[int]int{}
	for _, p := range ps {
		pages = max(pages, p.page)
		if p.s == "Station" {
			heads[p.page]++
		}
	}
	if pages < 2 {
		t.Fatalf("a 3000-word row took %d page(s)", pages)
	}
	for p := 1; p <= pages; p++ {
		if heads[p] != 1 {
			t.Errorf("page %d: header set %d times, want 1", p, heads[p])
		}
	}
}

// Every string set in the body lies inside the page's text column.
func TestDeepListStaysOnPage(t *testing.T) {
	l := doc.List{Items: [][]doc.Block{{doc.Text(numbered("z", 30))}}}
	for i := 0; i < 100; i++ {
		l = doc.List{Ordered: i%2 == 0, Items: [][]doc.Block{{doc.Text("x"), l}}}
	}
	for _, p := range renderPlaced(t, &doc.Document{Blocks: []doc.Block{l}}) {
		if p.y < bodyTop || p.y > bodyBottom {
			continue
		}
		w := textWidthOf("sans", "", sizeBody, p.s)
		if p.x < 0 || p.x+w > pageW-marginRight+1 {
			t.Fatalf("%q set at x = %.1f .. %.1f, outside the column", p.s, p.x, p.x+w)
		}
	}
}

// The title box never runs over the footer: nothing on page 1 is set
// below the body's bottom edge except the footer line itself.
func TestTitleBoxAboveFooter(t *testing.T) {
	d := &doc.Document{Meta: doc.Meta{DocID: "ID-1"}, Blocks: []doc.Block{
		doc.TitleBlock{Title: numbered("t", 600), Fields: [][2]string{{"Client", "A"}}},
	}}
	for _, p := range renderPlaced(t, d) {
		if p.y > bodyBottom+0.01 && !strings.HasPrefix(p.s, "Page ") && p.s != "ID-1" {
			t.Errorf("page %d: %q set at y = %.1f, below the body (%.1f)", p.page, p.s, p.y, bodyBottom)
		}
	}
}

// A running header with a very long title and document id is cut once to
// fit, with an ellipsis, and fast: one measurement, not one per character.
func TestRunningHeaderCut(t *testing.T) {
	title := strings.Repeat("Helmholtz pair ", 700) // 10 500 characters
	id := strings.Repeat("ID", 200)
	d := &doc.Document{Meta: doc.Meta{Title: title, DocID: id}}
	for i := 0; i < 30; i++ {
		d.Blocks = append(d.Blocks, doc.Text(numbered("p", 200)), doc.PageBreak{})
	}
	start := time.Now()
	ps := renderPlaced(t, d)
	if el := time.Since(start); el > 3*time.Second {
		t.Errorf("30 pages with a 10 500-character title: %v", el)
	}
	seen := 0
	for _, p := range ps {
		if p.y >= bodyTop {
			continue
		}
		seen++
		w := textWidthOf("sans", "", styHeader.size, p.s)
		if p.x < marginLeft-0.01 || p.x+w > pageW-marginRight+0.5 {
			t.Errorf("header text %.20q… spans x = %.1f .. %.1f, outside the margins", p.s, p.x, p.x+w)
		}
		if !strings.HasSuffix(p.s, "…") {
			t.Errorf("cut header text %.20q… has no ellipsis", p.s)
		}
	}
	if seen == 0 {
		t.Fatal("no running header set")
	}
	// The footer's document id is cut to leave room for "Page X of Y".
	for _, p := range ps {
		if p.y > bodyBottom && !strings.HasPrefix(p.s, "Page ") {
			w := textWidthOf("sans", "", styHeader.size, p.s)
			if p.x+w > pageW-marginRight-textWidthOf("sans", "", styHeader.size, "Page 30 of 30") {
				t.Errorf("footer %.20q… runs into the page number", p.s)
			}
		}
	}
}

func TestFitOneCut(t *testing.T) {
	for _, c := range []struct {
		s string
		w float64
	}{{"Coil pair for a magnetometer bench", 60}, {"x", 0.1}, {"", 10}, {"ab cd ef", 1000}, {strings.Repeat("é", 50), 30}} {
		got := fit(c.s, styHeader, c.w)
		if w := textWidthOf("sans", "", styHeader.size, got); w > c.w+1e-9 {
			t.Errorf("fit(%q, %g) = %q, %.2f wide", c.s, c.w, got, w)
		}
		if got != c.s {
			// the longest cut: one more character would not fit
			base := strings.TrimSuffix(got, "…")
			rest := strings.TrimPrefix(c.s, base)
			if !strings.HasPrefix(c.s, base) {
				t.Errorf("fit(%q) = %q is not a prefix and an ellipsis", c.s, got)
				continue
			}
			if r, size := utf8.DecodeRuneInString(rest); size > 0 && r != ' ' {
				longer := base + string(r) + "…"
				if textWidthOf("sans", "", styHeader.size, longer) <= c.w && got != "" {
					t.Errorf("fit(%q, %g) = %q; %q fits too", c.s, c.w, got, longer)
				}
			}
		}
	}
}

// Invalid UTF-8 and control characters anywhere in a document never reach
// the writer's decoder: the document renders and the letters after a bad
// byte survive.
func TestInvalidUTF8Guarded(t *testing.T) {
	bad := []string{"Some \xff prose", "tail \xe2", "\xc3", "a\x00b\x1bc", "mid \xe2\x82 word", "\xed\xa0\x80 surrogate", "\xf4\x90\x80\x80 beyond", "😀 emoji"}
	d := &doc.Document{Meta: doc.Meta{Title: bad[0], DocID: bad[1], Revision: bad[2], Author: bad[3], Subject: bad[4], Keywords: bad[5]}}
	d.Blocks = append(d.Blocks, doc.TitleBlock{Title: bad[4], Fields: [][2]string{{bad[0], bad[1]}, {"Client", bad[2]}}})
	for _, s := range bad {
		d.Blocks = append(d.Blocks,
			doc.Heading{Level: 1, Text: s}, doc.Heading{Level: 2, Text: s}, doc.Text(s),
			doc.List{Items: [][]doc.Block{{doc.Text(s)}}},
			doc.Table{Caption: s, Header: []string{s, "b"}, Rows: [][]doc.Cell{{{Text: s}, {Text: s, Status: doc.Fail}}}},
			doc.Callout{Title: s, Spans: []doc.Span{{Text: s, Code: true}}}, doc.Code{Text: s},
			doc.Figure{Caption: s})
	}
	var texts []string
	if _, err := render(d, options{onText: func(_ int, s string) { texts = append(texts, s) }}); err != nil {
		t.Fatalf("render: %v", err)
	}
	joined := strings.Join(texts, "\n")
	for _, w := range []string{"prose", "word", "surrogate", "beyond", "emoji"} {
		if !strings.Contains(joined, w) {
			t.Errorf("%q not set", w)
		}
	}
	for _, s := range append(bad, "\u200b\u0085\u009f") {
		out := bmp(s)
		if !utf8.ValidString(out) || !printable(out) {
			t.Errorf("bmp(%q) = %q is not printable UTF-8", s, out)
		}
		if strings.Count(out, "") < strings.Count(s, "") && utf8.ValidString(s) {
			t.Errorf("bmp(%q) = %q dropped characters", s, out)
		}
	}
}
