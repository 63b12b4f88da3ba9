package exchange

// valueType is the TOML type a key's cell is written as.
type valueType int

const (
	tString valueType = iota
	tNumber
	tInteger
	tBool
	tDate
	tDateTime // a date, or a date and time
	tStrings  // one per line in the cell
	tNumbers  // separated by ";"
	tPairs    // "a b; c d" for [[a, b], [c, d]]
)

var numberKeys = map[string]bool{}

func init() {
	for _, k := range []string{"top", "bottom", "depth", "diameter", "od", "id", "sdr", "slot", "slot_number",
		"bags", "bag_mass", "volume", "yield", "after_bags", "grain_min", "grain_max", "total_depth", "easting",
		"northing", "latitude", "longitude", "ground", "measuring_point", "height", "intake", "length", "width",
		"thickness", "declination", "dip", "dip_direction", "aperture", "trace_high", "trace_low", "low_azimuth",
		"left_azimuth", "inflow", "caliper"} {
		numberKeys[k] = true
	}
}

// typeOf is the type of a key of a table ("well", "fill", "surface.pad").
func typeOf(table, key string) valueType {
	switch {
	case table == "units", table == "well" && key == "id", table == "measuring_point" && key != "height":
		return tString
	case key == "bollards":
		return tInteger
	case key == "drive_shoe":
		return tBool
	case key == "drilled", key == "completed", key == "surveyed", key == "date":
		return tDate
	case key == "measured":
		return tDateTime
	case key == "notes":
		return tStrings
	case key == "centralizers":
		return tNumbers
	case key == "points":
		return tPairs
	case numberKeys[key]:
		return tNumber
	}
	return tString
}
