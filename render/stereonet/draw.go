package stereonet

import (
	"fmt"
	"math"

	"github.com/tremie-dev/tremie/render/draw"
)

var (
	netInk     = draw.RGB(0x22, 0x22, 0x22)
	gridInk    = draw.RGB(0xAA, 0xAA, 0xAA)
	grey       = draw.RGB(0x69, 0x69, 0x69)
	contourInk = draw.RGB(0x88, 0x22, 0x55) // Tol's "muted" wine, apart from the pole marks
	roseFill   = draw.RGB(0xBB, 0xCC, 0xEE)
)

// Plotted is one pole to draw with its mark.
type Plotted struct {
	Axis
	Role string
	Mark func(at draw.Point) []draw.Item
}

// Point is where an axis falls on a net of radius r centred at c, in page
// coordinates (y down).
func Point(c draw.Point, r float64, a Axis) draw.Point {
	x, y := EqualArea(a)
	return draw.Point{X: c.X + r*x, Y: c.Y - r*y}
}

// Net draws the primitive circle with its 10° ticks and compass letters,
// the Kamb contours of d when given, and the poles.
func Net(c draw.Point, r float64, poles []Plotted, d *Density) []draw.Item {
	items := []draw.Item{draw.Circle{Style: draw.Style{Stroke: netInk, StrokeWidth: 0.8, Fill: draw.White}, Center: c, R: r, Role: "stereonet:primitive"}}
	ticks := draw.Path{Style: draw.Style{Stroke: netInk, StrokeWidth: 0.5}}
	for az := 0; az < 360; az += 10 {
		t := rad(float64(az))
		l := 3.0
		if az%90 == 0 {
			l = 6
		}
		ticks.Subpaths = append(ticks.Subpaths, draw.Subpath{Points: []draw.Point{
			{X: c.X + r*math.Sin(t), Y: c.Y - r*math.Cos(t)}, {X: c.X + (r+l)*math.Sin(t), Y: c.Y - (r+l)*math.Cos(t)}}})
	}
	// The centre cross.
	ticks.Subpaths = append(ticks.Subpaths, draw.Subpath{Points: []draw.Point{{X: c.X - 3, Y: c.Y}, {X: c.X + 3, Y: c.Y}}},
		draw.Subpath{Points: []draw.Point{{X: c.X, Y: c.Y - 3}, {X: c.X, Y: c.Y + 3}}})
	items = append(items, ticks)
	for _, l := range []struct {
		s      string
		dx, dy float64
		a      draw.Anchor
	}{{"N", 0, -r - 9, draw.Middle}, {"E", r + 9, 3, draw.Start}, {"S", 0, r + 16, draw.Middle}, {"W", -r - 9, 3, draw.End}} {
		items = append(items, draw.Text{At: draw.Point{X: c.X + l.dx, Y: c.Y + l.dy}, S: l.s, Size: 8, Font: draw.Bold, Anchor: l.a, Color: netInk})
	}
	if d != nil {
		for i, lv := range d.Levels() {
			p := draw.Path{Style: draw.Style{Stroke: contourInk, StrokeWidth: 0.5 + 0.3*float64(i)}, Role: fmt.Sprintf("stereonet:contour:%d", 2*(i+1))}
			for _, s := range d.Contour(lv) {
				p.Subpaths = append(p.Subpaths, draw.Subpath{Points: []draw.Point{{X: c.X + r*s.X0, Y: c.Y - r*s.Y0}, {X: c.X + r*s.X1, Y: c.Y - r*s.Y1}}})
			}
			if len(p.Subpaths) > 0 {
				items = append(items, p)
			}
		}
	}
	for _, p := range poles {
		at := Point(c, r, p.Axis)
		for _, it := range p.Mark(at) {
			items = append(items, draw.WithRole(it, p.Role))
		}
	}
	return items
}

// Rose draws counts per bin of width degrees as petals from c, the
// petal's radius proportional to the square root of its count so that
// its area, not its length, stands for the count (an equal-area rose),
// with rings at round counts.
func Rose(c draw.Point, r float64, bins []int, width float64) []draw.Item {
	items := []draw.Item{draw.Circle{Style: draw.Style{Stroke: netInk, StrokeWidth: 0.8, Fill: draw.White}, Center: c, R: r, Role: "rose:frame"}}
	hi := 0
	for _, n := range bins {
		hi = max(hi, n)
	}
	if hi == 0 {
		return items
	}
	step := max(1, int(math.Ceil(float64(hi)/4)))
	for n := step; n <= hi; n += step {
		rr := r * math.Sqrt(float64(n)/float64(hi))
		items = append(items, draw.Circle{Style: draw.Style{Stroke: gridInk, StrokeWidth: 0.4, Dash: []float64{1.5, 1.5}}, Center: c, R: rr},
			// The ring's count stands on it at 25°, clear of the N.
			draw.Text{At: draw.Point{X: c.X + rr*math.Sin(rad(25)) + 1, Y: c.Y - rr*math.Cos(rad(25)) - 1}, S: fmt.Sprint(n), Size: 6, Color: grey})
	}
	for i, n := range bins {
		if n == 0 {
			continue
		}
		rr := r * math.Sqrt(float64(n)/float64(hi))
		pts := []draw.Point{c}
		for k := 0; k <= 4; k++ {
			t := rad(float64(i)*width + float64(k)*width/4)
			pts = append(pts, draw.Point{X: c.X + rr*math.Sin(t), Y: c.Y - rr*math.Cos(t)})
		}
		items = append(items, draw.Shape{Style: draw.Style{Stroke: netInk, StrokeWidth: 0.5, Fill: roseFill}, Points: pts, Closed: true,
			Role: fmt.Sprintf("rose:bin:%d", int(float64(i)*width))})
	}
	for _, l := range []struct {
		s      string
		dx, dy float64
		a      draw.Anchor
	}{{"N", 0, -r - 4, draw.Middle}, {"E", r + 4, 3, draw.Start}, {"S", 0, r + 10, draw.Middle}, {"W", -r - 4, 3, draw.End}} {
		items = append(items, draw.Text{At: draw.Point{X: c.X + l.dx, Y: c.Y + l.dy}, S: l.s, Size: 8, Font: draw.Bold, Anchor: l.a, Color: netInk})
	}
	return items
}
