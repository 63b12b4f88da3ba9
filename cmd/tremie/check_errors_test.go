package main

import (
	"encoding/json"
	"fmt"
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
		file + `:3:9: units = "yd" is not one of: ft, m`,
		file + `:4:1: unknown key "landscpe" in [project] (did you mean "landscape"?)`,
		file + `:5:1: unknown key "wels" in [project] (did you mean "wells"?)`,
		"\t[project] takes: ",
	} {
		if !strings.Contains(errb, want) {
			t.Errorf("stderr lacks %q:\n%s", want, errb)
		}
	}
	got := readCheckReport(t, out)
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

// A project file, the profile and the yields file it names, with three
// mistakes each (testdata/nine-mistakes): one run reports all nine,
// sorted by file, line and column, in the one printed form on stderr and
// in the JSON report, though the project file itself is rejected.
func TestCheckReportsProjectProfileAndYieldsErrorsTogether(t *testing.T) {
	t.Chdir(filepath.Join("testdata", "nine-mistakes"))
	want := []string{
		`project.toml:4:9: units = "yd" is not one of: ft, m`,
		`project.toml:7:1: unknown key "landscpe" in [project] (did you mean "landscape"?)`,
		`project.toml:8:1: unknown key "wels" in [project] (did you mean "wells"?)`,
		`site.profile.toml:2:9: units = "yd" is not one of: ft, m`,
		`site.profile.toml:4:7: unknown rule "SEAL-THICKNES" in [rule] (did you mean "SEAL-THICKNESS"?)`,
		`site.profile.toml:8:1: unknown key "mn" in [rule.ANNULAR-SPACE] (did you mean "min"?)`,
		`site.yields.toml:5:9: unknown key "filter-pak" in [yields] (did you mean "filter-pack"?)`,
		`site.yields.toml:9:9: yield must be a positive number, not -1`,
		`site.yields.toml:10:1: unknown key "bag_mas" in [yields.bentonite-chips] (did you mean "bag_mass"?)`,
	}
	code, _, errb := runTremie("check", ".")
	var lines []string
	for _, l := range strings.Split(strings.TrimSpace(errb), "\n") {
		if !strings.HasPrefix(l, "\t") { // a hint
			lines = append(lines, l)
		}
	}
	if code != exitInput || strings.Join(lines, "\n") != strings.Join(want, "\n") {
		t.Errorf("exit %d, stderr:\n%s\nwant the lines:\n%s", code, errb, strings.Join(want, "\n"))
	}
	code, out, _ := runTremie("check", "--format", "json", ".")
	report := readCheckReport(t, out)
	var got []string
	for _, r := range report {
		for _, e := range r.Errors {
			got = append(got, fmt.Sprintf("%s:%d:%d: %s", r.File, e.Line, e.Col, e.Message))
		}
	}
	if code != exitInput || strings.Join(got, "\n") != strings.Join(want, "\n") {
		t.Errorf("JSON report: exit %d, errors:\n%s\nwant:\n%s", code, strings.Join(got, "\n"), strings.Join(want, "\n"))
	}
}

// checkReport is what the tests read of check --format json.
type checkReport []struct {
	File     string `json:"file"`
	Readable bool   `json:"readable"`
	Errors   []struct {
		Line    int    `json:"line"`
		Col     int    `json:"col"`
		Message string `json:"message"`
		Hint    string `json:"hint"`
	} `json:"errors"`
}

func readCheckReport(t *testing.T, out string) checkReport {
	t.Helper()
	var r checkReport
	if err := json.Unmarshal([]byte(out), &r); err != nil {
		t.Fatalf("not JSON: %v\n%s", err, out)
	}
	return r
}
