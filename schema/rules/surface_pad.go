package rules

import "github.com/tremie-dev/tremie/schema"

// surfacePadSource is where the pad's minimum size comes from.
const surfacePadSource = "California DWR Bulletin 74-81 / 74-90, Part II section 10 (surface features, well pad): " +
	"a concrete pad at least 4 in thick, extending at least 2 ft laterally in every direction from the outside of the boring"

func init() {
	register(&Rule{
		ID:    "SURFACE-PAD",
		Title: "The concrete pad is thick and wide enough",
		Doc: "A concrete pad around the casing at ground sheds surface water away from the well and protects " +
			"the top of the annular seal. For water wells (domestic, public-supply, industrial, irrigation) " +
			"it must be recorded, be at least the minimum thickness and, centred on the boring, reach the " +
			"minimum distance beyond the boring on every side: its shorter side is compared with the " +
			"boring's diameter at ground plus twice that distance.",
		Severity: Warning,
		Source:   surfacePadSource,
		Params: []Param{
			{Name: "thickness", Kind: LengthParam, Default: 0.1, DefaultFt: 4.0 / 12,
				Doc: "minimum pad thickness", Source: "DWR 74-81 / 74-90 §10: 4 in (0.1 m)"},
			{Name: "reach", Kind: LengthParam, Default: 0.6, DefaultFt: 2,
				Doc: "minimum distance the pad reaches beyond the boring on every side", Source: "DWR 74-81 / 74-90 §10: 2 ft (0.6 m)"},
		},
		Run: runSurfacePad,
	})
}

// padTolerance forgives the rounding of a pad's size as written (common
// practice): 5 mm, about 0.2 in.
const padTolerance = schema.Length(0.005)

func runSurfacePad(p *Pass) {
	w := p.Well
	if !supplyPurposes[w.Purpose] { // water wells, whose standard sets the pad
		return
	}
	pad := w.Surface.Pad
	if pad == nil {
		p.Reportf("surface", nil, "a %s well has no concrete pad recorded ([surface.pad]); one at least %s thick reaching %s beyond the boring is needed",
			w.Purpose, p.D(p.Length("thickness")), p.D(p.Length("reach")))
		return
	}
	// a pad written to hundredths of a foot (0.33 ft for 4 in) passes:
	// padTolerance is the half-centimetre a tape reads to
	if minT := p.Length("thickness"); pad.Thickness > 0 && pad.Thickness < minT-padTolerance {
		p.Reportf("surface.pad.thickness", nil, "the pad is %s thick; at least %s is needed", p.D(pad.Thickness), p.D(minT))
	}
	b, ok := w.BoreholeAt(0)
	if !ok || pad.Length <= 0 || pad.Width <= 0 {
		return
	}
	hole := schema.LengthFrom(b.Diameter.Metres(), schema.Metres)
	reach := p.Length("reach")
	side, key := pad.Width, "surface.pad.width"
	if pad.Length < pad.Width {
		side, key = pad.Length, "surface.pad.length"
	}
	if got := (side - hole) / 2; got < reach-padTolerance {
		p.Reportf(key, nil, "the %s by %s pad reaches %s beyond the %s boring; at least %s on every side (a side of %s) is needed",
			p.D(pad.Length), p.D(pad.Width), p.D(max(got, 0)), w.Units.FormatDiameter(b.Diameter), p.D(reach), p.D(hole+2*reach))
	}
}
