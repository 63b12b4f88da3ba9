package out

import "testing"

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
