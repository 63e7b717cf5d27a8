package ui

import (
	"fmt"

	"github.com/charmbracelet/bubbles/key"
)

// KeyMap is every key binding of the workbench, with its help text.
type KeyMap struct {
	Help     key.Binding
	NextPane key.Binding
	PrevPane key.Binding
	Back     key.Binding
	Quit     key.Binding
	Sweep    SweepKeys

	// Interrupt quits even while a field is being typed in.
	Interrupt key.Binding
	Safety    key.Binding   // the full caution texts
	Jump      []key.Binding // by paneID: the pane's number
	JumpHelp  key.Binding   // help text for Jump, matches nothing
	SaveBlend key.Binding
	OpenBlend key.Binding
	Export    key.Binding
	Accept    key.Binding // enter in prompts
	Yes       key.Binding
	No        key.Binding
	SaveQuit  key.Binding // in the quit question: save, then quit

	Field    FieldKeys
	Recipe   RecipeKeys
	Setpoint SetpointKeys
	Scroll   ScrollKeys
	Anatomy  AnatomyKeys
	Process  ProcessKeys
}

// FieldKeys edit a line of text.
type FieldKeys struct {
	Left, Right, WordLeft, WordRight, Home, End key.Binding
	Backspace, Delete, DeleteWord               key.Binding
	DeleteToStart, DeleteToEnd                  key.Binding
}

// RecipeKeys are the composition pane's bindings.
type RecipeKeys struct {
	Up, Down  key.Binding
	Add       key.Binding
	Edit      key.Binding
	Balance   key.Binding
	Remove    key.Binding
	Normalise key.Binding
	// In the species search, where letters are typed into the query.
	Pick       key.Binding
	SearchUp   key.Binding
	SearchDown key.Binding
	// While an amount is typed in.
	Done key.Binding
	// Undo takes back the last change of the recipe (again: redo); Name
	// and Note edit the blend's name and note.
	Undo, Name, Note key.Binding
}

// SetpointKeys are the conditions pane's bindings.
type SetpointKeys struct {
	Up, Down    key.Binding
	Edit        key.Binding
	Temperature key.Binding
	Pressure    key.Binding
	Standard    key.Binding
	Gauge       key.Binding
}

// ScrollKeys move a pane's text that is taller than the pane.
type ScrollKeys struct {
	Up, Down, PageUp, PageDown, Top, Bottom key.Binding
}

// AnatomyKeys are the breakdown pane's bindings.
type AnatomyKeys struct {
	PrevSpecies, NextSpecies key.Binding
}

// ProcessKeys are the process pane's bindings.
type ProcessKeys struct {
	PrevKind, NextKind key.Binding
	Up, Down           key.Binding
	Edit               key.Binding
	Plot               key.Binding
}

// DefaultKeyMap returns the workbench's bindings.
func DefaultKeyMap() *KeyMap {
	k := &KeyMap{
		Help:      key.NewBinding(key.WithKeys("?"), key.WithHelp("?", "keys for this pane")),
		NextPane:  key.NewBinding(key.WithKeys("tab"), key.WithHelp("tab", "next pane")),
		PrevPane:  key.NewBinding(key.WithKeys("shift+tab"), key.WithHelp("shift+tab", "previous pane")),
		Back:      key.NewBinding(key.WithKeys("esc"), key.WithHelp("esc", "back out")),
		Quit:      key.NewBinding(key.WithKeys("q", "ctrl+c"), key.WithHelp("q", "quit")),
		Sweep:     defaultSweepKeys(),
		Interrupt: key.NewBinding(key.WithKeys("ctrl+c"), key.WithHelp("ctrl+c", "quit, also while typing")),
		Safety:    key.NewBinding(key.WithKeys("!"), key.WithHelp("!", "safety reminders in full")),
		SaveBlend: key.NewBinding(key.WithKeys("ctrl+s"), key.WithHelp("ctrl+s", "save blend file")),
		OpenBlend: key.NewBinding(key.WithKeys("ctrl+o"), key.WithHelp("ctrl+o", "open blend file")),
		Export:    key.NewBinding(key.WithKeys("ctrl+e"), key.WithHelp("ctrl+e", "export readout, sweep or process result")),
		Accept:    key.NewBinding(key.WithKeys("enter"), key.WithHelp("enter", "confirm")),
		Yes:       key.NewBinding(key.WithKeys("y", "Y"), key.WithHelp("y", "yes")),
		No:        key.NewBinding(key.WithKeys("n", "N"), key.WithHelp("n", "no")),
		SaveQuit:  key.NewBinding(key.WithKeys("s", "S"), key.WithHelp("s", "save, then quit")),
		Field: FieldKeys{
			Left:          key.NewBinding(key.WithKeys("left", "ctrl+b"), key.WithHelp("←", "cursor left")),
			Right:         key.NewBinding(key.WithKeys("right", "ctrl+f"), key.WithHelp("→", "cursor right")),
			WordLeft:      key.NewBinding(key.WithKeys("alt+left", "alt+b"), key.WithHelp("alt+←", "word left")),
			WordRight:     key.NewBinding(key.WithKeys("alt+right", "alt+f"), key.WithHelp("alt+→", "word right")),
			Home:          key.NewBinding(key.WithKeys("home", "ctrl+a"), key.WithHelp("home", "start of line")),
			End:           key.NewBinding(key.WithKeys("end", "ctrl+e"), key.WithHelp("end", "end of line")),
			Backspace:     key.NewBinding(key.WithKeys("backspace", "ctrl+h"), key.WithHelp("backspace", "delete left")),
			Delete:        key.NewBinding(key.WithKeys("delete", "ctrl+d"), key.WithHelp("delete", "delete right")),
			DeleteWord:    key.NewBinding(key.WithKeys("ctrl+w", "alt+backspace"), key.WithHelp("ctrl+w", "delete word")),
			DeleteToStart: key.NewBinding(key.WithKeys("ctrl+u"), key.WithHelp("ctrl+u", "delete to start")),
			DeleteToEnd:   key.NewBinding(key.WithKeys("ctrl+k"), key.WithHelp("ctrl+k", "delete to end")),
		},
		Recipe: RecipeKeys{
			Up:         key.NewBinding(key.WithKeys("up", "k"), key.WithHelp("↑/k", "up: previous species")),
			Down:       key.NewBinding(key.WithKeys("down", "j"), key.WithHelp("↓/j", "down: next species")),
			Add:        key.NewBinding(key.WithKeys("a", "+"), key.WithHelp("a", "add: search the catalogue for a species")),
			Edit:       key.NewBinding(key.WithKeys("enter", "e"), key.WithHelp("enter/e", "edit: type the amount")),
			Balance:    key.NewBinding(key.WithKeys("b"), key.WithHelp("b", "balance: make it the balance gas, or undo that")),
			Remove:     key.NewBinding(key.WithKeys("d", "delete"), key.WithHelp("d", "remove: drop the species")),
			Normalise:  key.NewBinding(key.WithKeys("n"), key.WithHelp("n", "normalise: scale the amounts to 100 %")),
			Pick:       key.NewBinding(key.WithKeys("enter"), key.WithHelp("enter", "add: the marked species")),
			SearchUp:   key.NewBinding(key.WithKeys("up", "ctrl+p"), key.WithHelp("↑", "up: previous match")),
			SearchDown: key.NewBinding(key.WithKeys("down", "ctrl+n"), key.WithHelp("↓", "down: next match")),
			Done:       key.NewBinding(key.WithKeys("enter"), key.WithHelp("enter", "keep: the amount as typed (esc undoes)")),
			Undo:       key.NewBinding(key.WithKeys("u"), key.WithHelp("u", "undo: the last recipe change, a removal too (u again redoes)")),
			Name:       key.NewBinding(key.WithKeys("r"), key.WithHelp("r", "rename: type the blend's name")),
			Note:       key.NewBinding(key.WithKeys("c"), key.WithHelp("c", "comment: type the blend's note")),
		},
		Setpoint: SetpointKeys{
			Up:          key.NewBinding(key.WithKeys("up", "k"), key.WithHelp("↑/k", "up: previous line")),
			Down:        key.NewBinding(key.WithKeys("down", "j"), key.WithHelp("↓/j", "down: next line")),
			Edit:        key.NewBinding(key.WithKeys("enter", "e", " "), key.WithHelp("enter/e", "edit: type or switch the marked line")),
			Temperature: key.NewBinding(key.WithKeys("t"), key.WithHelp("t", "T: type the temperature with a unit")),
			Pressure:    key.NewBinding(key.WithKeys("p"), key.WithHelp("p", "P: type the pressure with a unit (bar, psig, ...)")),
			Standard:    key.NewBinding(key.WithKeys("s"), key.WithHelp("s", "P°: standard pressure 1 bar or 1 atm")),
			Gauge:       key.NewBinding(key.WithKeys("g"), key.WithHelp("g", "gauge: show pressure as gauge or absolute")),
		},
		Scroll: ScrollKeys{
			Up:       key.NewBinding(key.WithKeys("up", "k"), key.WithHelp("↑/k", "scroll: up a line")),
			Down:     key.NewBinding(key.WithKeys("down", "j"), key.WithHelp("↓/j", "scroll: down a line")),
			PageUp:   key.NewBinding(key.WithKeys("pgup"), key.WithHelp("pgup", "page: up")),
			PageDown: key.NewBinding(key.WithKeys("pgdown", " "), key.WithHelp("pgdn", "page: down")),
			Top:      key.NewBinding(key.WithKeys("home", "g"), key.WithHelp("home", "top: first line")),
			Bottom:   key.NewBinding(key.WithKeys("end", "G"), key.WithHelp("end", "bottom: last line")),
		},
		Process: ProcessKeys{
			PrevKind: key.NewBinding(key.WithKeys("left", "["), key.WithHelp("←/[", "process: previous one in the row at the top")),
			NextKind: key.NewBinding(key.WithKeys("right", "]"), key.WithHelp("→/]", "process: next one in the row at the top")),
			Up:       key.NewBinding(key.WithKeys("up", "k"), key.WithHelp("↑/k", "up: previous field")),
			Down:     key.NewBinding(key.WithKeys("down", "j"), key.WithHelp("↓/j", "down: next field")),
			Edit:     key.NewBinding(key.WithKeys("enter", "e"), key.WithHelp("enter/e", "edit: type the field, or switch its choice")),
			Plot:     key.NewBinding(key.WithKeys("p"), key.WithHelp("p", "plot: the path, T against P or H against T")),
		},
		Anatomy: AnatomyKeys{
			PrevSpecies: key.NewBinding(key.WithKeys("left", "["), key.WithHelp("←/[", "species: previous one")),
			NextSpecies: key.NewBinding(key.WithKeys("right", "]"), key.WithHelp("→/]", "species: next one")),
		},
	}
	n := min(paneCount(), 9)
	k.JumpHelp = key.NewBinding(key.WithHelp(fmt.Sprintf("1-%d", n), "go to a pane by its number"))
	for i := range n {
		d := string(rune('1' + i))
		k.Jump = append(k.Jump, key.NewBinding(key.WithKeys(d), key.WithHelp(d, "go to "+paneSpecs[i].name)))
	}
	return k
}

// globalHelp lists the keys that work in every pane, for the help overlay.
func (k *KeyMap) globalHelp() []key.Binding {
	return []key.Binding{k.NextPane, k.PrevPane, k.JumpHelp, k.Help, k.Safety, k.SaveBlend, k.OpenBlend, k.Export, k.Back, k.Quit, k.Interrupt}
}

func defaultSweepKeys() SweepKeys {
	return SweepKeys{
		Variable:        key.NewBinding(key.WithKeys("v"), key.WithHelp("v", "variable: sweep T or P")),
		EditRange:       key.NewBinding(key.WithKeys("e", "enter"), key.WithHelp("e/enter", "range: type the range and points")),
		ToggleLog:       key.NewBinding(key.WithKeys("g"), key.WithHelp("g", "linear or log grid (T)")),
		Property:        key.NewBinding(key.WithKeys("p"), key.WithHelp("p", "property: the next one")),
		PrevProperty:    key.NewBinding(key.WithKeys("P"), key.WithHelp("P", "previous property")),
		NextSpecies:     key.NewBinding(key.WithKeys("s"), key.WithHelp("s", "next species (or blend)")),
		PrevSpecies:     key.NewBinding(key.WithKeys("S"), key.WithHelp("S", "previous species")),
		Overlay:         key.NewBinding(key.WithKeys("o"), key.WithHelp("o", "overlay: every species with the blend")),
		CursorLeft:      key.NewBinding(key.WithKeys("left", "h"), key.WithHelp("←/h", "cursor left one column")),
		CursorRight:     key.NewBinding(key.WithKeys("right", "l"), key.WithHelp("→/l", "cursor right one column")),
		CursorStepLeft:  key.NewBinding(key.WithKeys(",", "shift+left"), key.WithHelp(",", "cursor back one grid point")),
		CursorStepRight: key.NewBinding(key.WithKeys(".", "shift+right"), key.WithHelp(".", "cursor on one grid point")),
		CursorHome:      key.NewBinding(key.WithKeys("home"), key.WithHelp("home", "cursor to the left end")),
		CursorEnd:       key.NewBinding(key.WithKeys("end"), key.WithHelp("end", "cursor to the right end")),
		NextField:       key.NewBinding(key.WithKeys("tab", "down"), key.WithHelp("tab/↓", "next field (while typing)")),
		PrevField:       key.NewBinding(key.WithKeys("shift+tab", "up"), key.WithHelp("shift+tab/↑", "previous field (while typing)")),
		Apply:           key.NewBinding(key.WithKeys("enter"), key.WithHelp("enter", "apply the range (while typing)")),
	}
}
