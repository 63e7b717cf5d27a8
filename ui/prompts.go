package ui

import (
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/model"
)

// The prompts on the bottom line: save, open and export paths, and the
// questions before replacing a file or dropping unsaved changes.

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

// maxPathRunes bounds a typed path; longer ones are no path a system takes.
const maxPathRunes = 1024

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

// makeDataDir creates the user's data directory when a file is written
// into it, as proposed, for the first time. Other folders are the user's
// to make.
func (r *root) makeDataDir(path string) {
	if r.dataDir != "" && filepath.Dir(path) == r.dataDir {
		_ = os.MkdirAll(r.dataDir, 0o755) // a failure shows as the write's error
	}
}

// proposalDir is where a save or export is proposed: the folder last
// used, else that of the blend file, else the user's data directory, so
// that files do not land wherever zmix happened to be started.
func (r *root) proposalDir() string {
	switch {
	case r.lastDir != "":
		return r.lastDir
	case r.blendPath != "":
		return filepath.Dir(r.blendPath)
	case r.dataDir != "":
		return r.dataDir
	}
	return r.cwd
}

// showPath writes a path as short as it reads: relative to the start
// directory inside it, from ~ inside the home directory.
func (r *root) showPath(p string) string {
	if s := r.shortPath(p); s != p {
		return s
	}
	if home, err := os.UserHomeDir(); err == nil && home != "" {
		if rel, err := filepath.Rel(home, p); err == nil && !strings.HasPrefix(rel, "..") {
			return filepath.Join("~", rel)
		}
	}
	return p
}

func (r *root) openPrompt(kind promptKind) {
	r.prompt = kind
	value := ""
	switch kind {
	case promptSave:
		value = r.showPath(filepath.Join(r.proposalDir(), "blend.json"))
		if r.blendPath != "" {
			value = r.showPath(r.blendPath)
		}
	case promptOpen:
		if dir := r.proposalDir(); dir != "" {
			value = r.showPath(dir) + string(filepath.Separator)
			if value == "."+string(filepath.Separator) {
				value = ""
			}
		}
	case promptExport:
		r.exportSrc, _ = r.focused().(sweepSource)
		r.exportProc, _ = r.focused().(processSource)
		name := "readout.csv"
		switch {
		case r.exportSrc != nil:
			name = "sweep.csv"
		case r.exportProc != nil:
			name = "process.json"
		}
		value = r.showPath(filepath.Join(r.proposalDir(), name))
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
	// Say at once that the target cannot be written (a directory, a
	// device, a dangling link), rather than after asking to replace it.
	if err := mixtures.CheckWriteTarget(path); err != nil {
		r.lastTyped[kind] = r.input.value()
		r.closePrompt()
		r.setError("not written: " + model.UserMessage(err))
		return
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
	r.makeDataDir(path)
	if err := r.b.blendFile().Save(path); err != nil {
		r.setError("not saved: " + cleanErr(err))
		return false
	}
	r.blendPath, r.unsaved, r.contentSeen = path, false, r.b.content
	r.lastDir = filepath.Dir(path)
	r.setStatus("saved the blend to " + r.showPath(path))
	return true
}

// openBlend replaces the document with a blend file; afterChange brings
// the panes up to date, as after any edit.
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
	r.contentSeen = r.b.content
	r.blendPath, r.unsaved = path, false
	r.lastDir = filepath.Dir(path)
	r.setStatus("opened " + r.showPath(path))
}

// export writes the readout, or the sweep when asked from the sweep pane,
// with the columns of the state and sweep commands.
func (r *root) export(path string) {
	asJSON := strings.EqualFold(filepath.Ext(path), ".json")
	gauge := r.b.in.Gauge
	what := "readout"
	var write func(w io.Writer) error
	if r.exportProc != nil {
		// The process commands' writers: JSON or CSV (submitPrompt takes
		// no other name).
		rep := r.exportProc.processReport()
		if rep == nil {
			r.setError("no process result to export: see the Process pane's message")
			return
		}
		what = rep.Result.Kind() + " result"
		write = func(w io.Writer) error {
			if asJSON {
				return report.WriteProcessJSON(w, rep)
			}
			return report.WriteProcessCSV(w, rep)
		}
	} else if r.exportSrc != nil {
		res := r.exportSrc.Result()
		if res == nil {
			r.setError("no finished sweep to export yet")
			return
		}
		what = fmt.Sprintf("sweep (%d points)", res.Len())
		// The pane keeps only what it plots: the export computes the
		// sweep again and writes each point as it comes.
		src := r.exportSrc
		write = func(w io.Writer) error {
			if asJSON {
				return report.WriteSweepJSON(w, gauge, src.ResultSource())
			}
			return report.WriteSweepCSV(w, gauge, src.ResultSource())
		}
	} else {
		if r.b.stateErr != "" {
			r.setError("nothing to export: " + r.b.stateErr)
			return
		}
		// The state command's writers: the file holds what
		// zmix state --json (or --csv) prints, cautions and notes included.
		rep := r.b.stateReport()
		write = func(w io.Writer) error {
			if asJSON {
				return report.WriteStateJSON(w, rep)
			}
			return report.WriteStateCSV(w, rep)
		}
	}
	r.makeDataDir(path)
	if err := mixtures.WriteFileAtomicFunc(path, 0o666, write); err != nil {
		r.setError("export failed: " + cleanErr(err))
		return
	}
	r.lastDir = filepath.Dir(path)
	msg := "exported the " + what + " to " + r.showPath(path)
	if !r.b.valid() && r.exportSrc == nil && r.exportProc == nil {
		msg += " (the last valid state: an entry has an error)"
	}
	r.setStatus(msg)
}

// question is the text of a prompt answered by one key.
func (r *root) question() string {
	k := r.c.Keys
	switch r.prompt {
	case promptQuit:
		return fmt.Sprintf("%s: changes not saved. Quit? %s quit · %s save and quit · %s stay",
			filepath.Base(r.blendPath), k.Yes.Help().Key, k.SaveQuit.Help().Key, k.No.Help().Key)
	case promptReplace:
		return fmt.Sprintf("%s: changes not saved. Open another file? %s yes · %s no",
			filepath.Base(r.blendPath), k.Yes.Help().Key, k.No.Help().Key)
	case promptOverwrite:
		return fmt.Sprintf("%s exists. Replace it? %s yes · %s no", r.shortPath(r.pending), k.Yes.Help().Key, k.No.Help().Key)
	}
	return ""
}

func (r *root) promptLine() string {
	s := r.c.Styles
	t := r.c.Text
	switch r.prompt {
	case promptQuit, promptReplace, promptOverwrite:
		return s.Prompt.Render(" " + t(model.Printable(r.question())))
	}
	label := map[promptKind]string{
		promptSave:   " Save blend to: ",
		promptOpen:   " Open blend file: ",
		promptExport: " Export readout to (.csv/.json): ",
	}[r.prompt]
	if r.prompt == promptExport && r.exportSrc != nil {
		label = " Export sweep to (.csv/.json): "
	}
	if r.prompt == promptExport && r.exportProc != nil {
		label = " Export process result to (.json, or .txt for text): "
	}
	hint := t("  enter ok · esc cancel")
	return s.Prompt.Render(label) + r.input.view(max(r.width-lipgloss.Width(label)-lipgloss.Width(hint)-2, 8)) + s.Muted.Render(hint)
}
