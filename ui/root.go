package ui

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"time"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures"
	"zmix/model"
)

type overlayKind int

const (
	overlayNone overlayKind = iota
	overlayHelp
	overlaySafety
)

type promptKind int

const (
	promptNone      promptKind = iota
	promptSave                 // path to save the blend file to
	promptOpen                 // path of a blend file to open
	promptExport               // path to export the readout or sweep to
	promptOverwrite            // the path exists: replace it?
	promptQuit                 // unsaved changes to the blend file: quit?
	promptReplace              // unsaved changes: open another file anyway?
)

// saveDoneMsg reports an autosave write.
type saveDoneMsg struct {
	seq uint64
	err error
}

// signalMsg carries SIGHUP, SIGTERM or SIGINT into the event loop, so that
// the state is saved by the same code as every other change.
type signalMsg struct{ sig os.Signal }

// root is the workbench: it owns the document and the panes, routes keys
// to the focused pane, and handles what belongs to no pane: focus, layout,
// overlays, prompts, files and the autosave.
type root struct {
	c        *Common
	b        *bench
	recipe   *recipePane
	setpoint *setpointPane
	props    *propertiesPane
	sweep    *sweepPane
	anatomy  *anatomyPane

	width, height int
	lay           layout
	statusRows    int // the status line wraps a long message onto a second row
	safety        []string
	sizes         [paneCount]box
	focus, viewer paneID

	overlay       overlayKind
	overlayScroll scroller

	prompt      promptKind
	input       field
	pending     string     // a path waiting for the overwrite answer
	pendingKind promptKind // what the path is for
	exportSweep bool
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
		input: newField(c), viewer: paneProperties, lastTyped: map[promptKind]string{}}

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
	sweepSettings := DefaultSweepSettings()
	anatomySpecies := ""
	if saved != nil {
		if saved.Sweep.Var != "" {
			sweepSettings = saved.Sweep
		}
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
		anatomySpecies = saved.AnatomySpecies
	default:
		demo := mixtures.DemoFile()
		b.loadFile(demo)
		if r.status == "" {
			r.setStatus("demo blend (invented scenario); " + c.Keys.OpenBlend.Help().Key + " opens a file")
		}
	}
	b.update()
	r.contentSeen = b.content

	r.recipe = newRecipePane(c, b)
	r.setpoint = newSetpointPane(c, b)
	r.props = newPropertiesPane(c, b)
	r.sweep = newSweepPane(c, sweepSettings)
	r.anatomy = newAnatomyPane(c, b)
	r.anatomy.formula = anatomySpecies
	if r.focus.isViewer() {
		r.viewer = r.focus
	}
	r.refreshPanes()
	return r, nil
}

func (r *root) restore(st *savedState) {
	b := r.b
	if lv := st.LastValid; lv != nil {
		// Establish the last valid state first; the typed text then
		// replaces it only where it reads.
		b.entries = append(b.entries[:0], lv.Recipe...)
		b.tempText, b.presText = lv.Temperature, lv.Pressure
		std, _ := mixtures.StdPressureFromText(st.StandardPressure)
		b.stdAtm = std == model.StdPressureAtmPa
		b.update()
	}
	b.entries = append(b.entries[:0], st.Recipe...)
	b.name, b.note = st.Name, st.Note
	b.tempText, b.presText = st.Temperature, st.Pressure
	std, _ := mixtures.StdPressureFromText(st.StandardPressure)
	b.stdAtm = std == model.StdPressureAtmPa
	b.showGauge = st.PressureView == "gauge"
	r.blendPath, r.unsaved = st.BlendPath, st.Unsaved
	b.changed = true
}

// snapshot is the state to autosave.
func (r *root) snapshot() savedState {
	b := r.b
	view := "absolute"
	if b.showGauge {
		view = "gauge"
	}
	return savedState{
		Format: stateFormat, Name: b.name, Note: b.note,
		Recipe:      append([]entry{}, b.entries...),
		Temperature: b.tempText, Pressure: b.presText, StandardPressure: b.stdText(), PressureView: view,
		Sweep: r.sweep.Settings(), Pane: paneKeys[r.focus],
		BlendPath: r.blendPath, Unsaved: r.unsaved, AnatomySpecies: r.anatomy.formula,
		LastValid: &validText{Recipe: append([]entry{}, b.validEntries...), Temperature: b.validTemp, Pressure: b.validPres},
	}
}

func (r *root) Init() tea.Cmd {
	return tea.Batch(r.sweep.SetInputs(r.b.in), waitForSignal(r.signals))
}

// waitForSignal turns the next signal into a message. It runs as a command,
// not as a goroutine of ours, so that the program's own machinery owns it.
func waitForSignal(ch <-chan os.Signal) tea.Cmd {
	if ch == nil {
		return nil
	}
	return func() tea.Msg {
		s, ok := <-ch
		if !ok {
			return nil
		}
		return signalMsg{s}
	}
}

func (r *root) Update(msg tea.Msg) tea.Cmd {
	var cmds []tea.Cmd
	switch msg := msg.(type) {
	case tea.WindowSizeMsg:
		r.width, r.height = max(msg.Width, 0), max(msg.Height, 0)
		r.c.Width, r.c.Height = r.width, r.height
		r.relayout()
		cmds = append(cmds, r.sweep.Update(msg))
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
		cmds = append(cmds, r.sweep.Update(msg))
	}
	if r.quitting {
		return tea.Batch(append(cmds, tea.Quit)...)
	}
	cmds = append(cmds, r.afterChange())
	return tea.Batch(cmds...)
}

// afterChange brings everything derived up to date after a message, and
// autosaves if anything the state holds changed.
func (r *root) afterChange() tea.Cmd {
	var cmd tea.Cmd
	if r.b.changed {
		if r.b.update() {
			cmd = r.sweep.SetInputs(r.b.in)
		}
		r.refreshPanes()
		r.relayout()
	}
	if r.b.content != r.contentSeen {
		r.contentSeen = r.b.content
		r.unsaved = true
	}
	if r.wantStatusRows() != r.statusRows {
		r.relayout()
	}
	r.sweep.Changed() // the snapshot below holds the settings themselves
	return tea.Batch(cmd, r.autosave())
}

func (r *root) refreshPanes() {
	r.recipe.refresh()
	r.setpoint.refresh()
	r.props.refresh()
	r.anatomy.refresh()
}

// relayout places the panes for the current size and caution strip, and
// tells each pane its size when it changed.
func (r *root) relayout() {
	r.safety = safetyLines(r.c, r.b.cautions, r.b.notes, r.width)
	r.statusRows = r.wantStatusRows()
	bodyH := r.height - 1 - r.statusRows - len(r.safety)
	nSpecies := 0
	if r.b.in.Mixture != nil {
		nSpecies = len(r.b.in.Mixture.Components) + len(cautionNotes(r.b.notes)) // rows of the readout
	}
	r.lay = computeLayout(r.width, r.height, bodyH, r.focus, r.viewer, len(r.b.entries), nSpecies)
	if r.lay.kind == layoutTooSmall {
		return
	}
	for id := paneID(0); id < paneCount; id++ {
		bx := r.lay.boxes[id]
		if bx == r.sizes[id] {
			continue
		}
		r.sizes[id] = bx
		w, h := bx.inner()
		switch id {
		case paneRecipe:
			r.recipe.SetSize(w, h)
		case paneSetpoint:
			r.setpoint.SetSize(w, h)
		case paneProperties:
			r.props.SetSize(w, h)
		case paneSweep:
			r.sweep.SetSize(w, h)
		case paneAnatomy:
			r.anatomy.SetSize(w, h)
		}
	}
	r.input.setWidth(r.width / 2)
	if r.overlay != overlayNone {
		r.buildOverlay()
	}
}

func (r *root) setFocus(id paneID) {
	r.focus = (id + paneCount) % paneCount
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

// paneEditing reports whether the focused pane is taking typed text, so
// that letters are not taken as commands.
func (r *root) paneEditing() bool {
	switch r.focus {
	case paneRecipe:
		return r.recipe.Editing()
	case paneSetpoint:
		return r.setpoint.Editing()
	case paneSweep:
		return r.sweep.Editing()
	}
	return false
}

func (r *root) paneUpdate(msg tea.KeyMsg) tea.Cmd {
	switch r.focus {
	case paneRecipe:
		return r.recipe.Update(msg)
	case paneSetpoint:
		return r.setpoint.Update(msg)
	case paneProperties:
		return r.props.Update(msg)
	case paneSweep:
		return r.sweep.Update(msg)
	case paneAnatomy:
		return r.anatomy.Update(msg)
	}
	return nil
}

func (r *root) paneKeyHelp(id paneID) []key.Binding {
	switch id {
	case paneRecipe:
		return r.recipe.KeyHelp()
	case paneSetpoint:
		return r.setpoint.KeyHelp()
	case paneProperties:
		return r.props.KeyHelp()
	case paneSweep:
		return r.sweep.KeyHelp()
	case paneAnatomy:
		return r.anatomy.KeyHelp()
	}
	return nil
}

func (r *root) paneShortHelp(id paneID) []key.Binding {
	switch id {
	case paneRecipe:
		return r.recipe.ShortHelp()
	case paneSetpoint:
		return r.setpoint.ShortHelp()
	case paneProperties:
		return r.props.ShortHelp()
	case paneSweep:
		h := r.sweep.KeyHelp()
		return h[:min(len(h), 4)]
	case paneAnatomy:
		return r.anatomy.ShortHelp()
	}
	return nil
}

func (r *root) key(msg tea.KeyMsg) tea.Cmd {
	k := r.c.Keys
	if r.prompt != promptNone {
		return r.promptKey(msg)
	}
	if key.Matches(msg, k.Interrupt) {
		return r.requestQuit()
	}
	if r.overlay != overlayNone {
		switch {
		case key.Matches(msg, k.Back), key.Matches(msg, k.Quit),
			r.overlay == overlayHelp && key.Matches(msg, k.Help),
			r.overlay == overlaySafety && key.Matches(msg, k.Safety):
			r.overlay = overlayNone
		default:
			scrollKeys(&r.overlayScroll, k.Scroll, msg)
		}
		return nil
	}
	if r.paneEditing() {
		return r.paneUpdate(msg)
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
		return r.paneUpdate(msg)
	default:
		for i, j := range k.Jump {
			if key.Matches(msg, j) {
				r.setFocus(paneID(i))
				return nil
			}
		}
		r.status = ""
		return r.paneUpdate(msg)
	}
	return nil
}

func (r *root) openOverlay(kind overlayKind) {
	r.overlay = kind
	r.overlayScroll.top()
	r.buildOverlay()
}

func (r *root) overlayBox() box {
	return box{min(r.width, 88), max(r.lay.bodyH, 3)}
}

func (r *root) buildOverlay() {
	bx := r.overlayBox()
	iw, ih := bx.inner()
	r.overlayScroll.setHeight(ih)
	if r.overlay == overlaySafety {
		r.overlayScroll.setLines(safetyDetail(r.c, r.b.cautions, r.b.notes, iw))
		return
	}
	s := r.c.Styles
	var lines []string
	section := func(title string, bs []key.Binding) {
		lines = append(lines, s.Title.Render(r.c.Text(title)))
		for _, b := range bs {
			h := b.Help()
			if h.Key == "" {
				continue
			}
			lines = append(lines, "  "+s.HelpKey.Render(padRight(r.c.KeyText(h.Key), 12))+" "+r.c.Text(h.Desc))
		}
		lines = append(lines, "")
	}
	section("In "+paneNames[r.focus], r.paneKeyHelp(r.focus))
	section("Everywhere", r.c.Keys.globalHelp())
	lines = append(lines, s.Muted.Render(r.c.Text("Amounts: 2%, 500 ppm, 0.3 (fraction), 30 wt%, 0.3 kg/kg, 0.2 bar (partial), bal")))
	lines = append(lines, s.Muted.Render(r.c.Text("T: K, C, F, R   P: "+mixtures.PressureUnits)))
	r.overlayScroll.setLines(lines)
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

// finalSave writes the state at once, for quitting: an autosave still in
// flight has an older sequence number and cannot overwrite it.
func (r *root) finalSave() error {
	if r.store == nil {
		return nil
	}
	data, err := json.MarshalIndent(r.snapshot(), "", "  ")
	if err != nil {
		return err
	}
	r.saveSeq++
	r.lastSaved = data
	return r.store.write(r.saveSeq, data)
}

func (r *root) autosave() tea.Cmd {
	if r.store == nil {
		return nil
	}
	data, err := json.MarshalIndent(r.snapshot(), "", "  ")
	if err != nil || bytes.Equal(data, r.lastSaved) {
		return nil
	}
	r.lastSaved = data
	if r.saving {
		r.savePending = true
		return nil
	}
	return r.saveCmd(data)
}

func (r *root) saveCmd(data []byte) tea.Cmd {
	r.saving = true
	r.saveSeq++
	seq, store := r.saveSeq, r.store
	return func() tea.Msg { return saveDoneMsg{seq, store.write(seq, data)} }
}

func (r *root) saveDone(m saveDoneMsg) tea.Cmd {
	r.saving = false
	if m.err != nil {
		r.setError("autosave failed: " + cleanErr(m.err))
	}
	if r.savePending {
		r.savePending = false
		return r.saveCmd(r.lastSaved)
	}
	return nil
}

// absPath resolves a typed path: ~ is the home directory, and a relative
// path is taken from where zmix was started.
func (r *root) absPath(p string) string {
	p = strings.TrimSpace(p)
	if p == "" {
		return ""
	}
	if p == "~" || strings.HasPrefix(p, "~/") {
		if home, err := os.UserHomeDir(); err == nil {
			p = filepath.Join(home, p[1:])
		}
	}
	if !filepath.IsAbs(p) && r.cwd != "" {
		p = filepath.Join(r.cwd, p)
	}
	return filepath.Clean(p)
}

// shortPath shows a path relative to the start directory when inside it.
func (r *root) shortPath(p string) string {
	if r.cwd != "" {
		if rel, err := filepath.Rel(r.cwd, p); err == nil && !strings.HasPrefix(rel, "..") {
			return rel
		}
	}
	return p
}

func (r *root) openPrompt(kind promptKind) {
	r.prompt = kind
	value := ""
	switch kind {
	case promptSave:
		value = "blend.json"
		if r.blendPath != "" {
			value = r.shortPath(r.blendPath)
		}
	case promptOpen:
		if r.blendPath != "" {
			value = r.shortPath(filepath.Dir(r.blendPath)) + string(filepath.Separator)
			if value == "."+string(filepath.Separator) {
				value = ""
			}
		}
	case promptExport:
		r.exportSweep = r.focus == paneSweep
		value = "readout.csv"
		if r.exportSweep {
			value = "sweep.csv"
		}
	}
	if last, ok := r.lastTyped[kind]; ok {
		// The user's own text comes back as they left it, to edit.
		delete(r.lastTyped, kind)
		r.input.start(last)
		return
	}
	if kind == promptOpen {
		r.input.start(value) // a folder to go on typing in
		return
	}
	r.input.suggest(value)
}

func (r *root) closePrompt() {
	r.prompt = promptNone
	r.input.stop()
}

func (r *root) promptKey(msg tea.KeyMsg) tea.Cmd {
	k := r.c.Keys
	switch r.prompt {
	case promptQuit:
		switch {
		case key.Matches(msg, k.Yes), key.Matches(msg, k.Interrupt):
			return r.requestQuit()
		case key.Matches(msg, k.SaveQuit):
			if r.saveBlend(r.blendPath) {
				return r.requestQuit()
			}
			r.prompt = promptNone
		case key.Matches(msg, k.No), key.Matches(msg, k.Back):
			r.prompt = promptNone
		}
		return nil
	case promptReplace:
		switch {
		case key.Matches(msg, k.Yes):
			r.openPrompt(promptOpen)
		case key.Matches(msg, k.No), key.Matches(msg, k.Back):
			r.prompt = promptNone
		case key.Matches(msg, k.Interrupt):
			r.prompt = promptNone
			return r.requestQuit()
		}
		return nil
	case promptOverwrite:
		switch {
		case key.Matches(msg, k.Yes):
			r.prompt = promptNone
			r.write(r.pendingKind, r.pending)
		case key.Matches(msg, k.No), key.Matches(msg, k.Back):
			r.openPrompt(r.pendingKind)
			r.input.start(r.shortPath(r.pending))
		case key.Matches(msg, k.Interrupt):
			r.prompt = promptNone
			return r.requestQuit()
		}
		return nil
	}
	switch {
	case key.Matches(msg, k.Interrupt):
		r.closePrompt()
		return r.requestQuit()
	case key.Matches(msg, k.Back):
		r.closePrompt()
		r.setStatus("cancelled")
	case key.Matches(msg, k.Accept):
		r.submitPrompt()
	default:
		return r.input.update(msg)
	}
	return nil
}

func (r *root) submitPrompt() {
	kind := r.prompt
	path := r.absPath(r.input.value())
	if path == "" {
		return // nothing typed yet; esc cancels
	}
	switch kind {
	case promptOpen:
		r.openBlend(path)
		return
	case promptExport:
		if ext := strings.ToLower(filepath.Ext(path)); ext != ".csv" && ext != ".json" {
			r.lastTyped[kind] = r.input.value()
			r.closePrompt()
			r.setError(fmt.Sprintf("not exported: %s: want a name ending in .csv or .json, which chooses the format", filepath.Base(path)))
			return
		}
	}
	r.closePrompt()
	if _, err := os.Stat(path); err == nil && !(kind == promptSave && path == r.blendPath) {
		r.pending, r.pendingKind = path, kind
		r.prompt = promptOverwrite
		return
	}
	r.write(kind, path)
}

func (r *root) write(kind promptKind, path string) {
	if kind == promptSave {
		r.saveBlend(path)
	} else {
		r.export(path)
	}
}

// fileProblem names what must be fixed before the recipe can go to a blend
// file, which must load again.
func (r *root) fileProblem() string {
	for i, e := range r.b.rowErr {
		if e != "" {
			return r.b.entries[i].Species + ": " + e
		}
	}
	for _, e := range []string{r.b.blendErr, r.b.tempErr, r.b.presErr} {
		if e != "" {
			return e
		}
	}
	return ""
}

func (r *root) saveBlend(path string) bool {
	if p := r.fileProblem(); p != "" {
		r.setError("not saved: fix this first: " + p)
		return false
	}
	if err := r.b.blendFile().Save(path); err != nil {
		r.setError("not saved: " + cleanErr(err))
		return false
	}
	r.blendPath, r.unsaved, r.contentSeen = path, false, r.b.content
	r.setStatus("saved the blend to " + r.shortPath(path))
	return true
}

func (r *root) openBlend(path string) {
	typed := r.input.value()
	r.closePrompt()
	f, err := mixtures.LoadBlendFile(path)
	if err != nil {
		r.setError(cleanErr(err) + " (" + r.c.Keys.OpenBlend.Help().Key + " to try again)")
		r.lastTyped[promptOpen] = typed
		return
	}
	r.b.loadFile(f)
	r.b.update()
	r.contentSeen = r.b.content
	r.blendPath, r.unsaved = path, false
	r.recipe.sel = 0
	r.refreshPanes()
	r.relayout()
	r.setStatus("opened " + r.shortPath(path))
}

// export writes the readout, or the sweep when asked from the sweep pane,
// with the columns of the state and sweep commands.
func (r *root) export(path string) {
	var buf bytes.Buffer
	asJSON := strings.EqualFold(filepath.Ext(path), ".json")
	gauge := r.b.in.Gauge
	what := "readout"
	var err error
	if r.exportSweep {
		res := r.sweep.Result()
		if res == nil {
			r.setError("no finished sweep to export yet")
			return
		}
		what = fmt.Sprintf("sweep (%d points)", len(res.Points))
		if asJSON {
			err = mixtures.WriteSweepJSON(&buf, res, gauge)
		} else {
			err = mixtures.WriteCSV(&buf, res.Points, gauge)
		}
	} else {
		if r.b.stateErr != "" {
			r.setError("nothing to export: " + r.b.stateErr)
			return
		}
		st := r.b.state
		if asJSON {
			err = mixtures.WriteJSON(&buf, &st, gauge)
		} else {
			err = mixtures.WriteCSV(&buf, []mixtures.State{st}, gauge)
		}
	}
	if err == nil {
		err = mixtures.WriteFileAtomic(path, buf.Bytes(), 0o644)
	}
	if err != nil {
		r.setError("export failed: " + cleanErr(err))
		return
	}
	msg := "exported the " + what + " to " + r.shortPath(path)
	if !r.b.valid() && !r.exportSweep {
		msg += " (the last valid state: an entry has an error)"
	}
	r.setStatus(msg)
}

// View draws the whole screen. It only puts together what Update and
// SetSize prepared.
func (r *root) View() string {
	if r.width <= 0 || r.height <= 0 {
		return ""
	}
	if r.lay.kind == layoutTooSmall {
		return r.tooSmallView()
	}
	var sb strings.Builder
	sb.Grow(r.width * r.height * 2)
	sb.WriteString(r.tabBar())
	sb.WriteByte('\n')
	sb.WriteString(r.body())
	for _, l := range r.safety {
		sb.WriteByte('\n')
		sb.WriteString(fitLine(l, r.width))
	}
	sb.WriteByte('\n')
	sb.WriteString(r.bottomLine())
	return sb.String()
}

func (r *root) tooSmallView() string {
	msg := fmt.Sprintf("zmix needs a terminal of at least %d×%d; this one is %d×%d. Enlarge the window or use a smaller font. q quits.",
		minWidth, minHeight, r.width, r.height)
	lines := wrap(r.c.Text(msg), r.width)
	if len(lines) > r.height {
		lines = lines[:r.height]
	}
	for i, l := range lines {
		lines[i] = truncate(l, r.width)
	}
	return strings.Join(lines, "\n")
}

func (r *root) tabBar() string {
	s := r.c.Styles
	var sb strings.Builder
	sb.WriteString(s.Title.Render("zmix"))
	sb.WriteString(s.Muted.Render(r.c.Text(" ·")))
	for id := paneID(0); id < paneCount; id++ {
		label := fmt.Sprintf("%d %s", id+1, paneNames[id])
		if id == r.focus {
			sb.WriteString(s.TabActive.Render(" [" + label + "]"))
		} else {
			sb.WriteString(s.Tab.Render("  " + label + " "))
		}
	}
	left := sb.String()
	if in := r.b.in; in.Valid() {
		right := r.c.Text(short(in.TempK, 6) + " K · " + r.b.presShown(in.PresPa))
		if gap := r.width - lipgloss.Width(left) - lipgloss.Width(right) - 1; gap >= 2 {
			return left + strings.Repeat(" ", gap) + s.Muted.Render(right) + " "
		}
	}
	return fitLine(left, r.width)
}

func (r *root) paneTitle(id paneID) string {
	t := paneNames[id]
	switch id {
	case paneRecipe:
		t = r.recipe.title()
	case paneAnatomy:
		t = r.anatomy.title()
	}
	return fmt.Sprintf("%d %s", id+1, t)
}

func (r *root) paneFrame(id paneID) string {
	bx := r.lay.boxes[id]
	var body string
	var above, below bool
	switch id {
	case paneRecipe:
		body = r.recipe.View()
		above, below = r.recipe.scroll.more()
	case paneSetpoint:
		body = r.setpoint.View()
		above, below = r.setpoint.scroll.more()
	case paneProperties:
		body = r.props.View()
		above, below = r.props.scroll.more()
	case paneSweep:
		body = r.sweep.View()
	case paneAnatomy:
		body = r.anatomy.View()
		above, below = r.anatomy.scroll.more()
	}
	return frame(r.c, r.paneTitle(id), body, bx, id == r.focus, above, below)
}

// body draws the panes of the layout, or an overlay in their place.
func (r *root) body() string {
	l := &r.lay
	if r.overlay != overlayNone {
		title := "Keys: " + paneNames[r.focus] + " (esc closes)"
		if r.overlay == overlaySafety {
			title = "Safety reminders (esc closes)"
		}
		above, below := r.overlayScroll.more()
		f := frame(r.c, title, r.overlayScroll.view(), r.overlayBox(), true, above, below)
		return lipgloss.PlaceHorizontal(r.width, lipgloss.Center, f)
	}
	if l.kind == layoutSingle && len(l.leftPanes) == 0 {
		f := r.paneFrame(r.focus)
		if l.headline {
			f += "\n" + r.headlineLine()
		}
		return f
	}
	var left, right []string
	for _, id := range l.leftPanes {
		left = append(left, strings.Split(r.paneFrame(id), "\n")...)
	}
	if l.kind == layoutSingle {
		left = append(left, r.headlineLine())
	}
	for _, id := range l.right {
		right = append(right, strings.Split(r.paneFrame(id), "\n")...)
	}
	var sb strings.Builder
	rw := r.width - l.leftW
	for i := 0; i < l.bodyH; i++ {
		if i > 0 {
			sb.WriteByte('\n')
		}
		if i < len(left) {
			sb.WriteString(left[i])
		} else {
			sb.WriteString(strings.Repeat(" ", l.leftW))
		}
		if rw <= 0 {
			continue
		}
		if i < len(right) {
			sb.WriteString(right[i])
		} else {
			sb.WriteString(strings.Repeat(" ", rw))
		}
	}
	return sb.String()
}

func (r *root) headlineLine() string {
	return r.props.headline(r.width)
}

// bottomLine is the prompt while one is open, else the status line: the
// last message or the file's state on the left, keys on the right.
func (r *root) bottomLine() string {
	s := r.c.Styles
	t := r.c.Text
	if r.prompt != promptNone {
		return fitLine(r.promptLine(), r.width)
	}
	right := t(" ? keys · tab pane · q quit ")
	bar := s.StatusBar
	var left string
	switch {
	case r.status != "":
		if r.statusErr {
			bar = s.Error
		}
		if r.statusRows > 1 {
			lines := wrap(t(r.status), r.width-1)
			if len(lines) > 2 {
				lines = lines[:2]
			}
			for len(lines) < 2 {
				lines = append(lines, "")
			}
			return bar.Render(fitLine(" "+lines[0], r.width)) + "\n" + bar.Render(fitLine(" "+lines[1], r.width))
		}
		left = t(" " + r.status)
	default:
		left = " " + r.fileState()
		room := r.width - lipgloss.Width(right)
		sep := t(" │ ")
		for _, b := range r.paneShortHelp(r.focus) {
			h := b.Help()
			desc, _, _ := strings.Cut(h.Desc, ":")
			if f := strings.Fields(desc); len(f) > 1 && !strings.Contains(h.Desc, ":") {
				desc = f[0]
			}
			hint := sep + r.c.KeyText(h.Key) + " " + t(desc)
			if lipgloss.Width(left)+lipgloss.Width(hint) > room {
				break
			}
			left += hint
			sep = t(" · ")
		}
	}
	room := r.width - lipgloss.Width(right)
	if room < 20 {
		return bar.Render(fitLine(left, r.width))
	}
	return bar.Render(fitLine(left, room) + right)
}

func (r *root) fileState() string {
	if r.blendPath == "" {
		return r.c.Text("no file, autosaved")
	}
	name := filepath.Base(r.blendPath)
	if r.unsaved {
		return name + " (changed)"
	}
	return name
}

func (r *root) promptLine() string {
	s := r.c.Styles
	t := r.c.Text
	k := r.c.Keys
	switch r.prompt {
	case promptQuit:
		return s.Prompt.Render(t(fmt.Sprintf(" %s: changes not saved. Quit? %s quit · %s save and quit · %s stay",
			filepath.Base(r.blendPath), k.Yes.Help().Key, k.SaveQuit.Help().Key, k.No.Help().Key)))
	case promptReplace:
		return s.Prompt.Render(t(fmt.Sprintf(" %s: changes not saved. Open another file? %s yes · %s no",
			filepath.Base(r.blendPath), k.Yes.Help().Key, k.No.Help().Key)))
	case promptOverwrite:
		return s.Prompt.Render(t(fmt.Sprintf(" %s exists. Replace it? %s yes · %s no", r.shortPath(r.pending), k.Yes.Help().Key, k.No.Help().Key)))
	}
	label := map[promptKind]string{
		promptSave:   " Save blend to: ",
		promptOpen:   " Open blend file: ",
		promptExport: " Export readout to (.csv/.json): ",
	}[r.prompt]
	if r.prompt == promptExport && r.exportSweep {
		label = " Export sweep to (.csv/.json): "
	}
	hint := t("  enter ok · esc cancel")
	return s.Prompt.Render(label) + r.input.view(max(r.width-lipgloss.Width(label)-lipgloss.Width(hint)-2, 8)) + s.Muted.Render(hint)
}
