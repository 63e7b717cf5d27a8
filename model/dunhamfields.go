package model

import (
	"strconv"
	"strings"
)

// dunhamFields are the catalogue fields of a diatomic's Dunham constants
// (see DunhamConstants), with what each holds. A block that gives any of
// them gives we_cm, wexe_cm, Be_cm, alphae_cm, term and D0_cm; the others
// default to 0. Excited states come as "state_LABEL = TERM Te we wexe weye
// Be alphae De [A]", one line a state, LABEL a short name such as a or b.
var dunhamFields = map[string]string{
	"term":       "ground-state term symbol: multiplicity, Sigma, Pi or Delta, then + or - (Sigma), then g or u (homonuclear), e.g. 3Sigma-g, 2Pi",
	"we_cm":      "harmonic wavenumber ωe in cm⁻¹",
	"wexe_cm":    "anharmonicity ωexe in cm⁻¹",
	"weye_cm":    "anharmonicity ωeye in cm⁻¹",
	"Be_cm":      "equilibrium rotational constant Be in cm⁻¹",
	"alphae_cm":  "vibration–rotation constant αe in cm⁻¹",
	"gammae_cm":  "vibration–rotation constant γe in cm⁻¹",
	"De_cm":      "centrifugal distortion De in cm⁻¹",
	"betae_cm":   "centrifugal distortion βe in cm⁻¹",
	"He_cm":      "sextic centrifugal distortion He in cm⁻¹ (the +He·K³ term)",
	"A_cm":       "spin–orbit constant A of a 2Pi ground state in cm⁻¹",
	"curve":      "yes: the ground state's levels from its RKR potential curve by WKB quantization, quasi-bound levels included (a Sigma ground state; see potential.go); no: from the series in K",
	"D0_cm":      "dissociation energy D0 from the lowest level in cm⁻¹ (the level sums stop there)",
	"harm_cm":    "harmonic wavenumbers ωi of a polyatomic's modes in cm⁻¹, in vib_cm's order",
	"gll_cm":     "vibrational angular momentum constants g_tt in cm⁻¹, one per doubly degenerate mode",
	"xij_cm":     "anharmonicity constants xij in cm⁻¹, the upper triangle row by row (x11 x12 x13 x22 x23 x33)",
	"alpha_cm":   "vibration–rotation constants of a polyatomic with anharmonic levels: for each vib_cm mode in order, one αi per rot_cm constant (A B C, or B), in cm⁻¹; B_v = B_0 − Σ αi vi",
	"dist_cm":    "quartic centrifugal distortion of a nonlinear molecule: the z axis (1, 2 or 3 in rot_cm's order), then ΔJ ΔJK ΔK δJ δK (Watson's A reduction) in cm⁻¹",
	"ladder_cm":  "a mode by its observed levels: the vib_cm mode it replaces, the symmetry divisor, a colon, the levels from 0 (see ladder.go)",
	"torsion_cm": "hindered internal rotations, each \"fundamental V0 F n σ\" (cm⁻¹, cm⁻¹, cm⁻¹, fold, symmetry) and any further potential terms as \"V n\" pairs, separated by ;",
}

// requiredDunhamFields must all come with any Dunham field.
var requiredDunhamFields = []string{"we_cm", "wexe_cm", "Be_cm", "alphae_cm", "term", "D0_cm"}

// The ranges of the Dunham constants (values from memory): H2 has the
// largest ωexe (121 cm⁻¹), αe (3.06) and De (0.047); |ωeye| and |γe| stay
// below 1 and |βe| below 0.01 for the light hydrides; CO's D0, 89 460
// cm⁻¹, is the strongest bond; |A| reaches some thousands of cm⁻¹ only in
// heavy radicals.
var (
	wexeRange   = numRange{"anharmonicity ωexe", 0, 200, "cm⁻¹", false}
	weyeRange   = numRange{"anharmonicity ωeye", -10, 10, "cm⁻¹", false}
	alphaeRange = numRange{"vibration–rotation constant αe", -1, 10, "cm⁻¹", false}
	gammaeRange = numRange{"vibration–rotation constant γe", -1, 1, "cm⁻¹", false}
	distRange   = numRange{"centrifugal distortion De", 0, 1, "cm⁻¹", false}
	betaeRange  = numRange{"centrifugal distortion βe", -0.1, 0.1, "cm⁻¹", false}
	sexticRange = numRange{"sextic centrifugal distortion He", -1e-3, 1e-3, "cm⁻¹", false}
	soRange     = numRange{"spin–orbit constant A", -5000, 5000, "cm⁻¹", false}
	dissocRange = numRange{"dissociation energy", 100, 100000, "cm⁻¹", false}
)

// maxElecStates bounds the excited states a species lists.
const maxElecStates = 20

// isStateField reports whether key names an excited state: "state_" and a
// label of 1 to 8 letters or digits.
func isStateField(key string) bool {
	label, ok := strings.CutPrefix(key, "state_")
	if !ok || len(label) == 0 || len(label) > 8 {
		return false
	}
	for _, r := range label {
		if !(r >= 'a' && r <= 'z' || r >= 'A' && r <= 'Z' || r >= '0' && r <= '9') {
			return false
		}
	}
	return true
}

// IsLevelField reports whether a catalogue field holds constants of the
// summed levels (Dunham constants, excited states, xij, torsions, ladders,
// distortion), for listings of sources.
func IsLevelField(key string) bool { return isDunhamField(key) }

// isDunhamField reports whether key is one of the fields of this file.
func isDunhamField(key string) bool {
	_, ok := dunhamFields[key]
	return ok || isStateField(key)
}

func setDunhamField(sp *Species, key, value string) error {
	switch key {
	case "torsion_cm":
		return setTorsions(sp, value)
	case "ladder_cm":
		return setLadder(sp, value)
	case "dist_cm":
		return setDistortion(sp, value)
	case "harm_cm", "xij_cm", "gll_cm", "alpha_cm":
		return setAnharmonic(sp, key, value)
	case "D0_cm":
		x, err := dissocRange.parse(value)
		sp.DissociationCm = x
		return err
	}
	if sp.Dunham == nil {
		sp.Dunham = &DunhamConstants{Term: TermSymbol{Multiplicity: 1}}
	}
	d := sp.Dunham
	if isStateField(key) {
		st, err := parseState(strings.TrimPrefix(key, "state_"), value)
		if err != nil {
			return err
		}
		sp.States = append(sp.States, st)
		return nil
	}
	if key == "curve" {
		switch value {
		case "yes":
			d.FromCurve = true
		case "no":
			d.FromCurve = false
		default:
			return Errorf("model", "%s: want yes or no", Quote(value))
		}
		return nil
	}
	if key == "term" {
		t, err := ParseTermSymbol(value)
		if err != nil {
			return err
		}
		d.Term = t
		return nil
	}
	ranges := map[string]struct {
		r   numRange
		dst *float64
	}{
		"we_cm":     {vibRange, &d.WeCm},
		"wexe_cm":   {wexeRange, &d.WeXeCm},
		"weye_cm":   {weyeRange, &d.WeYeCm},
		"Be_cm":     {rotRange, &d.BeCm},
		"alphae_cm": {alphaeRange, &d.AlphaeCm},
		"gammae_cm": {gammaeRange, &d.GammaeCm},
		"De_cm":     {distRange, &d.DeCm},
		"betae_cm":  {betaeRange, &d.BetaeCm},
		"He_cm":     {sexticRange, &d.HeCm},
		"A_cm":      {soRange, &d.SpinOrbitCm},
		"D0_cm":     {dissocRange, &sp.DissociationCm},
	}
	f := ranges[key]
	x, err := f.r.parse(value)
	if err != nil {
		return err
	}
	*f.dst = x
	return nil
}

// parseState reads "TERM Te we wexe weye Be alphae De [A]".
func parseState(label, value string) (ElecState, error) {
	const want = "TERM Te we wexe weye Be alphae De [A] (cm⁻¹), e.g. 1Deltag 7918.1 1483.5 12.9 0 1.4264 0.0171 4.86e-6"
	f := strings.Fields(value)
	if len(f) != 8 && len(f) != 9 {
		return ElecState{}, Errorf("model", "%s: %d items; want %s", Quote(value), len(f), want)
	}
	t, err := ParseTermSymbol(f[0])
	if err != nil {
		return ElecState{}, err
	}
	st := ElecState{Name: label, DunhamConstants: DunhamConstants{Term: t}}
	dst := []*float64{&st.TeCm, &st.WeCm, &st.WeXeCm, &st.WeYeCm, &st.BeCm, &st.AlphaeCm, &st.DeCm, &st.SpinOrbitCm}
	rs := []numRange{elecRange, vibRange, wexeRange, weyeRange, rotRange, alphaeRange, distRange, soRange}
	for i, tok := range f[1:] {
		x, err := rs[i].parse(tok)
		if err != nil {
			return ElecState{}, Errorf("model", "item %d of %s: %v", i+2, Quote(value), err)
		}
		*dst[i] = x
	}
	return st, nil
}

// ParseTermSymbol reads a term symbol in ASCII: the multiplicity 2S+1,
// Sigma, Pi or Delta, then + or − (Sigma only), then g or u (homonuclear
// molecules), as in "3Sigma-g", "1Sigma+", "2Pi" and "1Deltag".
func ParseTermSymbol(s string) (TermSymbol, error) {
	const want = "want the multiplicity, Sigma, Pi or Delta, a sign for Sigma and g or u, e.g. 3Sigma-g, 1Sigma+, 2Pi, 1Deltag"
	i := 0
	for i < len(s) && s[i] >= '0' && s[i] <= '9' {
		i++
	}
	mult, err := strconv.Atoi(s[:i])
	if err != nil || mult < 1 || mult > 9 {
		return TermSymbol{}, Errorf("model", "term %s: multiplicity 1 to 9 first; %s", Quote(s), want)
	}
	t := TermSymbol{Multiplicity: mult}
	rest := s[i:]
	switch {
	case strings.HasPrefix(rest, "Sigma"):
		rest = rest[5:]
		if rest == "" || (rest[0] != '+' && rest[0] != '-') {
			return TermSymbol{}, Errorf("model", "term %s: a Sigma state needs + or -; %s", Quote(s), want)
		}
		t.Minus = rest[0] == '-'
		rest = rest[1:]
	case strings.HasPrefix(rest, "Pi"):
		t.Lambda, rest = 1, rest[2:]
	case strings.HasPrefix(rest, "Delta"):
		t.Lambda, rest = 2, rest[5:]
	default:
		return TermSymbol{}, Errorf("model", "term %s: %s", Quote(s), want)
	}
	switch rest {
	case "", "g":
	case "u":
		t.Ungerade = true
	default:
		return TermSymbol{}, Errorf("model", "term %s: %s", Quote(s), want)
	}
	return t, nil
}

// check applies the ranges a species built in code must meet, and that
// the vibrational ladder starts rising.
func (d *DunhamConstants) check(formula, what string, ground bool) error {
	for _, c := range []struct {
		r numRange
		x float64
	}{
		{vibRange, d.WeCm}, {wexeRange, d.WeXeCm}, {weyeRange, d.WeYeCm},
		{rotRange, d.BeCm}, {alphaeRange, d.AlphaeCm}, {gammaeRange, d.GammaeCm},
		{distRange, d.DeCm}, {betaeRange, d.BetaeCm}, {sexticRange, d.HeCm}, {soRange, d.SpinOrbitCm}, {elecRange, d.TeCm},
	} {
		if !c.r.contains(c.x) {
			return Errorf("model", "%s %s: %g; want %s", formula, what, c.x, c.r)
		}
	}
	if ground && d.TeCm != 0 {
		return Errorf("model", "%s %s: Te %g cm⁻¹; want 0", formula, what, d.TeCm)
	}
	if d.Term.Multiplicity < 1 || d.Term.Lambda < 0 || d.Term.Lambda > 2 {
		return Errorf("model", "%s %s: term symbol with multiplicity %d and Λ %d; want 1 to 9 and 0 to 2", formula, what, d.Term.Multiplicity, d.Term.Lambda)
	}
	if d.Term.doubletPi() != (d.SpinOrbitCm != 0) {
		return Errorf("model", "%s %s: the spin–orbit constant A goes with a 2Pi state, and a 2Pi state needs it", formula, what)
	}
	// ΔG(1/2) = ωe − 2ωexe + 13/4 ωeye must be positive: the ladder rises.
	if d.WeCm-2*d.WeXeCm+3.25*d.WeYeCm <= 0 {
		return Errorf("model", "%s %s: ωe %g and ωexe %g give no rising vibrational ladder", formula, what, d.WeCm, d.WeXeCm)
	}
	if d.BeCm-0.5*d.AlphaeCm <= 0 {
		return Errorf("model", "%s %s: Be %g and αe %g give B0 ≤ 0", formula, what, d.BeCm, d.AlphaeCm)
	}
	return nil
}

// setTorsions reads "289 1012 10.68 3 3; …": for each hindered rotor the
// vib_cm fundamental it replaces, V0, F, the fold n and the symmetry σ.
func setTorsions(sp *Species, value string) error {
	const want = "fundamental V0 F n σ, e.g. 289 1012 10.68 3 3, then any further terms as V n pairs"
	for _, group := range strings.Split(value, ";") {
		f := strings.Fields(group)
		if len(f) < 5 || len(f)%2 == 0 || len(f) > 5+2*maxTorsionTerms {
			return Errorf("model", "torsion %s: %d items; want %s (at most %d pairs)", Quote(strings.TrimSpace(group)), len(f), want, maxTorsionTerms)
		}
		var nums [5]float64
		for i, r := range []numRange{vibRange, barrierRange, torsionFRange, foldRange, sigmaRange} {
			x, err := r.parse(f[i])
			if err != nil {
				return Errorf("model", "torsion %s: %v", Quote(strings.TrimSpace(group)), err)
			}
			nums[i] = x
		}
		if len(sp.Torsions) == maxTorsions {
			return Errorf("model", "more than %d torsions", maxTorsions)
		}
		tor := Torsion{ReplacesCm: nums[0], BarrierCm: nums[1], FCm: nums[2], Fold: int(nums[3]), Symmetry: int(nums[4])}
		for i := 5; i+1 < len(f); i += 2 {
			v, err := termRange.parse(f[i])
			if err != nil {
				return Errorf("model", "torsion %s: %v", Quote(strings.TrimSpace(group)), err)
			}
			n, err := foldRange.parse(f[i+1])
			if err != nil {
				return Errorf("model", "torsion %s: %v", Quote(strings.TrimSpace(group)), err)
			}
			tor.More = append(tor.More, PotentialTerm{Cm: v, Fold: int(n)})
		}
		sp.Torsions = append(sp.Torsions, tor)
	}
	return nil
}

// setAnharmonic reads harm_cm ("3832.2 1648.5 3942.5") or xij_cm (the
// upper triangle, "x11 x12 x13 x22 x23 x33"); the shapes are checked
// together when the block is prepared.
func setAnharmonic(sp *Species, key, value string) error {
	if sp.Anharmonic == nil {
		sp.Anharmonic = &Anharmonic{}
	}
	a := sp.Anharmonic
	if key == "alpha_cm" {
		xs, err := parseNumbers(value, alphaRange, 3*maxAnharmonicModes)
		if err != nil {
			return err
		}
		a.AlphaCm = xs
		return nil
	}
	if key == "gll_cm" {
		xs, err := parseNumbers(value, xijRange, maxAnharmonicModes)
		if err != nil {
			return err
		}
		a.GllCm = xs
		return nil
	}
	if key == "harm_cm" {
		xs, err := parseNumbers(value, vibRange, maxAnharmonicModes)
		if err != nil {
			return err
		}
		a.HarmonicCm = xs
		return nil
	}
	xs, err := parseNumbers(value, xijRange, maxAnharmonicModes*(maxAnharmonicModes+1)/2)
	if err != nil {
		return err
	}
	n := 0
	for n*(n+1)/2 < len(xs) {
		n++
	}
	if n*(n+1)/2 != len(xs) {
		return Errorf("model", "%s: %d numbers; want the upper triangle, n(n+1)/2 of them (6 for 3 modes)", Quote(value), len(xs))
	}
	a.XCm = make([][]float64, n)
	k := 0
	for i := 0; i < n; i++ {
		a.XCm[i] = make([]float64, n)
		for j := i; j < n; j++ {
			a.XCm[i][j] = xs[k]
			k++
		}
	}
	return nil
}
