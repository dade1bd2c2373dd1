package pdf

import (
	"bytes"
	"crypto/sha256"
	"testing"

	"coilmemo/doc"
	"coilmemo/fonts"
)

// TestFiguresDrawnAheadSameBytes: replaying the figures drawn ahead gives
// the memo drawing each figure on the spot gives, byte for byte, and so
// does one layout pass (RenderOnePass).
func TestFiguresDrawnAheadSameBytes(t *testing.T) {
	for _, pages := range []int{1, 2, 5} {
		d := exampleDocument(pages)
		if countFigures(d.Blocks) == 0 {
			t.Fatal("the example document has no figures")
		}
		ahead, err := render(d, options{compress: true})
		if err != nil {
			t.Fatal(err)
		}
		spot, err := render(exampleDocument(pages), options{compress: true, onSpot: true})
		if err != nil {
			t.Fatal(err)
		}
		if !bytes.Equal(ahead, spot) {
			t.Errorf("%d-page document: drawn ahead %d bytes, on the spot %d bytes, not the same", pages, len(ahead), len(spot))
		}
		one, err := RenderOnePass(exampleDocument(pages))
		if err != nil {
			t.Fatal(err)
		}
		if !bytes.Equal(ahead, one) {
			t.Errorf("%d-page document: two passes %d bytes, one pass %d bytes, not the same", pages, len(ahead), len(one))
		}
	}
}

// TestFaceBytesUntouched: rendering leaves the embedded font files as they
// were (fpdf writes into the bytes it is given; addFace gives it a copy),
// so a memo does not depend on the memos rendered before it. Two documents
// whose code blocks use different glyphs are rendered in turn.
func TestFaceBytesUntouched(t *testing.T) {
	code := func(text string) *doc.Document {
		return &doc.Document{Blocks: []doc.Block{doc.Paragraph{Spans: []doc.Span{{Text: "Listing:"}}}, doc.Code{Text: text}}}
	}
	a, b := code("coil = 120 turns\nwire = AWG 24 {x}"), code("ZQJ ~ |µ| → 0.5 mT; ±2 %")
	sums := func() map[string][32]byte {
		m := map[string][32]byte{}
		for _, s := range fonts.All() {
			m[s.Family+"/"+s.Style] = sha256.Sum256(s.TTF)
		}
		return m
	}
	first, err := Render(a)
	if err != nil {
		t.Fatal(err)
	}
	before := sums()
	if _, err := Render(b); err != nil {
		t.Fatal(err)
	}
	for k, v := range sums() {
		if v != before[k] {
			t.Errorf("face %s changed by rendering", k)
		}
	}
	again, err := Render(a)
	if err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(first, again) {
		t.Error("a document rendered after another differs from its first render")
	}
}
