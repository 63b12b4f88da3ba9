package book

import (
	"bytes"
	"io/fs"
	"os"
	"os/exec"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
	"time"

	"github.com/pdfcpu/pdfcpu/pkg/api"
	"github.com/pdfcpu/pdfcpu/pkg/pdfcpu/model"

	"github.com/tremie-dev/tremie/cmd/tremie/demo"
	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/table"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/rules"
)

// demoInput binds the demo project, plus one file that cannot be read.
func demoInput(t testing.TB) (Input, []int) {
	t.Helper()
	pt, err := demo.FS.ReadFile("project.toml")
	if err != nil {
		t.Fatal(err)
	}
	p, err := project.Parse(".", "project.toml", pt)
	if err != nil {
		t.Fatal(err)
	}
	names, _ := fs.Glob(demo.FS, "wells/*.toml")
	var entries []table.Entry
	var wells []Well
	var pages []int
	for _, n := range names {
		data, _ := demo.FS.ReadFile(n)
		w, err := schema.Load(n, data)
		if err != nil {
			t.Fatal(err)
		}
		project.Apply(p, w)
		fds := rules.Check(w, nil)
		doc := stubSheets(w, 1+len(wells)%2)
		pdf, err := out.PDF(doc)
		if err != nil {
			t.Fatal(err)
		}
		entries = append(entries, table.Entry{File: n, Well: w, Findings: fds})
		wells = append(wells, Well{ID: w.ID, File: n, Findings: fds, Sheets: pdf})
		pages = append(pages, len(doc.Pages))
	}
	bad := "wells/ZZ-9.toml"
	entries = append(entries, table.Entry{File: bad, Err: &schema.Error{File: bad, Line: 3, Msg: "TOML syntax: unterminated string"}})
	wells = append(wells, Well{File: bad, Problem: "wells/ZZ-9.toml:3: TOML syntax: unterminated string"})
	pages = append(pages, 0)
	in := Input{Project: p, Date: time.Date(2026, 6, 15, 0, 0, 0, 0, time.UTC), Table: table.Build(entries, p.Units), Wells: wells}
	return in, pages
}

// stubSheets stands in for a well's laid-out sheets (package
// render/sheet): n letter pages through the real PDF backend.
func stubSheets(w *schema.Well, n int) *draw.Document {
	doc := &draw.Document{Title: w.ID, Date: "2026-06-15T00:00:00Z"}
	for i := 0; i < n; i++ {
		pg := &draw.Page{Width: 612, Height: 792}
		pg.Add(draw.Box{Style: draw.Style{Stroke: draw.Black, StrokeWidth: 1}, Rect: draw.Rect{X: 28, Y: 28, W: 556, H: 736}})
		pg.Add(draw.Text{At: draw.Point{X: 40, Y: 60}, S: w.ID + " sheet " + strconv.Itoa(i+1) + " — 2 in ± 0.1°", Size: 14})
		doc.Pages = append(doc.Pages, pg)
	}
	return doc
}

func TestBookValidatesWithBookmarksPerWell(t *testing.T) {
	in, pages := demoInput(t)
	pdf, err := Build(in)
	if err != nil {
		t.Fatal(err)
	}
	// pdfcpu's validator, in its strict mode.
	conf := model.NewDefaultConfiguration()
	conf.ValidationMode = model.ValidationStrict
	if err := api.Validate(bytes.NewReader(pdf), conf); err != nil {
		t.Fatalf("pdfcpu validation: %v", err)
	}
	bms, err := api.Bookmarks(bytes.NewReader(pdf), nil)
	if err != nil {
		t.Fatal(err)
	}
	top := map[string]int{}
	var wellMarks []string
	for _, b := range bms {
		top[b.Title] = b.PageFrom
		if b.Title == "Well sheets" {
			for _, k := range b.Kids {
				wellMarks = append(wellMarks, k.Title)
			}
		}
	}
	var drawn []string
	sheets := 0
	for i, w := range in.Wells {
		if w.Sheets != nil {
			drawn = append(drawn, w.ID)
			sheets += pages[i]
		}
	}
	if strings.Join(wellMarks, " ") != strings.Join(drawn, " ") {
		t.Errorf("well bookmarks %v, want %v", wellMarks, drawn)
	}
	if top["Cover"] != 1 || top["Contents"] != 2 || top["Construction summary"] <= 2 || top["Findings and waivers"] < top["Construction summary"] {
		t.Errorf("outline %v", top)
	}
	// cover + contents + table pages + sheets: the sheets begin right
	// after the tables, and nothing follows the last sheet.
	n, err := api.PageCount(bytes.NewReader(pdf), nil)
	if err != nil {
		t.Fatal(err)
	}
	contentsPages := top["Construction summary"] - 2
	tablePages := top["Well sheets"] - top["Construction summary"]
	if n != 1+contentsPages+tablePages+sheets || contentsPages != 1 || tablePages < 2 {
		t.Errorf("%d pages; contents %d, tables %d, sheets %d", n, contentsPages, tablePages, sheets)
	}
}

func TestBookIsDeterministic(t *testing.T) {
	in, _ := demoInput(t)
	a, err := Build(in)
	if err != nil {
		t.Fatal(err)
	}
	b, _ := Build(in)
	if !bytes.Equal(a, b) {
		t.Fatal("two builds differ")
	}
	if !bytes.Contains(a, []byte("/CreationDate(D:20260615000000+00'00')")) {
		t.Error("creation date not pinned to the input date")
	}
	in.Date = in.Date.AddDate(0, 0, 1)
	c, _ := Build(in)
	if bytes.Equal(a, c) {
		t.Error("a different date gave the same bytes")
	}
}

// TestBookText reads the book back with poppler's pdftotext, where
// installed: the caution is on the cover and after the findings, the
// contents name every well, and non-ASCII text survives the UTF-8 font.
func TestBookText(t *testing.T) {
	bin, err := exec.LookPath("pdftotext")
	if err != nil {
		t.Skip("pdftotext not installed")
	}
	in, _ := demoInput(t)
	in.Project.Client = "Brennick Valley Water Authority — Ångström Division ±µ°"
	pdf, err := Build(in)
	if err != nil {
		t.Fatal(err)
	}
	path := filepath.Join(t.TempDir(), "book.pdf")
	os.WriteFile(path, pdf, 0o644)
	page := func(first, last int) string {
		out, err := exec.Command(bin, "-f", itoa(first), "-l", itoa(last), "-layout", path, "-").Output()
		if err != nil {
			t.Fatal(err)
		}
		return strings.Join(strings.Fields(string(out)), " ")
	}
	caution := strings.Join(strings.Fields(Caution), " ")
	if c := page(1, 1); !strings.Contains(c, caution) || !strings.Contains(c, "Ångström Division ±µ°") {
		t.Errorf("cover:\n%s", c)
	}
	contents := page(2, 2)
	for _, w := range in.Wells {
		if !strings.Contains(contents, w.Name()) {
			t.Errorf("contents lack %s:\n%s", w.Name(), contents)
		}
	}
	if !strings.Contains(contents, "not drawn") {
		t.Errorf("contents do not say the unreadable file was not drawn:\n%s", contents)
	}
	bms, _ := api.Bookmarks(bytes.NewReader(pdf), nil)
	var sheetsAt int
	for _, b := range bms {
		if b.Title == "Well sheets" {
			sheetsAt = b.PageFrom
		}
	}
	tables := page(3, sheetsAt-1)
	if !strings.Contains(tables, caution) || !strings.Contains(tables, "Findings and waivers") || !strings.Contains(tables, "MW-3") {
		t.Errorf("tables:\n%s", tables)
	}
}

func itoa(n int) string { return strconv.Itoa(n) }

// TestBookTakesAnyUnicode: runes above U+FFFF (an emoji in the project
// name, a musical symbol in a well ID) and runes the face lacks print as
// the replacement character; fpdf used to panic on the first kind.
func TestBookTakesAnyUnicode(t *testing.T) {
	in, _ := demoInput(t)
	in.Project.Name = "Coldwater 💧 Mill"
	in.Project.Client = "Client \U0001D11E and \u0E01"
	in.Wells[0].ID = "MW-\U0001F600"
	pdf, err := Build(in)
	if err != nil {
		t.Fatal(err)
	}
	bin, err := exec.LookPath("pdftotext")
	if err != nil {
		t.Skip("pdftotext not installed")
	}
	path := filepath.Join(t.TempDir(), "book.pdf")
	os.WriteFile(path, pdf, 0o644)
	out, err := exec.Command(bin, "-l", "2", path, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{"Coldwater \uFFFD Mill", "Client \uFFFD and", "MW-\uFFFD"} {
		if !strings.Contains(string(out), want) {
			t.Errorf("book text lacks %q:\n%s", want, out)
		}
	}
	if printable("plain ±µ° Å") != "plain ±µ° Å" {
		t.Error("printable changed text the face can print")
	}
}

// FuzzBookText: any text in the project's name and a well's ID binds
// into a book without a panic.
func FuzzBookText(f *testing.F) {
	f.Add("Coldwater 💧 Mill", "MW-\U0001F600")
	f.Add("\x00\x1b[2J", "=cmd|' /C calc'!A0")
	f.Add(strings.Repeat("W", 2000), "")
	in, _ := demoInput(f)
	f.Fuzz(func(t *testing.T, name, id string) {
		c := in
		pr := *in.Project
		pr.Name = name
		c.Project = &pr
		c.Wells = append([]Well{}, in.Wells...)
		c.Wells[0].ID = id
		if _, err := Build(c); err != nil && !strings.Contains(err.Error(), "book") {
			t.Fatalf("unexplained error: %v", err)
		}
	})
}

// TestTallyReadsAsWords: the findings page counts the demo's wells in
// words, one status each (the seven demo wells: four clean, MW-3 with
// errors, MW-2 waived, MW-4 planned; and the test's unreadable file),
// never "1 errors".
func TestTallyReadsAsWords(t *testing.T) {
	in, _ := demoInput(t)
	got := tally(in)
	if !strings.HasPrefix(got, "8 wells: 4 clean, 1 with errors, 1 waived, 1 planned, 1 unreadable.") {
		t.Errorf("tally %q", got)
	}
}

// TestCleanBookSaysNoFindings: a book of wells without findings says so
// under "Findings and waivers" instead of printing the table's head over
// no rows.
func TestCleanBookSaysNoFindings(t *testing.T) {
	bin, err := exec.LookPath("pdftotext")
	if err != nil {
		t.Skip("pdftotext not installed")
	}
	in, _ := demoInput(t)
	var wells []Well
	var entries []table.Entry
	for _, w := range in.Wells {
		if len(w.Findings) > 0 || w.Problem != "" {
			continue
		}
		data, err := demo.FS.ReadFile(w.File)
		if err != nil {
			t.Fatal(err)
		}
		sw, err := schema.Load(w.File, data)
		if err != nil {
			t.Fatal(err)
		}
		project.Apply(in.Project, sw)
		wells = append(wells, w)
		entries = append(entries, table.Entry{File: w.File, Well: sw})
	}
	if len(wells) < 2 {
		t.Fatalf("%d clean demo wells", len(wells))
	}
	in.Wells = wells
	in.Table = table.Build(entries, in.Project.Units)
	pdf, err := Build(in)
	if err != nil {
		t.Fatal(err)
	}
	path := filepath.Join(t.TempDir(), "book.pdf")
	os.WriteFile(path, pdf, 0o644)
	out, err := exec.Command(bin, "-layout", path, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	text := strings.Join(strings.Fields(string(out)), " ")
	if !strings.Contains(text, "Findings and waivers") || !strings.Contains(text, "No well has a finding, and none is waived.") {
		t.Errorf("the findings page does not say there are none:\n%s", text)
	}
	if strings.Contains(text, "Line Finding") || strings.Contains(text, "not listed") {
		t.Errorf("the findings page prints a table head or says what it leaves out of no rows:\n%s", text)
	}
}
