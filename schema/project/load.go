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

// fileData is the file's shape, every key the format knows: its tags are
// the key table (File) that Parse reads by and `tremie schema project`
// prints; any other key is reported as unknown.
type fileData struct {
	Project struct {
		Name             string   `toml:"name" required:"true" doc:"Project name; a well's project when it gives none." example:"Coldwater Mill groundwater investigation"`
		Client           string   `toml:"client" doc:"Client; a well's client when it gives none." example:"Valley Water Authority"`
		Site             string   `toml:"site" doc:"Site; a well's site when it gives none." example:"Former mill, Tannery Road"`
		Units            string   `toml:"units" enum:"ft,m" doc:"Depth unit of the project-wide tables (summary, book); default the unit all wells share, else m. Each sheet keeps its well file's units." example:"ft"`
		Datum            string   `toml:"datum" doc:"Elevation datum for wells whose [elevation] gives none." example:"NAVD88"`
		CoordinateSystem string   `toml:"coordinate_system" doc:"Reference system for wells whose [location] gives none." example:"NAD83 / UTM zone 11N"`
		CRS              string   `toml:"crs" doc:"EPSG code of the coordinates, for wells whose [location] gives no crs (docs/import.md lists the codes)." example:"EPSG:2227"`
		North            string   `toml:"north" enum:"true,magnetic" doc:"What wall-feature azimuths are measured from, for wells whose file has no [orientation]." example:"magnetic"`
		Declination      *float64 `toml:"declination" doc:"Degrees, east positive, with north = magnetic: added to a magnetic azimuth to make it true." example:"13.5"`
		Page             string   `toml:"page" doc:"Page template of every sheet: letter, tabloid, a4 or a3." example:"letter"`
		Landscape        bool     `toml:"landscape" doc:"Print sheets in landscape." example:"false"`
		Profile          string   `toml:"profile" doc:"Path of the rule profile (relative to this file); must exist. Default: the rule defaults." example:"site.profile.toml"`
		Yields           string   `toml:"yields" doc:"Path of a yields file with a [yields] table; must exist. Default: the built-in yields." example:"site.yields.toml"`
		Logo             string   `toml:"logo" doc:"PNG or JPEG for the title block and book cover: at most 1 MiB, 16 to 2048 pixels a side." example:"logo.png"`
		Wells            string   `toml:"wells" doc:"Directory (searched recursively) or glob of the well files; default wells." example:"wells"`
		Output           string   `toml:"output" doc:"Where sheets, the cache and tables go; default out." example:"out"`

		// title-block fields
		Consultant string `toml:"consultant" doc:"Title block: the firm preparing the logs." example:"Example Hydrogeology"`
		PreparedBy string `toml:"prepared_by" doc:"Title block: who drafted the logs." example:"A. Geologist"`
		CheckedBy  string `toml:"checked_by" doc:"Title block: who checked them; also a well's checked_by when it gives none." example:"B. Reviewer, PG"`
		ApprovedBy string `toml:"approved_by" doc:"Title block: who approved them." example:"B. Reviewer, PG"`
		Report     string `toml:"report" doc:"Title block: report number." example:"EH-2026-014"`
		Job        string `toml:"job" doc:"Title block: job number." example:"26-044"`
		Revision   string `toml:"revision" doc:"Title block: revision." example:"0"`
		Issued     any    `toml:"issued" type:"date" doc:"Title block: issue date of the set of sheets, a TOML date without quotes." example:"2026-06-15"`
		Issue      bool   `toml:"issue" doc:"Draw the issued set (as render --issue): no rule IDs or file lines, wells with unwaived errors refused, a revision block and a seal space." example:"false"`
	} `toml:"project" required:"true" doc:"The project's settings and title-block fields."`
	Section  []sectionData  `toml:"section" doc:"A cross-section that tremie section draws and tremie book binds."`
	Revision []revisionData `toml:"revision" doc:"A row of the revision block of an issued set, oldest first."`
}

type revisionData struct {
	Rev         string `toml:"rev" required:"true" doc:"Revision letter or number." example:"A"`
	Date        any    `toml:"date" type:"date" required:"true" doc:"Date of the revision, a TOML date without quotes." example:"2026-06-15"`
	Description string `toml:"description" required:"true" doc:"What the revision is." example:"Issued for permit"`
	By          string `toml:"by" doc:"Who made it (initials)." example:"RV"`
}

// readRevisions reads the [[revision]] tables of an issued set.
func readRevisions(doc *schema.Doc, ts []*schema.Table) []Revision {
	var out []Revision
	for _, t := range ts {
		r := Revision{Rev: t.Str("rev"), Date: t.Date("date"), Description: t.Str("description"), By: t.Str("by")}
		if strings.TrimSpace(r.Rev) == "" || strings.TrimSpace(r.Description) == "" || r.Date.IsZero() {
			doc.Errorf(t.Path(), "a [[revision]] needs rev, date and description")
		}
		t.Done()
		out = append(out, r)
	}
	return out
}

// File is the key table of a project file, made from fileData.
var File = schema.SpecOf("tremie project file", "A project's settings shared by every well: names, units, page, rule profile, yields, title block, where the wells are and where outputs go.", fileData{})

// Load reads dir/project.toml (dir may also be the file itself) and the
// logo it names. Errors carry the file and line.
func Load(dir string) (*Project, error) {
	dir, file := locate(dir)
	data, err := schema.ReadInput(file, schema.MaxTextFile)
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
	doc, err := schema.ParseDoc(file, data, File)
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
		Units:            schema.DepthUnit(pt.OneOf("units")),
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
		Issue: pt.Bool("issue"),
	}
	if strings.TrimSpace(p.Name) == "" {
		doc.Errorf("project", "[project] needs a name (name = \"...\")")
	}
	if p.CRS != "" {
		if _, err := crs.Parse(p.CRS); err != nil {
			doc.Errorf("project.crs", "%v", err)
		}
	}
	p.Orientation = readNorth(doc, pt)
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
	p.TitleBlock.Revisions = readRevisions(doc, root.List("revision"))
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
		pt, ok := schema.NumberPair(e)
		if !ok {
			return nil
		}
		out = append(out, pt)
	}
	return out
}

// readNorth reads the project's azimuth reference for wall features:
// north = "true" or "magnetic", with the declination (degrees, east
// positive) for magnetic.
func readNorth(doc *schema.Doc, pt *schema.Table) schema.Orientation {
	o := schema.Orientation{North: schema.NorthReference(pt.Str("north")), Given: pt.Has("north")}
	dec, hasDec := pt.Num("declination")
	switch {
	case o.North != "" && o.North != schema.TrueNorth && o.North != schema.MagneticNorth:
		doc.Errorf("project.north", "north must be \"true\" or \"magnetic\", not %q", o.North)
	case o.North == schema.MagneticNorth && !hasDec:
		doc.Errorf("project.north", "north = \"magnetic\" needs the declination (degrees, east positive)")
	case hasDec && o.North != schema.MagneticNorth:
		doc.Errorf("project.declination", "declination applies to north = \"magnetic\" only")
	case hasDec && (dec < -90 || dec > 90):
		doc.Errorf("project.declination", "declination %v is outside -90..90 degrees", dec)
	default:
		o.Declination = dec
	}
	return o
}

// Linked is the rule profile and the yields file a project file names,
// as paths, read from a project file that may be rejected: a run that
// cannot use the project still reports the errors of the files it names
// with its own, so that all are fixed at once. Each is "" when not named
// or not a string, and both when the file cannot be read or parsed.
func Linked(dir string) (profile, yields string) {
	dir, file := locate(dir)
	data, err := schema.ReadInput(file, schema.MaxTextFile)
	if err != nil {
		return "", ""
	}
	doc, err := schema.ParseDoc(file, data, File)
	if err != nil {
		return "", ""
	}
	pt := doc.Root().Sub("project")
	if pt == nil {
		return "", ""
	}
	p := &Project{Dir: dir}
	if s, ok := pt.Raw("profile"); ok {
		p.Profile, _ = s.(string)
	}
	if s, ok := pt.Raw("yields"); ok {
		p.Yields, _ = s.(string)
	}
	return p.ProfilePath(), p.YieldsPath()
}

// locate is the project's directory and file, given either.
func locate(path string) (dir, file string) {
	if st, err := os.Stat(path); err == nil && st.IsDir() {
		return path, filepath.Join(path, FileName)
	}
	return filepath.Dir(path), path
}
