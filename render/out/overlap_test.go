package out_test

import (
	"fmt"
	"image"
	"math"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
)

// What a text must keep clear of is read from rsvg-convert's raster of
// the sheet without its text (the bare sheet), at the resolution of the
// text raster, pixel for pixel.
//
// A pixel of the bare sheet is ink (a line, a leader, a tick, a symbol,
// a pattern's marks, a dark fill) when its luminance, with the sRGB
// weights of ITU-R BT.709 (0.2126 R + 0.7152 G + 0.0722 B), lies below
// groundLevel. Lighter pixels are ground a text may sit on by design:
// the paper; the white of a halo or of a label's box, which hides what
// it covers and so leaves no ink in the bare sheet either; pale fills
// such as a lithology colour. A text overlaps another element when 3 or
// more of its fully covered pixels (the colour of its own, see
// inkTexts) lie on ink, or lie inside another text's box drawn in by
// slackPt.
//
// groundLevel is three quarters of white: a black hairline counts as
// ink wherever it covers a quarter of a pixel or more, while the light
// grey (200) of background grid lines, meant to be written over, does
// not; dark text on a ground darker than this would not read anyway.
const groundLevel = 191

// inkMask marks the ink pixels of a raster.
type inkMask struct {
	w, h int
	ink  []bool
}

func (m inkMask) at(x, y int) bool { return m.ink[y*m.w+x] }

// inkMaskOf reads the ink of a raster, composited on white.
func inkMaskOf(img image.Image) inkMask {
	n := nrgba(img)
	b := n.Bounds()
	m := inkMask{w: b.Dx(), h: b.Dy(), ink: make([]bool, b.Dx()*b.Dy())}
	for y := 0; y < m.h; y++ {
		row := n.Pix[y*n.Stride:]
		for x := 0; x < m.w; x++ {
			p := row[4*x : 4*x+4]
			a := float64(p[3]) / 255
			lum := 0.2126*float64(p[0]) + 0.7152*float64(p[1]) + 0.0722*float64(p[2])
			lum = lum*a + 255*(1-a)
			m.ink[y*m.w+x] = lum < groundLevel
		}
	}
	return m
}

// bareRaster rasterises a page without its text with rsvg-convert.
func bareRaster(t *testing.T, rsvg string, p *draw.Page) raster {
	t.Helper()
	bare := &draw.Page{Width: p.Width, Height: p.Height, Items: withoutText(p.Items)}
	return rsvgRasterImage(t, rsvg, bare, out.TextAsOutlines)
}

func withoutText(items []draw.Item) []draw.Item {
	var kept []draw.Item
	for _, it := range items {
		switch it := it.(type) {
		case draw.Text:
		case draw.Clip:
			kept = append(kept, draw.Clip{Rect: it.Rect, Items: withoutText(it.Items)})
		default:
			kept = append(kept, it)
		}
	}
	return kept
}

// overlaps names each text whose fully covered pixels lie on the ink of
// the bare sheet, or in another text's box, and what it overlaps.
func (ip *inkedPage) overlaps(img image.Image, bare inkMask) []string {
	w, h := img.Bounds().Dx(), img.Bounds().Dy()
	if w != bare.w || h != bare.h {
		return []string{fmt.Sprintf("the text raster is %d × %d, the bare sheet's %d × %d", w, h, bare.w, bare.h)}
	}
	// cover counts the boxes, drawn in, over each pixel's centre; who
	// is the last of them.
	cover := make([]uint8, w*h)
	who := make([]int32, w*h)
	const k = rsvgDPI / 72.0
	for j, b := range ip.boxes {
		x0, x1 := int(math.Ceil((b.r.X+slackPt)*k-0.5)), int(math.Floor((b.r.Right()-slackPt)*k-0.5))
		y0, y1 := int(math.Ceil((b.r.Y+slackPt)*k-0.5)), int(math.Floor((b.r.Bottom()-slackPt)*k-0.5))
		for y := max(0, y0); y <= min(h-1, y1); y++ {
			for x := max(0, x0); x <= min(w-1, x1); x++ {
				if cover[y*w+x] < 255 {
					cover[y*w+x]++
				}
				who[y*w+x] = int32(j + 1)
			}
		}
	}
	onInk := make([]int, len(ip.boxes)+1)
	onText := make([]int, len(ip.boxes)+1)
	other := make([]int, len(ip.boxes)+1) // a text overlapped, by number
	at := make([]draw.Point, len(ip.boxes)+1)
	eachTextPixel(img, len(ip.boxes), func(x, y, t int) {
		i := y*w + x
		if bare.ink[i] {
			onInk[t]++
			at[t] = draw.Point{X: (float64(x) + 0.5) / k, Y: (float64(y) + 0.5) / k}
		}
		if c := cover[i]; c >= 2 || c == 1 && int(who[i]) != t {
			onText[t]++
			if int(who[i]) != t {
				other[t] = int(who[i])
			} else {
				other[t] = ip.boxAt(x, y, t)
			}
		}
	})
	var out []string
	for t := 1; t <= len(ip.boxes); t++ {
		if onInk[t] >= 3 {
			out = append(out, fmt.Sprintf("%q lies on another element's ink (%d pixels, one at %.1f, %.1f pt)", ip.boxes[t-1].s, onInk[t], at[t].X, at[t].Y))
		}
		if onText[t] >= 3 {
			out = append(out, fmt.Sprintf("%q runs into the box of %q (%d pixels)", ip.boxes[t-1].s, ip.boxes[other[t]-1].s, onText[t]))
		}
	}
	return out
}

// boxAt is a text other than t whose drawn-in box holds pixel (x, y).
func (ip *inkedPage) boxAt(x, y, t int) int {
	const k = rsvgDPI / 72.0
	px, py := (float64(x)+0.5)/k, (float64(y)+0.5)/k
	for j, b := range ip.boxes {
		if j+1 != t && px >= b.r.X+slackPt && px <= b.r.Right()-slackPt && py >= b.r.Y+slackPt && py <= b.r.Bottom()-slackPt {
			return j + 1
		}
	}
	return t
}

// TestRsvgCheckSeesATextOnAnotherElement shows the overlap check has
// teeth, on MW-1 with text as outlines: a line drawn through one label
// (as a label moved onto a line would lie) is reported for that label
// alone; a label moved onto another is reported with it, and nothing
// else is.
func TestRsvgCheckSeesATextOnAnotherElement(t *testing.T) {
	rsvg := tool(t, "rsvg-convert text-box test", "librsvg2-bin", "rsvg-convert")
	sheet := demoDocs(t)[1].doc.Pages[0] // MW-1
	check := func(p *draw.Page) []string {
		inked := inkTexts(t, p)
		bare := inkMaskOf(bareRaster(t, rsvg, p).img)
		return inked.overlaps(rsvgRasterImage(t, rsvg, inked.page, out.TextAsOutlines).img, bare)
	}
	if got := check(sheet); len(got) != 0 {
		t.Fatalf("MW-1 as drawn: %v", got)
	}
	// the labels at the top level of the page, in order
	var labels []int
	for i, it := range sheet.Items {
		if tx, ok := it.(draw.Text); ok && tx.Rotate == 0 && len(tx.S) > 4 {
			labels = append(labels, i)
		}
	}
	if len(labels) < 2 {
		t.Fatal("no labels to move")
	}
	struck, target, moved := sheet.Items[labels[0]].(draw.Text), sheet.Items[labels[0]].(draw.Text), sheet.Items[labels[1]].(draw.Text)

	t.Run("line through a label", func(t *testing.T) {
		box := textExtent(struck)
		y := struck.At.Y - draw.CapHeight(struck.Font, struck.Size)/2
		p := &draw.Page{Width: sheet.Width, Height: sheet.Height, Items: append(append([]draw.Item(nil), sheet.Items...),
			draw.Shape{Style: draw.Style{Stroke: draw.Black, StrokeWidth: 0.5}, Points: []draw.Point{{X: box.X + 2, Y: y}, {X: box.Right() - 2, Y: y}}})}
		got := check(p)
		if len(got) != 1 || !strings.Contains(got[0], fmt.Sprintf("%q lies on another element's ink", struck.S)) {
			t.Fatalf("reported %v, want %q alone, on ink", got, struck.S)
		}
		t.Logf("reported: %s", got[0])
	})

	t.Run("label onto a label", func(t *testing.T) {
		items := append([]draw.Item(nil), sheet.Items...)
		moved.At, moved.Anchor = draw.Point{X: target.At.X + 3, Y: target.At.Y + 1}, target.Anchor
		items[labels[1]] = moved
		got := check(&draw.Page{Width: sheet.Width, Height: sheet.Height, Items: items})
		if len(got) == 0 {
			t.Fatalf("%q moved onto %q: nothing reported", moved.S, target.S)
		}
		for _, g := range got {
			if !strings.Contains(g, fmt.Sprintf("%q", moved.S)) && !strings.Contains(g, fmt.Sprintf("%q", target.S)) {
				t.Errorf("reported a text not moved: %s", g)
			}
			t.Logf("reported: %s", g)
		}
	})
}
