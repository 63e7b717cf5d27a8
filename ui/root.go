package ui

import (
	"errors"
	"os"
	"path/filepath"
	"time"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures"
	"zmix/model"
)

// The root model is split by concern: this file routes messages and keys
// and keeps the layout; prompts.go has the prompts and the files they
// read and write, autosave.go the saved state, overlay.go the help and
// safety overlays, and view.go draws the screen.

// root is the workbench: it owns the document and the panes, routes keys
// to the focused pane, and handles what belongs to no pane: focus, layout,
// overlays, prompts, files and the autosave.
type root struct {
	c     *Common
	b     *bench
	panes []pane // by paneID, in Tab order

	width, height int
	lay           layout
	statusRows    int // the status line wraps a long message onto a second row
	safety        []string
	sizes         []box // by paneID: the size each pane was last given
	focus, viewer paneID

	overlay       overlayKind
	overlayScroll scroller

	prompt      promptKind
	input       field
	pending     string                // a path waiting for the overwrite answer
	pendingKind promptKind            // what the path is for
	exportSrc   sweepSource           // the pane whose sweep the export prompt writes; nil: the readout
	lastTyped   map[promptKind]string // what a failed prompt held, to offer again

	status    string
	statusErr bool

	blendPath   string // the blend file last opened or saved explicitly
	unsaved     bool   // the recipe changed since then
	contentSeen uint64

	store       *stateStore
	saveSeq     uint64
	lastSaved   []byte
	saving      bool
	savePending bool
	dirty       bool     // the saved state may differ from lastSaved
	dirtyKey    stateKey // the root's own saved fields when last compared
	snapshots   int      // snapshots taken, for tests of the autosave's cost

	signals  <-chan os.Signal
	now      func() time.Time
	cwd      string
	quitting bool
}

// rootOptions are what newRoot takes from its surroundings, so that tests
// can fix them.
type rootOptions struct {
	store   *stateStore
	now     func() time.Time
	cwd     string
	signals <-chan os.Signal
	mono    bool
}

func newRoot(cfg Config, opt rootOptions) (*root, error) {
	cat := cfg.Catalogue
	if cat == nil {
		cat = model.Builtin()
	}
	if opt.now == nil {
		opt.now = time.Now
	}
	c := &Common{Styles: DefaultStyles(opt.mono, cfg.ASCII), Keys: DefaultKeyMap(), ASCII: cfg.ASCII, Catalogue: cat}
	b := newBench(cat)
	r := &root{c: c, b: b, store: opt.store, now: opt.now, cwd: opt.cwd, signals: opt.signals,
		input: newField(c), viewer: paneID(-1), lastTyped: map[promptKind]string{},
		dirty: true} // the first message writes the state, in the current format

	var saved *savedState
	if opt.store != nil {
		st, msg, err := opt.store.load(opt.now())
		switch {
		case err == nil:
			saved = st
		case !errors.Is(err, errNoState):
			r.setError(msg)
		}
	}
	if saved != nil {
		if id, ok := paneByKey(saved.Pane); ok {
			r.focus = id
		}
	}
	switch {
	case cfg.BlendFile != "":
		f, err := mixtures.LoadBlendFile(cfg.BlendFile)
		if err != nil {
			return nil, err
		}
		b.loadFile(f)
		b.viewFromFile(f)
		if saved != nil && saved.PressureView != "" {
			b.showGauge = saved.PressureView == "gauge" // the user's setting
		}
		r.blendPath = r.absPath(cfg.BlendFile)
		r.setStatus("opened " + r.shortPath(r.blendPath))
		if saved != nil && saved.Unsaved {
			// The workbench held changes nobody saved; keep them on disk.
			if aside, err := opt.store.setAside(opt.now()); err == nil {
				r.setStatus("opened " + filepath.Base(r.blendPath) + "; the earlier unsaved workbench is kept as " + aside)
			}
		}
	case saved != nil:
		r.restore(saved)
	default:
		demo := mixtures.DemoFile()
		b.loadFile(demo)
		b.viewFromFile(demo)
		if r.status == "" {
			r.setStatus("demo blend (invented scenario); " + c.Keys.OpenBlend.Help().Key + " opens a file")
		}
	}
	b.update()
	r.contentSeen = b.content

	for _, s := range paneSpecs {
		r.panes = append(r.panes, s.newPane(c, b))
	}
	r.sizes = make([]box, len(r.panes))
	if saved != nil {
		for _, p := range r.panes {
			if sp, ok := p.(statePane); ok {
				sp.restoreState(saved)
			}
		}
	}
	for id := range r.panes {
		if paneID(id).isViewer() && r.viewer < 0 {
			r.viewer = paneID(id)
		}
	}
	if r.focus.isViewer() {
		r.viewer = r.focus
	}
	return r, nil
}

// Init brings every pane up to date, which starts the first sweep, and
// waits for signals.
func (r *root) Init() tea.Cmd {
	return tea.Batch(r.syncPanes(), waitForSignal(r.signals))
}

func (r *root) Update(msg tea.Msg) tea.Cmd {
	var cmds []tea.Cmd
	switch msg := msg.(type) {
	case tea.WindowSizeMsg:
		r.width, r.height = max(msg.Width, 0), max(msg.Height, 0)
		r.c.Width, r.c.Height = r.width, r.height
		r.relayout()
		cmds = append(cmds, r.broadcast(msg))
	case signalMsg:
		// The terminal may be gone (SIGHUP): save, then leave at once.
		r.finalSave()
		r.quitting = true
		return tea.Quit
	case saveDoneMsg:
		cmds = append(cmds, r.saveDone(msg))
	case tea.KeyMsg:
		if msg.Type == tea.KeyRunes && !msg.Paste && len(msg.Runes) > 1 {
			// Keys typed fast, or sent in one packet over a slow SSH
			// link, arrive as one message; here each is a key of its own.
			for _, ru := range msg.Runes {
				cmds = append(cmds, r.Update(tea.KeyMsg{Type: tea.KeyRunes, Runes: []rune{ru}, Alt: msg.Alt}))
				if r.quitting {
					break
				}
			}
			return tea.Batch(cmds...)
		}
		cmds = append(cmds, r.key(msg))
	default:
		cmds = append(cmds, r.broadcast(msg))
	}
	if r.quitting {
		return tea.Batch(append(cmds, tea.Quit)...)
	}
	cmds = append(cmds, r.afterChange())
	return tea.Batch(cmds...)
}

// broadcast hands a message that is not a key to every pane: results go
// back to the pane that asked for them, which alone knows them.
func (r *root) broadcast(msg tea.Msg) tea.Cmd {
	var cmds []tea.Cmd
	for _, p := range r.panes {
		cmds = append(cmds, p.Update(msg))
	}
	return tea.Batch(cmds...)
}

// afterChange brings everything derived up to date after a message, and
// autosaves if anything the state holds changed.
func (r *root) afterChange() tea.Cmd {
	var cmd tea.Cmd
	if r.b.changed {
		r.dirty = true
		r.b.update()
		cmd = r.syncPanes()
		r.relayout()
	}
	if r.b.content != r.contentSeen {
		r.contentSeen = r.b.content
		r.unsaved = true
	}
	if r.wantStatusRows() != r.statusRows {
		r.relayout()
	}
	return tea.Batch(cmd, r.autosave())
}

// syncPanes tells every pane that the document changed.
func (r *root) syncPanes() tea.Cmd {
	var cmds []tea.Cmd
	for _, p := range r.panes {
		cmds = append(cmds, p.Sync())
	}
	return tea.Batch(cmds...)
}

// relayout places the panes for the current size and caution strip, and
// tells each pane its size when it changed.
func (r *root) relayout() {
	r.safety = safetyLines(r.c, r.b.cautions, r.b.notes, r.width)
	r.statusRows = r.wantStatusRows()
	bodyH := r.height - 1 - r.statusRows - len(r.safety)
	r.lay = computeLayout(r.width, r.height, bodyH, r.focus, r.viewer, r.panes)
	if r.lay.kind == layoutTooSmall {
		return
	}
	for id, p := range r.panes {
		bx := r.lay.boxes[id]
		if bx == r.sizes[id] {
			continue
		}
		r.sizes[id] = bx
		p.SetSize(bx.inner())
	}
	r.input.setWidth(r.width / 2)
	if r.overlay != overlayNone {
		r.buildOverlay()
	}
}

func (r *root) setFocus(id paneID) {
	n := paneID(len(r.panes))
	r.focus = (id + n) % n
	if r.focus.isViewer() {
		r.viewer = r.focus
	}
	r.relayout()
}

// wantStatusRows is 2 when the message does not fit on one row.
func (r *root) wantStatusRows() int {
	if r.status != "" && r.prompt == promptNone && lipgloss.Width(r.c.Text(r.status))+2 > r.width {
		return 2
	}
	return 1
}

func (r *root) setStatus(s string) { r.status, r.statusErr = s, false }
func (r *root) setError(s string)  { r.status, r.statusErr = s, true }

// focused is the pane that has the keys.
func (r *root) focused() pane { return r.panes[r.focus] }

func (r *root) key(msg tea.KeyMsg) tea.Cmd {
	k := r.c.Keys
	if r.prompt != promptNone {
		return r.promptKey(msg)
	}
	if key.Matches(msg, k.Interrupt) {
		return r.requestQuit()
	}
	if r.overlay != overlayNone {
		r.overlayKey(msg)
		return nil
	}
	if r.focused().Editing() {
		return r.focused().Update(msg)
	}
	switch {
	case key.Matches(msg, k.Quit):
		return r.requestQuit()
	case key.Matches(msg, k.Help):
		r.openOverlay(overlayHelp)
	case key.Matches(msg, k.Safety):
		r.openOverlay(overlaySafety)
	case key.Matches(msg, k.NextPane):
		r.setFocus(r.focus + 1)
	case key.Matches(msg, k.PrevPane):
		r.setFocus(r.focus - 1)
	case key.Matches(msg, k.SaveBlend):
		r.openPrompt(promptSave)
	case key.Matches(msg, k.OpenBlend):
		if r.unsaved && r.blendPath != "" {
			r.prompt = promptReplace
		} else {
			r.openPrompt(promptOpen)
		}
	case key.Matches(msg, k.Export):
		r.openPrompt(promptExport)
	case key.Matches(msg, k.Back):
		r.status = ""
		return r.focused().Update(msg)
	default:
		for i, j := range k.Jump {
			if key.Matches(msg, j) {
				r.setFocus(paneID(i))
				return nil
			}
		}
		r.status = ""
		return r.focused().Update(msg)
	}
	return nil
}

// requestQuit quits, or asks first when a blend file has unsaved changes.
// The autosave keeps the work either way; the question is about the file.
func (r *root) requestQuit() tea.Cmd {
	if r.prompt != promptQuit && r.unsaved && r.blendPath != "" {
		r.prompt = promptQuit
		return nil
	}
	r.finalSave()
	r.quitting = true
	return tea.Quit
}
