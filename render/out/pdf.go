package out

import (
	"bytes"
	"errors"
	"fmt"

	"github.com/tdewolff/canvas"
	"github.com/tdewolff/canvas/renderers/pdf"

	"github.com/tremie-dev/tremie/render/draw"
)

// PDF writes every page of doc into one PDF. Text is real text in
// embedded, subset TrueType faces with a Unicode map, so it can be
// searched and copied. The creation date is doc.Date.
func PDF(doc *draw.Document) ([]byte, error) { return PDFWith(doc, EncodeOptions{}) }

// PDFWith writes doc as PDF with the text mode of opt.
func PDFWith(doc *draw.Document, opt EncodeOptions) ([]byte, error) {
	if doc == nil || len(doc.Pages) == 0 {
		return nil, errors.New("pdf: the document has no pages")
	}
	info, err := newPDFInfo(doc)
	if err != nil {
		return nil, fmt.Errorf("pdf: %w", err)
	}
	pages := make([]*draw.Page, len(doc.Pages))
	for i := range doc.Pages {
		if pages[i], err = pageOf(doc, i); err != nil {
			return nil, fmt.Errorf("pdf: %w", err)
		}
	}
	var buf bytes.Buffer
	// Streams are compressed by fixPDF, at a level chosen per stream.
	opts := pdf.Options{Compress: false, SubsetFonts: true, ImageEncoding: canvas.Lossless}
	r := pdf.New(&buf, pages[0].Width*mmPerPt, pages[0].Height*mmPerPt, &opts)
	fonts := takeFonts()
	defer fonts.giveBack()
	patterns := newPDFPatterns()
	paths, jpegs := &pdfPaths{}, &pdfJPEGs{}
	for i, p := range pages {
		if i > 0 {
			r.NewPage(p.Width*mmPerPt, p.Height*mmPerPt)
		}
		if err := paintPage(pdfRenderer{PDF: r, paths: paths, jpegs: jpegs}, p, fonts, opt.Text, patterns); err != nil {
			return nil, fmt.Errorf("pdf page %d: %w", i+1, err)
		}
	}
	if err := r.Close(); err != nil {
		return nil, fmt.Errorf("pdf: %w", err)
	}
	out, err := fixPDF(buf.Bytes(), info.object(), patterns, paths, jpegs)
	if err != nil {
		return nil, fmt.Errorf("pdf: %w", err)
	}
	return out, nil
}
