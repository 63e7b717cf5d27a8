package ui

import (
	"strings"

	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/mixtures/safety"
)

// maxSafetyClassLines bounds the strip's list of hazard classes; the full
// texts are one key away.
const maxSafetyClassLines = 2

// safetyLines is the strip that stays on screen while any caution applies:
// the hazard classes with their species, then the line that defers to the
// site's codes, the data sheets and licensed practice, never cut.
//
// The model's validity cautions (a species near condensing, real-gas
// effects) get a line of their own at the top, so that they stay in sight
// whichever pane is shown.
func safetyLines(c *Common, cautions []mixtures.Caution, notes []mixtures.StateNote, w int) []string {
	notes = cautionNotes(notes)
	if len(cautions) == 0 && len(notes) == 0 || w <= 0 {
		return nil
	}
	s := c.Styles
	var out []string
	if len(notes) > 0 {
		out = append(out, s.Caution.Render(c.shorten(validityMarker(c, notes), w)))
	}
	if len(cautions) == 0 {
		for _, l := range report.Wrap(c.Text(mixtures.DeferLine), w) {
			out = append(out, s.Warning.Render(l))
		}
		return out
	}
	parts := make([]string, len(cautions))
	for i, ca := range cautions {
		parts[i] = ca.Title
		if len(ca.Species) > 0 {
			parts[i] += " (" + strings.Join(ca.Species, ", ") + ")"
		}
	}
	head := "SAFETY: " + strings.Join(parts, " · ") + "  [" + c.Keys.Safety.Help().Key + " details]"
	classes := report.Wrap(c.Text(head), w)
	if len(classes) > maxSafetyClassLines {
		classes = classes[:maxSafetyClassLines]
		last := []rune(classes[maxSafetyClassLines-1])
		more := c.Text("…") + " [" + c.Keys.Safety.Help().Key + "]"
		cut := max(0, min(len(last), w-len([]rune(more))))
		classes[maxSafetyClassLines-1] = string(last[:cut]) + more
	}
	for _, l := range classes {
		out = append(out, s.Caution.Render(l))
	}
	for _, l := range report.Wrap(c.Text(mixtures.DeferLine), w) {
		out = append(out, s.Warning.Render(l))
	}
	return out
}

// validityMarker names the species the model's cautions concern, ahead
// of the first caution's text: "MODEL CAUTION (NH3): T is within ...".
func validityMarker(c *Common, notes []mixtures.StateNote) string {
	var who []string
	seen := map[string]bool{}
	for _, n := range notes {
		name := n.Species
		if name == "" {
			name = "blend"
		}
		if !seen[name] {
			seen[name] = true
			who = append(who, name)
		}
	}
	head := "MODEL CAUTION"
	if len(notes) > 1 {
		head = "MODEL CAUTIONS"
	}
	// A note reads "figure: consequence"; the marker gives the consequence
	// ("a cooler spot or a compression may condense it"), the overlay all.
	text := notes[0].Text
	if i := strings.LastIndex(text, ": "); i >= 0 {
		text = text[i+2:]
	}
	return head + " (" + strings.Join(who, ", ") + ") [" + c.Keys.Safety.Help().Key + " details]: " + text
}

// safetyDetail is the full text of every caution, for the overlay: the
// model's validity cautions first, then the hazard classes.
func safetyDetail(c *Common, cautions []mixtures.Caution, notes []mixtures.StateNote, hz *safety.Result, w int) []string {
	s := c.Styles
	var out []string
	notes = cautionNotes(notes)
	// Each text is a bullet, wrapped under itself.
	bullet := func(text string) {
		for i, l := range report.Wrap(c.Text(text), w-2) {
			if i == 0 {
				out = append(out, s.Caution.Render("* "+l))
			} else {
				out = append(out, "  "+l)
			}
		}
	}
	for _, n := range notes {
		bullet(report.NoteText(n))
	}
	if len(notes) > 0 {
		out = append(out, "")
	}
	if len(cautions) == 0 {
		return append(out, s.Muted.Render(c.Text("No hazard class applies to this blend at this pressure. Gases still call for the care of the data sheets.")))
	}
	for _, ca := range cautions {
		bullet(mixtures.FormatCaution(ca))
	}
	out = append(out, "")
	out = append(out, hazardDetail(c, hz, w)...)
	for _, l := range report.Wrap(c.Text(mixtures.DeferLine), w) {
		out = append(out, s.Warning.Render(l))
	}
	return out
}

// hazardDetail is the recipe's classification (flammable limits, ISO 10156,
// GHS) as zmix hazard prints it: label and verdict, wrapped under the
// label when the overlay is narrow.
func hazardDetail(c *Common, hz *safety.Result, w int) []string {
	if hz == nil {
		return nil
	}
	s := c.Styles
	out := []string{s.Caution.Render(c.Text("Classification (zmix hazard gives the methods and sources)"))}
	for _, row := range report.HazardLines(hz) {
		for i, l := range report.Wrap(c.Text(row[0]+": "+row[1]), w-4) {
			if i == 0 {
				out = append(out, "  "+l)
			} else {
				out = append(out, "    "+l)
			}
		}
	}
	if hz.Recalled {
		for _, l := range report.Wrap(c.Text("Rests on recalled figures (\"from memory\"): check them against the SDS."), w-2) {
			out = append(out, "  "+s.Muted.Render(l))
		}
	}
	out = append(out, "")
	// Each component's figures, where the overlay is wide enough for the
	// table: it is not wrapped, which would tear its columns apart.
	table := report.SpeciesFigureLines(hz.Figures)
	fits := true
	for i, l := range table {
		table[i] = c.Text(l)
		fits = fits && lipgloss.Width(table[i]) <= w
	}
	if len(table) > 0 && fits {
		out = append(out, s.Caution.Render(table[0]))
		out = append(append(out, table[1:]...), "")
	} else if len(table) > 0 {
		out = append(out, s.Muted.Render(c.Text("(zmix hazard lists each component's figures)")), "")
	}
	return out
}
