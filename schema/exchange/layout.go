// Package exchange reads and writes tremie's spreadsheet layout for well
// construction data (docs/import.md): a Wells sheet, one row per well, and
// an Intervals sheet, one row per borehole section, casing, riser, screen,
// sump, fill, tag reading, open hole, lithology interval, water level,
// formation sample, waiver, wall image or wall feature. Import turns a
// workbook (or CSV files) into well files that the strict loader has
// accepted, naming every bad cell as
// file:Sheet!B12; Layout writes wells back into the same layout, so a
// project round-trips; Template writes an empty workbook with notes,
// validation lists and one invented example well.
//
// Columns map to well-file keys. A Wells column is a key of a singleton
// table ([well], [units], [location], [surface.pad], ...); the Intervals
// columns are the keys of the array tables, named as in the well file,
// with "kind" values of the file's own renamed "<table>_kind". A header
// written as a dotted key path ("pump.description") reaches any key of
// the well file the named columns do not, so the layout keeps up with the
// format.
package exchange

import "strings"

// Sheet names.
const (
	WellsSheet     = "Wells"
	IntervalsSheet = "Intervals"
	ListsSheet     = "Lists"
)

// wellColumn is a Wells column and the key it fills.
type wellColumn struct {
	name, table, key, note string
}

// wellColumns are the Wells sheet's named columns, in sheet order.
var wellColumns = []wellColumn{
	{"well_id", "well", "id", "Well ID, unique in the workbook (required)."},
	{"purpose", "well", "purpose", "What the well is for (required); see the list."},
	{"status", "well", "status", "Free text: active, planned, abandoned..."},
	{"depth_unit", "units", "depth", "ft or m (required): the unit of every depth, height and elevation of this well."},
	{"diameter_unit", "units", "diameter", "in or mm; default in with ft, mm with m."},
	{"mass_unit", "units", "mass", "lb or kg for bag masses; default lb with ft, kg with m."},
	{"volume_unit", "units", "volume", "ft3, gal, L or m3 for placed volumes; default ft3 with ft, L with m."},
	{"total_depth", "well", "total_depth", "Depth of the bottom of the hole (required)."},
	{"project", "well", "project", "Overrides the project's name."},
	{"client", "well", "client", ""},
	{"site", "well", "site", ""},
	{"drilled", "well", "drilled", "Date, e.g. 2026-03-09."},
	{"completed", "well", "completed", "Date."},
	{"permit", "well", "permit", ""},
	{"logged_by", "well", "logged_by", ""},
	{"checked_by", "well", "checked_by", ""},
	{"notes", "well", "notes", "Notes for the sheet; one per line in the cell."},
	{"drilling_method", "drilling", "method", "e.g. hollow-stem auger."},
	{"contractor", "drilling", "contractor", ""},
	{"licence", "drilling", "licence", "The contractor's licence number."},
	{"driller", "drilling", "driller", ""},
	{"location", "location", "description", "Where the well stands, in words."},
	{"easting", "location", "easting", "Projected easting, in the crs's unit."},
	{"northing", "location", "northing", "Projected northing."},
	{"latitude", "location", "latitude", "Decimal degrees, WGS 84 unless crs names another geographic system."},
	{"longitude", "location", "longitude", "Decimal degrees."},
	{"crs", "location", "crs", "EPSG code of easting/northing, e.g. EPSG:2227."},
	{"coordinate_system", "location", "system", "The reference system in words, for the sheet."},
	{"ground_elevation", "elevation", "ground", "Ground-surface elevation, in the depth unit."},
	{"measuring_point_elevation", "elevation", "measuring_point", "Elevation of the measuring point."},
	{"elevation_datum", "elevation", "datum", "e.g. NAVD88."},
	{"surveyed", "elevation", "surveyed", "Date of the survey."},
	{"surface", "surface", "kind", "stick-up or flush-mount."},
	{"lock", "surface", "lock", ""},
	{"drainage", "surface", "drainage", ""},
	{"bollards", "surface", "bollards", "Number of guard posts (a whole number)."},
	{"protective_top", "surface.protective", "top", "Stick-up protective casing: top, negative above ground."},
	{"protective_bottom", "surface.protective", "bottom", ""},
	{"protective_diameter", "surface.protective", "diameter", ""},
	{"protective_material", "surface.protective", "material", ""},
	{"vault_diameter", "surface.vault", "diameter", "Flush-mount vault."},
	{"vault_depth", "surface.vault", "depth", ""},
	{"vault_cover", "surface.vault", "cover", ""},
	{"pad_length", "surface.pad", "length", "Concrete pad, in the depth unit."},
	{"pad_width", "surface.pad", "width", ""},
	{"pad_thickness", "surface.pad", "thickness", ""},
}

// intervalKinds are the Intervals sheet's row kinds and the array table
// each fills. The sections of a well string take their kind from the
// section's own kind.
var intervalKinds = []struct{ kind, table, note string }{
	{"borehole", "borehole", "A drilled diameter over a depth range."},
	{"casing", "casing", "An outer casing (surface, conductor, intermediate, production); name it to place fills within it."},
	{"string", "string", "A well string's own keys (name, caps, centralizers); its sections are riser, screen and sump rows naming it in the string column."},
	{"riser", "string.section", "Blank pipe of a string."},
	{"screen", "string.section", "Screen of a string."},
	{"sump", "string.section", "Sump, tail pipe or silt trap below a screen."},
	{"fill", "fill", "An annular fill interval: filter pack, seal, grout, backfill."},
	{"tag", "fill.tag", "A weighted-tape tag of the fill row above it: after_bags, depth."},
	{"open-hole", "open_hole", "An uncased interval below the casing."},
	{"lithology", "lithology", "A lithology interval: uscs or rock, description."},
	{"water-level", "water_level", "A depth to water: depth, reference, measured, water_level_kind, and string for a level measured in one string of a nested well."},
	{"sample", "sample", "A sieve analysis of the formation at one depth (ASTM D6913): depth, d10, d30, d60, note."},
	{"waiver", "waiver", "Accepts a rule's finding for this well: rule, reason, approved_by, date."},
	{"wall-image", "wall_image", "An oriented wall image of an open hole."},
	{"feature", "feature", "A wall feature picked on a wall image or measured."},
}

// sectionKinds are the kinds that are sections of a well string.
var sectionKinds = map[string]bool{"riser": true, "screen": true, "sump": true}

func kindOfTable(table string) string {
	for _, k := range intervalKinds {
		if k.table == table && !sectionKinds[k.kind] {
			return k.kind
		}
	}
	return strings.ReplaceAll(table[strings.LastIndexByte(table, '.')+1:], "_", "-")
}

func tableOfKind(kind string) (string, bool) {
	for _, k := range intervalKinds {
		if k.kind == kind {
			return k.table, true
		}
	}
	return "", false
}

// kindColumn is the column a table's own "kind" key takes: casing_kind,
// water_level_kind, feature_kind.
func kindColumn(table string) string {
	return table[strings.LastIndexByte(table, '.')+1:] + "_kind"
}

// intervalColumns are the Intervals sheet's columns in sheet order: the
// well and kind, the string a section belongs to, then the keys.
var intervalColumns = []struct{ name, note string }{
	{"well_id", "The Wells row this row belongs to (required)."},
	{"kind", "What the row is (required); see the list."},
	{"string", "riser, screen and sump rows: the name of their well string; blank for a well's only unnamed string. water-level rows: the string the level was measured in (nested wells); blank for the whole hole."},
	{"name", "casing, string and wall-image rows: the name others refer to."},
	{"top", "Depth of the top, in the well's depth unit; negative above ground."},
	{"bottom", "Depth of the bottom; below top."},
	{"depth", "tag and water-level rows: the depth read; sample rows: the depth taken at; feature rows: the trace's centre."},
	{"diameter", "borehole rows: the drilled diameter, in the diameter unit."},
	{"casing_kind", "casing rows: surface, conductor, intermediate or production."},
	{"material", "fill rows: the fill material (see the list); pipe rows: PVC, stainless steel..."},
	{"size", "Nominal pipe size, e.g. 2 or 1-1/2 or DN50."},
	{"schedule", "Pipe schedule: 40, 80, 5S, 10S."},
	{"sdr", "Standard dimension ratio, instead of schedule."},
	{"od", "Outside diameter, when size and schedule do not give it."},
	{"id", "Inside diameter."},
	{"joint", "flush-threaded, coupled, welded, solvent-welded."},
	{"slot", "screen rows: slot width in the diameter unit."},
	{"slot_number", "screen rows: slot in thousandths of an inch (10 = 0.010 in)."},
	{"type", "screen rows: slotted, continuous-wrap or prepacked."},
	{"top_cap", "string rows: e.g. locking expansion plug."},
	{"bottom_cap", "string rows: e.g. threaded end plug."},
	{"centralizers", "casing and string rows: depths, separated by ;"},
	{"product", "fill rows: trade name or description."},
	{"gradation", "fill rows: US sieve range, e.g. 20/40."},
	{"method", "borehole: drilling method; fill: tremie, poured or pumped."},
	{"within", "fill rows: the name of the casing the fill was placed inside."},
	{"bags", "fill rows: bags placed."},
	{"bag_mass", "fill rows: mass of one bag, in the mass unit."},
	{"volume", "fill rows: volume placed instead of bags, in the volume unit."},
	{"yield", "fill rows: volume one bag yields, overriding the default."},
	{"after_bags", "tag rows: bags placed when tagged."},
	{"reference", "water-level rows: ground or measuring-point."},
	{"measured", "water-level rows: date or date and time, e.g. 2026-03-20T08:15:00."},
	{"water_level_kind", "water-level rows: first-encountered, static or pumping."},
	{"uscs", "lithology rows: ASTM D2487 group symbol, e.g. SP-SM."},
	{"rock", "lithology rows: a rock type instead of uscs."},
	{"description", "lithology rows: the log's description."},
	{"d10", "sample and fill rows (the formation's or the pack's grading): grain size 10 % is finer than by mass, mm."},
	{"d30", "sample and fill rows: grain size 30 % is finer than, mm."},
	{"d60", "sample and fill rows: grain size 60 % is finer than, mm."},
	{"rule", "waiver rows: the rule ID."},
	{"reason", "waiver rows: why the finding is accepted."},
	{"approved_by", "waiver rows: who accepted it."},
	{"date", "waiver rows: date."},
}
