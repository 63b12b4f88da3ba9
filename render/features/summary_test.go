package features

import (
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/stereonet"
	"github.com/tremie-dev/tremie/schema"
)

func demoRows(t *testing.T) ([]Row, *schema.Well) {
	t.Helper()
	w, err := schema.LoadFile("../../cmd/tremie/demo/wells/BR-1.toml")
	if err != nil {
		t.Fatal(err)
	}
	return Rows("BR-1.toml", w), w
}

// Every pole on the page stands where the equal-area formula puts it,
// r = R·√2·sin((90° − plunge)/2) from the net's centre, and the table
// lists every feature.
func TestSummaryPlacesPoles(t *testing.T) {
	rows, w := demoRows(t)
	doc := Summary(SummaryInput{Title: w.ID, Rows: rows})
	pg := doc.Pages[0]
	var prim *draw.Circle
	poles := map[string]draw.Point{}
	var table []string
	pg.Walk(func(it draw.Item) {
		switch v := it.(type) {
		case draw.Circle:
			if v.Role == "stereonet:primitive" {
				prim = &v
			}
			if strings.HasPrefix(v.Role, "stereonet:pole:") {
				poles[v.Role] = v.Center
			}
		case draw.Shape:
			if strings.HasPrefix(v.Role, "stereonet:pole:") {
				// a polygon mark: its centre is the mean of its corners
				var c draw.Point
				for _, p := range v.Points {
					c.X += p.X / float64(len(v.Points))
					c.Y += p.Y / float64(len(v.Points))
				}
				poles[v.Role] = c
			}
		case draw.Text:
			if strings.HasPrefix(v.Role, "summary:row:") {
				table = append(table, v.Role)
			}
		}
	})
	if prim == nil {
		t.Fatal("no primitive circle")
	}
	if len(poles) != len(rows) || len(table) != len(rows) {
		t.Fatalf("%d poles and %d table rows for %d features", len(poles), len(table), len(rows))
	}
	for _, r := range rows {
		p, ok := poles["stereonet:pole:"+r.WellID+":"+r.Feature.Path]
		if !ok {
			t.Fatalf("no pole for %s", r.Feature.Path)
		}
		dist := math.Hypot(p.X-prim.Center.X, p.Y-prim.Center.Y)
		want := prim.R * math.Sqrt2 * math.Sin((90-*r.PolePl)*math.Pi/180/2)
		// Triangles' corner means sit off their centroid by up to a tenth
		// of the mark; the mark is 6 pt.
		if math.Abs(dist-want) > 0.6 {
			t.Errorf("%s: pole %.2f pt from the centre, want %.2f", r.Feature.Path, dist, want)
		}
		// North is up, east to the right.
		az := math.Atan2(p.X-prim.Center.X, prim.Center.Y-p.Y) * 180 / math.Pi
		if d := math.Abs(schema.NormAzimuth(az-*r.PoleTrend+180) - 180); dist > 5 && d > 3 {
			t.Errorf("%s: pole at azimuth %.1f, want %.1f", r.Feature.Path, schema.NormAzimuth(az), *r.PoleTrend)
		}
	}
	// Thirteen poles are enough for Kamb contours.
	contours := 0
	pg.Walk(func(it draw.Item) {
		if p, ok := it.(draw.Path); ok && strings.HasPrefix(p.Role, "stereonet:contour:") {
			contours++
		}
	})
	if len(rows) >= stereonet.MinKambPoles && contours == 0 {
		t.Error("no density contours")
	}
}

// A long table continues on further pages, every row drawn once.
func TestSummaryContinues(t *testing.T) {
	rows, w := demoRows(t)
	var many []Row
	for range 10 {
		many = append(many, rows...)
	}
	doc := Summary(SummaryInput{Title: w.ID, Rows: many, Project: true})
	if len(doc.Pages) < 2 {
		t.Fatalf("%d pages for %d rows", len(doc.Pages), len(many))
	}
	n := 0
	for _, pg := range doc.Pages {
		pg.Walk(func(it draw.Item) {
			if v, ok := it.(draw.Text); ok && strings.HasPrefix(v.Role, "summary:row:") {
				n++
			}
		})
	}
	if n != len(many) {
		t.Errorf("%d rows drawn, want %d", n, len(many))
	}
}

// TREMIE_LOOK=DIR writes the demo's summary page as PNG to look at.
func TestLookSummary(t *testing.T) {
	dir := os.Getenv("TREMIE_LOOK")
	if dir == "" {
		t.Skip("set TREMIE_LOOK=DIR to write the summary page")
	}
	rows, w := demoRows(t)
	doc := Summary(SummaryInput{Title: w.ID, Subtitle: WellSubtitle(w), Rows: rows})
	png, err := out.PNG(doc, 0, 110)
	if err != nil {
		t.Fatal(err)
	}
	os.WriteFile(filepath.Join(dir, "BR-1-features.png"), png, 0o644)
}

// TestSummarySubtitleCountsHoles: the page of one well takes "the hole"
// as vertical, a project's page "each hole" (the one well's page once
// read "each hole taken as vertical").
func TestSummarySubtitleCountsHoles(t *testing.T) {
	rows, w := demoRows(t)
	subtitle := func(in SummaryInput) string {
		var s []string
		Summary(in).Pages[0].Walk(func(it draw.Item) {
			if v, ok := it.(draw.Text); ok && v.Role == "summary:subtitle" {
				s = append(s, v.S)
			}
		})
		return strings.Join(s, " | ")
	}
	if got := subtitle(SummaryInput{Title: w.ID, Rows: rows}); !strings.Contains(got, "the hole taken as vertical") {
		t.Errorf("one well: %q", got)
	}
	other := append([]Row(nil), rows...)
	for i := range other {
		other[i].WellID = "BR-9"
	}
	if got := subtitle(SummaryInput{Title: "site", Rows: append(rows, other...), Project: true}); !strings.Contains(got, "in 2 wells") || !strings.Contains(got, "each hole taken as vertical") {
		t.Errorf("two wells: %q", got)
	}
}
