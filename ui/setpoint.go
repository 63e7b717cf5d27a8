package ui

import (
	"strings"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures"
	"zmix/mixtures/report"
)

// The setpoint pane's lines.
const (
	spTemp = iota
	spPres
	spStd
	spView
	spCount
)

// setpointPane holds the conditions: temperature and pressure typed with
// units, the standard pressure of μ°, and whether pressures show as gauge.
type setpointPane struct {
	c    *Common
	b    *bench
	w, h int

	sel     int
	editing bool
	input   field
	before  string

	scroll scroller
}

func newSetpointPane(c *Common, b *bench) *setpointPane {
	return &setpointPane{c: c, b: b, input: newField(c)}
}

func (p *setpointPane) SetSize(w, h int) {
	p.w, p.h = max(w, 0), max(h, 0)
	p.input.setWidth(p.fieldWidth())
	p.scroll.setHeight(p.h)
	p.refresh()
}

func (p *setpointPane) Editing() bool { return p.editing }

func (p *setpointPane) KeyHelp() []key.Binding {
	k := p.c.Keys.Setpoint
	if p.editing {
		return []key.Binding{p.c.Keys.Accept, p.c.Keys.Back, p.c.Keys.Interrupt}
	}
	return []key.Binding{k.Up, k.Down, k.Edit, k.Temperature, k.Pressure, k.Standard, k.Gauge}
}

func (p *setpointPane) ShortHelp() []key.Binding {
	k := p.c.Keys.Setpoint
	if p.editing {
		return []key.Binding{p.c.Keys.Accept, p.c.Keys.Back}
	}
	return []key.Binding{k.Temperature, k.Pressure, k.Standard, k.Gauge}
}

func (p *setpointPane) Update(m tea.Msg) tea.Cmd {
	msg, ok := m.(tea.KeyMsg)
	if !ok {
		return nil
	}
	var cmd tea.Cmd
	if p.editing {
		switch {
		case key.Matches(msg, p.c.Keys.Back):
			p.set(p.before)
			p.stopEdit()
		case key.Matches(msg, p.c.Keys.Accept):
			p.stopEdit()
		default:
			cmd = p.input.update(msg)
			p.set(p.input.value())
		}
		p.refresh()
		return cmd
	}
	k := p.c.Keys.Setpoint
	switch {
	case key.Matches(msg, k.Up):
		p.sel = max(p.sel-1, 0)
	case key.Matches(msg, k.Down):
		p.sel = min(p.sel+1, spCount-1)
	case key.Matches(msg, k.Temperature):
		p.sel = spTemp
		p.startEdit()
	case key.Matches(msg, k.Pressure):
		p.sel = spPres
		p.startEdit()
	case key.Matches(msg, k.Standard):
		p.sel = spStd
		p.b.toggleStd()
	case key.Matches(msg, k.Gauge):
		p.sel = spView
		p.b.toggleGauge()
	case key.Matches(msg, k.Edit):
		switch p.sel {
		case spTemp, spPres:
			p.startEdit()
		case spStd:
			p.b.toggleStd()
		case spView:
			p.b.toggleGauge()
		}
	}
	p.refresh()
	return nil
}

func (p *setpointPane) typed() string {
	if p.sel == spTemp {
		return p.b.tempText
	}
	return p.b.presText
}

func (p *setpointPane) set(s string) {
	if p.sel == spTemp {
		p.b.setTemp(s)
	} else {
		p.b.setPres(s)
	}
}

func (p *setpointPane) startEdit() {
	p.editing = true
	p.before = p.typed()
	p.input.start(p.before)
}

func (p *setpointPane) stopEdit() {
	p.editing = false
	p.input.stop()
}

// fieldWidth leaves room for the label and for the value in kelvin.
func (p *setpointPane) fieldWidth() int { return max(8, min(18, p.w-16-22)) }

func (p *setpointPane) refresh() {
	// Extras wrap under their values while the pane has the rows for
	// them; past that they give way, so that every line stays in view.
	lines, selLine := p.render(true)
	if len(lines) > p.h {
		lines, selLine = p.render(false)
	}
	p.scroll.setLines(lines)
	p.scroll.show(selLine, selLine)
}

// render builds the pane's lines; wrapExtras says whether an extra that
// does not fit beside its value may go under it.
func (p *setpointPane) render(wrapExtras bool) (lines []string, selLine int) {
	s := p.c.Styles
	fw := p.fieldWidth()
	const lw = 12
	// A note has a part the user needs (a conversion) and an extra (a
	// second form, a hint). Beside the value goes all that fits of that
	// order; a needed part that does not fit is wrapped under the value,
	// never cut, and an extra that does not fit is left out.
	row := func(i int, label, value, need, extra string) {
		mark := "  "
		l := padRight(label, lw)
		if i == p.sel {
			mark = "> "
			l = s.Selected.Render(l)
			selLine = len(lines)
		}
		line := mark + l + " " + value
		fits := func(n string) bool { return lipgloss.Width(line)+2+lipgloss.Width(n) <= p.w }
		note := need + extra
		switch {
		case fits(note):
		case need == "" && !wrapExtras, fits(need) && !wrapExtras:
			note = need
		}
		if note == "" || fits(note) {
			if note != "" {
				line += "  " + s.Muted.Render(note)
			}
			lines = append(lines, line)
			return
		}
		// No room beside the value: the note goes under it, wrapped
		// between words, never cut.
		lines = append(lines, line)
		indent := strings.Repeat(" ", 2+lw+1)
		for _, l := range report.Wrap(note, p.w-len(indent)) {
			lines = append(lines, indent+s.Muted.Render(l))
		}
	}
	typed := func(i int, text string) string {
		if p.editing && p.sel == i {
			return padRight(p.input.view(fw), fw)
		}
		if text == "" {
			return s.Muted.Render(padRight("(type one)", fw))
		}
		return padRight(p.c.Text(text), fw)
	}
	errLines := func(msg string) {
		for _, l := range report.Wrap(p.c.Text(msg), p.w-4) {
			lines = append(lines, "    "+s.Error.Render(l))
		}
	}

	in := p.b.in
	tNote, tExtra, pNote, pExtra := "", "", "", ""
	if p.b.tempErr == "" && in.TempK > 0 {
		tNote = report.Short(in.TempK, 6) + " K"
		tExtra = p.c.Text(", " + report.Fixed(mixtures.KelvinToCelsius(in.TempK), 2) + " °C")
	}
	if p.b.presErr == "" && in.PresPa > 0 {
		// In the reading chosen (show P as), like every pressure on screen.
		pNote = p.b.presShown(in.PresPa)
		if squeeze(pNote) == squeeze(p.b.presText) {
			pNote = "" // shown as typed: nothing to add
		}
		switch {
		case in.Gauge && !p.b.showGauge:
			pExtra = ", entered as gauge"
		case !in.Gauge && p.b.showGauge:
			pExtra = ", entered as absolute"
		}
	}
	row(spTemp, "temperature", typed(spTemp, p.b.tempText), tNote, tExtra)
	if p.b.tempErr != "" {
		msg := p.b.tempErr
		if in.TempK > 0 {
			msg += " (" + mixtures.FormatTemperature(in.TempK) + " still in force)"
		}
		errLines(msg)
	}
	row(spPres, "pressure", typed(spPres, p.b.presText), pNote, pExtra)
	if p.b.presErr != "" {
		msg := p.b.presErr
		if in.PresPa > 0 {
			msg += " (" + p.b.presShown(in.PresPa) + " still in force)"
		}
		errLines(msg)
	}
	row(spStd, p.c.Text("P° (std)"), padRight(p.b.stdText(), fw), "", p.c.Text("reference of μ°"))
	view := "absolute"
	if p.b.showGauge {
		view = "gauge"
	}
	row(spView, "show P as", padRight(view, fw), "", "1 atm = 0 gauge")
	return lines, selLine
}

// squeeze lowers s and drops its spaces, to compare typed values.
func squeeze(s string) string { return strings.ToLower(strings.Join(strings.Fields(s), "")) }

func (p *setpointPane) View() string { return p.scroll.view() }

func (p *setpointPane) Title() string { return "Setpoint" }

func (p *setpointPane) Sync() tea.Cmd { p.refresh(); return nil }

func (p *setpointPane) More() (above, below bool) { return p.scroll.more() }
