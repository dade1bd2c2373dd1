package pdf

import (
	"bytes"
	"testing"
	"time"

	"coilmemo/doc"
)

// A document prepared ahead (Warm) gives the same bytes as one made on the
// spot, and a second render after it the same again.
func TestWarmSameBytes(t *testing.T) {
	d := &doc.Document{Meta: doc.Meta{Title: "Warm test", Created: time.Date(2026, 12, 2, 0, 0, 0, 0, time.UTC)},
		Blocks: []doc.Block{doc.Heading{Level: 1, Text: "Section"}, doc.Paragraph{Spans: []doc.Span{{Text: "Body text, "}, {Text: "bold", Strong: true}, {Text: " and "}, {Text: "italic", Emph: true}, {Text: "."}, {Text: "x^2", Math: true}}}}}
	for pending.Load() > 0 {
		takePrepared()
	}
	cold, err := Render(d)
	if err != nil {
		t.Fatal(err)
	}
	Warm()
	for deadline := time.Now().Add(10 * time.Second); len(ready) == 0 && time.Now().Before(deadline); {
		time.Sleep(time.Millisecond)
	}
	if len(ready) == 0 {
		t.Fatal("Warm prepared no document")
	}
	warm, err := Render(d)
	if err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(cold, warm) {
		t.Error("the prepared document's PDF differs from a fresh one's")
	}
}

// Every Warm is taken by one Render, which waits for a document still being
// prepared instead of preparing its own: after n Warms and n Renders made
// straight away none is pending or left over, and the bytes are the same.
func TestWarmTakenOnce(t *testing.T) {
	d := &doc.Document{Blocks: []doc.Block{doc.Paragraph{Spans: []doc.Span{{Text: "Body."}}}}}
	for pending.Load() > 0 {
		takePrepared()
	}
	want, err := Render(d)
	if err != nil {
		t.Fatal(err)
	}
	for range 3 {
		Warm()
	}
	for range 3 {
		got, err := Render(d)
		if err != nil {
			t.Fatal(err)
		}
		if !bytes.Equal(got, want) {
			t.Fatal("a render after Warm differs")
		}
	}
	if n, left := pending.Load(), len(ready); n != 0 || left != 0 {
		t.Errorf("%d pending and %d prepared left after as many renders as Warms", n, left)
	}
	for range maxWarm + 3 {
		Warm()
	}
	if n := pending.Load(); n != maxWarm {
		t.Errorf("%d pending, want at most %d", n, maxWarm)
	}
	for pending.Load() > 0 {
		takePrepared()
	}
}
