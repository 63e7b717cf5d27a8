package model

import (
	_ "embed"
	"errors"
	"io/fs"
	"os"
	"sort"
	"strings"
	"sync"
)

//go:embed species.cat
var builtinText string

// Catalogue is a set of species addressed by formula.
type Catalogue struct {
	species   []*Species
	byFormula map[string]*Species
	spinMods  []*Species // named spin modifications, in catalogue order
}

var (
	builtinOnce sync.Once
	builtinCat  *Catalogue
)

// Builtin returns the catalogue embedded in the program. It is parsed once;
// callers must not modify the species it returns.
func Builtin() *Catalogue {
	builtinOnce.Do(func() {
		list, err := parseCatalogue("species.cat", strings.NewReader(builtinText), true)
		if err != nil {
			// The embedded file is tested; failing here is a build defect.
			panic(err)
		}
		builtinCat = newCatalogue(list)
	})
	return builtinCat
}

func newCatalogue(list []*Species) *Catalogue {
	list, variants := withSpinVariants(list)
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
	// The spin modifications are names, not entries of the list: they
	// share everything but their rotor with the species they derive from.
	for _, sp := range variants {
		if _, taken := c.byFormula[sp.Formula]; !taken {
			c.byFormula[sp.Formula] = sp
			c.spinMods = append(c.spinMods, sp)
		}
	}
	return c
}

// SpinModifications lists the named spin modifications (eH2, nH2, pH2,
// eD2, nD2, oD2) that Lookup answers to besides the entries of All.
func (c *Catalogue) SpinModifications() []*Species { return c.spinMods }

// WithFile returns a new catalogue: this one with the species of a user
// file added, or overriding those of the same formula.
func (c *Catalogue) WithFile(path string) (*Catalogue, error) {
	f, err := os.Open(path)
	if err != nil {
		// The path comes from the user: the error repeats it made safe,
		// and stays a *fs.PathError for callers that sort failures.
		var pe *fs.PathError
		if errors.As(err, &pe) {
			err = &fs.PathError{Op: pe.Op, Path: Printable(pe.Path), Err: pe.Err}
		}
		return nil, Errorf("model", "species file: %w", err)
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
	// A name in words matches whatever the spacing between them.
	words := strings.Join(strings.Fields(key), " ")
	for _, sp := range c.species {
		if strings.EqualFold(sp.Formula, key) || strings.EqualFold(sp.Name, words) {
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
