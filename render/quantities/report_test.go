package quantities

import (
	"bytes"
	"errors"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/pipeline"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/schematest"
	"github.com/tremie-dev/tremie/schema/starter"
)

// demoWells is the demo project's wells, which tremie demo writes.
var demoWells = filepath.Join("..", "..", "cmd", "tremie", "demo", "wells")

// fixture is a rule's test well.
func fixture(rule, name string) string {
	return filepath.Join("..", "..", "schema", "rules", "testdata", rule, name)
}

func writeFile(t *testing.T, dir, name, body string) string {
	t.Helper()
	p := filepath.Join(dir, name)
	if err := os.WriteFile(p, []byte(body), 0o644); err != nil {
		t.Fatal(err)
	}
	return p
}

// build resolves the paths as a command does and builds their report.
func build(t *testing.T, opt Options, paths ...string) (*Report, []Problem) {
	t.Helper()
	run, err := pipeline.Resolve(paths, pipeline.Options{Quiet: true})
	if err != nil {
		t.Fatal(err)
	}
	if len(run.Problems) > 0 {
		t.Fatalf("resolving %v: %v", paths, run.Problems)
	}
	return Build(run, opt)
}

// written is the report in a format.
func written(t *testing.T, format string, rep *Report) string {
	t.Helper()
	var b bytes.Buffer
	if err := Write(&b, format, rep); err != nil {
		t.Fatal(err)
	}
	return b.String()
}

// report builds the paths' report with the default contingency, failing
// on any problem, and writes it in a format.
func report(t *testing.T, format string, paths ...string) string {
	t.Helper()
	rep, problems := build(t, Options{Contingency: quantity.DefaultContingency}, paths...)
	if len(problems) > 0 {
		t.Fatalf("problems: %v", problems)
	}
	return written(t, format, rep)
}

func TestFormats(t *testing.T) {
	if got := strings.Join(Formats(), " "); got != "text json csv" {
		t.Errorf("formats %q, want the default text first", got)
	}
	if err := Write(&bytes.Buffer{}, "xml", &Report{}); err == nil || !strings.Contains(err.Error(), "text, json, csv") {
		t.Errorf("unknown format: %v", err)
	}
}

// An interval whose geometry fails (a fill below the recorded hole) is a
// problem at its [[fill]]'s line, and the rest is still computed; an
// unreadable file is a problem of its own and the other wells still come
// out.
func TestBuildProblems(t *testing.T) {
	dir := t.TempDir()
	body := strings.Replace(schematest.PlannedWell, "[[fill]]\ntop = 20.0\nbottom = 30.0", "[[fill]]\ntop = 20.0\nbottom = 35.0", 1)
	body = strings.Replace(body, "total_depth = 30.0", "total_depth = 35.0", 1)
	g := writeFile(t, dir, "G.toml", body)
	b := writeFile(t, dir, "B.toml", strings.Replace(strings.Replace(schematest.PlannedWell, "PL-1", "PL-2", 2), "bottom = 17.0", "botom = 17.0", 1))
	rep, problems := build(t, Options{}, g, b)
	if len(problems) != 2 {
		t.Fatalf("problems %v, want the pack's geometry and B.toml", problems)
	}
	// the pack is the first [[fill]], on line 32 of PlannedWell
	if p := problems[0]; p.Unreadable || p.Error() != g+":32: fill[0]: at 30–35 ft: no borehole section covers it" {
		t.Errorf("interval problem %q", p.Error())
	}
	var list schema.ErrorList
	if p := problems[1]; !p.Unreadable || p.File != b || !errors.As(p, &list) || !strings.Contains(p.Error(), "botom") {
		t.Errorf("unreadable problem %+v", p)
	}
	if len(rep.Wells) != 1 {
		t.Fatalf("%d wells, want G only", len(rep.Wells))
	}
	out := written(t, "text", rep)
	if !strings.Contains(out, "bentonite-chips") || !strings.Contains(out, "cannot be computed") {
		t.Errorf("output:\n%s", out)
	}
}

// A planned metric well with a 2000 mm hole for 50 mm pipe (DN50, OD
// 60.3 mm, ASTM D1785) is reported as a likely unit slip (33.2 times the
// OD, above the common-practice 10) and left out of the order, which
// would otherwise buy some 800 bags of sand for it; the other planned
// well (schematest.PlannedWell) is still ordered for.
func TestBuildHoldsBackUnitSlip(t *testing.T) {
	dir := t.TempDir()
	b, err := starter.Well(starter.Options{ID: "SL-1", Kind: "planned", Units: schema.Metres})
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(string(b), "diameter = 210.0") {
		t.Fatal("the starter's hole is not 210 mm")
	}
	writeFile(t, dir, "SL-1.toml", strings.Replace(string(b), "diameter = 210.0", "diameter = 2000.0", 1))
	writeFile(t, dir, "PL-1.toml", schematest.PlannedWell)
	rep, _ := build(t, Options{Contingency: quantity.DefaultContingency}, dir)
	if strings.Join(rep.Order.Held, " ") != "SL-1" || strings.Join(rep.Order.For, " ") != "PL-1" {
		t.Errorf("held %v, ordering for %v", rep.Order.Held, rep.Order.For)
	}
	out := written(t, "text", rep)
	for _, s := range []string{"error SIZE-PLAUSIBLE", "33.2 times the 60.3 mm OD", "Order for the planned wells PL-1\n",
		"Left out of both lists: SL-1, whose sizes are likely a unit slip (rule SIZE-PLAUSIBLE)"} {
		if !strings.Contains(out, s) {
			t.Errorf("output lacks %q:\n%s", s, out)
		}
	}
}
