package schema

import (
	"path"
	"strconv"
	"strings"
)

// Bounds on what one well file may ask for, so no input exhausts memory.
const (
	maxTracePoints = 360
	maxWallImages  = 50
)

var featureKindNames = stringsOf(FeatureKinds)

// features reads [orientation], [[wall_image]] and [[feature]]; the
// boreholes must be read already, since picks take the hole diameter
// from them.
func (r *reader) features(root *table, w *Well) {
	w.Orientation = Orientation{North: TrueNorth}
	if t := root.sub("orientation"); t != nil {
		w.Orientation = r.orientation(t)
	}
	images := root.list("wall_image")
	if len(images) > maxWallImages {
		r.errAt("wall_image", "%d [[wall_image]] tables; at most %d are read", len(images), maxWallImages)
		images = images[:maxWallImages]
	}
	for i, t := range images {
		w.WallImages = append(w.WallImages, r.wallImage(t, i, w))
	}
	for _, t := range root.list("feature") { // at most MaxFeatures
		f, ok := r.feature(t, w)
		if !ok {
			continue
		}
		o, err := w.orient(&f)
		if err != nil {
			where, key := "", t.path
			if f.Picks != nil {
				key = t.keyPath("points")
				if f.Picks.HighLowGiven {
					key = t.keyPath("trace_high")
				}
				top, bot := f.Picks.Span()
				where = " picked at " + w.Units.FormatInterval(top, bot)
			}
			r.errAt(key, "%s%s: %v", f.Kind.Label(), where, err)
			continue
		}
		f.Orient = o
		if f.Picks != nil && !t.Has("depth") {
			f.Depth = Length(o.Picked.Fit.A)
		}
		w.Features = append(w.Features, f)
	}
}

func (r *reader) orientation(t *table) Orientation {
	defer t.done()
	o := Orientation{North: NorthReference(t.oneOf("north")), Given: true, Pos: r.at(t.path)}
	if o.North == "" {
		o.North = TrueNorth
		if !t.Has("north") {
			r.errAt(t.path, "missing required key \"north\" in [orientation] (\"true\" or \"magnetic\")")
		}
	}
	dec, hasDec := t.num("declination")
	switch {
	case o.North == MagneticNorth && !hasDec:
		r.errAt(t.path, "north = \"magnetic\" needs the declination (degrees, east positive) to turn azimuths to true north")
	case o.North == TrueNorth && hasDec && dec != 0:
		r.errAt(t.keyPath("declination"), "declination applies to north = \"magnetic\" only; azimuths from true north need none")
	case hasDec && (dec < -90 || dec > 90):
		r.errAt(t.keyPath("declination"), "declination %v is outside -90..90 degrees", dec)
	default:
		o.Declination = dec
	}
	return o
}

func (r *reader) wallImage(t *table, i int, w *Well) WallImage {
	defer t.done()
	im := WallImage{Name: t.str("name"), File: t.reqStr("file"), Interval: r.interval(t, w.Units, false), Pos: r.at(t.path), Path: t.path, Clockwise: true}
	if im.Name == "" {
		im.Name = "image-" + strconv.Itoa(i+1)
	}
	for _, o := range w.WallImages {
		if o.Name == im.Name {
			r.errAt(t.keyPath("name"), "name %q is used twice (also %s)", im.Name, o.Path)
		}
	}
	if f := strings.ToLower(path.Ext(strings.ReplaceAll(im.File, "\\", "/"))); im.File != "" && !oneOfStr(f, ".png", ".jpg", ".jpeg", ".tif", ".tiff") {
		r.errAt(t.keyPath("file"), "file %q is not a PNG, JPEG or TIFF image (by its extension)", im.File)
	}
	im.LeftAzimuth = r.azimuth(t, "left_azimuth", false)
	switch t.oneOf("direction") {
	case "counterclockwise":
		im.Clockwise = false
	}
	return im
}

func (r *reader) feature(t *table, w *Well) (Feature, bool) {
	defer t.done()
	u := w.Units
	f := Feature{Pos: r.at(t.path), Path: t.path, Note: t.str("note"), Image: t.str("image")}
	nerr := len(r.errs)
	if !t.Has("kind") {
		r.errAt(t.path, "missing required key \"kind\" in [[feature]] (one of: %s)", strings.Join(featureKindNames, ", "))
	}
	f.Kind = FeatureKind(t.oneOf("kind"))
	f.Confidence = Confidence(t.oneOf("confidence"))
	if v, ok := t.nonNegative("depth"); ok {
		f.Depth = LengthFrom(v, u.Depth)
	}
	if v, ok := t.positive("aperture"); ok {
		f.Aperture = DiameterFrom(v, u.Diameter)
	}
	if v, ok := t.nonNegative("inflow"); ok {
		vu, _ := InflowUnit(u)
		f.Inflow, f.HasInflow = VolumeFrom(v, vu), true
	}
	if v, ok := t.positive("caliper"); ok {
		f.Caliper = DiameterFrom(v, u.Diameter)
	}
	if f.Image != "" {
		if _, ok := w.WallImageNamed(f.Image); !ok {
			r.errAt(t.keyPath("image"), "image = %q names no [[wall_image]]", f.Image)
		}
	}

	// Orientation: given, picked, or both (then they are compared).
	if t.Has("dip") || t.Has("dip_direction") {
		if !t.Has("dip") || !t.Has("dip_direction") {
			r.errAt(t.path, "give dip and dip_direction together")
		}
		dip, _ := t.num("dip")
		if dip < 0 || dip > 90 {
			r.errAt(t.keyPath("dip"), "dip %v is outside 0..90 degrees", dip)
		}
		f.Given = &Attitude{Dip: dip, DipDirection: r.azimuth(t, "dip_direction", true)}
	}
	highLow := t.Has("trace_high") || t.Has("trace_low") || t.Has("low_azimuth")
	points := t.Has("points")
	switch {
	case highLow && points:
		r.errAt(t.keyPath("points"), "give trace_high, trace_low and low_azimuth, or points, not both")
	case highLow:
		if !t.Has("trace_high") || !t.Has("trace_low") || !t.Has("low_azimuth") {
			r.errAt(t.path, "picks by the trace's ends need trace_high, trace_low and low_azimuth")
		}
		hi, _ := t.nonNegative("trace_high")
		lo, _ := t.nonNegative("trace_low")
		if lo < hi {
			r.errAt(t.keyPath("trace_low"), "trace_low = %v is above trace_high = %v (the low point is the deeper one)", lo, hi)
		}
		f.Picks = &Picks{High: LengthFrom(hi, u.Depth), Low: LengthFrom(lo, u.Depth), LowAzimuth: r.azimuth(t, "low_azimuth", true), HighLowGiven: true}
	case points:
		f.Picks = &Picks{Points: r.tracePoints(t, u)}
	}
	if f.Picks == nil && f.Caliper > 0 {
		r.errAt(t.keyPath("caliper"), "caliper is the hole diameter for picks; this feature has none")
	}
	if f.Picks == nil && !t.Has("depth") {
		r.errAt(t.path, "missing required key \"depth\" in [[feature]] (or picks that fix it)")
	}
	if f.Picks != nil && t.Has("depth") && f.Picks.HighLowGiven && (f.Depth < f.Picks.High || f.Depth > f.Picks.Low) {
		r.errAt(t.keyPath("depth"), "depth %s lies outside the picked trace (%s)", u.FormatDepth(f.Depth), u.FormatInterval(f.Picks.High, f.Picks.Low))
	}
	return f, len(r.errs) == nerr
}

// azimuth reads an angle in [0, 360]; 360 is taken as 0.
func (r *reader) azimuth(t *table, k string, required bool) float64 {
	v, ok := t.num(k)
	if !ok {
		if required && !t.Has(k) {
			r.errAt(t.path, "missing required key %q in [%s]", k, stripIndex(t.path))
		}
		return 0
	}
	if v < 0 || v > 360 {
		r.errAt(t.keyPath(k), "%s %v is outside 0..360 degrees", k, v)
		return 0
	}
	return NormAzimuth(v)
}

// tracePoints reads points = [[azimuth, depth], ...].
func (r *reader) tracePoints(t *table, u Units) []TracePoint {
	k := "points"
	v, _ := t.get(k, TypeNumberPairs)
	arr, ok := v.([]any)
	if !ok {
		r.errAt(t.keyPath(k), "points must be an array of [azimuth, depth] pairs, not %s", typeName(v))
		return nil
	}
	if len(arr) < 3 || len(arr) > maxTracePoints {
		r.errAt(t.keyPath(k), "points holds %d pairs; give 3 to %d [azimuth, depth] pairs", len(arr), maxTracePoints)
		return nil
	}
	out := make([]TracePoint, 0, len(arr))
	for i, e := range arr {
		pair, ok := e.([]any)
		if !ok || len(pair) != 2 {
			r.errAt(t.keyPath(k), "points[%d] must be an [azimuth, depth] pair", i)
			return nil
		}
		nums, ok := NumberPair(pair)
		if !ok {
			for _, x := range pair {
				if _, isNum := Number(x); !isNum {
					r.errAt(t.keyPath(k), "points[%d] must hold two numbers, found %s", i, typeName(x))
					break
				}
			}
			return nil
		}
		// 1e6 (ft or m), far beyond any real borehole's depth, only keeps
		// an absurd number out of the trace's arithmetic
		if !(nums[0] >= 0 && nums[0] <= 360) || !(nums[1] >= 0 && nums[1] < 1e6) {
			r.errAt(t.keyPath(k), "points[%d] = [%v, %v]: azimuth must be 0..360 degrees and depth at or below ground", i, nums[0], nums[1])
			return nil
		}
		out = append(out, TracePoint{Azimuth: NormAzimuth(nums[0]), Depth: LengthFrom(nums[1], u.Depth)})
	}
	return out
}

func oneOfStr(s string, l ...string) bool {
	for _, x := range l {
		if s == x {
			return true
		}
	}
	return false
}
