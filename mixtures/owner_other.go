//go:build !unix

package mixtures

import "io/fs"

// fileOwner is not known on this system.
func fileOwner(fs.FileInfo) (int, bool) { return 0, false }
