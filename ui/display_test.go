package ui

import (
	"strings"
	"testing"
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

// ASCII mode sends no byte above 127 on any screen: panes, overlays,
// prompts and the status bar (issue 7, item 7).
func TestASCIIModeEveryScreen(t *testing.T) {
	for _, size := range [][2]int{{80, 24}, {100, 30}, {120, 40}, {200, 50}} {
		for _, step := range screenTour {
			r := testRoot(t, size[0], size[1], testRootOpts{ascii: true})
			missing := map[rune]bool{}
			r.c.missingGlyph = func(ru rune) { missing[ru] = true }
			r.refreshPanes()
			r.sizes = [paneCount]box{} // every pane draws its lines again
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
