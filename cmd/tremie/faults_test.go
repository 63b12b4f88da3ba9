package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// TestEveryCommandRefusesABrokenProject (issue 15, output hygiene): a
// project.toml that does not parse is an input error, exit 2 with its
// file and line, for every command that reads a project, and for a well
// file named inside such a project (render once answered 3, "name the
// output directory"). A well file named where a project directory is
// wanted is refused, not written as a project of one.
func TestEveryCommandRefusesABrokenProject(t *testing.T) {
	dir := t.TempDir()
	os.MkdirAll(filepath.Join(dir, "wells"), 0o755)
	if err := os.WriteFile(filepath.Join(dir, "project.toml"), []byte("[project]\nname = \"x\"\nunits = \"ft\"\nbogus = = 1\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	well := filepath.Join(dir, "wells", "MW-1.toml")
	if err := os.WriteFile(well, []byte(sealedWell), 0o644); err != nil {
		t.Fatal(err)
	}
	for _, args := range [][]string{
		{"check", dir}, {"check", well},
		{"render", dir}, {"render", well},
		{"book", dir}, {"table", dir, "--format", "csv"}, {"export", dir},
		{"quantities", dir}, {"features", dir}, {"section", dir},
	} {
		code, _, errb := runTremie(args...)
		if code != exitInput || !strings.Contains(errb, "project.toml:4:9") {
			t.Errorf("%s: exit %d, want %d with project.toml:4:9\n%s", strings.Join(args, " "), code, exitInput, errb)
		}
	}
	for _, cmd := range []string{"book", "table", "export", "section"} {
		code, out, errb := runTremie(cmd, well)
		if code != exitInput || !strings.Contains(errb, "is a file; name the project's directory") || strings.Contains(out, "MW-1") {
			t.Errorf("%s FILE: exit %d, want %d refusing the file\n%s\n%s", cmd, code, exitInput, out, errb)
		}
	}
}

// TestEveryCSVIsInert: a well ID or a description that a spreadsheet
// would run as a formula is neutralised in every CSV tremie writes (OWASP,
// "CSV Injection"), while negative numbers stay numbers.
func TestEveryCSVIsInert(t *testing.T) {
	dir := t.TempDir()
	if code, _, errb := runTremie("--quiet", "demo", "-o", dir); code > exitFindings {
		t.Fatalf("demo: exit %d %s", code, errb)
	}
	for file, id := range map[string]string{"BR-1.toml": `=HYPERLINK(\"x\")`, "MW-2.toml": "+SUM(1)", "MW-3.toml": "-2+3"} {
		p := filepath.Join(dir, "wells", file)
		b, err := os.ReadFile(p)
		if err != nil {
			t.Fatal(err)
		}
		old := "id = \"" + strings.TrimSuffix(file, ".toml") + "\""
		if !strings.Contains(string(b), old) {
			t.Fatalf("%s has no %s", file, old)
		}
		os.WriteFile(p, []byte(strings.Replace(string(b), old, "id = \""+id+"\"", 1)), 0o644)
	}
	for _, args := range [][]string{
		{"table", dir, "--format", "csv"},
		{"export", dir, "--format", "csv"},
		{"quantities", dir, "--format", "csv"},
		{"features", dir, "--format", "csv"},
	} {
		_, out, errb := runTremie(args...)
		if out == "" {
			t.Errorf("%s: no output\n%s", strings.Join(args, " "), errb)
			continue
		}
		for _, bad := range []string{",=HYPERLINK", "\n=HYPERLINK", `"=HYPERLINK`, ",+SUM", "\n+SUM", ",-2+3", "\n-2+3"} {
			if strings.Contains(out, bad) {
				t.Errorf("%s: a formula cell %q is written as is", strings.Join(args, " "), bad)
			}
		}
		if args[0] == "features" {
			if !strings.Contains(out, `"'=HYPERLINK(""x"")"`) {
				t.Errorf("features: BR-1's inert ID is missing:\n%.400s", out)
			}
		} else if !strings.Contains(out, "'+SUM(1)") || !strings.Contains(out, "'-2+3") {
			t.Errorf("%s: the inert IDs are missing:\n%.600s", strings.Join(args, " "), out)
		}
	}
}

// TestProjectCommandsNameThemselves: a project command's messages start
// with its own name (they once all said "tremie project:"), a section
// asked of a folder without project.toml names the folder, and --wells
// with one well is a usage error (exit 3), not the project file's.
func TestProjectCommandsNameThemselves(t *testing.T) {
	missing := filepath.Join(t.TempDir(), "nosuch")
	for _, cmd := range []string{"book", "table", "export", "section"} {
		code, _, errb := runTremie(cmd, missing)
		if code != exitInput || !strings.HasPrefix(errb, "tremie "+cmd+": ") {
			t.Errorf("%s on a missing folder: exit %d, stderr %q", cmd, code, errb)
		}
	}
	dir := t.TempDir()
	os.MkdirAll(filepath.Join(dir, "wells"), 0o755)
	if err := os.WriteFile(filepath.Join(dir, "wells", "MW-1.toml"), []byte(sealedWell), 0o644); err != nil {
		t.Fatal(err)
	}
	code, _, errb := runTremie("section", dir, "-o", t.TempDir())
	if code != exitInput || !strings.HasPrefix(errb, "tremie section: "+dir+": ") || !strings.Contains(errb, "--wells") {
		t.Errorf("section without sections: exit %d, stderr %q", code, errb)
	}
	code, _, errb = runTremie("section", dir, "--wells", "MW-1", "-o", t.TempDir())
	if code != exitUsage || !strings.Contains(errb, "at least two") {
		t.Errorf("section --wells MW-1: exit %d, stderr %q", code, errb)
	}
}
