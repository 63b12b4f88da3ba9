package main

import (
	"bytes"
	"encoding/json"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema/rules"
	"github.com/tremie-dev/tremie/schema/schematest"
)

// runTremie runs the command function as main would.
func runTremie(args ...string) (code int, stdout, stderr string) {
	var out, errb bytes.Buffer
	code = run(args, &out, &errb)
	return code, out.String(), errb.String()
}

// sealedWell is a monitoring well that passes every error-level rule:
// 2-in Sch 40 PVC (OD 2.375 in, ASTM D1785) in an 8.25-in hole, pack 2 ft
// above the screen (US EPA 1992), 3 ft of chips (TI 814-01: 2 ft or more),
// sealed to 23 ft (DWR 74-81: 20 ft for monitoring).
var sealedWell = schematest.MonitoringWell("OK-1", "ft", "8.25", "36.0",
	schematest.Fill("23.0", "36.0", "filter-pack")+"gradation = \"20/40\"\n"+
		schematest.Fill("20.0", "23.0", "bentonite-chips")+
		schematest.Fill("0.0", "20.0", "neat-cement")+
		"[[lithology]]\ntop = 0.0\nbottom = 36.0\nuscs = \"SP\"\n")

// unsealedWell (BAD-1) has grout straight on the pack (line 31: the
// grout's bottom).
var unsealedWell = strings.Replace(strings.Replace(sealedWell, `id = "OK-1"`, `id = "BAD-1"`, 1), `[[fill]]
top = 20.0
bottom = 23.0
material = "bentonite-chips"
[[fill]]
top = 0.0
bottom = 20.0
`, `[[fill]]
top = 0.0
bottom = 23.0
`, 1)

func put(t *testing.T, dir, name, body string) string {
	t.Helper()
	p := filepath.Join(dir, name)
	if err := os.MkdirAll(filepath.Dir(p), 0o755); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(p, []byte(body), 0o644); err != nil {
		t.Fatal(err)
	}
	return p
}

var findingLine = regexp.MustCompile(`^(.+):(\d+): (error|warning|waived) ([A-Z0-9-]+): (.+)$`)

func TestCheckCleanAndFlawed(t *testing.T) {
	dir := t.TempDir()
	ok := put(t, dir, "OK-1.toml", sealedWell)
	code, out, errb := runTremie("check", ok)
	if code != exitOK || errb != "" {
		t.Fatalf("clean well: exit %d, stderr %q\n%s", code, errb, out)
	}
	if !strings.Contains(out, "checked 1 file (default thresholds): 0 errors") || !strings.Contains(out, "never replace") {
		t.Errorf("clean well summary:\n%s", out)
	}

	bad := put(t, dir, "BAD-1.toml", unsealedWell)
	code, out, _ = runTremie("check", bad)
	if code != exitFindings {
		t.Fatalf("unsealed well: exit %d, want %d\n%s", code, exitFindings, out)
	}
	want := bad + ":31: error SEAL-ABOVE-PACK: neat cement at 0–23 ft rests directly on the pack (top at 23 ft)"
	if !strings.Contains(out, want) {
		t.Errorf("missing line %q in\n%s", want, out)
	}
	for _, l := range strings.Split(strings.TrimSpace(out), "\n") {
		if strings.HasPrefix(l, dir) && !findingLine.MatchString(l) {
			t.Errorf("finding line not in path:line: severity RULE: message form: %q", l)
		}
	}
}

// The demo project: the flawed well MW-3 is flagged for its missing seal
// and its annulus gap, with depths; every other demo well has no error.
func TestCheckDemo(t *testing.T) {
	code, out, errb := runTremie("check", "demo/wells")
	if code != exitFindings || errb != "" {
		t.Fatalf("demo: exit %d (want 1), stderr %q\n%s", code, errb, out)
	}
	for _, want := range []string{
		"MW-3.toml:87: error SEAL-ABOVE-PACK: bentonite grout at 14–28 ft rests directly on the pack (top at 28 ft)",
		"MW-3.toml:95: error ANNULUS-GAP: no fill is recorded in the borehole annulus at 12–14 ft",
	} {
		if !strings.Contains(out, want) {
			t.Errorf("demo check lacks %q:\n%s", want, out)
		}
	}
	for _, l := range strings.Split(out, "\n") {
		m := findingLine.FindStringSubmatch(l)
		if m != nil && m[3] == "error" && !strings.HasSuffix(m[1], "MW-3.toml") {
			t.Errorf("a demo well other than MW-3 has an error: %s", l)
		}
	}
}

// One unreadable file does not stop the others, and exit 2 wins over 1.
func TestCheckBadFileAmongGood(t *testing.T) {
	dir := t.TempDir()
	put(t, dir, "a/OK-1.toml", sealedWell)
	put(t, dir, "b/BAD-1.toml", unsealedWell)
	put(t, dir, "c/TYPO.toml", strings.Replace(sealedWell, "bottom = 36.0\ndiameter", "botom = 36.0\ndiameter", 1))
	put(t, dir, "project.toml", "[project]\nname = \"x\"\nwells = \".\"\n")
	put(t, dir, "county.profile.toml", "[profile]\nname = \"x\"\n")
	code, out, errb := runTremie("check", dir)
	if code != exitInput {
		t.Fatalf("exit %d, want %d\n%s\n%s", code, exitInput, out, errb)
	}
	if !regexp.MustCompile(`TYPO\.toml:9:\d+: unknown key "botom"`).MatchString(errb) {
		t.Errorf("stderr does not name the typo with file and line: %q", errb)
	}
	if !strings.Contains(out, "BAD-1.toml:31: error SEAL-ABOVE-PACK") {
		t.Errorf("the flawed file after a bad one was not reported:\n%s", out)
	}
	if !strings.Contains(out, "checked 3 files") || !strings.Contains(out, "1 file could not be read") {
		t.Errorf("summary:\n%s", out)
	}
	code, _, errb = runTremie("check", filepath.Join(dir, "a"), filepath.Join(dir, "nowhere"))
	if code != exitInput || !strings.Contains(errb, "nowhere") {
		t.Errorf("missing path: exit %d, stderr %q", code, errb)
	}
}

func TestCheckJSON(t *testing.T) {
	dir := t.TempDir()
	put(t, dir, "BAD-1.toml", unsealedWell)
	put(t, dir, "OK-1.toml", sealedWell)
	put(t, dir, "SYNTAX.toml", "[units\n")
	code, out, _ := runTremie("check", dir, "--format", "json")
	if code != exitInput {
		t.Errorf("exit %d, want %d", code, exitInput)
	}
	var got []struct {
		File     string `json:"file"`
		Well     string `json:"well"`
		Readable bool   `json:"readable"`
		Findings []struct {
			Rule     string   `json:"rule"`
			Severity string   `json:"severity"`
			Line     int      `json:"line"`
			Waived   bool     `json:"waived"`
			Top      *float64 `json:"top"`
			Bottom   *float64 `json:"bottom"`
			Unit     string   `json:"unit"`
		} `json:"findings"`
		Errors []struct {
			Line    int    `json:"line"`
			Message string `json:"message"`
		} `json:"errors"`
	}
	if err := json.Unmarshal([]byte(out), &got); err != nil {
		t.Fatalf("not JSON: %v\n%s", err, out)
	}
	if len(got) != 3 {
		t.Fatalf("%d results, want 3", len(got))
	}
	bad, ok, syn := got[0], got[1], got[2]
	if bad.Well != "BAD-1" || !bad.Readable || len(bad.Findings) == 0 {
		t.Errorf("flawed file: %+v", bad)
	}
	found := false
	for _, f := range bad.Findings {
		if f.Rule == "SEAL-ABOVE-PACK" && f.Severity == "error" && f.Line == 31 && f.Top != nil && *f.Top == 23 && f.Unit == "ft" {
			found = true
		}
	}
	if !found {
		t.Errorf("SEAL-ABOVE-PACK at 23 ft not in %+v", bad.Findings)
	}
	if !ok.Readable || ok.Findings == nil {
		t.Errorf("clean file: %+v (findings must be [] not null)", ok)
	}
	if syn.Readable || len(syn.Errors) == 0 || syn.Errors[0].Line == 0 {
		t.Errorf("syntax error file: %+v", syn)
	}
	_, again, _ := runTremie("check", "--format", "json", dir)
	if again != out {
		t.Error("two runs on the same input gave different bytes")
	}
}

func TestCheckProfile(t *testing.T) {
	dir := t.TempDir()
	bad := put(t, dir, "BAD-1.toml", unsealedWell)
	off := put(t, dir, "off.profile.toml", "[profile]\nname = \"lenient\"\n[rule.SEAL-ABOVE-PACK]\nseverity = \"warning\"\n")
	code, out, _ := runTremie("check", "--profile", off, bad)
	if code != exitOK || !strings.Contains(out, "warning SEAL-ABOVE-PACK") || !strings.Contains(out, "profile lenient") {
		t.Errorf("profile lowering the rule to a warning: exit %d\n%s", code, out)
	}
	typo := put(t, dir, "typo.profile.toml", "[profile]\nunits = \"ft\"\n[rule.SEAL-ABOVE-PAK]\n")
	code, out, errb := runTremie("check", "--profile", typo, bad)
	if code != exitInput || !strings.Contains(errb, "typo.profile.toml:3:") || out != "" {
		t.Errorf("bad profile: exit %d, stderr %q, stdout %q", code, errb, out)
	}
}

func TestCheckWaived(t *testing.T) {
	dir := t.TempDir()
	w := put(t, dir, "W.toml", unsealedWell+"[[waiver]]\nrule = \"SEAL-ABOVE-PACK\"\nreason = \"test\"\napproved_by = \"reviewer\"\n")
	code, out, _ := runTremie("check", w)
	if code != exitOK || !strings.Contains(out, ": waived SEAL-ABOVE-PACK:") || !strings.Contains(out, "1 waived") {
		t.Errorf("waived: exit %d\n%s", code, out)
	}
}

func TestCheckUsage(t *testing.T) {
	for _, args := range [][]string{{"check"}, {"check", "--format", "xml", "x.toml"}, {"check", "--nope", "x.toml"}} {
		if code, _, _ := runTremie(args...); code != exitUsage {
			t.Errorf("%v: exit %d, want %d", args, code, exitUsage)
		}
	}
}

func TestRulesListing(t *testing.T) {
	code, out, _ := runTremie("rules")
	if code != exitOK {
		t.Fatalf("exit %d", code)
	}
	for _, r := range rules.All() {
		if !strings.Contains(out, "\n"+r.ID+"  "+r.Severity.String()+"  "+r.Title+"\n") {
			t.Errorf("listing lacks %s", r.ID)
		}
	}
	// TI 814-01's 2 ft seal, shown in both unit systems.
	if !strings.Contains(out, "param min = 2 ft (wells in ft), 0.6 m (wells in m)") {
		t.Errorf("listing lacks the seal default")
	}
	if code, _, _ := runTremie("rules", "NO-SUCH-RULE"); code != exitUsage {
		t.Errorf("unknown rule: exit %d, want %d", code, exitUsage)
	}
	// Per purpose: a public-supply well gets DWR 74-81's 50 ft seal and
	// TM 5-813-1's 10 ft of pack above the screen, and is not judged by the
	// monitoring-well pack maximum.
	code, out, _ = runTremie("rules", "--purpose", "public-supply", "SANITARY-SEAL-DEPTH", "PACK-ABOVE-SCREEN", "PACK-ABOVE-MAX")
	if code != exitOK {
		t.Fatalf("--purpose: exit %d", code)
	}
	for _, want := range []string{"param depth = 50 ft (wells in ft)", "param min = 10 ft (wells in ft)", "does not apply to public-supply wells"} {
		if !strings.Contains(out, want) {
			t.Errorf("--purpose public-supply lacks %q:\n%s", want, out)
		}
	}
	if code, _, _ := runTremie("rules", "--purpose", "orchard"); code != exitUsage {
		t.Errorf("unknown purpose: exit %d, want %d", code, exitUsage)
	}
}

// TestCheckClosesWithTheSheetsCaution: tremie check and tremie rules
// close with the caution every sheet and book carries (check once had
// words of its own for the defaults).
func TestCheckClosesWithTheSheetsCaution(t *testing.T) {
	code, out, errb := runTremie("check", "../../testdata/gallery")
	if code != exitOK || !strings.Contains(out, rules.Caution(nil)) {
		t.Errorf("check: exit %d\n%s\n%s", code, out, errb)
	}
	_, out, _ = runTremie("rules")
	if !strings.Contains(strings.Join(strings.Fields(out), " "), rules.Caution(nil)) {
		t.Errorf("rules does not carry the caution:\n%.400s", out)
	}
}
