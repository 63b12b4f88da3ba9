package project

import (
	"errors"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"time"

	"github.com/BurntSushi/toml"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/crs"
)

// ErrNoProject is returned (wrapped) by Load when the directory has no
// project.toml; callers that accept a bare directory of wells use Default.
var ErrNoProject = errors.New("no " + FileName)

// fileData is the file's shape; every key the format knows is here, so
// anything else is reported as unknown. Its tags are also the key table
// that `tremie schema project` prints (see File).
type fileData struct {
	Project struct {
		Name             string `toml:"name" required:"true" doc:"Project name; a well's project when it gives none." example:"Coldwater Mill groundwater investigation"`
		Client           string `toml:"client" doc:"Client; a well's client when it gives none." example:"Valley Water Authority"`
		Site             string `toml:"site" doc:"Site; a well's site when it gives none." example:"Former mill, Tannery Road"`
		Units            string `toml:"units" enum:"ft,m" doc:"Depth unit of the project-wide tables (summary, book); default the unit all wells share, else m. Each sheet keeps its well file's units." example:"ft"`
		Datum            string `toml:"datum" doc:"Elevation datum for wells whose [elevation] gives none." example:"NAVD88"`
		CoordinateSystem string `toml:"coordinate_system" doc:"Reference system for wells whose [location] gives none." example:"NAD83 / UTM zone 11N"`
		CRS              string `toml:"crs" doc:"EPSG code of the coordinates, for wells whose [location] gives no crs (docs/import.md lists the codes)." example:"EPSG:2227"`
		Page             string `toml:"page" doc:"Page template of every sheet: letter, tabloid, a4 or a3." example:"letter"`
		Landscape        bool   `toml:"landscape" doc:"Print sheets in landscape." example:"false"`
		Profile          string `toml:"profile" doc:"Path of the rule profile (relative to this file); must exist. Default: the rule defaults." example:"site.profile.toml"`
		Yields           string `toml:"yields" doc:"Path of a yields file with a [yields] table; must exist. Default: the built-in yields." example:"site.yields.toml"`
		Logo             string `toml:"logo" doc:"PNG or JPEG for the title block and book cover: at most 1 MiB, 16 to 2048 pixels a side." example:"logo.png"`
		Wells            string `toml:"wells" doc:"Directory (searched recursively) or glob of the well files; default wells." example:"wells"`
		Output           string `toml:"output" doc:"Where sheets, the cache and tables go; default out." example:"out"`

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

// File is the key table of a project file, made from fileData.
var File = schema.SpecOf("tremie project file", "A project's settings shared by every well: names, units, page, rule profile, yields, title block, where the wells are and where outputs go.", fileData{})

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
// relative paths are joined to.
func Parse(dir, file string, data []byte) (*Project, error) {
	lines := schema.KeyLines(string(data))
	var fd fileData
	md, err := toml.Decode(string(data), &fd)
	if err != nil {
		return nil, decodeError(file, lines, err)
	}
	if und := md.Undecoded(); len(und) > 0 {
		k := und[0].String()
		msg := fmt.Sprintf("unknown key %q", k)
		if len(und[0]) == 1 {
			msg = fmt.Sprintf("unknown table or key %q (a project file has a [project] table and [[section]] tables)", k)
		}
		return nil, &schema.Error{File: file, Line: lines[k], Key: k, Msg: msg}
	}
	bad := func(key, format string, args ...any) error {
		return &schema.Error{File: file, Line: schema.LineOf(lines, key), Key: key, Msg: fmt.Sprintf(format, args...)}
	}
	if !md.IsDefined("project") {
		return nil, &schema.Error{File: file, Line: 1, Msg: "missing [project] table"}
	}
	pr := fd.Project
	if strings.TrimSpace(pr.Name) == "" {
		return nil, bad("project", "[project] needs a name (name = \"...\")")
	}
	p := &Project{
		Dir:              dir,
		File:             file,
		Name:             pr.Name,
		Client:           pr.Client,
		Site:             pr.Site,
		Datum:            pr.Datum,
		CoordinateSystem: pr.CoordinateSystem,
		CRS:              pr.CRS,
		Page:             pr.Page,
		Landscape:        pr.Landscape,
		Profile:          pr.Profile,
		Yields:           pr.Yields,
		LogoPath:         pr.Logo,
		Wells:            pr.Wells,
		Keys:             lines,
	}
	switch schema.DepthUnit(pr.Units) {
	case "", schema.Feet, schema.Metres:
		p.Units = schema.DepthUnit(pr.Units)
	default:
		return nil, bad("project.units", "units must be \"ft\" or \"m\", not %q", pr.Units)
	}
	if pr.CRS != "" {
		if _, err := crs.Parse(pr.CRS); err != nil {
			return nil, bad("project.crs", "%v", err)
		}
	}
	if md.IsDefined("project", "wells") && strings.TrimSpace(pr.Wells) == "" {
		return nil, bad("project.wells", "wells must name a directory or a glob, e.g. \"wells\" or \"wells/*.toml\"")
	}
	if p.Wells == "" {
		p.Wells = DefaultWells
	}
	out := pr.Output
	if md.IsDefined("project", "output") && strings.TrimSpace(out) == "" {
		return nil, bad("project.output", "output must name a directory, e.g. \"out\"")
	}
	if out == "" {
		out = DefaultOutput
	}
	p.Output = p.Path(out)
	if pr.Profile != "" {
		if st, err := os.Stat(p.ProfilePath()); err != nil || st.IsDir() {
			return nil, bad("project.profile", "rule profile %s not found", p.ProfilePath())
		}
	}
	if pr.Yields != "" {
		if st, err := os.Stat(p.YieldsPath()); err != nil || st.IsDir() {
			return nil, bad("project.yields", "yields file %s not found", p.YieldsPath())
		}
	}
	tb := fd.Project
	p.TitleBlock = TitleBlock{
		Consultant:   tb.Consultant,
		PreparedBy:   tb.PreparedBy,
		CheckedBy:    tb.CheckedBy,
		ApprovedBy:   tb.ApprovedBy,
		ReportNumber: tb.Report,
		JobNumber:    tb.Job,
		Revision:     tb.Revision,
	}
	if tb.Issued != nil {
		t, ok := tb.Issued.(time.Time)
		if name, _ := t.Zone(); !ok || name != "date-local" { // BurntSushi's zone for a TOML local date
			return nil, bad("project.issued", "issued must be a date such as 2026-03-14, without quotes")
		}
		p.TitleBlock.Issued = schema.Date{Year: t.Year(), Month: t.Month(), Day: t.Day()}
	}
	p.Issue = pr.Issue
	for i, r := range fd.Revision {
		t, ok := r.Date.(time.Time)
		if name, _ := t.Zone(); !ok || name != "date-local" {
			return nil, bad(fmt.Sprintf("revision[%d].date", i), "date must be a date such as 2026-03-14, without quotes")
		}
		if strings.TrimSpace(r.Rev) == "" || strings.TrimSpace(r.Description) == "" {
			return nil, bad(fmt.Sprintf("revision[%d]", i), "a revision needs rev and description")
		}
		p.TitleBlock.Revisions = append(p.TitleBlock.Revisions, Revision{Rev: r.Rev, Date: schema.Date{Year: t.Year(), Month: t.Month(), Day: t.Day()}, Description: r.Description, By: r.By})
	}
	if p.Sections, err = sections(file, lines, fd.Section, p.Units); err != nil {
		return nil, err
	}
	if pr.Logo != "" {
		logo, err := LoadLogo(p.Path(pr.Logo))
		if err != nil {
			return nil, &schema.Error{File: file, Line: schema.LineOf(lines, "project.logo"), Key: "project.logo", Msg: err.Error()}
		}
		p.Logo = logo
	}
	return p, nil
}

var lineInMsg = regexp.MustCompile(`line (\d+)`)

// decodeError turns a TOML syntax or type error into an Error with a line.
func decodeError(file string, lines map[string]int, err error) error {
	var pe toml.ParseError
	if errors.As(err, &pe) {
		msg := pe.Message
		if pe.LastKey != "" && pe.Position.Line == 0 {
			return &schema.Error{File: file, Line: schema.LineOf(lines, pe.LastKey), Key: pe.LastKey, Msg: msg}
		}
		return &schema.Error{File: file, Line: pe.Position.Line, Key: pe.LastKey, Msg: msg}
	}
	msg := strings.TrimPrefix(err.Error(), "toml: ")
	line := 0
	if m := lineInMsg.FindStringSubmatch(msg); m != nil {
		line, _ = strconv.Atoi(m[1])
		msg = strings.TrimSpace(strings.TrimPrefix(msg[strings.Index(msg, m[0])+len(m[0]):], ":"))
	}
	return &schema.Error{File: file, Line: line, Msg: msg}
}
