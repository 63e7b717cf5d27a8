// Package cli is zmix's shell commands, the scripting twin of the
// workbench: each command parses its flags into the engine's inputs
// (package mixtures and its sub-packages), and writes the result as text,
// JSON or CSV through package mixtures/report, the presentation the
// workbench shares. Errors reach the user as one line on stderr with an
// exit status (ExitOK, ExitFailure, ExitUsage).
//
// The package sits under ui because it is presentation; it imports ui
// only for the workbench's Config, to open the workbench from
// "zmix open". Package main hands Run the process's streams and
// environment and exits with what it returns.
//
// One file per command (cmd_NAME.go) holds its runner; usage.go holds the
// help texts, cli.go the shared flag parsing, app.go the command list and
// the exit statuses.
package cli
