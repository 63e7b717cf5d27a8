package mixtures

import (
	"errors"
	"fmt"
	"math"
	"strings"

	"zmix/model"
)

// Basis says what an amount measures.
type Basis int

const (
	MoleFraction Basis = iota // x, also from mol %, ppm and ppb
	MassFraction              // w, also from mass %
	PartialPres               // a partial pressure in Pa
	Balance                   // whatever is left
)

// Amount is one parsed amount: Value is a fraction (0..1) for the
// fraction bases and Pa for PartialPres.
type Amount struct {
	Basis Basis
	Value float64
}

// Item is one "SPECIES AMOUNT" entry of a blend, with where it stood in
// the text so that errors can point at it.
type Item struct {
	Key    string // species as typed
	Amount Amount
	Text   string // the amount as typed
	Offset int    // byte offset of the item in the blend text
	Length int
}

// Blend is a parsed blend text. It holds no species data, so it can be
// resolved against any catalogue.
type Blend struct {
	Text  string
	Items []Item
}

// Errors of blends; each BlendError wraps one of these.
var (
	ErrEmptyBlend     = errors.New("empty blend")
	ErrNegative       = errors.New("negative amount")
	ErrOver100        = errors.New("amounts sum to more than 100 %")
	ErrUnder100       = errors.New("amounts sum to less than 100 % and no species is the balance")
	ErrUnknownSpecies = errors.New("unknown species")
	ErrSyntax         = errors.New("cannot read item")
	ErrTwoBalances    = errors.New("more than one balance species")
	ErrNotFinite      = errors.New("amount is not a finite number")
)

// BlendError points at the offending token of a blend.
type BlendError struct {
	Text   string // the whole blend text
	Token  string // the offending token
	Offset int    // its byte offset in Text (−1 if the blend as a whole)
	Err    error  // one of the Err… values above
	Detail string
}

func (e *BlendError) Error() string {
	var b strings.Builder
	b.WriteString("blend")
	if e.Offset >= 0 {
		fmt.Fprintf(&b, " item %q", e.Token)
	} else {
		fmt.Fprintf(&b, " %q", e.Text)
	}
	fmt.Fprintf(&b, ": %v", e.Err)
	if e.Detail != "" {
		b.WriteString(": " + e.Detail)
	}
	return b.String()
}

func (e *BlendError) Unwrap() error { return e.Err }

// sumTolerance absorbs the rounding of published compositions: amounts
// that sum to 100 % within 0.05 % are taken as complete and renormalised.
const sumTolerance = 5e-4

const amountForms = "a mole fraction (0.21), mol % (21%), ppm, ppb, mass fraction (0.3 kg/kg), mass % (30 wt%), a partial pressure (0.2 bar), or bal"

// ParseBlend reads blend text such as "SiH4 2%, H2 500ppm, N2 bal".
func ParseBlend(text string) (*Blend, error) {
	b := &Blend{Text: text}
	start := 0
	for i := 0; i <= len(text); i++ {
		if i < len(text) && text[i] != ',' && text[i] != ';' && text[i] != '\n' {
			continue
		}
		raw := text[start:i]
		off := start
		start = i + 1
		trimmed := strings.TrimSpace(raw)
		if trimmed == "" {
			continue
		}
		off += strings.Index(raw, trimmed)
		item, err := parseItem(trimmed)
		if err != nil {
			err.Text, err.Token, err.Offset = text, trimmed, off
			return nil, err
		}
		item.Offset, item.Length = off, len(trimmed)
		b.Items = append(b.Items, item)
	}
	if len(b.Items) == 0 {
		return nil, &BlendError{Text: text, Offset: -1, Err: ErrEmptyBlend, Detail: "want items like \"N2 79%, O2 21%\""}
	}
	balances := 0
	for _, it := range b.Items {
		if it.Amount.Basis == Balance {
			balances++
			if balances > 1 {
				return nil, &BlendError{Text: text, Token: text[it.Offset : it.Offset+it.Length], Offset: it.Offset, Err: ErrTwoBalances, Detail: "mark one species only as bal"}
			}
		}
	}
	return b, nil
}

func parseItem(s string) (Item, *BlendError) {
	fields := strings.Fields(s)
	if len(fields) < 2 {
		return Item{}, &BlendError{Err: ErrSyntax, Detail: "want SPECIES AMOUNT, where AMOUNT is " + amountForms}
	}
	key := fields[0]
	amountText := strings.Join(fields[1:], " ")
	a, err := parseAmount(amountText)
	if err != nil {
		return Item{}, err
	}
	return Item{Key: key, Amount: a, Text: amountText}, nil
}

// ParseAmount reads one amount; see the package documentation. Its
// errors are *BlendError values.
func ParseAmount(s string) (Amount, error) {
	a, err := parseAmount(s)
	if err != nil {
		return Amount{}, err
	}
	return a, nil
}

// parseAmount is ParseAmount with the concrete error type, whose position
// fields the blend parser fills in.
func parseAmount(s string) (Amount, *BlendError) {
	trimmed := strings.TrimSpace(s)
	if low := strings.ToLower(trimmed); low == "bal" || low == "balance" {
		return Amount{Basis: Balance}, nil
	}
	// The unit keeps its case for pressureUnit, which must tell MPa from mPa.
	x, typedUnit, err := splitNumber(trimmed)
	unit := strings.ToLower(typedUnit)
	if err != nil {
		return Amount{}, &BlendError{Err: ErrSyntax, Detail: fmt.Sprintf("amount %q: %v; want %s", s, err, amountForms)}
	}
	if x < 0 {
		return Amount{}, &BlendError{Err: ErrNegative, Detail: fmt.Sprintf("%q; amounts must be 0 or more", s)}
	}
	var a Amount
	switch unit {
	case "", "mol/mol":
		a = Amount{MoleFraction, x}
	case "%", "mol%", "mol %", "%mol":
		a = Amount{MoleFraction, x / 100}
	case "ppm", "ppmv", "ppm mol":
		a = Amount{MoleFraction, x * 1e-6}
	case "ppb", "ppbv":
		a = Amount{MoleFraction, x * 1e-9}
	case "kg/kg":
		a = Amount{MassFraction, x}
	case "wt%", "wt %", "mass%", "mass %", "%wt":
		a = Amount{MassFraction, x / 100}
	default:
		if why := ambiguousPressureUnit(typedUnit); why != "" {
			return Amount{}, &BlendError{Err: ErrSyntax, Detail: fmt.Sprintf("amount %q: %s", s, why)}
		}
		size, gauge, ok := pressureUnit(typedUnit)
		if !ok || gauge {
			why := "unknown unit"
			if gauge {
				why = "a partial pressure must be absolute, not gauge"
			}
			return Amount{}, &BlendError{Err: ErrSyntax, Detail: fmt.Sprintf("amount %q: %s %q; want %s", s, why, typedUnit, amountForms)}
		}
		a = Amount{PartialPres, x * size}
		if math.IsInf(a.Value, 0) {
			return Amount{}, &BlendError{Err: ErrSyntax, Detail: fmt.Sprintf("amount %q is too large to compute with; want %s", s, amountForms)}
		}
	}
	if a.Basis != PartialPres && a.Value > 1+1e-12 {
		return Amount{}, &BlendError{Err: ErrOver100, Detail: fmt.Sprintf("%q alone is more than 100 %%", s)}
	}
	return a, nil
}

// Component is one species of a resolved mixture.
type Component struct {
	Species  *model.Species
	X        float64 // mole fraction
	MassFrac float64
}

// HasPartialPressures reports whether any amount is a partial pressure,
// so that the total pressure changes the mole fractions.
func (b *Blend) HasPartialPressures() bool {
	for _, it := range b.Items {
		if it.Amount.Basis == PartialPres {
			return true
		}
	}
	return false
}

// SumPartialPa returns the sum of the partial pressures given, and whether
// every amount is a partial pressure (so that the sum is the total).
func (b *Blend) SumPartialPa() (sumPa float64, all bool) {
	all = true
	for _, it := range b.Items {
		if it.Amount.Basis == PartialPres {
			sumPa += it.Amount.Value
		} else {
			all = false
		}
	}
	return sumPa, all
}

// Resolve looks the species up in cat and turns the amounts into mole
// fractions at total pressure presPa (used only by partial pressures).
// Species listed more than once are merged; species of zero amount are
// dropped.
func (b *Blend) Resolve(cat *model.Catalogue, presPa float64) (*Mixture, error) {
	type entry struct {
		sp   *model.Species
		item Item
	}
	entries := make([]entry, len(b.Items))
	for i, it := range b.Items {
		sp, ok := cat.Lookup(it.Key)
		if !ok {
			detail := "not in the catalogue"
			if sug := cat.Suggest(it.Key, 3); len(sug) > 0 {
				detail = "did you mean " + strings.Join(sug, ", ") + "?"
			}
			return nil, &BlendError{Text: b.Text, Token: it.Key, Offset: it.Offset, Err: ErrUnknownSpecies, Detail: detail}
		}
		entries[i] = entry{sp, it}
	}
	whole := func(err error, detail string) error {
		return &BlendError{Text: b.Text, Offset: -1, Err: err, Detail: detail}
	}

	// Mole-fraction items (X), mass-fraction items (W) and the balance:
	// closed-form solution of Σx = 1 with wᵢ = xᵢMᵢ/M̄.
	var sumX, sumXM, sumW, sumWOverM float64
	bal := -1
	for i, e := range entries {
		m := e.sp.MolarMassKgPerMol
		switch e.item.Amount.Basis {
		case MoleFraction:
			sumX += e.item.Amount.Value
			sumXM += e.item.Amount.Value * m
		case PartialPres:
			if !(presPa > 0) {
				return nil, whole(ErrSyntax, "partial pressures need a total pressure above 0 Pa")
			}
			x := e.item.Amount.Value / presPa
			sumX += x
			sumXM += x * m
		case MassFraction:
			sumW += e.item.Amount.Value
			sumWOverM += e.item.Amount.Value / m
		case Balance:
			bal = i
		}
	}
	if sumX > 1+sumTolerance {
		return nil, whole(ErrOver100, fmt.Sprintf("mole amounts sum to %.6g %%", 100*sumX))
	}
	if sumW > 1+sumTolerance {
		return nil, whole(ErrOver100, fmt.Sprintf("mass amounts sum to %.6g %%", 100*sumW))
	}
	var molarMass float64 // M̄ of the blend
	switch {
	case bal >= 0:
		mb := entries[bal].sp.MolarMassKgPerMol
		denom := 1 - sumW + sumWOverM*mb
		molarMass = (sumXM + (1-sumX)*mb) / denom
		xBal := 1 - sumX - molarMass*sumWOverM
		if xBal < -sumTolerance {
			return nil, whole(ErrOver100, fmt.Sprintf("nothing is left for the balance %s", entries[bal].item.Key))
		}
	case sumW == 0:
		if math.Abs(sumX-1) > sumTolerance {
			return nil, whole(ErrUnder100, fmt.Sprintf("they sum to %.6g %%; mark one species as bal or make them sum to 100 %%", 100*sumX))
		}
		molarMass = sumXM / sumX
	case sumX == 0:
		if math.Abs(sumW-1) > sumTolerance {
			return nil, whole(ErrUnder100, fmt.Sprintf("mass amounts sum to %.6g %%; mark one species as bal or make them sum to 100 %%", 100*sumW))
		}
		molarMass = sumW / sumWOverM
	default:
		if sumW >= 1 {
			return nil, whole(ErrOver100, "mass amounts leave nothing for the mole amounts")
		}
		molarMass = sumXM / (1 - sumW)
		if total := sumX + molarMass*sumWOverM; math.Abs(total-1) > sumTolerance {
			return nil, whole(ErrUnder100, fmt.Sprintf("mole and mass amounts together make %.6g %% by moles; mark one species as bal", 100*total))
		}
	}

	// Mole fraction of each entry; NewMixture merges repeated species.
	comps := make([]Component, 0, len(entries))
	for _, e := range entries {
		var x float64
		a := e.item.Amount
		switch a.Basis {
		case MoleFraction:
			x = a.Value
		case PartialPres:
			x = a.Value / presPa
		case MassFraction:
			x = a.Value * molarMass / e.sp.MolarMassKgPerMol
		case Balance:
			x = math.Max(0, 1-sumX-molarMass*sumWOverM)
		}
		comps = append(comps, Component{Species: e.sp, X: x})
	}
	return NewMixture(comps)
}

// NewMixture builds a mixture from mole amounts (any positive scale),
// merging a species given more than once (a gas mixed with itself adds
// no entropy), dropping zero amounts and normalising the rest to sum to
// one.
func NewMixture(comps []Component) (*Mixture, error) {
	var kept []Component
	index := make(map[*model.Species]int, len(comps))
	total := 0.0
	for _, c := range comps {
		if math.IsNaN(c.X) || math.IsInf(c.X, 0) {
			return nil, fmt.Errorf("mixtures: %s: %w (x = %g)", c.Species.Formula, ErrNotFinite, c.X)
		}
		if c.X < 0 {
			return nil, fmt.Errorf("mixtures: %s: %w (x = %g)", c.Species.Formula, ErrNegative, c.X)
		}
		if c.X == 0 {
			continue
		}
		total += c.X
		if j, ok := index[c.Species]; ok {
			kept[j].X += c.X
			continue
		}
		index[c.Species] = len(kept)
		kept = append(kept, Component{Species: c.Species, X: c.X})
	}
	if math.IsInf(total, 0) {
		return nil, fmt.Errorf("mixtures: %w: the amounts add up to more than a float can hold", ErrNotFinite)
	}
	if len(kept) == 0 {
		return nil, fmt.Errorf("mixtures: %w: every amount is zero", ErrEmptyBlend)
	}
	m := &Mixture{Components: kept}
	for i := range kept {
		kept[i].X /= total
		m.MolarMassKgPerMol += kept[i].X * kept[i].Species.MolarMassKgPerMol
	}
	for i := range kept {
		kept[i].MassFrac = kept[i].X * kept[i].Species.MolarMassKgPerMol / m.MolarMassKgPerMol
	}
	return m, nil
}
