package ui

import (
	"errors"
	"fmt"
	"os"
	"os/signal"
	"runtime/debug"
	"syscall"
	"time"

	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/lipgloss"
	"github.com/muesli/termenv"

	"zmix/model"
)

// Config is what the commands (package ui/cli) hand the workbench.
type Config struct {
	Catalogue *model.Catalogue
	BlendFile string // open this blend file instead of the saved state
	ASCII     bool   // no braille, box-drawing or other non-ASCII glyphs
	NoColor   bool   // monochrome
	StateDir  string // where the autosaved state lives; "" means $XDG_STATE_HOME/zmix
}

// Run opens the workbench and blocks until the user quits.
func Run(cfg Config) error {
	// Signals are caught before any work that can take time, so that
	// SIGTERM or a dropped SSH link (SIGHUP) during the start still ends
	// in a save: Bubble Tea's own handler would end the program on SIGTERM
	// without it, and it does not watch SIGHUP.
	sigs := make(chan os.Signal, 1)
	signal.Notify(sigs, syscall.SIGHUP, syscall.SIGTERM, syscall.SIGINT)
	defer signal.Stop(sigs)

	dir := cfg.StateDir
	if dir == "" {
		var err error
		if dir, err = DefaultStateDir(); err != nil {
			return err
		}
	}
	mono := cfg.NoColor || os.Getenv("NO_COLOR") != ""
	if mono {
		lipgloss.SetColorProfile(termenv.Ascii)
	}
	cwd, _ := os.Getwd()

	store, notice, err := claimStateStore(dir)
	if err != nil {
		return err
	}
	defer store.release()
	dataDir, _ := DefaultDataDir() // without one, proposals start where zmix was started
	r, err := newRoot(cfg, rootOptions{store: store, now: time.Now, cwd: cwd, dataDir: dataDir, signals: sigs, mono: mono, notice: notice})
	if err != nil {
		return err
	}
	g := newGuard(r, dir, time.Now)
	p := tea.NewProgram(g, tea.WithAltScreen(), tea.WithoutSignalHandler(), tea.WithOutput(terminalOutput()))
	g.kill = p.Kill
	_, runErr := p.Run()

	if g.crashed {
		return g.exitError()
	}
	// Whatever ended the program, the last state goes to disk before exit.
	saveErr := func() (err error) {
		defer func() {
			if v := recover(); v != nil {
				err = fmt.Errorf("%v", v)
			}
		}()
		return r.finalSave()
	}()
	switch {
	case errors.Is(runErr, tea.ErrProgramPanic):
		// A panic our guard did not see; Bubble Tea printed its stack.
		report := writeCrashReport(dir, time.Now(), runErr, debug.Stack(), saveErr)
		return fmt.Errorf("ui: internal error (%v); crash report: %s", runErr, report)
	case runErr != nil && !errors.Is(runErr, tea.ErrProgramKilled):
		return fmt.Errorf("ui: %w", runErr)
	}
	if saveErr != nil {
		return fmt.Errorf("ui: could not save the workbench state to %s: %v", store.path, saveErr)
	}
	return nil
}
