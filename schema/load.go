package schema

import (
	"fmt"
	"strconv"
	"strings"

	"github.com/tremie-dev/tremie/schema/crs"
)

// LoadFile reads and checks one well file. A rejected file yields an
// ErrorList naming every problem with its line.
func LoadFile(path string) (*Well, error) {
	data, err := ReadInput(path, MaxTextFile)
	if err != nil {
		return nil, ErrorList{ReadError(path, "", err)}
	}
	return Load(path, data)
}

// Load parses a well file's bytes; name is used in positions.
func Load(name string, data []byte) (*Well, error) {
	src := string(data)
	raw, err := decode(name, data, src)
	if err != nil {
		return nil, err
	}
	r := &reader{file: name, src: src, heads: scanHeaderLines(src)}
	w := r.well(r.root(raw))
	if len(r.errs) > 0 {
		r.errs.Sort()
		return nil, r.errs
	}
	w.keys = &keyIndex{src: src, lines: r.lines}
	w.Placeholders = findPlaceholders(src)
	return w, nil
}

// at is the position of a part of the well: the line of its table header,
// or else of the key or table nearest it.
func (r *reader) at(path string) Pos {
	if line, ok := r.heads[path]; ok {
		return Pos{File: r.file, Line: line}
	}
	if r.lines == nil {
		r.lines = scanKeyLines(r.src)
	}
	line, ok := r.lines[path]
	for q := path; !ok && q != ""; q = parentPath(q) {
		line, ok = r.lines[q]
	}
	if line == 0 {
		line = 1
	}
	return Pos{File: r.file, Line: line}
}

// purposeNames and materialNames are Purposes and Materials as the strings
// a file may give, made once rather than for every well and fill.
var (
	purposeNames  = stringsOf(Purposes)
	materialNames = stringsOf(Materials)
)

func stringsOf[S ~string](l []S) []string {
	out := make([]string, len(l))
	for i, s := range l {
		out[i] = string(s)
	}
	return out
}

func (r *reader) well(root *table) *Well {
	w := &Well{Pos: Pos{File: r.file, Line: 1}}
	w.Units = r.units(root.sub("units"), root)

	wt := root.sub("well")
	if wt == nil {
		r.errAt("", "missing required table [well]")
		wt = &table{r: r, path: "well", m: map[string]any{}}
	}
	w.ID = wt.reqStr("id")
	w.Project = wt.str("project")
	w.Client = wt.str("client")
	w.Site = wt.str("site")
	if _, ok := wt.m["purpose"]; !ok {
		r.errAt("well", "missing required key \"purpose\" in [well] (one of: %s)", strings.Join(purposeNames, ", "))
	}
	w.Purpose = Purpose(wt.oneOf("purpose"))
	w.Status = wt.str("status")
	w.Drilled = wt.date("drilled")
	w.Completed = wt.date("completed")
	w.Permit = wt.str("permit")
	w.LoggedBy = wt.str("logged_by")
	w.CheckedBy = wt.str("checked_by")
	w.Notes = wt.strings("notes")
	if _, ok := wt.m["total_depth"]; !ok {
		r.errAt("well", "missing required key \"total_depth\" in [well]")
	} else if td, ok := wt.positive("total_depth"); ok {
		w.TotalDepth = LengthFrom(td, w.Units.Depth)
	}
	wt.done()

	if t := root.sub("drilling"); t != nil {
		w.Drilling = Drilling{Method: t.str("method"), Contractor: t.str("contractor"), Licence: t.str("licence"), Driller: t.str("driller")}
		t.done()
	}
	if t := root.sub("location"); t != nil {
		w.Location = r.location(t)
	}
	if t := root.sub("elevation"); t != nil {
		w.Elevation = r.elevation(t, w.Units)
	}
	for _, t := range root.list("borehole") {
		iv := r.interval(t, w.Units, false)
		b := BoreholeSection{Interval: iv, Method: t.str("method"), Pos: r.at(t.path), Path: t.path}
		if _, ok := t.m["diameter"]; !ok {
			r.errAt(t.path, "missing required key \"diameter\" in [[borehole]]")
		}
		if d, ok := t.positive("diameter"); ok {
			b.Diameter = DiameterFrom(d, w.Units.Diameter)
		}
		t.done()
		w.Boreholes = append(w.Boreholes, b)
	}
	if len(w.Boreholes) == 0 {
		r.errAt("", "no [[borehole]] section: give at least one with top, bottom and diameter")
	}
	for _, t := range root.list("casing") {
		w.Casings = append(w.Casings, r.casing(t, w.Units))
	}
	for i, t := range root.list("string") {
		w.Strings = append(w.Strings, r.wellString(t, i, w.Units))
	}
	r.uniqueNames(w)
	r.checkLiners(w)
	for _, t := range root.list("fill") {
		w.Fills = append(w.Fills, r.fill(t, w))
	}
	for _, t := range root.list("open_hole") {
		w.OpenHoles = append(w.OpenHoles, OpenHole{Interval: r.interval(t, w.Units, false), Pos: r.at(t.path), Path: t.path})
		t.done()
	}
	for _, t := range root.list("lithology") {
		w.Lithology = append(w.Lithology, r.layer(t, w.Units))
	}
	// before the water levels, which may be measured from it
	if t := root.sub("measuring_point"); t != nil {
		w.MeasuringPoint = r.measuringPoint(t, w)
	}
	for _, t := range root.list("water_level") {
		w.WaterLevels = append(w.WaterLevels, r.waterLevel(t, w))
	}
	for _, t := range root.list("sample") {
		w.Samples = append(w.Samples, r.sample(t, w))
	}
	if t := root.sub("surface"); t != nil {
		w.Surface = r.surface(t, w.Units)
	}
	if t := root.sub("pump"); t != nil {
		w.Pump = r.pump(t, w)
	}
	if t := root.sub("pumping_test"); t != nil {
		w.PumpingTest = r.pumpingTest(t, w)
	}
	r.features(root, w)
	for _, t := range root.list("waiver") {
		wv := Waiver{Rule: t.reqStr("rule"), Reason: t.reqStr("reason"), ApprovedBy: t.reqStr("approved_by"), Date: t.date("date"), Pos: r.at(t.path)}
		t.done()
		w.Waivers = append(w.Waivers, wv)
	}
	root.done()
	return w
}

func (r *reader) units(t *table, root *table) Units {
	if t == nil {
		r.errAt("", "missing required table [units]: declare depth = \"ft\" or \"m\" once per file")
		return DefaultUnits(Feet)
	}
	defer t.done()
	if _, ok := t.m["depth"]; !ok {
		r.errAt("units", "missing required key \"depth\" in [units] (\"ft\" or \"m\")")
	}
	depth := DepthUnit(t.oneOf("depth"))
	if depth == "" {
		depth = Feet
	}
	u := DefaultUnits(depth)
	if d := t.oneOf("diameter"); d != "" {
		u.Diameter = DiameterUnit(d)
	}
	if m := t.oneOf("mass"); m != "" {
		u.Mass = MassUnit(m)
	}
	if v := t.oneOf("volume"); v != "" {
		u.Volume = VolumeUnit(v)
	}
	return u
}

func (r *reader) location(t *table) Location {
	defer t.done()
	l := Location{Description: t.str("description"), System: t.str("system"), CRS: t.str("crs")}
	if l.CRS != "" {
		if _, err := crs.Parse(l.CRS); err != nil {
			r.errAt(t.keyPath("crs"), "%v", err)
		}
	}
	opt := func(k string) *float64 {
		if v, ok := t.num(k); ok {
			return &v
		}
		return nil
	}
	l.Easting, l.Northing = opt("easting"), opt("northing")
	l.Latitude, l.Longitude = opt("latitude"), opt("longitude")
	if l.Latitude != nil && (*l.Latitude < -90 || *l.Latitude > 90) {
		r.errAt(t.keyPath("latitude"), "latitude %v is outside -90..90", *l.Latitude)
	}
	if l.Longitude != nil && (*l.Longitude < -180 || *l.Longitude > 180) {
		r.errAt(t.keyPath("longitude"), "longitude %v is outside -180..180", *l.Longitude)
	}
	return l
}

func (r *reader) elevation(t *table, u Units) Elevation {
	defer t.done()
	e := Elevation{Datum: t.str("datum"), Surveyed: t.date("surveyed"), Pos: r.at(t.path)}
	if v, ok := t.num("ground"); ok {
		l := LengthFrom(v, u.Depth)
		e.Ground = &l
	}
	if v, ok := t.num("measuring_point"); ok {
		l := LengthFrom(v, u.Depth)
		e.MeasuringPoint = &l
	}
	return e
}

// interval reads top and bottom; aboveGround allows a negative top.
func (r *reader) interval(t *table, u Units, aboveGround bool) Interval {
	top := t.reqNum("top")
	bottom := t.reqNum("bottom")
	if !aboveGround && top < 0 {
		r.errAt(t.keyPath("top"), "top = %v is above ground; only casings, strings and the protective casing may stick up", top)
	}
	if _, ok := t.m["top"]; ok {
		if _, ok := t.m["bottom"]; ok && !(top < bottom) {
			r.errAt(t.keyPath("bottom"), "bottom = %v is not below top = %v (depths grow downward)", bottom, top)
		}
	}
	return Interval{Top: LengthFrom(top, u.Depth), Bottom: LengthFrom(bottom, u.Depth)}
}

func (r *reader) pipe(t *table, u Units) Pipe {
	p := Pipe{Material: t.str("material"), Size: t.str("size"), Schedule: t.str("schedule"), Joint: t.str("joint")}
	if v, ok := t.positive("sdr"); ok {
		if v <= 2 {
			r.errAt(t.keyPath("sdr"), "sdr = %v is too small (wall = OD / SDR must leave a bore)", v)
		} else {
			p.SDR = v
		}
	}
	od, hasOD := t.positive("od")
	id, hasID := t.positive("id")
	if err := resolvePipe(&p, od, id, hasOD, hasID, u.Diameter); err != nil {
		key := "size"
		if hasOD || hasID {
			key = "id"
		}
		r.errAt(t.keyPath(key), "%v", err)
	}
	return p
}

func (r *reader) casing(t *table, u Units) Casing {
	defer t.done()
	c := Casing{Interval: r.interval(t, u, true), Pos: r.at(t.path), Path: t.path}
	c.Kind = CasingKind(t.oneOf("kind"))
	if c.Kind == "" {
		c.Kind = SurfaceCasing
	}
	c.Name = t.str("name")
	if c.Name == "" {
		c.Name = string(c.Kind)
	}
	c.Pipe = r.pipe(t, u)
	if !c.Pipe.Known() {
		r.errAt(t.path, "casing %q: give size with schedule or sdr, or od and id", c.Name)
	}
	c.Centralizers = r.depths(t, "centralizers", u)
	c.DriveShoe = t.boolean("drive_shoe")
	return c
}

func (r *reader) depths(t *table, k string, u Units) []Length {
	var out []Length
	for _, v := range t.numbers(k) {
		out = append(out, LengthFrom(v, u.Depth))
	}
	return out
}

func (r *reader) wellString(t *table, i int, u Units) String {
	defer t.done()
	s := String{Name: t.str("name"), TopCap: t.str("top_cap"), BottomCap: t.str("bottom_cap"), Pos: r.at(t.path), Path: t.path}
	if s.Name == "" {
		s.Name = "main"
		if i > 0 {
			s.Name = fmt.Sprintf("string-%d", i+1)
		}
	}
	s.Centralizers = r.depths(t, "centralizers", u)
	s.Liner = r.liner(t)
	var prev Pipe
	for _, st := range t.list("section") {
		sec := r.section(st, u, prev)
		prev = sec.Pipe
		s.Sections = append(s.Sections, sec)
	}
	if len(s.Sections) == 0 {
		r.errAt(t.path, "string %q has no [[string.section]] (riser, screen, sump)", s.Name)
	}
	return s
}

func (r *reader) section(t *table, u Units, prev Pipe) Section {
	defer t.done()
	sec := Section{Interval: r.interval(t, u, true), Pos: r.at(t.path), Path: t.path}
	if _, ok := t.m["kind"]; !ok {
		r.errAt(t.path, "missing required key \"kind\" in [[string.section]] (riser, screen or sump)")
	}
	sec.Kind = SectionKind(t.oneOf("kind"))
	sec.Pipe = r.pipe(t, u)
	if !sec.Pipe.Known() {
		if !prev.Known() {
			r.errAt(t.path, "section: give size with schedule or sdr, or od and id (the first section of a string must)")
		}
		mat, joint := sec.Pipe.Material, sec.Pipe.Joint
		sec.Pipe = prev
		if mat != "" {
			sec.Pipe.Material = mat
		}
		if joint != "" {
			sec.Pipe.Joint = joint
		}
	}
	slot, hasSlot := t.positive("slot")
	num, hasNum := t.positive("slot_number")
	typ := t.oneOf("type")
	open, hasOpen := t.positive("open_area")
	if sec.Kind != ScreenSection {
		if hasSlot || hasNum || typ != "" || hasOpen {
			r.errAt(t.path, "slot, slot_number, type and open_area apply to screen sections only")
		}
		return sec
	}
	if hasOpen {
		if open >= 100 {
			r.errAt(t.keyPath("open_area"), "open_area = %v is not a percentage below 100", open)
		}
		sec.OpenArea = open / 100
	}
	switch {
	case hasSlot && hasNum:
		r.errAt(t.keyPath("slot_number"), "give slot or slot_number, not both")
	case hasSlot:
		sec.Slot = DiameterFrom(slot, u.Diameter)
	case hasNum:
		sec.Slot = DiameterFrom(num/1000, Inches) // slot number = thousandths of an inch
	}
	sec.ScreenType = ScreenType(typ)
	if sec.ScreenType == "" {
		sec.ScreenType = Slotted
	}
	return sec
}

func (r *reader) uniqueNames(w *Well) {
	seen := map[string]string{}
	for _, c := range w.Casings {
		if prev, dup := seen[c.Name]; dup {
			r.errAt(c.Path, "name %q is used twice (also %s)", c.Name, prev)
		}
		seen[c.Name] = c.Path
	}
	for _, s := range w.Strings {
		if prev, dup := seen[s.Name]; dup {
			r.errAt(s.Path, "name %q is used twice (also %s)", s.Name, prev)
		}
		seen[s.Name] = s.Path
	}
}

func (r *reader) fill(t *table, w *Well) Fill {
	defer t.done()
	u := w.Units
	f := Fill{Interval: r.interval(t, u, false), Pos: r.at(t.path), Path: t.path}
	if _, ok := t.m["material"]; !ok {
		r.errAt(t.path, "missing required key \"material\" in [[fill]] (one of: %s)", strings.Join(materialNames, ", "))
	}
	f.Material = Material(t.oneOf("material"))
	f.Product = t.str("product")
	f.Gradation = t.str("gradation")
	if f.Gradation != "" {
		lo, hi, err := ParseGradation(f.Gradation)
		if err != nil {
			r.errAt(t.keyPath("gradation"), "%v", err)
		}
		f.GrainMin, f.GrainMax = lo, hi
	}
	if v, ok := t.positive("grain_min"); ok {
		f.GrainMin = Diameter(v) // grain sizes are always mm
	}
	if v, ok := t.positive("grain_max"); ok {
		f.GrainMax = Diameter(v)
	}
	if f.GrainMin > 0 && f.GrainMax > 0 && f.GrainMin > f.GrainMax {
		r.errAt(t.keyPath("grain_max"), "grain_max is smaller than grain_min")
	}
	r.gradingCurve(t, &f.D10, &f.D30, &f.D60)
	f.Method = Placement(t.oneOf("method"))
	f.Within = t.str("within")
	if f.Within != "" {
		found := false
		for _, c := range w.Casings {
			found = found || c.Name == f.Within
		}
		if !found {
			r.errAt(t.keyPath("within"), "within = %q names no [[casing]]", f.Within)
		}
	}
	bags, hasBags := t.nonNegative("bags")
	mass, hasMass := t.positive("bag_mass")
	vol, hasVol := t.nonNegative("volume")
	if hasBags && hasVol {
		r.errAt(t.keyPath("volume"), "give bags or volume placed, not both")
	}
	f.Bags = bags
	if hasMass {
		f.BagMass = MassFrom(mass, u.Mass)
	}
	if hasVol {
		f.Placed = VolumeFrom(vol, u.Volume)
	}
	if y, ok := t.positive("yield"); ok {
		f.Yield = VolumeFrom(y, u.Volume)
	}
	if d, ok := t.positive("density"); ok {
		f.Density = SlurryDensityFrom(d, u)
	}
	if d, ok := t.positive("size"); ok {
		f.Size = DiameterFrom(d, u.Diameter)
	}
	if d, ok := t.nonNegative("water_inside"); ok {
		f.WaterInside, f.HasWaterInside = LengthFrom(d, u.Depth), true
	}
	for _, tt := range t.list("tag") {
		tag := Tag{Pos: r.at(tt.path), Path: tt.path}
		if _, ok := tt.m["after_bags"]; !ok {
			r.errAt(tt.path, "missing required key \"after_bags\" in [[fill.tag]]")
		}
		if v, ok := tt.nonNegative("after_bags"); ok {
			tag.AfterBags = v
		}
		if _, ok := tt.m["depth"]; !ok {
			r.errAt(tt.path, "missing required key \"depth\" in [[fill.tag]]")
		}
		if v, ok := tt.nonNegative("depth"); ok {
			tag.Depth = LengthFrom(v, u.Depth)
		}
		tt.done()
		f.Tags = append(f.Tags, tag)
	}
	return f
}

func (r *reader) layer(t *table, u Units) Layer {
	defer t.done()
	l := Layer{Interval: r.interval(t, u, false), USCS: strings.ToUpper(strings.TrimSpace(t.str("uscs"))), Rock: t.str("rock"), Description: t.str("description"), Unit: strings.TrimSpace(t.str("unit")), Pos: r.at(t.path), Path: t.path}
	switch {
	case l.USCS != "" && l.Rock != "":
		r.errAt(t.keyPath("rock"), "give uscs or rock, not both")
	case l.USCS == "" && l.Rock == "":
		r.errAt(t.path, "lithology: give uscs (an ASTM D2487 group symbol) or rock")
	case l.USCS != "":
		if msg := USCSProblem(l.USCS); msg != "" {
			r.errAt(t.keyPath("uscs"), "uscs = %q %s", l.USCS, msg)
		}
	}
	if s := t.str("weathering"); s != "" {
		g, ok := ParseWeathering(s)
		switch {
		case !ok:
			r.errAt(t.keyPath("weathering"), "weathering = %q is not a grade (fresh, slightly-weathered, moderately-weathered, highly-weathered, completely-weathered, residual-soil, or I to VI; ISRM 1981 / BS 5930)", s)
		case l.Rock == "":
			r.errAt(t.keyPath("weathering"), "weathering grades rock: give it with rock, not uscs")
		default:
			l.Weathering = g
		}
	}
	return l
}

func (r *reader) waterLevel(t *table, w *Well) WaterLevel {
	defer t.done()
	wl := WaterLevel{Pos: r.at(t.path), Path: t.path}
	if _, ok := t.m["depth"]; !ok {
		r.errAt(t.path, "missing required key \"depth\" in [[water_level]]")
	}
	d, _ := t.num("depth")
	wl.Written = LengthFrom(d, w.Units.Depth)
	wl.Reference = LevelReference(t.oneOf("reference"))
	if wl.Reference == "" {
		wl.Reference = FromGround
	}
	wl.Measured, wl.HasTime = t.instant("measured")
	wl.Kind = LevelKind(t.oneOf("kind"))
	if wl.Kind == "" {
		wl.Kind = Static
	}
	var in *String
	_, named := t.m["string"].(string) // a wrong type is reported by str
	if wl.String = t.str("string"); named {
		for i := range w.Strings {
			if w.Strings[i].Name == wl.String {
				in = &w.Strings[i]
			}
		}
		if in == nil {
			r.errAt(t.keyPath("string"), "string = %q names no [[string]]%s", wl.String, stringNames(w))
		}
	}
	wl.Depth = wl.Written
	if wl.Reference == FromMeasuringPoint {
		wl.Depth = wl.Written - measuringPointHeight(w, in)
	}
	return wl
}

// stringNames lists a well's string names for an error message.
func stringNames(w *Well) string {
	var names []string
	for _, s := range w.Strings {
		names = append(names, strconv.Quote(s.Name))
	}
	if len(names) == 0 {
		return " (the well has none)"
	}
	return " (the well's strings: " + strings.Join(names, ", ") + ")"
}

// measuringPointHeight is the measuring point's height above ground: from
// the surveyed elevations when both are given, else from the riser's top;
// for a level measured in one string of a nested well, that string's
// riser top unless the measuring point is given otherwise.
func measuringPointHeight(w *Well, in *String) Length {
	if e := w.Elevation; e.Ground != nil && e.MeasuringPoint != nil {
		return *e.MeasuringPoint - *e.Ground
	}
	if m := w.MeasuringPoint; in != nil && in.Liner == nil && len(in.Sections) > 0 && m.Height == nil && m.Pipe == "" {
		return -in.Top()
	}
	return w.StickUp()
}

func (r *reader) surface(t *table, u Units) Surface {
	defer t.done()
	s := Surface{Kind: SurfaceKind(t.oneOf("kind")), Lock: t.str("lock"), Drainage: t.str("drainage"), Bollards: t.integer("bollards"), Pos: r.at(t.path)}
	if p := t.sub("protective"); p != nil {
		pc := &Protective{Interval: r.interval(p, u, true), Material: p.str("material"), Pos: r.at(p.path)}
		if d, ok := p.positive("diameter"); ok {
			pc.Diameter = DiameterFrom(d, u.Diameter)
		}
		p.done()
		s.Protective = pc
	}
	if v := t.sub("vault"); v != nil {
		vt := &Vault{Cover: v.str("cover"), Pos: r.at(v.path)}
		if d, ok := v.positive("diameter"); ok {
			vt.Diameter = DiameterFrom(d, u.Diameter)
		}
		if d, ok := v.positive("depth"); ok {
			vt.Depth = LengthFrom(d, u.Depth)
		}
		v.done()
		s.Vault = vt
	}
	if p := t.sub("pad"); p != nil {
		pad := &Pad{Pos: r.at(p.path)}
		if v, ok := p.positive("length"); ok {
			pad.Length = LengthFrom(v, u.Depth)
		}
		if v, ok := p.positive("width"); ok {
			pad.Width = LengthFrom(v, u.Depth)
		}
		if v, ok := p.positive("thickness"); ok {
			pad.Thickness = LengthFrom(v, u.Depth)
		}
		p.done()
		s.Pad = pad
	}
	if s.Kind == StickUp && s.Vault != nil {
		r.errAt(t.path, "a stick-up completion has no [surface.vault]")
	}
	if s.Kind == FlushMount && s.Protective != nil {
		r.errAt(t.path, "a flush-mount completion has no [surface.protective]")
	}
	return s
}

// gradingCurve reads d10, d30 and d60 (mm, always), which must not
// decrease: by definition 10 % of the mass is finer than d10, 30 % than
// d30, 60 % than d60.
func (r *reader) gradingCurve(t *table, d10, d30, d60 *Diameter) {
	prev, prevKey := Diameter(0), ""
	for _, k := range []struct {
		name string
		to   *Diameter
	}{{"d10", d10}, {"d30", d30}, {"d60", d60}} {
		v, ok := t.positive(k.name)
		if !ok {
			continue
		}
		*k.to = Diameter(v)
		if *k.to < prev {
			r.errAt(t.keyPath(k.name), "%s = %v mm is smaller than %s = %v mm: a grading curve does not fall", k.name, v, prevKey, float64(prev))
		}
		prev, prevKey = *k.to, k.name
	}
}
