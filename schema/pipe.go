package schema

import (
	"fmt"
	"strings"
)

// nominalOD is the outside diameter in inches of each nominal pipe size,
// shared by PVC (ASTM D1785) and steel pipe (ASME B36.10M/B36.19M).
// The PVC values agree with ASTM D1785's table as reproduced in the PVC
// pipe data of sd-w.com/channel_flow/pipe_data (1/8 to 24 in).
var nominalOD = map[string]float64{
	"1/2": 0.840, "3/4": 1.050, "1": 1.315, "1-1/4": 1.660, "1-1/2": 1.900,
	"2": 2.375, "2-1/2": 2.875, "3": 3.500, "4": 4.500, "5": 5.563,
	"6": 6.625, "8": 8.625, "10": 10.750, "12": 12.750,
}

// scheduleWall is the wall thickness in inches by schedule and nominal
// size. Sch 40 and 80 are the minimum walls of ASTM D1785 (PVC), which
// equal the nominal walls of ASME B36.10M (steel) except 10 and 12 in Sch
// 80 (steelWall); 5S and 10S from ASME B36.19M (stainless): 1/2 to 2 in
// agree with Ta Chen's stainless pipe dimension chart, larger sizes from
// memory.
var scheduleWall = map[string]map[string]float64{
	"40": {"1/2": 0.109, "3/4": 0.113, "1": 0.133, "1-1/4": 0.140, "1-1/2": 0.145, "2": 0.154,
		"2-1/2": 0.203, "3": 0.216, "4": 0.237, "5": 0.258, "6": 0.280, "8": 0.322, "10": 0.365, "12": 0.406},
	"80": {"1/2": 0.147, "3/4": 0.154, "1": 0.179, "1-1/4": 0.191, "1-1/2": 0.200, "2": 0.218,
		"2-1/2": 0.276, "3": 0.300, "4": 0.337, "5": 0.375, "6": 0.432, "8": 0.500, "10": 0.593, "12": 0.687},
	"5S": {"1/2": 0.065, "3/4": 0.065, "1": 0.065, "1-1/4": 0.065, "1-1/2": 0.065, "2": 0.065,
		"2-1/2": 0.083, "3": 0.083, "4": 0.083, "5": 0.109, "6": 0.109, "8": 0.109, "10": 0.134, "12": 0.156},
	"10S": {"1/2": 0.083, "3/4": 0.083, "1": 0.109, "1-1/4": 0.109, "1-1/2": 0.109, "2": 0.109,
		"2-1/2": 0.120, "3": 0.120, "4": 0.120, "5": 0.134, "6": 0.134, "8": 0.148, "10": 0.165, "12": 0.180},
}

// steelWall holds the ASME B36.10M walls where steel differs from ASTM
// D1785: 10-in Sch 80 is 0.594 in (PVC 0.593), 12-in Sch 80 0.688 in (PVC
// 0.687).
var steelWall = map[string]map[string]float64{
	"80": {"10": 0.594, "12": 0.688},
}

// isSteel reports whether a pipe material is steel or iron, whose
// schedule walls follow ASME B36.10M rather than ASTM D1785.
func isSteel(material string) bool {
	m := strings.ToLower(material)
	return strings.Contains(m, "steel") || strings.Contains(m, "iron")
}

// dnToNPS maps metric nominal diameters to nominal pipe sizes (ISO 6708
// DN designations as commonly paired; from memory).
var dnToNPS = map[string]string{
	"15": "1/2", "20": "3/4", "25": "1", "32": "1-1/4", "40": "1-1/2", "50": "2",
	"65": "2-1/2", "80": "3", "100": "4", "125": "5", "150": "6", "200": "8", "250": "10", "300": "12",
}

// NominalSize normalises a written size ("2", "2 in", "1.5", "DN50") to
// the nominal-pipe-size key, or an error.
func NominalSize(s string) (string, error) {
	t := strings.TrimSpace(strings.ToLower(s))
	t = strings.TrimSuffix(t, "in")
	t = strings.TrimSuffix(t, "\"")
	t = strings.TrimSpace(t)
	if strings.HasPrefix(t, "dn") {
		n := strings.TrimSpace(t[2:])
		if nps, ok := dnToNPS[n]; ok {
			return nps, nil
		}
		return "", fmt.Errorf("size %q: unknown DN size", s)
	}
	decimals := map[string]string{"0.5": "1/2", "0.75": "3/4", "1.25": "1-1/4", "1.5": "1-1/2", "2.5": "2-1/2", "1 1/4": "1-1/4", "1 1/2": "1-1/2", "2 1/2": "2-1/2"}
	if v, ok := decimals[t]; ok {
		t = v
	}
	if _, ok := nominalOD[t]; ok {
		return t, nil
	}
	return "", fmt.Errorf("size %q is not a nominal pipe size (1/2 to 12 in, or DN15 to DN300)", s)
}

// resolvePipe computes OD and ID (mm) from explicit diameters, size with
// schedule, or size with SDR.
func resolvePipe(p *Pipe, od, id float64, hasOD, hasID bool, u DiameterUnit) error {
	if hasOD {
		p.OD = DiameterFrom(od, u)
	}
	if hasID {
		p.ID = DiameterFrom(id, u)
	}
	if p.Size != "" && (!hasOD || !hasID) {
		nps, err := NominalSize(p.Size)
		if err != nil {
			return err
		}
		odIn := nominalOD[nps]
		if !hasOD {
			p.OD = DiameterFrom(odIn, Inches)
		}
		if !hasID {
			switch {
			case p.Schedule != "":
				walls, ok := scheduleWall[strings.ToUpper(p.Schedule)]
				if !ok {
					return fmt.Errorf("schedule %q unknown (use 40, 80, 5S or 10S, or give od and id)", p.Schedule)
				}
				w, ok := walls[nps]
				if !ok {
					return fmt.Errorf("no schedule %s dimensions for size %s", p.Schedule, p.Size)
				}
				if sw, ok := steelWall[strings.ToUpper(p.Schedule)][nps]; ok && isSteel(p.Material) {
					w = sw
				}
				p.ID = p.OD - 2*DiameterFrom(w, Inches)
			case p.SDR > 0:
				p.ID = p.OD - 2*p.OD/Diameter(p.SDR)
			}
		}
	}
	if p.SDR > 0 && p.ID == 0 && p.OD > 0 {
		p.ID = p.OD - 2*p.OD/Diameter(p.SDR)
	}
	if p.OD > 0 && p.ID >= p.OD {
		return fmt.Errorf("inside diameter %.3f mm is not smaller than outside diameter %.3f mm", float64(p.ID), float64(p.OD))
	}
	return nil
}

// Known reports whether the pipe's diameters are known.
func (p Pipe) Known() bool { return p.OD > 0 }
