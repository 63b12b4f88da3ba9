package schema

// WellFile is the key table of a well file: every key the loader reads,
// with its type, unit and meaning. FORMAT.md is its long-form
// documentation; `tremie schema well` prints it as JSON Schema.
var WellFile = wellFile()

// interval gives the top and bottom keys; aboveGround lets the top be
// negative (a height above ground).
func interval(part string, aboveGround bool, top, bottom float64) []KeySpec {
	topDoc := "Depth of the top of the " + part + " below ground surface."
	bound := NonNegative
	if aboveGround {
		topDoc += " Negative for a height above ground (stick-up)."
		bound = AnyNumber
	}
	return []KeySpec{
		{Name: "top", Type: TypeNumber, Required: true, Unit: UnitDepth, Bound: bound, Doc: topDoc, Example: top},
		{Name: "bottom", Type: TypeNumber, Required: true, Unit: UnitDepth, Doc: "Depth of the bottom of the " + part + " below ground surface; below top.", Example: bottom},
	}
}

// pipeKeys are the keys that give a casing's or a section's pipe.
func pipeKeys() []KeySpec {
	return []KeySpec{
		{Name: "material", Type: TypeString, Doc: "Pipe material.", Example: "PVC"},
		{Name: "size", Type: TypeString, Doc: "Nominal pipe size in inches (\"2\", \"1-1/2\") or \"DN50\"; with schedule or sdr it gives the diameters.", Example: "2"},
		{Name: "schedule", Type: TypeString, Doc: "Pipe schedule (ASTM D1785 / ASME B36.10), e.g. \"40\", \"80\", \"5S\", \"10S\".", Example: "40"},
		{Name: "sdr", Type: TypeNumber, Bound: Positive, Doc: "Standard dimension ratio: wall = OD / SDR. Instead of schedule.", Example: 21.0},
		{Name: "od", Type: TypeNumber, Bound: Positive, Unit: UnitDiameter, Doc: "Outside diameter, when size and schedule do not give it.", Example: 2.375},
		{Name: "id", Type: TypeNumber, Bound: Positive, Unit: UnitDiameter, Doc: "Inside diameter, when size and schedule do not give it.", Example: 2.067},
		{Name: "joint", Type: TypeString, Doc: "How lengths are joined: flush-threaded, coupled, welded, solvent-welded.", Example: "flush-threaded"},
	}
}

func centralizers() KeySpec {
	return KeySpec{Name: "centralizers", Type: TypeNumbers, Unit: UnitDepth, Doc: "Depths of the centralizers.", Example: []any{24.5}}
}

func joinKeys(parts ...[]KeySpec) []KeySpec {
	var out []KeySpec
	for _, p := range parts {
		out = append(out, p...)
	}
	return out
}

func wellFile() *TableSpec {
	units := &TableSpec{Doc: "The units the file is written in, declared once.", Keys: []KeySpec{
		{Name: "depth", Type: TypeString, Required: true, Enum: []string{"ft", "m"}, Doc: "Unit of depths, lengths and elevations: ft or m.", Example: "ft"},
		{Name: "diameter", Type: TypeString, Enum: []string{"in", "mm"}, Doc: "Unit of diameters and slot widths; default in with ft, mm with m.", Example: "in"},
		{Name: "mass", Type: TypeString, Enum: []string{"lb", "kg"}, Doc: "Unit of bag masses; default lb with ft, kg with m.", Example: "lb"},
		{Name: "volume", Type: TypeString, Enum: []string{"ft3", "gal", "L", "m3"}, Doc: "Unit of placed volumes and yields (gal = US gallon); default ft3 with ft, L with m.", Example: "ft3"},
	}}
	well := &TableSpec{Doc: "Who, what and how deep.", Keys: []KeySpec{
		{Name: "id", Type: TypeString, Required: true, Doc: "Well ID as it appears on sheets and tables.", Example: "MW-3"},
		{Name: "project", Type: TypeString, Doc: "Project name, overriding the project file's.", Example: "Groundwater investigation"},
		{Name: "client", Type: TypeString, Doc: "Client, overriding the project file's.", Example: "Valley Water Authority"},
		{Name: "site", Type: TypeString, Doc: "Site, overriding the project file's.", Example: "Former mill"},
		{Name: "purpose", Type: TypeString, Required: true, Enum: stringsOf(Purposes), Doc: "What the well is for; rules such as the sanitary-seal depth depend on it (recovery = recovery or extraction).", Example: "monitoring"},
		{Name: "status", Type: TypeString, Doc: "Free text: active, planned, abandoned... A planned well has no amounts placed yet.", Example: "active"},
		{Name: "drilled", Type: TypeDate, Doc: "Date drilled.", Example: "2026-03-09"},
		{Name: "completed", Type: TypeDate, Doc: "Date the construction was completed.", Example: "2026-03-10"},
		{Name: "total_depth", Type: TypeNumber, Required: true, Bound: Positive, Unit: UnitDepth, Doc: "Depth of the bottom of the hole below ground surface.", Example: 36.0},
		{Name: "permit", Type: TypeString, Doc: "Well permit number.", Example: "WP-26-0311"},
		{Name: "logged_by", Type: TypeString, Doc: "Who logged the well.", Example: "A. Geologist"},
		{Name: "checked_by", Type: TypeString, Doc: "Who checked the log.", Example: "B. Reviewer, PG"},
		{Name: "notes", Type: TypeStrings, Doc: "Notes printed in the sheet's notes area.", Example: []any{"Screen straddles the seasonal water table."}},
	}}
	drilling := &TableSpec{Doc: "How and by whom the hole was made.", Keys: []KeySpec{
		{Name: "method", Type: TypeString, Doc: "Drilling method.", Example: "hollow-stem auger"},
		{Name: "contractor", Type: TypeString, Doc: "Drilling contractor.", Example: "Example Drilling Co."},
		{Name: "licence", Type: TypeString, Doc: "The contractor's licence number.", Example: "C57-000000"},
		{Name: "driller", Type: TypeString, Doc: "The driller's name.", Example: "C. Driller"},
	}}
	location := &TableSpec{Doc: "Where the well stands.", Keys: []KeySpec{
		{Name: "description", Type: TypeString, Doc: "Where, in words.", Example: "north fence line, 12 m east of gate 2"},
		{Name: "easting", Type: TypeNumber, Doc: "Projected easting, in the units of system.", Example: 512300.0},
		{Name: "northing", Type: TypeNumber, Doc: "Projected northing, in the units of system.", Example: 4123400.0},
		{Name: "latitude", Type: TypeNumber, Unit: UnitDegrees, Doc: "Latitude, -90 to 90.", Example: 45.5},
		{Name: "longitude", Type: TypeNumber, Unit: UnitDegrees, Doc: "Longitude, -180 to 180.", Example: -120.5},
		{Name: "system", Type: TypeString, Doc: "The coordinates' reference system, as text.", Example: "NAD83 / UTM zone 11N"},
		{Name: "crs", Type: TypeString, Doc: "The reference system of easting/northing as an EPSG code; latitude/longitude are WGS 84 or the geographic system it names.", Example: "EPSG:32611"},
	}}
	elevation := &TableSpec{Doc: "Surveyed elevations above a datum.", Keys: []KeySpec{
		{Name: "ground", Type: TypeNumber, Unit: UnitDepth, Doc: "Ground-surface elevation.", Example: 412.36},
		{Name: "measuring_point", Type: TypeNumber, Unit: UnitDepth, Doc: "Measuring-point elevation (usually the top of the riser), the water-level reference.", Example: 412.04},
		{Name: "datum", Type: TypeString, Doc: "Vertical datum.", Example: "NAVD88"},
		{Name: "surveyed", Type: TypeDate, Doc: "Date surveyed.", Example: "2026-03-20"},
	}}
	borehole := &TableSpec{Doc: "One drilled diameter over a depth range, top down; a hole that steps down has several.", Keys: joinKeys(
		interval("borehole section", false, 0.0, 36.0),
		[]KeySpec{
			{Name: "diameter", Type: TypeNumber, Required: true, Bound: Positive, Unit: UnitDiameter, Doc: "Drilled diameter.", Example: 8.25},
			{Name: "method", Type: TypeString, Doc: "Drilling method of this section.", Example: "hollow-stem auger"},
		})}
	casing := &TableSpec{Doc: "An outer casing (surface, conductor, intermediate) the well strings run inside or below.", Keys: joinKeys(
		[]KeySpec{
			{Name: "name", Type: TypeString, Doc: "Name a fill's within refers to; default the kind.", Example: "surface"},
			{Name: "kind", Type: TypeString, Enum: []string{string(SurfaceCasing), string(ConductorCasing), string(IntermediateCasing), string(ProductionCasing)}, Doc: "The casing's role; default surface.", Example: "surface"},
		},
		interval("casing", true, -2.0, 20.0),
		pipeKeys(),
		[]KeySpec{centralizers(),
			{Name: "drive_shoe", Type: TypeBool, Doc: "true for a driven casing with a shoe on its bottom.", Example: false},
		})}
	section := &TableSpec{Doc: "One length of a well string, top down: riser, screen or sump.", Keys: joinKeys(
		[]KeySpec{{Name: "kind", Type: TypeString, Required: true, Enum: []string{string(RiserSection), string(ScreenSection), string(SumpSection)}, Doc: "riser, screen or sump (sump, tail pipe or silt trap).", Example: "screen"}},
		interval("section", true, 25.0, 35.0),
		pipeKeys(),
		[]KeySpec{
			{Name: "slot", Type: TypeNumber, Bound: Positive, Unit: UnitDiameter, Doc: "Screens: slot width.", Example: 0.010},
			{Name: "slot_number", Type: TypeNumber, Bound: Positive, Unit: UnitSlotNo, Doc: "Screens: instead of slot, the slot number (10-slot = 0.010 in).", Example: 10},
			{Name: "type", Type: TypeString, Enum: []string{string(Slotted), string(ContinuousWrap), string(Prepacked)}, Doc: "Screens: the screen type; default slotted.", Example: "slotted"},
			{Name: "open_area", Type: TypeNumber, Bound: Positive, Doc: "Screens: open area, percent of the screen's outer surface (manufacturer's figure).", Example: 12.5},
		})}
	str := &TableSpec{Doc: "A well string: riser, screen(s) and sump in one column of pipe; a nested completion has one per well.", Keys: []KeySpec{
		{Name: "name", Type: TypeString, Doc: "Name of the string, unique in the file; default main.", Example: "MW-3"},
		{Name: "top_cap", Type: TypeString, Doc: "Cap at the top of the riser.", Example: "locking expansion plug"},
		{Name: "bottom_cap", Type: TypeString, Doc: "Cap at the bottom of the string.", Example: "threaded end plug"},
		centralizers(),
		{Name: "hung_in", Type: TypeString, Doc: "A liner: the name of the [[casing]] it hangs inside; its top lies within that casing.", Example: "production"},
		{Name: "hanger", Type: TypeString, Enum: []string{string(Packer), string(Hanger)}, RequiredIf: "for a liner", Doc: "Liners: packer (holds the liner and seals the lap) or hanger (holds it, no seal).", Example: "packer"},
		{Name: "hanger_product", Type: TypeString, Doc: "Liners: the packer's or hanger's make or description.", Example: "mechanical packer"},
		{Name: "lap_seal", Type: TypeString, Enum: stringsOf(Materials), Doc: "Liners: the sealing material in the lap annulus, a seal or grout fill material.", Example: "neat-cement"},
		{Name: "section", Type: TypeTables, Required: true, Doc: "The string's lengths, top down.", Table: section},
	}}
	tag := &TableSpec{Doc: "A weighted-tape tag of the top of the fill while it was placed.", Keys: []KeySpec{
		{Name: "after_bags", Type: TypeNumber, Required: true, Bound: NonNegative, Doc: "Bags placed when tagged.", Example: 5},
		{Name: "depth", Type: TypeNumber, Required: true, Bound: NonNegative, Unit: UnitDepth, Doc: "Depth tagged.", Example: 28.8},
	}}
	fill := &TableSpec{Doc: "One annular fill interval: filter pack, seal, grout, backfill.", Keys: joinKeys(
		interval("fill", false, 23.0, 36.0),
		[]KeySpec{
			{Name: "material", Type: TypeString, Required: true, Enum: stringsOf(Materials), Doc: "The fill's material class.", Example: "filter-pack"},
			{Name: "product", Type: TypeString, Doc: "Trade name or description.", Example: "silica sand"},
			{Name: "gradation", Type: TypeString, Doc: "US sieve range, coarse/fine: \"20/40\" passes No. 20 and is held on No. 40.", Example: "20/40"},
			{Name: "grain_min", Type: TypeNumber, Bound: Positive, Unit: UnitGrain, Doc: "Instead of gradation: smallest grain size.", Example: 0.42},
			{Name: "grain_max", Type: TypeNumber, Bound: Positive, Unit: UnitGrain, Doc: "Instead of gradation: largest grain size.", Example: 0.84},
			{Name: "d10", Type: TypeNumber, Bound: Positive, Unit: UnitGrain, Doc: "Grain size 10 % of the pack is finer than, by mass (its grading curve); the slot is checked against it.", Example: 0.45},
			{Name: "d30", Type: TypeNumber, Bound: Positive, Unit: UnitGrain, Doc: "Grain size 30 % of the pack is finer than.", Example: 0.55},
			{Name: "d60", Type: TypeNumber, Bound: Positive, Unit: UnitGrain, Doc: "Grain size 60 % of the pack is finer than.", Example: 0.70},
			{Name: "method", Type: TypeString, Enum: []string{string(Tremied), string(Poured), string(Pumped)}, Doc: "How the fill was placed.", Example: "poured"},
			{Name: "within", Type: TypeString, Doc: "Name of the [[casing]] the fill was placed inside; default the borehole annulus.", Example: "surface"},
			{Name: "bags", Type: TypeNumber, Bound: NonNegative, Doc: "Bags placed.", Example: 9},
			{Name: "bag_mass", Type: TypeNumber, Bound: Positive, Unit: UnitMass, Doc: "Mass of one bag.", Example: 50},
			{Name: "volume", Type: TypeNumber, Bound: NonNegative, Unit: UnitVolume, Doc: "Instead of bags: volume placed.", Example: 6.4},
			{Name: "yield", Type: TypeNumber, Bound: Positive, Unit: UnitVolume, Doc: "Volume one bag (or batch) fills in place, overriding the material default.", Example: 0.5},
			{Name: "size", Type: TypeNumber, Bound: Positive, Unit: UnitDiameter, Doc: "Nominal size of bentonite chips or pellets, in the diameter unit (0.375 for 3/8-in chips).", Example: 0.375},
			{Name: "density", Type: TypeNumber, Bound: Positive, Doc: "Slurry density measured with a mud balance: lb/gal in a file in feet, kg/L in one in metres.", Example: 15.2},
			{Name: "water_inside", Type: TypeNumber, Bound: NonNegative, Unit: UnitDepth, Doc: "With grout: depth of the water standing inside the casing while the grout was placed and set (0 = filled to the top); rule COLLAPSE-LOAD takes the casing as empty when it is not given.", Example: 0.0},
			{Name: "tag", Type: TypeTables, Doc: "Weighted-tape tags of the top of the fill.", Table: tag},
		})}
	openHole := &TableSpec{Doc: "An uncased interval below the casing (rock completion).", Keys: interval("open hole", false, 60.0, 150.0)}
	layer := &TableSpec{Doc: "One layer of the log, top down.", Keys: joinKeys(
		interval("layer", false, 0.0, 4.0),
		[]KeySpec{
			{Name: "uscs", Type: TypeString, Doc: "ASTM D2487 group symbol (GW, GP, GM, GC, SW, SP, SM, SC, ML, CL, OL, MH, CH, OH, PT, or a dual symbol such as SP-SM).", Example: "SP"},
			{Name: "rock", Type: TypeString, Doc: "Instead of uscs: a rock type, e.g. granite, sandstone, weathered shale.", Example: "sandstone"},
			{Name: "description", Type: TypeString, Doc: "The log's description of the layer.", Example: "Poorly graded SAND, fine to medium, grey-brown, wet"},
			{Name: "weathering", Type: TypeString, Doc: "With rock: the weathering grade after ISRM (1981) and BS 5930: fresh (I), slightly-weathered (II), moderately-weathered (III), highly-weathered (IV), completely-weathered (V), residual-soil (VI); the Roman numeral is accepted.", Example: "slightly-weathered"},
			{Name: "unit", Type: TypeString, Doc: "The hydrostratigraphic unit the layer belongs to, a name of your own; cross-sections join a unit between neighbouring wells.", Example: "upper aquifer"},
		})}
	water := &TableSpec{Doc: "A water level.", Keys: []KeySpec{
		{Name: "depth", Type: TypeNumber, Required: true, Unit: UnitDepth, Doc: "Depth to water below the reference.", Example: 25.21},
		{Name: "reference", Type: TypeString, Enum: []string{string(FromGround), string(FromMeasuringPoint)}, Doc: "What depth is measured from; default ground.", Example: "measuring-point"},
		{Name: "measured", Type: TypeDateTime, Doc: "When measured: a date or a local date-time.", Example: "2026-03-20T08:15:00"},
		{Name: "kind", Type: TypeString, Enum: []string{string(FirstEncountered), string(Static), string(Pumping)}, Doc: "What the level is; default static.", Example: "static"},
		{Name: "string", Type: TypeString, Doc: "Name of the [[string]] the level was measured in, for a nested well whose strings each have their own head; omitted, the level applies to the whole hole.", Example: "MW-3"},
	}}
	sample := &TableSpec{Doc: "A sieve analysis of the formation at one depth (ASTM D6913), for filter-pack design.", Keys: []KeySpec{
		{Name: "depth", Type: TypeNumber, Required: true, Bound: NonNegative, Unit: UnitDepth, Doc: "Depth the sample was taken at, below ground.", Example: 30.0},
		{Name: "d10", Type: TypeNumber, Bound: Positive, Unit: UnitGrain, Doc: "Grain size 10 % of the sample is finer than, by mass.", Example: 0.12},
		{Name: "d30", Type: TypeNumber, Bound: Positive, Unit: UnitGrain, Doc: "Grain size 30 % of the sample is finer than; the pack's d30 is designed from it.", Example: 0.25},
		{Name: "d60", Type: TypeNumber, Bound: Positive, Unit: UnitGrain, Doc: "Grain size 60 % of the sample is finer than.", Example: 0.40},
		{Name: "note", Type: TypeString, Doc: "Free text.", Example: "split spoon, fine to medium sand"},
	}}
	protective := &TableSpec{Doc: "Stick-up: the protective casing.", Keys: joinKeys(
		interval("protective casing", true, -3.0, 2.0),
		[]KeySpec{
			{Name: "diameter", Type: TypeNumber, Bound: Positive, Unit: UnitDiameter, Doc: "Diameter of the protective casing.", Example: 6.0},
			{Name: "material", Type: TypeString, Doc: "Material of the protective casing.", Example: "steel"},
		})}
	vault := &TableSpec{Doc: "Flush-mount: the vault.", Keys: []KeySpec{
		{Name: "diameter", Type: TypeNumber, Bound: Positive, Unit: UnitDiameter, Doc: "Vault diameter.", Example: 8.0},
		{Name: "depth", Type: TypeNumber, Bound: Positive, Unit: UnitDepth, Doc: "Vault depth.", Example: 1.0},
		{Name: "cover", Type: TypeString, Doc: "The vault's cover.", Example: "bolted steel lid"},
	}}
	pad := &TableSpec{Doc: "The concrete pad around the well.", Keys: []KeySpec{
		{Name: "length", Type: TypeNumber, Bound: Positive, Unit: UnitDepth, Doc: "Pad length.", Example: 2.0},
		{Name: "width", Type: TypeNumber, Bound: Positive, Unit: UnitDepth, Doc: "Pad width.", Example: 2.0},
		{Name: "thickness", Type: TypeNumber, Bound: Positive, Unit: UnitDepth, Doc: "Pad thickness.", Example: 0.5},
	}}
	surface := &TableSpec{Doc: "The completion at ground.", Keys: []KeySpec{
		{Name: "kind", Type: TypeString, Enum: []string{string(StickUp), string(FlushMount)}, Doc: "stick-up (with [surface.protective]) or flush-mount (with [surface.vault]).", Example: "flush-mount"},
		{Name: "lock", Type: TypeString, Doc: "The lock.", Example: "keyed padlock"},
		{Name: "drainage", Type: TypeString, Doc: "Drainage of the completion.", Example: "weep hole, gravel base"},
		{Name: "bollards", Type: TypeInteger, Bound: NonNegative, Max: 1_000_000, Doc: "Number of guard posts.", Example: 3},
		{Name: "protective", Type: TypeTable, Doc: "Stick-up: the protective casing.", Table: protective},
		{Name: "vault", Type: TypeTable, Doc: "Flush-mount: the vault.", Table: vault},
		{Name: "pad", Type: TypeTable, Doc: "The concrete pad.", Table: pad},
	}}
	measuringPoint := &TableSpec{Doc: "The point water levels refer to; give pipe or height. Default: the highest top of the strings that reach the surface.", Keys: []KeySpec{
		{Name: "pipe", Type: TypeString, Doc: "The name of the casing or string whose top is the measuring point.", Example: "MW-3"},
		{Name: "height", Type: TypeNumber, Unit: UnitDepth, Doc: "Instead of pipe: the measuring point's height above ground (negative below).", Example: 2.5},
		{Name: "description", Type: TypeString, Doc: "How the sheet names it.", Example: "top of riser, north side"},
	}}
	pump := &TableSpec{Doc: "The pump of a supply well.", Keys: []KeySpec{
		{Name: "intake", Type: TypeNumber, Required: true, Bound: Positive, Unit: UnitDepth, Doc: "Depth of the pump intake (pump setting) below ground.", Example: 30.0},
		{Name: "description", Type: TypeString, Doc: "The pump.", Example: "submersible, set on 2-in column"},
	}}
	waiver := &TableSpec{Doc: "A finding accepted by a named person: still reported, as waived, but no longer failing the check.", Keys: []KeySpec{
		{Name: "rule", Type: TypeString, Required: true, Doc: "The rule ID waived (tremie rules lists them).", Example: "PACK-ABOVE-MAX"},
		{Name: "reason", Type: TypeString, Required: true, Doc: "Why.", Example: "approved by the regulator on site"},
		{Name: "approved_by", Type: TypeString, Required: true, Doc: "Who approved it.", Example: "B. Reviewer, PG"},
		{Name: "date", Type: TypeDate, Doc: "Date approved.", Example: "2026-03-21"},
	}}
	orientation := &TableSpec{Doc: "What every azimuth in the file is measured from; without it, true north.", Keys: []KeySpec{
		{Name: "north", Type: TypeString, Required: true, Enum: []string{string(TrueNorth), string(MagneticNorth)}, Doc: "true or magnetic north.", Example: "magnetic"},
		{Name: "declination", Type: TypeNumber, Unit: UnitAngle, Doc: "Magnetic declination, east positive, -90 to 90; required for magnetic, added to a magnetic azimuth to make it true.", Example: 13.5},
	}}
	wallImage := &TableSpec{Doc: "An unwrapped image of the open-hole wall.", Keys: joinKeys(
		[]KeySpec{
			{Name: "name", Type: TypeString, Doc: "What features name in image; default image-1, image-2...", Example: "optical"},
			{Name: "file", Type: TypeString, Required: true, Doc: "PNG, JPEG or TIFF, relative to the well file.", Example: "BR-1-wall.png"},
		},
		interval("image", false, 40.0, 150.0),
		[]KeySpec{
			{Name: "left_azimuth", Type: TypeNumber, Unit: UnitAngle, Doc: "Azimuth at the image's left edge, 0 to 360; default 0.", Example: 0.0},
			{Name: "direction", Type: TypeString, Enum: []string{"clockwise", "counterclockwise"}, Doc: "clockwise: azimuth grows to the right (default).", Example: "clockwise"},
		})}
	feature := &TableSpec{Doc: "A fracture, bedding plane, vein or contact logged on the open-hole wall.", Keys: []KeySpec{
		{Name: "kind", Type: TypeString, Required: true, Enum: stringsOf(FeatureKinds), Doc: "What the feature is.", Example: "water-bearing-fracture"},
		{Name: "depth", Type: TypeNumber, Bound: NonNegative, Unit: UnitDepth, RequiredIf: "without picks", Doc: "Depth of the trace's centre; with picks, the fitted trace's mean depth when not given.", Example: 97.0},
		{Name: "aperture", Type: TypeNumber, Bound: Positive, Unit: UnitDiameter, Doc: "Opening.", Example: 0.1},
		{Name: "inflow", Type: TypeNumber, Bound: NonNegative, Unit: "volume unit per minute (gpm for gal, L/min for L)", Doc: "Measured inflow.", Example: 4.5},
		{Name: "confidence", Type: TypeString, Enum: []string{string(HighConfidence), string(MediumConfidence), string(LowConfidence)}, Doc: "How sure the logger is.", Example: "high"},
		{Name: "note", Type: TypeString, Doc: "Free text.", Example: "iron staining"},
		{Name: "image", Type: TypeString, Doc: "The [[wall_image]] the picks were made on.", Example: "optical"},
		{Name: "dip", Type: TypeNumber, Unit: UnitAngle, RequiredIf: "with dip_direction", Doc: "Dip given directly, 0 to 90; with dip_direction.", Example: 35.0},
		{Name: "dip_direction", Type: TypeNumber, Unit: UnitAngle, RequiredIf: "with dip", Doc: "Dip direction given directly, 0 to 360.", Example: 140.0},
		{Name: "trace_high", Type: TypeNumber, Bound: NonNegative, Unit: UnitDepth, Doc: "Picks: depth of the trace's highest point.", Example: 96.6},
		{Name: "trace_low", Type: TypeNumber, Bound: NonNegative, Unit: UnitDepth, Doc: "Picks: depth of the trace's lowest point.", Example: 97.4},
		{Name: "low_azimuth", Type: TypeNumber, Unit: UnitAngle, Doc: "Picks: azimuth of the lowest point, 0 to 360.", Example: 128.0},
		{Name: "points", Type: TypeNumberPairs, Doc: "Picks instead of trace_high/trace_low: 3 to 360 [azimuth, depth] pairs along the trace.", Example: []any{[]any{0.0, 96.8}, []any{120.0, 97.3}, []any{240.0, 96.7}}},
		{Name: "caliper", Type: TypeNumber, Bound: Positive, Unit: UnitDiameter, Doc: "Hole diameter at the feature, overriding the [[borehole]] section's.", Example: 6.0},
	}}
	pumpingTest := &TableSpec{Doc: "A supply well's pumping test and design rate. Rates in US gal/min in a file in feet, L/s in one in metres.", Keys: []KeySpec{
		{Name: "rate", Type: TypeNumber, Bound: Positive, Doc: "Tested pumping rate (gal/min or L/s).", Example: 350.0},
		{Name: "design_rate", Type: TypeNumber, Bound: Positive, Doc: "Design pumping rate (gal/min or L/s).", Example: 300.0},
		{Name: "duration", Type: TypeNumber, Bound: Positive, Doc: "Duration of the test, hours.", Example: 24.0},
		{Name: "static_level", Type: TypeNumber, Bound: NonNegative, Unit: UnitDepth, Doc: "Static level before pumping, below ground.", Example: 161.5},
		{Name: "pumping_level", Type: TypeNumber, Bound: Positive, Unit: UnitDepth, Doc: "Pumping level at the end of the test, below ground.", Example: 192.0},
		{Name: "specific_capacity", Type: TypeNumber, Bound: Positive, Doc: "Rate per unit drawdown (gal/min per ft, or L/s per m); default worked from the rate and levels.", Example: 11.5},
	}}
	return &TableSpec{Title: "tremie well file", Doc: "One groundwater well as built (or planned): units, construction, lithology, water levels. Depths are below ground surface in the file's depth unit; a height above ground is a negative depth.", Keys: []KeySpec{
		{Name: "units", Type: TypeTable, Required: true, Doc: units.Doc, Table: units},
		{Name: "well", Type: TypeTable, Required: true, Doc: well.Doc, Table: well},
		{Name: "drilling", Type: TypeTable, Doc: drilling.Doc, Table: drilling},
		{Name: "location", Type: TypeTable, Doc: location.Doc, Table: location},
		{Name: "elevation", Type: TypeTable, Doc: elevation.Doc, Table: elevation},
		{Name: "borehole", Type: TypeTables, Required: true, Doc: borehole.Doc, Table: borehole},
		{Name: "casing", Type: TypeTables, Doc: casing.Doc, Table: casing},
		{Name: "string", Type: TypeTables, Doc: str.Doc, Table: str},
		{Name: "fill", Type: TypeTables, Doc: fill.Doc, Table: fill},
		{Name: "open_hole", Type: TypeTables, Doc: openHole.Doc, Table: openHole},
		{Name: "lithology", Type: TypeTables, Doc: layer.Doc, Table: layer},
		{Name: "water_level", Type: TypeTables, Doc: water.Doc, Table: water},
		{Name: "sample", Type: TypeTables, Doc: sample.Doc, Table: sample},
		{Name: "measuring_point", Type: TypeTable, Doc: measuringPoint.Doc, Table: measuringPoint},
		{Name: "pump", Type: TypeTable, Doc: pump.Doc, Table: pump},
		{Name: "pumping_test", Type: TypeTable, Doc: pumpingTest.Doc, Table: pumpingTest},
		{Name: "surface", Type: TypeTable, Doc: surface.Doc, Table: surface},
		{Name: "waiver", Type: TypeTables, Doc: waiver.Doc, Table: waiver},
		{Name: "orientation", Type: TypeTable, Doc: orientation.Doc, Table: orientation},
		{Name: "wall_image", Type: TypeTables, Doc: wallImage.Doc, Table: wallImage},
		{Name: "feature", Type: TypeTables, Doc: feature.Doc, Table: feature},
	}}
}
