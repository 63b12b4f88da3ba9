package gis

import (
	"path/filepath"
	"slices"
	"strings"

	"github.com/tremie-dev/tremie/render/table"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/crs"
)

// Export is a project's wells ready for a map: the points placed and the
// wells left out, with why.
type Export struct {
	Projected *crs.CRS // the projected column set's system; nil when none is shared
	Columns   []table.Column
	Points    []Point
	Skipped   []Skipped
	// Caution goes with the export, naming the thresholds the wells were
	// checked with (table.CautionFor); Build sets the defaults' one.
	Caution string
}

// Point is one monitoring point: a well, or one string of a nested well.
type Point struct {
	ID    string // the well ID, or "WELL/STRING" for a string of a nested well
	Well  string
	Name  string // the monitoring point: the string's name, or the well ID
	Pos   Position
	E, N  float64 // in Projected, when it is set
	Cells []table.Cell
	// Sheets are links to the well's sheets, relative to the export's
	// folder, slash-separated.
	Sheets []string
}

// Skipped is a well left out of the map.
type Skipped struct {
	File, ID, Reason string
}

// Input is one well of the project with the paths of its sheets.
type Input struct {
	Entry  table.Entry
	Sheets []string // paths as the command wrote them (any form filepath.Rel accepts)
}

// asWritten are the summary's coordinate columns, which mix systems from
// row to row; the export replaces them with one system per column set.
var asWritten = map[string]bool{"Easting": true, "Northing": true, "Latitude": true, "Longitude": true, "Coordinate system": true}

// Build places every readable well; units is the summary's depth unit ("" for
// the shared one), projected the system of the projected columns (nil for
// SharedCRS's choice), dir the folder the export is written to.
func Build(in []Input, units schema.DepthUnit, projected *crs.CRS, dir string) *Export {
	entries := make([]table.Entry, len(in))
	for i, w := range in {
		entries[i] = w.Entry
	}
	if projected == nil {
		projected = SharedCRS(entries)
	}
	full := table.Build(entries, units)
	x := &Export{Projected: projected, Caution: table.Caution}
	for _, c := range full.Columns() {
		if !asWritten[c.Header] {
			x.Columns = append(x.Columns, c)
		}
	}
	for _, w := range in {
		e := w.Entry
		if e.Well == nil {
			reason := "unreadable"
			if e.Err != nil {
				reason += ": " + firstLine(e.Err.Error())
			}
			x.Skipped = append(x.Skipped, Skipped{File: e.File, Reason: reason})
			continue
		}
		pos, err := Locate(e.Well)
		if err != nil {
			x.Skipped = append(x.Skipped, Skipped{File: e.File, ID: e.Well.ID, Reason: err.Error()})
			continue
		}
		p := Point{ID: e.Well.ID, Well: e.Well.ID, Name: e.Well.ID, Pos: pos, Sheets: links(w.Sheets, dir)}
		if projected != nil {
			en, err := projectedOf(e.Well, pos, projected)
			if err != nil {
				x.Skipped = append(x.Skipped, Skipped{File: e.File, ID: e.Well.ID, Reason: err.Error()})
				continue
			}
			p.E, p.N = en[0], en[1]
		}
		// The summary's rows of this well are its monitoring points: one,
		// or one per string of a nested well.
		for _, r := range table.Build([]table.Entry{e}, full.Units).Rows {
			q := p
			if r.String != "" {
				q.Name, q.ID = r.String, e.Well.ID+"/"+r.String
			}
			q.Cells = x.cells(r)
			x.Points = append(x.Points, q)
		}
	}
	return x
}

func (x *Export) cells(r table.Row) []table.Cell {
	out := make([]table.Cell, len(x.Columns))
	for i, c := range x.Columns {
		out[i] = c.Value(r)
	}
	return out
}

// projectedOf is the well's easting and northing in sys: as written when
// the well is in sys, else converted from its position.
func projectedOf(w *schema.Well, pos Position, sys *crs.CRS) ([2]float64, error) {
	loc := w.Location
	if loc.Easting != nil && loc.Northing != nil && loc.CRS != "" {
		if c, err := crs.Parse(loc.CRS); err == nil && c.Code == sys.Code {
			return [2]float64{*loc.Easting, *loc.Northing}, nil
		}
	}
	e, n, err := sys.FromLonLat(pos.Lon, pos.Lat)
	return [2]float64{e, n}, err
}

// SharedCRS is the projected system every well that names one shares, or
// nil when none does or they differ.
func SharedCRS(entries []table.Entry) *crs.CRS {
	var shared *crs.CRS
	for _, e := range entries {
		if e.Well == nil || e.Well.Location.CRS == "" {
			continue
		}
		c, err := crs.Parse(e.Well.Location.CRS)
		if err != nil || c.Geographic() {
			continue
		}
		if shared != nil && shared.Code != c.Code {
			return nil
		}
		shared = c
	}
	return shared
}

func links(paths []string, dir string) []string {
	var out []string
	absDir, _ := filepath.Abs(dir)
	for _, p := range paths {
		abs, _ := filepath.Abs(p)
		rel, err := filepath.Rel(absDir, abs)
		if err != nil {
			rel = p
		}
		out = append(out, filepath.ToSlash(rel))
	}
	return out
}

func firstLine(s string) string {
	if i := strings.IndexByte(s, '\n'); i >= 0 {
		return s[:i]
	}
	return s
}

// SheetFiles lists the sheet files `tremie render` left for a well in its
// output folder, named by its base name: base.pdf, base.svg or
// base-sheetN.svg, and the PNGs; sorted, so links come out the same.
func SheetFiles(outDir, base string) []string {
	var out []string
	for _, pattern := range []string{base + ".*", base + "-sheet*.*"} {
		m, _ := filepath.Glob(filepath.Join(outDir, pattern))
		for _, f := range m {
			switch strings.ToLower(filepath.Ext(f)) {
			case ".pdf", ".svg", ".png":
				out = append(out, f)
			}
		}
	}
	slices.Sort(out)
	return slices.Compact(out)
}
