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
	for len(ready) > 0 {
		<-ready
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
