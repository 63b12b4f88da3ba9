package rules

import "github.com/tremie-dev/tremie/schema"

func init() {
	register(&Rule{
		ID:    "ELEVATION-STICKUP",
		Title: "Surveyed elevations agree with the stick-up",
		Doc: "The measuring point is the one `[measuring_point]` names, else the top of the riser. Its surveyed elevation minus the ground elevation " +
			"must equal the height of that riser top above ground (a negative top in the file; below ground for a " +
			"flush mount), within the tolerance; otherwise water levels converted from the measuring point are " +
			"wrong. Skipped when either elevation is missing.",
		Severity: Error,
		Source:   "common practice: water-level elevation = measuring-point elevation - depth to water",
		Params: []Param{{
			Name: "tolerance", Kind: LengthParam, Default: 0.03, DefaultFt: 0.1,
			Doc: "allowed difference between surveyed and recorded stick-up",
			Source: "common practice: 0.1 ft (0.03 m), no published figure; the ground beside a casing is not one point " +
				"and a ground shot is commonly good to about 0.1 ft where the measuring point is surveyed to 0.01 ft",
		}},
		Run: runElevationStickup,
	})
}

func runElevationStickup(p *Pass) {
	w := p.Well
	e := w.Elevation
	if e.Ground == nil || e.MeasuringPoint == nil {
		return
	}
	surveyed := *e.MeasuringPoint - *e.Ground
	// The measuring point the file names; else any top of a pipe that
	// reaches the surface (a liner hangs below it).
	tops := []schema.Length{-w.StickUp()}
	if !w.MeasuringPoint.Given() {
		tops = tops[:0]
		for _, s := range w.Strings {
			if len(s.Sections) > 0 && s.Liner == nil {
				tops = append(tops, s.Top())
			}
		}
		if len(tops) == 0 {
			for _, c := range w.Casings {
				tops = append(tops, c.Top)
			}
		}
	}
	if len(tops) == 0 {
		return
	}
	tol := p.Length("tolerance")
	best := tops[0]
	for _, t := range tops {
		if d := surveyed + t; abs(d) < abs(surveyed+best) {
			best = t
		}
	}
	if diff := surveyed + best; abs(diff) > tol+eps {
		p.Reportf("elevation.measuring_point", []schema.Length{best}, "measuring point minus ground is %s, but the %s is %s: they differ by %s, more than %s",
			p.D(surveyed), w.MeasuringPointLabel(), p.level(best), p.D(abs(diff)), p.D(tol))
	}
}

func abs(l schema.Length) schema.Length {
	if l < 0 {
		return -l
	}
	return l
}
