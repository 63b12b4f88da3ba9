// Package templates holds tremie's page templates: the sheet sizes a
// construction log is drawn on (Letter, Tabloid, A4, A3), each with its
// margin, title-block height, legend area and column widths, written as
// small TOML files embedded in the binary. README.md describes the
// fields. All lengths are returned in points (1/72 in), the unit of the
// drawing model.
package templates

import (
	"embed"
	"fmt"
	"math"
	"sort"
	"strconv"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

//go:embed *.toml
var files embed.FS

// Template is one page layout, portrait or landscape.
type Template struct {
	Name      string // file name without .toml: "letter", "tabloid", "a4", "a3"
	Title     string // for people: "Letter (8.5 × 11 in)"
	Landscape bool

	Width, Height float64 // points, as oriented
	Margin        float64 // points, on all four sides
	TitleBlock    float64 // points: height of the title block at the top of the area inside the margins
	Legend        Legend
	Columns       Columns
}

// Legend is where the legend and notes go, inside the margins and below
// the title block.
type Legend struct {
	Side string  // "bottom": a band under the body; "right": a column beside it
	Size float64 // points: the band's height, or the column's width
}

// Columns are the body's columns, left to right, as fractions of the
// body's width (the width inside the margins, less a right-side legend).
// They sum to 1.
type Columns struct {
	Depth       float64 `toml:"depth"`       // depth axis, below ground
	Elevation   float64 `toml:"elevation"`   // elevation axis
	Lithology   float64 `toml:"lithology"`   // lithology pattern
	USCS        float64 `toml:"uscs"`        // USCS group symbol
	Description float64 `toml:"description"` // the log's description, wrapped
	Well        float64 `toml:"well"`        // the well drawn to scale
	Callouts    float64 `toml:"callouts"`    // labels with leader lines
}

// Sum is the total of the fractions.
func (c Columns) Sum() float64 {
	return c.Depth + c.Elevation + c.Lithology + c.USCS + c.Description + c.Well + c.Callouts
}

// Content is the area inside the margins.
func (t *Template) Content() (x, y, w, h float64) {
	return t.Margin, t.Margin, t.Width - 2*t.Margin, t.Height - 2*t.Margin
}

// Body is the area for the columns: inside the margins, below the title
// block, beside or above the legend.
func (t *Template) Body() (x, y, w, h float64) {
	x, y, w, h = t.Content()
	y += t.TitleBlock
	h -= t.TitleBlock
	if t.Legend.Side == "right" {
		w -= t.Legend.Size
	} else {
		h -= t.Legend.Size
	}
	return x, y, w, h
}

// Names lists the templates, sorted.
func Names() []string {
	entries, _ := files.ReadDir(".")
	var names []string
	for _, e := range entries {
		if n, ok := strings.CutSuffix(e.Name(), ".toml"); ok {
			names = append(names, n)
		}
	}
	sort.Strings(names)
	return names
}

// aliases are other names people use for the same sheets.
var aliases = map[string]string{
	"us-letter": "letter", "ansi-a": "letter",
	"ansi-b": "tabloid", "ledger": "tabloid", "11x17": "tabloid",
}

// Load returns a template by name (case-insensitive; "ansi-a", "ansi-b",
// "ledger" and "11x17" are accepted too), turned when landscape. An
// unknown name is an error that lists the valid ones.
func Load(name string, landscape bool) (*Template, error) {
	key := strings.ToLower(strings.TrimSpace(name))
	if a, ok := aliases[key]; ok {
		key = a
	}
	var data []byte
	var err error
	if !strings.ContainsAny(key, `/\.`) {
		data, err = files.ReadFile(key + ".toml")
	}
	if data == nil || err != nil {
		return nil, fmt.Errorf("unknown page %q: use one of %s", name, strings.Join(Names(), ", "))
	}
	return Parse(key, data, landscape)
}

// Parse reads a template written in the format README.md describes;
// name is used in messages and as the template's Name. It reads strictly
// (schema.Doc): every problem is reported, with name.toml:line:col, in one
// schema.ErrorList.
func Parse(name string, data []byte, landscape bool) (*Template, error) {
	doc, err := schema.ParseDoc(name+".toml", data, nil)
	if err != nil {
		return nil, err
	}
	root := doc.Root()
	t := &Template{Name: name, Title: root.Str("title"), Landscape: landscape}
	t.Width = readLength(doc, root, "width")
	t.Height = readLength(doc, root, "height")
	t.Margin = readLength(doc, root, "margin")
	t.TitleBlock = readLength(doc, root, "title_block")
	t.Legend = readLegend(doc, root.Sub("legend"))
	t.Columns = readColumns(root.Sub("columns"))
	where := map[string]string{"title_block": "title_block", "legend": "legend", "columns": "columns"}
	if lt := root.Sub("landscape"); lt != nil {
		tb := readLength(doc, lt, "title_block")
		legend, columns := lt.Sub("legend"), lt.Sub("columns")
		if landscape {
			if lt.Has("title_block") {
				t.TitleBlock, where["title_block"] = tb, "landscape.title_block"
			}
			if legend != nil {
				t.Legend, where["legend"] = readLegend(doc, legend), "landscape.legend"
			}
			if columns != nil {
				t.Columns, where["columns"] = readColumns(columns), "landscape.columns"
			}
		} else {
			readLegend(doc, legend)
			readColumns(columns)
		}
		lt.Done()
	}
	root.Done()
	if err := doc.Err(); err != nil {
		return nil, err
	}
	if landscape {
		t.Width, t.Height = math.Max(t.Width, t.Height), math.Min(t.Width, t.Height)
	}
	t.check(doc, where)
	if err := doc.Err(); err != nil {
		return nil, err
	}
	return t, nil
}

func readLegend(doc *schema.Doc, t *schema.Table) Legend {
	if t == nil {
		return Legend{}
	}
	l := Legend{Side: t.Str("side"), Size: readLength(doc, t, "size")}
	t.Done()
	return l
}

func readColumns(t *schema.Table) Columns {
	if t == nil {
		return Columns{}
	}
	num := func(k string) float64 { v, _ := t.Num(k); return v }
	c := Columns{Depth: num("depth"), Elevation: num("elevation"), Lithology: num("lithology"), USCS: num("uscs"),
		Description: num("description"), Well: num("well"), Callouts: num("callouts")}
	t.Done()
	return c
}

// check records what makes the template unusable at the key that sets it;
// where names the table each of title_block, legend and columns came from.
func (t *Template) check(doc *schema.Doc, where map[string]string) {
	switch {
	case t.Title == "":
		doc.Errorf("", "title is missing")
	case !(t.Width > 0 && t.Height > 0):
		doc.Errorf("width", "width and height must be given and positive")
	case t.Margin < 0 || 2*t.Margin >= math.Min(t.Width, t.Height):
		doc.Errorf("margin", "margin %.1f pt leaves no room on a %.0f × %.0f pt page", t.Margin, t.Width, t.Height)
	case t.Legend.Side != "bottom" && t.Legend.Side != "right":
		doc.Errorf(where["legend"]+".side", "legend side %q: use \"bottom\" or \"right\"", t.Legend.Side)
	}
	if _, _, w, h := t.Body(); w <= 0 || h <= 0 || t.TitleBlock < 0 || t.Legend.Size < 0 {
		doc.Errorf(where["title_block"], "title block and legend leave no room for the body")
	}
	c := t.Columns
	for _, v := range []float64{c.Depth, c.Elevation, c.Lithology, c.USCS, c.Description, c.Well, c.Callouts} {
		if !(v >= 0) {
			doc.Errorf(where["columns"], "column fraction %g is negative", v)
		}
	}
	if s := c.Sum(); math.Abs(s-1) > 1e-6 {
		doc.Errorf(where["columns"], "column fractions sum to %g, not 1", s)
	}
}

// readLength reads a length key in points; an error is recorded at it.
func readLength(doc *schema.Doc, t *schema.Table, k string) float64 {
	s := t.Str(k)
	if s == "" {
		return 0
	}
	pt, err := parseLength(s)
	if err != nil {
		doc.Errorf(joinPath(t.Path(), k), "%s: %v", k, err)
	}
	return pt
}

func joinPath(table, k string) string {
	if table == "" {
		return k
	}
	return table + "." + k
}

// Points per unit: 72 per inch by the PostScript and PDF definition of
// the point; 25.4 mm to the inch exactly (international inch, 1959).
var perUnit = map[string]float64{"in": 72, "mm": 72 / 25.4, "cm": 720 / 25.4, "pt": 1}

// parseLength reads a length such as "8.5in", "210mm", "2.5cm" or "24pt"
// in points.
func parseLength(s string) (float64, error) {
	s = strings.TrimSpace(s)
	for unit, k := range perUnit {
		if num, ok := strings.CutSuffix(s, unit); ok {
			v, err := strconv.ParseFloat(strings.TrimSpace(num), 64)
			if err != nil || math.IsNaN(v) || math.IsInf(v, 0) || v < 0 {
				return 0, fmt.Errorf("length %q: want a non-negative number and a unit (in, mm, cm, pt)", s)
			}
			return v * k, nil
		}
	}
	return 0, fmt.Errorf("length %q: give a unit (in, mm, cm, pt)", s)
}
