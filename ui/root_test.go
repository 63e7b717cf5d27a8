package ui

import (
	"strings"
	"testing"
	"unicode/utf8"

	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/lipgloss"
)

func TestRootFocusKeys(t *testing.T) {
	r := testRoot(t, 80, 24, testRootOpts{})
	steps := []struct {
		key  string
		want paneID
	}{
		{"tab", paneSetpoint}, {"tab", paneProperties}, {"tab", paneSweep}, {"tab", paneAnatomy}, {"tab", paneProcess},
		{"tab", paneRecipe}, {"shift+tab", paneProcess}, {"shift+tab", paneAnatomy}, {"3", paneProperties}, {"1", paneRecipe}, {"5", paneAnatomy}, {"6", paneProcess},
	}
	for _, s := range steps {
		press(t, r, s.key)
		if r.focus != s.want {
			t.Fatalf("after %s: focus %s, want %s", s.key, r.focus.name(), s.want.name())
		}
		if !strings.Contains(r.View(), "["+string(rune('1'+s.want))+" "+s.want.name()+"]") {
			t.Errorf("tab bar does not mark %s:\n%s", s.want.name(), r.View())
		}
	}
}

// While a field is being typed in, q, ?, Tab and digits are text.
func TestRootEditingTakesLetters(t *testing.T) {
	r := testRoot(t, 80, 24, testRootOpts{})
	press(t, r, "2", "t", "ctrl+u")
	for _, k := range []string{"q", "?", "tab", "3", "!"} {
		if press(t, r, k) {
			t.Fatalf("%q quit while typing", k)
		}
		if r.focus != paneSetpoint || r.overlay != overlayNone {
			t.Fatalf("%q acted as a global key while typing", k)
		}
	}
	if got := r.b.tempText; got != "q?3!" {
		t.Errorf("typed text = %q, want q?3!", got)
	}
	press(t, r, "esc")
	if r.panes[paneSetpoint].Editing() || r.b.tempText != "22 C" {
		t.Errorf("esc: editing %v, text %q", r.panes[paneSetpoint].Editing(), r.b.tempText)
	}
	if !press(t, r, "t", "ctrl+c") {
		t.Errorf("ctrl+c did not quit while typing")
	}
}

// The help overlay lists every key the focused pane has, and the global
// keys; esc closes it.
func TestRootHelpOverlay(t *testing.T) {
	r := testRoot(t, 120, 60, testRootOpts{})
	for id := paneID(0); id < paneID(paneCount()); id++ {
		r.setFocus(id)
		press(t, r, "?")
		if r.overlay != overlayHelp {
			t.Fatalf("%s: ? did not open the help", id.name())
		}
		r.overlayScroll.setHeight(1000)
		v := r.overlayScroll.view()
		for _, b := range append(r.panes[id].KeyHelp(), r.c.Keys.globalHelp()...) {
			h := b.Help()
			if !strings.Contains(v, h.Key) || !strings.Contains(v, h.Desc) {
				t.Errorf("%s: help lacks %q %q", id.name(), h.Key, h.Desc)
			}
		}
		press(t, r, "esc")
		if r.overlay != overlayNone {
			t.Errorf("esc did not close the help")
		}
	}
	press(t, r, "!")
	if r.overlay != overlaySafety || !strings.Contains(r.View(), "Pyrophoric (SiH4): can ignite") {
		t.Errorf("! did not show the safety texts:\n%s", r.View())
	}
	press(t, r, "q") // closes the overlay, does not quit
	if r.overlay != overlayNone || r.quitting {
		t.Errorf("q in an overlay: overlay %d quitting %v", r.overlay, r.quitting)
	}
}

func TestRootQuitPlain(t *testing.T) {
	r := testRoot(t, 80, 24, testRootOpts{})
	press(t, r, "enter", "5") // an edit: autosaved work needs no question
	press(t, r, "esc")
	if !press(t, r, "q") {
		t.Errorf("q did not quit")
	}
}

// With a blend file edited since its save, q asks first.
func TestRootQuitAsksForUnsavedFile(t *testing.T) {
	dir := t.TempDir()
	r := testRoot(t, 80, 24, testRootOpts{stateDir: dir})
	press(t, r, "ctrl+s", "enter") // saves blend.json in dir
	if r.blendPath == "" || r.unsaved {
		t.Fatalf("save: path %q unsaved %v, status %q", r.blendPath, r.unsaved, r.status)
	}
	if !press(t, r, "q") {
		t.Fatalf("q with the file saved did not quit")
	}
	r.quitting = false
	press(t, r, "b") // SiH4 becomes the balance: an edit
	if !r.unsaved {
		t.Fatal("an edit did not mark the file unsaved")
	}
	if press(t, r, "q") || r.prompt != promptQuit {
		t.Fatalf("q with unsaved changes quit without asking")
	}
	if !strings.Contains(r.View(), "not saved") {
		t.Errorf("question not shown:\n%s", r.View())
	}
	press(t, r, "n")
	if r.prompt != promptNone || r.quitting {
		t.Fatalf("n did not stay")
	}
	if press(t, r, "q"); !press(t, r, "s") {
		t.Fatalf("s did not save and quit")
	}
	if r.unsaved {
		t.Errorf("s quit without saving")
	}
	r.quitting = false
	press(t, r, "b")
	if press(t, r, "q"); !press(t, r, "y") {
		t.Errorf("y did not quit")
	}
}

func TestRootTooSmall(t *testing.T) {
	for _, size := range [][2]int{{0, 0}, {1, 1}, {20, 5}, {63, 30}, {100, 17}, {64, 18}} {
		r := testRoot(t, size[0], size[1], testRootOpts{})
		v := r.View() // must not panic
		lines := strings.Split(v, "\n")
		if v != "" && len(lines) > max(size[1], 0) {
			t.Errorf("%v: %d lines", size, len(lines))
		}
		for _, l := range lines {
			if lipgloss.Width(l) > size[0] {
				t.Errorf("%v: line wider than the screen: %q", size, l)
			}
		}
		if size[0] >= 20 && (size[0] < minWidth || size[1] < minHeight) && !strings.Contains(v, "64×18") {
			t.Errorf("%v: no word of the size needed:\n%s", size, v)
		}
	}
}

// Every layout fills the screen exactly: no line too long, none missing.
func TestRootScreenFits(t *testing.T) {
	for _, size := range [][2]int{{64, 18}, {80, 23}, {80, 24}, {100, 30}, {119, 40}, {120, 40}, {200, 60}} {
		for _, ascii := range []bool{false, true} {
			r := testRoot(t, size[0], size[1], testRootOpts{ascii: ascii})
			for id := paneID(0); id < paneID(paneCount()); id++ {
				r.setFocus(id)
				for _, keys := range [][]string{nil, {"?"}, {"!"}} {
					press(t, r, keys...)
					v := r.View()
					lines := strings.Split(v, "\n")
					if len(lines) != size[1] {
						t.Errorf("%v ascii=%v %s %v: %d lines", size, ascii, id.name(), keys, len(lines))
					}
					for _, l := range lines {
						if lipgloss.Width(l) > size[0] {
							t.Errorf("%v %s: line of %d cells: %q", size, id.name(), lipgloss.Width(l), l)
						}
					}
					if ascii {
						for i := 0; i < len(v); i++ {
							if v[i] >= utf8.RuneSelf {
								t.Fatalf("%v %s %v: non-ASCII in ASCII mode: %q", size, id.name(), keys, lineAt(v, i))
							}
						}
					}
					press(t, r, "esc")
				}
			}
		}
	}
}

func lineAt(s string, i int) string {
	start := strings.LastIndexByte(s[:i], '\n') + 1
	end := strings.IndexByte(s[i:], '\n')
	if end < 0 {
		return s[start:]
	}
	return s[start : i+end]
}

func TestRootLayouts(t *testing.T) {
	cases := []struct {
		w, h    int
		want    layoutKind
		visible []paneID
	}{
		{80, 24, layoutSingle, []paneID{paneRecipe, paneSetpoint}},
		{100, 30, layoutSplit, []paneID{paneRecipe, paneSetpoint, paneProperties}},
		{120, 40, layoutFull, []paneID{paneRecipe, paneSetpoint, paneProperties, paneSweep, paneAnatomy}},
	}
	for _, c := range cases {
		r := testRoot(t, c.w, c.h, testRootOpts{})
		if r.lay.kind != c.want {
			t.Errorf("%d×%d: layout %d, want %d", c.w, c.h, r.lay.kind, c.want)
		}
		v := r.View()
		for _, id := range c.visible {
			if !strings.Contains(v, paneTitleText(r, id)) {
				t.Errorf("%d×%d: %s not on screen", c.w, c.h, id.name())
			}
		}
	}
}

// paneTitleText is a pane's title as its frame shows it: bracketed when
// the pane has focus.
func paneTitleText(r *root, id paneID) string {
	if id == r.focus {
		return "[" + r.paneTitle(id) + "]"
	}
	return " " + r.paneTitle(id) + " "
}

// The caution strip shows while a caution applies and goes with it.
func TestRootSafetyStrip(t *testing.T) {
	r := testRoot(t, 80, 24, testRootOpts{})
	if v := r.View(); !strings.Contains(v, "SAFETY") || !strings.Contains(v, "licensed professional practice") {
		t.Fatalf("demo blend without its cautions:\n%s", v)
	}
	// Air at 1 bar: no caution.
	r.b.loadFile(&blendAir)
	settle(t, r, r.Update(nil))
	if v := r.View(); strings.Contains(v, "SAFETY") {
		t.Errorf("air at 1 bar shows a caution strip:\n%s", v)
	}
}

// Keys that arrive in one message (fast typing, or one packet over a slow
// SSH link) act one by one: "2" moves to Setpoint, "t" opens the
// temperature, and the rest is typed into it.
func TestRootCoalescedKeys(t *testing.T) {
	r := testRoot(t, 80, 24, testRootOpts{stateDir: t.TempDir()})
	settle(t, r, r.Update(tea.KeyMsg{Type: tea.KeyRunes, Runes: []rune("2t")}))
	if r.focus != paneSetpoint || !r.panes[paneSetpoint].Editing() {
		t.Fatalf("after \"2t\" in one message: focus %d, editing %v; want Setpoint, editing", r.focus, r.panes[paneSetpoint].Editing())
	}
	press(t, r, "ctrl+u")
	settle(t, r, r.Update(tea.KeyMsg{Type: tea.KeyRunes, Runes: []rune("350")}))
	press(t, r, " ", "K", "enter")
	if got := r.b.in.TempK; got != 350 {
		t.Errorf("temperature typed in coalesced keys: %g K in force, want 350 K", got)
	}
	// A bracketed paste stays whole: pasted text is never taken as keys.
	settle(t, r, r.Update(tea.KeyMsg{Type: tea.KeyRunes, Runes: []rune("qq"), Paste: true}))
	if r.quitting {
		t.Errorf("a paste of \"qq\" quit the workbench")
	}
}
