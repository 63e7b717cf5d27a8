package model

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// notKnown lists the figures the built-in catalogue leaves out on purpose,
// with the reason; zmix then says "not known". A species missing from here
// and from the catalogue fails TestBuiltinSafetyTable.
var notKnown = map[string]string{
	"NO lc50_ppm":   "ISO 10298 value not recalled with confidence (1 h or 4 h basis unclear)",
	"GeH4 lfl_pct":  "no flammable limits recalled or read; the gas-detection data page read gives none",
	"GeH4 lc50_ppm": "ISO 10298 value not recalled with confidence; suppliers label it H330 (fatal if inhaled), and OSHA's 1989 review (read) quotes mouse deaths after 1 h at 150 and 185 ppm, but no rat LC50",
	"WF6 lc50_ppm":  "no LC50 recalled or read; suppliers classify it Acute Tox. 1 by inhalation (LC50 at most 100 ppm, 4 h)",
	// The ISO 10156 classification of a blend with these then says "not
	// known" unless the other fuels already sum above 1.
	"D2 tci_pct":      tciNotKnown,
	"C2H2 tci_pct":    tciNotKnown,
	"NH3 tci_pct":     tciNotKnown,
	"H2S tci_pct":     tciNotKnown,
	"SiH4 tci_pct":    tciNotKnown,
	"PH3 tci_pct":     tciNotKnown,
	"AsH3 tci_pct":    tciNotKnown,
	"C3H6 tci_pct":    tciNotKnown,
	"B2H6 tci_pct":    tciNotKnown,
	"GeH4 tci_pct":    tciNotKnown,
	"SiH2Cl2 tci_pct": tciNotKnown,
	"n-C4H10 tci_pct": tciNotKnown,
	"i-C4H10 tci_pct": tciNotKnown,
}

const tciNotKnown = "ISO 10156 Tci neither recalled with confidence nor read"

// TestBuiltinSafetyTable: every species with a flammable class has its
// flammable limits in air and its ISO 10156 Tci, or a reason in notKnown;
// every toxic one has an LC50 with its exposure time; every oxidizer has
// its ISO 10156 Ci; and every safety figure in the
// file names its source, saying "from memory" where it was recalled and
// "read from" and the page where it was read.
func TestBuiltinSafetyTable(t *testing.T) {
	missing := func(sp *Species, field string) bool {
		if _, ok := notKnown[sp.Formula+" "+field]; ok {
			return false
		}
		return true
	}
	for _, sp := range Builtin().All() {
		sd := sp.Safety
		if sp.Hazards&Flammable != 0 && (sd.LFLPct == 0 || sd.UFLPct == 0) && missing(sp, "lfl_pct") {
			t.Errorf("%s is flammable but has no lfl_pct/ufl_pct", sp.Formula)
		}
		if sp.Hazards&Flammable != 0 && sd.TciPct == 0 && missing(sp, "tci_pct") {
			t.Errorf("%s is flammable but has no tci_pct, and notKnown gives no reason", sp.Formula)
		}
		if sp.Hazards&Flammable == 0 && (sd.LFLPct > 0 || sd.TciPct > 0) {
			t.Errorf("%s has flammable limits or a Tci but no flammable class", sp.Formula)
		}
		if sp.Hazards&Toxic != 0 && missing(sp, "lc50_ppm") {
			if !sd.LC50.Known() {
				t.Errorf("%s is toxic but has no lc50_ppm", sp.Formula)
			} else if sd.LC50.Hours != 1 && sd.LC50.Hours != 4 {
				t.Errorf("%s LC50 exposure time %g h, want 1 or 4", sp.Formula, sd.LC50.Hours)
			}
		}
		if sp.Hazards&Oxidizer != 0 && sd.Ci == 0 && missing(sp, "ci") {
			t.Errorf("%s is an oxidizer but has no ISO 10156 ci", sp.Formula)
		}
		if sd.Ki > 0 && sp.Hazards&(Flammable|Oxidizer|Toxic) != 0 {
			t.Errorf("%s has a Ki, which only inert gases take", sp.Formula)
		}
		for _, f := range SafetyFieldNames() {
			if !hasSafetyField(sd, f) {
				continue
			}
			src := sp.Sources[f]
			if src == "" {
				t.Errorf("%s %s: no source", sp.Formula, f)
			} else if !strings.Contains(src, "from memory") && !readFrom.MatchString(src) {
				t.Errorf("%s %s: source %q says neither \"from memory\" nor the page it was read from", sp.Formula, f, src)
			}
		}
	}
	for k := range notKnown {
		formula, field, _ := strings.Cut(k, " ")
		sp, ok := Builtin().Lookup(formula)
		if !ok {
			t.Errorf("notKnown lists %s, which is not in the catalogue", formula)
		} else if hasSafetyField(sp.Safety, field) {
			t.Errorf("notKnown lists %s %s, which the catalogue now has: drop the exception", formula, field)
		}
	}
}

func hasSafetyField(sd SafetyData, field string) bool {
	switch field {
	case "lfl_pct":
		return sd.LFLPct > 0
	case "ufl_pct":
		return sd.UFLPct > 0
	case "autoign_K":
		return sd.AutoIgnitionK > 0
	case "tci_pct":
		return sd.TciPct > 0
	case "ki":
		return sd.Ki > 0
	case "ci":
		return sd.Ci > 0
	case "lc50_ppm":
		return sd.LC50.Known()
	case "oel_ppm":
		return sd.Exposure.Known()
	}
	panic("unknown safety field " + field)
}

// TestBuiltinSafetyValues spot-checks figures against the compilations the
// catalogue names (all from memory, as the catalogue says).
func TestBuiltinSafetyValues(t *testing.T) {
	cases := []struct {
		formula string
		get     func(SafetyData) float64
		want    float64
		source  string
	}{
		{"H2", func(s SafetyData) float64 { return s.LFLPct }, 4.0, "BuM627 hydrogen LFL, from memory"},
		{"CH4", func(s SafetyData) float64 { return s.UFLPct }, 15.0, "BuM627 methane UFL, from memory"},
		{"H2", func(s SafetyData) float64 { return s.TciPct }, 5.5, "ISO 10156 hydrogen Tci, from memory"},
		{"Ar", func(s SafetyData) float64 { return s.Ki }, 0.55, "ISO 10156 argon Ki, from memory"},
		{"N2O", func(s SafetyData) float64 { return s.Ci }, 0.6, "ISO 10156 N2O Ci, from memory"},
		{"H2S", func(s SafetyData) float64 { return s.LC50.PPM }, 712, "ISO 10298 H2S LC50 1 h, from memory"},
	}
	for _, c := range cases {
		sp, _ := Builtin().Lookup(c.formula)
		if got := c.get(sp.Safety); got != c.want {
			t.Errorf("%s = %g, want %g (%s)", c.formula, got, c.want, c.source)
		}
	}
}

func TestLC50FourHour(t *testing.T) {
	cases := []struct {
		in        LC50
		want      float64
		converted bool
	}{
		{LC50{712, 1}, 356, true},    // GHS Table 3.1.1 notes: a 1 h gas value is halved
		{LC50{1880, 4}, 1880, false}, // already on the 4 h basis
	}
	for _, c := range cases {
		got, conv := c.in.FourHourPPM()
		if got != c.want || conv != c.converted {
			t.Errorf("%v.FourHourPPM() = %g, %v; want %g, %v", c.in, got, conv, c.want, c.converted)
		}
	}
}

var safetyErrorCases = []struct {
	name, line, field, msg string
}{
	{"negative LFL", "lfl_pct = -1", "lfl_pct", "out of range"},
	{"LFL above 100", "lfl_pct = 101", "lfl_pct", "out of range"},
	{"zero Tci", "tci_pct = 0", "tci_pct", "out of range"},
	{"Ki too large", "ki = 50", "ki", "out of range"},
	{"cold autoignition", "autoign_K = 20", "autoign_K", "out of range"},
	{"LC50 without time", "lc50_ppm = 300", "lc50_ppm", "exposure time, 1h or 4h"},
	{"LC50 at 2 h", "lc50_ppm = 300 2h", "lc50_ppm", `"2h" is not 1h or 4h`},
	{"LC50 not a number", "lc50_ppm = lots 1h", "lc50_ppm", `"lots" is not a number`},
	{"OEL without year", "oel_ppm = 1 TWA; US ACGIH TLV", "oel_ppm", "three parts"},
	{"OEL bad kind", "oel_ppm = 1 MAX; US ACGIH TLV; 2020", "oel_ppm", "not TWA, STEL or ceiling"},
	{"OEL bad year", "oel_ppm = 1 TWA; US ACGIH TLV; 20x0", "oel_ppm", "want a whole year from 1900 to 2100"},
	{"OEL no jurisdiction", "oel_ppm = 1 TWA;  ; 2020", "oel_ppm", "jurisdiction"},
	{"NaN LFL", "lfl_pct = NaN", "lfl_pct", "not a number"},
	{"OEL control character", "oel_ppm = 1 TWA; US\x1bTLV; 2020", "oel_ppm", "want printable text"},
}

func TestParseSafetyErrors(t *testing.T) {
	for _, c := range safetyErrorCases {
		text := "[H2]\nname = h\nrotor = linear\nrot_cm = 60\nsigma = 2\nspin = 1 3\nvib_cm = 4161\ndHf0_kJ = 0\n" + c.line + "\n"
		_, err := ParseCatalogue("site.cat", strings.NewReader(text))
		var ce *CatalogueError
		if !errors.As(err, &ce) || ce.Line != 9 || ce.Field != c.field || !strings.Contains(ce.Msg, c.msg) {
			t.Errorf("%s: error %v; want line 9, field %q, containing %q", c.name, err, c.field, c.msg)
		}
	}
	// Checks across fields point at the block.
	pair := []struct{ lines, msg string }{
		{"lfl_pct = 4\n", "come as a pair"},
		{"lfl_pct = 40\nufl_pct = 4\n", "not above lfl_pct"},
	}
	for _, c := range pair {
		text := "[H2]\nname = h\nrotor = linear\nrot_cm = 60\nsigma = 2\nspin = 1 3\nvib_cm = 4161\ndHf0_kJ = 0\n" + c.lines
		_, err := ParseCatalogue("site.cat", strings.NewReader(text))
		var ce *CatalogueError
		if !errors.As(err, &ce) || ce.Line != 1 || !strings.Contains(ce.Msg, c.msg) {
			t.Errorf("%q: error %v; want line 1 containing %q", c.lines, err, c.msg)
		}
	}
}

func TestParseSafetyFields(t *testing.T) {
	text := `[H2]
name = h
rotor = linear
rot_cm = 60 | fixture
sigma = 2 | fixture
spin = 1 3 | fixture
vib_cm = 4161 | fixture
dHf0_kJ = 0 | fixture
hazards = flammable
lfl_pct = 4 | fixture
ufl_pct = 75 | fixture
autoign_K = 773 | fixture
tci_pct = 5.5 | fixture
lc50_ppm = 1000 4h | fixture
oel_ppm = 2 STEL; Atlantis OSHA; 2024 | fixture
`
	list, err := ParseCatalogue("site.cat", strings.NewReader(text))
	if err != nil {
		t.Fatal(err)
	}
	sd := list[0].Safety
	want := SafetyData{LFLPct: 4, UFLPct: 75, AutoIgnitionK: 773, TciPct: 5.5, LC50: LC50{1000, 4},
		Exposure: ExposureLimit{PPM: 2, Kind: "STEL", Jurisdiction: "Atlantis OSHA", Year: 2024}}
	if sd != want {
		t.Errorf("parsed %+v, want %+v", sd, want)
	}
	if list[0].Sources["oel_ppm"] != "fixture" {
		t.Errorf("source of oel_ppm = %q", list[0].Sources["oel_ppm"])
	}
	if s := sd.Exposure.String(); s != "2 ppm STEL (Atlantis OSHA, 2024)" {
		t.Errorf("exposure limit reads %q", s)
	}
}

// FuzzSafetyField feeds any text to the safety fields: no panic, and every
// value accepted is finite and within the field's range.
func FuzzSafetyField(f *testing.F) {
	for _, s := range []string{"3760 1h", "1880 4h", "0.3 TWA; US ACGIH TLV; 2021", "4.0", "1e400", "-0", "NaN 1h", "1 ceiling;\x1b[31m;2000"} {
		f.Add("lc50_ppm", s)
		f.Add("oel_ppm", s)
		f.Add("lfl_pct", s)
	}
	f.Fuzz(func(t *testing.T, field, value string) {
		if _, ok := safetyFields[field]; !ok {
			field = SafetyFieldNames()[len(field)%len(SafetyFieldNames())]
		}
		var sd SafetyData
		if err := setSafetyField(&sd, field, value); err != nil {
			if strings.Contains(UserMessage(err), "\n") {
				t.Fatalf("multi-line error %q", err)
			}
			return
		}
		for _, x := range []float64{sd.LFLPct, sd.UFLPct, sd.AutoIgnitionK, sd.TciPct, sd.Ki, sd.Ci, sd.LC50.PPM, sd.Exposure.PPM} {
			if math.IsNaN(x) || math.IsInf(x, 0) || x < 0 || x > 1e6 {
				t.Fatalf("%s = %q accepted as %+v", field, value, sd)
			}
		}
		if sd.Exposure.Known() && checkText("", sd.Exposure.Jurisdiction, 60) != nil {
			t.Fatalf("jurisdiction %q kept unprintable text", sd.Exposure.Jurisdiction)
		}
	})
}
