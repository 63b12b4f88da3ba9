package table

import (
	"bytes"
	"encoding/csv"
	"errors"
	"io/fs"
	"math"
	"sort"
	"strconv"
	"strings"
	"testing"
	"time"

	"github.com/BurntSushi/toml"
	"github.com/xuri/excelize/v2"

	"github.com/tremie-dev/tremie/cmd/tremie/demo"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/rules"
)

// source is one well file: its text and, independently of package
// schema, its raw TOML as BurntSushi/toml decodes it.
type source struct {
	name string
	text []byte
	raw  map[string]any
}

func sources(t *testing.T) []source {
	t.Helper()
	var out []source
	names, _ := fs.Glob(demo.FS, "wells/*.toml")
	for _, n := range names {
		b, _ := demo.FS.ReadFile(n)
		out = append(out, source{name: n, text: b})
	}
	out = append(out, source{name: "PZ-9.toml", text: []byte(metricWell)})
	for i := range out {
		if _, err := toml.Decode(string(out[i].text), &out[i].raw); err != nil {
			t.Fatal(err)
		}
	}
	return out
}

func entries(t *testing.T, src []source) []Entry {
	var es []Entry
	for _, s := range src {
		w, err := schema.Load(s.name, s.text)
		if err != nil {
			t.Fatal(err)
		}
		es = append(es, Entry{File: s.name, Well: w, Findings: rules.Check(w, nil)})
	}
	return es
}

func num(m map[string]any, k string) (float64, bool) {
	switch v := m[k].(type) {
	case float64:
		return v, true
	case int64:
		return float64(v), true
	}
	return 0, false
}

func sub(m map[string]any, k string) map[string]any { v, _ := m[k].(map[string]any); return v }

func list(m map[string]any, k string) []map[string]any { v, _ := m[k].([]map[string]any); return v }

// expected computes the numbers of a well's rows from the raw file, one
// map per string (a nested well has a row per string), in feet: depths
// and elevations as written, converted with 1 ft = 0.3048 m exactly
// (NIST SP 811); elevations of depths are ground minus depth, and a
// water level read from the measuring point is MP elevation minus the
// reading (common practice).
func expected(s source) []map[string]float64 {
	toFt := 1.0
	if sub(s.raw, "units")["depth"] == "m" {
		toFt = 1 / 0.3048
	}
	common := map[string]float64{}
	el := sub(s.raw, "elevation")
	ground, hasGround := num(el, "ground")
	mp, hasMP := num(el, "measuring_point")
	if hasGround {
		common["Ground elev. (ft)"] = ground * toFt
	}
	if hasMP {
		common["MP elev. (ft)"] = mp * toFt
	}
	td, _ := num(sub(s.raw, "well"), "total_depth")
	common["Total depth (ft)"] = td * toFt
	// The latest static reading (dates in these files sort as text) of
	// a string: of those measured in it, else of the whole hole's.
	waterOf := func(row map[string]float64, name string) {
		var latest map[string]any
		latestAt := ""
		own := false
		for _, wl := range list(s.raw, "water_level") {
			in, _ := wl["string"].(string)
			own = own || (name != "" && in == name)
		}
		for _, wl := range list(s.raw, "water_level") {
			kind, _ := wl["kind"].(string)
			in, _ := wl["string"].(string)
			if kind != "" && kind != "static" || own && in != name || !own && in != "" {
				continue
			}
			at := ""
			if tm, ok := wl["measured"].(time.Time); ok {
				at = tm.Format("2006-01-02T15:04:05")
			}
			if latest == nil || at > latestAt {
				latest, latestAt = wl, at
			}
		}
		if latest != nil {
			d, _ := num(latest, "depth")
			if latest["reference"] == "measuring-point" {
				row["Water level elev. (ft)"] = (mp - d) * toFt
				row["Water level (ft)"] = (d - (mp - ground)) * toFt
			} else {
				row["Water level elev. (ft)"] = (ground - d) * toFt
				row["Water level (ft)"] = d * toFt
			}
		}
	}
	strs := list(s.raw, "string")
	if len(strs) == 0 {
		strs = []map[string]any{{}}
	}
	var out []map[string]float64
	for _, st := range strs {
		row := map[string]float64{}
		for k, v := range common {
			row[k] = v
		}
		name, _ := st["name"].(string)
		waterOf(row, name)
		top, bot := math.Inf(1), math.Inf(-1)
		for _, sec := range list(st, "section") {
			if sec["kind"] == "screen" {
				a, _ := num(sec, "top")
				b, _ := num(sec, "bottom")
				top, bot = math.Min(top, a), math.Max(bot, b)
			}
		}
		if !math.IsInf(top, 0) {
			row["Screen top (ft)"], row["Screen bottom (ft)"] = top*toFt, bot*toFt
			if hasGround {
				row["Screen top elev. (ft)"], row["Screen bottom elev. (ft)"] = (ground-top)*toFt, (ground-bot)*toFt
			}
		}
		out = append(out, row)
	}
	return out
}

// points counts the monitoring points of the sources: a row per string.
func points(src []source) int {
	n := 0
	for _, s := range src {
		n += len(expected(s))
	}
	return n
}

func TestCSVNumbersEqualTheWellFiles(t *testing.T) {
	src := sources(t)
	tb := Build(entries(t, src), schema.Feet)
	var buf bytes.Buffer
	if err := tb.CSV(&buf); err != nil {
		t.Fatal(err)
	}
	recs, err := csv.NewReader(&buf).ReadAll() // encoding/csv checks the record lengths
	if err != nil {
		t.Fatal(err)
	}
	// data only: the header and exactly one record per monitoring point
	// (the demo's nested NW-1 gives two), no caution or total rows
	if len(recs) != 1+points(src) || points(src) != len(src)+1 {
		t.Fatalf("%d records for %d points of %d wells", len(recs), points(src), len(src))
	}
	col := map[string]int{}
	for i, h := range recs[0] {
		col[h] = i
	}
	checked, i := 0, 1
	for _, s := range src {
		strs := list(s.raw, "string")
		for k, want := range expected(s) {
			rec := recs[i]
			i++
			for h, v := range want {
				j, ok := col[h]
				if !ok {
					t.Fatalf("no column %q in %v", h, recs[0])
				}
				got, err := strconv.ParseFloat(rec[j], 64)
				// Two decimals are printed.
				if err != nil || math.Abs(got-v) > 0.005+1e-9 {
					t.Errorf("%s %s = %q, want %.4f", s.name, h, rec[j], v)
				}
				checked++
			}
			if id := sub(s.raw, "well")["id"]; rec[col["Well"]] != id {
				t.Errorf("%s: id %q", s.name, rec[col["Well"]])
			}
			if len(strs) > 1 && rec[col["String"]] != strs[k]["name"] {
				t.Errorf("%s row %d: string %q, want %v", s.name, k, rec[col["String"]], strs[k]["name"])
			}
		}
	}
	if checked < 6*len(src) {
		t.Errorf("only %d numbers checked", checked)
	}
}

func TestXLSXNumbersEqualTheWellFiles(t *testing.T) {
	src := sources(t)
	tb := Build(entries(t, src), schema.Feet)
	data, err := tb.XLSX("test", time.Date(2026, 6, 15, 0, 0, 0, 0, time.UTC))
	if err != nil {
		t.Fatal(err)
	}
	f, err := excelize.OpenReader(bytes.NewReader(data), excelize.Options{RawCellValue: true})
	if err != nil {
		t.Fatal(err)
	}
	rows, err := f.GetRows("Summary")
	if err != nil {
		t.Fatal(err)
	}
	col := map[string]int{}
	for i, h := range rows[0] {
		col[h] = i
	}
	if len(rows) != 1+points(src) {
		t.Errorf("Summary has %d rows, want the header and %d points", len(rows), points(src))
	}
	i := 0
	for _, s := range src {
		for _, want := range expected(s) {
			for h, w := range want {
				cell, _ := excelize.CoordinatesToCellName(col[h]+1, i+2)
				if typ, _ := f.GetCellType("Summary", cell); typ != excelize.CellTypeNumber && typ != excelize.CellTypeUnset {
					t.Errorf("%s %s: cell type %v, want a number", s.name, h, typ)
				}
				v, _ := f.GetCellValue("Summary", cell)
				got, err := strconv.ParseFloat(v, 64)
				// Full precision is stored; only the rounding of the
				// inputs' conversions separates them.
				if err != nil || math.Abs(got-w) > 1e-9 {
					t.Errorf("%s %s = %q, want %v", s.name, h, v, w)
				}
			}
			i++
		}
	}
	if note, _ := f.GetCellValue(NotesSheet, "A1"); note != Caution {
		t.Errorf("notes sheet holds %q", note)
	}
	props, _ := f.GetDocProps()
	if props.Created != "2026-06-15T00:00:00Z" || props.Modified != props.Created {
		t.Errorf("doc dates %q %q", props.Created, props.Modified)
	}
	again, _ := tb.XLSX("test", time.Date(2026, 6, 15, 0, 0, 0, 0, time.UTC))
	if !bytes.Equal(data, again) {
		t.Error("XLSX bytes differ between two runs")
	}
}

func TestTextColumns(t *testing.T) {
	w, err := schema.Load("PZ-9.toml", []byte(metricWell))
	if err != nil {
		t.Fatal(err)
	}
	r := Build([]Entry{{Well: w}}, "").Rows[0]
	if r.CasingSize != "DN50 SDR 11" || r.CasingMaterial != "PVC" {
		t.Errorf("casing %q %q", r.CasingSize, r.CasingMaterial)
	}
	if r.Slot == nil || math.Abs(*r.Slot-0.5) > 1e-12 || r.SlotText != "0.5 mm" {
		t.Errorf("slot %v %q", r.Slot, r.SlotText)
	}
	if c := (Cell{Num: r.Slot, Digits: 2, Fixed: true}); c.String() != "0.50" {
		t.Errorf("slot cell %q", c.String())
	}
	if r.Pack != "9.4–14.5" || r.Seal != "8.4–9.4" || r.Grout != "0–8.4" {
		t.Errorf("fills %q | %q | %q", r.Pack, r.Seal, r.Grout)
	}
	// The later of the two readings: 122.12 - 4.31 = 117.81 m.
	if r.WaterDate != "2026-05-02" || r.WaterElev == nil || math.Abs(*r.WaterElev-117.81) > 1e-9 {
		t.Errorf("water %q %v", r.WaterDate, r.WaterElev)
	}
}

func mustRead(t *testing.T, name string) []byte {
	b, err := demo.FS.ReadFile(name)
	if err != nil {
		t.Fatal(err)
	}
	return b
}

func TestStatusAndUnreadable(t *testing.T) {
	w, _ := schema.Load("PZ-9.toml", []byte(metricWell))
	cases := []struct {
		fs   []rules.Finding
		want Status
	}{
		{nil, Clean},
		{[]rules.Finding{{Severity: rules.Warning}}, Warnings},
		{[]rules.Finding{{Severity: rules.Error, Waived: true}}, Waived},
		{[]rules.Finding{{Severity: rules.Error, Waived: true}, {Severity: rules.Warning}}, Warnings},
		{[]rules.Finding{{Severity: rules.Warning}, {Severity: rules.Error}}, Errors},
	}
	for i, c := range cases {
		if got := Build([]Entry{{Well: w, Findings: c.fs}}, "").Rows[0].Status; got != c.want {
			t.Errorf("case %d: %s, want %s", i, got, c.want)
		}
	}
	tb := Build([]Entry{{File: "bad.toml", Err: errors.New("bad.toml:3:1: TOML syntax: x\nmore")}, {Well: w}}, "")
	if tb.Units != schema.Metres {
		t.Errorf("units %q: the only readable well is in metres", tb.Units)
	}
	var md bytes.Buffer
	tb.Markdown(&md)
	lines := strings.Split(md.String(), "\n")
	if !strings.Contains(lines[2], "unreadable: bad.toml:3:1: TOML syntax: x |") || !strings.HasPrefix(lines[3], "| PZ-9 |") {
		t.Errorf("markdown:\n%s", md.String())
	}
	if !strings.Contains(lines[1], "---:|") || !strings.Contains(md.String(), Caution) {
		t.Errorf("markdown header/caution:\n%s", md.String())
	}
}

func TestMixedUnitsDefaultToMetres(t *testing.T) {
	src := sources(t)
	tb := Build(entries(t, src), "")
	units := map[schema.DepthUnit]bool{}
	for _, e := range entries(t, src) {
		units[e.Well.Units.Depth] = true
	}
	if len(units) != 2 || tb.Units != schema.Metres {
		t.Errorf("units %v → %q", units, tb.Units)
	}
	h := tb.Header()
	sort.Strings(h)
	if i := sort.SearchStrings(h, "Total depth (m)"); i == len(h) || h[i] != "Total depth (m)" {
		t.Errorf("header %v", h)
	}
}

// metricWell is an invented piezometer written in metres, with a sump
// and a reading from the measuring point.
const metricWell = `[units]
depth = "m"
[well]
id = "PZ-9"
purpose = "piezometer"
total_depth = 14.5
[elevation]
ground = 121.37
measuring_point = 122.12
[[borehole]]
top = 0.0
bottom = 14.5
diameter = 200
[[string]]
[[string.section]]
kind = "riser"
top = -0.75
bottom = 10.0
material = "PVC"
size = "DN50"
sdr = 11
[[string.section]]
kind = "screen"
top = 10.0
bottom = 13.0
slot = 0.5
[[string.section]]
kind = "sump"
top = 13.0
bottom = 14.5
[[fill]]
top = 9.4
bottom = 14.5
material = "filter-pack"
[[fill]]
top = 8.4
bottom = 9.4
material = "bentonite-pellets"
[[fill]]
top = 0.0
bottom = 8.4
material = "bentonite-grout"
[[water_level]]
depth = 4.31
reference = "measuring-point"
measured = 2026-05-02
[[water_level]]
depth = 4.02
reference = "measuring-point"
measured = 2026-04-01
`

// Slots and sizes come in the table's units with the unit in the header;
// 1 in = 25.4 mm exactly (NIST SP 811). A 0.040-in slot stays 0.040 in a
// table in feet and is 1.016 mm (shown 1.02) in one in metres; a 0.5-mm
// slot is 0.0197 in (shown 0.020) in feet; a pipe given only by its OD
// (60.325 mm = 2.375 in, ASTM D1785 2-in) shows it in inches in feet.
func TestSlotAndSizeUnits(t *testing.T) {
	inch := strings.NewReplacer(`id = "PZ-9"`, `id = "PW-7"`, `slot = 0.5`, `slot_number = 40`).Replace(metricWell)
	inch = strings.Replace(inch, "[units]\ndepth = \"m\"", "[units]\ndepth = \"m\"\ndiameter = \"in\"", 1)
	inch = strings.Replace(inch, "diameter = 200", "diameter = 8", 1)
	pw7, err := schema.Load("PW-7.toml", []byte(inch))
	if err != nil {
		t.Fatal(err)
	}
	noSize := strings.Replace(strings.Replace(metricWell, `size = "DN50"`, `od = 60.325`+"\nid = 50.0", 1), "sdr = 11\n", "", 1)
	pz, err := schema.Load("PZ-9.toml", []byte(noSize))
	if err != nil {
		t.Fatal(err)
	}
	cell := func(tb *Table, row int, header string) string {
		for i, h := range tb.Header() {
			if h == header {
				return tb.Cells(tb.Rows[row])[i].String()
			}
		}
		t.Fatalf("no column %q in %v", header, tb.Header())
		return ""
	}
	ft := Build([]Entry{{Well: pw7}, {Well: pz}}, schema.Feet)
	if got := cell(ft, 0, "Slot (in)"); got != "0.040" {
		t.Errorf("0.040-in slot in feet: %q", got)
	}
	if got := cell(ft, 1, "Slot (in)"); got != "0.020" {
		t.Errorf("0.5-mm slot in feet: %q, want 0.020", got)
	}
	if got := cell(ft, 1, "Casing size"); got != "OD 2.375 in" {
		t.Errorf("OD-only casing in feet: %q", got)
	}
	m := Build([]Entry{{Well: pw7}, {Well: pz}}, schema.Metres)
	if got := cell(m, 0, "Slot (mm)"); got != "1.02" {
		t.Errorf("0.040-in slot in metres: %q, want 1.02", got)
	}
	if got := cell(m, 1, "Slot (mm)"); got != "0.50" {
		t.Errorf("0.5-mm slot in metres: %q", got)
	}
}

// A nested well gives a row per string with its own screen, the pack
// around it and its own water level: NW-1's strings are screened 30-40 and
// 70-80 ft (not one envelope of 30-80), packed 28-43 and 67-82 ft with a
// 1-ft fine-sand collar on each, 27-28 and 66-67 ft (the demo file). The
// collar is part of the string's pack, as a single well's pack cell shows
// it ("21.5–23 fine sand; 23–36 filter pack" for MW-1): this test once
// pinned "28–43", which left out the fine sand on the shallow pack. The
// packs of the other string, below a seal, stay out. Each string has its
// head, 20.9 ft for NW-1S and 24.6 ft for NW-1D below the 401.94-ft
// ground: elevations 381.04 and 377.34 ft.
func TestNestedWellRowPerString(t *testing.T) {
	w, err := schema.Load("NW-1.toml", mustRead(t, "wells/NW-1.toml"))
	if err != nil {
		t.Fatal(err)
	}
	tb := Build([]Entry{{File: "NW-1.toml", Well: w}}, schema.Feet)
	if len(tb.Rows) != 2 || tb.Wells() != 1 {
		t.Fatalf("%d rows of %d wells", len(tb.Rows), tb.Wells())
	}
	for i, want := range []struct {
		name        string
		top, bot    float64
		pack        string
		water, elev float64
		date        string
	}{
		{"NW-1S", 30, 40, "27–28 fine sand; 28–43 filter pack", 20.9, 381.04, "2026-03-20"},
		{"NW-1D", 70, 80, "66–67 fine sand; 67–82 filter pack", 24.6, 377.34, "2026-03-20"},
	} {
		r := tb.Rows[i]
		if r.ID != "NW-1" || r.String != want.name || *r.ScreenTop != want.top || *r.ScreenBottom != want.bot || r.Pack != want.pack {
			t.Errorf("row %d: %s %s %v–%v pack %q; want %+v", i, r.ID, r.String, *r.ScreenTop, *r.ScreenBottom, r.Pack, want)
		}
		if r.WaterDepth == nil || math.Abs(*r.WaterDepth-want.water) > 1e-9 || r.WaterElev == nil || math.Abs(*r.WaterElev-want.elev) > 1e-9 || r.WaterDate != want.date {
			t.Errorf("row %d %s: water %v elev %v on %q; want %+v", i, want.name, r.WaterDepth, r.WaterElev, r.WaterDate, want)
		}
	}
	// A string with no level of its own shows the hole's level: with
	// NW-1D's reading taken away, its row falls back to the first water
	// met while drilling (26.5 ft, the only reading of the whole hole).
	var kept []schema.WaterLevel
	for _, l := range w.WaterLevels {
		if l.String != "NW-1D" {
			kept = append(kept, l)
		}
	}
	w.WaterLevels = kept
	tb = Build([]Entry{{File: "NW-1.toml", Well: w}}, schema.Feet)
	if d := tb.Rows[1].WaterDepth; d == nil || math.Abs(*d-26.5) > 1e-9 || tb.Rows[1].WaterKind != "first-encountered" {
		t.Errorf("NW-1D without its own level: %v %s, want the hole's 26.5 ft first-encountered", d, tb.Rows[1].WaterKind)
	}
	if d := tb.Rows[0].WaterDepth; d == nil || math.Abs(*d-20.9) > 1e-9 {
		t.Errorf("NW-1S: %v, want its own 20.9 ft", d)
	}
}

// TestCSVCellsAreInert: a well ID or note that a spreadsheet would run as
// a formula is neutralised (OWASP, "CSV Injection"); numbers, negative
// ones too, stay numbers.
func TestCSVCellsAreInert(t *testing.T) {
	for in, want := range map[string]string{
		"=HYPERLINK(\"x\")": "'=HYPERLINK(\"x\")",
		"+1":                "'+1",
		"-cmd":              "'-cmd",
		"@SUM(A1)":          "'@SUM(A1)",
		"\tx":               "'\tx",
		"MW-1":              "MW-1",
		"":                  "",
	} {
		if got := Inert(in); got != want {
			t.Errorf("Inert(%q) = %q, want %q", in, got, want)
		}
	}
	neg := -2.5
	if got := (Cell{Num: &neg, Digits: 1}).CSVText(); got != "-2.5" {
		t.Errorf("a negative number became %q", got)
	}
}

// TestInertField: in a record of strings a plain decimal number stays a
// number, while anything a spreadsheet would evaluate is neutralised
// (OWASP, "CSV Injection": =, +, -, @, tab, carriage return).
func TestInertField(t *testing.T) {
	for in, want := range map[string]string{
		"-2.5":         "-2.5",
		"1e-3":         "1e-3",
		"-121.5846":    "-121.5846",
		"12":           "12",
		"-2+3":         "'-2+3",
		"-1e-3+A1":     "'-1e-3+A1",
		"+1":           "'+1",
		"-":            "'-",
		"-.":           "'-.",
		"=1+1":         "'=1+1",
		"@cmd":         "'@cmd",
		"\r=x":         "'\r=x",
		"MW-1":         "MW-1",
		"-Inf":         "'-Inf",
		"-0x1p-2":      "'-0x1p-2",
		"wells/W.toml": "wells/W.toml",
	} {
		if got := InertField(in); got != want {
			t.Errorf("InertField(%q) = %q, want %q", in, got, want)
		}
	}
}

// TestFillColumnsInWords: a column mixing materials names each as the
// sheet does, in words ("cement bentonite"), not by the well file's
// hyphenated value: the demo's MW-1 has concrete over cement-bentonite
// grout, and fine sand over filter pack (its well file).
func TestFillColumnsInWords(t *testing.T) {
	w, err := schema.Load("MW-1.toml", mustRead(t, "wells/MW-1.toml"))
	if err != nil {
		t.Fatal(err)
	}
	r := Build([]Entry{{Well: w}}, "").Rows[0]
	if r.Grout != "0–1.5 concrete; 1.5–18.5 cement bentonite" || r.Pack != "21.5–23 fine sand; 23–36 filter pack" {
		t.Errorf("fills %q | %q", r.Pack, r.Grout)
	}
	// and the purpose as the sheet's title block does: PW-1 is a
	// public-supply well in its file, "public supply" to a reader
	pw, err := schema.Load("PW-1.toml", mustRead(t, "wells/PW-1.toml"))
	if err != nil {
		t.Fatal(err)
	}
	if got := Build([]Entry{{Well: pw}}, "").Rows[0].Purpose; got != "public supply" {
		t.Errorf("purpose %q", got)
	}
}
