package ui

import (
	"bytes"
	"encoding/json"
	"os"
	"os/signal"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
	"time"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/model"
)

var blendAir = mixtures.BlendFile{
	Format: mixtures.BlendFormat, Name: "instrument air",
	Components: []mixtures.FileComponent{{Species: "N2", Amount: "78.08%"}, {Species: "O2", Amount: "20.95%"},
		{Species: "Ar", Amount: "0.93%"}, {Species: "CO2", Amount: "0.04%"}},
	Temperature: "25 C", Pressure: "1 bar", StandardPressure: "1 bar",
}

func readState(t *testing.T, dir string) savedState {
	t.Helper()
	data, err := os.ReadFile(filepath.Join(dir, stateFileName))
	if err != nil {
		t.Fatal(err)
	}
	var st savedState
	if err := json.Unmarshal(data, &st); err != nil {
		t.Fatal(err)
	}
	return st
}

// Every change is saved, as typed, and the next start shows it again.
func TestAutosaveAndRestore(t *testing.T) {
	dir := t.TempDir()
	r := testRoot(t, 100, 30, testRootOpts{stateDir: dir})
	press(t, r, "down", "enter", "ctrl+u")
	typeIn(t, r, "2%x") // invalid, kept as typed
	press(t, r, "enter", "2", "t", "ctrl+u")
	typeIn(t, r, "350 K")
	press(t, r, "enter", "s", "g", "5", "right")
	st := readState(t, dir)
	if st.Blend.Components[1] != (mixtures.FileComponent{Species: "NH3", Amount: "2%x"}) || st.Blend.Temperature != "350 K" || st.Blend.StandardPressure != "1 atm" ||
		st.PressureView != "gauge" || st.Pane != "anatomy" || st.AnatomySpecies != "NH3" {
		t.Errorf("saved state: %+v", st)
	}
	if st.LastValid == nil || st.LastValid.Components[1].Amount != "2%" {
		t.Errorf("last valid recipe not saved: %+v", st.LastValid)
	}

	r2 := testRoot(t, 100, 30, testRootOpts{stateDir: dir})
	if r2.b.entries[1].Amount != "2%x" || r2.b.tempText != "350 K" || r2.b.std != mixtures.StdAtm || !r2.b.showGauge || r2.focus != paneAnatomy {
		t.Errorf("restored: entries %v temp %q std %v gauge %v focus %s", r2.b.entries, r2.b.tempText, r2.b.std, r2.b.showGauge, r2.focus.name())
	}
	// The typo is still there, and so is the last valid blend behind it.
	if r2.b.rowErr[1] == "" || r2.b.in.Mixture == nil || r2.b.in.TempK != 350 {
		t.Errorf("restored derived state: row error %q, mixture %v, T %g", r2.b.rowErr[1], r2.b.in.Mixture, r2.b.in.TempK)
	}
	if x, _ := r2.b.moleFraction("NH3"); x != 0.02 {
		t.Errorf("last valid x(NH3) = %g, want 0.02 (from 2%%, the text before the typo)", x)
	}
	if r2.panes[paneAnatomy].(*anatomyPane).formula != "NH3" {
		t.Errorf("anatomy species %q", r2.panes[paneAnatomy].(*anatomyPane).formula)
	}
}

func TestCorruptStateMovedAside(t *testing.T) {
	for _, junk := range []string{"{not json", `{"format":"someone-else/9"}`, "", `{"format":"zmix-workbench/1","recipe":"N2"}`} {
		dir := t.TempDir()
		path := filepath.Join(dir, stateFileName)
		if err := os.WriteFile(path, []byte(junk), 0o600); err != nil {
			t.Fatal(err)
		}
		r := testRoot(t, 80, 24, testRootOpts{stateDir: dir})
		aside := path + ".corrupt-" + testClock.Format("20060102-150405")
		kept, err := os.ReadFile(aside)
		if err != nil || string(kept) != junk {
			t.Errorf("%q: not kept aside: %v", junk, err)
		}
		if !strings.Contains(r.status, "unreadable") || !strings.Contains(r.status, filepath.Base(aside)) {
			t.Errorf("%q: status %q", junk, r.status)
		}
		if r.b.name != mixtures.DemoFile().Name || r.b.in.Mixture == nil {
			t.Errorf("%q: did not start on the demo", junk)
		}
		if !strings.Contains(r.View(), "unreadable") {
			t.Errorf("%q: message not on screen", junk)
		}
		// The start goes on, and the next save is a good state file.
		press(t, r, "tab")
		if st := readState(t, dir); st.Format != stateFormat {
			t.Errorf("new state format %q", st.Format)
		}
	}
}

// SIGHUP (a dropped SSH link) saves the state and quits. The signal comes
// in as a message from a command, so the save is the same code path.
func TestSignalSavesState(t *testing.T) {
	for _, sig := range []syscall.Signal{syscall.SIGHUP, syscall.SIGTERM} {
		dir := t.TempDir()
		r := testRoot(t, 80, 24, testRootOpts{stateDir: dir})
		press(t, r, "enter", "ctrl+u")
		typeIn(t, r, "3.5%") // no autosave has run for the last keys yet
		r.saving = true      // as if a write were in flight: the signal must not wait for it
		if cmd := r.Update(signalMsg{sig}); !returnsQuit(cmd) {
			t.Fatalf("%v: no quit", sig)
		}
		if st := readState(t, dir); st.Blend.Components[0].Amount != "3.5%" {
			t.Errorf("%v: saved amount %q, want 3.5%%", sig, st.Blend.Components[0].Amount)
		}
	}
}

// The real signal reaches the command that waits for it. Notify is set
// first, so the test process does not die of its own SIGHUP.
func TestWaitForSignalDeliversSIGHUP(t *testing.T) {
	ch := make(chan os.Signal, 1)
	signal.Notify(ch, syscall.SIGHUP)
	defer signal.Stop(ch)
	cmd := waitForSignal(ch)
	if err := syscall.Kill(os.Getpid(), syscall.SIGHUP); err != nil {
		t.Fatal(err)
	}
	done := make(chan any, 1)
	go func() { done <- cmd() }()
	select {
	case msg := <-done:
		if m, ok := msg.(signalMsg); !ok || m.sig != syscall.SIGHUP {
			t.Errorf("got %#v, want signalMsg{SIGHUP}", msg)
		}
	case <-time.After(5 * time.Second):
		t.Fatal("no message after SIGHUP")
	}
}

func TestSaveAndOpenBlendFile(t *testing.T) {
	dir := t.TempDir()
	r := testRoot(t, 80, 24, testRootOpts{stateDir: dir})
	press(t, r, "ctrl+s", "ctrl+u")
	typeIn(t, r, "line3.json")
	press(t, r, "enter")
	path := filepath.Join(dir, "line3.json")
	f, err := mixtures.LoadBlendFile(path)
	if err != nil {
		t.Fatalf("saved file does not load: %v (status %q)", err, r.status)
	}
	if f.BlendText() != mixtures.DemoFile().BlendText() || f.Temperature != "22 C" {
		t.Errorf("saved %+v", f)
	}
	if r.blendPath != path || r.unsaved {
		t.Errorf("path %q unsaved %v", r.blendPath, r.unsaved)
	}

	// Another blend on disk, opened over an unsaved edit: asked first.
	other := filepath.Join(dir, "air.json")
	air := blendAir
	if err := air.Save(other); err != nil {
		t.Fatal(err)
	}
	press(t, r, "d") // drop SiH4
	press(t, r, "ctrl+o")
	if r.prompt != promptReplace {
		t.Fatalf("open over unsaved changes did not ask (prompt %d)", r.prompt)
	}
	press(t, r, "y", "ctrl+u")
	typeIn(t, r, "air.json")
	press(t, r, "enter")
	if r.blendPath != other || r.b.entries[0].Species != "N2" || len(r.b.entries) != 4 || r.unsaved {
		t.Fatalf("open: path %q entries %v unsaved %v status %q", r.blendPath, r.b.entries, r.unsaved, r.status)
	}
	if strings.Contains(r.View(), "SAFETY") {
		t.Errorf("air still shows the demo's cautions")
	}

	// Saving over another existing file asks; n keeps it.
	press(t, r, "ctrl+s", "ctrl+u")
	typeIn(t, r, "line3.json")
	press(t, r, "enter")
	if r.prompt != promptOverwrite {
		t.Fatalf("no overwrite question (prompt %d, status %q)", r.prompt, r.status)
	}
	press(t, r, "n", "esc")
	if g, _ := mixtures.LoadBlendFile(path); g.Components[0].Species != "SiH4" {
		t.Errorf("n overwrote the file")
	}

	// A file that does not load: one clear line, nothing replaced.
	bad := filepath.Join(dir, "bad.json")
	os.WriteFile(bad, []byte(`{"format":"zmix-blend/1","components":[{"species":"N2","amount":"110%"}]}`), 0o600)
	press(t, r, "ctrl+o", "ctrl+u")
	typeIn(t, r, "bad.json")
	press(t, r, "enter")
	if !r.statusErr || !strings.Contains(r.status, "bad.json") || r.blendPath != other {
		t.Errorf("bad file: status %q, path %q", r.status, r.blendPath)
	}
}

func TestSaveRefusesInvalidRecipe(t *testing.T) {
	dir := t.TempDir()
	r := testRoot(t, 80, 24, testRootOpts{stateDir: dir})
	press(t, r, "enter", "x", "enter", "ctrl+s", "enter")
	if _, err := os.Stat(filepath.Join(dir, "blend.json")); err == nil {
		t.Errorf("a blend that cannot load was saved")
	}
	if !r.statusErr || !strings.Contains(r.status, "not saved") {
		t.Errorf("status %q", r.status)
	}
}

// The export holds exactly what the state command writes for the state.
func TestExportReadout(t *testing.T) {
	dir := t.TempDir()
	r := testRoot(t, 80, 24, testRootOpts{stateDir: dir})
	// What zmix state prints for the demo blend at its conditions.
	st := engineState(t, "SiH4 4%, NH3 18%, H2 500ppm, N2 bal", 295.15, 1.4e5)
	mix, err := mixtures.ParseBlend("SiH4 4%, NH3 18%, H2 500ppm, N2 bal")
	if err != nil {
		t.Fatal(err)
	}
	m, err := mix.Resolve(model.Builtin(), 1.4e5)
	if err != nil {
		t.Fatal(err)
	}
	rep := &report.StateReport{State: &st, PresText: "1.4 bar", Cautions: mixtures.Cautions(m, 1.4e5), Notes: mixtures.Notes(&st, false)}
	var wantCSV, wantJSON bytes.Buffer
	if err := report.WriteStateCSV(&wantCSV, rep); err != nil {
		t.Fatal(err)
	}
	if err := report.WriteStateJSON(&wantJSON, rep); err != nil {
		t.Fatal(err)
	}
	// At the demo state no validity note reaches caution level (NH3 at
	// 25 kPa is far below its vapour pressure), so the JSON has no notes.
	for _, key := range []string{`"cautions": [`, "Pyrophoric (SiH4)", `"real_gas": {`} {
		if !strings.Contains(wantJSON.String(), key) {
			t.Fatalf("the state command's JSON lacks %q; the test no longer checks the safety text", key)
		}
	}
	for name, want := range map[string][]byte{"out.csv": wantCSV.Bytes(), "out.json": wantJSON.Bytes()} {
		press(t, r, "ctrl+e", "ctrl+u")
		typeIn(t, r, name)
		press(t, r, "enter")
		got, err := os.ReadFile(filepath.Join(dir, name))
		if err != nil {
			t.Fatalf("%s: %v (status %q)", name, err, r.status)
		}
		if !bytes.Equal(got, want) {
			t.Errorf("%s differs from the state command's output", name)
		}
	}
	press(t, r, "ctrl+e", "ctrl+u")
	typeIn(t, r, "out.txt")
	press(t, r, "enter")
	if !r.statusErr || !strings.Contains(r.status, ".csv or .json") {
		t.Errorf("bad extension: status %q", r.status)
	}
}

func TestExportSweep(t *testing.T) {
	dir := t.TempDir()
	r := testRoot(t, 80, 24, testRootOpts{stateDir: dir})
	// At 80x24 the sweep runs once its pane is shown.
	press(t, r, "4")
	res := r.panes[paneSweep].(*sweepPane).Result()
	if res == nil {
		t.Fatal("no sweep once the sweep pane is shown")
	}
	press(t, r, "ctrl+e", "ctrl+u")
	typeIn(t, r, "sweep.json")
	press(t, r, "enter")
	got, err := os.ReadFile(filepath.Join(dir, "sweep.json"))
	if err != nil {
		t.Fatalf("%v (status %q)", err, r.status)
	}
	// What zmix sweep writes for the same sweep.
	k := r.panes[paneSweep].(*sweepPane).resultKey
	var want bytes.Buffer
	report.WriteSweepJSON(&want, false, &report.SweepSource{Mix: k.mix, Sweep: res.Sweep, FixedTempK: k.fixedTempK, FixedPresPa: k.fixedPresPa, Opts: k.opts})
	if !bytes.Equal(got, want.Bytes()) {
		t.Errorf("sweep export differs from the sweep command's output")
	}
}

// zmix open FILE starts on the file; unsaved work of the last session is
// kept aside rather than lost.
func TestOpenFileAtStart(t *testing.T) {
	dir := t.TempDir()
	r := testRoot(t, 80, 24, testRootOpts{stateDir: dir})
	press(t, r, "ctrl+s", "enter", "d") // saved, then edited: unsaved
	r.finalSave()
	other := filepath.Join(dir, "air.json")
	air := blendAir
	air.Save(other)
	r2 := testRoot(t, 80, 24, testRootOpts{stateDir: dir, blendFile: other})
	if r2.blendPath != other || r2.b.entries[0].Species != "N2" {
		t.Errorf("did not open %s: %v", other, r2.b.entries)
	}
	aside := filepath.Join(dir, stateFileName+".replaced-"+testClock.Format("20060102-150405"))
	if _, err := os.Stat(aside); err != nil || !strings.Contains(r2.status, "kept as") {
		t.Errorf("earlier unsaved workbench not kept: %v, status %q", err, r2.status)
	}
}

// The proposed file name is replaced by what the user types, and kept to
// edit when the first key is an edit key.
func TestSavePromptProposalReplacedByTyping(t *testing.T) {
	dir := t.TempDir()
	r := testRoot(t, 80, 24, testRootOpts{stateDir: dir})
	press(t, r, "ctrl+s")
	if got := r.input.value(); got != "blend.json" {
		t.Fatalf("proposed name %q, want blend.json", got)
	}
	typeIn(t, r, "line3.json")
	if got := r.input.value(); got != "line3.json" {
		t.Errorf("typing over the proposal gave %q, want line3.json", got)
	}
	press(t, r, "esc", "ctrl+s", "left")
	typeIn(t, r, "X")
	if got := r.input.value(); got != "blend.jsoXn" {
		t.Errorf("editing the proposal gave %q, want blend.jsoXn", got)
	}
}

// A path that cannot be written (here a directory) is refused at once,
// with the reason, before any question about replacing it; what was
// typed comes back at the next prompt.
func TestWriteTargetRefusedBeforeAsking(t *testing.T) {
	dir := t.TempDir()
	r := testRoot(t, 80, 24, testRootOpts{stateDir: dir})
	target := filepath.Join(dir, "out.csv")
	if err := os.Mkdir(target, 0o700); err != nil {
		t.Fatal(err)
	}
	press(t, r, "ctrl+e", "ctrl+u")
	typeIn(t, r, target)
	press(t, r, "enter")
	if r.prompt == promptOverwrite {
		t.Fatalf("asked to replace a directory")
	}
	if !r.statusErr || !strings.Contains(r.status, "not written") || !strings.Contains(r.status, "out.csv") {
		t.Errorf("status %q", r.status)
	}
	if fi, err := os.Stat(target); err != nil || !fi.IsDir() {
		t.Errorf("the directory was touched: %v", err)
	}
	press(t, r, "ctrl+e")
	if !strings.Contains(r.input.value(), "out.csv") {
		t.Errorf("the typed path was lost: %q", r.input.value())
	}
}
