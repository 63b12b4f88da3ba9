package main

import (
	"github.com/tremie-dev/tremie/cmd/tremie/demo"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
)

var renderedLine = regexp.MustCompile(`(?m)^\S+: (\S+), \d+ sheets? →`)

// rendered lists the well IDs a render run drew (not skipped).
func rendered(out string) []string {
	var ids []string
	for _, m := range renderedLine.FindAllStringSubmatch(out, -1) {
		ids = append(ids, m[1])
	}
	return ids
}

// Issue check: touching one well file redraws exactly that well; changing
// a project-level setting redraws all; --force redraws all.
func TestRenderIncremental(t *testing.T) {
	dir := t.TempDir()
	if err := demo.Write(dir, false); err != nil {
		t.Fatal(err)
	}
	args := []string{"render", dir, "--format", "svg"}
	_, out, _ := runTremie(args...)
	if got := rendered(out); len(got) != 7 {
		t.Fatalf("cold run drew %v, want all 7 demo wells\n%s", got, out)
	}
	_, out, _ = runTremie(args...)
	if got := rendered(out); len(got) != 0 || !strings.Contains(out, "0 rendered, 7 unchanged, 0 failed") {
		t.Fatalf("warm run drew %v\n%s", got, out)
	}
	// An output damaged without a change of size (one byte flipped) is
	// drawn again; the other wells are not.
	svg := filepath.Join(dir, "out", "MW-1.svg")
	sheet, err := os.ReadFile(svg)
	if err != nil {
		t.Fatal(err)
	}
	sheet[len(sheet)/2] ^= 0x01
	if err := os.WriteFile(svg, sheet, 0o644); err != nil {
		t.Fatal(err)
	}
	_, out, _ = runTremie(args...)
	if got := rendered(out); len(got) != 1 || got[0] != "MW-1" {
		t.Fatalf("after flipping a byte of MW-1.svg the run drew %v, want exactly MW-1\n%s", got, out)
	}
	// Saving a file with the same bytes changes nothing; a changed byte does.
	mw2 := filepath.Join(dir, "wells", "MW-2.toml")
	data, _ := os.ReadFile(mw2)
	if err := os.WriteFile(mw2, append(data, []byte("# re-surveyed\n")...), 0o644); err != nil {
		t.Fatal(err)
	}
	_, out, _ = runTremie(args...)
	if got := rendered(out); len(got) != 1 || got[0] != "MW-2" {
		t.Fatalf("after editing MW-2 the run drew %v, want exactly MW-2\n%s", got, out)
	}
	// A project-level setting enters every well's hash.
	prj := filepath.Join(dir, "project.toml")
	pdata, _ := os.ReadFile(prj)
	if err := os.WriteFile(prj, []byte(strings.Replace(string(pdata), `revision = "0"`, `revision = "A"`, 1)), 0o644); err != nil {
		t.Fatal(err)
	}
	_, out, _ = runTremie(args...)
	if got := rendered(out); len(got) != 7 {
		t.Fatalf("after a project change the run drew %v, want all 7\n%s", got, out)
	}
	_, out, _ = runTremie(append(args, "--force")...)
	if got := rendered(out); len(got) != 7 {
		t.Fatalf("--force drew %v, want all 7", got)
	}
	// A removed well's outputs are reported as stale, not deleted.
	if err := os.Remove(filepath.Join(dir, "wells", "MW-4.toml")); err != nil {
		t.Fatal(err)
	}
	_, _, errb := runTremie(args...)
	if !strings.Contains(errb, "stale output") || !strings.Contains(errb, "MW-4.svg") {
		t.Errorf("no stale report for MW-4: %q", errb)
	}
	if _, err := os.Stat(filepath.Join(dir, "out", "MW-4.svg")); err != nil {
		t.Errorf("stale output was deleted: %v", err)
	}
}

// Issue check: a project with one unreadable file and one well with errors
// still renders every other well and exits non-zero.
func TestRenderProjectWithBadFile(t *testing.T) {
	dir := t.TempDir()
	if err := demo.Write(dir, false); err != nil {
		t.Fatal(err)
	}
	put(t, dir, "wells/ZZ-BAD.toml", "[units]\ndepth = \"ft\"\n[well]\nid = \"ZZ\"\npurpose = \"monitoring\"\ntotal_depth = 10\nbotom = 3\n")
	code, out, errb := runTremie("render", dir, "--format", "svg")
	if code != exitInput {
		t.Errorf("exit %d, want %d (an unreadable file wins over findings)", code, exitInput)
	}
	if !strings.Contains(errb, "ZZ-BAD.toml:7:1: unknown key \"botom\"") {
		t.Errorf("bad file not named with its line: %q", errb)
	}
	if got := rendered(out); len(got) != 7 {
		t.Errorf("drew %v, want the 7 good demo wells (MW-3 with its findings)", got)
	}
	if !strings.Contains(out, "7 rendered, 0 unchanged, 1 failed") {
		t.Errorf("summary missing: %s", out)
	}
}
