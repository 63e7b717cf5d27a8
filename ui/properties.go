package ui

import (
	"strings"

	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures"
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
	return max(10, min(20+nSpecies, avail-16))
}

// readoutRow is one figure of the blend, per mole and per kilogram.
type readoutRow struct {
	label             string
	perMol, molUnit   string
	perKg, kgUnit     string
	shortLabel, extra string
}

// readoutRows formats the blend's figures with the same digits as the
// state command.
func (p *propertiesPane) readoutRows() []readoutRow {
	st := &p.b.state
	perKg := func(x float64) float64 { return st.PerKg(x) }
	jmk, jkk := "J/(mol·K)", "J/(kg·K)"
	return []readoutRow{
		{label: "molar mass M", shortLabel: "M", perMol: sig(1000*st.MolarMassKgPerMol, 6), molUnit: "g/mol"},
		{label: "density ρ", shortLabel: "ρ", perMol: sig(st.DensityKgPerM3, 5), molUnit: "kg/m³"},
		{label: "heat capacity Cp", shortLabel: "Cp", perMol: sig(st.CpJPerMolK, 5), molUnit: jmk, perKg: sig(perKg(st.CpJPerMolK), 5), kgUnit: jkk},
		{label: "heat capacity Cv", shortLabel: "Cv", perMol: sig(st.CvJPerMolK, 5), molUnit: jmk, perKg: sig(perKg(st.CvJPerMolK), 5), kgUnit: jkk},
		{label: "γ = Cp/Cv", shortLabel: "γ", perMol: sig(st.Gamma, 5)},
		{label: "speed of sound c", shortLabel: "c", perMol: sig(st.SoundSpeedMPerS, 5), molUnit: "m/s"},
		{label: "enthalpy H", shortLabel: "H", perMol: fixed(st.HJPerMol/1000, 3), molUnit: "kJ/mol", perKg: fixed(perKg(st.HJPerMol)/1000, 3), kgUnit: "kJ/kg"},
		{label: "internal energy U", shortLabel: "U", perMol: fixed(st.UJPerMol/1000, 3), molUnit: "kJ/mol", perKg: fixed(perKg(st.UJPerMol)/1000, 3), kgUnit: "kJ/kg"},
		{label: "entropy S", shortLabel: "S", perMol: sig(st.SJPerMolK, 6), molUnit: jmk, perKg: sig(perKg(st.SJPerMolK), 6), kgUnit: jkk},
		{label: "Gibbs energy G", shortLabel: "G", perMol: fixed(st.GJPerMol/1000, 3), molUnit: "kJ/mol", perKg: fixed(perKg(st.GJPerMol)/1000, 3), kgUnit: "kJ/kg"},
		{label: "Helmholtz energy A", shortLabel: "A", perMol: fixed(st.AJPerMol/1000, 3), molUnit: "kJ/mol", perKg: fixed(perKg(st.AJPerMol)/1000, 3), kgUnit: "kJ/kg"},
	}
}

// speciesCells formats one species with the same digits as the state command.
func speciesCells(b *bench, i int) []string {
	t := &b.state.Species[i]
	return []string{
		t.Species.Formula,
		sig(t.X, 4),
		sig(t.MassFrac, 4),
		sig(t.PartialPresPa/1000, 4),
		fixed(t.MuJPerMol/1000, 3),
		sig(t.SJPerMolK, 5),
		sig(t.CpJPerMolK, 4),
	}
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
		for _, l := range wrap(t(p.b.stateErr), p.w) {
			add(s.Error.Render(l))
		}
		return lines
	}
	in := p.b.in
	head := short(in.TempK, 6) + " K, " + p.b.presShown(in.PresPa) + ", P° " + p.b.stdText()
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
		for _, l := range wrap(t("last valid state: an entry has an error (see Recipe / Setpoint)"), p.w) {
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
		full = append(full, wrap(t("! "+noteLine(note)), p.w)...)
	}
	if len(lines)+len(full)+1+len(rows)+1+4+n <= p.h {
		for _, l := range full {
			add(s.Caution.Render(l))
		}
	} else {
		for _, note := range notes {
			add(s.Caution.Render(p.c.shorten("! "+noteLine(note), p.w)))
		}
	}
	oneCol := len(lines) + 1 + len(rows) + 1 + 4 + n
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
	p.mixingLine(lw+8, vw, add)
}

func (p *propertiesPane) mixingLine(lw, vw int, add func(string)) {
	s := p.c.Styles
	t := p.c.Text
	line := s.Label.Render(padRight("mixing entropy", lw)) + s.Value.Render(padLeft(sig(p.b.state.SMixJPerMolK, 5), vw)) + " " +
		s.Unit.Render(t("J/(mol·K)"))
	note := t("  −R Σ xᵢ ln xᵢ, part of S")
	if lipgloss.Width(line)+lipgloss.Width(note) > p.w {
		add(line)
		add(s.Muted.Render(strings.Repeat(" ", lw) + note))
		return
	}
	add(line + s.Muted.Render(note))
}

// speciesColumns are the table's headings and widths; mass goes first
// when the pane is narrow.
var speciesColumns = []struct {
	head, unit string
	width      int
}{
	{"species", "", 7}, {"x", "mol/mol", 10}, {"mass", "kg/kg", 10}, {"pᵢ", "kPa", 9},
	{"μᵢ", "kJ/mol", 10}, {"Sᵢ", "J/(mol·K)", 10}, {"Cpᵢ", "J/(mol·K)", 10},
}

func (p *propertiesPane) speciesTable(add func(string)) {
	s := p.c.Styles
	t := p.c.Text
	full := 0
	for _, c := range speciesColumns {
		full += c.width
	}
	skipMass := p.w < full
	add("")
	var h1, h2 strings.Builder
	for i, c := range speciesColumns {
		if skipMass && i == 2 {
			continue
		}
		if i == 0 {
			h1.WriteString(padRight(t(c.head), c.width))
			h2.WriteString(strings.Repeat(" ", c.width))
			continue
		}
		h1.WriteString(padLeft(t(c.head), c.width))
		h2.WriteString(padLeft(t(c.unit), c.width))
	}
	add(s.Label.Render(h1.String()))
	add(s.Unit.Render(h2.String()))
	for i := range p.b.state.Species {
		cells := speciesCells(p.b, i)
		var row strings.Builder
		for j, c := range speciesColumns {
			if skipMass && j == 2 {
				continue
			}
			if j == 0 {
				row.WriteString(padRight(t(cells[0]), c.width))
				continue
			}
			row.WriteString(padLeft(cells[j], c.width))
		}
		add(s.Value.Render(row.String()))
	}
	for _, l := range wrap(t("each species at its partial pressure pᵢ; μᵢ = μᵢ°(T) + RT ln(xᵢP/P°), elements at 0 K as zero"), p.w) {
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
	v := si * q.Scale
	if q.Digits.Decimals > 0 {
		return fixed(v, q.Digits.Decimals)
	}
	return sig(v, q.Digits.Sig)
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

// noteLine is a validity note as the state command writes it.
func noteLine(n mixtures.StateNote) string {
	if n.Species == "" {
		return n.Severity.String() + ": " + n.Text
	}
	return n.Severity.String() + ": " + n.Species + ": " + n.Text
}
