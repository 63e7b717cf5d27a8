package ui

import (
	"strings"

	"github.com/charmbracelet/lipgloss"
)

// paneID names the workbench's panes, in Tab order.
type paneID int

const (
	paneRecipe paneID = iota
	paneSetpoint
	paneProperties
	paneSweep
	paneAnatomy
	paneCount
)

// paneNames are the panes' names on screen; paneKeys name them in the
// saved state.
var (
	paneNames = [paneCount]string{"Recipe", "Setpoint", "Properties", "Sweep", "Anatomy"}
	paneKeys  = [paneCount]string{"recipe", "setpoint", "properties", "sweep", "anatomy"}
)

func paneByKey(s string) (paneID, bool) {
	for i, k := range paneKeys {
		if k == s {
			return paneID(i), true
		}
	}
	return 0, false
}

// isViewer reports whether a pane shows results rather than inputs.
func (id paneID) isViewer() bool {
	return id == paneProperties || id == paneSweep || id == paneAnatomy
}

// The smallest screen the workbench draws on, and the sizes from which it
// shows more panes at once.
const (
	minWidth, minHeight     = 64, 18
	splitWidth, splitHeight = 100, 24
	fullWidth, fullHeight   = 120, 36
	setpointBoxHeight       = 8
)

type layoutKind int

const (
	layoutTooSmall layoutKind = iota
	layoutSingle              // one pane at a time
	layoutSplit               // inputs on the left, one result pane on the right
	layoutFull                // every pane
)

// box is a pane's outer size on screen, frame included.
type box struct{ w, h int }

// inner is the size inside the frame, clamped at zero.
func (b box) inner() (int, int) { return max(b.w-2, 0), max(b.h-2, 0) }

type layout struct {
	kind      layoutKind
	bodyH     int
	leftW     int
	headline  bool // single layout: a line of key figures under input panes
	boxes     [paneCount]box
	visible   [paneCount]bool
	leftPanes []paneID // top to bottom, split and full layouts
	right     []paneID
}

// computeLayout places the panes in a body of w × bodyH cells.
func computeLayout(w, h, bodyH int, focus, viewer paneID, nEntries, nSpecies int) layout {
	l := layout{bodyH: bodyH}
	switch {
	case w < minWidth || h < minHeight || bodyH < 6:
		l.kind = layoutTooSmall
		return l
	case w >= fullWidth && h >= fullHeight && bodyH >= 24:
		l.kind = layoutFull
	case w >= splitWidth && h >= splitHeight && bodyH >= 14:
		l.kind = layoutSplit
	default:
		l.kind = layoutSingle
	}
	switch l.kind {
	case layoutSingle:
		// The inputs share the screen when there is room, with a line of
		// key figures under them; a result pane has the screen to itself.
		l.headline = !focus.isViewer()
		for _, id := range []paneID{paneProperties, paneSweep, paneAnatomy} {
			l.boxes[id] = box{w, bodyH}
		}
		if recipeH := bodyH - 1 - setpointBoxHeight; recipeH >= 6 {
			l.boxes[paneRecipe] = box{w, recipeH}
			l.boxes[paneSetpoint] = box{w, setpointBoxHeight}
			if l.headline {
				l.leftW = w
				l.leftPanes = []paneID{paneRecipe, paneSetpoint}
				l.visible[paneRecipe], l.visible[paneSetpoint] = true, true
			}
		} else {
			l.boxes[paneRecipe] = box{w, bodyH - 1}
			l.boxes[paneSetpoint] = box{w, bodyH - 1}
		}
		l.visible[focus] = true
	case layoutSplit:
		l.leftW = max(38, min(50, w*2/5))
		rw := w - l.leftW
		l.boxes[paneSetpoint] = box{l.leftW, setpointBoxHeight}
		l.boxes[paneRecipe] = box{l.leftW, bodyH - setpointBoxHeight}
		for _, id := range []paneID{paneProperties, paneSweep, paneAnatomy} {
			l.boxes[id] = box{rw, bodyH}
		}
		l.leftPanes = []paneID{paneRecipe, paneSetpoint}
		l.right = []paneID{viewer}
		l.visible[paneRecipe], l.visible[paneSetpoint], l.visible[viewer] = true, true, true
	case layoutFull:
		l.leftW = max(40, min(56, w*3/8))
		rw := w - l.leftW
		rest := bodyH - setpointBoxHeight
		recipeH := max(7, min(nEntries+5, rest/2))
		l.boxes[paneRecipe] = box{l.leftW, recipeH}
		l.boxes[paneSetpoint] = box{l.leftW, setpointBoxHeight}
		l.boxes[paneAnatomy] = box{l.leftW, rest - recipeH}
		// The readout takes what its one-column form needs, but leaves the
		// plot at least 16 rows.
		propsH := max(10, min(20+nSpecies, bodyH-16))
		l.boxes[paneProperties] = box{rw, propsH}
		l.boxes[paneSweep] = box{rw, bodyH - propsH}
		l.leftPanes = []paneID{paneRecipe, paneSetpoint, paneAnatomy}
		l.right = []paneID{paneProperties, paneSweep}
		for id := range l.visible {
			l.visible[id] = true
		}
	}
	return l
}

// frame draws a pane's border with its title in the top edge, and marks
// text hidden above or below. The focused pane has its own border shape,
// so that focus shows without colour.
func frame(c *Common, title, body string, b box, focused, above, below bool) string {
	if b.w < 4 || b.h < 2 {
		return ""
	}
	s := c.Styles
	bd, edge := s.Border, s.Pane
	titleStyle := s.Label
	if focused {
		bd, edge = s.FocusedBorder, s.FocusedPane
		titleStyle = s.Title
	}
	edge = lipgloss.NewStyle().Foreground(edge.GetForeground())
	iw, ih := b.inner()

	var sb strings.Builder
	sb.Grow((b.w + 16) * b.h)
	t := c.Text(title)
	if lipgloss.Width(t) > iw-4 {
		t = truncate(t, max(iw-4, 0))
	}
	tag := ""
	if above {
		tag = c.Text(" ↑ more ")
	}
	fill := iw - 1 - lipgloss.Width(t) - 2 - lipgloss.Width(tag)
	top := bd.TopLeft + bd.Top
	sb.WriteString(edge.Render(top))
	sb.WriteString(titleStyle.Render(" " + t + " "))
	sb.WriteString(edge.Render(strings.Repeat(bd.Top, max(fill, 0)) + tag + bd.TopRight))
	sb.WriteByte('\n')

	left, right := edge.Render(bd.Left), edge.Render(bd.Right)
	lines := strings.Split(body, "\n")
	for i := 0; i < ih; i++ {
		line := ""
		if i < len(lines) {
			line = lines[i]
		}
		sb.WriteString(left)
		sb.WriteString(fitLine(line, iw))
		sb.WriteString(right)
		sb.WriteByte('\n')
	}
	tag = ""
	if below {
		tag = c.Text(" ↓ more ")
	}
	sb.WriteString(edge.Render(bd.BottomLeft + strings.Repeat(bd.Bottom, max(iw-lipgloss.Width(tag), 0)) + tag + bd.BottomRight))
	return sb.String()
}
