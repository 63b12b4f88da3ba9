package main

import (
	"github.com/tremie-dev/tremie/cmd/tremie/demo"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
)

// A project's yields file reaches the quantities: with 0.45 ft3 per 50-lb
// bag of filter sand (a supplier figure in this invented project) MW-1's
// pack of 4.457 ft3 needs ceil(4.457 / 0.45) = 10 bags, not the 9 of the
// 0.5 ft3 default (common practice).
func TestProjectYieldsFile(t *testing.T) {
	dir := t.TempDir()
	if err := demo.Write(dir, false); err != nil {
		t.Fatal(err)
	}
	put(t, dir, "site.yields.toml", "[yields]\nvolume = \"ft3\"\nmass = \"lb\"\n[yields.filter-pack]\nyield = 0.45\nbag_mass = 50\nnote = \"supplier sheet\"\n")
	prj := filepath.Join(dir, "project.toml")
	data, _ := os.ReadFile(prj)
	if err := os.WriteFile(prj, []byte(strings.Replace(string(data), "[project]\n", "[project]\nyields = \"site.yields.toml\"\n", 1)), 0o644); err != nil {
		t.Fatal(err)
	}
	_, out, errb := runTremie("quantities", dir)
	row := regexp.MustCompile(`(?m)^MW-1 .*\n.*\n\s+1\s+filter-pack\s+23–36\s+4\.457\s+\S+\s+0\.450 / 50-lb bag\s+10\s+9\s`)
	if !row.MatchString(out) {
		t.Errorf("MW-1's pack row does not use the project's yield:\n%s\n%s", out[:min(len(out), 1500)], errb)
	}
	// A yields file the project names but that is missing is an error with its line.
	if err := os.Remove(filepath.Join(dir, "site.yields.toml")); err != nil {
		t.Fatal(err)
	}
	code, _, errb := runTremie("quantities", dir)
	if code != exitInput || !strings.Contains(errb, "project.toml:") || !strings.Contains(errb, "yields file") {
		t.Errorf("exit %d, stderr %q", code, errb)
	}
}

// The placement checks of tremie check use the project's yields too: at
// 0.3 ft3 per 50-lb bag MW-1's 9 bags make 2.7 ft3 against 4.457 ft3
// calculated, 61 %, below the 80 % default, so MW-1 gets the bridge error it
// does not get at the 0.5 ft3 default (common practice).
func TestProjectYieldsReachCheck(t *testing.T) {
	dir := t.TempDir()
	if err := demo.Write(dir, false); err != nil {
		t.Fatal(err)
	}
	_, before, _ := runTremie("check", dir)
	if strings.Contains(before, "MW-1.toml:72: error PLACED-VOLUME-LOW") {
		t.Fatalf("MW-1 flagged at the default yields:\n%s", before)
	}
	put(t, dir, "site.yields.toml", "[yields]\n[yields.filter-pack]\nyield = 0.3\nbag_mass = 50\n")
	prj := filepath.Join(dir, "project.toml")
	data, _ := os.ReadFile(prj)
	if err := os.WriteFile(prj, []byte(strings.Replace(string(data), "[project]\n", "[project]\nyields = \"site.yields.toml\"\n", 1)), 0o644); err != nil {
		t.Fatal(err)
	}
	_, after, errb := runTremie("check", dir)
	if !strings.Contains(after, "MW-1.toml:72: error PLACED-VOLUME-LOW") {
		t.Errorf("MW-1 not flagged with the project's yields:\n%s\n%s", after, errb)
	}
}

// A yields file gives a grout's mix, and the grout-mix lines use it. Neat
// cement at 1.25 ft3 per 94-lb sack with 6.0 US gal of water (an invented
// mix sheet) weighs (94 + 6.0 x 8.3417) / (1.25 x 7.48052) = 144.05 lb /
// 9.3507 gal = 15.41 lb/gal (water at 62.4 lb/ft3, 7.48052 gal/ft3, NIST
// HB 44); MW-2's mud balance read 15.3 lb/gal, 15.3 / 15.405 - 1 = -0.7 %.
// Cement-bentonite stated at 13.9 lb/gal with no water is shown as
// stated.
func TestProjectYieldsGroutMix(t *testing.T) {
	dir := t.TempDir()
	if err := demo.Write(dir, false); err != nil {
		t.Fatal(err)
	}
	put(t, dir, "site.yields.toml", "[yields]\n[yields.neat-cement]\nyield = 1.25\nbag_mass = 94\nwater = 6.0\n\n[yields.cement-bentonite]\nyield = 1.6\nbag_mass = 94\ndensity = 13.9\n")
	prj := filepath.Join(dir, "project.toml")
	data, _ := os.ReadFile(prj)
	if err := os.WriteFile(prj, []byte(strings.Replace(string(data), "[project]\n", "[project]\nyields = \"site.yields.toml\"\n", 1)), 0o644); err != nil {
		t.Fatal(err)
	}
	_, out, errb := runTremie("quantities", filepath.Join(dir, "wells", "MW-2.toml"), filepath.Join(dir, "wells", "MW-1.toml"))
	for _, s := range []string{
		"grout mix, fill 3: 6.000 gal water per 94-lb bag, expected 15.41 lb/gal; measured 15.3 lb/gal (-0.7 %)",
		"grout mix, fill 4: expected 13.90 lb/gal (stated in the yields file)",
	} {
		if !strings.Contains(out, s) {
			t.Errorf("output lacks %q:\n%s\n%s", s, out, errb)
		}
	}
	// water for a dry material, or water without a bag, is an error with its line
	put(t, dir, "site.yields.toml", "[yields]\n[yields.bentonite-chips]\nyield = 0.7\nwater = 1\n\n[yields.neat-cement]\nyield = 1.2\nwater = 5\n")
	code, _, errb := runTremie("quantities", dir)
	if code != exitInput || !strings.Contains(errb, `site.yields.toml:4:1: unknown key "water" in [yields.bentonite-chips]`) ||
		!strings.Contains(errb, "site.yields.toml:8:") || !strings.Contains(errb, "needs the bag") {
		t.Errorf("exit %d, stderr %q", code, errb)
	}
}
