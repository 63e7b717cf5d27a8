package ui

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"

	"zmix/model"
)

// maxSeats is how many workbenches may share one state directory, each
// with a state file of its own: state.json, then state-2.json and on.
const maxSeats = 9

// claimStateStore finds the state file this workbench may write: the first
// whose advisory lock (state.lock, state-2.lock …, held with flock while
// the workbench runs) no other workbench holds. Two workbenches writing
// one file would each replace the other's edits without a word. A second
// workbench starts from the first one's state, saves to a file of its
// own, and says so; when every seat is taken the workbench opens read-only.
// The note is for the status line; "" when the usual file is ours.
func claimStateStore(dir string) (*stateStore, string, error) {
	if err := os.MkdirAll(dir, 0o700); err != nil {
		return nil, "", model.Errorf("ui", "state directory %s: %w", model.Printable(dir), err)
	}
	primary := filepath.Join(dir, stateFileName)
	for seat := 1; seat <= maxSeats; seat++ {
		name, lockName := stateFileName, "state.lock"
		if seat > 1 {
			name, lockName = fmt.Sprintf("state-%d.json", seat), fmt.Sprintf("state-%d.lock", seat)
		}
		lock, err := lockFile(filepath.Join(dir, lockName))
		if err == errLocked {
			continue
		}
		if err != nil {
			return nil, "", model.Errorf("ui", "state lock %s: %w", model.Printable(filepath.Join(dir, lockName)), err)
		}
		s := &stateStore{dir: dir, path: filepath.Join(dir, name), lock: lock}
		s.removeStaleTemps()
		if seat == 1 {
			return s, "", nil
		}
		s.from = primary
		return s, fmt.Sprintf("another zmix workbench has the saved state open; this one saves its own, to %s", s.path), nil
	}
	s := &stateStore{dir: dir, from: primary}
	return s, fmt.Sprintf("%d zmix workbenches have %s open; this one is read-only: it does not autosave (%s saves the blend to a file)",
		maxSeats, dir, DefaultKeyMap().SaveBlend.Help().Key), nil
}

// release lets the next workbench have this state file.
func (s *stateStore) release() {
	if s != nil && s.lock != nil {
		s.lock.Close() // closing the file drops its flock
		s.lock = nil
	}
}

// removeStaleTemps deletes the temporary files of writes to this state
// file that a kill interrupted; the rename that would have finished them
// never came. Only the lock holder writes them, so none is in use.
func (s *stateStore) removeStaleTemps() {
	prefix := "." + filepath.Base(s.path) + ".tmp-"
	entries, err := os.ReadDir(s.dir)
	if err != nil {
		return
	}
	for _, e := range entries {
		if strings.HasPrefix(e.Name(), prefix) && e.Type().IsRegular() {
			os.Remove(filepath.Join(s.dir, e.Name()))
		}
	}
}
