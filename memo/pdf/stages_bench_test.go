package pdf

import (
	"bytes"
	"testing"

	"coilmemo/fonts"
)

// The PDF backend's stages over the 10-page example document (text, tables,
// equations and figures):
//
//	go test -run '^$' -bench 'Stage' ./memo/pdf

// BenchmarkStageDryPass: the layout pass that only learns the page count.
func BenchmarkStageDryPass(b *testing.B) {
	d := exampleDocument(8)
	for range b.N {
		r := newRenderer(d, options{}, 0, true)
		if err := r.run(); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkStageSetPass: the pass that sets every text, equation and
// figure, with the page count known (fonts registered on first use).
func BenchmarkStageSetPass(b *testing.B) {
	d := exampleDocument(8)
	dry := newRenderer(d, options{}, 0, true)
	if err := dry.run(); err != nil {
		b.Fatal(err)
	}
	for range b.N {
		r := newRenderer(d, options{compress: true}, dry.pdf.PageNo(), false)
		if err := r.run(); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkStageOutput: writing the set document out (font subsetting,
// compression, cross-reference table).
func BenchmarkStageOutput(b *testing.B) {
	d := exampleDocument(8)
	dry := newRenderer(d, options{}, 0, true)
	if err := dry.run(); err != nil {
		b.Fatal(err)
	}
	for range b.N {
		b.StopTimer()
		r := newRenderer(d, options{compress: true}, dry.pdf.PageNo(), false)
		if err := r.run(); err != nil {
			b.Fatal(err)
		}
		b.StartTimer()
		var buf bytes.Buffer
		if err := r.pdf.Output(&buf); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkStageFontRegister: registering each embedded face with a new
// document, as the set pass does on a face's first use.
func BenchmarkStageFontRegister(b *testing.B) {
	for _, s := range fonts.All() {
		b.Run(s.Family+s.Style, func(b *testing.B) {
			for range b.N {
				d := exampleDocument(0)
				r := newRenderer(d, options{}, 1, false)
				r.fonts.use(s.Family, s.Style, 10)
				if err := r.pdf.Error(); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
