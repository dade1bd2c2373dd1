package memo

import (
	"coilmemo/analysis"
	"io"

	"coilmemo/doc"
)

// WriteSummary writes the memo's page 1 — identification, verdict,
// headline results and requirements — as plain text, for the terminal.
func WriteSummary(w io.Writer, j *analysis.Study) error {
	full := Compose(j)
	first := &doc.Document{Meta: full.Meta}
	for _, b := range full.Blocks {
		if _, ok := b.(doc.PageBreak); ok {
			break
		}
		first.Blocks = append(first.Blocks, b)
	}
	return doc.WriteText(w, first)
}
