package main

import (
	"os"
	"path/filepath"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
)

// inputs is what the FILE|DIR arguments of check and render expand to.
type inputs struct {
	files []string
	// projects maps a well file to the project it was found in (nil
	// entries are absent), for project defaults and the title block.
	projects map[string]*project.Project
	// profile and outDir come from the first project named, for commands
	// that were not given them.
	profile string
	yields  string
	outDir  string
}

// collectInputs expands the arguments: a project directory gives its well
// files (with the project, its output directory and profile); other
// directories and files are searched with schema.FindWells, and each file
// picks up the project.toml of its directory or up to three above. One
// unreadable path or project never stops the rest.
func collectInputs(paths []string) (inputs, []error) {
	in := inputs{projects: map[string]*project.Project{}}
	var errs []error
	seen := map[string]bool{}
	add := func(f string, p *project.Project) {
		if seen[f] {
			return
		}
		seen[f] = true
		in.files = append(in.files, f)
		if p != nil {
			in.projects[f] = p
		}
	}
	for _, a := range paths {
		if st, err := os.Stat(a); err == nil && st.IsDir() {
			if _, err := os.Stat(filepath.Join(a, project.FileName)); err == nil {
				p, err := project.Load(a)
				if err != nil {
					errs = append(errs, err)
					continue
				}
				wf, err := p.WellFiles()
				if err != nil {
					errs = append(errs, err)
					continue
				}
				for _, f := range wf {
					add(f, p)
				}
				if in.outDir == "" {
					in.outDir = p.Output
				}
				if in.profile == "" {
					in.profile = p.ProfilePath()
				}
				if in.yields == "" {
					in.yields = p.YieldsPath()
				}
				continue
			}
		}
		found, ferrs := schema.FindWells([]string{a})
		errs = append(errs, ferrs...)
		for _, f := range found {
			p, err := enclosingProject(f)
			if err != nil {
				errs = append(errs, err)
			}
			add(f, p)
		}
	}
	return in, errs
}

// enclosingProject finds the project a well file belongs to: a
// project.toml in its directory or up to three directories above. None
// is not an error; an unreadable one is.
func enclosingProject(file string) (*project.Project, error) {
	dir := filepath.Dir(file)
	for i := 0; i < 4; i++ {
		if _, err := os.Stat(filepath.Join(dir, project.FileName)); err == nil {
			return project.Load(dir)
		}
		parent := filepath.Dir(dir)
		if parent == dir {
			break
		}
		dir = parent
	}
	return nil, nil
}

// withYields is the profile (nil for the defaults) with the yields the
// placement checks use, so that check, render, book and quantities compare
// placed amounts against the same figures.
func withYields(prof *rules.Profile, y *quantity.Yields) *rules.Profile {
	if y == nil {
		return prof
	}
	if prof == nil {
		prof = rules.DefaultProfile()
	}
	cp := *prof
	cp.Yields = y
	return &cp
}
