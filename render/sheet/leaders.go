package sheet

import (
	"github.com/tremie-dev/tremie/render/draw"
)

// calloutItems draws placed callouts: white ground, text and a leader
// from the component to the label's first line.
func (p *painter) calloutItems(pcs []placedCallout) []draw.Item {
	l := p.l
	knee := l.cols.well.Right() + 2
	var items []draw.Item
	for _, pc := range pcs {
		b := pc.box
		items = append(items, box(b, draw.Color{}, 0, draw.White, "callout:"+pc.c.key))
		items = append(items, pc.block.items(b.X+1, b.Y, ink, "callout-text")...)
		ly := b.Y + lineGap(sizeSmall)*0.55
		items = append(items,
			draw.Shape{Style: draw.Style{Stroke: ink, StrokeWidth: 0.45}, Points: []draw.Point{{X: pc.anchorX, Y: pc.anchorY}, {X: knee, Y: pc.anchorY}, {X: b.X - 4, Y: ly}, {X: b.X - 0.5, Y: ly}}, Role: "leader:" + pc.c.key},
		)
		for _, x := range pc.dotsX {
			items = append(items, draw.Circle{Style: draw.Style{Fill: ink}, Center: draw.Point{X: x, Y: pc.anchorY}, R: 0.9})
		}
	}
	return items
}
