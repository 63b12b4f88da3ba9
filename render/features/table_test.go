package features

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

const wellSrc = `[units]
depth = "ft"
diameter = "in"
[well]
id = "T-1"
purpose = "domestic"
total_depth = 150
[elevation]
ground = 421.7
[orientation]
north = "magnetic"
declination = 13.5
[[borehole]]
top = 0
bottom = 150
diameter = 6
[[feature]]
kind = "water-bearing-fracture"
trace_high = 96.6
trace_low = 97.4
low_azimuth = 128
inflow = 4.5
[[feature]]
kind = "foliation"
depth = 110
dip = 30
dip_direction = 350
`

func load(t *testing.T) *schema.Well {
	t.Helper()
	w, err := schema.Load("t.toml", []byte(wellSrc))
	if err != nil {
		t.Fatal(err)
	}
	return w
}

// Hand arithmetic: the trace rises and falls 97.4 − 96.6 = 0.8 ft = 9.6 in
// on a 6-in hole, so dip = arctan(9.6 / 6) = arctan 1.6 = 57.99°
// (trigonometric table); the low point at magnetic 128° with 13.5° east
// declination is true 141.5°; strike (right-hand rule) 141.5 − 90 =
// 51.5°; the pole trends 141.5 + 180 = 321.5° and plunges 90 − 57.99 =
// 32.01°; elevation 421.7 − 97 = 324.7 ft. The foliation written as
// 30°→350 magnetic is 30°→003.5 true, strike 273.5, pole 60°→183.5.
func TestCSVMatchesHandArithmetic(t *testing.T) {
	var buf bytes.Buffer
	if err := Write(&buf, Rows("t.toml", load(t)), "csv"); err != nil {
		t.Fatal(err)
	}
	recs, err := csv.NewReader(&buf).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	col := map[string]int{}
	for i, h := range recs[0] {
		col[h] = i
	}
	want := []map[string]string{
		{"depth": "97", "elevation": "324.7", "kind": "water-bearing-fracture", "dip": "57.99", "dip_direction": "141.5", "strike_rhr": "51.5",
			"pole_trend": "321.5", "pole_plunge": "32.01", "inflow": "4.5", "inflow_unit": "gpm", "hole_diameter": "6", "line": "17"},
		{"depth": "110", "dip": "30", "dip_direction": "3.5", "strike_rhr": "273.5", "pole_trend": "183.5", "pole_plunge": "60", "method": "given", "line": "23"},
	}
	if len(recs) != 2+len(want) || recs[len(recs)-1][0] != "caution" {
		t.Fatalf("got %d records: %q", len(recs), recs)
	}
	for i, w := range want {
		for k, v := range w {
			if got := recs[i+1][col[k]]; got != v {
				t.Errorf("feature %d %s = %q, want %q", i+1, k, got, v)
			}
		}
	}
}

func TestTextAndJSON(t *testing.T) {
	rows := Rows("t.toml", load(t))
	var buf bytes.Buffer
	if err := Write(&buf, rows, "text"); err != nil {
		t.Fatal(err)
	}
	for _, s := range []string{"water-bearing fracture", "58", "142", "052", "32→322", "read from magnetic north, declination 13.5°", Caution} {
		if !strings.Contains(buf.String(), s) {
			t.Errorf("text lacks %q:\n%s", s, buf.String())
		}
	}
	buf.Reset()
	if err := Write(&buf, rows, "json"); err != nil {
		t.Fatal(err)
	}
	var doc struct {
		Features []struct {
			Dip          float64 `json:"dip"`
			WaterBearing bool    `json:"water_bearing"`
		} `json:"features"`
	}
	if err := json.Unmarshal(buf.Bytes(), &doc); err != nil {
		t.Fatal(err)
	}
	if len(doc.Features) != 2 || doc.Features[0].Dip != 57.9946 || !doc.Features[0].WaterBearing || doc.Features[1].WaterBearing {
		t.Errorf("json: %+v", doc)
	}
	if err := Write(&buf, rows, "xml"); err == nil {
		t.Error("xml accepted")
	}
}
