package book

import (
	"bytes"
	"fmt"
	"regexp"
	"sort"
	"strconv"
)

// canonical rewrites a PDF that has a classic cross-reference table and
// no object streams (how config makes pdfcpu write) so that the same
// document always has the same bytes. pdfcpu renumbers merged objects and
// writes them in Go map order, so its output varies run to run. Here the
// objects are renumbered in the order a walk from the trailer's /Root and
// /Info first reaches them (references taken in text order; pdfcpu writes
// dictionary keys sorted) and written in that order with a fresh table.
// Each object is cut at the offsets pdfcpu's own table gives; only its
// references ("12 0 R", outside strings and stream data) are renumbered.
func canonical(pdf []byte) ([]byte, error) {
	xrefAt, err := startXref(pdf)
	if err != nil {
		return nil, err
	}
	entries, trailer, err := readXref(pdf, xrefAt)
	if err != nil {
		return nil, err
	}
	blocks, headerEnd, err := cutObjects(pdf, entries, xrefAt)
	if err != nil {
		return nil, err
	}
	// Walk from the trailer.
	newNr := map[int]int{}
	var order []int
	queue := refsIn(trailer)
	for len(queue) > 0 {
		nr := queue[0]
		queue = queue[1:]
		if _, seen := newNr[nr]; seen {
			continue
		}
		b, ok := blocks[nr]
		if !ok {
			continue // a reference to a free object reads as null
		}
		newNr[nr] = len(order) + 1
		order = append(order, nr)
		queue = append(queue, refsIn(b.dict)...)
	}
	var out bytes.Buffer
	out.Write(pdf[:headerEnd])
	offsets := make([]int, len(order)+1)
	for i, nr := range order {
		b := blocks[nr]
		offsets[i+1] = out.Len()
		fmt.Fprintf(&out, "%d 0 obj", i+1)
		out.Write(renumber(b.dict, newNr))
		out.Write(b.rest)
	}
	xref := out.Len()
	fmt.Fprintf(&out, "xref\n0 %d\n0000000000 65535 f \n", len(order)+1)
	for _, o := range offsets[1:] {
		fmt.Fprintf(&out, "%010d 00000 n \n", o)
	}
	t := renumber(trailer, newNr)
	t = sizeRE.ReplaceAll(t, []byte("/Size "+strconv.Itoa(len(order)+1)))
	out.Write(t)
	fmt.Fprintf(&out, "startxref\n%d\n%%%%EOF\n", xref)
	return out.Bytes(), nil
}

var sizeRE = regexp.MustCompile(`/Size ?\d+`)

// object is one indirect object cut from the file: dict is its text
// after "N G obj" up to any stream data, rest the stream and "endobj".
type object struct{ dict, rest []byte }

func cutObjects(pdf []byte, entries []*xrefEntry, xrefAt int) (map[int]object, int, error) {
	var used []*xrefEntry
	for _, e := range entries {
		if e.inUse {
			used = append(used, e)
		}
	}
	if len(used) == 0 {
		return nil, 0, fmt.Errorf("canonical: no objects")
	}
	sort.Slice(used, func(i, j int) bool { return used[i].offset < used[j].offset })
	blocks := map[int]object{}
	for i, e := range used {
		end := xrefAt
		if i+1 < len(used) {
			end = used[i+1].offset
		}
		if e.offset < 0 || end > len(pdf) || e.offset >= end {
			return nil, 0, fmt.Errorf("canonical: object %d at bad offset %d", e.nr, e.offset)
		}
		b := pdf[e.offset:end]
		head := []byte(fmt.Sprintf("%d %d obj", e.nr, e.gen))
		if !bytes.HasPrefix(b, head) {
			return nil, 0, fmt.Errorf("canonical: offset %d does not start object %d", e.offset, e.nr)
		}
		b = b[len(head):]
		n := dictEnd(b)
		blocks[e.nr] = object{dict: b[:n], rest: b[n:]}
	}
	return blocks, used[0].offset, nil
}

// dictEnd is where an object's stream data begins ("stream" at the top
// level, outside strings), or the end of b.
func dictEnd(b []byte) int {
	depth := 0
	for i := 0; i < len(b); i++ {
		switch c := b[i]; {
		case c == '(':
			i = stringEnd(b, i)
		case c == '<' && i+1 < len(b) && b[i+1] == '<':
			depth++
			i++
		case c == '>' && i+1 < len(b) && b[i+1] == '>':
			depth--
			i++
		case c == '<':
			for i < len(b) && b[i] != '>' {
				i++
			}
		case depth == 0 && bytes.HasPrefix(b[i:], []byte("stream")):
			return i
		}
	}
	return len(b)
}

// stringEnd is the index of the ")" closing the literal string at i,
// honouring backslash escapes and balanced parentheses.
func stringEnd(b []byte, i int) int {
	depth := 0
	for ; i < len(b); i++ {
		switch b[i] {
		case '\\':
			i++
		case '(':
			depth++
		case ')':
			depth--
			if depth == 0 {
				return i
			}
		}
	}
	return len(b)
}

var refRE = regexp.MustCompile(`(\d+)\s+(\d+)\s+R\b`)

// spans calls fn on each part of b outside strings, with its offset.
func spans(b []byte, fn func(start int, part []byte)) {
	start := 0
	for i := 0; i < len(b); i++ {
		switch {
		case b[i] == '(':
			fn(start, b[start:i])
			i = stringEnd(b, i)
			start = i + 1
		case b[i] == '<' && (i+1 >= len(b) || b[i+1] != '<') && (i == 0 || b[i-1] != '<'):
			fn(start, b[start:i])
			for i < len(b) && b[i] != '>' {
				i++
			}
			start = i + 1
		case b[i] == '<':
			i++ // "<<"
		}
	}
	if start < len(b) {
		fn(start, b[start:])
	}
}

func refsIn(b []byte) []int {
	var out []int
	spans(b, func(_ int, part []byte) {
		for _, m := range refRE.FindAllSubmatch(part, -1) {
			n, _ := strconv.Atoi(string(m[1]))
			out = append(out, n)
		}
	})
	return out
}

func renumber(b []byte, newNr map[int]int) []byte {
	var out bytes.Buffer
	last := 0
	spans(b, func(start int, part []byte) {
		for _, m := range refRE.FindAllSubmatchIndex(part, -1) {
			n, _ := strconv.Atoi(string(part[m[2]:m[3]]))
			out.Write(b[last : start+m[0]])
			if nn, ok := newNr[n]; ok {
				fmt.Fprintf(&out, "%d 0 R", nn)
			} else {
				out.WriteString("null") // a free object
			}
			last = start + m[1]
		}
	})
	out.Write(b[last:])
	return out.Bytes()
}

type xrefEntry struct {
	nr, gen, offset int
	inUse           bool
}

var startXrefRE = regexp.MustCompile(`startxref\s+(\d+)\s+%%EOF\s*$`)

func startXref(pdf []byte) (int, error) {
	m := startXrefRE.FindSubmatch(pdf)
	if m == nil {
		return 0, fmt.Errorf("canonical: no startxref")
	}
	n, err := strconv.Atoi(string(m[1]))
	if err != nil || n >= len(pdf) || !bytes.HasPrefix(pdf[n:], []byte("xref")) {
		return 0, fmt.Errorf("canonical: startxref %s does not point at a cross-reference table", m[1])
	}
	return n, nil
}

var subsectionRE = regexp.MustCompile(`^(\d+) (\d+)$`)

// readXref parses a classic cross-reference table at off and returns its
// entries and the trailer (from "trailer" up to "startxref").
func readXref(pdf []byte, off int) ([]*xrefEntry, []byte, error) {
	lines := bytes.SplitAfter(pdf[off:], []byte("\n"))
	var entries []*xrefEntry
	pos := off + len(lines[0]) // after "xref"
	for i := 1; i < len(lines); {
		l := bytes.TrimSpace(lines[i])
		if bytes.HasPrefix(l, []byte("trailer")) {
			end := bytes.Index(pdf[pos:], []byte("startxref"))
			if end < 0 {
				return nil, nil, fmt.Errorf("canonical: trailer without startxref")
			}
			return entries, pdf[pos : pos+end], nil
		}
		m := subsectionRE.FindSubmatch(l)
		if m == nil {
			return nil, nil, fmt.Errorf("canonical: bad cross-reference line %q", l)
		}
		first, _ := strconv.Atoi(string(m[1]))
		count, _ := strconv.Atoi(string(m[2]))
		pos += len(lines[i])
		i++
		for k := 0; k < count; k++ {
			if i >= len(lines) {
				return nil, nil, fmt.Errorf("canonical: cross-reference table cut short")
			}
			f := bytes.Fields(lines[i])
			if len(f) != 3 {
				return nil, nil, fmt.Errorf("canonical: bad entry %q", lines[i])
			}
			o, _ := strconv.Atoi(string(f[0]))
			g, _ := strconv.Atoi(string(f[1]))
			entries = append(entries, &xrefEntry{nr: first + k, gen: g, offset: o, inUse: string(f[2]) == "n"})
			pos += len(lines[i])
			i++
		}
	}
	return nil, nil, fmt.Errorf("canonical: no trailer")
}
