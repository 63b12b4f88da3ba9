package out

import (
	"bytes"
	"compress/zlib"
	"crypto/sha256"
	"encoding/hex"
	"errors"
	"fmt"
	"io"
	"regexp"
	"sort"
	"strconv"
	"strings"
)

// fixPDF makes canvas's PDF output repeatable, and adds the pattern fills
// canvas cannot write (setPatterns): it replaces object 2, the
// information dictionary canvas writes with the clock's date, by info;
// pins the date inside every embedded TrueType program (FontFile2
// streams, see pinFontDate); compresses the streams canvas leaves
// uncompressed; and rewrites the cross-reference table and
// trailer, adding a file identifier hashed from the content. Anything
// unexpected in canvas's layout is an error, not a silent guess.
func fixPDF(pdf []byte, info []byte, patterns *pdfPatterns, paths *pdfPaths, jpegs *pdfJPEGs) ([]byte, error) {
	xrefAt, offsets, err := readXref(pdf)
	if err != nil {
		return nil, err
	}
	if len(offsets) < 4 {
		return nil, errors.New("unexpected cross-reference table: fewer than 3 objects")
	}
	spans, err := objectSpans(pdf, xrefAt, offsets)
	if err != nil {
		return nil, err
	}
	if spans, err = setPatterns(spans, patterns); err != nil {
		return nil, err
	}
	replace := map[int][]byte{2: info}
	jpegs.replaceStandIns(spans, replace)
	fonts, contents := map[int]bool{}, map[int]bool{}
	for _, span := range spans[1:] {
		// Only dictionaries name font files and content streams; stream
		// data is skipped.
		if at := bytes.Index(span, []byte(">>stream\n")); at >= 0 {
			span = span[:at]
		}
		for _, m := range fontFileRE.FindAllSubmatch(span, -1) {
			n, _ := strconv.Atoi(string(m[1]))
			if n > 2 && n < len(offsets) {
				fonts[n] = true
			}
		}
		for _, m := range contentsRE.FindAllSubmatch(span, -1) {
			n, _ := strconv.Atoi(string(m[1]))
			if n > 2 && n < len(spans) {
				contents[n] = true
			}
		}
	}
	// Streams come from canvas uncompressed and are compressed here: page
	// content at contentLevel, images and pattern tiles at Flate's fastest
	// level, font programs at the default level, once, after their date
	// is pinned.
	for n := 3; n < len(spans); n++ {
		if _, done := replace[n]; done || !bytes.Contains(spans[n], []byte(">>stream\n")) {
			continue
		}
		pin, level := (func([]byte) ([]byte, error))(nil), zlib.BestSpeed
		switch {
		case fonts[n]:
			pin, level = pinFontDate, zlib.DefaultCompression
		case contents[n]:
			pin, level = paths.fill, contentLevel
		}
		obj, err := compressStream(spans[n], pin, level)
		if err != nil {
			return nil, fmt.Errorf("stream object %d: %w", n, err)
		}
		replace[n] = obj
	}
	return rebuild(spans, replace), nil
}

// contentLevel compresses page content: Go's level 4 takes about the
// time of its fastest level (a different, greedier matcher) and writes a
// sheet's content about a sixth smaller (BR-1: 16.7 KB at level 1, 14.1
// KB at 4, 13.5 KB at the default 6, which takes twice the time).
const contentLevel = 4

var fontFileRE = regexp.MustCompile(`/FontFile2 (\d+) 0 R`)

// objectSpans cuts the file into its header, one span per object (each
// running to the next object in file order), and returns them indexed by
// object number; span 0 is the header. The xref table and trailer are
// dropped: rebuild writes new ones.
func objectSpans(pdf []byte, xrefAt int, offsets []int) ([][]byte, error) {
	order := make([]int, 0, len(offsets)-1)
	for n := 1; n < len(offsets); n++ {
		order = append(order, n)
	}
	sort.Slice(order, func(i, j int) bool { return offsets[order[i]] < offsets[order[j]] })
	spans := make([][]byte, len(offsets))
	spans[0] = pdf[:offsets[order[0]]]
	for i, n := range order {
		end := xrefAt
		if i+1 < len(order) {
			end = offsets[order[i+1]]
		}
		span := pdf[offsets[n]:end]
		if !bytes.HasPrefix(span, []byte(strconv.Itoa(n)+" 0 obj\n")) {
			return nil, fmt.Errorf("unexpected layout: object %d does not start where the cross-reference table says", n)
		}
		spans[n] = span
	}
	return spans, nil
}

// rebuild writes the header, the objects in number order (replaced where
// given), a cross-reference table and a trailer.
func rebuild(spans [][]byte, replace map[int][]byte) []byte {
	var out bytes.Buffer
	out.Write(spans[0])
	offsets := make([]int, len(spans))
	for n := 1; n < len(spans); n++ {
		offsets[n] = out.Len()
		if r, ok := replace[n]; ok {
			out.Write(r)
		} else {
			out.Write(spans[n])
		}
	}
	xref := out.Len()
	b := make([]byte, 0, 64+20*len(spans))
	b = append(b, "xref\n0 "...)
	b = strconv.AppendInt(b, int64(len(spans)), 10)
	b = append(b, "\n0000000000 65535 f \n"...)
	for _, off := range offsets[1:] {
		b = appendPadded(b, off, 10) // each entry exactly 20 bytes (ISO 32000-1, 7.5.4)
		b = append(b, " 00000 n \n"...)
	}
	out.Write(b)
	sum := sha256.Sum256(out.Bytes())
	id := strings.ToUpper(hex.EncodeToString(sum[:16]))
	b = append(b[:0], "trailer\n<</Size "...)
	b = strconv.AppendInt(b, int64(len(spans)), 10)
	b = append(b, "/Root 1 0 R/Info 2 0 R/ID [<"+id+"><"+id+">]>>\nstartxref\n"...)
	b = strconv.AppendInt(b, int64(xref), 10)
	b = append(b, "\n%%EOF\n"...)
	out.Write(b)
	return out.Bytes()
}

var lengthRE = regexp.MustCompile(`/Length (\d+)`)

// compressStream Flate-compresses an uncompressed stream object, first
// passing its data through pin when given; a stream that already has a
// filter is left as it is, unless it must be pinned.
func compressStream(obj []byte, pin func([]byte) ([]byte, error), level int) ([]byte, error) {
	const open, closing = ">>stream\n", "\nendstream\n"
	at := bytes.Index(obj, []byte(open))
	if at < 0 {
		return nil, errors.New("not a stream")
	}
	dict := obj[:at+2]
	m := lengthRE.FindSubmatchIndex(dict)
	if m == nil {
		return nil, errors.New("stream has no /Length")
	}
	length, _ := strconv.Atoi(string(dict[m[2]:m[3]]))
	start := at + len(open)
	if start+length > len(obj) || !bytes.HasPrefix(obj[start+length:], []byte(closing)) {
		return nil, errors.New("stream length does not match its data")
	}
	data := obj[start : start+length]
	if bytes.Contains(dict, []byte("/Filter")) {
		if pin == nil {
			return obj, nil
		}
		if !bytes.Contains(dict, []byte("/Filter/FlateDecode")) {
			return nil, errors.New("stream to pin is not Flate-compressed")
		}
		zr, err := zlib.NewReader(bytes.NewReader(data))
		if err != nil {
			return nil, err
		}
		if data, err = io.ReadAll(zr); err != nil {
			return nil, err
		}
		dict = bytes.Replace(dict, []byte("/Filter/FlateDecode"), nil, 1)
		m = lengthRE.FindSubmatchIndex(dict)
	}
	if pin != nil {
		var err error
		if data, err = pin(data); err != nil {
			return nil, err
		}
	}
	var z bytes.Buffer
	if err := deflate(&z, data, level); err != nil {
		return nil, err
	}

	var out bytes.Buffer
	out.Grow(len(obj))
	out.Write(dict[:m[2]])
	out.WriteString(strconv.Itoa(z.Len()))
	out.Write(dict[m[3] : len(dict)-2])
	out.WriteString("/Filter/FlateDecode>>stream\n")
	out.Write(z.Bytes())
	out.Write(obj[start+length:])
	return out.Bytes(), nil
}

// readXref parses the classic cross-reference table canvas writes: one
// subsection from object 0. offsets[n] is object n's byte offset.
func readXref(pdf []byte) (xrefAt int, offsets []int, err error) {
	sx := bytes.LastIndex(pdf, []byte("startxref\n"))
	if sx < 0 {
		return 0, nil, errors.New("no startxref")
	}
	rest := pdf[sx+len("startxref\n"):]
	nl := bytes.IndexByte(rest, '\n')
	if nl < 0 {
		return 0, nil, errors.New("truncated startxref")
	}
	xrefAt, err = strconv.Atoi(string(rest[:nl]))
	if err != nil || xrefAt < 0 || xrefAt >= sx {
		return 0, nil, fmt.Errorf("bad startxref %q", rest[:nl])
	}
	lines := strings.Split(string(pdf[xrefAt:sx]), "\n")
	if len(lines) < 3 || lines[0] != "xref" {
		return 0, nil, errors.New("no cross-reference table at startxref")
	}
	head := strings.Fields(lines[1])
	if len(head) != 2 || head[0] != "0" {
		return 0, nil, fmt.Errorf("unexpected cross-reference subsection %q", lines[1])
	}
	n, err := strconv.Atoi(head[1])
	if err != nil || n < 1 || len(lines) < 2+n {
		return 0, nil, fmt.Errorf("unexpected cross-reference subsection %q", lines[1])
	}
	offsets = make([]int, n)
	for i := 1; i < n; i++ {
		f := strings.Fields(lines[2+i])
		if len(f) != 3 || f[2] != "n" {
			return 0, nil, fmt.Errorf("unexpected cross-reference entry %q", lines[2+i])
		}
		if offsets[i], err = strconv.Atoi(f[0]); err != nil || offsets[i] >= xrefAt {
			return 0, nil, fmt.Errorf("bad cross-reference offset %q", f[0])
		}
	}
	return xrefAt, offsets, nil
}

// appendPadded appends n in decimal, zero-padded to width digits.
func appendPadded(b []byte, n, width int) []byte {
	var digits [20]byte
	d := strconv.AppendInt(digits[:0], int64(n), 10)
	for i := len(d); i < width; i++ {
		b = append(b, '0')
	}
	return append(b, d...)
}
