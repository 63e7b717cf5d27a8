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
	"strconv"
	"sync"
	"time"
	"unicode/utf8"

	"zmix/mixtures"
	"zmix/model"
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

// DefaultDataDir returns $XDG_DATA_HOME/zmix, or ~/.local/share/zmix:
// where the workbench proposes to save blends and exports at first.
func DefaultDataDir() (string, error) {
	if x := os.Getenv("XDG_DATA_HOME"); filepath.IsAbs(x) {
		return filepath.Join(x, "zmix"), nil
	}
	home, err := os.UserHomeDir()
	if err != nil {
		return "", model.Errorf("ui", "no data directory: %w (set XDG_DATA_HOME)", err)
	}
	return filepath.Join(home, ".local", "share", "zmix"), nil
}

// stateStore writes the autosave. Writes may come from several commands
// at once; the mutex serialises them and the sequence number makes sure an
// older snapshot never replaces a newer one.
type stateStore struct {
	dir  string
	path string
	// from is where a first start of this file reads the state instead:
	// a second workbench on the directory starts from the first one's.
	from string
	lock *os.File // the advisory lock held on path, while the workbench runs

	mu      sync.Mutex
	written uint64
	chmoded bool
}

func newStateStore(dir string) *stateStore {
	return &stateStore{dir: dir, path: filepath.Join(dir, stateFileName)}
}

func (s *stateStore) write(seq uint64, data []byte) error {
	s.mu.Lock()
	defer s.mu.Unlock()
	if seq <= s.written || s.path == "" {
		return nil // an older snapshot, or a read-only workbench
	}
	if err := os.MkdirAll(s.dir, 0o700); err != nil {
		return model.Errorf("ui", "state directory %s: %w", model.Printable(s.dir), err)
	}
	if err := mixtures.WriteFileAtomic(s.path, data, 0o600); err != nil {
		return err
	}
	if !s.chmoded {
		// The state is the user's work: readable by them alone, even when
		// an older file was made with looser rights.
		os.Chmod(s.path, 0o600)
		s.chmoded = true
	}
	s.written = seq
	return nil
}

// maxStateBytes bounds state.json: a blend file twice over (as typed and
// as last valid) and a few settings. A larger file was not written by us,
// and is refused before any work that grows with it.
const maxStateBytes = 2*mixtures.MaxBlendFileBytes + 64<<10

// readStateFile reads a state file if it is a regular file no larger than
// maxStateBytes. A FIFO or a device would block or never end.
func readStateFile(path string) ([]byte, error) {
	// Stat before opening: opening a FIFO waits for a writer.
	if st, err := os.Stat(path); err != nil {
		return nil, err
	} else if !st.Mode().IsRegular() {
		return nil, model.Errorf("ui", "not a regular file (%s)", st.Mode().Type())
	}
	fh, err := os.Open(path)
	if err != nil {
		return nil, err
	}
	defer fh.Close()
	if st, err := fh.Stat(); err == nil && !st.Mode().IsRegular() {
		return nil, model.Errorf("ui", "not a regular file (%s)", st.Mode().Type())
	}
	data, err := io.ReadAll(io.LimitReader(fh, maxStateBytes+1))
	if err == nil && len(data) > maxStateBytes {
		err = model.Errorf("ui", "larger than %d KiB; a state file is small JSON written by zmix", maxStateBytes>>10)
	}
	return data, err
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
		return &st, st.check()
	case stateFormatV1:
		var v1 savedStateV1
		if err := decodeOne(data, &v1); err != nil {
			return nil, err
		}
		st := v1.upgrade()
		return st, st.check()
	}
	return nil, model.Errorf("ui", "format %s, want %q", model.Quote(head.Format), stateFormat)
}

// check holds a state to the limits of what the workbench can hold and
// the engine accepts, so that no entry of a hostile file makes the start
// slow: the limits of a blend file for the recipe, and those of the
// fields for the rest.
func (st *savedState) check() error {
	type limit struct {
		what, text string
		max        int
	}
	var limits []limit
	for _, f := range []*mixtures.BlendFile{&st.Blend, st.LastValid} {
		if f == nil {
			continue
		}
		if len(f.Components) > mixtures.MaxBlendItems {
			return model.Errorf("ui", "a recipe of %d lines; a state holds at most %d", len(f.Components), mixtures.MaxBlendItems)
		}
		for i, c := range f.Components {
			line := "recipe line " + strconv.Itoa(i+1)
			limits = append(limits, limit{line + ": species", c.Species, mixtures.MaxSpeciesChars},
				limit{line + ": amount", c.Amount, mixtures.MaxAmountChars})
		}
		limits = append(limits, limit{"name", f.Name, mixtures.MaxNameChars}, limit{"note", f.Note, mixtures.MaxNoteChars},
			limit{"temperature", f.Temperature, maxFieldRunes}, limit{"pressure", f.Pressure, maxFieldRunes},
			limit{"standard pressure", f.StandardPressure, maxFieldRunes})
	}
	sw := &st.Sweep
	limits = append(limits, limit{"sweep start", sw.From, maxFieldRunes}, limit{"sweep end", sw.To, maxFieldRunes},
		limit{"sweep property", sw.Property, maxFieldRunes}, limit{"sweep species", sw.Species, maxFieldRunes},
		limit{"pane", st.Pane, maxFieldRunes}, limit{"anatomy species", st.AnatomySpecies, maxFieldRunes},
		limit{"pressure view", st.PressureView, maxFieldRunes}, limit{"blend file path", st.BlendPath, maxPathRunes})
	for _, l := range limits {
		if n := utf8.RuneCountInString(l.text); n > l.max {
			return model.Errorf("ui", "%s of %d characters; a state holds at most %d", l.what, n, l.max)
		}
	}
	return nil
}

// decodeOne decodes exactly one JSON value from data.
func decodeOne(data []byte, v any) error {
	dec := json.NewDecoder(bytes.NewReader(data))
	if err := dec.Decode(v); err != nil {
		return err
	}
	if _, err := dec.Token(); err != io.EOF {
		return model.Errorf("ui", "text after the end of the JSON value")
	}
	return nil
}

// errNoState says there is no saved state yet: a first start.
var errNoState = errors.New("ui: no saved state")

// load reads the saved state. A file that cannot be read or understood is
// moved aside (state.json.corrupt-TIME) so that it is kept for the user and
// the next start is clean; the message says where it went.
func (s *stateStore) load(now time.Time) (*savedState, string, error) {
	if _, err := os.Lstat(s.path); (s.path == "" || errors.Is(err, fs.ErrNotExist)) && s.from != "" {
		// A first start on this file: begin where the other workbench's
		// state stands, without touching its file.
		if data, err := readStateFile(s.from); err == nil {
			if st, err := decodeState(data); err == nil {
				return st, "", nil
			}
		}
		return nil, "", errNoState
	}
	data, err := readStateFile(s.path)
	if errors.Is(err, fs.ErrNotExist) {
		return nil, "", errNoState
	}
	if err == nil {
		var st *savedState
		if st, err = decodeState(data); err == nil {
			return st, "", nil
		}
	}
	why := model.UserMessage(err)
	aside, rerr := moveAside(s.path, ".corrupt-", now)
	if rerr != nil {
		return nil, fmt.Sprintf("saved state unreadable (%s) and could not be moved aside (%s); starting on the demo", why, model.UserMessage(rerr)), err
	}
	return nil, fmt.Sprintf("saved state unreadable (%s); kept as %s; starting on the demo", why, filepath.Base(aside)), err
}

// moveAside renames path to path+tag+TIME, adding -2, -3 … when a file of
// that name exists already, so that no kept copy is ever replaced.
func moveAside(path, tag string, now time.Time) (string, error) {
	base := path + tag + now.Format("20060102-150405")
	aside := base
	for n := 2; ; n++ {
		if _, err := os.Lstat(aside); errors.Is(err, fs.ErrNotExist) {
			break
		}
		if n > 1000 {
			return "", model.Errorf("ui", "%s: a thousand copies kept already", model.Printable(base))
		}
		aside = base + "-" + strconv.Itoa(n)
	}
	return aside, os.Rename(path, aside)
}

// setAside moves the current state file out of the way, for when a blend
// file replaces a workbench that held unsaved changes.
func (s *stateStore) setAside(now time.Time) (string, error) {
	return moveAside(s.path, ".replaced-", now)
}
