package ui

import "github.com/charmbracelet/lipgloss"

// Styles holds every lipgloss style of the workbench, in one place.
type Styles struct {
	Title      lipgloss.Style
	Pane       lipgloss.Style // the panes' frames
	Label      lipgloss.Style
	Value      lipgloss.Style
	Unit       lipgloss.Style
	Muted      lipgloss.Style
	Error      lipgloss.Style
	Warning    lipgloss.Style
	Caution    lipgloss.Style
	Help       lipgloss.Style
	StatusBar  lipgloss.Style
	Selected   lipgloss.Style
	PlotAxis   lipgloss.Style
	PlotCursor lipgloss.Style
	// Series styles tell overlaid curves apart; plots must also tell them
	// apart without colour (markers or line patterns).
	Series [4]lipgloss.Style

	// Frame glyphs, the same for every pane; the focused pane's title is
	// bracketed, so that focus shows without colour too.
	Border    lipgloss.Border
	TabActive lipgloss.Style
	Tab       lipgloss.Style
	HelpKey   lipgloss.Style
	Prompt    lipgloss.Style
	Edit      lipgloss.Style // a field being typed in
	Cursor    lipgloss.Style
}

// asciiBorder draws frames with ASCII only.
var asciiBorder = lipgloss.Border{Top: "-", Bottom: "-", Left: "|", Right: "|", TopLeft: "+", TopRight: "+", BottomLeft: "+", BottomRight: "+"}

// DefaultStyles builds the styles; mono drops all colour (NO_COLOR,
// monochrome terminals) and ascii uses ASCII-only borders.
func DefaultStyles(mono, ascii bool) *Styles {
	border := lipgloss.RoundedBorder()
	if ascii {
		border = asciiBorder
	}
	color := func(c string) lipgloss.TerminalColor {
		if mono {
			return lipgloss.NoColor{}
		}
		return lipgloss.Color(c)
	}
	s := &Styles{Border: border}
	s.Pane = lipgloss.NewStyle().Foreground(color("240"))
	s.Title = lipgloss.NewStyle().Bold(true).Foreground(color("37"))
	s.Label = lipgloss.NewStyle().Foreground(color("250"))
	s.Value = lipgloss.NewStyle().Bold(true)
	s.Unit = lipgloss.NewStyle().Foreground(color("244"))
	s.Muted = lipgloss.NewStyle().Foreground(color("242"))
	s.Error = lipgloss.NewStyle().Foreground(color("203")).Bold(true)
	s.Warning = lipgloss.NewStyle().Foreground(color("179"))
	s.Caution = lipgloss.NewStyle().Foreground(color("214")).Bold(true)
	s.Help = lipgloss.NewStyle().Foreground(color("246"))
	s.StatusBar = lipgloss.NewStyle().Reverse(true)
	s.Selected = lipgloss.NewStyle().Reverse(true)
	s.PlotAxis = lipgloss.NewStyle().Foreground(color("244"))
	s.PlotCursor = lipgloss.NewStyle().Foreground(color("214"))
	for i, c := range []string{"37", "170", "143", "75"} {
		s.Series[i] = lipgloss.NewStyle().Foreground(color(c))
	}
	s.TabActive = lipgloss.NewStyle().Bold(true).Foreground(color("37"))
	s.Tab = lipgloss.NewStyle().Foreground(color("246"))
	s.HelpKey = lipgloss.NewStyle().Bold(true).Foreground(color("37"))
	s.Prompt = lipgloss.NewStyle().Bold(true)
	// Bold rather than underline: lipgloss styles the spaces of underlined
	// text one by one, which would cut the cursor's own escape codes.
	s.Edit = lipgloss.NewStyle().Bold(true)
	s.Cursor = lipgloss.NewStyle().Reverse(true)
	return s
}
