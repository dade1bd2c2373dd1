package memo

import (
	"fmt"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"

	"coilmemo/analysis"
	"coilmemo/doc"
	"coilmemo/memo/pdf"
)

// The page rules, over every example's memo and every figure-test design
// (testdata/figures), from the layout engine's own placement records: no
// page before the last more than 40 % blank (page 1, which the memo ends
// on purpose, the contents page and a page before a new section
// included), a last page holding more than a few lines, no heading starting in the bottom 15 % of a page's text
// area, a heading on the page its first block starts on with more than a
// line of it, a figure's or a table's lead-in and a lead-in ending in a colon (page
// 1's "Cautions raised") on the page of what it introduces, and a table
// split over pages with its header repeated on every page it continues
// on and two rows or more on each.
func TestExamplePages(t *testing.T) {
	files, err := filepath.Glob("../examples/*.md")
	if err != nil || len(files) == 0 {
		t.Fatalf("no examples: %v", err)
	}
	more, _ := filepath.Glob("../testdata/figures/*.md")
	if len(more) == 0 {
		t.Fatal("no figure-test designs in testdata/figures")
	}
	files = append(files, more...)
	for _, f := range files {
		t.Run(filepath.Base(f), func(t *testing.T) {
			src, err := os.ReadFile(f)
			if err != nil {
				t.Fatal(err)
			}
			j, diags := analysis.Run(f, src, analysis.Options{ReadPrevious: func(ref string) (string, []byte, error) {
				b, err := os.ReadFile(filepath.Join(filepath.Dir(f), ref))
				return ref, b, err
			}})
			if len(diags) > 0 {
				t.Fatal(diags)
			}
			d := Compose(j)
			l, err := pdf.Measure(d)
			if err != nil {
				t.Fatal(err)
			}
			for _, p := range pageRuleViolations(l) {
				t.Error(p)
			}
			for _, p := range leadInViolations(d.Blocks, l) {
				t.Error(p)
			}
		})
	}
}

// leadInViolations lists the lead-ins — paragraphs ending in a colon —
// that end on another page than the block they introduce starts on.
func leadInViolations(blocks []doc.Block, l *pdf.Layout) []string {
	last, first := map[int]int{}, map[int]int{}
	for _, b := range l.Boxes {
		if _, ok := first[b.Block]; !ok {
			first[b.Block] = b.Page
		}
		last[b.Block] = b.Page
	}
	var out []string
	for i, b := range blocks {
		p, ok := b.(doc.Paragraph)
		if !ok || len(p.Spans) == 0 || i+1 >= len(blocks) {
			continue
		}
		text := strings.TrimSpace(p.Spans[len(p.Spans)-1].Text)
		if !strings.HasSuffix(text, ":") {
			continue
		}
		if _, ok := first[i+1]; ok && last[i] != first[i+1] {
			out = append(out, fmt.Sprintf("page %d: the lead-in %q, what it introduces on page %d", last[i], p.Spans[0].Text, first[i+1]))
		}
	}
	return out
}

// pageBlank is the part of a page's text area below the last thing placed
// on it.
func pageBlank(l *pdf.Layout, bottom float64) float64 {
	return 1 - (bottom-l.BodyTop)/(l.BodyBottom-l.BodyTop)
}

// pageRuleViolations lists the pages that break the rules.
func pageRuleViolations(l *pdf.Layout) []string {
	var out []string
	body := l.BodyBottom - l.BodyTop
	bottom := make([]float64, l.Pages+1)
	low := map[int]bool{}
	first, last := map[int]int{}, map[int]int{}
	kind := map[int]string{}
	table := map[int]int{} // the page each table starts on
	for _, b := range l.Boxes {
		if b.Page < 1 || b.Page > l.Pages {
			continue
		}
		bottom[b.Page] = max(bottom[b.Page], b.Bottom)
		if b.Kind == "heading" && b.Top > l.BodyTop+0.85*body && !low[b.Block] {
			low[b.Block] = true
			out = append(out, fmt.Sprintf("page %d: a heading starts %.0f %% down the text area", b.Page, 100*(b.Top-l.BodyTop)/body))
		}
		if _, ok := first[b.Block]; !ok {
			first[b.Block] = b.Page
			kind[b.Block] = b.Kind
		}
		last[b.Block] = b.Page
		if _, ok := table[b.Block]; !ok && b.Kind == "table start" {
			table[b.Block] = b.Page
		}
	}
	// A heading starts the page of its first block, and keeps more than a
	// line or two of what it heads on its page ("11 Safety" and its
	// one-line introduction at a page foot).
	for _, b := range l.Boxes {
		if b.Kind != "heading" {
			continue
		}
		if p, ok := first[b.Block+1]; ok && p != b.Page {
			out = append(out, fmt.Sprintf("page %d: a heading (block %d), its first block on page %d", b.Page, b.Block, p))
		} else if b.Page < l.Pages && bottom[b.Page]-b.Bottom < 0.03*body {
			out = append(out, fmt.Sprintf("page %d: a heading with %.0f %% of the text area below it at the page foot", b.Page, 100*(bottom[b.Page]-b.Bottom)/body))
		}
	}
	// A paragraph right before a figure (its lead-in) ends on the
	// figure's page; a table split over pages has its header again and
	// two rows or more on every page.
	rows := map[[2]int]int{}
	head := map[[2]int]bool{}
	for _, b := range l.Boxes {
		switch b.Kind {
		case "table":
			rows[[2]int{b.Block, b.Page}]++
		case "table head":
			head[[2]int{b.Block, b.Page}] = true
		}
	}
	for i, k := range kind {
		if k == "paragraph" && kind[i+1] == "figure" && last[i] != first[i+1] {
			out = append(out, fmt.Sprintf("page %d: a figure's lead-in (block %d), its figure on page %d", last[i], i, first[i+1]))
		}
		// A paragraph set whole right before a table introduces it: it
		// ends on the page the table starts on.
		if k == "paragraph" && kind[i+1] == "table start" && first[i] == last[i] && last[i] != first[i+1] {
			out = append(out, fmt.Sprintf("page %d: a table's lead-in (block %d), its table on page %d", last[i], i, first[i+1]))
		}
	}
	// A figure and its lead-in moved to the next page leave no more than
	// 35 % of the page before blank (page 1 ends on purpose): the figure
	// shrinks to fit instead (from 30 % blank on, pdf's figureFloor; a
	// figure that does not fit even so moves).
	for i, k := range kind {
		if k == "paragraph" && kind[i+1] == "figure" {
			if p := first[i]; p > 2 && !slices.Contains(l.Broken, p-1) {
				if blank := pageBlank(l, bottom[p-1]); blank > 0.35 && firstOnPage(l, p) == i {
					out = append(out, fmt.Sprintf("page %d: %.0f %% blank before a figure and its lead-in (block %d) moved to page %d", p-1, 100*blank, i, p))
				}
			}
		}
	}
	for i, start := range table {
		if start == last[i] {
			continue
		}
		for p := start; p <= last[i]; p++ {
			if n := rows[[2]int{i, p}]; n < 2 {
				out = append(out, fmt.Sprintf("page %d: %d row of table block %d alone", p, n, i))
			}
			if p > start && !head[[2]int{i, p}] {
				out = append(out, fmt.Sprintf("page %d: table block %d continued without its header", p, i))
			}
		}
	}
	for p := 1; p < l.Pages; p++ {
		if blank := pageBlank(l, bottom[p]); blank > 0.40 {
			why := ""
			if slices.Contains(l.Broken, p) {
				why = " (ended by a page break)"
			}
			out = append(out, fmt.Sprintf("page %d of %d: %.0f %% blank%s", p, l.Pages, 100*blank, why))
		}
	}
	// The last page holds more than a few lines: a closing section split
	// with only its end on the last page is set whole there instead.
	if p := l.Pages; p > 1 {
		if fill := 1 - pageBlank(l, bottom[p]); fill < lastPageFill {
			out = append(out, fmt.Sprintf("page %d of %d, the last: %.0f %% of the text area filled", p, l.Pages, 100*fill))
		}
	}
	slices.Sort(out)
	return out
}

// firstOnPage is the block of the first box placed on page p (−1 for none).
func firstOnPage(l *pdf.Layout, p int) int {
	for _, b := range l.Boxes {
		if b.Page == p {
			return b.Block
		}
	}
	return -1
}

// lastPageFill is the least part of the text area the last page of a memo
// of several pages holds.
const lastPageFill = 0.15

// The rule checker finds what it is for: a page half blank (before a new
// section too), a heading at the foot or parted from its first block, a
// lead-in parted from its figure, a lone table row, a table continued
// without its header.
func TestPageRuleViolations(t *testing.T) {
	has := func(got []string, want ...string) {
		t.Helper()
		for _, w := range want {
			found := false
			for _, g := range got {
				found = found || strings.Contains(g, w)
			}
			if !found {
				t.Errorf("missing %q in %q", w, got)
			}
		}
		if len(got) != len(want) {
			t.Errorf("%d findings, want %d: %q", len(got), len(want), got)
		}
	}
	l := &pdf.Layout{Pages: 3, BodyTop: 100, BodyBottom: 1100, Boxes: []pdf.Box{
		{Page: 1, Block: 0, Kind: "heading", Top: 100, Bottom: 120},
		{Page: 1, Block: 1, Kind: "paragraph", Top: 120, Bottom: 500},
		{Page: 2, Block: 2, Kind: "figure", Top: 100, Bottom: 900},
		{Page: 2, Block: 3, Kind: "heading", Top: 960, Bottom: 980},
		{Page: 2, Block: 4, Kind: "table start", Top: 980, Bottom: 1040},
		{Page: 2, Block: 4, Kind: "table", Top: 1020, Bottom: 1040},
		{Page: 2, Block: 4, Kind: "table", Top: 1040, Bottom: 1090},
		{Page: 3, Block: 4, Kind: "table head", Top: 100, Bottom: 130},
		{Page: 3, Block: 4, Kind: "table", Top: 130, Bottom: 150},
		{Page: 3, Block: 5, Kind: "heading", Top: 150, Bottom: 170},
		{Page: 3, Block: 6, Kind: "paragraph", Top: 170, Bottom: 400},
	}}
	has(pageRuleViolations(l), "page 1 of 3: 60 % blank", "page 2: a heading starts 86 %",
		"lead-in (block 1), its figure on page 2", "page 3: 1 row of table block 4 alone")
	// A table continued without its header; a heading whose first block
	// starts the next page.
	l = &pdf.Layout{Pages: 3, BodyTop: 100, BodyBottom: 1100, Boxes: []pdf.Box{
		{Page: 1, Block: 0, Kind: "table start", Top: 100, Bottom: 160},
		{Page: 1, Block: 0, Kind: "table", Top: 140, Bottom: 160},
		{Page: 1, Block: 0, Kind: "table", Top: 160, Bottom: 1090},
		{Page: 2, Block: 0, Kind: "table", Top: 100, Bottom: 120},
		{Page: 2, Block: 0, Kind: "table", Top: 120, Bottom: 140},
		{Page: 2, Block: 1, Kind: "paragraph", Top: 140, Bottom: 700},
		{Page: 2, Block: 2, Kind: "heading", Top: 700, Bottom: 720},
		{Page: 3, Block: 3, Kind: "paragraph", Top: 100, Bottom: 300},
	}}
	has(pageRuleViolations(l), "page 2: table block 0 continued without its header", "page 2: a heading (block 2), its first block on page 3")
	// A heading and one line at a page foot.
	foot := &pdf.Layout{Pages: 2, BodyTop: 100, BodyBottom: 1100, Boxes: []pdf.Box{
		{Page: 1, Block: 0, Kind: "paragraph", Top: 100, Bottom: 900},
		{Page: 1, Block: 1, Kind: "heading", Top: 920, Bottom: 940},
		{Page: 1, Block: 2, Kind: "paragraph", Top: 940, Bottom: 960},
		{Page: 2, Block: 3, Kind: "paragraph", Top: 100, Bottom: 1000},
	}}
	has(pageRuleViolations(foot), "a heading with 2 % of the text area below it")
	// A clean page.
	l = &pdf.Layout{Pages: 1, BodyTop: 100, BodyBottom: 1100, Boxes: []pdf.Box{
		{Page: 1, Block: 2, Kind: "figure", Top: 100, Bottom: 900},
		{Page: 1, Block: 3, Kind: "heading", Top: 800, Bottom: 820},
	}}
	has(pageRuleViolations(l))
	// A short page before a new section is as much a fault as any other;
	// the last page may be short.
	l = &pdf.Layout{Pages: 3, BodyTop: 100, BodyBottom: 1100, Boxes: []pdf.Box{
		{Page: 1, Block: 0, Kind: "paragraph", Top: 100, Bottom: 300},
		{Page: 2, Block: 1, Kind: "heading", Top: 100, Bottom: 120},
		{Page: 2, Block: 2, Kind: "paragraph", Top: 120, Bottom: 300},
		{Page: 3, Block: 3, Kind: "heading", Top: 100, Bottom: 120},
		{Page: 3, Block: 4, Kind: "paragraph", Top: 120, Bottom: 140},
	}}
	has(pageRuleViolations(l), "page 1 of 3: 80 % blank", "page 2 of 3: 80 % blank", "page 3 of 3, the last: 4 % of the text area filled")
	// A lead-in parted from its list is found; one kept with it is not.
	blocks := []doc.Block{doc.Text("Cautions raised:"), doc.List{}, doc.Text("Then:"), doc.List{}}
	l = &pdf.Layout{Pages: 2, Boxes: []pdf.Box{{Page: 1, Block: 0}, {Page: 2, Block: 1}, {Page: 2, Block: 2}, {Page: 2, Block: 3}}}
	if got := leadInViolations(blocks, l); len(got) != 1 || !strings.Contains(got[0], "Cautions raised") {
		t.Errorf("lead-in findings %q", got)
	}
}
