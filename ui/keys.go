package ui

import "github.com/charmbracelet/bubbles/key"

// KeyMap is every key binding of the workbench, with its help text.
type KeyMap struct {
	Help     key.Binding
	NextPane key.Binding
	PrevPane key.Binding
	Back     key.Binding
	Quit     key.Binding
	Sweep    SweepKeys
}

// DefaultKeyMap returns the workbench's bindings.
func DefaultKeyMap() *KeyMap {
	return &KeyMap{
		Help:     key.NewBinding(key.WithKeys("?"), key.WithHelp("?", "keys for this pane")),
		NextPane: key.NewBinding(key.WithKeys("tab"), key.WithHelp("tab", "next pane")),
		PrevPane: key.NewBinding(key.WithKeys("shift+tab"), key.WithHelp("shift+tab", "previous pane")),
		Back:     key.NewBinding(key.WithKeys("esc"), key.WithHelp("esc", "back out")),
		Quit:     key.NewBinding(key.WithKeys("q", "ctrl+c"), key.WithHelp("q", "quit")),
		Sweep:    defaultSweepKeys(),
	}
}

func defaultSweepKeys() SweepKeys {
	return SweepKeys{
		Variable:    key.NewBinding(key.WithKeys("v"), key.WithHelp("v", "sweep T or P")),
		EditRange:   key.NewBinding(key.WithKeys("e", "enter"), key.WithHelp("e", "edit range and points")),
		ToggleLog:   key.NewBinding(key.WithKeys("l"), key.WithHelp("l", "linear/log grid")),
		Property:    key.NewBinding(key.WithKeys("p"), key.WithHelp("p", "next property")),
		NextSpecies: key.NewBinding(key.WithKeys("s"), key.WithHelp("s", "next species")),
		Overlay:     key.NewBinding(key.WithKeys("o"), key.WithHelp("o", "overlay species")),
		CursorLeft:  key.NewBinding(key.WithKeys("left", "h"), key.WithHelp("←/h", "cursor left")),
		CursorRight: key.NewBinding(key.WithKeys("right"), key.WithHelp("→", "cursor right")),
		CursorHome:  key.NewBinding(key.WithKeys("home"), key.WithHelp("home", "first point")),
		CursorEnd:   key.NewBinding(key.WithKeys("end"), key.WithHelp("end", "last point")),
	}
}
