package out_test

import (
	"fmt"
	"os"
	"path/filepath"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
)

// deepDoc lays out the gallery's deep well (DS-1200: 1,200 ft, 150
// layers, eight sheets), the document of the 1-second target.
func deepDoc(b testing.TB) *draw.Document {
	b.Helper()
	dir := b.TempDir()
	data, err := os.ReadFile(filepath.Join(galleryDir, "DS-1200.toml"))
	if err != nil {
		b.Fatal(err)
	}
	if err := os.WriteFile(filepath.Join(dir, "DS-1200.toml"), data, 0o644); err != nil {
		b.Fatal(err)
	}
	docs := projectDocs(b, dir)
	if len(docs) != 1 {
		b.Fatalf("%d documents", len(docs))
	}
	return docs[0].doc
}

// BenchmarkDeepWellPNG, …SVG and …PDF time each writer alone on the deep
// well's sheets, one at a time, without layout or files, for profiling
// (the command's whole run is cmd/tremie's BenchmarkRenderDeepWell).
func BenchmarkDeepWellPNG(b *testing.B) {
	doc := deepDoc(b)
	for b.Loop() {
		for i := range doc.Pages {
			if _, err := out.PNG(doc, i, 150); err != nil {
				b.Fatal(err)
			}
		}
	}
}

func BenchmarkDeepWellSVG(b *testing.B) {
	doc := deepDoc(b)
	for b.Loop() {
		for i := range doc.Pages {
			if _, err := out.SVG(doc, i); err != nil {
				b.Fatal(err)
			}
		}
	}
}

func BenchmarkDeepWellPDF(b *testing.B) {
	doc := deepDoc(b)
	for b.Loop() {
		if _, err := out.PDF(doc); err != nil {
			b.Fatal(err)
		}
	}
}

// TestWriteDeepWellPNG writes the deep well's sheets as PNG into
// $TREMIE_DEEP_PNG_DIR (skipped without it): rasters to compare before
// and after a change to the raster writer.
func TestWriteDeepWellPNG(t *testing.T) {
	dir := os.Getenv("TREMIE_DEEP_PNG_DIR")
	if dir == "" {
		t.Skip("TREMIE_DEEP_PNG_DIR is not set")
	}
	doc := deepDoc(t)
	for i := range doc.Pages {
		b, err := out.PNG(doc, i, 150)
		if err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(filepath.Join(dir, fmt.Sprintf("sheet%d.png", i+1)), b, 0o644); err != nil {
			t.Fatal(err)
		}
	}
}
