package sheet

import (
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
)

// Every centralizer of the demo and gallery wells, on every page size,
// stands inside the borehole at its depth: its bows reach toward the
// wall and never past it, a nested well's off-centre strings too (common
// practice: a centralizer's springs bear on the hole wall).
func TestCentralizersInsideTheHole(t *testing.T) {
	wells := demoAndGallery(t)
	seen := 0
	eachPage(t, func(page string, pg Page) {
		for _, c := range wells {
			doc := layoutOf(t, c.w, c.in, Options{Page: pg})
			for i, p := range doc.Pages {
				var holes, cents []draw.Box
				p.Walk(func(it draw.Item) {
					if b, ok := it.(draw.Box); ok {
						switch {
						case strings.HasPrefix(b.Role, "borehole:"):
							holes = append(holes, b)
						case strings.HasPrefix(b.Role, "centralizer:"):
							cents = append(cents, b)
						}
					}
				})
				for _, ce := range cents {
					seen++
					y := ce.Rect.Y + ce.Rect.H/2
					in := false
					for _, h := range holes {
						if y >= h.Rect.Y && y <= h.Rect.Bottom() && ce.Rect.X >= h.Rect.X-0.01 && ce.Rect.Right() <= h.Rect.Right()+0.01 {
							in = true
						}
					}
					if !in {
						t.Errorf("%s on %s sheet %d: %s at %+v stands outside the hole %v", c.name, page, i+1, ce.Role, ce.Rect, holes)
					}
				}
			}
		}
	})
	if seen == 0 {
		t.Fatal("no centralizer drawn")
	}
}
