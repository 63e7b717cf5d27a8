package ui

import (
	"strconv"
	"strings"

	"github.com/charmbracelet/bubbles/key"
	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures"
)

// refresh lays the pane out and builds the lines View returns. It runs at
// the end of every Update that changed something, never in View.
func (p *sweepPane) refresh() {
	w, h := p.w, p.h
	if w <= 0 || h <= 0 {
		p.view = ""
		return
	}
	top := []string{p.settingsLine()}
	if e := p.errorLine(); e != "" {
		top = append(top, e)
	}
	top = append(top, p.propertyLine())
	bottom := append(p.readoutLines(w), p.statusLine())

	rows := max(h-len(top)-len(bottom), 0)
	if rows != p.chartRows || w != p.plot.w {
		p.chartRows = rows
		p.plot.setSize(w, rows)
	}
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
		// Typed text can hold any glyph; ASCII mode spells it out.
		out = append(out, fitLine(p.c.Text(l), w))
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

// settingsLine shows the sweep: variable, range, points, grid and the
// value held fixed. While editing, the field being typed in is bracketed.
func (p *sweepPane) settingsLine() string {
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
	line := label("sweep ") + st.Value.Render(p.set.Var.Key()) +
		label("  from ") + field(sweepFieldFrom) + label(" to ") + field(sweepFieldTo) +
		"  " + field(sweepFieldSteps) + label(" points") + "  " + label(grid)
	if p.haveIn && p.in.Valid() {
		held := "  at P = " + presText(p.in.PresPa)
		if p.in.Gauge {
			held += " abs"
		}
		if p.sweep.Var == mixtures.SweepPressure {
			held = "  at T = " + sig(p.in.TempK, 6) + " K"
		}
		line += st.Muted.Render(held)
	}
	return line
}

// errorLine is the error of the typed range, or "".
func (p *sweepPane) errorLine() string {
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
		return ""
	}
	return p.c.Styles.Error.Render(p.c.Text("! " + e))
}

// propertyLine shows the properties, the chosen one bracketed, and which
// curves are drawn.
func (p *sweepPane) propertyLine() string {
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
	of := "blend"
	if p.set.Species != "" {
		of = p.set.Species
	}
	b.WriteString(st.Label.Render("  of ") + st.Value.Render(p.c.Text(of)))
	overlay := "off"
	if p.set.Overlay {
		overlay = "on"
	}
	b.WriteString(st.Label.Render("  overlay ") + st.Value.Render(overlay))
	return b.String()
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
			val = sig(v, 5)
		}
		sample := plotSample(k, p.c.ASCII)
		add(sample+" "+s.name+" "+val,
			st.Series[k%len(st.Series)].Render(sample)+" "+st.Label.Render(s.name)+" "+st.Value.Render(val))
	}
	return append(lines, line.String())
}

// statusLine is the one line of news: a failure, progress, a notice, or
// a reminder of the main keys.
func (p *sweepPane) statusLine() string {
	st := p.c.Styles
	switch {
	case p.runErr != "":
		return st.Error.Render(p.c.Text("! sweep failed: " + p.runErr))
	case p.running && p.done > 0:
		pct := strconv.Itoa(int(100 * float64(p.done) / float64(max(p.total, 1))))
		return st.Muted.Render("sweeping: " + strconv.Itoa(p.done) + " of " + strconv.Itoa(p.total) + " points (" + pct + " %)")
	case p.running:
		return st.Muted.Render("sweeping " + strconv.Itoa(p.total) + " points...")
	case p.note != "":
		return st.Warning.Render(p.c.Text(p.note))
	case !p.editing && p.hasErrors():
		return st.Warning.Render(p.c.Text("in force until the entry is fixed: " + p.set.From + " to " + p.set.To + ", " + strconv.Itoa(p.set.Steps) + " points"))
	case p.plotNote != "":
		return st.Warning.Render(p.c.Text(p.plotNote))
	}
	k := &p.c.Keys.Sweep
	if p.editing {
		return p.hint(sweepHint{k.Apply, "apply"}, sweepHint{k.NextField, "next field"}, sweepHint{p.c.Keys.Back, "undo"})
	}
	return p.hint(sweepHint{k.EditRange, "range"}, sweepHint{k.Variable, "T/P"}, sweepHint{k.Property, "property"},
		sweepHint{k.NextSpecies, "species"}, sweepHint{k.Overlay, "overlay"}, sweepHint{k.CursorLeft, "cursor"}, sweepHint{k.CursorRight, ""})
}

// sweepHint is a binding with the one word the status line gives it.
type sweepHint struct {
	b    key.Binding
	word string
}

// hint lists a few bindings as "key word" pairs; the key names come from
// the key map, so they follow any change of binding.
func (p *sweepPane) hint(hs ...sweepHint) string {
	parts := make([]string, 0, len(hs))
	for _, h := range hs {
		s := p.c.KeyText(h.b.Help().Key)
		if h.word != "" {
			s += " " + h.word
		}
		parts = append(parts, s)
	}
	return p.c.Styles.Help.Render(p.c.Text(strings.Join(parts, "  ")))
}
