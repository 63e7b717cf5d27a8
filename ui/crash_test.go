package ui

import (
	"os"
	"strings"
	"testing"
	"time"

	tea "github.com/charmbracelet/bubbletea"
)

func testGuard(t *testing.T, dir string) (*guard, *root) {
	t.Helper()
	r := testRoot(t, 80, 24, testRootOpts{stateDir: dir})
	return newGuard(r, dir, func() time.Time { return testClock }), r
}

func checkCrash(t *testing.T, g *guard, dir, wantAmount string) {
	t.Helper()
	if !g.crashed {
		t.Fatal("the panic was not caught")
	}
	data, err := os.ReadFile(g.report)
	if err != nil {
		t.Fatalf("no crash report: %v", err)
	}
	for _, want := range []string{"zmix crash report", "panic:", "stack:", "state save: ok"} {
		if !strings.Contains(string(data), want) {
			t.Errorf("report lacks %q", want)
		}
	}
	if !strings.HasPrefix(g.report, dir) {
		t.Errorf("report %s not in the state directory %s", g.report, dir)
	}
	if st := readState(t, dir); st.Blend.Components[0].Amount != wantAmount {
		t.Errorf("state saved with %q, want %q", st.Blend.Components[0].Amount, wantAmount)
	}
	if err := g.exitError(); !strings.Contains(err.Error(), g.report) {
		t.Errorf("exit error %q does not name the report", err)
	}
	if v := g.View(); !strings.Contains(v, "crash report") {
		t.Errorf("view after the crash: %q", v)
	}
	if _, cmd := g.Update(tea.KeyMsg{Type: tea.KeyRunes, Runes: []rune("x")}); !returnsQuit(cmd) {
		t.Errorf("a crashed workbench does not quit")
	}
}

func TestPanicInUpdate(t *testing.T) {
	dir := t.TempDir()
	g, r := testGuard(t, dir)
	press(t, r, "enter", "ctrl+u")
	typeIn(t, r, "6%")
	r.panes[paneRecipe] = panicPane{r.panes[paneRecipe]} // the next key to the recipe pane panics
	_, cmd := g.Update(testKey("x"))
	if !returnsQuit(cmd) {
		t.Errorf("no quit after a panic in Update")
	}
	checkCrash(t, g, dir, "6%")
}

func TestPanicInView(t *testing.T) {
	dir := t.TempDir()
	g, r := testGuard(t, dir)
	killed := false
	g.kill = func() { killed = true }
	r.panes[paneRecipe] = panicPane{r.panes[paneRecipe]} // drawing the recipe panics
	g.View()
	if !killed {
		t.Errorf("a panic in View did not end the program")
	}
	checkCrash(t, g, dir, "4%")
}

func TestPanicInCommand(t *testing.T) {
	dir := t.TempDir()
	g, _ := testGuard(t, dir)
	boom := func() tea.Msg { panic("boom") }
	msg := g.wrap(tea.Batch(boom, boom))()
	batch, ok := msg.(tea.BatchMsg)
	if !ok {
		t.Fatalf("batch came back as %T", msg)
	}
	inner := batch[0]()
	if _, ok := inner.(cmdPanicMsg); !ok {
		t.Fatalf("a panicking command gave %T, want cmdPanicMsg", inner)
	}
	if _, cmd := g.Update(inner); !returnsQuit(cmd) {
		t.Errorf("no quit after a panic in a command")
	}
	checkCrash(t, g, dir, "4%")
}
