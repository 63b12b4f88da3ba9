package sheet

import (
	"bytes"
	"encoding/xml"
	"flag"
	"fmt"
	"io"
	"io/fs"
	"os"
	"path"
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/cmd/tremie/demo"
	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
	"github.com/tremie-dev/tremie/templates"
)

var update = flag.Bool("update", false, "rewrite the golden SVGs under testdata/golden from the current layout")

// demoWells reads every demo well with the inputs and options tremie
// render would use, by file name.
func demoWells(t testing.TB) map[string]demoWell {
	t.Helper()
	pdata, err := demo.FS.ReadFile("project.toml")
	if err != nil {
		t.Fatal(err)
	}
	prj, err := project.Parse("demo", "project.toml", pdata)
	if err != nil {
		t.Fatal(err)
	}
	tpl, err := templates.Load(prj.Page, prj.Landscape)
	if err != nil {
		t.Fatal(err)
	}
	names, err := fs.Glob(demo.FS, "wells/*.toml")
	if err != nil || len(names) < 6 {
		t.Fatalf("demo wells: %v (%d)", err, len(names))
	}
	out := map[string]demoWell{}
	for _, n := range names {
		data, err := demo.FS.ReadFile(n)
		if err != nil {
			t.Fatal(err)
		}
		w, err := schema.Load(n, data)
		if err != nil {
			t.Fatalf("%s: %v", n, err)
		}
		project.Apply(prj, w)
		in := Inputs{Findings: rules.Check(w, nil), Quantities: quantity.Compute(w, nil), TitleBlock: prj.TitleBlock}
		in.WallImages = demoWallImages(t, w)
		out[path.Base(n)] = demoWell{w: w, in: in, opt: Options{Page: FromTemplate(tpl)}}
	}
	return out
}

type demoWell struct {
	w   *schema.Well
	in  Inputs
	opt Options
}

// demoDocs lays out every demo well as tremie render would.
func demoDocs(t testing.TB) map[string]*draw.Document {
	t.Helper()
	docs := map[string]*draw.Document{}
	for n, d := range demoWells(t) {
		doc, err := Layout(d.w, d.in, d.opt)
		if err != nil {
			t.Fatalf("%s: %v", n, err)
		}
		docs[n] = doc
	}
	return docs
}

func TestGoldenDemoSheets(t *testing.T) {
	dir := filepath.Join("testdata", "golden")
	if *update {
		if err := os.MkdirAll(dir, 0o755); err != nil {
			t.Fatal(err)
		}
	}
	for name, doc := range demoDocs(t) {
		base := name[:len(name)-len(".toml")]
		for i := range doc.Pages {
			got, err := out.SVG(doc, i)
			if err != nil {
				t.Fatalf("%s sheet %d: %v", name, i+1, err)
			}
			if err := parsesAsXML(got); err != nil {
				t.Errorf("%s sheet %d: SVG does not parse (encoding/xml): %v", name, i+1, err)
			}
			file := filepath.Join(dir, base+".svg")
			if len(doc.Pages) > 1 {
				file = filepath.Join(dir, fmt.Sprintf("%s-sheet%d.svg", base, i+1))
			}
			if *update {
				if err := os.WriteFile(file, got, 0o644); err != nil {
					t.Fatal(err)
				}
				continue
			}
			want, err := os.ReadFile(file)
			if err != nil {
				t.Errorf("%s: %v (run go test ./render/sheet -run Golden -update)", file, err)
				continue
			}
			if !bytes.Equal(got, want) {
				t.Errorf("%s differs from the layout (%d bytes now, %d golden) at byte %d; review with -update and git diff", file, len(got), len(want), firstDiff(got, want))
			}
		}
	}
}

func parsesAsXML(b []byte) error {
	dec := xml.NewDecoder(bytes.NewReader(b))
	for {
		if _, err := dec.Token(); err == io.EOF {
			return nil
		} else if err != nil {
			return err
		}
	}
}

func firstDiff(a, b []byte) int {
	for i := 0; i < len(a) && i < len(b); i++ {
		if a[i] != b[i] {
			return i
		}
	}
	return min(len(a), len(b))
}

// Every demo sheet shows what the issue asks of a sheet: the caution, a
// legend holding exactly the symbols painted on it, and callouts.
func TestDemoSheetsContents(t *testing.T) {
	for name, doc := range demoDocs(t) {
		for i, p := range doc.Pages {
			if len(texts(p, "caution")) == 0 {
				t.Errorf("%s sheet %d: no caution", name, i+1)
			}
			legend := map[string]bool{}
			for _, b := range boxes(p, "legend:") {
				legend[b.Role[len("legend:"):]] = true
			}
			body := boxes(p, "body")
			if len(body) != 1 {
				continue // a notes sheet
			}
			painted := map[string]bool{}
			p.Walk(func(it draw.Item) {
				if b, ok := it.(draw.Box); ok && len(b.Role) > 7 && b.Role[:7] == "symbol " && b.Y >= body[0].Y && b.Bottom() <= body[0].Bottom() {
					painted[b.Role[7:]] = true
				}
			})
			// Every pattern painted in the drawing is in the legend, and
			// every pattern in the legend was painted in the drawing.
			inDual := func(id string) bool {
				// A dual soil (soil:SW-SM) paints bands of both its groups.
				for l := range legend {
					if g, ok := strings.CutPrefix(l, "soil:"); ok && strings.Contains(g, "-") {
						for _, part := range strings.Split(g, "-") {
							if "soil:"+part == id {
								return true
							}
						}
					}
				}
				return false
			}
			for id := range painted {
				if !legend[id] && !inDual(id) {
					t.Errorf("%s sheet %d: %s painted but not in the legend", name, i+1, id)
				}
			}
			for id := range legend {
				if strings.HasPrefix(id, "fill:") || strings.HasPrefix(id, "rock:") || strings.HasPrefix(id, "soil:") && !strings.Contains(id, "-") {
					if !painted[id] {
						t.Errorf("%s sheet %d: legend lists %s, not painted on the sheet", name, i+1, id)
					}
				}
			}
			if len(boxes(p, "callout:")) < 3 {
				t.Errorf("%s sheet %d: %d callouts", name, i+1, len(boxes(p, "callout:")))
			}
		}
	}
}
