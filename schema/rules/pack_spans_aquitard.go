package rules

import (
	"fmt"

	"github.com/tremie-dev/tremie/schema"
)

func init() {
	register(&Rule{
		ID:    "PACK-SPANS-AQUITARD",
		Title: "Screen and pack do not cross a clay or silt layer",
		Doc: "The whole packed length (the screen and the pack and fine sand around it) is the monitored " +
			"zone. A clay or silt layer (a fine-grained ASTM D2487 group: ML, CL, OL, MH, CH, OH, PT) lying " +
			"wholly inside that length, with permeable pack above and below it, is bridged by the pack: the " +
			"well may connect the two zones the layer kept apart, and the sample mixes them.",
		Severity: Warning,
		Source:   "US EPA, RCRA Ground-Water Monitoring: Draft Technical Guidance (1992): the packed length is the monitored zone; a well screens one zone",
		Run:      runPackSpansAquitard,
	})
}

func runPackSpansAquitard(p *Pass) {
	w := p.Well
	seen := map[string]bool{}
	for _, sc := range w.Screens() {
		sec := sc.Section
		packed := []schema.Interval{sec.Interval}
		for _, r := range runs(p.annulusFills(p.annulusAt(mid(sec.Interval))), isPack) {
			if _, ok := overlap(r.Interval, sec.Interval); ok {
				packed = append(packed, r.Interval)
			}
		}
		for _, zone := range union(packed) {
			for _, l := range w.Lithology {
				if !l.FineGrained() || l.Top <= zone.Top+eps || l.Bottom >= zone.Bottom-eps {
					continue
				}
				k := fmt.Sprintf("%s|%g", l.Path, float64(zone.Top))
				if seen[k] {
					continue
				}
				seen[k] = true
				p.Reportf(l.Path, depths(l.Interval), "the %s layer at %s lies inside the packed length %s of string %q: the well may connect the zones above and below it",
					l.USCS, p.span(l.Interval), p.span(zone), sc.String.Name)
			}
		}
	}
}
