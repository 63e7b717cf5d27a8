package cli

import (
	"bytes"
	"fmt"
	"io"
	"slices"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/model"
	"zmix/ui"
)

func (a *app) cmdOpen(g *globalOpts, args []string) error {
	flags := newFlagSet("zmix open")
	g.register(flags, true)
	rest, err := parseFlags(flags, args, true)
	if err != nil {
		return err
	}
	switch len(rest) {
	case 0:
		return badInput("the blend file is missing; give one, e.g. zmix open line3.json (zmix with no arguments opens the demo)")
	case 1:
	default:
		return badInput("one blend file at a time; got %d: %s", len(rest), strings.Join(rest, " "))
	}
	return a.openWorkbench(g, rest[0])
}

// openWorkbench starts the workbench on blendFile, or on the saved state
// or the demo when blendFile is "". Where the workbench cannot run (no
// terminal) the readout of the same blend is printed instead, so that zmix
// always answers, in a pipe too.
func (a *app) openWorkbench(g *globalOpts, blendFile string) error {
	cat, err := g.catalogue()
	if err != nil {
		return err
	}
	// Check the file before the screen is taken over, so that a bad file
	// gets the same one-line error as everywhere else.
	src, err := workbenchBlend(blendFile)
	if err != nil {
		return err
	}
	if a.isTerminal(a.stdout) {
		if err := a.workbench(ui.Config{Catalogue: cat, BlendFile: blendFile, ASCII: g.ascii, NoColor: g.noColor}); err != nil {
			return ioFailure(fmt.Errorf("workbench: %v", err))
		}
		return nil
	}
	fmt.Fprintln(a.stderr, "zmix: standard output is not a terminal, so the workbench cannot open; printing the readout instead")
	return a.printFileReadout(cat, g, src)
}

// workbenchBlend loads the blend file the workbench was asked to open, or
// the built-in demo.
func workbenchBlend(path string) (*blendSource, error) {
	if path == "" {
		demo := mixtures.DemoFile()
		b, err := demo.Parse()
		if err != nil {
			return nil, fmt.Errorf("the built-in demo blend: %v", err)
		}
		return &blendSource{blend: b, file: demo, path: "built-in demo"}, nil
	}
	return openBlendFile("", path)
}

// printFileReadout prints what `zmix state --blend @FILE` prints.
func (a *app) printFileReadout(cat *model.Catalogue, g *globalOpts, src *blendSource) error {
	if src.file.Temperature == "" {
		return badInput("%s holds no temperature; zmix state --blend @%s --temp T --pres P gives its readout", src.path, src.path)
	}
	cfg, err := stateConditions(src, src.file.Temperature, src.file.Pressure, src.file.StandardPressure)
	if err != nil {
		return err
	}
	cfg.ascii = g.ascii
	return a.printState(cat, cfg)
}

func (a *app) cmdHelp(g *globalOpts, args []string) error {
	out := a.stdout
	if g.ascii || slices.Contains(args, "--ascii") || slices.Contains(args, "-ascii") {
		out = &report.ASCIIWriter{W: a.stdout}
		args = slices.DeleteFunc(args, func(s string) bool { return s == "--ascii" || s == "-ascii" })
	}
	switch len(args) {
	case 0:
		usageMain(out)
		return nil
	case 1:
		if h := args[0]; h == "--help" || h == "-help" || h == "-h" || h == "--h" {
			usageHelp(out)
			return nil
		}
		c, ok := lookupCommand(args[0])
		if !ok {
			if near := nearCommand(args[0]); near != "" {
				return badInput("no help on %s; did you mean %s? The commands are %s", model.Quote(args[0]), near, commandNames())
			}
			return badInput("no help on %s; the commands are %s", model.Quote(args[0]), commandNames())
		}
		c.usage(out)
		return nil
	}
	return badInput("help takes one command name at most; the commands are %s", commandNames())
}

func usageMain(w io.Writer) {
	var b bytes.Buffer
	b.WriteString(`zmix: the state of an ideal-gas mixture, from molecular partition functions

Usage:
  zmix [--ascii] [--no-color] [--species FILE]     open the workbench where you left it
                                                   (the built-in demo blend the first time)
  zmix open FILE                                   open the workbench on a saved blend file
  zmix COMMAND [flags]

Commands:
`)
	width := 0
	for _, c := range commands {
		width = max(width, len(c.name))
	}
	for _, c := range commands {
		fmt.Fprintf(&b, "  %-*s  %s\n", width, c.name, c.summary)
	}
	b.WriteString(`
Flags for every command:
  --species FILE   merge the species of FILE over the built-in catalogue (repeatable)
  --ascii          plain ASCII output (also ZMIX_ASCII=1)
  --no-color       no colour in the workbench (also NO_COLOR=1)

Examples:
  zmix state --blend "N2 78.08%, O2 20.95%, Ar 0.93%, CO2 0.04%" --temp 25C --pres 1atm
  zmix sweep --blend "SiH4 2%, H2 500ppm, N2 bal" --temp 300..900K --pres 2barg --steps 7
  zmix state --blend "H2O dew -40C, air bal" --temp 25C --pres 8bar
  zmix catalog SF6

Run zmix COMMAND --help for a command's flags. Exit status: 0 done, 1 a file or
the terminal could not be read or written, 2 the input was wrong.
`)
	w.Write(b.Bytes())
}

func usageOpen(w io.Writer) {
	io.WriteString(w, `Usage: zmix open [--ascii] [--no-color] [--species FILE] FILE

Opens the workbench on a saved blend file (JSON, format "zmix-blend/1"; see
the README). Without a terminal it prints the file's readout instead, as
zmix state --blend @FILE does.

Examples:
  zmix open line3-nitride.json
  zmix open --ascii --no-color line3-nitride.json
`)
}

func usageHelp(w io.Writer) {
	io.WriteString(w, `Usage: zmix help [COMMAND]

Shows the overview, or the flags and examples of one command.

Examples:
  zmix help
  zmix help sweep
`)
}
