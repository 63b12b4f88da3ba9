package symbols

import (
	"math"

	"github.com/tremie-dev/tremie/render/draw"
)

// A pen collects the marks of a pattern as drawing primitives. Marks of
// one style gather into one draw.Path (see batch), so a pattern costs a
// backend a few paths, not one per mark.
//
// A pen draws either straight onto the page, dropping what falls outside
// the target rectangle r and cutting lines to it, or, with tile set, one
// repeat of a periodic pattern: r is then the tile's cell at the origin,
// each mark is drawn once and whole (copies of the cell put it back
// wherever it reaches), and cell grids run over exactly one period.
type pen struct {
	r     draw.Rect
	items []draw.Item // *draw.Path while drawing; see done
	// period is the size of the pattern's repeat, zero for a motif that
	// does not repeat (a well part); cell numbers wrap round it, so that
	// a motif varied cell by cell repeats with it.
	period draw.Point
	tile   bool
	// rowsPerTile and misfit check, while a tile is drawn, that the
	// motif's grid fits it (see tileMisfits).
	rowsPerTile int
	misfit      string
}

const (
	markWidth = 0.4 // points: the usual pattern stroke
	boldWidth = 0.7
)

func stroke(w float64) draw.Style { return draw.Style{Stroke: ink, StrokeWidth: w} }

// line draws a segment, cut to the rectangle (Liang–Barsky).
func (p *pen) line(x0, y0, x1, y1, w float64) {
	p.lineStyled(x0, y0, x1, y1, stroke(w))
}

func (p *pen) lineStyled(x0, y0, x1, y1 float64, st draw.Style) {
	a, b := draw.Point{X: x0, Y: y0}, draw.Point{X: x1, Y: y1}
	if !p.tile {
		var ok bool
		if a, b, ok = draw.ClipSegment(p.r, draw.Point{X: x0, Y: y0}, draw.Point{X: x1, Y: y1}); !ok {
			return
		}
	}
	p.batch(st, draw.Subpath{Points: []draw.Point{a, b}}, nil)
}

// dot draws a filled disc.
func (p *pen) dot(x, y, r float64) {
	if !p.touches(x-r, y-r, 2*r, 2*r) {
		return
	}
	p.batch(draw.Style{Fill: ink}, draw.Subpath{}, &draw.Disc{Center: draw.Point{X: x, Y: y}, R: r})
}

// ring draws a circle outline.
func (p *pen) ring(x, y, r, w float64) {
	if !p.touches(x-r-w, y-r-w, 2*(r+w), 2*(r+w)) {
		return
	}
	p.batch(stroke(w), draw.Subpath{}, &draw.Disc{Center: draw.Point{X: x, Y: y}, R: r})
}

// poly draws a closed polygon, filled with ink or outlined.
func (p *pen) poly(filled bool, pts ...draw.Point) {
	minX, minY, maxX, maxY := math.Inf(1), math.Inf(1), math.Inf(-1), math.Inf(-1)
	for _, q := range pts {
		minX, minY = math.Min(minX, q.X), math.Min(minY, q.Y)
		maxX, maxY = math.Max(maxX, q.X), math.Max(maxY, q.Y)
	}
	if !p.touches(minX-1, minY-1, maxX-minX+2, maxY-minY+2) {
		return
	}
	st := stroke(markWidth)
	if filled {
		st = draw.Style{Fill: ink}
	}
	p.batch(st, draw.Subpath{Points: pts, Closed: true}, nil)
}

// polyline draws an open polyline, cut to the rectangle piece by piece.
func (p *pen) polyline(w float64, pts ...draw.Point) {
	for i := 1; i < len(pts); i++ {
		p.line(pts[i-1].X, pts[i-1].Y, pts[i].X, pts[i].Y, w)
	}
}

// batch adds a subpath (or, with d set, a circle) to the path of its
// style. It may join a path drawn earlier than other marks only when
// those are all of the same opaque colours, since reordering such marks
// changes no pixel; otherwise it starts a new path, keeping the order.
func (p *pen) batch(st draw.Style, sub draw.Subpath, d *draw.Disc) {
	for i := len(p.items) - 1; i >= 0; i-- {
		g, ok := p.items[i].(*draw.Path)
		if !ok || !sameInk(g.Style, st) {
			break
		}
		if sameStyle(g.Style, st) {
			if d != nil {
				g.Circles = append(g.Circles, *d)
			} else {
				g.Subpaths = append(g.Subpaths, sub)
			}
			return
		}
	}
	g := &draw.Path{Style: st}
	if d != nil {
		g.Circles = []draw.Disc{*d}
	} else {
		g.Subpaths = []draw.Subpath{sub}
	}
	p.items = append(p.items, g)
}

// done returns the marks as items, the gathered paths as values.
func (p *pen) done() []draw.Item {
	for i, it := range p.items {
		if g, ok := it.(*draw.Path); ok {
			p.items[i] = *g
		}
	}
	return p.items
}

// sameInk: both styles paint only one and the same opaque colour.
func sameInk(a, b draw.Style) bool {
	ca, cb := inkOf(a), inkOf(b)
	return ca == cb && ca.A == 255
}

// inkOf is a style's one colour, or none when it paints two different ones.
func inkOf(s draw.Style) draw.Color {
	switch {
	case s.Fill.None():
		return s.Stroke
	case s.Stroke.None() || s.Stroke == s.Fill:
		return s.Fill
	}
	return draw.Color{}
}

func sameStyle(a, b draw.Style) bool {
	if a.Stroke != b.Stroke || a.Fill != b.Fill || a.StrokeWidth != b.StrokeWidth || len(a.Dash) != len(b.Dash) {
		return false
	}
	for i := range a.Dash {
		if a.Dash[i] != b.Dash[i] {
			return false
		}
	}
	return true
}

// touches: a mark with these bounds may show. A tile keeps every mark.
func (p *pen) touches(x, y, w, h float64) bool {
	return p.tile || p.r.Intersects(draw.Rect{X: x, Y: y, W: w, H: h})
}

// cells calls fn for every cell of a w × h grid fixed to the page origin
// that may put marks in the pen's rectangle (margin is how far, in
// points, a cell's marks reach beyond the cell), or for a tile the cells
// of one period. i and j number the cell's column and row, wrapped round
// the period, so a motif can stagger odd rows or vary by cell and still
// repeat; the period must hold a whole (and, for staggered rows, even)
// number of cells.
func (p *pen) cells(w, h, margin float64, fn func(x, y float64, i, j int)) {
	ni, nj := p.count(w, p.period.X), p.count(h, p.period.Y)
	if p.tile {
		p.rowsPerTile = nj
		if math.Abs(float64(ni)*w-p.period.X) > 1e-9 || math.Abs(float64(nj)*h-p.period.Y) > 1e-9 {
			p.misfit = "the tile is not a whole number of cells"
		}
	}
	var i0, i1, j0, j1 int
	if p.tile {
		i0, i1, j0, j1 = 0, ni-1, 0, nj-1
	} else {
		r := p.r
		i0 = int(math.Floor((r.X - margin) / w))
		i1 = int(math.Floor((r.Right() + margin) / w))
		j0 = int(math.Floor((r.Y - margin) / h))
		j1 = int(math.Floor((r.Bottom() + margin) / h))
	}
	for j := j0; j <= j1; j++ {
		for i := i0; i <= i1; i++ {
			fn(float64(i)*w, float64(j)*h, wrap(i, ni), wrap(j, nj))
		}
	}
}

// count is how many cells of size c a period holds (0: no period).
func (p *pen) count(c, period float64) int {
	if period <= 0 {
		return 0
	}
	return max(1, int(math.Round(period/c)))
}

// wrap numbers cell i within a period of n cells (n = 0: no wrapping).
func wrap(i, n int) int {
	if n <= 0 {
		return i
	}
	return (i%n + n) % n
}

// rows calls fn for every row of height h, fixed to the page origin, that
// meets the pen's rectangle (for a tile, the rows of its cell): for
// motifs that run the full width.
func (p *pen) rows(h float64, fn func(y float64)) {
	r := p.r
	if p.tile && math.Abs(float64(p.count(h, r.H))*h-r.H) > 1e-9 {
		p.misfit = "the tile is not a whole number of rows"
	}
	for j := int(math.Floor(r.Y / h)); float64(j)*h <= r.Bottom(); j++ {
		if p.tile && float64(j)*h >= r.Bottom()-1e-9 {
			break // the next cell's first row
		}
		fn(float64(j) * h)
	}
}

// stagger is half a cell for odd rows: brick-like offsets. A tile must
// then hold an even number of rows.
func (p *pen) stagger(j int, w float64) float64 {
	if p.tile && p.rowsPerTile%2 != 0 {
		p.misfit = "staggered rows need an even number of rows per tile"
	}
	if j&1 != 0 {
		return w / 2
	}
	return 0
}

// hatch draws parallel lines at angle degrees (counter-clockwise from the
// x axis, as seen on the page) spaced apart, on a family of lines fixed
// to the page origin. At 45° and 135° the lines repeat every
// spacing·√2 along each axis: a tile's side must be a whole multiple of
// that (see diagonal). dash, if set ({on, off} in points), dashes them
// with the dashes also fixed to the page, so they too run on across
// touching rectangles.
func (p *pen) hatch(angle, spacing, w float64, dash []float64) {
	a := angle * math.Pi / 180
	// Direction on the page (y down, so counter-clockwise is -y).
	dx, dy := math.Cos(a), -math.Sin(a)
	nx, ny := -dy, dx // unit normal
	corners := [4]draw.Point{{X: p.r.X, Y: p.r.Y}, {X: p.r.Right(), Y: p.r.Y}, {X: p.r.X, Y: p.r.Bottom()}, {X: p.r.Right(), Y: p.r.Bottom()}}
	// Ranges over the rectangle of the offset across the lines and of
	// the position along them.
	lo, hi := math.Inf(1), math.Inf(-1)
	tlo, thi := math.Inf(1), math.Inf(-1)
	for _, c := range corners {
		o := nx*c.X + ny*c.Y
		lo, hi = math.Min(lo, o), math.Max(hi, o)
		t := dx*c.X + dy*c.Y
		tlo, thi = math.Min(tlo, t), math.Max(thi, t)
	}
	st := stroke(w)
	for k := math.Ceil(lo / spacing); k*spacing <= hi; k++ {
		o := k * spacing
		// Points on the line are (nx, ny)·o + (dx, dy)·t.
		at := func(t float64) (float64, float64) { return nx*o + dx*t, ny*o + dy*t }
		if len(dash) != 2 {
			x0, y0 := at(tlo - 1)
			x1, y1 := at(thi + 1)
			p.hatchLine(x0, y0, x1, y1, st)
			continue
		}
		period := dash[0] + dash[1]
		for t := math.Floor(tlo/period) * period; t <= thi; t += period {
			x0, y0 := at(t)
			x1, y1 := at(t + dash[0])
			p.hatchLine(x0, y0, x1, y1, st)
		}
	}
}

// hatchLine draws a piece of a hatch line cut to the rectangle, in a tile
// too: the pieces of one line in neighbouring cells meet end to end.
func (p *pen) hatchLine(x0, y0, x1, y1 float64, st draw.Style) {
	a, b, ok := draw.ClipSegment(p.r, draw.Point{X: x0, Y: y0}, draw.Point{X: x1, Y: y1})
	if ok {
		p.batch(st, draw.Subpath{Points: []draw.Point{a, b}}, nil)
	}
}

// hash gives a small deterministic pseudo-random value in [0, 1) for a
// cell, for motifs that should not look machine-regular.
func hash(i, j, salt int) float64 {
	h := uint32(i)*73856093 ^ uint32(j)*19349663 ^ uint32(salt)*83492791
	h ^= h >> 13
	h *= 0x5bd1e995
	h ^= h >> 15
	return float64(h%1000) / 1000
}
