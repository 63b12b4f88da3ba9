package out

import "github.com/tdewolff/canvas"

// clipToRect cuts a filled path to a rectangle: every subpath is flattened
// and clipped by Sutherland–Hodgman against the four edges, which is exact
// for a convex clip window and keeps each subpath's winding, so holes stay
// holes under the non-zero rule. It replaces canvas's general boolean
// operations here, which print warnings to standard output and can panic on
// degenerate input; layout only ever clips to rectangles.
func clipToRect(p *canvas.Path, r canvas.Rect) *canvas.Path {
	out := &canvas.Path{}
	for _, sub := range p.Flatten(canvas.Tolerance).Split() {
		poly := sub.Coords()
		if n := len(poly); n > 1 && poly[0].Equals(poly[n-1]) {
			poly = poly[:n-1]
		}
		poly = clipEdge(poly, func(q canvas.Point) bool { return q.X >= r.X0 }, func(a, b canvas.Point) canvas.Point { return atX(a, b, r.X0) })
		poly = clipEdge(poly, func(q canvas.Point) bool { return q.X <= r.X1 }, func(a, b canvas.Point) canvas.Point { return atX(a, b, r.X1) })
		poly = clipEdge(poly, func(q canvas.Point) bool { return q.Y >= r.Y0 }, func(a, b canvas.Point) canvas.Point { return atY(a, b, r.Y0) })
		poly = clipEdge(poly, func(q canvas.Point) bool { return q.Y <= r.Y1 }, func(a, b canvas.Point) canvas.Point { return atY(a, b, r.Y1) })
		if len(poly) < 3 {
			continue
		}
		out.MoveTo(poly[0].X, poly[0].Y)
		for _, q := range poly[1:] {
			out.LineTo(q.X, q.Y)
		}
		out.Close()
	}
	return out
}

// clipEdge is one Sutherland–Hodgman pass: keep the part of a closed
// polygon on the inside of one edge.
func clipEdge(poly []canvas.Point, inside func(canvas.Point) bool, cross func(a, b canvas.Point) canvas.Point) []canvas.Point {
	if len(poly) == 0 {
		return nil
	}
	out := make([]canvas.Point, 0, len(poly)+4)
	prev := poly[len(poly)-1]
	for _, cur := range poly {
		switch in, prevIn := inside(cur), inside(prev); {
		case in && prevIn:
			out = append(out, cur)
		case in && !prevIn:
			out = append(out, cross(prev, cur), cur)
		case !in && prevIn:
			out = append(out, cross(prev, cur))
		}
		prev = cur
	}
	return out
}

func atX(a, b canvas.Point, x float64) canvas.Point {
	t := (x - a.X) / (b.X - a.X)
	return canvas.Point{X: x, Y: a.Y + t*(b.Y-a.Y)}
}

func atY(a, b canvas.Point, y float64) canvas.Point {
	t := (y - a.Y) / (b.Y - a.Y)
	return canvas.Point{X: a.X + t*(b.X-a.X), Y: y}
}
