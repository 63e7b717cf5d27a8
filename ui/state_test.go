package ui

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
	"zmix/mixtures"

	tea "github.com/charmbracelet/bubbletea"
)

// Messages that change nothing saved (sizes, sweep progress, cursor moves,
// scrolling) take no snapshot and write nothing; an edit takes one.
func TestAutosaveOnlyWhenStateChanges(t *testing.T) {
	dir := t.TempDir()
	r := testRoot(t, 120, 40, testRootOpts{stateDir: dir})
	press(t, r, "4") // the sweep pane: its cursor keys change nothing saved
	snaps, written := r.snapshots, r.store.written
	for range 20 {
		settle(t, r, r.Update(tea.WindowSizeMsg{Width: 120, Height: 40}))
		press(t, r, "left", "right", ".", ",")
		settle(t, r, r.Update(nil))
	}
	press(t, r, "3", "down", "up", "4") // scrolling and back: focus changes (two), saved
	focusSnaps := r.snapshots - snaps
	press(t, r, "left", "right")
	if n := r.snapshots - snaps - focusSnaps; n != 0 {
		t.Errorf("%d snapshots for messages that change nothing saved, want 0", n)
	}
	if focusSnaps != 2 {
		t.Errorf("%d snapshots for 2 focus changes, want 2", focusSnaps)
	}
	if r.store.written != written+2 {
		t.Errorf("%d writes, want 2 (one per focus change)", r.store.written-written)
	}
	// A sweep setting is saved once.
	snaps = r.snapshots
	press(t, r, "o")
	if r.snapshots-snaps != 1 || readState(t, dir).Sweep.Overlay != true {
		t.Errorf("overlay: %d snapshots, saved overlay %v", r.snapshots-snaps, readState(t, dir).Sweep.Overlay)
	}
}

// A state file of the first format, which mirrored the blend file's
// fields, still opens, and is written back in the current format.
func TestStateFormatV1Loads(t *testing.T) {
	dir := t.TempDir()
	v1 := `{
  "format": "zmix-workbench/1",
  "name": "bench line 2",
  "recipe": [{"species": "N2", "amount": "bal"}, {"species": "NH3", "amount": "2%x"}],
  "temperature": "350 K",
  "pressure": "2 bar",
  "standard_pressure": "1 atm",
  "pressure_view": "gauge",
  "sweep": {"var": "P", "from": "1 bar", "to": "20 bar", "steps": 50, "log": true, "property": "S", "species": "", "overlay": false},
  "pane": "setpoint",
  "anatomy_species": "NH3",
  "last_valid": {"recipe": [{"species": "N2", "amount": "bal"}, {"species": "NH3", "amount": "2%"}], "temperature": "350 K", "pressure": "2 bar"}
}`
	if err := os.WriteFile(filepath.Join(dir, stateFileName), []byte(v1), 0o600); err != nil {
		t.Fatal(err)
	}
	r := testRoot(t, 100, 30, testRootOpts{stateDir: dir})
	if r.statusErr {
		t.Fatalf("v1 state refused: %s", r.status)
	}
	b := r.b
	if b.name != "bench line 2" || len(b.entries) != 2 || b.entries[1].Amount != "2%x" || b.tempText != "350 K" ||
		b.std != mixtures.StdAtm || !b.showGauge || r.focus != paneSetpoint {
		t.Errorf("v1 restored as name %q entries %v T %q atm %v gauge %v focus %s", b.name, b.entries, b.tempText, b.std, b.showGauge, r.focus.name())
	}
	if x, _ := b.moleFraction("NH3"); x != 0.02 {
		t.Errorf("last valid x(NH3) = %g, want 0.02", x)
	}
	if s := r.panes[paneSweep].(*sweepPane).Settings(); s.Var != mixtures.SweepPressure || s.Steps != 50 || s.Property != "S" {
		t.Errorf("sweep settings %+v", s)
	}
	st := readState(t, dir)
	if st.Format != stateFormat || st.Blend.Name != "bench line 2" || st.Blend.Components[1].Amount != "2%x" {
		t.Errorf("rewritten as %+v", st)
	}
}

// Text after the JSON value means the file was not written by us: it is
// corrupt, kept aside, and the start goes on.
func TestStateTrailingTextIsCorrupt(t *testing.T) {
	dir := t.TempDir()
	r0 := testRoot(t, 80, 24, testRootOpts{stateDir: dir})
	r0.finalSave()
	path := filepath.Join(dir, stateFileName)
	data, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	for _, tail := range []string{"{}", "x", `"more"`, "\n]"} {
		if err := os.WriteFile(path, append(append([]byte{}, data...), tail...), 0o600); err != nil {
			t.Fatal(err)
		}
		if _, err := decodeState(append(append([]byte{}, data...), tail...)); err == nil {
			t.Errorf("state followed by %q decodes", tail)
		}
	}
	r := testRoot(t, 80, 24, testRootOpts{stateDir: dir})
	if !r.statusErr || !strings.Contains(r.status, "unreadable") {
		t.Errorf("state with trailing text: status %q", r.status)
	}
	if _, err := decodeState(append(data, " \n\t"...)); err != nil {
		t.Errorf("trailing white space refused: %v", err)
	}
}
