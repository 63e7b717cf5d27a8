package ui

import (
	"os"

	"github.com/charmbracelet/bubbles/key"
	"testing"
	"time"

	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/lipgloss"
	"github.com/muesli/termenv"

	"zmix/mixtures"
	"zmix/model"
)

// TestMain fixes the colour profile, so that screens compare as plain text
// whatever terminal runs the tests.
func TestMain(m *testing.M) {
	lipgloss.SetColorProfile(termenv.Ascii)
	os.Exit(m.Run())
}

// testClock is the fixed time of every test, so that file names made from
// the time are known.
var testClock = time.Date(2031, 5, 4, 10, 20, 30, 0, time.UTC)

type testRootOpts struct {
	ascii     bool
	blendFile string
	stateDir  string
	dataDir   string // where saves are proposed; "" means the state directory
}

// testRoot builds a workbench on a fresh state directory (or the given
// one), sized w × h, with its start-up commands run.
func testRoot(t testing.TB, w, h int, o testRootOpts) *root {
	t.Helper()
	if o.stateDir == "" {
		o.stateDir = t.TempDir()
	}
	if o.dataDir == "" {
		o.dataDir = o.stateDir
	}
	r, err := newRoot(Config{Catalogue: model.Builtin(), ASCII: o.ascii, BlendFile: o.blendFile},
		rootOptions{store: newStateStore(o.stateDir), now: func() time.Time { return testClock }, cwd: o.stateDir, dataDir: o.dataDir, mono: true})
	if err != nil {
		t.Fatal(err)
	}
	settle(t, r, r.Init())
	settle(t, r, r.Update(tea.WindowSizeMsg{Width: w, Height: h}))
	return r
}

// settle runs a command and every command that follows from it, feeding
// the messages back, as the program would; it stops at quit.
func settle(t testing.TB, r *root, cmd tea.Cmd) (quit bool) {
	t.Helper()
	queue := []tea.Cmd{cmd}
	for n := 0; len(queue) > 0; n++ {
		if n > 100000 {
			t.Fatal("commands do not settle")
		}
		c := queue[0]
		queue = queue[1:]
		if c == nil {
			continue
		}
		switch msg := c().(type) {
		case nil:
		case tea.BatchMsg:
			queue = append(queue, msg...)
		case tea.QuitMsg:
			quit = true
		default:
			queue = append(queue, r.Update(msg))
		}
	}
	return quit
}

// testKey turns "enter", "ctrl+s", "a" … into a key message.
func testKey(k string) tea.KeyMsg {
	special := map[string]tea.KeyType{
		"enter": tea.KeyEnter, "esc": tea.KeyEsc, "tab": tea.KeyTab, "shift+tab": tea.KeyShiftTab,
		"left": tea.KeyLeft, "right": tea.KeyRight, "up": tea.KeyUp, "down": tea.KeyDown,
		"home": tea.KeyHome, "end": tea.KeyEnd, "backspace": tea.KeyBackspace, "delete": tea.KeyDelete,
		"ctrl+c": tea.KeyCtrlC, "ctrl+s": tea.KeyCtrlS, "ctrl+o": tea.KeyCtrlO, "ctrl+e": tea.KeyCtrlE,
		"ctrl+u": tea.KeyCtrlU, "pgdown": tea.KeyPgDown, "pgup": tea.KeyPgUp, " ": tea.KeySpace,
	}
	if kt, ok := special[k]; ok {
		if kt == tea.KeySpace {
			return tea.KeyMsg{Type: kt, Runes: []rune{' '}}
		}
		return tea.KeyMsg{Type: kt}
	}
	return tea.KeyMsg{Type: tea.KeyRunes, Runes: []rune(k)}
}

// press sends keys one by one and runs what they start; it reports
// whether the program was told to quit.
func press(t testing.TB, r *root, keys ...string) bool {
	t.Helper()
	for _, k := range keys {
		if settle(t, r, r.Update(testKey(k))) {
			return true
		}
	}
	return false
}

// typeIn types text a character at a time.
func typeIn(t testing.TB, r *root, text string) {
	t.Helper()
	for _, c := range text {
		press(t, r, string(c))
	}
}

// hasBinding reports whether bs holds a binding with b's help.
func hasBinding(bs []key.Binding, b key.Binding) bool {
	for _, x := range bs {
		if x.Help() == b.Help() {
			return true
		}
	}
	return false
}

// returnsQuit runs cmd and reports whether it, or a command of its batch,
// tells the program to quit.
func returnsQuit(cmd tea.Cmd) bool {
	if cmd == nil {
		return false
	}
	switch msg := cmd().(type) {
	case tea.QuitMsg:
		return true
	case tea.BatchMsg:
		for _, c := range msg {
			if returnsQuit(c) {
				return true
			}
		}
	}
	return false
}

// The panes by their keys in the saved state; the code itself never
// names a pane by its place.
var (
	paneRecipe     = mustPane("recipe")
	paneSetpoint   = mustPane("setpoint")
	paneProperties = mustPane("properties")
	paneSweep      = mustPane("sweep")
	paneAnatomy    = mustPane("anatomy")
	paneProcess    = mustPane("process")
)

func mustPane(key string) paneID {
	id, ok := paneByKey(key)
	if !ok {
		panic("no pane " + key)
	}
	return id
}

// panicPane panics in Update and View, to test the crash guard.
type panicPane struct{ pane }

func (panicPane) Update(tea.Msg) tea.Cmd { panic("test: a pane's Update fails") }
func (panicPane) View() string           { panic("test: a pane's View fails") }

// recipe makes recipe lines from species and amounts, in pairs.
func recipe(speciesAmount ...string) []mixtures.FileComponent {
	var r []mixtures.FileComponent
	for i := 0; i+1 < len(speciesAmount); i += 2 {
		r = append(r, mixtures.FileComponent{Species: speciesAmount[i], Amount: speciesAmount[i+1]})
	}
	return r
}
