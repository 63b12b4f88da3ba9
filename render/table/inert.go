package table

import "strings"

// Inert makes a text cell safe to open in a spreadsheet program: a cell
// that begins with =, +, -, @, a tab or a carriage return is read there
// as a formula, so such a cell gets a leading apostrophe, as the OWASP
// guidance on CSV injection recommends. Numbers are written through
// Cell.String and never pass here, so a negative stick-up stays a number.
func Inert(s string) string {
	if s == "" || !strings.ContainsRune("=+-@\t\r", rune(s[0])) {
		return s
	}
	return "'" + s
}

// CSVText is a cell as a CSV field: numbers as they are, text made inert.
func (c Cell) CSVText() string {
	if c.Num != nil {
		return c.String()
	}
	return Inert(c.Text)
}

// InertField is Inert for a field that may hold a number written as text
// (a depth, a ratio): a plain decimal number such as -2.5 or 1e-3 is left
// as it is, anything else that a spreadsheet would run is made inert.
// Writers whose fields are strings already use it on every field.
func InertField(s string) string {
	if plainNumber(s) {
		return s
	}
	return Inert(s)
}

// plainNumber: an optional minus sign, digits with at most one point,
// and an optional exponent; no sign of a formula can hide in it.
func plainNumber(s string) bool {
	s = strings.TrimPrefix(s, "-")
	mant, exp, hasExp := strings.Cut(strings.ToLower(s), "e")
	digits, point := 0, false
	for _, c := range mant {
		switch {
		case c >= '0' && c <= '9':
			digits++
		case c == '.' && !point:
			point = true
		default:
			return false
		}
	}
	if digits == 0 {
		return false
	}
	if hasExp {
		exp = strings.TrimPrefix(strings.TrimPrefix(exp, "-"), "+")
		if exp == "" || strings.Trim(exp, "0123456789") != "" {
			return false
		}
	}
	return true
}

// InertRecord applies InertField to every field of a CSV record.
func InertRecord(rec []string) []string {
	for i, f := range rec {
		rec[i] = InertField(f)
	}
	return rec
}
