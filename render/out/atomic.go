package out

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"regexp"
	"strconv"
	"sync"
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
	tmp, err := createStaged(dir, "."+base+".tmp-"+strconv.Itoa(os.Getpid())+"-*")
	if err != nil {
		return nil, fmt.Errorf("write %s: %w", path, err)
	}
	defer func() {
		if err != nil {
			tmp.Close()
			os.Remove(tmp.Name())
			release(tmp.Name())
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

// pending holds the temporary files of this process not yet renamed or
// removed, for RemoveStaged; closed, once RemoveStaged has run, refuses
// new ones.
var pending struct {
	sync.Mutex
	names  map[string]bool
	closed bool
}

// createStaged makes a temporary file in dir and records it as pending,
// in one step under the lock, so that none is made after RemoveStaged.
func createStaged(dir, pattern string) (*os.File, error) {
	pending.Lock()
	defer pending.Unlock()
	if pending.closed {
		return nil, errors.New("the run is stopping")
	}
	f, err := os.CreateTemp(dir, pattern)
	if err != nil {
		return nil, err
	}
	if pending.names == nil {
		pending.names = map[string]bool{}
	}
	pending.names[f.Name()] = true
	return f, nil
}

// release forgets a pending temporary file: put in place or removed.
func release(name string) {
	pending.Lock()
	defer pending.Unlock()
	delete(pending.names, name)
}

// RemoveStaged removes every temporary file this process has staged and
// not yet put in place, and makes no more: a run stopped at once (a
// second Ctrl-C) leaves no temporary file behind. The destinations are
// untouched.
func RemoveStaged() {
	pending.Lock()
	defer pending.Unlock()
	for name := range pending.names {
		os.Remove(name)
	}
	pending.names, pending.closed = nil, true
}

// Commit renames the staged file over its destination.
func (s *Staged) Commit() error {
	defer release(s.tmp)
	if err := os.Rename(s.tmp, s.dst); err != nil {
		os.Remove(s.tmp)
		return fmt.Errorf("write %s: %w", s.dst, err)
	}
	syncDir(filepath.Dir(s.dst))
	return nil
}

// syncDir syncs a directory so that a rename in it survives a crash; not
// every system allows it, and the data is already safe, so failure is
// ignored.
func syncDir(dir string) {
	if d, err := os.Open(dir); err == nil {
		d.Sync()
		d.Close()
	}
}

// Abort removes the staged file, leaving the destination as it was.
func (s *Staged) Abort() {
	os.Remove(s.tmp)
	release(s.tmp)
}

// CommitAll puts every staged file in place, or none: each destination
// that exists is first kept under a second name (a hard link, or where
// the file system has none, the file moved aside; named as a temporary
// file of this process, so that SweepTemps removes it if the run dies
// here), and when a rename fails part-way (a directory stands where an
// output goes, the disk is full) the files already renamed are put back.
// The staged files are removed either way.
func CommitAll(staged []*Staged) error {
	type old struct {
		name  string // "" where the destination was new
		moved bool   // moved aside rather than linked: put back on failure
	}
	defer func() {
		for _, s := range staged {
			release(s.tmp)
		}
	}()
	kept := make([]old, len(staged))
	undo := func(renamed int) {
		for i := range staged {
			k := kept[i]
			switch {
			case i < renamed && k.name != "":
				os.Rename(k.name, staged[i].dst)
			case i < renamed:
				os.Remove(staged[i].dst)
			default:
				staged[i].Abort()
				if k.moved {
					os.Rename(k.name, staged[i].dst)
				} else if k.name != "" {
					os.Remove(k.name)
				}
			}
		}
	}
	for i, s := range staged {
		st, err := os.Lstat(s.dst)
		if err != nil {
			continue // nothing there yet
		}
		if st.IsDir() {
			undo(0)
			return fmt.Errorf("write %s: a directory stands there", s.dst)
		}
		name := s.tmp + "0" // unique as the staged name is, and of its pattern
		if err := os.Link(s.dst, name); err == nil {
			kept[i] = old{name: name}
		} else if err := os.Rename(s.dst, name); err == nil {
			kept[i] = old{name: name, moved: true}
		} else {
			undo(0)
			return fmt.Errorf("write %s: keeping the old file until all are written: %w", s.dst, err)
		}
	}
	for i, s := range staged {
		if err := os.Rename(s.tmp, s.dst); err != nil {
			undo(i)
			return fmt.Errorf("write %s: %w (none of the files written with it replaced)", s.dst, err)
		}
	}
	for _, k := range kept {
		if k.name != "" {
			os.Remove(k.name)
		}
	}
	if len(staged) > 0 {
		syncDir(filepath.Dir(staged[0].dst))
	}
	return nil
}

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
