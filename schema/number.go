package schema

// Number reads a TOML number, integer or float, as a float64: the TOML
// parser hands integers over as int64, and a depth of 12 is as good as
// 12.0.
func Number(v any) (float64, bool) {
	switch n := v.(type) {
	case int64:
		return float64(n), true
	case float64:
		return n, true
	}
	return 0, false
}

// NumberPair reads a TOML array of exactly two numbers, such as an
// [easting, northing] bend point or an [azimuth, depth] trace point.
func NumberPair(v any) ([2]float64, bool) {
	var p [2]float64
	arr, ok := v.([]any)
	if !ok || len(arr) != 2 {
		return p, false
	}
	for i, e := range arr {
		if p[i], ok = Number(e); !ok {
			return p, false
		}
	}
	return p, true
}
