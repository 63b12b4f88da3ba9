package out

import (
	"fmt"
	"sort"
	"strings"
	"sync"

	"github.com/tremie-dev/tremie/render/draw"
)

// Format is one output format, registered by name so that no caller holds
// a switch over formats: the render pipeline looks each one up and writes
// what it returns.
type Format struct {
	Name string // "svg", as --format spells it
	Ext  string // the file extension, with its dot: ".svg"
	// PerSheet is true when every sheet goes to its own file (SVG, PNG),
	// false when the whole document is one file (PDF).
	PerSheet bool
	// Encode writes a document: one file per sheet, or one for all.
	Encode func(doc *draw.Document, opt EncodeOptions) ([][]byte, error)
	// Sheet, in a PerSheet format, writes sheet i (0-based) alone, as
	// Encode writes it, so that a caller may write sheets at once.
	Sheet func(doc *draw.Document, i int, opt EncodeOptions) ([]byte, error)
}

// EncodeOptions are the settings a format may use.
type EncodeOptions struct {
	DPI  float64  // raster resolution (PNG)
	Text TextMode // how vector formats write words; "" is TextAsText
}

var (
	formatsMu sync.RWMutex
	formats   = map[string]Format{}
)

// RegisterFormat makes a format available by its name. Registering a
// name twice is a programming error and panics.
func RegisterFormat(f Format) {
	formatsMu.Lock()
	defer formatsMu.Unlock()
	if _, dup := formats[f.Name]; dup {
		panic("out: format " + f.Name + " registered twice")
	}
	formats[f.Name] = f
}

// LookupFormat returns the format registered under name (any case).
func LookupFormat(name string) (Format, bool) {
	formatsMu.RLock()
	defer formatsMu.RUnlock()
	f, ok := formats[strings.ToLower(strings.TrimSpace(name))]
	return f, ok
}

// FormatNames lists the registered formats, sorted.
func FormatNames() []string {
	formatsMu.RLock()
	defer formatsMu.RUnlock()
	names := make([]string, 0, len(formats))
	for n := range formats {
		names = append(names, n)
	}
	sort.Strings(names)
	return names
}

// ParseFormats reads a comma-separated list of format names ("svg,pdf"),
// keeping the order given and dropping repeats.
func ParseFormats(list string) ([]Format, error) {
	var fs []Format
	seen := map[string]bool{}
	for _, n := range strings.Split(list, ",") {
		f, ok := LookupFormat(n)
		if !ok {
			return nil, fmt.Errorf("unknown format %q (%s)", strings.TrimSpace(n), strings.Join(FormatNames(), ", "))
		}
		if !seen[f.Name] {
			seen[f.Name] = true
			fs = append(fs, f)
		}
	}
	return fs, nil
}

// perSheet registers a format that writes each sheet of a document to a
// file of its own, with one to write a sheet.
func perSheet(name, ext string, one func(doc *draw.Document, i int, opt EncodeOptions) ([]byte, error)) Format {
	sheet := func(doc *draw.Document, i int, opt EncodeOptions) ([]byte, error) {
		b, err := one(doc, i, opt)
		if err != nil {
			return nil, fmt.Errorf("%s sheet %d: %w", name, i+1, err)
		}
		return b, nil
	}
	return Format{Name: name, Ext: ext, PerSheet: true, Sheet: sheet,
		Encode: func(doc *draw.Document, opt EncodeOptions) ([][]byte, error) {
			files := make([][]byte, 0, len(doc.Pages))
			for i := range doc.Pages {
				b, err := sheet(doc, i, opt)
				if err != nil {
					return nil, err
				}
				files = append(files, b)
			}
			return files, nil
		}}
}

func init() {
	RegisterFormat(perSheet("svg", ".svg", func(doc *draw.Document, i int, opt EncodeOptions) ([]byte, error) { return SVGWith(doc, i, opt) }))
	RegisterFormat(perSheet("png", ".png", func(doc *draw.Document, i int, opt EncodeOptions) ([]byte, error) { return PNG(doc, i, opt.DPI) }))
	RegisterFormat(Format{Name: "pdf", Ext: ".pdf",
		Encode: func(doc *draw.Document, opt EncodeOptions) ([][]byte, error) {
			b, err := PDFWith(doc, opt)
			if err != nil {
				return nil, fmt.Errorf("pdf: %w", err)
			}
			return [][]byte{b}, nil
		}})
}
