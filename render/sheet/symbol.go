package sheet

import (
	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// symbol is what the sheet needs of a pattern: a key the legend
// deduplicates on, the legend's words, and painters for a region and for
// the legend's swatch. Nearly all come from the shared symbol table
// (render/symbols), so the drawing and the legend cannot disagree.
type symbol struct {
	key    string
	label  string
	order  int // legend order: lithology, fills, well parts, as in the table
	paint  func(r draw.Rect) []draw.Item
	swatch func(r draw.Rect) []draw.Item
}

// tableOrder is each table symbol's place in symbols.All, for a legend
// in the table's order.
var tableOrder = func() map[string]int {
	m := map[string]int{}
	for i, s := range symbols.All() {
		m[s.ID] = i
	}
	return m
}()

func fromTable(s symbols.Symbol) symbol {
	order, ok := tableOrder[s.ID]
	if !ok {
		// Dual soils are made on demand: after their first part's soil.
		order = len(tableOrder)
		if s.Kind == symbols.Lithology {
			order = 0
		}
	}
	paint := func(r draw.Rect) []draw.Item { return marked(s.ID, s.Paint(r)) }
	return symbol{key: s.ID, label: s.Name, order: int(s.Kind)*10000 + order, paint: paint, swatch: s.Swatch}
}

// marked names every item a symbol paints on the drawing after the
// symbol ("symbol KEY"), so that what a sheet shows can be read back
// from its items (TestLegendIsWhatIsPainted). Roles are not written to
// any output. The items are copied: a symbol may share its marks.
func marked(key string, items []draw.Item) []draw.Item {
	role := "symbol " + key
	out := make([]draw.Item, len(items))
	for i, it := range items {
		out[i] = draw.WithRole(it, role)
	}
	return out
}

func materialSymbol(m schema.Material) symbol { return fromTable(symbols.ForMaterial(m)) }

func layerSymbol(ly schema.Layer) symbol { return fromTable(symbols.ForLayer(ly)) }

func partSymbol(id string) symbol { return fromTable(symbols.MustPart(id)) }
