// Command zmix computes the thermodynamic state of ideal-gas mixtures from
// molecular partition functions. With no arguments it opens the keyboard
// workbench; its commands give every figure to scripts:
//
//	zmix                      the workbench, on the built-in demo blend
//	zmix open FILE            the workbench, on a saved blend file
//	zmix state  --blend SPEC --temp T --pres P [--json | --csv]
//	zmix sweep  --blend SPEC (--temp A..B | --pres A..B) [--steps N] [--log]
//	zmix hazard --blend SPEC [--json]
//	zmix release --blend SPEC (--amount Q | --rate R) --room V [--ach N | --vent FLOW]
//	zmix catalog [FORMULA]
//
// main only hands the process's streams, environment and terminal to the
// commands (package ui/cli) and exits with the status they return: 0 done,
// 1 a file or the terminal failed, 2 the input was wrong. The physics lives
// in packages model and mixtures.
package main

import (
	"io"
	"os"

	"zmix/ui"
	"zmix/ui/cli"
)

func main() {
	os.Exit(cli.Run(os.Args[1:], cli.Outside{
		Stdout:     os.Stdout,
		Stderr:     os.Stderr,
		Getenv:     os.Getenv,
		Workbench:  ui.Run,
		IsTerminal: isTerminal,
	}))
}

// isTerminal reports whether w is a character device such as a terminal.
func isTerminal(w io.Writer) bool {
	f, ok := w.(*os.File)
	if !ok {
		return false
	}
	info, err := f.Stat()
	return err == nil && info.Mode()&os.ModeCharDevice != 0
}
