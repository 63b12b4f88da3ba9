package exchange

import "time"

// Template is an empty workbook in the layout (every named column, its
// note, the validation lists) holding one invented example well, EX-1, to
// copy from or delete.
func Template(date time.Time) ([]byte, error) {
	b := &book{}
	t, n := textValue, numValue
	b.wells = []map[string]value{{
		"well_id": t("EX-1"), "purpose": t("monitoring"), "status": t("active"),
		"depth_unit": t("ft"), "diameter_unit": t("in"), "total_depth": n(45),
		"drilled": t("2026-04-14"), "completed": t("2026-04-14"), "permit": t("EX-PERMIT-001"),
		"logged_by": t("A. Example"), "notes": t("Example well: replace or delete this row and its intervals."),
		"drilling_method": t("hollow-stem auger"), "contractor": t("Example Drilling Co."),
		"location": t("Example location, 20 ft north of the gate"),
		"easting":  n(612345.0), "northing": n(4178901.0), "crs": t("EPSG:32610"), "coordinate_system": t("WGS 84 / UTM zone 10N"),
		"ground_elevation": n(120.45), "measuring_point_elevation": n(120.12), "elevation_datum": t("NAVD88"), "surveyed": t("2026-04-20"),
		"surface": t("flush-mount"), "vault_diameter": n(8), "vault_depth": n(1), "vault_cover": t("bolted steel lid"),
		"pad_length": n(2), "pad_width": n(2), "pad_thickness": n(0.5),
	}}
	row := func(kind string, kv ...any) map[string]value {
		r := map[string]value{"well_id": t("EX-1"), "kind": t(kind)}
		for i := 0; i+1 < len(kv); i += 2 {
			switch v := kv[i+1].(type) {
			case string:
				r[kv[i].(string)] = t(v)
			case float64:
				r[kv[i].(string)] = n(v)
			case int:
				r[kv[i].(string)] = n(float64(v))
			}
		}
		return r
	}
	b.intervals = []map[string]value{
		row("borehole", "top", 0, "bottom", 1, "diameter", 16, "method", "post-hole auger, for the vault"),
		row("borehole", "top", 1, "bottom", 45, "diameter", 8.25, "method", "hollow-stem auger"),
		row("string", "name", "EX-1", "top_cap", "locking expansion plug", "bottom_cap", "threaded end plug"),
		row("riser", "string", "EX-1", "top", 0.33, "bottom", 34, "material", "PVC", "size", "2", "schedule", "40", "joint", "flush-threaded"),
		row("screen", "string", "EX-1", "top", 34, "bottom", 44, "material", "PVC", "size", "2", "schedule", "40", "slot_number", 10, "type", "slotted"),
		row("fill", "top", 32, "bottom", 45, "material", "filter-pack", "gradation", "20/40", "method", "poured", "bags", 9, "bag_mass", 50),
		row("tag", "after_bags", 9, "depth", 32.1),
		row("fill", "top", 29, "bottom", 32, "material", "bentonite-chips", "method", "poured", "bags", 2, "bag_mass", 50),
		row("fill", "top", 1, "bottom", 29, "material", "cement-bentonite", "method", "tremie"),
		row("fill", "top", 0, "bottom", 1, "material", "concrete"),
		row("lithology", "top", 0, "bottom", 12, "uscs", "ML", "description", "Sandy SILT, brown, moist"),
		row("lithology", "top", 12, "bottom", 30, "uscs", "SM", "description", "Silty SAND, fine, grey-brown, wet below 31 ft"),
		row("lithology", "top", 30, "bottom", 45, "uscs", "SP", "description", "Poorly graded SAND, medium, grey, wet"),
		row("water-level", "depth", 30.6, "reference", "ground", "water_level_kind", "static", "measured", "2026-04-20T09:00:00"),
	}
	b.settleColumns()
	return (&Workbook{b: b}).XLSX(date)
}
