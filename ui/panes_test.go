package ui

import (
	"path/filepath"
	"strings"
	"testing"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"
)

// notePane is a pane as a contributor would add one: a type of its own
// and a registration, nothing else.
type notePane struct {
	c     *Common
	b     *bench
	w, h  int
	lines scroller
	keys  int
}

func (p *notePane) SetSize(w, h int) { p.w, p.h = w, h; p.lines.setHeight(h) }
func (p *notePane) Update(msg tea.Msg) tea.Cmd {
	if _, ok := msg.(tea.KeyMsg); ok {
		p.keys++
	}
	return nil
}
func (p *notePane) View() string              { return p.lines.view() }
func (p *notePane) KeyHelp() []key.Binding    { return []key.Binding{p.c.Keys.Scroll.Up} }
func (p *notePane) ShortHelp() []key.Binding  { return nil }
func (p *notePane) Title() string             { return "Notes" }
func (p *notePane) Editing() bool             { return false }
func (p *notePane) More() (above, below bool) { return p.lines.more() }
func (p *notePane) Sync() tea.Cmd {
	p.lines.setLines([]string{"species: " + p.b.entries[0].Species})
	return nil
}

// A pane registered with one line is in the Tab order, has a number key,
// is drawn, gets its keys, lists its help and is kept as the focus in the
// saved state; the root needs no other change.
func TestOnePaneOneRegistration(t *testing.T) {
	saved := paneSpecs
	t.Cleanup(func() { paneSpecs = saved })
	paneSpecs = append(append([]paneSpec{}, saved...),
		paneSpec{key: "notes", name: "Notes", role: roleResult, newPane: func(c *Common, b *bench) pane { return &notePane{c: c, b: b} }})
	id := paneID(len(paneSpecs) - 1)

	dir := t.TempDir()
	r := testRoot(t, 100, 30, testRootOpts{stateDir: dir})
	press(t, r, string(rune('1'+id)))
	if r.focus != id {
		t.Fatalf("number key %d: focus %s", id+1, r.focus.name())
	}
	v := r.View()
	if !strings.Contains(v, "Notes") || !strings.Contains(v, "species: SiH4") {
		t.Errorf("the new pane is not drawn:\n%s", v)
	}
	press(t, r, "x")
	if n := r.panes[id].(*notePane).keys; n != 1 {
		t.Errorf("the focused new pane got %d keys, want 1", n)
	}
	press(t, r, "?")
	if !strings.Contains(r.overlayScroll.view(), "Keys: Notes") && !strings.Contains(r.View(), "Keys: Notes") {
		t.Errorf("help overlay does not name the new pane:\n%s", r.View())
	}
	press(t, r, "esc", "tab")
	if r.focus != 0 {
		t.Errorf("tab from the last pane: focus %s, want the first", r.focus.name())
	}
	press(t, r, "shift+tab")
	r.finalSave()
	if st := readState(t, dir); st.Pane != "notes" {
		t.Errorf("saved pane %q, want notes", st.Pane)
	}
	r2 := testRoot(t, 100, 30, testRootOpts{stateDir: dir})
	if r2.focus != id {
		t.Errorf("restored focus %s, want Notes", r2.focus.name())
	}
}

// Opening a blend file sweeps the new blend at once, as any edit does.
func TestOpenBlendSweepsNewBlend(t *testing.T) {
	dir := t.TempDir()
	r := testRoot(t, 120, 40, testRootOpts{stateDir: dir})
	air := blendAir
	if err := air.Save(filepath.Join(dir, "air.json")); err != nil {
		t.Fatal(err)
	}
	press(t, r, "ctrl+o", "ctrl+u")
	typeIn(t, r, "air.json")
	press(t, r, "enter")
	res := r.panes[paneSweep].(*sweepPane).Result()
	if res == nil {
		t.Fatal("no sweep after opening a file")
	}
	sp := r.panes[paneSweep].(*sweepPane)
	if sp.resultKey.mix != r.b.in.Mixture {
		t.Errorf("the sweep shown is of the blend before the file was opened")
	}
}
