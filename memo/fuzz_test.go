package memo

import (
	"coilmemo/analysis/report"
	"io"
	"os"
	"path/filepath"
	"testing"

	"coilmemo/doc"
	"coilmemo/spec"
)

// FuzzEvaluate runs the whole pipeline — reader, calculations, checks,
// sweep, composition, the text backend, the JSON and the PDF — on
// mutated specs: whatever the reader accepts must compose without a panic.
// Seeds: the shipped examples.
func FuzzEvaluate(f *testing.F) {
	files, _ := filepath.Glob("../examples/*.md")
	for _, p := range files {
		b, err := os.ReadFile(p)
		if err != nil {
			f.Fatal(err)
		}
		f.Add(b)
	}
	f.Fuzz(func(t *testing.T, src []byte) {
		s, diags := spec.Parse("fuzz.md", src)
		if len(diags) > 0 {
			return
		}
		// The fuzzer looks for crashes, not for slow designs: skip the
		// very large ones whose evaluation alone takes seconds.
		turns := 0
		for _, c := range s.Design.Coils {
			turns += c.Turns
		}
		if turns > 5000 || s.Sweep != nil && len(s.Sweep.Values()) > 10 {
			return
		}
		j, diags := evaluate("fuzz.md", src)
		if len(diags) > 0 {
			t.Fatalf("the reader accepted the spec once and refused it the second time: %v", diags)
		}
		if err := doc.WriteText(io.Discard, Document(j)); err != nil {
			t.Fatal(err)
		}
		if _, err := report.JSON(j); err != nil {
			t.Fatal(err)
		}
		if _, err := PDF(j); err != nil {
			t.Fatal(err)
		}
	})
}
