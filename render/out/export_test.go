package out

// Intersect gives the external tests the painter's rectangle arithmetic.
var Intersect = intersect
