package ui

import (
	"strings"

	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/model"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"
)

// propertiesPane is the readout: every figure of the blend at the current
// state, and a line per species at its partial pressure.
type propertiesPane struct {
	c    *Common
	b    *bench
	w, h int

	scroll scroller
}

func newPropertiesPane(c *Common, b *bench) *propertiesPane {
	return &propertiesPane{c: c, b: b}
}

func (p *propertiesPane) SetSize(w, h int) {
	p.w, p.h = max(w, 0), max(h, 0)
	p.scroll.setHeight(p.h)
	p.refresh()
}

func (p *propertiesPane) Editing() bool { return false }

func (p *propertiesPane) KeyHelp() []key.Binding {
	k := p.c.Keys.Scroll
	return []key.Binding{k.Up, k.Down, k.PageUp, k.PageDown, k.Top, k.Bottom}
}

func (p *propertiesPane) ShortHelp() []key.Binding {
	k := p.c.Keys.Scroll
	return []key.Binding{k.Up, k.Down}
}

func (p *propertiesPane) Update(m tea.Msg) tea.Cmd {
	msg, ok := m.(tea.KeyMsg)
	if !ok {
		return nil
	}
	scrollKeys(&p.scroll, p.c.Keys.Scroll, msg)
	return nil
}

// scrollKeys moves a scroller by the scroll bindings.
func scrollKeys(s *scroller, k ScrollKeys, msg tea.KeyMsg) {
	switch {
	case key.Matches(msg, k.Up):
		s.scroll(-1)
	case key.Matches(msg, k.Down):
		s.scroll(1)
	case key.Matches(msg, k.PageUp):
		s.scroll(-max(s.height-1, 1))
	case key.Matches(msg, k.PageDown):
		s.scroll(max(s.height-1, 1))
	case key.Matches(msg, k.Top):
		s.top()
	case key.Matches(msg, k.Bottom):
		s.bottom()
	}
}

func (p *propertiesPane) View() string { return p.scroll.view() }

func (p *propertiesPane) Title() string { return "Properties" }

func (p *propertiesPane) Sync() tea.Cmd { p.refresh(); return nil }

func (p *propertiesPane) More() (above, below bool) { return p.scroll.more() }

// wantHeight is what the one-column readout needs, leaving 16 rows of
// the column to the panes under it (the plot).
func (p *propertiesPane) wantHeight(avail int) int {
	nSpecies := 0
	if p.b.in.Mixture != nil {
		nSpecies = len(p.b.in.Mixture.Components) + len(cautionNotes(p.b.notes)) // a caution line each
	}
	// Besides its figures the readout has ten rows: the frame, the
	// heading, the mixing-entropy and real-gas lines, the blank lines and the species
	// table's headings and note.
	figures := 0
	for i := range mixtures.Quantities {
		if q := &mixtures.Quantities[i]; q.Section == mixtures.SectionMixture && q.Key != mixingKey {
			figures++
		}
	}
	return max(10, min(figures+10+nSpecies, avail-16))
}

// readoutRow is one figure of the blend, per mole and per kilogram.
type readoutRow struct {
	label             string
	perMol, molUnit   string
	perKg, kgUnit     string
	shortLabel, extra string
}

// readoutRows formats the blend's figures, as the state command does,
// from the quantity table: every figure of the mixture section except the
// mixing entropy, which has a line of its own.
func (p *propertiesPane) readoutRows() []readoutRow {
	st := &p.b.state
	var rows []readoutRow
	for i := range mixtures.Quantities {
		q := &mixtures.Quantities[i]
		if q.Section != mixtures.SectionMixture || q.Key == mixingKey {
			continue
		}
		r := readoutRow{label: q.Label, shortLabel: p.symbol(q), perMol: quantityText(q, q.Get(st)), molUnit: p.unit(q.Unit, q.UnitASCII)}
		if q.HasPerKg() {
			r.perKg, r.kgUnit = quantityText(q, q.PerKg(st)), p.unit(q.PerKgUnit, q.PerKgUnitASCII)
		}
		rows = append(rows, r)
	}
	return rows
}

// mixingKey is the quantity the readout gives a line of its own.
const mixingKey = "Smix"

// symbol and unit pick the quantity table's glyphs or its ASCII forms.
func (p *propertiesPane) symbol(q *mixtures.Quantity) string {
	if p.c.ASCII {
		return q.SymbolASCII
	}
	return q.Symbol
}

func (p *propertiesPane) unit(glyphs, ascii string) string {
	if p.c.ASCII {
		return ascii
	}
	return glyphs
}

// speciesKeys are the species quantities of the workbench's table, in the
// table's order; mass ("w") is left out first when the pane is narrow.
var speciesKeys = []string{"x", "w", "p", "mu", "S", "Cp"}

// speciesNameWidth is the width of the table's first column.
const speciesNameWidth = 7

// speciesColumnWidth leaves a value of the table's digits and its unit a
// space to spare.
func speciesColumnWidth(q *mixtures.SpeciesQuantity) int {
	return max(10, lipgloss.Width(q.Unit)+1)
}

func (p *propertiesPane) refresh() {
	p.scroll.setLines(p.render())
}

func (p *propertiesPane) render() []string {
	s := p.c.Styles
	t := p.c.Text
	var lines []string
	add := func(l string) { lines = append(lines, l) }
	if p.b.stateErr != "" || !p.b.in.Valid() {
		for _, l := range report.Wrap(t(p.b.stateErr), p.w) {
			add(s.Error.Render(l))
		}
		return lines
	}
	in := p.b.in
	head := report.Short(in.TempK, 6) + " K, " + p.b.presShown(in.PresPa) + ", P° " + p.b.stdText()
	// The mark of an entry in error goes on the heading line when it fits,
	// so that the figures under it do not move: a typing slip then
	// redraws one line here, not the whole readout.
	const stale = "  last valid state: an entry is in error"
	switch {
	case p.b.valid():
		add(s.Title.Render(t(head)))
	case lipgloss.Width(t(head+stale)) <= p.w:
		add(s.Title.Render(t(head)) + s.Warning.Render(t(stale)))
	default:
		add(s.Title.Render(t(head)))
		for _, l := range report.Wrap(t("last valid state: an entry has an error (see Recipe / Setpoint)"), p.w) {
			add(s.Warning.Render(l))
		}
	}
	rows := p.readoutRows()
	n := len(p.b.state.Species)
	// The model's own cautions stand under the conditions they concern,
	// not only in Anatomy: whole when the pane has the rows, else one line
	// each, cut between words; the safety overlay has them in full.
	notes := cautionNotes(p.b.notes)
	var full []string
	for _, note := range notes {
		full = append(full, report.Wrap(t("! "+report.NoteText(note)), p.w)...)
	}
	if len(lines)+len(full)+1+len(rows)+2+4+n <= p.h {
		for _, l := range full {
			add(s.Caution.Render(l))
		}
	} else {
		for _, note := range notes {
			add(s.Caution.Render(p.c.shorten("! "+report.NoteText(note), p.w)))
		}
	}
	oneCol := len(lines) + 1 + len(rows) + 2 + 4 + n // + the mixing and real-gas lines
	if p.h < oneCol && p.w >= 60 {
		p.twoColumns(rows, add)
	} else {
		p.oneColumn(rows, add)
	}
	p.speciesTable(add)
	return lines
}

func (p *propertiesPane) oneColumn(rows []readoutRow, add func(string)) {
	s := p.c.Styles
	t := p.c.Text
	const lw, vw, uw = 19, 11, 10
	kg := p.w >= lw+vw+1+uw+vw+1+9
	if kg {
		add(s.Label.Render(strings.Repeat(" ", lw) + padLeft("per mole", vw) + strings.Repeat(" ", uw+1) + padLeft("per kg", vw)))
	}
	for _, r := range rows {
		line := s.Label.Render(padRight(t(r.label), lw)) + s.Value.Render(padLeft(r.perMol, vw)) + " " + s.Unit.Render(padRight(t(r.molUnit), uw))
		if kg && r.perKg != "" {
			line += s.Value.Render(padLeft(r.perKg, vw)) + " " + s.Unit.Render(t(r.kgUnit))
		}
		add(strings.TrimRight(line, " "))
	}
	p.realGasLine(add)
	p.dewPointLines(add)
	p.mixingLine(lw, vw, add)
}

// twoColumns packs the figures per mole side by side, for short panes.
func (p *propertiesPane) twoColumns(rows []readoutRow, add func(string)) {
	s := p.c.Styles
	t := p.c.Text
	half := (len(rows) + 1) / 2
	const lw, vw, uw = 4, 11, 10
	colW := p.w / 2
	cell := func(r readoutRow) string {
		return padRight(s.Label.Render(padRight(t(r.shortLabel), lw))+s.Value.Render(padLeft(r.perMol, vw))+" "+s.Unit.Render(t(r.molUnit)), colW)
	}
	for i := 0; i < half; i++ {
		line := cell(rows[i])
		if j := i + half; j < len(rows) {
			line += cell(rows[j])
		}
		add(strings.TrimRight(line, " "))
	}
	p.realGasLine(add)
	p.dewPointLines(add)
	p.mixingLine(lw+8, vw, add)
}

func (p *propertiesPane) mixingLine(lw, vw int, add func(string)) {
	s := p.c.Styles
	t := p.c.Text
	q, _ := mixtures.QuantityByKey(mixingKey)
	line := s.Label.Render(padRight(t(q.Label), lw)) + s.Value.Render(padLeft(quantityText(q, q.Get(&p.b.state)), vw)) + " " +
		s.Unit.Render(p.unit(q.Unit, q.UnitASCII))
	note := t("  −R Σ xᵢ ln xᵢ, part of S")
	if lipgloss.Width(line)+lipgloss.Width(note) > p.w {
		add(line)
		add(s.Muted.Render(strings.Repeat(" ", lw) + note))
		return
	}
	add(line + s.Muted.Render(note))
}

// realGasLine gives the real-gas figures of the quantity table on one
// line, with the model that gives them: they stand beside the ideal-gas
// figures and do not replace them.
func (p *propertiesPane) realGasLine(add func(string)) {
	s := p.c.Styles
	t := p.c.Text
	st := &p.b.state
	line := s.Label.Render("real gas ")
	rg, known := st.RealGasResult()
	if !known {
		add(line + s.Muted.Render(t(" not known: no critical constants")))
		return
	}
	var items []string
	for i := range mixtures.Quantities {
		q := &mixtures.Quantities[i]
		if q.Section != mixtures.SectionRealGas {
			continue
		}
		item := p.symbol(q) + " " + quantityText(q, q.Get(st))
		if u := p.unit(q.Unit, q.UnitASCII); u != "" {
			item += " " + u
		}
		items = append(items, item)
	}
	line += s.Value.Render(t(" " + strings.Join(items, "  ")))
	if model := "  " + rg.Model.Short(); lipgloss.Width(line)+lipgloss.Width(model) <= p.w {
		line += s.Muted.Render(t(model))
	}
	add(line)
}

// dewPointLines give the blend's dew (or frost) point at the line
// pressure and the relative humidity of its water, as zmix state's
// real-gas section does, when it has them: where a cooler pipe or a
// compression would condense it.
func (p *propertiesPane) dewPointLines(add func(string)) {
	s := p.c.Styles
	t := p.c.Text
	st := &p.b.state
	var lines [][2]string
	if dp := mixtures.DewPoint(st); dp.Known {
		lines = append(lines, report.DewPointShort(st, dp))
	}
	if rh, ok := report.HumidityShort(mixtures.RelativeHumidity(st)); ok {
		// One line with the dew point where it fits.
		if n := len(lines); n > 0 && lipgloss.Width(t(lines[n-1][0]+" "+lines[n-1][1]+"; "+rh[0]+" "+rh[1])) <= p.w {
			lines[n-1][1] += "; " + rh[0] + " " + rh[1]
		} else {
			lines = append(lines, rh)
		}
	}
	for _, l := range lines {
		label := l[0] + " "
		for i, w := range report.Wrap(t(l[1]), max(p.w-len(label), 20)) {
			if i == 0 {
				add(s.Label.Render(label) + s.Value.Render(w))
			} else {
				add(strings.Repeat(" ", len(label)) + s.Value.Render(w))
			}
		}
	}
}

func (p *propertiesPane) speciesTable(add func(string)) {
	s := p.c.Styles
	t := p.c.Text
	var cols []*mixtures.SpeciesQuantity
	full := speciesNameWidth
	for _, k := range speciesKeys {
		if q, ok := mixtures.SpeciesQuantityByKey(k); ok {
			cols = append(cols, q)
			full += speciesColumnWidth(q)
		}
	}
	skipMass := p.w < full
	add("")
	h1 := padRight(t("species"), speciesNameWidth)
	h2 := strings.Repeat(" ", speciesNameWidth)
	for _, q := range cols {
		if skipMass && q.Key == "w" {
			continue
		}
		label := q.Label
		if p.c.ASCII {
			label = q.LabelASCII
		}
		h1 += padLeft(label, speciesColumnWidth(q))
		h2 += padLeft(p.unit(q.Unit, q.UnitASCII), speciesColumnWidth(q))
	}
	add(s.Label.Render(h1))
	add(s.Unit.Render(h2))
	for i := range p.b.state.Species {
		sp := &p.b.state.Species[i]
		row := padRight(t(sp.Species.Formula), speciesNameWidth)
		for _, q := range cols {
			if skipMass && q.Key == "w" {
				continue
			}
			row += padLeft(report.Number(q.Get(sp)*q.Scale, q.Digits), speciesColumnWidth(q))
		}
		add(s.Value.Render(row))
	}
	for _, l := range report.Wrap(t("each species at its partial pressure pᵢ; μᵢ = μᵢ°(T) + RT ln(xᵢP/P°), elements at 0 K as zero"), p.w) {
		add(s.Muted.Render(l))
	}
}

// headlineKeys are the figures of the one-line readout, most wanted first;
// those that do not fit the width are left out whole.
var headlineKeys = []string{"M", "rho", "Cp", "gamma", "c"}

// headline is the blend in one line of w cells, for layouts that do not
// show the readout beside the recipe. While an entry is in error the
// figures are those of the last valid state, and the line says so, as
// the readout does.
func (p *propertiesPane) headline(w int) string {
	s := p.c.Styles
	t := p.c.Text
	if p.b.stateErr != "" || !p.b.in.Valid() {
		return fitLine(s.Error.Render(p.c.shorten(p.b.stateErr, w)), w)
	}
	lead, leadStyle := "= ", s.Muted
	if !p.b.valid() {
		lead, leadStyle = "last valid: ", s.Warning
	}
	line := leadStyle.Render(t(lead))
	used := lipgloss.Width(t(lead))
	st := &p.b.state
	for i, k := range headlineKeys {
		q, ok := mixtures.QuantityByKey(k)
		if !ok {
			continue
		}
		sym, unit := q.Symbol, q.Unit
		if p.c.ASCII {
			sym, unit = q.SymbolASCII, q.UnitASCII
		}
		item := sym + " " + quantityText(q, q.Get(st))
		if unit != "" {
			item += " " + unit
		}
		if i > 0 {
			item = "  " + item
		}
		if used+lipgloss.Width(item) > w {
			break
		}
		line += s.Value.Render(item)
		used += lipgloss.Width(item)
	}
	return fitLine(line, w)
}

// quantityText writes a figure in display units with the digits its row
// of the quantity table gives.
func quantityText(q *mixtures.Quantity, si float64) string {
	return report.Number(si*q.Scale, q.Digits)
}

// cautionNotes are the validity notes at caution level or worse: those the
// workbench keeps in sight, as it does the safety strip.
func cautionNotes(notes []mixtures.StateNote) []mixtures.StateNote {
	var out []mixtures.StateNote
	for _, n := range notes {
		if n.Severity >= model.Caution {
			out = append(out, n)
		}
	}
	return out
}
