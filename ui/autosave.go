package ui

import (
	"bytes"
	"encoding/json"
	"os"

	tea "github.com/charmbracelet/bubbletea"

	"zmix/mixtures"
	"zmix/model"
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
		b.entries = append(b.entries[:0], lv.Recipe...)
		b.tempText, b.presText = lv.Temperature, lv.Pressure
		std, _ := mixtures.StdPressureFromText(st.StandardPressure)
		b.stdAtm = std == model.StdPressureAtmPa
		b.update()
	}
	b.entries = append(b.entries[:0], st.Recipe...)
	b.name, b.note = st.Name, st.Note
	b.tempText, b.presText = st.Temperature, st.Pressure
	std, _ := mixtures.StdPressureFromText(st.StandardPressure)
	b.stdAtm = std == model.StdPressureAtmPa
	b.showGauge = st.PressureView == "gauge"
	r.blendPath, r.unsaved = st.BlendPath, st.Unsaved
	b.changed = true
}

// snapshot is the state to autosave.
func (r *root) snapshot() savedState {
	b := r.b
	view := "absolute"
	if b.showGauge {
		view = "gauge"
	}
	st := savedState{
		Format: stateFormat, Name: b.name, Note: b.note,
		Recipe:      append([]entry{}, b.entries...),
		Temperature: b.tempText, Pressure: b.presText, StandardPressure: b.stdText(), PressureView: view,
		Pane:      paneSpecs[r.focus].key,
		BlendPath: r.blendPath, Unsaved: r.unsaved,
		LastValid: &validText{Recipe: append([]entry{}, b.validEntries...), Temperature: b.validTemp, Pressure: b.validPres},
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

func (r *root) autosave() tea.Cmd {
	if r.store == nil {
		return nil
	}
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
