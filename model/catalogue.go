package model

import (
	"bufio"
	_ "embed"
	"fmt"
	"io"
	"os"
	"sort"
	"strconv"
	"strings"
	"sync"
)

//go:embed species.cat
var builtinText string

// Catalogue is a set of species addressed by formula.
type Catalogue struct {
	species   []*Species
	byFormula map[string]*Species
}

var (
	builtinOnce sync.Once
	builtinCat  *Catalogue
)

// Builtin returns the catalogue embedded in the program. It is parsed once;
// callers must not modify the species it returns.
func Builtin() *Catalogue {
	builtinOnce.Do(func() {
		list, err := ParseCatalogue("species.cat", strings.NewReader(builtinText))
		if err != nil {
			// The embedded file is tested; failing here is a build defect.
			panic(err)
		}
		builtinCat = newCatalogue(list)
	})
	return builtinCat
}

func newCatalogue(list []*Species) *Catalogue {
	c := &Catalogue{byFormula: make(map[string]*Species, len(list))}
	for _, sp := range list {
		if _, dup := c.byFormula[sp.Formula]; !dup {
			c.species = append(c.species, sp)
		} else {
			for i, old := range c.species {
				if old.Formula == sp.Formula {
					c.species[i] = sp
				}
			}
		}
		c.byFormula[sp.Formula] = sp
	}
	return c
}

// WithFile returns a new catalogue: this one with the species of a user
// file added, or overriding those of the same formula.
func (c *Catalogue) WithFile(path string) (*Catalogue, error) {
	f, err := os.Open(path)
	if err != nil {
		return nil, fmt.Errorf("model: species file: %w", err)
	}
	defer f.Close()
	extra, err := ParseCatalogue(path, f)
	if err != nil {
		return nil, err
	}
	return newCatalogue(append(append([]*Species(nil), c.species...), extra...)), nil
}

// All returns the species in file order.
func (c *Catalogue) All() []*Species { return c.species }

// Lookup finds a species by formula; an exact match wins, then a
// case-insensitive match of the formula or of the name.
func (c *Catalogue) Lookup(key string) (*Species, bool) {
	if sp, ok := c.byFormula[key]; ok {
		return sp, true
	}
	for _, sp := range c.species {
		if strings.EqualFold(sp.Formula, key) || strings.EqualFold(sp.Name, key) {
			return sp, true
		}
	}
	return nil, false
}

// Suggest returns up to n formulas nearest to key, for "did you mean".
func (c *Catalogue) Suggest(key string, n int) []string {
	type scored struct {
		formula string
		dist    int
	}
	lk := strings.ToLower(key)
	var all []scored
	for _, sp := range c.species {
		d := editDistance(lk, strings.ToLower(sp.Formula))
		if dn := editDistance(lk, strings.ToLower(sp.Name)); dn < d {
			d = dn
		}
		if strings.HasPrefix(strings.ToLower(sp.Name), lk) && lk != "" {
			d = 0
		}
		all = append(all, scored{sp.Formula, d})
	}
	sort.SliceStable(all, func(i, j int) bool { return all[i].dist < all[j].dist })
	var out []string
	for _, s := range all {
		if len(out) == n || s.dist > 1+len(key)/2 {
			break
		}
		out = append(out, s.formula)
	}
	return out
}

// Search returns the species whose formula or name contains query,
// case-insensitively; formulas that start with it come first.
func (c *Catalogue) Search(query string) []*Species {
	q := strings.ToLower(strings.TrimSpace(query))
	var first, rest []*Species
	for _, sp := range c.species {
		f, nm := strings.ToLower(sp.Formula), strings.ToLower(sp.Name)
		switch {
		case strings.HasPrefix(f, q) || strings.HasPrefix(nm, q):
			first = append(first, sp)
		case strings.Contains(f, q) || strings.Contains(nm, q):
			rest = append(rest, sp)
		}
	}
	return append(first, rest...)
}

func editDistance(a, b string) int {
	ra, rb := []rune(a), []rune(b)
	prev := make([]int, len(rb)+1)
	cur := make([]int, len(rb)+1)
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(ra); i++ {
		cur[0] = i
		for j := 1; j <= len(rb); j++ {
			cost := 1
			if ra[i-1] == rb[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
		}
		prev, cur = cur, prev
	}
	return prev[len(rb)]
}

// CatalogueError names the file, line and field of a bad entry.
type CatalogueError struct {
	File  string
	Line  int
	Field string
	Msg   string
}

func (e *CatalogueError) Error() string {
	if e.Field == "" {
		return fmt.Sprintf("%s:%d: %s", e.File, e.Line, e.Msg)
	}
	return fmt.Sprintf("%s:%d: field %q: %s", e.File, e.Line, e.Field, e.Msg)
}

// catalogueFields lists the keys a species block may hold.
var catalogueFields = map[string]string{
	"name":    "free text",
	"rotor":   "atom, linear or nonlinear",
	"rot_cm":  "rotational constants in cm⁻¹: B, or A B C",
	"sigma":   "symmetry number, a whole number ≥ 1",
	"spin":    "even-J and odd-J nuclear-spin weights, two numbers ≥ 0",
	"vib_cm":  "fundamentals in cm⁻¹, each optionally xN for degeneracy N (667x2)",
	"elec_cm": "electronic levels in cm⁻¹, each xN for degeneracy N (0x3 7918x2)",
	"dHf0_kJ": "ΔfH°(0 K) in kJ/mol",
	"boil_K":  "normal boiling or sublimation point in K",
	"hazards": "comma-separated: asphyxiant, flammable, oxidizer, toxic, pyrophoric, corrosive",
	"note":    "free text",
}

// ParseCatalogue reads species blocks from a catalogue file:
//
//	[CO2]
//	name    = carbon dioxide
//	rot_cm  = 0.39021          | source of the number
//
// Lines starting with # are comments; a "|" starts the field's source.
func ParseCatalogue(file string, r io.Reader) ([]*Species, error) {
	var (
		out      []*Species
		cur      *Species
		curLine  int
		seen     map[string]bool
		headerAt = map[string]int{} // formula → line of its block
		lineNo   int
		scanner  = bufio.NewScanner(r)
	)
	finish := func() error {
		if cur == nil {
			return nil
		}
		for _, need := range []string{"name", "rotor", "dHf0_kJ"} {
			if !seen[need] {
				return &CatalogueError{file, curLine, need, "missing (every species needs name, rotor and dHf0_kJ)"}
			}
		}
		if cur.Rotor != Atom && !seen["rot_cm"] {
			return &CatalogueError{file, curLine, "rot_cm", "missing for a " + cur.Rotor.String() + " rotor"}
		}
		if err := cur.Safety.check(); err != nil {
			return &CatalogueError{file, curLine, "", err.Error()}
		}
		if err := cur.Prepare(); err != nil {
			return &CatalogueError{file, curLine, "", strings.TrimPrefix(err.Error(), "model: ")}
		}
		out = append(out, cur)
		cur = nil
		return nil
	}
	for scanner.Scan() {
		lineNo++
		line := strings.TrimSpace(scanner.Text())
		if line == "" || strings.HasPrefix(line, "#") {
			continue
		}
		if strings.HasPrefix(line, "[") {
			if err := finish(); err != nil {
				return nil, err
			}
			if !strings.HasSuffix(line, "]") {
				return nil, &CatalogueError{file, lineNo, "", fmt.Sprintf("species header %q must look like [CO2]", line)}
			}
			formula := strings.TrimSpace(line[1 : len(line)-1])
			if _, err := ParseFormula(formula); err != nil {
				return nil, &CatalogueError{file, lineNo, "", strings.TrimPrefix(err.Error(), "model: ")}
			}
			if at, dup := headerAt[formula]; dup {
				return nil, &CatalogueError{file, lineNo, "", fmt.Sprintf("species [%s] given twice (first at line %d)", formula, at)}
			}
			headerAt[formula] = lineNo
			cur = &Species{Formula: formula, Sources: map[string]string{}}
			curLine = lineNo
			seen = map[string]bool{}
			continue
		}
		if cur == nil {
			return nil, &CatalogueError{file, lineNo, "", "field outside a species block (start one with [FORMULA])"}
		}
		key, value, ok := strings.Cut(line, "=")
		if !ok {
			return nil, &CatalogueError{file, lineNo, "", fmt.Sprintf("%q is not key = value", line)}
		}
		key = strings.TrimSpace(key)
		value, source, _ := strings.Cut(value, "|")
		value, source = strings.TrimSpace(value), strings.TrimSpace(source)
		want, known := catalogueFields[key]
		if sw, ok := safetyFields[key]; ok {
			want, known = sw, true
		}
		if !known {
			return nil, &CatalogueError{file, lineNo, key, "unknown field (known: " + knownFieldList() + ")"}
		}
		if seen[key] {
			return nil, &CatalogueError{file, lineNo, key, "given twice"}
		}
		seen[key] = true
		if err := setField(cur, key, value); err != nil {
			return nil, &CatalogueError{file, lineNo, key, fmt.Sprintf("%q: %v; want %s", value, err, want)}
		}
		if source != "" {
			cur.Sources[key] = source
		}
	}
	if err := scanner.Err(); err != nil {
		return nil, fmt.Errorf("model: %s: %w", file, err)
	}
	if err := finish(); err != nil {
		return nil, err
	}
	if len(out) == 0 {
		return nil, &CatalogueError{file, lineNo, "", "no species (start one with [FORMULA])"}
	}
	return out, nil
}

func knownFieldList() string {
	keys := make([]string, 0, len(catalogueFields)+len(safetyFields))
	for k := range catalogueFields {
		keys = append(keys, k)
	}
	keys = append(keys, SafetyFieldNames()...)
	sort.Strings(keys)
	return strings.Join(keys, ", ")
}

func setField(sp *Species, key, value string) error {
	if _, ok := safetyFields[key]; ok {
		return setSafetyField(&sp.Safety, key, value)
	}
	switch key {
	case "name":
		if value == "" {
			return fmt.Errorf("empty")
		}
		sp.Name = value
	case "note":
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
			return fmt.Errorf("unknown rotor")
		}
	case "rot_cm":
		xs, err := parseNumbers(value)
		if err != nil {
			return err
		}
		sp.RotConstPerCm = xs
	case "sigma":
		n, err := strconv.Atoi(value)
		if err != nil || n < 1 {
			return fmt.Errorf("not a whole number ≥ 1")
		}
		sp.Symmetry = n
	case "spin":
		xs, err := parseNumbers(value)
		if err != nil || len(xs) != 2 {
			return fmt.Errorf("need two numbers")
		}
		sp.SpinWeights = [2]float64{xs[0], xs[1]}
	case "vib_cm":
		modes, err := parseLevels(value)
		if err != nil {
			return err
		}
		for _, m := range modes {
			sp.Vib = append(sp.Vib, VibMode{m.EnergyPerCm, m.Degeneracy})
		}
	case "elec_cm":
		levels, err := parseLevels(value)
		if err != nil {
			return err
		}
		sp.Elec = levels
	case "dHf0_kJ":
		x, err := parseNumber(value)
		if err != nil {
			return err
		}
		sp.EnergyZeroJPerMol = x * 1000
	case "boil_K":
		x, err := parseNumber(value)
		if err != nil || x <= 0 {
			return fmt.Errorf("not a temperature above 0 K")
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
				return fmt.Errorf("unknown hazard %q", name)
			}
			sp.Hazards |= h
		}
	}
	return nil
}

func parseNumber(s string) (float64, error) {
	x, err := strconv.ParseFloat(s, 64)
	if err != nil || x != x || x > 1e300 || x < -1e300 {
		return 0, fmt.Errorf("not a number")
	}
	return x, nil
}

func parseNumbers(s string) ([]float64, error) {
	var out []float64
	for _, f := range strings.Fields(s) {
		x, err := parseNumber(f)
		if err != nil {
			return nil, fmt.Errorf("%q is not a number", f)
		}
		out = append(out, x)
	}
	if len(out) == 0 {
		return nil, fmt.Errorf("no numbers")
	}
	return out, nil
}

// parseLevels reads "1333 667x2 2349" into energies with degeneracies.
func parseLevels(s string) ([]ElecLevel, error) {
	var out []ElecLevel
	for _, f := range strings.Fields(s) {
		num, deg := f, "1"
		if a, b, ok := strings.Cut(f, "x"); ok {
			num, deg = a, b
		}
		x, err := parseNumber(num)
		if err != nil {
			return nil, fmt.Errorf("%q is not a number", num)
		}
		g, err := strconv.Atoi(deg)
		if err != nil || g < 1 {
			return nil, fmt.Errorf("degeneracy %q is not a whole number ≥ 1", deg)
		}
		out = append(out, ElecLevel{x, g})
	}
	if len(out) == 0 {
		return nil, fmt.Errorf("no levels")
	}
	return out, nil
}
