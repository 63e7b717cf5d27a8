package ui

import "strings"

// scroller holds a pane's rendered lines and which of them are in view.
// Panes rebuild the lines when their data or size changes, never in View.
type scroller struct {
	lines  []string
	offset int
	height int
}

func (s *scroller) setLines(lines []string) {
	s.lines = lines
	s.clamp()
}

func (s *scroller) setHeight(h int) {
	s.height = max(h, 0)
	s.clamp()
}

func (s *scroller) clamp() {
	s.offset = max(0, min(s.offset, len(s.lines)-s.height))
}

func (s *scroller) scroll(by int) {
	s.offset += by
	s.clamp()
}

func (s *scroller) top()    { s.offset = 0 }
func (s *scroller) bottom() { s.offset = len(s.lines); s.clamp() }

// show brings lines first..last into view, first winning if they do not
// all fit.
func (s *scroller) show(first, last int) {
	if last >= s.offset+s.height {
		s.offset = last - s.height + 1
	}
	if first < s.offset {
		s.offset = first
	}
	s.clamp()
}

// view returns the lines in view, joined.
func (s *scroller) view() string {
	end := min(len(s.lines), s.offset+s.height)
	if s.offset >= end {
		return ""
	}
	return strings.Join(s.lines[s.offset:end], "\n")
}

// more reports lines hidden above and below, for the frame to show.
func (s *scroller) more() (above, below bool) {
	return s.offset > 0, s.offset+s.height < len(s.lines)
}
