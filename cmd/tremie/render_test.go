package main

import (
	"bytes"
	"encoding/xml"
	"image/png"
	"io"
	"io/fs"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"

	"github.com/pdfcpu/pdfcpu/pkg/api"
	"github.com/pdfcpu/pdfcpu/pkg/pdfcpu/model"

	"github.com/tremie-dev/tremie/cmd/tremie/demo"
)

// copyDemo copies the demo project to a temporary directory.
func copyDemo(t *testing.T) string {
	t.Helper()
	dir := t.TempDir()
	err := fs.WalkDir(demo.FS, ".", func(p string, d fs.DirEntry, err error) error {
		if err != nil || d.IsDir() {
			return err
		}
		b, err := demo.FS.ReadFile(p)
		if err != nil {
			return err
		}
		dst := filepath.Join(dir, filepath.FromSlash(p))
		if err := os.MkdirAll(filepath.Dir(dst), 0o755); err != nil {
			return err
		}
		return os.WriteFile(dst, b, 0o644)
	})
	if err != nil {
		t.Fatal(err)
	}
	return dir
}

func TestRenderDemoProject(t *testing.T) {
	t.Setenv("SOURCE_DATE_EPOCH", "1780000000")
	dir := copyDemo(t)
	outDir := filepath.Join(t.TempDir(), "sheets")
	var stdout, stderr bytes.Buffer
	code := run([]string{"render", dir, "-o", outDir, "--dpi", "40"}, &stdout, &stderr)
	// The demo holds a flawed well: it is drawn, marked, and the run
	// exits 1.
	if code != exitFindings {
		t.Fatalf("exit %d, want %d\nstdout:\n%s\nstderr:\n%s", code, exitFindings, stdout.String(), stderr.String())
	}
	if !strings.Contains(stdout.String(), "NOT FINAL") {
		t.Errorf("the flawed well is not reported not final:\n%s", stdout.String())
	}
	wells, _ := fs.Glob(demo.FS, "wells/*.toml")
	conf := model.NewDefaultConfiguration()
	api.DisableConfigDir()
	for _, w := range wells {
		id := strings.TrimSuffix(filepath.Base(w), ".toml")
		pdf, err := os.ReadFile(filepath.Join(outDir, id+".pdf"))
		if err != nil {
			t.Errorf("%s: %v", id, err)
			continue
		}
		// pdfcpu: ISO 32000-1 validation.
		if err := api.Validate(bytes.NewReader(pdf), conf); err != nil {
			t.Errorf("%s.pdf: pdfcpu: %v", id, err)
		}
		n, err := api.PageCount(bytes.NewReader(pdf), conf)
		if err != nil {
			t.Fatal(err)
		}
		svgs, pngs := sheetFiles(outDir, id, "svg"), sheetFiles(outDir, id, "png")
		if len(svgs) != n || len(pngs) != n {
			t.Errorf("%s: %d PDF pages, %d SVG and %d PNG files", id, n, len(svgs), len(pngs))
		}
		for _, s := range svgs {
			b, _ := os.ReadFile(s)
			dec := xml.NewDecoder(bytes.NewReader(b))
			for {
				if _, err := dec.Token(); err == io.EOF {
					break
				} else if err != nil {
					t.Errorf("%s: encoding/xml: %v", s, err)
					break
				}
			}
		}
		for _, p := range pngs {
			f, _ := os.Open(p)
			img, err := png.Decode(f)
			f.Close()
			if err != nil {
				t.Errorf("%s: %v", p, err)
				continue
			}
			// Letter at 40 dpi: 8.5 x 11 in = 340 x 440 px.
			if b := img.Bounds(); b.Dx() != 340 || b.Dy() != 440 {
				t.Errorf("%s: %d x %d px, want 340 x 440", p, b.Dx(), b.Dy())
			}
		}
	}
	// Searchable text, read back by an independent reader.
	if tool, err := exec.LookPath("pdftotext"); err == nil {
		txt, err := exec.Command(tool, "-enc", "UTF-8", filepath.Join(outDir, "MW-1.pdf"), "-").Output()
		if err != nil {
			t.Fatal(err)
		}
		for _, s := range []string{"MW-1", "25–35 ft", "Screen", "never replace"} {
			if !strings.Contains(string(txt), s) {
				t.Errorf("MW-1.pdf text lacks %q", s)
			}
		}
	}
	// Same input, same bytes.
	first, _ := os.ReadFile(filepath.Join(outDir, "MW-1.pdf"))
	firstPNG, _ := os.ReadFile(filepath.Join(outDir, "MW-1.png"))
	code = run([]string{"render", dir, "-o", outDir, "--dpi", "40"}, io.Discard, io.Discard)
	second, _ := os.ReadFile(filepath.Join(outDir, "MW-1.pdf"))
	secondPNG, _ := os.ReadFile(filepath.Join(outDir, "MW-1.png"))
	if code != exitFindings || !bytes.Equal(first, second) || !bytes.Equal(firstPNG, secondPNG) {
		t.Errorf("second run: exit %d, PDF equal %v, PNG equal %v", code, bytes.Equal(first, second), bytes.Equal(firstPNG, secondPNG))
	}
	if !bytes.Contains(first, []byte("/CreationDate (D:20260528")) {
		t.Errorf("PDF creation date is not SOURCE_DATE_EPOCH 1780000000 (2026-05-28)")
	}
	// Nothing half-written is left behind.
	left, _ := filepath.Glob(filepath.Join(outDir, ".*tmp*"))
	if len(left) > 0 {
		t.Errorf("temporary files left: %v", left)
	}
}

func TestRenderStrictRefusesAndBadFileGoesOn(t *testing.T) {
	dir := copyDemo(t)
	bad := filepath.Join(dir, "wells", "ZZ-bad.toml")
	if err := os.WriteFile(bad, []byte("[units]\ndepth = \"ft\"\n[well]\nid = \"ZZ\"\npurpose = \"monitoring\"\ntotal_depth = [\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	outDir := t.TempDir()
	var stdout, stderr bytes.Buffer
	code := run([]string{"render", "--strict", "--format", "svg", filepath.Join(dir, "wells"), "-o", outDir}, &stdout, &stderr)
	if code != exitInput {
		t.Errorf("exit %d, want %d (a bad file)\n%s", code, exitInput, stderr.String())
	}
	if !strings.Contains(stderr.String(), "ZZ-bad.toml:") {
		t.Errorf("stderr does not name the bad file with its line:\n%s", stderr.String())
	}
	if !strings.Contains(stderr.String(), "refused under --strict") {
		t.Errorf("no --strict refusal reported:\n%s", stderr.String())
	}
	if _, err := os.Stat(filepath.Join(outDir, "MW-1.svg")); err != nil {
		t.Errorf("the good wells were not drawn after the bad one: %v", err)
	}
	if _, err := os.Stat(filepath.Join(outDir, "MW-3.svg")); err == nil {
		t.Error("--strict drew the flawed well")
	}
}

func TestRenderNamesStayInOutDir(t *testing.T) {
	dir := t.TempDir()
	src, err := demo.FS.ReadFile("wells/MW-1.toml")
	if err != nil {
		t.Fatal(err)
	}
	evil := strings.Replace(string(src), `id = "MW-1"`, `id = "../../x"`, 1)
	if evil == string(src) {
		t.Fatal("demo MW-1 has no id line to replace")
	}
	p := filepath.Join(dir, "evil.toml")
	if err := os.WriteFile(p, []byte(evil), 0o644); err != nil {
		t.Fatal(err)
	}
	outDir := filepath.Join(dir, "a", "b")
	code := run([]string{"render", p, "-o", outDir, "--format", "svg"}, io.Discard, io.Discard)
	if code != exitOK {
		t.Fatalf("exit %d", code)
	}
	if _, err := os.Stat(filepath.Join(outDir, "x.svg")); err != nil {
		t.Errorf("x.svg not in OUTDIR: %v", err)
	}
	if _, err := os.Stat(filepath.Join(dir, "x.svg")); err == nil {
		t.Error("output escaped OUTDIR")
	}
}

func TestRenderUsage(t *testing.T) {
	for _, args := range [][]string{
		{"render"},
		{"render", "x.toml", "-o", "o", "--format", "gif"},
		{"render", "x.toml", "-o", "o", "--scale", "big"},
		{"render", "x.toml", "-o", "o", "--page", "foolscap"},
	} {
		if code := run(args, io.Discard, io.Discard); code != exitUsage {
			t.Errorf("%v: exit %d, want %d", args, code, exitUsage)
		}
	}
}

// sheetFiles are a well's sheet files of one format: ID.EXT or
// ID-sheetN.EXT, not its feature summary.
func sheetFiles(dir, id, ext string) []string {
	one, _ := filepath.Glob(filepath.Join(dir, id+"."+ext))
	many, _ := filepath.Glob(filepath.Join(dir, id+"-sheet*."+ext))
	return append(one, many...)
}

// An issued set of the demo refuses MW-3 (unwaived errors) and draws the
// others; a project may ask for the issued set with issue = true.
func TestRenderIssueRefusesUnwaivedErrors(t *testing.T) {
	dir := copyDemo(t)
	for _, args := range [][]string{{"--issue"}, nil} {
		if args == nil {
			pf := filepath.Join(dir, "project.toml")
			data, err := os.ReadFile(pf)
			if err != nil {
				t.Fatal(err)
			}
			if err := os.WriteFile(pf, []byte(strings.Replace(string(data), "[project]\n", "[project]\nissue = true\n", 1)), 0o644); err != nil {
				t.Fatal(err)
			}
		}
		outDir := t.TempDir()
		var stdout, stderr bytes.Buffer
		code := run(append([]string{"render", "--format", "svg", dir, "-o", outDir}, args...), &stdout, &stderr)
		if code != exitFindings || !strings.Contains(stderr.String(), "MW-3): not issued") {
			t.Errorf("%v: exit %d, stderr:\n%s", args, code, stderr.String())
		}
		if _, err := os.Stat(filepath.Join(outDir, "MW-3.svg")); err == nil {
			t.Errorf("%v: MW-3 was issued", args)
		}
		// the refused well is not counted as rendered
		if !strings.Contains(stdout.String(), "6 rendered, 1 refused, 0 unchanged, 0 failed") {
			t.Errorf("%v: summary line:\n%s", args, stdout.String())
		}
		data, err := os.ReadFile(filepath.Join(outDir, "MW-1.svg"))
		if err != nil || !strings.Contains(string(data), "SEAL AND SIGNATURE") {
			t.Errorf("%v: MW-1 not drawn as issued (%v)", args, err)
		}
	}
}

// render --scale fit of the 1,200-ft gallery well draws one sheet and
// says on stderr, without failing (exit 0: the well is clean), that its
// description notes still take notes sheets, with the figures and what
// Tabloid would do.
func TestRenderFitSaysNotesSheetsRemain(t *testing.T) {
	t.Setenv("SOURCE_DATE_EPOCH", "1780000000")
	outDir := t.TempDir()
	var stdout, stderr bytes.Buffer
	code := run([]string{"render", "../../testdata/gallery/DS-1200.toml", "--scale", "fit", "--format", "svg", "-o", outDir}, &stdout, &stderr)
	if code != exitOK {
		t.Fatalf("exit %d, want %d\nstdout:\n%s\nstderr:\n%s", code, exitOK, stdout.String(), stderr.String())
	}
	msg := stderr.String()
	for _, want := range []string{"DS-1200: drawn on 1 sheet at 1 in = 300 ft", "147 description notes", "continue on 3 notes sheets", "a larger page (tabloid) holds them on 1"} {
		if !strings.Contains(msg, want) {
			t.Errorf("stderr lacks %q:\n%s", want, msg)
		}
	}
}
