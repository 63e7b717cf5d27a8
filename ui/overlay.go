package ui

import (
	"strings"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"

	"zmix/mixtures"
	"zmix/mixtures/report"
)

// overlayKind is what covers the panes, if anything.
type overlayKind int

const (
	overlayNone overlayKind = iota
	overlayHelp
	overlaySafety
)

func (r *root) openOverlay(kind overlayKind) {
	r.overlay = kind
	r.overlayScroll.top()
	r.buildOverlay()
}

// overlayKey closes the overlay or scrolls it.
func (r *root) overlayKey(msg tea.KeyMsg) {
	k := r.c.Keys
	switch {
	case key.Matches(msg, k.Back), key.Matches(msg, k.Quit),
		r.overlay == overlayHelp && key.Matches(msg, k.Help),
		r.overlay == overlaySafety && key.Matches(msg, k.Safety):
		r.overlay = overlayNone
	default:
		scrollKeys(&r.overlayScroll, k.Scroll, msg)
	}
}

func (r *root) overlayBox() box {
	return box{min(r.width, 88), max(r.lay.bodyH, 3)}
}

// overlayTitle is the overlay's frame title.
func (r *root) overlayTitle() string {
	if r.overlay == overlaySafety {
		return "Safety reminders (esc closes)"
	}
	return "Keys: " + r.focus.name() + " (esc closes)"
}

func (r *root) buildOverlay() {
	bx := r.overlayBox()
	iw, ih := bx.inner()
	r.overlayScroll.setHeight(ih)
	if r.overlay == overlaySafety {
		r.overlayScroll.setLines(safetyDetail(r.c, r.b.cautions, r.b.notes, r.b.hazard, iw))
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
			// A description too long for the line goes on under itself.
			const keyW = 12
			for i, d := range report.Wrap(r.c.Text(h.Desc), iw-2-keyW-1) {
				k := strings.Repeat(" ", keyW)
				if i == 0 {
					k = s.HelpKey.Render(padRight(r.c.KeyText(h.Key), keyW))
				}
				lines = append(lines, "  "+k+" "+d)
			}
		}
		lines = append(lines, "")
	}
	section("In "+r.focus.name(), r.focused().KeyHelp())
	section("Everywhere", r.c.Keys.globalHelp())
	for _, text := range []string{
		"Amounts: 2%, 500 ppm, 0.3 (fraction), 30 wt%, 0.3 kg/kg, 0.2 bar (partial), bal",
		"T: K, C, F, R   P: " + mixtures.PressureUnits,
	} {
		for _, l := range report.Wrap(r.c.Text(text), iw) {
			lines = append(lines, s.Muted.Render(l))
		}
	}
	r.overlayScroll.setLines(lines)
}
