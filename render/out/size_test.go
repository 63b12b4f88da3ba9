package out_test

import (
	"strconv"
	"testing"

	"github.com/tremie-dev/tremie/render/out"
)

// Sheet size targets of a demo sheet (issue 15): patterns are written
// once per document as tiles, so a sheet's size follows its text and
// lines, not the area its fills cover.
const (
	maxSheetSVG = 100_000 // bytes per sheet
	maxSheetPDF = 60_000  // bytes per one-sheet document
)

// TestDemoSheetSizes keeps every demo sheet within the size targets,
// BR-1 with its wall image too: the image is embedded at its printed
// resolution as JPEG, and the feature traces are stroked paths.
// The largest of each is logged (go test -v), to see the margin left.
func TestDemoSheetSizes(t *testing.T) {
	var bigSVG, bigPDF string
	svgMax, pdfMax := 0, 0
	for _, nd := range demoDocs(t) {
		for i := range nd.doc.Pages {
			b, err := out.SVG(nd.doc, i)
			if err != nil {
				t.Fatal(err)
			}
			if len(b) > svgMax {
				svgMax, bigSVG = len(b), nd.name+" sheet "+strconv.Itoa(i+1)
			}
			if len(b) > maxSheetSVG {
				t.Errorf("%s sheet %d: SVG is %d bytes, target %d", nd.name, i+1, len(b), maxSheetSVG)
			}
		}
		b, err := out.PDF(nd.doc)
		if err != nil {
			t.Fatal(err)
		}
		if limit := maxSheetPDF * len(nd.doc.Pages); len(b) > limit {
			t.Errorf("%s: PDF of %d sheets is %d bytes, target %d", nd.name, len(nd.doc.Pages), len(b), limit)
		}
		if per := len(b) / len(nd.doc.Pages); per > pdfMax {
			pdfMax, bigPDF = per, nd.name
		}
	}
	t.Logf("largest SVG sheet: %s, %d bytes (target %d); largest PDF per sheet: %s, %d bytes (target %d)", bigSVG, svgMax, maxSheetSVG, bigPDF, pdfMax, maxSheetPDF)
}
