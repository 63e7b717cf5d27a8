package ui

import (
	"strings"

	"zmix/mixtures"
)

// maxSafetyClassLines bounds the strip's list of hazard classes; the full
// texts are one key away.
const maxSafetyClassLines = 2

// safetyLines is the strip that stays on screen while any caution applies:
// the hazard classes with their species, then the line that defers to the
// site's codes, the data sheets and licensed practice, never cut.
func safetyLines(c *Common, cautions []mixtures.Caution, w int) []string {
	if len(cautions) == 0 || w <= 0 {
		return nil
	}
	s := c.Styles
	parts := make([]string, len(cautions))
	for i, ca := range cautions {
		parts[i] = ca.Title
		if len(ca.Species) > 0 {
			parts[i] += " (" + strings.Join(ca.Species, ", ") + ")"
		}
	}
	head := "SAFETY: " + strings.Join(parts, " · ") + "  [" + c.Keys.Safety.Help().Key + " details]"
	classes := wrap(c.Text(head), w)
	if len(classes) > maxSafetyClassLines {
		classes = classes[:maxSafetyClassLines]
		last := []rune(classes[maxSafetyClassLines-1])
		more := c.Text("…") + " [" + c.Keys.Safety.Help().Key + "]"
		cut := max(0, min(len(last), w-len([]rune(more))))
		classes[maxSafetyClassLines-1] = string(last[:cut]) + more
	}
	var out []string
	for _, l := range classes {
		out = append(out, s.Caution.Render(l))
	}
	for _, l := range wrap(c.Text(mixtures.DeferLine), w) {
		out = append(out, s.Warning.Render(l))
	}
	return out
}

// safetyDetail is the full text of every caution, for the overlay.
func safetyDetail(c *Common, cautions []mixtures.Caution, w int) []string {
	s := c.Styles
	if len(cautions) == 0 {
		return []string{s.Muted.Render(c.Text("No caution applies to this blend at this pressure. Gases still call for the care of the data sheets."))}
	}
	var out []string
	for _, ca := range cautions {
		for i, l := range wrap(c.Text(mixtures.FormatCaution(ca)), w-2) {
			if i == 0 {
				out = append(out, s.Caution.Render("* "+l))
			} else {
				out = append(out, "  "+l)
			}
		}
	}
	out = append(out, "")
	for _, l := range wrap(c.Text(mixtures.DeferLine), w) {
		out = append(out, s.Warning.Render(l))
	}
	return out
}
