// Package section lays out a cross-section of several wells: each well a
// narrow column at its distance along a line, hung at its ground
// elevation, with the lithology, the construction, water levels and the
// hydrostratigraphic units joined between neighbours that both have them.
// It returns a device-independent draw.Document (package render/out
// writes it); items carry Role strings that tests read.
package section

import (
	"errors"
	"fmt"
	"sort"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/templates"
)

// Caution is printed on every section sheet.
const Caution = "Figures and checks support, and never replace, the review of a licensed professional and the governing local well code. Units are joined only between neighbouring wells that both log them; the ground between wells is not known."

// Input is everything a section shows.
type Input struct {
	Project *project.Project // title block, units, datum; may be nil
	Section project.Section
	Wells   []*schema.Well      // in the order of Section.Wells
	Page    *templates.Template // nil: Tabloid landscape
	Date    string              // document date (RFC 3339); "" for none
}

// ErrUnplaceable is wrapped by Layout's error when wells lack the
// elevation or coordinates a section needs.
var ErrUnplaceable = errors.New("wells cannot be placed on a section")

// placed is one well on the line.
type placed struct {
	w        *schema.Well
	plan     XY      // metres
	chainage float64 // metres along the line
	offset   float64 // metres off the line
	ground   schema.Length
	x        float64 // drawn column centre, points
	moved    bool    // drawn apart from its true distance to keep columns apart
}

// Layout draws the section on one sheet.
func Layout(in Input) (*draw.Document, error) {
	if len(in.Wells) < 2 {
		return nil, fmt.Errorf("section %q: needs at least two wells", in.Section.Name)
	}
	wells, line, method, err := place(in)
	if err != nil {
		return nil, fmt.Errorf("section %q: %w", in.Section.Name, err)
	}
	tpl := in.Page
	if tpl == nil {
		if tpl, err = templates.Load("tabloid", true); err != nil {
			return nil, err
		}
	}
	l := newLayout(in, tpl, wells, line, method)
	page := l.draw()
	title := "Cross-section " + in.Section.Name
	if in.Project != nil && in.Project.Name != "" {
		title = in.Project.Name + " — " + title
	}
	return &draw.Document{Title: title, Subject: "Hydrogeological cross-section", Date: in.Date, Pages: []*draw.Page{page}}, nil
}

// differing names, when the wells give more than one value of a key
// (case and spaces aside; wells without one are taken to agree), each
// value with its wells: "DHHN2016: EU-2; NAVD88: NW-3, PL-4"; else "".
func differing(wells []*schema.Well, key func(*schema.Well) string) string {
	var order []string
	ids := map[string][]string{}
	for _, w := range wells {
		v := strings.TrimSpace(key(w))
		if v == "" {
			continue
		}
		k := strings.ToUpper(strings.Join(strings.Fields(v), ""))
		if _, ok := ids[k]; !ok {
			order = append(order, v)
		}
		ids[k] = append(ids[k], w.ID)
	}
	if len(order) < 2 {
		return ""
	}
	var parts []string
	for _, v := range order {
		parts = append(parts, v+": "+strings.Join(ids[strings.ToUpper(strings.Join(strings.Fields(v), ""))], ", "))
	}
	return strings.Join(parts, "; ")
}

// place finds each well's plan position, its distance along the line
// and its offset, refusing wells without a ground elevation or
// coordinates (all of them named at once).
func place(in Input) ([]*placed, polyline, string, error) {
	unit := project.CoordinateUnits[in.Section.CoordinateUnit]
	if unit == 0 {
		unit = 1
	}
	var noElev, noXY []string
	allEN, allLL := true, true
	for _, w := range in.Wells {
		if w.Elevation.Ground == nil {
			noElev = append(noElev, w.ID)
		}
		loc := w.Location
		if loc.Easting == nil || loc.Northing == nil {
			allEN = false
		}
		if loc.Latitude == nil || loc.Longitude == nil {
			allLL = false
		}
		if (loc.Easting == nil || loc.Northing == nil) && (loc.Latitude == nil || loc.Longitude == nil) {
			noXY = append(noXY, w.ID)
		}
	}
	var msgs []string
	if len(noElev) > 0 {
		msgs = append(msgs, "no ground elevation ([elevation] ground) for "+strings.Join(noElev, ", "))
	}
	if len(noXY) > 0 {
		msgs = append(msgs, "no coordinates ([location] easting and northing, or latitude and longitude) for "+strings.Join(noXY, ", "))
	}
	if len(msgs) == 0 && !allEN && !allLL {
		msgs = append(msgs, "some wells give only easting/northing and others only latitude/longitude; give every well of a section the same kind")
	}
	// One elevation axis and one plan need one vertical datum and, for
	// easting/northing, one reference system.
	if d := differing(in.Wells, func(w *schema.Well) string { return w.Elevation.Datum }); d != "" {
		msgs = append(msgs, "the wells' elevations are above different datums ("+d+"); a section hangs them on one axis")
	}
	if allEN {
		if d := differing(in.Wells, func(w *schema.Well) string { return w.Location.CRS }); d != "" {
			msgs = append(msgs, "the wells' easting/northing are in different reference systems ("+d+"); a section measures distances on one")
		}
	}
	if len(msgs) > 0 {
		return nil, nil, "", fmt.Errorf("%w: %s", ErrUnplaceable, strings.Join(msgs, "; "))
	}
	pts := make([]XY, len(in.Wells))
	var bends []XY
	method := ""
	if allEN {
		for i, w := range in.Wells {
			pts[i] = XY{E: *w.Location.Easting * unit, N: *w.Location.Northing * unit}
		}
		for _, b := range in.Section.Bends {
			bends = append(bends, XY{E: b[0] * unit, N: b[1] * unit})
		}
	} else {
		lat, lon := make([]float64, len(in.Wells)), make([]float64, len(in.Wells))
		for i, w := range in.Wells {
			lat[i], lon[i] = *w.Location.Latitude, *w.Location.Longitude
		}
		pts = localPlane(lat, lon)
		method = "positions from latitude and longitude on a local plane; "
		if len(in.Section.Bends) > 0 {
			return nil, nil, "", fmt.Errorf("bend points are easting/northing pairs, but the wells give latitude and longitude only")
		}
	}
	line, err := lineThrough(bends, pts)
	if err != nil {
		return nil, nil, "", err
	}
	if len(bends) >= 2 {
		method += "distances along the bent line given in the project, each well projected onto its nearest segment"
	} else {
		method += fmt.Sprintf("distances along the straight line from %s to %s, each well projected perpendicular onto it", in.Wells[0].ID, in.Wells[len(in.Wells)-1].ID)
	}
	out := make([]*placed, len(in.Wells))
	for i, w := range in.Wells {
		c, off := line.project(pts[i])
		out[i] = &placed{w: w, plan: pts[i], chainage: c, offset: off, ground: *w.Elevation.Ground}
	}
	// Wells are drawn in the section's order; a chainage that runs
	// backwards is noted, since the reader expects distance to grow.
	return out, line, method, nil
}

// chainageOrder reports the wells, if any, whose distance along the line
// is less than their predecessor's.
func chainageOrder(ws []*placed) []string {
	var back []string
	for i := 1; i < len(ws); i++ {
		if ws[i].chainage < ws[i-1].chainage {
			back = append(back, ws[i].w.ID)
		}
	}
	sort.Strings(back)
	return back
}
