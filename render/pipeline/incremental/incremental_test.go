package incremental

import (
	"bytes"
	"fmt"
	"os"
	"path/filepath"
	"sort"
	"strings"
	"testing"
	"time"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/pipeline/batch"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/rules"
	"github.com/tremie-dev/tremie/schema/synth"
)

// run is a render loop as the command runs it: hash every well, skip the
// fresh ones, draw the others to SVG, record, report stale outputs, save.
type run struct {
	drawn, stale []string
	sum          batch.Summary
}

func renderProject(t testing.TB, dir string, force bool) run {
	t.Helper()
	p, err := project.Load(dir)
	if err != nil {
		t.Fatal(err)
	}
	files, err := p.WellFiles()
	if err != nil {
		t.Fatal(err)
	}
	cache, err := Load(p.Output)
	if err != nil {
		t.Logf("warning: %v", err)
	}
	var logo []byte
	if p.Logo != nil {
		logo = p.Logo.Data
	}
	base := NewBase(Shared{Version: "test", Settings: p.Settings(), Template: []byte(p.Page), Logo: logo, Options: []string{"svg"}})
	if err := os.MkdirAll(p.Output, 0o755); err != nil {
		t.Fatal(err)
	}
	res, sum := batch.Run(files, batch.Options{}, func(i int, file string) (string, batch.Outcome, error) {
		key := p.Key(file)
		data, err := os.ReadFile(file)
		if err != nil {
			cache.Forget(key)
			return key, batch.Done, err
		}
		hash := base.Well(data)
		outs := []string{strings.TrimSuffix(filepath.Base(file), ".toml") + ".svg"}
		if !force && cache.Fresh(key, hash, outs) {
			return key, batch.Skipped, nil
		}
		w, err := schema.Load(file, data)
		if err != nil {
			cache.Forget(key)
			return key, batch.Done, err
		}
		project.Apply(p, w)
		svg, err := out.SVG(stubSheet(w), 0)
		if err != nil {
			return key, batch.Done, err
		}
		if err := out.WriteFileAtomic(filepath.Join(p.Output, outs[0]), svg); err != nil {
			return key, batch.Done, err
		}
		cache.Record(key, hash, outs)
		return key, batch.Done, nil
	})
	var r run
	var present []string
	for i, x := range res {
		present = append(present, p.Key(files[i]))
		if x.Outcome == batch.Done {
			r.drawn = append(r.drawn, x.Value)
		}
	}
	r.stale = cache.Stale(present)
	if err := cache.Save(); err != nil {
		t.Fatal(err)
	}
	r.sum = sum
	return r
}

// stubSheet stands in for the real layout (package render/sheet): the
// cache only cares that an output was written.
func stubSheet(w *schema.Well) *draw.Document {
	pg := &draw.Page{Width: 200, Height: 100}
	pg.Add(draw.Text{At: draw.Point{X: 10, Y: 50}, S: w.ID + " " + w.Project + " " + fmt.Sprint(len(rules.Check(w, nil))), Size: 10})
	return &draw.Document{Title: w.ID, Pages: []*draw.Page{pg}}
}

func newProject(t *testing.T, n int) string {
	t.Helper()
	dir := t.TempDir()
	if err := synth.Project(dir, n); err != nil {
		t.Fatal(err)
	}
	return dir
}

func wellPath(dir string, i int) string { return filepath.Join(dir, "wells", synth.FileName(i)) }

func TestUnchangedProjectDrawsNothing(t *testing.T) {
	dir := newProject(t, 5)
	if r := renderProject(t, dir, false); len(r.drawn) != 5 || r.sum.Failed != 0 {
		t.Fatalf("cold run drew %v (%+v)", r.drawn, r.sum)
	}
	if r := renderProject(t, dir, false); len(r.drawn) != 0 || r.sum.Skipped != 5 {
		t.Fatalf("warm run drew %v (%+v)", r.drawn, r.sum)
	}
	if r := renderProject(t, dir, true); len(r.drawn) != 5 {
		t.Fatalf("forced run drew %v", r.drawn)
	}
}

func TestEditingOneWellRedrawsExactlyThatWell(t *testing.T) {
	dir := newProject(t, 5)
	renderProject(t, dir, false)
	path := wellPath(dir, 2)
	data, _ := os.ReadFile(path)
	edited := bytes.Replace(data, []byte(`status = "active"`), []byte(`status = "inactive"`), 1)
	if bytes.Equal(edited, data) {
		t.Fatal("edit did not apply")
	}
	os.WriteFile(path, edited, 0o644)
	r := renderProject(t, dir, false)
	if fmt.Sprint(r.drawn) != "[wells/SW-0003.toml]" {
		t.Errorf("after editing SW-0003 drew %v", r.drawn)
	}
	// A new modification time with the same bytes is no change.
	later := time.Now().Add(time.Hour)
	os.Chtimes(wellPath(dir, 4), later, later)
	if r := renderProject(t, dir, false); len(r.drawn) != 0 {
		t.Errorf("after touching SW-0005 drew %v", r.drawn)
	}
}

func TestProjectSettingRedrawsAll(t *testing.T) {
	dir := newProject(t, 4)
	renderProject(t, dir, false)
	pf := filepath.Join(dir, "project.toml")
	data, _ := os.ReadFile(pf)
	os.WriteFile(pf, bytes.Replace(data, []byte(`report = "SYN-0001"`), []byte(`report = "SYN-0002"`), 1), 0o644)
	if r := renderProject(t, dir, false); len(r.drawn) != 4 {
		t.Errorf("after changing the report number drew %v", r.drawn)
	}
	// Moving the output elsewhere is not a change of what is drawn, but
	// the new directory has no outputs yet, so everything is drawn there.
	data, _ = os.ReadFile(pf)
	os.WriteFile(pf, bytes.Replace(data, []byte(`output = "out"`), []byte(`output = "out2"`), 1), 0o644)
	if r := renderProject(t, dir, false); len(r.drawn) != 4 {
		t.Errorf("into a new output directory drew %v", r.drawn)
	}
}

func TestFreshWithRecordedOutputs(t *testing.T) {
	dir := t.TempDir()
	c, _ := Load(dir)
	os.WriteFile(filepath.Join(dir, "a-sheet1.svg"), nil, 0o644)
	os.WriteFile(filepath.Join(dir, "a-sheet2.svg"), nil, 0o644)
	c.Record("a.toml", "h", []string{"a-sheet2.svg", "a-sheet1.svg"})
	if !c.Fresh("a.toml", "h", nil) || c.Fresh("a.toml", "other", nil) || c.Fresh("a.toml", "h", []string{"a.svg"}) {
		t.Error("Fresh with nil outputs must check the recorded ones and the hash")
	}
	os.Remove(filepath.Join(dir, "a-sheet2.svg"))
	if c.Fresh("a.toml", "h", nil) {
		t.Error("a recorded output is gone")
	}
}

func TestMissingOutputIsRedrawn(t *testing.T) {
	dir := newProject(t, 3)
	renderProject(t, dir, false)
	os.Remove(filepath.Join(dir, "out", "SW-0002.svg"))
	if r := renderProject(t, dir, false); fmt.Sprint(r.drawn) != "[wells/SW-0002.toml]" {
		t.Errorf("drew %v", r.drawn)
	}
}

func TestRemovedWellIsStaleNotDeleted(t *testing.T) {
	dir := newProject(t, 3)
	renderProject(t, dir, false)
	os.Remove(wellPath(dir, 0))
	r := renderProject(t, dir, false)
	if fmt.Sprint(r.stale) != "[SW-0001.svg]" || len(r.drawn) != 0 {
		t.Errorf("stale %v, drawn %v", r.stale, r.drawn)
	}
	if _, err := os.Stat(filepath.Join(dir, "out", "SW-0001.svg")); err != nil {
		t.Error("the stale output was deleted")
	}
	// Still reported on the next run, until the user removes it.
	if r := renderProject(t, dir, false); fmt.Sprint(r.stale) != "[SW-0001.svg]" {
		t.Errorf("second run: stale %v", r.stale)
	}
	os.Remove(filepath.Join(dir, "out", "SW-0001.svg"))
	if r := renderProject(t, dir, false); len(r.stale) != 0 {
		t.Errorf("after removal: stale %v", r.stale)
	}
}

func TestBadWellsDoNotStopTheOthers(t *testing.T) {
	dir := newProject(t, 6)
	// One file that is not TOML, one that cannot be read.
	os.WriteFile(wellPath(dir, 1), []byte("[units\ndepth = "), 0o644)
	// A dangling link cannot be read, even by root (who reads a 0000 file).
	os.Remove(wellPath(dir, 3))
	if err := os.Symlink("nowhere.toml", wellPath(dir, 3)); err != nil {
		t.Fatal(err)
	}
	r := renderProject(t, dir, false)
	if r.sum.Failed != 2 || r.sum.Done != 4 {
		t.Errorf("summary %+v", r.sum)
	}
	for _, i := range []int{0, 2, 4, 5} {
		if _, err := os.Stat(filepath.Join(dir, "out", synth.ID(i)+".svg")); err != nil {
			t.Errorf("%s not drawn: %v", synth.ID(i), err)
		}
	}
	// Failed wells are not recorded: they are tried again next time.
	if r := renderProject(t, dir, false); r.sum.Failed != 2 || r.sum.Skipped != 4 {
		t.Errorf("second run %+v", r.sum)
	}
}

func TestDamagedCacheDrawsEverything(t *testing.T) {
	dir := newProject(t, 2)
	renderProject(t, dir, false)
	os.WriteFile(filepath.Join(dir, "out", FileName), []byte("{not json"), 0o644)
	if _, err := Load(filepath.Join(dir, "out")); err == nil {
		t.Error("no warning for a damaged cache")
	}
	if r := renderProject(t, dir, false); len(r.drawn) != 2 {
		t.Errorf("drew %v", r.drawn)
	}
	if _, err := Load(filepath.Join(dir, "out")); err != nil {
		t.Errorf("cache not rewritten: %v", err)
	}
}

func TestCacheFileIsDeterministicAndAtomic(t *testing.T) {
	a, b := t.TempDir(), t.TempDir()
	for _, d := range []string{a, b} {
		c, _ := Load(d)
		keys := []string{"w/c.toml", "w/a.toml", "w/b.toml"}
		if d == b {
			sort.Sort(sort.Reverse(sort.StringSlice(keys)))
		}
		for _, k := range keys {
			c.Record(k, "h-"+k, []string{k + ".pdf", k + ".svg"})
		}
		if err := c.Save(); err != nil {
			t.Fatal(err)
		}
	}
	x, _ := os.ReadFile(filepath.Join(a, FileName))
	y, _ := os.ReadFile(filepath.Join(b, FileName))
	if !bytes.Equal(x, y) {
		t.Errorf("cache files differ:\n%s\n%s", x, y)
	}
	ents, _ := os.ReadDir(a)
	if len(ents) != 1 {
		t.Errorf("left behind: %v", ents)
	}
}

func TestHashSeparatesFields(t *testing.T) {
	// Moving bytes from one input to the next must change the hash.
	h1 := NewBase(Shared{Version: "1", Settings: []byte("ab"), Profile: []byte("c")}).Well([]byte("w"))
	h2 := NewBase(Shared{Version: "1", Settings: []byte("a"), Profile: []byte("bc")}).Well([]byte("w"))
	h3 := NewBase(Shared{Version: "2", Settings: []byte("ab"), Profile: []byte("c")}).Well([]byte("w"))
	if h1 == h2 || h1 == h3 || len(h1) != 64 {
		t.Errorf("%s %s %s", h1, h2, h3)
	}
}

func BenchmarkWarmCheck1000(b *testing.B) {
	dir := b.TempDir()
	if err := synth.Project(dir, 1000); err != nil {
		b.Fatal(err)
	}
	c, _ := Load(dir)
	base := NewBase(Shared{Version: "bench"})
	for i := 0; i < 1000; i++ {
		os.WriteFile(filepath.Join(dir, synth.ID(i)+".svg"), nil, 0o644)
		c.Record(synth.FileName(i), base.Well(synth.Well(i)), []string{synth.ID(i) + ".svg"})
	}
	for b.Loop() {
		for i := 0; i < 1000; i++ {
			data, _ := os.ReadFile(wellPath(dir, i))
			if !c.Fresh(synth.FileName(i), base.Well(data), []string{synth.ID(i) + ".svg"}) {
				b.Fatal("not fresh")
			}
		}
	}
}
