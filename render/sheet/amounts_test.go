package sheet

import (
	"math"
	"sort"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
)

// The amounts table of every demo and gallery well, as built and as
// designed, on every page size and orientation, never parts a number
// from its unit ("(1" / "bag)", "ft³/50" / "lb") nor breaks a word of
// its head ("Interva" / "l") (common practice: a table cell is read
// line by line, and a quantity is one reading).
func TestAmountCellsKeepUnitsWithNumbers(t *testing.T) {
	heads := map[string]bool{}
	for _, w := range strings.Fields("Interval Material Calculated Placed Ratio To order Yield") {
		heads[w] = true
	}
	wells := demoAndGallery(t)
	rows := 0
	eachPage(t, func(page string, pg Page) {
		for _, c := range wells {
			doc := layoutOf(t, c.w, c.in, Options{Page: pg})
			for i, p := range doc.Pages {
				byX := map[float64][]draw.Text{}
				p.Walk(func(it draw.Item) {
					tx, ok := it.(draw.Text)
					if !ok {
						return
					}
					switch tx.Role {
					case "amounts-head":
						for _, w := range strings.Fields(tx.S) {
							if !heads[w] {
								t.Errorf("%s on %s sheet %d: amounts head broken: %q", c.name, page, i+1, tx.S)
							}
						}
					case "amounts-row":
						byX[tx.At.X] = append(byX[tx.At.X], tx)
						rows++
					}
				})
				for _, col := range byX {
					sort.Slice(col, func(a, b int) bool { return col[a].At.Y < col[b].At.Y })
					for k := 1; k < len(col); k++ {
						prev, next := col[k-1], col[k]
						if math.Abs(next.At.Y-prev.At.Y-lineGap(sizeTiny)) > 0.01 {
							continue // the next row
						}
						if endsInDigit(prev.S) && startsAUnit(next.S) {
							t.Errorf("%s on %s sheet %d: a number parted from its unit: %q / %q", c.name, page, i+1, prev.S, next.S)
						}
					}
				}
			}
		}
	})
	if rows == 0 {
		t.Fatal("no amounts drawn")
	}
}

// TestAmountsNameTheCasingAFillIsIn: a fill placed inside an outer
// casing says so in the amounts table, as in its component label: TW-7
// has cement behind its conductor and cement inside it over the same
// 0–50 ft, which the table once listed as two rows alike but for the
// material.
func TestAmountsNameTheCasingAFillIsIn(t *testing.T) {
	for _, c := range galleryWells(t) {
		if c.name != "TW-7.toml" {
			continue
		}
		doc := layoutOf(t, c.w, c.in, Options{})
		var rows []string
		doc.Pages[0].Walk(func(it draw.Item) {
			if tx, ok := it.(draw.Text); ok && tx.Role == "amounts-row" {
				rows = append(rows, tx.S)
			}
		})
		all := strings.Join(rows, " ")
		if !strings.Contains(all, "in conductor") {
			t.Errorf("TW-7's amounts do not name the conductor the neat cement is in: %q", all)
		}
		return
	}
	t.Fatal("no TW-7 among the gallery wells")
}

// TestCasingPhraseNamesAPipe: a casing named after its kind reads as a
// pipe ("in surface casing"; DS-1200's amounts said "Neat cement in
// surface"), while a name that already says what it is stays as written.
func TestCasingPhraseNamesAPipe(t *testing.T) {
	for name, want := range map[string]string{
		"surface":      "surface casing",
		"production":   "production casing",
		"conductor":    "conductor",
		"outer casing": "outer casing",
		"14-in Liner":  "14-in Liner",
	} {
		if got := casingPhrase(name); got != want {
			t.Errorf("casingPhrase(%q) = %q, want %q", name, got, want)
		}
	}
}
