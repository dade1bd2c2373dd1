// Package memo writes a Study up as the memo's document model: one file
// per memo section, composed in the memo's order (compose.go), with the
// PDF backend (memo/pdf) and the math typesetter (memo/mathlayout) below
// it. It computes no physics: every number comes from the analysis stage.
package memo

import (
	"coilmemo/analysis"
	"coilmemo/doc"
	"coilmemo/memo/pdf"
)

// Version is the tool version printed in every memo's record section.
const Version = analysis.Version

// Document composes the memo's document model of a study.
func Document(st *analysis.Study) *doc.Document { return Compose(st) }

// PDF renders the memo of a study.
func PDF(st *analysis.Study) ([]byte, error) { return pdf.Render(Compose(st)) }

// PDFOnePass is PDF in one layout pass (pdf.RenderOnePass), the same
// bytes: for a batch that keeps every core busy with other memos.
func PDFOnePass(st *analysis.Study) ([]byte, error) { return pdf.RenderOnePass(Compose(st)) }

// WarmPDF starts preparing the PDF writer for a PDF that will follow
// (its embedded faces registered on another core; see pdf.Warm).
func WarmPDF() { pdf.Warm() }
