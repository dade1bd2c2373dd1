package spec

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// BenchmarkParseExample parses each example in examples/ (spec text to a
// typed Spec in SI):
//
//	go test -run '^$' -bench ParseExample ./spec
func BenchmarkParseExample(b *testing.B) {
	files, err := filepath.Glob("../examples/*.md")
	if err != nil || len(files) == 0 {
		b.Fatalf("no examples: %v", err)
	}
	for _, f := range files {
		src, err := os.ReadFile(f)
		if err != nil {
			b.Fatal(err)
		}
		b.Run(strings.TrimSuffix(filepath.Base(f), ".md"), func(b *testing.B) {
			b.SetBytes(int64(len(src)))
			for range b.N {
				if _, diags := Parse(f, src); len(diags) > 0 {
					b.Fatal(diags)
				}
			}
		})
	}
}
