package symbols

import (
	"flag"
	"fmt"
	"os"
	"path/filepath"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
)

var sheetDir = flag.String("symbolsheet", "", "write the symbol sheet as PNG and PDF to this directory")

// TestSymbolSheet renders the reference sheet through every backend; with
// -symbolsheet DIR it also keeps the files for a reviewer to look at.
func TestSymbolSheet(t *testing.T) {
	pages := SymbolSheet(612, 792)
	doc := &draw.Document{Title: "tremie symbol set", Pages: pages}
	pdf, err := out.PDF(doc)
	if err != nil {
		t.Fatal(err)
	}
	for i := range pages {
		if _, err := out.SVG(doc, i); err != nil {
			t.Fatal(err)
		}
		png, err := out.PNG(doc, i, 110)
		if err != nil {
			t.Fatal(err)
		}
		if *sheetDir != "" {
			os.WriteFile(filepath.Join(*sheetDir, fmt.Sprintf("symbols-%d.png", i+1)), png, 0o644)
		}
	}
	if *sheetDir != "" {
		os.WriteFile(filepath.Join(*sheetDir, "symbols.pdf"), pdf, 0o644)
	}
}
