//go:build !unix

package ui

import (
	"errors"
	"os"
)

var errLocked = errors.New("ui: locked by another workbench")

// lockFile only opens the file where flock does not exist: two workbenches
// on one state directory are not told apart there.
func lockFile(path string) (*os.File, error) {
	return os.OpenFile(path, os.O_RDWR|os.O_CREATE, 0o600)
}
