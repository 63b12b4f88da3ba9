package exchange

import (
	"fmt"
	"slices"
	"sort"
	"strconv"
	"strings"
	"time"

	"github.com/tremie-dev/tremie/schema"
)

// value is one cell to write: a number or text ("" = blank).
type value struct {
	num   *float64
	text  string
	isNum bool
}

func textValue(s string) value { return value{text: s} }
func numValue(v float64) value { return value{num: &v, isNum: true} }

// book is a workbook in the layout: the columns and rows of both sheets.
type book struct {
	wellCols, intervalCols []string
	wells, intervals       []map[string]value
}

// Layout reads well files and lays them out in the import layout, as they
// are written (file units, the keys each file gives), so that importing
// the workbook gives the same wells back. A key the named columns do not
// cover gets a dotted-path column (Wells) or a column of its own name
// (Intervals).
func Layout(files []string) (*Workbook, error) {
	b := &book{}
	for _, f := range files {
		data, err := schema.ReadInput(f, schema.MaxTextFile)
		if err != nil {
			return nil, err
		}
		tree, err := schema.DecodeTOML(f, data)
		if err != nil {
			return nil, err
		}
		if err := b.add(tree); err != nil {
			return nil, fmt.Errorf("%s: %v", f, err)
		}
	}
	b.settleColumns()
	return &Workbook{b: b}, nil
}

// Workbook is a layout ready to write.
type Workbook struct{ b *book }

func (b *book) add(tree map[string]any) error {
	row := map[string]value{}
	wellID := ""
	if w, ok := tree["well"].(map[string]any); ok {
		wellID, _ = w["id"].(string)
	}
	var walkSingle func(path string, m map[string]any) error
	walkSingle = func(path string, m map[string]any) error {
		for k, v := range m {
			if sub, ok := v.(map[string]any); ok {
				if err := walkSingle(path+"."+k, sub); err != nil {
					return err
				}
				continue
			}
			if _, ok := v.([]map[string]any); ok {
				return fmt.Errorf("[[%s.%s]] has no place in the import layout", path, k)
			}
			row[wellColumnFor(path, k)] = cellOf(v)
		}
		return nil
	}
	var arrays []string
	for k, v := range tree {
		switch t := v.(type) {
		case map[string]any:
			if err := walkSingle(k, t); err != nil {
				return err
			}
		case []map[string]any:
			arrays = append(arrays, k)
		default:
			return fmt.Errorf("top-level key %q has no place in the import layout", k)
		}
	}
	b.wells = append(b.wells, row)
	sort.SliceStable(arrays, func(i, j int) bool {
		if rank(arrays[i]) != rank(arrays[j]) {
			return rank(arrays[i]) < rank(arrays[j])
		}
		return arrays[i] < arrays[j]
	})
	for _, table := range arrays {
		for _, el := range tree[table].([]map[string]any) {
			if err := b.addItem(wellID, table, el, ""); err != nil {
				return err
			}
		}
	}
	return nil
}

// addItem writes one array element as a row, and its nested arrays (a
// string's sections, a fill's tags) after it.
func (b *book) addItem(wellID, table string, el map[string]any, parentString string) error {
	row := map[string]value{"well_id": textValue(wellID)}
	kind := kindOfTable(table)
	if table == "string.section" {
		k, _ := el["kind"].(string)
		kind = k
		row["string"] = textValue(parentString)
	}
	row["kind"] = textValue(kind)
	var nested []string
	for k, v := range el {
		if _, ok := v.([]map[string]any); ok {
			nested = append(nested, k)
			continue
		}
		if _, ok := v.(map[string]any); ok {
			return fmt.Errorf("[%s.%s] has no place in the import layout", table, k)
		}
		if k == "kind" {
			if table == "string.section" {
				continue
			}
			k = kindColumn(table)
		}
		row[k] = cellOf(v)
	}
	b.intervals = append(b.intervals, row)
	slices.Sort(nested)
	name, _ := el["name"].(string)
	for _, k := range nested {
		for _, sub := range el[k].([]map[string]any) {
			if err := b.addItem(wellID, table+"."+k, sub, name); err != nil {
				return err
			}
		}
	}
	return nil
}

func wellColumnFor(table, key string) string {
	for _, c := range wellColumns {
		if c.table == table && c.key == key {
			return c.name
		}
	}
	return table + "." + key
}

// cellOf writes a TOML value as the layout's cell.
func cellOf(v any) value {
	switch t := v.(type) {
	case string:
		return textValue(t)
	case int64:
		return numValue(float64(t))
	case float64:
		return numValue(t)
	case bool:
		return textValue(strconv.FormatBool(t))
	case time.Time:
		// The TOML decoder marks local dates and date-times by the name
		// of the time's zone.
		switch t.Location().String() {
		case "date-local":
			return textValue(t.Format("2006-01-02"))
		case "datetime-local":
			return textValue(t.Format("2006-01-02T15:04:05"))
		}
		return textValue(t.Format(time.RFC3339))
	case []any:
		var parts []string
		sep := "; "
		for _, e := range t {
			switch x := e.(type) {
			case string:
				sep = "\n"
				parts = append(parts, x)
			case []any:
				var pair []string
				for _, n := range x {
					pair = append(pair, numberText(n))
				}
				parts = append(parts, strings.Join(pair, " "))
			default:
				parts = append(parts, numberText(x))
			}
		}
		return textValue(strings.Join(parts, sep))
	}
	return textValue(fmt.Sprint(v))
}

func numberText(v any) string {
	switch n := v.(type) {
	case int64:
		return strconv.FormatInt(n, 10)
	case float64:
		return formatNumber(n)
	}
	return fmt.Sprint(v)
}

// settleColumns fixes both sheets' columns: the named ones, then any
// others the wells use, in name order.
func (b *book) settleColumns() {
	b.wellCols = nil
	for _, c := range wellColumns {
		b.wellCols = append(b.wellCols, c.name)
	}
	b.wellCols = appendExtra(b.wellCols, b.wells)
	b.intervalCols = nil
	for _, c := range intervalColumns {
		b.intervalCols = append(b.intervalCols, c.name)
	}
	b.intervalCols = appendExtra(b.intervalCols, b.intervals)
}

func appendExtra(cols []string, rows []map[string]value) []string {
	var extra []string
	for _, r := range rows {
		for k := range r {
			if !slices.Contains(cols, k) && !slices.Contains(extra, k) {
				extra = append(extra, k)
			}
		}
	}
	slices.Sort(extra)
	return append(cols, extra...)
}
