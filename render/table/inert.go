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
