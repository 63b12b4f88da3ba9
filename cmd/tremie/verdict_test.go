package main

import (
	"os"
	"regexp"
	"sort"
	"strings"
	"testing"
)

// countyProfile is a project's own profile that turns both ways against
// the defaults: a 5-ft seal minimum (the default is 2 ft after TI 814-01,
// so OK-1's 3 ft of chips fails only here) and SEAL-ABOVE-PACK made a
// warning (so BAD-1's grout on the pack blocks only under the defaults).
const countyProfile = `[profile]
name = "Test County ordinance"
units = "ft"
source = "invented for this test"

[rule.SEAL-THICKNESS]
min = 5

[rule.SEAL-ABOVE-PACK]
severity = "warning"
`

// profiledProject writes a project with its own profile and two wells
// and makes it the working directory, as a user inside it would be.
func profiledProject(t *testing.T) string {
	t.Helper()
	dir := t.TempDir()
	put(t, dir, "project.toml", "[project]\nname = \"Test project\"\nprofile = \"county.profile.toml\"\n")
	put(t, dir, "county.profile.toml", countyProfile)
	put(t, dir, "wells/OK-1.toml", sealedWell)
	put(t, dir, "wells/BAD-1.toml", unsealedWell)
	t.Chdir(dir)
	return dir
}

// findingsFor keeps the finding lines of one file from a check report,
// sorted.
func findingsFor(out, file string) []string {
	var keep []string
	for _, l := range strings.Split(out, "\n") {
		if strings.HasPrefix(l, file+":") {
			keep = append(keep, l)
		}
	}
	sort.Strings(keep)
	return keep
}

// A well inside a project is judged with the project's profile however it
// is named: as a file, as the wells folder or as the project.
func TestSameVerdictHoweverNamed(t *testing.T) {
	profiledProject(t)
	namings := [][]string{{"wells/OK-1.toml", "wells/BAD-1.toml"}, {"wells"}, {"."}}
	for _, file := range []string{"wells/OK-1.toml", "wells/BAD-1.toml"} {
		var first []string
		for i, args := range namings {
			if i == 0 {
				args = []string{file}
			}
			code, out, errb := runTremie(append([]string{"check"}, args...)...)
			if errb != "" {
				t.Errorf("check %v: stderr %q", args, errb)
			}
			if !strings.Contains(out, "(profile Test County ordinance)") {
				t.Errorf("check %v does not say the project's profile is in force:\n%s", args, out)
			}
			got := findingsFor(out, file)
			if i == 0 {
				first = got
				wantCode := exitOK
				if file == "wells/OK-1.toml" {
					wantCode = exitFindings
				}
				if code != wantCode {
					t.Errorf("check %s: exit %d, want %d\n%s", file, code, wantCode, out)
				}
				continue
			}
			if strings.Join(got, "\n") != strings.Join(first, "\n") {
				t.Errorf("check %v reports for %s:\n%s\nbut check %s:\n%s", args, file, strings.Join(got, "\n"), file, strings.Join(first, "\n"))
			}
		}
		// What the profile makes of each: OK-1's 3 ft of chips is under
		// the county's 5 ft; BAD-1's grout on the pack is only a warning.
		want := map[string]*regexp.Regexp{
			"wells/OK-1.toml":  regexp.MustCompile(`error SEAL-THICKNESS`),
			"wells/BAD-1.toml": regexp.MustCompile(`warning SEAL-ABOVE-PACK`),
		}[file]
		if !want.MatchString(strings.Join(first, "\n")) {
			t.Errorf("%s: %v lacks %s", file, first, want)
		}
		// and named from inside the wells folder, as "OK-1.toml"
		dir, _ := os.Getwd()
		t.Chdir("wells")
		_, out, _ := runTremie("check", strings.TrimPrefix(file, "wells/"))
		got := findingsFor(out, strings.TrimPrefix(file, "wells/"))
		for i := range got {
			got[i] = "wells/" + got[i]
		}
		if strings.Join(got, "\n") != strings.Join(first, "\n") {
			t.Errorf("check %s from wells/ reports:\n%s\nbut from the project:\n%s", file, strings.Join(got, "\n"), strings.Join(first, "\n"))
		}
		t.Chdir(dir)
	}
}

// render of one well alone stamps NOT FINAL exactly when the project run
// does, and draws into the project's output folder.
func TestRenderOneWellAsTheProjectDoes(t *testing.T) {
	profiledProject(t)
	notFinal := func(out string) map[string]bool {
		m := map[string]bool{}
		for _, l := range strings.Split(out, "\n") {
			if i := strings.Index(l, ": "); i > 0 && strings.HasPrefix(l, "wells/") {
				m[l[:i]] = strings.Contains(l, "NOT FINAL")
			}
		}
		return m
	}
	code, out, errb := runTremie("render", ".", "--format", "svg")
	if code != exitFindings {
		t.Fatalf("project: exit %d\n%s\n%s", code, out, errb)
	}
	project := notFinal(out)
	if !project["wells/OK-1.toml"] || project["wells/BAD-1.toml"] {
		t.Fatalf("project run: NOT FINAL %v, want OK-1 only (under the county profile)", project)
	}
	for _, f := range []string{"wells/OK-1.toml", "wells/BAD-1.toml"} {
		code, out, errb := runTremie("render", f, "--format", "svg", "--force")
		if errb != "" {
			t.Errorf("render %s: stderr %q", f, errb)
		}
		alone := notFinal(out)
		if len(alone) != 1 || alone[f] != project[f] {
			t.Errorf("render %s alone: NOT FINAL %v, project run %v\n%s", f, alone, project[f], out)
		}
		if want := map[bool]int{true: exitFindings, false: exitOK}[project[f]]; code != want {
			t.Errorf("render %s alone: exit %d, want %d", f, code, want)
		}
		if !strings.Contains(out, "→ out/") {
			t.Errorf("render %s alone did not draw into the project's output folder:\n%s", f, out)
		}
	}
}
