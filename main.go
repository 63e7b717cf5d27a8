package main

import (
	_ "github.com/NimbleMarkets/ntcharts/canvas"
	_ "github.com/charmbracelet/bubbles/key"
	_ "github.com/charmbracelet/bubbletea"
	_ "github.com/charmbracelet/lipgloss"
	_ "gonum.org/v1/gonum/unit/constant"
	_ "github.com/charmbracelet/x/exp/teatest"
)

func main() {}
