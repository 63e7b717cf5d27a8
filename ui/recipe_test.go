package ui

import (
	"reflect"
	"strings"
	"testing"

	"zmix/mixtures"
	"zmix/model"
)

// testPaneCommon is a Common for panes tested on their own.
func testPaneCommon(ascii bool) *Common {
	return &Common{Width: 100, Height: 30, Styles: DefaultStyles(true, ascii), Keys: DefaultKeyMap(), ASCII: ascii, Catalogue: model.Builtin()}
}

// testRecipe is a recipe pane on the demo blend, sized 70 × 16.
func testRecipe(t *testing.T) (*recipePane, *bench) {
	t.Helper()
	c := testPaneCommon(false)
	b := newBench(c.Catalogue)
	b.loadFile(mixtures.DemoFile())
	b.update()
	p := newRecipePane(c, b)
	p.SetSize(70, 16)
	return p, b
}

// recipeKeys sends keys to a pane's Update and updates the bench after each,
// as the root does.
func recipeKeys(p *recipePane, b *bench, keys ...string) {
	for _, k := range keys {
		p.Update(testKey(k))
		if b.changed {
			b.update()
			p.refresh()
		}
	}
}

func recipeType(p *recipePane, b *bench, text string) {
	for _, c := range text {
		recipeKeys(p, b, string(c))
	}
}

func TestRecipeAddBySearch(t *testing.T) {
	p, b := testRecipe(t)
	recipeKeys(p, b, "a")
	if !p.Editing() || p.mode != recipeSearching {
		t.Fatalf("a did not open the search")
	}
	recipeType(p, b, "argo") // by name
	if len(p.hits) == 0 || p.hits[0].Formula != "Ar" {
		t.Fatalf("search for argo found %v, want Ar first", p.hits)
	}
	if !strings.Contains(p.View(), "argon") {
		t.Errorf("the search list does not show argon:\n%s", p.View())
	}
	recipeKeys(p, b, "enter")
	if p.mode != recipeEditing || b.entries[p.sel].Species != "Ar" {
		t.Fatalf("enter did not add Ar and open its amount (mode %d, entry %+v)", p.mode, b.entries[p.sel])
	}
	// Until an amount is typed the entry says so and the blend keeps its
	// last valid state.
	if b.rowErr[p.sel] == "" || b.in.Mixture == nil || len(b.in.Mixture.Components) != 4 {
		t.Errorf("empty amount: row error %q, mixture %v", b.rowErr[p.sel], b.in.Mixture)
	}
	recipeType(p, b, "1%")
	recipeKeys(p, b, "enter")
	if p.Editing() {
		t.Errorf("enter did not leave the amount")
	}
	if got := b.entries[len(b.entries)-1]; got != (mixtures.FileComponent{Species: "Ar", Amount: "1%"}) {
		t.Errorf("last entry = %+v, want Ar 1%%", got)
	}
	if x, ok := b.moleFraction("Ar"); !ok || x != 0.01 {
		t.Errorf("x(Ar) = %g, %v; want 0.01", x, ok)
	}
}

func TestRecipeSearchByFormulaAndArrows(t *testing.T) {
	p, b := testRecipe(t)
	recipeKeys(p, b, "a")
	recipeType(p, b, "c")
	if f := p.hits[0]; !strings.HasPrefix(strings.ToLower(f.Formula), "c") && !strings.HasPrefix(f.Name, "c") {
		t.Errorf("first hit for c is %s (%s)", f.Formula, f.Name)
	}
	recipeKeys(p, b, "down")
	if p.hit != 1 {
		t.Fatalf("down moved the mark to %d, want 1", p.hit)
	}
	recipeKeys(p, b, "up", "up")
	if p.hit != 0 {
		t.Errorf("up stops at the first hit; mark at %d", p.hit)
	}
	recipeKeys(p, b, "esc")
	if p.Editing() || len(b.entries) != 4 {
		t.Errorf("esc from the search added something or stayed open (%d entries)", len(b.entries))
	}
}

func TestRecipeAddExistingEditsIt(t *testing.T) {
	p, b := testRecipe(t)
	recipeKeys(p, b, "a")
	recipeType(p, b, "NH3")
	recipeKeys(p, b, "enter")
	if len(b.entries) != 4 || b.entries[p.sel].Species != "NH3" || p.mode != recipeEditing {
		t.Errorf("adding a species already present: %d entries, selected %s, mode %d", len(b.entries), b.entries[p.sel].Species, p.mode)
	}
}

func TestRecipeEditInvalidThenEscRestores(t *testing.T) {
	p, b := testRecipe(t)
	recipeKeys(p, b, "down", "enter") // NH3 18%
	recipeKeys(p, b, "backspace", "backspace", "backspace")
	gen := b.in.Gen
	// Pasted in one go: typed a key at a time, "12 pa" on the way would be
	// a valid partial pressure.
	recipeKeys(p, b, "12 parsecs")
	if b.entries[1].Amount != "12 parsecs" {
		t.Fatalf("typed text not kept: %q", b.entries[1].Amount)
	}
	if !strings.Contains(p.View(), "unknown unit") {
		t.Errorf("the error is not shown in place:\n%s", p.View())
	}
	if b.in.Gen != gen {
		t.Errorf("an invalid amount changed the inputs (gen %d → %d)", gen, b.in.Gen)
	}
	recipeKeys(p, b, "esc")
	if b.entries[1].Amount != "18%" || p.Editing() {
		t.Errorf("esc left %q (editing %v), want 18%% restored", b.entries[1].Amount, p.Editing())
	}
	if x, _ := b.moleFraction("NH3"); x != 0.18 {
		t.Errorf("x(NH3) = %g after esc, want 0.18", x)
	}
}

func TestRecipeEnterKeepsInvalidText(t *testing.T) {
	p, b := testRecipe(t)
	recipeKeys(p, b, "enter", "x", "enter")
	if b.entries[0].Amount != "4%x" || b.rowErr[0] == "" {
		t.Errorf("entry %q, error %q: want the invalid text kept with its error", b.entries[0].Amount, b.rowErr[0])
	}
}

func TestRecipeRemoveBalanceNormalise(t *testing.T) {
	p, b := testRecipe(t)
	recipeKeys(p, b, "down", "down", "d") // remove H2
	if len(b.entries) != 3 || b.entries[2].Species != "N2" {
		t.Fatalf("after d: %+v", b.entries)
	}
	recipeKeys(p, b, "n")
	if !strings.Contains(p.msg, "balance") {
		t.Errorf("normalise with a balance: message %q", p.msg)
	}
	recipeKeys(p, b, "down", "b") // N2: clear the balance; it gets its share
	if got := b.entries[2].Amount; got != "78%" {
		t.Errorf("N2 after b = %q, want 78%%", got)
	}
	recipeKeys(p, b, "enter", "backspace", "backspace", "backspace")
	recipeType(p, b, "38%")
	recipeKeys(p, b, "enter")
	if b.blendErr == "" {
		t.Errorf("4%% + 18%% + 38%% with no balance should not resolve")
	}
	recipeKeys(p, b, "n")
	if b.blendErr != "" {
		t.Errorf("after normalise: %q", b.blendErr)
	}
	want := []string{"6.66667%", "30%", "63.3333%"}
	for i, w := range want {
		if b.entries[i].Amount != w {
			t.Errorf("entry %d = %q, want %q", i, b.entries[i].Amount, w)
		}
	}
}

func TestRecipeEmpty(t *testing.T) {
	p, b := testRecipe(t)
	recipeKeys(p, b, "d", "d", "d", "d", "d", "enter", "b", "n", "up", "down")
	if len(b.entries) != 0 || p.Editing() {
		t.Fatalf("entries %v editing %v", b.entries, p.Editing())
	}
	if v := p.View(); !strings.Contains(v, "press a to add") || !strings.Contains(v, "empty") {
		t.Errorf("empty recipe view:\n%s", v)
	}
}

func TestRecipeKeyHelpPerMode(t *testing.T) {
	p, b := testRecipe(t)
	k := p.c.Keys.Recipe
	if !hasBinding(p.KeyHelp(), k.Normalise) {
		t.Errorf("browse help lacks normalise")
	}
	recipeKeys(p, b, "a")
	if !hasBinding(p.KeyHelp(), k.Pick) {
		t.Errorf("search help lacks pick")
	}
}

// A query that matches nothing offers the catalogue's nearest names, the
// engine's suggestion that the commands give, and enter adds the marked one.
func TestRecipeSearchSuggestsNearest(t *testing.T) {
	p, b := testRecipe(t)
	recipeKeys(p, b, "a")
	recipeType(p, b, "Ni2")
	want := p.c.Catalogue.Suggest("Ni2", 3)
	if len(want) == 0 {
		t.Fatal("the catalogue suggests nothing for Ni2; the test needs a query it can place")
	}
	var got []string
	for _, sp := range p.hits {
		got = append(got, sp.Formula)
	}
	if strings.Join(got, " ") != strings.Join(want, " ") || !strings.Contains(p.View(), "nearest names") {
		t.Fatalf("hits for Ni2 = %v, want the nearest names %v; view:\n%s", got, want, p.View())
	}
	recipeKeys(p, b, "enter")
	if p.mode != recipeEditing || b.entries[p.sel].Species != want[0] {
		t.Errorf("enter did not add %s and open its amount", want[0])
	}
}

// A query naming a gas the catalogue is known to lack says why, and offers
// no look-alike to add by mistake.
func TestRecipeSearchSaysWhyAbsent(t *testing.T) {
	p, b := testRecipe(t)
	recipeKeys(p, b, "a")
	recipeType(p, b, "C4F8")
	if len(p.hits) != 0 || !strings.Contains(p.View(), "not in the built-in") || !strings.Contains(p.View(), "--species FILE") {
		t.Fatalf("hits for C4F8 = %d; view:\n%s", len(p.hits), p.View())
	}
	recipeKeys(p, b, "enter")
	if len(b.entries) != 4 || !strings.Contains(p.msg, "not in the built-in") {
		t.Errorf("enter on no hits: %d entries, remark %q; want 4 and the reason", len(b.entries), p.msg)
	}
}

// "air" is offered first by the search, as a named mixture; its row
// shows its own share, and the blend holds its components.
func TestRecipeSearchOffersAir(t *testing.T) {
	p, b := testRecipe(t)
	recipeKeys(p, b, "a")
	recipeType(p, b, "ai")
	if len(p.hits) == 0 || p.hits[0].Formula != "air" || !strings.Contains(p.View(), "dry air (N2, O2, Ar, CO2)") {
		t.Fatalf("hits for ai = %v, want air first; view:\n%s", p.hits, p.View())
	}
	recipeKeys(p, b, "enter")
	recipeType(p, b, "10%")
	recipeKeys(p, b, "enter")
	if e := b.entries[p.sel]; e.Species != "air" || e.Amount != "10%" {
		t.Fatalf("after adding air: marked row %+v", e)
	}
	if x, ok := b.moleFraction("air"); !ok || x != 0.10 {
		t.Errorf("air row: x = %g, %v; want its own 0.1", x, ok)
	}
	found := false
	for _, c := range b.in.Mixture.Components {
		found = found || c.Species.Formula == "O2"
	}
	if !found || !strings.Contains(p.View(), "0.1000") || !strings.Contains(p.View(), "air = dry air (N2, O2, Ar, CO2)") {
		t.Errorf("air in the recipe: O2 in the blend %v; view:\n%s", found, p.View())
	}
}

// The new row's amount is ready to type; enter on an empty amount asks for
// one and keeps the field open; after the amount, the row stays marked;
// esc on a new row takes it back out.
func TestRecipeNewRowAmount(t *testing.T) {
	p, b := testRecipe(t)
	recipeKeys(p, b, "a")
	recipeType(p, b, "ar")
	recipeKeys(p, b, "enter", "enter")
	if p.mode != recipeEditing || !strings.Contains(p.View(), "type one for Ar") {
		t.Fatalf("enter on an empty amount: mode %d; view:\n%s", p.mode, p.View())
	}
	recipeType(p, b, "1%")
	recipeKeys(p, b, "enter")
	if p.mode != recipeBrowse || b.entries[p.sel].Species != "Ar" || b.entries[p.sel].Amount != "1%" {
		t.Fatalf("after the amount: mode %d, marked row %+v", p.mode, b.entries[p.sel])
	}
	n := len(b.entries)
	recipeKeys(p, b, "a")
	recipeType(p, b, "xe")
	recipeKeys(p, b, "enter", "esc")
	if len(b.entries) != n || p.mode != recipeBrowse {
		t.Errorf("esc on a new row kept it: %+v", b.entries)
	}
}

// One undo takes back the last recipe change, a removal included; undo
// again redoes it.
func TestRecipeUndo(t *testing.T) {
	p, b := testRecipe(t)
	before := append([]mixtures.FileComponent{}, b.entries...)
	recipeKeys(p, b, "down", "d")
	if len(b.entries) != len(before)-1 {
		t.Fatalf("d removed nothing")
	}
	recipeKeys(p, b, "u")
	if !reflect.DeepEqual(b.entries, before) {
		t.Fatalf("u after d: %+v, want %+v", b.entries, before)
	}
	recipeKeys(p, b, "u")
	if len(b.entries) != len(before)-1 {
		t.Errorf("u again did not redo the removal: %+v", b.entries)
	}
	recipeKeys(p, b, "u", "enter", "ctrl+u")
	recipeType(p, b, "20%")
	recipeKeys(p, b, "enter", "u")
	if !reflect.DeepEqual(b.entries, before) {
		t.Errorf("u after an amount edit: %+v, want %+v", b.entries, before)
	}
}

// The blend's name and note are typed in the pane and go to its file.
func TestRecipeNameAndNote(t *testing.T) {
	p, b := testRecipe(t)
	recipeKeys(p, b, "r", "ctrl+u")
	recipeType(p, b, "Line 4 purge")
	recipeKeys(p, b, "enter", "c", "ctrl+u")
	recipeType(p, b, "Invented: bench test")
	recipeKeys(p, b, "enter")
	if f := b.blendFile(); f.Name != "Line 4 purge" || f.Note != "Invented: bench test" {
		t.Errorf("blend file name %q, note %q", f.Name, f.Note)
	}
	recipeKeys(p, b, "r")
	recipeType(p, b, " (draft)")
	recipeKeys(p, b, "esc")
	if b.name != "Line 4 purge" {
		t.Errorf("esc kept the typed name: %q", b.name)
	}
}
