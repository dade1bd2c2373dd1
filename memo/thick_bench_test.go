package memo

import (
	"os"
	"testing"

	"gonum.org/v1/plot/vg/recorder"
)

// Benchmarks of the speed case of docs/performance.md
// (testdata/bench/bench-thick.md: a 1 000-turn multilayer coil whose memo
// maps |B| on a 201 × 201 grid):
//
//	go test -run '^$' -bench BenchThick -benchtime 20x ./memo
//
// the whole memo (spec text to PDF bytes), the analysis alone, the PDF
// from the analysed study, and the |B| map figure drawn into a recording
// canvas.

func benchThick(b *testing.B) []byte {
	b.Helper()
	src, err := os.ReadFile("../testdata/bench/bench-thick.md")
	if err != nil {
		b.Fatal(err)
	}
	return src
}

func BenchmarkBenchThick(b *testing.B) {
	src := benchThick(b)
	for range b.N {
		out, err := PDF(benchStudy(b, "bench-thick", src))
		if err != nil {
			b.Fatal(err)
		}
		b.SetBytes(int64(len(out)))
	}
}

func BenchmarkBenchThickAnalysis(b *testing.B) {
	src := benchThick(b)
	for range b.N {
		benchStudy(b, "bench-thick", src)
	}
}

func BenchmarkBenchThickPDF(b *testing.B) {
	st := benchStudy(b, "bench-thick", benchThick(b))
	b.ResetTimer()
	for range b.N {
		if _, err := PDF(st); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkBenchThickMapFigure(b *testing.B) {
	d := Compose(benchStudy(b, "bench-thick", benchThick(b)))
	found := false
	for _, f := range figuresOf(d.Blocks) {
		if f.Number != 3 { // the |B| map
			continue
		}
		found = true
		b.ResetTimer()
		for range b.N {
			f.Draw(&recorder.Canvas{}, f.Width, f.Height)
		}
	}
	if !found {
		b.Fatal("no figure 3")
	}
}
