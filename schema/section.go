package schema

import (
	"cmp"
	"slices"
	"sort"
	"strconv"
)

// What stands in the hole at a depth, answered once for quantities, rules
// and the sheet. The well is cut at every boundary of every part into
// slabs; within a slab nothing changes. A part covers the depths
// top <= z < bottom (half-open), so at a boundary the part below is the
// one present: a pipe whose bottom is at z is gone at z, one whose top is
// at z is there.

// HolePipe is one length of pipe standing in the hole: an outer casing or
// one section of a well string.
type HolePipe struct {
	Interval
	OD, ID  Diameter
	Casing  *Casing  // set for an outer casing
	String  *String  // set for a string section
	Section *Section // set for a string section
	Index   int      // the casing's index in Well.Casings, or the string's in Well.Strings
	Path    string   // key path: "casing[0]", "string[1].section[2]"
}

// Label names the pipe for messages: `casing "surface"` or
// `string "main" screen`.
func (p HolePipe) Label() string {
	if p.Casing != nil {
		return "casing " + strconv.Quote(p.Casing.Label())
	}
	return "string " + strconv.Quote(p.String.Label()) + " " + string(p.Section.Kind)
}

// Owner names the casing or string the pipe belongs to, without the
// section kind: `string "main"`.
func (p HolePipe) Owner() string {
	if p.Casing != nil {
		return p.Label()
	}
	return "string " + strconv.Quote(p.String.Label())
}

// HolePipes lists every outer casing, then every section of every string,
// in file order.
func (w *Well) HolePipes() []HolePipe {
	var out []HolePipe
	for i := range w.Casings {
		c := &w.Casings[i]
		out = append(out, HolePipe{Interval: c.Interval, OD: c.Pipe.OD, ID: c.Pipe.ID, Casing: c, Index: i,
			Path: pathOr(c.Path, "casing["+strconv.Itoa(i)+"]")})
	}
	for i := range w.Strings {
		s := &w.Strings[i]
		for j := range s.Sections {
			sec := &s.Sections[j]
			out = append(out, HolePipe{Interval: sec.Interval, OD: sec.Pipe.OD, ID: sec.Pipe.ID, String: s, Section: sec, Index: i,
				Path: pathOr(sec.Path, "string["+strconv.Itoa(i)+"].section["+strconv.Itoa(j)+"]")})
		}
	}
	return out
}

// pathOr is a part's key path, or one made up for a well built in code.
func pathOr(p, made string) string {
	if p != "" {
		return p
	}
	return made
}

// CrossSection is what stands in the hole over one slab of depth,
// Top <= z < Bottom.
type CrossSection struct {
	Interval
	Hole     Diameter // borehole diameter; 0 when no borehole section covers the slab
	HasHole  bool
	Borehole *BoreholeSection // the borehole section giving Hole (the last written that covers the slab), nil when none
	// Casings are the outer casings present, outermost (widest) first;
	// each stands inside the one before it.
	Casings []HolePipe
	// Strings are the string sections present, one per string, in file
	// order; they stand side by side inside the innermost casing.
	Strings  []HolePipe
	Fills    []*Fill // annular fills present, in file order
	OpenHole bool    // a declared open-hole interval covers the slab
}

// Outermost returns the pipes that touch the borehole annulus: the
// outermost casing, or else every string side by side.
func (cs CrossSection) Outermost() []HolePipe {
	if len(cs.Casings) > 0 {
		return cs.Casings[:1:1]
	}
	return cs.Strings
}

// Inside returns the casing of that name and the pipes standing directly
// inside it, or false when it is not present.
func (cs CrossSection) Inside(name string) (HolePipe, []HolePipe, bool) {
	for i, c := range cs.Casings {
		if c.Casing.Label() != name {
			continue
		}
		if i+1 < len(cs.Casings) {
			return c, cs.Casings[i+1 : i+2 : i+2], true
		}
		return c, cs.Strings, true
	}
	return HolePipe{}, nil, false
}

// Annulus names the annulus just outside the strings: the innermost
// casing present, or "" for the borehole annulus.
func (cs CrossSection) Annulus() string {
	if n := len(cs.Casings); n > 0 {
		return cs.Casings[n-1].Casing.Label()
	}
	return ""
}

// Sections is a well cut into slabs at every boundary of every part:
// borehole sections, casings, string sections, fills and open holes, from
// the shallowest top (above ground for a stick-up) to the deepest bottom.
type Sections struct {
	slabs []CrossSection // top down, contiguous
}

// CrossSections cuts the well into slabs. It reads the well as it is now:
// make it once for a check, a report or a layout and share it.
func (w *Well) CrossSections() *Sections {
	cuts := make([]Length, 0, 2+2*(len(w.Boreholes)+len(w.Casings)+len(w.Fills)+len(w.OpenHoles)+8))
	cuts = append(cuts, 0, w.TotalDepth)
	w.EachConstructionInterval(func(iv Interval) { cuts = append(cuts, iv.Top, iv.Bottom) })
	slices.Sort(cuts)
	cuts = slices.Compact(cuts)
	pipes := w.HolePipes()
	s := &Sections{slabs: make([]CrossSection, 0, len(cuts))}
	for i := 1; i < len(cuts); i++ {
		s.slabs = append(s.slabs, w.slab(Interval{Top: cuts[i-1], Bottom: cuts[i]}, pipes))
	}
	return s
}

// covers reports whether a part's interval covers a slab; slabs are cut
// at every part's boundaries, so the slab's middle decides.
func covers(part Interval, mid Length) bool { return part.Top <= mid && mid < part.Bottom }

func (w *Well) slab(iv Interval, pipes []HolePipe) CrossSection {
	mid := iv.Top + (iv.Bottom-iv.Top)/2
	cs := CrossSection{Interval: iv}
	for i := range w.Boreholes {
		if b := &w.Boreholes[i]; covers(b.Interval, mid) {
			cs.Hole, cs.HasHole, cs.Borehole = b.Diameter, true, b // the last written wins
		}
	}
	lastString := -1
	for _, p := range pipes {
		if !covers(p.Interval, mid) {
			continue
		}
		if p.Casing != nil {
			cs.Casings = append(cs.Casings, p)
		} else if p.Index != lastString {
			// one pipe per string: overlapping sections of one string
			// are a fault of the string, not a second pipe
			cs.Strings = append(cs.Strings, p)
			lastString = p.Index
		}
	}
	slices.SortStableFunc(cs.Casings, func(a, b HolePipe) int { return cmp.Compare(b.OD, a.OD) })
	for i := range w.Fills {
		if covers(w.Fills[i].Interval, mid) {
			cs.Fills = append(cs.Fills, &w.Fills[i])
		}
	}
	for _, o := range w.OpenHoles {
		cs.OpenHole = cs.OpenHole || covers(o.Interval, mid)
	}
	return cs
}

// All returns every slab, top down. Callers must not change them.
func (s *Sections) All() []CrossSection { return s.slabs }

// At returns the slab holding depth z (Top <= z < Bottom); outside the
// well's parts it is an empty cross-section at z.
func (s *Sections) At(z Length) CrossSection {
	i := sort.Search(len(s.slabs), func(i int) bool { return s.slabs[i].Bottom > z })
	if i < len(s.slabs) && s.slabs[i].Top <= z {
		return s.slabs[i]
	}
	return CrossSection{Interval: Interval{Top: z, Bottom: z}}
}

// Within returns the slabs covering top..bottom, each clipped to it, top
// down; a part of the range beyond every part of the well comes as an
// empty cross-section.
func (s *Sections) Within(top, bottom Length) []CrossSection {
	var out []CrossSection
	if !(top < bottom) {
		return nil
	}
	if n := len(s.slabs); n == 0 || top < s.slabs[0].Top {
		end := bottom
		if n > 0 {
			end = min(bottom, s.slabs[0].Top)
		}
		out = append(out, CrossSection{Interval: Interval{Top: top, Bottom: end}})
	}
	for _, cs := range s.slabs {
		if cs.Bottom <= top || cs.Top >= bottom {
			continue
		}
		cs.Top, cs.Bottom = max(cs.Top, top), min(cs.Bottom, bottom)
		out = append(out, cs)
	}
	if n := len(s.slabs); n > 0 && bottom > s.slabs[n-1].Bottom {
		out = append(out, CrossSection{Interval: Interval{Top: max(top, s.slabs[n-1].Bottom), Bottom: bottom}})
	}
	return out
}
