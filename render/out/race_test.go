package out

import (
	"bytes"
	"sync"
	"testing"
)

// TestConcurrentRendering: a batch renders wells in parallel; each call
// has its own fonts, and the shared measurement cache is locked. Run with
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
