package book

import (
	"bytes"
	"crypto/md5"
	"encoding/hex"
	"fmt"
	"io"
	"regexp"
	"strings"
	"sync"

	"github.com/pdfcpu/pdfcpu/pkg/api"
	"github.com/pdfcpu/pdfcpu/pkg/pdfcpu"
	"github.com/pdfcpu/pdfcpu/pkg/pdfcpu/model"
	"github.com/pdfcpu/pdfcpu/pkg/pdfcpu/types"
)

var disableConfig sync.Once

// config is pdfcpu's configuration for the book: no configuration
// directory in the user's home, no network, and plain (uncompressed)
// cross-reference tables and objects, so that the document dates and
// file identifier pdfcpu stamps can be pinned afterwards (see pin).
func config() *model.Configuration {
	disableConfig.Do(api.DisableConfigDir)
	c := model.NewDefaultConfiguration()
	c.Offline = true
	c.ValidationMode = model.ValidationRelaxed
	c.WriteObjectStream = false
	c.WriteXRefStream = false
	c.Optimize = false
	c.OptimizeBeforeWriting = false
	return c
}

// sheetPages counts the pages of each well's sheets.
func sheetPages(wells []Well) ([]int, error) {
	out := make([]int, len(wells))
	for i, w := range wells {
		if w.Sheets == nil {
			continue
		}
		n, err := api.PageCount(bytes.NewReader(w.Sheets), config())
		if err != nil {
			return nil, fmt.Errorf("book: sheets of %s: %w", w.Name(), err)
		}
		out[i] = n
	}
	return out, nil
}

// sectionPages counts the pages of each cross-section.
func sectionPages(secs []Section) ([]int, error) {
	out := make([]int, len(secs))
	for i, s := range secs {
		n, err := api.PageCount(bytes.NewReader(s.Sheet), config())
		if err != nil {
			return nil, fmt.Errorf("book: cross-section %s: %w", s.Name, err)
		}
		out[i] = n
	}
	return out, nil
}

// bind merges the front matter, the tables and the sheets, adds the
// outline and pins the dates.
func bind(front, tables []byte, in Input, pl *plan) ([]byte, error) {
	parts := []io.ReadSeeker{bytes.NewReader(front), bytes.NewReader(tables)}
	for _, s := range in.Sections {
		parts = append(parts, bytes.NewReader(s.Sheet))
	}
	for _, w := range in.Wells {
		if w.Sheets != nil {
			parts = append(parts, bytes.NewReader(w.Sheets))
		}
	}
	var merged bytes.Buffer
	if err := api.MergeRaw(parts, &merged, false, config()); err != nil {
		return nil, fmt.Errorf("book: merging: %w", err)
	}
	// Read, outline and write without pdfcpu's optimizer, whose
	// deduplication numbers objects in map order.
	ctx, err := api.ReadAndValidate(bytes.NewReader(merged.Bytes()), config())
	if err != nil {
		return nil, fmt.Errorf("book: reading the merged pages: %w", err)
	}
	if err := pdfcpu.AddBookmarks(ctx, outline(in, pl), true); err != nil {
		return nil, fmt.Errorf("book: bookmarks: %w", err)
	}
	var marked bytes.Buffer
	if err := api.WriteContext(ctx, &marked); err != nil {
		return nil, fmt.Errorf("book: writing: %w", err)
	}
	ordered, err := canonical(marked.Bytes())
	if err != nil {
		return nil, fmt.Errorf("book: %w", err)
	}
	out, err := pin(ordered, in)
	if err != nil {
		return nil, fmt.Errorf("book: %w", err)
	}
	return out, nil
}

// outline is the book's bookmarks: one per part, and under "Well sheets"
// one per drawn well, titled with its ID.
func outline(in Input, pl *plan) []pdfcpu.Bookmark {
	bms := []pdfcpu.Bookmark{
		{Title: "Cover", PageFrom: 1},
		{Title: "Contents", PageFrom: 2},
		{Title: "Construction summary", PageFrom: pl.summaryPage()},
		{Title: "Findings and waivers", PageFrom: pl.findingsPage()},
	}
	var secs []pdfcpu.Bookmark
	for i, s := range in.Sections {
		secs = append(secs, pdfcpu.Bookmark{Title: "Cross-section " + s.Name, PageFrom: pl.sectionPage(i)})
	}
	if len(secs) > 0 {
		bms = append(bms, pdfcpu.Bookmark{Title: "Cross-sections", PageFrom: secs[0].PageFrom, Kids: secs})
	}
	var kids []pdfcpu.Bookmark
	for i, w := range in.Wells {
		if p := pl.wellPage(i); p > 0 {
			kids = append(kids, pdfcpu.Bookmark{Title: w.Name(), PageFrom: p})
		}
	}
	if len(kids) > 0 {
		bms = append(bms, pdfcpu.Bookmark{Title: "Well sheets", PageFrom: kids[0].PageFrom, Kids: kids})
	}
	return bms
}

var (
	// pdfcpu writes the dates of the document information dictionary as
	// string literals of fixed length, D:YYYYMMDDHHmmSS+HH'mm'.
	infoDate = regexp.MustCompile(`/(?:CreationDate|ModDate) ?\((D:\d{14}[+-]\d\d'\d\d')\)`)
	// and the file identifier in the trailer as two hex strings.
	fileID = regexp.MustCompile(`/ID ?\[ ?<([0-9A-Fa-f]{32})> ?<([0-9A-Fa-f]{32})> ?\]`)
)

// pin replaces the clock time pdfcpu writes with the book's date, and
// its time-seeded file identifier with a digest of the content. Both are
// fixed-length tokens in uncompressed objects, so no byte offset moves
// and the cross-reference table stays exact.
func pin(pdf []byte, in Input) ([]byte, error) {
	out := bytes.Clone(pdf)
	date := types.DateString(in.Date.UTC())
	n := 0
	for _, m := range infoDate.FindAllSubmatchIndex(out, -1) {
		if m[3]-m[2] == len(date) {
			copy(out[m[2]:m[3]], date)
			n++
		}
	}
	if n != 2 {
		return nil, fmt.Errorf("pinning dates: found %d of the 2 document dates", n)
	}
	loc := fileID.FindSubmatchIndex(out)
	if loc == nil {
		return nil, fmt.Errorf("pinning the file identifier: none found")
	}
	for _, k := range []int{2, 4} {
		copy(out[loc[k]:loc[k+1]], strings.Repeat("0", 32))
	}
	sum := md5.Sum(out) // the identifier is an MD5-sized token (ISO 32000-1, 14.4)
	id := strings.ToUpper(hex.EncodeToString(sum[:]))
	for _, k := range []int{2, 4} {
		copy(out[loc[k]:loc[k+1]], id)
	}
	return out, nil
}
