package model

import (
	"errors"
	"os"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"
)

// requiredSpecies must be in the built-in catalogue.
var requiredSpecies = []string{
	"He", "Ne", "Ar", "Kr", "Xe",
	"H2", "N2", "O2", "CO", "CO2", "H2O", "CH4", "C2H6", "C3H8", "C2H4", "C2H2",
	"NH3", "NO", "N2O", "NO2", "SO2", "H2S",
	"HCl", "HF", "Cl2", "F2", "SF6", "NF3", "CF4", "SiH4",
	"H", "O", "N", "OH",
}

func TestBuiltinCatalogue(t *testing.T) {
	list, err := ParseCatalogue("species.cat", strings.NewReader(builtinText))
	if err != nil {
		t.Fatalf("embedded catalogue: %v", err)
	}
	if len(list) < 34 {
		t.Errorf("embedded catalogue has %d species, want at least 34", len(list))
	}
	for _, f := range requiredSpecies {
		if sp, ok := Builtin().Lookup(f); !ok || sp.Formula != f {
			t.Errorf("species %s missing from the built-in catalogue", f)
		}
	}
	for _, sp := range Builtin().All() {
		if sp.Name == "" || sp.MolarMassKgPerMol <= 0 {
			t.Errorf("%s: name %q, molar mass %g", sp.Formula, sp.Name, sp.MolarMassKgPerMol)
		}
	}
}

// numericFields are the catalogue fields that hold numbers.
var numericFields = map[string]bool{
	"rot_cm": true, "sigma": true, "spin": true, "vib_cm": true,
	"elec_cm": true, "dHf0_kJ": true, "boil_K": true,
	"Tc_K": true, "Pc_bar": true, "omega": true,
}

// quotedJANAF matches a citation of a JANAF table read for this project:
// the tables quoted in janaf_test.go.
var quotedJANAF = regexp.MustCompile(`JANAF table (He-001|Ne-001|Ar-001|Kr-001|Xe-001|H-001|O-001|N-002|H-050|N-023|O-029|H-064|C-095|C-067|H-083|H-038)\b`)

// readFrom matches a value read from a named public page or compilation
// while the catalogue was written ("read from the CCCBDB n-butane page");
// the header of species.cat explains the phrase.
var readFrom = regexp.MustCompile(`\bread from (a copy of |the )?\S`)

// TestBuiltinSources reads the embedded file line by line: every numeric
// field carries a source after "|", and the source is honest about where
// the number came from. It says "from memory", or cites a JANAF table that
// was read (and is checked in janaf_test.go), or names the page it was
// read from, or states the structural fact
// a whole number follows from (a point group for σ, nuclear spins for the
// spin weights, a reference state for a zero enthalpy of formation).
func TestBuiltinSources(t *testing.T) {
	formula := ""
	for i, line := range strings.Split(builtinText, "\n") {
		line = strings.TrimSpace(line)
		if strings.HasPrefix(line, "[") {
			formula = strings.Trim(line, "[]")
			continue
		}
		key, rest, ok := strings.Cut(line, "=")
		key = strings.TrimSpace(key)
		if !ok || strings.HasPrefix(line, "#") || !numericFields[key] {
			continue
		}
		_, src, _ := strings.Cut(rest, "|")
		src = strings.TrimSpace(src)
		where := func() string { return formula + " " + key + " (species.cat:" + strconv.Itoa(i+1) + ")" }
		if src == "" {
			t.Errorf("%s: no source", where())
			continue
		}
		honest := strings.Contains(src, "from memory") || quotedJANAF.MatchString(src) || readFrom.MatchString(src) ||
			(key == "sigma" && strings.HasPrefix(src, "point group")) ||
			(key == "spin" && strings.Contains(src, "I(")) ||
			(key == "dHf0_kJ" && strings.Contains(src, "reference state"))
		if !honest {
			t.Errorf("%s: source %q neither says \"from memory\" nor cites a table that was read", where(), src)
		}
	}
	// The parsed species keep the sources under the field names.
	for _, sp := range Builtin().All() {
		need := []string{"dHf0_kJ"}
		if sp.Rotor != Atom {
			need = append(need, "rot_cm")
		}
		if len(sp.Vib) > 0 {
			need = append(need, "vib_cm")
		}
		if sp.Symmetry > 1 {
			need = append(need, "sigma")
		}
		if sp.Homonuclear() {
			need = append(need, "spin")
		}
		if sp.BoilingK > 0 {
			need = append(need, "boil_K")
		}
		for _, f := range need {
			if sp.Sources[f] == "" {
				t.Errorf("%s: Sources[%q] is empty", sp.Formula, f)
			}
		}
	}
}

// TestBuiltinHazards checks the hazard classes against the GHS classes on
// gas suppliers' safety data sheets (from memory). Every gas that can
// displace air and is not otherwise toxic is at least an asphyxiant;
// radicals, which no one bottles, and water have none.
func TestBuiltinHazards(t *testing.T) {
	want := map[string]Hazard{
		"He": Asphyxiant, "Ne": Asphyxiant, "Ar": Asphyxiant, "Kr": Asphyxiant, "Xe": Asphyxiant,
		"N2": Asphyxiant, "CO2": Asphyxiant, "SF6": Asphyxiant, "CF4": Asphyxiant,
		"H2": Flammable | Asphyxiant, "D2": Flammable | Asphyxiant,
		"CH4": Flammable | Asphyxiant, "C2H6": Flammable | Asphyxiant, "C3H8": Flammable | Asphyxiant,
		"C2H4": Flammable | Asphyxiant, "C2H2": Flammable | Asphyxiant,
		"O2": Oxidizer, "N2O": Oxidizer | Asphyxiant,
		"CO": Flammable | Toxic, "H2S": Toxic | Flammable,
		"NH3": Toxic | Corrosive | Flammable,
		"NO":  Toxic | Oxidizer, "NO2": Toxic | Oxidizer | Corrosive, "NF3": Oxidizer | Toxic,
		"F2": Oxidizer | Toxic | Corrosive, "Cl2": Oxidizer | Toxic | Corrosive,
		"SO2": Toxic | Corrosive, "HF": Toxic | Corrosive, "HCl": Toxic | Corrosive,
		"SiH4": Pyrophoric | Flammable, "PH3": Toxic | Pyrophoric | Flammable,
		"HBr": Toxic | Corrosive, "CHF3": Asphyxiant, "BF3": Toxic | Corrosive, "BCl3": Toxic | Corrosive,
		"AsH3": Toxic | Flammable, "ClF3": Oxidizer | Toxic | Corrosive,
		"C3H6": Flammable | Asphyxiant, "C2F6": Asphyxiant,
		"B2H6": Flammable | Toxic | Pyrophoric, "GeH4": Toxic | Flammable | Pyrophoric,
		"WF6": Toxic | Corrosive, "SiH2Cl2": Toxic | Flammable | Corrosive,
		"n-C4H10": Flammable | Asphyxiant, "i-C4H10": Flammable | Asphyxiant,
		"H": 0, "O": 0, "N": 0, "OH": 0, "H2O": 0,
	}
	for _, sp := range Builtin().All() {
		w, ok := want[sp.Formula]
		if !ok {
			t.Errorf("%s: no expected hazard classes in this test; add them", sp.Formula)
			continue
		}
		if sp.Hazards != w {
			t.Errorf("%s hazards = %q, want %q", sp.Formula, sp.Hazards, w)
		}
		if sp.BoilingK == 0 && w != 0 {
			t.Errorf("%s is a bottled gas without a boiling point", sp.Formula)
		}
	}
}

// catalogueErrorCases are bad catalogue files and where their error must
// point.
var catalogueErrorCases = []struct {
	name  string
	text  string
	line  int
	field string
	msg   string // in the message
}{
	{"bad number", "[N2]\nname = nitrogen\nrotor = linear\nrot_cm = 1.99q\ndHf0_kJ = 0\n", 4, "rot_cm", `"1.99q" is not a number`},
	{"NaN number", "[Ar]\nname = argon\nrotor = atom\ndHf0_kJ = NaN\n", 4, "dHf0_kJ", "not a number"},
	{"unknown field", "[Ar]\nname = argon\ncolour = blue\n", 3, "colour", "unknown field"},
	{"unknown hazard", "[H2]\nname = hydrogen\nhazards = flammable, explosive\n", 3, "hazards", `unknown hazard "explosive"`},
	{"unknown rotor", "[Ar]\nname = argon\nrotor = spinning\n", 3, "rotor", "unknown rotor"},
	{"bad degeneracy", "[CO2]\nname = c\nrotor = linear\nrot_cm = 0.39\nvib_cm = 667x0\ndHf0_kJ = 0\n", 5, "vib_cm", "degeneracy"},
	{"missing rot_cm", "# comment\n[CO]\nname = carbon monoxide\nrotor = linear\ndHf0_kJ = -113.8\n", 2, "rot_cm", "missing for a linear rotor"},
	{"missing name", "[Ar]\nrotor = atom\ndHf0_kJ = 0\n", 1, "name", "missing"},
	{"duplicate field", "[N2]\nname = nitrogen\nboil_K = 77\nboil_K = 78\n", 4, "boil_K", "given twice"},
	{"duplicate species", "[Ar]\nname = a\nrotor = atom\ndHf0_kJ = 0\n\n[Ar]\nname = b\nrotor = atom\ndHf0_kJ = 0\n", 6, "", "given twice (first at line 1)"},
	{"spin weights need σ = 2", "[N2]\nname = n\nrotor = linear\nrot_cm = 2\nspin = 6 3\ndHf0_kJ = 0\n", 1, "", "symmetry number 2"},
	{"excited ground level", "[O]\nname = o\nrotor = atom\nelec_cm = 5x2\ndHf0_kJ = 0\n", 4, "elec_cm", `"5x2": the first level is the ground level; want it at 0 cm⁻¹`},
	{"three constants for a linear rotor", "[CO]\nname = c\nrotor = linear\nrot_cm = 1 2 3\ndHf0_kJ = 0\n", 1, "", "takes 1 rotational constants, got 3"},
	{"field outside a block", "name = orphan\n", 1, "", "field outside a species block"},
	{"not key = value", "[Ar]\nname argon\n", 2, "", "is not key = value"},
	{"bad header", "[N2\nname = n\n", 1, "", "must look like [CO2]"},
	{"unknown element", "[Qq2]\n", 1, "", `unknown element "Qq"`},
	{"no species", "# only a comment\n", 1, "", "no species"},
}

func TestParseCatalogueErrors(t *testing.T) {
	for _, tt := range catalogueErrorCases {
		_, err := ParseCatalogue("site.cat", strings.NewReader(tt.text))
		var ce *CatalogueError
		if !errors.As(err, &ce) {
			t.Errorf("%s: error %v, want a *CatalogueError", tt.name, err)
			continue
		}
		if ce.File != "site.cat" || ce.Line != tt.line || ce.Field != tt.field || !strings.Contains(ce.Msg, tt.msg) {
			t.Errorf("%s: got %s:%d field %q: %s; want site.cat:%d field %q containing %q", tt.name, ce.File, ce.Line, ce.Field, ce.Msg, tt.line, tt.field, tt.msg)
		}
		msg := err.Error()
		prefix := "site.cat:" + strconv.Itoa(tt.line) + ":"
		if !strings.HasPrefix(msg, prefix) || (tt.field != "" && !strings.Contains(msg, `field "`+tt.field+`"`)) || strings.Contains(msg, "\n") {
			t.Errorf("%s: message %q, want one line starting %q and naming the field", tt.name, msg, prefix)
		}
	}
}

// siteFile is a user catalogue of an invented lab: it overrides nitrogen
// (a made-up boiling point, so that the override shows) and adds a species.
// Its numbers are test fixtures, not data.
const siteFile = `# test fixture
[N2]
name    = nitrogen (site)
rotor   = linear
rot_cm  = 1.98957 | test fixture
sigma   = 2       | test fixture
spin    = 6 3     | test fixture
vib_cm  = 2329.9  | test fixture
dHf0_kJ = 0       | test fixture
boil_K  = 77.0    | test fixture
hazards = asphyxiant

[ClF]
name    = chlorine monofluoride
rotor   = linear
rot_cm  = 0.516   | test fixture
vib_cm  = 773     | test fixture
dHf0_kJ = -50     | test fixture
hazards = toxic, corrosive
`

func TestCatalogueWithFile(t *testing.T) {
	path := filepath.Join(t.TempDir(), "site.cat")
	if err := os.WriteFile(path, []byte(siteFile), 0o600); err != nil {
		t.Fatal(err)
	}
	base := Builtin()
	c, err := base.WithFile(path)
	if err != nil {
		t.Fatalf("WithFile: %v", err)
	}
	if got, want := len(c.All()), len(base.All())+1; got != want {
		t.Errorf("WithFile: %d species, want %d (one added, one overridden)", got, want)
	}
	n2, _ := c.Lookup("N2")
	if n2.BoilingK != 77.0 || n2.Name != "nitrogen (site)" {
		t.Errorf("overridden N2: boiling %g K, name %q; want the site file's", n2.BoilingK, n2.Name)
	}
	for i, sp := range base.All() {
		if sp.Formula == "N2" && c.All()[i] != n2 {
			t.Errorf("overridden N2 moved from position %d", i)
		}
	}
	if last := c.All()[len(c.All())-1]; last.Formula != "ClF" || last.Hazards != Toxic|Corrosive {
		t.Errorf("added species: last is %s (%v), want ClF (toxic, corrosive)", last.Formula, last.Hazards)
	}
	if orig, _ := base.Lookup("N2"); orig.BoilingK != 77.355 {
		t.Errorf("WithFile changed the built-in N2: boiling %g K", orig.BoilingK)
	}

	if _, err := base.WithFile(filepath.Join(t.TempDir(), "absent.cat")); err == nil || !strings.Contains(err.Error(), "absent.cat") {
		t.Errorf("WithFile(absent file) error %v, want one naming the file", err)
	}
	bad := filepath.Join(t.TempDir(), "bad.cat")
	if err := os.WriteFile(bad, []byte("[Ar]\nname = argon\nrotor = atom\ndHf0_kJ = zero\n"), 0o600); err != nil {
		t.Fatal(err)
	}
	var ce *CatalogueError
	if _, err := base.WithFile(bad); !errors.As(err, &ce) || ce.File != bad || ce.Line != 4 || ce.Field != "dHf0_kJ" {
		t.Errorf("WithFile(bad file) error %v, want %s:4 field dHf0_kJ", err, bad)
	}
}

func TestCatalogueLookup(t *testing.T) {
	c := Builtin()
	tests := []struct{ key, want string }{
		{"CO2", "CO2"},
		{"co2", "CO2"},
		{"Co", "CO"}, // no exact match: case-insensitive formula
		{"carbon dioxide", "CO2"},
		{"Silane", "SiH4"},
	}
	for _, tt := range tests {
		if sp, ok := c.Lookup(tt.key); !ok || sp.Formula != tt.want {
			t.Errorf("Lookup(%q) = %v, %v; want %s", tt.key, sp, ok, tt.want)
		}
	}
	if _, ok := c.Lookup("unobtainium"); ok {
		t.Errorf("Lookup(unobtainium) found a species")
	}
	if got := c.Suggest("nitrgen", 3); len(got) == 0 || got[0] != "N2" {
		t.Errorf("Suggest(nitrgen) = %v, want N2 first", got)
	}
	if got := c.Search("meth"); len(got) == 0 || got[0].Formula != "CH4" {
		t.Errorf("Search(meth) first = %v, want CH4", got)
	}
}

// TestAbsentSpecies: a gas the catalogue is known to lack is named with
// the reason, under its formula, its prefixed formula and its names,
// until a species file adds it.
func TestAbsentSpecies(t *testing.T) {
	c := Builtin()
	for _, key := range []string{"c-C4F8", "C4F8", "octafluorocyclobutane", "RC318", " c-c4f8 "} {
		h := c.UnknownHint(key)
		if !strings.Contains(h, "not in the built-in catalogue") || !strings.Contains(h, "--species FILE") {
			t.Errorf("UnknownHint(%q) = %q, want the reason c-C4F8 is missing", key, h)
		}
	}
	if h := c.UnknownHint("C4H10"); !strings.Contains(h, "n-C4H10") {
		t.Errorf("UnknownHint(C4H10) = %q, want the isomers", h)
	}
	if h := c.UnknownHint("Xq"); !strings.HasPrefix(h, "did you mean") {
		t.Errorf("UnknownHint(Xq) = %q, want the nearest names", h)
	}
	list, err := ParseCatalogue("ring.cat", strings.NewReader("[c-C4F8]\nname = octafluorocyclobutane\nrotor = nonlinear\nrot_cm = 0.04 0.03 0.02 | test fixture\n"+
		"vib_cm = 1000x5 900x5 500x5 400x5 200x5 100x5 | test fixture\ndHf0_kJ = -1500 | test fixture\n"))
	if err != nil {
		t.Fatal(err)
	}
	with := newCatalogue(append(append([]*Species(nil), c.All()...), list...))
	if _, ok := with.AbsentHint("C4F8"); ok {
		t.Error("with c-C4F8 added by a species file, AbsentHint still says it is missing")
	}
}
