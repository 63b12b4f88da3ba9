package sheet

import (
	"sort"

	"github.com/tremie-dev/tremie/schema"
)

// hgeom is the horizontal scale of the well column: diameters are drawn in
// proportion to one another at 1:ratio, centred on cx, and the sheet
// states the exaggeration against the vertical scale.
type hgeom struct {
	cx           float64
	ratio        float64 // paper to real, 1:ratio
	ppmm         float64 // points per millimetre of diameter
	exaggeration float64 // horizontal over vertical scale
	// strX is the centre of each well string; strings that share depth in
	// one hole (a nested completion) stand side by side.
	strX []float64
}

// Round horizontal ratios, most detailed first.
var horizontalRatios = []float64{1, 2, 2.5, 4, 5, 8, 10, 12, 15, 20, 25, 30, 40, 50, 100, 200}

// fallbackOD is drawn for a pipe whose diameter was not recorded (the
// rules report it); 2-in nominal pipe (ASTM D1785: OD 2.375 in).
const fallbackOD = schema.Diameter(60.3)

func od(p schema.Pipe) schema.Diameter {
	if p.OD > 0 {
		return p.OD
	}
	return fallbackOD
}

func id(p schema.Pipe) schema.Diameter {
	if p.ID > 0 && p.ID < od(p) {
		return p.ID
	}
	return od(p) * 0.87
}

// widest is the largest diameter drawn to scale (a concrete pad is drawn
// with break marks instead and does not count).
func widest(w *schema.Well) schema.Diameter {
	var d schema.Diameter
	for _, b := range w.Boreholes {
		d = max(d, b.Diameter)
	}
	for _, c := range w.Casings {
		d = max(d, od(c.Pipe))
	}
	for _, s := range w.Strings {
		for _, sec := range s.Sections {
			d = max(d, od(sec.Pipe))
		}
	}
	if p := w.Surface.Protective; p != nil {
		d = max(d, p.Diameter)
	}
	if v := w.Surface.Vault; v != nil {
		d = max(d, v.Diameter)
	}
	if d <= 0 {
		d = 200
	}
	return d
}

func (l *layout) horizontal() hgeom {
	col := l.cols.well
	avail := col.W - 30 // room for rough walls, centralizers and leader starts
	d := float64(widest(l.w))
	h := hgeom{cx: col.Center()}
	fits := false
	for _, r := range horizontalRatios {
		h.ratio = r
		if fits = d*72/25.4/r <= avail; fits {
			break
		}
	}
	// A diameter past every round ratio (a slip of units the rules
	// report) still draws within the column: 1:500, 1:1000, 1:2000, ...
	for step := 0; !fits && step < 3*320; step++ {
		h.ratio *= []float64{2.5, 2, 2}[step%3]
		fits = d*72/25.4/h.ratio <= avail
	}
	h.ppmm = 72 / 25.4 / h.ratio
	h.strX = l.stringCentres(h)
	return h
}

// exaggerationFor is the horizontal exaggeration at a vertical scale.
func (h hgeom) exaggerationFor(s Scale) float64 { return s.Ratio / h.ratio }

// x is the page x of a horizontal offset (mm) from the centre line.
func (h hgeom) x(mm schema.Diameter) float64 { return h.cx + float64(mm)*h.ppmm }

// stringCentres places strings that overlap in depth side by side across
// the narrowest hole (or casing bore) they share, with equal gaps; other
// strings stand on the centre line.
func (l *layout) stringCentres(h hgeom) []float64 {
	w := l.w
	n := len(w.Strings)
	xs := make([]float64, n)
	for i := range xs {
		xs[i] = h.cx
	}
	// Group strings by overlapping depth (connected components).
	group := make([]int, n)
	for i := range group {
		group[i] = i
	}
	var find func(int) int
	find = func(i int) int {
		for group[i] != i {
			i = group[i]
		}
		return i
	}
	for i := 0; i < n; i++ {
		for j := i + 1; j < n; j++ {
			a := schema.Interval{Top: w.Strings[i].Top(), Bottom: w.Strings[i].Bottom()}
			b := schema.Interval{Top: w.Strings[j].Top(), Bottom: w.Strings[j].Bottom()}
			if a.Overlaps(b) {
				group[find(j)] = find(i)
			}
		}
	}
	members := map[int][]int{}
	for i := 0; i < n; i++ {
		g := find(i)
		members[g] = append(members[g], i)
	}
	roots := make([]int, 0, len(members))
	for g := range members {
		roots = append(roots, g)
	}
	sort.Ints(roots)
	for _, g := range roots {
		m := members[g]
		if len(m) < 2 {
			continue
		}
		// The depth they all share, and the narrowest bore over it.
		common := schema.Interval{Top: w.Strings[m[0]].Top(), Bottom: w.Strings[m[0]].Bottom()}
		total := schema.Diameter(0)
		for _, i := range m {
			common.Top = max(common.Top, w.Strings[i].Top())
			common.Bottom = min(common.Bottom, w.Strings[i].Bottom())
			total += stringOD(w.Strings[i])
		}
		bore := schema.Diameter(0)
		for _, b := range w.Boreholes {
			if b.Overlaps(common) && (bore == 0 || b.Diameter < bore) {
				bore = b.Diameter
			}
		}
		for _, c := range w.Casings {
			if c.Top <= common.Top && c.Bottom >= common.Bottom && id(c.Pipe) >= total && (bore == 0 || id(c.Pipe) < bore) {
				bore = id(c.Pipe)
			}
		}
		gap := (bore - total) / schema.Diameter(len(m)+1)
		if gap < 0 || bore == 0 {
			gap = 0
			bore = total
		}
		left := -bore / 2
		for _, i := range m {
			d := stringOD(w.Strings[i])
			xs[i] = h.x(left + gap + d/2)
			left += gap + d
		}
	}
	return xs
}

// stringOD is a string's largest outside diameter.
func stringOD(s schema.String) schema.Diameter {
	var d schema.Diameter
	for _, sec := range s.Sections {
		d = max(d, od(sec.Pipe))
	}
	if d == 0 {
		d = fallbackOD
	}
	return d
}
