package symbols

import "github.com/tremie-dev/tremie/render/draw"

// The ground colours are Paul Tol's "light" qualitative scheme (P. Tol,
// "Colour Schemes", SRON technical note SRON/EPS/TN/09-002, and his
// online notes): nine colours chosen to stay distinct for colour-blind
// readers and light enough to carry black text. Hex values from memory
// of that scheme; the tests check the properties that matter here
// (contrast for black text, separation under colour-vision-deficiency
// simulation) rather than the source.
var (
	tolLightBlue   = hex(0x77AADD)
	tolOrange      = hex(0xEE8866)
	tolLightYellow = hex(0xEEDD88)
	tolPink        = hex(0xFFAABB)
	tolLightCyan   = hex(0x99DDFF)
	tolMint        = hex(0x44BB99)
	tolPear        = hex(0xBBCC33)
	tolOlive       = hex(0xAAAA00)
	tolPaleGrey    = hex(0xDDDDDD)
)

// Family grounds: our assignment of the scheme to what a symbol depicts,
// each lightened a quarter of the way to white so the marks, not the
// colour, dominate a printed sheet. The tests check the lightened set
// stays apart under colour-vision-deficiency simulation.
var (
	groundGravel    = lighten(tolOrange)
	groundSand      = lighten(tolLightYellow) // sands, and the sand of filter packs
	groundSilt      = lighten(tolPear)
	groundClay      = lighten(tolLightBlue)
	groundOrganic   = lighten(tolOlive)
	groundRock      = lighten(tolPaleGrey) // sound rock, and cement grouts
	groundWeathered = lighten(tolPink)
	groundPlaced    = lighten(tolMint) // made ground: fill, backfill, cave-in
	groundBentonite = lighten(tolLightCyan)
	groundUnknown   = draw.White
)

// Grounds lists the family ground colours, for tests and legends.
var Grounds = []draw.Color{groundGravel, groundSand, groundSilt, groundClay, groundOrganic, groundRock, groundWeathered, groundPlaced, groundBentonite}

// lightenBy is how far toward white a scheme colour is moved.
const lightenBy = 0.25

func lighten(c draw.Color) draw.Color {
	f := func(v uint8) uint8 { return uint8(float64(v) + (255-float64(v))*lightenBy + 0.5) }
	return draw.RGB(f(c.R), f(c.G), f(c.B))
}

// Ink is the colour of pattern marks: near-black, so patterns survive
// photocopying; partInk draws pipe walls.
var (
	ink       = hex(0x222222)
	partInk   = hex(0x4D4D4D)
	waterInk  = hex(0x4477AA) // Tol's "bright" blue, for the water-level mark
	frameInk  = hex(0x333333)
	slotWhite = draw.White
)

// Palette lists the scheme's colours in its published order, for tests
// and for anyone drawing beside the symbols.
var Palette = []draw.Color{tolLightBlue, tolOrange, tolLightYellow, tolPink, tolLightCyan, tolMint, tolPear, tolOlive, tolPaleGrey}

func hex(v uint32) draw.Color { return draw.RGB(uint8(v>>16), uint8(v>>8), uint8(v)) }
