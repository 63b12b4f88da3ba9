package out

import (
	"bytes"
	"fmt"
	"sort"
	"strings"
	"time"
	"unicode/utf16"

	"github.com/tremie-dev/tremie/render/draw"
)

// pdfInfo is the document information dictionary (ISO 32000-1, 14.3.3).
// canvas writes its own with the wall-clock time; fixPDF replaces it with
// this one, built from the document alone.
type pdfInfo struct {
	entries map[string]string
}

func newPDFInfo(doc *draw.Document) (*pdfInfo, error) {
	e := map[string]string{
		"Creator":  "tremie",
		"Producer": "tremie with tdewolff/canvas",
	}
	for k, v := range map[string]string{"Title": doc.Title, "Subject": doc.Subject, "Author": doc.Author} {
		if v = strings.TrimSpace(cleanText(v)); v != "" {
			e[k] = v
		}
	}
	if doc.Date != "" {
		d, err := pdfDate(doc.Date)
		if err != nil {
			return nil, err
		}
		e["CreationDate"] = d
		e["ModDate"] = d
	}
	return &pdfInfo{entries: e}, nil
}

// pdfDate converts an RFC 3339 time (or a plain YYYY-MM-DD date) to the PDF
// date form D:YYYYMMDDHHmmSS+HH'mm' (ISO 32000-1, 7.9.4).
func pdfDate(s string) (string, error) {
	t, err := time.Parse(time.RFC3339, s)
	if err != nil {
		var err2 error
		if t, err2 = time.Parse("2006-01-02", s); err2 != nil {
			return "", fmt.Errorf("document date %q is not RFC 3339: %w", s, err)
		}
	}
	d := t.Format("D:20060102150405")
	_, off := t.Zone()
	// UTC is written +00'00' rather than Z: both are allowed, and the
	// signed form is what every reader (and pdfcpu) writes and expects.
	sign := byte('+')
	if off < 0 {
		sign, off = '-', -off
	}
	b := append([]byte(d), sign)
	b = appendPadded(b, off/3600, 2)
	b = append(b, '\'')
	b = appendPadded(b, off%3600/60, 2)
	return string(append(b, '\'')), nil
}

// text encodes a string as a hex string in UTF-16BE with a byte-order
// mark, which every reader takes for any Unicode text (ISO 32000-1, 7.9.2.2).
func pdfText(s string) string {
	const hexDigits = "0123456789ABCDEF"
	b := make([]byte, 0, 6+4*len(s))
	b = append(b, "<FEFF"...)
	for _, u := range utf16.Encode([]rune(s)) {
		b = append(b, hexDigits[u>>12], hexDigits[u>>8&15], hexDigits[u>>4&15], hexDigits[u&15])
	}
	return string(append(b, '>'))
}

func (in *pdfInfo) object() []byte {
	keys := make([]string, 0, len(in.entries))
	for k := range in.entries {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	var b bytes.Buffer
	b.WriteString("2 0 obj\n<<")
	for _, k := range keys {
		v := in.entries[k]
		b.WriteString("/" + k)
		if strings.HasSuffix(k, "Date") {
			// Dates are ASCII; written as literal strings, the usual form.
			b.WriteString(" (" + v + ")")
		} else {
			b.WriteString(" " + pdfText(v))
		}
	}
	b.WriteString(">>\nendobj\n")
	return b.Bytes()
}
