//go:build unix

package ui

import (
	"errors"
	"os"
	"syscall"
)

// errLocked says another process holds the lock.
var errLocked = errors.New("ui: locked by another workbench")

// lockFile opens path and takes an exclusive advisory lock on it without
// waiting. The lock lasts while the file stays open, and the system drops
// it when the process ends however it ends, so a killed workbench leaves
// no stale lock.
func lockFile(path string) (*os.File, error) {
	f, err := os.OpenFile(path, os.O_RDWR|os.O_CREATE, 0o600)
	if err != nil {
		return nil, err
	}
	if err := syscall.Flock(int(f.Fd()), syscall.LOCK_EX|syscall.LOCK_NB); err != nil {
		f.Close()
		if errors.Is(err, syscall.EWOULDBLOCK) {
			return nil, errLocked
		}
		return nil, err
	}
	return f, nil
}
