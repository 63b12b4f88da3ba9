// Package quantity is the arithmetic of annular fill: the volume between
// the borehole wall (or an outer casing's bore) and everything inside it,
// integrated exactly over each fill interval; the volume inside each pipe
// per unit length, for purge volumes; the yield of a bag of each material;
// and, from those, bags needed, the ratio of placed to calculated volume and
// the depth each tag reading should have found.
//
// It works on the typed model only (package schema) and knows nothing of
// rules, files or drawing. Every geometry between two depth boundaries is
// constant (a cylinder with cylinders in it), so the integrals are sums
// over the slices between all boundaries, not approximations.
package quantity
