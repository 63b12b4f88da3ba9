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
