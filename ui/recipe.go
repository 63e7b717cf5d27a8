package ui

import (
	"fmt"
	"slices"
	"strings"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/model"
)

type recipeMode int

const (
	recipeBrowse recipeMode = iota
	recipeEditing
	recipeSearching
	recipeNaming // the blend's name or note is typed in
)

// recipeField is the text being typed in recipeNaming mode.
type recipeField int

const (
	fieldName recipeField = iota
	fieldNote
)

// recipePane is the composition: species and amounts as typed, each with
// its error in place, and a search of the catalogue to add species.
type recipePane struct {
	c    *Common
	b    *bench
	w, h int

	sel    int
	mode   recipeMode
	amount field
	before string // the amount before editing, for esc
	added  bool   // the row being edited was just added by the search
	field  recipeField
	search field
	hits   []searchHit
	hit    int
	// absent is why the catalogue lacks the gas a query names (c-C4F8),
	// when it is one it is known to lack.
	absent string
	// nearest says the hits are the names nearest a query that matched
	// nothing; beforeEntries is the recipe when an amount was opened.
	nearest       bool
	beforeEntries []mixtures.FileComponent
	msg           string // the pane's last remark, e.g. why normalise refused
	loads         uint64 // the bench's loads when last synced

	scroll scroller
}

func newRecipePane(c *Common, b *bench) *recipePane {
	p := &recipePane{c: c, b: b, amount: newFieldLimit(c, mixtures.MaxAmountChars), search: newFieldLimit(c, mixtures.MaxSpeciesChars), loads: b.loads}
	return p
}

func (p *recipePane) SetSize(w, h int) {
	p.w, p.h = max(w, 0), max(h, 0)
	p.amount.setWidth(p.amountWidth())
	p.search.setWidth(p.w - 14)
	p.scroll.setHeight(p.h)
	p.refresh()
}

func (p *recipePane) Editing() bool { return p.mode != recipeBrowse }

func (p *recipePane) KeyHelp() []key.Binding {
	k := p.c.Keys.Recipe
	switch p.mode {
	case recipeEditing:
		return []key.Binding{k.Done, p.c.Keys.Back, p.c.Keys.Interrupt}
	case recipeSearching:
		return []key.Binding{k.Pick, k.SearchUp, k.SearchDown, p.c.Keys.Back}
	case recipeNaming:
		return []key.Binding{p.c.Keys.Accept, p.c.Keys.Back, p.c.Keys.Interrupt}
	}
	return []key.Binding{k.Up, k.Down, k.Add, k.Edit, k.Balance, k.Remove, k.Normalise, k.Undo, k.Name, k.Note}
}

// ShortHelp is the few keys the status line names.
func (p *recipePane) ShortHelp() []key.Binding {
	k := p.c.Keys.Recipe
	switch p.mode {
	case recipeEditing:
		return []key.Binding{k.Done, p.c.Keys.Back}
	case recipeSearching:
		return []key.Binding{k.Pick, p.c.Keys.Back}
	case recipeNaming:
		return []key.Binding{p.c.Keys.Accept, p.c.Keys.Back}
	}
	return []key.Binding{k.Add, k.Edit, k.Balance, k.Remove, k.Normalise, k.Undo}
}

func (p *recipePane) Update(m tea.Msg) tea.Cmd {
	msg, ok := m.(tea.KeyMsg)
	if !ok {
		return nil
	}
	k := p.c.Keys.Recipe
	var cmd tea.Cmd
	switch p.mode {
	case recipeEditing:
		p.msg = ""
		switch {
		case key.Matches(msg, p.c.Keys.Back) && p.added && strings.TrimSpace(p.before) == "":
			// Esc on a row the search just added takes the row back out.
			p.msg = "not added: " + p.b.entries[p.sel].Species
			p.b.undoRecipe()
			p.stopEdit()
		case key.Matches(msg, p.c.Keys.Back):
			p.b.setAmount(p.sel, p.before)
			p.stopEdit()
		case key.Matches(msg, k.Done) && strings.TrimSpace(p.amount.value()) == "":
			// An empty amount is not a recipe line: ask for one.
			p.msg = "enter keeps an amount: type one for " + p.b.entries[p.sel].Species + "; esc " + p.escWord()
		case key.Matches(msg, k.Done):
			if p.b.entries[p.sel].Amount != p.before && !p.added {
				p.b.rememberRecipe(p.beforeEntries)
			}
			p.stopEdit()
		default:
			cmd = p.amount.update(msg)
			p.b.setAmount(p.sel, p.amount.value())
		}
	case recipeNaming:
		switch {
		case key.Matches(msg, p.c.Keys.Back):
			p.stopNaming(false)
		case key.Matches(msg, p.c.Keys.Accept):
			p.stopNaming(true)
		default:
			cmd = p.amount.update(msg)
		}
	case recipeSearching:
		switch {
		case key.Matches(msg, p.c.Keys.Back):
			p.mode = recipeBrowse
			p.search.stop()
		case key.Matches(msg, k.Pick):
			p.pick()
		case key.Matches(msg, k.SearchUp):
			p.hit = max(p.hit-1, 0)
		case key.Matches(msg, k.SearchDown):
			p.hit = min(p.hit+1, len(p.hits)-1)
		default:
			cmd = p.search.update(msg)
			p.findHits()
		}
	default:
		p.msg = ""
		switch {
		case key.Matches(msg, k.Up):
			p.sel = max(p.sel-1, 0)
		case key.Matches(msg, k.Down):
			p.sel = min(p.sel+1, len(p.b.entries)-1)
		case key.Matches(msg, k.Add):
			p.mode = recipeSearching
			p.search.start("")
			p.findHits()
		case key.Matches(msg, k.Edit):
			if len(p.b.entries) > 0 {
				p.startEdit()
			}
		case key.Matches(msg, k.Balance):
			if len(p.b.entries) > 0 {
				p.b.rememberRecipe(nil)
				p.b.setBalance(p.sel)
			}
		case key.Matches(msg, k.Remove):
			if len(p.b.entries) > 0 {
				p.msg = "removed " + p.b.entries[p.sel].Species + "; " + k.Undo.Help().Key + " puts it back"
				p.b.rememberRecipe(nil)
				p.b.remove(p.sel)
			}
		case key.Matches(msg, k.Undo):
			if p.b.undoRecipe() {
				p.msg = "undone: the recipe is as before its last change (" + k.Undo.Help().Key + " again redoes)"
			} else {
				p.msg = "nothing to undo yet"
			}
		case key.Matches(msg, k.Name):
			p.startNaming(fieldName)
		case key.Matches(msg, k.Note):
			p.startNaming(fieldNote)
		case key.Matches(msg, k.Normalise):
			before := append([]mixtures.FileComponent{}, p.b.entries...)
			if err := p.b.normalise(); err != nil {
				p.msg = err.Error()
			} else {
				p.b.rememberRecipe(before)
				p.msg = "amounts scaled to sum to 100 %"
			}
		}
	}
	p.sel = max(0, min(p.sel, len(p.b.entries)-1))
	p.refresh()
	return cmd
}

func (p *recipePane) startEdit() {
	p.mode = recipeEditing
	p.before = p.b.entries[p.sel].Amount
	p.beforeEntries = append(p.beforeEntries[:0], p.b.entries...)
	p.amount.start(p.before)
}

func (p *recipePane) stopEdit() {
	p.mode = recipeBrowse
	p.added = false
	p.amount.stop()
}

// escWord says what esc does while an amount is typed.
func (p *recipePane) escWord() string {
	if p.added && strings.TrimSpace(p.before) == "" {
		return "drops the species"
	}
	return "undoes the edit"
}

// startNaming opens the blend's name or note for typing, in the amount's
// field, which is free while no amount is typed.
func (p *recipePane) startNaming(f recipeField) {
	p.mode, p.field = recipeNaming, f
	text := p.b.name
	if f == fieldNote {
		text = p.b.note
	}
	p.amount.setWidth(max(p.w-8, 8))
	p.amount.start(text)
}

func (p *recipePane) stopNaming(keep bool) {
	if keep {
		if p.field == fieldName {
			p.b.setName(p.amount.value())
		} else {
			p.b.setNote(p.amount.value())
		}
	}
	p.mode = recipeBrowse
	p.amount.stop()
	p.amount.setWidth(p.amountWidth())
}

// searchHit is one line of the species search: a catalogue species, or
// a named mixture (air), which blend text takes as one item.
type searchHit struct {
	Formula, Name string
}

// findHits searches the catalogue for the query, with the named mixtures
// whose names start with it first; when nothing matches, it offers the
// nearest names instead, as the commands' "did you mean" does.
func (p *recipePane) findHits() {
	q := p.search.value()
	p.hits, p.hit, p.nearest, p.absent = nil, 0, false, ""
	if strings.TrimSpace(q) == "" {
		return
	}
	if key := strings.ToLower(strings.TrimSpace(q)); len(key) >= 2 {
		for _, m := range mixtures.AllNamedMixtures() {
			if strings.HasPrefix(m.Name, key) {
				p.hits = append(p.hits, searchHit{m.Name, m.Short})
			}
		}
	}
	for _, sp := range p.c.Catalogue.Search(q) {
		p.hits = append(p.hits, searchHit{sp.Formula, sp.Name})
	}
	if len(p.hits) > 0 {
		return
	}
	// A gas the catalogue is known to lack says why, rather than offering
	// a look-alike.
	if why, ok := p.c.Catalogue.AbsentHint(q); ok {
		p.absent = why
		return
	}
	for _, f := range p.c.Catalogue.Suggest(q, 3) {
		if sp, ok := p.c.Catalogue.Lookup(f); ok {
			p.hits = append(p.hits, searchHit{sp.Formula, sp.Name})
		}
	}
	p.nearest = len(p.hits) > 0
}

// pick adds the marked search hit and opens its amount for typing.
func (p *recipePane) pick() {
	p.search.stop()
	p.mode = recipeBrowse
	if len(p.hits) == 0 {
		p.msg = fmt.Sprintf("no species matches %q; try a formula (SiH4) or a name (silane)", p.search.value())
		if p.absent != "" {
			p.msg = p.absent
		}
		return
	}
	sp := p.hits[p.hit]
	before := append([]mixtures.FileComponent{}, p.b.entries...)
	i, added := p.b.addSpecies(sp.Formula)
	p.sel = i
	if !added {
		p.msg = sp.Formula + " is in the recipe already; edit its amount"
	} else {
		p.b.rememberRecipe(before)
	}
	// The new row's amount is open, ready to type: focus stays in it.
	p.startEdit()
	p.added = added
}

// selectSpecies marks the entry of a formula, if present.
func (p *recipePane) selectSpecies(formula string) {
	for i, e := range p.b.entries {
		if e.Species == formula {
			p.sel = i
		}
	}
	p.refresh()
}

func (p *recipePane) amountWidth() int { return max(10, min(22, p.w-24)) }

func (p *recipePane) speciesWidth() int {
	w := 7
	for _, e := range p.b.entries {
		w = max(w, len(p.c.Text(e.Species))+1)
	}
	return min(w, max(p.w/3, 7))
}

// refresh rebuilds the lines from the bench; it runs on every change and
// resize, so that View only slices.
func (p *recipePane) refresh() {
	if p.mode == recipeSearching {
		p.scroll.setLines(p.searchLines())
		p.scroll.top()
		return
	}
	s := p.c.Styles
	var lines []string
	// The blend's name and note, wrapped; while one is typed, its field.
	// The note is shown only where the pane has the rows for it.
	var noteLines []string
	for _, f := range []recipeField{fieldName, fieldNote} {
		text, label := p.b.name, "name: "
		if f == fieldNote {
			text, label = p.b.note, "note: "
		}
		var out []string
		if p.mode == recipeNaming && p.field == f {
			out = []string{s.Label.Render(label) + p.amount.view(max(p.w-len(label)-1, 8))}
		} else if text != "" {
			for _, l := range report.Wrap(p.c.Text(model.Printable(text)), p.w) {
				out = append(out, s.Muted.Render(l))
			}
		}
		if f == fieldNote {
			noteLines = out
		} else {
			lines = append(lines, out...)
		}
	}
	nameEnd := len(lines)
	sw, aw := p.speciesWidth(), p.amountWidth()
	xHead := "x mol/mol"
	if p.b.blendErr != "" || anyErr(p.b.rowErr) {
		xHead = "x (last valid)"
	}
	lines = append(lines, s.Label.Render("  "+padRight("species", sw)+" "+padRight("amount", aw)+" "+xHead))
	selFirst, selLast := 0, 0
	for i, e := range p.b.entries {
		mark := "  "
		if i == p.sel {
			mark = "> "
		}
		amt := padRight(p.c.Text(e.Amount), aw)
		if p.mode == recipeEditing && i == p.sel {
			amt = padRight(p.amount.view(aw), aw)
		} else if e.Amount == "" {
			amt = s.Muted.Render(padRight("(type one)", aw))
		}
		x := ""
		if v, ok := p.b.moleFraction(e.Species); ok {
			x = report.Sig(v, 4)
		}
		name := padRight(p.c.Text(e.Species), sw)
		if i == p.sel {
			name = s.Selected.Render(name)
		}
		if i == p.sel {
			selFirst = len(lines)
		}
		lines = append(lines, mark+name+" "+amt+" "+s.Value.Render(x))
		if i < len(p.b.rowErr) && p.b.rowErr[i] != "" {
			for _, l := range report.Wrap(p.c.Text(p.b.rowErr[i]), p.w-4) {
				lines = append(lines, "    "+s.Error.Render(l))
			}
		}
		if i == p.sel {
			selLast = len(lines) - 1
		}
	}
	if len(p.b.entries) == 0 {
		lines = append(lines, s.Muted.Render("  (no species: press a to add one)"))
	}
	// What a named mixture in the recipe (air) is, in a line; its shares
	// are the Properties pane's species rows, its source the README.
	var named []string
	for _, e := range p.b.entries {
		if m, ok := mixtures.LookupNamedMixture(e.Species); ok && !slices.Contains(named, m.Name) {
			named = append(named, m.Name)
			for _, l := range report.Wrap(p.c.Text(m.Name+" = "+m.Short), p.w-2) {
				lines = append(lines, s.Muted.Render("  "+l))
			}
		}
	}
	if p.b.blendErr != "" {
		for _, l := range report.Wrap(p.c.Text(p.b.blendErr), p.w-2) {
			lines = append(lines, s.Error.Render(l))
		}
	}
	if p.msg != "" {
		for _, l := range report.Wrap(p.c.Text(p.msg), p.w) {
			lines = append(lines, s.Warning.Render(l))
		}
	}
	if len(noteLines) > 0 && (len(lines)+len(noteLines) <= p.h || p.mode == recipeNaming) {
		lines = append(lines[:nameEnd], append(noteLines, lines[nameEnd:]...)...)
		selFirst += len(noteLines)
		selLast += len(noteLines)
	}
	p.scroll.setLines(lines)
	p.scroll.show(selFirst, selLast)
	if p.msg != "" || p.b.blendErr != "" {
		p.scroll.show(len(lines)-1, len(lines)-1)
		p.scroll.show(selFirst, selLast)
	}
}

func (p *recipePane) searchLines() []string {
	s := p.c.Styles
	lines := []string{s.Label.Render("add species: ") + p.search.view(max(p.w-14, 4))}
	for _, l := range report.Wrap(p.c.Text("type a formula or name; ↑↓ choose, enter adds, esc cancels"), p.w) {
		lines = append(lines, s.Muted.Render(l))
	}
	switch {
	case p.absent != "":
		for _, l := range report.Wrap(p.c.Text(p.absent), max(p.w-2, 10)) {
			lines = append(lines, s.Error.Render("  "+l))
		}
	case len(p.hits) == 0:
		lines = append(lines, s.Error.Render("  no match in the catalogue"))
	case p.nearest:
		lines = append(lines, s.Warning.Render(p.c.Text("  no match; the nearest names:")))
	}
	// The query stays in view; the list scrolls under it.
	room := max(p.h-len(lines), 1)
	first := max(0, p.hit-room+1)
	for i := first; i < len(p.hits) && i < first+room; i++ {
		sp := p.hits[i]
		mark := "  "
		f := padRight(p.c.Text(sp.Formula), 7)
		if i == p.hit {
			mark = "> "
			f = s.Selected.Render(f)
		}
		lines = append(lines, mark+f+" "+p.c.Text(sp.Name))
	}
	return lines
}

func anyErr(errs []string) bool {
	for _, e := range errs {
		if e != "" {
			return true
		}
	}
	return false
}

func (p *recipePane) View() string { return p.scroll.view() }

// Sync follows the document; a newly loaded file starts at its first row.
func (p *recipePane) Sync() tea.Cmd {
	if p.loads != p.b.loads {
		p.loads, p.sel = p.b.loads, 0
	}
	p.refresh()
	return nil
}

func (p *recipePane) More() (above, below bool) { return p.scroll.more() }

// wantHeight is a row per entry and the frame, header and a spare row,
// but no more than half the column.
func (p *recipePane) wantHeight(avail int) int { return max(7, min(len(p.b.entries)+5, avail/2)) }

// Title names the pane in its frame.
func (p *recipePane) Title() string {
	if n := len(p.b.entries); n > 0 {
		return fmt.Sprintf("Recipe (%d)", n)
	}
	return "Recipe"
}
