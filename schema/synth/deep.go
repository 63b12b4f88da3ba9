package synth

import (
	"fmt"
	"math"
	"math/rand"
	"strings"
)

// Deep returns the TOML text of a deep telescoped supply well (invented):
// total depth td feet, a conductor, a surface and a production casing
// telescoped inside one another, a screen liner hung in the production
// casing on a packer, and n lithology intervals of varied description
// length. Its volumes follow the recorded diameters, so it checks clean
// but for one waived finding; it is the stress case of the sheets' text
// fitting.
func Deep(td float64, n int) []byte {
	r := rand.New(rand.NewSource(int64(n)*104729 + int64(td)))
	var b strings.Builder
	p := func(format string, args ...any) { fmt.Fprintf(&b, format+"\n", args...) }
	f := func(v float64) string { return num(Len(v)) }
	// Depths of the telescope, in feet: each casing is cemented in its own
	// hole section, the liner hangs 10 ft into the production casing.
	cond, surf, prod := 60.0, math.Round(td/3), math.Round(td*2/3)
	linerTop := prod - 10
	screenTop := prod + 10
	sumpBot := td - 10
	ann := func(hole, pipe float64) float64 { return math.Pi / 4 * (hole*hole - pipe*pipe) / 144 } // ft3 per ft

	p("# Deep supply well %.0f ft with %d lithology intervals (generated test data, invented).", td, n)
	p("[units]\ndepth = \"ft\"\ndiameter = \"in\"\n")
	p("[well]")
	p("id = \"DS-%d\"", int(td))
	p("project = \"Marlow Basin Deep Aquifer Test\"\nclient = \"Marlow Basin Water Cooperative\"\nsite = \"Test site 4, Quarry Hollow Road\"")
	p("purpose = \"public-supply\"\nstatus = \"active\"\ndrilled = 2026-01-12\ncompleted = 2026-03-20\ntotal_depth = %s", f(td))
	p("permit = \"MBWC-PS-2026-11\"\nlogged_by = \"E. Vasquez-Lund, PG 30118\"\nchecked_by = \"N. Achterberg, PE 61204\"")
	p("notes = [%q, %q]", "Conductor, surface and production casings cemented in turn; screen liner set on a packer.", "Descriptions from cuttings every 5 ft and the geophysical logs.")
	p("\n[drilling]\nmethod = \"mud rotary\"\ncontractor = \"Deepwell Brothers Drilling\"\nlicence = \"C57-712455\"\ndriller = \"O. Fairweather\"")
	p("\n[location]\ndescription = \"Test site 4, 200 ft south of the quarry gate\"\neasting = 498120.0\nnorthing = 4302210.0\nsystem = \"invented local grid, ft\"")
	p("\n[elevation]\nground = 1204.6\nmeasuring_point = 1206.1\ndatum = \"NAVD88\"\nsurveyed = 2026-03-25")
	p("\n[measuring_point]\npipe = \"production\"")
	p("\n[pump]\nintake = %s\ndescription = \"submersible, 125 hp, on 8-in column\"", f(linerTop-40))
	holes := []struct{ top, bot, d float64 }{{0, cond, 36}, {cond, surf, 30}, {surf, prod, 24}, {prod, td, 19}}
	for _, h := range holes {
		p("\n[[borehole]]\ntop = %s\nbottom = %s\ndiameter = %s", f(h.top), f(h.bot), f(h.d))
	}
	casings := []struct {
		name       string
		top, bot   float64
		od, id     float64
		driveShoe  bool
		centralise bool
	}{
		{"conductor", 0, cond, 32, 31.25, true, false},
		{"surface", 0, surf, 26, 25.25, false, true},
		{"production", -1.5, prod, 20, 19.25, false, true},
	}
	for _, c := range casings {
		p("\n[[casing]]\nname = %q\nkind = %q\ntop = %s\nbottom = %s\nmaterial = \"carbon steel\"\nod = %s\nid = %s\njoint = \"welded\"", c.name, c.name, f(c.top), f(c.bot), f(c.od), f(c.id))
		if c.driveShoe {
			p("drive_shoe = true")
		}
		if c.centralise {
			p("centralizers = [%s, %s]", f(math.Round(c.bot/2)), f(c.bot-10))
		}
	}
	p("\n[[string]]\nname = \"liner\"\nhung_in = \"production\"\nhanger = \"packer\"\nhanger_product = \"neoprene lead packer\"\nbottom_cap = \"welded steel plate\"")
	sections := []struct {
		kind     string
		top, bot float64
	}{{"riser", linerTop, screenTop}}
	for z := screenTop; z < sumpBot-10; {
		s := math.Min(z+60, sumpBot-10)
		sections = append(sections, struct {
			kind     string
			top, bot float64
		}{"screen", z, s})
		if s >= sumpBot-10 {
			z = s
			break
		}
		blank := math.Min(s+20, sumpBot-10)
		sections = append(sections, struct {
			kind     string
			top, bot float64
		}{"riser", s, blank})
		z = blank
	}
	sections = append(sections, struct {
		kind     string
		top, bot float64
	}{"sump", sections[len(sections)-1].bot, sumpBot})
	for k, s := range sections {
		p("\n[[string.section]]\nkind = %q\ntop = %s\nbottom = %s", s.kind, f(s.top), f(s.bot))
		switch {
		case s.kind == "screen":
			p("material = \"304 stainless steel\"\nod = 12.75\nid = 12.0\nslot_number = 50\ntype = \"continuous-wrap\"")
		case k == 0:
			p("material = \"carbon steel\"\nsize = \"12\"\nschedule = \"40\"\njoint = \"welded\"")
		}
	}
	grout := func(top, bot, hole, pipe float64, within string) {
		p("\n[[fill]]\ntop = %s\nbottom = %s", f(top), f(bot))
		if within != "" {
			p("within = %q", within)
		}
		p("material = \"neat-cement\"\nproduct = \"Portland Type II\"\nmethod = \"tremie\"\nvolume = %s", f(math.Round(ann(hole, pipe)*(bot-top)*1.05)))
	}
	grout(0, cond, 36, 32, "")
	grout(0, cond, 31.25, 26, "conductor")
	grout(cond, surf, 30, 26, "")
	grout(0, surf, 25.25, 20, "surface")
	grout(surf, prod, 24, 20, "")
	packVol := 0.0
	for _, s := range sections {
		if s.top >= prod {
			packVol += ann(19, 12.75) * (s.bot - s.top)
		}
	}
	packVol += ann(19, 12.75)*(screenTop-prod) + math.Pi/4*19*19/144*(td-sumpBot)
	p("\n[[fill]]\ntop = %s\nbottom = %s\nmaterial = \"filter-pack\"\nproduct = \"rounded silica gravel\"\ngradation = \"6/12\"\nmethod = \"tremie\"\nvolume = %s", f(prod), f(td), f(math.Round(packVol)))

	// Lithology: n intervals of varied thickness; soils above the
	// production casing's shoe, permeable sands, gravels and sandstone
	// below it (no aquitard across the packed length).
	rocks := []struct{ rock, desc string }{
		{"sandstone", "SANDSTONE, fine to medium grained, friable, light grey, water-bearing fractures"},
		{"conglomerate", "CONGLOMERATE, poorly cemented, rounded quartzite pebbles in a sandy matrix"},
		{"sandstone", "SANDSTONE, coarse grained, weakly cemented, tan"},
	}
	extra := []string{"", "; occasional thin interbeds of silt", "; drilling slowed, mud losses of about 20 bbl noted by the driller, cuttings coarser", "; cuttings with shell fragments and scattered wood", "; geophysical log shows a high-resistivity unit; gamma low; caliper in gauge"}
	cuts := make([]float64, n+1)
	for k := 1; k < n; k++ {
		cuts[k] = td * (float64(k) + 0.6*(r.Float64()-0.5)) / float64(n)
	}
	cuts[n] = td
	for k := 0; k < n; k++ {
		top, bot := math.Round(cuts[k]), math.Round(cuts[k+1])
		if k == n-1 {
			bot = td
		}
		if bot <= top {
			continue
		}
		p("\n[[lithology]]\ntop = %s\nbottom = %s", f(top), f(bot))
		x := extra[r.Intn(len(extra))]
		switch {
		case bot > prod && k%3 == 0:
			s := rocks[r.Intn(len(rocks))]
			p("rock = %q\ndescription = %q", s.rock, s.desc+x)
		case bot > prod:
			s := aquifers[r.Intn(len(aquifers))]
			p("uscs = %q\ndescription = %q", s.uscs, s.desc+x)
		default:
			s := soils[r.Intn(len(soils))]
			p("uscs = %q\ndescription = %q", s.uscs, s.desc+x)
		}
	}
	p("\n[[water_level]]\ndepth = 312.5\nkind = \"static\"\nreference = \"measuring-point\"\nmeasured = 2026-03-21T09:00:00")
	p("\n[surface]\nkind = \"stick-up\"\nlock = \"well house, locked\"\n\n[surface.pad]\nlength = 12.0\nwidth = 12.0\nthickness = 0.67")
	return []byte(b.String())
}
