// Package table builds a project's construction summary: one row per
// monitoring point (a well, or each string of a nested well) with its location, elevations, depth, casing, screen, annular
// fill, latest water level and check status, in the project's depth unit.
// Writers turn it into CSV, Markdown or XLSX; the columns are defined
// once (columns.go) and every writer reads them.
package table

import (
	"math"
	"sort"
	"strings"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
)

// Caution closes every table: figures support, never replace, review.
const Caution = "Caution: these figures and checks support, and never replace, the review of a licensed professional and the governing local well code; rule thresholds are defaults to be set to the local rules."

// Status is a well's check status.
type Status string

const (
	Clean      Status = "clean"
	Warnings   Status = "warnings"
	Errors     Status = "errors"
	Waived     Status = "waived" // every finding is waived
	Unreadable Status = "unreadable"
	Planned    Status = "planned" // a design: nothing placed to check yet
)

// Entry is one well as the table receives it.
type Entry struct {
	File     string
	Well     *schema.Well // nil when the file could not be read
	Findings []rules.Finding
	Err      error // why the file could not be read
}

// Row is one well's line of the summary, lengths in the table's unit.
type Row struct {
	File    string
	ID      string
	String  string // the string's name when the well has several, else ""
	Purpose string

	Easting, Northing   *float64 // as written
	Latitude, Longitude *float64
	System              string

	Ground, MeasuringPoint *float64 // elevations
	Datum                  string
	TotalDepth             *float64

	CasingSize, CasingMaterial string

	Screens                         int
	ScreenTop, ScreenBottom         *float64 // depths
	ScreenTopElev, ScreenBottomElev *float64 // elevations
	Slot                            *float64 // in the table's diameter unit; nil when none or mixed
	SlotText                        string   // every slot, when they differ

	Pack, Seal, Grout string // intervals "top–bottom; ..."

	WaterDepth *float64
	WaterDate  string
	WaterElev  *float64
	WaterKind  string

	Status                   Status
	Errors, Warnings, Waived int
	Problem                  string // the load error of an unreadable file
}

// Table is the summary of a project.
type Table struct {
	Units schema.DepthUnit
	Rows  []Row
	// Profile is the rule profile the findings were made under, nil for
	// the defaults: the caution names it.
	Profile *rules.Profile
}

// caution is the table's caution, true to the thresholds in force.
func (t *Table) caution() string { return CautionFor(t.Profile) }

// CautionFor is the caution of a summary checked under prof (nil for the
// defaults): Caution, or one naming the profile in force.
func CautionFor(prof *rules.Profile) string {
	if prof.IsDefault() {
		return Caution
	}
	return "Caution: " + rules.Caution(prof)
}

// Build makes the table in the given unit; "" takes the unit every
// readable well shares, or metres when they differ.
func Build(entries []Entry, units schema.DepthUnit) *Table {
	if units == "" {
		units = sharedUnit(entries)
	}
	t := &Table{Units: units}
	for _, e := range entries {
		t.Rows = append(t.Rows, rowsOf(e, units)...)
	}
	return t
}

// DiameterUnit is the unit of the table's slots and sizes: inches for a
// table in feet, millimetres for one in metres.
func (t *Table) DiameterUnit() schema.DiameterUnit { return diameterUnit(t.Units) }

func diameterUnit(u schema.DepthUnit) schema.DiameterUnit {
	if u == schema.Feet {
		return schema.Inches
	}
	return schema.Millimetres
}

// FirstOfWell reports whether row i is its well's first (a nested
// well's strings follow each other).
func (t *Table) FirstOfWell(i int) bool {
	return i == 0 || t.Rows[i].File != t.Rows[i-1].File || t.Rows[i].ID != t.Rows[i-1].ID
}

// Wells is the number of wells the rows come from.
func (t *Table) Wells() int {
	n := 0
	for i := range t.Rows {
		if t.FirstOfWell(i) {
			n++
		}
	}
	return n
}

// rowsOf is a well's rows: one per string of a nested well (its own
// riser, screens and the pack around them), else one.
func rowsOf(e Entry, u schema.DepthUnit) []Row {
	r := rowOf(e, u)
	w := e.Well
	if w == nil || len(w.Strings) < 2 {
		return []Row{r}
	}
	out := make([]Row, 0, len(w.Strings))
	for i := range w.Strings {
		sr := r
		sr.String = w.Strings[i].Label()
		one := *w
		one.Strings = w.Strings[i : i+1]
		sr.CasingSize, sr.CasingMaterial = casing(&one, u)
		sr.ScreenTop, sr.ScreenBottom, sr.ScreenTopElev, sr.ScreenBottomElev, sr.Slot, sr.SlotText = nil, nil, nil, nil, nil, ""
		screens(&one, &sr, u)
		sr.Pack = fillCell(packColumn(w, w.Strings[i]), u)
		sr.WaterDepth, sr.WaterElev, sr.WaterKind, sr.WaterDate = nil, nil, "", ""
		if wl, ok := w.LatestLevelIn(w.Strings[i]); ok {
			water(w, &sr, wl, u)
		}
		out = append(out, sr)
	}
	return out
}

// packColumn is the pack of one string of a nested well: the pack fills
// that reach its screens and the pack fills (fine sand) stacked directly
// on top of them, as a single well's pack cell shows its fine-sand collar.
// The packs of the other strings, below a seal, are left out.
func packColumn(w *schema.Well, s schema.String) []schema.Fill {
	col := quantity.PacksAround(w, s)
	for grown := true; grown; {
		grown = false
		for _, f := range w.Fills {
			if f.Material.Group() != schema.PackGroup || holds(col, f) {
				continue
			}
			for _, c := range col {
				if math.Abs(float64(f.Bottom-c.Top)) < touching {
					col, grown = append(col, f), true
					break
				}
			}
		}
	}
	return col
}

// touching is how near two fills' ends lie to count as one on the other:
// a micrometre, far below any depth a file writes.
const touching = 1e-6

func holds(fs []schema.Fill, f schema.Fill) bool {
	for _, g := range fs {
		if g.Pos == f.Pos && g.Interval == f.Interval && g.Material == f.Material {
			return true
		}
	}
	return false
}

func sharedUnit(entries []Entry) schema.DepthUnit {
	var u schema.DepthUnit
	for _, e := range entries {
		if e.Well == nil {
			continue
		}
		if u == "" {
			u = e.Well.Units.Depth
		} else if u != e.Well.Units.Depth {
			return schema.Metres
		}
	}
	if u == "" {
		return schema.Metres
	}
	return u
}

func rowOf(e Entry, u schema.DepthUnit) Row {
	w := e.Well
	if w == nil {
		r := Row{File: e.File, Status: Unreadable}
		if e.Err != nil {
			r.Problem = firstLine(e.Err.Error())
		}
		return r
	}
	r := Row{
		File:      e.File,
		ID:        w.ID,
		Purpose:   w.Purpose.Words(),
		Easting:   w.Location.Easting,
		Northing:  w.Location.Northing,
		Latitude:  w.Location.Latitude,
		Longitude: w.Location.Longitude,
		System:    w.Location.System,
		Datum:     w.Elevation.Datum,
	}
	in := func(l schema.Length) *float64 { v := l.In(u); return &v }
	if w.TotalDepth > 0 {
		r.TotalDepth = in(w.TotalDepth)
	}
	if g := w.Elevation.Ground; g != nil {
		r.Ground = in(*g)
	}
	if mp := w.Elevation.MeasuringPoint; mp != nil {
		r.MeasuringPoint = in(*mp)
	}
	r.CasingSize, r.CasingMaterial = casing(w, u)
	screens(w, &r, u)
	r.Pack, r.Seal, r.Grout = fills(w, u)
	wl, ok := w.LatestLevel()
	if len(w.Strings) == 1 {
		wl, ok = w.LatestLevelIn(w.Strings[0])
	}
	if ok {
		water(w, &r, wl, u)
	}
	var s Status
	s, r.Errors, r.Warnings, r.Waived = status(e.Findings)
	r.Status = plannedOr(w, s)
	return r
}

// water fills a row's water-level cells from one reading.
func water(w *schema.Well, r *Row, wl schema.WaterLevel, u schema.DepthUnit) {
	d := wl.Depth.In(u)
	r.WaterDepth = &d
	if g := w.Elevation.Ground; g != nil {
		e := (*g - wl.Depth).In(u)
		r.WaterElev = &e
	}
	r.WaterKind = string(wl.Kind)
	if !wl.Measured.IsZero() {
		r.WaterDate = wl.Measured.Format("2006-01-02")
	}
}

// casing describes the riser of each string: "2 in Sch 40", "PVC"; a
// well with no string (an open-hole rock well) is described by its outer
// casing, which is then the well's casing.
func casing(w *schema.Well, u schema.DepthUnit) (size, material string) {
	var sizes, mats []string
	for _, s := range w.Strings {
		if len(s.Sections) == 0 {
			continue
		}
		p := s.Sections[0].Pipe
		sizes = append(sizes, pipeSize(p, u))
		mats = append(mats, p.Material)
	}
	if len(w.Strings) == 0 {
		for _, c := range w.Casings {
			sizes = append(sizes, pipeSize(c.Pipe, u))
			mats = append(mats, c.Pipe.Material)
		}
	}
	return joinDistinct(sizes), joinDistinct(mats)
}

// pipeSize is the nominal size as written, or the outside diameter in the
// table's diameter unit when the file gives none.
func pipeSize(p schema.Pipe, u schema.DepthUnit) string {
	s := p.Size
	if s != "" && !strings.HasPrefix(strings.ToUpper(s), "DN") {
		s += " in"
	}
	switch {
	case p.Schedule != "":
		s += " Sch " + p.Schedule
	case p.SDR > 0:
		s += " SDR " + schema.TrimFloat(p.SDR, 1)
	}
	if s == "" && p.OD > 0 {
		if diameterUnit(u) == schema.Inches {
			s = "OD " + schema.TrimFloat(p.OD.Inches(), 3) + " in"
		} else {
			s = "OD " + schema.TrimFloat(float64(p.OD), 1) + " mm"
		}
	}
	return strings.TrimSpace(s)
}

func screens(w *schema.Well, r *Row, u schema.DepthUnit) {
	in := func(l schema.Length) *float64 { v := l.In(u); return &v }
	elev := func(depth schema.Length) *float64 {
		if w.Elevation.Ground == nil {
			return nil
		}
		return in(*w.Elevation.Ground - depth)
	}
	scr := w.Screens()
	r.Screens = len(scr)
	if len(scr) == 0 {
		return
	}
	top, bot := scr[0].Section.Top, scr[0].Section.Bottom
	var slots []string
	slotSet := map[schema.Diameter]bool{}
	for _, s := range scr {
		top = min(top, s.Section.Top)
		bot = max(bot, s.Section.Bottom)
		if s.Section.Slot > 0 && !slotSet[s.Section.Slot] {
			slotSet[s.Section.Slot] = true
			slots = append(slots, slotText(s.Section, diameterUnit(u)))
		}
	}
	r.ScreenTop, r.ScreenBottom = in(top), in(bot)
	r.ScreenTopElev, r.ScreenBottomElev = elev(top), elev(bot)
	if len(slotSet) == 1 {
		for d := range slotSet {
			v := float64(d) // mm
			if diameterUnit(u) == schema.Inches {
				v = d.Inches()
			}
			r.Slot = &v
		}
	}
	r.SlotText = strings.Join(slots, "; ")
}

// slotText is "0.010 in (10-slot)" or "0.25 mm", in the table's unit.
func slotText(s schema.Section, du schema.DiameterUnit) string {
	if du == schema.Millimetres {
		return schema.TrimFloat(float64(s.Slot), 2) + " mm"
	}
	return schema.TrimFloat(s.Slot.Inches(), 3) + " in (" + schema.TrimFloat(s.SlotNumber(), 0) + "-slot)"
}

// fills lists the pack, seal and grout intervals top down; grout includes
// the concrete surface seal, named when the column mixes materials.
func fills(w *schema.Well, u schema.DepthUnit) (pack, seal, grout string) {
	var groups [3][]schema.Fill
	for _, f := range w.Fills {
		switch f.Material.Group() {
		case schema.PackGroup:
			groups[0] = append(groups[0], f)
		case schema.SealGroup:
			groups[1] = append(groups[1], f)
		case schema.GroutGroup, schema.ConcreteGroup:
			groups[2] = append(groups[2], f)
		}
	}
	return fillCell(groups[0], u), fillCell(groups[1], u), fillCell(groups[2], u)
}

// fillCell lists fills top down, each material named when they differ.
func fillCell(fs []schema.Fill, u schema.DepthUnit) string {
	fs = append([]schema.Fill(nil), fs...)
	sort.SliceStable(fs, func(i, j int) bool { return fs[i].Top < fs[j].Top })
	mixed := false
	for _, f := range fs {
		mixed = mixed || f.Material != fs[0].Material
	}
	var parts []string
	for _, f := range fs {
		s := interval(f.Top, f.Bottom, u)
		if mixed {
			s += " " + f.Material.Words()
		}
		if f.Within != "" {
			s += " (in " + f.Within + ")"
		}
		parts = append(parts, s)
	}
	return strings.Join(parts, "; ")
}

func interval(top, bot schema.Length, u schema.DepthUnit) string {
	return schema.TrimFloat(top.In(u), 2) + "–" + schema.TrimFloat(bot.In(u), 2)
}

// StatusOf is a readable well's status, one rule for the table, the
// book, the export and the live page: errors (an unwaived error finding)
// before planned (a design: nothing placed to check yet), then warnings,
// waived (every finding waived), clean.
func StatusOf(w *schema.Well, fs []rules.Finding) Status {
	s, _, _, _ := status(fs)
	return plannedOr(w, s)
}

// plannedOr is s, or planned for a design without an unwaived error.
func plannedOr(w *schema.Well, s Status) Status {
	if w.IsPlanned() && s != Errors {
		return Planned
	}
	return s
}

func status(fs []rules.Finding) (s Status, errs, warns, waived int) {
	t := rules.Count(fs)
	errs, warns, waived = t.Errors, t.Warnings, t.Waived
	switch {
	case errs > 0:
		return Errors, errs, warns, waived
	case warns > 0:
		return Warnings, errs, warns, waived
	case waived > 0:
		return Waived, errs, warns, waived
	}
	return Clean, 0, 0, 0
}

func joinDistinct(v []string) string {
	var out []string
	for _, s := range v {
		if s != "" && !contains(out, s) {
			out = append(out, s)
		}
	}
	return strings.Join(out, "; ")
}

func contains(v []string, s string) bool {
	for _, x := range v {
		if x == s {
			return true
		}
	}
	return false
}

func firstLine(s string) string {
	if i := strings.IndexByte(s, '\n'); i >= 0 {
		return s[:i]
	}
	return s
}
