package sheet

import (
	"math"
	"sort"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// part is one piece of the well as the sheet shows it: a borehole, a
// fill, a casing, a string, the lithology log... It paints itself on one
// sheet (clipping with the painter's vis/visible), labels itself with
// callouts, names the legend symbols it paints on a sheet showing a
// window of depths, so the legend is known without painting, and reports
// the depths it spans, which the sheets must show.
//
// To add one: a type in its own file with these five methods, listed by
// layout.assemble at its place in the reading order, in the layer it is
// painted in. The legend must name exactly what paint paints:
// TestLegendIsWhatIsPainted compares the two on the demo, the gallery and
// the rule fixtures; TestPaintOrder reads the stacking from a layout.
type part interface {
	// stack is where the part is painted: by layer, then by sub within
	// the layer; parts of one stack paint in the order they are listed.
	stack() stack
	paint(p *painter) []draw.Item
	callouts(l *layout) []callout
	legend(l *layout, v window) []symbol
	// extent is the depths the part spans; false for none of its own.
	extent(l *layout) (schema.Interval, bool)
}

// hull is the smallest interval holding every one of ivs.
func hull(ivs ...schema.Interval) (schema.Interval, bool) {
	if len(ivs) == 0 {
		return schema.Interval{}, false
	}
	h := ivs[0]
	for _, iv := range ivs[1:] {
		h.Top, h.Bottom = min(h.Top, iv.Top), max(h.Bottom, iv.Bottom)
	}
	return h, true
}

// at is the interval of a point.
func at(d schema.Length) schema.Interval { return schema.Interval{Top: d, Bottom: d} }

// depthRange is the depth range the sheets must show: from the highest
// part above ground (or the ground) to the total depth or the deepest
// part.
func (l *layout) depthRange() (top, bot schema.Length) {
	bot = l.w.TotalDepth
	for _, pt := range l.parts {
		if iv, ok := pt.extent(l); ok {
			top, bot = min(top, iv.Top), max(bot, iv.Bottom)
		}
	}
	return top, bot
}

// layer is a stage of the drawing, bottom first.
type layer int

const (
	layerLog         layer = iota // the lithology column and descriptions, beside the well
	layerHole                     // the hole's white ground
	layerPad                      // the concrete pad
	layerFill                     // fills placed in the hole
	layerCasing                   // outer casings, outermost first, each with what fills its bore
	layerOpenHole                 // uncased hole, cleared
	layerString                   // the well strings with their caps and centralizers
	layerCentralizer              // the outer casings' centralizers
	layerSurface                  // protective casing and vault
	layerWalls                    // hole walls and the ground line, so every fill ends on a clean edge
	layerMark                     // laps, shoes, pump and tags, above the pipes
	layerWater                    // water levels, on top
	layerFeatures                 // the wall-feature column, beside the well
)

// stack orders painting: layer first, then sub (an outer casing's rank,
// so that what fills its bore paints right after it).
type stack struct {
	layer layer
	sub   int
}

func (s stack) before(o stack) bool {
	if s.layer != o.layer {
		return s.layer < o.layer
	}
	return s.sub < o.sub
}

func on(l layer) stack { return stack{layer: l} }

// window is the depths a sheet shows, its pads included at the ends.
type window struct{ lo, hi schema.Length }

// everywhere shows every depth: the whole well's legend.
var everywhere = window{schema.Length(math.Inf(-1)), schema.Length(math.Inf(1))}

// shows reports whether any of [top, bot] is in the window.
func (v window) shows(top, bot schema.Length) bool { return min(bot, v.hi) > max(top, v.lo) }

// showsAt reports whether a depth is in the window.
func (v window) showsAt(d schema.Length) bool { return d >= v.lo && d <= v.hi }

// assemble lists the well's parts in reading order, the order their
// labels are gathered in: surface completion, outer casings, strings,
// fills, boreholes, open hole, water levels, then the supply-well parts;
// the log columns and the wall features have no labels.
func (l *layout) assemble() []part {
	w := l.w
	ps := []part{lithologyPart{}}
	if w.Surface.Protective != nil {
		ps = append(ps, protectivePart{})
	}
	if w.Surface.Vault != nil && w.Surface.Kind != schema.StickUp {
		ps = append(ps, vaultPart{})
	}
	if _, ok := padInterval(w.Surface); ok {
		ps = append(ps, padPart{})
	}

	// Outer casings paint outermost first, each followed by the fills
	// placed in its bore and the laps hung in it.
	byOD := make([]int, len(w.Casings))
	for i := range byOD {
		byOD[i] = i
	}
	sort.SliceStable(byOD, func(a, b int) bool { return od(w.Casings[byOD[a]].Pipe) > od(w.Casings[byOD[b]].Pipe) })
	rank := make([]int, len(w.Casings))
	for r, ci := range byOD {
		rank[ci] = r
	}
	mpCasing, mpString, mpNamed := l.measuringPointPipe()
	for i, c := range w.Casings {
		ps = append(ps, casingPart{ci: i, rank: rank[i], mp: i == mpCasing})
		if len(c.Centralizers) > 0 {
			ps = append(ps, casingCentralizers(i))
		}
	}
	for si, s := range w.Strings {
		ps = append(ps, stringPart{si: si, mp: si == mpString, mpNamed: mpNamed})
		if len(s.Centralizers) > 0 {
			ps = append(ps, stringCentralizers(si))
		}
	}
	for i, f := range w.Fills {
		fp := fillPart{fi: i, host: -1}
		if f.Within != "" {
			for ci, c := range w.Casings {
				if f.Within == c.Label() {
					fp.host, fp.rank = ci, rank[ci]
					break
				}
			}
		}
		ps = append(ps, fp)
	}
	for i := range w.Boreholes {
		ps = append(ps, boreholePart{i})
	}
	for i := range w.OpenHoles {
		ps = append(ps, openHolePart{i})
	}
	ps = append(ps, wallsPart{}, groundPart{})
	for i := range w.WaterLevels {
		ps = append(ps, waterPart{i})
	}

	// Supply wells: liners with their laps, drive shoes, the pump and the
	// tags of fill tops.
	for i := range w.Strings {
		if lp, ok := newLapPart(l, i, rank); ok {
			ps = append(ps, lp)
			if lp.liner.LapSeal != "" {
				ps = append(ps, lapSealPart{lp})
			}
		}
	}
	for i, c := range w.Casings {
		if c.DriveShoe {
			ps = append(ps, shoePart{ci: i})
		}
	}
	if w.Pump != nil {
		ps = append(ps, pumpPart{})
	}
	for i, f := range w.Fills {
		if len(f.Tags) > 0 {
			ps = append(ps, tagPart{fi: i})
		}
	}
	if len(w.Features) > 0 {
		ps = append(ps, featuresPart{})
	}
	return ps
}

// paintOrder is the parts in the order they are painted.
func paintOrder(ps []part) []part {
	out := append([]part(nil), ps...)
	sort.SliceStable(out, func(i, j int) bool { return out[i].stack().before(out[j].stack()) })
	return out
}

// paintLayers paints the parts of the layers from lo to hi.
func (p *painter) paintLayers(lo, hi layer) []draw.Item {
	var items []draw.Item
	for _, pt := range p.l.painted {
		if s := pt.stack(); s.layer >= lo && s.layer <= hi {
			items = append(items, pt.paint(p)...)
		}
	}
	return items
}

// legendOf is the legend of a sheet showing the window: every symbol
// its parts name, in the table's order.
func (l *layout) legendOf(v window) []symbol {
	seen := map[string]symbol{}
	for _, pt := range l.parts {
		for _, s := range pt.legend(l, v) {
			seen[s.key] = s
		}
	}
	return sortedSymbols(seen)
}
