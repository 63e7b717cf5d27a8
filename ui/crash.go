package ui

import (
	"fmt"
	"os"
	"path/filepath"
	"runtime/debug"
	"strings"
	"time"

	tea "github.com/charmbracelet/bubbletea"
)

// guard is the tea.Model the program runs. It wraps the workbench so that a
// panic anywhere in Update, View or a command saves the state, writes a
// crash report and ends the program normally, which restores the
// terminal. Bubble Tea's own panic catching stays on as a last resort.
type guard struct {
	r    *root
	dir  string           // where crash reports go
	now  func() time.Time // for the report's name
	kill func()           // ends the program from inside View

	crashed bool
	report  string // the crash report's path, "" if it could not be written
	saveErr error
	value   any
}

// cmdPanicMsg carries a panic out of a command into Update.
type cmdPanicMsg struct {
	value any
	stack []byte
}

func newGuard(r *root, dir string, now func() time.Time) *guard {
	return &guard{r: r, dir: dir, now: now}
}

func (g *guard) Init() tea.Cmd { return g.wrap(g.r.Init()) }

func (g *guard) Update(msg tea.Msg) (model tea.Model, cmd tea.Cmd) {
	if g.crashed {
		return g, tea.Quit
	}
	if p, ok := msg.(cmdPanicMsg); ok {
		g.crash(p.value, p.stack)
		return g, tea.Quit
	}
	defer func() {
		if v := recover(); v != nil {
			g.crash(v, debug.Stack())
			model, cmd = g, tea.Quit
		}
	}()
	return g, g.wrap(g.r.Update(msg))
}

func (g *guard) View() (view string) {
	if g.crashed {
		return g.crashText()
	}
	defer func() {
		if v := recover(); v != nil {
			g.crash(v, debug.Stack())
			if g.kill != nil {
				g.kill() // View cannot return a command; this ends the program
			}
			view = g.crashText()
		}
	}()
	return g.r.View()
}

// wrap runs cmd with a recover that turns a panic into a message, and does
// the same for each command of a batch.
func (g *guard) wrap(cmd tea.Cmd) tea.Cmd {
	if cmd == nil {
		return nil
	}
	return func() (msg tea.Msg) {
		defer func() {
			if v := recover(); v != nil {
				msg = cmdPanicMsg{v, debug.Stack()}
			}
		}()
		msg = cmd()
		if batch, ok := msg.(tea.BatchMsg); ok {
			for i := range batch {
				batch[i] = g.wrap(batch[i])
			}
			return batch
		}
		return msg
	}
}

// crash saves the state (if the model still allows it) and writes the
// report. It never panics itself.
func (g *guard) crash(v any, stack []byte) {
	if g.crashed {
		return
	}
	g.crashed, g.value = true, v
	func() {
		defer func() {
			if e := recover(); e != nil {
				g.saveErr = fmt.Errorf("saving the state failed too: %v", e)
			}
		}()
		g.saveErr = g.r.finalSave()
	}()
	g.report = writeCrashReport(g.dir, g.now(), v, stack, g.saveErr)
}

func (g *guard) crashText() string {
	return "zmix stopped on an internal error; see the crash report."
}

// exitError is what Run returns after a crash: one line with the paths.
func (g *guard) exitError() error {
	state := "the workbench state was saved"
	if g.saveErr != nil {
		state = "the state could not be saved (" + g.saveErr.Error() + "); the last autosave is kept"
	}
	if g.r.store != nil && g.saveErr == nil {
		state += " to " + g.r.store.path
	}
	report := "no crash report could be written"
	if g.report != "" {
		report = "crash report: " + g.report
	}
	return fmt.Errorf("ui: internal error (%v); %s; %s", g.value, state, report)
}

// writeCrashReport writes what a maintainer needs to find the fault, and
// returns the file's path, or "" if no file could be written.
func writeCrashReport(dir string, now time.Time, v any, stack []byte, saveErr error) string {
	var sb strings.Builder
	fmt.Fprintf(&sb, "zmix crash report\n\ntime: %s\npanic: %v\n", now.Format(time.RFC3339), v)
	if saveErr != nil {
		fmt.Fprintf(&sb, "state save: %v\n", saveErr)
	} else {
		sb.WriteString("state save: ok\n")
	}
	if bi, ok := debug.ReadBuildInfo(); ok {
		fmt.Fprintf(&sb, "build: %s %s\n", bi.Main.Path, bi.GoVersion)
		for _, s := range bi.Settings {
			if s.Key == "vcs.revision" || s.Key == "vcs.modified" {
				fmt.Fprintf(&sb, "%s: %s\n", s.Key, s.Value)
			}
		}
	}
	fmt.Fprintf(&sb, "\nstack:\n%s", stack)
	for _, d := range []string{dir, os.TempDir()} {
		if d == "" || os.MkdirAll(d, 0o700) != nil {
			continue
		}
		path := filepath.Join(d, "crash-"+now.Format("20060102-150405")+".txt")
		if os.WriteFile(path, []byte(sb.String()), 0o600) == nil {
			return path
		}
	}
	return ""
}
