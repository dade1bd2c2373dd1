package memo

import (
	"fmt"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"

	"coilmemo/analysis"
	"coilmemo/memo/pdf"
)

// The page rules, over every example's memo, from the layout engine's own
// placement records: no page before the last more than 40 % blank (a page
// the memo ends on purpose, page 1 and the contents page, included), and
// no heading starting in the bottom 15 % of a page's text area.
func TestExamplePages(t *testing.T) {
	files, err := filepath.Glob("../examples/*.md")
	if err != nil || len(files) == 0 {
		t.Fatalf("no examples: %v", err)
	}
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
			l, err := pdf.Measure(Compose(j))
			if err != nil {
				t.Fatal(err)
			}
			for _, p := range pageRuleViolations(l) {
				t.Error(p)
			}
		})
	}
}

// pageRuleViolations lists the pages that break the rules.
func pageRuleViolations(l *pdf.Layout) []string {
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
	for p := 1; p < l.Pages; p++ {
		blank := 1 - (bottom[p]-l.BodyTop)/body
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
	}}
	got := pageRuleViolations(l)
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
	l.Boxes = l.Boxes[2:4]
	l.Boxes[1].Top = 800
	l.Pages = 1
	if got := pageRuleViolations(l); len(got) != 0 {
		t.Errorf("a clean page: %q", got)
	}
}
