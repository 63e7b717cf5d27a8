package ui

import (
	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"

	"zmix/mixtures"
	"zmix/mixtures/report"
)

// pane is what the root asks of every pane. The root holds the panes in
// one list, in Tab order, and knows them only through this interface; the
// registrations below are the one place that names their types.
type pane interface {
	// SetSize gives the cells inside the pane's frame.
	SetSize(w, h int)
	// Update takes a key while the pane has focus, and every message
	// that is not a key (command results, sizes), focused or not.
	Update(msg tea.Msg) tea.Cmd
	// View joins lines prepared in Update, Sync or SetSize.
	View() string
	// KeyHelp lists every binding of the pane's current mode, for the
	// help overlay; ShortHelp the few the status line names.
	KeyHelp() []key.Binding
	ShortHelp() []key.Binding
	// Title is the text in the pane's frame, after its number.
	Title() string
	// Editing reports whether the pane takes typed text, so that letters
	// go to it rather than to the global keys.
	Editing() bool
	// Sync brings the pane up to date after the document changed; the
	// command it returns runs work the change needs (a sweep).
	Sync() tea.Cmd
	// More reports text hidden above and below, marked on the frame.
	More() (above, below bool)
}

// Optional abilities a pane may have; the root looks for them by interface,
// never by type.
type (
	// statePane keeps settings of its own in the saved state.
	statePane interface {
		saveState(st *savedState)
		restoreState(st *savedState)
		// stateChanged reports whether what saveState writes may have
		// changed since the last call; it must be cheap.
		stateChanged() bool
	}
	// headlinePane gives the key figures in one line of w cells, shown
	// under the input panes when no result pane is on screen.
	headlinePane interface{ headline(w int) string }
	// sweepSource has a sweep to export instead of the readout.
	sweepSource interface {
		Result() *mixtures.SweepTable
		ResultSource() *report.SweepSource
	}
	// processSource has a process result to export instead of the
	// readout; nil when it has none.
	processSource interface{ processReport() *report.ProcessReport }
	// lazyPane does costly work (a sweep) only while it is on screen:
	// the root tells it, after every message, whether it is shown, and
	// runs the command it returns.
	lazyPane interface{ setShown(shown bool) tea.Cmd }
	// heightPane asks for a height of its own in a column of the full
	// layout, out of avail rows; the last pane of a column takes the rest.
	heightPane interface{ wantHeight(avail int) int }
)

// paneRole says where a pane goes in the layouts.
type paneRole int

const (
	// roleInput panes edit the document; they stay on screen together in
	// every layout that has room, in the left column.
	roleInput paneRole = iota
	// roleResult panes show results; narrow layouts show one at a time.
	roleResult
	// roleResultLeft is a result pane that the full layout puts under the
	// inputs, in the left column.
	roleResultLeft
	// roleResultShared is a result pane that the full layout shows in
	// place of the right column's last pane, while it is the result pane
	// last focused; elsewhere it is a result pane like the others.
	roleResultShared
)

// paneSpec registers a pane. Its place in paneSpecs is its place in the
// Tab order and its number key.
type paneSpec struct {
	key     string // its name in the saved state
	name    string // its name on the tab bar
	role    paneRole
	fixedH  int // a fixed outer height in stacked layouts; 0 means flexible
	newPane func(c *Common, b *bench) pane
}

// paneSpecs are the workbench's panes. Adding a pane is a file with its
// type and one line here.
var paneSpecs = []paneSpec{
	{key: "recipe", name: "Recipe", role: roleInput, newPane: func(c *Common, b *bench) pane { return newRecipePane(c, b) }},
	{key: "setpoint", name: "Setpoint", role: roleInput, fixedH: 8, newPane: func(c *Common, b *bench) pane { return newSetpointPane(c, b) }},
	{key: "properties", name: "Properties", role: roleResult, newPane: func(c *Common, b *bench) pane { return newPropertiesPane(c, b) }},
	{key: "sweep", name: "Sweep", role: roleResult, newPane: func(c *Common, b *bench) pane { return newBenchSweepPane(c, b) }},
	{key: "anatomy", name: "Anatomy", role: roleResultLeft, newPane: func(c *Common, b *bench) pane { return newAnatomyPane(c, b) }},
	{key: "process", name: "Process", role: roleResultShared, newPane: func(c *Common, b *bench) pane { return newProcessPane(c, b) }},
}

// paneID is a pane's index in paneSpecs and in the root's list.
type paneID int

func paneCount() int { return len(paneSpecs) }

func (id paneID) spec() *paneSpec { return &paneSpecs[id] }

// name is the pane's name on the tab bar.
func (id paneID) name() string { return paneSpecs[id].name }

// isViewer reports whether a pane shows results rather than inputs.
func (id paneID) isViewer() bool { return paneSpecs[id].role != roleInput }

func paneByKey(s string) (paneID, bool) {
	for i := range paneSpecs {
		if paneSpecs[i].key == s {
			return paneID(i), true
		}
	}
	return 0, false
}
