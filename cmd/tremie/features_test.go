package main

import (
	"bytes"
	"image"
	"image/png"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/cmd/tremie/demo"
	"github.com/tremie-dev/tremie/render/wallimage"
	"github.com/tremie-dev/tremie/schema"
)

// One bad file is reported with its line and exit code 2; the good one is
// still listed.
func TestFeaturesCommand(t *testing.T) {
	dir := t.TempDir()
	good := "[units]\ndepth = \"m\"\n[well]\nid = \"G\"\npurpose = \"monitoring\"\ntotal_depth = 30\n[[borehole]]\ntop = 0\nbottom = 30\ndiameter = 150\n" +
		"[[feature]]\nkind = \"fracture\"\ntrace_high = 20\ntrace_low = 20.15\nlow_azimuth = 90\n"
	bad := strings.Replace(good, "trace_low = 20.15", "trace_low = 19", 1)
	os.WriteFile(filepath.Join(dir, "g.toml"), []byte(good), 0o644)
	os.WriteFile(filepath.Join(dir, "b.toml"), []byte(bad), 0o644)
	var out, errb bytes.Buffer
	code := runFeatures([]string{"--format", "csv", dir}, &out, &errb)
	if code != exitInput {
		t.Errorf("exit %d, want %d", code, exitInput)
	}
	if !strings.Contains(errb.String(), "b.toml:14:") || !strings.Contains(errb.String(), "trace_low = 19 is above trace_high = 20") {
		t.Errorf("stderr: %s", errb.String())
	}
	// 0.15 m on a 150-mm hole: h = d, 45° (arctan 1).
	if !strings.Contains(out.String(), ",G,20.075,,m,fracture,45,90,0,270,45,") {
		t.Errorf("stdout: %s", out.String())
	}
	if code := runFeatures([]string{"--format", "xml", dir}, &out, &errb); code != exitUsage {
		t.Errorf("bad format: exit %d", code)
	}
}

// The demo's rock well gets its feature summary beside its sheets, and
// the book binds it after them.
func TestDemoFeatureSummary(t *testing.T) {
	t.Setenv("SOURCE_DATE_EPOCH", "1780000000")
	dir := copyDemo(t)
	outDir := filepath.Join(t.TempDir(), "sheets")
	var stdout, stderr bytes.Buffer
	run([]string{"render", dir, "-o", outDir, "--format", "pdf"}, &stdout, &stderr)
	if _, err := os.Stat(filepath.Join(outDir, "BR-1-features.pdf")); err != nil {
		t.Errorf("no feature summary: %v\n%s", err, stderr.String())
	}
	if _, err := os.Stat(filepath.Join(outDir, "MW-1-features.pdf")); err == nil {
		t.Error("a well without features got a feature summary")
	}
}

// The demo's wall image is the generator's: the embedded file decodes to
// the very pixels wallimage.DemoImages makes from BR-1's picks (bytes may
// differ between Go releases' PNG encoders; pixels may not).
func TestDemoWallImageIsGenerated(t *testing.T) {
	data, err := demo.FS.ReadFile("wells/BR-1.toml")
	if err != nil {
		t.Fatal(err)
	}
	w, err := schema.Load("BR-1.toml", data)
	if err != nil {
		t.Fatal(err)
	}
	made, err := wallimage.DemoImages(w)
	if err != nil {
		t.Fatal(err)
	}
	for _, wi := range w.WallImages {
		embedded, err := demo.FS.ReadFile("wells/" + wi.File)
		if err != nil {
			t.Fatalf("%s not embedded: %v", wi.File, err)
		}
		a, errA := png.Decode(bytes.NewReader(embedded))
		b, errB := png.Decode(bytes.NewReader(made[wi.File]))
		if errA != nil || errB != nil {
			t.Fatal(errA, errB)
		}
		ga, gb := a.(*image.Gray), b.(*image.Gray)
		if !ga.Rect.Eq(gb.Rect) || !bytes.Equal(ga.Pix, gb.Pix) {
			t.Errorf("%s differs from what the generator makes: regenerate it with wallimage.DemoImages", wi.File)
		}
	}
}

// A changed wall image redraws its well though the well file is the same.
func TestChangedWallImageRedraws(t *testing.T) {
	t.Setenv("SOURCE_DATE_EPOCH", "1780000000")
	dir := copyDemo(t)
	well := filepath.Join(dir, "wells", "BR-1.toml")
	outDir := filepath.Join(t.TempDir(), "out")
	if code, _, errb := runTremie("render", well, "-o", outDir, "--format", "svg"); code != exitOK {
		t.Fatalf("first render: %d %s", code, errb)
	}
	_, out, _ := runTremie("render", well, "-o", outDir, "--format", "svg")
	if !strings.Contains(out, "0 rendered, 1 unchanged") {
		t.Fatalf("second render is not skipped:\n%s", out)
	}
	img := filepath.Join(dir, "wells", "BR-1-wall.png")
	data, _ := os.ReadFile(img)
	w, _ := schema.Load(well, mustRead(t, well))
	made, _ := wallimage.Synthesize(w, w.WallImages[0], 180, 10) // another size
	if bytes.Equal(made, data) {
		t.Fatal("no change made")
	}
	os.WriteFile(img, made, 0o644)
	_, out, _ = runTremie("render", well, "-o", outDir, "--format", "svg")
	if !strings.Contains(out, "1 rendered, 0 unchanged") {
		t.Errorf("a changed image did not redraw:\n%s", out)
	}
}

func mustRead(t *testing.T, path string) []byte {
	t.Helper()
	b, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	return b
}
