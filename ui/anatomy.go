package ui

import (
	"fmt"
	"strings"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures/report"
	"zmix/model"
)

// anatomyPane takes one species of the blend apart: what translation,
// rotation, vibration and electronic levels each give to S and Cp, its
// characteristic temperatures, and whether the model holds for it here.
type anatomyPane struct {
	c    *Common
	b    *bench
	w, h int

	formula      string // the species shown; the first one if it is not in the blend
	savedFormula string // formula when stateChanged last looked
	scroll       scroller
}

func newAnatomyPane(c *Common, b *bench) *anatomyPane { return &anatomyPane{c: c, b: b} }

func (p *anatomyPane) SetSize(w, h int) {
	p.w, p.h = max(w, 0), max(h, 0)
	p.scroll.setHeight(p.h)
	p.refresh()
}

func (p *anatomyPane) Editing() bool { return false }

func (p *anatomyPane) KeyHelp() []key.Binding {
	k, s := p.c.Keys.Anatomy, p.c.Keys.Scroll
	return []key.Binding{k.PrevSpecies, k.NextSpecies, s.Up, s.Down, s.PageUp, s.PageDown}
}

func (p *anatomyPane) ShortHelp() []key.Binding {
	k := p.c.Keys.Anatomy
	return []key.Binding{k.PrevSpecies, k.NextSpecies}
}

func (p *anatomyPane) Update(m tea.Msg) tea.Cmd {
	msg, ok := m.(tea.KeyMsg)
	if !ok {
		return nil
	}
	k := p.c.Keys.Anatomy
	switch {
	case key.Matches(msg, k.PrevSpecies):
		p.step(-1)
	case key.Matches(msg, k.NextSpecies):
		p.step(1)
	default:
		scrollKeys(&p.scroll, p.c.Keys.Scroll, msg)
		return nil
	}
	p.refresh()
	return nil
}

// index returns the shown species' place in the state, or -1.
func (p *anatomyPane) index() int {
	sp := p.b.state.Species
	if p.b.stateErr != "" || len(sp) == 0 {
		return -1
	}
	for i := range sp {
		if sp[i].Species.Formula == p.formula {
			return i
		}
	}
	return 0
}

func (p *anatomyPane) step(by int) {
	i := p.index()
	if i < 0 {
		return
	}
	n := len(p.b.state.Species)
	p.formula = p.b.state.Species[(i+by+n)%n].Species.Formula
}

func (p *anatomyPane) Sync() tea.Cmd { p.refresh(); return nil }

func (p *anatomyPane) More() (above, below bool) { return p.scroll.more() }

// The species shown is kept with the workbench state.
func (p *anatomyPane) saveState(st *savedState)    { st.AnatomySpecies = p.formula }
func (p *anatomyPane) restoreState(st *savedState) { p.formula = st.AnatomySpecies; p.refresh() }
func (p *anatomyPane) stateChanged() bool {
	c := p.formula != p.savedFormula
	p.savedFormula = p.formula
	return c
}

func (p *anatomyPane) Title() string {
	if i := p.index(); i >= 0 {
		return "Anatomy: " + p.b.state.Species[i].Species.Formula
	}
	return "Anatomy"
}

func (p *anatomyPane) View() string { return p.scroll.view() }

func (p *anatomyPane) refresh() { p.scroll.setLines(p.render()) }

func (p *anatomyPane) render() []string {
	s := p.c.Styles
	t := p.c.Text
	var lines []string
	add := func(l string) { lines = append(lines, l) }
	// addHanging wraps text to the pane, its first line after indent and
	// the others after indent and two spaces more.
	addHanging := func(style func(...string) string, indent, text string) {
		for i, l := range report.Wrap(t(text), p.w-len(indent)-2) {
			if i > 0 {
				l = strings.Repeat(" ", len(indent)+2) + l
			} else {
				l = indent + l
			}
			add(style(l))
		}
	}
	addWrapped := func(style func(...string) string, indent, text string) {
		for i, l := range report.Wrap(t(text), p.w-len(indent)) {
			if i > 0 {
				l = strings.Repeat(" ", len(indent)) + l
			} else {
				l = indent + l
			}
			add(style(l))
		}
	}
	// addLabeled hangs wrapped text after a label column.
	addLabeled := func(label, text string) {
		lw := lipgloss.Width(t("Θvib")) + 3
		for i, l := range report.Wrap(t(text), p.w-lw) {
			head := strings.Repeat(" ", lw)
			if i == 0 {
				head = padRight(t(label), lw)
			}
			add(s.Label.Render(head) + l)
		}
	}
	i := p.index()
	if i < 0 {
		addWrapped(s.Error.Render, "", p.b.stateErr)
		return lines
	}
	term := &p.b.state.Species[i]
	sp := term.Species
	st := &term.State
	a := report.AnatomyOf(term)
	n := len(p.b.state.Species)
	addWrapped(s.Title.Render, "", fmt.Sprintf("%s, %s: x %s at pᵢ %s, %s K", sp.Formula, sp.Name, report.Sig(term.X, 4), report.PressureAuto(term.PartialPresPa), report.Short(st.TempK, 6)))
	if n > 1 {
		add(s.Muted.Render(t(fmt.Sprintf("species %d of %d (←/→ for the others)", i+1, n))))
	}

	const lw, vw = 13, 13
	add(s.Label.Render(padRight("", lw) + padLeft(t("S J/(mol·K)"), vw) + padLeft(t("Cp J/(mol·K)"), vw+1)))
	for _, f := range a.Factors {
		mark := ""
		if f.Name == "translation" {
			mark = " *"
		}
		add(s.Label.Render(padRight(f.Name, lw)) + s.Value.Render(padLeft(report.Fixed(f.SJPerMolK, 3), vw)+padLeft(report.Fixed(f.CpJPerMolK, 3), vw+1)) + mark)
	}
	add(s.Label.Render(padRight("total", lw)) + s.Value.Render(padLeft(report.Fixed(a.TotalS, 3), vw)+padLeft(report.Fixed(a.TotalCp, 3), vw+1)))
	addWrapped(s.Muted.Render, "", "* Cp = Cv + R: the R, the P dV work of heating at constant pressure, is booked with translation.")

	add("")
	addHanging(s.Label.Render, "", "Treatment: "+a.Treatment)
	for _, f := range a.Factors {
		addHanging(s.Muted.Render, "  ", f.Name+": "+f.Treatment)
	}
	if line := a.OverRigidHarmonicLine(); line != "" {
		addHanging(s.Muted.Render, "  ", line)
	}

	add("")
	addLabeled("Θrot", a.RotorLine())
	addLabeled("Θvib", a.VibLine())
	addLabeled("Θel", a.ElecLine())
	if a.BoilingK > 0 {
		addLabeled("Tb", report.Sig(a.BoilingK, 5)+" K at 1 atm")
	}

	add("")
	add(s.Label.Render("Does the model hold here?"))
	for _, note := range p.b.notes {
		if note.Species == sp.Formula {
			addWrapped(noteStyle(s, note.Severity), "  ", note.Severity.String()+": "+note.Text)
		}
	}
	if sp.Notes != "" {
		addWrapped(s.Muted.Render, "  ", "about "+sp.Formula+": "+sp.Notes)
	}
	first := true
	for _, note := range p.b.notes {
		if note.Species == "" {
			if first {
				add(s.Label.Render("The blend as a whole"))
				first = false
			}
			addWrapped(noteStyle(s, note.Severity), "  ", note.Severity.String()+": "+note.Text)
		}
	}
	return lines
}

func noteStyle(s *Styles, sev model.Severity) func(...string) string {
	switch sev {
	case model.Invalid:
		return s.Error.Render
	case model.Caution:
		return s.Warning.Render
	}
	return s.Value.Render
}
