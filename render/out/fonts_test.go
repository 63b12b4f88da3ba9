package out

import (
	"bytes"
	"fmt"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
)

// TestShapedLinesShared: a font set that has shaped another document's
// lines writes a document exactly as a fresh set does, in every format,
// and it did keep the lines it shaped.
func TestShapedLinesShared(t *testing.T) {
	encode := func() map[string][]byte {
		doc := sampleDoc()
		return map[string][]byte{"svg": must(SVG(doc, 0)), "pdf": must(PDF(doc)), "png": must(PNG(doc, 0, 96))}
	}
	idleSets.Lock()
	idleSets.sets = nil // a fresh set for the first document
	idleSets.Unlock()
	fresh := encode()
	other := benchDoc()
	must(SVG(other, 0))
	must(PDF(other))
	again := encode()
	for k := range fresh {
		if !bytes.Equal(fresh[k], again[k]) {
			t.Errorf("%s written with a set that shaped other lines differs from a fresh set's", k)
		}
	}
	fs := takeFonts()
	defer fs.giveBack()
	if len(fs.lines) == 0 {
		t.Error("the set kept no shaped line")
	}
}

// TestShapedLinesBounded: a set never holds more than maxLines lines.
func TestShapedLinesBounded(t *testing.T) {
	fs := &fontSet{}
	for i := 0; i < maxLines+10; i++ {
		if _, err := fs.line(draw.Regular, 8, rgba(draw.Black), fmt.Sprint(i)); err != nil {
			t.Fatal(err)
		}
		if len(fs.lines) > maxLines {
			t.Fatalf("%d lines kept, bound %d", len(fs.lines), maxLines)
		}
	}
	a, _ := fs.line(draw.Bold, 9, rgba(draw.Black), "MW-1")
	b, _ := fs.line(draw.Bold, 9, rgba(draw.Black), "MW-1")
	c, _ := fs.line(draw.Bold, 10, rgba(draw.Black), "MW-1")
	if a != b || a == c {
		t.Error("a line is shaped once per face, size, colour and string")
	}
}
