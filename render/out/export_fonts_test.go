package out

// SystemFamily gives the viewer tests the installed family each face's
// SVG font stack names.
var SystemFamily = systemFamily
