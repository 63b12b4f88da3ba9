package gis

import (
	"bytes"
	"encoding/json"
	"io/fs"
	"math"
	"os"
	"strings"
	"testing"

	"github.com/paulmach/orb"
	"github.com/paulmach/orb/geojson"
	"github.com/santhosh-tekuri/jsonschema/v6"

	"github.com/tremie-dev/tremie/cmd/tremie/demo"
	"github.com/tremie-dev/tremie/render/table"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/crs"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/rules"
)

// demoInputs loads the demo project as `tremie export` does.
func demoInputs(t *testing.T) ([]Input, *project.Project) {
	t.Helper()
	pdata, err := demo.FS.ReadFile("project.toml")
	if err != nil {
		t.Fatal(err)
	}
	prj, err := project.Parse("demo", "project.toml", pdata)
	if err != nil {
		t.Fatal(err)
	}
	names, _ := fs.Glob(demo.FS, "wells/*.toml")
	var in []Input
	for _, n := range names {
		data, _ := demo.FS.ReadFile(n)
		w, err := schema.Load(n, data)
		if err != nil {
			t.Fatal(err)
		}
		project.Apply(prj, w)
		in = append(in, Input{Entry: table.Entry{File: n, Well: w, Findings: rules.Check(w, nil)}, Sheets: []string{"demo/out/" + w.ID + ".pdf"}})
	}
	return in, prj
}

func demoExport(t *testing.T) *Export {
	in, prj := demoInputs(t)
	c, err := crs.Parse(prj.CRS)
	if err != nil {
		t.Fatal(err)
	}
	return Build(in, prj.Units, c, "demo")
}

// The demo's GeoJSON validates against the geojson.org FeatureCollection
// JSON Schema with a general-purpose validator (santhosh-tekuri/jsonschema).
func TestDemoGeoJSONValidatesAgainstSchema(t *testing.T) {
	data := demoExport(t).GeoJSON()
	sf, err := os.Open("testdata/FeatureCollection.schema.json")
	if err != nil {
		t.Fatal(err)
	}
	defer sf.Close()
	doc, err := jsonschema.UnmarshalJSON(sf)
	if err != nil {
		t.Fatal(err)
	}
	c := jsonschema.NewCompiler()
	if err := c.AddResource("https://geojson.org/schema/FeatureCollection.json", doc); err != nil {
		t.Fatal(err)
	}
	sch, err := c.Compile("https://geojson.org/schema/FeatureCollection.json")
	if err != nil {
		t.Fatal(err)
	}
	v, err := jsonschema.UnmarshalJSON(bytes.NewReader(data))
	if err != nil {
		t.Fatalf("not JSON: %v\n%s", err, data)
	}
	if err := sch.Validate(v); err != nil {
		t.Fatalf("invalid GeoJSON: %v", err)
	}
	// and a feature without coordinates is refused by the schema, so the
	// check has teeth
	bad, _ := jsonschema.UnmarshalJSON(strings.NewReader(`{"type":"FeatureCollection","features":[{"type":"Feature","properties":{},"geometry":{"type":"Point"}}]}`))
	if sch.Validate(bad) == nil {
		t.Error("schema accepted a Point without coordinates")
	}
}

// The demo reads back with a GIS library (paulmach/orb's geojson): one
// Point per monitoring point, NW-1's two strings apart, every point where
// its EPSG:2227 easting and northing put it.
func TestDemoGeoJSONReadsBackInOrb(t *testing.T) {
	x := demoExport(t)
	fc, err := geojson.UnmarshalFeatureCollection(x.GeoJSON())
	if err != nil {
		t.Fatal(err)
	}
	if len(fc.Features) != len(x.Points) || len(x.Skipped) != 0 {
		t.Fatalf("%d features for %d points, %d skipped", len(fc.Features), len(x.Points), len(x.Skipped))
	}
	ids := map[string]orb.Point{}
	for _, f := range fc.Features {
		p, ok := f.Geometry.(orb.Point)
		if !ok {
			t.Fatalf("%v: geometry %T", f.ID, f.Geometry)
		}
		ids[f.ID.(string)] = p
		if f.Properties["Check status"] == nil || f.Properties["Sheets"] == nil {
			t.Errorf("%v lacks status or sheets: %v", f.ID, f.Properties)
		}
	}
	for _, id := range []string{"MW-1", "NW-1/NW-1S", "NW-1/NW-1D", "PW-1"} {
		if _, ok := ids[id]; !ok {
			t.Errorf("no feature %s in %v", id, ids)
		}
	}
	// MW-1 is written as E 6248113.52, N 2081447.19 ftUS in EPSG:2227:
	// converting back from the exported longitude and latitude must
	// return those to a centimetre (0.03 ft).
	c, _ := crs.Parse("EPSG:2227")
	p := ids["MW-1"]
	e, n, _ := c.FromLonLat(p.Lon(), p.Lat())
	if math.Abs(e-6248113.52) > 0.03 || math.Abs(n-2081447.19) > 0.03 {
		t.Errorf("MW-1 comes back at %.3f, %.3f", e, n)
	}
	// PW-1 is written in WGS 84: it stays where it is, and gets its
	// EPSG:2227 coordinates in the projected columns.
	if q := ids["PW-1"]; math.Abs(q.Lat()-37.70512) > 1e-9 || math.Abs(q.Lon()+121.58236) > 1e-9 {
		t.Errorf("PW-1 at %v", q)
	}
}

func TestGeoJSONAndCSVAreDeterministic(t *testing.T) {
	a, b := demoExport(t), demoExport(t)
	if !bytes.Equal(a.GeoJSON(), b.GeoJSON()) {
		t.Error("GeoJSON differs between runs")
	}
	ca, _ := a.CSV()
	cb, _ := b.CSV()
	if !bytes.Equal(ca, cb) {
		t.Error("CSV differs between runs")
	}
}

// Every CSV row carries the same coordinate columns: the projected set in
// one system for all, then WGS 84.
func TestCSVOneSystemPerColumnSet(t *testing.T) {
	data, err := demoExport(t).CSV()
	if err != nil {
		t.Fatal(err)
	}
	lines := strings.Split(strings.TrimSpace(string(data)), "\n")
	head := lines[0]
	for _, col := range []string{"Easting (ftUS, EPSG:2227)", "Northing (ftUS, EPSG:2227)", lonTitle, latTitle} {
		if !strings.Contains(head, col) {
			t.Errorf("header lacks %q: %s", col, head)
		}
	}
	for _, col := range []string{",Easting,", ",Latitude,", "Coordinate system"} {
		if strings.Contains(head, col) {
			t.Errorf("header still mixes systems (%q): %s", col, head)
		}
	}
	if len(lines) != 9 { // header + 8 monitoring points (NW-1 has two)
		t.Errorf("%d lines", len(lines))
	}
}

// A well without coordinates, or with easting and northing but no crs,
// is left out with its reason, never placed at 0,0.
func TestUnplacedWellsAreLeftOut(t *testing.T) {
	in, _ := demoInputs(t)
	bare := *in[0].Entry.Well
	bare.ID = "NO-XY"
	bare.Location = schema.Location{}
	noCRS := *in[0].Entry.Well
	noCRS.ID = "NO-CRS"
	noCRS.Location.CRS = ""
	in = append(in, Input{Entry: table.Entry{File: "no-xy.toml", Well: &bare}}, Input{Entry: table.Entry{File: "no-crs.toml", Well: &noCRS}},
		Input{Entry: table.Entry{File: "bad.toml", Err: os.ErrInvalid}})
	x := Build(in, "", nil, ".")
	if len(x.Skipped) != 3 {
		t.Fatalf("skipped %v", x.Skipped)
	}
	for _, s := range x.Skipped {
		if s.Reason == "" {
			t.Errorf("%s: no reason", s.File)
		}
	}
	for _, p := range x.Points {
		if p.Pos.Lon == 0 && p.Pos.Lat == 0 {
			t.Errorf("%s placed at 0,0", p.ID)
		}
		if p.Well == "NO-XY" || p.Well == "NO-CRS" {
			t.Errorf("%s exported", p.Well)
		}
	}
	var fc struct{ Features []json.RawMessage }
	if err := json.Unmarshal(x.GeoJSON(), &fc); err != nil || len(fc.Features) != len(x.Points) {
		t.Errorf("GeoJSON features %d, points %d, %v", len(fc.Features), len(x.Points), err)
	}
}
