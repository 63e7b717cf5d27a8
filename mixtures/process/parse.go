package process

import (
	"strconv"
	"strings"

	"zmix/mixtures"
	"zmix/model"
)

// StreamSpec is one stream as written: "BLEND; T; RATE", such as
// "N2 79%, O2 21%; 25C; 120 Nm3/h". The blend is left as text (or
// @FILE) for the caller to resolve.
type StreamSpec struct {
	BlendText string
	TempK     float64
	Rate      Rate
}

// StreamForm says how a stream is written, for messages.
const StreamForm = `"BLEND; T; RATE", e.g. "N2 79%, O2 21%; 25C; 120 Nm3/h"`

// ParseStream reads a stream. The blend may hold semicolons of its own:
// the last two fields are the temperature and the rate.
func ParseStream(s string) (StreamSpec, error) {
	if err := tooLong("a stream", s); err != nil {
		return StreamSpec{}, err
	}
	parts := strings.Split(s, ";")
	if len(parts) < 3 {
		return StreamSpec{}, model.Errorf("process", "stream %s: want %s", model.Quote(s), StreamForm)
	}
	n := len(parts)
	blend := strings.TrimSpace(strings.Join(parts[:n-2], ";"))
	if blend == "" {
		return StreamSpec{}, model.Errorf("process", "stream %s: the blend is missing; want %s", model.Quote(s), StreamForm)
	}
	t, err := mixtures.ParseTemperature(strings.TrimSpace(parts[n-2]))
	if err != nil {
		return StreamSpec{}, model.Errorf("process", "stream %s: %v", model.Quote(s), err)
	}
	r, err := ParseRate(parts[n-1])
	if err != nil {
		return StreamSpec{}, model.Errorf("process", "stream %s: %v", model.Quote(s), err)
	}
	return StreamSpec{BlendText: blend, TempK: t, Rate: r}, nil
}

// Target is a species and the mole fraction it should be brought to.
type Target struct {
	Species *model.Species
	X       float64
	Text    string // as typed
}

// TargetForm says how a target is written, for messages.
const TargetForm = `"SPECIES LEVEL" with LEVEL a mole fraction, %, ppm or ppb, of 0.001 ppb or more, e.g. "O2 10ppm"`

// MinTargetLevel is the lowest target level read, 1 part per trillion:
// below the purities gas lines are specified to, and far enough above
// the smallest float that no purge count or dilution ratio overflows (a
// target of 1e-300 ppb made either infinite).
const MinTargetLevel = 1e-12

// ParseTarget reads "SPECIES LEVEL", looking the species up in cat.
func ParseTarget(cat *model.Catalogue, s string) (Target, error) {
	if err := tooLong("a target", s); err != nil {
		return Target{}, err
	}
	name, level, _ := mixtures.SplitSpeciesAmount(s)
	if level == "" {
		return Target{}, model.Errorf("process", "target %s: want %s", model.Quote(s), TargetForm)
	}
	sp, err := targetSpecies(cat, s, name)
	if err != nil {
		return Target{}, err
	}
	a, err := mixtures.ParseAmount(level)
	if err != nil {
		return Target{}, model.Errorf("process", "target %s: %v", model.Quote(s), err)
	}
	if a.Basis != mixtures.MoleFraction {
		return Target{}, model.Errorf("process", "target %s: the level must be by moles; want %s", model.Quote(s), TargetForm)
	}
	if !(a.Value > 0 && a.Value < 1) {
		return Target{}, model.Errorf("process", "target %s: a level of %g is never reached; want %s", model.Quote(s), a.Value, TargetForm)
	}
	if a.Value < MinTargetLevel {
		return Target{}, model.Errorf("process", "target %s: a level below 1e-12 (0.001 ppb) is beyond what zmix computes; want %s", model.Quote(s), TargetForm)
	}
	return Target{Species: sp, X: a.Value, Text: strings.TrimSpace(s)}, nil
}

// fractionOf is the mole fraction of sp in mix, 0 when it holds none.
func fractionOf(mix *mixtures.Mixture, sp *model.Species) float64 {
	for _, c := range mix.Components {
		if c.Species == sp || c.Species.Formula == sp.Formula {
			return c.X
		}
	}
	return 0
}

// trimFloat writes x with up to 6 significant figures, for messages.
func trimFloat(x float64) string { return strconv.FormatFloat(x, 'g', 6, 64) }

// VolumeUnits lists the units ParseVolume accepts.
const VolumeUnits = "m3, L, ft3"

var volumeUnits = map[string]float64{"m3": 1, "l": 1e-3, "litre": 1e-3, "liter": 1e-3, "ft3": cubicFoot, "cf": cubicFoot}

// MaxVolumeM3 bounds every volume zmix reads (a room, a vessel, a
// cylinder): a cubic kilometre, far beyond any of them, so that a slip of
// the exponent (1e300 L) is refused rather than computed.
const MaxVolumeM3 = 1e9

// ParseVolume reads a volume with its unit ("2.5 m3", "50 L", "12 ft3"),
// or a room's three sides with a length unit ("6 x 4 x 3 m", "20x15x10
// ft"), and returns m³; it must be above zero and at most MaxVolumeM3.
func ParseVolume(s string) (float64, error) {
	if err := tooLong("a volume", s); err != nil {
		return 0, err
	}
	if v, ok, err := parseSides(s); ok {
		if err != nil {
			return 0, err
		}
		if !(v > 0) || v > MaxVolumeM3 {
			return 0, model.Errorf("process", "volume %s: want a volume above zero and at most 1e9 m3", model.Quote(s))
		}
		return v, nil
	}
	x, unit, ok := splitValue(strings.TrimSpace(s))
	if !ok {
		return 0, model.Errorf("process", "volume %s: want a number and a unit (%s), e.g. 2.5 m3", model.Quote(s), VolumeUnits)
	}
	size, ok := volumeUnits[strings.ToLower(strings.NewReplacer("³", "3", "^3", "3", " ", "").Replace(unit))]
	if !ok {
		return 0, model.Errorf("process", "volume %s: unknown unit %s; want %s", model.Quote(s), model.Quote(unit), VolumeUnits)
	}
	v := x * size
	if !(v > 0) || v > MaxVolumeM3 {
		return 0, model.Errorf("process", "volume %s: want a volume above zero and at most 1e9 m3", model.Quote(s))
	}
	return v, nil
}

// lengthUnits are the units of a room's sides, in m.
var lengthUnits = map[string]float64{"m": 1, "ft": 0.3048, "cm": 0.01, "mm": 0.001}

// parseSides reads "A x B x C UNIT" (x, X or ×, the unit after the last
// side): ok says the text has that shape, err what is wrong with it.
func parseSides(s string) (m3 float64, ok bool, err error) {
	parts := strings.FieldsFunc(strings.ToLower(s), func(r rune) bool { return r == 'x' || r == '×' })
	if len(parts) != 3 {
		return 0, false, nil
	}
	v := 1.0
	for i, p := range parts {
		x, unit, splitErr := mixtures.SplitNumber(p)
		if splitErr != nil || (i < 2) != (unit == "") {
			return 0, true, model.Errorf("process", "volume %s: want three sides and one length unit after the last, e.g. 6 x 4 x 3 m", model.Quote(s))
		}
		if !(x > 0) {
			return 0, true, model.Errorf("process", "volume %s: want each side above zero", model.Quote(s))
		}
		if i == 2 {
			size, known := lengthUnits[unit]
			if !known {
				return 0, true, model.Errorf("process", "volume %s: unknown length unit %s; want m, cm, mm or ft, e.g. 6 x 4 x 3 m", model.Quote(s), model.Quote(unit))
			}
			v *= size * size * size
		}
		v *= x
	}
	return v, true, nil
}

// ParseTargetSpecies reads the species of a target given with a ratio
// instead of a level: "SiH4", "nitrous oxide", or a whole target whose
// level is not used ("SiH4 50ppm").
func ParseTargetSpecies(cat *model.Catalogue, s string) (*model.Species, error) {
	if err := tooLong("a target", s); err != nil {
		return nil, err
	}
	name, _, found := mixtures.SplitSpeciesAmount(s)
	if !found {
		name = strings.Join(strings.Fields(s), " ") // the species alone, in words or not
	}
	if name == "" {
		return nil, model.Errorf("process", "target %s: want the species, e.g. SiH4", model.Quote(s))
	}
	return targetSpecies(cat, s, name)
}

// targetSpecies looks a target's species up, with the catalogue's hint
// when it is unknown.
func targetSpecies(cat *model.Catalogue, target, name string) (*model.Species, error) {
	sp, ok := cat.Lookup(name)
	if !ok {
		hint := cat.UnknownHint(name)
		if hint == "" {
			hint = "it is not in the catalogue"
		}
		return nil, model.Errorf("process", "target %s: unknown species %s; %s", model.Quote(target), model.Quote(name), hint)
	}
	return sp, nil
}

// ParseEfficiency reads an efficiency as a fraction or a percentage
// ("0.8", "80%"), in (0, 1].
func ParseEfficiency(s string) (float64, error) {
	if err := tooLong("an efficiency", s); err != nil {
		return 0, err
	}
	a, err := mixtures.ParseAmount(s)
	if err != nil || a.Basis != mixtures.MoleFraction || !(a.Value > 0 && a.Value <= 1) {
		return 0, model.Errorf("process", "efficiency %s: want a fraction above 0 and at most 1, or a percentage, e.g. 0.8 or 80%%", model.Quote(s))
	}
	return a.Value, nil
}
