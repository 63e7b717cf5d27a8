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
	"lfl_pct":   lflRange.String(),
	"ufl_pct":   uflRange.String(),
	"autoign_K": autoignRange.String(),
	"tci_pct":   tciRange.String(),
	"ki":        kiRange.String(),
	"ci":        ciRange.String(),
	"lc50_ppm":  "an LC50 in ppm and its exposure time, 1h or 4h: 3760 1h",
	"oel_ppm":   "limit in ppm, kind; jurisdiction; year: 0.3 TWA; US ACGIH TLV; 2021",
}

// The ranges of the safety figures, each with the reason for its ends
// (values from memory).
var (
	// Flammable limits are percentages of the mixture with air; acetylene
	// and ethylene oxide reach 100 %, and no gas burns below about 0.1 %.
	lflRange = numRange{"lower flammable limit", 0.01, 100, "% by volume", false}
	uflRange = numRange{"upper flammable limit", 0.01, 100, "% by volume", false}
	// Carbon disulfide ignites near 363 K, the lowest of common fuels;
	// none needs more than about 1 300 K. Pyrophoric gases, which ignite at
	// room temperature, carry that class instead of a number.
	autoignRange = numRange{"autoignition temperature", 300, 2000, "K", false}
	tciRange     = numRange{"Tci", 0.01, 100, "% by mole", false}
	// ISO 10156's Ki run from about 0.5 (the heavy noble gases) to a few
	// for large molecules such as SF6.
	kiRange = numRange{"Ki", 0.01, 20, "", false}
	// Ci: 1 for O2, 40 for F2 and ClF3, the largest tabulated.
	ciRange = numRange{"Ci", 0.01, 100, "", false}
	// ppm by volume cannot exceed a million.
	ppmRange  = numRange{"concentration", 1e-6, 1e6, "ppm", false}
	yearRange = numRange{"year", 1900, 2100, "", true}
)

// SafetyFieldNames lists the catalogue fields that hold safety figures.
func SafetyFieldNames() []string {
	return []string{"lfl_pct", "ufl_pct", "autoign_K", "tci_pct", "ki", "ci", "lc50_ppm", "oel_ppm"}
}

// knownField reports whether a species block may hold the field.
func knownField(key string) bool {
	_, a := catalogueFields[key]
	_, b := safetyFields[key]
	return a || b
}

func setSafetyField(sd *SafetyData, key, value string) error {
	var err error
	switch key {
	case "lfl_pct":
		sd.LFLPct, err = lflRange.parse(value)
	case "ufl_pct":
		sd.UFLPct, err = uflRange.parse(value)
	case "autoign_K":
		sd.AutoIgnitionK, err = autoignRange.parse(value)
	case "tci_pct":
		sd.TciPct, err = tciRange.parse(value)
	case "ki":
		sd.Ki, err = kiRange.parse(value)
	case "ci":
		sd.Ci, err = ciRange.parse(value)
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
		return LC50{}, Errorf("model", "%s: want %s", Quote(s), safetyFields["lc50_ppm"])
	}
	ppm, err := ppmRange.parse(f[0])
	if err != nil {
		return LC50{}, err
	}
	switch strings.ToLower(f[1]) {
	case "1h":
		return LC50{ppm, 1}, nil
	case "4h":
		return LC50{ppm, 4}, nil
	}
	return LC50{}, Errorf("model", "exposure time %s is not 1h or 4h", Quote(f[1]))
}

// parseExposure reads "0.3 TWA; US ACGIH TLV; 2021".
func parseExposure(s string) (ExposureLimit, error) {
	parts := strings.Split(s, ";")
	if len(parts) != 3 {
		return ExposureLimit{}, Errorf("model", "%s: want three parts separated by \";\": %s", Quote(s), safetyFields["oel_ppm"])
	}
	head := strings.Fields(parts[0])
	if len(head) != 2 {
		return ExposureLimit{}, Errorf("model", "%s: want a limit in ppm and its kind (TWA, STEL or ceiling)", Quote(parts[0]))
	}
	ppm, err := ppmRange.parse(head[0])
	if err != nil {
		return ExposureLimit{}, err
	}
	kind := head[1]
	switch strings.ToLower(kind) {
	case "twa", "stel", "ceiling":
	default:
		return ExposureLimit{}, Errorf("model", "kind %s is not TWA, STEL or ceiling", Quote(kind))
	}
	where := strings.TrimSpace(parts[1])
	if where == "" {
		return ExposureLimit{}, Errorf("model", "the jurisdiction is empty; name it, e.g. US ACGIH TLV")
	}
	if err := checkText("jurisdiction", where, 60); err != nil {
		return ExposureLimit{}, err
	}
	year, err := yearRange.parse(strings.TrimSpace(parts[2]))
	if err != nil {
		return ExposureLimit{}, err
	}
	return ExposureLimit{PPM: ppm, Kind: kind, Jurisdiction: where, Year: int(year)}, nil
}

// check tests the figures against each other once a block is read.
func (sd *SafetyData) check() error {
	if (sd.LFLPct > 0) != (sd.UFLPct > 0) {
		return Errorf("model", "lfl_pct and ufl_pct come as a pair: give both or neither")
	}
	if sd.LFLPct > 0 && sd.UFLPct <= sd.LFLPct {
		return Errorf("model", "ufl_pct %g is not above lfl_pct %g", sd.UFLPct, sd.LFLPct)
	}
	return nil
}
