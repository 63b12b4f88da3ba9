package main

import (
	"bytes"
	"encoding/json"
	"github.com/tremie-dev/tremie/cmd/tremie/demo"
	"os"
	"path/filepath"
	"regexp"
	"sort"
	"strings"
	"testing"

	"github.com/xuri/excelize/v2"
)

// findingsOf runs tremie check --format json on a project and returns its
// findings as "well rule severity message" lines, without file lines
// (the re-imported files are laid out differently).
func findingsOf(t *testing.T, dir string) []string {
	t.Helper()
	_, out, _ := runTremie("check", "--format", "json", dir)
	var files []struct {
		Findings []map[string]any
	}
	if err := json.Unmarshal([]byte(out), &files); err != nil {
		var one struct {
			Files []struct{ Findings []map[string]any }
		}
		if err2 := json.Unmarshal([]byte(out), &one); err2 != nil {
			t.Fatalf("check json: %v\n%s", err, out[:min(len(out), 400)])
		}
		for _, f := range one.Files {
			files = append(files, struct{ Findings []map[string]any }{f.Findings})
		}
	}
	var lines []string
	for _, f := range files {
		for _, fd := range f.Findings {
			delete(fd, "line")
			delete(fd, "file")
			b, _ := json.Marshal(fd)
			lines = append(lines, string(b))
		}
	}
	sort.Strings(lines)
	return lines
}

var sourceLine = regexp.MustCompile(`\(line \d+\)`)

// The demo goes out through tremie table --format import-xlsx and back in
// through tremie import: the wells check with the same findings and draw
// the same sheets, apart from the file lines findings cite.
func TestDemoRoundTripsThroughImportLayout(t *testing.T) {
	root := t.TempDir()
	a, b := filepath.Join(root, "a"), filepath.Join(root, "b")
	if err := demo.Write(a, false); err != nil {
		t.Fatal(err)
	}
	book := filepath.Join(root, "demo.xlsx")
	if code, _, errb := runTremie("table", a, "--format", "import-xlsx", "-o", book); code == exitUsage || code >= exitInput {
		t.Fatalf("table: %d %s", code, errb)
	}
	if code, out, errb := runTremie("import", book, "-o", filepath.Join(b, "wells")); code != exitOK {
		t.Fatalf("import: %d %s %s", code, out, errb)
	}
	prj, _ := os.ReadFile(filepath.Join(a, "project.toml"))
	os.WriteFile(filepath.Join(b, "project.toml"), prj, 0o644)
	// The wall images a well names travel beside it, not in the workbook.
	images, _ := filepath.Glob(filepath.Join(a, "wells", "*.png"))
	for _, im := range images {
		data, _ := os.ReadFile(im)
		os.WriteFile(filepath.Join(b, "wells", filepath.Base(im)), data, 0o644)
	}
	fa, fb := findingsOf(t, a), findingsOf(t, b)
	if len(fa) == 0 || strings.Join(fa, "\n") != strings.Join(fb, "\n") {
		t.Errorf("findings differ:\n%s\n---\n%s", strings.Join(fa, "\n"), strings.Join(fb, "\n"))
	}
	ra, rb := filepath.Join(root, "ra"), filepath.Join(root, "rb")
	runTremie("render", a, "-o", ra, "--format", "svg")
	runTremie("render", b, "-o", rb, "--format", "svg")
	sheets, _ := filepath.Glob(filepath.Join(ra, "*.svg"))
	if len(sheets) < 7 {
		t.Fatalf("%d sheets drawn", len(sheets))
	}
	for _, s := range sheets {
		x, _ := os.ReadFile(s)
		y, err := os.ReadFile(filepath.Join(rb, filepath.Base(s)))
		if err != nil {
			t.Errorf("%s not drawn from the re-imported wells", filepath.Base(s))
			continue
		}
		if !bytes.Equal(sourceLine.ReplaceAll(x, nil), sourceLine.ReplaceAll(y, nil)) {
			t.Errorf("%s differs after the round trip", filepath.Base(s))
		}
	}
}

// A new user's path: write the template, fill three wells in it (here
// with excelize, as a spreadsheet program would), import, and check and
// render take the files as they are. Importing again refuses to overwrite
// them without --force.
func TestTemplateFilledWithThreeWells(t *testing.T) {
	dir := t.TempDir()
	tpl := filepath.Join(dir, "w.xlsx")
	if code, _, errb := runTremie("import", "--template", tpl); code != exitOK {
		t.Fatalf("template: %d %s", code, errb)
	}
	if code, _, _ := runTremie("import", "--template", tpl); code != exitOutput {
		t.Errorf("--template over an existing file: exit %d", code)
	}
	f, err := excelize.OpenFile(tpl)
	if err != nil {
		t.Fatal(err)
	}
	col := func(sheet, name string) string {
		rows, _ := f.GetRows(sheet)
		for i, h := range rows[0] {
			if h == name {
				c, _ := excelize.ColumnNumberToName(i + 1)
				return c
			}
		}
		t.Fatalf("no column %s on %s", name, sheet)
		return ""
	}
	// copy EX-1 to rows 3 and 4 as EX-2, EX-3 (other depths), and its
	// intervals likewise
	wells, _ := f.GetRows("Wells", excelize.Options{RawCellValue: true})
	for i, id := range []string{"EX-2", "EX-3"} {
		row := make([]any, len(wells[1]))
		for j, v := range wells[1] {
			row[j] = v
		}
		cell, _ := excelize.CoordinatesToCellName(1, i+3)
		f.SetSheetRow("Wells", cell, &row)
		f.SetCellStr("Wells", col("Wells", "well_id")+strings.TrimPrefix(cell, "A"), id)
	}
	ivs, _ := f.GetRows("Intervals", excelize.Options{RawCellValue: true})
	n := len(ivs)
	for k, id := range []string{"EX-2", "EX-3"} {
		for r := 1; r < len(ivs); r++ {
			row := make([]any, len(ivs[r]))
			for j, v := range ivs[r] {
				row[j] = v
			}
			row[0] = id
			cell, _ := excelize.CoordinatesToCellName(1, n+1+k*(len(ivs)-1)+r-1)
			f.SetSheetRow("Intervals", cell, &row)
		}
	}
	if err := f.Save(); err != nil {
		t.Fatal(err)
	}
	out := filepath.Join(dir, "wells")
	if code, o, errb := runTremie("import", tpl, "-o", out); code != exitOK || !strings.Contains(o, "3 well files") {
		t.Fatalf("import: %d %s %s", code, o, errb)
	}
	if code, o, errb := runTremie("check", out); code == exitInput {
		t.Errorf("check refused the imported files: %s %s", o, errb)
	}
	if code, _, errb := runTremie("render", out, "-o", filepath.Join(dir, "sheets"), "--format", "svg"); code == exitInput || code == exitOutput {
		t.Errorf("render refused the imported files: %d %s", code, errb)
	}
	before, _ := os.ReadFile(filepath.Join(out, "EX-2.toml"))
	if code, _, errb := runTremie("import", tpl, "-o", out); code != exitOutput || !strings.Contains(errb, "--force") {
		t.Errorf("second import: %d %s", code, errb)
	}
	after, _ := os.ReadFile(filepath.Join(out, "EX-2.toml"))
	if !bytes.Equal(before, after) {
		t.Error("EX-2.toml changed without --force")
	}
	if code, _, _ := runTremie("import", tpl, "-o", out, "--force"); code != exitOK {
		t.Errorf("--force: exit %d", code)
	}
}

// A bad cell: exit 2, every problem on stderr as file:Sheet!Cell, and no
// file written.
func TestImportBadCellWritesNothing(t *testing.T) {
	dir := t.TempDir()
	csv := filepath.Join(dir, "w.csv")
	os.WriteFile(csv, []byte("well_id,purpose,depth_unit,total_depth\nB-1,monitoring,ft,lots\nB-2,monitoring,yards,10\n"), 0o644)
	out := filepath.Join(dir, "wells")
	code, _, errb := runTremie("import", csv, "-o", out)
	if code != exitInput || !strings.Contains(errb, "w.csv:Wells!D2: total_depth") || !strings.Contains(errb, "w.csv:Wells!C3:") {
		t.Errorf("exit %d\n%s", code, errb)
	}
	if _, err := os.Stat(out); err == nil {
		t.Error("the wells directory was made despite the errors")
	}
}

// TestImportCountsInWords: the closing line counts in words that agree
// with the count ("1 problem", "1 well file exists"), and an existing
// file is kept (exit 4) until --force.
func TestImportCountsInWords(t *testing.T) {
	dir := t.TempDir()
	out := filepath.Join(dir, "wells")
	tmpl := filepath.Join(dir, "t.xlsx")
	if code, _, errb := runTremie("import", "--template", tmpl); code != exitOK {
		t.Fatalf("template: exit %d %s", code, errb)
	}
	if code, _, errb := runTremie("import", tmpl, "-o", out); code != exitOK {
		t.Fatalf("import: exit %d %s", code, errb)
	}
	code, _, errb := runTremie("import", tmpl, "-o", out)
	if code != exitOutput || !strings.Contains(errb, "tremie import: 1 well file exists; nothing written") {
		t.Errorf("second import: exit %d\n%s", code, errb)
	}
	wells, intervals := filepath.Join(dir, "w.csv"), filepath.Join(dir, "i.csv")
	os.WriteFile(wells, []byte("well_id,purpose,depth_unit,total_depth\nB-1,monitoring,ft,10\n"), 0o644)
	os.WriteFile(intervals, []byte("well_id,kind,top,bottom,diameter\nB-1,borehole,0,10,wide\n"), 0o644)
	code, _, errb = runTremie("import", wells, intervals, "-o", filepath.Join(dir, "other"))
	if code != exitInput || !strings.Contains(errb, "tremie import: 1 problem; nothing written") {
		t.Errorf("one bad cell: exit %d\n%s", code, errb)
	}
}
