//go:build unix

package mixtures

import (
	"io/fs"
	"syscall"
)

// fileOwner returns the user id that owns a file.
func fileOwner(st fs.FileInfo) (int, bool) {
	if sys, ok := st.Sys().(*syscall.Stat_t); ok {
		return int(sys.Uid), true
	}
	return 0, false
}
