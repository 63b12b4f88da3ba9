package pipeline

import (
	"fmt"
	"os"

	"github.com/tremie-dev/tremie/schema/project"
)

// ResolveProject is Resolve for the commands that take one project
// directory (book, table). The project is the one every well found
// belongs to; a directory whose wells belong to no project (or to
// several) is taken with every default, as project.Default describes.
func ResolveProject(dir string, opt Options) (*Run, *project.Project, error) {
	// A well file named where the project is wanted would be taken as a
	// project of one well, or of none when its project file is broken,
	// and written all the same: refuse it at once.
	if st, err := os.Stat(dir); err == nil && !st.IsDir() {
		return nil, nil, fmt.Errorf("%s is a file; name the project's directory (the one holding project.toml)", dir)
	}
	r, err := Resolve([]string{dir}, opt)
	if err != nil {
		return nil, nil, err
	}
	var p *project.Project
	for i, in := range r.Inputs {
		if i == 0 {
			p = in.Setting.Project
		} else if in.Setting.Project != p {
			p = nil
			break
		}
	}
	if p == nil {
		if q, ok := r.projectAt(dir); ok && q == nil {
			return r, nil, nil // its project.toml could not be read: in Problems
		}
		p = project.Default(dir)
		if r.OutDir == "" {
			r.OutDir = p.Output
		}
	}
	if len(r.Inputs) == 0 && len(r.Problems) == 0 {
		r.Problems = append(r.Problems, fmt.Errorf("%s: no well files in %s", dir, p.Path(p.Wells)))
	}
	return r, p, nil
}
