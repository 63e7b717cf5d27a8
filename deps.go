package main

// These blank imports keep the workbench's libraries in go.mod until the
// ui package imports them itself; they add nothing the ui will not link.
import (
	_ "github.com/NimbleMarkets/ntcharts/canvas"
	_ "github.com/charmbracelet/bubbles/key"
	_ "github.com/charmbracelet/bubbletea"
	_ "github.com/charmbracelet/lipgloss"
)
