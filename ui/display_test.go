package ui

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures"
	"zmix/model"
)

// screenTour is a walk through every pane, overlay and prompt of the
// workbench: each step is a name and the keys that reach it from the
// start screen. A step's keys may start with "type:" to type text.
var screenTour = []struct {
	name string
	keys []string
}{
	{"recipe", nil},
	{"recipe_search", []string{"a", "type:si"}},
	{"recipe_edit", []string{"enter"}},
	{"setpoint", []string{"2"}},
	{"setpoint_edit", []string{"2", "t"}},
	{"setpoint_gauge", []string{"2", "g"}},
	{"properties", []string{"3"}},
	{"sweep", []string{"4"}},
	{"sweep_edit", []string{"4", "e"}},
	{"sweep_overlay", []string{"4", "o"}},
	{"sweep_pressure", []string{"4", "v"}},
	{"anatomy", []string{"5"}},
	{"help", []string{"?"}},
	{"help_sweep", []string{"4", "?"}},
	{"safety", []string{"!"}},
	{"prompt_save", []string{"ctrl+s"}},
	{"prompt_open", []string{"ctrl+o"}},
	{"prompt_export", []string{"ctrl+e"}},
	{"prompt_export_sweep", []string{"4", "ctrl+e"}},
	{"error_in_place", []string{"enter", "ctrl+u", "type:two percent", "enter"}},
	{"cold_caution", []string{"2", "t", "ctrl+u", "type:-40 C", "enter", "p", "ctrl+u", "type:30 psig", "enter", "3"}},
}

// walk takes r through the keys of one tour step.
func walk(t *testing.T, r *root, keys []string) {
	t.Helper()
	for _, k := range keys {
		if text, ok := strings.CutPrefix(k, "type:"); ok {
			typeIn(t, r, text)
		} else {
			press(t, r, k)
		}
	}
}

// paneTour is a step per registered pane, by its number key, so that a
// pane added later is walked too.
func paneTour() []struct {
	name string
	keys []string
} {
	var out []struct {
		name string
		keys []string
	}
	for i := range paneSpecs {
		out = append(out, struct {
			name string
			keys []string
		}{"pane_" + paneSpecs[i].key, []string{string(rune('1' + i))}})
	}
	return out
}

// ASCII mode sends no byte above 127 on any screen: panes, overlays,
// prompts and the status bar (issue 7, item 7).
func TestASCIIModeEveryScreen(t *testing.T) {
	for _, size := range [][2]int{{80, 24}, {100, 30}, {120, 40}, {200, 50}} {
		for _, step := range append(paneTour(), screenTour...) {
			r := testRoot(t, size[0], size[1], testRootOpts{ascii: true})
			missing := map[rune]bool{}
			r.c.missingGlyph = func(ru rune) { missing[ru] = true }
			settle(t, r, r.syncPanes())
			r.sizes = make([]box, len(r.panes)) // every pane draws its lines again
			r.relayout()
			walk(t, r, step.keys)
			screen := r.View()
			for ru := range missing {
				t.Errorf("%dx%d %s: ASCII mode has no spelling of %q and writes \"?\"", size[0], size[1], step.name, ru)
			}
			for i, line := range strings.Split(screen, "\n") {
				for j, ru := range line {
					if ru >= 0x80 {
						t.Errorf("%dx%d %s: line %d col %d: %q is not ASCII in %q", size[0], size[1], step.name, i, j, ru, line)
						break
					}
				}
			}
		}
	}
}

// The model's cautions stay in sight: a line in Properties and a marker
// on every pane while one applies (issue 7, item 5). The demo blend at
// -40 °C and 30 psig brings NH3 near condensing.
func TestValidityCautionInSight(t *testing.T) {
	cold := []string{"2", "t", "ctrl+u", "type:-40 C", "enter", "p", "ctrl+u", "type:30 psig", "enter"}
	for _, size := range [][2]int{{80, 24}, {120, 40}} {
		r := testRoot(t, size[0], size[1], testRootOpts{})
		walk(t, r, cold)
		for _, pane := range []string{"1", "2", "3", "4", "5"} {
			press(t, r, pane)
			// The blend's own caution (Z = 0.99 at -40 °C and 3 bar) stands
			// beside NH3's.
			if screen := r.View(); !strings.Contains(screen, "MODEL CAUTIONS (blend, NH3)") {
				t.Errorf("%dx%d pane %s: no marker of the model's caution:\n%s", size[0], size[1], pane, screen)
			}
		}
		press(t, r, "3")
		if screen := r.View(); !strings.Contains(screen, "! caution: NH3: partial pressure is") {
			t.Errorf("%dx%d: Properties lacks the caution line:\n%s", size[0], size[1], screen)
		}
		press(t, r, "!")
		if screen := r.View(); !strings.Contains(screen, "* caution: NH3: partial pressure is") {
			t.Errorf("%dx%d: the safety overlay lacks the caution in full:\n%s", size[0], size[1], screen)
		}
	}
}

// At 80×24 the key-figures line says when it shows the last valid state
// (issue 7, item 11), and leaves out whole figures rather than cutting one.
func TestHeadlineMarkedStale(t *testing.T) {
	r := testRoot(t, 80, 24, testRootOpts{})
	head := func() string {
		for _, l := range strings.Split(r.View(), "\n") {
			if strings.HasPrefix(l, "= ") || strings.HasPrefix(l, "last valid") {
				return l
			}
		}
		return ""
	}
	if h := head(); !strings.HasPrefix(h, "= M ") || !strings.Contains(h, "m/s") {
		t.Fatalf("key figures = %q, want every figure", h)
	}
	walk(t, r, []string{"enter", "ctrl+u", "type:two percent", "enter"})
	h := head()
	if !strings.HasPrefix(h, "last valid: M ") {
		t.Fatalf("key figures with an entry in error = %q, want it marked last valid", h)
	}
	if f := strings.Fields(h); len(f) > 0 && strings.Contains("MρCpγc", f[len(f)-1]) {
		t.Errorf("key figures = %q: a figure's value is cut off", h)
	}
}

// Pressures show in the unit typed and the reading chosen everywhere: tab
// bar, Setpoint, Properties, the sweep's header, axis and cursor; the
// choice survives opening a file (issue 7, item 9).
func TestPressureViewEverywhere(t *testing.T) {
	dir := t.TempDir()
	r := testRoot(t, 120, 40, testRootOpts{stateDir: dir})
	press(t, r, "2", "g")
	check := func(when string, want ...string) {
		t.Helper()
		screen := r.View()
		if strings.Contains(screen, "bar abs") {
			t.Errorf("%s: an absolute pressure on a gauge screen:\n%s", when, screen)
		}
		for _, w := range want {
			if !strings.Contains(screen, w) {
				t.Errorf("%s: screen lacks %q:\n%s", when, w, screen)
			}
		}
	}
	check("gauge view", "295.15 K · 0.38675 barg", "295.15 K, 0.38675 barg", "0.38675 barg, entered as")
	press(t, r, "4")
	check("T sweep", "at P = 0.38675 barg")
	press(t, r, "v")
	check("P sweep", "P in barg", " barg (point")

	// A range typed in psig is shown in psig.
	walk(t, r, []string{"e", "ctrl+u", "type:5..150 psig", "enter"})
	check("psig range", "P in psig", " psig (point")

	f := mixtures.DemoFile()
	f.Pressure = "2 bar"
	path := filepath.Join(dir, "other.json")
	if err := f.Save(path); err != nil {
		t.Fatal(err)
	}
	walk(t, r, []string{"ctrl+o", "ctrl+u", "type:" + path, "enter"})
	if !r.b.showGauge {
		t.Fatalf("opening a file reset the pressure view to absolute (status %q)", r.status)
	}
	check("after ctrl+o", "0.98675 barg") // 2 bar absolute
}

// Save and export propose the user's data directory at first, then the
// folder last used; the data directory is made when first written to.
func TestSaveProposesDataDirThenLastFolder(t *testing.T) {
	data := filepath.Join(t.TempDir(), "share", "zmix")
	r := testRoot(t, 100, 30, testRootOpts{dataDir: data})
	press(t, r, "ctrl+s")
	if got, want := r.input.value(), filepath.Join(data, "blend.json"); got != want {
		t.Fatalf("save proposes %q, want %q", got, want)
	}
	press(t, r, "enter")
	if _, err := os.Stat(filepath.Join(data, "blend.json")); err != nil {
		t.Fatalf("saving as proposed: %v (status %q)", err, r.status)
	}
	press(t, r, "ctrl+e")
	if got, want := r.input.value(), filepath.Join(data, "readout.csv"); got != want {
		t.Errorf("export proposes %q, want %q", got, want)
	}
	other := t.TempDir()
	walk(t, r, []string{"ctrl+u", "type:" + filepath.Join(other, "x.json"), "enter", "ctrl+e"})
	if got, want := r.input.value(), filepath.Join(other, "readout.csv"); got != want {
		t.Errorf("after an export elsewhere, export proposes %q, want %q (the last folder)", got, want)
	}
}

// goldenTour is the screens kept as golden files at every size: each pane,
// each overlay and a prompt of each kind.
var goldenTour = []struct {
	name string
	keys []string
}{
	{"recipe", nil},
	{"setpoint", []string{"2"}},
	{"properties", []string{"3"}},
	{"sweep", []string{"4"}},
	{"sweep_pressure_overlay", []string{"4", "v", "o"}},
	{"anatomy", []string{"5"}},
	{"help", []string{"?"}},
	{"safety", []string{"!"}},
	{"export", []string{"ctrl+e"}},
	{"quit", []string{"ctrl+s", "enter", "d", "q"}},
}

// Golden screens of every pane, overlay and prompt at the four sizes the
// issue names (issue 7, item 8).
func TestGoldenEveryScreen(t *testing.T) {
	for _, size := range [][2]int{{80, 24}, {100, 30}, {120, 40}, {200, 50}} {
		for _, step := range goldenTour {
			name := fmt.Sprintf("tour_%s_%dx%d", step.name, size[0], size[1])
			t.Run(name, func(t *testing.T) {
				r := testRoot(t, size[0], size[1], testRootOpts{})
				walk(t, r, step.keys)
				compareGolden(t, name, r.View())
			})
		}
	}
}

// Nothing a user needs is cut mid-word (issue 7, item 8): each case is a
// screen and text that must stand on it whole.
func TestNothingCutMidWord(t *testing.T) {
	long := strings.Repeat("very-long-folder-name/", 5)
	// The export goes into the folder as long as the path typed.
	for _, c := range []struct {
		name string
		w, h int
		keys []string
		want []string
	}{
		{"help overlay units, 80 columns", 80, 24, []string{"?", "end"}, []string{"0.2 bar (partial),", "bal", "psig"}},
		{"quit prompt", 80, 24, []string{"ctrl+s", "enter", "d", "q"}, []string{"y quit · s save and quit · n stay"}},
		{"export confirmation", 80, 24, []string{"ctrl+e", "ctrl+u", "type:" + long + "x.csv", "enter"}, []string{"exported the readout to", "/x.csv"}},
		{"open-file error", 80, 24, []string{"ctrl+o", "ctrl+u", "type:" + long + "missing.json", "enter"}, []string{"missing.json", "(ctrl+o to try again)"}},
		{"sweep key hint, 80", 80, 24, []string{"4"}, []string{"←/h →/l cursor"}},
		{"sweep key hint, 120", 120, 40, []string{"4"}, []string{"←/h →/l cursor"}},
		{"sweep header at 30 psig", 80, 24, []string{"2", "p", "ctrl+u", "type:30 psig", "enter", "4"}, []string{"at P = 44.696 psia"}},
		{"blend name, 120x40", 120, 40, nil, []string{"nitride feed", "(demo)"}},
		{"450 °C, 120x40", 120, 40, []string{"2", "t", "ctrl+u", "type:450 C", "enter"}, []string{"723.15 K, 450.00 °C"}},
		{"Setpoint readout, 100x24", 100, 24, []string{"2", "t", "ctrl+u", "type:450 C", "enter", "p", "ctrl+u", "type:30 psig", "enter"},
			[]string{"450 C     723.15 K", "30 psig   44.696 psia"}}, // the °C echo gives way to keep every row in view
	} {
		r := testRoot(t, c.w, c.h, testRootOpts{})
		if err := os.MkdirAll(filepath.Join(r.cwd, long), 0o755); err != nil {
			t.Fatal(err)
		}
		walk(t, r, c.keys)
		screen := r.View()
		for _, w := range c.want {
			if !strings.Contains(screen, w) {
				t.Errorf("%s: screen lacks %q whole:\n%s", c.name, w, screen)
			}
		}
	}
}

// A blend with no hazard class can still have a model caution: the strip
// then holds its marker and the line deferring to site practice, whole.
func TestModelCautionWithoutHazards(t *testing.T) {
	c := testPaneCommon(false)
	notes := []mixtures.StateNote{{Species: "Ar", Note: model.Note{Severity: model.Caution, Text: "T/x = 1: a test note"}}}
	lines := safetyLines(c, nil, notes, 40)
	got := strings.Join(lines, "\n")
	if !strings.Contains(got, "MODEL CAUTION (Ar)") || !strings.Contains(got, "professional practice.") {
		t.Errorf("strip without hazards:\n%s", got)
	}
}

// In a narrow Setpoint (the split layouts) every line stays in view: the
// conversions wrap under their values and the hints give way (issue 7,
// item 8: the Setpoint readout at 100×24).
func TestSetpointFitsNarrow(t *testing.T) {
	for _, size := range [][2]int{{100, 24}, {100, 30}} {
		r := testRoot(t, size[0], size[1], testRootOpts{})
		walk(t, r, []string{"2", "t", "ctrl+u", "type:450 C", "enter", "p", "ctrl+u", "type:30 psig", "enter"})
		sp := r.panes[1]
		if above, below := sp.More(); above || below {
			t.Errorf("%dx%d: Setpoint hides lines (above %v, below %v):\n%s", size[0], size[1], above, below, r.View())
		}
	}
}

// At the narrowest workbench (64 columns) the tab row cannot name every
// pane: the others keep their numbers and the focused one its name, so
// that the focus never falls off the end of the row.
func TestTabRowKeepsFocusInSight(t *testing.T) {
	for _, w := range []int{minWidth, 80, 120} {
		r := testRoot(t, w, 24, testRootOpts{})
		for id := range r.panes {
			walk(t, r, []string{fmt.Sprint(id + 1)})
			bar := r.tabBar()
			want := fmt.Sprintf("[%d %s]", id+1, paneID(id).name())
			if !strings.Contains(bar, want) || lipgloss.Width(bar) > w {
				t.Errorf("%d columns, pane %d: tab row %q (width %d); want %q in it", w, id+1, bar, lipgloss.Width(bar), want)
			}
		}
	}
}
