package analysis

import (
	"os"
	"testing"

	"coilmemo/spec"
)

// BenchmarkSizeExample sizes the shipped sizing example: 17 gauges × 2951
// turn counts (50 167 choices) with a free radial build.
func BenchmarkSizeExample(b *testing.B) {
	src, err := os.ReadFile("../examples/torque-coil-sizing.md")
	if err != nil {
		b.Fatal(err)
	}
	s, diags := spec.Parse("torque-coil-sizing.md", src)
	if len(diags) > 0 {
		b.Fatal(diags)
	}
	b.ReportAllocs()
	for b.Loop() {
		if _, _, d := SizeDesign(s); len(d) > 0 {
			b.Fatal(d)
		}
	}
}
