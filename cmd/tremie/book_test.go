package main

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/pdfcpu/pdfcpu/pkg/api"
	"github.com/pdfcpu/pdfcpu/pkg/pdfcpu/model"

	"github.com/tremie-dev/tremie/schema/synth"
)

func TestBookBindsEveryReadableWell(t *testing.T) {
	dir := spoiledProject(t, 6)
	out := filepath.Join(t.TempDir(), "book.pdf")
	var stdout, stderr bytes.Buffer
	if code := run([]string{"book", dir, "-o", out}, &stdout, &stderr); code != exitInput {
		t.Errorf("exit %d, want %d (one unreadable file); stderr:\n%s", code, exitInput, stderr.String())
	}
	pdf, err := os.ReadFile(out)
	if err != nil {
		t.Fatal(err)
	}
	conf := model.NewDefaultConfiguration()
	conf.ValidationMode = model.ValidationStrict
	if err := api.Validate(bytes.NewReader(pdf), conf); err != nil {
		t.Fatalf("pdfcpu validation: %v", err)
	}
	bms, err := api.Bookmarks(bytes.NewReader(pdf), nil)
	if err != nil {
		t.Fatal(err)
	}
	var ids []string
	for _, b := range bms {
		if b.Title == "Well sheets" {
			for _, k := range b.Kids {
				ids = append(ids, k.Title)
			}
		}
	}
	// Wells 1 and 2 cannot be read; well 3 has errors and is drawn.
	want := []string{synth.ID(0), synth.ID(3), synth.ID(4), synth.ID(5)}
	if strings.Join(ids, " ") != strings.Join(want, " ") {
		t.Errorf("well bookmarks %v, want %v", ids, want)
	}
	// Same project, same bytes.
	again := filepath.Join(t.TempDir(), "again.pdf")
	run([]string{"book", dir, "-o", again}, &stdout, &stderr)
	if b, _ := os.ReadFile(again); !bytes.Equal(b, pdf) {
		t.Error("a second run wrote different bytes")
	}
}

func TestBookDefaultsToTheOutputFolder(t *testing.T) {
	dir := t.TempDir()
	if err := synth.Project(dir, 2); err != nil {
		t.Fatal(err)
	}
	var stdout, stderr bytes.Buffer
	if code := run([]string{"book", dir}, &stdout, &stderr); code != exitOK {
		t.Fatalf("exit %d: %s", code, stderr.String())
	}
	if _, err := os.Stat(filepath.Join(dir, "out", "book.pdf")); err != nil {
		t.Fatal(err)
	}
	if code := run([]string{"book"}, &stdout, &stderr); code != exitUsage {
		t.Errorf("no directory: exit %d", code)
	}
}
