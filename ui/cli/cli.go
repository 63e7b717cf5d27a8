package cli

import (
	"bytes"
	"errors"
	"flag"
	"fmt"
	"io"
	"io/fs"
	"slices"
	"sort"
	"strconv"
	"strings"

	"zmix/mixtures"
	"zmix/mixtures/report"
	"zmix/model"
)

// errHelp is what parseFlags returns for -h or --help.
var errHelp = flag.ErrHelp

// globalOpts are the options every command shares: the display mode and
// the user's species files.
type globalOpts struct {
	ascii        bool
	noColor      bool
	speciesFiles []string
}

// fromEnv takes the defaults from the environment; flags given later win.
func (g *globalOpts) fromEnv(getenv func(string) string) {
	if v := strings.ToLower(strings.TrimSpace(getenv("ZMIX_ASCII"))); v != "" && v != "0" && v != "false" && v != "no" {
		g.ascii = true
	}
	// no-color.org: any non-empty value turns colour off.
	if getenv("NO_COLOR") != "" {
		g.noColor = true
	}
}

// register adds the shared flags to fs; the colour flag only matters where
// the workbench may open.
func (g *globalOpts) register(fs *flag.FlagSet, workbench bool) {
	fs.BoolVar(&g.ascii, "ascii", g.ascii, "plain ASCII output: no Greek letters, superscripts, braille or box drawing (also ZMIX_ASCII=1)")
	fs.Func("species", "merge the species of `FILE` over the built-in catalogue (may be repeated)", func(s string) error {
		if strings.TrimSpace(s) == "" {
			return errors.New("want the path of a species file")
		}
		g.speciesFiles = append(g.speciesFiles, s)
		return nil
	})
	if workbench {
		fs.BoolVar(&g.noColor, "no-color", g.noColor, "no colour in the workbench (also NO_COLOR=1)")
	}
}

// catalogue returns the built-in catalogue with the user's files merged
// over it, in the order given.
func (g *globalOpts) catalogue() (*model.Catalogue, error) {
	cat := model.Builtin()
	for _, path := range g.speciesFiles {
		next, err := cat.WithFile(path)
		if err != nil {
			var pe *fs.PathError
			if errors.As(err, &pe) {
				return nil, ioFailure(fmt.Errorf("--species %s: cannot read it: %v", path, pe.Err))
			}
			return nil, badInput("--species %s: %v", path, err)
		}
		if err := mixtures.CheckNamesFree(next); err != nil {
			return nil, badInput("--species %s: %s", path, model.UserMessage(err))
		}
		cat = next
	}
	return cat, nil
}

// helpAsked, when set (by a test), sees the flag set of a command asked
// for --help, so that its usage text can be checked against the flags it
// takes.
var helpAsked func(*flag.FlagSet)

func newFlagSet(name string) *flag.FlagSet {
	fs := flag.NewFlagSet(name, flag.ContinueOnError)
	fs.SetOutput(io.Discard) // errors are reported as one line by the caller
	fs.Usage = func() {}
	return fs
}

// parseFlags parses args into fs. With interleave, positional arguments may
// stand between flags ("catalog CO2 --std 1atm"); without, parsing stops at
// the first one (the command name after the global flags).
func parseFlags(fs *flag.FlagSet, args []string, interleave bool) ([]string, error) {
	var positional []string
	for {
		if err := fs.Parse(args); err != nil {
			if errors.Is(err, flag.ErrHelp) {
				if helpAsked != nil {
					helpAsked(fs)
				}
				return nil, errHelp
			}
			return nil, flagError(fs, err)
		}
		args = fs.Args()
		if !interleave || len(args) == 0 {
			if err := noBlankValues(fs); err != nil {
				return nil, err
			}
			return append(positional, args...), nil
		}
		positional = append(positional, args[0])
		args = args[1:]
	}
}

// noBlankValues refuses a flag given with an empty value (--std ""): it
// would otherwise read as the flag left out, and a default would be used
// silently.
func noBlankValues(fs *flag.FlagSet) error {
	var blank string
	fs.Visit(func(f *flag.Flag) {
		// String flags only: a Func flag (--species) checks its own value.
		if g, ok := f.Value.(flag.Getter); ok {
			if v, ok := g.Get().(string); ok && blank == "" && strings.TrimSpace(v) == "" {
				blank = f.Name
			}
		}
	})
	if blank != "" {
		_, usage := flag.UnquoteUsage(fs.Lookup(blank))
		return badInput("--%s was given an empty value; want %s (see %s --help)", blank, usage, fs.Name())
	}
	return nil
}

// flagError rewrites the flag package's messages into zmix's one-line
// form, listing the flags where a flag was unknown.
func flagError(fs *flag.FlagSet, err error) error {
	// The flag package names flags with one dash; zmix documents two.
	msg := strings.ReplaceAll(err.Error(), "flag -", "flag --")
	if name, ok := strings.CutPrefix(msg, "flag provided but not defined: "); ok {
		name = strings.TrimLeft(name, "-")
		if near := nearFlag(fs, name); near != "" {
			return badInput("unknown flag --%s; did you mean --%s? The flags are %s (see %s --help)", name, near, flagList(fs), fs.Name())
		}
		return badInput("unknown flag --%s; the flags are %s (see %s --help)", name, flagList(fs), fs.Name())
	}
	if name, ok := strings.CutPrefix(msg, "flag needs an argument: "); ok {
		return badInput("flag --%s needs a value (see %s --help)", strings.TrimLeft(name, "-"), fs.Name())
	}
	return badInput("%s (see %s --help)", msg, fs.Name())
}

// flagSynonyms are other commands' names for a flag, most likely first.
var flagSynonyms = map[string][]string{
	"fill":     {"pres"},
	"to":       {"to-pres", "to-temp"},
	"to-pres":  {"to"},
	"pressure": {"pres"},
	"parent":   {"add"}, // weighed: each parent gas is an --add
}

// nearFlag returns the one flag of fs that name is the start of, or that
// is the start of name (--to for --to-pres, --temperature for --temp,
// --step for --steps), or "" when there is not exactly one.
func nearFlag(fs *flag.FlagSet, name string) string {
	// Words one command uses for what another calls otherwise: release's
	// --fill is cylinder's --pres, throttle's --to-pres compress's --to.
	for _, alt := range flagSynonyms[name] {
		if fs.Lookup(alt) != nil {
			return alt
		}
	}
	var near []string
	fs.VisitAll(func(f *flag.Flag) {
		if len(name) >= 2 && (strings.HasPrefix(f.Name, name) || strings.HasPrefix(name, f.Name)) {
			near = append(near, f.Name)
		}
	})
	if len(near) != 1 {
		return ""
	}
	return near[0]
}

func flagList(fs *flag.FlagSet) string {
	var names []string
	fs.VisitAll(func(f *flag.Flag) { names = append(names, "--"+f.Name) })
	sort.Strings(names)
	return strings.Join(names, ", ")
}

// flagsGiven returns the names of the flags that were set on the command
// line.
func flagsGiven(fs *flag.FlagSet) map[string]bool {
	set := map[string]bool{}
	fs.Visit(func(f *flag.Flag) { set[f.Name] = true })
	return set
}

// parseOnlyFlags parses the flags of a command that takes no positional
// arguments.
func parseOnlyFlags(fs *flag.FlagSet, cmd string, args []string) error {
	rest, err := parseFlags(fs, args, true)
	if err != nil {
		return err
	}
	return noArgs(cmd, rest)
}

// noArgs rejects positional arguments for commands that take none.
func noArgs(cmd string, rest []string) error {
	if len(rest) > 0 {
		return badInput("unexpected argument %s; every input is a flag, and a value with a space needs quotes, e.g. --pres \"1 bar\" (see zmix %s --help)", model.Quote(rest[0]), cmd)
	}
	return nil
}

// outputFormat is how a command writes its result.
type outputFormat int

const (
	formatText outputFormat = iota
	formatJSON
	formatCSV
)

func pickFormat(asJSON, asCSV bool) (outputFormat, error) {
	switch {
	case asJSON && asCSV:
		return 0, badInput("--json and --csv both given; choose one output format")
	case asJSON:
		return formatJSON, nil
	case asCSV:
		return formatCSV, nil
	}
	return formatText, nil
}

// formatFlags are the --json and --csv flags of a command whose result is
// nested (the process, hazard and release commands); their CSV is the
// long table of report.WriteFlatCSV.
// nestedFlags are the flags the commands with a nested result share: the
// blend, --json and --csv, and the global flags. A command adds its own
// to fs before parse.
type nestedFlags struct {
	fs    *flag.FlagSet
	name  string
	blend string
	out   formatFlags
}

// newNestedFlags makes the flag set of zmix name, with the blend flag
// described by blendUsage.
func newNestedFlags(g *globalOpts, name, blendUsage string) *nestedFlags {
	c := &nestedFlags{fs: newFlagSet("zmix " + name), name: name}
	c.fs.StringVar(&c.blend, "blend", "", blendUsage)
	c.out.register(c.fs)
	g.register(c.fs, false)
	return c
}

// parse reads args, which hold flags only.
func (c *nestedFlags) parse(args []string) error { return parseOnlyFlags(c.fs, c.name, args) }

type formatFlags struct{ json, csv bool }

func (f *formatFlags) register(fs *flag.FlagSet) {
	fs.BoolVar(&f.json, "json", false, "write one JSON object")
	fs.BoolVar(&f.csv, "csv", false, "write CSV: one row per figure (section, row, name, value)")
}

func (f formatFlags) pick() (outputFormat, error) { return pickFormat(f.json, f.csv) }

// page returns where a text output is rendered: out itself, or a writer
// that turns it into plain ASCII.
func page(out *bytes.Buffer, ascii bool) io.Writer {
	if ascii {
		return &report.ASCIIWriter{W: out}
	}
	return out
}

// emit writes a finished output in one go, so that a failure part-way
// never leaves half a readout on the screen.
func (a *app) emit(out *bytes.Buffer) error {
	if _, err := a.stdout.Write(out.Bytes()); err != nil {
		return ioFailure(fmt.Errorf("writing the output: %v", err))
	}
	return nil
}

// blendSource is the blend a command works on, from --blend text or from a
// saved blend file (--blend @FILE).
type blendSource struct {
	blend *mixtures.Blend
	file  *mixtures.BlendFile // nil for blend text
	path  string
}

const blendForms = `blend text such as "N2 78.08%, O2 20.95%, Ar 0.93%, CO2 0.04%" or @FILE for a saved blend file`

func readBlend(spec string) (*blendSource, error) {
	if strings.TrimSpace(spec) == "" {
		return nil, badInput("--blend is missing; give %s", blendForms)
	}
	if path, ok := strings.CutPrefix(spec, "@"); ok {
		if path == "" {
			return nil, badInput("--blend @: the file name is missing; give %s", blendForms)
		}
		return openBlendFile("--blend @"+path+": ", path)
	}
	b, err := mixtures.ParseBlend(spec)
	if err != nil {
		return nil, badInput("--blend: %v", err)
	}
	return &blendSource{blend: b}, nil
}

// openBlendFile reads a blend file for a command or the workbench; prefix
// starts its error lines. The blend's items carry their file and line, so
// that an error found when it is resolved still names them.
func openBlendFile(prefix, path string) (*blendSource, error) {
	f, b, err := mixtures.ReadBlendFile(path)
	if err != nil {
		var pe *fs.PathError
		if errors.As(err, &pe) {
			where := prefix
			if where == "" {
				where = model.Printable(path) + ": "
			}
			return nil, ioFailure(fmt.Errorf("%scannot read it: %v", where, pe.Err))
		}
		return nil, badInput("%s%v", prefix, err)
	}
	return &blendSource{blend: b, file: f, path: path}, nil
}

// label is how the blend is named in a readout.
func (s *blendSource) label() string { return s.plainLabel() + namedNote(s.blend) }

// plainLabel is the label without the named mixtures' note.
func (s *blendSource) plainLabel() string {
	if s.file == nil {
		return s.blend.Text
	}
	text := s.file.BlendText()
	if s.file.Name != "" {
		return fmt.Sprintf("%s  [%s: %s]", text, s.path, s.file.Name)
	}
	return fmt.Sprintf("%s  [%s]", text, s.path)
}

// namedNote says what the named mixtures (air) the blends hold were
// taken to be, each once, for the end of a label: what "air" means goes
// with the blend wherever it is shown. It is "" when they hold none.
func namedNote(blends ...*mixtures.Blend) string {
	var notes []string
	for _, b := range blends {
		if n := b.NamedNote(); n != "" && !slices.Contains(notes, n) {
			notes = append(notes, n)
		}
	}
	if len(notes) == 0 {
		return ""
	}
	return "  [" + strings.Join(notes, "; ") + "]"
}

// fileValue returns the value saved in the blend file for a condition, or
// "" if there is no file or it holds none.
func (s *blendSource) fileValue(which string) string {
	if s.file == nil {
		return ""
	}
	switch which {
	case "temp":
		return s.file.Temperature
	case "pres":
		return s.file.Pressure
	case "std":
		return s.file.StandardPressure
	}
	return ""
}

// pick returns the flag's value if it was given, else the blend file's.
func (s *blendSource) pick(given map[string]bool, name, flagValue string) string {
	if given[name] {
		return flagValue
	}
	return s.fileValue(name)
}

// temperature is a parsed temperature with the text it came from.
type temperature struct {
	kelvin float64
	text   string
}

func parseTemperature(flagName, text string) (temperature, error) {
	k, err := mixtures.ParseTemperature(text)
	if err != nil {
		return temperature{}, badInput("%s: %v", flagName, err)
	}
	return temperature{k, text}, nil
}

// pressure is a parsed total pressure, with the text it came from; text is
// empty when the total is the sum of the blend's partial pressures.
type pressure struct {
	mixtures.Pressure
	text string
}

func parsePressure(flagName, text string) (pressure, error) {
	p, err := mixtures.ParsePressure(text)
	if err != nil {
		return pressure{}, badInput("%s: %v", flagName, err)
	}
	return pressure{p, text}, nil
}

// totalPressure reads the total pressure, or, if none is given and every
// amount of the blend is a partial pressure, takes their sum.
func totalPressure(src *blendSource, text string) (pressure, error) {
	if strings.TrimSpace(text) != "" {
		return parsePressure("--pres", text)
	}
	if sum, all := src.blend.SumPartialPa(); all && sum > 0 {
		return pressure{Pressure: mixtures.Pressure{Pa: sum}}, nil
	}
	return pressure{}, badInput("--pres is missing; give the total pressure with a unit (%s), e.g. --pres 1atm or --pres 2barg", mixtures.PressureUnits)
}

func parseStd(text string) (mixtures.StdPressure, error) {
	std, err := mixtures.ParseStdPressure(text)
	if err != nil {
		return 0, badInput("--std: %v", err)
	}
	return std, nil
}

// stepsFlag is --steps: a whole number of points, end points included.
// A value that reads as a temperature or pressure (50K, 1bar) is a step
// typed where the count goes; it is kept in step, for
// the command to answer with the number of points it means once the
// range is known.
type stepsFlag struct {
	n    int
	step string
}

func (s *stepsFlag) String() string { return strconv.Itoa(s.n) }

func (s *stepsFlag) Set(v string) error {
	v = strings.TrimSpace(v)
	n, err := mixtures.ParseSteps(v)
	if err != nil {
		if _, tErr := mixtures.ParseTemperature(v); tErr == nil {
			s.step = v
			return nil
		}
		if _, pErr := mixtures.ParsePressure(v); pErr == nil {
			s.step = v
			return nil
		}
		return fmt.Errorf("want a whole number of points from 2 to %d, end points included", mixtures.MaxSweepSteps)
	}
	s.n, s.step = n, ""
	return nil
}

// stepError answers a step typed for --steps: the number of points that
// gives that step over sw, where there is one.
func (s *stepsFlag) stepError(sw mixtures.Sweep) error {
	if n, ok := sw.PointsForStep(s.step); ok {
		return badInput("--steps %s: a number of points, end points included, not a step; a step of %s over this range is --steps %d", model.Quote(s.step), s.step, n)
	}
	return badInput("--steps %s: a number of points, end points included, not a step: want a whole number from 2 to %d", model.Quote(s.step), mixtures.MaxSweepSteps)
}
