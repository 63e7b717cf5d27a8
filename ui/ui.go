package ui

import (
	"errors"

	"zmix/model"
)

// Config is what main.go hands the workbench.
type Config struct {
	Catalogue *model.Catalogue
	BlendFile string // open this blend file instead of the saved state
	ASCII     bool   // no braille, box-drawing or other non-ASCII glyphs
	NoColor   bool   // monochrome
	StateDir  string // where the autosaved state lives; "" means $XDG_STATE_HOME/zmix
}

// Run opens the workbench and blocks until the user quits.
func Run(cfg Config) error {
	return errors.New("ui: the workbench is not built yet")
}
