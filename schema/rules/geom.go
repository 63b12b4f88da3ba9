package rules

// Shared geometry for the rules. Any rule file in this package may use
// these; keep them small and free of reporting.
//
//   eps                   depth tolerance for "meets" and "overlaps"
//   annulusFills(w, name) the fills of one annulus, top down
//   runs(fs, keep)        maximal contiguous runs of the fills keep accepts
//   fillAbove(fs, d, ...) the nearest fill resting on depth d
//   covered / subtract / union / overlap   interval set arithmetic
//   sumOD(pipes)          the width of pipes standing side by side
//
// What stands in the hole at a depth is schema.Sections, shared by the
// rules of a check through p.crossSections(), p.segments() and
// p.annulusAt(d).

import (
	"cmp"
	"slices"
	"sort"

	"github.com/tremie-dev/tremie/schema"
)

// eps is the depth tolerance: far below anything written to 0.01 ft, and
// above the rounding of a foot-to-metre conversion.
const eps schema.Length = 1e-6

// roundOff is the slack a computed figure gets against its threshold
// (absolute on a fraction or a diameter in mm, relative where multiplied
// in): a figure equal to the threshold as written (2 in of space against
// 2 in, after inch-to-mm conversions) passes despite float round-off,
// about 1e-16 relative; 1e-9 is far below any difference that matters.
// Common practice.
const roundOff = 1e-9

// boreholeAnnulus names the annulus between the borehole wall and the
// outermost pipe (a Fill with Within == "").
const boreholeAnnulus = ""

// annulusFills returns the fills placed in the named annulus ("" for the
// borehole annulus, else a casing's name), sorted top down.
func annulusFills(w *schema.Well, within string) []*schema.Fill {
	var out []*schema.Fill
	for i := range w.Fills {
		if w.Fills[i].Within == within {
			out = append(out, &w.Fills[i])
		}
	}
	slices.SortStableFunc(out, func(a, b *schema.Fill) int {
		if c := cmp.Compare(a.Top, b.Top); c != 0 {
			return c
		}
		return cmp.Compare(a.Bottom, b.Bottom)
	})
	return out
}

// annulusNames lists the annuli that have fills: "" first, then casing
// names in file order.
func annulusNames(w *schema.Well) []string {
	out := []string{boreholeAnnulus}
	for _, c := range w.Casings {
		for _, f := range w.Fills {
			if f.Within == c.Name {
				out = append(out, c.Name)
				break
			}
		}
	}
	return out
}

// run is a contiguous stack of fills of one kind, top down.
type run struct {
	schema.Interval
	Fills []*schema.Fill
}

// runs groups fills (sorted top down) into maximal contiguous runs of the
// fills keep accepts.
func runs(fs []*schema.Fill, keep func(*schema.Fill) bool) []run {
	var out []run
	for _, f := range fs {
		if !keep(f) {
			continue
		}
		if n := len(out); n > 0 && f.Top <= out[n-1].Bottom+eps {
			if f.Bottom > out[n-1].Bottom {
				out[n-1].Bottom = f.Bottom
			}
			out[n-1].Fills = append(out[n-1].Fills, f)
			continue
		}
		out = append(out, run{Interval: f.Interval, Fills: []*schema.Fill{f}})
	}
	return out
}

// isPack accepts filter pack and fine sand.
func isPack(f *schema.Fill) bool { return f.Material.Group() == schema.PackGroup }

// isFilterPack accepts filter pack only.
func isFilterPack(f *schema.Fill) bool { return f.Material == schema.FilterPack }

// isBentoniteSeal accepts bentonite chips, pellets and granular bentonite.
func isBentoniteSeal(f *schema.Fill) bool { return f.Material.Group() == schema.SealGroup }

// fillAbove returns the fill nearest above depth d (the one whose bottom
// is deepest while not below d), skipping those skip accepts, and whether
// it rests on d (its bottom within eps of d).
func fillAbove(fs []*schema.Fill, d schema.Length, skip func(*schema.Fill) bool) (*schema.Fill, bool) {
	var best *schema.Fill
	for _, f := range fs {
		if skip != nil && skip(f) {
			continue
		}
		if f.Bottom > d+eps {
			continue
		}
		if best == nil || f.Bottom > best.Bottom {
			best = f
		}
	}
	if best == nil {
		return nil, false
	}
	return best, best.Bottom >= d-eps
}

// union merges intervals into a sorted set of disjoint ones.
func union(ivs []schema.Interval) []schema.Interval {
	s := append([]schema.Interval(nil), ivs...)
	sort.Slice(s, func(i, j int) bool { return s[i].Top < s[j].Top })
	var out []schema.Interval
	for _, iv := range s {
		if n := len(out); n > 0 && iv.Top <= out[n-1].Bottom+eps {
			if iv.Bottom > out[n-1].Bottom {
				out[n-1].Bottom = iv.Bottom
			}
			continue
		}
		out = append(out, iv)
	}
	return out
}

// subtract returns the parts of base not covered by cut, dropping slivers
// thinner than eps.
func subtract(base, cut []schema.Interval) []schema.Interval {
	cut = union(cut)
	var out []schema.Interval
	for _, b := range union(base) {
		cur := b.Top
		for _, c := range cut {
			if c.Bottom <= cur || c.Top >= b.Bottom {
				continue
			}
			if c.Top > cur+eps {
				out = append(out, schema.Interval{Top: cur, Bottom: c.Top})
			}
			if c.Bottom > cur {
				cur = c.Bottom
			}
		}
		if b.Bottom > cur+eps {
			out = append(out, schema.Interval{Top: cur, Bottom: b.Bottom})
		}
	}
	return out
}

// overlap is the shared part of two intervals, and whether it is thicker
// than eps.
func overlap(a, b schema.Interval) (schema.Interval, bool) {
	iv := schema.Interval{Top: max(a.Top, b.Top), Bottom: min(a.Bottom, b.Bottom)}
	return iv, iv.Bottom-iv.Top > eps
}

// intervalsOf returns the intervals of fills.
func intervalsOf(fs []*schema.Fill) []schema.Interval {
	out := make([]schema.Interval, len(fs))
	for i, f := range fs {
		out[i] = f.Interval
	}
	return out
}

// thickness sums the thickness of a set of disjoint intervals.
func thickness(ivs []schema.Interval) schema.Length {
	var t schema.Length
	for _, iv := range union(ivs) {
		t += iv.Thickness()
	}
	return t
}

// sumOD adds the outside diameters of pipes standing side by side.
func sumOD(ps []schema.HolePipe) schema.Diameter {
	var s schema.Diameter
	for _, p := range ps {
		s += p.OD
	}
	return s
}

// mid is the middle of an interval.
func mid(iv schema.Interval) schema.Length { return (iv.Top + iv.Bottom) / 2 }

// spanTracker merges consecutive offending segments per key into one
// interval, so a rule reports each fault once with its whole depth range.
type spanTracker struct {
	order []string
	spans map[string][]schema.Interval
}

func (t *spanTracker) add(key string, iv schema.Interval) {
	if t.spans == nil {
		t.spans = map[string][]schema.Interval{}
	}
	if _, ok := t.spans[key]; !ok {
		t.order = append(t.order, key)
	}
	s := t.spans[key]
	if n := len(s); n > 0 && iv.Top <= s[n-1].Bottom+eps {
		s[n-1].Bottom = max(s[n-1].Bottom, iv.Bottom)
	} else {
		s = append(s, iv)
	}
	t.spans[key] = s
}

// each calls fn for every key in first-seen order and each merged span.
func (t *spanTracker) each(fn func(key string, iv schema.Interval)) {
	for _, k := range t.order {
		for _, iv := range t.spans[k] {
			fn(k, iv)
		}
	}
}
