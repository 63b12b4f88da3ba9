package sheet

import (
	"math"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/features"
	"github.com/tremie-dev/tremie/schema"
)

// The feature track: a column beside the open hole, for a well with wall
// features, holding the unwrapped wall image (resampled to the sheet's
// resolution) with each picked trace drawn over it as its sinusoid, and a
// dip track with a mark per feature at its dip on a 0–90° scale and a
// tick toward its dip direction (north up). Everything is drawn at the
// sheet's depth scale; the hole is taken as vertical, as the head says.

// Share of the body width the feature column takes, from the description
// and callout columns, and the share of the column the image takes.
const (
	featureFromDesc  = 0.04
	featureFromCall  = 0.13
	featureImageFrac = 0.58
	stripDPI         = 200.0 // pixels per inch of the strip as drawn
)

// layFeatureColumn makes room for the feature column between the
// description and the well when the well has features.
func (l *layout) layFeatureColumn(width float64) {
	if len(l.w.Features) == 0 {
		return
	}
	c := &l.cols
	fromDesc, fromCall := featureFromDesc*width, featureFromCall*width
	c.desc.W -= fromDesc
	c.feat = xRange{X: c.desc.Right(), W: fromDesc + fromCall}
	c.well.X = c.feat.Right()
	c.call.X = c.well.Right()
	c.call.W -= fromCall
}

// featureGeom are the track's two parts.
type featureGeom struct {
	strip, dip xRange
}

func (l *layout) featureGeom() featureGeom {
	c := l.cols.feat
	sw := c.W * featureImageFrac
	return featureGeom{strip: xRange{X: c.X + 2, W: sw - 3}, dip: xRange{X: c.X + sw + 5, W: c.W - sw - 10}}
}

// frame is the image whose azimuths the strip shows: the first wall
// image, or north at the left, clockwise, when there is none.
func (l *layout) frame() schema.WallImage {
	if len(l.w.WallImages) > 0 {
		return l.w.WallImages[0]
	}
	return schema.WallImage{Clockwise: true}
}

// frameOf is the image a feature was picked on, or the strip's frame.
func (l *layout) frameOf(f *schema.Feature) schema.WallImage {
	if im, ok := l.w.WallImageNamed(f.Image); ok {
		return im
	}
	return l.frame()
}

// featuresPart is the wall-feature column of a well with features.
type featuresPart struct{}

func (featuresPart) stack() stack { return on(layerFeatures) }

func (featuresPart) callouts(*layout) []callout { return nil }

func (featuresPart) extent(l *layout) (schema.Interval, bool) {
	var ivs []schema.Interval
	for _, f := range l.w.Features {
		ivs = append(ivs, at(f.Depth))
	}
	for _, wi := range l.w.WallImages {
		ivs = append(ivs, wi.Interval)
	}
	return hull(ivs...)
}

func (featuresPart) legend(l *layout, v window) []symbol {
	if l.cols.feat.W == 0 {
		return nil
	}
	var out []symbol
	for i := range l.w.Features {
		f := &l.w.Features[i]
		if fit, _, ok := traceOf(l.w, f); ok && v.showsAt(Length(fit.A)) {
			out = append(out, traceSymbol())
		}
		if f.Orient.HasAttitude && v.showsAt(f.Depth) {
			out = append(out, featureSymbol(features.MarkFor(f)), tickSymbol())
		}
	}
	return out
}

func (featuresPart) paint(p *painter) []draw.Item { return p.featureTrack() }

// featureTrack paints the feature column of one sheet.
func (p *painter) featureTrack() []draw.Item {
	l := p.l
	if l.cols.feat.W == 0 {
		return nil
	}
	g := l.featureGeom()
	y0, y1 := p.clipY()
	var items []draw.Item
	items = append(items, p.wallStrips(g)...)
	items = append(items, p.traces(g)...)
	items = append(items, p.dipTrack(g, y0, y1)...)
	col := l.cols.feat
	out := []draw.Item{draw.Clip{Rect: draw.Rect{X: col.X, Y: y0, W: col.W, H: y1 - y0}, Items: items}}
	return append(out, l.featureHead(g)...)
}

// wallStrips places each image's visible depths, resampled so that a
// printed pixel is 1/200 in whatever the image's own size.
func (p *painter) wallStrips(g featureGeom) []draw.Item {
	var items []draw.Item
	for _, wi := range p.l.w.WallImages {
		ya, yb, ok := p.vis(wi.Top, wi.Bottom)
		if !ok {
			continue
		}
		r := draw.Rect{X: g.strip.X, Y: ya, W: g.strip.W, H: yb - ya}
		im := p.l.in.WallImages[wi.Name]
		if im == nil {
			items = append(items, box(r, lightGrey, 0.4, draw.RGB(245, 245, 245), "wall-image-missing:"+wi.Name))
			continue
		}
		span := float64(wi.Bottom - wi.Top)
		top := float64(max(wi.Top, p.dlo)-wi.Top) / span
		bot := float64(min(wi.Bottom, p.dhi)-wi.Top) / span
		pw := max(1, min(2048, int(math.Round(r.W/72*stripDPI))))
		ph := max(1, min(8192, int(math.Round(r.H/72*stripDPI))))
		data, err := im.Strip(top, bot, pw, ph)
		if err != nil {
			continue
		}
		items = append(items, draw.Image{Rect: r, Data: data, Role: "wall-image:" + wi.Name}, box(r, grey, 0.4, draw.Color{}, ""))
	}
	// Quarter lines, so a trace's low point can be read against N, E, S, W.
	fr := p.l.frame()
	lines := draw.Path{Style: draw.Style{Stroke: draw.RGB(150, 150, 150), StrokeWidth: 0.3, Dash: []float64{1, 2}}}
	y0, y1 := p.clipY()
	for az := 0.0; az < 360; az += 90 {
		x := g.strip.X + fr.ColumnOf(az)*g.strip.W
		lines.Subpaths = append(lines.Subpaths, draw.Subpath{Points: []draw.Point{{X: x, Y: y0}, {X: x, Y: y1}}})
	}
	return append(items, lines)
}

// traceSteps is the finest division of a sinusoid; traceTolerance (pt)
// how far its drawn polyline may stray from it, a twentieth of the
// thinnest trace's width, so a flat trace takes a few points, not 121.
const (
	traceSteps     = 120
	traceTolerance = 0.04
)

// sampleCurve samples at(u), u from 0 to 1, on a grid of steps segments,
// keeping only the grid points needed for the polyline through them to
// stay within tol of every grid point (Douglas–Peucker over the grid).
func sampleCurve(at func(u float64) draw.Point, steps int, tol float64) []draw.Point {
	grid := make([]draw.Point, steps+1)
	for k := range grid {
		grid[k] = at(float64(k) / float64(steps))
	}
	keep := make([]bool, len(grid))
	keep[0], keep[steps] = true, true
	var simplify func(i, j int)
	simplify = func(i, j int) {
		a, b := grid[i], grid[j]
		dx, dy := b.X-a.X, b.Y-a.Y
		n := math.Hypot(dx, dy)
		far, worst := -1, tol
		for k := i + 1; k < j; k++ {
			q := grid[k]
			d := math.Hypot(q.X-a.X, q.Y-a.Y)
			if n > 0 {
				d = math.Abs(dx*(q.Y-a.Y)-dy*(q.X-a.X)) / n
			}
			if d > worst {
				far, worst = k, d
			}
		}
		if far < 0 {
			return
		}
		keep[far] = true
		simplify(i, far)
		simplify(far, j)
	}
	simplify(0, steps)
	out := make([]draw.Point, 0, 16)
	for k, q := range grid {
		if keep[k] {
			out = append(out, q)
		}
	}
	return out
}

// traces draws each feature's sinusoid across the strip: solid from
// picks, dashed where only a dip was given (the trace it implies).
func (p *painter) traces(g featureGeom) []draw.Item {
	l := p.l
	var items []draw.Item
	for i := range l.w.Features {
		f := &l.w.Features[i]
		fit, dashed, ok := traceOf(l.w, f)
		if !ok {
			continue
		}
		if !p.visible(Length(fit.A)) {
			continue
		}
		fr := l.frameOf(f)
		at := func(u float64) draw.Point {
			return draw.Point{X: g.strip.X + u*g.strip.W, Y: p.y(fit.DepthAt(fr.AzimuthAt(u)))}
		}
		pts := sampleCurve(at, traceSteps, traceTolerance)
		st := draw.Style{Stroke: ink, StrokeWidth: 0.8}
		if f.IsWaterBearing() {
			st = draw.Style{Stroke: waterBlue, StrokeWidth: 1.1}
		}
		if dashed {
			st.Dash = []float64{2, 1.5}
		}
		halo := draw.Style{Stroke: draw.White, StrokeWidth: st.StrokeWidth + 1.2}
		items = append(items, draw.Shape{Style: halo, Points: pts}, draw.Shape{Style: st, Points: pts, Role: "feature-trace:" + f.Path})
	}
	return items
}

// Length is schema.Length, for sinusoid depths held in metres.
type Length = schema.Length

// traceOf is a feature's trace: the fitted one, or for a given dip the
// one it implies in the hole at the feature's depth.
func traceOf(w *schema.Well, f *schema.Feature) (fit schema.Sinusoid, implied, ok bool) {
	o := f.Orient
	if o.Picked != nil {
		return o.Picked.Fit, false, true
	}
	if o.Given == nil {
		return schema.Sinusoid{}, false, false
	}
	b, found := w.BoreholeAt(f.Depth)
	if !found {
		return schema.Sinusoid{}, false, false
	}
	// Back from true north to the file's azimuths, which the strip shows.
	dd := o.Given.DipDirection
	if w.Orientation.North == schema.MagneticNorth {
		dd = schema.NormAzimuth(dd - w.Orientation.Declination)
	}
	h := b.Diameter.Metres() * math.Tan(o.Given.Dip*math.Pi/180)
	return schema.SinusoidFromHighLow(f.Depth-Length(h/2), f.Depth+Length(h/2), dd), true, true
}

// dipTrack draws the 0–90° scale and a mark per feature with a tick
// toward its dip direction, north up.
func (p *painter) dipTrack(g featureGeom, y0, y1 float64) []draw.Item {
	l := p.l
	grid := draw.Path{Style: draw.Style{Stroke: lightGrey, StrokeWidth: 0.4}}
	for d := 0.0; d <= 90; d += 45 {
		x := g.dip.X + d/90*g.dip.W
		grid.Subpaths = append(grid.Subpaths, draw.Subpath{Points: []draw.Point{{X: x, Y: y0}, {X: x, Y: y1}}})
	}
	items := []draw.Item{grid}
	for i := range l.w.Features {
		f := &l.w.Features[i]
		o := f.Orient
		if !o.HasAttitude || !p.visible(f.Depth) {
			continue
		}
		at := draw.Point{X: g.dip.X + o.Dip/90*g.dip.W, Y: p.y(f.Depth)}
		mk := features.MarkFor(f)
		t := o.DipDirection * math.Pi / 180
		const tick = 7.0
		items = append(items, draw.Shape{Style: draw.Style{Stroke: ink, StrokeWidth: 0.7}, Points: []draw.Point{at, {X: at.X + tick*math.Sin(t), Y: at.Y - tick*math.Cos(t)}}, Role: "feature-tick:" + f.Path})
		for k, it := range mk.Draw(at, 5) {
			if k == 0 {
				it = draw.WithRole(it, "feature-dip:"+f.Path)
			}
			items = append(items, it)
		}
	}
	return items
}

// featureHead writes the column's heads: the strip's azimuths and the
// dip scale, and that the hole is taken as vertical.
func (l *layout) featureHead(g featureGeom) []draw.Item {
	b := l.body
	c := l.cols.feat
	items := []draw.Item{line(c.X, b.Y, c.X, b.Bottom(), 0.4, ink, "")}
	items = append(items, text(g.strip.Center(), b.Y+8, fit("WALL IMAGE", draw.Bold, sizeTiny, g.strip.W), draw.Bold, sizeTiny, draw.Middle, ink, "column-head"),
		text(g.dip.Center(), b.Y+8, "DIP", draw.Bold, sizeTiny, draw.Middle, ink, "column-head"))
	fr := l.frame()
	for i, s := range []string{"N", "E", "S", "W"} {
		x := g.strip.X + fr.ColumnOf(float64(i)*90)*g.strip.W
		a := draw.Middle
		if x < g.strip.X+3 {
			a = draw.Start
		}
		items = append(items, text(x, b.Y+15, s, draw.Regular, sizeTiny, a, grey, "column-head"))
	}
	for d := 0.0; d <= 90; d += 45 {
		a := draw.Middle
		switch d {
		case 0:
			a = draw.Start
		case 90:
			a = draw.End
		}
		items = append(items, text(g.dip.X+d/90*g.dip.W, b.Y+15, schema.TrimFloat(d, 0), draw.Regular, sizeTiny, a, grey, "column-head"))
	}
	items = append(items, text(c.Center(), b.Y+21, fit("hole taken as vertical", draw.Italic, sizeTiny-0.5, c.W-2), draw.Italic, sizeTiny-0.5, draw.Middle, grey, "column-head:vertical"))
	return items
}

// featureSymbol is a feature mark as a legend entry.
func featureSymbol(mk features.Mark) symbol {
	sw := func(r draw.Rect) []draw.Item {
		return mk.Draw(draw.Point{X: r.X + r.W/2, Y: r.Y + r.H/2}, 6)
	}
	return symbol{key: "feature:" + mk.Key, label: mk.Label, order: 90000 + features.LegendOrder(mk.Key), paint: sw, swatch: sw}
}

// tickSymbol explains the dip track's marks.
func tickSymbol() symbol {
	sw := func(r draw.Rect) []draw.Item {
		at := draw.Point{X: r.X + r.W*0.4, Y: r.Y + r.H*0.6}
		return []draw.Item{draw.Shape{Style: draw.Style{Stroke: ink, StrokeWidth: 0.7}, Points: []draw.Point{at, {X: at.X + 5, Y: at.Y - 4}}},
			draw.Circle{Style: draw.Style{Stroke: ink, StrokeWidth: 0.7, Fill: draw.White}, Center: at, R: 2.5}}
	}
	return symbol{key: "feature:tick", label: "Dip 0–90°, tick toward dip direction (north up)", order: 89998, paint: sw, swatch: sw}
}

// traceSymbol is the legend entry of a trace on the wall strip.
func traceSymbol() symbol {
	sw := func(r draw.Rect) []draw.Item {
		var pts []draw.Point
		for k := 0; k <= 12; k++ {
			u := float64(k) / 12
			pts = append(pts, draw.Point{X: r.X + u*r.W, Y: r.Y + r.H/2 + r.H*0.3*math.Cos(2*math.Pi*(u-0.35))})
		}
		return []draw.Item{draw.Shape{Style: draw.Style{Stroke: ink, StrokeWidth: 0.8}, Points: pts}}
	}
	return symbol{key: "feature:trace", label: "Feature trace on the wall (dashed: from a given dip)", order: 89999, paint: sw, swatch: sw}
}
