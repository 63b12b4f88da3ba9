package main

import (
	"encoding/json"
	"github.com/tremie-dev/tremie/cmd/tremie/demo"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// tremie export on the demo: a GeoJSON file with every monitoring point,
// links relative to the file's folder, and the same bytes twice.
func TestExportDemo(t *testing.T) {
	dir := t.TempDir()
	if err := demo.Write(dir, false); err != nil {
		t.Fatal(err)
	}
	dst := filepath.Join(dir, "gis", "wells.geojson")
	code, out, errb := runTremie("export", dir, "--format", "geojson", "-o", dst)
	if code != exitFindings || !strings.Contains(out, "8 monitoring points") || errb != "" && !strings.Contains(errb, "error") {
		t.Fatalf("code %d\n%s\n%s", code, out, errb)
	}
	first, err := os.ReadFile(dst)
	if err != nil {
		t.Fatal(err)
	}
	var fc struct {
		Type     string
		Features []struct {
			ID         string
			Properties map[string]any
		}
	}
	if err := json.Unmarshal(first, &fc); err != nil || fc.Type != "FeatureCollection" || len(fc.Features) != 8 {
		t.Fatalf("%v %+v", err, fc)
	}
	runTremie("export", dir, "--format", "geojson", "-o", dst)
	again, _ := os.ReadFile(dst)
	if string(again) != string(first) {
		t.Error("a second export wrote different bytes")
	}
	code, csv, _ := runTremie("export", dir, "--format", "csv")
	if code == exitUsage || !strings.HasPrefix(csv, "Monitoring point,Well,") {
		t.Errorf("csv to stdout: %d %q", code, csv[:min(len(csv), 80)])
	}
	if code, _, _ := runTremie("export", dir, "--format", "kml"); code != exitUsage {
		t.Errorf("--format kml: exit %d", code)
	}
}

// TestCountsAgreeWithTheirNouns: the closing lines of export, table and
// book count in words that agree ("1 monitoring point", "1 well"; they
// read "1 monitoring points", "1 wells").
func TestCountsAgreeWithTheirNouns(t *testing.T) {
	code, out, errb := runTremie("export", "../../testdata/gallery", "-o", filepath.Join(t.TempDir(), "g.json"))
	if code != exitOK || !strings.Contains(out, "1 monitoring point written") || !strings.Contains(out, "(5 wells left out)") {
		t.Errorf("export: exit %d\n%s%s", code, out, errb)
	}
	dir := t.TempDir()
	os.MkdirAll(filepath.Join(dir, "wells"), 0o755)
	if err := os.WriteFile(filepath.Join(dir, "wells", "MW-1.toml"), []byte(sealedWell), 0o644); err != nil {
		t.Fatal(err)
	}
	code, out, errb = runTremie("table", dir, "--format", "xlsx", "-o", filepath.Join(dir, "t.xlsx"))
	if code > exitFindings || !strings.Contains(out, "1 monitoring point of 1 well written") {
		t.Errorf("table: exit %d\n%s%s", code, out, errb)
	}
	code, out, errb = runTremie("book", dir, "-o", filepath.Join(dir, "b.pdf"))
	if code > exitFindings || !strings.Contains(out, "tremie book: 1 well bound into") {
		t.Errorf("book: exit %d\n%s%s", code, out, errb)
	}
}
