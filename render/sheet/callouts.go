package sheet

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// callouts lists every component of the well with its words, one
// callout for what several strings share.
func (l *layout) callouts() []callout { return mergeStrings(l.rawCallouts()) }

// rawCallouts lists every component of the well with its words.
func (l *layout) rawCallouts() []callout {
	w := l.w
	h := l.hz
	var cs []callout
	add := func(c callout) { cs = append(cs, c) }
	named := len(w.Strings) > 1

	// Surface completion.
	if pc := w.Surface.Protective; pc != nil {
		lines := []string{joinNonEmpty(" ", l.diameter(pc.Diameter), pc.Material), l.interval(pc.Interval)}
		if w.Surface.Lock != "" {
			lines = append(lines, "lock: "+w.Surface.Lock)
		}
		r := float64(pc.Diameter) / 2 * h.ppmm
		add(callout{key: "protective", iv: schema.Interval{Top: pc.Top, Bottom: min(pc.Bottom, 0)}, anchorX: fixed(h.cx + r), title: "Protective casing", lines: lines, where: 1, rank: 0})
	}
	if v := w.Surface.Vault; v != nil && w.Surface.Kind != schema.StickUp {
		lines := []string{fmt.Sprintf("%s diameter, %s deep", l.diameter(v.Diameter), l.depth(v.Depth))}
		if v.Cover != "" {
			lines = append(lines, v.Cover)
		}
		if w.Surface.Lock != "" {
			lines = append(lines, "lock: "+w.Surface.Lock)
		}
		if w.Surface.Drainage != "" {
			lines = append(lines, "drainage: "+w.Surface.Drainage)
		}
		r := float64(v.Diameter) / 2 * h.ppmm
		add(callout{key: "vault", iv: schema.Interval{Top: 0, Bottom: v.Depth}, anchorX: fixed(h.cx + r), title: "Flush-mount vault", lines: lines, rank: 0})
	}
	if pd := w.Surface.Pad; pd != nil {
		if iv, ok := padInterval(w.Surface); ok {
			du := l.u.Depth
			lines := []string{fmt.Sprintf("%s × %s × %s %s thick", schema.TrimFloat(pd.Length.In(du), 2), schema.TrimFloat(pd.Width.In(du), 2), schema.TrimFloat(pd.Thickness.In(du), 2), du)}
			if w.Surface.Bollards > 0 {
				lines = append(lines, fmt.Sprintf("%d guard %s", w.Surface.Bollards, plural(w.Surface.Bollards, "post", "posts")))
			}
			half := min(float64(pd.Length)*1000/2*h.ppmm, l.cols.well.W/2-6)
			add(callout{key: "pad", iv: iv, anchorX: fixed(h.cx + half), title: "Concrete pad", lines: lines, rank: 1})
		}
	}

	// Outer casings; the measuring point is on the pipe the file names,
	// else on the first string that reaches the surface, else on the
	// highest casing.
	mpCasing, mpString, mpNamed := l.measuringPointPipe()
	for i, c := range w.Casings {
		if i == mpCasing {
			r := float64(od(c.Pipe)) / 2 * h.ppmm
			add(callout{key: "mp:" + pathOr(c.Path, "casing", i), iv: schema.Interval{Top: c.Top, Bottom: c.Top}, anchorX: fixed(h.cx + r), title: "Measuring point",
				lines: l.mpLines(c.Called(), c.Top, ""), rank: 3})
		}
		r := float64(od(c.Pipe)) / 2 * h.ppmm
		title := c.Called() // one name per part: the casing's own
		add(callout{key: "casing:" + pathOr(c.Path, "casing", i), iv: c.Interval, anchorX: fixed(h.cx + r), title: upperFirst(title),
			lines: []string{l.pipeLine(c.Pipe), l.pipeSizes(c.Pipe), l.interval(c.Interval)}, minor: map[int]bool{1: true}, where: 2, rank: 2})
		if len(c.Centralizers) > 0 {
			add(l.centralizerCallout("centralizer:"+pathOr(c.Path, "casing", i), h.cx, od(c.Pipe), c.Centralizers, title))
		}
	}

	// Well strings.
	for si, s := range w.Strings {
		x := h.strX[si]
		suffix := ""
		if named {
			suffix = " — " + s.Label()
		}
		if len(s.Sections) > 0 && s.Liner == nil {
			top := s.Sections[0]
			rt := float64(od(top.Pipe)) / 2 * h.ppmm
			lines := l.mpLines("riser", top.Top, s.TopCap)
			if si != mpString && w.Elevation.MeasuringPoint != nil {
				lines = lines[:1]
				if s.TopCap != "" {
					lines = append(lines, "cap: "+s.TopCap)
				}
			}
			title := "Measuring point"
			if mpNamed && si != mpString {
				title = "Top of riser"
			}
			add(callout{key: "mp:" + s.Label(), iv: schema.Interval{Top: top.Top, Bottom: top.Top}, anchorX: fixed(x + rt), title: title + suffix, lines: lines, rank: 3,
				base: title, of: ofString(named, s)})
		}
		for k, sec := range s.Sections {
			r := float64(od(sec.Pipe)) / 2 * h.ppmm
			role := string(sec.Kind) + ":" + s.Label() + fmt.Sprintf("[%d]", k)
			var lines []string
			var minor map[int]bool
			switch sec.Kind {
			case schema.ScreenSection:
				t := string(sec.ScreenType)
				if t == "" {
					t = string(schema.Slotted)
				}
				lines = []string{l.pipeSpec(sec.Pipe), l.slot(sec) + ", " + t, l.interval(sec.Interval)}
			default:
				lines = []string{l.pipeLine(sec.Pipe), l.pipeSizes(sec.Pipe), l.interval(sec.Interval)}
				minor = map[int]bool{1: true}
			}
			add(callout{key: role, iv: sec.Interval, anchorX: fixed(x + r), title: upperFirst(string(sec.Kind)) + suffix, lines: lines, minor: minor, where: 2, rank: 4,
				base: upperFirst(string(sec.Kind)), of: ofString(named, s)})
		}
		if s.BottomCap != "" && len(s.Sections) > 0 {
			b := s.Sections[len(s.Sections)-1]
			r := float64(od(b.Pipe)) / 2 * h.ppmm
			add(callout{key: "bottomcap:" + s.Label(), iv: schema.Interval{Top: b.Bottom, Bottom: b.Bottom}, anchorX: fixed(x + r), title: "Bottom cap" + suffix,
				lines: []string{s.BottomCap + " at " + l.depth(b.Bottom)}, rank: 5, base: "Bottom cap", of: ofString(named, s)})
		}
		if len(s.Centralizers) > 0 {
			add(l.centralizerCallout("centralizer:"+s.Label(), x, stringOD(s), s.Centralizers, suffix))
		}
	}

	// Annular fills.
	for i, f := range w.Fills {
		title := materialName(f.Material)
		switch {
		case f.Gradation != "":
			title += " " + f.Gradation
		case f.GrainMin > 0 && f.GrainMax > 0:
			title += fmt.Sprintf(" %s–%s mm", schema.TrimFloat(float64(f.GrainMin), 2), schema.TrimFloat(float64(f.GrainMax), 2))
		}
		var lines []string
		minor := map[int]bool{}
		if f.Product != "" {
			lines = append(lines, f.Product)
			minor[0] = true
		}
		where := l.interval(f.Interval)
		if f.Method != "" {
			where += ", " + string(f.Method)
		}
		if f.Within != "" {
			where += ", inside " + f.Within
		}
		whereAt := len(lines)
		lines = append(lines, where)
		if r, ok := l.amountRow(i); ok {
			lines = append(lines, "calc. "+l.calculated(r))
			switch {
			case r.Recorded:
				lines = append(lines, "placed "+l.placed(r)+ratioSuffix(ratio(r)))
			case l.w.IsPlanned():
				lines = append(lines, "to order "+l.toOrder(r))
			}
		}
		fi := f
		add(callout{key: "interval:" + pathOr(f.Path, "fill", i), iv: f.Interval, anchorX: func(d schema.Length) float64 { return l.annulusX(fi, d) }, title: title, lines: lines, minor: minor, where: whereAt, rank: 6})
	}

	// Boreholes and open hole.
	for i, b := range w.Boreholes {
		r := float64(b.Diameter) / 2 * h.ppmm
		lines := []string{l.diameter(b.Diameter) + " diameter", l.interval(b.Interval)}
		if b.Method != "" {
			lines = append(lines, b.Method)
		} else if w.Drilling.Method != "" {
			lines = append(lines, w.Drilling.Method)
		}
		add(callout{key: "borehole:" + pathOr(b.Path, "borehole", i), iv: b.Interval, anchorX: fixed(h.cx + r), title: "Borehole", lines: lines, minor: map[int]bool{2: true}, where: 1, rank: 7})
	}
	for i, o := range w.OpenHoles {
		d := l.holeAt((o.Top + o.Bottom) / 2)
		r := float64(d) / 2 * h.ppmm
		add(callout{key: "openhole:" + pathOr(o.Path, "open_hole", i), iv: o.Interval, anchorX: fixed(h.cx + r + 1.6), title: "Open hole",
			lines: []string{l.diameter(d) + " diameter, uncased", l.interval(o.Interval)}, where: 1, rank: 7})
	}

	// Water levels.
	x := h.cx
	if len(h.strX) > 0 {
		x = h.strX[0]
	}
	for i, wl := range w.WaterLevels {
		title := map[schema.LevelKind]string{schema.FirstEncountered: "Water first encountered", schema.Pumping: "Pumping water level"}[wl.Kind]
		if title == "" {
			title = "Static water level"
		}
		line := l.depth(wl.Depth) + " below ground"
		if wl.Reference == schema.FromMeasuringPoint {
			line += fmt.Sprintf(" (%s below MP)", l.depth(wl.Written))
		}
		lines := []string{line}
		if g := w.Elevation.Ground; g != nil {
			lines = append(lines, strings.TrimSpace(fmt.Sprintf("elev. %s %s", l.depth(*g-wl.Depth), w.Elevation.Datum)))
		}
		if !wl.Measured.IsZero() {
			if wl.HasTime {
				lines = append(lines, wl.Measured.Format("2006-01-02 15:04"))
			} else {
				lines = append(lines, wl.Measured.Format("2006-01-02"))
			}
		}
		xi := x + float64(i%3-1)*3.5 + 3.5
		add(callout{key: "water:" + pathOr(wl.Path, "water_level", i), iv: schema.Interval{Top: wl.Depth, Bottom: wl.Depth}, anchorX: fixed(xi), title: title, lines: lines, rank: 8})
	}
	for _, pt := range l.parts {
		cs = append(cs, pt.callouts(l)...)
	}
	return cs
}

func ofString(named bool, s schema.String) []string {
	if !named {
		return nil
	}
	return []string{s.Label()}
}

// mergeStrings joins the callouts of one part of several strings that
// stand at the same depth and say the same first thing (the measuring
// points of a nested well, say) into one label naming every string. A
// line not all of them share is kept, followed by the strings it is of.
func mergeStrings(cs []callout) []callout {
	var out []callout
	used := make([]bool, len(cs))
	for i, c := range cs {
		if used[i] {
			continue
		}
		if len(c.of) != 1 || len(c.lines) == 0 {
			out = append(out, c)
			continue
		}
		group := []callout{c}
		for j := i + 1; j < len(cs); j++ {
			d := cs[j]
			if !used[j] && len(d.of) == 1 && d.base == c.base && d.iv == c.iv && len(d.lines) > 0 && d.lines[0] == c.lines[0] {
				group = append(group, d)
				used[j] = true
			}
		}
		if len(group) == 1 {
			out = append(out, c)
			continue
		}
		m := c
		m.of = nil
		m.also = nil
		m.lines = nil
		m.minor = map[int]bool{}
		var order []string
		from := map[string][]string{}
		minor := map[string]bool{}
		for _, g := range group {
			m.of = append(m.of, g.of[0])
			if g.key != c.key {
				m.also = append(m.also, g.anchorX)
			}
			for k, s := range g.lines {
				if _, seen := from[s]; !seen {
					order = append(order, s)
				}
				from[s] = append(from[s], g.of[0])
				minor[s] = minor[s] || g.minor[k]
			}
		}
		m.where = 0
		for k, s := range order {
			if k > 0 && s == c.lines[min(c.where, len(c.lines)-1)] {
				m.where = k
			}
			if len(from[s]) < len(group) {
				s += " (" + strings.Join(from[s], ", ") + ")"
			}
			if minor[order[k]] {
				m.minor[len(m.lines)] = true
			}
			m.lines = append(m.lines, s)
		}
		m.title = pluralTitle(c.base) + " — " + strings.Join(m.of, ", ")
		out = append(out, m)
	}
	return out
}

func pluralTitle(s string) string {
	if strings.HasSuffix(s, "s") {
		return s
	}
	return s + "s"
}

func ratioSuffix(r string) string {
	if r == "—" {
		return ""
	}
	return ", " + r + " of calc."
}

func (l *layout) centralizerCallout(key string, x float64, d schema.Diameter, at []schema.Length, of string) callout {
	ds := make([]string, len(at))
	for i, z := range at {
		ds[i] = schema.TrimFloat(z.In(l.u.Depth), 2)
	}
	first := at[0]
	r := float64(d) / 2 * l.hz.ppmm
	hole := float64(l.holeAt(first)) / 2 * l.hz.ppmm
	tip := x + r + max(hole-r-0.8, 2)
	title := "Centralizers"
	if len(at) == 1 {
		title = "Centralizer"
	}
	if strings.HasPrefix(of, " — ") {
		title += of
	}
	return callout{key: key, iv: schema.Interval{Top: first, Bottom: first}, anchorX: fixed(tip), title: title,
		lines: []string{"at " + strings.Join(ds, ", ") + " " + string(l.u.Depth)}, rank: 5}
}

func fixed(x float64) func(schema.Length) float64 { return func(schema.Length) float64 { return x } }

func upperFirst(s string) string {
	if s == "" {
		return s
	}
	return strings.ToUpper(s[:1]) + s[1:]
}

// annulusX is the middle of a fill's annulus on the right of the well at
// a depth: between the outermost pipe standing in its region and the
// hole wall (or the casing bore it was placed in).
func (l *layout) annulusX(f schema.Fill, d schema.Length) float64 {
	h := l.hz
	cs := l.secs.At(d)
	outer := float64(cs.Hole) / 2 * h.ppmm
	limit := schema.Diameter(1e9)
	if c, _, ok := cs.Inside(f.Within); ok && f.Within != "" {
		outer = float64(id(c.Casing.Pipe)) / 2 * h.ppmm
		limit = id(c.Casing.Pipe)
	}
	inner := 0.0
	for _, c := range cs.Casings {
		if od(c.Casing.Pipe) < limit {
			inner = max(inner, float64(od(c.Casing.Pipe))/2*h.ppmm)
		}
	}
	for _, s := range cs.Strings {
		inner = max(inner, h.strX[s.Index]-h.cx+float64(od(s.Section.Pipe))/2*h.ppmm)
	}
	if outer <= inner {
		return h.cx + inner
	}
	return h.cx + (inner+outer)/2
}

// measuringPointPipe finds the pipe whose top is the measuring point: a
// casing index or a string index (the other -1), and whether the file
// named it. With none named it is the first string that reaches the
// surface, else the highest casing; a nested well's other strings are
// measuring points of their own.
func (l *layout) measuringPointPipe() (casing, str int, named bool) {
	w := l.w
	casing, str = -1, -1
	if m := w.MeasuringPoint; m.Pipe != "" {
		for i, c := range w.Casings {
			if c.Name == m.Pipe {
				return i, -1, true
			}
		}
		for i, s := range w.Strings {
			if s.Name == m.Pipe {
				return -1, i, true
			}
		}
	}
	named = w.MeasuringPoint.Height != nil
	for i, s := range w.Strings {
		if s.Liner == nil && len(s.Sections) > 0 {
			return -1, i, named
		}
	}
	for i, c := range w.Casings {
		if casing < 0 || c.Top < w.Casings[casing].Top {
			casing = i
		}
	}
	return casing, -1, named
}

// mpLines describes a measuring point at the top of a pipe.
func (l *layout) mpLines(pipe string, top schema.Length, topCap string) []string {
	var lines []string
	if su := -top; su > 0 {
		lines = append(lines, fmt.Sprintf("top of %s, %s above ground", pipe, l.depth(su)))
	} else {
		lines = append(lines, fmt.Sprintf("top of %s, %s below ground", pipe, l.depth(top)))
	}
	if mp := l.w.Elevation.MeasuringPoint; mp != nil {
		lines = append(lines, strings.TrimSpace(fmt.Sprintf("elev. %s %s", l.depth(*mp), l.w.Elevation.Datum)))
	}
	if topCap != "" {
		lines = append(lines, "cap: "+topCap)
	}
	return lines
}
