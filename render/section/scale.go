package section

import (
	"fmt"
	"math"

	"github.com/tremie-dev/tremie/schema"
)

// scale is a drawing scale: Ratio real lengths per paper length.
type scale struct {
	ratio    float64
	imperial bool
}

const pointsPerMetre = 72 / 0.0254 // 1 in = 72 pt = 0.0254 m exactly

// points is the drawn length of l metres.
func (s scale) points(metres float64) float64 { return metres * pointsPerMetre / s.ratio }

func (s scale) String() string {
	if s.imperial {
		return fmt.Sprintf("1 in = %s ft", schema.TrimFloat(s.ratio/12, 2))
	}
	return "1:" + schema.TrimFloat(s.ratio, 1)
}

// Round scales, most detailed first: the 1-2-5 steps with the engineer's
// scale's 30, 40 and 60 (common practice). Vertical scales stop at the
// coarsest that still shows a 2-ft seal; horizontal ones run to site
// plans a few kilometres long.
var (
	verticalFeet    = []float64{1, 2, 5, 10, 20, 30, 40, 50, 100, 200, 500}
	verticalMetric  = []float64{20, 50, 100, 200, 250, 500, 1000, 2000, 5000}
	horizontalFeet  = []float64{5, 10, 20, 30, 40, 50, 60, 100, 200, 300, 400, 500, 1000, 2000, 5000, 10000}
	horizontalMetre = []float64{50, 100, 200, 250, 500, 1000, 2000, 2500, 5000, 10000, 25000, 50000, 100000}
)

// fit picks the most detailed round scale at which span metres fit in
// room points; the coarsest when none does (ok false).
func fit(imperial bool, steps []float64, span, room float64) (scale, bool) {
	var last scale
	for _, n := range steps {
		s := scale{ratio: n, imperial: imperial}
		if imperial {
			s.ratio = n * 12
		}
		last = s
		if s.points(span) <= room {
			return s, true
		}
	}
	return last, false
}

// niceStep is the round step (1, 2 or 5 times a power of ten) nearest
// above raw.
func niceStep(raw float64) float64 {
	if !(raw > 0) || math.IsInf(raw, 0) {
		return 1
	}
	p := math.Pow(10, math.Floor(math.Log10(raw)))
	for _, m := range []float64{1, 2, 5, 10} {
		if m*p >= raw {
			return m * p
		}
	}
	return 10 * p
}

// exaggeration is the vertical exaggeration, horizontal ratio over
// vertical ratio, written for the title block.
func exaggeration(h, v scale) string {
	e := h.ratio / v.ratio
	return "vertical exaggeration " + schema.TrimFloat(e, 1) + "×"
}
