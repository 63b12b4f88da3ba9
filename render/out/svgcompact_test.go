package out

import (
	"bytes"
	"fmt"
	"regexp"
	"testing"
)

func TestCompactSVG(t *testing.T) {
	in := `<svg a="1"><path d="M0 0" style="fill:none;stroke:#191919"/>` +
		`<text x="1" y="2" style="font: 3px GoRegular;fill:#191919"><tspan x="1" y="2">A &amp; B</tspan></text>` +
		`<text x="1" y="2" style="font: 3px GoRegular;fill:#191919"><tspan x="1" y="5">moved</tspan></text>` +
		`<path d="M1 1" style="fill:none;stroke:#191919"/><path d="M2 2" style="fill:#fff;stroke:#000"/></svg>`
	want := `<svg a="1"><style>.s0{fill:none;stroke:#191919}.s1{font: 3px GoRegular;fill:#191919}</style><path d="M0 0" class="s0"/>` +
		`<text x="1" y="2" class="s1">A &amp; B</text>` +
		`<text x="1" y="2" class="s1"><tspan x="1" y="5">moved</tspan></text>` +
		`<path d="M1 1" class="s0"/><path d="M2 2" style="fill:#fff;stroke:#000"/></svg>`
	if got := string(compactSVG([]byte(in))); got != want {
		t.Errorf("compactSVG:\n got %s\nwant %s", got, want)
	}
	// A document already using classes is left alone.
	classy := `<svg><path class="x" style="a"/><path style="a"/></svg>`
	if got := string(compactSVG([]byte(classy))); got != classy {
		t.Errorf("compactSVG changed a document with classes: %s", got)
	}
}

// TestCompactScansMatchRegexps: the scans of compactSVG find exactly what
// the two regular expressions they stand for find, on a drawn sheet and
// on near misses.
func TestCompactScansMatchRegexps(t *testing.T) {
	styleRE := regexp.MustCompile(` style="([^"]*)"`)
	tspanRE := regexp.MustCompile(`<text x="([^"]*)" y="([^"]*)"([^>]*)><tspan x="([^"]*)" y="([^"]*)">([^<]*)</tspan></text>`)
	inputs := [][]byte{
		must(SVG(sampleDoc(), 0)),
		must(SVG(sampleDoc(), 1)),
		[]byte(`<text x="1" y="2" style="a"><tspan x="1" y="2">A</tspan></text><text x="1" y="2"><tspan x="3" y="2">B</tspan></text>` +
			`<text x="1" y="2<tspan x="1" y="2">C</tspan></text><text x="5" y="6" fill="red"><tspan x="5" y="6">D<b/></tspan></text>` +
			`<text x="7" y="8"><tspan x="7" y="8">E</tspan></text> style="x" style="unclosed`),
	}
	for k, in := range inputs {
		var got, want [][]int
		eachStyle(in, func(from, to int, _ []byte) { got = append(got, []int{from, to}) })
		for _, m := range styleRE.FindAllIndex(in, -1) {
			want = append(want, m)
		}
		if fmt.Sprint(got) != fmt.Sprint(want) {
			t.Errorf("input %d: styles at %v, the expression finds %v", k, got, want)
		}
		ref := tspanRE.ReplaceAllFunc(in, func(m []byte) []byte {
			s := tspanRE.FindSubmatch(m)
			if !bytes.Equal(s[1], s[4]) || !bytes.Equal(s[2], s[5]) {
				return m
			}
			return []byte(`<text x="` + string(s[1]) + `" y="` + string(s[2]) + `"` + string(s[3]) + `>` + string(s[6]) + `</text>`)
		})
		if out := dropLoneTspans(in); !bytes.Equal(out, ref) {
			t.Errorf("input %d: tspans dropped differently from the expression", k)
		}
	}
}
