package out

import (
	"bytes"
	"compress/zlib"
	"image"
	"io"
	"regexp"
	"strconv"

	"github.com/tdewolff/canvas"
)

// pdfJPEGs passes a JPEG's own bytes into the PDF (a DCTDecode image,
// ISO 32000-1, 7.4.8) instead of canvas's decoding and encoding it again
// at its own quality: no second loss, smaller and faster. canvas writes
// images only from pixels, so the image goes to it as a stand-in, one
// pixel whose colour numbers the JPEG, placed as the JPEG would be; fixPDF
// then writes the JPEG in the stand-in's image object.
type pdfJPEGs struct {
	data  [][]byte
	sizes []image.Point
	gray  []bool
}

// standIn records a JPEG of size w × h pixels (gray: one component, else
// three) and returns the one-pixel image to give canvas in its place.
func (pj *pdfJPEGs) standIn(data []byte, w, h int, gray bool) image.Image {
	k := len(pj.data)
	pj.data = append(pj.data, data)
	pj.sizes = append(pj.sizes, image.Pt(w, h))
	pj.gray = append(pj.gray, gray)
	px := image.NewRGBA(image.Rect(0, 0, 1, 1))
	px.Pix[0], px.Pix[1], px.Pix[2], px.Pix[3] = byte(k>>16), byte(k>>8), byte(k), 0xff
	return px
}

// placeStandIn is the matrix that places a one-pixel stand-in where m
// places an image of w × h pixels.
func placeStandIn(m canvas.Matrix, w, h int) canvas.Matrix {
	return m.Scale(float64(w), float64(h))
}

// A stand-in's image object: one opaque RGB pixel, Flate-compressed.
var (
	lengthOfRE  = regexp.MustCompile(`/Length (\d+)\b`)
	widthOneRE  = regexp.MustCompile(`/Width 1\b`)
	heightOneRE = regexp.MustCompile(`/Height 1\b`)
)

func isStandInDict(dict []byte) bool {
	for _, want := range []string{"/Subtype/Image", "/ColorSpace/DeviceRGB", "/Filter/FlateDecode", "/BitsPerComponent 8"} {
		if !bytes.Contains(dict, []byte(want)) {
			return false
		}
	}
	return widthOneRE.Match(dict) && heightOneRE.Match(dict) && !bytes.Contains(dict, []byte("/SMask"))
}

// replaceStandIns writes each recorded JPEG in the image object of its
// stand-in, the k-th stand-in in object order holding JPEG k, into
// replace (object number to its new text).
func (pj *pdfJPEGs) replaceStandIns(spans [][]byte, replace map[int][]byte) {
	if pj == nil || len(pj.data) == 0 {
		return
	}
	next := 0
	for n := 3; n < len(spans) && next < len(pj.data); n++ {
		at := bytes.Index(spans[n], []byte(">>stream\n"))
		if at < 0 || at > 400 || !isStandInDict(spans[n][:at]) {
			continue
		}
		lm := lengthOfRE.FindSubmatch(spans[n][:at])
		if lm == nil {
			continue
		}
		length, _ := strconv.Atoi(string(lm[1]))
		start := at + len(">>stream\n")
		if start+length > len(spans[n]) {
			continue
		}
		zr, err := zlib.NewReader(bytes.NewReader(spans[n][start : start+length]))
		if err != nil {
			continue
		}
		px, err := io.ReadAll(io.LimitReader(zr, 4))
		if err != nil || len(px) != 3 || int(px[0])<<16|int(px[1])<<8|int(px[2]) != next {
			continue // a real one-pixel image
		}
		cs := "DeviceRGB"
		if pj.gray[next] {
			cs = "DeviceGray"
		}
		var b []byte
		b = strconv.AppendInt(b, int64(n), 10)
		b = append(b, " 0 obj\n<</BitsPerComponent 8/ColorSpace/"...)
		b = append(b, cs...)
		b = append(b, "/Filter/DCTDecode/Height "...)
		b = strconv.AppendInt(b, int64(pj.sizes[next].Y), 10)
		b = append(b, "/Interpolate true/Length "...)
		b = strconv.AppendInt(b, int64(len(pj.data[next])), 10)
		b = append(b, "/Subtype/Image/Type/XObject/Width "...)
		b = strconv.AppendInt(b, int64(pj.sizes[next].X), 10)
		b = append(b, ">>stream\n"...)
		b = append(b, pj.data[next]...)
		b = append(b, "\nendstream\nendobj\n"...)
		replace[n] = b
		next++
	}
}
