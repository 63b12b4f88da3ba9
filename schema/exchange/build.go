package exchange

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"slices"
	"sort"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// WellFile is one well file made by Import.
type WellFile struct {
	ID   string
	Name string // file name, <ID>.toml made safe
	Data []byte
	Well *schema.Well // as the loader read Data
}

// Import reads the workbook or CSV files and makes one well file per
// Wells row. Every cell that is wrong is reported, in sheet order; when
// any is, no file is returned.
func Import(paths ...string) ([]WellFile, []error) {
	var sheets []*sheet
	for _, p := range paths {
		s, err := readFile(p)
		if err != nil {
			return nil, []error{err}
		}
		sheets = append(sheets, s...)
	}
	var wells, intervals []*sheet
	for _, s := range sheets {
		if s.name == WellsSheet {
			wells = append(wells, s)
		} else {
			intervals = append(intervals, s)
		}
	}
	if len(wells) == 0 {
		return nil, []error{errors.New("no Wells sheet: a workbook needs one, or pass a wells CSV (see docs/import.md)")}
	}
	im := &importer{byID: map[string]*wellRows{}}
	for _, s := range wells {
		im.strayCells(s)
		im.readWells(s)
	}
	for _, s := range intervals {
		im.strayCells(s)
		im.readIntervals(s)
	}
	if len(im.order) == 0 && len(im.errs) == 0 {
		return nil, []error{fmt.Errorf("%s: the Wells sheet has no wells", wells[0].file)}
	}
	var out []WellFile
	for _, w := range im.order {
		wf, ok := im.build(w)
		if ok {
			out = append(out, wf)
		}
	}
	if len(im.errs) > 0 {
		sortErrors(im.errs)
		return nil, im.errs
	}
	names := map[string]string{}
	for i := range out {
		n := strings.ToLower(out[i].Name)
		if prev, dup := names[n]; dup {
			return nil, []error{fmt.Errorf("wells %q and %q would both be written as %s: give them IDs that differ in more than case or punctuation", prev, out[i].ID, out[i].Name)}
		}
		names[n] = out[i].ID
	}
	return out, nil
}

// entry is one key's value with the cell it came from.
type entry struct {
	key, value string
	cell       Cell
}

// item is one array-table element (or a singleton table) of a well.
type item struct {
	table string
	head  Cell // the cell a problem with the whole element is named at
	keys  []entry
	tags  []*item // a fill's tags
}

type wellRows struct {
	id       string
	idCell   Cell
	singles  map[string]*item // by table
	items    []*item          // array elements, sheet order
	strings  []*stringRows    // in order of first mention
	lastFill *item
}

type stringRows struct {
	name     string
	own      *item // the string row, if any
	sections []*item
}

type importer struct {
	byID  map[string]*wellRows
	order []*wellRows
	errs  []error
	// failed remembers the keys whose cells were already reported, by the
	// cell heading their table, so the loader's "missing required key"
	// for them is not said twice.
	failed map[Cell]map[string]bool
}

func (im *importer) fail(head Cell, key string) {
	if im.failed == nil {
		im.failed = map[Cell]map[string]bool{}
	}
	if im.failed[head] == nil {
		im.failed[head] = map[string]bool{}
	}
	im.failed[head][key] = true
}

func (im *importer) errAt(c Cell, format string, args ...any) {
	im.errs = append(im.errs, &CellError{Cell: c, Msg: fmt.Sprintf(format, args...)})
}

func sortErrors(errs []error) {
	sort.SliceStable(errs, func(i, j int) bool {
		a, aok := errs[i].(*CellError)
		b, bok := errs[j].(*CellError)
		if !aok || !bok {
			return aok && !bok
		}
		if a.Cell.File != b.Cell.File {
			return a.Cell.File < b.Cell.File
		}
		if a.Cell.Sheet != b.Cell.Sheet {
			return a.Cell.Sheet == WellsSheet
		}
		if a.Cell.Row != b.Cell.Row {
			return a.Cell.Row < b.Cell.Row
		}
		return a.Cell.Col < b.Cell.Col
	})
}

func blank(row []string) bool {
	for _, c := range row {
		if strings.TrimSpace(c) != "" {
			return false
		}
	}
	return true
}

// wellTarget maps a Wells header to its table and key.
func wellTarget(h string) (table, key string, ok bool) {
	n := normal(h)
	for _, c := range wellColumns {
		if c.name == n {
			return c.table, c.key, true
		}
	}
	if i := strings.LastIndexByte(n, '.'); i > 0 && i < len(n)-1 {
		return n[:i], n[i+1:], true
	}
	return "", "", false
}

func (im *importer) readWells(s *sheet) {
	type target struct{ table, key string }
	cols := make([]target, len(s.header))
	idCol := -1
	for i, h := range s.header {
		if strings.TrimSpace(h) == "" {
			continue
		}
		t, k, ok := wellTarget(h)
		if !ok {
			im.errAt(Cell{s.file, s.name, 1, i + 1}, "unknown column %q (the Wells columns are listed in docs/import.md; a dotted key path such as pump.description reaches any other key)", h)
			continue
		}
		cols[i] = target{t, k}
		if t == "well" && k == "id" {
			idCol = i
		}
	}
	if idCol < 0 {
		im.errAt(Cell{s.file, s.name, 1, 0}, "no well_id column")
		return
	}
	for ri, row := range s.rows {
		if blank(row) {
			continue
		}
		rowNum := ri + 2
		idCell := Cell{s.file, s.name, rowNum, idCol + 1}
		id := ""
		if idCol < len(row) {
			id = strings.TrimSpace(row[idCol])
		}
		if id == "" {
			im.errAt(idCell, "well_id is empty")
			continue
		}
		if prev, dup := im.byID[id]; dup {
			im.errAt(idCell, "well %q is already on row %d", id, prev.idCell.Row)
			continue
		}
		w := &wellRows{id: id, idCell: idCell, singles: map[string]*item{}}
		im.byID[id] = w
		im.order = append(im.order, w)
		for ci, text := range row {
			if ci >= len(cols) || cols[ci].table == "" || strings.TrimSpace(text) == "" {
				continue
			}
			c := Cell{s.file, s.name, rowNum, ci + 1}
			t := cols[ci]
			it := w.singles[t.table]
			if it == nil {
				it = &item{table: t.table, head: c}
				w.singles[t.table] = it
			}
			v, err := tomlValue(listed(t.table, t.key, text), typeOf(t.table, t.key))
			if err != nil {
				im.errAt(c, "%s: %v", s.header[ci], err)
				im.fail(it.head, t.key)
				continue
			}
			it.keys = append(it.keys, entry{t.key, v, c})
		}
	}
}

func (im *importer) readIntervals(s *sheet) {
	idCol, kindCol, stringCol := -1, -1, -1
	names := make([]string, len(s.header))
	for i, h := range s.header {
		n := normal(h)
		names[i] = n
		switch n {
		case "well_id":
			idCol = i
		case "kind":
			kindCol = i
		case "string":
			stringCol = i
		}
	}
	if idCol < 0 || kindCol < 0 {
		im.errAt(Cell{s.file, s.name, 1, 0}, "the Intervals sheet needs well_id and kind columns")
		return
	}
	get := func(row []string, i int) string {
		if i < 0 || i >= len(row) {
			return ""
		}
		return strings.TrimSpace(row[i])
	}
	for ri, row := range s.rows {
		if blank(row) {
			continue
		}
		rowNum := ri + 2
		idCell := Cell{s.file, s.name, rowNum, idCol + 1}
		kindCell := Cell{s.file, s.name, rowNum, kindCol + 1}
		w := im.byID[get(row, idCol)]
		if w == nil {
			if get(row, idCol) == "" {
				im.errAt(idCell, "well_id is empty")
			} else {
				im.errAt(idCell, "well %q is not on the Wells sheet", get(row, idCol))
			}
			continue
		}
		kind := strings.ToLower(get(row, kindCol))
		table, ok := tableOfKind(kind)
		if !ok {
			im.errAt(kindCell, "kind %q is not one of %s", get(row, kindCol), strings.Join(kindNames(), ", "))
			continue
		}
		it := &item{table: table, head: kindCell}
		if sectionKinds[kind] {
			it.keys = append(it.keys, entry{"kind", quote(kind), kindCell})
		}
		for ci, text := range row {
			// The string column places a section in its string; a water
			// level's is its own key, the string it was measured in.
			if ci == idCol || ci == kindCol || ci == stringCol && table != "water_level" || ci >= len(names) || names[ci] == "" || strings.TrimSpace(text) == "" {
				continue
			}
			c := Cell{s.file, s.name, rowNum, ci + 1}
			key := names[ci]
			if key == kindColumn(table) {
				key = "kind"
			} else if strings.HasSuffix(key, "_kind") && key != "kind" {
				im.errAt(c, "%s is not a column of %s rows", s.header[ci], kind)
				continue
			}
			v, err := tomlValue(listed(table, key, text), typeOf(table, key))
			if err != nil {
				im.errAt(c, "%s: %v", s.header[ci], err)
				im.fail(it.head, key)
				continue
			}
			it.keys = append(it.keys, entry{key, v, c})
		}
		switch {
		case sectionKinds[kind], kind == "string":
			name := get(row, stringCol)
			if kind == "string" {
				name = ""
				for _, e := range it.keys {
					if e.key == "name" {
						name = strings.Trim(e.value, `"`)
					}
				}
			} else if name != "" && stringCol >= 0 {
				_ = name
			}
			sr := w.stringNamed(name)
			if kind == "string" {
				if sr.own != nil {
					im.errAt(kindCell, "string %q already has its row (row %d)", name, sr.own.head.Row)
					continue
				}
				sr.own = it
			} else {
				sr.sections = append(sr.sections, it)
			}
		case kind == "tag":
			if w.lastFill == nil {
				im.errAt(kindCell, "a tag row belongs to the fill row above it, and well %q has none yet", w.id)
				continue
			}
			w.lastFill.tags = append(w.lastFill.tags, it)
		default:
			if kind == "fill" {
				w.lastFill = it
			}
			w.items = append(w.items, it)
		}
	}
}

func (w *wellRows) stringNamed(name string) *stringRows {
	for _, s := range w.strings {
		if s.name == name {
			return s
		}
	}
	s := &stringRows{name: name}
	w.strings = append(w.strings, s)
	return s
}

func kindNames() []string {
	var out []string
	for _, k := range intervalKinds {
		out = append(out, k.kind)
	}
	return out
}

// tableOrder is the order tables are written in, as schema/FORMAT.md
// documents them; others follow in name order.
var tableOrder = []string{"units", "well", "drilling", "location", "elevation", "measuring_point", "pump",
	"borehole", "casing", "string", "fill", "open_hole", "lithology", "water_level", "sample",
	"surface", "surface.protective", "surface.vault", "surface.pad", "waiver", "orientation", "wall_image", "feature"}

func rank(table string) int {
	if i := slices.Index(tableOrder, table); i >= 0 {
		return i
	}
	return len(tableOrder)
}

// doc is a well file being written, with the cell behind each line.
type doc struct {
	b     strings.Builder
	cells []Cell
}

func (d *doc) line(s string, c Cell) {
	d.b.WriteString(s)
	d.b.WriteByte('\n')
	d.cells = append(d.cells, c)
}

func (d *doc) table(header string, it *item) {
	if d.b.Len() > 0 {
		d.line("", Cell{})
	}
	d.line(header, it.head)
	for _, e := range sortedKeys(it) {
		d.line(e.key+" = "+e.value, e.cell)
	}
}

// build writes one well's file and loads it; the loader's complaints are
// named at the cells behind their lines.
func (im *importer) build(w *wellRows) (WellFile, bool) {
	var d doc
	d.line("# "+w.id+": imported from "+w.idCell.File+" by tremie import", w.idCell)
	singles := make([]string, 0, len(w.singles))
	for t := range w.singles {
		singles = append(singles, t)
	}
	sort.Slice(singles, func(i, j int) bool {
		ri, rj := rank(singles[i]), rank(singles[j])
		if ri != rj {
			return ri < rj
		}
		return singles[i] < singles[j]
	})
	arrays := slices.Clone(w.items)
	sort.SliceStable(arrays, func(i, j int) bool { return rank(arrays[i].table) < rank(arrays[j].table) })
	// Singleton tables and arrays interleave in the documented order;
	// sub-tables of a singleton ([surface.pad]) stay after it.
	si, ai := 0, 0
	stringsDone := false
	writeStrings := func() {
		for _, s := range w.strings {
			head := w.idCell
			if s.own != nil {
				head = s.own.head
			} else if len(s.sections) > 0 {
				head = s.sections[0].head
			}
			own := &item{table: "string", head: head}
			if s.own != nil {
				own.keys = s.own.keys
			} else if s.name != "" {
				own.keys = []entry{{"name", quote(s.name), head}}
			}
			d.table("[[string]]", own)
			for _, sec := range s.sections {
				d.table("[[string.section]]", sec)
			}
		}
		stringsDone = true
	}
	for si < len(singles) || ai < len(arrays) || !stringsDone {
		next := len(tableOrder) + 1
		if si < len(singles) {
			next = rank(singles[si])
		}
		if ai < len(arrays) && rank(arrays[ai].table) < next {
			next = rank(arrays[ai].table)
		}
		if !stringsDone && rank("string") <= next {
			writeStrings()
			continue
		}
		if si < len(singles) && rank(singles[si]) == next {
			d.table("["+singles[si]+"]", w.singles[singles[si]])
			si++
			continue
		}
		it := arrays[ai]
		ai++
		d.table("[["+it.table+"]]", it)
		for _, tag := range it.tags {
			d.table("[[fill.tag]]", tag)
		}
	}
	data := []byte(d.b.String())
	name := schema.SafeFileName(w.id) + ".toml"
	well, err := schema.Load(name, data)
	if err != nil {
		var list schema.ErrorList
		if errors.As(err, &list) {
			for _, e := range list {
				c := w.idCell
				if e.Line >= 1 && e.Line <= len(d.cells) && d.cells[e.Line-1].File != "" {
					c = d.cells[e.Line-1]
				}
				if k, ok := strings.CutPrefix(e.Msg, "missing required key \""); ok {
					if i := strings.IndexByte(k, '"'); i > 0 && im.failed[c][k[:i]] {
						continue // its cell is already reported
					}
				}
				im.errAt(c, "%s", e.Msg)
			}
		} else {
			im.errAt(w.idCell, "%v", err)
		}
		return WellFile{}, false
	}
	return WellFile{ID: w.id, Name: name, Data: data, Well: well}, true
}

// Destinations are the paths the files go to in dir, and those of them
// that exist already.
func Destinations(dir string, files []WellFile) (paths, existing []string) {
	for _, f := range files {
		p := filepath.Join(dir, f.Name)
		paths = append(paths, p)
		if _, err := os.Lstat(p); err == nil {
			existing = append(existing, p)
		}
	}
	return paths, existing
}

// sortedKeys are an element's keys in the key table's order (the order of
// schema/FORMAT.md), keys it does not know last, each group as written.
func sortedKeys(it *item) []entry {
	var names []string
	if k := tableSpec(it.table); k != nil {
		names = k.Names()
	}
	keys := slices.Clone(it.keys)
	sort.SliceStable(keys, func(i, j int) bool {
		a, b := slices.Index(names, keys[i].key), slices.Index(names, keys[j].key)
		if a < 0 {
			a = len(names)
		}
		if b < 0 {
			b = len(names)
		}
		return a < b
	})
	return keys
}

// Taken names every well file already in dir (or a folder below it),
// other than the paths the import writes, whose ID is that of an
// imported well (compared without case): the two would be one well twice,
// and every later command would refuse both. A file that does not load
// is left to tremie check.
func Taken(dir string, files []WellFile, paths []string) []error {
	if _, err := os.Stat(dir); err != nil {
		return nil // a new folder holds nothing yet
	}
	found, _ := schema.FindWells([]string{dir})
	written := map[string]bool{}
	for _, p := range paths {
		if abs, err := filepath.Abs(p); err == nil {
			written[abs] = true
		}
	}
	var errs []error
	for _, f := range found {
		if abs, err := filepath.Abs(f); err != nil || written[abs] {
			continue
		}
		w, err := schema.LoadFile(f)
		if err != nil || w == nil {
			continue
		}
		for _, im := range files {
			if strings.EqualFold(strings.TrimSpace(w.ID), strings.TrimSpace(im.ID)) {
				errs = append(errs, &schema.Error{File: f, Line: w.Line("well.id"), Key: "well.id",
					Msg: fmt.Sprintf("well ID %q is already this file's: importing %s beside it would make two wells of one ID (rename one, or import into another folder)", w.ID, im.Name)})
			}
		}
	}
	return errs
}
