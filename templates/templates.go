// Package templates holds tremie's page templates: the sheet sizes a
// construction log is drawn on (Letter, Tabloid, A4, A3), each with its
// margin, title-block height, legend area and column widths, written as
// small TOML files embedded in the binary. README.md describes the
// fields. All lengths are returned in points (1/72 in), the unit of the
// drawing model.
package templates

import (
	"bytes"
	"embed"
	"errors"
	"fmt"
	"math"
	"sort"
	"strconv"
	"strings"

	"github.com/BurntSushi/toml"
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

// file is a template as written.
type file struct {
	Title      string  `toml:"title"`
	Width      length  `toml:"width"`
	Height     length  `toml:"height"`
	Margin     length  `toml:"margin"`
	TitleBlock length  `toml:"title_block"`
	Legend     legend  `toml:"legend"`
	Columns    Columns `toml:"columns"`
	Landscape  struct {
		TitleBlock length   `toml:"title_block"`
		Legend     *legend  `toml:"legend"`
		Columns    *Columns `toml:"columns"`
	} `toml:"landscape"`
}

type legend struct {
	Side string `toml:"side"`
	Size length `toml:"size"`
}

// Parse reads a template written in the format README.md describes;
// name is used in messages and as the template's Name.
func Parse(name string, data []byte, landscape bool) (*Template, error) {
	var f file
	md, err := toml.NewDecoder(bytes.NewReader(data)).Decode(&f)
	if err != nil {
		var pe toml.ParseError
		if errors.As(err, &pe) {
			return nil, fmt.Errorf("%s.toml:%d: %s", name, pe.Position.Line, pe.Message)
		}
		return nil, fmt.Errorf("%s.toml: %w", name, err)
	}
	if und := md.Undecoded(); len(und) > 0 {
		return nil, fmt.Errorf("%s.toml: unknown key %q", name, und[0].String())
	}
	t := &Template{
		Name: name, Title: f.Title, Landscape: landscape,
		Width: f.Width.pt, Height: f.Height.pt, Margin: f.Margin.pt, TitleBlock: f.TitleBlock.pt,
		Legend:  Legend{Side: f.Legend.Side, Size: f.Legend.Size.pt},
		Columns: f.Columns,
	}
	if landscape {
		t.Width, t.Height = math.Max(t.Width, t.Height), math.Min(t.Width, t.Height)
		if f.Landscape.TitleBlock.set {
			t.TitleBlock = f.Landscape.TitleBlock.pt
		}
		if l := f.Landscape.Legend; l != nil {
			t.Legend = Legend{Side: l.Side, Size: l.Size.pt}
		}
		if c := f.Landscape.Columns; c != nil {
			t.Columns = *c
		}
	}
	if err := t.check(); err != nil {
		return nil, fmt.Errorf("%s.toml: %w", name, err)
	}
	return t, nil
}

func (t *Template) check() error {
	switch {
	case t.Title == "":
		return errors.New("title is missing")
	case !(t.Width > 0 && t.Height > 0):
		return errors.New("width and height must be given and positive")
	case t.Margin < 0 || 2*t.Margin >= math.Min(t.Width, t.Height):
		return fmt.Errorf("margin %.1f pt leaves no room on a %.0f × %.0f pt page", t.Margin, t.Width, t.Height)
	case t.Legend.Side != "bottom" && t.Legend.Side != "right":
		return fmt.Errorf("legend side %q: use \"bottom\" or \"right\"", t.Legend.Side)
	}
	_, _, w, h := t.Body()
	if w <= 0 || h <= 0 || t.TitleBlock < 0 || t.Legend.Size < 0 {
		return errors.New("title block and legend leave no room for the body")
	}
	c := t.Columns
	for _, v := range []float64{c.Depth, c.Elevation, c.Lithology, c.USCS, c.Description, c.Well, c.Callouts} {
		if !(v >= 0) {
			return fmt.Errorf("column fraction %g is negative", v)
		}
	}
	if s := c.Sum(); math.Abs(s-1) > 1e-6 {
		return fmt.Errorf("column fractions sum to %g, not 1", s)
	}
	return nil
}

// length is a TOML string such as "8.5in", "210mm", "2.5cm" or "24pt",
// held in points.
type length struct {
	pt  float64
	set bool
}

// Points per unit: 72 per inch by the PostScript and PDF definition of
// the point; 25.4 mm to the inch exactly (international inch, 1959).
var perUnit = map[string]float64{"in": 72, "mm": 72 / 25.4, "cm": 720 / 25.4, "pt": 1}

func (l *length) UnmarshalText(b []byte) error {
	s := strings.TrimSpace(string(b))
	for unit, k := range perUnit {
		if num, ok := strings.CutSuffix(s, unit); ok {
			v, err := strconv.ParseFloat(strings.TrimSpace(num), 64)
			if err != nil || math.IsNaN(v) || math.IsInf(v, 0) || v < 0 {
				return fmt.Errorf("length %q: want a non-negative number and a unit (in, mm, cm, pt)", s)
			}
			l.pt, l.set = v*k, true
			return nil
		}
	}
	return fmt.Errorf("length %q: give a unit (in, mm, cm, pt)", s)
}
