package pdf

import "coilmemo/doc"

// RenderFpdfDeflate is Render with the page contents compressed by fpdf
// itself, for comparing with deflatePages from the external tests.
func RenderFpdfDeflate(d *doc.Document) ([]byte, error) {
	return render(d, options{compress: true, fpdfDeflate: true})
}
