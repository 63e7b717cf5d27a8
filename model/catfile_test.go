package model

import (
	"errors"
	"math"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
)

// speciesBlock is a valid species file for CO2 with one field replaced:
// the tests below put a bad value in that field.
func speciesBlock(field, value string) string {
	fields := []struct{ key, value string }{
		{"name", "carbon dioxide (test)"},
		{"rotor", "linear"},
		{"rot_cm", "0.39022"},
		{"sigma", "2"},
		{"spin", "1 0"},
		{"vib_cm", "1333 667.4x2 2349.1"},
		{"elec_cm", "0x1"},
		{"dHf0_kJ", "-393.151"},
		{"boil_K", "194.69"},
		{"note", "test fixture"},
	}
	var b strings.Builder
	b.WriteString("[CO2]\n")
	for _, f := range fields {
		v := f.value
		if f.key == field {
			v = value
		}
		b.WriteString(f.key + " = " + v + "\n")
	}
	return b.String()
}

// lineOf is the line of field in speciesBlock.
func lineOf(field string) int {
	for i, l := range strings.Split(speciesBlock("", ""), "\n") {
		if strings.HasPrefix(l, field+" ") {
			return i + 1
		}
	}
	return 0
}

// TestSpeciesFileRanges: every number of a species file lies in a
// physical range, checked when the file is read. The error names
// file:line, the field, the value as typed and the range accepted. The
// first rows are the reproductions of issue 7 (a degeneracy sum that
// wrapped to −2 and gave Cp below 5R/2; rotational constants that loaded
// and then failed every state with a message about temperature).
func TestSpeciesFileRanges(t *testing.T) {
	tests := []struct {
		name, field, value string
		want               []string // in the message
	}{
		{"degeneracies that overflow when summed", "vib_cm", "500x9223372036854775807 500x9223372036854775807",
			[]string{`"500x9223372036854775807"`, `degeneracy "9223372036854775807" is out of range`, "vibrational degeneracy from 1 to 5"}},
		{"one huge degeneracy", "vib_cm", "1333 667.4x1000000 2349.1", []string{`"1000000" is out of range`, "from 1 to 5"}},
		{"degeneracy past int64", "vib_cm", "1333 667.4x99999999999999999999 2349.1", []string{"out of range", "from 1 to 5"}},
		{"negative degeneracy", "vib_cm", "1333 667.4x-2 2349.1", []string{`"-2" is out of range`}},
		{"wavenumber zero", "vib_cm", "1333 0x2 2349.1", []string{`"0" is out of range`, "vibrational wavenumber from 1 to 5000 cm⁻¹"}},
		{"wavenumber huge", "vib_cm", "1333 667.4x2 1e300", []string{`"1e300" is out of range`, "from 1 to 5000"}},
		{"wavenumber not a number", "vib_cm", "1333 667.4x2 23a9", []string{`"23a9" is not a number`}},
		{"too few modes", "vib_cm", "1333 667.4 2349.1", []string{"3 modes", "3 atoms (CO2) has 4"}},
		{"too many modes", "vib_cm", "1333 667.4x3 2349.1", []string{"5 modes", "has 4"}},
		{"rotational constant tiny", "rot_cm", "1e-300", []string{`"1e-300" is out of range`, "rotational constant from 0.0001 to 100 cm⁻¹"}},
		{"rotational constant huge", "rot_cm", "1e300", []string{`"1e300" is out of range`}},
		{"rotational constant overflows", "rot_cm", "1e999", []string{`"1e999" is out of range`}},
		{"rotational constant negative", "rot_cm", "-0.39", []string{`"-0.39" is out of range`}},
		{"electronic level huge", "elec_cm", "0x1 5e5x2", []string{`"5e5" is out of range`, "electronic level from 0 to 200000 cm⁻¹"}},
		{"electronic level negative", "elec_cm", "0x1 -100x2", []string{`"-100" is out of range`}},
		{"electronic degeneracy huge", "elec_cm", "0x1 1000x101", []string{`"101" is out of range`, "electronic degeneracy from 1 to 100"}},
		{"electronic degeneracy zero", "elec_cm", "0x0", []string{`"0" is out of range`}},
		{"too many electronic levels", "elec_cm", "0x1" + strings.Repeat(" 1000x1", 100), []string{"more than 100 levels"}},
		{"symmetry number huge", "sigma", "61", []string{`"61" is out of range`, "symmetry number from 1 to 60"}},
		{"symmetry number not whole", "sigma", "2.5", []string{`"2.5" is not a whole number`}},
		{"spin weight huge", "spin", "1 1000", []string{`"1000" is out of range`, "spin weight from 0 to 100"}},
		{"spin weights both zero", "spin", "0 0", []string{"not both 0"}},
		{"enthalpy huge", "dHf0_kJ", "-1e6", []string{`"-1e6" is out of range`, "enthalpy of formation from -10000 to 10000 kJ/mol"}},
		{"enthalpy infinite", "dHf0_kJ", "-Inf", []string{`"-Inf" is out of range`}},
		{"boiling point zero", "boil_K", "0", []string{`"0" is out of range`, "boiling point from 1 to 6000 K"}},
		{"boiling point huge", "boil_K", "1e5", []string{`"1e5" is out of range`}},
	}
	for _, tt := range tests {
		_, err := ParseCatalogue("lab.cat", strings.NewReader(speciesBlock(tt.field, tt.value)))
		var ce *CatalogueError
		if !errors.As(err, &ce) {
			t.Errorf("%s: error %v, want a *CatalogueError", tt.name, err)
			continue
		}
		msg := UserMessage(err)
		prefix := "lab.cat:" + strconv.Itoa(lineOf(tt.field)) + `: field "` + tt.field + `": `
		if !strings.HasPrefix(msg, prefix) {
			t.Errorf("%s: message %q, want it to start %q", tt.name, msg, prefix)
		}
		for _, w := range tt.want {
			if !strings.Contains(msg, w) {
				t.Errorf("%s: message %q, want it to hold %q", tt.name, msg, w)
			}
		}
	}
}

// TestSpeciesFileShape: the rotor agrees with the number of atoms.
func TestSpeciesFileShape(t *testing.T) {
	tests := []struct{ name, text, want string }{
		{"molecule as an atom", "[N2]\nname = n\nrotor = atom\ndHf0_kJ = 0\n", "N2 has 2 atoms; want linear or nonlinear, not atom"},
		{"atom with vibrations", "[Ar]\nname = a\nrotor = atom\nvib_cm = 100\ndHf0_kJ = 0\n", "an atom of 1 atoms (Ar) has 0"},
		{"atom as linear", "[Ar]\nname = a\nrotor = linear\nrot_cm = 1\ndHf0_kJ = 0\n", "Ar is one atom; want atom, not linear"},
		{"diatomic as nonlinear", "[CO]\nname = c\nrotor = nonlinear\nrot_cm = 1 1 1\nvib_cm = 2143\ndHf0_kJ = 0\n", "a nonlinear molecule needs at least 3"},
		{"linear with σ 3", "[CO]\nname = c\nrotor = linear\nrot_cm = 1.9\nsigma = 3\nvib_cm = 2143\ndHf0_kJ = 0\n", "a linear molecule has σ = 1 or 2"},
	}
	for _, tt := range tests {
		_, err := ParseCatalogue("lab.cat", strings.NewReader(tt.text))
		if err == nil || !strings.Contains(err.Error(), tt.want) || !strings.HasPrefix(err.Error(), "lab.cat:") {
			t.Errorf("%s: error %v, want lab.cat:… holding %q", tt.name, err, tt.want)
		}
	}
}

// TestSpeciesFileText: names, formulas and other text holding control
// characters, invalid UTF-8 or too many characters are refused with
// file:line and field, and the message itself carries no control
// character.
func TestSpeciesFileText(t *testing.T) {
	tests := []struct {
		name, text string
		line       int
		field      string
		want       string
	}{
		{"escape in a name", speciesBlock("name", "EVIL\x1b[2J\x1b[1;1HHACKED"), lineOf("name"), "name", `"EVIL\x1b[2J\x1b[1;1HHACKED" holds U+001B`},
		{"tab inside a name", speciesBlock("name", "carbon\tdioxide"), lineOf("name"), "name", "U+0009"},
		{"bidi override in a name", speciesBlock("name", "carbon \u202edioxide"), lineOf("name"), "name", "U+202E"},
		{"invalid UTF-8 in a name", speciesBlock("name", "carbon \xff dioxide"), lineOf("name"), "name", "byte 0xff (not UTF-8)"},
		{"escape in a note", speciesBlock("note", "sublimes\x1b]0;pwned\x07"), lineOf("note"), "note", "U+001B"},
		{"escape in a source", speciesBlock("rot_cm", "0.39022 | H&H\x1b[31m"), lineOf("rot_cm"), "rot_cm", "source"},
		{"escape in a field name", "[CO2]\nna\x1bme = x\n", 2, "na\x1bme", "unknown field"},
		{"escape in a formula", "[CO\x1b[2J]\n", 1, "", `"CO\x1b[2J"`},
		{"name too long", speciesBlock("name", strings.Repeat("n", 65)), lineOf("name"), "name", "65 characters long; want at most 64"},
		{"note too long", speciesBlock("note", strings.Repeat("n", 501)), lineOf("note"), "note", "want at most 500"},
		{"source too long", speciesBlock("boil_K", "194.69 | "+strings.Repeat("s", 301)), lineOf("boil_K"), "boil_K", "want at most 300"},
	}
	for _, tt := range tests {
		_, err := ParseCatalogue("lab.cat", strings.NewReader(tt.text))
		var ce *CatalogueError
		if !errors.As(err, &ce) {
			t.Errorf("%s: error %v, want a *CatalogueError", tt.name, err)
			continue
		}
		if ce.Line != tt.line || ce.Field != tt.field || !strings.Contains(ce.Msg, tt.want) {
			t.Errorf("%s: got line %d field %q: %s; want line %d field %q holding %q", tt.name, ce.Line, ce.Field, ce.Msg, tt.line, tt.field, tt.want)
		}
		if msg := UserMessage(err); Printable(msg) != msg {
			t.Errorf("%s: message %q holds characters that are not printable", tt.name, msg)
		}
	}
	// What loads is printable everywhere it may be shown.
	for _, sp := range Builtin().All() {
		for _, s := range []string{sp.Formula, sp.Name, sp.Notes} {
			if Printable(s) != s {
				t.Errorf("%s: %q is not printable", sp.Formula, s)
			}
		}
		for k, s := range sp.Sources {
			if Printable(s) != s {
				t.Errorf("%s: source of %s %q is not printable", sp.Formula, k, s)
			}
		}
	}
}

// endless is an io.Reader that never ends: one byte pattern, repeated.
type endless struct {
	pattern []byte
	read    int64
}

func (e *endless) Read(p []byte) (int, error) {
	for i := range p {
		p[i] = e.pattern[(e.read+int64(i))%int64(len(e.pattern))]
	}
	e.read += int64(len(p))
	return len(p), nil
}

// TestSpeciesFileBounded: a line over MaxSpeciesLineBytes is refused with
// its file and line, not "bufio.Scanner: token too long", and neither an
// endless line nor an endless file of short lines is read past its bound,
// so that any file opens or is refused at once.
func TestSpeciesFileBounded(t *testing.T) {
	// A 4 MB line: a note of that size in an otherwise good file.
	dir := t.TempDir()
	huge := filepath.Join(dir, "huge.cat")
	text := "# site file\n[Ar]\nname = argon\nnote = " + strings.Repeat("n", 4<<20) + "\nrotor = atom\ndHf0_kJ = 0\n"
	if err := os.WriteFile(huge, []byte(text), 0o600); err != nil {
		t.Fatal(err)
	}
	_, err := Builtin().WithFile(huge)
	var ce *CatalogueError
	if !errors.As(err, &ce) || ce.File != huge || ce.Line != 4 {
		t.Fatalf("WithFile(4 MB line) error %v, want %s:4", err, huge)
	}
	if msg := UserMessage(err); !strings.Contains(msg, "line is over 64 KiB; a line may hold at most 65536 bytes") || strings.Contains(msg, "token too long") {
		t.Errorf("WithFile(4 MB line) message %q", msg)
	}
	// A line of exactly the limit is read (and then judged on its merits).
	atLimit := "[Ar]\nname = argon\nnote = " + strings.Repeat("n", MaxSpeciesLineBytes-len("note = ")) + "\n"
	if _, err := ParseCatalogue("lab.cat", strings.NewReader(atLimit)); err == nil || strings.Contains(err.Error(), "line is over") || !strings.Contains(err.Error(), "want at most 500") {
		t.Errorf("a line of %d bytes: error %v, want the note refused for its length, not the line", MaxSpeciesLineBytes, err)
	}

	endlessLine := &endless{pattern: []byte("n")}
	_, err = ParseCatalogue("pipe", endlessLine)
	if !errors.As(err, &ce) || ce.Line != 1 || !strings.Contains(ce.Msg, "line is over") {
		t.Errorf("an endless line: error %v, want pipe:1: line is over …", err)
	}
	if endlessLine.read > 2*MaxSpeciesLineBytes {
		t.Errorf("an endless line: read %d bytes before refusing it, want at most %d", endlessLine.read, 2*MaxSpeciesLineBytes)
	}
	endlessFile := &endless{pattern: []byte("# a comment\n")}
	_, err = ParseCatalogue("pipe", endlessFile)
	if !errors.As(err, &ce) || !strings.Contains(ce.Msg, "a species file may hold at most 1048576 bytes") {
		t.Errorf("an endless file: error %v, want the size limit", err)
	}
	if endlessFile.read > MaxSpeciesFileBytes+2*MaxSpeciesLineBytes {
		t.Errorf("an endless file: read %d bytes before refusing it, want at most %d", endlessFile.read, MaxSpeciesFileBytes+2*MaxSpeciesLineBytes)
	}
	// CRLF line ends read as LF ones.
	if _, err := ParseCatalogue("dos.cat", strings.NewReader("[Ar]\r\nname = argon\r\nrotor = atom\r\ndHf0_kJ = 0\r\n")); err != nil {
		t.Errorf("CRLF file: %v", err)
	}
}

// loadableSpecies returns the built-in species and those of every species
// file under testdata/species that loads.
func loadableSpecies(t *testing.T) []*Species {
	t.Helper()
	all := append([]*Species(nil), Builtin().All()...)
	files, err := filepath.Glob(filepath.Join("..", "testdata", "species", "*.cat"))
	if err != nil {
		t.Fatal(err)
	}
	loaded := 0
	for _, f := range files {
		c, err := (&Catalogue{byFormula: map[string]*Species{}}).WithFile(f)
		if err != nil {
			t.Logf("%s does not load: %v", f, UserMessage(err))
			continue
		}
		loaded++
		all = append(all, c.All()...)
	}
	if loaded == 0 {
		t.Fatalf("no species file under testdata/species loads (of %d)", len(files))
	}
	return all
}

// TestEveryStateIsPhysical: for every species that loads, at every
// temperature the model accepts, over pressures from the smallest to the
// largest a float64 holds and under every treatment, Cp ≥ 5R/2 (each
// internal factor's Cv/R is a variance of energy over kT², so it cannot be
// negative) and 1 < γ ≤ 5/3, to rounding.
func TestEveryStateIsPhysical(t *testing.T) {
	const rounding = 1e-9 // in units of R
	r := GasConstant
	var temps []float64
	for lt := math.Log10(MinTempK); lt <= math.Log10(MaxTempK)+1e-9; lt += 0.125 {
		temps = append(temps, math.Pow(10, lt))
	}
	temps = append(temps, RefTempK, 812.5)
	press := []float64{1e-300, 1, 1e5, 1e8, 1e300}
	var treatments []Treatment
	for _, rot := range []RotationTreatment{RotationAuto, RotationSummed, RotationClassical} {
		for _, vib := range []VibrationTreatment{VibrationHarmonic, VibrationFrozen} {
			for _, el := range []ElectronicTreatment{ElectronicLevels, ElectronicGroundOnly} {
				for _, lev := range []LevelTreatment{LevelsDefault, LevelsSummed, LevelsRigidHarmonic} {
					treatments = append(treatments, Treatment{Rotation: rot, Vibration: vib, Electronic: el, Levels: lev})
				}
			}
		}
	}
	for _, sp := range loadableSpecies(t) {
		fails := 0
		for _, tr := range treatments {
			for _, tempK := range temps {
				for _, presPa := range press {
					s, err := sp.StateWith(tempK, presPa, tr)
					if err != nil {
						t.Fatalf("%s at %g K, %g Pa: %v", sp.Formula, tempK, presPa, err)
					}
					gamma := s.CpJPerMolK / s.CvJPerMolK
					if s.CpJPerMolK < 2.5*r*(1-rounding) || !(gamma > 1) || gamma > 5.0/3*(1+rounding) {
						if fails++; fails <= 3 {
							t.Errorf("%s at %g K, %g Pa, %+v: Cp = %.12g J/(mol·K) (5R/2 = %.12g), γ = %.12g; want Cp ≥ 5R/2 and 1 < γ ≤ 5/3", sp.Formula, tempK, presPa, tr, s.CpJPerMolK, 2.5*r, gamma)
						}
					}
				}
			}
		}
	}
}

// FuzzParseCatalogue: any file either is refused with one printable line
// naming the file, or loads species whose every state is physical
// (Cp ≥ 5R/2, 1 < γ ≤ 5/3) and whose text is printable.
func FuzzParseCatalogue(f *testing.F) {
	f.Add(speciesBlock("", ""))
	f.Add(speciesBlock("vib_cm", "500x9223372036854775807 500x9223372036854775807"))
	f.Add("[H2O]\nname = w\nrotor = nonlinear\nrot_cm = 1e-300 1 1\nvib_cm = 1595 3657 3756\ndHf0_kJ = -238.9\n")
	f.Add("[O]\nname = o\nrotor = atom\nelec_cm = 0x5 158.265x3 226.977x1\ndHf0_kJ = 246.8\n")
	f.Add("[H2]\nname = h\nrotor = linear\nrot_cm = 59.3\nsigma = 2\nspin = 1 3\nvib_cm = 4161\ndHf0_kJ = 0\n")
	r := GasConstant
	f.Fuzz(func(t *testing.T, text string) {
		list, err := ParseCatalogue("fuzz.cat", strings.NewReader(text))
		if err != nil {
			msg := UserMessage(err)
			if !strings.HasPrefix(msg, "fuzz.cat") || Printable(msg) != msg {
				t.Fatalf("error %q: want one printable line starting with the file name", msg)
			}
			return
		}
		for _, sp := range list {
			for _, s := range []string{sp.Formula, sp.Name, sp.Notes} {
				if Printable(s) != s {
					t.Fatalf("%q loaded with text %q that is not printable", sp.Formula, s)
				}
			}
			for _, tempK := range []float64{MinTempK, 1, 77, 300, 3000, MaxTempK} {
				s, err := sp.State(tempK, 1e5)
				if err != nil {
					t.Fatalf("%s at %g K: %v", sp.Formula, tempK, err)
				}
				gamma := s.CpJPerMolK / s.CvJPerMolK
				if s.CpJPerMolK < 2.5*r*(1-1e-9) || !(gamma > 1) || gamma > 5.0/3*(1+1e-9) {
					t.Fatalf("%s at %g K: Cp = %g, γ = %g", sp.Formula, tempK, s.CpJPerMolK, gamma)
				}
			}
		}
	})
}

// Species are prepared while the file is read on, yet the error shown is
// the first in file order: a block that fails to prepare comes before a
// bad line further down, and a bad line before a block after it.
func TestSpeciesFileFirstErrorInOrder(t *testing.T) {
	badShape := "[N2]\nname = n\nrotor = atom\ndHf0_kJ = 0\n"                            // fails when prepared
	good := "[CO]\nname = c\nrotor = linear\nrot_cm = 1.9\nvib_cm = 2143\ndHf0_kJ = 0\n" // prepares
	badLine := "[Ar]\nname = a\ncolour = blue\n"                                         // fails as read
	tests := []struct{ name, text, want string }{
		{"prepare error first", badShape + good + badLine, "lab.cat:3:"}, // its rotor line
		{"line error first", good + badLine + badShape, "lab.cat:9:"},
	}
	for _, tt := range tests {
		for i := 0; i < 20; i++ { // the goroutines' order must not matter
			_, err := ParseCatalogue("lab.cat", strings.NewReader(tt.text))
			if err == nil || !strings.HasPrefix(err.Error(), tt.want) {
				t.Fatalf("%s: error %v, want one starting %q", tt.name, err, tt.want)
			}
		}
	}
}
