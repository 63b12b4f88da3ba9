package starter

// The starter constructions. Each value is given in feet and inches and
// in metres and millimetres; both make a construction that passes every
// rule with its default thresholds (TestStartersCheckClean), with amounts
// placed near what the annulus takes at the default yields.

var wellKinds = map[string]func(Options) []part{
	"monitoring": monitoringWell,
	"nested":     nestedWell,
	"rock":       rockWell,
	"supply":     supplyWell,
	"planned":    plannedWell,
}

const fill, keep = true, false

func unitsPart() part {
	return part{path: "units", vals: []value{
		per("depth", "ft", "m", keep),
		per("diameter", "in", "mm", keep),
		per("mass", "lb", "kg", keep),
		per("volume", "ft3", "L", keep),
	}}
}

func wellPart(o Options, status string, td value, dates bool) part {
	vals := []value{
		same("id", o.ID, keep),
		same("purpose", string(o.Purpose), keep),
		same("status", status, keep),
	}
	if dates {
		vals = append(vals, same("drilled", "2026-03-09", fill), same("completed", "2026-03-10", fill))
	}
	vals = append(vals, td,
		same("permit", "WP-0000", fill),
		same("logged_by", "A. Geologist", fill),
		same("checked_by", "B. Reviewer, PG", fill),
	)
	return part{path: "well", vals: vals}
}

func drillingPart(method string) part {
	return part{path: "drilling", vals: []value{
		same("method", method, fill),
		same("contractor", "Example Drilling Co.", fill),
		same("licence", "C57-000000", fill),
		same("driller", "C. Driller", fill),
	}}
}

func locationPart() part {
	return part{path: "location", vals: []value{
		per("description", "north fence line, 15 ft east of gate 2", "north fence line, 5 m east of gate 2", fill),
		same("latitude", 37.7000, fill),
		same("longitude", -121.5800, fill),
	}}
}

// elevationPart gives ground and the measuring point's elevation, which
// must agree with the riser top (ELEVATION-STICKUP).
func elevationPart(groundFt, mpFt, groundM, mpM float64) part {
	return part{path: "elevation", vals: []value{
		per("ground", groundFt, groundM, fill),
		per("measuring_point", mpFt, mpM, fill),
		same("datum", "NAVD88", fill),
		same("surveyed", "2026-03-20", fill),
	}}
}

func iv(topFt, bottomFt, topM, bottomM float64) []value {
	return []value{per("top", topFt, topM, fill), per("bottom", bottomFt, bottomM, fill)}
}

func with(vals []value, more ...value) []value { return append(vals, more...) }

// bags is a bag count and mass as placed, both to fill.
func bags(nFt, nM float64, massLb, massKg float64) []value {
	return []value{per("bags", nFt, nM, fill), per("bag_mass", massLb, massKg, fill)}
}

// flushMount is a vault and pad at ground.
func flushMount(vaultIn, vaultMM float64) []part {
	return []part{
		{path: "surface", vals: []value{
			same("kind", "flush-mount", keep),
			same("lock", "locking J-plug, keyed padlock", fill),
			same("drainage", "gravel base", fill),
		}},
		{path: "surface.vault", vals: []value{
			per("diameter", vaultIn, vaultMM, fill),
			per("depth", 1.0, 0.3, fill),
			same("cover", "bolted steel lid, traffic rated", fill),
		}},
		{path: "surface.pad", vals: []value{
			per("length", 3.0, 0.9, fill), per("width", 3.0, 0.9, fill), per("thickness", 0.5, 0.15, fill),
		}},
	}
}

func lithologyParts(layers ...[]value) []part {
	var out []part
	for _, l := range layers {
		out = append(out, part{path: "lithology", array: true, vals: l})
	}
	return out
}

func monitoringWell(o Options) []part { return monitoringParts(o, false) }

func plannedWell(o Options) []part { return monitoringParts(o, true) }

// monitoringParts is a single-string monitoring well; planned leaves out
// what only building it records: dates, amounts, water levels.
func monitoringParts(o Options, planned bool) []part {
	status := "active"
	if planned {
		status = "planned"
	}
	amounts := func(v ...value) []value {
		if planned {
			return nil
		}
		return v
	}
	parts := []part{
		unitsPart(),
		wellPart(o, status, per("total_depth", 36.0, 11.0, fill), !planned),
		drillingPart("hollow-stem auger"),
		locationPart(),
		elevationPart(412.36, 412.04, 125.69, 125.59),
		{path: "borehole", array: true, vals: with(iv(0, 36, 0, 11.0), per("diameter", 8.25, 210.0, fill), same("method", "hollow-stem auger", fill))},
		{path: "string", array: true, vals: []value{
			same("name", o.ID, keep),
			same("top_cap", "locking expansion plug", fill),
			same("bottom_cap", "threaded end plug", fill),
		}},
		{path: "string.section", array: true, note: "The riser, from its top (below ground in a flush-mount vault) down to the screen.", vals: with([]value{same("kind", "riser", keep)},
			with(iv(0.32, 25, 0.1, 7.6),
				same("material", "PVC", fill), per("size", "2", "DN50", fill), same("schedule", "40", fill), same("joint", "flush-threaded", fill))...)},
		{path: "string.section", array: true, note: "The screen; it takes the pipe of the riser above it.", vals: with([]value{same("kind", "screen", keep)},
			with(iv(25, 35, 7.6, 10.6), per("slot_number", 10.0, 10.0, fill), same("type", "slotted", fill))...)},
		{path: "fill", array: true, note: "Annular fills, bottom up: the filter pack around the screen.", vals: with(iv(23, 36, 7.0, 11.0),
			with([]value{same("material", "filter-pack", keep), same("product", "silica sand", fill), same("gradation", "20/40", fill), same("method", "poured", fill)},
				amounts(bags(9, 9, 50, 25)...)...)...)},
		{path: "fill", array: true, note: "Fine sand between the pack and the seal, keeping bentonite out of the pack.", vals: with(iv(21.5, 23, 6.55, 7.0),
			with([]value{same("material", "fine-sand", keep), same("gradation", "30/70", fill), same("method", "poured", fill)},
				amounts(bags(1, 1, 50, 25)...)...)...)},
		{path: "fill", array: true, note: "The bentonite seal above the pack.", vals: with(iv(18.5, 21.5, 5.6, 6.55),
			with([]value{same("material", "bentonite-chips", keep), per("product", "3/8-in chips, hydrated in lifts", "10 mm chips, hydrated in lifts", fill), same("method", "poured", fill)},
				amounts(bags(2, 2, 50, 25)...)...)...)},
		{path: "fill", array: true, note: "Grout from the seal to below the pad.", vals: with(iv(1.5, 18.5, 0.45, 5.6),
			with([]value{same("material", "cement-bentonite", keep), same("method", "tremie", fill)},
				amounts(per("volume", 6.4, 180.0, fill))...)...)},
		{path: "fill", array: true, note: "Concrete of the surface completion.", vals: with(iv(0, 1.5, 0, 0.45),
			same("material", "concrete", keep), same("method", "poured", fill))},
	}
	parts = append(parts, lithologyParts(
		with(iv(0, 17, 0, 5.2), same("uscs", "SM", fill), same("description", "Silty SAND, fine, light olive brown, moist", fill)),
		with(iv(17, 36, 5.2, 11.0), same("uscs", "SP", fill), per("description", "Poorly graded SAND, fine to medium, grey, wet below 26 ft", "Poorly graded SAND, fine to medium, grey, wet below 8 m", fill)),
	)...)
	if !planned {
		parts = append(parts, part{path: "water_level", array: true, vals: []value{
			per("depth", 25.2, 7.7, fill), same("reference", "ground", fill), same("kind", "static", fill), same("measured", "2026-03-20T08:15:00", fill),
		}})
	}
	return append(parts, flushMount(8, 200)...)
}

func nestedWell(o Options) []part {
	shallow, deep := o.ID+"S", o.ID+"D"
	str := func(name string) part {
		return part{path: "string", array: true, vals: []value{
			same("name", name, keep), same("top_cap", "locking expansion plug", fill), same("bottom_cap", "threaded end plug", fill),
		}}
	}
	riser := func(bottomFt, bottomM float64) part {
		return part{path: "string.section", array: true, vals: with([]value{same("kind", "riser", keep)},
			with(iv(0.32, bottomFt, 0.1, bottomM), same("material", "PVC", fill), per("size", "2", "DN50", fill), same("schedule", "40", fill), same("joint", "flush-threaded", fill))...)}
	}
	screen := func(topFt, bottomFt, topM, bottomM float64) part {
		return part{path: "string.section", array: true, vals: with([]value{same("kind", "screen", keep)},
			with(iv(topFt, bottomFt, topM, bottomM), per("slot_number", 10.0, 10.0, fill))...)}
	}
	fillOf := func(note, material string, v []value, more ...value) part {
		return part{path: "fill", array: true, note: note, vals: with(v, with([]value{same("material", material, keep)}, more...)...)}
	}
	parts := []part{
		unitsPart(),
		wellPart(o, "active", per("total_depth", 82.0, 25.0, fill), true),
		drillingPart("hollow-stem auger"),
		locationPart(),
		elevationPart(412.36, 412.04, 125.69, 125.59),
		{path: "borehole", array: true, vals: with(iv(0, 82, 0, 25.0), per("diameter", 11.0, 280.0, fill), same("method", "hollow-stem auger", fill))},
		{path: "string", array: true, note: "The shallow well of the nest.", vals: str(shallow).vals},
		riser(30, 9.1),
		screen(30, 40, 9.1, 12.2),
		{path: "string", array: true, note: "The deep well of the nest.", vals: str(deep).vals},
		riser(70, 21.3),
		screen(70, 80, 21.3, 24.4),
		fillOf("Annular fills, bottom up: the deep well's pack.", "filter-pack", iv(67, 82, 20.4, 25.0), with([]value{same("gradation", "20/40", fill)}, bags(19, 19, 50, 25)...)...),
		fillOf("", "fine-sand", iv(66, 67, 20.1, 20.4), with([]value{same("gradation", "30/70", fill)}, bags(1.5, 1.5, 50, 25)...)...),
		fillOf("The deep well's seal.", "bentonite-pellets", iv(62, 66, 18.9, 20.1), bags(4, 4, 50, 25)...),
		fillOf("Grout between the two screened zones.", "bentonite-grout", iv(46, 62, 14.0, 18.9), per("volume", 10.4, 290.0, fill)),
		fillOf("", "bentonite-chips", iv(43, 46, 13.1, 14.0), bags(3, 3, 50, 25)...),
		fillOf("The shallow well's pack.", "filter-pack", iv(28, 43, 8.5, 13.1), with([]value{same("gradation", "20/40", fill)}, bags(18, 18, 50, 25)...)...),
		fillOf("", "fine-sand", iv(27, 28, 8.2, 8.5), with([]value{same("gradation", "30/70", fill)}, bags(1, 1, 50, 25)...)...),
		fillOf("The shallow well's seal.", "bentonite-chips", iv(24, 27, 7.3, 8.2), bags(3, 3, 50, 25)...),
		fillOf("Grout to below the pad.", "cement-bentonite", iv(1.5, 24, 0.45, 7.3), same("method", "tremie", fill), per("volume", 15.0, 390.0, fill)),
		fillOf("Concrete of the surface completion.", "concrete", iv(0, 1.5, 0, 0.45)),
	}
	parts = append(parts, lithologyParts(
		with(iv(0, 25, 0, 7.6), same("uscs", "SM", fill), same("description", "Silty SAND, moist", fill)),
		with(iv(25, 45, 7.6, 13.7), same("uscs", "SP", fill), same("description", "SAND, fine to medium, wet", fill)),
		with(iv(45, 64, 13.7, 19.5), same("uscs", "CL", fill), same("description", "Lean CLAY, stiff", fill)),
		with(iv(64, 82, 19.5, 25.0), same("uscs", "SW", fill), same("description", "Well-graded SAND with gravel, wet", fill)),
	)...)
	level := func(note, name string, ft, m float64, at string) part {
		return part{path: "water_level", array: true, note: note, vals: []value{
			same("string", name, keep), per("depth", ft, m, fill), same("reference", "ground", fill), same("kind", "static", fill), same("measured", at, fill),
		}}
	}
	parts = append(parts,
		level("Each well of the nest has its own head: name the string a level was measured in.", shallow, 26.1, 7.95, "2026-03-20T08:15:00"),
		level("", deep, 29.4, 8.96, "2026-03-20T08:30:00"))
	return append(parts, flushMount(12, 300)...)
}

func rockWell(o Options) []part {
	parts := []part{
		unitsPart(),
		wellPart(o, "active", per("total_depth", 150.0, 45.0, fill), true),
		drillingPart("mud rotary to the casing seat, air rotary below"),
		locationPart(),
		elevationPart(421.70, 423.20, 128.53, 128.98),
		{path: "borehole", array: true, note: "The hole for the surface casing.", vals: with(iv(0, 40, 0, 12.0), per("diameter", 11.0, 280.0, fill), same("method", "mud rotary", fill))},
		{path: "borehole", array: true, note: "The open hole in rock below the casing seat.", vals: with(iv(40, 150, 12.0, 45.0), per("diameter", 6.0, 152.0, fill), same("method", "air rotary hammer", fill))},
		{path: "casing", array: true, vals: with([]value{same("name", "surface", keep), same("kind", "surface", keep)},
			with(iv(-1.5, 40, -0.45, 12.0), same("material", "carbon steel", fill), per("size", "6", "DN150", fill), same("schedule", "40", fill), same("joint", "welded", fill))...)},
		{path: "fill", array: true, note: "The grout seal around the surface casing, placed by tremie from the seat up.", vals: with(iv(0, 40, 0, 12.0),
			same("material", "neat-cement", keep), same("method", "tremie", fill), per("bags", 15.0, 14.0, fill), per("bag_mass", 94.0, 42.6, fill))},
		{path: "open_hole", array: true, vals: iv(40, 150, 12.0, 45.0)},
	}
	parts = append(parts, lithologyParts(
		with(iv(0, 8, 0, 2.4), same("uscs", "CL", fill), same("description", "Lean CLAY, brown", fill)),
		with(iv(8, 31, 2.4, 9.4), same("uscs", "GM", fill), same("description", "Silty GRAVEL, wet", fill)),
		with(iv(31, 35, 9.4, 10.7), same("rock", "granite", fill), same("weathering", "highly-weathered", fill), same("description", "Weathered granite, friable", fill)),
		with(iv(35, 150, 10.7, 45.0), same("rock", "granite", fill), same("description", "Granite, grey, fractured at depth", fill)),
	)...)
	parts = append(parts,
		part{path: "water_level", array: true, vals: []value{
			per("depth", 41.3, 12.6, fill), same("reference", "measuring-point", fill), same("kind", "static", fill), same("measured", "2026-04-10T10:30:00", fill),
		}},
		part{path: "surface", vals: []value{same("kind", "stick-up", keep), same("lock", "sanitary well seal, bolted", fill), same("drainage", "pad sloped away from the casing", fill)}},
		part{path: "surface.pad", vals: []value{per("length", 5.0, 1.5, fill), per("width", 5.0, 1.5, fill), per("thickness", 0.33, 0.1, fill)}},
	)
	return parts
}

func supplyWell(o Options) []part {
	parts := []part{
		unitsPart(),
		wellPart(o, "active", per("total_depth", 120.0, 36.0, fill), true),
		drillingPart("mud rotary"),
		locationPart(),
		elevationPart(415.0, 416.5, 126.5, 126.95),
		{path: "borehole", array: true, vals: with(iv(0, 120, 0, 36.0), per("diameter", 14.0, 356.0, fill), per("method", "mud rotary, 14-in bit", "mud rotary, 356 mm bit", fill))},
		{path: "string", array: true, vals: []value{same("name", o.ID, keep), same("top_cap", "sanitary well seal with vent", fill), same("bottom_cap", "welded steel bottom plate", fill)}},
		{path: "string.section", array: true, note: "The casing (riser), from its stick-up down to the screen.", vals: with([]value{same("kind", "riser", keep)},
			with(iv(-1.5, 80, -0.45, 24.0), same("material", "carbon steel", fill), per("size", "6", "DN150", fill), same("schedule", "40", fill), same("joint", "welded", fill))...)},
		{path: "string.section", array: true, vals: with([]value{same("kind", "screen", keep)},
			with(iv(80, 110, 24.0, 33.0), same("material", "304 stainless steel", fill), per("size", "6", "DN150", fill), same("schedule", "10S", fill), per("slot_number", 40.0, 40.0, fill), same("type", "continuous-wrap", fill))...)},
		{path: "string.section", array: true, note: "A sump below the screen to hold settled fines.", vals: with([]value{same("kind", "sump", keep)},
			with(iv(110, 115, 33.0, 34.5), same("material", "carbon steel", fill), per("size", "6", "DN150", fill), same("schedule", "40", fill))...)},
		{path: "fill", array: true, note: "Annular fills, bottom up: the filter pack.", vals: with(iv(75, 120, 22.5, 36.0),
			same("material", "filter-pack", keep), same("gradation", "8/16", fill), same("method", "tremie", fill), per("bags", 42.0, 74.0, fill), per("bag_mass", 100.0, 25.0, fill))},
		{path: "fill", array: true, note: "The bentonite seal above the pack.", vals: with(iv(70, 75, 21.0, 22.5),
			same("material", "bentonite-pellets", keep), same("method", "poured", fill), per("bags", 6.0, 6.0, fill), per("bag_mass", 50.0, 25.0, fill))},
		{path: "fill", array: true, note: "The sanitary seal: neat cement by tremie from the bentonite seal to ground.", vals: with(iv(0, 70, 0, 21.0),
			same("material", "neat-cement", keep), same("method", "tremie", fill), per("bags", 52.0, 52.0, fill), per("bag_mass", 94.0, 42.6, fill))},
	}
	parts = append(parts, lithologyParts(
		with(iv(0, 18, 0, 5.5), same("uscs", "CL", fill), same("description", "Lean CLAY, brown", fill)),
		with(iv(18, 72, 5.5, 21.5), same("uscs", "CL-ML", fill), same("description", "Silty CLAY", fill)),
		with(iv(72, 120, 21.5, 36.0), same("uscs", "GW", fill), same("description", "Well-graded GRAVEL with sand, wet", fill)),
	)...)
	return append(parts,
		part{path: "water_level", array: true, vals: []value{
			per("depth", 45.0, 13.7, fill), same("reference", "ground", fill), same("kind", "static", fill), same("measured", "2026-05-19T07:00:00", fill),
		}},
		part{path: "surface", vals: []value{same("kind", "stick-up", keep), same("lock", "locking well cap", fill), same("drainage", "pad sloped away from the casing", fill)}},
		part{path: "surface.pad", vals: []value{per("length", 6.0, 1.8, fill), per("width", 6.0, 1.8, fill), per("thickness", 0.5, 0.15, fill)}},
	)
}
