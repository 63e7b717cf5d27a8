package ui

import (
	"strings"

	"github.com/charmbracelet/lipgloss"
)

// The smallest screen the workbench draws on, and the sizes from which it
// shows more panes at once.
const (
	minWidth, minHeight     = 64, 18
	splitWidth, splitHeight = 100, 24
	fullWidth, fullHeight   = 120, 36
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
	headline  bool     // single layout: a line of key figures under input panes
	boxes     []box    // by paneID
	visible   []bool   // by paneID
	leftPanes []paneID // top to bottom, split and full layouts
	right     []paneID
}

// computeLayout places the panes in a body of w × bodyH cells. Where a
// pane goes follows from its role in paneSpecs; only heights in a column
// are asked of the panes themselves.
//
// shared is the roleResultShared pane the full layout shows in place of
// the right column's last pane, or -1 for none.
func computeLayout(w, h, bodyH int, focus, viewer, shared paneID, panes []pane) layout {
	n := len(panes)
	l := layout{bodyH: bodyH, boxes: make([]box, n), visible: make([]bool, n)}
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
	var inputs, results, leftCol, rightCol, sharers []paneID
	for id := range panes {
		switch paneSpecs[id].role {
		case roleInput:
			inputs = append(inputs, paneID(id))
			leftCol = append(leftCol, paneID(id))
		case roleResultLeft:
			results = append(results, paneID(id))
			leftCol = append(leftCol, paneID(id))
		case roleResultShared:
			results = append(results, paneID(id))
			sharers = append(sharers, paneID(id))
		default:
			results = append(results, paneID(id))
			rightCol = append(rightCol, paneID(id))
		}
	}
	switch l.kind {
	case layoutSingle:
		// The inputs share the screen when there is room, with a line of
		// key figures under them; a result pane has the screen to itself.
		l.headline = !focus.isViewer()
		for _, id := range results {
			l.boxes[id] = box{w, bodyH}
		}
		if l.stack(inputs, w, bodyH-1, panes) >= 6 {
			if l.headline {
				l.leftW = w
				l.leftPanes = inputs
				for _, id := range inputs {
					l.visible[id] = true
				}
			}
		} else {
			for _, id := range inputs {
				l.boxes[id] = box{w, bodyH - 1}
			}
		}
		l.visible[focus] = true
	case layoutSplit:
		l.leftW = max(38, min(50, w*2/5))
		l.stack(inputs, l.leftW, bodyH, panes)
		for _, id := range results {
			l.boxes[id] = box{w - l.leftW, bodyH}
		}
		l.leftPanes = inputs
		l.right = []paneID{viewer}
		for _, id := range inputs {
			l.visible[id] = true
		}
		l.visible[viewer] = true
	case layoutFull:
		l.leftW = max(40, min(56, w*3/8))
		l.stack(leftCol, l.leftW, bodyH, panes)
		l.stack(rightCol, w-l.leftW, bodyH, panes)
		for id := range l.visible {
			l.visible[id] = true
		}
		// A shared pane takes the box of the right column's last pane,
		// shown in its place from when it is focused until that pane is.
		if len(rightCol) > 0 {
			last := rightCol[len(rightCol)-1]
			rightCol = append([]paneID(nil), rightCol...)
			for _, id := range sharers {
				l.boxes[id] = l.boxes[last]
				l.visible[id] = id == shared
				if id == shared {
					l.visible[last] = false
					rightCol[len(rightCol)-1] = id
				}
			}
		}
		l.leftPanes, l.right = leftCol, rightCol
	}
	return l
}

// stack gives the panes of one column, w wide, heights that fill avail
// rows: fixed heights first, then each flexible pane what it asks of the
// rows left (or an equal share), the last one the rest. It returns the
// smallest flexible height, so that a layout can see whether they fit.
func (l *layout) stack(ids []paneID, w, avail int, panes []pane) int {
	rest := avail
	var flex []paneID
	for _, id := range ids {
		if fh := paneSpecs[id].fixedH; fh > 0 {
			l.boxes[id] = box{w, fh}
			rest -= fh
		} else {
			flex = append(flex, id)
		}
	}
	smallest, left := rest, rest
	for i, id := range flex {
		h := left
		if i < len(flex)-1 {
			if hp, ok := panes[id].(heightPane); ok {
				h = hp.wantHeight(rest)
			} else {
				h = left / (len(flex) - i)
			}
		}
		l.boxes[id] = box{w, h}
		left -= h
		smallest = min(smallest, h)
	}
	return smallest
}

// frame draws a pane's border with its title in the top edge, and marks
// text hidden above or below. Focus shows in the title alone, bracketed
// and bright, so that moving it redraws one row of each pane rather than
// every row of two frames: every byte crosses SSH.
func frame(c *Common, title, body string, b box, focused, above, below bool) string {
	if b.w < 4 || b.h < 2 {
		return ""
	}
	s := c.Styles
	bd, edge := s.Border, s.Pane
	titleStyle, open, close := s.Label, " ", " "
	if focused {
		titleStyle, open, close = s.Title, "[", "]"
	}
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
	sb.WriteString(titleStyle.Render(open + t + close))
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

// sharedSlot is the pane a roleResultShared pane replaces in the full
// layout: the last result pane of the right column.
func sharedSlot() paneID {
	slot := paneID(-1)
	for id := range paneSpecs {
		if paneSpecs[id].role == roleResult {
			slot = paneID(id)
		}
	}
	return slot
}

// nextShared is which shared pane the full layout shows after focus moves
// to focus, from cur: the shared pane focused, none once its slot's own
// pane is focused, else as it was.
func nextShared(cur, focus paneID) paneID {
	switch {
	case paneSpecs[focus].role == roleResultShared:
		return focus
	case focus == sharedSlot():
		return -1
	}
	return cur
}
