package out

import (
	"bytes"
	"sync"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
)

// TestConcurrentRendering: a batch renders wells in parallel; each call
// takes a font set of its own from the pool, and the shared measurement
// cache is locked. Run with
// -race to make this meaningful; without it, it still checks that
// parallel output equals serial output.
func TestConcurrentRendering(t *testing.T) {
	want := [3][]byte{must(SVG(sampleDoc(), 0)), must(PDF(sampleDoc())), must(PNG(sampleDoc(), 0, 50))}
	var wg sync.WaitGroup
	errs := make(chan string, 12)
	for g := 0; g < 4; g++ {
		wg.Add(1)
		go func() {
			defer wg.Done()
			doc := sampleDoc()
			got := [3][]byte{must(SVG(doc, 0)), must(PDF(doc)), must(PNG(doc, 0, 50))}
			for k := range got {
				if !bytes.Equal(got[k], want[k]) {
					errs <- [3]string{"svg", "pdf", "png"}[k]
				}
			}
		}()
	}
	wg.Wait()
	close(errs)
	for e := range errs {
		t.Errorf("parallel %s differs from serial", e)
	}
}

// TestFontReuseKeepsBytes: a font set reused from an earlier document
// (with other text, so other glyphs) embeds only what this one uses: a
// document comes out the same before and after another is written.
func TestFontReuseKeepsBytes(t *testing.T) {
	doc := sampleDoc()
	want := [2][]byte{must(SVG(doc, 0)), must(PDF(doc))}
	other := sampleDoc()
	for _, font := range []draw.FontStyle{draw.Regular, draw.Bold, draw.Italic, draw.Mono} {
		other.Pages[0].Add(draw.Text{At: draw.Point{X: 50, Y: 700}, S: "ÆØÅ qwertyuiop — 0123456789 µ±§", Size: 9, Font: font})
	}
	for i := 0; i < 3; i++ {
		must(SVG(other, 0))
		must(PDF(other))
	}
	got := [2][]byte{must(SVG(doc, 0)), must(PDF(doc))}
	for k := range got {
		if !bytes.Equal(got[k], want[k]) {
			t.Errorf("%s changed after another document reused its fonts", [2]string{"svg", "pdf"}[k])
		}
	}
}
