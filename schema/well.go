// Package schema is tremie's typed model of one as-built (or planned) well,
// read from one TOML file. Every depth is a Length in metres below ground
// surface and every diameter a Diameter in millimetres, whatever units the
// file was written in; Units remembers those for reporting. The model knows
// nothing of rules, quantities or drawing.
package schema

import (
	"strings"
	"sync"
	"time"
)

// Pos locates a value in its source file, for findings and errors.
type Pos struct {
	File string
	Line int
}

// Well is one well as built (or as planned).
type Well struct {
	Pos   Pos // the file, line 1
	Units Units

	ID        string
	Project   string
	Client    string
	Site      string
	Purpose   Purpose
	Status    string // free text: active, planned, abandoned, ...
	Drilled   Date
	Completed Date
	Permit    string
	LoggedBy  string
	CheckedBy string
	Notes     []string

	// TotalDepth is the depth of the bottom of the borehole.
	TotalDepth Length

	Drilling    Drilling
	Location    Location
	Elevation   Elevation
	Boreholes   []BoreholeSection // top down, as written
	Casings     []Casing          // outer, surface, conductor casings
	Strings     []String          // well strings: riser, screen, sump
	Fills       []Fill            // annular fill intervals
	OpenHoles   []OpenHole
	Lithology   []Layer
	WaterLevels []WaterLevel
	Samples     []FormationSample // formation sieve analyses (sample.go)
	Surface     Surface
	Waivers     []Waiver
	// MeasuringPoint says what water levels and the surveyed measuring-
	// point elevation refer to; see StickUp.
	MeasuringPoint MeasuringPoint
	Pump           *Pump        // nil when no pump setting is recorded
	PumpingTest    *PumpingTest // nil when none is recorded (pumping.go)

	// Open-hole wall features and the images they were picked on
	// (feature.go); Orientation is their azimuth reference.
	Orientation Orientation
	WallImages  []WallImage
	Features    []Feature // as written

	// Placeholders are the starter values still marked "# FILL".
	Placeholders []Placeholder

	// keys locates key paths in the file text; see Line and HasKey.
	keys *keyIndex
}

// keyIndex maps every dotted key path with array indices, such as
// "fill[2].bottom", to its line. It is made from the file text on first
// use, since a well that checks clean never asks; safe for concurrent use.
type keyIndex struct {
	once  sync.Once
	src   string
	lines map[string]int
}

func (k *keyIndex) get() map[string]int {
	if k == nil {
		return nil
	}
	k.once.Do(func() {
		if k.lines == nil {
			k.lines = scanKeyLines(k.src)
		}
		k.src = ""
	})
	return k.lines
}

// Line returns the line of a key path, or of the nearest enclosing table
// that has one, or 1.
func (w *Well) Line(path string) int {
	return LineOf(w.keys.get(), path)
}

// HasKey reports whether the file gives the key path itself, such as
// "string[0].section[1].slot".
func (w *Well) HasKey(path string) bool {
	_, ok := w.keys.get()[path]
	return ok
}

// At returns the position of a key path.
func (w *Well) At(path string) Pos { return Pos{File: w.Pos.File, Line: w.Line(path)} }

// Date is a calendar date from the file (TOML local date); zero if absent.
type Date struct {
	Year  int
	Month time.Month
	Day   int
}

// IsZero reports whether the date was not given.
func (d Date) IsZero() bool { return d.Year == 0 }

// String writes the date as YYYY-MM-DD, or "" if not given.
func (d Date) String() string {
	if d.IsZero() {
		return ""
	}
	return time.Date(d.Year, d.Month, d.Day, 0, 0, 0, 0, time.UTC).Format("2006-01-02")
}

// Time is the date at midnight UTC.
func (d Date) Time() time.Time { return time.Date(d.Year, d.Month, d.Day, 0, 0, 0, 0, time.UTC) }

// Purpose is what the well is for; rules such as the sanitary-seal depth
// depend on it.
type Purpose string

// Words names the purpose as a reader writes it: "public supply".
func (p Purpose) Words() string { return strings.ReplaceAll(string(p), "-", " ") }

const (
	Monitoring   Purpose = "monitoring"
	Piezometer   Purpose = "piezometer"
	Recovery     Purpose = "recovery" // recovery or extraction
	Domestic     Purpose = "domestic"
	PublicSupply Purpose = "public-supply"
	Industrial   Purpose = "industrial"
	Irrigation   Purpose = "irrigation"
	Injection    Purpose = "injection"
)

// Purposes lists every accepted purpose, in the order the docs give them.
var Purposes = []Purpose{Monitoring, Piezometer, Recovery, Domestic, PublicSupply, Industrial, Irrigation, Injection}

// Drilling records how and by whom the hole was made.
type Drilling struct {
	Method     string
	Contractor string
	Licence    string
	Driller    string
}

// Location is where the well stands. Coordinates are kept as written; the
// reference system is free text (e.g. "NAD83 / UTM zone 11N") and, for
// conversion to longitude and latitude, an EPSG code (CRS, "EPSG:2227")
// that the loader has checked package crs knows.
type Location struct {
	Description string
	Easting     *float64
	Northing    *float64
	Latitude    *float64
	Longitude   *float64
	System      string
	CRS         string
}

// Elevation holds the surveyed elevations, in depth units converted to
// metres like every Length (an elevation is a height above the datum).
type Elevation struct {
	Ground         *Length
	MeasuringPoint *Length // usually the top of the riser
	Datum          string
	Surveyed       Date
	Pos            Pos
}

// Interval is a depth range, Top above Bottom.
type Interval struct {
	Top    Length
	Bottom Length
}

// Thickness is Bottom - Top.
func (iv Interval) Thickness() Length { return iv.Bottom - iv.Top }

// Contains reports whether depth d lies within the interval (inclusive).
func (iv Interval) Contains(d Length) bool { return d >= iv.Top && d <= iv.Bottom }

// Overlaps reports whether two intervals share more than a point.
func (iv Interval) Overlaps(o Interval) bool { return iv.Top < o.Bottom && o.Top < iv.Bottom }

// BoreholeSection is one drilled diameter over a depth range; a hole that
// steps down has several.
type BoreholeSection struct {
	Interval
	Diameter Diameter
	Method   string
	Pos      Pos
	Path     string // key path, e.g. "borehole[1]"
}

// Pipe is the cross-section of a casing, riser, screen or sump.
type Pipe struct {
	Material string   // PVC, stainless steel, carbon steel, HDPE, ...
	Size     string   // nominal size as written: "2", "1-1/2", "DN50"
	Schedule string   // "40", "80", "5S", "10S", or ""
	SDR      float64  // standard dimension ratio, 0 if not given
	OD       Diameter // resolved outside diameter
	ID       Diameter // resolved inside diameter
	Joint    string   // flush-threaded, coupled, welded, solvent-welded
}

// Wall is the wall thickness.
func (p Pipe) Wall() Diameter { return (p.OD - p.ID) / 2 }

// Casing is an outer casing the well strings run inside or below: a
// surface, conductor or intermediate casing.
type Casing struct {
	Interval
	Name         string // used by fills placed inside it ("within")
	Kind         CasingKind
	Pipe         Pipe
	Centralizers []Length
	DriveShoe    bool // a driven casing with a shoe on its bottom
	Pos          Pos
	Path         string
}

// CasingKind names an outer casing's role.
type CasingKind string

const (
	SurfaceCasing      CasingKind = "surface"
	ConductorCasing    CasingKind = "conductor"
	IntermediateCasing CasingKind = "intermediate"
	ProductionCasing   CasingKind = "production"
)

// String is one well string: pipe sections from its top (riser) down
// through its screen(s) to a sump or tail pipe, closed by a bottom cap.
// Nested completions have several strings in one borehole.
type String struct {
	Name         string
	TopCap       string // e.g. "locking expansion plug"
	BottomCap    string // e.g. "threaded end plug"; "" if none recorded
	Centralizers []Length
	Sections     []Section // top down
	// Liner: a string hung inside an outer casing rather than run to the
	// surface; its top is within that casing (the lap).
	Liner *Liner
	Pos   Pos
	Path  string
}

// Top is the top of the string's first section.
func (s String) Top() Length {
	if len(s.Sections) == 0 {
		return 0
	}
	return s.Sections[0].Top
}

// Bottom is the bottom of the string's last section.
func (s String) Bottom() Length {
	if len(s.Sections) == 0 {
		return 0
	}
	return s.Sections[len(s.Sections)-1].Bottom
}

// Screens returns the string's screen sections.
func (s String) Screens() []Section {
	var out []Section
	for _, sec := range s.Sections {
		if sec.Kind == ScreenSection {
			out = append(out, sec)
		}
	}
	return out
}

// SectionKind is what a length of a well string is.
type SectionKind string

const (
	RiserSection  SectionKind = "riser"
	ScreenSection SectionKind = "screen"
	SumpSection   SectionKind = "sump" // sump, tail pipe or silt trap
)

// Section is one length of a well string.
type Section struct {
	Interval
	Kind SectionKind
	Pipe Pipe
	// Screen only:
	Slot       Diameter   // slot width; 0 if not given
	OpenArea   float64    // open area as a fraction of the screen's outer surface; 0 if not given
	ScreenType ScreenType // slotted, continuous-wrap, prepacked
	Pos        Pos
	Path       string
}

// SlotNumber is the slot width in thousandths of an inch.
func (s Section) SlotNumber() float64 { return s.Slot.Inches() * 1000 }

// ScreenType is how a screen's openings are made.
type ScreenType string

const (
	Slotted        ScreenType = "slotted"
	ContinuousWrap ScreenType = "continuous-wrap"
	Prepacked      ScreenType = "prepacked"
)

// Fill is one annular fill interval.
type Fill struct {
	Interval
	Material  Material
	Product   string   // trade name or description
	Gradation string   // sieve range as written, e.g. "20/40"
	GrainMin  Diameter // finest grain size (from the sieve range or written), 0 if unknown
	GrainMax  Diameter // coarsest grain size, 0 if unknown
	// D10, D30, D60 are the grain sizes 10, 30 and 60 % of the pack is
	// finer than, by mass (its grading curve, ASTM D6913), in mm; 0 if not given.
	D10, D30, D60 Diameter
	Method        Placement
	// Within names the outer casing the fill was placed inside; "" means
	// the borehole annulus outside every casing.
	Within string
	// Amount placed, if recorded: bags (with mass each) or a volume.
	Bags    float64
	BagMass Mass
	Placed  Volume // a placed volume, 0 if given as bags or not recorded
	// Yield overrides the material's default yield per bag; 0 = default.
	Yield Volume
	// Density is the slurry's density measured with a mud balance, in
	// kg/m3; 0 if not recorded.
	Density float64
	// WaterInside is the depth of the water standing inside the casing
	// while a grout was placed and set (0: filled to the top); HasWaterInside
	// is false when not recorded, and the collapse load then takes the
	// casing as empty.
	WaterInside    Length
	HasWaterInside bool
	// Size is the nominal size of bentonite chips or pellets (3/8 in,
	// say); 0 if not given.
	Size Diameter
	Tags []Tag
	Pos  Pos
	Path string
}

// Recorded reports whether an amount placed was recorded.
func (f Fill) Recorded() bool { return f.Bags > 0 || f.Placed > 0 }

// Tag is a weighted-tape reading of the top of the fill after a number of
// bags.
type Tag struct {
	AfterBags float64
	Depth     Length
	Pos       Pos
	Path      string
}

// Placement is how fill went down the annulus.
type Placement string

const (
	Tremied Placement = "tremie"
	Poured  Placement = "poured"
	Pumped  Placement = "pumped"
)

// Material is an annular fill's class.
type Material string

const (
	FilterPack        Material = "filter-pack"
	FineSand          Material = "fine-sand"
	BentoniteChips    Material = "bentonite-chips"
	BentonitePellets  Material = "bentonite-pellets"
	BentoniteGranular Material = "bentonite-granular"
	BentoniteGrout    Material = "bentonite-grout"
	NeatCement        Material = "neat-cement"
	CementBentonite   Material = "cement-bentonite"
	SandCement        Material = "sand-cement"
	Concrete          Material = "concrete"
	NativeBackfill    Material = "native-backfill"
	CaveIn            Material = "cave-in"
)

// Materials lists every fill class, bottom-of-sequence first.
var Materials = []Material{FilterPack, FineSand, BentoniteChips, BentonitePellets, BentoniteGranular, BentoniteGrout, NeatCement, CementBentonite, SandCement, Concrete, NativeBackfill, CaveIn}

// Group is the role a material plays in the sequence.
type Group int

const (
	PackGroup     Group = iota // filter pack, fine sand
	SealGroup                  // bentonite chips, pellets, granular
	GroutGroup                 // bentonite, neat cement, cement-bentonite, sand-cement grout
	ConcreteGroup              // surface seal
	BackfillGroup              // native backfill, cave-in
)

// Group returns the material's role.
func (m Material) Group() Group {
	switch m {
	case FilterPack, FineSand:
		return PackGroup
	case BentoniteChips, BentonitePellets, BentoniteGranular:
		return SealGroup
	case BentoniteGrout, NeatCement, CementBentonite, SandCement:
		return GroutGroup
	case Concrete:
		return ConcreteGroup
	default:
		return BackfillGroup
	}
}

// Words names the material as a reader writes it, without the file's
// hyphens: "filter pack", "cement bentonite".
func (m Material) Words() string { return strings.ReplaceAll(string(m), "-", " ") }

// IsSeal reports whether the material seals the annulus (bentonite, grout
// or concrete), as opposed to a pack or a backfill.
func (m Material) IsSeal() bool {
	g := m.Group()
	return g == SealGroup || g == GroutGroup || g == ConcreteGroup
}

// OpenHole is an uncased interval below the casing (a rock completion).
type OpenHole struct {
	Interval
	Pos  Pos
	Path string
}

// Layer is one lithology interval.
type Layer struct {
	Interval
	USCS        string     // ASTM D2487 group symbol, e.g. "SP-SM"; "" for rock
	Rock        string     // rock type, e.g. "granite"; "" for soil
	Weathering  Weathering // grade of the rock, ISRM 1981 / BS 5930; "" if not given
	Description string
	// Unit is the hydrostratigraphic unit the interval belongs to, a name
	// of the user's ("upper aquifer"); cross-sections join a unit's top
	// and bottom between neighbouring wells that both have it.
	Unit string
	Pos  Pos
	Path string
}

// WaterLevel is one depth-to-water reading, converted to below ground.
type WaterLevel struct {
	Depth     Length // below ground surface, after applying Reference
	Written   Length // as written, below Reference
	Reference LevelReference
	Measured  time.Time // date and time (UTC if the file gave no offset)
	HasTime   bool      // false when only a date was written
	Kind      LevelKind
	// String is the name of the [[string]] the level was measured in, for
	// a nested well whose strings each have their own head; "" when the
	// level applies to the whole hole.
	String string
	Pos    Pos
	Path   string
}

// In reports whether the level was measured in string s or applies to the
// whole hole.
func (l WaterLevel) In(s String) bool { return l.String == "" || l.String == s.Name }

// LevelReference is what a water-level depth was measured from.
type LevelReference string

const (
	FromGround         LevelReference = "ground"
	FromMeasuringPoint LevelReference = "measuring-point"
)

// LevelKind says what a water level is.
type LevelKind string

const (
	FirstEncountered LevelKind = "first-encountered"
	Static           LevelKind = "static"
	Pumping          LevelKind = "pumping"
)

// Surface is the completion at ground: a flush-mount vault or a stick-up
// protective casing, usually on a concrete pad.
type Surface struct {
	Kind       SurfaceKind
	Protective *Protective
	Vault      *Vault
	Pad        *Pad
	Lock       string
	Drainage   string // weep hole, gravel base, ...
	Bollards   int
	Pos        Pos
}

// SurfaceKind is a surface completion type.
type SurfaceKind string

const (
	StickUp    SurfaceKind = "stick-up"
	FlushMount SurfaceKind = "flush-mount"
	NoSurface  SurfaceKind = ""
)

// Protective is a stick-up protective casing around the riser.
type Protective struct {
	Interval // Top is negative: its height above ground
	Diameter Diameter
	Material string
	Pos      Pos
}

// Vault is a flush-mount road box.
type Vault struct {
	Diameter Diameter
	Depth    Length
	Cover    string
	Pos      Pos
}

// Pad is the concrete surface pad. Sizes are Lengths (file depth units).
type Pad struct {
	Length    Length
	Width     Length
	Thickness Length
	Pos       Pos
}

// Waiver accepts a finding of one rule for this well, with a reason and
// the approver. A waived finding is still reported, as waived.
type Waiver struct {
	Rule       string
	Reason     string
	ApprovedBy string
	Date       Date
	// At optionally limits the waiver to findings at this depth range.
	Pos Pos
}

// StickUp is the height of the measuring point above ground: the one the
// file names ([measuring_point]), else the highest top of the strings that
// run to the surface (liners hang below it), or for a well with none of
// those (an open-hole rock well, or one with liners only) the highest
// outer-casing top. It is negative when a flush-mount riser ends below
// ground, and 0 when there is no pipe at all.
func (w *Well) StickUp() Length {
	if m := w.MeasuringPoint; m.Height != nil {
		return *m.Height
	} else if top, ok := w.PipeTop(m.Pipe); ok && m.Pipe != "" {
		return -top
	}
	first := true
	var h Length
	consider := func(top Length) {
		if first || -top > h {
			h, first = -top, false
		}
	}
	for _, s := range w.Strings {
		if s.Liner == nil && len(s.Sections) > 0 {
			consider(s.Top())
		}
	}
	if first {
		for _, c := range w.Casings {
			consider(c.Top)
		}
	}
	return h
}

// Screens returns every screen section of every string, with its string.
func (w *Well) Screens() []StringSection {
	var out []StringSection
	for i := range w.Strings {
		for _, sec := range w.Strings[i].Sections {
			if sec.Kind == ScreenSection {
				out = append(out, StringSection{String: &w.Strings[i], Section: sec})
			}
		}
	}
	return out
}

// StringSection is a section with the string it belongs to.
type StringSection struct {
	String  *String
	Section Section
}

// BoreholeAt returns the borehole section at depth d, or false. Like
// every part in a CrossSection a section covers top <= d < bottom; where
// sections overlap the last written wins.
func (w *Well) BoreholeAt(d Length) (BoreholeSection, bool) {
	var found BoreholeSection
	ok := false
	for _, b := range w.Boreholes {
		if covers(b.Interval, d) {
			found, ok = b, true
		}
	}
	return found, ok
}

func parentPath(p string) string {
	for i := len(p) - 1; i >= 0; i-- {
		switch p[i] {
		case '.':
			return p[:i]
		case '[':
			return p[:i]
		}
	}
	return ""
}

// EachGeometryInterval calls fn with the interval of every part that
// shapes the well's cross-section: borehole sections, outer casings and
// the sections of every string. Between two of their boundaries the
// cross-section is the same at every depth.
func (w *Well) EachGeometryInterval(fn func(Interval)) {
	for _, b := range w.Boreholes {
		fn(b.Interval)
	}
	for _, c := range w.Casings {
		fn(c.Interval)
	}
	for _, s := range w.Strings {
		for _, sec := range s.Sections {
			fn(sec.Interval)
		}
	}
}

// EachConstructionInterval calls fn with the interval of every part of the
// construction: the geometry of EachGeometryInterval, the annular fills and
// the open-hole intervals.
func (w *Well) EachConstructionInterval(fn func(Interval)) {
	w.EachGeometryInterval(fn)
	for _, f := range w.Fills {
		fn(f.Interval)
	}
	for _, o := range w.OpenHoles {
		fn(o.Interval)
	}
}

// Label is the casing's name, or its kind for a casing built without one
// (the loader always sets a name).
func (c Casing) Label() string {
	if c.Name != "" {
		return c.Name
	}
	return string(c.Kind)
}

// Label is the string's name, or "main" for a string built without one
// (the loader always sets a name).
func (s String) Label() string {
	if s.Name != "" {
		return s.Name
	}
	return "main"
}

// LatestLevel is the latest static water level (a reading of no stated
// kind counts as static), or the latest of any kind when none is static.
func (w *Well) LatestLevel() (WaterLevel, bool) {
	return latestOf(w.WaterLevels)
}

// LatestLevelIn is LatestLevel for one string of the well: the latest of
// the levels measured in that string, else of those of the whole hole.
// In a nested well each string has its own head, so a level measured in
// another string is never used.
func (w *Well) LatestLevelIn(s String) (WaterLevel, bool) {
	var own, hole []WaterLevel
	for _, l := range w.WaterLevels {
		switch {
		case l.String == "":
			hole = append(hole, l)
		case l.String == s.Name:
			own = append(own, l)
		}
	}
	if len(own) > 0 {
		return latestOf(own)
	}
	return latestOf(hole)
}

func latestOf(levels []WaterLevel) (WaterLevel, bool) {
	var best WaterLevel
	found, static := false, false
	for _, l := range levels {
		isStatic := l.Kind == Static || l.Kind == ""
		switch {
		case !found, isStatic && !static, isStatic == static && l.Measured.After(best.Measured):
			best, found, static = l, true, isStatic
		}
	}
	return best, found
}

// SlurryDensityFrom converts a mud-balance reading as written, lb/gal in
// a file in feet and kg/L in one in metres, to kg/m3 (1 lb/gal =
// 0.45359237 kg / 3.785411784 L, NIST Handbook 44).
func SlurryDensityFrom(v float64, u Units) float64 {
	if u.Imperial() {
		return v * 0.45359237 / LitresPerUSGallon * 1000
	}
	return v * 1000
}

// SlurryDensityIn is a density in kg/m3 as the file writes it: lb/gal or
// kg/L, with that unit's name.
func SlurryDensityIn(kgPerM3 float64, u Units) (float64, string) {
	if u.Imperial() {
		return kgPerM3 / (0.45359237 / LitresPerUSGallon * 1000), "lb/gal"
	}
	return kgPerM3 / 1000, "kg/L"
}
