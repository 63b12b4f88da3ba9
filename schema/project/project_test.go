package project

import (
	"bytes"
	"errors"
	"image"
	"image/color"
	"image/png"
	"math/rand"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

const sample = `# invented project
[project]
name = "Larkspur Flats monitoring"
client = "Corvid Valley Water Board"
site = "Larkspur Flats rail yard"
units = "m"
datum = "NAVD88"
coordinate_system = "NAD83 / UTM zone 11N"
page = "a4"
landscape = true
wells = "wells"
output = "sheets"
consultant = "Harrow & Fitch Hydrogeology"
prepared_by = "J. Okonkwo"
checked_by = "R. Vasquez"
report = "HF-2026-014"
issued = 2026-03-20
`

func writeProject(t *testing.T, text string) string {
	t.Helper()
	dir := t.TempDir()
	if err := os.WriteFile(filepath.Join(dir, FileName), []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	return dir
}

func TestLoadReadsEveryKey(t *testing.T) {
	dir := writeProject(t, sample)
	p, err := Load(dir)
	if err != nil {
		t.Fatal(err)
	}
	if p.Name != "Larkspur Flats monitoring" || p.Client != "Corvid Valley Water Board" || p.Site != "Larkspur Flats rail yard" {
		t.Errorf("names: %+v", p)
	}
	if p.Units != schema.Metres || p.Page != "a4" || !p.Landscape || p.Datum != "NAVD88" || p.CoordinateSystem != "NAD83 / UTM zone 11N" {
		t.Errorf("settings: %+v", p)
	}
	if p.Output != filepath.Join(dir, "sheets") || p.Wells != "wells" {
		t.Errorf("paths: output %q wells %q", p.Output, p.Wells)
	}
	tb := p.TitleBlock
	if tb.Consultant != "Harrow & Fitch Hydrogeology" || tb.PreparedBy != "J. Okonkwo" || tb.CheckedBy != "R. Vasquez" || tb.ReportNumber != "HF-2026-014" {
		t.Errorf("title block: %+v", tb)
	}
	if tb.Issued.String() != "2026-03-20" {
		t.Errorf("issued %q", tb.Issued)
	}
	if p.Keys["project.page"] != 9 {
		t.Errorf("line of page = %d, want 9", p.Keys["project.page"])
	}
}

func TestLoadDefaults(t *testing.T) {
	dir := writeProject(t, "[project]\nname = \"x\"\n")
	p, err := Load(filepath.Join(dir, FileName)) // the file itself works too
	if err != nil {
		t.Fatal(err)
	}
	if p.Wells != DefaultWells || p.Output != filepath.Join(dir, DefaultOutput) || p.Units != "" || p.Logo != nil {
		t.Errorf("defaults: %+v", p)
	}
}

func TestLoadErrorsNameTheLine(t *testing.T) {
	cases := []struct {
		name, text string
		line       int
		want       string
	}{
		{"unknown key", "[project]\nname = \"x\"\n\ncolour = \"red\"\n", 4, `unknown key "colour" in [project]`},
		{"unknown table", "[project]\nname = \"x\"\n[title]\nfoo = 1\n", 3, `"title"`},
		{"wrong type", "[project]\nname = \"x\"\nlandscape = \"yes\"\n", 3, "landscape must be true or false, not a string"},
		{"syntax", "[project]\nname = \"x\n", 2, ""},
		{"no name", "[project]\nclient = \"c\"\n", 1, "needs a name"},
		{"no table", "name = \"x\"\n", 1, ""},
		{"bad units", "[project]\nname = \"x\"\nunits = \"yd\"\n", 3, `units = "yd" is not one of: ft, m`},
		{"empty wells", "[project]\nname = \"x\"\nwells = \"\"\n", 3, "wells must name"},
		{"date as text", "[project]\nname = \"x\"\nissued = \"March\"\n", 3, "must be a date"},
		{"missing profile", "[project]\nname = \"x\"\nprofile = \"nope.profile.toml\"\n", 3, "not found"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			dir := writeProject(t, c.text)
			_, err := Load(dir)
			var se *schema.Error
			if !errors.As(err, &se) {
				t.Fatalf("error %v (%T), want *schema.Error", err, err)
			}
			if se.Line != c.line {
				t.Errorf("line %d, want %d (%v)", se.Line, c.line, err)
			}
			if !strings.Contains(se.Msg, c.want) {
				t.Errorf("message %q lacks %q", se.Msg, c.want)
			}
			if !strings.HasPrefix(err.Error(), filepath.Join(dir, FileName)+":") {
				t.Errorf("message %q does not start with the file", err)
			}
		})
	}
}

// A project file with three mistakes reports all three, sorted, each with
// file:line:col, and a key one slip away from a known one is named.
func TestLoadReportsEveryError(t *testing.T) {
	dir := writeProject(t, "[project]\nname = \"x\"\nunits = \"yd\"\nlandscpe = true\n\n[[section]]\nname = \"A-A'\"\nwells = [\"MW-1\", \"MW-2\"]\nmax_offset = \"far\"\n")
	_, err := Load(dir)
	list := schema.Errors("", err)
	file := filepath.Join(dir, FileName)
	want := []string{
		file + `:3:9: units = "yd" is not one of: ft, m`,
		file + `:4:1: unknown key "landscpe" in [project] (did you mean "landscape"?)`,
		file + `:9:14: max_offset must be a number, not a string`,
	}
	if len(list) != len(want) {
		t.Fatalf("%d errors, want %d:\n%v", len(list), len(want), err)
	}
	for i, e := range list {
		if e.Error() != want[i] {
			t.Errorf("error %d:\n got %s\nwant %s", i, e, want[i])
		}
	}
	if !strings.Contains(err.Error(), "\n\t[project] takes: ") {
		t.Errorf("no usage hint for the unknown key:\n%v", err)
	}
}

func TestLoadMissingFile(t *testing.T) {
	_, err := Load(t.TempDir())
	if !errors.Is(err, ErrNoProject) {
		t.Fatalf("err = %v, want ErrNoProject", err)
	}
}

// pngOf encodes an image with the standard library's PNG encoder.
func pngOf(t *testing.T, w, h int, noise bool) []byte {
	t.Helper()
	img := image.NewNRGBA(image.Rect(0, 0, w, h))
	r := rand.New(rand.NewSource(1))
	for y := 0; y < h; y++ {
		for x := 0; x < w; x++ {
			c := color.NRGBA{uint8(x), uint8(y), 90, 255}
			if noise {
				c = color.NRGBA{uint8(r.Intn(256)), uint8(r.Intn(256)), uint8(r.Intn(256)), 255}
			}
			img.SetNRGBA(x, y, c)
		}
	}
	var b bytes.Buffer
	if err := png.Encode(&b, img); err != nil {
		t.Fatal(err)
	}
	return b.Bytes()
}

func TestLogo(t *testing.T) {
	good := pngOf(t, 120, 40, false)
	noisy := pngOf(t, 1000, 1000, true) // random pixels do not compress: ~3 MB
	if len(noisy) <= MaxLogoBytes {
		t.Fatalf("noisy PNG is only %d bytes", len(noisy))
	}
	cases := []struct {
		name string
		data []byte
		want string // "" = accepted
	}{
		{"good", good, ""},
		{"too many bytes", noisy, "limit is 1048576"},
		{"too wide", pngOf(t, 3000, 20, false), "3000×20 pixels"},
		{"too small", pngOf(t, 8, 8, false), "at least 16"},
		{"not an image", []byte("GIF89a not really"), "not a PNG or JPEG"},
		{"truncated", good[:len(good)/2], "damaged"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			dir := writeProject(t, "[project]\nname = \"x\"\n\nlogo = \"art/logo.png\"\n")
			os.MkdirAll(filepath.Join(dir, "art"), 0o755)
			if err := os.WriteFile(filepath.Join(dir, "art", "logo.png"), c.data, 0o644); err != nil {
				t.Fatal(err)
			}
			p, err := Load(dir)
			if c.want == "" {
				if err != nil {
					t.Fatal(err)
				}
				if p.Logo == nil || p.Logo.Width != 120 || p.Logo.Height != 40 || p.Logo.Format != "png" {
					t.Errorf("logo %+v", p.Logo)
				}
				return
			}
			var se *schema.Error
			if !errors.As(err, &se) || se.Line != 4 || !strings.Contains(se.Msg, c.want) {
				t.Errorf("err = %v, want line 4 and %q", err, c.want)
			}
		})
	}
}

const wellText = `[units]
depth = "ft"
[well]
id = "MW-9"
purpose = "monitoring"
total_depth = 20.0
%s
[elevation]
ground = 100.0
[[borehole]]
top = 0.0
bottom = 20.0
diameter = 8.0
`

func TestApplyFillsOnlyBlanks(t *testing.T) {
	p, err := Parse(".", FileName, []byte(sample))
	if err != nil {
		t.Fatal(err)
	}
	blank, err := schema.Load("blank.toml", []byte(strings.Replace(wellText, "%s", "", 1)))
	if err != nil {
		t.Fatal(err)
	}
	Apply(p, blank)
	if blank.Project != p.Name || blank.Client != p.Client || blank.Site != p.Site || blank.CheckedBy != "R. Vasquez" ||
		blank.Elevation.Datum != "NAVD88" || blank.Location.System != "NAD83 / UTM zone 11N" {
		t.Errorf("blank well after Apply: %+v", blank)
	}
	own, err := schema.Load("own.toml", []byte(strings.Replace(wellText, "%s", "client = \"Own Client\"\nchecked_by = \"A. Person\"", 1)))
	if err != nil {
		t.Fatal(err)
	}
	Apply(p, own)
	if own.Client != "Own Client" || own.CheckedBy != "A. Person" || own.Project != p.Name {
		t.Errorf("well values must win: client %q checked %q project %q", own.Client, own.CheckedBy, own.Project)
	}
}

func TestWellFiles(t *testing.T) {
	dir := writeProject(t, "[project]\nname = \"x\"\n")
	for _, f := range []string{"wells/MW-2.toml", "wells/MW-1.toml", "wells/deep/PZ-1.toml", "wells/.hidden/X.toml", "wells/notes.txt", "wells/site.profile.toml"} {
		path := filepath.Join(dir, filepath.FromSlash(f))
		os.MkdirAll(filepath.Dir(path), 0o755)
		os.WriteFile(path, []byte("#"), 0o644)
	}
	p, _ := Load(dir)
	got, err := p.WellFiles()
	if err != nil {
		t.Fatal(err)
	}
	var keys []string
	for _, f := range got {
		keys = append(keys, p.Key(f))
	}
	if strings.Join(keys, " ") != "wells/MW-1.toml wells/MW-2.toml wells/deep/PZ-1.toml" {
		t.Errorf("dir: %v", keys)
	}
	p.Wells = "wells/MW-*.toml"
	got, _ = p.WellFiles()
	if len(got) != 2 {
		t.Errorf("glob: %v", got)
	}
	p.Wells = "nowhere"
	if _, err := p.WellFiles(); err == nil {
		t.Error("missing wells directory: no error")
	}
}

func TestSettingsChangeWithEverySheetSetting(t *testing.T) {
	base, _ := Parse(".", FileName, []byte(sample))
	ref := string(base.Settings())
	edits := map[string]func(p *Project){
		"name":     func(p *Project) { p.Name += "!" },
		"page":     func(p *Project) { p.Page = "letter" },
		"land":     func(p *Project) { p.Landscape = false },
		"report":   func(p *Project) { p.TitleBlock.ReportNumber = "2" },
		"issued":   func(p *Project) { p.TitleBlock.Issued.Day++ },
		"logo":     func(p *Project) { p.LogoPath = "l.png" },
		"datum":    func(p *Project) { p.Datum = "NGVD29" },
		"revision": func(p *Project) { p.TitleBlock.Revision = "C" },
	}
	for name, edit := range edits {
		p, _ := Parse(".", FileName, []byte(sample))
		edit(p)
		if string(p.Settings()) == ref {
			t.Errorf("%s: settings unchanged", name)
		}
	}
	p, _ := Parse(".", FileName, []byte(sample))
	p.Output = "elsewhere"
	if string(p.Settings()) != ref {
		t.Error("output directory must not change the settings")
	}
}
