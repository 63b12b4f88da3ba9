package out

import (
	"os"
	"path/filepath"
	"strconv"
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
