//go:build unix

package out

import (
	"os"
	"syscall"
)

// alive reports whether a process with this ID exists (signal 0 checks
// without sending anything; EPERM means it exists but is not ours).
func alive(pid int) bool {
	if pid <= 0 {
		return false
	}
	if pid == os.Getpid() {
		return true
	}
	err := syscall.Kill(pid, 0)
	return err == nil || err == syscall.EPERM
}
