package report

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"zmix/mixtures"
	"zmix/model"
)

// The digits of Sig are mixtures.FormatSig's, tested in
// mixtures/format_test.go; these are the rules this package adds: one
// spelling for non-finite values, no sign on a zero, exponent form for
// fixed figures too wide to read.
func TestNumberRules(t *testing.T) {
	tests := []struct {
		name string
		got  string
		want string
	}{
		{"Sig delegates", Sig(1.18385, 5), mixtures.FormatSig(1.18385, 5)},
		{"Sig small", Sig(4e-7, 5), mixtures.FormatSig(4e-7, 5)},
		{"Sig NaN", Sig(math.NaN(), 4), NotANumber},
		{"Short Inf", Short(math.Inf(1), 4), NotANumber},
		{"Fixed -Inf", Fixed(math.Inf(-1), 3), NotANumber},
		{"Fixed signed zero", Fixed(-0.0001, 3), "0.000"},
		{"Fixed negative zero", Fixed(math.Copysign(0, -1), 3), "0.000"},
		{"Fixed negative", Fixed(-0.0006, 3), "-0.001"},
		{"Sig negative zero", Sig(math.Copysign(0, -1), 4), "0.000"},
		{"Short negative zero", Short(math.Copysign(0, -1), 4), "0"},
		{"Fixed everyday", Fixed(-50.7543, 3), "-50.754"},
		{"Fixed wide", Fixed(1e300, 3), "1.000000e+300"},
		{"Fixed just below wide", Fixed(999999999.1234, 3), "999999999.123"},
		{"Fixed wide negative", Fixed(-2.5e12, 3), "-2.500000e+12"},
		{"Number decimals", Number(-1.2345, mixtures.Digits{Decimals: 2}), "-1.23"},
		{"Number sig", Number(1.2345, mixtures.Digits{Sig: 3}), "1.23"},
		{"Percent", Percent(1, 3), "33.3 %"},
		{"Percent of zero", Percent(1, 0), "-"},
	}
	for _, tt := range tests {
		if tt.got != tt.want {
			t.Errorf("%s: got %q, want %q", tt.name, tt.got, tt.want)
		}
	}
}

func TestToASCII(t *testing.T) {
	tests := []struct{ in, want string }{
		{"J/(mol·K)", "J/(mol.K)"},
		{"P° = 1 bar, μᵢ°", "P0 = 1 bar, mu_i0"},
		{"25 °C, γ, ρ kg/m³", "25 C, gamma, rho kg/m3"},
		{"−R Σ xᵢ ln xᵢ", "-R sum x_i ln x_i"},
		{"T/Θrot ≫ 1 → ok …", "T/Theta_rot >> 1 -> ok ..."},
		{"ΔSmix ± η", "DeltaSmix +/- eta"},
		{"name in 日本", "name in ??"},
	}
	for _, tt := range tests {
		got := ToASCII(tt.in)
		if got != tt.want {
			t.Errorf("ToASCII(%q) = %q, want %q", tt.in, got, tt.want)
		}
		for i := 0; i < len(got); i++ {
			if got[i] >= 0x80 {
				t.Errorf("ToASCII(%q) has byte %#x", tt.in, got[i])
			}
		}
	}
	// Every symbol, unit and label of the quantity table has an ASCII
	// spelling that needs no "?".
	for _, q := range mixtures.Quantities {
		for _, s := range []string{q.Label, q.Symbol, q.Unit, q.PerKgUnit} {
			if strings.Contains(ToASCII(s), "?") {
				t.Errorf("quantity %s: %q has no ASCII form: %q", q.Key, s, ToASCII(s))
			}
		}
	}
	for _, q := range mixtures.SpeciesQuantities {
		for _, s := range []string{q.Label, q.Unit, q.Description} {
			if strings.Contains(ToASCII(s), "?") {
				t.Errorf("species quantity %s: %q has no ASCII form: %q", q.Key, s, ToASCII(s))
			}
		}
	}
}

func TestWrap(t *testing.T) {
	tests := []struct {
		name  string
		in    string
		width int
		want  []string
	}{
		{"fits", "a bc def", 20, []string{"a bc def"}},
		{"breaks at spaces", "alpha beta gamma delta", 11, []string{"alpha beta", "gamma delta"}},
		{"long word cut", "abcdefghijkl", 8, []string{"abcdefgh", "ijkl"}},
		{"width 0 acts as the minimum", "abcdefghijkl mn", 0, []string{"abcdefgh", "ijkl mn"}},
		{"negative width", "ab", -4, []string{"ab"}},
		{"newlines kept", "a\nb", 20, []string{"a", "b"}},
		{"empty", "", 10, []string{""}},
		{"wide runes", "μμμμμμμμμμ", 8, []string{"μμμμμμμμ", "μμ"}},
	}
	for _, tt := range tests {
		got := Wrap(tt.in, tt.width)
		if strings.Join(got, "|") != strings.Join(tt.want, "|") {
			t.Errorf("%s: Wrap(%q, %d) = %q, want %q", tt.name, tt.in, tt.width, got, tt.want)
		}
	}
}

// A megabyte-long word once took minutes, because the wrapper measured
// the rest of the word again on every cut; how fast it goes is
// ui's BenchmarkWrapHugeWord's to say, this checks the cut.
func TestWrapLongWord(t *testing.T) {
	word := strings.Repeat("x", 1<<20)
	lines := Wrap(word, -4)
	if len(lines) != (1<<20)/minWrapWidth {
		t.Errorf("%d lines, want %d", len(lines), (1<<20)/minWrapWidth)
	}
}

// appendJSONFloat must write exactly what encoding/json writes, so that
// the streamed JSON reads as the encoder's would.
func TestJSONFloatMatchesEncoder(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 1))
	xs := []float64{0, 1, -1, 1e-7, 1e-6, 9.99e-7, 1e20, 1e21, 123456.789, -2.5e-300, math.MaxFloat64, math.SmallestNonzeroFloat64}
	for range 2000 {
		xs = append(xs, math.Float64frombits(rng.Uint64()))
	}
	for _, x := range xs {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			continue
		}
		want, _ := json.Marshal(x)
		if got := appendJSONFloat(nil, x); string(got) != string(want) {
			t.Errorf("appendJSONFloat(%v) = %s, want %s", x, got, want)
		}
	}
}

func demoReport(t *testing.T) *StateReport {
	t.Helper()
	b, err := mixtures.ParseBlend("SiH4 4%, NH3 18%, H2 500ppm, N2 bal")
	if err != nil {
		t.Fatal(err)
	}
	mix, err := b.Resolve(model.Builtin(), 1.4e5)
	if err != nil {
		t.Fatal(err)
	}
	st, err := mix.State(295.15, 1.4e5, mixtures.Options{})
	if err != nil {
		t.Fatal(err)
	}
	return &StateReport{Label: "demo", State: &st, PresText: "1.4 bar", Cautions: mixtures.Cautions(mix, 1.4e5), Notes: mixtures.Notes(&st, true)}
}

// JSON and CSV list the same figures in the same order, and the JSON is
// what encoding/json reads back to the engine's numbers.
// jsonOnly are the members of the state JSON that are not quantity
// columns: lists and objects the CSV has no cell for.
var jsonOnly = map[string]bool{"cautions": true, "notes": true, "species": true, "real_gas": true,
	"dew_point_K": true, "dew_point_species": true, "dew_point_kind": true, "dew_point_method": true,
	"relative_humidity_percent": true}

func TestStateJSONAndCSVAgree(t *testing.T) {
	r := demoReport(t)
	var jb, cb bytes.Buffer
	if err := WriteStateJSON(&jb, r); err != nil {
		t.Fatal(err)
	}
	if err := WriteStateCSV(&cb, r); err != nil {
		t.Fatal(err)
	}
	var obj map[string]any
	if err := json.Unmarshal(jb.Bytes(), &obj); err != nil {
		t.Fatalf("invalid JSON: %v\n%s", err, jb.String())
	}
	rows, err := csv.NewReader(&cb).ReadAll()
	if err != nil || len(rows) != 2 {
		t.Fatalf("CSV: %v, %d rows", err, len(rows))
	}
	// The JSON keys in document order, species flattened as in CSV.
	dec := json.NewDecoder(bytes.NewReader(jb.Bytes()))
	var keys []string
	depth := 0
	species := ""
	expectKey := false
	for {
		tok, err := dec.Token()
		if err != nil {
			break
		}
		switch v := tok.(type) {
		case json.Delim:
			if v == '{' || v == '[' {
				depth++
			} else {
				depth--
			}
			// After an object or a list closes, a key follows at the
			// levels that hold keys.
			expectKey = v == '{' || (v != '[' && (depth == 1 || depth == 3))
			continue
		case string:
			if expectKey {
				switch {
				case depth == 1 && !jsonOnly[v]:
					keys = append(keys, v)
				case depth == 3 && v != "name":
					keys = append(keys, species+"."+v)
				}
				expectKey = false
				if depth == 3 && v == "name" {
					s, _ := dec.Token()
					species = s.(string)
					expectKey = true
				}
				continue
			}
		}
		expectKey = depth == 1 || depth == 3
	}
	if strings.Join(keys, ",") != strings.Join(rows[0], ",") {
		t.Errorf("JSON keys and CSV columns differ:\nJSON %v\nCSV  %v", keys, rows[0])
	}
	if got := obj["cp_J_molK"].(float64); got != r.State.CpJPerMolK {
		t.Errorf("cp_J_molK = %v, want %v", got, r.State.CpJPerMolK)
	}
	cautions := obj["cautions"].([]any)
	if len(cautions) == 0 || cautions[len(cautions)-1] != mixtures.DeferLine {
		t.Errorf("cautions = %v, want a list ending with the deferral line", cautions)
	}
	if _, ok := obj["notes"].([]any); !ok {
		t.Errorf("notes missing: %v", obj["notes"])
	}
}

// No output writes a state with a non-finite figure; the error names it.
func TestNonFiniteRefused(t *testing.T) {
	r := demoReport(t)
	bad := *r.State
	bad.DensityKgPerM3 = math.Inf(1)
	r.State = &bad
	for name, write := range map[string]func(*bytes.Buffer) error{
		"text": func(b *bytes.Buffer) error { return WriteStateText(b, r) },
		"json": func(b *bytes.Buffer) error { return WriteStateJSON(b, r) },
		"csv":  func(b *bytes.Buffer) error { return WriteStateCSV(b, r) },
	} {
		var b bytes.Buffer
		err := write(&b)
		if err == nil || !strings.Contains(model.UserMessage(err), "density ρ") {
			t.Errorf("%s: err = %v, want one naming density ρ", name, err)
		}
		if b.Len() != 0 {
			t.Errorf("%s: wrote %d bytes before refusing", name, b.Len())
		}
	}
}

// A name from a file cannot reach the terminal as an escape sequence.
func TestStateTextSanitisesLabel(t *testing.T) {
	r := demoReport(t)
	r.Label = "EVIL\x1b[2J\x1b[1;1HHACKED"
	var b bytes.Buffer
	if err := WriteStateText(&b, r); err != nil {
		t.Fatal(err)
	}
	if bytes.IndexByte(b.Bytes(), 0x1b) >= 0 {
		t.Errorf("the readout holds an ESC byte")
	}
	var j bytes.Buffer
	if err := WriteStateJSON(&j, r); err != nil {
		t.Fatal(err)
	}
	if bytes.IndexByte(j.Bytes(), 0x1b) >= 0 {
		t.Errorf("the JSON holds an ESC byte")
	}
}

// The sweep's CSV rows are written by a faster path than a state's; both
// must give the same cells.
func TestSweepCSVRowMatchesState(t *testing.T) {
	r := demoReport(t)
	got := string(appendCSVRow(nil, r.State, true))
	var b bytes.Buffer
	cw := csv.NewWriter(&b)
	cw.Write(CSVRow(nil, r.State, true))
	cw.Flush()
	if got != b.String() {
		t.Errorf("appendCSVRow = %q\nCSVRow gives %q", got, b.String())
	}
}

func TestAppendJSONString(t *testing.T) {
	for _, s := range []string{"N2", "cp_J_molK", "a\"b", "x<y", "EVIL\x1b[2J", "μ°", "back\\slash"} {
		want, _ := json.Marshal(s)
		if got := appendJSONString(nil, s); string(got) != string(want) {
			t.Errorf("appendJSONString(%q) = %s, want %s", s, got, want)
		}
	}
}

// The catalogue entry of H2 and its spin modifications says which mixture
// of ortho and para each name holds, since normal and equilibrium
// hydrogen differ by up to 80 % in rotational Cp below 300 K.
func TestSpeciesSpinModificationText(t *testing.T) {
	tests := []struct {
		formula string
		want    string
	}{
		{"H2", "(frozen mixture: 25 % even J, 75 % odd J)"}, // normal hydrogen, 3:1 ortho:para
		{"nH2", "(frozen mixture: 25 % even J, 75 % odd J)"},
		{"eH2", "(spin isomers in equilibrium)"},
		{"pH2", "(frozen: even J only)"},
		{"D2", "(frozen mixture: 66.7 % even J, 33.3 % odd J)"}, // normal deuterium, 2:1 ortho:para
		{"oD2", "(frozen: even J only)"},
	}
	for _, tt := range tests {
		sp, ok := model.Builtin().Lookup(tt.formula)
		if !ok {
			t.Fatalf("%s: not in the catalogue", tt.formula)
		}
		var b bytes.Buffer
		if err := WriteSpecies(&b, sp, true, 1e5, []float64{298.15}); err != nil {
			t.Fatal(err)
		}
		if !strings.Contains(b.String(), tt.want) {
			t.Errorf("catalog %s: want %q in\n%s", tt.formula, tt.want, b.String())
		}
	}
}

// The species list names the spin modifications that blend text takes,
// since they are not entries of the list.
func TestCatalogListNamesSpinModifications(t *testing.T) {
	var b bytes.Buffer
	WriteCatalogList(&b, model.Builtin())
	flat := strings.Join(strings.Fields(b.String()), " ")
	for _, want := range []string{"Spin modifications, by name: eH2 (equilibrium hydrogen)", "pH2 (para hydrogen)", "oD2 (ortho deuterium)",
		"Named mixtures, which blend text takes as one item: air (dry air (N2, O2, Ar, CO2))."} {
		if !strings.Contains(flat, want) {
			t.Errorf("the list lacks %q:\n%s", want, b.String())
		}
	}
}
