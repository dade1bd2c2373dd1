package pdf_test

import (
	"bytes"
	"os"
	"path/filepath"
	"testing"

	"coilmemo/analysis"
	"coilmemo/memo"
	"coilmemo/memo/pdf"
)

// The page contents deflated with reused writers give the file fpdf
// writes when it compresses them itself: same streams, same dictionaries,
// same cross-reference offsets — over every example memo.
func TestDeflatePagesAsFpdf(t *testing.T) {
	files, _ := filepath.Glob("../../examples/*.md")
	if len(files) == 0 {
		t.Fatal("no examples")
	}
	for _, f := range files {
		t.Run(filepath.Base(f), func(t *testing.T) {
			src, err := os.ReadFile(f)
			if err != nil {
				t.Fatal(err)
			}
			j, diags := analysis.Run(filepath.Base(f), src, analysis.Options{ReadPrevious: func(ref string) (string, []byte, error) {
				b, err := os.ReadFile(filepath.Join(filepath.Dir(f), ref))
				return ref, b, err
			}})
			if len(diags) > 0 {
				t.Fatal(diags)
			}
			d := memo.Document(j)
			ours, err := pdf.Render(d)
			if err != nil {
				t.Fatal(err)
			}
			theirs, err := pdf.RenderFpdfDeflate(d)
			if err != nil {
				t.Fatal(err)
			}
			if !bytes.Equal(ours, theirs) {
				i := 0
				for i < min(len(ours), len(theirs)) && ours[i] == theirs[i] {
					i++
				}
				t.Fatalf("%d bytes against fpdf's %d, first difference at %d: %q against %q", len(ours), len(theirs), i,
					ours[max(0, i-40):min(len(ours), i+40)], theirs[max(0, i-40):min(len(theirs), i+40)])
			}
			pages := bytes.Count(ours, []byte("<</Type /Page\n"))
			if deflated := bytes.Count(ours, []byte("<</Filter /FlateDecode /Length ")); pages == 0 || deflated < pages {
				t.Errorf("%d pages, %d streams deflated as fpdf deflates page contents", pages, deflated)
			}
		})
	}
}
