package starter

import (
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema"
)

// TestTaplo runs Taplo, the TOML toolkit behind the editors' TOML
// language servers, over a skeleton: the starter and project files pass
// through .taplo.toml and through a starter's #:schema line, and a
// misspelt fill material and a misspelt key are flagged. Taplo is found
// on PATH or at $TAPLO (npm install @taplo/cli); without it the test is
// skipped.
func TestTaplo(t *testing.T) {
	exe := os.Getenv("TAPLO")
	if exe == "" {
		exe, _ = exec.LookPath("taplo")
	}
	if exe == "" {
		msg := "taplo test skipped: no taplo on PATH or in $TAPLO (npm install @taplo/cli)"
		fmt.Println(msg)
		t.Skip(msg)
	}
	dir := t.TempDir()
	if _, err := Init(dir, InitOptions{}); err != nil {
		t.Fatal(err)
	}
	if _, err := WriteWell(filepath.Join(dir, "wells"), Options{ID: "MW-9", Units: schema.Metres, Kind: "nested"}); err != nil {
		t.Fatal(err)
	}
	check := func(dir string, files ...string) (string, bool) {
		cmd := exec.Command(exe, append([]string{"check"}, files...)...)
		cmd.Dir = dir
		out, err := cmd.CombinedOutput()
		return string(out), err == nil
	}
	if out, ok := check(dir, "wells/MW-9.toml", "project.toml", ProfileName); !ok {
		t.Fatalf("taplo rejects the skeleton:\n%s", out)
	}
	well := filepath.Join(dir, "wells", "MW-9.toml")
	src, _ := os.ReadFile(well)
	bad := strings.Replace(string(src), `material = "bentonite-pellets"`, `material = "bentonite-pelets"`, 1)
	bad = strings.Replace(bad, "[[borehole]]\n", "[[borehole]]\ndiamter = 8\n", 1)
	os.WriteFile(well, []byte(bad), 0o644)
	out, ok := check(dir, "wells/MW-9.toml")
	if ok || !strings.Contains(out, `"bentonite-pelets" is not one of`) || !strings.Contains(out, "'diamter' was unexpected") {
		t.Errorf("taplo does not flag the wrong material and key:\n%s", out)
	}
	// outside a project, through the #:schema line alone
	loose := t.TempDir()
	if _, err := WriteWell(loose, Options{ID: "A-1"}); err != nil {
		t.Fatal(err)
	}
	a1 := filepath.Join(loose, "A-1.toml")
	src, _ = os.ReadFile(a1)
	if out, ok := check(loose, "A-1.toml"); !ok {
		t.Fatalf("taplo rejects a starter:\n%s", out)
	}
	os.WriteFile(a1, []byte(strings.Replace(string(src), `material = "bentonite-chips"`, `material = "bentonite-chipz"`, 1)), 0o644)
	if out, ok := check(loose, "A-1.toml"); ok || !strings.Contains(out, `"bentonite-chipz" is not one of`) {
		t.Errorf("taplo does not flag the wrong material through #:schema:\n%s", out)
	}
}
