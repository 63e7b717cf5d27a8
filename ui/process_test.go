package ui

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"zmix/mixtures"
	"zmix/mixtures/process"
	"zmix/mixtures/report"
)

// testProcess is a Process pane on the demo blend, sized w × h.
func testProcess(t *testing.T, ascii bool, w, h int) (*processPane, *bench) {
	t.Helper()
	c := testPaneCommon(ascii)
	b := newBench(c.Catalogue)
	b.loadFile(mixtures.DemoFile())
	b.update()
	p := newProcessPane(c, b)
	p.SetSize(w, h)
	p.Sync()
	return p, b
}

func (p *processPane) keys(t *testing.T, keys ...string) {
	t.Helper()
	for _, k := range keys {
		p.Update(testKey(k))
	}
}

func (p *processPane) whole() string {
	p.scroll.setHeight(1000)
	defer p.scroll.setHeight(p.h)
	return p.View()
}

// Every process gives a result on the demo blend with its defaults; the
// figures are the engine's.
func TestProcessPaneEveryKind(t *testing.T) {
	p, b := testProcess(t, false, 90, 30)
	for i, k := range processKinds {
		if p.current().key != k.key {
			t.Fatalf("kind %d is %s, want %s", i, p.current().key, k.key)
		}
		v := p.whole()
		if p.result == nil {
			t.Errorf("%s: no result: %s", k.key, p.err)
		}
		if p.result != nil {
			for _, out := range p.result.Outputs() {
				if !strings.Contains(v, report.FigureNumber(out)) {
					t.Errorf("%s: screen lacks %s = %s:\n%s", k.key, out.Label, report.FigureNumber(out), v)
				}
			}
		}
		p.keys(t, "right")
	}
	if p.current().key != "flow" {
		t.Errorf("right from the last process: %s, want flow again", p.current().key)
	}
	// The compression shown is mixtures/process's on the same inputs.
	p.keys(t, "right")
	want, err := process.Compression{Mixture: b.in.Mixture, InletTempK: b.in.TempK, InletPresPa: b.in.PresPa, OutletPresPa: 8e5, Efficiency: 0.8, Model: process.Ideal{Options: b.in.Opts}}.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if got, ok := process.Lookup(p.result, "t2"); !ok || got.SI != want.OutletTempK {
		t.Errorf("pane T₂ = %v, engine %g K", got.SI, want.OutletTempK)
	}
}

// A field typed wrong gives one error line naming the field and what it
// accepts; esc puts the value back.
func TestProcessPaneFieldErrors(t *testing.T) {
	p, _ := testProcess(t, false, 90, 30)
	p.keys(t, "right", "down", "enter", "ctrl+u", "1", "2", "0", "%")
	if !p.Editing() {
		t.Fatal("enter on a field should start typing")
	}
	if p.result != nil || !strings.Contains(p.err, "efficiency") || !strings.Contains(p.err, "80%") {
		t.Errorf("efficiency 120%%: err %q, want it naming the field and the accepted form", p.err)
	}
	p.keys(t, "esc")
	if p.Editing() || p.value("eff") != "0.8" || p.result == nil {
		t.Errorf("esc: editing %v, eff %q, result %v; want the old value back and a result", p.Editing(), p.value("eff"), p.result != nil)
	}
	// A dilution with no target names the field.
	p.keys(t, "right", "right", "right", "down", "enter", "ctrl+u", "enter")
	if p.result != nil || !strings.Contains(p.err, "target: give") {
		t.Errorf("dilute with no target: err %q, want the error naming the field", p.err)
	}
	p.keys(t, "left", "left", "left")
	// The purge method is a choice: enter switches it.
	p.keys(t, "right", "right", "right", "right", "down", "down", "enter")
	if p.value("method") != "vacuum" {
		t.Errorf("purge method after enter: %q, want vacuum", p.value("method"))
	}
}

// The recipe changing makes the pane solve again (its generation).
func TestProcessPaneFollowsInputs(t *testing.T) {
	p, b := testProcess(t, false, 90, 30)
	p.keys(t, "right") // compress
	before, _ := process.Lookup(p.result, "t2")
	b.setTemp("350 K")
	b.update()
	p.Sync()
	after, _ := process.Lookup(p.result, "t2")
	if !(after.SI > before.SI) {
		t.Errorf("T₂ went from %g to %g K when the inlet warmed by 55 K", before.SI, after.SI)
	}
}

// The plot: compress and heat draw their path; the others say they have
// none. View is pure: asked twice it gives the same text.
func TestProcessPanePlot(t *testing.T) {
	for _, ascii := range []bool{false, true} {
		p, _ := testProcess(t, ascii, 90, 30)
		p.keys(t, "right", "p")
		if p.path == nil || len(p.path.Curves) != 2 {
			t.Fatalf("compress plot: path %v (%s)", p.path, p.pathErr)
		}
		v := p.whole()
		if !strings.Contains(v, "isentropic") || !strings.Contains(v, "T in K") {
			t.Errorf("compress plot lacks its legend or axis:\n%s", v)
		}
		if p.View() != p.View() {
			t.Error("View is not pure")
		}
		p.keys(t, "right") // heat
		if p.path == nil || !strings.Contains(p.whole(), "H in kJ/mol") {
			t.Errorf("heat plot: path %v (%s)", p.path, p.pathErr)
		}
		p.keys(t, "right") // mix
		if !strings.Contains(p.whole(), "no path to plot") {
			t.Errorf("mix with the plot on: want a note that it has no path")
		}
		if ascii {
			for _, k := range processKinds {
				_ = k
				if v := p.whole(); !isASCIIText(v) {
					t.Errorf("ASCII mode writes non-ASCII in %s:\n%s", p.current().key, v)
				}
				p.keys(t, "right")
			}
		}
	}
}

func isASCIIText(s string) bool {
	for i := 0; i < len(s); i++ {
		if s[i] >= 0x80 {
			return false
		}
	}
	return true
}

// Mixing can take its second stream from a blend file.
func TestProcessPaneStreamFromFile(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "co2.json")
	f := mixtures.FileFromBlend(mustParse(t, "CO2 1"))
	if err := f.Save(path); err != nil {
		t.Fatal(err)
	}
	p, _ := testProcess(t, false, 90, 30)
	p.keys(t, "right", "right", "right", "down", "enter", "ctrl+u")
	for _, r := range "@" + path {
		p.keys(t, string(r))
	}
	p.keys(t, "enter")
	if p.result == nil {
		t.Fatalf("stream 2 from %s: %s", path, p.err)
	}
	if st := p.result.Outlet(); st == nil || len(st.Species) != 5 {
		t.Errorf("the outlet should hold the demo's four species and CO2")
	}
	os.Remove(path)
	p.keys(t, "enter", "enter") // read again: the file is gone
	if p.result != nil || !strings.Contains(p.err, "stream 2") {
		t.Errorf("a missing file: err %q, want it naming stream 2", p.err)
	}
}

func mustParse(t *testing.T, text string) *mixtures.Blend {
	t.Helper()
	b, err := mixtures.ParseBlend(text)
	if err != nil {
		t.Fatal(err)
	}
	return b
}

// The fields and the choice survive a restart through the saved state.
func TestProcessPaneSavedState(t *testing.T) {
	p, _ := testProcess(t, false, 90, 30)
	p.keys(t, "right", "right", "enter", "ctrl+u", "3", "0", "0", " ", "C", "enter", "p")
	var st savedState
	p.saveState(&st)
	q, _ := testProcess(t, false, 90, 30)
	q.restoreState(&st)
	q.Sync()
	if q.current().key != "heat" || q.value("to") != "300 C" || !q.plotOn || q.result == nil {
		t.Errorf("restored: kind %s, to %q, plot %v, result %v", q.current().key, q.value("to"), q.plotOn, q.result != nil)
	}
}

// The export writes what the commands print, in the format its name
// chooses: --json's object or --csv's table.
func TestProcessExport(t *testing.T) {
	tests := []struct {
		name string
		want []string
	}{
		{"compress.json", []string{`"process": "compress"`, `"outlet_temperature_K"`, `"work_J_mol"`, `"cautions"`}},
		{"compress.csv", []string{"section,row,name,value\n", ",,process,compress\n", ",,outlet_temperature_K,", "cautions,1,,"}},
	}
	for _, tt := range tests {
		dir := t.TempDir()
		r := testRoot(t, 120, 40, testRootOpts{stateDir: dir})
		press(t, r, "6", "right")
		press(t, r, "ctrl+e", "ctrl+u")
		out := filepath.Join(dir, tt.name)
		typeIn(t, r, out)
		press(t, r, "enter")
		data, err := os.ReadFile(out)
		if err != nil {
			t.Fatalf("%s: no export: %v (status: %s)", tt.name, err, r.View())
		}
		for _, k := range tt.want {
			if !strings.Contains(string(data), k) {
				t.Errorf("%s lacks %q:\n%s", tt.name, k, data)
			}
		}
	}
}

// The weighed choice shows the engine's composition for the parents as
// typed, and a parent typed wrong names its field.
func TestProcessPaneWeighed(t *testing.T) {
	p, _ := testProcess(t, true, 100, 40)
	for p.current().key != "weighed" {
		p.keys(t, "right")
	}
	if p.result == nil {
		t.Fatalf("weighed: no result: %s", p.err)
	}
	// It names its own gases: with no valid recipe yet it still works,
	// and no inlet line is shown.
	c := testPaneCommon(true)
	empty := newBench(c.Catalogue)
	empty.update()
	q := newProcessPane(c, empty)
	q.SetSize(100, 40)
	for q.current().key != "weighed" {
		q.keys(t, "right")
	}
	q.Sync()
	if empty.in.Valid() || q.result == nil || strings.Contains(q.whole(), "inlet:") {
		t.Fatalf("weighed with no recipe: valid %v, result %v, err %q", empty.in.Valid(), q.result != nil, q.err)
	}
	var w process.Weighing
	for _, text := range []string{"2.4105 g CH4", "412.37 g N2 with O2 <5ppm"} {
		parent, err := process.ParseParent(p.c.Catalogue, text)
		if err != nil {
			t.Fatal(err)
		}
		w.Parents = append(w.Parents, parent)
	}
	w.MassUKg = 4e-6
	want, err := w.Solve()
	if err != nil {
		t.Fatal(err)
	}
	got, ok := p.result.(*process.WeighedResult)
	if !ok || len(got.X) != len(want.X) || got.X[0] != want.X[0] || got.UX[0] != want.UX[0] {
		t.Fatalf("pane result %+v, engine %+v", p.result, want)
	}
	v := p.whole()
	for _, s := range []string{"Composition (mole fractions)", "CH4", report.Number(want.X[0], mixtures.Digits{Sig: 7})} {
		if !strings.Contains(v, s) {
			t.Errorf("screen lacks %q:\n%s", s, v)
		}
	}
	p.keys(t, "down", "enter", "ctrl+u")
	for _, r := range "412 g N2 with O2 5wt%, Ar 3ppm" { // moles and mass mixed in one parent
		p.keys(t, string(r))
	}
	p.keys(t, "enter")
	if p.result != nil || !strings.Contains(p.err, "parent 2") || !strings.Contains(p.err, "by moles") {
		t.Errorf("bad parent 2: err %q, want it naming the field and the basis", p.err)
	}
	p.keys(t, "esc", "down", "down", "down", "down", "enter")
	for _, r := range "Ar 30 +- 1" {
		p.keys(t, string(r))
	}
	p.keys(t, "enter")
	if p.result != nil || !strings.HasPrefix(p.err, "atomic weight: ") {
		t.Errorf("bad atomic weight: err %q, want it naming the field", p.err)
	}
}

// The pane shows the result's notes, as the commands print them: here
// that the demo's start gas, with no O2, needs no purge at all.
func TestProcessPaneShowsNotes(t *testing.T) {
	p, _ := testProcess(t, false, 90, 60)
	p.keys(t, "right", "right", "right", "right", "right")
	if p.current().key != "purge" {
		t.Fatalf("process %s, want purge", p.current().key)
	}
	v := p.View()
	for _, want := range []string{"Note: the start gas already meets the target: no purge is needed.", "Note: levels of O2"} {
		if !strings.Contains(strings.Join(strings.Fields(v), " "), want) {
			t.Errorf("the pane lacks %q:\n%s", want, v)
		}
	}
}
