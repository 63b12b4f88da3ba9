package sheet

import (
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
)

// The well column paints its parts bottom first, as part.go's layers
// say: the hole's ground, fills in the hole, then each outer casing,
// outermost first, followed by the fills placed in its bore; the strings,
// the outer casings' centralizers, the walls, the marks of laps, shoes
// and tags, and the water levels last. Read on the gallery's 1,200-ft
// supply well (three casings, two with cement in their bores, a liner
// on a packer), drawn on one sheet.
func TestPaintOrder(t *testing.T) {
	var c *corpusWell
	for _, g := range galleryWells(t) {
		if g.name == "DS-1200.toml" {
			c = &g
		}
	}
	if c == nil {
		t.Fatal("no DS-1200 in the gallery")
	}
	doc := layoutOf(t, c.w, c.in, Options{Scale: &Scale{Ratio: 6000}})
	// The first page draws the whole well; the others are notes sheets.
	// The well column's clip holds the parts (the one with the hole in
	// it); the first item of each role says where its part was painted.
	var first map[string]int
	for _, it := range doc.Pages[0].Items {
		cl, ok := it.(draw.Clip)
		if !ok {
			continue
		}
		roles := map[string]int{}
		for n, it := range cl.Items {
			role := ""
			switch v := it.(type) {
			case draw.Box:
				role = v.Role
			case draw.Shape:
				role = v.Role
			}
			if _, seen := roles[role]; role != "" && !seen {
				roles[role] = n
			}
		}
		if _, ok := roles["borehole:borehole[0]"]; ok {
			first = roles
		}
	}
	at := func(role string) int {
		t.Helper()
		i, ok := first[role]
		if !ok {
			t.Fatalf("nothing painted as %q; roles: %v", role, first)
		}
		return i
	}
	before := func(a, b string) {
		t.Helper()
		if at(a) >= at(b) {
			t.Errorf("%s painted at %d, not before %s at %d", a, at(a), b, at(b))
		}
	}
	w := c.w
	conductor, surface, production := "casing:casing[0]", "casing:casing[1]", "casing:casing[2]"
	if w.Fills[1].Within != "conductor" || w.Fills[3].Within != "surface" || w.Fills[5].Within != "" {
		t.Fatalf("the gallery well changed: fills 1, 3 and 5 within %q, %q and %q", w.Fills[1].Within, w.Fills[3].Within, w.Fills[5].Within)
	}
	before("borehole:borehole[0]", "interval:fill[5]") // ground, then the fills in the hole
	before("interval:fill[5]", conductor)              // fills in the hole under every casing
	before(conductor, "interval:fill[1]")              // cement inside the conductor ...
	before("interval:fill[1]", surface)                // ... before the casing inside it
	before(surface, "interval:fill[3]")
	before("interval:fill[3]", production)
	var section string
	for role := range first {
		if strings.HasPrefix(role, "riser:liner") && (section == "" || first[role] < first[section]) {
			section = role
		}
	}
	before(production, section)                    // strings inside the casings
	before(section, "centralizer:casing[1]")       // the casings' centralizers over the strings
	before("centralizer:casing[1]", "hole-bottom") // the walls over them
	before("hole-bottom", "hanger:liner")          // the lap's packer above the walls
	before("hanger:liner", "water:water_level[0]") // water levels last
}
