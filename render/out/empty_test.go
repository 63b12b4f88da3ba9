package out

import (
	"bytes"
	"testing"

	"github.com/pdfcpu/pdfcpu/pkg/api"

	"github.com/tremie-dev/tremie/render/draw"
)

// TestEmptyPage: a blank page (no fonts, no images) is still a valid
// file in every format.
func TestEmptyPage(t *testing.T) {
	doc := &draw.Document{Pages: []*draw.Page{{Width: 612, Height: 792}}}
	b, err := PDF(doc)
	if err != nil {
		t.Fatal(err)
	}
	if err := api.Validate(bytes.NewReader(b), pdfcpuConf()); err != nil {
		t.Errorf("blank PDF invalid: %v", err)
	}
	s, err := SVG(doc, 0)
	if err != nil {
		t.Fatal(err)
	}
	svgText(t, s)
	img := decodePNG(t, must(PNG(doc, 0, 36)))
	if c := img.At(100, 100); !near(c, draw.White, 0) {
		t.Errorf("blank PNG pixel %v, want white", c)
	}
}
