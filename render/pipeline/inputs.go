package pipeline

import (
	"fmt"
	"os"
)

// inputFile is a file a run reads, with what it is.
type inputFile struct{ path, what string }

// inputFiles are the files the run reads: its well files and each
// setting's project file, rule profile, yields file and logo.
func (r *Run) inputFiles() []inputFile {
	var files []inputFile
	for _, in := range r.Inputs {
		files = append(files, inputFile{in.Path, "a well file"})
	}
	for _, s := range r.Settings {
		if p := s.Project; p != nil {
			files = append(files, inputFile{p.File, "the project file"}, inputFile{p.LogoPath, "the project's logo"})
		}
		files = append(files, inputFile{s.ProfileFile, "the rule profile"}, inputFile{s.YieldsFile, "the yields file"})
	}
	return files
}

// Reads says what path is when the run reads it (a well file, the project
// file, ...), comparing the files themselves, whatever the path's form.
func (r *Run) Reads(path string) (what string, ok bool) {
	st, err := os.Stat(path)
	if err != nil {
		return "", false // a file not there yet is no input
	}
	for _, f := range r.inputFiles() {
		if f.path == "" {
			continue
		}
		if fs, err := os.Stat(f.path); err == nil && os.SameFile(st, fs) {
			return f.what, true
		}
	}
	return "", false
}

// WriteNamed writes one document to the file the user named on the
// command line (asked for, so an older file there is replaced), unless
// the run reads that file: a slip of -o must not put a table over a well
// file or the project file.
func (r *Run) WriteNamed(path string, data []byte) error {
	if what, ok := r.Reads(path); ok {
		return &OutputError{fmt.Errorf("%s is %s of this project: tremie never writes over its input; name another output file", path, what)}
	}
	return WriteFile(path, data)
}
