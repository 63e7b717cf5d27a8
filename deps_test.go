package main

// teatest is a test-only dependency of the workbench's golden screens;
// importing it here keeps it in go.mod without linking it into zmix.
import _ "github.com/charmbracelet/x/exp/teatest"
