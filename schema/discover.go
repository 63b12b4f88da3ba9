package schema

import (
	"errors"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"sort"
	"strings"
)

// IsWellFile reports whether a file name is taken as a well file when a
// directory is searched: a .toml file that is not a project file
// (project.toml), a rule profile (*.profile.toml) or a yield table
// (*.yields.toml).
func IsWellFile(name string) bool {
	base := filepath.Base(name)
	if !strings.HasSuffix(base, ".toml") || strings.HasPrefix(base, ".") {
		return false
	}
	return base != "project.toml" && !strings.HasSuffix(base, ".profile.toml") && !strings.HasSuffix(base, ".yields.toml")
}

// FindWells expands files and directories into well-file paths: a file
// named on the command line is taken as it is; a directory is searched
// recursively (hidden directories skipped) for well files. Each directory's
// files come sorted, so the order is stable. A path that does not exist is
// an error naming it; the others are still returned.
func FindWells(paths []string) ([]string, []error) {
	var out []string
	var errs []error
	seen := map[string]bool{}
	add := func(p string) {
		if !seen[p] {
			seen[p] = true
			out = append(out, p)
		}
	}
	for _, p := range paths {
		info, err := os.Stat(p)
		if err != nil {
			errs = append(errs, fmt.Errorf("%s: %w", p, unwrapPathError(err)))
			continue
		}
		if !info.IsDir() {
			add(p)
			continue
		}
		var found []string
		err = filepath.WalkDir(p, func(path string, d fs.DirEntry, err error) error {
			if err != nil {
				errs = append(errs, fmt.Errorf("%s: %w", path, unwrapPathError(err)))
				return nil
			}
			if d.IsDir() {
				if path != p && strings.HasPrefix(d.Name(), ".") {
					return filepath.SkipDir
				}
				return nil
			}
			if IsWellFile(path) {
				found = append(found, path)
			}
			return nil
		})
		if err != nil {
			errs = append(errs, fmt.Errorf("%s: %w", p, err))
		}
		sort.Strings(found)
		for _, f := range found {
			add(f)
		}
	}
	return out, errs
}

// unwrapPathError drops the path from an os error whose message names it
// already.
func unwrapPathError(err error) error {
	var pe *os.PathError
	if errors.As(err, &pe) {
		return pe.Err
	}
	return err
}
