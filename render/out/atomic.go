package out

import (
	"fmt"
	"os"
	"path/filepath"
	"regexp"
	"strconv"
)

// WriteFileAtomic writes data to path so that path holds either its old
// content or all of data, never a part: it writes a temporary file in the
// same directory, syncs it, and renames it over path.
func WriteFileAtomic(path string, data []byte) error {
	s, err := Stage(path, data)
	if err != nil {
		return err
	}
	return s.Commit()
}

// Staged is a file written beside its destination and not yet in place:
// several outputs are staged first and committed together, so that a
// failure part-way replaces none of them.
type Staged struct{ tmp, dst string }

// Stage writes data to a synced temporary file in path's directory. Its
// name carries the process ID, so that SweepTemps can tell a temporary
// file left by a killed run from one a running process is writing.
func Stage(path string, data []byte) (s *Staged, err error) {
	dir, base := filepath.Split(path)
	if dir == "" {
		dir = "."
	}
	tmp, err := os.CreateTemp(dir, "."+base+".tmp-"+strconv.Itoa(os.Getpid())+"-*")
	if err != nil {
		return nil, fmt.Errorf("write %s: %w", path, err)
	}
	defer func() {
		if err != nil {
			tmp.Close()
			os.Remove(tmp.Name())
		}
	}()
	if _, err = tmp.Write(data); err != nil {
		return nil, fmt.Errorf("write %s: %w", path, err)
	}
	if err = tmp.Sync(); err != nil {
		return nil, fmt.Errorf("write %s: sync: %w", path, err)
	}
	// CreateTemp makes the file 0600; an output is an ordinary document.
	if err = tmp.Chmod(0o644); err != nil {
		return nil, fmt.Errorf("write %s: %w", path, err)
	}
	if err = tmp.Close(); err != nil {
		return nil, fmt.Errorf("write %s: close: %w", path, err)
	}
	return &Staged{tmp: tmp.Name(), dst: path}, nil
}

// Commit renames the staged file over its destination.
func (s *Staged) Commit() error {
	if err := os.Rename(s.tmp, s.dst); err != nil {
		os.Remove(s.tmp)
		return fmt.Errorf("write %s: %w", s.dst, err)
	}
	// Sync the directory so the rename itself survives a crash; not every
	// system allows it, and the data is already safe, so failure is ignored.
	if d, derr := os.Open(filepath.Dir(s.dst)); derr == nil {
		d.Sync()
		d.Close()
	}
	return nil
}

// Abort removes the staged file, leaving the destination as it was.
func (s *Staged) Abort() { os.Remove(s.tmp) }

// tempName matches the temporary files Stage makes; group 1 is the PID.
var tempName = regexp.MustCompile(`^\..+\.tmp-([0-9]+)-[0-9]+$`)

// SweepTemps removes from dir the temporary files of tremie runs that
// are no longer running (killed before they could clean up), and returns
// how many it removed. A temporary file of a live process is left alone.
func SweepTemps(dir string) int {
	entries, err := os.ReadDir(dir)
	if err != nil {
		return 0
	}
	n := 0
	for _, e := range entries {
		m := tempName.FindStringSubmatch(e.Name())
		if m == nil || !e.Type().IsRegular() {
			continue
		}
		pid, err := strconv.Atoi(m[1])
		if err != nil || alive(pid) {
			continue
		}
		if os.Remove(filepath.Join(dir, e.Name())) == nil {
			n++
		}
	}
	return n
}
