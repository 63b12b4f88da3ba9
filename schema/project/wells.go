package project

import (
	"fmt"
	"os"
	"path/filepath"
	"sort"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// WellFiles lists the project's well files, sorted: the .toml files under
// the wells directory (recursively), or those matching the wells glob.
// project.toml itself is never a well file.
func (p *Project) WellFiles() ([]string, error) {
	pattern := p.Path(p.Wells)
	var files []string
	if st, err := os.Stat(pattern); err == nil && st.IsDir() {
		found, errs := schema.FindWells([]string{pattern})
		if len(errs) > 0 {
			return nil, fmt.Errorf("listing wells in %s: %w", pattern, errs[0])
		}
		files = found
	} else {
		m, err := filepath.Glob(pattern)
		if err != nil {
			return nil, fmt.Errorf("wells pattern %q: %w", p.Wells, err)
		}
		for _, f := range m {
			if st, err := os.Stat(f); err == nil && !st.IsDir() && isWellFile(f) {
				files = append(files, f)
			}
		}
		if len(m) == 0 && !strings.ContainsAny(p.Wells, "*?[") {
			return nil, fmt.Errorf("wells directory %s not found", pattern)
		}
	}
	sort.Strings(files)
	return files, nil
}

func isWellFile(path string) bool { return schema.IsWellFile(path) }

// Key is a well file's name relative to the project directory, with
// forward slashes: stable across machines, for caches and messages.
func (p *Project) Key(file string) string {
	dir, f := p.Dir, file
	if filepath.IsAbs(dir) != filepath.IsAbs(f) || strings.HasPrefix(filepath.Clean(dir), "..") {
		// one absolute, or the project above the working directory:
		// compare them as absolute paths
		if a, err := filepath.Abs(dir); err == nil {
			dir = a
		}
		if a, err := filepath.Abs(f); err == nil {
			f = a
		}
	}
	if rel, err := filepath.Rel(dir, f); err == nil && !strings.HasPrefix(rel, "..") {
		return filepath.ToSlash(rel)
	}
	return filepath.ToSlash(file)
}
