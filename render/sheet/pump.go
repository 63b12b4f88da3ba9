package sheet

import (
	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/symbols"
	"github.com/tremie-dev/tremie/schema"
)

// pumpPart marks the pump intake on the well's centre line.
type pumpPart struct{}

func (pumpPart) stack() stack { return on(layerMark) }

func (pumpPart) extent(l *layout) (schema.Interval, bool) { return at(l.w.Pump.Intake), true }

func (pumpPart) legend(l *layout, v window) []symbol {
	if !v.showsAt(l.w.Pump.Intake) {
		return nil
	}
	return []symbol{partSymbol(symbols.Pump)}
}

func (pumpPart) box(p *painter) draw.Rect {
	y := p.y(p.l.w.Pump.Intake)
	// The mark's bottom third is the intake: it sits on the intake depth.
	return draw.Rect{X: p.l.hz.cx - 6, Y: y - 12*0.75, W: 12, H: 12}
}

func (pp pumpPart) paint(p *painter) []draw.Item {
	if !p.visible(p.l.w.Pump.Intake) {
		return nil
	}
	r := pp.box(p)
	items := []draw.Item{draw.Box{Rect: r, Role: "pump"}}
	return append(items, partSymbol(symbols.Pump).paint(r)...)
}

func (pumpPart) callouts(l *layout) []callout {
	pu := l.w.Pump
	lines := []string{"intake at " + l.depth(pu.Intake)}
	if pu.Description != "" {
		lines = append(lines, pu.Description)
	}
	return []callout{{key: "pump", iv: schema.Interval{Top: pu.Intake, Bottom: pu.Intake}, anchorX: fixed(l.hz.cx + 2), title: "Pump", lines: lines, rank: 4}}
}
