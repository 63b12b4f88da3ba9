package main

import (
	"crypto/sha256"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"sort"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/cmd/tremie/demo"
)

// treeDigest is every file under dir with the hash of its bytes, sorted.
func treeDigest(t *testing.T, dir string) string {
	t.Helper()
	var lines []string
	err := filepath.WalkDir(dir, func(p string, d fs.DirEntry, err error) error {
		if err != nil || d.IsDir() {
			return err
		}
		b, err := os.ReadFile(p)
		if err != nil {
			return err
		}
		lines = append(lines, fmt.Sprintf("%s %x", p, sha256.Sum256(b)))
		return nil
	})
	if err != nil {
		t.Fatal(err)
	}
	sort.Strings(lines)
	return strings.Join(lines, "\n")
}

// tremie demo -o on an existing project changes no byte of it and exits
// non-zero with a clear message; --force writes the demo over it.
func TestDemoRefusesANonEmptyDirectory(t *testing.T) {
	dir := profiledProject(t)
	runTremie("render", ".", "--format", "svg")
	before := treeDigest(t, dir)
	code, out, errb := runTremie("demo", "-o", dir)
	if code == exitOK || code == exitFindings {
		t.Errorf("demo into a project: exit %d", code)
	}
	if !strings.Contains(errb, "is not empty") || !strings.Contains(errb, "--force") {
		t.Errorf("message: %q", errb)
	}
	if strings.Contains(out, "wrote") {
		t.Errorf("stdout claims a write: %q", out)
	}
	if after := treeDigest(t, dir); after != before {
		t.Errorf("the project changed:\nbefore\n%s\nafter\n%s", before, after)
	}
	// An empty directory and a new one are fine.
	if err := demo.Write(t.TempDir(), false); err != nil {
		t.Errorf("demo into an empty directory: %v", err)
	}
	if err := demo.Write(filepath.Join(t.TempDir(), "new"), false); err != nil {
		t.Errorf("demo into a new directory: %v", err)
	}
	// --force: asked for, so it writes the demo's files over it.
	if code, _, errb := runTremie("--quiet", "demo", "-o", dir, "--force"); code > exitFindings {
		t.Errorf("demo --force: exit %d %s", code, errb)
	}
	if b, _ := os.ReadFile(filepath.Join(dir, "project.toml")); !strings.Contains(string(b), "Coldwater Mill") {
		t.Error("demo --force did not write the demo project")
	}
}

// render replaces only files tremie wrote in the output folder: a file of
// the user's under a sheet's name stays as it is (exit 4) unless --force;
// the other wells are still drawn.
func TestRenderKeepsTheUsersFiles(t *testing.T) {
	dir := profiledProject(t)
	mine := []byte("my own notes, not a sheet")
	put(t, dir, "out/OK-1.svg", string(mine))
	code, out, errb := runTremie("render", ".", "--format", "svg")
	if code != exitOutput {
		t.Errorf("exit %d, want %d\n%s\n%s", code, exitOutput, out, errb)
	}
	if !strings.Contains(errb, filepath.Join("out", "OK-1.svg")+" exists and was not written by tremie") {
		t.Errorf("stderr: %q", errb)
	}
	if b, _ := os.ReadFile(filepath.Join(dir, "out", "OK-1.svg")); string(b) != string(mine) {
		t.Error("the user's file was overwritten")
	}
	if _, err := os.Stat(filepath.Join(dir, "out", "BAD-1.svg")); err != nil {
		t.Errorf("the other well was not drawn: %v", err)
	}
	// Drawn again, tremie's own file is replaced without a word.
	os.WriteFile(filepath.Join(dir, "wells", "BAD-1.toml"), []byte(unsealedWell+"\n# edited\n"), 0o644)
	if code, _, errb := runTremie("render", "wells/BAD-1.toml", "--format", "svg"); code != exitOK {
		t.Errorf("redraw of tremie's own file: exit %d %s", code, errb)
	}
	// Asked with --force, the user's file is replaced.
	if code, _, errb := runTremie("render", ".", "--format", "svg", "--force"); code != exitFindings {
		t.Errorf("--force: exit %d %s", code, errb)
	}
	if b, _ := os.ReadFile(filepath.Join(dir, "out", "OK-1.svg")); !strings.HasPrefix(string(b), "<?xml") && !strings.HasPrefix(string(b), "<svg") {
		t.Errorf("--force did not draw the sheet: %.40q", b)
	}
	// The book's default file follows the same rule.
	put(t, dir, "out/book.pdf", "mine")
	if code, _, errb := runTremie("book", "."); code != exitOutput || !strings.Contains(errb, "book.pdf exists and was not written by tremie") {
		t.Errorf("book over the user's book.pdf: exit %d %q", code, errb)
	}
}

// Two wells with one ID are an input error (exit 2) naming both files and
// the lines of their IDs; neither is drawn.
func TestDuplicateWellIDs(t *testing.T) {
	dir := profiledProject(t)
	put(t, dir, "wells/backup/OK-1 copy.toml", sealedWell)
	for _, cmd := range []string{"check", "render"} {
		code, out, errb := runTremie(cmd, ".")
		if code != exitInput {
			t.Errorf("%s: exit %d, want %d\n%s\n%s", cmd, code, exitInput, out, errb)
		}
		a, b := filepath.Join("wells", "OK-1.toml"), filepath.Join("wells", "backup", "OK-1 copy.toml")
		if !strings.Contains(errb, a+":4") || !strings.Contains(errb, b+":4") || !strings.Contains(errb, `well ID "OK-1" is also the ID of`) {
			t.Errorf("%s: stderr does not name both files and lines:\n%s", cmd, errb)
		}
	}
	if _, err := os.Stat(filepath.Join(dir, "out", "OK-1.pdf")); err == nil {
		t.Error("a well with a duplicate ID was drawn")
	}
	if _, err := os.Stat(filepath.Join(dir, "out", "BAD-1.pdf")); err != nil {
		t.Errorf("the other well was not drawn: %v", err)
	}
	// A well drawn before its copy appeared keeps its sheets, and they are
	// not called stale: its file is still there; once the copy is gone it
	// is drawn again.
	os.Remove(filepath.Join(dir, "wells", "backup", "OK-1 copy.toml"))
	if code, out, errb := runTremie("render", "."); code != exitFindings || !strings.Contains(out, "OK-1") {
		t.Fatalf("render without the copy: exit %d\n%s\n%s", code, out, errb)
	}
	put(t, dir, "wells/backup/OK-1 copy.toml", sealedWell)
	if _, _, errb := runTremie("render", "."); strings.Contains(errb, "stale") {
		t.Errorf("a well refused for its duplicate ID has its sheets called stale:\n%s", errb)
	}
	if _, err := os.Stat(filepath.Join(dir, "out", "OK-1.svg")); err != nil {
		t.Errorf("OK-1's sheet is gone: %v", err)
	}
	os.Remove(filepath.Join(dir, "wells", "backup", "OK-1 copy.toml"))
	if _, out, _ := runTremie("render", "."); !strings.Contains(out, "OK-1.toml: OK-1, 1 sheet") {
		t.Errorf("OK-1 not drawn again once its copy is gone:\n%s", out)
	}
}

// Rendering some wells into a shared output folder leaves the others'
// sheets alone; they are stale only once their well file is gone.
func TestStaleOnlyWhenTheWellFileIsGone(t *testing.T) {
	dir := profiledProject(t)
	if code, _, errb := runTremie("render", ".", "--format", "svg"); code != exitFindings {
		t.Fatalf("exit %d %s", code, errb)
	}
	_, _, errb := runTremie("render", "wells/OK-1.toml", "--format", "svg", "--force")
	if strings.Contains(errb, "stale") {
		t.Errorf("rendering one well called the other's sheets stale:\n%s", errb)
	}
	os.Remove(filepath.Join(dir, "wells", "BAD-1.toml"))
	_, _, errb = runTremie("render", "wells/OK-1.toml", "--format", "svg", "--force")
	if !strings.Contains(errb, "stale output "+filepath.Join("out", "BAD-1.svg")) {
		t.Errorf("the sheet of a deleted well is not reported stale:\n%s", errb)
	}
	if _, err := os.Stat(filepath.Join(dir, "out", "BAD-1.svg")); err != nil {
		t.Error("a stale sheet was deleted")
	}
}
