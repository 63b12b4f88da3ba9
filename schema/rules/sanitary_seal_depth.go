package rules

import "github.com/tremie-dev/tremie/schema"

// sanitarySealSource is where the default sanitary-seal depths come from.
const sanitarySealSource = "California DWR Bulletin 74-81, section 9.A (minimum depth of seal below ground surface), as reproduced " +
	"in a county's well-permit record: community water supply and industrial wells 50 ft (15 m); individual domestic, " +
	"agricultural, air-conditioning and observation and monitoring wells 20 ft (6.1 m)"

// sanitarySealFt is the default minimum seal depth for each purpose, in
// feet and in the metres the bulletin itself gives beside them (so a well
// in metres gets 15 m, not 15.24 m). Piezometers and recovery wells are
// taken as monitoring wells and injection wells as industrial ones: our
// mapping, not DWR's.
var sanitarySealFt = []struct {
	purpose schema.Purpose
	ft, m   float64
	source  string
}{
	{schema.Monitoring, 20, 6.1, "DWR 74-81 §9.A: observation and monitoring, 20 ft (6.1 m)"},
	{schema.Piezometer, 20, 6.1, "taken as a monitoring well (DWR 74-81 §9.A: 20 ft, 6.1 m)"},
	{schema.Recovery, 20, 6.1, "taken as a monitoring well (DWR 74-81 §9.A: 20 ft, 6.1 m)"},
	{schema.Domestic, 20, 6.1, "DWR 74-81 §9.A: individual domestic, 20 ft (6.1 m)"},
	{schema.Irrigation, 20, 6.1, "DWR 74-81 §9.A: agricultural, 20 ft (6.1 m)"},
	{schema.PublicSupply, 50, 15, "DWR 74-81 §9.A: community water supply, 50 ft (15 m)"},
	{schema.Industrial, 50, 15, "DWR 74-81 §9.A: industrial, 50 ft (15 m)"},
	{schema.Injection, 50, 15, "taken as an industrial well (DWR 74-81 §9.A: 50 ft, 15 m)"},
}

// sanitarySealParam is the one parameter, with a default per purpose.
func sanitarySealParam() Param {
	prm := Param{
		Name: "depth", Kind: LengthParam,
		Doc:    "minimum sanitary-seal depth; set per purpose as [rule.SANITARY-SEAL-DEPTH.PURPOSE] depth = N or [sanitary_seal] PURPOSE = N",
		Source: "no default for a well whose purpose is not given",
	}
	for _, s := range sanitarySealFt {
		prm.ByPurpose = append(prm.ByPurpose, PurposeDefault{
			Purposes: []schema.Purpose{s.purpose},
			Default:  s.m, DefaultFt: s.ft,
			Source: s.source,
		})
	}
	return prm
}

func init() {
	register(&Rule{
		ID:    "SANITARY-SEAL-DEPTH",
		Title: "The sanitary seal reaches the depth the well's use requires",
		Doc: "The annular (sanitary) seal keeps surface water and shallow groundwater from running down the " +
			"outside of the casing. Counted from the surface (or the vault floor) down through the borehole " +
			"annulus, the unbroken run of concrete, grout and bentonite must reach the minimum depth for the " +
			"well's purpose, set per project in the profile's [sanitary_seal] table. Where the pack of a " +
			"shallow well starts above that depth the seal cannot reach it: this is then a warning that a " +
			"variance from the local agency is needed (record it as a waiver).",
		Severity: Error,
		Source:   sanitarySealSource,
		Params:   []Param{sanitarySealParam()},
		Run:      runSanitarySealDepth,
	})
}

func runSanitarySealDepth(p *Pass) {
	w := p.Well
	if w.Purpose == "" {
		return
	}
	required := p.Length("depth")
	if required <= 0 {
		return
	}
	top0 := schema.Length(0)
	if v := w.Surface.Vault; v != nil && v.Depth > 0 {
		top0 = v.Depth
	}
	fs := p.annulusFills(boreholeAnnulus)
	var seal schema.Length
	var first *schema.Fill
	if len(fs) > 0 && fs[0].Top <= top0+eps && fs[0].Material.IsSeal() {
		first = fs[0]
		for _, r := range runs(fs, func(f *schema.Fill) bool { return f.Material.IsSeal() }) {
			if r.Top <= top0+eps {
				seal = r.Bottom
				break
			}
		}
	}
	if seal >= required-eps {
		return
	}
	path := "well.purpose"
	if first != nil {
		path = key(first.Path, "top")
	}
	var packTop schema.Length = -1
	if rs := runs(fs, isPack); len(rs) > 0 {
		packTop = rs[0].Top
	}
	if packTop >= 0 && packTop < required && seal >= packTop-eps {
		p.ReportSeverity(p.capped(Warning), path, []schema.Length{seal, required},
			"the sanitary seal reaches %s, down to the pack at %s; a %s well needs %s: a variance from the local agency is needed", p.D(seal), p.D(packTop), w.Purpose, p.D(required))
		return
	}
	if first == nil {
		p.Reportf(path, []schema.Length{0, required}, "no sanitary seal starts at the surface of the borehole annulus; a %s well needs one at least %s deep", w.Purpose, p.D(required))
		return
	}
	p.Reportf(path, []schema.Length{seal, required}, "the sanitary seal reaches %s; a %s well needs at least %s", p.D(seal), w.Purpose, p.D(required))
}
