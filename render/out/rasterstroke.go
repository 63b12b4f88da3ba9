package out

import (
	"math"

	"github.com/tdewolff/canvas"
)

// rasterStrokeArea is the area a stroke of half-width h covers along a
// mark, for the raster, where canvas's general stroker settles every
// outline it makes (most of a pattern's raster time): a straight
// segment's butt-capped rectangle, or a convex polygon's ring between its
// mitred outer outline and its inner one. The area turns counter-clockwise
// (y up) and a ring's hole clockwise, as canvas's settled outlines do, so
// under the non-zero rule overlapping marks stay inked. nil where the mark
// is neither: canvas strokes it.
func rasterStrokeArea(pts []canvas.Point, closed bool, h float64) *canvas.Path {
	switch {
	case !closed && len(pts) == 2:
		return segmentOutline(pts[0], pts[1], h)
	case closed && len(pts) >= 3:
		return convexRing(pts, h)
	}
	return nil
}

// miterLimit is canvas's MiterJoin limit (and SVG's default): a corner
// whose miter reaches further than this many half-widths is bevelled.
const miterLimit = 4

// convexRing strokes a closed convex polygon with mitred corners: the
// outer outline has each corner's miter point (or, past the limit, both
// ends of its bevel), the inner one each corner's inward offset, whose
// edges all keep their direction while the stroke leaves a hole. A
// triangle whose inner edges all turn round has no hole: the stroke
// covers it. nil for anything else (a concave or degenerate polygon, or
// a hole that loses an edge), which canvas strokes.
func convexRing(in []canvas.Point, h float64) *canvas.Path {
	pts := in
	if n := len(pts); pts[0].Equals(pts[n-1]) {
		pts = pts[:n-1]
	}
	n := len(pts)
	if n < 3 || n > 16 || h <= 0 {
		return nil
	}
	var buf [16]canvas.Point
	ccw := buf[:n]
	copy(ccw, pts)
	area := 0.0
	for i, a := range ccw {
		b := ccw[(i+1)%n]
		area += a.X*b.Y - b.X*a.Y
	}
	if area == 0 {
		return nil
	}
	if area < 0 {
		for a, b := 0, n-1; a < b; a, b = a+1, b-1 {
			ccw[a], ccw[b] = ccw[b], ccw[a]
		}
	}
	// Outward unit normals of the edges: edge i runs from point i to i+1.
	var nbuf [16]canvas.Point
	normals := nbuf[:n]
	for i, a := range ccw {
		d := ccw[(i+1)%n].Sub(a)
		l := math.Hypot(d.X, d.Y)
		if l == 0 {
			return nil
		}
		normals[i] = canvas.Point{X: d.Y / l, Y: -d.X / l}
		next := ccw[(i+2)%n].Sub(ccw[(i+1)%n])
		if d.X*next.Y-d.Y*next.X <= 0 {
			return nil // not strictly convex
		}
	}
	out := &canvas.Path{}
	var ibuf [16]canvas.Point
	inner := ibuf[:n]
	for i, p := range ccw {
		n0, n1 := normals[(i+n-1)%n], normals[i]
		bis := n0.Add(n1)
		cos := math.Sqrt((1 + n0.Dot(n1)) / 2) // of half the angle between the normals
		if cos == 0 || bis.Length() == 0 {
			return nil
		}
		reach := h / cos
		bis = bis.Norm(1)
		if miterLimit*h < reach {
			a, b := p.Add(n0.Mul(h)), p.Add(n1.Mul(h))
			lineOrMove(out, i, a)
			out.LineTo(b.X, b.Y)
		} else {
			lineOrMove(out, i, p.Add(bis.Mul(reach)))
		}
		inner[i] = p.Sub(bis.Mul(reach))
	}
	out.Close()
	kept, turned := 0, 0
	for i, a := range inner {
		d, e := ccw[(i+1)%n].Sub(ccw[i]), inner[(i+1)%n].Sub(a)
		if d.Dot(e) > 0 {
			kept++
		} else {
			turned++
		}
	}
	switch {
	case kept == n:
		// The hole, clockwise.
		out.MoveTo(inner[n-1].X, inner[n-1].Y)
		for i := n - 2; i >= 0; i-- {
			out.LineTo(inner[i].X, inner[i].Y)
		}
		out.Close()
	case turned == n && n == 3:
	default:
		return nil
	}
	return out
}

func lineOrMove(p *canvas.Path, i int, q canvas.Point) {
	if i == 0 {
		p.MoveTo(q.X, q.Y)
	} else {
		p.LineTo(q.X, q.Y)
	}
}

// ringArea is the area a stroke of half-width h covers along a circle
// of radius r about c: canvas's own stroke outline of that circle, made
// once per radius and width about the origin and moved to c (the same
// outline, to rounding, without settling it again for every copy).
func (r *pngRenderer) ringArea(c canvas.Point, radius, h float64) *canvas.Path {
	key := [2]float64{radius, h}
	ring, ok := r.rings[key]
	if !ok {
		circle := &canvas.Path{}
		addCircle(circle, canvas.Point{}, radius, false)
		ring = circle.Stroke(2*h, canvas.ButtCap, canvas.MiterJoin, canvas.PixelTolerance/r.res.DPMM())
		if r.rings == nil {
			r.rings = map[[2]float64]*canvas.Path{}
		}
		if len(r.rings) < maxRings {
			r.rings[key] = ring
		}
	}
	return ring.Copy().Translate(c.X, c.Y)
}

// maxRings bounds the ring outlines a raster keeps.
const maxRings = 256
