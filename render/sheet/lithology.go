package sheet

import (
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// lithologyPart is the log beside the well: the pattern column, the USCS
// column and the descriptions, each level with its layer (or as near as
// the layers above and below allow, with a leader), in the forms
// planDescriptions chose.
type lithologyPart struct{}

func (lithologyPart) stack() stack { return on(layerLog) }

func (lithologyPart) callouts(*layout) []callout { return nil }

func (lithologyPart) extent(l *layout) (schema.Interval, bool) {
	var ivs []schema.Interval
	for _, ly := range l.w.Lithology {
		ivs = append(ivs, ly.Interval)
	}
	return hull(ivs...)
}

func (lithologyPart) legend(l *layout, v window) []symbol {
	var out []symbol
	for _, ly := range l.w.Lithology {
		if v.shows(ly.Top, ly.Bottom) {
			out = append(out, layerSymbol(ly))
		}
	}
	return out
}

func (lithologyPart) paint(p *painter) []draw.Item {
	l := p.l
	lc, uc, dc := l.cols.lith, l.cols.uscs, l.cols.desc
	y0c, y1c := p.clipY()
	var clipped, items []draw.Item
	for i, ly := range l.w.Lithology {
		y0, y1, ok := p.vis(ly.Top, ly.Bottom)
		if !ok {
			continue
		}
		role := "lith:" + pathOr(ly.Path, "lithology", i)
		clipped = append(clipped, p.paint(layerSymbol(ly), draw.Rect{X: lc.X, Y: y0, W: lc.W, H: y1 - y0}, role)...)
		for _, y := range []float64{y0, y1} {
			clipped = append(clipped, line(lc.X, y, uc.Right(), y, 0.5, ink, ""), line(dc.X, y, dc.X+5, y, 0.5, ink, ""))
		}
		if sym, size, shown := l.columnSymbol(ly, y1-y0); shown {
			clipped = append(clipped, text(uc.Center(), (y0+y1)/2+draw.CapHeight(draw.Bold, size)/2, sym, draw.Bold, size, draw.Middle, ink, "uscs:"+pathOr(ly.Path, "lithology", i)))
		}
	}
	textX, _ := l.descText()
	for _, d := range p.descriptions() {
		if d.form == descNoted {
			continue
		}
		items = append(items, d.block.items(textX, d.top, ink, "description")...)
		// A leader when the text no longer sits beside its layer.
		mid := (d.y0 + d.y1) / 2
		if c := d.top + d.block.height()/2; c < d.y0 || c > d.y1 {
			ty := d.top + lineGap(sizeSmall)/2
			items = append(items, draw.Shape{Style: draw.Style{Stroke: grey, StrokeWidth: 0.4},
				Points: []draw.Point{{X: dc.X, Y: mid}, {X: dc.X + 3, Y: mid}, {X: textX - 2, Y: ty}}, Role: "leader:description"})
		}
	}
	out := []draw.Item{draw.Clip{Rect: draw.Rect{X: lc.X, Y: y0c, W: dc.Right() - lc.X, H: y1c - y0c}, Items: clipped}}
	// Ground line across the log columns.
	if p.visible(0) {
		y := p.y(0)
		out = append(out, line(lc.X, y, dc.X+5, y, 1.1, ink, "ground"))
	}
	return append(out, items...)
}

// descriptions are the sheet's descriptions as planDescriptions fitted
// them.
func (p *painter) descriptions() []descEntry {
	for i, sp := range p.l.sheets {
		if sp == p.sp && i < len(p.l.sheetDescs) {
			return p.l.sheetDescs[i]
		}
	}
	return nil
}

// columnSymbol is what the USCS column shows for a layer h points tall:
// its group symbol or rock abbreviation, the size, and whether it fits.
func (l *layout) columnSymbol(ly schema.Layer, h float64) (string, float64, bool) {
	uc := l.cols.uscs
	sym := ly.USCS
	if sym == "" {
		sym = rockAbbrev(ly)
	}
	size := sizeSmall
	if draw.TextWidth(draw.Bold, size, sym) > uc.W-2 {
		size = sizeTiny
	}
	return sym, size, sym != "" && h >= 8 && draw.TextWidth(draw.Bold, size, sym) <= uc.W-2
}

// describe is a layer's description, led by its rock type when the
// description does not already name it.
func describe(ly schema.Layer) string {
	d := strings.TrimSpace(ly.Description)
	if ly.Rock != "" && !strings.Contains(strings.ToLower(d), strings.ToLower(ly.Rock)) {
		r := strings.ToUpper(ly.Rock)
		if d == "" {
			return r
		}
		return r + ": " + d
	}
	if d == "" {
		if ly.USCS != "" {
			return ly.USCS
		}
		return "(no description)"
	}
	return d
}

// rockAbbrev is our short rock label for the USCS column, at most four
// letters so it always fits: the name's first letter and the consonants
// after it, in capitals (granite GRNT, gneiss GNSS, sandstone SNDS), with
// a lower-case w before it for weathered rock (wGNS). The notes explain
// every one the sheet uses (rockKey).
func rockAbbrev(ly schema.Layer) string {
	name, weathered := rockNaming(ly)
	prefix, n := "", 4
	if weathered {
		prefix, n = "w", 3
	}
	var b []rune
	for k, r := range strings.ReplaceAll(name, " ", "") {
		if len(b) == n {
			break
		}
		if k == 0 || (r >= 'a' && r <= 'z' && !strings.ContainsRune("aeiouy", r) && (len(b) == 0 || b[len(b)-1] != r-'a'+'A')) {
			b = append(b, r)
		}
	}
	if len(b) == 0 {
		return ""
	}
	return prefix + strings.ToUpper(string(b))
}

// rockNaming is a layer's rock name without its weathering words and
// whether the rock is weathered: a qualifier written before the name
// ("highly weathered granite", "decomposed gneiss") or a weathering
// grade, any but fresh (the weathering key, when given, over the words).
func rockNaming(ly schema.Layer) (name string, weathered bool) {
	name, grade, _ := schema.ParseRock(ly.Rock)
	if ly.Weathering != "" {
		grade = ly.Weathering
	}
	return name, grade != "" && grade != schema.Fresh
}

// rockKey explains the rock abbreviations the well's log uses, for the
// notes: "USCS column, rocks: GNSS gneiss; GRNT granite", or "".
func (l *layout) rockKey() string {
	seen := map[string]bool{}
	var parts []string
	for _, ly := range l.w.Lithology {
		abbrev := rockAbbrev(ly)
		if ly.Rock == "" || abbrev == "" || seen[abbrev] {
			continue
		}
		seen[abbrev] = true
		name, weathered := rockNaming(ly)
		if weathered {
			name = "weathered " + name
		}
		parts = append(parts, abbrev+" "+name)
	}
	if len(parts) == 0 {
		return ""
	}
	return "USCS column, rocks (our abbreviations): " + strings.Join(parts, "; ") + "."
}
