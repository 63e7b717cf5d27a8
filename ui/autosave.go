package ui

import (
	"bytes"
	"encoding/json"
	"os"

	tea "github.com/charmbracelet/bubbletea"
)

// saveDoneMsg reports an autosave write.
type saveDoneMsg struct {
	seq uint64
	err error
}

// signalMsg carries SIGHUP, SIGTERM or SIGINT into the event loop, so that
// the state is saved by the same code as every other change.
type signalMsg struct{ sig os.Signal }

// waitForSignal turns the next signal into a message. It runs as a command,
// not as a goroutine of ours, so that the program's own machinery owns it.
func waitForSignal(ch <-chan os.Signal) tea.Cmd {
	if ch == nil {
		return nil
	}
	return func() tea.Msg {
		s, ok := <-ch
		if !ok {
			return nil
		}
		return signalMsg{s}
	}
}

// restore takes the document from a saved state.
func (r *root) restore(st *savedState) {
	b := r.b
	if lv := st.LastValid; lv != nil {
		// Establish the last valid state first; the typed text then
		// replaces it only where it reads.
		b.setText(lv)
		b.update()
	}
	b.setText(&st.Blend)
	b.showGauge = st.PressureView == "gauge"
	r.blendPath, r.unsaved = st.BlendPath, st.Unsaved
}

// snapshot is the state to autosave.
func (r *root) snapshot() savedState {
	r.snapshots++
	view := "absolute"
	if r.b.showGauge {
		view = "gauge"
	}
	st := savedState{
		Format: stateFormat, Blend: *r.b.blendFile(), PressureView: view,
		Pane:      paneSpecs[r.focus].key,
		BlendPath: r.blendPath, Unsaved: r.unsaved,
		LastValid: r.b.lastValidFile(),
	}
	for _, p := range r.panes {
		if sp, ok := p.(statePane); ok {
			sp.saveState(&st)
		}
	}
	return st
}

// finalSave writes the state at once, for quitting: an autosave still in
// flight has an older sequence number and cannot overwrite it.
func (r *root) finalSave() error {
	if r.store == nil {
		return nil
	}
	data, err := json.MarshalIndent(r.snapshot(), "", "  ")
	if err != nil {
		return err
	}
	r.saveSeq++
	r.lastSaved = data
	return r.store.write(r.saveSeq, data)
}

// stateKey is the part of the saved state that the root itself holds,
// compared after every message to see cheaply whether it changed.
type stateKey struct {
	focus     paneID
	blendPath string
	unsaved   bool
}

// checkDirty notes whether anything the saved state holds may have
// changed: the document (afterChange marks that), the root's own fields,
// or a pane's own settings. It costs a few comparisons, not a snapshot.
func (r *root) checkDirty() {
	if k := (stateKey{r.focus, r.blendPath, r.unsaved}); k != r.dirtyKey {
		r.dirtyKey, r.dirty = k, true
	}
	for _, p := range r.panes {
		if sp, ok := p.(statePane); ok && sp.stateChanged() {
			r.dirty = true
		}
	}
}

// autosave writes the state when it changed. Most messages (sweep
// progress, cursor moves, sizes) change nothing saved and cost nothing
// here; a change is marshalled once and written only if the bytes differ.
func (r *root) autosave() tea.Cmd {
	if r.store == nil {
		return nil
	}
	r.checkDirty()
	if !r.dirty {
		return nil
	}
	r.dirty = false
	data, err := json.MarshalIndent(r.snapshot(), "", "  ")
	if err != nil || bytes.Equal(data, r.lastSaved) {
		return nil
	}
	r.lastSaved = data
	if r.saving {
		r.savePending = true
		return nil
	}
	return r.saveCmd(data)
}

func (r *root) saveCmd(data []byte) tea.Cmd {
	r.saving = true
	r.saveSeq++
	seq, store := r.saveSeq, r.store
	return func() tea.Msg { return saveDoneMsg{seq, store.write(seq, data)} }
}

func (r *root) saveDone(m saveDoneMsg) tea.Cmd {
	r.saving = false
	if m.err != nil {
		r.setError("autosave failed: " + cleanErr(m.err))
	}
	if r.savePending {
		r.savePending = false
		return r.saveCmd(r.lastSaved)
	}
	return nil
}
