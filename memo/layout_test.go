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
// page before the last more than 40 % blank (a page the memo ends on
// purpose, page 1 and the contents page, included) unless the next page
// opens a new major section, no heading starting in the bottom 15 % of a
// page's text area, and a lead-in ending in a colon (page 1's "Cautions
// raised") on the page of what it introduces.
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
			for _, p := range pageRuleViolations(l, majorStarts(d.Blocks)) {
				t.Error(p)
			}
			for _, p := range leadInViolations(d.Blocks, l) {
				t.Error(p)
			}
		})
	}
}

// majorStarts marks the top-level blocks that are level-1 headings.
func majorStarts(blocks []doc.Block) map[int]bool {
	out := map[int]bool{}
	for i, b := range blocks {
		if h, ok := b.(doc.Heading); ok && h.Level <= 1 {
			out[i] = true
		}
	}
	return out
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

// pageRuleViolations lists the pages that break the rules; major marks
// the blocks that open a new major section (a page before one may end
// short).
func pageRuleViolations(l *pdf.Layout, major map[int]bool) []string {
	var out []string
	body := l.BodyBottom - l.BodyTop
	bottom := make([]float64, l.Pages+1)
	low := map[int]bool{}
	for _, b := range l.Boxes {
		if b.Page < 1 || b.Page > l.Pages {
			continue
		}
		bottom[b.Page] = max(bottom[b.Page], b.Bottom)
		if b.Kind == "heading" && b.Top > l.BodyTop+0.85*body && !low[b.Block] {
			low[b.Block] = true
			out = append(out, fmt.Sprintf("page %d: a heading starts %.0f %% down the text area", b.Page, 100*(b.Top-l.BodyTop)/body))
		}
	}
	// A heading keeps more than a line or two of what it heads on its
	// page ("11 Safety" and its one-line introduction at a page foot).
	for _, b := range l.Boxes {
		if b.Kind == "heading" && b.Page < l.Pages && bottom[b.Page]-b.Bottom < 0.03*body {
			out = append(out, fmt.Sprintf("page %d: a heading with %.0f %% of the text area below it at the page foot", b.Page, 100*(bottom[b.Page]-b.Bottom)/body))
		}
	}
	// A paragraph right before a figure (its lead-in) ends on the
	// figure's page; a table split over pages has two rows or more on
	// every page.
	first, last := map[int]int{}, map[int]int{}
	kind := map[int]string{}
	rows := map[[2]int]int{}
	for _, b := range l.Boxes {
		if _, ok := first[b.Block]; !ok {
			first[b.Block] = b.Page
		}
		last[b.Block] = b.Page
		kind[b.Block] = b.Kind
		if b.Kind == "table" {
			rows[[2]int{b.Block, b.Page}]++
		}
	}
	for i, k := range kind {
		if k == "paragraph" && kind[i+1] == "figure" && last[i] != first[i+1] {
			out = append(out, fmt.Sprintf("page %d: a figure's lead-in (block %d), its figure on page %d", last[i], i, first[i+1]))
		}
		if k == "table" && first[i] != last[i] {
			for p := first[i]; p <= last[i]; p++ {
				if n := rows[[2]int{i, p}]; n == 1 {
					out = append(out, fmt.Sprintf("page %d: one row of table block %d alone", p, i))
				}
			}
		}
	}
	opens := map[int]int{} // the first block of each page
	for _, b := range l.Boxes {
		if _, ok := opens[b.Page]; !ok {
			opens[b.Page] = b.Block
		}
	}
	for p := 1; p < l.Pages; p++ {
		blank := 1 - (bottom[p]-l.BodyTop)/body
		if next, ok := opens[p+1]; ok && major[next] {
			continue
		}
		if blank > 0.40 {
			why := ""
			if slices.Contains(l.Broken, p) {
				why = " (ended by a page break)"
			}
			out = append(out, fmt.Sprintf("page %d of %d: %.0f %% blank%s", p, l.Pages, 100*blank, why))
		}
	}
	return out
}

// The rule checker finds what it is for: a page half blank, a heading at
// the foot, a lead-in parted from its figure, a lone table row.
func TestPageRuleViolations(t *testing.T) {
	l := &pdf.Layout{Pages: 3, BodyTop: 100, BodyBottom: 1100, Boxes: []pdf.Box{
		{Page: 1, Block: 0, Kind: "heading", Top: 100, Bottom: 120},
		{Page: 1, Block: 1, Kind: "paragraph", Top: 120, Bottom: 500},
		{Page: 2, Block: 2, Kind: "figure", Top: 100, Bottom: 900},
		{Page: 2, Block: 3, Kind: "heading", Top: 960, Bottom: 980},
		{Page: 2, Block: 4, Kind: "table", Top: 980, Bottom: 1000},
		{Page: 2, Block: 4, Kind: "table", Top: 1000, Bottom: 1090},
		{Page: 3, Block: 4, Kind: "table", Top: 100, Bottom: 120},
		{Page: 3, Block: 5, Kind: "heading", Top: 120, Bottom: 140},
	}}
	got := pageRuleViolations(l, nil)
	for _, want := range []string{"page 1 of 3: 60 % blank", "page 2: a heading starts 86 %", "lead-in (block 1), its figure on page 2", "page 3: one row of table block 4 alone"} {
		found := false
		for _, g := range got {
			found = found || strings.Contains(g, want)
		}
		if !found {
			t.Errorf("missing %q in %q", want, got)
		}
	}
	if len(got) != 4 {
		t.Errorf("%d findings, want 4: %q", len(got), got)
	}
	// A heading and one line at a page foot.
	foot := &pdf.Layout{Pages: 2, BodyTop: 100, BodyBottom: 1100, Boxes: []pdf.Box{
		{Page: 1, Block: 0, Kind: "paragraph", Top: 100, Bottom: 900},
		{Page: 1, Block: 1, Kind: "heading", Top: 920, Bottom: 940},
		{Page: 1, Block: 2, Kind: "paragraph", Top: 940, Bottom: 960},
		{Page: 2, Block: 3, Kind: "paragraph", Top: 100, Bottom: 1000},
	}}
	if got := pageRuleViolations(foot, nil); len(got) != 1 || !strings.Contains(got[0], "a heading with 2 % of the text area below it") {
		t.Errorf("a heading and one line at the foot: %q", got)
	}
	l.Boxes = l.Boxes[2:4]
	l.Boxes[1].Top = 800
	l.Pages = 1
	if got := pageRuleViolations(l, nil); len(got) != 0 {
		t.Errorf("a clean page: %q", got)
	}
	// A short page before a new major section is no fault.
	l = &pdf.Layout{Pages: 3, BodyTop: 100, BodyBottom: 1100, Boxes: []pdf.Box{
		{Page: 1, Block: 0, Kind: "paragraph", Top: 100, Bottom: 300},
		{Page: 2, Block: 1, Kind: "heading", Top: 100, Bottom: 120},
		{Page: 2, Block: 2, Kind: "paragraph", Top: 120, Bottom: 300},
		{Page: 3, Block: 3, Kind: "heading", Top: 100, Bottom: 120},
	}}
	if got := pageRuleViolations(l, map[int]bool{1: true}); len(got) != 1 || !strings.Contains(got[0], "page 2 of 3") {
		t.Errorf("short page before a major section: %q, want page 2 alone", got)
	}
	// A lead-in parted from its list is found; one kept with it is not.
	blocks := []doc.Block{doc.Text("Cautions raised:"), doc.List{}, doc.Text("Then:"), doc.List{}}
	l = &pdf.Layout{Pages: 2, Boxes: []pdf.Box{{Page: 1, Block: 0}, {Page: 2, Block: 1}, {Page: 2, Block: 2}, {Page: 2, Block: 3}}}
	if got := leadInViolations(blocks, l); len(got) != 1 || !strings.Contains(got[0], "Cautions raised") {
		t.Errorf("lead-in findings %q", got)
	}
}
