package out

import (
	"math"

	"github.com/tdewolff/canvas"

	"github.com/tremie-dev/tremie/render/draw"
)

// edgeSlack (mm) absorbs rounding when a mark ends on the clip edge.
const edgeSlack = 1e-9

// circleCCW is the turning of canvas's circles, which filled subpaths
// of a compound path are made to share (see compound).
var circleCCW = canvas.Circle(1).CCW()

// compound draws a draw.Path as few canvas paths: the subpaths that lie
// inside the clip as one path in the item's style; those cut by the clip
// edge as exact filled areas, their stroke outline computed here (a
// straight segment's is a rectangle) and cut by clipToRect. Filled
// subpaths all turn the same way, so under the non-zero rule overlapping
// marks stay filled as they would be drawn one by one.
func (p *painter) compound(it draw.Path, clip *draw.Rect, path string) {
	if c := p.newCompound(it.Style, clip); c != nil {
		c.add(it, 0, 0, path)
		c.flush()
	}
}

// A compoundPath gathers the marks of one style, possibly from many
// paths (a pattern's tile laid cell by cell), into the few canvas paths
// that flush draws.
type compoundPath struct {
	p            *painter
	st           canvas.Style
	fill, stroke bool
	clip         *draw.Rect
	cr           canvas.Rect
	whole        *canvas.Path
	cutFill      *canvas.Path
	cutStroke    *canvas.Path // stroke outlines of cut straight segments, as area
	cutOutlines  []*canvas.Path
	raster       *pngRenderer // set when drawing a raster, for strokeArea
	wholeFill    *canvas.Path // raster: fills of whole marks stroked through strokeArea
	strokeArea   *canvas.Path // raster: the stroke of whole marks, as area
	half         float64
	cubic        bool
	pts          []canvas.Point
	seg          [2]draw.Point
}

// newCompound starts gathering marks of style s under clip; nil when the
// style paints nothing.
func (p *painter) newCompound(s draw.Style, clip *draw.Rect) *compoundPath {
	st, fill, stroke := p.style(s)
	if !fill && !stroke {
		return nil
	}
	c := &compoundPath{p: p, st: st, fill: fill, stroke: stroke, clip: clip,
		whole: &canvas.Path{}, cutFill: &canvas.Path{}, cutStroke: &canvas.Path{},
		half: st.StrokeWidth / 2, pts: make([]canvas.Point, 0, 8)}
	if clip != nil {
		c.cr = p.rect(*clip)
	}
	// PDF has no arcs, and canvas's own replacement of them is
	// quadratic in a long path, so circles go to PDF as Béziers.
	_, c.cubic = p.r.(pdfRenderer)
	if r, ok := p.r.(*pngRenderer); ok {
		c.raster, c.wholeFill, c.strokeArea = r, &canvas.Path{}, &canvas.Path{}
	}
	return c
}

// place sorts one subpath by where it lies: b bounds it (canvas
// millimetres), build adds it to a path. On a raster, area (if not nil)
// is the subpath's stroke as area (see rasterStrokeArea).
func (c *compoundPath) place(b canvas.Rect, build func(*canvas.Path), closed, joins bool, seg []canvas.Point, area *canvas.Path) {
	if area != nil && (c.clip == nil || c.cr.Expand(edgeSlack).Contains(area.FastBounds())) {
		c.strokeArea = c.strokeArea.Append(area)
		if c.fill && closed {
			build(c.wholeFill)
		}
		return
	}
	if c.clip == nil {
		build(c.whole)
		return
	}
	reach := 0.0
	if c.stroke {
		reach = c.half
		if joins {
			reach = 2 * c.st.StrokeWidth
		}
	}
	b = b.Expand(reach)
	var quad *canvas.Path
	if c.stroke && seg != nil {
		// A straight segment's stroke is exactly this rectangle (its
		// dashes parts of it), so one ending square on the clip edge
		// counts as inside.
		quad = segmentOutline(seg[0], seg[1], c.half)
		b = quad.FastBounds()
	}
	switch {
	case c.cr.Expand(edgeSlack).Contains(b):
		build(c.whole)
		return
	case !c.cr.Overlaps(b):
		return
	}
	sub := &canvas.Path{}
	build(sub)
	var outline *canvas.Path // the stroke's area, computed once
	if c.stroke && quad == nil && joins {
		outline = strokeOutline(sub, c.st, false)
		if fitsIn(outline, c.cr) {
			// The reach above is a bound for the joins; the stroke itself
			// stays inside, so the subpath is drawn stroked, not outlined.
			build(c.whole)
			return
		}
	}
	if len(c.st.Dashes) > 0 {
		quad = nil // a cut dashed segment is outlined dash by dash below
	}
	if c.fill {
		area := sub
		if !closed {
			area = sub.Copy()
			area.Close()
		}
		c.cutFill = c.cutFill.Append(clipToRect(area, c.cr))
	}
	if !c.stroke {
		return
	}
	if quad != nil {
		c.cutStroke = c.cutStroke.Append(clipToRect(quad, c.cr))
		return
	}
	if outline == nil || len(c.st.Dashes) > 0 {
		outline = strokeOutline(sub, c.st, true)
	}
	if part := clipToRect(outline, c.cr); !part.Empty() {
		c.cutOutlines = append(c.cutOutlines, part)
	}
}

// add gathers the marks of it, moved by (dx, dy) points.
func (c *compoundPath) add(it draw.Path, dx, dy float64, path string) {
	p := c.p
	for j, sp := range it.Subpaths {
		if len(sp.Points) < 2 {
			continue
		}
		pts := c.pts[:0]
		ok := true
		src := sp.Points
		if c.clip != nil && len(src) == 2 && !sp.Closed && finite(src[0].X, src[0].Y, src[1].X, src[1].Y) {
			// A straight mark is cut to the clip first, as a pattern
			// drawn straight onto the page cuts it, so that its stroke
			// is a rectangle ending on the edge (see place).
			a, e, in := draw.ClipSegment(draw.Rect{X: c.clip.X - dx, Y: c.clip.Y - dy, W: c.clip.W, H: c.clip.H}, src[0], src[1])
			if !in {
				continue
			}
			c.seg = [2]draw.Point{a, e}
			src = c.seg[:]
		}
		for _, q := range src {
			if !finite(q.X, q.Y) {
				ok = false
				break
			}
			pts = append(pts, p.pos(q.X+dx, q.Y+dy))
		}
		c.pts = pts
		if !ok {
			p.fail(path, "path %q subpath %d is not finite", it.Role, j)
			continue
		}
		if c.fill && len(pts) > 2 && (signedArea(pts) > 0) != circleCCW {
			for a, b := 0, len(pts)-1; a < b; a, b = a+1, b-1 {
				pts[a], pts[b] = pts[b], pts[a]
			}
		}
		b := canvas.Rect{X0: pts[0].X, Y0: pts[0].Y, X1: pts[0].X, Y1: pts[0].Y}
		for _, q := range pts[1:] {
			b = b.AddPoint(q)
		}
		closed := sp.Closed
		build := func(dst *canvas.Path) {
			dst.MoveTo(pts[0].X, pts[0].Y)
			for _, q := range pts[1:] {
				dst.LineTo(q.X, q.Y)
			}
			if closed {
				dst.Close()
			}
		}
		var seg []canvas.Point
		if len(pts) == 2 && !closed {
			seg = pts[:2]
		}
		var area *canvas.Path
		if c.raster != nil && c.stroke && len(c.st.Dashes) == 0 {
			area = rasterStrokeArea(pts, closed, c.half)
		}
		c.place(b, build, closed, closed || len(pts) > 2, seg, area)
	}
	for j, d := range it.Circles {
		if !finite(d.Center.X, d.Center.Y, d.R) {
			p.fail(path, "path %q circle %d is not finite", it.Role, j)
			continue
		}
		if d.R <= 0 {
			continue
		}
		q, r := p.pos(d.Center.X+dx, d.Center.Y+dy), d.R*mmPerPt
		b := canvas.Rect{X0: q.X - r, Y0: q.Y - r, X1: q.X + r, Y1: q.Y + r}
		var area *canvas.Path
		if c.raster != nil && c.stroke && len(c.st.Dashes) == 0 {
			area = c.raster.ringArea(q, r, c.half)
		}
		c.place(b, func(dst *canvas.Path) { addCircle(dst, q, r, c.cubic) }, true, false, nil, area)
	}
}

// flush draws what was gathered.
func (c *compoundPath) flush() {
	r := c.p.r
	if !c.cutFill.Empty() {
		fs := canvas.DefaultStyle
		fs.Fill = c.st.Fill
		r.RenderPath(c.cutFill, fs, canvas.Identity)
	}
	switch {
	case c.raster != nil && !c.strokeArea.Empty():
		c.raster.renderPath(c.whole, c.st, canvas.Identity, c.wholeFill, c.strokeArea)
	case !c.whole.Empty():
		r.RenderPath(c.whole, c.st, canvas.Identity)
	}
	ss := canvas.DefaultStyle
	ss.Fill = c.st.Stroke
	if !c.cutStroke.Empty() {
		r.RenderPath(c.cutStroke, ss, canvas.Identity)
	}
	// Outlines canvas computed may hold holes (a ring's); each is drawn
	// alone so one's hole never cancels another's ink.
	for _, o := range c.cutOutlines {
		r.RenderPath(o, ss, canvas.Identity)
	}
}

// addCircle adds a circle to dst, turning like canvas.Circle: as two
// arcs, or as four cubic Béziers (control points at 0.5523 of the radius,
// within 0.03 % of the circle).
func addCircle(dst *canvas.Path, c canvas.Point, r float64, cubic bool) {
	dst.MoveTo(c.X+r, c.Y)
	if !cubic {
		dst.ArcTo(r, r, 0, false, true, c.X-r, c.Y)
		dst.ArcTo(r, r, 0, false, true, c.X+r, c.Y)
		dst.Close()
		return
	}
	k := r * 4 * (math.Sqrt2 - 1) / 3
	s := 1.0 // counter-clockwise, y up
	if !circleCCW {
		s = -1
	}
	dst.CubeTo(c.X+r, c.Y+s*k, c.X+k, c.Y+s*r, c.X, c.Y+s*r)
	dst.CubeTo(c.X-k, c.Y+s*r, c.X-r, c.Y+s*k, c.X-r, c.Y)
	dst.CubeTo(c.X-r, c.Y-s*k, c.X-k, c.Y-s*r, c.X, c.Y-s*r)
	dst.CubeTo(c.X+k, c.Y-s*r, c.X+r, c.Y-s*k, c.X+r, c.Y)
	dst.Close()
}

// segmentOutline is the area a butt-capped stroke of half-width h covers
// along a to b: a rectangle, turning like canvas's circles.
func segmentOutline(a, b canvas.Point, h float64) *canvas.Path {
	d := b.Sub(a)
	l := math.Hypot(d.X, d.Y)
	out := &canvas.Path{}
	if l == 0 {
		return out
	}
	n := canvas.Point{X: -d.Y / l * h, Y: d.X / l * h}
	c := [4]canvas.Point{a.Sub(n), b.Sub(n), b.Add(n), a.Add(n)} // counter-clockwise
	if !circleCCW {
		c[1], c[3] = c[3], c[1]
	}
	out.MoveTo(c[0].X, c[0].Y)
	for _, q := range c[1:] {
		out.LineTo(q.X, q.Y)
	}
	out.Close()
	return out
}

// signedArea is positive for a counter-clockwise polygon (y up).
func signedArea(pts []canvas.Point) float64 {
	s := 0.0
	for i, a := range pts {
		b := pts[(i+1)%len(pts)]
		s += a.X*b.Y - b.X*a.Y
	}
	return s / 2
}
