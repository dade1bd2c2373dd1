package pdf

import (
	"bytes"
	"fmt"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"coilmemo/doc"

	"gonum.org/v1/plot/vg"
)

func TestDeterministic(t *testing.T) {
	d := exampleDocument(2)
	first, err := Render(d)
	if err != nil {
		t.Fatal(err)
	}
	for i := 0; i < 3; i++ {
		again, err := Render(exampleDocument(2))
		if err != nil {
			t.Fatal(err)
		}
		if !bytes.Equal(first, again) {
			t.Fatalf("render %d differs from the first (%d vs %d bytes)", i+2, len(again), len(first))
		}
	}
	for _, bad := range []string{"/ID [", "FPDF"} {
		if bytes.Contains(first, []byte(bad)) {
			t.Errorf("output contains %q", bad)
		}
	}
	if !bytes.Contains(first, []byte("D:20240514093000")) {
		t.Error("creation date from Meta.Created not found")
	}
}

// pdfObjects splits an (uncompressed-dictionary) PDF into its objects.
func pdfObjects(t *testing.T, b []byte) map[int]string {
	t.Helper()
	re := regexp.MustCompile(`(?s)(\d+) 0 obj\s*(.*?)endobj`)
	objs := map[int]string{}
	for _, m := range re.FindAllSubmatch(b, -1) {
		n, _ := strconv.Atoi(string(m[1]))
		body := m[2]
		// drop stream data, keep the dictionary
		if i := bytes.Index(body, []byte("stream")); i >= 0 {
			body = body[:i]
		}
		objs[n] = string(body)
	}
	return objs
}

func ref(t *testing.T, dict, key string) int {
	t.Helper()
	m := regexp.MustCompile(regexp.QuoteMeta(key) + `\s*\[?\s*(\d+) 0 R`).FindStringSubmatch(dict)
	if m == nil {
		return 0
	}
	n, _ := strconv.Atoi(m[1])
	return n
}

var isFont = regexp.MustCompile(`/Type\s*/Font\b`)

func TestFontsEmbedded(t *testing.T) {
	b, err := Render(exampleDocument(0))
	if err != nil {
		t.Fatal(err)
	}
	objs := pdfObjects(t, b)
	fonts := 0
	for n, body := range objs {
		if !isFont.MatchString(body) || strings.Contains(body, "/Subtype /CIDFontType2") {
			continue
		}
		fonts++
		if !strings.Contains(body, "/Subtype /Type0") {
			t.Errorf("font object %d is not a Type0 (composite) font: %q", n, body)
			continue
		}
		desc := ref(t, body, "/DescendantFonts")
		cid, ok := objs[desc]
		if !ok || !strings.Contains(cid, "/CIDFontType2") {
			t.Errorf("font %d: descendant %d missing", n, desc)
			continue
		}
		fd, ok := objs[ref(t, cid, "/FontDescriptor")]
		if !ok {
			t.Errorf("font %d: no font descriptor", n)
			continue
		}
		ff := ref(t, fd, "/FontFile2")
		file, ok := objs[ff]
		if ff == 0 || !ok || !strings.Contains(file, "/Length1") {
			t.Errorf("font %d: descriptor has no embedded font file", n)
		}
	}
	if fonts < 5 {
		t.Errorf("found %d fonts, want at least 5 (sans, bold, mono, and the serif faces of the mathematics)", fonts)
	}
	for _, face := range []string{"/BaseFont /utf8serifI", "/BaseFont /utf8serif"} {
		if !bytes.Contains(b, []byte(face)) {
			t.Errorf("no %s: the equations' faces are not in the file", face)
		}
	}
	if bytes.Contains(b, []byte("/Type1")) || bytes.Contains(b, []byte("/Helvetica")) {
		t.Error("a non-embedded standard font is referenced")
	}
}

func longTable(rows int) *doc.Document {
	t := doc.Table{Caption: "Long table", Header: []string{"Station", "Value", "Check"}}
	for i := 0; i < rows; i++ {
		t.Rows = append(t.Rows, []doc.Cell{{Text: fmt.Sprintf("row %d", i)}, {Text: "1.0 mT"}, {Status: doc.Pass}})
	}
	return &doc.Document{
		Meta:   doc.Meta{Title: "T", DocID: "X-1", Revision: "A"},
		Blocks: []doc.Block{doc.Heading{Level: 1, Text: "Table"}, t},
	}
}

func TestTableHeaderRepeats(t *testing.T) {
	perPage := map[int]int{}
	pages := 0
	_, err := render(longTable(150), options{compress: true, onText: func(page int, s string) {
		if s == "Station" {
			perPage[page]++
		}
		pages = max(pages, page)
	}})
	if err != nil {
		t.Fatal(err)
	}
	if pages < 3 {
		t.Fatalf("table of 150 rows took %d pages, want ≥ 3", pages)
	}
	for p := 1; p <= pages; p++ {
		if perPage[p] != 1 {
			t.Errorf("page %d: header set %d times, want 1", p, perPage[p])
		}
	}
	// The same, seen in the uncompressed file: the header text appears
	// (UTF-16 encoded) once per page.
	b, err := render(longTable(150), options{})
	if err != nil {
		t.Fatal(err)
	}
	if n := bytes.Count(b, utf16Text("Station")); n != pages {
		t.Errorf("uncompressed file has the header %d times, want %d", n, pages)
	}
}

// utf16Text is s as fpdf writes it into a content stream for a UTF-8 font.
func utf16Text(s string) []byte {
	var b []byte
	for _, r := range s {
		b = append(b, byte(r>>8), byte(r))
	}
	return b
}

func TestFooterOnEveryPage(t *testing.T) {
	seen := map[string]bool{}
	pages := 0
	_, err := render(exampleDocument(3), options{compress: true, onText: func(page int, s string) {
		seen[fmt.Sprintf("%d|%s", page, s)] = true
		pages = max(pages, page)
	}})
	if err != nil {
		t.Fatal(err)
	}
	for p := 1; p <= pages; p++ {
		for _, want := range []string{fmt.Sprintf("Page %d of %d", p, pages), "CM-2024-0117  ·  Revision B  ·  2024-05-14", "CM-2024-0117"} {
			if !seen[fmt.Sprintf("%d|%s", p, want)] {
				t.Errorf("page %d lacks %q", p, want)
			}
		}
	}
}

func TestHeadingKeptWithNext(t *testing.T) {
	// Fill a page so that a heading would land in the last line or two.
	for fill := 30; fill < 42; fill++ {
		d := &doc.Document{Meta: doc.Meta{DocID: "K"}}
		for i := 0; i < fill; i++ {
			d.Blocks = append(d.Blocks, doc.Text(fmt.Sprintf("Line %d.", i)))
		}
		d.Blocks = append(d.Blocks, doc.Heading{Level: 1, Text: "Orphan candidate"},
			doc.Text("First body line after the heading, long enough to be a proper paragraph of text that wraps onto a second line in the memo body width, and then some more words."))
		pageOf := map[string]int{}
		_, err := render(d, options{compress: true, onText: func(page int, s string) {
			if _, ok := pageOf[s]; !ok {
				pageOf[s] = page
			}
		}})
		if err != nil {
			t.Fatal(err)
		}
		hp := pageOf["Orphan candidate"]
		bp := pageOf["First body line after the heading, long enough to be a proper paragraph of text that wraps onto a second line in the memo body"]
		if hp == 0 {
			t.Fatalf("fill %d: heading not set", fill)
		}
		for s, p := range pageOf {
			if strings.HasPrefix(s, "First body line") {
				bp = p
			}
		}
		if hp != bp {
			t.Errorf("fill %d: heading on page %d, its paragraph on page %d", fill, hp, bp)
		}
	}
}

func TestOutlineAndNumbering(t *testing.T) {
	var texts []string
	b, err := render(exampleDocument(0), options{onText: func(_ int, s string) { texts = append(texts, s) }})
	if err != nil {
		t.Fatal(err)
	}
	// Eight level-1 headings, numbered 1…8, each a bookmark; plus level 2.
	pages := len(regexp.MustCompile(`/Type /Page\b`).FindAll(b, -1))
	if n := bytes.Count(b, []byte("/Parent")) - pages; n != 11 {
		t.Errorf("outline has %d entries, want 11 (8 sections, 3 subsections)", n)
	}
	for _, title := range []string{"1 Summary of results", "As given", "8 Record"} {
		if !bytes.Contains(b, append([]byte("(\xfe\xff"), utf16Text(title)...)) {
			t.Errorf("no bookmark %q", title)
		}
	}
	joined := strings.Join(texts, "\n")
	for i, h := range []string{"Summary of results", "Inputs", "Assumptions", "Method", "Field on the axis", "Verification", "Safety cautions", "Record"} {
		if !strings.Contains(joined, fmt.Sprintf("%d\n%s", i+1, h)) {
			t.Errorf("heading %q not numbered %d", h, i+1)
		}
	}
	for _, want := range []string{"Table 1", "Table 2", "Figure 1", "Figure 2", "PASS", "FAIL", "CHECK", "⚠ WARNING", "NOTE", "Table 2 (continued)"} {
		if !strings.Contains(joined, want) {
			t.Errorf("no %q in the set text", want)
		}
	}
}

func TestMetadata(t *testing.T) {
	b, err := render(exampleDocument(0), options{})
	if err != nil {
		t.Fatal(err)
	}
	for _, key := range []string{"/Title", "/Subject", "/Author", "/Keywords", "/Creator", "/CreationDate (D:20240514093000)", "/ModDate (D:20240514093000)"} {
		if !bytes.Contains(b, []byte(key)) {
			t.Errorf("no %s in the info dictionary", key)
		}
	}
	if !bytes.Contains(b, utf16Text("coilmemo")) {
		t.Error("creator is not coilmemo")
	}
}

func TestEmptyAndOddDocuments(t *testing.T) {
	for name, d := range map[string]*doc.Document{
		"empty":     {},
		"nil block": {Blocks: []doc.Block{nil, doc.PageBreak{}, doc.PageBreak{}}},
		"empty table": {Blocks: []doc.Block{doc.Table{}, doc.Table{Header: []string{"a"}},
			doc.List{}, doc.Code{}, doc.Callout{}, doc.Figure{}, doc.TitleBlock{}, doc.Paragraph{}}},
		"long word": {Blocks: []doc.Block{doc.Text(strings.Repeat("x", 2000)), doc.Heading{Level: 3, Text: "deep first"}}},
		"pointers":  {Blocks: []doc.Block{&doc.Heading{Level: 1, Text: "P"}, &doc.Paragraph{Spans: []doc.Span{{Text: "q"}}}}},
	} {
		b, err := Render(d)
		if err != nil {
			t.Errorf("%s: %v", name, err)
			continue
		}
		if !bytes.HasPrefix(b, []byte("%PDF-")) {
			t.Errorf("%s: not a PDF", name)
		}
	}
}

func BenchmarkRender10Pages(b *testing.B) {
	d := exampleDocument(8)
	pages := 0
	if _, err := render(d, options{compress: true, onText: func(p int, _ string) { pages = max(pages, p) }}); err != nil {
		b.Fatal(err)
	}
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		out, err := Render(d)
		if err != nil {
			b.Fatal(err)
		}
		b.SetBytes(int64(len(out)))
	}
	b.ReportMetric(float64(pages), "pages")
}

// Text after a figure is set in its own colour, not in whatever fill the
// page had before the figure (the figure's state is discarded with its
// clip, so the renderer has to restate colours).
func TestTextColourAfterFigure(t *testing.T) {
	b, err := render(exampleDocument(0), options{})
	if err != nil {
		t.Fatal(err)
	}
	ops := regexp.MustCompile(`(?s)\bq\b|\bQ\b|([\d.]+) ([\d.]+) ([\d.]+) rg|([\d.]+) g\b|\(((?:\\.|[^\\)])*)\) Tj`)
	type fill struct{ r, g, b float64 }
	cur := fill{}
	var stack []fill
	checked := 0
	for _, m := range ops.FindAllSubmatch(b, -1) {
		switch {
		case string(m[0]) == "q":
			stack = append(stack, cur)
		case string(m[0]) == "Q":
			if len(stack) > 0 {
				cur, stack = stack[len(stack)-1], stack[:len(stack)-1]
			}
		case m[1] != nil:
			r, _ := strconv.ParseFloat(string(m[1]), 64)
			g, _ := strconv.ParseFloat(string(m[2]), 64)
			bl, _ := strconv.ParseFloat(string(m[3]), 64)
			cur = fill{r, g, bl}
		case m[4] != nil:
			v, _ := strconv.ParseFloat(string(m[4]), 64)
			cur = fill{v, v, v}
		case m[5] != nil:
			if bytes.Contains(m[5], utf16Text("Figure ")) {
				checked++
				ink := fill{0.110, 0.133, 0.153}
				if cur != ink {
					t.Errorf("figure caption set in %v, want the ink colour %v", cur, ink)
				}
			}
		}
	}
	if checked < 2 {
		t.Errorf("checked %d captions, want ≥ 2", checked)
	}
}

// Characters outside the Basic Multilingual Plane (emoji) are set as
// U+FFFD instead of breaking the writer's 16-bit font tables.
func TestAstralCharacters(t *testing.T) {
	d := &doc.Document{Meta: doc.Meta{Title: "coil 🚀"}, Blocks: []doc.Block{
		doc.Heading{Level: 1, Text: "field 🧲"}, doc.Text("a 🧲 b"),
		doc.Table{Header: []string{"x 🚀"}, Rows: [][]doc.Cell{{{Text: "𝑥"}}}},
	}}
	if _, err := Render(d); err != nil {
		t.Fatalf("a document with emoji: %v", err)
	}
}

// A section heading followed at once by its first subsection: the two and
// the subsection's first paragraph share a page, wherever the page fills.
func TestHeadingChainKeptWithNext(t *testing.T) {
	for fill := 30; fill < 44; fill++ {
		d := &doc.Document{Meta: doc.Meta{DocID: "K"}}
		for i := 0; i < fill; i++ {
			d.Blocks = append(d.Blocks, doc.Text(fmt.Sprintf("Line %d.", i)))
		}
		d.Blocks = append(d.Blocks, doc.Heading{Level: 1, Text: "Section"}, doc.Heading{Level: 2, Text: "Subsection"},
			doc.Text("Body."))
		pageOf := map[string]int{}
		if _, err := render(d, options{compress: true, onText: func(page int, s string) { pageOf[s] = page }}); err != nil {
			t.Fatal(err)
		}
		if a, b, c := pageOf["Section"], pageOf["Subsection"], pageOf["Body."]; a == 0 || a != b || b != c {
			t.Errorf("fill %d: section heading on page %d, subsection on %d, its text on %d", fill, a, b, c)
		}
	}
}

// A lead-in and a tall figure that do not fit below half a page of text:
// the text after the figure fills the page first, and the lead-in and its
// figure start the next page together, rather than leave half a page
// blank.
func TestFigureFloatsPastText(t *testing.T) {
	d := &doc.Document{Meta: doc.Meta{DocID: "F"}}
	for i := 0; i < 22; i++ {
		d.Blocks = append(d.Blocks, doc.Text(fmt.Sprintf("Line %d.", i)))
	}
	d.Blocks = append(d.Blocks, doc.Text("Figure 1 shows it."),
		doc.Figure{Number: 1, Caption: "Tall.", Width: 440, Height: 600, Draw: func(vg.Canvas, vg.Length, vg.Length) {}},
		doc.Text("After one."), doc.Text("After two."), doc.Heading{Level: 1, Text: "Next"}, doc.Text("End."))
	pageOf := map[string]int{}
	if _, err := render(d, options{compress: true, onText: func(page int, s string) { pageOf[s] = page }}); err != nil {
		t.Fatal(err)
	}
	if pageOf["Line 21."] != 1 || pageOf["After one."] != 1 || pageOf["After two."] != 1 ||
		pageOf["Figure 1 shows it."] != 2 || pageOf["Next"] < 2 {
		t.Errorf("pages: %v", pageOf)
	}
}
