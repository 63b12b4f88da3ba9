package main

import (
	"encoding/json"
	"path/filepath"
	"strings"
	"testing"
)

// Settings files with several mistakes: check names every one, with
// file:line:col, on stderr in the one printed form and, under --format
// json, in the report.
func TestCheckReportsEverySettingsError(t *testing.T) {
	dir := t.TempDir()
	put(t, dir, "wells/OK-1.toml", sealedWell)
	put(t, dir, "project.toml", "[project]\nname = \"x\"\nunits = \"yd\"\nlandscpe = true\nwels = \"wells\"\n")
	code, out, errb := runTremie("check", "--format", "json", dir)
	file := filepath.Join(dir, "project.toml")
	for _, want := range []string{
		file + `:3:9: units must be "ft" or "m", not "yd"`,
		file + `:4:1: unknown key "landscpe" in [project] (did you mean "landscape"?)`,
		file + `:5:1: unknown key "wels" in [project] (did you mean "wells"?)`,
		"\t[project] takes: ",
	} {
		if !strings.Contains(errb, want) {
			t.Errorf("stderr lacks %q:\n%s", want, errb)
		}
	}
	var got []struct {
		File     string `json:"file"`
		Readable bool   `json:"readable"`
		Errors   []struct {
			Line    int    `json:"line"`
			Col     int    `json:"col"`
			Message string `json:"message"`
			Hint    string `json:"hint"`
		} `json:"errors"`
	}
	if err := json.Unmarshal([]byte(out), &got); err != nil {
		t.Fatalf("not JSON: %v\n%s", err, out)
	}
	if code != exitInput || len(got) == 0 {
		t.Fatalf("exit %d, report %s", code, out)
	}
	last := got[len(got)-1]
	if last.File != file || last.Readable || len(last.Errors) != 3 || last.Errors[1].Line != 4 || last.Errors[1].Col != 1 || last.Errors[1].Hint == "" {
		t.Errorf("project entry in the JSON report: %+v", last)
	}

	// a profile with three mistakes, named on the command line
	prof := put(t, dir, "bad.profile.toml", "[profile]\nunits = \"yd\"\n[rule.SEAL-THICKNES]\nmin = 3\n[rule.ANNULAR-SPACE]\nmn = 2\n")
	code, out, errb = runTremie("check", "--format", "json", "--profile", prof, filepath.Join(dir, "wells", "OK-1.toml"))
	if code != exitInput || strings.Count(errb, prof+":") != 3 || !strings.Contains(errb, `did you mean "SEAL-THICKNESS"?`) {
		t.Errorf("profile: exit %d\n%s", code, errb)
	}
	if !strings.Contains(out, `"file": "`+prof+`"`) || strings.Count(out, `"message"`) != 3 {
		t.Errorf("profile errors missing from the JSON report:\n%s", out)
	}
}
