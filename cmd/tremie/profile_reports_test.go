package main

import (
	"encoding/json"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
)

// Every report of a project with a rule profile names that profile and
// never says the thresholds are defaults: check, quantities (text, JSON,
// CSV), the summary table, the GIS export, the sheets and the book.
func TestReportsNameTheProfileInForce(t *testing.T) {
	dir := t.TempDir()
	put(t, dir, "project.toml", "[project]\nname = \"Profile trial (invented)\"\nunits = \"ft\"\ncrs = \"EPSG:2227\"\nwells = \"wells\"\nprofile = \"county.profile.toml\"\n")
	put(t, dir, "county.profile.toml", "[profile]\nname = \"Tarn County code\"\nunits = \"ft\"\nsource = \"Tarn County Code ch. 7 (invented)\"\n\n[rule.SEAL-THICKNESS]\nmin = 2\n")
	for _, id := range []string{"MW-1", "MW-2"} {
		b, err := os.ReadFile(filepath.Join("demo", "wells", id+".toml"))
		if err != nil {
			t.Fatal(err)
		}
		put(t, dir, filepath.Join("wells", id+".toml"), string(b))
	}
	const named = `rule thresholds from profile "Tarn County code" (county.profile.toml), following Tarn County Code ch. 7 (invented)`
	expect := func(what, out string) {
		t.Helper()
		flat := strings.Join(strings.Fields(out), " ")
		if !strings.Contains(flat, named) {
			t.Errorf("%s does not name the profile:\n%s", what, out)
		}
		if strings.Contains(flat, "thresholds are defaults") {
			t.Errorf("%s says the thresholds are defaults under a profile:\n%s", what, out)
		}
	}
	for _, args := range [][]string{
		{"check", dir},
		{"quantities", dir},
		{"quantities", "--format", "json", dir},
		{"quantities", "--format", "csv", dir},
		{"quantities", filepath.Join(dir, "wells", "MW-1.toml")}, // a file of the project
		{"table", "--format", "md", dir},
		{"export", "--format", "csv", dir},
		{"export", "--format", "geojson", dir},
	} {
		code, out, errb := runTremie(args...)
		if code != exitOK && code != exitFindings {
			t.Fatalf("%v: exit %d: %s", args, code, errb)
		}
		if args[0] == "check" {
			expect(strings.Join(args, " "), strings.ReplaceAll(out, "Figures and checks", "")) // check words its own caution
			continue
		}
		switch args[len(args)-2] {
		case "csv":
			out = strings.ReplaceAll(out, `""`, `"`) // a CSV cell's doubled quotes
		case "geojson", "json":
			var g struct {
				Caution string `json:"caution"`
			}
			if err := json.Unmarshal([]byte(out), &g); err != nil {
				t.Fatal(err)
			}
			out = g.Caution
		}
		expect(strings.Join(args, " "), out)
	}
	outDir := filepath.Join(dir, "sheets")
	if code, _, errb := runTremie("render", "--format", "svg", "-o", outDir, dir); code != exitOK && code != exitFindings {
		t.Fatalf("render: exit %d: %s", code, errb)
	}
	svg, err := os.ReadFile(filepath.Join(outDir, "MW-1.svg"))
	if err != nil {
		t.Fatal(err)
	}
	if s := string(svg); strings.Contains(s, "thresholds are defaults") || !strings.Contains(s, "Tarn County code") {
		t.Errorf("the sheet's footer does not name the profile")
	}
	if _, err := exec.LookPath("pdftotext"); err != nil {
		t.Skip("pdftotext (poppler-utils) not installed: the book's text is not read")
	}
	pdf := filepath.Join(dir, "book.pdf")
	if code, _, errb := runTremie("book", dir, "-o", pdf); code != exitOK && code != exitFindings {
		t.Fatalf("book: exit %d: %s", code, errb)
	}
	text, err := exec.Command("pdftotext", pdf, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	expect("book", string(text))
}
