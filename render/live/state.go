// Package live serves a project as a local web page that follows the
// files on disk: every well with its status, sheets (SVG), findings with
// file and line, and quantities. When a well, project, profile or yields
// file changes, the wells it touches are checked and drawn again (an
// unchanged well keeps its drawing: a content-hash cache) and the open
// page updates itself over Server-Sent Events, keeping its scroll
// position. Sheets are kept in memory: the server writes no file.
package live

import (
	"crypto/sha256"
	"errors"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"sort"
	"strings"

	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/sheet"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
	"github.com/tremie-dev/tremie/templates"
)

// Status is a well's standing on the page.
type Status string

const (
	Clean    Status = "clean"
	Warnings Status = "warnings"
	Errors   Status = "errors" // an unwaived error finding, or the file could not be read
	Planned  Status = "planned"
)

// maxWellBytes bounds what is read of one well file.
const maxWellBytes = 8 << 20

// Well is one well file as the page shows it.
type Well struct {
	Key        string // path relative to the project, forward slashes
	Path       string
	ID         string
	Status     Status
	Problems   schema.ErrorList // why it could not be read or parsed; then no sheet
	Findings   []rules.Finding
	Quantities *quantity.Report
	Sheets     [][]byte // SVG, one per sheet
	Version    string   // hash of what it was made from: changes when it is redrawn
}

// setting is what every well is judged and drawn with.
type setting struct {
	project  *project.Project
	profile  *rules.Profile
	page     sheet.Page
	problems []error // project, profile, yields or page that could not be read
	hash     [32]byte
}

// loadSetting reads the project file and what it names. A file that
// cannot be read is a problem shown on the page; the defaults stand in.
func loadSetting(dir string) *setting {
	s := &setting{}
	h := sha256.New()
	p, err := project.Load(dir)
	switch {
	case errors.Is(err, project.ErrNoProject):
		p = project.Default(dir)
	case err != nil:
		s.problems = append(s.problems, err)
		p = project.Default(dir)
	}
	s.project = p
	if data, err := os.ReadFile(filepath.Join(dir, project.FileName)); err == nil {
		h.Write(data)
	}
	h.Write([]byte{0})
	var yields *quantity.Yields
	if path := p.YieldsPath(); path != "" {
		data, _ := os.ReadFile(path)
		h.Write(data)
		if yields, err = quantity.LoadYields(path); err != nil {
			s.problems = append(s.problems, err)
			yields = nil
		}
	}
	h.Write([]byte{0})
	if path := p.ProfilePath(); path != "" {
		data, _ := os.ReadFile(path)
		h.Write(data)
		if s.profile, err = rules.LoadProfile(path); err != nil {
			s.problems = append(s.problems, err)
			s.profile = nil
		}
	}
	if yields != nil {
		if s.profile == nil {
			s.profile = &rules.Profile{Name: "default thresholds"}
		}
		s.profile.Yields = yields
	}
	name := p.Page
	if name == "" {
		name = "letter"
	}
	fmt.Fprintf(h, "\x00%s\x00%v", name, p.Landscape)
	if t, err := templates.Load(name, p.Landscape); err != nil {
		s.problems = append(s.problems, fmt.Errorf("%s: page %q: %w", p.File, name, err))
	} else {
		s.page = sheet.FromTemplate(t)
	}
	h.Sum(s.hash[:0])
	return s
}

// wellFiles lists the project's well files.
func (s *setting) wellFiles() ([]string, error) {
	files, err := s.project.WellFiles()
	if err != nil {
		return nil, err
	}
	sort.Strings(files)
	return files, nil
}

// prepare reads, checks, quantifies and draws one well. prev is the last
// result for the same file: returned as it is when neither the file nor
// the setting changed.
func prepare(s *setting, path, key string, prev *Well) *Well {
	data, err := readBounded(path)
	h := sha256.New()
	h.Write(s.hash[:])
	h.Write(data)
	version := fmt.Sprintf("%x", h.Sum(nil))[:16]
	if prev != nil && prev.Version == version && err == nil {
		return prev
	}
	w := &Well{Key: key, Path: path, Version: version, Status: Errors}
	if err != nil {
		w.Problems = schema.ErrorList{schema.ReadError(key, "", err)}
		return w
	}
	well, err := schema.Load(key, data) // positions name the file as the project does
	if err != nil {
		var el schema.ErrorList
		if !errors.As(err, &el) {
			el = schema.ErrorList{{File: key, Msg: err.Error()}}
		}
		w.Problems = el
		return w
	}
	w.ID = well.ID
	project.Apply(s.project, well)
	var yields *quantity.Yields
	if s.profile != nil {
		yields = s.profile.Yields
	}
	w.Quantities = quantity.Compute(well, yields)
	w.Findings = rules.Check(well, s.profile)
	w.Status = statusOf(well, w.Findings)
	doc, err := sheet.Layout(well, sheet.Inputs{Findings: w.Findings, Quantities: w.Quantities, TitleBlock: s.project.TitleBlock, Logo: logo(s.project), Profile: s.profile}, sheet.Options{Page: s.page})
	if err != nil {
		w.Problems = schema.ErrorList{{File: path, Msg: "cannot draw: " + err.Error()}}
		return w
	}
	for i := range doc.Pages {
		svg, err := out.SVG(doc, i)
		if err != nil {
			w.Problems = schema.ErrorList{{File: path, Msg: "cannot draw: " + err.Error()}}
			return w
		}
		w.Sheets = append(w.Sheets, svg)
	}
	return w
}

func logo(p *project.Project) []byte {
	if p == nil || p.Logo == nil {
		return nil
	}
	return p.Logo.Data
}

func statusOf(w *schema.Well, findings []rules.Finding) Status {
	if rules.Blocking(findings) {
		return Errors
	}
	if strings.EqualFold(strings.TrimSpace(w.Status), "planned") {
		return Planned
	}
	for _, f := range findings {
		if !f.Waived {
			return Warnings
		}
	}
	return Clean
}

func readBounded(path string) ([]byte, error) {
	f, err := os.Open(path)
	if err != nil {
		return nil, err
	}
	defer f.Close()
	data, err := io.ReadAll(io.LimitReader(f, maxWellBytes+1))
	if err != nil {
		return nil, err
	}
	if len(data) > maxWellBytes {
		return nil, fmt.Errorf("a well file is at most %d bytes", maxWellBytes)
	}
	return data, nil
}
