package pipeline

import (
	"cmp"
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"slices"

	"github.com/tremie-dev/tremie/render/sheet"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
	"github.com/tremie-dev/tremie/templates"
)

// Options are what a command line may set for a run; every field left
// empty takes the enclosing project's setting, else the default.
type Options struct {
	Profile string // a rule profile for every well, over the projects'
	Yields  string // a [yields] file for every well, over the projects'
	OutDir  string // the output directory, over the first project's
	// Page and Landscape name the page template; PageSet says they were
	// given and win over a project's page.
	Page      string
	Landscape bool
	PageSet   bool
	Quiet     bool // no progress bar
}

// Setting is what the wells of one project (or of no project) are judged
// and drawn with. Every well file inside a project's directory gets that
// project's setting, however it was named.
type Setting struct {
	Project     *project.Project // nil for wells outside any project
	Profile     *rules.Profile   // never nil: the defaults when none is named; carries the yields
	ProfileFile string           // "" for the default thresholds
	Yields      *quantity.Yields // nil for the default yields
	YieldsFile  string
	PageName    string
	Landscape   bool
	Page        sheet.Page
	// Err is why the setting could not be read (a project's profile,
	// yields file or page); its wells are then not judged.
	Err error

	profileBytes, yieldsBytes []byte // for the output cache
}

// Issue reports whether the setting's wells are drawn as the issued set:
// asked for on the command line, or by the project (issue = true).
func (s *Setting) Issue(asked bool) bool { return asked || s.Project != nil && s.Project.Issue }

// NotIssuable are the wells an issued set must refuse: read, with
// unwaived error findings.
func NotIssuable(wells []*Well) []*Well {
	var out []*Well
	for _, w := range wells {
		if w.Well != nil && w.Blocking() {
			out = append(out, w)
		}
	}
	return out
}

// ProfileLabel names the profile in force, for every report.
func (s *Setting) ProfileLabel() string {
	if s.Profile.IsDefault() {
		return "default thresholds"
	}
	return "profile " + s.Profile.Name
}

// TitleBlock and Logo are what the sheets of this setting carry.
func (s *Setting) TitleBlock() project.TitleBlock {
	if s.Project == nil {
		return project.TitleBlock{}
	}
	return s.Project.TitleBlock
}

// Logo is the project's logo bytes, nil for none.
func (s *Setting) Logo() []byte {
	if s.Project == nil || s.Project.Logo == nil {
		return nil
	}
	return s.Project.Logo.Data
}

// Input is one well file of a run and the setting it is judged with.
type Input struct {
	Path    string   // as found: joined to the path given
	Key     string   // relative to its project with forward slashes, else Path: stable, for caches
	Setting *Setting // never nil
}

// Run is everything a command needs from the paths it was given.
type Run struct {
	Inputs   []Input
	Settings []*Setting // in order of first use
	// OutDir is Options.OutDir, else the output directory of the first
	// project named; "" when neither.
	OutDir string
	// SourceDate is SOURCE_DATE_EPOCH as RFC 3339, "" when unset.
	SourceDate string
	// Problems are paths that could not be searched and project files or
	// settings that could not be read, each printed once; a run with any
	// is an input failure, but every other well is still processed.
	Problems []error

	opts     Options
	projects map[string]*project.Project // by absolute directory; nil = none there
	settings map[*project.Project]*Setting
	profiles map[string]*rules.Profile // by path, each read once
	yields   map[string]*quantity.Yields
}

// Resolve finds, from the FILE|DIR arguments, the well files, the project
// each belongs to and the setting it is judged with, the output directory
// and the source date. A directory holding project.toml gives that
// project's wells; any other directory is searched for well files; a
// file is taken as named. Each well file then picks up the project.toml
// of its directory or up to three above. The returned error is for the
// command line as a whole (an unreadable --profile, --yields or --page,
// a malformed SOURCE_DATE_EPOCH); everything else is in Run.Problems.
func Resolve(paths []string, opt Options) (*Run, error) {
	r := &Run{opts: opt, OutDir: opt.OutDir, projects: map[string]*project.Project{},
		settings: map[*project.Project]*Setting{}, profiles: map[string]*rules.Profile{}, yields: map[string]*quantity.Yields{}}
	var err error
	if r.SourceDate, err = SourceDate(); err != nil {
		return nil, err
	}
	if opt.Profile != "" {
		if _, err := r.profile(opt.Profile); err != nil {
			return nil, err
		}
	}
	if opt.Yields != "" {
		if _, err := r.yieldsFile(opt.Yields); err != nil {
			return nil, err
		}
	}
	if opt.PageSet {
		if _, err := PageFor(opt.Page, opt.Landscape); err != nil {
			return nil, fmt.Errorf("--page: %w", err)
		}
	}
	seen := map[string]bool{}
	add := func(f string, p *project.Project) {
		abs, err := filepath.Abs(f)
		if err != nil {
			abs = filepath.Clean(f)
		}
		if seen[abs] {
			return
		}
		seen[abs] = true
		in := Input{Path: f, Key: filepath.ToSlash(f), Setting: r.setting(p)}
		if p != nil {
			in.Key = p.Key(f)
		}
		r.Inputs = append(r.Inputs, in)
	}
	for _, a := range paths {
		if p, ok := r.projectAt(a); ok {
			if p == nil {
				continue // unreadable: in Problems
			}
			files, err := p.WellFiles()
			if err != nil {
				r.Problems = append(r.Problems, fmt.Errorf("%s: %w", p.File, err))
				continue
			}
			r.useOutput(p)
			for _, f := range files {
				add(f, p)
			}
			continue
		}
		found, errs := schema.FindWells([]string{a})
		r.Problems = append(r.Problems, errs...)
		for _, f := range found {
			p := r.enclosingProject(f)
			r.useOutput(p)
			add(f, p)
		}
	}
	sortProblems(r.Problems)
	return r, nil
}

// sortProblems orders the problems of a run by the file, line and column
// of their first error, so that the errors of a project file, its profile
// and its yields file read as one sorted list; a problem without a file
// keeps its place before them.
func sortProblems(ps []error) {
	first := func(e error) *schema.Error {
		if l := schema.Errors("", e); len(l) > 0 {
			return l[0]
		}
		return &schema.Error{}
	}
	slices.SortStableFunc(ps, func(a, b error) int {
		x, y := first(a), first(b)
		return cmp.Or(cmp.Compare(x.File, y.File), cmp.Compare(x.Line, y.Line), cmp.Compare(x.Col, y.Col))
	})
}

// useOutput takes the first project's output directory when none was given.
func (r *Run) useOutput(p *project.Project) {
	if r.OutDir == "" && p != nil {
		r.OutDir = p.Output
	}
}

// projectAt reports whether dir holds a project file, and the project
// (nil when it could not be read, the error then in Problems).
func (r *Run) projectAt(dir string) (*project.Project, bool) {
	if st, err := os.Stat(dir); err != nil || !st.IsDir() {
		return nil, false
	}
	if _, err := os.Stat(filepath.Join(dir, project.FileName)); err != nil {
		return nil, false
	}
	abs, err := filepath.Abs(dir)
	if err != nil {
		abs = filepath.Clean(dir)
	}
	if p, ok := r.projects[abs]; ok {
		return p, true
	}
	p, err := project.Load(dir)
	if err != nil {
		r.Problems = append(r.Problems, err)
		r.checkLinked(dir)
		p = nil
	}
	r.projects[abs] = p
	return p, true
}

// checkLinked reads the profile and yields file a rejected project file
// names (unless the command line names its own), so that their errors are
// reported with the project file's in the same run.
func (r *Run) checkLinked(dir string) {
	prof, yields := project.Linked(dir)
	if st, err := os.Stat(prof); err == nil && !st.IsDir() && r.opts.Profile == "" {
		if _, err := r.profile(prof); err != nil {
			r.Problems = append(r.Problems, err)
		}
	}
	if st, err := os.Stat(yields); err == nil && !st.IsDir() && r.opts.Yields == "" {
		if _, err := r.yieldsFile(yields); err != nil {
			r.Problems = append(r.Problems, err)
		}
	}
}

// enclosingProject is the project a well file belongs to: a project.toml
// in its directory or up to three directories above; nil when none (or
// when the one found could not be read).
func (r *Run) enclosingProject(file string) *project.Project {
	dir := filepath.Dir(file)
	for i := 0; i < 4; i++ {
		if p, ok := r.projectAt(dir); ok {
			return p
		}
		// up by "..", so that a file named from inside its project
		// ("MW-1.toml" in wells/) finds it, as "../project.toml"
		abs, err := filepath.Abs(dir)
		if err != nil || filepath.Dir(abs) == abs {
			break
		}
		dir = filepath.Join(dir, "..")
	}
	return nil
}

// setting is the setting of a project (nil for none), built once.
func (r *Run) setting(p *project.Project) *Setting {
	if s, ok := r.settings[p]; ok {
		return s
	}
	s := &Setting{}
	r.settings[p] = s
	r.Settings = append(r.Settings, s)
	s.Project = p
	s.ProfileFile, s.YieldsFile = r.opts.Profile, r.opts.Yields
	s.PageName, s.Landscape = r.opts.Page, r.opts.Landscape
	if p != nil {
		if s.ProfileFile == "" {
			s.ProfileFile = p.ProfilePath()
		}
		if s.YieldsFile == "" {
			s.YieldsFile = p.YieldsPath()
		}
		if !r.opts.PageSet {
			s.PageName, s.Landscape = p.Page, p.Landscape
		}
	}
	var errs []error
	s.Profile = rules.DefaultProfile()
	if s.ProfileFile != "" {
		prof, err := r.profile(s.ProfileFile)
		if err != nil {
			errs = append(errs, err)
		} else {
			s.Profile = prof
			s.profileBytes, _ = schema.ReadInput(s.ProfileFile, schema.MaxTextFile)
		}
	}
	if s.YieldsFile != "" {
		y, err := r.yieldsFile(s.YieldsFile)
		if err != nil {
			errs = append(errs, err)
		} else {
			s.Yields = y
			s.yieldsBytes, _ = schema.ReadInput(s.YieldsFile, schema.MaxTextFile)
			cp := *s.Profile
			cp.Yields = y
			s.Profile = &cp
		}
	}
	page, err := PageFor(s.PageName, s.Landscape)
	if err != nil {
		if p != nil {
			err = schema.ErrorList{{File: p.File, Line: schema.LineOf(p.Keys, "project.page"), Key: "project.page", Msg: fmt.Sprintf("page %q: %v", s.PageName, err)}}
		} else {
			err = fmt.Errorf("page: %w", err)
		}
		errs = append(errs, err)
	}
	s.Page = page
	if len(errs) > 0 {
		s.Err = errors.Join(errs...)
		r.Problems = append(r.Problems, errs...)
	}
	return s
}

// profile reads a rule profile once per run.
func (r *Run) profile(path string) (*rules.Profile, error) {
	return loadOnce(r.profiles, path, rules.LoadProfile)
}

// yieldsFile reads a yields file once per run.
func (r *Run) yieldsFile(path string) (*quantity.Yields, error) {
	return loadOnce(r.yields, path, quantity.LoadYields)
}

// loadOnce reads the file at path with load unless cache holds it: a file
// read well is kept; one that fails is read (and reported) again wherever
// it is named again.
func loadOnce[T any](cache map[string]T, path string, load func(string) (T, error)) (T, error) {
	if v, ok := cache[path]; ok {
		return v, nil
	}
	v, err := load(path)
	if err != nil {
		var none T
		return none, err
	}
	cache[path] = v
	return v, nil
}

// ProfileLabels names the profiles in force in this run, each once, in
// order of first use.
func (r *Run) ProfileLabels() []string {
	var out []string
	seen := map[string]bool{}
	for _, s := range r.Settings {
		if l := s.ProfileLabel(); !seen[l] {
			seen[l] = true
			out = append(out, l)
		}
	}
	if len(out) == 0 {
		return []string{(&Setting{}).ProfileLabel()}
	}
	return out
}

// PageFor is a page template by name ("" for letter), turned when
// landscape.
func PageFor(name string, landscape bool) (sheet.Page, error) {
	if name == "" {
		name = "letter"
	}
	t, err := templates.Load(name, landscape)
	if err != nil {
		return sheet.Page{}, err
	}
	return sheet.FromTemplate(t), nil
}
