package ui

import (
	"strconv"
	"strings"

	"github.com/charmbracelet/bubbles/key"
	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures"
	"zmix/mixtures/report"
)

// refresh lays the pane out and builds the lines View returns. It runs at
// the end of every Update that changed something, never in View.
func (p *sweepPane) refresh() {
	w, h := p.w, p.h
	if w <= 0 || h <= 0 {
		p.view = ""
		return
	}
	// Every line is packed or wrapped to the width, never cut mid-word.
	top := p.pack(w, "  ", p.settingsParts()...)
	top = append(top, p.errorLines(w)...)
	top = append(top, p.pack(w, "  ", p.propertyParts()...)...)
	bottom := append(p.readoutLines(w), p.statusLines(w)...)

	// The legend says which curves lie under others, which depends on the
	// chart's size, which depends on the legend's lines: settle it in two
	// passes at most.
	for pass := 0; pass < 2; pass++ {
		rows := max(h-len(top)-len(bottom), 0)
		if rows == p.chartRows && w == p.plot.w {
			break
		}
		p.chartRows = rows
		p.plot.setSize(w, rows)
		bottom = append(p.readoutLines(w), p.statusLines(w)...)
	}
	rows := p.chartRows
	lines := top
	if chart := p.plot.view(); chart != nil {
		lines = append(lines, chart...)
	} else if rows > 0 {
		lines = append(lines, p.c.Styles.Muted.Render(p.c.Text(p.emptyText())))
		for i := 1; i < rows; i++ {
			lines = append(lines, "")
		}
	}
	lines = append(lines, bottom...)

	out := make([]string, 0, h)
	for _, l := range lines {
		if len(out) == h {
			break
		}
		out = append(out, fitLine(l, w))
	}
	blank := strings.Repeat(" ", w)
	for len(out) < h {
		out = append(out, blank)
	}
	p.view = strings.Join(out, "\n")
}

// emptyText says why there is no plot.
func (p *sweepPane) emptyText() string {
	switch {
	case p.plot.hasData:
		return "enlarge the pane to see the plot"
	case p.running:
		return "sweeping..."
	case p.runErr != "":
		return "no plot: the sweep failed (see below)"
	case p.result != nil:
		return "nothing to plot: no finite values"
	case !p.haveIn || !p.in.Valid():
		return "no valid blend to sweep yet"
	}
	return "no sweep yet"
}

// settingsParts show the sweep: variable and range, points, grid and the
// value held fixed. While editing, the field being typed in is bracketed.
func (p *sweepPane) settingsParts() []string {
	st := p.c.Styles
	vi := p.vi()
	values := [sweepFieldCount]string{p.drafts[vi][0], p.drafts[vi][1], p.stepsDraft}
	field := func(i int) string {
		if p.editing && i == p.focus {
			return "[" + st.Edit.Render(p.fields[i].view(24)) + "]"
		}
		v := values[i]
		if p.editing {
			v = p.fields[i].value()
		}
		s := st.Value.Render(p.c.Text(v))
		if p.errs[i] != "" {
			s += st.Error.Render("!")
		}
		return s
	}
	label := func(s string) string { return st.Label.Render(s) }
	grid := "linear grid"
	if p.sweep.Log || p.sweep.Var == mixtures.SweepPressure {
		grid = "log grid"
	}
	parts := []string{
		label("sweep ") + st.Value.Render(p.set.Var.Key()) + label("  from ") + field(sweepFieldFrom) + label(" to ") + field(sweepFieldTo),
		field(sweepFieldSteps) + label(" points"),
		label(grid),
	}
	if p.haveIn && p.in.Valid() {
		var held string
		switch {
		case p.sweep.Var == mixtures.SweepPressure:
			held = "at T = " + report.Short(p.in.TempK, 6) + " K"
		case p.b != nil:
			held = "at P = " + p.b.presShown(p.in.PresPa)
		default:
			held = "at P = " + report.PressureIn(p.in.PresPa, mixtures.BarAbsolute)
		}
		parts = append(parts, st.Muted.Render(held))
	}
	return parts
}

// pack joins parts (which may hold styles) with sep into lines of at most
// w cells, starting a new line where the next part does not fit, so that
// no part is cut; ASCII mode spells out each part first.
func (p *sweepPane) pack(w int, sep string, parts ...string) []string {
	var lines []string
	line, width := "", 0
	for _, part := range parts {
		part = p.c.Text(part)
		pw := lipgloss.Width(part)
		if width > 0 && width+len(sep)+pw > w {
			lines = append(lines, line)
			line, width = "", 0
		}
		if width > 0 {
			line += sep
			width += len(sep)
		}
		line += part
		width += pw
	}
	return append(lines, line)
}

// errorLines are the error of the typed range, wrapped, or none.
func (p *sweepPane) errorLines(w int) []string {
	var e string
	if p.editing && p.errs[p.focus] != "" {
		e = p.errs[p.focus]
	}
	for _, fe := range p.errs {
		if e == "" {
			e = fe
		}
	}
	if e == "" {
		e = p.rangeErr
	}
	if e == "" {
		return nil
	}
	return p.styledWrap(p.c.Styles.Error, "! "+e, w)
}

// styledWrap wraps plain text to w cells, as drawn, in one style.
func (p *sweepPane) styledWrap(style lipgloss.Style, text string, w int) []string {
	lines := report.Wrap(p.c.Text(text), w)
	for i, l := range lines {
		lines[i] = style.Render(l)
	}
	return lines
}

// propertyParts show the properties, the chosen one bracketed, and which
// curves are drawn.
func (p *sweepPane) propertyParts() []string {
	st := p.c.Styles
	ascii := p.c.ASCII
	var b strings.Builder
	b.WriteString(st.Label.Render("plot "))
	cur := p.propIndex()
	for i := range sweepProps {
		if i > 0 {
			b.WriteByte(' ')
		}
		sym := sweepProps[i].sym(ascii)
		if i == cur {
			b.WriteString(st.Selected.Render("[" + sym + "]"))
		} else {
			b.WriteString(st.Muted.Render(sym))
		}
	}
	parts := []string{b.String()}
	if p.plotted != "" {
		parts = append(parts, st.Label.Render("of ")+st.Value.Render(p.plotted))
	}
	overlay := "off"
	if p.set.Overlay {
		overlay = "on"
	}
	return append(parts, st.Label.Render("overlay ")+st.Value.Render(overlay))
}

// readoutLines read the curves off at the cursor: the grid value, then
// each curve's legend picture, name and value, packed into lines of
// width w.
func (p *sweepPane) readoutLines(w int) []string {
	st := p.c.Styles
	if p.result == nil || len(p.series) == 0 {
		return nil
	}
	n := len(p.result.Grid)
	i := min(max(p.cursor, 0), n-1)
	prop := &sweepProps[p.propIndex()]
	head := "cursor " + p.xText(p.result.Grid[i]) + " (point " + strconv.Itoa(i+1) + " of " + strconv.Itoa(n) + ")"
	quantity := prop.sym(p.c.ASCII)
	if u := prop.unitText(p.c.ASCII); u != "" {
		quantity += " in " + u
	}
	var lines []string
	var line strings.Builder
	width := 0
	add := func(plain, styled string) {
		ew := lipgloss.Width(plain)
		if width > 0 && width+3+ew > w {
			lines = append(lines, line.String())
			line.Reset()
			width = 0
		}
		if width > 0 {
			line.WriteString("   ")
			width += 3
		}
		line.WriteString(styled)
		width += ew
	}
	add(head, st.Label.Render(head))
	add(quantity, st.Muted.Render(quantity))
	for k, s := range p.series {
		v := s.y(i)
		val := "not finite"
		if plotFinite(v) {
			val = report.Number(v, p.seriesDigits(k))
		}
		sample := plotSample(k, p.c.ASCII)
		under := ""
		if j := p.plot.coveredBy(k); j >= 0 && j < len(p.series) {
			under = " (under " + p.series[j].name + ")"
		}
		add(sample+" "+s.name+" "+val+under,
			st.Series[k%len(st.Series)].Render(sample)+" "+st.Label.Render(s.name)+" "+st.Value.Render(val)+st.Muted.Render(under))
	}
	return append(lines, line.String())
}

// statusLines are the news, wrapped: a failure, progress, a notice, or a
// reminder of the main keys (those that fit, whole).
func (p *sweepPane) statusLines(w int) []string {
	st := p.c.Styles
	switch {
	case p.runErr != "":
		return p.styledWrap(st.Error, "! sweep failed: "+p.runErr, w)
	case p.running && p.done > 0:
		pct := strconv.Itoa(int(100 * float64(p.done) / float64(max(p.total, 1))))
		return p.styledWrap(st.Muted, "sweeping: "+strconv.Itoa(p.done)+" of "+strconv.Itoa(p.total)+" points ("+pct+" %)", w)
	case p.running:
		return p.styledWrap(st.Muted, "sweeping "+strconv.Itoa(p.total)+" points...", w)
	case p.note != "":
		return p.styledWrap(st.Warning, p.note, w)
	case !p.editing && p.hasErrors():
		return p.styledWrap(st.Warning, "in force until the entry is fixed: "+p.set.From+" to "+p.set.To+", "+strconv.Itoa(p.set.Steps)+" points", w)
	case p.plotNote != "":
		return p.styledWrap(st.Warning, p.plotNote, w)
	}
	k := &p.c.Keys.Sweep
	if p.editing {
		return []string{p.hint(w, sweepHint{k.Apply, "apply"}, sweepHint{k.NextField, "next field"}, sweepHint{p.c.Keys.Back, "undo"})}
	}
	return []string{p.hint(w, sweepHint{k.EditRange, "range"}, sweepHint{k.Variable, "T/P"}, sweepHint{k.Property, "property"},
		sweepHint{k.CursorLeft, ""}, sweepHint{k.CursorRight, "cursor"}, sweepHint{k.NextSpecies, "species"}, sweepHint{k.Overlay, "overlay"})}
}

// sweepHint is a binding with the one word the status line gives it.
type sweepHint struct {
	b    key.Binding
	word string
}

// hint lists a few bindings as "key word" pairs; the key names come from
// the key map, so they follow any change of binding.
//
// A binding with no word shares the next one's ("←/h →/l cursor"). Hints
// that do not fit in w cells are left out whole, from the end.
func (p *sweepPane) hint(w int, hs ...sweepHint) string {
	var groups []string
	keys := ""
	for _, h := range hs {
		keys += p.c.KeyText(h.b.Help().Key)
		if h.word == "" {
			keys += " "
			continue
		}
		groups = append(groups, p.c.Text(keys+" "+h.word))
		keys = ""
	}
	line := ""
	for _, g := range groups {
		next := g
		if line != "" {
			next = line + "  " + g
		}
		if lipgloss.Width(next) > w {
			break
		}
		line = next
	}
	return p.c.Styles.Help.Render(line)
}
