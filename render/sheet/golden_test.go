package sheet

import (
	"bytes"
	"crypto/sha256"
	"encoding/xml"
	"flag"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/schema"
)

var update = flag.Bool("update", false, "rewrite the golden SVGs under testdata/golden from the current layout")

// DemoWell is a demo well as the render pipeline hands it to Layout.
type DemoWell struct {
	Well *schema.Well
	In   Inputs
	Opt  Options
}

// PrepareDemo is set by pipeline_test.go (package sheet_test), which may
// import render/pipeline, the one sequence from a well file to its
// sheets; this package's own tests cannot import it without a cycle.
var PrepareDemo func(t testing.TB) map[string]DemoWell

// demoWells reads every demo well with the inputs and options tremie
// render gives it, by file name.
func demoWells(t testing.TB) map[string]demoWell {
	t.Helper()
	out := map[string]demoWell{}
	for n, d := range PrepareDemo(t) {
		out[n] = demoWell{w: d.Well, in: d.In, opt: d.Opt}
	}
	return out
}

type demoWell struct {
	w   *schema.Well
	in  Inputs
	opt Options
}

// demoDocs lays out every demo well as tremie render would.
func demoDocs(t testing.TB) map[string]*draw.Document {
	t.Helper()
	docs := map[string]*draw.Document{}
	for n, d := range demoWells(t) {
		doc, err := Layout(d.w, d.in, d.opt)
		if err != nil {
			t.Fatalf("%s: %v", n, err)
		}
		docs[n] = doc
	}
	return docs
}

func TestGoldenDemoSheets(t *testing.T) {
	dir := filepath.Join("testdata", "golden")
	if *update {
		if err := os.MkdirAll(dir, 0o755); err != nil {
			t.Fatal(err)
		}
	}
	for name, doc := range demoDocs(t) {
		base := name[:len(name)-len(".toml")]
		for i := range doc.Pages {
			got, err := out.SVG(doc, i)
			if err != nil {
				t.Fatalf("%s sheet %d: %v", name, i+1, err)
			}
			if err := parsesAsXML(got); err != nil {
				t.Errorf("%s sheet %d: SVG does not parse (encoding/xml): %v", name, i+1, err)
			}
			file := filepath.Join(dir, base+".svg")
			if len(doc.Pages) > 1 {
				file = filepath.Join(dir, fmt.Sprintf("%s-sheet%d.svg", base, i+1))
			}
			if *update {
				if err := os.WriteFile(file, got, 0o644); err != nil {
					t.Fatal(err)
				}
				continue
			}
			want, err := os.ReadFile(file)
			if err != nil {
				t.Errorf("%s: %v (run go test ./render/sheet -run Golden -update)", file, err)
				continue
			}
			if !bytes.Equal(got, want) {
				t.Errorf("%s differs from the layout (%d bytes now, %d golden) at byte %d; review with -update and git diff", file, len(got), len(want), firstDiff(got, want))
			}
		}
	}
}

func parsesAsXML(b []byte) error {
	dec := xml.NewDecoder(bytes.NewReader(b))
	for {
		if _, err := dec.Token(); err == io.EOF {
			return nil
		} else if err != nil {
			return err
		}
	}
}

func firstDiff(a, b []byte) int {
	for i := 0; i < len(a) && i < len(b); i++ {
		if a[i] != b[i] {
			return i
		}
	}
	return min(len(a), len(b))
}

// Every demo sheet shows what the issue asks of a sheet: the caution and
// callouts (its legend: TestLegendIsWhatIsPainted).
func TestDemoSheetsContents(t *testing.T) {
	for name, doc := range demoDocs(t) {
		for i, p := range doc.Pages {
			if len(texts(p, "caution")) == 0 {
				t.Errorf("%s sheet %d: no caution", name, i+1)
			}
			if len(boxes(p, "body")) != 1 {
				continue // a notes sheet
			}
			if len(boxes(p, "callout:")) < 3 {
				t.Errorf("%s sheet %d: %d callouts", name, i+1, len(boxes(p, "callout:")))
			}
		}
	}
}

// TestGoldenGallery keeps the gallery's sheets (testdata/gallery) as they
// were reviewed: the SHA-256 of every sheet's SVG, one line per sheet, in
// testdata/gallery/golden.sha256 (hashes rather than files: the 1,200-ft
// well alone has eight sheets). Review a change by looking at the PNGs
// (docs/gallery.md) and rewrite with -update.
func TestGoldenGallery(t *testing.T) {
	const path = "../../testdata/gallery/golden.sha256"
	var b strings.Builder
	for _, c := range galleryWells(t) {
		doc := layoutOf(t, c.w, c.in, Options{Date: "2026-06-15T00:00:00Z"})
		for i := range doc.Pages {
			svg, err := out.SVG(doc, i)
			if err != nil {
				t.Fatal(err)
			}
			fmt.Fprintf(&b, "%x  %s sheet %d\n", sha256.Sum256(svg), c.name, i+1)
		}
	}
	if *update {
		if err := os.WriteFile(path, []byte(b.String()), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run go test ./render/sheet -run Golden -update)", err)
	}
	if string(want) != b.String() {
		t.Errorf("gallery sheets differ from %s: look at them (docs/gallery.md) and rewrite with -update\nnow:\n%s", path, b.String())
	}
}
