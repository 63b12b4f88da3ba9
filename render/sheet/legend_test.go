package sheet

import (
	"os"
	"path/filepath"
	"slices"
	"sort"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/features"
	"github.com/tremie-dev/tremie/schema"
)

// The legend comes from the parts' own account of what they paint
// (part.legend); these tests read what was actually painted from the
// laid-out page items instead, and require the two to agree on every
// sheet of the demo, the gallery and the fixtures: nothing painted is
// missing from the legend, and the legend lists nothing the sheet does
// not show.

func TestLegendIsWhatIsPainted(t *testing.T) {
	type doc struct {
		name string
		w    *schema.Well
		d    *draw.Document
	}
	var docs []doc
	for n, dw := range demoWells(t) {
		docs = append(docs, doc{n, dw.w, layoutOf(t, dw.w, dw.in, dw.opt)})
	}
	for _, c := range galleryWells(t) {
		docs = append(docs, doc{c.name, c.w, layoutOf(t, c.w, c.in, Options{Date: "2026-06-15T00:00:00Z"})})
	}
	// Neither has a prepacked screen, the one symbol the sheet makes
	// itself; a well cut over several sheets at 1:60 has one.
	pre := simpleWell(300)
	pre.Strings[0].Sections[1].ScreenType = schema.Prepacked
	docs = append(docs, doc{"prepacked", pre, layoutOf(t, pre, Inputs{}, Options{Scale: &Scale{Ratio: 60}})})
	// Every rule fixture and accepted file, cut into several sheets at
	// 1:40, so that parts cross the windows' edges in every way.
	files, err := filepath.Glob("../../schema/rules/testdata/*/*.toml")
	more, err2 := filepath.Glob("../../testdata/good/*.toml")
	if err != nil || err2 != nil || len(files) == 0 || len(more) == 0 {
		t.Fatalf("fixtures: %v %v", err, err2)
	}
	drawn := 0
	for _, f := range append(files, more...) {
		data, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		w, err := schema.Load(f, data)
		if err != nil {
			continue // a fixture of the loader's errors
		}
		d, err := Layout(w, Inputs{}, Options{Scale: &Scale{Ratio: 40}})
		if err != nil {
			continue // nothing to draw
		}
		docs = append(docs, doc{f, w, d})
		drawn++
	}
	if drawn < len(files)/2 {
		t.Fatalf("only %d of %d fixtures drawn", drawn, len(files)+len(more))
	}
	sort.Slice(docs, func(i, j int) bool { return docs[i].name < docs[j].name })
	kinds := map[string]bool{}
	for _, d := range docs {
		for i, p := range d.d.Pages {
			legend, painted := legendKeys(p), paintedKeys(d.w, p)
			if !slices.Equal(legend, painted) {
				t.Errorf("%s sheet %d:\nlegend  %v\npainted %v", d.name, i+1, legend, painted)
			}
			for _, k := range painted {
				kinds[strings.SplitN(k, ":", 2)[0]] = true
			}
		}
	}
	// The corpus exercises every kind of symbol: soils, rocks, fills,
	// well parts, the sheet's own (prepacked sleeve) and wall features.
	for _, k := range []string{"soil", "rock", "fill", "part", "sheet", "feature"} {
		if !kinds[k] {
			t.Errorf("no %s symbol painted anywhere in the demo and the gallery; kinds seen: %v", k, kinds)
		}
	}
}

// legendKeys are the symbols a page's legend lists, sorted.
func legendKeys(p *draw.Page) []string {
	var out []string
	for _, b := range boxes(p, "legend:") {
		out = append(out, strings.TrimPrefix(b.Role, "legend:"))
	}
	sort.Strings(out)
	return out
}

// paintedKeys are the symbols painted on a page outside its legend,
// sorted: every item a symbol paints carries its role "symbol KEY", and
// the feature column's marks are read from their roles and the feature
// they name (features.MarkFor).
func paintedKeys(w *schema.Well, p *draw.Page) []string {
	var legendBox []draw.Rect
	for _, b := range boxes(p, "band:legend") {
		legendBox = append(legendBox, b.Rect)
	}
	inLegend := func(r draw.Rect) bool {
		for _, b := range legendBox {
			if r.X >= b.X && r.Y >= b.Y && r.Right() <= b.Right() && r.Bottom() <= b.Bottom() {
				return true
			}
		}
		return false
	}
	seen := map[string]bool{}
	var walk func(items []draw.Item)
	walk = func(items []draw.Item) {
		for _, it := range items {
			role := ""
			switch v := it.(type) {
			case draw.Clip:
				walk(v.Items)
			case draw.Box:
				role = v.Role
			case draw.Shape:
				role = v.Role
			case draw.Circle:
				role = v.Role
			case draw.Path:
				role = v.Role
			case draw.Pattern:
				role = v.Role
				if !strings.HasPrefix(role, "symbol ") {
					// a pattern painted around the sheet's symbols: the
					// comparison fails and names it
					seen["unmarked pattern "+v.Tile.ID] = true
				}
			case draw.Image:
				role = v.Role
			}
			switch {
			case strings.HasPrefix(role, "symbol "):
				seen[strings.TrimPrefix(role, "symbol ")] = true
			case strings.HasPrefix(role, "feature-trace:"):
				seen["feature:trace"] = true
			case strings.HasPrefix(role, "feature-tick:"):
				seen["feature:tick"] = true
			case strings.HasPrefix(role, "feature-dip:"):
				path := strings.TrimPrefix(role, "feature-dip:")
				for i := range w.Features {
					if w.Features[i].Path == path {
						seen["feature:"+features.MarkFor(&w.Features[i]).Key] = true
					}
				}
			}
		}
	}
	for _, it := range p.Items {
		if c, ok := it.(draw.Clip); ok && inLegend(c.Rect) {
			continue // a legend swatch
		}
		walk([]draw.Item{it})
	}
	out := make([]string, 0, len(seen))
	for k := range seen {
		out = append(out, k)
	}
	sort.Strings(out)
	return out
}
