package sheet

import "github.com/tremie-dev/tremie/render/draw"

// part is one piece of the well as the sheet shows it. It paints itself
// on one sheet (clipping with the painter's vis/visible and recording
// what it paints with p.use), labels itself with callouts, and names the
// legend symbols it paints anywhere in the well, so the legend is known
// without painting.
type part interface {
	paint(p *painter) []draw.Item
	callouts(l *layout) []callout
	legend() []symbol
}

// supplyParts are the parts of telescoped supply wells: liners with their
// laps, drive shoes, the pump and the tags of fill tops. They paint above
// the pipes.
func (l *layout) supplyParts() []part {
	var ps []part
	for i := range l.w.Strings {
		if lp, ok := newLapPart(l, i); ok {
			ps = append(ps, lp)
		}
	}
	for i, c := range l.w.Casings {
		if c.DriveShoe {
			ps = append(ps, shoePart{ci: i})
		}
	}
	if l.w.Pump != nil {
		ps = append(ps, pumpPart{})
	}
	for i, f := range l.w.Fills {
		if len(f.Tags) > 0 {
			ps = append(ps, tagPart{fi: i})
		}
	}
	return ps
}
