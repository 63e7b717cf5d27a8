package ui

import (
	"github.com/charmbracelet/bubbles/key"

	"zmix/mixtures"
	"zmix/model"
)

// Common is shared by every pane: the size it may draw in, the styles,
// the key map and the session-wide settings. There are no globals.
type Common struct {
	Width, Height int
	Styles        *Styles
	Keys          *KeyMap
	ASCII         bool
	Catalogue     *model.Catalogue

	// missingGlyph, when set (by tests), hears of every non-ASCII glyph
	// that ASCII mode could only write as "?".
	missingGlyph func(rune)
}

// Inputs is the last valid computation input: what every result pane
// computes from. Gen grows by one whenever any part of it changes, so
// panes recompute only on change and drop results of older generations.
type Inputs struct {
	Mixture *mixtures.Mixture
	TempK   float64
	PresPa  float64
	Gauge   bool // the pressure was entered as gauge
	Opts    mixtures.Options
	Gen     uint64
}

// Valid reports whether the inputs can be computed.
func (in Inputs) Valid() bool { return in.Mixture != nil && in.TempK > 0 && in.PresPa > 0 }

// SweepSettings are the sweep pane's settings, saved with the workbench
// state. Ranges keep the text the user typed, with units.
type SweepSettings struct {
	Var      mixtures.SweepVar `json:"var"`      // saved as "T" or "P"
	From     string            `json:"from"`     // e.g. "200 K"
	To       string            `json:"to"`       // e.g. "1500 K"
	Steps    int               `json:"steps"`    // points, end points included
	Log      bool              `json:"log"`      // log grid (P sweeps are always log)
	Property string            `json:"property"` // "S", "Cp", "mu", "H", "G" or "gamma"
	Species  string            `json:"species"`  // formula for per-species μ; "" for the blend
	Overlay  bool              `json:"overlay"`  // overlay per-species curves
}

// DefaultSweepSettings is the sweep a new workbench starts with.
func DefaultSweepSettings() SweepSettings {
	return SweepSettings{Var: mixtures.SweepTemperature, From: "200 K", To: "1500 K", Steps: 200, Property: "Cp"}
}

// SweepKeys are the sweep pane's bindings; they live in KeyMap.Sweep.
type SweepKeys struct {
	Variable    key.Binding // toggle T / P
	EditRange   key.Binding // edit from/to/steps
	ToggleLog   key.Binding
	Property    key.Binding // cycle the plotted property
	NextSpecies key.Binding
	Overlay     key.Binding
	CursorLeft  key.Binding
	CursorRight key.Binding
	CursorHome  key.Binding
	CursorEnd   key.Binding

	PrevProperty    key.Binding
	PrevSpecies     key.Binding
	CursorStepLeft  key.Binding // one grid point, however dense the grid
	CursorStepRight key.Binding
	// While the range is typed in.
	NextField key.Binding
	PrevField key.Binding
	Apply     key.Binding
}
