package main

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/cmd/tremie/demo"
)

// TestNamedOutputNeverReplacesAnInput: -o naming a file the project reads
// (a well file, written as another path to it; the project file; the rule
// profile) is refused with exit 4 and the file is left as it was, for
// table, export and book; a file of the user's that is no input is
// replaced, as asked.
func TestNamedOutputNeverReplacesAnInput(t *testing.T) {
	dir := t.TempDir()
	if err := demo.Write(dir, false); err != nil {
		t.Fatal(err)
	}
	prof := filepath.Join(dir, "site.profile.toml")
	os.WriteFile(prof, []byte("[profile]\nname = \"site\"\n"), 0o644)
	prj := filepath.Join(dir, "project.toml")
	src, _ := os.ReadFile(prj)
	os.WriteFile(prj, []byte(strings.Replace(string(src), "[project]\n", "[project]\nprofile = \"site.profile.toml\"\n", 1)), 0o644)
	for _, c := range []struct{ target, what string }{
		{filepath.Join(dir, "wells", "..", "wells", "MW-1.toml"), "a well file"},
		{prj, "the project file"},
		{prof, "the rule profile"},
	} {
		before, err := os.ReadFile(c.target)
		if err != nil {
			t.Fatal(err)
		}
		for _, args := range [][]string{
			{"table", dir, "--format", "md", "-o", c.target},
			{"table", dir, "--format", "import-xlsx", "-o", c.target},
			{"export", dir, "--format", "csv", "-o", c.target},
			{"book", dir, "-o", c.target},
		} {
			code, _, errb := runTremie(args...)
			if code != exitOutput || !strings.Contains(errb, "is "+c.what+" of this project") {
				t.Errorf("%s -o %s: exit %d, %s", args[0], filepath.Base(c.target), code, errb)
			}
			if after, _ := os.ReadFile(c.target); !bytes.Equal(before, after) {
				t.Fatalf("%s -o %s replaced it", args[0], c.target)
			}
		}
	}
	mine := filepath.Join(dir, "notes.md")
	os.WriteFile(mine, []byte("old table\n"), 0o644)
	if code, _, errb := runTremie("table", dir, "--format", "md", "-o", mine); code == exitOutput {
		t.Errorf("a file named by the user that is no input: %s", errb)
	}
	if got, _ := os.ReadFile(mine); !strings.HasPrefix(string(got), "| Well |") {
		t.Errorf("the named file holds %q", got)
	}
}
