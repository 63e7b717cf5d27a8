package cli

import (
	"errors"
	"fmt"
	"io"
	"slices"
	"strings"

	"zmix/mixtures/report"
	"zmix/model"
	"zmix/ui"
)

// Exit statuses: Run returns one of these.
const (
	ExitOK      = 0
	ExitFailure = 1 // reading or writing a file or the terminal failed
	ExitUsage   = 2 // the input was wrong; the message says how
)

// Outside is what the commands need from the world outside the process:
// its streams and environment, the workbench to open on a terminal, and
// the test of whether a stream is one. main passes the real ones; tests
// pass stand-ins.
type Outside struct {
	Stdout, Stderr io.Writer
	Getenv         func(string) string
	Workbench      func(ui.Config) error
	IsTerminal     func(io.Writer) bool
}

// Run runs zmix with args (without the program name) and returns its exit
// status: ExitOK, ExitFailure or ExitUsage. Every error has been reported
// on o.Stderr as one line by then.
func Run(args []string, o Outside) int {
	a := &app{stdout: o.Stdout, stderr: o.Stderr, getenv: o.Getenv, workbench: o.Workbench, isTerminal: o.IsTerminal}
	return a.run(args)
}

// app holds what a command needs from the outside world.
type app struct {
	stdout, stderr io.Writer
	getenv         func(string) string
	workbench      func(ui.Config) error
	isTerminal     func(io.Writer) bool
}

// command is one subcommand: its name, one-line summary and runner.
type command struct {
	name, summary string
	run           func(a *app, g *globalOpts, args []string) error
	usage         func(w io.Writer)
}

var commands []command

func init() {
	// Set here rather than in the declaration: help refers back to the list.
	commands = []command{
		{"state", "the full readout of a blend at one temperature and pressure", (*app).cmdState, usageState},
		{"sweep", "a blend's properties over a range of temperature or pressure", (*app).cmdSweep, usageSweep},
		{"flow", "convert a flow between molar, mass, actual and standard volume units", (*app).cmdFlow, usageFlow},
		{"compress", "compress or expand a blend: outlet temperature, work and power", (*app).cmdCompress, usageCompress},
		{"heat", "the duty to heat or cool a blend at constant pressure", (*app).cmdHeat, usageHeat},
		{"mix", "join streams adiabatically: outlet state and entropy generated", (*app).cmdMix, usageMix},
		{"dilute", "the diluent flow for a target level, or the level of a ratio", (*app).cmdDilute, usageDilute},
		{"purge", "purge cycles or time to bring a species down to a target", (*app).cmdPurge, usagePurge},
		{"hazard", "a blend's flammable limits, ISO 10156 and GHS classification", (*app).cmdHazard, usageHazard},
		{"release", "a blend released into a room: oxygen, % LFL and ppm at the peak", (*app).cmdRelease, usageRelease},
		{"cylinder", "a cylinder's contents with the real-gas Z, and its fill recipe", (*app).cmdCylinder, usageCylinder},
		{"throttle", "a blend throttled across a valve: the outlet temperature (real gas)", (*app).cmdThrottle, usageThrottle},
		{"weighed", "the composition of a cylinder filled by weight, with its uncertainty", (*app).cmdWeighed, usageWeighed},
		{"catalog", "the species list, or one species' data, sources and table", (*app).cmdCatalog, usageCatalog},
		{"open", "the workbench on a saved blend file", (*app).cmdOpen, usageOpen},
		{"help", "help on zmix or on one command", (*app).cmdHelp, usageHelp},
	}
}

// lookupCommand finds a command by name, in any letter case (State).
func lookupCommand(name string) (command, bool) {
	for _, c := range commands {
		if strings.EqualFold(c.name, name) {
			return c, true
		}
	}
	return command{}, false
}

// nearCommand returns the one command a mistyped name most likely meant:
// one sharing its first four letters or more (states, dilution,
// catalogue), or "catalog" for species; "" when there is no one.
func nearCommand(name string) string {
	name = strings.ToLower(name)
	if name == "species" {
		return "catalog"
	}
	var near []string
	for _, c := range commands {
		n := 0
		for n < len(name) && n < len(c.name) && name[n] == c.name[n] {
			n++
		}
		if n >= 4 {
			near = append(near, c.name)
		}
	}
	if len(near) != 1 {
		return ""
	}
	return near[0]
}

func commandNames() string {
	names := make([]string, len(commands))
	for i, c := range commands {
		names[i] = c.name
	}
	return strings.Join(names, ", ")
}

func (a *app) run(args []string) int {
	g := &globalOpts{}
	fs := newFlagSet("zmix")
	g.register(fs, true)
	rest, err := parseFlags(fs, args, false)
	// Help is output like any other: plain ASCII when asked for, by the
	// environment or by --ascii anywhere on the line (parsing stops at
	// --help, so a later --ascii is not parsed as a flag).
	helpOut := func() io.Writer {
		g.fromEnv(a.getenv)
		if g.ascii || slices.Contains(args, "--ascii") {
			return &report.ASCIIWriter{W: a.stdout}
		}
		return a.stdout
	}
	if errors.Is(err, errHelp) {
		usageMain(helpOut())
		return ExitOK
	}
	if err != nil {
		return a.fail("zmix", err)
	}
	g.fromEnv(a.getenv)
	if len(rest) == 0 {
		return a.fail("zmix", a.openWorkbench(g, ""))
	}
	c, ok := lookupCommand(rest[0])
	if !ok {
		if near := nearCommand(rest[0]); near != "" {
			return a.fail("zmix", badInput("unknown command %s; did you mean %s? The commands are %s (zmix --help shows them all)", model.Quote(rest[0]), near, commandNames()))
		}
		return a.fail("zmix", badInput("unknown command %s; the commands are %s (zmix --help shows them all)", model.Quote(rest[0]), commandNames()))
	}
	err = c.run(a, g, rest[1:])
	if errors.Is(err, errHelp) {
		c.usage(helpOut())
		return ExitOK
	}
	return a.fail("zmix "+c.name, err)
}

// cliError is an error with the exit status it calls for.
type cliError struct {
	code int
	msg  string
}

func (e *cliError) Error() string { return e.msg }

// badInput is an error in what the user typed or saved: exit status 2.
// Errors among args contribute their user's line, with no package prefix.
func badInput(format string, args ...any) error {
	return &cliError{ExitUsage, model.UserMessage(model.Errorf("", format, args...))}
}

// ioFailure is a file or terminal that could not be read or written:
// exit status 1.
func ioFailure(err error) error {
	return &cliError{ExitFailure, model.UserMessage(err)}
}

// fail reports err, if any, as one line on stderr and returns the exit
// status. Errors that did not come through badInput or ioFailure are
// taken as bad input: the engine's errors describe the input.
func (a *app) fail(prefix string, err error) int {
	if err == nil {
		return ExitOK
	}
	code := ExitUsage
	var ce *cliError
	if errors.As(err, &ce) {
		code = ce.code
	}
	// One line, and nothing in it that a terminal would act on: the
	// message may quote a file's contents.
	fmt.Fprintf(a.stderr, "%s: %s\n", prefix, model.Printable(model.UserMessage(err)))
	return code
}
