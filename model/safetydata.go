package model

import (
	"fmt"
	"strconv"
	"strings"
)

// SafetyData holds one species' published safety figures. A zero number
// means "not known": the catalogue stores nothing it has no source for, and
// the calculations that need a missing figure say so instead of guessing.
// Each figure's source is in Species.Sources under its catalogue field name.
type SafetyData struct {
	// LFLPct and UFLPct are the lower and upper flammable limits in air,
	// % by volume at about 20 °C and 1 atm (catalogue fields lfl_pct,
	// ufl_pct). Compilations differ; the source names the one used.
	LFLPct, UFLPct float64
	// AutoIgnitionK is the autoignition temperature in air (autoign_K).
	AutoIgnitionK float64
	// TciPct is ISO 10156's Tci: the largest content of this flammable gas
	// in nitrogen, % by mole, that is not flammable in air (tci_pct).
	TciPct float64
	// Ki is ISO 10156's nitrogen-equivalency coefficient of an inert gas
	// (ki): 1 mol of it dilutes like Ki mol of nitrogen.
	Ki float64
	// Ci is ISO 10156's oxygen-equivalency coefficient of an oxidizer (ci):
	// 1 mol of it oxidizes like Ci mol of oxygen.
	Ci float64
	// LC50 is the acute inhalation toxicity as published (lc50_ppm).
	LC50 LC50
	// Exposure is an occupational exposure limit, if one is shown (oel_ppm).
	Exposure ExposureLimit
}

// LC50 is a median lethal concentration, rat, by inhalation, in ppm by
// volume, with the exposure time it was measured over.
type LC50 struct {
	PPM   float64 // as published; 0 if not known
	Hours float64 // exposure time: 1 or 4
}

// Known reports whether an LC50 is stored.
func (l LC50) Known() bool { return l.PPM > 0 }

// FourHourPPM is the LC50 over 4 h, the basis of the GHS categories. A 1 h
// value for a gas is divided by 2, as the notes to GHS Table 3.1.1
// prescribe (UN GHS, chapter 3.1; from memory); converted says so.
func (l LC50) FourHourPPM() (ppm float64, converted bool) {
	if l.Hours == 1 {
		return l.PPM / 2, true
	}
	return l.PPM, false
}

func (l LC50) String() string {
	if !l.Known() {
		return "not known"
	}
	return strconv.FormatFloat(l.PPM, 'g', -1, 64) + " ppm (" + strconv.FormatFloat(l.Hours, 'g', -1, 64) + " h)"
}

// ExposureLimit is an occupational exposure limit. Limits differ by country
// and change over time, so each names its jurisdiction and year.
type ExposureLimit struct {
	PPM          float64 // 0 if none is shown
	Kind         string  // TWA, STEL or ceiling
	Jurisdiction string  // e.g. "US ACGIH TLV"
	Year         int
}

// Known reports whether a limit is stored.
func (e ExposureLimit) Known() bool { return e.PPM > 0 }

func (e ExposureLimit) String() string {
	if !e.Known() {
		return "none shown"
	}
	return fmt.Sprintf("%s ppm %s (%s, %d)", strconv.FormatFloat(e.PPM, 'g', -1, 64), e.Kind, e.Jurisdiction, e.Year)
}

// safetyFields are the catalogue fields of SafetyData, with what each
// accepts. They sit after a block's hazards line in species.cat.
var safetyFields = map[string]string{
	"lfl_pct":   "lower flammable limit in air, % by volume, above 0 and at most 100",
	"ufl_pct":   "upper flammable limit in air, % by volume, above 0 and at most 100",
	"autoign_K": "autoignition temperature in K, from 300 to 2000",
	"tci_pct":   "ISO 10156 Tci, % by mole in nitrogen, above 0 and at most 100",
	"ki":        "ISO 10156 nitrogen-equivalency coefficient, above 0 and at most 20",
	"ci":        "ISO 10156 oxygen-equivalency coefficient, above 0 and at most 100",
	"lc50_ppm":  "LC50, rat, ppm by volume, and its exposure time: 3760 1h or 1880 4h",
	"oel_ppm":   "limit; kind; jurisdiction; year, e.g. 0.3 TWA; US ACGIH TLV; 2021",
}

// SafetyFieldNames lists the catalogue fields that hold safety figures.
func SafetyFieldNames() []string {
	return []string{"lfl_pct", "ufl_pct", "autoign_K", "tci_pct", "ki", "ci", "lc50_ppm", "oel_ppm"}
}

func setSafetyField(sd *SafetyData, key, value string) error {
	inRange := func(lo, hi float64, loOpen bool) (float64, error) {
		x, err := parseNumber(value)
		if err != nil {
			return 0, err
		}
		if x > hi || x < lo || (loOpen && x == lo) {
			return 0, fmt.Errorf("out of range")
		}
		return x, nil
	}
	var err error
	switch key {
	case "lfl_pct":
		sd.LFLPct, err = inRange(0, 100, true)
	case "ufl_pct":
		sd.UFLPct, err = inRange(0, 100, true)
	case "autoign_K":
		sd.AutoIgnitionK, err = inRange(300, 2000, false)
	case "tci_pct":
		sd.TciPct, err = inRange(0, 100, true)
	case "ki":
		sd.Ki, err = inRange(0, 20, true)
	case "ci":
		sd.Ci, err = inRange(0, 100, true)
	case "lc50_ppm":
		sd.LC50, err = parseLC50(value)
	case "oel_ppm":
		sd.Exposure, err = parseExposure(value)
	}
	return err
}

// parseLC50 reads "3760 1h": ppm, then the exposure time. Only 1 h and 4 h
// are taken, the two times GHS knows how to compare.
func parseLC50(s string) (LC50, error) {
	f := strings.Fields(s)
	if len(f) != 2 {
		return LC50{}, fmt.Errorf("need a concentration and an exposure time")
	}
	ppm, err := parseNumber(f[0])
	if err != nil || ppm <= 0 || ppm > 1e6 {
		return LC50{}, fmt.Errorf("%s is not a concentration from 0 to 1000000 ppm", Quote(f[0]))
	}
	switch strings.ToLower(f[1]) {
	case "1h":
		return LC50{ppm, 1}, nil
	case "4h":
		return LC50{ppm, 4}, nil
	}
	return LC50{}, fmt.Errorf("exposure time %s is not 1h or 4h", Quote(f[1]))
}

// parseExposure reads "0.3 TWA; US ACGIH TLV; 2021".
func parseExposure(s string) (ExposureLimit, error) {
	parts := strings.Split(s, ";")
	if len(parts) != 3 {
		return ExposureLimit{}, fmt.Errorf("need three parts separated by ;")
	}
	head := strings.Fields(parts[0])
	if len(head) != 2 {
		return ExposureLimit{}, fmt.Errorf("the first part is a limit in ppm and its kind (TWA, STEL or ceiling)")
	}
	ppm, err := parseNumber(head[0])
	if err != nil || ppm <= 0 || ppm > 1e6 {
		return ExposureLimit{}, fmt.Errorf("%s is not a limit from 0 to 1000000 ppm", Quote(head[0]))
	}
	kind := head[1]
	switch strings.ToLower(kind) {
	case "twa", "stel", "ceiling":
	default:
		return ExposureLimit{}, fmt.Errorf("kind %s is not TWA, STEL or ceiling", Quote(kind))
	}
	where := strings.TrimSpace(parts[1])
	if where == "" || len(where) > 60 {
		return ExposureLimit{}, fmt.Errorf("the jurisdiction is empty or longer than 60 characters")
	}
	year, err := strconv.Atoi(strings.TrimSpace(parts[2]))
	if err != nil || year < 1900 || year > 2100 {
		return ExposureLimit{}, fmt.Errorf("year %s is not from 1900 to 2100", Quote(strings.TrimSpace(parts[2])))
	}
	return ExposureLimit{PPM: ppm, Kind: kind, Jurisdiction: Printable(where), Year: year}, nil
}

// check tests the figures against each other once a block is read.
func (sd *SafetyData) check() error {
	if (sd.LFLPct > 0) != (sd.UFLPct > 0) {
		return fmt.Errorf("lfl_pct and ufl_pct come as a pair: give both or neither")
	}
	if sd.LFLPct > 0 && sd.UFLPct <= sd.LFLPct {
		return fmt.Errorf("ufl_pct %g is not above lfl_pct %g", sd.UFLPct, sd.LFLPct)
	}
	return nil
}
