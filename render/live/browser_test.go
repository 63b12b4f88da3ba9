package live

import (
	"context"
	"fmt"
	"io"
	"net/http"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"github.com/chromedp/chromedp"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/rules"
)

// chromium finds a Chromium or Chrome to drive, "" when there is none.
func chromium() string {
	for _, name := range []string{"chromium", "chromium-browser", "google-chrome", "headless-shell"} {
		if p, err := exec.LookPath(name); err == nil {
			return p
		}
	}
	return ""
}

// TestBrowser drives a real headless Chromium: the page lists the demo's
// wells, shows MW-3's findings with file and line, and when a well file
// is edited on disk the open page shows the new sheet by itself, keeping
// its scroll position; a syntax error shows file:line and recovers.
// TREMIE_LOOK=DIR keeps screenshots of the page to look at.
func TestBrowser(t *testing.T) {
	exe := chromium()
	if exe == "" {
		msg := "browser test skipped: no Chromium on PATH (Debian: apt-get install chromium; .ci/run installs it)"
		fmt.Println(msg) // visible without -v
		t.Skip(msg)
	}
	dir := demoProject(t)
	s, err := New(dir)
	if err != nil {
		t.Fatal(err)
	}
	ctx, cancel := context.WithCancel(context.Background())
	defer cancel()
	addrc := make(chan string, 1)
	served := make(chan error, 1)
	go func() { served <- s.Serve(ctx, "127.0.0.1:0", func(a string) { addrc <- a }) }()
	base := "http://" + <-addrc

	opts := append(chromedp.DefaultExecAllocatorOptions[:], chromedp.ExecPath(exe), chromedp.NoSandbox,
		chromedp.DisableGPU, chromedp.WindowSize(1200, 900))
	actx, acancel := chromedp.NewExecAllocator(ctx, opts...)
	defer acancel()
	bctx, bcancel := chromedp.NewContext(actx)
	defer bcancel()
	// The first action starts the browser and must run without a timeout.
	if err := chromedp.Do(bctx, chromedp.Navigate(base+"/")); err != nil {
		t.Fatalf("open the page: %v", err)
	}
	waitJS(t, bctx, `document.querySelectorAll('section.well').length > 0`)
	ids := eval[[]string](t, bctx, `Array.from(document.querySelectorAll('section.well')).map(s => s.dataset.id)`)
	want := []string{"BR-1", "MW-1", "MW-2", "MW-3", "MW-4", "NW-1", "PW-1"}
	if strings.Join(ids, ",") != strings.Join(want, ",") {
		t.Errorf("wells on the page %v, want %v", ids, want)
	}

	// MW-3's findings, as the library finds them, each with file:line
	mw3 := eval[string](t, bctx, `document.querySelector('section[data-id="MW-3"]').innerText`)
	for _, f := range expectedFindings(t, dir, "MW-3.toml") {
		if want := fmt.Sprintf("wells/MW-3.toml:%d", f.Line); !strings.Contains(mw3, want) || !strings.Contains(mw3, f.Rule) {
			t.Errorf("MW-3's section lacks %s %s", want, f.Rule)
		}
	}
	if !strings.Contains(mw3, "errors") || !strings.Contains(mw3, "Quantities") {
		t.Errorf("MW-3's section lacks its status or quantities:\n%s", mw3)
	}
	look(t, bctx, "serve-page.png")

	// scroll MW-1 into view, edit its file, see the new sheet
	sel := `section[data-id="MW-1"] .sheets img`
	eval[float64](t, bctx, `document.querySelector('section[data-id="MW-1"]').scrollIntoView(); window.scrollBy(0, 40); window.scrollY`)
	time.Sleep(300 * time.Millisecond)
	y0 := eval[float64](t, bctx, `window.scrollY`)
	before := waitAttr(t, bctx, sel, "src", func(v string) bool { return v != "" })
	mw1 := filepath.Join(dir, "wells", "MW-1.toml")
	src, _ := os.ReadFile(mw1)
	edited := strings.Replace(string(src), "Sandy SILT, dark brown", "Sandy SILT, reddish brown", 1)
	if edited == string(src) {
		t.Fatal("the demo's MW-1 changed: update the edit")
	}
	start := time.Now()
	if err := os.WriteFile(mw1, []byte(edited), 0o644); err != nil {
		t.Fatal(err)
	}
	after := waitAttr(t, bctx, sel, "src", func(v string) bool { return v != "" && v != before })
	took := time.Since(start)
	t.Logf("the open page showed MW-1's new sheet %v after the file was saved", took.Round(time.Millisecond))
	if took > 3*time.Second { // the target is one second; the shared test machine is slow
		t.Errorf("the page took %v to update", took)
	}
	if svg := fetch(t, base+after); !strings.Contains(svg, "reddish") {
		t.Error("the new sheet does not show the edit")
	}
	y1 := eval[float64](t, bctx, `window.scrollY`)
	if d := y1 - y0; d > 2 || d < -2 {
		t.Errorf("scroll moved from %v to %v", y0, y1)
	}
	look(t, bctx, "serve-edited.png")

	// a syntax error shows file:line instead of the sheet, and recovers
	if err := os.WriteFile(mw1, []byte(edited+"x = = 1\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	problem := waitText(t, bctx, `section[data-key="wells/MW-1.toml"]`, func(s string) bool { return strings.Contains(s, "TOML syntax") })
	if !strings.Contains(problem, "wells/MW-1.toml:") {
		t.Errorf("no file:line in %q", problem)
	}
	look(t, bctx, "serve-syntax.png")
	if err := os.WriteFile(mw1, []byte(edited), 0o644); err != nil {
		t.Fatal(err)
	}
	waitAttr(t, bctx, sel, "src", func(v string) bool { return v != "" })

	cancel()
	select {
	case err := <-served:
		if err != nil {
			t.Error(err)
		}
	case <-time.After(10 * time.Second):
		t.Error("the server did not stop")
	}
}

func expectedFindings(t *testing.T, dir, file string) []rules.Finding {
	w, err := schema.LoadFile(filepath.Join(dir, "wells", file))
	if err != nil {
		t.Fatal(err)
	}
	p, err := project.Load(dir)
	if err != nil {
		t.Fatal(err)
	}
	project.Apply(p, w)
	fs := rules.Check(w, nil)
	if len(fs) < 3 {
		t.Fatalf("%s has only %d findings", file, len(fs))
	}
	return fs
}

// waitAttr polls an attribute of the first match of sel until ok.
func waitAttr(t *testing.T, ctx context.Context, sel, attr string, ok func(string) bool) string {
	t.Helper()
	deadline := time.Now().Add(15 * time.Second)
	for time.Now().Before(deadline) {
		js := fmt.Sprintf(`(function(){var e=document.querySelector(%q); return e ? e.getAttribute(%q) || "" : ""})()`, sel, attr)
		if v, err := chromedp.Run(ctx, chromedp.Evaluate[string](js)); err == nil && ok(v) {
			return v
		}
		time.Sleep(25 * time.Millisecond)
	}
	t.Fatalf("%s[%s] never changed", sel, attr)
	return ""
}

func waitText(t *testing.T, ctx context.Context, sel string, ok func(string) bool) string {
	t.Helper()
	deadline := time.Now().Add(15 * time.Second)
	for time.Now().Before(deadline) {
		js := fmt.Sprintf(`(function(){var e=document.querySelector(%q); return e ? e.innerText : ""})()`, sel)
		if v, err := chromedp.Run(ctx, chromedp.Evaluate[string](js)); err == nil && ok(v) {
			return v
		}
		time.Sleep(25 * time.Millisecond)
	}
	t.Fatalf("%s never showed what was expected", sel)
	return ""
}

// waitJS polls a JavaScript condition until it holds.
func waitJS(t *testing.T, ctx context.Context, cond string) {
	t.Helper()
	deadline := time.Now().Add(15 * time.Second)
	for time.Now().Before(deadline) {
		if ok, err := chromedp.Run(ctx, chromedp.Evaluate[bool](cond)); err == nil && ok {
			return
		}
		time.Sleep(25 * time.Millisecond)
	}
	t.Fatalf("never true: %s", cond)
}

// eval runs JavaScript in the page and returns its value.
func eval[T any](t *testing.T, ctx context.Context, js string) T {
	t.Helper()
	v, err := chromedp.Run(ctx, chromedp.Evaluate[T](js))
	if err != nil {
		t.Fatalf("%s: %v", js, err)
	}
	return v
}

func fetch(t *testing.T, url string) string {
	resp, err := http.Get(url)
	if err != nil {
		t.Fatal(err)
	}
	defer resp.Body.Close()
	b, _ := io.ReadAll(resp.Body)
	return string(b)
}

// look saves a screenshot of the viewport to $TREMIE_LOOK, if set.
func look(t *testing.T, ctx context.Context, name string) {
	dir := os.Getenv("TREMIE_LOOK")
	if dir == "" {
		return
	}
	time.Sleep(400 * time.Millisecond)
	png, err := chromedp.Run(ctx, chromedp.CaptureScreenshot())
	if err != nil {
		t.Errorf("screenshot: %v", err)
		return
	}
	if err := os.MkdirAll(dir, 0o755); err != nil {
		t.Error(err)
	}
	if err := os.WriteFile(filepath.Join(dir, name), png, 0o644); err != nil {
		t.Error(err)
	}
}
