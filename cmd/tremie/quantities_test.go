package main

import (
	"bytes"
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema/schematest"
)

func writeFile(t *testing.T, dir, name, body string) string {
	t.Helper()
	p := filepath.Join(dir, name)
	if err := os.WriteFile(p, []byte(body), 0o644); err != nil {
		t.Fatal(err)
	}
	return p
}

func runQ(args ...string) (int, string, string) {
	var out, errb bytes.Buffer
	code := run(append([]string{"quantities"}, args...), &out, &errb)
	return code, out.String(), errb.String()
}

// A bad file is reported with its position and the others still come out.
func TestQuantitiesBadFile(t *testing.T) {
	dir := t.TempDir()
	writeFile(t, dir, "A.toml", schematest.PlannedWell)
	writeFile(t, dir, "B.toml", strings.Replace(schematest.PlannedWell, "bottom = 17.0", "botom = 17.0", 1))
	code, out, errs := runQ(dir, filepath.Join(dir, "missing.toml"))
	if code != exitInput {
		t.Errorf("exit %d, want %d", code, exitInput)
	}
	if !strings.Contains(errs, "B.toml:") || !strings.Contains(errs, "botom") || !strings.Contains(errs, "missing.toml") {
		t.Errorf("stderr: %s", errs)
	}
	if !strings.Contains(out, "PL-1") {
		t.Errorf("good well missing from output:\n%s", out)
	}
}

func TestQuantitiesYieldsFile(t *testing.T) {
	dir := t.TempDir()
	w := writeFile(t, dir, "PL-1.toml", schematest.PlannedWell)
	// 3.4046 ft3 / 0.45 = 7.57 -> 8 bags
	y := writeFile(t, dir, "site.yields.toml", "[yields.filter-pack]\nyield = 0.45\nbag_mass = 50\n")
	code, out, errs := runQ("--yields", y, w, "--format", "json")
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var q struct {
		Wells []struct {
			Fills []struct {
				BagsNeeded *int `json:"bags_needed"`
			} `json:"fills"`
		} `json:"wells"`
	}
	json.Unmarshal([]byte(out), &q)
	if n := q.Wells[0].Fills[0].BagsNeeded; n == nil || *n != 8 {
		t.Errorf("bags with 0.45 ft3 yield: %v, want 8", n)
	}
	bad := writeFile(t, dir, "bad.yields.toml", "[yields.filter-pack]\nyeild = 0.45\n")
	if code, _, errs := runQ("--yields", bad, w); code != exitInput || !strings.Contains(errs, "bad.yields.toml:2") {
		t.Errorf("bad yields: exit %d, %s", code, errs)
	}
}

func TestQuantitiesUsage(t *testing.T) {
	for _, args := range [][]string{{}, {"--format", "xml", "x"}, {"--contingency", "-5", "x"}, {"--nope", "x"}} {
		if code, _, _ := runQ(args...); code != exitUsage {
			t.Errorf("%v: exit %d, want %d", args, code, exitUsage)
		}
	}
}

// An interval whose geometry fails (a fill below the recorded hole) is
// reported with its file and line, exit 1, and the rest is still
// computed.
func TestQuantitiesGeometryError(t *testing.T) {
	dir := t.TempDir()
	body := strings.Replace(schematest.PlannedWell, "[[fill]]\ntop = 20.0\nbottom = 30.0", "[[fill]]\ntop = 20.0\nbottom = 35.0", 1)
	body = strings.Replace(body, "total_depth = 30.0", "total_depth = 35.0", 1)
	p := writeFile(t, dir, "G.toml", body)
	code, out, errs := runQ(p)
	if code != exitFindings {
		t.Errorf("exit %d, want %d", code, exitFindings)
	}
	// the pack is the first [[fill]], on line 32 of schematest.PlannedWell
	if !strings.Contains(errs, "G.toml:32: fill[0]: at 30–35 ft: no borehole section") {
		t.Errorf("stderr: %s", errs)
	}
	if !strings.Contains(out, "bentonite-chips") || !strings.Contains(out, "cannot be computed") {
		t.Errorf("output:\n%s", out)
	}
}

// A profile sets the reconciliation thresholds: with min_ratio 0.5 the
// MW-3 pack (56 %) is no longer low; its tags still are.
func TestQuantitiesProfile(t *testing.T) {
	dir := t.TempDir()
	prof := writeFile(t, dir, "site.profile.toml", "[profile]\nname = \"lenient\"\nunits = \"ft\"\n\n[rule.PLACED-VOLUME-LOW]\nmin_ratio = 0.5\n")
	code, out, errs := runQ("--profile", prof, filepath.Join("demo", "wells", "MW-3.toml"))
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errs)
	}
	if strings.Contains(out, "PLACED-VOLUME-LOW") || !strings.Contains(out, "TAG-EXPECTED-TOP") {
		t.Errorf("output:\n%s", out)
	}
	if code, _, _ := runQ("--profile", filepath.Join(dir, "none.toml"), dir); code != exitInput {
		t.Errorf("missing profile: exit %d", code)
	}
}

// An unwaived error among the reconciliation findings exits 1, as check
// and render do (README's exit codes): the demo's MW-3 placed 56 % of its
// pack's calculated volume (PLACED-VOLUME-LOW, error), and the report is
// still written in full. The usage line names the operands.
func TestQuantitiesExitsOneOnAnError(t *testing.T) {
	code, out, errs := runQ(filepath.Join("demo", "wells", "MW-3.toml"))
	if code != exitFindings {
		t.Errorf("exit %d, want %d: %s", code, exitFindings, errs)
	}
	if !strings.Contains(out, "PLACED-VOLUME-LOW") || !strings.Contains(out, "licensed professional") {
		t.Errorf("report not written in full:\n%s", out)
	}
	if code, out, _ := runQ("--help"); code != exitOK || !strings.Contains(out, "usage: tremie quantities [flags] FILE|DIR...") {
		t.Errorf("--help: exit %d\n%s", code, out)
	}
}
