package sheet

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// Scale is a vertical drawing scale: Ratio real lengths per paper length.
// An imperial scale "1 in = 5 ft" is the ratio 60; a metric "1:50" is 50.
type Scale struct {
	Ratio    float64
	Imperial bool // written as "1 in = N ft" rather than "1:N"
	// Fit asks for the most detailed round scale that draws the whole
	// well on one sheet (Ratio is then chosen by the layout).
	Fit bool
}

// Fitted is the scale that asks for one sheet.
var Fitted = Scale{Fit: true}

const pointsPerMetre = 72 / 0.0254 // 1 in = 72 pt = 0.0254 m exactly

// PointsPerMetre is how many page points one metre of depth takes.
func (s Scale) PointsPerMetre() float64 { return pointsPerMetre / s.Ratio }

// Points is the drawn length of a depth interval.
func (s Scale) Points(l schema.Length) float64 { return float64(l) * s.PointsPerMetre() }

// FeetPerInch is the imperial reading of the scale.
func (s Scale) FeetPerInch() float64 { return s.Ratio / 12 }

// String writes the scale as a drafter states it: "1 in = 5 ft" or "1:50".
func (s Scale) String() string {
	if s.Fit && s.Ratio == 0 {
		return "fit"
	}
	if s.Imperial {
		return fmt.Sprintf("1 in = %s ft", schema.TrimFloat(s.FeetPerInch(), 2))
	}
	return "1:" + schema.TrimFloat(s.Ratio, 1)
}

// Imperial makes the scale 1 in = ft feet.
func Imperial(ft float64) Scale { return Scale{Ratio: ft * 12, Imperial: true} }

// Metric makes the scale 1:n.
func Metric(n float64) Scale { return Scale{Ratio: n} }

// ParseScale reads "1in=5ft", "1 in = 5 ft", "1\"=5'", "1:50", or "fit"
// (one sheet at the most detailed round scale that holds the well).
func ParseScale(s string) (Scale, error) {
	t := strings.ToLower(strings.ReplaceAll(s, " ", ""))
	if t == "fit" {
		return Fitted, nil
	}
	if a, b, ok := strings.Cut(t, ":"); ok {
		if a != "1" {
			return Scale{}, fmt.Errorf("scale %q: a metric scale is written 1:N, such as 1:50", s)
		}
		n, err := strconv.ParseFloat(b, 64)
		if err != nil || !(n > 0) || math.IsInf(n, 0) {
			return Scale{}, fmt.Errorf("scale %q: %q is not a positive number", s, b)
		}
		return Metric(n), nil
	}
	a, b, ok := strings.Cut(t, "=")
	if !ok {
		return Scale{}, fmt.Errorf("scale %q: write it as 1in=5ft or 1:50", s)
	}
	a = strings.TrimSuffix(strings.TrimSuffix(a, "in"), "\"")
	b = strings.TrimSuffix(strings.TrimSuffix(b, "ft"), "'")
	in, err1 := strconv.ParseFloat(a, 64)
	ft, err2 := strconv.ParseFloat(b, 64)
	if err1 != nil || err2 != nil || !(in > 0) || !(ft > 0) || math.IsInf(in, 0) || math.IsInf(ft, 0) {
		return Scale{}, fmt.Errorf("scale %q: write it as 1in=5ft (paper inches = real feet)", s)
	}
	return Imperial(ft / in), nil
}

// Round scales, most detailed first. Automatic scaling walks these and
// stops at the last readable one (index readable); past it the well goes
// on over several sheets rather than shrinking further. Neighbouring steps
// are at most 1.5 apart (but at the very ends), so the scale that holds a
// well on one sheet fills at least two thirds of its body.
var (
	// ft per in: the faces of the engineer's scale (10 to 60 parts to the
	// inch, read at 1, 10 and 100 ft a part), with 8 and 80 read on the
	// 40 face at 2 parts a division and 15 and 150 on the 30 face at a
	// half (common practice)
	imperialSteps = []float64{1, 2, 3, 4, 5, 6, 8, 10, 15, 20, 30, 40, 50, 60, 80, 100, 150, 200, 300, 400, 500, 600}
	// 1:N: ISO 5455 steps with the 1:25, 1:75, 1:125, 1:150 and 1:250 of
	// metric scale rules (common practice)
	metricSteps      = []float64{20, 25, 50, 75, 100, 125, 150, 200, 250, 500, 1000, 2000}
	imperialReadable = 50.0  // 1 in = 50 ft: a 2-ft seal is 2.9 pt
	metricReadable   = 500.0 // 1:500: a 1-m seal is 5.7 pt
)

// candidates lists the automatic scales for the units, most detailed
// first, ending at the readable limit.
func candidates(imperial bool) []Scale {
	var out []Scale
	if imperial {
		for _, ft := range imperialSteps {
			if ft <= imperialReadable {
				out = append(out, Imperial(ft))
			}
		}
		return out
	}
	for _, n := range metricSteps {
		if n <= metricReadable {
			out = append(out, Metric(n))
		}
	}
	return out
}

// allSteps is every round scale of the units, past the readable limit
// too, most detailed first.
func allSteps(imperial bool) []Scale {
	var all []Scale
	if imperial {
		for _, ft := range append(imperialSteps, 800, 1000, 2000) {
			all = append(all, Imperial(ft))
		}
		return all
	}
	for _, n := range append(metricSteps, 5000, 10000) {
		all = append(all, Metric(n))
	}
	return all
}

// fitScale is the most detailed round scale of every step the units have
// (past the readable limit too) at which a depth span fits the body, or
// false when none does.
func fitScale(imperial bool, span schema.Length, body float64) (Scale, bool) {
	all := allSteps(imperial)
	for _, s := range all {
		if s.Points(span) <= body {
			return s, true
		}
	}
	return all[len(all)-1], false
}

// autoScale picks the most detailed round scale at which a depth span
// fits the body height, or the readable limit when none does.
func autoScale(imperial bool, span schema.Length, body float64) (Scale, bool) {
	cs := candidates(imperial)
	for _, s := range cs {
		if s.Points(span) <= body {
			return s, true
		}
	}
	return cs[len(cs)-1], false
}
