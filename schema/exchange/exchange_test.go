package exchange

import (
	"bytes"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"
	"time"

	"github.com/xuri/excelize/v2"

	"github.com/tremie-dev/tremie/schema"
)

var day = time.Date(2026, 1, 1, 0, 0, 0, 0, time.UTC)

func writeTemp(t *testing.T, name string, data []byte) string {
	t.Helper()
	p := filepath.Join(t.TempDir(), name)
	if err := os.WriteFile(p, data, 0o644); err != nil {
		t.Fatal(err)
	}
	return p
}

// The template carries a note on every named header, validation lists on
// the list columns and the example well, which imports as it is.
func TestTemplate(t *testing.T) {
	data, err := Template(day)
	if err != nil {
		t.Fatal(err)
	}
	again, _ := Template(day)
	if !bytes.Equal(data, again) {
		t.Error("template bytes differ between runs")
	}
	p := writeTemp(t, "template.xlsx", data)
	f, err := excelize.OpenFile(p)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	comments, _ := f.GetComments(WellsSheet)
	if len(comments) < 30 {
		t.Errorf("%d header notes on Wells", len(comments))
	}
	dvs, _ := f.GetDataValidations(IntervalsSheet)
	var lists []string
	for _, dv := range dvs {
		lists = append(lists, dv.Sqref+"="+dv.Formula1)
	}
	for _, col := range []string{"kind", "material", "casing_kind"} {
		found := false
		for i, c := range intervalColumnNames() {
			if c == col {
				name, _ := excelize.ColumnNumberToName(i + 1)
				for _, l := range lists {
					found = found || strings.HasPrefix(l, name+"2:")
				}
			}
		}
		if !found {
			t.Errorf("no validation list on Intervals %s: %v", col, lists)
		}
	}
	files, errs := Import(p)
	if len(errs) > 0 || len(files) != 1 || files[0].ID != "EX-1" {
		t.Fatalf("%v %v", errs, files)
	}
	w := files[0].Well
	if len(w.Fills) != 4 || len(w.Fills[0].Tags) != 1 || len(w.Strings) != 1 || len(w.Strings[0].Sections) != 2 || w.Location.CRS != "EPSG:32610" {
		t.Errorf("EX-1 read as %+v", w)
	}
}

func intervalColumnNames() []string {
	var out []string
	for _, c := range intervalColumns {
		out = append(out, c.name)
	}
	return out
}

// sheetRows fills a workbook's sheets from rows of cells (row 1 the header).
func workbook(t *testing.T, sheets map[string][][]any) string {
	t.Helper()
	f := excelize.NewFile()
	defer f.Close()
	first := true
	for _, name := range []string{WellsSheet, IntervalsSheet} {
		rows, ok := sheets[name]
		if !ok {
			continue
		}
		if first {
			f.SetSheetName("Sheet1", name)
			first = false
		} else {
			f.NewSheet(name)
		}
		for ri, r := range rows {
			cell, _ := excelize.CoordinatesToCellName(1, ri+1)
			if err := f.SetSheetRow(name, cell, &r); err != nil {
				t.Fatal(err)
			}
		}
	}
	var buf bytes.Buffer
	if err := f.Write(&buf); err != nil {
		t.Fatal(err)
	}
	return writeTemp(t, "wells.xlsx", buf.Bytes())
}

var wellsHeader = []any{"well_id", "purpose", "depth_unit", "total_depth", "drilled"}
var intervalsHeader = []any{"well_id", "kind", "string", "top", "bottom", "diameter", "material", "size", "schedule", "slot_number", "bags", "after_bags", "depth"}

// Every bad cell is named by file, sheet and cell, all of them at once,
// and nothing is made.
func TestEveryBadCellIsNamed(t *testing.T) {
	p := workbook(t, map[string][][]any{
		WellsSheet: {
			wellsHeader,
			{"A-1", "monitoring", "ft", "deep", "2026-03-09"}, // D2: not a number
			{"A-2", "monitoring", "ft", 30, "last tuesday"},   // E3: not a date
			{"A-3", "bird-bath", "ft", 30, nil},               // B4: not a purpose
			{"A-1", "monitoring", "ft", 20, nil},              // A5: duplicate
		},
		IntervalsSheet: {
			intervalsHeader,
			{"A-2", "borehole", nil, 0, 30, 8.25},
			{"A-2", "fill", nil, 20, 10, nil, "filter-pack"},                   // E3: inverted (bottom above top)
			{"A-2", "fill", nil, 0, 10, nil, "unobtainium"},                    // G4: unknown material
			{"Z-9", "borehole", nil, 0, 10, 8},                                 // A5: unknown well
			{"A-2", "gravel", nil, 0, 1},                                       // B6: unknown kind
			{"A-2", "tag", nil, nil, nil, nil, nil, nil, nil, nil, nil, 3, 12}, // fine: tags the fill above
		},
	})
	files, errs := Import(p)
	if files != nil {
		t.Errorf("files made despite errors: %v", files)
	}
	var got []string
	for _, e := range errs {
		got = append(got, e.Error())
	}
	t.Logf("\n%s", strings.Join(got, "\n"))
	want := []string{
		"wells.xlsx:Wells!D2: total_depth: \"deep\" is not a number",
		"wells.xlsx:Wells!E3: drilled: \"last tuesday\" is not a date",
		"wells.xlsx:Wells!B4:",
		"wells.xlsx:Wells!A5: well \"A-1\" is already on row 2",
		"wells.xlsx:Intervals!",
		"wells.xlsx:Intervals!G4:",
		"wells.xlsx:Intervals!A5: well \"Z-9\" is not on the Wells sheet",
		"wells.xlsx:Intervals!B6: kind \"gravel\" is not one of",
	}
	for _, w := range want {
		if !slices.ContainsFunc(got, func(g string) bool { return strings.HasPrefix(g, w) }) {
			t.Errorf("no error %q in\n%s", w, strings.Join(got, "\n"))
		}
	}
	// the inverted interval is named at its top or bottom cell on row 3
	if !slices.ContainsFunc(got, func(g string) bool {
		return strings.HasPrefix(g, "wells.xlsx:Intervals!D3:") || strings.HasPrefix(g, "wells.xlsx:Intervals!E3:")
	}) {
		t.Errorf("inverted fill not named at D3/E3:\n%s", strings.Join(got, "\n"))
	}
	if !slices.ContainsFunc(got, func(g string) bool {
		return strings.HasPrefix(g, "wells.xlsx:Intervals!G4:") && strings.Contains(g, "unobtainium")
	}) {
		t.Errorf("unknown material not named:\n%s", strings.Join(got, "\n"))
	}
}

// The same wells from two CSV files: the header tells the sheets apart.
func TestCSVPair(t *testing.T) {
	dir := t.TempDir()
	wells := "well_id,purpose,depth_unit,total_depth\nC-1,piezometer,m,12.5\n"
	intervals := "well_id,kind,string,top,bottom,diameter,material,size,schedule\nC-1,borehole,,0,12.5,200,,,\nC-1,riser,,0,9,,PVC,2,40\nC-1,screen,,9,12,,PVC,2,40\n"
	os.WriteFile(filepath.Join(dir, "w.csv"), []byte(wells), 0o644)
	os.WriteFile(filepath.Join(dir, "i.csv"), []byte(intervals), 0o644)
	files, errs := Import(filepath.Join(dir, "w.csv"), filepath.Join(dir, "i.csv"))
	if len(errs) > 0 || len(files) != 1 {
		t.Fatalf("%v", errs)
	}
	w := files[0].Well
	if w.Units.Depth != schema.Metres || len(w.Strings) != 1 || len(w.Strings[0].Sections) != 2 || w.Boreholes[0].Diameter != 200 {
		t.Errorf("C-1 read as %+v", w)
	}
	// a bad cell of a CSV is named with the sheet the header makes it
	os.WriteFile(filepath.Join(dir, "i.csv"), []byte(strings.Replace(intervals, "12.5,200", "12.5,wide", 1)), 0o644)
	_, errs = Import(filepath.Join(dir, "w.csv"), filepath.Join(dir, "i.csv"))
	if len(errs) != 1 || !strings.HasPrefix(errs[0].Error(), "i.csv:Intervals!F2: diameter:") {
		t.Errorf("%v", errs)
	}
}

// A water-level row of a nested well names the string it was measured in
// in the string column, as a section row names its string; a name that is
// not one of the well's strings is named at its cell.
func TestWaterLevelRowNamesItsString(t *testing.T) {
	dir := t.TempDir()
	wells := "well_id,purpose,depth_unit,total_depth\nN-1,monitoring,ft,60\n"
	intervals := "well_id,kind,string,top,bottom,depth,diameter,size,schedule,water_level_kind\n" +
		"N-1,borehole,,0,60,,10,,,\n" +
		"N-1,riser,N-1S,0,20,,,1,40,\nN-1,screen,N-1S,20,30,,,1,40,\n" +
		"N-1,riser,N-1D,0,45,,,1,40,\nN-1,screen,N-1D,45,55,,,1,40,\n" +
		"N-1,water-level,N-1S,,,18.2,,,,static\nN-1,water-level,N-1D,,,21.7,,,,static\nN-1,water-level,,,,25,,,,first-encountered\n"
	os.WriteFile(filepath.Join(dir, "w.csv"), []byte(wells), 0o644)
	os.WriteFile(filepath.Join(dir, "i.csv"), []byte(intervals), 0o644)
	files, errs := Import(filepath.Join(dir, "w.csv"), filepath.Join(dir, "i.csv"))
	if len(errs) > 0 || len(files) != 1 {
		t.Fatalf("%v", errs)
	}
	var got []string
	for _, l := range files[0].Well.WaterLevels {
		got = append(got, l.String+"@"+schema.TrimFloat(l.Depth.In(schema.Feet), 2))
	}
	if want := []string{"N-1S@18.2", "N-1D@21.7", "@25"}; !slices.Equal(got, want) {
		t.Errorf("levels %v, want %v", got, want)
	}
	os.WriteFile(filepath.Join(dir, "i.csv"), []byte(strings.Replace(intervals, "water-level,N-1D", "water-level,N-1X", 1)), 0o644)
	_, errs = Import(filepath.Join(dir, "w.csv"), filepath.Join(dir, "i.csv"))
	if len(errs) != 1 || !strings.HasPrefix(errs[0].Error(), "i.csv:Intervals!C8:") || !strings.Contains(errs[0].Error(), `"N-1X" names no [[string]]`) {
		t.Errorf("unknown string: %v, want C8 named", errs)
	}
}

// A CSV file saved where the comma is the decimal mark separates its
// fields with semicolons: read so, whole rows keep their cells, and a
// decimal comma is named at its cell.
func TestSemicolonCSV(t *testing.T) {
	dir := t.TempDir()
	os.WriteFile(filepath.Join(dir, "w.csv"), []byte("\xef\xbb\xbfwell_id;purpose;depth_unit;total_depth\r\nC-1;piezometer;m;12.5\r\n"), 0o644)
	os.WriteFile(filepath.Join(dir, "i.csv"), []byte("well_id;kind;top;bottom;diameter;uscs;description\nC-1;borehole;0;12.5;200;;\nC-1;lithology;0;12.5;;SP;Sand, fine; grey\n"), 0o644)
	_, errs := Import(filepath.Join(dir, "w.csv"), filepath.Join(dir, "i.csv"))
	// "Sand, fine; grey" unquoted splits at its semicolon: one cell too many, not a lost row
	if len(errs) != 1 || !strings.HasPrefix(errs[0].Error(), `i.csv:Intervals!H3: " grey" stands under no column name`) {
		t.Fatalf("an unquoted separator in a cell: %v, want H3 named", errs)
	}
	// the same with commas: "Sand, fine, grey" must not become "Sand"
	os.WriteFile(filepath.Join(dir, "c.csv"), []byte("well_id,kind,top,bottom,diameter,uscs,description\nC-1,borehole,0,12.5,200,,\nC-1,lithology,0,12.5,,SP,Sand, fine, grey\n"), 0o644)
	_, errs = Import(filepath.Join(dir, "w.csv"), filepath.Join(dir, "c.csv"))
	if len(errs) != 2 || !strings.HasPrefix(errs[0].Error(), "c.csv:Intervals!H3:") || !strings.HasPrefix(errs[1].Error(), "c.csv:Intervals!I3:") {
		t.Errorf("a comma CSV's split cell: %v, want H3 and I3 named", errs)
	}
	os.WriteFile(filepath.Join(dir, "i.csv"), []byte("well_id;kind;top;bottom;diameter;uscs;description\nC-1;borehole;0;12.5;200;;\nC-1;lithology;0;12.5;;SP;\"Sand, fine; grey\"\n"), 0o644)
	files, errs := Import(filepath.Join(dir, "w.csv"), filepath.Join(dir, "i.csv"))
	if len(errs) > 0 || len(files) != 1 {
		t.Fatalf("%v", errs)
	}
	if w := files[0].Well; w.TotalDepth != 12.5 || len(w.Lithology) != 1 || w.Lithology[0].Description != "Sand, fine; grey" {
		t.Errorf("C-1 read as %+v", w)
	}
	os.WriteFile(filepath.Join(dir, "w.csv"), []byte("well_id;purpose;depth_unit;total_depth\nC-1;piezometer;m;12,5\n"), 0o644)
	_, errs = Import(filepath.Join(dir, "w.csv"), filepath.Join(dir, "i.csv"))
	if len(errs) != 1 || !strings.HasPrefix(errs[0].Error(), "w.csv:Wells!D2: total_depth:") {
		t.Errorf("decimal comma: %v", errs)
	}
}

// Dates typed into a spreadsheet arrive as serial numbers.
func TestSerialDates(t *testing.T) {
	for in, want := range map[string]string{"46090": "2026-03-09", "46090.4444444444": "2026-03-09T10:40:00", "2026-03-09 10:40": "2026-03-09T10:40:00"} {
		got, err := tomlValue(in, tDateTime)
		if err != nil || got != want {
			t.Errorf("%s -> %q, %v; want %s", in, got, err, want)
		}
	}
}

// A list value typed with capitals or spaces around it, as a spreadsheet
// leaves it, is written as the list spells it; a word not in the list is
// still named at its cell.
func TestListValuesIgnoreCase(t *testing.T) {
	p := workbook(t, map[string][][]any{
		WellsSheet: {
			wellsHeader,
			{"A-1", " Monitoring ", "FT", 30, "2026-03-09"},
		},
		IntervalsSheet: {
			intervalsHeader,
			{"A-1", "Borehole", nil, 0, 30, 8.25},
			{"A-1", "fill", nil, 0, 30, nil, "Cement-Bentonite"},
			{"A-1", "fill", nil, 0, 30, nil, "cement bentonite"}, // G4: not the list's word
		},
	})
	_, errs := Import(p)
	if len(errs) != 1 || !strings.HasPrefix(errs[0].Error(), "wells.xlsx:Intervals!G4:") {
		t.Fatalf("errors %v, want only G4", errs)
	}
	p = workbook(t, map[string][][]any{
		WellsSheet:     {wellsHeader, {"A-1", " Monitoring ", "FT", 30, "2026-03-09"}},
		IntervalsSheet: {intervalsHeader, {"A-1", "Borehole", nil, 0, 30, 8.25}, {"A-1", "fill", nil, 0, 30, nil, "Cement-Bentonite"}},
	})
	files, errs := Import(p)
	if len(errs) > 0 || len(files) != 1 {
		t.Fatalf("%v", errs)
	}
	for _, want := range []string{`purpose = "monitoring"`, `depth = "ft"`, `material = "cement-bentonite"`} {
		if !strings.Contains(string(files[0].Data), want+"\n") {
			t.Errorf("no %s in\n%s", want, files[0].Data)
		}
	}
}
