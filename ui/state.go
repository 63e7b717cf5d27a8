package ui

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"path/filepath"
	"sync"
	"time"

	"zmix/mixtures"
)

// stateFormat tags the autosaved workbench state. Version 1 wrote the
// blend's fields one by one; it still loads (state_v1.go).
const stateFormat = "zmix-workbench/2"

// stateFileName is the autosave's name inside the state directory.
const stateFileName = "state.json"

// savedState is what the workbench keeps between runs: everything as the
// user typed it, so that a restart shows the same screen. The recipe and
// conditions are a blend file, as a blend file is written.
type savedState struct {
	Format       string             `json:"format"`
	Blend        mixtures.BlendFile `json:"blend"`
	PressureView string             `json:"pressure_view"` // "absolute" or "gauge"
	Sweep        SweepSettings      `json:"sweep"`
	Pane         string             `json:"pane"`
	// BlendPath is the blend file last opened or saved explicitly, and
	// Unsaved says the recipe changed since then.
	BlendPath      string `json:"blend_path,omitempty"`
	Unsaved        bool   `json:"unsaved_changes,omitempty"`
	AnatomySpecies string `json:"anatomy_species,omitempty"`
	// Process holds the Process pane's choice and fields, as typed.
	Process map[string]string `json:"process,omitempty"`
	// LastValid is the recipe and conditions that last resolved, for when
	// what was typed last does not: the readout restarts from them.
	LastValid *mixtures.BlendFile `json:"last_valid,omitempty"`
}

// DefaultStateDir returns $XDG_STATE_HOME/zmix, or ~/.local/state/zmix.
func DefaultStateDir() (string, error) {
	if x := os.Getenv("XDG_STATE_HOME"); filepath.IsAbs(x) {
		return filepath.Join(x, "zmix"), nil
	}
	home, err := os.UserHomeDir()
	if err != nil {
		return "", fmt.Errorf("ui: no state directory: %w (set XDG_STATE_HOME)", err)
	}
	return filepath.Join(home, ".local", "state", "zmix"), nil
}

// stateStore writes the autosave. Writes may come from several commands
// at once; the mutex serialises them and the sequence number makes sure an
// older snapshot never replaces a newer one.
type stateStore struct {
	dir  string
	path string

	mu      sync.Mutex
	written uint64
}

func newStateStore(dir string) *stateStore {
	return &stateStore{dir: dir, path: filepath.Join(dir, stateFileName)}
}

func (s *stateStore) write(seq uint64, data []byte) error {
	s.mu.Lock()
	defer s.mu.Unlock()
	if seq <= s.written {
		return nil
	}
	if err := os.MkdirAll(s.dir, 0o700); err != nil {
		return fmt.Errorf("ui: state directory: %w", err)
	}
	if err := mixtures.WriteFileAtomic(s.path, data, 0o600); err != nil {
		return err
	}
	s.written = seq
	return nil
}

// decodeState reads a saved state of either format. Anything after the
// one JSON value makes the file corrupt: it was not written by us.
func decodeState(data []byte) (*savedState, error) {
	var head struct {
		Format string `json:"format"`
	}
	if err := decodeOne(data, &head); err != nil {
		return nil, err
	}
	switch head.Format {
	case stateFormat:
		var st savedState
		if err := decodeOne(data, &st); err != nil {
			return nil, err
		}
		return &st, nil
	case stateFormatV1:
		var v1 savedStateV1
		if err := decodeOne(data, &v1); err != nil {
			return nil, err
		}
		return v1.upgrade(), nil
	}
	return nil, fmt.Errorf("format %q, want %q", head.Format, stateFormat)
}

// decodeOne decodes exactly one JSON value from data.
func decodeOne(data []byte, v any) error {
	dec := json.NewDecoder(bytes.NewReader(data))
	if err := dec.Decode(v); err != nil {
		return err
	}
	if _, err := dec.Token(); err != io.EOF {
		return errors.New("text after the end of the JSON value")
	}
	return nil
}

// errNoState says there is no saved state yet: a first start.
var errNoState = errors.New("ui: no saved state")

// load reads the saved state. A file that cannot be read or understood is
// moved aside (state.json.corrupt-TIME) so that it is kept for the user and
// the next start is clean; the message says where it went.
func (s *stateStore) load(now time.Time) (*savedState, string, error) {
	data, err := os.ReadFile(s.path)
	if errors.Is(err, fs.ErrNotExist) {
		return nil, "", errNoState
	}
	if err == nil {
		var st *savedState
		if st, err = decodeState(data); err == nil {
			return st, "", nil
		}
	}
	aside := s.path + ".corrupt-" + now.Format("20060102-150405")
	if rerr := os.Rename(s.path, aside); rerr != nil {
		return nil, fmt.Sprintf("saved state unreadable (%v) and could not be moved aside (%v); starting on the demo", err, rerr), err
	}
	return nil, fmt.Sprintf("saved state unreadable (%v); kept as %s; starting on the demo", err, filepath.Base(aside)), err
}

// setAside moves the current state file out of the way, for when a blend
// file replaces a workbench that held unsaved changes.
func (s *stateStore) setAside(now time.Time) (string, error) {
	aside := s.path + ".replaced-" + now.Format("20060102-150405")
	if err := os.Rename(s.path, aside); err != nil {
		return "", err
	}
	return aside, nil
}
