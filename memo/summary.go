package memo

import (
	"coilmemo/analysis"
	"io"
	"strings"

	"coilmemo/doc"
)

// WriteSummary writes the memo's page 1 — identification, verdict,
// headline results and requirements — followed by the field at the probes
// and the sweep's table when the spec has them, as Markdown for the
// terminal or a code host.
func WriteSummary(w io.Writer, j *analysis.Study) error {
	full, parts := ComposeSections(j)
	out := &doc.Document{Meta: full.Meta}
	for i, sec := range Sections {
		switch sec.Name() {
		case "summary":
			out.Blocks = append(out.Blocks, parts[i]...)
		case "field":
			for _, b := range parts[i] {
				if t, ok := b.(doc.Table); ok && strings.HasPrefix(t.Caption, "Flux density at the probe points") {
					out.Blocks = append(out.Blocks, doc.Heading{Level: 2, Text: "Field at the probes"}, t)
				}
			}
		case "sweep":
			for _, b := range parts[i] {
				switch b := b.(type) {
				case doc.Heading:
					if b.Level <= 1 { // below page 1's numbered section
						b.Level = 2
						out.Blocks = append(out.Blocks, b)
					}
				case doc.Table:
					out.Blocks = append(out.Blocks, b)
				}
			}
		}
	}
	return doc.WriteMarkdown(w, out)
}
