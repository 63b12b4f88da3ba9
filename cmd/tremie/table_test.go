package main

import (
	"bytes"
	"encoding/csv"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"github.com/xuri/excelize/v2"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/synth"
)

// spoiledProject is a synthetic project of n wells in which well 1 is not
// TOML, well 2 cannot be read and well 3 has an error finding (its
// filter pack stops below the top of its screen).
func spoiledProject(t testing.TB, n int) string {
	t.Helper()
	dir := t.TempDir()
	if err := synth.Project(dir, n); err != nil {
		t.Fatal(err)
	}
	well := func(i int) string { return filepath.Join(dir, "wells", synth.FileName(i)) }
	os.WriteFile(well(1), []byte("[units\ndepth = \"ft\"\n"), 0o644)
	os.Remove(well(2))
	if err := os.Symlink("missing.toml", well(2)); err != nil { // dangling: unreadable even by root
		t.Fatal(err)
	}
	w3, err := schema.Load("w3", synth.Well(3))
	if err != nil {
		t.Fatal(err)
	}
	text := string(synth.Well(3))
	// Lower the pack's top to 1 ft below the screen's top.
	packTop := w3.Fills[0].Top.In(w3.Units.Depth)
	screenTop := w3.Screens()[0].Section.Top.In(w3.Units.Depth)
	text = strings.Replace(text, "top = "+trim(packTop)+"\nbottom", "top = "+trim(screenTop+1)+"\nbottom", 1)
	if text == string(synth.Well(3)) {
		t.Fatal("could not spoil well 3")
	}
	os.WriteFile(well(3), []byte(text), 0o644)
	return dir
}

func trim(v float64) string {
	s := strconv.FormatFloat(v, 'f', 2, 64)
	s = strings.TrimRight(s, "0")
	if strings.HasSuffix(s, ".") {
		s += "0"
	}
	return s
}

func TestTableKeepsGoingPastBadWells(t *testing.T) {
	dir := spoiledProject(t, 6)
	var stdout, stderr bytes.Buffer
	code := run([]string{"table", dir, "--format", "csv"}, &stdout, &stderr)
	if code != exitInput {
		t.Errorf("exit %d, want %d (an unreadable file)", code, exitInput)
	}
	recs, err := csv.NewReader(&stdout).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	// data only: the header and one record per well (each has one string)
	if len(recs) != 1+6 {
		t.Fatalf("%d records", len(recs))
	}
	if !strings.Contains(stderr.String(), "licensed professional") {
		t.Error("the caution is not printed with the CSV")
	}
	status := map[string]string{}
	last := len(recs[0]) - 1
	for i, r := range recs[1:7] {
		status[synth.ID(i)] = strings.SplitN(r[last], ":", 2)[0]
		if i != 1 && i != 2 && r[0] != synth.ID(i) {
			t.Errorf("row %d is %q", i, r[0])
		}
	}
	want := map[string]string{"SW-0001": "clean", "SW-0002": "unreadable", "SW-0003": "unreadable", "SW-0004": "errors", "SW-0005": "clean", "SW-0006": "clean"}
	for id, s := range want {
		if status[id] != s {
			t.Errorf("%s: %q, want %q", id, status[id], s)
		}
	}
	for _, f := range []string{synth.FileName(1) + ":1:7: TOML syntax" /* "[units" unclosed on line 1 */, synth.FileName(2) + ": cannot read"} {
		if !strings.Contains(stderr.String(), f) {
			t.Errorf("stderr does not name %s:\n%s", f, stderr.String())
		}
	}
}

func TestTableErrorsOnlyExitOne(t *testing.T) {
	dir := spoiledProject(t, 6)
	os.Remove(filepath.Join(dir, "wells", synth.FileName(1)))
	os.Remove(filepath.Join(dir, "wells", synth.FileName(2)))
	var stdout, stderr bytes.Buffer
	if code := run([]string{"table", dir, "--format", "md"}, &stdout, &stderr); code != exitFindings {
		t.Errorf("exit %d, want %d; stderr:\n%s", code, exitFindings, stderr.String())
	}
	if !strings.Contains(stdout.String(), "| SW-0004 |") || !strings.Contains(stdout.String(), "Caution") {
		t.Errorf("markdown:\n%s", stdout.String())
	}
}

func TestTableXLSXDefaultsToTheOutputFolder(t *testing.T) {
	dir := t.TempDir()
	if err := synth.Project(dir, 5); err != nil {
		t.Fatal(err)
	}
	var stdout, stderr bytes.Buffer
	if code := run([]string{"table", "--format", "xlsx", dir}, &stdout, &stderr); code != exitOK {
		t.Fatalf("exit %d: %s", code, stderr.String())
	}
	path := filepath.Join(dir, "out", "summary.xlsx")
	f, err := excelize.OpenFile(path, excelize.Options{RawCellValue: true})
	if err != nil {
		t.Fatal(err)
	}
	rows, _ := f.GetRows("Summary")
	if len(rows) < 6 || rows[0][0] != "Well" || rows[5][0] != "SW-0005" {
		t.Fatalf("rows %v", rows)
	}
	// Total depth against the well file, both in the table's feet (the
	// synthetic project sets units = "ft"; 1 ft = 0.3048 m, NIST SP 811).
	col := -1
	for i, h := range rows[0] {
		if h == "Total depth (ft)" {
			col = i
		}
	}
	for i := 0; i < 5; i++ {
		w, _ := schema.Load("x", synth.Well(i))
		got, err := strconv.ParseFloat(rows[i+1][col], 64)
		if want := float64(w.TotalDepth) / 0.3048; err != nil || abs(got-want) > 1e-9 {
			t.Errorf("%s total depth %q, want %v", synth.ID(i), rows[i+1][col], want)
		}
	}
	first, _ := os.ReadFile(path)
	run([]string{"table", "--format", "xlsx", dir}, &stdout, &stderr)
	second, _ := os.ReadFile(path)
	if !bytes.Equal(first, second) {
		t.Error("two runs wrote different bytes")
	}
}

func abs(v float64) float64 {
	if v < 0 {
		return -v
	}
	return v
}

func TestTableUsage(t *testing.T) {
	var stdout, stderr bytes.Buffer
	for _, args := range [][]string{{"table"}, {"table", "a", "b"}, {"table", "x", "--format", "pdf"}} {
		if code := run(args, &stdout, &stderr); code != exitUsage {
			t.Errorf("%v: exit %d", args, code)
		}
	}
	if code := run([]string{"table", filepath.Join(t.TempDir(), "none")}, &stdout, &stderr); code != exitInput {
		t.Errorf("missing project: exit %d", code)
	}
}
