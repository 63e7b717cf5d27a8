package report

import (
	"strings"

	"github.com/mattn/go-runewidth"
)

// minWrapWidth is the narrowest line Wrap lays out: below it a caller's
// width is a layout not yet known (0 or negative before the first window
// size), and one word per line serves better than nothing.
const minWrapWidth = 8

// Wrap breaks plain text into lines of at most width cells at spaces; a
// word longer than a line is cut. Newlines start new lines. The work is
// linear in the length of s, whatever the width.
func Wrap(s string, width int) []string {
	width = max(width, minWrapWidth)
	var out []string
	for _, para := range strings.Split(s, "\n") {
		var line strings.Builder
		n := 0 // cells in line
		flush := func() {
			out = append(out, line.String())
			line.Reset()
			n = 0
		}
		words := strings.Fields(para)
		for _, word := range words {
			ww := Width(word)
			if ww > width {
				// Cut the word rune by rune, measuring each rune once.
				if n > 0 {
					flush()
				}
				for _, r := range word {
					rw := runewidth.RuneWidth(r)
					if n+rw > width && n > 0 {
						flush()
					}
					line.WriteRune(r)
					n += rw
				}
				continue
			}
			if n > 0 && n+1+ww > width {
				flush()
			}
			if n > 0 {
				line.WriteByte(' ')
				n++
			}
			line.WriteString(word)
			n += ww
		}
		if n > 0 || len(words) == 0 {
			flush()
		}
	}
	return out
}

// Width is the number of terminal cells plain text s takes.
func Width(s string) int {
	if isASCII(s) {
		return len(s) // the common case, and a sweep's every cell
	}
	return runewidth.StringWidth(s)
}
