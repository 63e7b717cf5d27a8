package model

import (
	"bufio"
	"errors"
	"fmt"
	"io"
	"math"
	"runtime"
	"sort"
	"strconv"
	"strings"
	"sync"
	"unicode"
	"unicode/utf8"
)

// A species file is read whole before any species is used, so its size
// is bounded before the work that grows with it: a line of many megabytes,
// or a file of many gigabytes, is refused after reading at most these many
// bytes, well within a second.
const (
	MaxSpeciesLineBytes = 64 << 10 // one line, without its newline
	MaxSpeciesFileBytes = 1 << 20  // a whole file: some thousands of species
)

// Free text read from a species file is bounded too, so that a name fits
// a table column and a note a few lines of a screen.
const (
	maxNameRunes   = 64
	maxNoteRunes   = 500
	maxSourceRunes = 300
)

// CatalogueError names the file, line and field of a bad entry. Its
// message is the line a person reads: it needs no package prefix, since
// the file and line already say where it comes from.
type CatalogueError struct {
	File  string
	Line  int
	Field string
	Msg   string
}

func (e *CatalogueError) Error() string {
	if e.Field == "" {
		return fmt.Sprintf("%s:%d: %s", Printable(e.File), e.Line, e.Msg)
	}
	return fmt.Sprintf("%s:%d: field %q: %s", Printable(e.File), e.Line, e.Field, e.Msg)
}

// UserMessage is the error's one line for a person.
func (e *CatalogueError) UserMessage() string { return e.Error() }

// catalogueFields lists the keys a species block may hold.
var catalogueFields = map[string]string{
	"name":    "free text",
	"Tc_K":    "critical temperature in K",
	"Pc_bar":  "critical pressure in bar",
	"omega":   "acentric factor",
	"quantum": "yes or no: yes when Tc_K and Pc_bar are a quantum gas's classical limits",
	"rotor":   "atom, linear or nonlinear",
	"rot_cm":  "rotational constants in cm⁻¹: B, or A B C",
	"sigma":   "symmetry number, a whole number ≥ 1",
	"spin":    "even-J and odd-J nuclear-spin weights, two whole numbers ≥ 0",
	"vib_cm":  "fundamentals in cm⁻¹, each optionally xN for degeneracy N (667x2)",
	"elec_cm": "electronic levels in cm⁻¹, each xN for degeneracy N (0x3 7918x2)",
	"dHf0_kJ": "ΔfH°(0 K) in kJ/mol",
	"boil_K":  "normal boiling or sublimation point in K",
	"hazards": "comma-separated: asphyxiant, flammable, oxidizer, toxic, pyrophoric, corrosive",
	"note":    "free text",
}

// numRange is the physical range a number of a species file must lie in:
// wide enough for any molecule a gas mixture holds, narrow enough that no
// state of the species can overflow or fall below the classical limits.
type numRange struct {
	what     string
	min, max float64
	unit     string // "" for a pure number
	whole    bool   // a whole number
}

// The ranges, each with the reason for its ends (values from memory).
var (
	// H2 has the largest B of any molecule, 60.9 cm⁻¹; molecules with
	// B below 1e-4 cm⁻¹ (over a thousand atoms) are not gases.
	rotRange = numRange{"rotational constant", 1e-4, 100, "cm⁻¹", false}
	// H2's fundamental, 4161 cm⁻¹, is the highest of any molecule; the
	// softest torsions lie some tens of cm⁻¹ up.
	vibRange = numRange{"vibrational wavenumber", 1, 5000, "cm⁻¹", false}
	// No point group has an irreducible representation of dimension
	// above 5 (icosahedral H).
	vibDegRange = numRange{"vibrational degeneracy", 1, 5, "", true}
	// Helium's ionisation energy, 198 311 cm⁻¹, bounds every bound level.
	elecRange = numRange{"electronic level", 0, 2e5, "cm⁻¹", false}
	// 2J+1 of the highest-J atomic levels, with room to spare.
	elecDegRange = numRange{"electronic degeneracy", 1, 100, "", true}
	// The icosahedral point groups have σ = 60, the largest there is.
	sigmaRange = numRange{"symmetry number", 1, 60, "", true}
	// Spin weights are (2I+1)-products of nuclear spins up to I = 9/2.
	spinRange = numRange{"spin weight", 0, 100, "", true}
	// UF6 is about −2 100 kJ/mol and the atoms stay below +1 000.
	dHf0Range = numRange{"enthalpy of formation", -10000, 10000, "kJ/mol", false}
	// He boils at 4.2 K; nothing is a gas at room temperature whose
	// boiling point is near 6 000 K.
	boilRange = numRange{"boiling point", 1, 6000, "K", false}
	// He's critical point, 5.2 K, is the lowest; refractory metals' lie
	// some thousands of K up. Pc: He 2.3 bar, and a few thousand bar
	// bounds the metals' estimates.
	critTRange = numRange{"critical temperature", 1, 10000, "K", false}
	critPRange = numRange{"critical pressure", 0.1, 5000, "bar", false}
	// ω: He −0.39, the most negative; long or polar molecules reach 1.5.
	omegaRange = numRange{"acentric factor", -1, 2, "", false}
)

// Limits on how many levels a species lists: each costs an exp in every
// state, and a sweep computes hundreds of thousands of states.
const (
	maxVibModes   = 200 // 3N−6 for N = 68 atoms
	maxElecLevels = 100
)

// String describes the accepted range, as an error message quotes it.
func (r numRange) String() string {
	s := fmt.Sprintf("%s from %g to %g", r.what, r.min, r.max)
	if r.unit != "" {
		s += " " + r.unit
	}
	switch {
	case r.whole:
		s = "a whole " + s
	case strings.ContainsRune("aeiou", rune(r.what[0])):
		s = "an " + s
	default:
		s = "a " + s
	}
	return s
}

// contains reports whether x lies in the range (and is whole, if it must be).
func (r numRange) contains(x float64) bool {
	return x >= r.min && x <= r.max && (!r.whole || x == math.Trunc(x))
}

// parse reads one number of the range from token tok of the file.
func (r numRange) parse(tok string) (float64, error) {
	x, err := strconv.ParseFloat(tok, 64)
	kind := "number"
	if r.whole {
		var n int64
		n, err = strconv.ParseInt(tok, 10, 64)
		x, kind = float64(n), "whole number"
	}
	switch {
	case errors.Is(err, strconv.ErrRange) || math.IsInf(x, 0):
		return 0, Errorf("model", "%s is out of range; want %s", Quote(tok), r)
	case err != nil || math.IsNaN(x):
		return 0, Errorf("model", "%s is not a %s; want %s", Quote(tok), kind, r)
	case x < r.min || x > r.max:
		return 0, Errorf("model", "%s is out of range; want %s", Quote(tok), r)
	}
	return x, nil
}

// ParseCatalogue reads species blocks from a catalogue file:
//
//	[CO2]
//	name    = carbon dioxide
//	rot_cm  = 0.39021          | source of the number
//
// Lines starting with # are comments; a "|" starts the field's source.
// Every number must lie in its physical range, free text must hold no
// control characters, and lines and the file are bounded in size
// (MaxSpeciesLineBytes, MaxSpeciesFileBytes); the first fault is returned
// as a *CatalogueError naming the file, line and field.
func ParseCatalogue(file string, r io.Reader) ([]*Species, error) {
	return parseCatalogue(file, r, false)
}

// parseCatalogue is ParseCatalogue; deferLevelss lets the species solve
// their potential curves on first use (the built-in catalogue, whose
// curves the tests solve), where a user's file has them solved, and any
// error reported, as it is read.
func parseCatalogue(file string, r io.Reader, deferLevelss bool) ([]*Species, error) {
	p := catParser{file: file, headerAt: map[string]int{}, slots: make(chan struct{}, max(1, runtime.GOMAXPROCS(0))), deferLevelss: deferLevelss}
	list, err := p.parse(r)
	// Whatever stopped the reading, the species begun before it are
	// waited for, and an error among them comes first.
	if werr := p.wait(); werr != nil {
		return nil, werr
	}
	if err != nil {
		return nil, err
	}
	return list, nil
}

// parse reads the file; the species it finishes are prepared as it goes.
func (p *catParser) parse(r io.Reader) ([]*Species, error) {
	file := p.file
	br := bufio.NewReaderSize(io.LimitReader(r, MaxSpeciesFileBytes+1), MaxSpeciesLineBytes+2)
	read := 0
	for {
		raw, err := br.ReadSlice('\n')
		if errors.Is(err, bufio.ErrBufferFull) {
			return nil, p.errf(p.lineNo+1, "", "line is over %d KiB; a line may hold at most %d bytes", MaxSpeciesLineBytes>>10, MaxSpeciesLineBytes)
		}
		read += len(raw)
		if read > MaxSpeciesFileBytes {
			return nil, p.errf(p.lineNo+1, "", "file is over %d MiB; a species file may hold at most %d bytes", MaxSpeciesFileBytes>>20, MaxSpeciesFileBytes)
		}
		if len(raw) > 0 {
			p.lineNo++
			line := strings.TrimSuffix(strings.TrimSuffix(string(raw), "\n"), "\r")
			if len(line) > MaxSpeciesLineBytes {
				return nil, p.errf(p.lineNo, "", "line is over %d KiB; a line may hold at most %d bytes", MaxSpeciesLineBytes>>10, MaxSpeciesLineBytes)
			}
			if err := p.line(line); err != nil {
				return nil, err
			}
		}
		if err == io.EOF {
			break
		}
		if err != nil {
			return nil, Errorf("model", "%s: %w", Printable(file), err)
		}
	}
	if err := p.finish(); err != nil {
		return nil, err
	}
	if len(p.out) == 0 {
		return nil, p.errf(p.lineNo, "", "no species (start one with [FORMULA])")
	}
	return p.out, nil
}

// catParser holds the state of one file being read.
type catParser struct {
	file     string
	lineNo   int
	out      []*Species
	cur      *Species
	curLine  int
	fieldAt  map[string]int // field → its line in the current block
	headerAt map[string]int // formula → line of its block
	jobs     []*prepareJob  // species being prepared, in file order
	slots    chan struct{}  // one per core: how many prepare at once
	// deferLevelss: see parseCatalogue.
	deferLevelss bool
}

// errf makes the error of a line; errors among args contribute their
// UserMessage, as with Errorf.
func (p *catParser) errf(line int, field, format string, args ...any) *CatalogueError {
	return &CatalogueError{p.file, line, field, UserMessage(Errorf("", format, args...))}
}

func (p *catParser) line(raw string) error {
	line := strings.TrimSpace(raw)
	if line == "" || strings.HasPrefix(line, "#") {
		return nil
	}
	if strings.HasPrefix(line, "[") {
		if err := p.finish(); err != nil {
			return err
		}
		if !strings.HasSuffix(line, "]") {
			return p.errf(p.lineNo, "", "species header %s must look like [CO2]", Quote(line))
		}
		formula := strings.TrimSpace(line[1 : len(line)-1])
		if _, err := ParseFormula(formula); err != nil {
			return p.errf(p.lineNo, "", "%s", UserMessage(err))
		}
		if at, dup := p.headerAt[formula]; dup {
			return p.errf(p.lineNo, "", "species [%s] given twice (first at line %d)", formula, at)
		}
		p.headerAt[formula] = p.lineNo
		p.cur = &Species{Formula: formula, Sources: map[string]string{}}
		p.curLine = p.lineNo
		p.fieldAt = map[string]int{}
		return nil
	}
	if p.cur == nil {
		return p.errf(p.lineNo, "", "field outside a species block (start one with [FORMULA])")
	}
	key, value, ok := strings.Cut(line, "=")
	if !ok {
		return p.errf(p.lineNo, "", "%s is not key = value", Quote(line))
	}
	key = strings.TrimSpace(key)
	value, source, _ := strings.Cut(value, "|")
	value, source = strings.TrimSpace(value), strings.TrimSpace(source)
	if !knownField(key) && !isDunhamField(key) {
		return p.errf(p.lineNo, key, "unknown field (known: %s)", knownFieldList())
	}
	if at, seen := p.fieldAt[key]; seen {
		return p.errf(p.lineNo, key, "given twice (first at line %d)", at)
	}
	p.fieldAt[key] = p.lineNo
	if err := checkText("value", value, 0); err != nil {
		return p.errf(p.lineNo, key, "%v", err)
	}
	if err := checkText("source", source, maxSourceRunes); err != nil {
		return p.errf(p.lineNo, key, "%v", err)
	}
	if err := setField(p.cur, key, value); err != nil {
		return p.errf(p.lineNo, key, "%v", err)
	}
	if source != "" {
		p.cur.Sources[key] = source
	}
	return nil
}

// finish checks the block just read as a whole and prepares its species.
func (p *catParser) finish() error {
	sp := p.cur
	if sp == nil {
		return nil
	}
	p.cur = nil
	for _, need := range []string{"name", "rotor", "dHf0_kJ"} {
		if _, ok := p.fieldAt[need]; !ok {
			return p.errf(p.curLine, need, "missing (every species needs name, rotor and dHf0_kJ)")
		}
	}
	if n := p.count("Tc_K", "Pc_bar", "omega"); n != 0 && n != 3 {
		return p.errf(p.curLine, "", "Tc_K, Pc_bar and omega come together: give all three, or none")
	}
	if _, ok := p.fieldAt["Tc_K"]; sp.QuantumGas && !ok {
		return p.errf(p.fieldAt["quantum"], "quantum", "needs Tc_K, Pc_bar and omega")
	}
	if _, ok := p.fieldAt["rot_cm"]; sp.Rotor != Atom && !ok {
		return p.errf(p.curLine, "rot_cm", "missing for a %s rotor", sp.Rotor)
	}
	if n := p.count("harm_cm", "xij_cm", "D0_cm"); sp.Anharmonic != nil && n != 3 {
		return p.errf(p.curLine, "", "harm_cm, xij_cm and D0_cm come together")
	}
	if sp.Dunham != nil {
		for _, need := range requiredDunhamFields {
			if _, ok := p.fieldAt[need]; !ok {
				return p.errf(p.curLine, need, "missing: Dunham constants need %s", strings.Join(requiredDunhamFields, ", "))
			}
		}
	}
	if err := sp.Safety.check(); err != nil {
		return p.errf(p.curLine, "", "%s", UserMessage(err))
	}
	// Preparing a species (its level lists, potential curves, torsions)
	// is most of a catalogue's load time, and each is independent of the
	// others: it runs on its own goroutine while the file is read on, and
	// wait reports the first error in file order.
	sp.deferLevels = p.deferLevelss
	job := &prepareJob{sp: sp, line: p.curLine, fieldAt: p.fieldAt}
	p.jobs = append(p.jobs, job)
	p.slots <- struct{}{}
	job.wg.Add(1)
	go func() {
		defer func() { <-p.slots; job.wg.Done() }()
		job.err = p.prepare(job)
	}()
	p.out = append(p.out, sp)
	return nil
}

// prepareJob is one species being prepared.
type prepareJob struct {
	sp      *Species
	line    int            // its block's line
	fieldAt map[string]int // its fields' lines
	wg      sync.WaitGroup // done when prepared
	err     error
}

// prepare prepares a species and checks its shape, with the error of the
// line at fault.
func (p *catParser) prepare(job *prepareJob) error {
	if err := job.sp.Prepare(); err != nil {
		return p.errf(job.line, "", "%s", UserMessage(err))
	}
	if err := checkShape(job.sp); err != nil {
		field := err.field
		line, ok := job.fieldAt[field]
		if !ok {
			line, field = job.line, ""
		}
		return p.errf(line, field, "%s", err.msg)
	}
	return nil
}

// wait waits for every species being prepared and returns the first
// error in file order: every block already finished lies before the line
// being read, so its error comes first, as when they were prepared one by
// one.
func (p *catParser) wait() error {
	var first error
	for _, job := range p.jobs {
		job.wg.Wait()
		if first == nil && job.err != nil {
			first = job.err
		}
	}
	p.jobs = nil
	return first
}

// count returns how many of the fields the current block gave.
func (p *catParser) count(fields ...string) int {
	n := 0
	for _, f := range fields {
		if _, ok := p.fieldAt[f]; ok {
			n++
		}
	}
	return n
}

// shapeError is a fault of a block as a whole, blamed on one field.
type shapeError struct{ field, msg string }

// checkShape checks that the fields of a species agree with its formula:
// an atom has one atom and no vibrations; a molecule of N atoms has
// 3N − 5 (linear) or 3N − 6 (nonlinear) vibrational modes, counted with
// their degeneracies; a linear molecule has σ = 1 or 2.
func checkShape(sp *Species) *shapeError {
	counts, err := ParseFormula(sp.Formula)
	if err != nil {
		return &shapeError{"", UserMessage(err)}
	}
	atoms := 0
	for _, n := range counts {
		atoms += n
	}
	want := 0
	switch sp.Rotor {
	case Atom:
		if atoms != 1 {
			return &shapeError{"rotor", fmt.Sprintf("%s has %d atoms; want linear or nonlinear, not atom", sp.Formula, atoms)}
		}
	case Linear:
		if atoms < 2 {
			return &shapeError{"rotor", fmt.Sprintf("%s is one atom; want atom, not linear", sp.Formula)}
		}
		want = 3*atoms - 5
		if sp.Symmetry > 2 {
			return &shapeError{"sigma", fmt.Sprintf("%d: a linear molecule has σ = 1 or 2", sp.Symmetry)}
		}
	case Nonlinear:
		if atoms < 3 {
			return &shapeError{"rotor", fmt.Sprintf("%s has %d atoms; a nonlinear molecule needs at least 3", sp.Formula, atoms)}
		}
		want = 3*atoms - 6
	}
	got := 0
	for _, v := range sp.Vib {
		got += v.Degeneracy
	}
	if got != want {
		what := "a " + sp.Rotor.String() + " molecule"
		if sp.Rotor == Atom {
			what = "an atom"
		}
		return &shapeError{"vib_cm", fmt.Sprintf("%d modes counted with their degeneracies; %s of %d atoms (%s) has %d", got, what, atoms, sp.Formula, want)}
	}
	return nil
}

// checkText refuses control characters, invalid UTF-8 and characters that
// do not print in text read from a file (tabs included: a name or note
// is laid out by whoever shows it), and text over maxRunes runes when
// maxRunes > 0. Refused, not cleaned: the file is the user's to fix, and
// what loads is then safe to show anywhere.
func checkText(what, s string, maxRunes int) error {
	for i, r := range s {
		if r == utf8.RuneError || !unicode.IsPrint(r) {
			bad := fmt.Sprintf("%U", r)
			if r == utf8.RuneError {
				bad = fmt.Sprintf("byte %#02x (not UTF-8)", s[i])
			}
			return Errorf("model", "%s %s holds %s at byte %d; want printable text", what, Quote(s), bad, i+1)
		}
	}
	if n := utf8.RuneCountInString(s); maxRunes > 0 && n > maxRunes {
		return Errorf("model", "%s %s is %d characters long; want at most %d", what, Quote(s), n, maxRunes)
	}
	return nil
}

func knownFieldList() string {
	keys := make([]string, 0, len(catalogueFields)+len(safetyFields))
	for k := range catalogueFields {
		keys = append(keys, k)
	}
	keys = append(keys, SafetyFieldNames()...)
	for k := range dunhamFields {
		keys = append(keys, k)
	}
	keys = append(keys, "state_LABEL")
	sort.Strings(keys)
	return strings.Join(keys, ", ")
}

func setField(sp *Species, key, value string) error {
	if isDunhamField(key) {
		return setDunhamField(sp, key, value)
	}
	if _, ok := safetyFields[key]; ok {
		return setSafetyField(&sp.Safety, key, value)
	}
	switch key {
	case "name":
		if value == "" {
			return Errorf("model", "empty; want %s", catalogueFields[key])
		}
		if err := checkText("name", value, maxNameRunes); err != nil {
			return err
		}
		sp.Name = value
	case "note":
		if err := checkText("note", value, maxNoteRunes); err != nil {
			return err
		}
		sp.Notes = value
	case "rotor":
		switch value {
		case "atom":
			sp.Rotor = Atom
		case "linear":
			sp.Rotor = Linear
		case "nonlinear":
			sp.Rotor = Nonlinear
		default:
			return Errorf("model", "%s: unknown rotor; want %s", Quote(value), catalogueFields[key])
		}
	case "rot_cm":
		xs, err := parseNumbers(value, rotRange, 3)
		if err != nil {
			return err
		}
		sp.RotConstPerCm = xs
	case "sigma":
		x, err := sigmaRange.parse(value)
		if err != nil {
			return err
		}
		sp.Symmetry = int(x)
	case "spin":
		xs, err := parseNumbers(value, spinRange, 2)
		if err != nil {
			return err
		}
		if len(xs) != 2 || xs[0]+xs[1] == 0 {
			return Errorf("model", "%s: want two whole numbers from 0 to 100, not both 0 (even-J and odd-J weights)", Quote(value))
		}
		sp.SpinWeights = [2]float64{xs[0], xs[1]}
	case "vib_cm":
		modes, err := parseLevels(value, vibRange, vibDegRange, maxVibModes)
		if err != nil {
			return err
		}
		for _, m := range modes {
			sp.Vib = append(sp.Vib, VibMode{m.EnergyPerCm, m.Degeneracy})
		}
	case "elec_cm":
		levels, err := parseLevels(value, elecRange, elecDegRange, maxElecLevels)
		if err != nil {
			return err
		}
		if levels[0].EnergyPerCm != 0 {
			return Errorf("model", "%s: the first level is the ground level; want it at 0 cm⁻¹", Quote(strings.Fields(value)[0]))
		}
		sp.Elec = levels
	case "dHf0_kJ":
		x, err := dHf0Range.parse(value)
		if err != nil {
			return err
		}
		sp.EnergyZeroJPerMol = x * 1000
	case "Tc_K":
		x, err := critTRange.parse(value)
		if err != nil {
			return err
		}
		sp.CriticalK = x
	case "Pc_bar":
		x, err := critPRange.parse(value)
		if err != nil {
			return err
		}
		sp.CriticalPa = x * 1e5
	case "omega":
		x, err := omegaRange.parse(value)
		if err != nil {
			return err
		}
		sp.Acentric = x
	case "quantum":
		switch value {
		case "yes":
			sp.QuantumGas = true
		case "no":
			sp.QuantumGas = false
		default:
			return Errorf("model", "%s; want %s", Quote(value), catalogueFields[key])
		}
	case "boil_K":
		x, err := boilRange.parse(value)
		if err != nil {
			return err
		}
		sp.BoilingK = x
	case "hazards":
		for _, name := range strings.Split(value, ",") {
			name = strings.TrimSpace(name)
			if name == "" || name == "none" {
				continue
			}
			h, ok := HazardByName(name)
			if !ok {
				return Errorf("model", "unknown hazard %s; want %s", Quote(name), catalogueFields[key])
			}
			sp.Hazards |= h
		}
	}
	return nil
}

// parseNumbers reads at most maxN space-separated numbers of range r.
func parseNumbers(s string, r numRange, maxN int) ([]float64, error) {
	var out []float64
	for _, f := range strings.Fields(s) {
		if len(out) == maxN {
			return nil, Errorf("model", "%s: more than %d numbers", Quote(s), maxN)
		}
		x, err := r.parse(f)
		if err != nil {
			return nil, err
		}
		out = append(out, x)
	}
	if len(out) == 0 {
		return nil, Errorf("model", "no numbers; want %s", r)
	}
	return out, nil
}

// parseLevels reads "1333 667x2 2349" into energies with degeneracies,
// each in its range, at most maxN of them.
func parseLevels(s string, energy, deg numRange, maxN int) ([]ElecLevel, error) {
	var out []ElecLevel
	for _, f := range strings.Fields(s) {
		if len(out) == maxN {
			return nil, Errorf("model", "more than %d levels; want at most %d", maxN, maxN)
		}
		num, g := f, "1"
		if a, b, ok := strings.Cut(f, "x"); ok {
			num, g = a, b
		}
		x, err := energy.parse(num)
		if err != nil {
			return nil, Errorf("model", "in %s: %v", Quote(f), err)
		}
		n, err := deg.parse(g)
		if err != nil {
			return nil, Errorf("model", "in %s: degeneracy %v", Quote(f), err)
		}
		out = append(out, ElecLevel{x, int(n)})
	}
	if len(out) == 0 {
		return nil, Errorf("model", "no levels; want %s", energy)
	}
	return out, nil
}
