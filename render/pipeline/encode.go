package pipeline

import (
	"fmt"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/pipeline/batch"
)

// outputDoc is one document of a well to write in every format: its
// sheets, or its feature summary.
type outputDoc struct {
	doc  *draw.Document
	base string // file name without extension: "MW-1", "MW-1-features"
	// several replaces the extension's start when the document writes
	// several files of one format: "MW-1-sheet2.svg".
	several string
	what    string // prefix of its encoding errors
}

// encodePart is one file to encode (one sheet of a per-sheet format), or
// one call of a format's Encode (a PDF, or every sheet of a format that
// has no sheet-at-a-time writer).
type encodePart struct {
	d     *outputDoc
	f     out.Format
	sheet int // -1: the whole document through f.Encode
	data  [][]byte
	err   error
}

// encodeAll encodes every document in every format, the parts at once on
// the CPUs no other well is using (batch.Each), and names the files: in
// document order, then format order, then sheet order, whatever order
// the parts finished in.
func encodeAll(path string, docs []outputDoc, opt RenderOptions) ([]pending, error) {
	eo := out.EncodeOptions{DPI: opt.DPI, Text: opt.Text}
	var parts []encodePart
	for i := range docs {
		d := &docs[i]
		for _, f := range opt.Formats {
			if f.Sheet == nil {
				parts = append(parts, encodePart{d: d, f: f, sheet: -1})
				continue
			}
			for s := range d.doc.Pages {
				parts = append(parts, encodePart{d: d, f: f, sheet: s})
			}
		}
	}
	batch.Each(len(parts), func(i int) {
		p := &parts[i]
		if p.sheet < 0 {
			p.data, p.err = p.f.Encode(p.d.doc, eo)
			return
		}
		var b []byte
		b, p.err = p.f.Sheet(p.d.doc, p.sheet, eo)
		p.data = [][]byte{b}
	})
	var files []pending
	for _, p := range parts {
		if p.err != nil {
			return nil, &OutputError{fmt.Errorf("%s: %s%w", path, p.d.what, p.err)}
		}
		n := len(p.data) // files of this format for this document
		first := 0
		if p.sheet >= 0 {
			n, first = len(p.d.doc.Pages), p.sheet
		}
		for k, data := range p.data {
			name := p.d.base + p.f.Ext
			if n > 1 {
				name = fmt.Sprintf("%s%s%d%s", p.d.base, p.d.several, first+k+1, p.f.Ext)
			}
			files = append(files, pending{name, data})
		}
	}
	return files, nil
}
