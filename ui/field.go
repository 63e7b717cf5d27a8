package ui

import (
	"fmt"
	"strings"
	"unicode"

	"github.com/charmbracelet/bubbles/key"
	tea "github.com/charmbracelet/bubbletea"
	"github.com/charmbracelet/lipgloss"
	"github.com/muesli/termenv"

	"zmix/model"
)

// field is a one-line text entry with a cursor that does not blink, so
// that nothing ticks while the user reads. Where styles cannot be drawn
// (NO_COLOR, the ASCII profile) the cursor shows as a bar.
//
// bubbles' textinput would do, but it pulls in a clipboard module that is
// not among our dependencies, and we need none of its extras.
type field struct {
	c       *Common
	runes   []rune
	pos     int
	focused bool
	width   int
	// suggested marks text offered by zmix (a default file name): the first
	// typed character replaces it whole, and any edit key keeps it.
	suggested bool
	limit     int // the most characters the field holds
}

// maxFieldRunes bounds a field unless it sets a limit of its own, so that
// a runaway paste cannot grow it without end, nor make any later work
// (a wrap, a search) long.
const maxFieldRunes = 256

func newField(c *Common) field { return field{c: c, limit: maxFieldRunes} }

// newFieldLimit is a field that holds at most limit characters: what the
// engine accepts for its kind of entry.
func newFieldLimit(c *Common, limit int) field { return field{c: c, limit: limit} }

// noticeMsg is a remark for the status line from a part that has no
// place of its own to say it, such as a field that cut a paste.
type noticeMsg struct{ text string }

// start opens the field on value with the cursor at its end.
func (f *field) start(value string) {
	f.runes = []rune(value)
	if len(f.runes) > f.limit {
		f.runes = f.runes[:f.limit]
	}
	f.pos = len(f.runes)
	f.focused = true
	f.suggested = false
}

// suggest opens the field on a proposed value that typing replaces.
func (f *field) suggest(value string) {
	f.start(value)
	f.suggested = true
}

func (f *field) stop() { f.focused, f.suggested = false, false }

func (f *field) active() bool { return f.focused }

func (f *field) value() string { return string(f.runes) }

// setWidth sets the cells the field scrolls within; panes call it from
// SetSize.
func (f *field) setWidth(w int) { f.width = max(w, 1) }

// update edits the text by one key. It never gives a command.
func (f *field) update(msg tea.KeyMsg) tea.Cmd {
	k := f.c.Keys.Field
	if f.suggested {
		f.suggested = false
		if msg.Type == tea.KeyRunes || msg.Type == tea.KeySpace {
			f.runes, f.pos = f.runes[:0], 0
		}
	}
	switch {
	case key.Matches(msg, k.Left):
		f.pos = max(f.pos-1, 0)
	case key.Matches(msg, k.Right):
		f.pos = min(f.pos+1, len(f.runes))
	case key.Matches(msg, k.WordLeft):
		f.pos = f.wordStart()
	case key.Matches(msg, k.WordRight):
		f.pos = f.wordEnd()
	case key.Matches(msg, k.Home):
		f.pos = 0
	case key.Matches(msg, k.End):
		f.pos = len(f.runes)
	case key.Matches(msg, k.Backspace):
		if f.pos > 0 {
			f.runes = append(f.runes[:f.pos-1], f.runes[f.pos:]...)
			f.pos--
		}
	case key.Matches(msg, k.Delete):
		if f.pos < len(f.runes) {
			f.runes = append(f.runes[:f.pos], f.runes[f.pos+1:]...)
		}
	case key.Matches(msg, k.DeleteWord):
		start := f.wordStart()
		f.runes = append(f.runes[:start], f.runes[f.pos:]...)
		f.pos = start
	case key.Matches(msg, k.DeleteToStart):
		f.runes = f.runes[f.pos:]
		f.pos = 0
	case key.Matches(msg, k.DeleteToEnd):
		f.runes = f.runes[:f.pos]
	case msg.Type == tea.KeyRunes || msg.Type == tea.KeySpace:
		if lost := f.insert(msg.Runes); lost > 0 {
			text := fmt.Sprintf("this field holds at most %d characters; %d typed or pasted were left out", f.limit, lost)
			return func() tea.Msg { return noticeMsg{text} }
		}
	}
	return nil
}

// insert puts printable runes at the cursor, up to the field's limit; it
// returns how many it had to leave out.
func (f *field) insert(rs []rune) (lost int) {
	var clean []rune
	for _, r := range rs {
		switch {
		case r == '\n' || r == '\r' || r == '\t':
			clean = append(clean, ' ')
		case unicode.IsPrint(r):
			clean = append(clean, r)
		}
	}
	if room := max(f.limit-len(f.runes), 0); len(clean) > room {
		lost = len(clean) - room
		clean = clean[:room]
	}
	if len(clean) == 0 {
		return lost
	}
	tail := append([]rune{}, f.runes[f.pos:]...)
	f.runes = append(append(f.runes[:f.pos], clean...), tail...)
	f.pos += len(clean)
	return lost
}

func (f *field) wordStart() int {
	i := f.pos
	for i > 0 && unicode.IsSpace(f.runes[i-1]) {
		i--
	}
	for i > 0 && !unicode.IsSpace(f.runes[i-1]) {
		i--
	}
	return i
}

func (f *field) wordEnd() int {
	i := f.pos
	for i < len(f.runes) && unicode.IsSpace(f.runes[i]) {
		i++
	}
	for i < len(f.runes) && !unicode.IsSpace(f.runes[i]) {
		i++
	}
	return i
}

// view draws the field in at most w cells, keeping the cursor in sight.
func (f *field) view(w int) string {
	w = max(w, 2)
	// Text a field opens on came from a file or the state: made printable.
	rs := []rune(f.c.Text(model.Printable(string(f.runes))))
	pos := min(f.pos, len(rs))
	// The cursor needs a cell of its own after the text.
	start := 0
	if pos >= w {
		start = pos - w + 1
	}
	end := min(len(rs), start+w)
	before, at, after := string(rs[start:pos]), " ", ""
	if pos < end {
		at = string(rs[pos])
		after = string(rs[pos+1 : end])
	}
	if !f.focused {
		return string(rs[start:end])
	}
	if f.suggested {
		// The whole proposal is marked, so the user can see typing replaces it.
		if lipgloss.ColorProfile() == termenv.Ascii {
			return "[" + string(rs[start:end]) + "]"
		}
		return f.c.Styles.Selected.Render(string(rs[start:end]))
	}
	if lipgloss.ColorProfile() == termenv.Ascii {
		// No reverse video: a bar marks the cursor.
		return strings.TrimSuffix(before+"|"+at+after, " ")
	}
	// Each part is styled on its own: lipgloss does not nest styles.
	edit := f.c.Styles.Edit
	return edit.Render(before) + f.c.Styles.Cursor.Render(at) + edit.Render(after)
}
