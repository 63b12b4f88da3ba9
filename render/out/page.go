package out

import (
	"errors"
	"fmt"

	"github.com/tremie-dev/tremie/render/draw"
)

// maxPageSide is the largest page side accepted, in points: 200 in, the
// PDF limit for a page without a user unit (ISO 32000-1, Annex C.2).
const maxPageSide = 14400

// pageOf returns page i (0-based) of doc after checking it can be drawn.
func pageOf(doc *draw.Document, i int) (*draw.Page, error) {
	if doc == nil {
		return nil, errors.New("no document")
	}
	if i < 0 || i >= len(doc.Pages) {
		return nil, fmt.Errorf("page %d out of range: the document has %d", i+1, len(doc.Pages))
	}
	p := doc.Pages[i]
	if p == nil {
		return nil, fmt.Errorf("page %d is nil", i+1)
	}
	if !finite(p.Width, p.Height) || p.Width <= 0 || p.Height <= 0 || p.Width > maxPageSide || p.Height > maxPageSide {
		return nil, fmt.Errorf("page %d: size %g × %g pt is not a drawable page (each side over 0 and at most %d pt)", i+1, p.Width, p.Height, maxPageSide)
	}
	return p, nil
}
