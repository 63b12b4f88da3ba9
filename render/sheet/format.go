package sheet

import (
	"fmt"
	"strings"
	"unicode"
	"unicode/utf8"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

// Words for numbers on the sheet, in the file's units.

func (l *layout) depth(d schema.Length) string { return l.u.FormatDepth(d) }

func (l *layout) interval(iv schema.Interval) string { return l.u.FormatInterval(iv.Top, iv.Bottom) }

func (l *layout) diameter(d schema.Diameter) string { return l.u.FormatDiameter(d) }

// volume writes a volume in the well's primary report unit, as printed.
func (l *layout) volume(v schema.Volume) string {
	p, _ := quantity.VolumeUnits(l.u)
	return quantity.Number(v.In(p)) + " " + p.Symbol()
}

// pipeSpec writes a pipe as a drafter labels it: "2-in Sch 40 PVC,
// flush-threaded".
func (l *layout) pipeSpec(p schema.Pipe) string {
	words := l.pipeWords(p)
	if strings.TrimSpace(p.Size) == "" && p.OD > 0 {
		od := "OD " + l.diameter(p.OD)
		if words == "" || strings.HasPrefix(words, ",") {
			return od + words
		}
		return od + " " + words
	}
	return words
}

// pipeLine is the words of a pipe for a label whose next line gives its
// diameters, so the outside diameter is not said twice.
func (l *layout) pipeLine(p schema.Pipe) string {
	if w := l.pipeWords(p); w != "" {
		return w
	}
	return "pipe material not recorded"
}

// pipeWords is pipeSpec without an outside diameter, for a label whose
// next line gives the diameters: "10-in Sch 40 carbon steel, welded".
func (l *layout) pipeWords(p schema.Pipe) string {
	var parts []string
	switch s := strings.TrimSpace(p.Size); {
	case s == "":
	case strings.HasPrefix(strings.ToUpper(s), "DN"):
		parts = append(parts, strings.ToUpper(s))
	default:
		parts = append(parts, strings.TrimSuffix(strings.TrimSuffix(s, "in"), "\"")+"-in")
	}
	if p.Schedule != "" {
		parts = append(parts, "Sch "+p.Schedule)
	}
	if p.SDR > 0 {
		parts = append(parts, "SDR "+schema.TrimFloat(p.SDR, 1))
	}
	if p.Material != "" {
		parts = append(parts, p.Material)
	}
	s := strings.Join(parts, " ")
	if p.Joint != "" {
		s = strings.TrimPrefix(s+", "+p.Joint, ", ")
	}
	return s
}

func (l *layout) pipeSizes(p schema.Pipe) string {
	switch {
	case p.OD > 0 && p.ID > 0:
		return fmt.Sprintf("OD %s, ID %s", l.diameter(p.OD), l.diameter(p.ID))
	case p.OD > 0:
		return "OD " + l.diameter(p.OD)
	}
	return "diameter not recorded"
}

// slot writes a screen's slot: "0.010-in slot (10-slot)" or "0.25-mm slot".
func (l *layout) slot(sec schema.Section) string {
	if sec.Slot <= 0 {
		return "slot not recorded"
	}
	if l.u.Diameter == schema.Millimetres {
		return fmt.Sprintf("%s-mm slot", schema.TrimFloat(float64(sec.Slot), 2))
	}
	return fmt.Sprintf("%.3f-in slot (%s-slot)", sec.Slot.Inches(), schema.TrimFloat(sec.SlotNumber(), 1))
}

// materialName is a fill class in words: "Filter pack", "Bentonite chips".
func materialName(m schema.Material) string {
	s := m.Words()
	if s == "" {
		return "Fill"
	}
	return strings.ToUpper(s[:1]) + s[1:]
}

// amountRow finds the quantity row of fill i.
func (l *layout) amountRow(i int) (quantity.Row, bool) {
	if l.in.Quantities == nil {
		return quantity.Row{}, false
	}
	for _, r := range l.in.Quantities.Rows {
		if r.Index == i {
			return r, true
		}
	}
	return quantity.Row{}, false
}

// calculated writes a row's calculated amount: "4.86 ft³ (10 bags)".
func (l *layout) calculated(r quantity.Row) string {
	if r.Err != nil || r.Calculated <= 0 {
		return "—"
	}
	s := l.volume(r.Calculated)
	if r.HasYield && r.BagsNeeded > 0 {
		s += fmt.Sprintf(" (%d %s)", r.BagsNeeded, plural(r.BagsNeeded, "bag", "bags"))
	}
	return s
}

// placed writes a row's placed amount: "9 bags = 4.5 ft³".
func (l *layout) placed(r quantity.Row) string {
	if !r.Recorded {
		return "not recorded"
	}
	switch {
	case r.BagsPlaced > 0 && r.Placed > 0:
		return fmt.Sprintf("%s %s = %s", schema.TrimFloat(r.BagsPlaced, 1), plural(int(r.BagsPlaced+0.5), "bag", "bags"), l.volume(r.Placed))
	case r.BagsPlaced > 0:
		return fmt.Sprintf("%s %s", schema.TrimFloat(r.BagsPlaced, 1), plural(int(r.BagsPlaced+0.5), "bag", "bags"))
	}
	return l.volume(r.Placed)
}

// toOrder writes a design's order for an interval: "11 bags" (the
// calculated volume with the contingency, in whole bags), or the volume
// for a material without bags.
func (l *layout) toOrder(r quantity.Row) string {
	if n := r.BagsToOrder(quantity.DefaultContingency); n > 0 {
		return fmt.Sprintf("%d %s", n, plural(n, "bag", "bags"))
	}
	if r.Err != nil || r.Calculated <= 0 {
		return "—"
	}
	return l.volume(schema.Volume(float64(r.Calculated) * (1 + quantity.DefaultContingency/100)))
}

// yield writes the yield per bag in force: "0.5 ft³ per 50 lb".
func (l *layout) yield(r quantity.Row) string {
	if !r.HasYield || r.Yield.Volume <= 0 {
		return "—"
	}
	s := l.volume(r.Yield.Volume) + " per bag"
	if r.Yield.BagMass > 0 {
		s = fmt.Sprintf("%s per %s %s", l.volume(r.Yield.Volume), schema.TrimFloat(r.Yield.BagMass.In(l.u.Mass), 1), l.u.Mass)
	}
	return s
}

func ratio(r quantity.Row) string {
	if r.Ratio <= 0 {
		return "—"
	}
	return fmt.Sprintf("%.2f", r.Ratio)
}

func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}

// amountFracs are the amounts table's column widths in a box of inner
// width w, as fractions of it: the columns' shares (amountCols; a
// design's "To order" holds a few words, "14 bags", and gives room to
// its yield, "0.500 ft³ per 50 lb"), widened where a column's widest
// word or number with its unit would not fit, at the expense of the
// others' room beyond theirs.
func (l *layout) amountFracs(w float64) []float64 {
	fr := make([]float64, len(amountCols))
	for i, c := range amountCols {
		fr[i] = c.frac
	}
	if l.w.IsPlanned() {
		fr = []float64{0.17, 0.21, 0.22, 0.15, 0.25}
	}
	least := make([]float64, len(fr))
	widest := func(i int, font draw.FontStyle, s string) {
		for _, g := range amountGroups(strings.ReplaceAll(s, "–", "– ")) {
			least[i] = max(least[i], draw.TextWidth(font, sizeTiny, g)+3.5)
		}
	}
	for i, h := range l.amountHead() {
		least[i] = draw.TextWidth(draw.Bold, sizeTiny, h) + 3.5 // a head on one line
	}
	if l.in.Quantities != nil {
		for _, row := range l.amountRows() {
			for i, s := range row {
				widest(i, draw.Regular, s)
			}
		}
	}
	need, spare := 0.0, 0.0
	for i := range fr {
		need += max(least[i]-fr[i]*w, 0)
		spare += max(fr[i]*w-least[i], 0)
	}
	if need == 0 || need > spare {
		return fr
	}
	for i := range fr {
		if least[i] > fr[i]*w {
			fr[i] = least[i] / w
		} else {
			fr[i] -= (fr[i]*w - least[i]) / spare * need / w
		}
	}
	return fr
}

// amountGroups splits an amount into the words a line may break
// between, each number kept with the unit after it ("9.709 L", "(1
// bag)", "0.500 ft³").
func amountGroups(s string) []string {
	var groups []string
	for _, tok := range strings.Fields(s) {
		if k := len(groups) - 1; k >= 0 && endsInDigit(groups[k]) && startsAUnit(tok) {
			groups[k] += " " + tok
			continue
		}
		groups = append(groups, tok)
	}
	return groups
}

// wrapAmount wraps an amount to width keeping each number with the unit
// after it ("9.709 L" / "(1 bag)", never "(1" / "bag)"); a number and
// unit wider than the width on their own are wrapped as words.
func wrapAmount(font draw.FontStyle, size float64, s string, width float64) []string {
	var lines []string
	line := ""
	for _, g := range amountGroups(s) {
		if line != "" && draw.TextWidth(font, size, line+" "+g) <= width {
			line += " " + g
			continue
		}
		if line != "" {
			lines = append(lines, line)
			line = ""
		}
		if draw.TextWidth(font, size, g) <= width {
			line = g
			continue
		}
		parts := draw.Wrap(font, size, g, width)
		lines = append(lines, parts[:len(parts)-1]...)
		line = parts[len(parts)-1]
	}
	if line != "" {
		lines = append(lines, line)
	}
	return lines
}

func endsInDigit(s string) bool {
	r, _ := utf8.DecodeLastRuneInString(s)
	return unicode.IsDigit(r)
}

// startsAUnit tells a word that names the unit of the number before it:
// "bags)", "ft³", "L", "lb", "%".
func startsAUnit(s string) bool {
	r, _ := utf8.DecodeRuneInString(s)
	return unicode.IsLetter(r) || r == '%'
}
