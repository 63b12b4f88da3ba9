// Package out writes drawing-model pages (package render/draw) as SVG, PDF
// or PNG through tdewolff/canvas. The backends only translate: every
// position, size and colour comes from the page. Page points (origin top
// left, y down) become canvas millimetres (origin bottom left, y up).
//
// Two readings of the model are fixed here, the same for every format:
// a Text with a zero Color is drawn black (invisible text has no use), and
// a Clip is applied geometrically (canvas renderers have no clip state):
// items wholly inside are drawn as they are, items wholly outside are
// dropped, and items crossing the edge are cut to it — fills and strokes
// as outlines, text as glyph outlines, images by cropping their pixels.
//
// Output is deterministic: the same document gives the same bytes. The
// PDF's creation date is Document.Date, never the clock.
package out
