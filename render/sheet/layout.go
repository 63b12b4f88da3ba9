package sheet

import (
	"errors"
	"fmt"
	"math"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/rules"
)

// span is the depth range one sheet draws.
type span struct{ Top, Bottom schema.Length }

// layout is the plan of one well's sheets: the page regions, the scale,
// the sheets' depth ranges and the pieces every sheet shares.
type layout struct {
	w   *schema.Well
	in  Inputs
	opt Options
	pg  Page
	u   schema.Units
	// strip is the height kept under the band for notes that would
	// otherwise go on a notes sheet (see fitstrip.go); the boxes flowed
	// into it are stripBoxes.
	strip      float64
	stripBoxes []sheetBox
	// freeBoxes are the notes set in the free rooms freeRs of the last
	// drawing sheet's body (see freespace.go).
	freeBoxes []sheetBox
	freeRs    []draw.Rect
	// autoAt, when set, is the scale the automatic choice tries instead
	// of its own (roomForNotes, freespace.go).
	autoAt Scale
	// even spreads the depth evenly over the drawing sheets (balance).
	even bool

	secs *schema.Sections // what stands in the hole at each depth

	content draw.Rect // the page inside its margin
	header  draw.Rect // title block
	body    draw.Rect // column heads and the scaled columns
	plot    draw.Rect // the scaled part of the body
	band    draw.Rect // legend, amounts, notes and findings
	caution draw.Rect

	cols      columnRects
	scale     Scale
	fitsOne   bool // the automatic scale fit the well on one sheet
	hz        hgeom
	top, bot  schema.Length // depth range drawn
	sheets    []span
	blocking  bool
	title     titleBlock
	bandPlan  bandPlan
	legendAll []symbol // every symbol the well's sheets use
	parts     []part   // the well's parts in reading order (part.go)
	painted   []part   // the same in paint order

	sheetDescs      [][]descEntry     // each sheet's lithology descriptions
	sheetCallouts   [][]placedCallout // each sheet's labels
	sheetNotes      [][]noteBlock     // each sheet's component notes, in its notes box
	calloutOverflow []noteBlock       // component notes for the notes sheet
	notesPages      [][]sheetBox      // the notes sheets' boxes
}

// columnRects are the x ranges of the body's columns.
type columnRects struct {
	depth, elev, lith, uscs, desc, well, call xRange
	feat                                      xRange // wall features (features.go); zero width when none
}

type xRange struct{ X, W float64 }

func (r xRange) Right() float64  { return r.X + r.W }
func (r xRange) Center() float64 { return r.X + r.W/2 }

// Vertical padding of the scaled area: room for the top cap and the
// total-depth label, so that nothing at the ends of the range is cut.
const (
	plotPadTop    = 16.0
	plotPadBottom = 12.0
	columnHeadH   = 22.0
	// maxSheets bounds the log sheets of one well, at a scale given or
	// chosen (the automatic scale turns more detailed for text only up to
	// it): the 1,200-ft gallery well takes 8 at the automatic scale and 25
	// at 1in=10ft (2.3 s for SVG, PDF and PNG on 2 busy cores), and about
	// 50 at 1in=5ft are refused, so that no well takes more than a few
	// seconds.
	maxSheets = 30
)

func newLayout(w *schema.Well, in Inputs, opt Options, pg Page) *layout {
	l := &layout{w: w, secs: w.CrossSections(), in: in, opt: opt, pg: pg, u: w.Units}
	if l.u.Depth == "" {
		l.u = schema.DefaultUnits(schema.Feet)
	}
	l.content = draw.Rect{X: pg.Margin, Y: pg.Margin, W: pg.Width - 2*pg.Margin, H: pg.Height - 2*pg.Margin}
	l.blocking = rules.Blocking(in.Findings)
	l.parts = l.assemble()
	l.painted = paintOrder(l.parts)
	return l
}

// plan fixes everything but the drawing of each sheet.
func (l *layout) plan() error {
	if err := l.planOnce(); err != nil {
		return err
	}
	l.notesInTheBody()
	l.notesOnTheSheet()
	l.roomForNotes()
	l.balance()
	return nil
}

// balance spreads the depth evenly over several drawing sheets where the
// last would otherwise stand more than a third empty with nothing in its
// free room (common practice: no sheet of a set left a third blank when
// the set can share its depth): same scale, same sheets, the match lines
// still on the axis ticks. A scale the user gave keeps full sheets.
func (l *layout) balance() {
	if len(l.sheets) < 2 || l.even || l.opt.Scale != nil || l.strip > 0 || l.lastUsed() >= 2.0/3 {
		return
	}
	alt := newLayout(l.w, l.in, l.opt, l.pg)
	alt.even, alt.autoAt = true, l.scale
	if alt.planOnce() != nil || alt.scale != l.scale || len(alt.sheets) != len(l.sheets) || !alt.textFits() {
		return
	}
	alt.notesInTheBody()
	if alt.sheetCount() > l.sheetCount() {
		return
	}
	*l = *alt
}

// planOnce plans the sheets with the strip as set.
func (l *layout) planOnce() error {
	l.top, l.bot = l.depthRange()
	if !(l.bot > l.top) || math.IsInf(float64(l.bot-l.top), 0) || math.IsNaN(float64(l.bot-l.top)) {
		return fmt.Errorf("nothing to draw: total depth %s", l.u.FormatDepth(l.w.TotalDepth))
	}

	l.title = l.titleFields()
	hh := l.title.height(l.content.W)
	l.header = draw.Rect{X: l.content.X, Y: l.content.Y, W: l.content.W, H: hh}

	cautionLines := draw.Wrap(draw.Italic, sizeTiny, rules.Caution(l.in.Profile), l.content.W)
	ch := float64(len(cautionLines))*lineGap(sizeTiny) + 4
	l.caution = draw.Rect{X: l.content.X, Y: l.content.Bottom() - ch, W: l.content.W, H: ch}

	bodyW := l.content.W
	if l.pg.LegendRight > 0 {
		bodyW -= l.pg.LegendRight + 6
	}
	l.layColumns(bodyW)
	l.hz = l.horizontal()

	// The band is sized for the whole well's legend, so every sheet has
	// the same body and the depth per sheet is constant.
	l.legendAll = l.legendOf(everywhere)
	l.bandPlan = l.planBand(l.legendAll)
	l.body = draw.Rect{X: l.content.X, Y: l.header.Bottom() + 6, W: bodyW}
	if l.pg.LegendRight > 0 {
		l.band = draw.Rect{X: l.content.Right() - l.pg.LegendRight, Y: l.body.Y, W: l.pg.LegendRight, H: l.bandFoot() - l.body.Y}
		l.body.H = l.band.H
		if l.strip > 0 {
			l.body.H -= l.strip + 4 // the strip stands under the drawing
		}
	} else {
		bh := l.bandPlan.height
		l.band = draw.Rect{X: l.content.X, Y: l.bandFoot() - bh, W: l.content.W, H: bh}
		l.body.H = l.band.Y - 6 - l.body.Y
	}
	l.placeBand()
	if l.pg.LegendRight > 0 && l.bandPlan.noteR.H < bandHeadH+bandPad+continueLineH+bandPad-1e-9 {
		return fmt.Errorf("page %q leaves no room beside the drawing for the legend of %d symbols; use a larger page or a portrait one", l.pg.Name, len(l.legendAll))
	}
	if l.body.H < 160 {
		return fmt.Errorf("page %q leaves %.0f pt for the drawing after the title block and notes; use a larger page", l.pg.Name, l.body.H)
	}
	l.plot = draw.Rect{X: l.body.X, Y: l.body.Y + columnHeadH, W: l.body.W, H: l.body.H - columnHeadH}

	usable := l.plot.H - plotPadTop - plotPadBottom
	switch {
	case l.opt.Scale != nil && l.opt.Scale.Fit:
		s, ok := fitScale(l.u.Imperial(), l.bot-l.top, usable)
		if !ok {
			return fmt.Errorf("the well does not fit one sheet even at %s; use a larger page or a scale", s)
		}
		l.scale, l.fitsOne = s, true
	case l.opt.Scale != nil:
		if !(l.opt.Scale.Ratio > 0) || math.IsInf(l.opt.Scale.Ratio, 0) {
			return fmt.Errorf("scale %v is not usable", *l.opt.Scale)
		}
		l.scale = *l.opt.Scale
		l.fitsOne = l.scale.Points(l.bot-l.top) <= usable
	case l.autoAt.Ratio > 0:
		l.scale, l.fitsOne = l.autoAt, l.autoAt.Points(l.bot-l.top) <= usable
	default:
		l.scale, l.fitsOne = autoScale(l.u.Imperial(), l.bot-l.top, usable)
		if s, ok := l.economicalScale(usable); ok {
			l.scale, l.fitsOne = s, s.Points(l.bot-l.top) <= usable
		}
	}
	if err := l.paginateAt(l.scale, usable); err != nil {
		return err
	}
	if l.opt.Scale == nil && l.autoAt.Ratio == 0 {
		// The automatic scale weighs the text too: where a sheet's
		// descriptions do not fit even one line each, or its labels run
		// off the drawing, a more detailed scale gives them room.
		for !l.textFits() {
			next, ok := moreDetailed(candidates(l.u.Imperial()), l.scale)
			if !ok {
				break
			}
			saved, savedFits, savedSheets := l.scale, l.fitsOne, l.sheets
			l.scale, l.fitsOne = next, false
			if err := l.paginateAt(l.scale, usable); err != nil {
				l.scale, l.fitsOne, l.sheets = saved, savedFits, savedSheets
				l.scaleFields()
				break
			}
		}
	}
	l.planCallouts()
	l.planNotesSheets()
	return l.flowIntoStrip()
}

// moreDetailed is the least detailed of the scales that is more detailed
// than s.
func moreDetailed(cs []Scale, s Scale) (Scale, bool) {
	best, ok := Scale{}, false
	for _, c := range cs {
		if c.Ratio < s.Ratio && (!ok || c.Ratio > best.Ratio) {
			best, ok = c, true
		}
	}
	return best, ok
}

// lessDetailed is the most detailed of the scales that is less detailed
// than s.
func lessDetailed(cs []Scale, s Scale) (Scale, bool) {
	best, ok := Scale{}, false
	for _, c := range cs {
		if c.Ratio > s.Ratio && (!ok || c.Ratio < best.Ratio) {
			best, ok = c, true
		}
	}
	return best, ok
}

// economicalScale spares a last sheet that would stand mostly blank:
// when the automatic scale needs several sheets and the last would be
// less than half used, the most detailed round scale up to twice the
// readable limit that needs fewer sheets is taken instead.
func (l *layout) economicalScale(usable float64) (Scale, bool) {
	// Judged on the sheets as paginated: match lines rounded to the
	// axis ticks can leave a last sheet far emptier than the depth alone
	// says (TW-7 on A4: 2.86 bodies of depth, four sheets, the last 11 %
	// used).
	halfUsed := func(s Scale, pages []span) bool {
		last := pages[len(pages)-1]
		return len(pages) == 1 || s.Points(last.Bottom-last.Top)/usable >= 0.5
	}
	pages := l.sheetsAt(l.scale, usable)
	if len(pages) <= 1 || halfUsed(l.scale, pages) {
		return Scale{}, false
	}
	limit := imperialReadable * 12 * 2
	if !l.u.Imperial() {
		limit = metricReadable * 2
	}
	// The most detailed scale that needs fewer sheets and uses at least
	// half of its last; else the most detailed that needs fewer.
	var fewer Scale
	found := false
	for _, s := range allSteps(l.u.Imperial()) {
		if s.Ratio <= l.scale.Ratio || s.Ratio > limit {
			continue
		}
		if at := l.sheetsAt(s, usable); len(at) < len(pages) {
			if halfUsed(s, at) {
				return s, true
			}
			if !found {
				fewer, found = s, true
			}
		}
	}
	return fewer, found
}

// sheetsAt is how paginateAt would divide the depth range at scale s.
func (l *layout) sheetsAt(s Scale, usable float64) []span {
	per := schema.Length(usable / s.PointsPerMetre())
	step := schema.LengthFrom(l.majorStepAt(s), l.u.Depth)
	pages := paginate(l.top, l.bot, per, step)
	if l.even && len(pages) > 1 {
		return paginateEven(l.top, l.bot, per, step, len(pages))
	}
	return pages
}

// withinSheetLimit is the most detailed round scale, less detailed than
// s, at which the log takes no more than maxSheets sheets, to suggest
// when s takes too many; false when none does.
func (l *layout) withinSheetLimit(s Scale, usable float64) (Scale, bool) {
	for _, c := range allSteps(s.Imperial) {
		if c.Ratio <= s.Ratio || float64((l.bot-l.top)/schema.Length(usable/c.PointsPerMetre())) > maxSheets {
			continue // as detailed, or too many sheets even before the round breaks
		}
		if len(l.sheetsAt(c, usable)) <= maxSheets {
			return c, true
		}
	}
	return Scale{}, false
}

// paginateAt divides the depth range into sheets at a scale.
func (l *layout) paginateAt(s Scale, usable float64) error {
	per := schema.Length(usable / s.PointsPerMetre())
	if n := float64((l.bot - l.top) / per); n > maxSheets {
		msg := fmt.Sprintf("at %s the well needs %.0f sheets (more than %d); choose a smaller scale, with more depth to the inch", s, math.Ceil(n), maxSheets)
		if fit, ok := l.withinSheetLimit(s, usable); ok {
			msg += fmt.Sprintf(", such as %s", fit)
		}
		return errors.New(msg)
	}
	l.scaleFields()
	l.sheets = l.sheetsAt(s, usable)
	return nil
}

// layColumns divides the body width by the page's column fractions.
func (l *layout) layColumns(width float64) {
	f := l.pg.columns()
	x := l.content.X
	next := func(frac float64) xRange {
		r := xRange{X: x, W: frac * width}
		x += r.W
		return r
	}
	l.cols.depth = next(f.Depth)
	l.cols.elev = next(f.Elevation)
	l.cols.lith = next(f.Lithology)
	l.cols.uscs = next(f.USCS)
	l.cols.desc = next(f.Description)
	l.cols.well = next(f.Well)
	l.cols.call = next(f.Callouts)
	l.layFeatureColumn(width)
}

// majorStep is the depth-axis tick interval in the file's depth unit:
// the smallest of 1, 2, 5 x 10^k that leaves at least 36 pt between ticks.
func (l *layout) majorStep() float64 { return l.majorStepAt(l.scale) }

// majorStepAt is the depth-axis tick interval at scale s.
func (l *layout) majorStepAt(s Scale) float64 {
	perUnit := s.Points(schema.LengthFrom(1, l.u.Depth))
	return niceStep(36 / perUnit)
}

// niceStep is the smallest 1, 2 or 5 x 10^k at least v.
func niceStep(v float64) float64 {
	if !(v > 0) || math.IsInf(v, 0) {
		return 1
	}
	p := math.Pow(10, math.Floor(math.Log10(v)))
	for _, m := range []float64{1, 2, 5, 10} {
		if m*p >= v*(1-1e-9) {
			return m * p
		}
	}
	return 10 * p
}

// paginate cuts [top, bot] into sheets of at most per metres each, ending
// each sheet but the last on a round depth (a multiple of step, the
// depth-axis tick interval) so that match lines fall on ticks.
func paginate(top, bot, per, step schema.Length) []span {
	if bot-top <= per {
		return []span{{top, bot}}
	}
	var out []span
	s := top
	for s < bot {
		e := s + per
		if e >= bot {
			out = append(out, span{s, bot})
			break
		}
		// Round the match depth down to a tick when that still leaves the
		// sheet at least half full.
		if r := roundDown(e, step); r > s+per/2 {
			e = r
		}
		out = append(out, span{s, e})
		s = e
	}
	return out
}

// lastUsed is the part of the last drawing sheet's body in use: its
// drawing, and the notes standing at its foot (freespace.go).
func (l *layout) lastUsed() float64 {
	usable := l.plot.H - plotPadTop - plotPadBottom
	last := l.sheets[len(l.sheets)-1]
	drawn := l.scale.Points(last.Bottom - last.Top)
	used := drawn / usable
	for _, b := range l.freeBoxes {
		used = max(used, 1-(b.r.Y-(l.plot.Y+plotPadTop+drawn))/usable)
	}
	return used
}

// paginateEven cuts [top, bot] into n sheets of at most per metres
// each, as nearly equal as the match lines on the nearest ticks (of
// step) allow.
func paginateEven(top, bot, per, step schema.Length, n int) []span {
	var out []span
	s := top
	for k := 1; k < n; k++ {
		e := top + (bot-top)*schema.Length(k)/schema.Length(n)
		if r := roundDown(e+step/2, step); r > s && r-s <= per && bot-r <= per*schema.Length(n-k) {
			e = r
		}
		e = min(e, s+per)
		out = append(out, span{s, e})
		s = e
	}
	return append(out, span{s, bot})
}

// roundDown is the largest multiple of step not above v (with a little
// tolerance, so 150 ft stays 150 ft after conversion to metres and back).
func roundDown(v, step schema.Length) schema.Length {
	if step <= 0 {
		return v
	}
	return schema.Length(math.Floor(float64(v/step)+1e-9)) * step
}

// niceFloor is the largest 1, 2 or 5 x 10^k not above v.
func niceFloor(v float64) float64 {
	if !(v > 0) || math.IsInf(v, 0) {
		return 1
	}
	p := math.Pow(10, math.Floor(math.Log10(v)))
	for _, m := range []float64{5, 2, 1} {
		if m*p <= v*(1+1e-9) {
			return m * p
		}
	}
	return p
}
