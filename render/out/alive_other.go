//go:build !unix

package out

// alive cannot ask about other processes here, so it keeps every
// temporary file: sweeping one a live run is writing would be worse than
// leaving one behind.
func alive(pid int) bool { return true }
