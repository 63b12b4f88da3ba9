// Package symbols is tremie's own symbol set: one table (table.go) gives
// every annular fill material, every lithology class and every drawn well
// part a pattern and a ground colour, and both the drawing and the legend
// paint from it, so the two cannot disagree.
//
// The patterns are designed here. Each is told apart in black-and-white
// print by its geometry alone; the ground colour only groups families
// (gravels, sands, silts, clays, bentonite seals, cement grouts, ...).
// The colours are Paul Tol's "light" qualitative scheme, published for
// colour-blind-safe fills that carry labels (palette.go names the source);
// which family gets which colour is ours.
//
// A Symbol paints into any rectangle: the marks are laid on a grid fixed to
// the page, not to the rectangle, so two touching intervals of one
// material join without a seam, and the marks are clipped exactly to the
// rectangle.
package symbols
