package symbols

import (
	"math"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// The table. Every pattern below is ours. The soil motifs follow one
// grammar so a reader can decode an unfamiliar symbol: rings are gravel,
// dots are sand, dash-and-dot rows are silt, unbroken lines are clay,
// tufts are organic matter; a well-graded soil mixes mark sizes where a
// poorly graded one repeats one size; a silty or clayey coarse soil adds
// the silt or clay mark; high plasticity doubles the fine-soil mark.
// Fill materials use shapes the soils do not: beads, stipple, chips,
// rings with a core, diamonds, hatching, triangles, zigzags.

// Annular fill materials, in schema.Materials order.
var materialSymbols = []Symbol{
	{ID: "fill:filter-pack", Name: "Filter pack", Kind: Material, Fill: groundSand, marks: filterPack, period: draw.Point{X: 2.8, Y: 4.8}},
	{ID: "fill:fine-sand", Name: "Fine sand", Kind: Material, Fill: groundSand, marks: fineSand, period: draw.Point{X: 12, Y: 10.8}},
	{ID: "fill:bentonite-chips", Name: "Bentonite chips", Kind: Material, Fill: groundBentonite, marks: bentoniteChips, period: draw.Point{X: 10, Y: 8.4}},
	{ID: "fill:bentonite-pellets", Name: "Bentonite pellets", Kind: Material, Fill: groundBentonite, marks: bentonitePellets, period: draw.Point{X: 4, Y: 7.2}},
	{ID: "fill:bentonite-granular", Name: "Granular bentonite", Kind: Material, Fill: groundBentonite, marks: bentoniteGranular, period: draw.Point{X: 3, Y: 5.2}},
	{ID: "fill:bentonite-grout", Name: "Bentonite grout", Kind: Material, Fill: groundBentonite, marks: bentoniteGrout, period: draw.Point{X: 3.6, Y: 3.6}},
	{ID: "fill:neat-cement", Name: "Neat cement grout", Kind: Material, Fill: groundRock, marks: neatCement, period: draw.Point{X: 5, Y: 5}},
	{ID: "fill:cement-bentonite", Name: "Cement-bentonite grout", Kind: Material, Fill: groundRock, marks: cementBentonite, period: draw.Point{X: 5, Y: 5}},
	{ID: "fill:sand-cement", Name: "Sand-cement grout", Kind: Material, Fill: groundRock, marks: sandCement, period: draw.Point{X: 10, Y: 10}},
	{ID: "fill:concrete", Name: "Concrete", Kind: Material, Fill: groundRock, marks: concrete, period: draw.Point{X: 14, Y: 12}},
	{ID: "fill:native-backfill", Name: "Native backfill", Kind: Material, Fill: groundPlaced, marks: nativeBackfill, period: draw.Point{X: 20, Y: 18}},
	{ID: "fill:cave-in", Name: "Cave-in (collapsed formation)", Kind: Material, Fill: groundPlaced, marks: caveIn, period: draw.Point{X: 6, Y: 8}},
}

// unknownMaterial stands in for a material the table does not know.
var unknownMaterial = Symbol{ID: "fill:unknown", Name: "Fill, material not recognised", Kind: Material, Fill: groundUnknown, marks: unrecognisedFill, period: draw.Point{X: 7, Y: 7}}

// Soils: the ASTM D2487 groups with their group names.
var soilSymbols = []Symbol{
	{ID: "soil:GW", Code: "GW", Name: "Well-graded gravel", Kind: Lithology, Fill: groundGravel, marks: gravelWell, period: draw.Point{X: 8, Y: 8}},
	{ID: "soil:GP", Code: "GP", Name: "Poorly graded gravel", Kind: Lithology, Fill: groundGravel, marks: gravelPoor, period: draw.Point{X: 5, Y: 8.8}},
	{ID: "soil:GM", Code: "GM", Name: "Silty gravel", Kind: Lithology, Fill: groundGravel, marks: gravelSilty, period: draw.Point{X: 7, Y: 12}},
	{ID: "soil:GC", Code: "GC", Name: "Clayey gravel", Kind: Lithology, Fill: groundGravel, marks: gravelClayey, period: draw.Point{X: 6, Y: 10}},
	{ID: "soil:SW", Code: "SW", Name: "Well-graded sand", Kind: Lithology, Fill: groundSand, marks: sandWell, period: draw.Point{X: 6, Y: 6}},
	{ID: "soil:SP", Code: "SP", Name: "Poorly graded sand", Kind: Lithology, Fill: groundSand, marks: sandPoor, period: draw.Point{X: 3.4, Y: 6}},
	{ID: "soil:SM", Code: "SM", Name: "Silty sand", Kind: Lithology, Fill: groundSand, marks: sandSilty, period: draw.Point{X: 6, Y: 8.8}},
	{ID: "soil:SC", Code: "SC", Name: "Clayey sand", Kind: Lithology, Fill: groundSand, marks: sandClayey, period: draw.Point{X: 4, Y: 8}},
	{ID: "soil:ML", Code: "ML", Name: "Silt", Kind: Lithology, Fill: groundSilt, marks: siltLow, period: draw.Point{X: 5, Y: 5.6}},
	{ID: "soil:MH", Code: "MH", Name: "Elastic silt", Kind: Lithology, Fill: groundSilt, marks: siltHigh, period: draw.Point{X: 5.5, Y: 7.2}},
	{ID: "soil:CL", Code: "CL", Name: "Lean clay", Kind: Lithology, Fill: groundClay, marks: clayLow, period: draw.Point{X: 4, Y: 2.6}},
	{ID: "soil:CH", Code: "CH", Name: "Fat clay", Kind: Lithology, Fill: groundClay, marks: clayHigh, period: draw.Point{X: 4, Y: 3.6}},
	{ID: "soil:OL", Code: "OL", Name: "Organic silt or clay, low plasticity", Kind: Lithology, Fill: groundOrganic, marks: organicLow, period: draw.Point{X: 7, Y: 10}},
	{ID: "soil:OH", Code: "OH", Name: "Organic silt or clay, high plasticity", Kind: Lithology, Fill: groundOrganic, marks: organicHigh, period: draw.Point{X: 6, Y: 12}},
	{ID: "soil:PT", Code: "PT", Name: "Peat", Kind: Lithology, Fill: groundOrganic, marks: peat, period: draw.Point{X: 4, Y: 6.8}},
}

// Rock classes and made ground; the words each is recognised by are in
// lookup.go.
var rockSymbols = []Symbol{
	{ID: "rock:crystalline", Name: "Igneous or metamorphic (crystalline) rock", Kind: Lithology, Fill: groundRock, marks: crystalline, period: draw.Point{X: 7, Y: 12}},
	{ID: "rock:sandstone", Name: "Sandstone or conglomerate", Kind: Lithology, Fill: groundRock, marks: sandstone, period: draw.Point{X: 12, Y: 12}},
	{ID: "rock:shale", Name: "Shale, mudstone or siltstone", Kind: Lithology, Fill: groundRock, marks: shale, period: draw.Point{X: 7, Y: 4}},
	{ID: "rock:limestone", Name: "Limestone or dolomite", Kind: Lithology, Fill: groundRock, marks: limestone, period: draw.Point{X: 9, Y: 9}},
	{ID: "rock:weathered", Name: "Weathered rock or saprolite", Kind: Lithology, Fill: groundWeathered, marks: weathered, period: draw.Point{X: 24, Y: 20}},
	{ID: "rock:fill", Name: "Fill (made ground)", Kind: Lithology, Fill: groundPlaced, marks: madeGround, period: draw.Point{X: 6, Y: 6}},
	{ID: "rock:unclassified", Name: "Rock or soil, not classified", Kind: Lithology, Fill: groundUnknown, marks: unclassified, period: draw.Point{X: 7, Y: 7}},
}

// Material and lithology entries by ID, and the fallbacks.
var (
	byID            = map[string]Symbol{}
	unclassifiedRow Symbol // the last rock row, with its tile (set by init)
)

func init() {
	unknownMaterial.tile = makeTile(unknownMaterial)
	for _, list := range [][]Symbol{materialSymbols, soilSymbols, rockSymbols, partSymbols, {unknownMaterial}} {
		for i, s := range list {
			if s.period.X > 0 && s.period.Y > 0 && s.tile == nil {
				list[i].tile = makeTile(s)
				s = list[i]
			}
			if _, dup := byID[s.ID]; dup {
				panic("symbols: duplicate id " + s.ID)
			}
			byID[s.ID] = s
		}
	}
	unclassifiedRow = rockSymbols[len(rockSymbols)-1]
	if len(materialSymbols) != len(schema.Materials) {
		panic("symbols: the material table and schema.Materials differ in length")
	}
	for i, m := range schema.Materials {
		if materialSymbols[i].ID != "fill:"+string(m) {
			panic("symbols: material table out of step with schema.Materials at " + string(m))
		}
	}
}

// ---- fill materials ----

// filterPack: small rings close-packed in a hexagonal array, like beads.
func filterPack(p *pen) {
	const w, h = 2.8, 2.4
	p.cells(w, h, 1.5, func(x, y float64, _, j int) {
		p.ring(x+p.stagger(j, w)+w/2, y+h/2, 0.85, 0.35)
	})
}

// fineSand: a dense stipple of fine dots.
func fineSand(p *pen) {
	const w, h = 2.0, 1.8
	p.cells(w, h, 1, func(x, y float64, i, j int) {
		p.dot(x+p.stagger(j, w)+0.5+0.6*hash(i, j, 1), y+0.9, 0.32)
	})
}

// bentoniteChips: solid angular chips, scattered in two orientations.
func bentoniteChips(p *pen) {
	const w, h = 5.0, 4.2
	p.cells(w, h, 3, func(x, y float64, i, j int) {
		x += p.stagger(j, w)
		if (i+j)&1 == 0 {
			p.poly(true, draw.Point{X: x + 0.8, Y: y + 1.0}, draw.Point{X: x + 3.2, Y: y + 0.6}, draw.Point{X: x + 2.6, Y: y + 2.4}, draw.Point{X: x + 1.0, Y: y + 2.7})
		} else {
			p.poly(true, draw.Point{X: x + 1.2, Y: y + 0.7}, draw.Point{X: x + 3.4, Y: y + 1.6}, draw.Point{X: x + 1.6, Y: y + 2.9})
		}
	})
}

// bentonitePellets: rings with a solid core, in staggered rows.
func bentonitePellets(p *pen) {
	const w, h = 4.0, 3.6
	p.cells(w, h, 2, func(x, y float64, _, j int) {
		cx, cy := x+p.stagger(j, w)+w/2, y+h/2
		p.ring(cx, cy, 1.15, 0.4)
		p.dot(cx, cy, 0.4)
	})
}

// bentoniteGranular: small solid diamonds, densely staggered.
func bentoniteGranular(p *pen) {
	const w, h, d = 3.0, 2.6, 0.75
	p.cells(w, h, 1.5, func(x, y float64, _, j int) {
		cx, cy := x+p.stagger(j, w)+w/2, y+h/2
		p.poly(true, draw.Point{X: cx, Y: cy - d}, draw.Point{X: cx + d, Y: cy}, draw.Point{X: cx, Y: cy + d}, draw.Point{X: cx - d, Y: cy})
	})
}

// bentoniteGrout: a single hatch rising to the right.
func bentoniteGrout(p *pen) { p.hatch(45, diagonal(3.6), markWidth, nil) }

// neatCement: a cross-hatch of two unbroken sets.
func neatCement(p *pen) {
	p.hatch(45, diagonal(5), markWidth, nil)
	p.hatch(135, diagonal(5), markWidth, nil)
}

// cementBentonite: the grout hatch crossed by a dashed set: half cement.
func cementBentonite(p *pen) {
	// One dash and gap per line spacing, so the dashes repeat with the
	// lines (1.9 : 1.64, about the 1.6 : 1.4 the eye reads as half-broken).
	p.hatch(45, diagonal(5), markWidth, nil)
	p.hatch(135, diagonal(5), markWidth, []float64{1.9, diagonal(5) - 1.9})
}

// sandCement: the grout hatch one way only, with sand stipple between
// the lines: cement carrying sand.
func sandCement(p *pen) {
	p.hatch(45, diagonal(5), markWidth, nil)
	const w, h = 10.0 / 3, 2.5
	p.cells(w, h, 2, func(x, y float64, i, j int) {
		p.dot(x+p.stagger(j, w)+0.6+0.8*hash(i, j, 2), y+1.3, 0.3)
	})
}

// concrete: open triangles (aggregate) among dots.
func concrete(p *pen) {
	const w, h = 7.0, 6.0
	p.cells(w, h, 3, func(x, y float64, i, j int) {
		x += p.stagger(j, w)
		tri := func(cx, cy, s float64, up bool) {
			k := s
			if !up {
				k = -s
			}
			p.poly(false, draw.Point{X: cx, Y: cy - k}, draw.Point{X: cx + s, Y: cy + k*0.7}, draw.Point{X: cx - s, Y: cy + k*0.7})
		}
		tri(x+2.0, y+2.2, 1.4, (i+j)&1 == 0)
		tri(x+5.3, y+4.4, 1.0, (i+j)&1 == 1)
		p.dot(x+5.0, y+1.3, 0.35)
		p.dot(x+1.6, y+5.0, 0.35)
	})
}

// nativeBackfill: a jumble of short strokes at varying angles and small
// rings: soil put back as it came.
func nativeBackfill(p *pen) {
	const w, h = 5.0, 4.5
	p.cells(w, h, 3, func(x, y float64, i, j int) {
		a := hash(i, j, 7)*2 - 1 // slope -1..1
		cx, cy := x+1.8, y+1.6
		p.line(cx-1.2, cy-1.2*a, cx+1.2, cy+1.2*a, markWidth)
		p.ring(x+3.8, y+3.4, 0.6, 0.35)
		p.dot(x+1.0, y+3.7, 0.3)
	})
}

// caveIn: broken zigzag bands: formation that fell in.
func caveIn(p *pen) {
	const w, h = 6.0, 4.0
	p.cells(w, h, 2, func(x, y float64, _, j int) {
		x += p.stagger(j, w)
		p.polyline(markWidth,
			draw.Point{X: x + 0.4, Y: y + 2.8}, draw.Point{X: x + 1.6, Y: y + 1.0},
			draw.Point{X: x + 2.8, Y: y + 2.8}, draw.Point{X: x + 4.0, Y: y + 1.0})
	})
}

// ---- soils ----

// gravelWell: rings of three sizes: a spread of grain sizes.
func gravelWell(p *pen) {
	const w, h = 8.0, 8.0
	p.cells(w, h, 2, func(x, y float64, _, _ int) {
		p.ring(x+2.3, y+2.3, 1.55, markWidth)
		p.ring(x+6.3, y+1.7, 0.7, markWidth)
		p.ring(x+1.9, y+6.3, 0.7, markWidth)
		p.ring(x+5.9, y+5.8, 1.1, markWidth)
	})
}

// gravelPoor: rings of one size in staggered rows.
func gravelPoor(p *pen) {
	const w, h = 5.0, 4.4
	p.cells(w, h, 2, func(x, y float64, _, j int) {
		p.ring(x+p.stagger(j, w)+w/2, y+h/2, 1.3, markWidth)
	})
}

// gravelSilty: uniform rings with the silt mark (dash and dot) between.
func gravelSilty(p *pen) {
	const w, h = 7.0, 6.0
	p.cells(w, h, 2, func(x, y float64, _, j int) {
		x += p.stagger(j, w)
		p.ring(x+2.0, y+2.2, 1.3, markWidth)
		p.line(x+3.6, y+4.9, x+5.6, y+4.9, markWidth)
		p.dot(x+6.5, y+4.9, 0.3)
	})
}

// gravelClayey: uniform rings between unbroken clay lines.
func gravelClayey(p *pen) {
	const w, h = 6.0, 5.0
	p.cells(w, h, 2, func(x, y float64, _, j int) {
		p.ring(x+p.stagger(j, w)+w/2, y+2.0, 1.3, markWidth)
		p.line(x, y+4.4, x+w, y+4.4, markWidth)
	})
}

// sandWell: dots of mixed sizes.
func sandWell(p *pen) {
	const w, h = 6.0, 6.0
	p.cells(w, h, 1, func(x, y float64, _, _ int) {
		p.dot(x+1.5, y+1.5, 0.6)
		p.dot(x+4.6, y+2.0, 0.3)
		p.dot(x+1.9, y+4.7, 0.3)
		p.dot(x+4.4, y+4.8, 0.45)
		p.dot(x+3.2, y+3.3, 0.22)
	})
}

// sandPoor: dots of one size in staggered rows.
func sandPoor(p *pen) {
	const w, h = 3.4, 3.0
	p.cells(w, h, 1, func(x, y float64, _, j int) {
		p.dot(x+p.stagger(j, w)+w/2, y+h/2, 0.45)
	})
}

// sandSilty: uniform dots with the silt mark.
func sandSilty(p *pen) {
	const w, h = 6.0, 4.4
	p.cells(w, h, 1.5, func(x, y float64, _, j int) {
		x += p.stagger(j, w)
		p.dot(x+1.2, y+1.2, 0.45)
		p.dot(x+4.2, y+1.2, 0.45)
		p.line(x+1.4, y+3.3, x+3.6, y+3.3, markWidth)
		p.dot(x+4.6, y+3.3, 0.3)
	})
}

// sandClayey: uniform dots between unbroken clay lines.
func sandClayey(p *pen) {
	const w, h = 4.0, 4.0
	p.cells(w, h, 1, func(x, y float64, _, j int) {
		p.dot(x+p.stagger(j, w)+w/2, y+1.5, 0.45)
		p.line(x, y+3.4, x+w, y+3.4, markWidth)
	})
}

// siltLow: staggered rows of dash and dot.
func siltLow(p *pen) {
	const w, h = 5.0, 2.8
	p.cells(w, h, 1, func(x, y float64, _, j int) {
		x += p.stagger(j, w)
		p.line(x+0.5, y+1.4, x+3.0, y+1.4, markWidth)
		p.dot(x+4.0, y+1.4, 0.32)
	})
}

// siltHigh: the silt mark doubled: paired dashes and a dot.
func siltHigh(p *pen) {
	const w, h = 5.5, 3.6
	p.cells(w, h, 1, func(x, y float64, _, j int) {
		x += p.stagger(j, w)
		p.line(x+0.5, y+1.2, x+3.2, y+1.2, markWidth)
		p.line(x+0.5, y+2.2, x+3.2, y+2.2, markWidth)
		p.dot(x+4.3, y+1.7, 0.36)
	})
}

// clayLow: unbroken horizontal lines.
func clayLow(p *pen) {
	const h = 2.6
	p.rows(h, func(y float64) {
		p.line(p.r.X, y+h/2, p.r.Right(), y+h/2, markWidth)
	})
}

// clayHigh: the clay line doubled.
func clayHigh(p *pen) {
	const h = 3.6
	p.rows(h, func(y float64) {
		p.line(p.r.X, y+1.2, p.r.Right(), y+1.2, markWidth)
		p.line(p.r.X, y+2.2, p.r.Right(), y+2.2, markWidth)
	})
}

// tuft is the organic mark: three short strokes fanning up from a point.
func tuft(p *pen, x, y, s float64) {
	p.line(x, y, x-0.9*s, y-1.3*s, markWidth)
	p.line(x, y, x, y-1.6*s, markWidth)
	p.line(x, y, x+0.9*s, y-1.3*s, markWidth)
	p.line(x-1.2*s, y, x+1.2*s, y, markWidth)
}

// organicLow: tufts with the silt mark.
func organicLow(p *pen) {
	const w, h = 7.0, 5.0
	p.cells(w, h, 2, func(x, y float64, _, j int) {
		x += p.stagger(j, w)
		tuft(p, x+2.0, y+2.4, 1)
		p.line(x+3.8, y+4.0, x+5.8, y+4.0, markWidth)
		p.dot(x+6.6, y+4.0, 0.3)
	})
}

// organicHigh: tufts with the doubled clay line.
func organicHigh(p *pen) {
	const w, h = 6.0, 6.0
	p.cells(w, h, 2, func(x, y float64, _, j int) {
		tuft(p, x+p.stagger(j, w)+w/2, y+3.0, 1)
		p.line(x, y+4.2, x+w, y+4.2, markWidth)
		p.line(x, y+5.2, x+w, y+5.2, markWidth)
	})
}

// peat: close-set tufts alone.
func peat(p *pen) {
	const w, h = 4.0, 3.4
	p.cells(w, h, 2, func(x, y float64, _, j int) {
		tuft(p, x+p.stagger(j, w)+w/2, y+2.6, 0.9)
	})
}

// ---- rock and made ground ----

// crystalline: upright and turned crosses, interlocking crystals.
func crystalline(p *pen) {
	const w, h, s = 7.0, 6.0, 1.1
	p.cells(w, h, 2, func(x, y float64, _, j int) {
		x += p.stagger(j, w)
		p.line(x+2-s, y+2, x+2+s, y+2, markWidth)
		p.line(x+2, y+2-s, x+2, y+2+s, markWidth)
		d := s * 0.75
		p.line(x+5.4-d, y+4.6-d, x+5.4+d, y+4.6+d, markWidth)
		p.line(x+5.4-d, y+4.6+d, x+5.4+d, y+4.6-d, markWidth)
	})
}

// sandstone: beds with sparse joints, sand dots inside: a rock built of
// sand grains.
func sandstone(p *pen) {
	const w, h = 12.0, 6.0
	p.cells(w, h, 1, func(x, y float64, _, j int) {
		p.line(x, y, x+w, y, markWidth)
		jx := x + p.stagger(j, w)
		p.line(jx, y, jx, y+h, markWidth)
		for _, d := range [][2]float64{{2.2, 2.0}, {5.0, 3.9}, {8.0, 1.8}, {10.4, 4.2}, {3.4, 4.6}, {7.0, 3.0}} {
			p.dot(jx+d[0], y+d[1], 0.4)
			p.dot(jx-w+d[0], y+d[1], 0.4)
		}
	})
}

// shale: close rows of long dashes: fissile beds.
func shale(p *pen) {
	const w, h = 7.0, 2.0
	p.cells(w, h, 1, func(x, y float64, _, j int) {
		x += p.stagger(j, w)
		p.line(x+0.4, y+1.0, x+5.6, y+1.0, markWidth)
	})
}

// limestone: blocks, bedding lines with staggered joints.
func limestone(p *pen) {
	const w, h = 9.0, 4.5
	p.cells(w, h, 0, func(x, y float64, _, j int) {
		p.line(x, y, x+w, y, markWidth)
		jx := x + p.stagger(j, w)
		p.line(jx, y, jx, y+h, markWidth)
	})
}

// weathered: small crosses and dots, half-broken: rock gone to soil.
func weathered(p *pen) {
	const w, h, s = 6.0, 5.0, 0.8
	p.cells(w, h, 1.5, func(x, y float64, i, j int) {
		x += p.stagger(j, w)
		p.line(x+1.5-s, y+1.6, x+1.5+s, y+1.6, markWidth)
		if hash(i, j, 3) < 0.6 {
			p.line(x+1.5, y+1.6-s, x+1.5, y+1.6+s, markWidth)
		}
		p.dot(x+4.3, y+3.8, 0.35)
		p.line(x+3.6, y+1.3, x+4.6, y+0.6, markWidth)
	})
}

// madeGround: a herringbone of short strokes: placed, not deposited.
func madeGround(p *pen) {
	const w, h = 3.0, 3.0
	p.cells(w, h, 1, func(x, y float64, i, j int) {
		if (i+j)&1 == 0 {
			p.line(x+0.4, y+2.6, x+2.6, y+0.4, markWidth)
		} else {
			p.line(x+0.4, y+0.4, x+2.6, y+2.6, markWidth)
		}
	})
}

// unclassified: sparse dashed diagonals, a pattern that claims nothing.
func unclassified(p *pen) {
	p.hatch(135, diagonal(7), markWidth, []float64{diagonal(7) / 2, diagonal(7) / 2})
}

// unrecognisedFill: the same, leaning the other way, for a fill material.
func unrecognisedFill(p *pen) {
	p.hatch(45, diagonal(7), markWidth, []float64{diagonal(7) / 2, diagonal(7) / 2})
}

// diagonal is the spacing of 45° lines that repeat every period points
// along each axis: period / √2.
func diagonal(period float64) float64 { return period / math.Sqrt2 }
