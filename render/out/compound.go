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
	st, fill, stroke := p.style(it.Style)
	if !fill && !stroke {
		return
	}
	var cr canvas.Rect
	if clip != nil {
		cr = p.rect(*clip)
	}
	whole := &canvas.Path{}
	cutFill := &canvas.Path{}
	cutStroke := &canvas.Path{} // stroke outlines of cut straight segments, as area
	var cutOutlines []*canvas.Path
	half := st.StrokeWidth / 2

	// PDF has no arcs, and canvas's own replacement of them is
	// quadratic in a long path, so circles go to PDF as Béziers.
	_, cubic := p.r.(pdfRenderer)

	// place sorts one subpath by where it lies: b bounds it (canvas
	// millimetres), build adds it to a path.
	place := func(b canvas.Rect, build func(*canvas.Path), closed, joins bool, seg []canvas.Point) {
		if clip == nil {
			build(whole)
			return
		}
		reach := 0.0
		if stroke {
			reach = half
			if joins {
				reach = 2 * st.StrokeWidth
			}
		}
		b = b.Expand(reach)
		var quad *canvas.Path
		if stroke && seg != nil && len(st.Dashes) == 0 {
			// A straight segment's stroke is exactly this rectangle, so
			// one ending square on the clip edge counts as inside.
			quad = segmentOutline(seg[0], seg[1], half)
			b = quad.FastBounds()
		}
		switch {
		case cr.Expand(edgeSlack).Contains(b):
			build(whole)
			return
		case !cr.Overlaps(b):
			return
		}
		sub := &canvas.Path{}
		build(sub)
		if fill {
			area := sub
			if !closed {
				area = sub.Copy()
				area.Close()
			}
			cutFill = cutFill.Append(clipToRect(area, cr))
		}
		if !stroke {
			return
		}
		if quad != nil {
			cutStroke = cutStroke.Append(clipToRect(quad, cr))
			return
		}
		outline := sub
		if len(st.Dashes) > 0 {
			outline = outline.Dash(0, st.Dashes...)
		}
		outline = outline.Stroke(st.StrokeWidth, canvas.ButtCap, canvas.MiterJoin, canvas.Tolerance)
		if part := clipToRect(outline, cr); !part.Empty() {
			cutOutlines = append(cutOutlines, part)
		}
	}

	pts := make([]canvas.Point, 0, 8)
	for j, sp := range it.Subpaths {
		if len(sp.Points) < 2 {
			continue
		}
		pts = pts[:0]
		ok := true
		for _, q := range sp.Points {
			if !finite(q.X, q.Y) {
				ok = false
				break
			}
			pts = append(pts, p.pos(q.X, q.Y))
		}
		if !ok {
			p.fail(path, "path %q subpath %d is not finite", it.Role, j)
			continue
		}
		if fill && len(pts) > 2 && (signedArea(pts) > 0) != circleCCW {
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
		place(b, build, closed, closed || len(pts) > 2, seg)
	}
	for j, c := range it.Circles {
		if !finite(c.Center.X, c.Center.Y, c.R) {
			p.fail(path, "path %q circle %d is not finite", it.Role, j)
			continue
		}
		if c.R <= 0 {
			continue
		}
		q, r := p.pos(c.Center.X, c.Center.Y), c.R*mmPerPt
		b := canvas.Rect{X0: q.X - r, Y0: q.Y - r, X1: q.X + r, Y1: q.Y + r}
		place(b, func(dst *canvas.Path) { addCircle(dst, q, r, cubic) }, true, false, nil)
	}

	if !cutFill.Empty() {
		fs := canvas.DefaultStyle
		fs.Fill = st.Fill
		p.r.RenderPath(cutFill, fs, canvas.Identity)
	}
	if !whole.Empty() {
		p.r.RenderPath(whole, st, canvas.Identity)
	}
	ss := canvas.DefaultStyle
	ss.Fill = st.Stroke
	if !cutStroke.Empty() {
		p.r.RenderPath(cutStroke, ss, canvas.Identity)
	}
	// Outlines canvas computed may hold holes (a ring's); each is drawn
	// alone so one's hole never cancels another's ink.
	for _, o := range cutOutlines {
		p.r.RenderPath(o, ss, canvas.Identity)
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
