package out

import (
	"fmt"
	"math"
	"strconv"

	"github.com/tremie-dev/tremie/render/draw"
)

// A patternPainter fills a region with a tile: the SVG and PDF writers
// define the tile once and fill by reference; the raster draws the
// tile's marks over the region.
type patternPainter interface {
	// fill paints area (page points, already cut to the visible clip)
	// with copies of t laid on the page grid.
	fill(p *painter, t *draw.Tile, area draw.Rect, path string)
}

const (
	// minTileSide bounds how many copies a fill may take (a page of
	// 1 pt tiles is about a million cells).
	minTileSide = 1.0
	// tileDecimals is the precision of tile geometry written to files:
	// a thousandth of a point.
	tileDecimals = 3
	// maxFillCopies bounds the mark copies one raster fill lays (cells ×
	// marks), which page size and tile size alone leave at 200 million
	// (a 1 pt tile over the largest page). The fullest fill of our
	// symbol tables, the weathered-rock tile (58 marks in 24 × 20 pt)
	// over a whole Tabloid sheet, lays about 117,000. Past the bound the
	// fill is reported, not drawn; under it, a fill takes a second or two
	// at most (500,000 dots: 2 s on a busy 2-core machine).
	maxFillCopies = 500_000
	// maxTileCopies bounds the copies of marks one tile holds, a mark
	// reaching past its cell being copied into every cell it reaches (see
	// wrapCopies), which the marks' extent alone leaves unbounded. Our
	// symbols hold at most 58 marks, each reaching one neighbour or
	// three: a few hundred copies.
	maxTileCopies = 10_000
)

// tileMarks is a tile's marks as paths, checked once per document: every
// Box, Shape and Circle becomes a one-subpath Path, so the writers handle
// one kind of mark. ink bounds the marks with their stroke's reach.
type tileMarks struct {
	paths []draw.Path
	ink   draw.Rect
	count int // subpaths and circles
}

// marksOf checks a tile and converts its marks.
func marksOf(t *draw.Tile) (tileMarks, error) {
	var m tileMarks
	if t == nil {
		return m, fmt.Errorf("pattern without a tile")
	}
	if !finite(t.W, t.H) || t.W < minTileSide || t.H < minTileSide || t.W > maxPageSide || t.H > maxPageSide {
		return m, fmt.Errorf("tile %q is %g × %g pt; each side must be %g–%d pt", t.ID, t.W, t.H, minTileSide, maxPageSide)
	}
	x0, y0, x1, y1 := math.Inf(1), math.Inf(1), math.Inf(-1), math.Inf(-1)
	grow := func(q draw.Point, reach float64) {
		x0, y0 = math.Min(x0, q.X-reach), math.Min(y0, q.Y-reach)
		x1, y1 = math.Max(x1, q.X+reach), math.Max(y1, q.Y+reach)
	}
	for k, it := range t.Items {
		var g draw.Path
		switch it := it.(type) {
		case draw.Path:
			g = it
		case draw.Shape:
			g = draw.Path{Style: it.Style, Subpaths: []draw.Subpath{{Points: it.Points, Closed: it.Closed}}}
		case draw.Box:
			r := normRect(it.Rect)
			g = draw.Path{Style: it.Style, Subpaths: []draw.Subpath{{Closed: true, Points: []draw.Point{
				{X: r.X, Y: r.Y}, {X: r.Right(), Y: r.Y}, {X: r.Right(), Y: r.Bottom()}, {X: r.X, Y: r.Bottom()}}}}}
		case draw.Circle:
			g = draw.Path{Style: it.Style, Circles: []draw.Disc{{Center: it.Center, R: it.R}}}
		default:
			return m, fmt.Errorf("tile %q mark %d: %T cannot be a pattern mark", t.ID, k, it)
		}
		if seeThrough(g.Fill) || seeThrough(g.Stroke) {
			// Pattern streams carry no transparency state.
			return m, fmt.Errorf("tile %q mark %d is translucent; pattern marks are opaque", t.ID, k)
		}
		reach := markReach(g.Style)
		for _, sp := range g.Subpaths {
			for _, q := range sp.Points {
				if !finite(q.X, q.Y) {
					return m, fmt.Errorf("tile %q mark %d is not finite", t.ID, k)
				}
				grow(q, reach)
			}
		}
		for _, c := range g.Circles {
			if !finite(c.Center.X, c.Center.Y, c.R) || c.R < 0 {
				return m, fmt.Errorf("tile %q mark %d: a circle is not finite", t.ID, k)
			}
			grow(c.Center, c.R+reach)
		}
		m.paths = append(m.paths, g)
	}
	if x0 <= x1 {
		m.ink = draw.Rect{X: x0, Y: y0, W: x1 - x0, H: y1 - y0}
	}
	copies := 0.0
	for _, g := range m.paths {
		m.count += len(g.Subpaths) + len(g.Circles)
		reach := markReach(g.Style)
		for _, sp := range g.Subpaths {
			if len(sp.Points) > 0 {
				copies += wrapCount(t, subpathBounds(sp.Points, reach))
			}
		}
		for _, c := range g.Circles {
			copies += wrapCount(t, draw.Rect{X: c.Center.X - c.R - reach, Y: c.Center.Y - c.R - reach, W: 2 * (c.R + reach), H: 2 * (c.R + reach)})
		}
	}
	if copies > maxTileCopies {
		return m, fmt.Errorf("tile %q: its marks reach so far past its %g × %g pt cell that it would hold %.0f copies of them, more than %d", t.ID, t.W, t.H, copies, maxTileCopies)
	}
	return m, nil
}

// wrapCount is at most how many offsets wrapCopies tries for a mark with
// bounds b, counted without trying them.
func wrapCount(t *draw.Tile, b draw.Rect) float64 {
	na := math.Ceil((t.W-b.X)/t.W) - math.Floor(-b.Right()/t.W) - 1
	nc := math.Ceil((t.H-b.Y)/t.H) - math.Floor(-b.Bottom()/t.H) - 1
	return max(na, 0) * max(nc, 0)
}

// markReach is how far a style's ink reaches past a mark's outline: half
// the stroke, or up to the miter limit (4) times that at a corner.
func markReach(s draw.Style) float64 {
	if s.Stroke.None() {
		return 0
	}
	return 2 * strokeWidth(s)
}

// cellsOver gives the range of tile cells (i0..i1, j0..j1) whose copy of
// ink (the marks' bounds in the tile) meets area.
func cellsOver(t *draw.Tile, ink, area draw.Rect) (i0, i1, j0, j1 int) {
	i0 = int(math.Floor((area.X - ink.Right()) / t.W))
	i1 = int(math.Ceil((area.Right() - ink.X) / t.W))
	j0 = int(math.Floor((area.Y - ink.Bottom()) / t.H))
	j1 = int(math.Ceil((area.Bottom() - ink.Y) / t.H))
	return
}

// wrapCopies calls fn with every offset (whole tiles) at which a mark
// with bounds b shows inside the tile's own cell: a mark reaching past
// an edge is drawn again on the other side, since a vector pattern cuts
// each copy to its cell.
func wrapCopies(t *draw.Tile, b draw.Rect, fn func(dx, dy float64)) {
	cell := draw.Rect{W: t.W, H: t.H}
	for a := int(math.Floor(-b.Right()/t.W)) + 1; float64(a)*t.W+b.X < t.W; a++ {
		for c := int(math.Floor(-b.Bottom()/t.H)) + 1; float64(c)*t.H+b.Y < t.H; c++ {
			dx, dy := float64(a)*t.W, float64(c)*t.H
			if cell.Intersects(draw.Rect{X: b.X + dx, Y: b.Y + dy, W: b.W, H: b.H}) {
				fn(dx, dy)
			}
		}
	}
}

// subpathBounds bounds a subpath's points with reach added.
func subpathBounds(pts []draw.Point, reach float64) draw.Rect {
	x0, y0, x1, y1 := math.Inf(1), math.Inf(1), math.Inf(-1), math.Inf(-1)
	for _, q := range pts {
		x0, y0 = math.Min(x0, q.X), math.Min(y0, q.Y)
		x1, y1 = math.Max(x1, q.X), math.Max(y1, q.Y)
	}
	return draw.Rect{X: x0 - reach, Y: y0 - reach, W: x1 - x0 + 2*reach, H: y1 - y0 + 2*reach}
}

// clockwise reports whether a polygon turns clockwise as seen on the
// page (y down); filled marks are all written turning one way, so under
// the non-zero rule overlapping marks stay filled.
func clockwise(pts []draw.Point) bool {
	s := 0.0
	for i, a := range pts {
		b := pts[(i+1)%len(pts)]
		s += a.X*b.Y - b.X*a.Y
	}
	return s > 0
}

// appendNum writes v rounded to decimals places, without trailing zeros.
func appendNum(b []byte, v float64, decimals int) []byte {
	k := math.Pow10(decimals)
	v = math.Round(v*k) / k
	if v == 0 {
		v = 0 // no "-0"
	}
	return strconv.AppendFloat(b, v, 'f', -1, 64)
}

// rasterPatterns draws a pattern's marks itself, for the raster: the
// tile's marks are laid in every cell that meets the region and cut to
// it, one compound path per mark style, so a fill costs a few paths.
type rasterPatterns struct {
	marks map[*draw.Tile]tileMarks
}

func (rp *rasterPatterns) fill(p *painter, t *draw.Tile, area draw.Rect, path string) {
	m, ok := rp.marks[t]
	if !ok {
		var err error
		if m, err = marksOf(t); err != nil {
			p.fail(path, "%v", err)
			return
		}
		if rp.marks == nil {
			rp.marks = map[*draw.Tile]tileMarks{}
		}
		rp.marks[t] = m
	}
	if m.ink.W <= 0 && m.ink.H <= 0 {
		return
	}
	i0, i1, j0, j1 := cellsOver(t, m.ink, area)
	if copies := float64(i1-i0+1) * float64(j1-j0+1) * float64(m.count); copies > maxFillCopies {
		p.fail(path, "pattern %q over %g × %g pt would lay %.0f copies of its marks on the raster, more than %d", t.ID, area.W, area.H, copies, maxFillCopies)
		return
	}
	for _, g := range m.paths {
		c := p.newCompound(g.Style, &area)
		if c == nil {
			continue
		}
		for j := j0; j <= j1; j++ {
			for i := i0; i <= i1; i++ {
				c.add(g, float64(i)*t.W, float64(j)*t.H, path)
			}
		}
		c.flush()
	}
}

func seeThrough(c draw.Color) bool { return c.A > 0 && c.A < 255 }

// eachCopy walks the marks of g as a vector writer lays them in the
// tile's cell: every subpath (filled ones turned clockwise on the page,
// so under the non-zero rule overlapping marks stay filled) and every
// circle, once for each offset at which it shows in the cell.
func eachCopy(t *draw.Tile, g draw.Path, sub func(pts []draw.Point, closed bool, dx, dy float64), disc func(d draw.Disc, dx, dy float64)) {
	reach := markReach(g.Style)
	for _, sp := range g.Subpaths {
		if len(sp.Points) < 2 {
			continue
		}
		pts := sp.Points
		if !g.Fill.None() && len(pts) > 2 && !clockwise(pts) {
			pts = reversed(pts)
		}
		wrapCopies(t, subpathBounds(pts, reach), func(dx, dy float64) { sub(pts, sp.Closed, dx, dy) })
	}
	for _, d := range g.Circles {
		if d.R <= 0 {
			continue
		}
		b := draw.Rect{X: d.Center.X - d.R - reach, Y: d.Center.Y - d.R - reach, W: 2 * (d.R + reach), H: 2 * (d.R + reach)}
		wrapCopies(t, b, func(dx, dy float64) { disc(d, dx, dy) })
	}
}

func reversed(pts []draw.Point) []draw.Point {
	out := make([]draw.Point, len(pts))
	for i, q := range pts {
		out[len(pts)-1-i] = q
	}
	return out
}
