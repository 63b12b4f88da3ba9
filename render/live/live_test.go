package live

import (
	"bytes"
	"context"
	"crypto/sha256"
	"fmt"
	"image"
	"image/color"
	"image/png"
	"io"
	"io/fs"
	"net/http"
	"net/http/httptest"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"
	"time"

	"github.com/fsnotify/fsnotify"
	"github.com/tremie-dev/tremie/cmd/tremie/demo"
)

// demoProject copies the demo project into a temporary directory.
func demoProject(t *testing.T) string {
	t.Helper()
	dir := t.TempDir()
	err := fs.WalkDir(demo.FS, ".", func(p string, d fs.DirEntry, err error) error {
		if err != nil {
			return err
		}
		if d.IsDir() {
			return os.MkdirAll(filepath.Join(dir, p), 0o755)
		}
		data, err := demo.FS.ReadFile(p)
		if err != nil {
			return err
		}
		return os.WriteFile(filepath.Join(dir, p), data, 0o644)
	})
	if err != nil {
		t.Fatal(err)
	}
	return dir
}

func get(t *testing.T, h http.Handler, path string) (int, string) {
	t.Helper()
	rec := httptest.NewRecorder()
	h.ServeHTTP(rec, httptest.NewRequest("GET", path, nil))
	b, _ := io.ReadAll(rec.Result().Body)
	return rec.Code, string(b)
}

// TestServesOnlyItsOwnOutputs: the page, its parts and the sheets held in
// memory answer; any path naming a file, inside the project or out of
// it, does not.
func TestServesOnlyItsOwnOutputs(t *testing.T) {
	dir := demoProject(t)
	before := tree(t, dir)
	s, err := New(dir)
	if err != nil {
		t.Fatal(err)
	}
	h := s.Handler()
	if code, body := get(t, h, "/"); code != 200 || !strings.Contains(body, "MW-3") {
		t.Errorf("page: %d", code)
	}
	if code, body := get(t, h, "/sheet/0/0.svg"); code != 200 || !strings.HasPrefix(strings.TrimSpace(body), "<") {
		t.Errorf("sheet: %d", code)
	}
	for _, p := range []string{
		"/project.toml", "/wells/MW-1.toml", "/sheet/../project.toml", "/sheet/0/../../project.toml",
		"/../../etc/passwd", "/%2e%2e/%2e%2e/etc/passwd", "/sheet/%2e%2e/%2e%2e/etc/passwd", "/sheet/-1/0.svg",
		"/sheet/99/0.svg", "/sheet/0/99.svg", "/sheet/0/x.svg", "/static/../project.toml", "/wells/../project.toml/",
	} {
		code, body := get(t, h, p)
		if code == 200 && (strings.Contains(body, "[project]") || strings.Contains(body, "root:")) {
			t.Errorf("%s served a file (%d)", p, code)
		}
		if code == 200 && p != "/wells" {
			t.Errorf("%s: %d, want an error", p, code)
		}
	}
	// and it wrote nothing into the project
	if after := tree(t, dir); after != before {
		t.Errorf("the project changed while served:\n%s\nnow:\n%s", before, after)
	}
}

// countingServer serves dir, recording how many wells each refresh drew.
func countingServer(t *testing.T, dir string) (*Server, *[]int) {
	t.Helper()
	var redrawn []int
	s, err := New(dir)
	if err != nil {
		t.Fatal(err)
	}
	s.Prepared = func(n int) { redrawn = append(redrawn, n) }
	return s, &redrawn
}

// tree lists every file under dir with its size and content hash.
func tree(t *testing.T, dir string) string {
	var b strings.Builder
	err := filepath.WalkDir(dir, func(p string, d fs.DirEntry, err error) error {
		if err != nil || d.IsDir() {
			return err
		}
		data, err := os.ReadFile(p)
		if err != nil {
			return err
		}
		fmt.Fprintf(&b, "%s %d %x\n", p, len(data), sha256.Sum256(data))
		return nil
	})
	if err != nil {
		t.Fatal(err)
	}
	return b.String()
}

// TestRefreshIsIncremental: a change to one well file redraws that well
// only; a change to the project file redraws every well; a syntax error
// is shown with file and line and recovers.
func TestRefreshIsIncremental(t *testing.T) {
	dir := demoProject(t)
	s, redrawn := countingServer(t, dir)
	if len(s.wells) != 7 {
		t.Fatalf("%d wells", len(s.wells))
	}
	s.Refresh()
	mw1 := filepath.Join(dir, "wells", "MW-1.toml")
	src, _ := os.ReadFile(mw1)
	os.WriteFile(mw1, []byte(strings.Replace(string(src), "dark brown", "reddish brown", 1)), 0o644)
	s.Refresh()
	prj := filepath.Join(dir, "project.toml")
	psrc, _ := os.ReadFile(prj)
	os.WriteFile(prj, []byte(strings.Replace(string(psrc), `revision = "0"`, `revision = "1"`, 1)), 0o644)
	s.Refresh()
	if want := []int{0, 1, 7}; !slices.Equal(*redrawn, want) {
		t.Errorf("wells redrawn per refresh %v, want %v", *redrawn, want)
	}
	var m *Well
	for _, w := range s.wells {
		if w.ID == "MW-1" {
			m = w
		}
	}
	if m == nil || !strings.Contains(string(m.Sheets[0].SVG), "reddish") {
		t.Fatal("MW-1 not redrawn with the change")
	}
	os.WriteFile(mw1, append([]byte(strings.Replace(string(src), "dark brown", "reddish brown", 1)), "x = = 1\n"...), 0o644)
	s.Refresh()
	_, body := get(t, s.Handler(), "/wells")
	if !strings.Contains(body, "wells/MW-1.toml:") || !strings.Contains(body, "TOML syntax") {
		t.Errorf("no file:line for the syntax error:\n%s", body)
	}
	os.WriteFile(mw1, src, 0o644)
	s.Refresh()
	for _, w := range s.wells {
		if w.Key == "wells/MW-1.toml" && (w.Problems != nil || len(w.Sheets) == 0) {
			t.Errorf("MW-1 did not recover: %v", w.Problems)
		}
	}
}

// TestServeStops: Serve returns when its context ends.
func TestServeStops(t *testing.T) {
	s, err := New(demoProject(t))
	if err != nil {
		t.Fatal(err)
	}
	ctx, cancel := context.WithCancel(context.Background())
	done := make(chan error, 1)
	addr := make(chan string, 1)
	go func() { done <- s.Serve(ctx, "127.0.0.1:0", func(a string) { addr <- a }) }()
	a := <-addr
	resp, err := http.Get("http://" + a + "/")
	if err != nil || resp.StatusCode != 200 {
		t.Fatalf("GET: %v", err)
	}
	resp.Body.Close()
	cancel()
	select {
	case err := <-done:
		if err != nil {
			t.Error(err)
		}
	case <-time.After(5 * time.Second):
		t.Fatal("Serve did not stop")
	}
}

// TestPageNamesTheProfile: each well's findings name the thresholds they
// were checked with: the defaults, or the project's profile by name, file
// and the code it follows.
func TestPageNamesTheProfile(t *testing.T) {
	dir := demoProject(t)
	s, err := New(dir)
	if err != nil {
		t.Fatal(err)
	}
	if _, body := get(t, s.Handler(), "/"); !strings.Contains(body, "Rule thresholds are defaults to be set to the local rules.") {
		t.Errorf("defaults not named")
	}
	if err := os.WriteFile(filepath.Join(dir, "county.profile.toml"), []byte("[profile]\nname = \"Tarn County code\"\nsource = \"Tarn County Code ch. 7 (invented)\"\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	prj := filepath.Join(dir, "project.toml")
	data, _ := os.ReadFile(prj)
	if err := os.WriteFile(prj, []byte(strings.Replace(string(data), "[project]\n", "[project]\nprofile = \"county.profile.toml\"\n", 1)), 0o644); err != nil {
		t.Fatal(err)
	}
	s, err = New(dir)
	if err != nil {
		t.Fatal(err)
	}
	_, body := get(t, s.Handler(), "/")
	if !strings.Contains(body, "Rule thresholds from profile &#34;Tarn County code&#34; (county.profile.toml), following Tarn County Code ch. 7 (invented).") ||
		strings.Contains(body, "thresholds are defaults") {
		t.Errorf("the page does not name the profile in force")
	}
}

// TestWallImageRedrawsItsWell: a wall image changed on disk redraws the
// well that shows it, and only that well, as a changed well file does;
// the watcher takes an image's events and watches its folder.
func TestWallImageRedrawsItsWell(t *testing.T) {
	dir := demoProject(t)
	s, redrawn := countingServer(t, dir)
	var before []byte
	for _, w := range s.wells {
		if w.ID == "BR-1" {
			if len(w.Images) != 1 {
				t.Fatalf("BR-1 names %v as its images, want its one wall image", w.Images)
			}
			before = w.Sheets[0].SVG
		}
	}
	img := filepath.Join(dir, "wells", "BR-1-wall.png")
	data, err := os.ReadFile(img)
	if err != nil {
		t.Fatal(err)
	}
	s.Refresh()
	// A darker copy of the image, so that the strip on the sheet changes.
	src, err := png.Decode(bytes.NewReader(data))
	if err != nil {
		t.Fatal(err)
	}
	b := src.Bounds()
	dark := image.NewGray(b)
	for y := b.Min.Y; y < b.Max.Y; y++ {
		for x := b.Min.X; x < b.Max.X; x++ {
			r, _, _, _ := src.At(x, y).RGBA()
			dark.SetGray(x, y, color.Gray{Y: uint8(r >> 10)})
		}
	}
	var buf bytes.Buffer
	if err := png.Encode(&buf, dark); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(img, buf.Bytes(), 0o644); err != nil {
		t.Fatal(err)
	}
	later := time.Now().Add(time.Second) // a time of its own, whatever the clock's grain
	os.Chtimes(img, later, later)
	s.Refresh()
	if !slices.Equal(*redrawn, []int{0, 1}) {
		t.Errorf("wells redrawn per refresh %v, want [0 1]", *redrawn)
	}
	for _, w := range s.wells {
		if w.ID == "BR-1" && bytes.Equal(w.Sheets[0].SVG, before) {
			t.Error("BR-1's sheet is the same after its wall image changed")
		}
	}
	if !slices.Contains(s.watchDirs(), filepath.Join(dir, "wells")) {
		t.Errorf("the image's folder is not watched: %v", s.watchDirs())
	}
	for name, want := range map[string]bool{"BR-1-wall.png": true, "core.JPG": true, "log.tiff": true, "notes.txt": false, ".BR-1-wall.png.swp": false} {
		if got := relevant(fsnotify.Event{Name: filepath.Join(dir, name), Op: fsnotify.Write}); got != want {
			t.Errorf("a write to %s is relevant: %v, want %v", name, got, want)
		}
	}
}

// TestProblemsReported: a broken project file does not stop the server;
// its problems, with file and line, are there at start (the command
// prints them), and OnProblems hears of each change to them: fixed, a
// well file broken, the same problems again (no call).
func TestProblemsReported(t *testing.T) {
	dir := demoProject(t)
	proj := filepath.Join(dir, "project.toml")
	good, err := os.ReadFile(proj)
	if err != nil {
		t.Fatal(err)
	}
	lines := strings.Count(string(good), "\n")
	if err := os.WriteFile(proj, append(slices.Clone(good), "bogus = = 1\n"...), 0o644); err != nil {
		t.Fatal(err)
	}
	s, err := New(dir)
	if err != nil {
		t.Fatal(err)
	}
	want := fmt.Sprintf("project.toml:%d:9: TOML syntax", lines+1)
	// named relative to the project, as its wells are
	if p := s.Problems(); len(p) != 1 || !strings.HasPrefix(p[0].Error(), want) {
		t.Fatalf("at start: %v, want one problem %q", p, want)
	}
	os.WriteFile(proj, append(slices.Clone(good), "titel = 1\n"...), 0o644)
	s.Refresh()
	if p := s.Problems(); len(p) != 1 || !strings.HasPrefix(p[0].Error(), "project.toml:") || !strings.Contains(p[0].Error(), " takes: ") {
		t.Fatalf("an unknown key: %v, want one problem naming project.toml with its hint", p)
	}
	// the page says why it shows no well, rather than an empty index
	if _, body := get(t, s.Handler(), "/"); !strings.Contains(body, "No well to show until the problem above is fixed.") || strings.Contains(body, `class="index"`) {
		t.Error("a page without wells does not say why")
	}
	os.WriteFile(proj, append(slices.Clone(good), "bogus = = 1\n"...), 0o644)
	s.Refresh()
	var heard [][]error
	s.OnProblems = func(p []error) { heard = append(heard, p) }
	if err := os.WriteFile(proj, good, 0o644); err != nil {
		t.Fatal(err)
	}
	s.Refresh()
	if len(heard) != 1 || len(heard[0]) != 0 || len(s.Problems()) != 0 {
		t.Fatalf("after the fix: heard %v, problems %v", heard, s.Problems())
	}
	s.Refresh()
	if len(heard) != 1 {
		t.Fatalf("nothing changed, yet heard %v", heard[1:])
	}
	well := filepath.Join(dir, "wells", "MW-2.toml")
	if err := os.WriteFile(well, []byte("[well]\nid = \"MW-2\"\nbogus = = 1\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	s.Refresh()
	if len(heard) != 2 || len(heard[1]) != 1 || !strings.HasPrefix(heard[1][0].Error(), "wells/MW-2.toml:3:9: TOML syntax") {
		t.Fatalf("a broken well: heard %v", heard[1:])
	}
}
