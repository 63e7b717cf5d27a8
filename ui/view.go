package ui

import (
	"fmt"
	"path/filepath"
	"strings"

	"github.com/charmbracelet/lipgloss"

	"zmix/mixtures/report"
	"zmix/model"
)

// View draws the whole screen. It only puts together what Update and
// SetSize prepared.
func (r *root) View() string {
	if r.width <= 0 || r.height <= 0 {
		return ""
	}
	if r.lay.kind == layoutTooSmall {
		return r.tooSmallView()
	}
	var sb strings.Builder
	sb.Grow(r.width * r.height * 2)
	sb.WriteString(r.tabBar())
	sb.WriteByte('\n')
	sb.WriteString(r.body())
	for _, l := range r.safety {
		sb.WriteByte('\n')
		sb.WriteString(fitLine(l, r.width))
	}
	sb.WriteByte('\n')
	sb.WriteString(r.bottomLine())
	return compactSGR(sb.String())
}

func (r *root) tooSmallView() string {
	msg := fmt.Sprintf("zmix needs a terminal of at least %d×%d; this one is %d×%d. Enlarge the window or use a smaller font. q quits.",
		minWidth, minHeight, r.width, r.height)
	lines := report.Wrap(r.c.Text(msg), r.width)
	if len(lines) > r.height {
		lines = lines[:r.height]
	}
	for i, l := range lines {
		lines[i] = truncate(l, r.width)
	}
	return strings.Join(lines, "\n")
}

func (r *root) tabBar() string {
	left := r.tabs(false)
	if lipgloss.Width(left) > r.width {
		// Too narrow for every name: the other tabs keep their numbers,
		// so that the focused one, named, is never cut off.
		left = r.tabs(true)
	}
	if in := r.b.in; in.Valid() {
		right := r.c.Text(report.Short(in.TempK, 6) + " K · " + r.b.presShown(in.PresPa))
		if gap := r.width - lipgloss.Width(left) - lipgloss.Width(right) - 1; gap >= 2 {
			return left + strings.Repeat(" ", gap) + r.c.Styles.Muted.Render(right) + " "
		}
	}
	return fitLine(left, r.width)
}

// tabs is the tab row's left part: every pane's number and name, or with
// compact only the focused pane's name.
func (r *root) tabs(compact bool) string {
	s := r.c.Styles
	var sb strings.Builder
	sb.WriteString(s.Title.Render("zmix"))
	sb.WriteString(s.Muted.Render(r.c.Text(" ·")))
	for id := range r.panes {
		label := fmt.Sprintf("%d %s", id+1, paneID(id).name())
		switch {
		case paneID(id) == r.focus:
			sb.WriteString(s.TabActive.Render(" [" + label + "]"))
		case compact:
			sb.WriteString(s.Tab.Render(fmt.Sprintf(" %d", id+1)))
		default:
			sb.WriteString(s.Tab.Render("  " + label + " "))
		}
	}
	return sb.String()
}

// paneTitle is a pane's frame title: its number and its own title.
func (r *root) paneTitle(id paneID) string {
	return fmt.Sprintf("%d %s", id+1, r.panes[id].Title())
}

func (r *root) paneFrame(id paneID) string {
	p := r.panes[id]
	above, below := p.More()
	return frame(r.c, r.paneTitle(id), p.View(), r.lay.boxes[id], id == r.focus, above, below)
}

// body draws the panes of the layout, or an overlay in their place.
func (r *root) body() string {
	l := &r.lay
	if r.overlay != overlayNone {
		above, below := r.overlayScroll.more()
		f := frame(r.c, r.overlayTitle(), r.overlayScroll.view(), r.overlayBox(), true, above, below)
		return lipgloss.PlaceHorizontal(r.width, lipgloss.Center, f)
	}
	if l.kind == layoutSingle && len(l.leftPanes) == 0 {
		f := r.paneFrame(r.focus)
		if l.headline {
			f += "\n" + r.headlineLine()
		}
		return f
	}
	var left, right []string
	for _, id := range l.leftPanes {
		left = append(left, strings.Split(r.paneFrame(id), "\n")...)
	}
	if l.kind == layoutSingle {
		left = append(left, r.headlineLine())
	}
	for _, id := range l.right {
		right = append(right, strings.Split(r.paneFrame(id), "\n")...)
	}
	var sb strings.Builder
	rw := r.width - l.leftW
	for i := 0; i < l.bodyH; i++ {
		if i > 0 {
			sb.WriteByte('\n')
		}
		if i < len(left) {
			sb.WriteString(left[i])
		} else {
			sb.WriteString(strings.Repeat(" ", l.leftW))
		}
		if rw <= 0 {
			continue
		}
		if i < len(right) {
			sb.WriteString(right[i])
		} else {
			sb.WriteString(strings.Repeat(" ", rw))
		}
	}
	return sb.String()
}

// headlineLine is the key figures in one line, from the pane that has them.
func (r *root) headlineLine() string {
	for _, p := range r.panes {
		if h, ok := p.(headlinePane); ok {
			return h.headline(r.width)
		}
	}
	return fitLine("", r.width)
}

// bottomLine is the prompt while one is open, else the status line: the
// last message or the file's state on the left, keys on the right.
func (r *root) bottomLine() string {
	s := r.c.Styles
	t := r.c.Text
	bar := s.StatusBar
	if r.prompt == promptNone && r.status != "" && r.statusErr {
		bar = s.Error
	}
	if r.prompt != promptNone {
		bar = s.Prompt
	}
	if wrapped := r.bottomWrapped(); len(wrapped) > 0 {
		out := make([]string, r.statusRows)
		for i := range out {
			l := ""
			if i < len(wrapped) {
				l = wrapped[i]
			}
			out[i] = bar.Render(fitLine(" "+l, r.width))
		}
		return strings.Join(out, "\n")
	}
	if r.prompt != promptNone {
		return fitLine(r.promptLine(), r.width)
	}
	right := r.keysReminder()
	var left string
	switch {
	case r.status != "":
		left = t(" " + r.status)
	default:
		left = " " + r.fileState()
		room := r.width - lipgloss.Width(right)
		sep := t(" │ ")
		for _, b := range r.focused().ShortHelp() {
			h := b.Help()
			desc, _, _ := strings.Cut(h.Desc, ":")
			if f := strings.Fields(desc); len(f) > 1 && !strings.Contains(h.Desc, ":") {
				desc = f[0]
			}
			hint := sep + r.c.KeyText(h.Key) + " " + t(desc)
			if lipgloss.Width(left)+lipgloss.Width(hint) > room {
				break
			}
			left += hint
			sep = t(" · ")
		}
	}
	room := r.width - lipgloss.Width(right)
	if room < 20 {
		return bar.Render(fitLine(left, r.width))
	}
	return bar.Render(fitLine(left, room) + right)
}

func (r *root) fileState() string {
	if r.blendPath == "" {
		return r.c.Text("no file, autosaved")
	}
	name := model.Printable(filepath.Base(r.blendPath))
	if r.unsaved {
		return name + " (changed)"
	}
	return name
}
