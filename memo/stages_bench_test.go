package memo

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg/recorder"

	"coilmemo/analysis"
	"coilmemo/doc"
	"coilmemo/memo/pdf"
)

// Stage benchmarks over every example in examples/: the whole run (spec
// text to PDF bytes, as `coilmemo build` does it after reading the file),
// composing the document, drawing each figure and the PDF backend alone.
//
//	go test -run '^$' -bench 'Example' ./memo

// benchExamples returns the examples' names and texts, in file order.
func benchExamples(b *testing.B) (names []string, srcs [][]byte) {
	b.Helper()
	files, err := filepath.Glob("../examples/*.md")
	if err != nil || len(files) == 0 {
		b.Fatalf("no examples: %v", err)
	}
	for _, f := range files {
		src, err := os.ReadFile(f)
		if err != nil {
			b.Fatal(err)
		}
		names = append(names, strings.TrimSuffix(filepath.Base(f), ".md"))
		srcs = append(srcs, src)
	}
	return names, srcs
}

func benchStudy(b *testing.B, name string, src []byte) *analysis.Study {
	b.Helper()
	st, diags := evaluate(name+".md", src)
	if len(diags) > 0 {
		b.Fatal(diags)
	}
	return st
}

// BenchmarkExampleWholeRun: spec text → Study → Document → PDF bytes.
func BenchmarkExampleWholeRun(b *testing.B) {
	names, srcs := benchExamples(b)
	for i, name := range names {
		b.Run(name, func(b *testing.B) {
			for range b.N {
				st := benchStudy(b, name, srcs[i])
				out, err := PDF(st)
				if err != nil {
					b.Fatal(err)
				}
				b.SetBytes(int64(len(out)))
			}
		})
	}
}

// BenchmarkExampleAnalysis: spec text → Study (parse, size, analyse).
func BenchmarkExampleAnalysis(b *testing.B) {
	names, srcs := benchExamples(b)
	for i, name := range names {
		b.Run(name, func(b *testing.B) {
			for range b.N {
				benchStudy(b, name, srcs[i])
			}
		})
	}
}

// BenchmarkExampleCompose: Study → Document (the figures' Draw functions
// are built, not called).
func BenchmarkExampleCompose(b *testing.B) {
	names, srcs := benchExamples(b)
	for i, name := range names {
		st := benchStudy(b, name, srcs[i])
		b.Run(name, func(b *testing.B) {
			for range b.N {
				Compose(st)
			}
		})
	}
}

// BenchmarkExamplePDF: Document → PDF bytes (layout, figures drawn into
// the page, fonts subset, compression, output).
func BenchmarkExamplePDF(b *testing.B) {
	names, srcs := benchExamples(b)
	for i, name := range names {
		d := Compose(benchStudy(b, name, srcs[i]))
		b.Run(name, func(b *testing.B) {
			for range b.N {
				out, err := pdf.Render(d)
				if err != nil {
					b.Fatal(err)
				}
				b.SetBytes(int64(len(out)))
			}
		})
	}
}

// BenchmarkExampleFigure draws each figure of each example into a
// recording canvas: the plot building and drawing of package figures,
// without the PDF writer (whose share BenchmarkExamplePDF includes).
func BenchmarkExampleFigure(b *testing.B) {
	names, srcs := benchExamples(b)
	for i, name := range names {
		d := Compose(benchStudy(b, name, srcs[i]))
		for _, f := range figuresOf(d.Blocks) {
			b.Run(fmt.Sprintf("%s/fig%02d", name, f.Number), func(b *testing.B) {
				for range b.N {
					c := &recorder.Canvas{}
					f.Draw(c, f.Width, f.Height)
				}
			})
		}
	}
}

func figuresOf(bs []doc.Block) []doc.Figure {
	var out []doc.Figure
	for _, b := range bs {
		switch v := b.(type) {
		case doc.Figure:
			if v.Draw != nil {
				out = append(out, v)
			}
		case doc.List:
			for _, it := range v.Items {
				out = append(out, figuresOf(it)...)
			}
		}
	}
	return out
}
