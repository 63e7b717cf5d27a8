package report

import (
	"fmt"
	"io"
	"strings"
)

// Align says how a table column is aligned.
type Align int

const (
	Left Align = iota
	Right
)

// Table lays out text in aligned columns, measured as the writer will
// print them.
type Table struct {
	indent string
	gap    string
	aligns []Align
	rows   [][]string
}

// NewTable returns a table whose lines start with indent and whose columns
// are aligned as given (Left for any column not listed).
func NewTable(indent string, aligns ...Align) *Table {
	return &Table{indent: indent, gap: "  ", aligns: aligns}
}

// Row adds a row.
func (t *Table) Row(cells ...string) { t.rows = append(t.rows, cells) }

// Write writes the table to w, trailing spaces trimmed.
func (t *Table) Write(w io.Writer) {
	rows := make([][]string, len(t.rows))
	var widths []int
	for i, r := range t.rows {
		rows[i] = make([]string, len(r))
		for j, c := range r {
			c = ForWriter(w, c)
			rows[i][j] = c
			if j >= len(widths) {
				widths = append(widths, 0)
			}
			widths[j] = max(widths[j], Width(c))
		}
	}
	var b strings.Builder
	for _, r := range rows {
		b.Reset()
		b.WriteString(t.indent)
		for i, c := range r {
			if i > 0 {
				b.WriteString(t.gap)
			}
			pad := strings.Repeat(" ", widths[i]-Width(c))
			a := Left
			if i < len(t.aligns) {
				a = t.aligns[i]
			}
			switch {
			case a == Right:
				b.WriteString(pad + c)
			case i < len(r)-1:
				b.WriteString(c + pad)
			default:
				b.WriteString(c)
			}
		}
		fmt.Fprintln(w, strings.TrimRight(b.String(), " "))
	}
}

// PageWidth is where the prose of a readout wraps.
const PageWidth = 78

// WriteWrapped writes text wrapped at PageWidth, the first line after
// first and the rest after rest. Words are never cut: a readout is read
// in a pager or a file, where a long word may run past the margin.
func WriteWrapped(w io.Writer, first, rest, text string) {
	text = ForWriter(w, text)
	var line strings.Builder
	line.WriteString(first)
	width := Width(first)
	lineHasWord := false
	for _, word := range strings.Fields(text) {
		wl := Width(word)
		if lineHasWord && width+1+wl > PageWidth {
			fmt.Fprintln(w, line.String())
			line.Reset()
			line.WriteString(rest)
			width, lineHasWord = Width(rest), false
		}
		if lineHasWord {
			line.WriteByte(' ')
			width++
		}
		line.WriteString(word)
		width += wl
		lineHasWord = true
	}
	fmt.Fprintln(w, line.String())
}
