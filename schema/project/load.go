package project

import (
	"errors"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"strings"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/crs"
)

// ErrNoProject is returned (wrapped) by Load when the directory has no
// project.toml; callers that accept a bare directory of wells use Default.
var ErrNoProject = errors.New("no " + FileName)

// fileData is the file's shape, every key the format knows: the key
// table of the file. Parse reads the same keys through schema.Doc, which
// reports any other as unknown.
type fileData struct {
	Project struct {
		Name             string `toml:"name"`
		Client           string `toml:"client"`
		Site             string `toml:"site"`
		Units            string `toml:"units"`
		Datum            string `toml:"datum"`
		CoordinateSystem string `toml:"coordinate_system"`
		CRS              string `toml:"crs"`
		Page             string `toml:"page"`
		Landscape        bool   `toml:"landscape"`
		Profile          string `toml:"profile"`
		Yields           string `toml:"yields"`
		Logo             string `toml:"logo"`
		Wells            string `toml:"wells"`
		Output           string `toml:"output"`

		// title-block fields
		Consultant string `toml:"consultant"`
		PreparedBy string `toml:"prepared_by"`
		CheckedBy  string `toml:"checked_by"`
		ApprovedBy string `toml:"approved_by"`
		Report     string `toml:"report"`
		Job        string `toml:"job"`
		Revision   string `toml:"revision"`
		Issued     any    `toml:"issued"`
	} `toml:"project"`
	Section []sectionData `toml:"section"`
}

// Load reads dir/project.toml (dir may also be the file itself) and the
// logo it names. Errors carry the file and line.
func Load(dir string) (*Project, error) {
	file := dir
	if st, err := os.Stat(dir); err == nil && st.IsDir() {
		file = filepath.Join(dir, FileName)
	} else {
		dir = filepath.Dir(dir)
	}
	data, err := os.ReadFile(file)
	if err != nil {
		if errors.Is(err, fs.ErrNotExist) {
			return nil, fmt.Errorf("%s: %w", file, ErrNoProject)
		}
		return nil, schema.ReadError(file, "", err)
	}
	return Parse(dir, file, data)
}

// Parse reads a project file's bytes; dir is the project root that
// relative paths are joined to. It reads strictly (schema.Doc): every
// problem of the file is reported, sorted, in one schema.ErrorList.
func Parse(dir, file string, data []byte) (*Project, error) {
	doc, err := schema.ParseDoc(file, data)
	if err != nil {
		return nil, err
	}
	root := doc.Root()
	pt := root.Sub("project")
	if pt == nil {
		doc.Errorf("", "missing [project] table")
		root.Done()
		return nil, doc.Err()
	}
	p := &Project{
		Dir:              dir,
		File:             file,
		Name:             pt.Str("name"),
		Client:           pt.Str("client"),
		Site:             pt.Str("site"),
		Units:            schema.DepthUnit(pt.Str("units")),
		Datum:            pt.Str("datum"),
		CoordinateSystem: pt.Str("coordinate_system"),
		CRS:              pt.Str("crs"),
		Page:             pt.Str("page"),
		Landscape:        pt.Bool("landscape"),
		Profile:          pt.Str("profile"),
		Yields:           pt.Str("yields"),
		LogoPath:         pt.Str("logo"),
		Wells:            pt.Str("wells"),
		Keys:             doc.Lines(),
		TitleBlock: TitleBlock{
			Consultant:   pt.Str("consultant"),
			PreparedBy:   pt.Str("prepared_by"),
			CheckedBy:    pt.Str("checked_by"),
			ApprovedBy:   pt.Str("approved_by"),
			ReportNumber: pt.Str("report"),
			JobNumber:    pt.Str("job"),
			Revision:     pt.Str("revision"),
			Issued:       pt.Date("issued"),
		},
	}
	if strings.TrimSpace(p.Name) == "" {
		doc.Errorf("project", "[project] needs a name (name = \"...\")")
	}
	switch p.Units {
	case "", schema.Feet, schema.Metres:
	default:
		doc.Errorf("project.units", "units must be \"ft\" or \"m\", not %q", p.Units)
	}
	if p.CRS != "" {
		if _, err := crs.Parse(p.CRS); err != nil {
			doc.Errorf("project.crs", "%v", err)
		}
	}
	if pt.Has("wells") && strings.TrimSpace(p.Wells) == "" {
		doc.Errorf("project.wells", "wells must name a directory or a glob, e.g. \"wells\" or \"wells/*.toml\"")
	}
	if p.Wells == "" {
		p.Wells = DefaultWells
	}
	out := pt.Str("output")
	if pt.Has("output") && strings.TrimSpace(out) == "" {
		doc.Errorf("project.output", "output must name a directory, e.g. \"out\"")
	}
	if out == "" {
		out = DefaultOutput
	}
	p.Output = p.Path(out)
	if p.Profile != "" {
		if st, err := os.Stat(p.ProfilePath()); err != nil || st.IsDir() {
			doc.Errorf("project.profile", "rule profile %s not found", p.ProfilePath())
		}
	}
	if p.Yields != "" {
		if st, err := os.Stat(p.YieldsPath()); err != nil || st.IsDir() {
			doc.Errorf("project.yields", "yields file %s not found", p.YieldsPath())
		}
	}
	pt.Done()
	sections := readSections(doc, root.List("section"))
	root.Done()
	if err := doc.Err(); err != nil {
		return nil, err
	}
	if p.Sections, err = checkSections(file, p.Keys, sections, p.Units); err != nil {
		return nil, err
	}
	if p.LogoPath != "" {
		logo, err := LoadLogo(p.Path(p.LogoPath))
		if err != nil {
			return nil, schema.ErrorList{{File: file, Line: schema.LineOf(p.Keys, "project.logo"), Key: "project.logo", Msg: err.Error()}}
		}
		p.Logo = logo
	}
	return p, nil
}

// readSections reads the [[section]] tables as written; checkSections
// then checks what they say.
func readSections(doc *schema.Doc, ts []*schema.Table) []sectionData {
	out := make([]sectionData, len(ts))
	for i, t := range ts {
		d := &out[i]
		d.Name = t.Str("name")
		d.Wells = t.Strings("wells")
		d.CoordinateUnit = t.Str("coordinate_unit")
		if v, ok := t.Num("max_offset"); ok {
			d.MaxOffset = &v
		}
		d.WaterDate, _ = t.Raw("water_date")
		if v, ok := t.Raw("bends"); ok {
			d.Bends = bendPoints(v)
			if d.Bends == nil {
				doc.Errorf(t.Path()+".bends", "bends must be an array of [easting, northing] pairs")
			}
		}
		t.Done()
	}
	return out
}

// bendPoints converts [[e, n], ...] to pairs, or nil if v is not that.
func bendPoints(v any) [][2]float64 {
	arr, ok := v.([]any)
	if !ok {
		return nil
	}
	out := make([][2]float64, 0, len(arr))
	for _, e := range arr {
		pair, ok := e.([]any)
		if !ok || len(pair) != 2 {
			return nil
		}
		var pt [2]float64
		for j, c := range pair {
			switch n := c.(type) {
			case int64:
				pt[j] = float64(n)
			case float64:
				pt[j] = n
			default:
				return nil
			}
		}
		out = append(out, pt)
	}
	return out
}
