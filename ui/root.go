package ui

import (
	"errors"
	"os"
	"path/filepath"
	"strings"
	"time"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures"
	"zmix/mixtures/report"
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
	shared        paneID // the shared pane in view in the full layout, or -1

	overlay       overlayKind
	overlayScroll scroller

	prompt      promptKind
	input       field
	pending     string                // a path waiting for the overwrite answer
	pendingKind promptKind            // what the path is for
	exportSrc   sweepSource           // the pane whose sweep the export prompt writes; nil: the readout
	exportProc  processSource         // the pane whose process result the export prompt writes
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
	dataDir  string // where saves and exports are proposed at first
	lastDir  string // the folder of the file last saved, opened or exported
	quitting bool
}

// rootOptions are what newRoot takes from its surroundings, so that tests
// can fix them.
type rootOptions struct {
	store   *stateStore
	now     func() time.Time
	cwd     string
	dataDir string
	signals <-chan os.Signal
	mono    bool
	notice  string // for the status line: which state file this workbench uses
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
	r := &root{c: c, b: b, store: opt.store, now: opt.now, cwd: opt.cwd, dataDir: opt.dataDir, signals: opt.signals,
		input: newFieldLimit(c, maxPathRunes), viewer: paneID(-1), shared: paneID(-1), lastTyped: map[promptKind]string{},
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
	if opt.notice != "" {
		if r.status != "" {
			opt.notice += "; " + r.status
		}
		r.status = model.Printable(opt.notice) // keeps statusErr
	}
	b.update()
	r.contentSeen = b.content

	for _, s := range paneSpecs {
		r.panes = append(r.panes, s.newPane(c, b))
	}
	r.sizes = make([]box, len(r.panes))
	for _, p := range r.panes {
		if lp, ok := p.(lazyPane); ok {
			lp.setShown(false) // until the first layout says otherwise
		}
	}
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
	r.shared = nextShared(r.shared, r.focus)
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
	case noticeMsg:
		r.setError(msg.text)
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
	return tea.Batch(cmd, r.showPanes(), r.autosave())
}

// showPanes tells each lazy pane whether it is on screen (or about to be
// exported from), so that a sweep runs only when someone looks at it.
func (r *root) showPanes() tea.Cmd {
	var cmds []tea.Cmd
	for id, p := range r.panes {
		if lp, ok := p.(lazyPane); ok {
			shown := id < len(r.lay.visible) && r.lay.visible[id] && r.lay.kind != layoutTooSmall
			cmds = append(cmds, lp.setShown(shown || paneID(id) == r.focus))
		}
	}
	return tea.Batch(cmds...)
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
	r.lay = computeLayout(r.width, r.height, bodyH, r.focus, r.viewer, r.shared, r.panes)
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
	r.shared = nextShared(r.shared, r.focus)
	r.relayout()
}

// maxBottomRows bounds the rows a long message or question may take.
const maxBottomRows = 3

// wantStatusRows is the rows the bottom line needs: more than one when a
// message or question does not fit on one row and is wrapped.
func (r *root) wantStatusRows() int { return max(1, len(r.bottomWrapped())) }

// bottomWrapped is the status message, or a question to answer, wrapped
// between words into at most maxBottomRows rows, when it does not fit on
// one row (a message beside the key reminder); nil when it does. Past the
// last row the text is shortened with an ellipsis, never cut mid-word.
func (r *root) bottomWrapped() []string {
	var text string
	switch r.prompt {
	case promptNone:
		if r.status == "" {
			return nil
		}
		text = r.c.Text(r.status)
		if 1+lipgloss.Width(text)+lipgloss.Width(r.keysReminder()) <= r.width {
			return nil
		}
	case promptQuit, promptReplace, promptOverwrite:
		text = r.c.Text(model.Printable(r.question()))
		if 1+lipgloss.Width(text) <= r.width {
			return nil
		}
	default:
		return nil
	}
	w := max(r.width-1, 1)
	lines := report.Wrap(text, w)
	for len(lines) > maxBottomRows || longestWord(text) > w {
		// A long path is what usually overflows, or would be broken across
		// rows: shorten it in the middle, keeping its start and its file
		// name, before anything else.
		shorter := shortenLongestWord(text)
		if shorter == text {
			break
		}
		text = shorter
		lines = report.Wrap(text, w)
	}
	if len(lines) > maxBottomRows {
		rest := strings.Join(lines[maxBottomRows-1:], " ")
		lines = append(lines[:maxBottomRows-1], r.c.shorten(rest, w))
	}
	return lines
}

// shortenLongestWord shortens the longest word of s over 40 cells (a path)
// to its first 12 and last 24 runes around an ellipsis, and returns s
// unchanged when no word is that long.
func shortenLongestWord(s string) string {
	words := strings.Fields(s)
	best := -1
	for i, w := range words {
		if n := len([]rune(w)); n > 40 && (best < 0 || n > len([]rune(words[best]))) {
			best = i
		}
	}
	if best < 0 {
		return s
	}
	rs := []rune(words[best])
	return strings.Replace(s, words[best], string(rs[:12])+"…"+string(rs[len(rs)-24:]), 1)
}

// longestWord is the width of the longest word of s.
func longestWord(s string) int {
	n := 0
	for _, w := range strings.Fields(s) {
		n = max(n, lipgloss.Width(w))
	}
	return n
}

// keysReminder is the right end of the status line.
func (r *root) keysReminder() string { return r.c.Text(" ? keys · tab pane · q quit ") }

// setStatus and setError put a message on the status line. Messages name
// paths and values from files and the user: they are made printable here,
// once for all of them.
func (r *root) setStatus(s string) { r.status, r.statusErr = model.Printable(s), false }
func (r *root) setError(s string)  { r.status, r.statusErr = model.Printable(s), true }

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
