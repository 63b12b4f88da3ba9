package exchange

import (
	"fmt"
	"math"
	"strconv"
	"strings"
	"time"

	"github.com/tremie-dev/tremie/schema"
)

// tomlValue turns a cell's text into the TOML value of a key of type t,
// or says what is wrong with it.
func tomlValue(text string, t valueType) (string, error) {
	s := strings.TrimSpace(text)
	switch t {
	case tNumber:
		return number(s)
	case tInteger:
		v, err := strconv.ParseFloat(s, 64)
		// a billion is far above any count a well table holds, and well
		// inside int64 and exact in a float64
		if err != nil || v != math.Trunc(v) || math.Abs(v) > 1e9 {
			return "", fmt.Errorf("%q is not a whole number", s)
		}
		return strconv.FormatInt(int64(v), 10), nil
	case tBool:
		switch strings.ToLower(s) {
		case "true", "yes", "1":
			return "true", nil
		case "false", "no", "0":
			return "false", nil
		}
		return "", fmt.Errorf("%q is not true or false", s)
	case tDate:
		d, _, err := dateTime(s)
		if err != nil {
			return "", err
		}
		return d, nil
	case tDateTime:
		d, tm, err := dateTime(s)
		if err != nil {
			return "", err
		}
		if tm == "" {
			return d, nil
		}
		return d + "T" + tm, nil
	case tStrings:
		var parts []string
		for _, line := range strings.Split(strings.ReplaceAll(text, "\r\n", "\n"), "\n") {
			if line = strings.TrimSpace(line); line != "" {
				parts = append(parts, quote(line))
			}
		}
		return "[" + strings.Join(parts, ", ") + "]", nil
	case tNumbers:
		var parts []string
		for _, f := range splitList(s) {
			n, err := number(f)
			if err != nil {
				return "", err
			}
			parts = append(parts, n)
		}
		return "[" + strings.Join(parts, ", ") + "]", nil
	case tPairs:
		var parts []string
		for _, p := range strings.Split(s, ";") {
			f := strings.Fields(strings.ReplaceAll(p, ",", " "))
			if len(f) == 0 {
				continue
			}
			if len(f) != 2 {
				return "", fmt.Errorf("%q is not a pair of numbers (write pairs as \"a b; c d\")", strings.TrimSpace(p))
			}
			a, err := number(f[0])
			if err != nil {
				return "", err
			}
			b, err := number(f[1])
			if err != nil {
				return "", err
			}
			parts = append(parts, "["+a+", "+b+"]")
		}
		return "[" + strings.Join(parts, ", ") + "]", nil
	}
	return quote(text), nil
}

// listed is a cell of a key with a list of values written as the list
// spells it when it differs only in case or surrounding spaces
// (" Monitoring " is monitoring): a spreadsheet capitalises what is
// typed into a cell. Any other text is left for the loader to name.
func listed(table, key, text string) string {
	k := keySpec(table, key)
	if k == nil {
		return text
	}
	for _, v := range k.Enum {
		if strings.EqualFold(strings.TrimSpace(text), v) {
			return v
		}
	}
	return text
}

func splitList(s string) []string {
	var out []string
	for _, f := range strings.FieldsFunc(s, func(r rune) bool { return r == ';' || r == ',' }) {
		if f = strings.TrimSpace(f); f != "" {
			out = append(out, f)
		}
	}
	return out
}

// number writes a number as a TOML float, as the key table's writer
// does: the shortest decimal that reads back to the same value, with a
// decimal point (36.0).
func number(s string) (string, error) {
	v, err := strconv.ParseFloat(strings.TrimSpace(s), 64)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		return "", fmt.Errorf("%q is not a number", s)
	}
	return schema.TOMLValue(schema.TypeNumber, v), nil
}

// formatNumber writes a number for a cell's text: as short as it reads
// back exactly, no decimal point on a whole number.
func formatNumber(v float64) string {
	if v == math.Trunc(v) && math.Abs(v) < 1e15 { // below 2^53: every whole number is exact, and fits int64
		return strconv.FormatInt(int64(v), 10)
	}
	return strconv.FormatFloat(v, 'f', -1, 64)
}

// Spreadsheet serial dates count days from 1899-12-30 (the 1900 date
// system as spreadsheet programs compute it after 1900-03-01).
var serialEpoch = time.Date(1899, 12, 30, 0, 0, 0, 0, time.UTC)

// dateTime reads "2026-03-09", "2026-03-09T10:40:00", "2026-03-09 10:40"
// or a serial number, and returns the date and the time ("" if none)
// as TOML writes them.
func dateTime(s string) (date, clock string, err error) {
	if v, perr := strconv.ParseFloat(s, 64); perr == nil {
		if v < 1 || v > 2958465 { // 9999-12-31
			return "", "", fmt.Errorf("%q is not a date", s)
		}
		days := math.Floor(v)
		t := serialEpoch.AddDate(0, 0, int(days)).Add(time.Duration(math.Round((v-days)*86400)) * time.Second)
		if t.Hour() == 0 && t.Minute() == 0 && t.Second() == 0 {
			return t.Format("2006-01-02"), "", nil
		}
		return t.Format("2006-01-02"), t.Format("15:04:05"), nil
	}
	for _, layout := range []string{"2006-01-02T15:04:05Z07:00", "2006-01-02T15:04:05", "2006-01-02 15:04:05", "2006-01-02T15:04", "2006-01-02 15:04"} {
		if t, perr := time.Parse(layout, s); perr == nil {
			c := t.Format("15:04:05")
			if strings.HasSuffix(layout, "Z07:00") {
				c = t.Format("15:04:05Z07:00")
			}
			return t.Format("2006-01-02"), c, nil
		}
	}
	if t, perr := time.Parse("2006-01-02", s); perr == nil {
		return t.Format("2006-01-02"), "", nil
	}
	return "", "", fmt.Errorf("%q is not a date (write 2026-03-09, or 2026-03-09T10:40:00 with a time)", s)
}

// quote writes a TOML basic string.
func quote(s string) string {
	var b strings.Builder
	b.WriteByte('"')
	for _, r := range s {
		switch r {
		case '"':
			b.WriteString(`\"`)
		case '\\':
			b.WriteString(`\\`)
		case '\n':
			b.WriteString(`\n`)
		case '\t':
			b.WriteString(`\t`)
		case '\r':
			b.WriteString(`\r`)
		default:
			if r < 0x20 || r == 0x7f {
				fmt.Fprintf(&b, `\u%04X`, r)
			} else {
				b.WriteRune(r)
			}
		}
	}
	b.WriteByte('"')
	return b.String()
}
