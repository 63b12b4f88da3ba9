package out

import (
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
)

// TestStageCommitAbortSweep: a staged file is invisible at its
// destination until committed; an aborted one leaves the old content;
// the sweep removes a dead run's temporary file and keeps a live one's.
func TestStageCommitAbortSweep(t *testing.T) {
	dir := t.TempDir()
	dst := filepath.Join(dir, "MW-1.svg")
	os.WriteFile(dst, []byte("old"), 0o644)
	s, err := Stage(dst, []byte("new"))
	if err != nil {
		t.Fatal(err)
	}
	if b, _ := os.ReadFile(dst); string(b) != "old" {
		t.Fatalf("staging changed the destination: %q", b)
	}
	s.Abort()
	if b, _ := os.ReadFile(dst); string(b) != "old" {
		t.Fatalf("abort changed the destination: %q", b)
	}
	s, _ = Stage(dst, []byte("new"))
	if err := s.Commit(); err != nil {
		t.Fatal(err)
	}
	if b, _ := os.ReadFile(dst); string(b) != "new" {
		t.Fatalf("commit: %q", b)
	}
	// PID 4194305 is above Linux's largest (pid_max is at most 2^22), so
	// no process has it.
	dead := filepath.Join(dir, ".MW-1.svg.tmp-4194305-123")
	live := filepath.Join(dir, ".MW-1.svg.tmp-"+strconv.Itoa(os.Getpid())+"-456")
	mine := filepath.Join(dir, "notes.tmp-1-2")
	for _, f := range []string{dead, live, mine} {
		os.WriteFile(f, nil, 0o644)
	}
	if n := SweepTemps(dir); n != 1 {
		t.Errorf("swept %d files, want 1", n)
	}
	if _, err := os.Stat(dead); err == nil {
		t.Error("a dead run's temporary file was left")
	}
	for _, f := range []string{live, mine, dst} {
		if _, err := os.Stat(f); err != nil {
			t.Errorf("%s was removed", f)
		}
	}
}

// TestCommitAllPutsBackOnFailure: a well's outputs go in together or not
// at all. When the last rename fails (a directory stands where the PNG
// goes), the SVG and PDF already renamed get their old content back, a
// new file is removed again, and no temporary or kept file is left.
func TestCommitAllPutsBackOnFailure(t *testing.T) {
	dir := t.TempDir()
	write := func(name, s string) {
		if err := os.WriteFile(filepath.Join(dir, name), []byte(s), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	write("MW-1.svg", "old svg")
	write("MW-1.pdf", "old pdf")
	var staged []*Staged
	for _, name := range []string{"MW-1.svg", "MW-1.pdf", "MW-1-features.svg", "MW-1.png"} {
		s, err := Stage(filepath.Join(dir, name), []byte("new "+name))
		if err != nil {
			t.Fatal(err)
		}
		staged = append(staged, s)
	}
	// The last rename fails (its staged file is gone: as good as a full
	// disk) after three went in.
	os.Remove(staged[3].tmp)
	if err := CommitAll(staged); err == nil {
		t.Fatal("CommitAll without the PNG's staged file succeeded")
	}
	same := func(when string, want ...string) {
		t.Helper()
		entries, _ := os.ReadDir(dir)
		var names []string
		for _, e := range entries {
			names = append(names, e.Name())
		}
		if strings.Join(names, " ") != strings.Join(want, " ") {
			t.Errorf("%s: the folder holds %v, want %v", when, names, want)
		}
		for name, want := range map[string]string{"MW-1.svg": "old svg", "MW-1.pdf": "old pdf"} {
			if b, _ := os.ReadFile(filepath.Join(dir, name)); string(b) != want {
				t.Errorf("%s: %s = %q, want %q", when, name, b, want)
			}
		}
	}
	same("a rename failed part-way", "MW-1.pdf", "MW-1.svg")
	// A directory where the PNG goes is seen before anything moves.
	os.Mkdir(filepath.Join(dir, "MW-1.png"), 0o755)
	staged = staged[:0]
	for _, name := range []string{"MW-1.svg", "MW-1.pdf", "MW-1.png"} {
		s, _ := Stage(filepath.Join(dir, name), []byte("new "+name))
		staged = append(staged, s)
	}
	if err := CommitAll(staged); err == nil || !strings.Contains(err.Error(), "directory") {
		t.Fatalf("CommitAll over a directory: %v", err)
	}
	same("a directory in the way", "MW-1.pdf", "MW-1.png", "MW-1.svg")
	// With the way clear, all three go in and nothing else stays.
	os.Remove(filepath.Join(dir, "MW-1.png"))
	staged = staged[:0]
	for _, name := range []string{"MW-1.svg", "MW-1.pdf", "MW-1.png"} {
		s, _ := Stage(filepath.Join(dir, name), []byte("new "+name))
		staged = append(staged, s)
	}
	if err := CommitAll(staged); err != nil {
		t.Fatal(err)
	}
	entries, _ := os.ReadDir(dir)
	if len(entries) != 3 {
		t.Errorf("%d files after a commit, want 3", len(entries))
	}
	if b, _ := os.ReadFile(filepath.Join(dir, "MW-1.svg")); string(b) != "new MW-1.svg" {
		t.Errorf("MW-1.svg = %q after the commit", b)
	}
}
