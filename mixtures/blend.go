package mixtures

import (
	"errors"
	"fmt"
	"math"
	"strconv"
	"strings"
	"unicode"
	"unicode/utf8"

	"zmix/model"
)

// Basis says what an amount measures.
type Basis int

const (
	MoleFraction Basis = iota // x, also from mol %, ppm and ppb
	MassFraction              // w, also from mass %
	PartialPres               // a partial pressure in Pa
	Balance                   // whatever is left
	// DewPointTemp is a partial pressure given as the temperature at which
	// the species condenses (a frost point, over ice, for water below its
	// triple point): Value is that temperature in K, and Resolve turns it
	// into the species' saturation pressure there.
	DewPointTemp
)

// Amount is one parsed amount: Value is a fraction (0..1) for the
// fraction bases, Pa for PartialPres and K for DewPointTemp.
type Amount struct {
	Basis Basis
	Value float64
}

// BlendItem is one species and its amount as a person wrote them: a
// recipe row, a blend-file component, or one item of blend text.
type BlendItem struct {
	Species string // a formula or name: "SiH4", "nitrogen"
	Amount  string // blend syntax: "2%", "500 ppm", "0.2 bar", "bal"
	// Origin says where the item was written, for messages: a file and
	// line such as "lab.json:7"; "" for none.
	Origin string
}

// Item is one parsed entry of a blend.
type Item struct {
	Key    string // species as typed
	Amount Amount
	Text   string // the amount as typed
	Index  int    // the item's index among the blend's items
	Origin string // as in BlendItem
	// Offset and Length place the item in the blend's Text.
	Offset int
	Length int
}

// Blend is a parsed blend. It holds no species data, so it can be
// resolved against any catalogue. Text is the blend as text: as typed for
// ParseBlend, the items joined with ", " for NewBlend.
type Blend struct {
	Text  string
	Items []Item
}

// Limits on what one item can hold, so that a pasted or corrupt entry is
// refused at once with a clear message rather than carried everywhere.
const (
	MaxSpeciesChars = 64
	MaxAmountChars  = 64
)

// Errors of blends; each BlendError is of one of these kinds.
var (
	ErrEmptyBlend     = errors.New("empty blend")
	ErrNegative       = errors.New("negative amount")
	ErrOver100        = errors.New("amounts sum to more than 100 %")
	ErrUnder100       = errors.New("amounts sum to less than 100 % and no species is the balance")
	ErrBalanceEmpty   = errors.New("nothing is left for the balance species")
	ErrUnknownSpecies = errors.New("unknown species")
	ErrSyntax         = errors.New("cannot read item")
	ErrTwoBalances    = errors.New("more than one balance species")
	ErrNotFinite      = errors.New("amount is not a finite number")
	ErrTooLong        = errors.New("entry too long")
	ErrNoDewPoint     = errors.New("no dew point")
)

// BlendError points at the offending item of a blend, by its index among
// the items, its place in the blend text and, when the caller gave one,
// its origin (a file and line).
type BlendError struct {
	Text   string // the whole blend text
	Token  string // the offending item, or species, as typed
	Offset int    // its byte offset in Text (−1 if the blend as a whole)
	Index  int    // the offending item's index (−1 if the blend as a whole)
	Origin string // where the item was written ("lab.json:7"), or ""
	Err    error  // one of the Err… values above
	Detail string

	ofSpecies bool // Token is the species alone
}

// Error is the message with the package prefix, for logs.
func (e *BlendError) Error() string { return "mixtures: " + e.UserMessage() }

// UserMessage is the one line a person reads: where, what, and what is
// accepted.
func (e *BlendError) UserMessage() string {
	if e.Index >= 0 && e.Text == "" && e.Token == "" && e.Origin == "" && e.Detail != "" {
		// An amount read on its own (ParseAmount): no blend, no item to
		// name, and the detail names the amount as typed.
		return e.Detail
	}
	var b strings.Builder
	what := "item"
	if e.ofSpecies || errors.Is(e.Err, ErrUnknownSpecies) {
		what = "species"
	}
	switch {
	case e.Index < 0:
		b.WriteString("blend " + model.Quote(e.Text))
	case e.Origin != "":
		b.WriteString(model.Printable(e.Origin) + ": " + what + " " + model.Quote(e.Token))
	default:
		b.WriteString("blend " + what + " " + model.Quote(e.Token))
	}
	fmt.Fprintf(&b, ": %v", e.Err)
	if e.Detail != "" {
		b.WriteString(": " + e.Detail)
	}
	return b.String()
}

// Detail without the place: what the workbench shows on the row itself.
func (e *BlendError) Reason() string {
	if e.Detail != "" {
		return e.Err.Error() + ": " + e.Detail
	}
	return e.Err.Error()
}

func (e *BlendError) Unwrap() error { return e.Err }

// sumTolerance absorbs the rounding of published compositions: amounts
// that sum to 100 % within 0.05 % are taken as complete and renormalised.
const sumTolerance = 5e-4

const amountForms = "a mole fraction (0.21), mol % (21%), ppm, ppb, mass fraction (0.3 kg/kg), mass % (30 wt%), a partial pressure (0.2 bar), a dew point (dew -40C), or bal"

// ParseBlend reads blend text such as "SiH4 2%, H2 500ppm, N2 bal": items
// separated by commas, semicolons or new lines, each a species and an
// amount. A species written alone, as the blend's only item ("N2"), is the
// pure gas: it reads as "N2 bal". It is a front end to NewBlend.
func ParseBlend(text string) (*Blend, error) {
	// A comma between digits is a decimal comma or a thousands separator
	// that would split an item in two, "N2 79,0 %" into "N2 79" and "0 %":
	// say so rather than report the halves.
	if tok, off, ok := digitComma(text); ok {
		return nil, &BlendError{Text: text, Token: tok, Offset: off, Index: -1, Err: ErrSyntax, Detail: digitCommaDetail(tok)}
	}
	var items []BlendItem
	var offsets, lengths []int
	lone := itemCount(text) == 1
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
		fields := strings.Fields(trimmed)
		if len(fields) < 2 {
			if lone {
				items = append(items, BlendItem{Species: fields[0], Amount: "bal"})
				offsets, lengths = append(offsets, off), append(lengths, len(trimmed))
				continue
			}
			return nil, &BlendError{Text: text, Token: trimmed, Offset: off, Index: len(items), Err: ErrSyntax,
				Detail: "want SPECIES AMOUNT, where AMOUNT is " + amountForms + " (a species alone is the pure gas only when it is the whole blend)"}
		}
		species, amount, _ := SplitSpeciesAmount(trimmed)
		items = append(items, BlendItem{Species: species, Amount: amount})
		offsets, lengths = append(offsets, off), append(lengths, len(trimmed))
	}
	b, err := newBlend(text, items, offsets, lengths)
	if err != nil {
		return nil, err
	}
	return b, nil
}

func isDigit(c byte) bool { return c >= '0' && c <= '9' }

// SplitSpeciesAmount splits one item, "SPECIES AMOUNT": a species named
// in words ("nitrous oxide 5%") runs up to the first word an amount
// starts with (a number, <, bal, dew), and found says there is one. With
// none, the first word is the species and the rest the amount, so that
// the amount's own error says what is wrong ("N2 lots"). The species is
// as typed, spacing kept, so that it indexes the text.
func SplitSpeciesAmount(item string) (species, amount string, found bool) {
	trimmed := strings.TrimSpace(item)
	fields := strings.Fields(trimmed)
	if len(fields) == 0 {
		return "", "", false
	}
	k := 1
	for k < len(fields) && !amountStart(fields[k]) {
		k++
	}
	found = k < len(fields)
	if !found {
		k = 1
	}
	return strings.TrimSpace(trimmed[:fieldOffset(trimmed, k)]), strings.Join(fields[k:], " "), found
}

// fieldOffset is the byte offset in s of its k-th whitespace-separated
// field (0-based), or len(s) when it has fewer.
func fieldOffset(s string, k int) int {
	n, inField := 0, false
	for i, r := range s {
		space := unicode.IsSpace(r)
		if !space && !inField {
			if n == k {
				return i
			}
			n++
		}
		inField = !space
	}
	return len(s)
}

// amountStart reports whether a word of blend text can start an amount:
// a number, a detection limit, "bal" or a dew point.
func amountStart(word string) bool {
	if c := word[0]; isDigit(c) || c == '.' || c == '+' || c == '-' || c == '<' {
		return true
	}
	w := strings.ToLower(word)
	return w == "bal" || w == "balance" || strings.HasPrefix(w, "dew")
}

// CommaInNumber reports whether s holds a comma between digits ("4,5",
// "1,000"), which blend text refuses with its own message.
func CommaInNumber(s string) bool {
	_, _, ok := digitComma(s)
	return ok
}

// digitComma finds the first number in s with a comma between digits
// ("79,0", "1,000") and returns it with its offset.
func digitComma(s string) (token string, offset int, ok bool) {
	for i := 1; i+1 < len(s); i++ {
		if s[i] != ',' || !isDigit(s[i-1]) || !isDigit(s[i+1]) {
			continue
		}
		j, k := i-1, i+1
		for j > 0 && (isDigit(s[j-1]) || s[j-1] == '.' || s[j-1] == ',') {
			j--
		}
		for k+1 < len(s) && (isDigit(s[k+1]) || s[k+1] == '.' || s[k+1] == ',') {
			k++
		}
		return s[j : k+1], j, true
	}
	return "", 0, false
}

func digitCommaDetail(token string) string {
	return fmt.Sprintf("the comma in %s: write decimals with a point (79.0) and numbers without thousands separators (1000 ppm); in blend text a comma separates items", model.Quote(token))
}

// itemCount returns how many non-blank items blend text holds.
func itemCount(text string) int {
	n := 0
	for _, part := range strings.FieldsFunc(text, func(r rune) bool { return r == ',' || r == ';' || r == '\n' }) {
		if strings.TrimSpace(part) != "" {
			n++
		}
	}
	return n
}

// NewBlend builds a blend from items, such as the rows of a recipe or the
// components of a blend file. An error is a *BlendError whose Index names
// the item at fault (−1 for the blend as a whole), carrying the item's
// Origin.
func NewBlend(items []BlendItem) (*Blend, error) {
	var sb strings.Builder
	offsets, lengths := make([]int, len(items)), make([]int, len(items))
	for i, it := range items {
		if i > 0 {
			sb.WriteString(", ")
		}
		offsets[i] = sb.Len()
		sb.WriteString(it.Species + " " + it.Amount)
		lengths[i] = sb.Len() - offsets[i]
	}
	b, err := newBlend(sb.String(), items, offsets, lengths)
	if err != nil {
		return nil, err
	}
	return b, nil
}

// newBlend parses items that sit at offsets in text.
func newBlend(text string, items []BlendItem, offsets, lengths []int) (*Blend, *BlendError) {
	b := &Blend{Text: text, Items: make([]Item, 0, len(items))}
	for i, in := range items {
		token := text[offsets[i] : offsets[i]+lengths[i]]
		fail := func(err *BlendError) *BlendError {
			err.Text, err.Index, err.Origin, err.Offset = text, i, in.Origin, offsets[i]
			if err.Token == "" || !strings.HasPrefix(token, err.Token) {
				err.Token = token
			}
			return err
		}
		item, err := parseItem(in)
		if err != nil {
			return nil, fail(err)
		}
		item.Index, item.Origin, item.Offset, item.Length = i, in.Origin, offsets[i], lengths[i]
		if item.Amount.Basis == Balance {
			for _, prev := range b.Items {
				if prev.Amount.Basis == Balance {
					return nil, fail(&BlendError{Err: ErrTwoBalances, Detail: "mark one species only as bal"})
				}
			}
		}
		b.Items = append(b.Items, item)
	}
	if len(b.Items) == 0 {
		return nil, &BlendError{Text: text, Offset: -1, Index: -1, Err: ErrEmptyBlend, Detail: "want items like \"N2 79%, O2 21%\""}
	}
	return b, nil
}

// CheckItem reports what is wrong with one item on its own: its length,
// its species (looked up in cat when cat is not nil) and its amount. Its
// error is the *BlendError that NewBlend or Resolve would give, so a
// caller can mark every bad row of a recipe at once.
func CheckItem(cat *model.Catalogue, in BlendItem) error {
	b, err := NewBlend([]BlendItem{in})
	if err != nil {
		return err
	}
	if cat != nil {
		if _, err := b.lookup(cat); err != nil {
			return err
		}
	}
	return nil
}

func parseItem(in BlendItem) (Item, *BlendError) {
	key := strings.TrimSpace(in.Species)
	switch n := utf8.RuneCountInString(in.Species); {
	case n > MaxSpeciesChars:
		return Item{}, &BlendError{Err: ErrTooLong, Token: in.Species, ofSpecies: true,
			Detail: fmt.Sprintf("a species of %d characters; want a formula or name of at most %d", n, MaxSpeciesChars)}
	case key == "":
		return Item{}, &BlendError{Err: ErrSyntax, Detail: "the species is missing; want a formula or name such as N2"}
	}
	if n := utf8.RuneCountInString(in.Amount); n > MaxAmountChars {
		return Item{}, &BlendError{Err: ErrTooLong,
			Detail: fmt.Sprintf("an amount of %d characters; want at most %d, such as 21%% or bal", n, MaxAmountChars)}
	}
	if strings.TrimSpace(in.Amount) == "" {
		return Item{}, &BlendError{Err: ErrSyntax, Detail: "the amount is missing; want " + amountForms}
	}
	amountText := strings.TrimSpace(in.Amount)
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
	if tok, _, ok := digitComma(trimmed); ok {
		return Amount{}, &BlendError{Err: ErrSyntax, Detail: fmt.Sprintf("amount %s: %s", model.Quote(s), digitCommaDetail(tok))}
	}
	// Two ways a certificate writes an amount that blend text does not
	// compute with: a detection limit and an uncertainty.
	if strings.HasPrefix(trimmed, "<") {
		return Amount{}, &BlendError{Err: ErrSyntax, Detail: fmt.Sprintf("amount %s is a detection limit, not an amount: give the amount to compute with, e.g. %s for the most there can be",
			model.Quote(s), model.Quote(strings.TrimSpace(strings.TrimPrefix(trimmed, "<"))))}
	}
	if i := strings.IndexAny(trimmed, "±"); i >= 0 || strings.Contains(trimmed, "+/-") || strings.Contains(trimmed, "+-") {
		value := trimmed
		for _, pm := range []string{"±", "+/-", "+-"} {
			if k := strings.Index(value, pm); k >= 0 {
				value = strings.TrimSpace(value[:k])
			}
		}
		return Amount{}, &BlendError{Err: ErrSyntax, Detail: fmt.Sprintf("amount %s carries an uncertainty, which blend text does not use: give the value alone (%s); zmix weighed propagates uncertainties",
			model.Quote(s), model.Quote(value))}
	}
	if rest, ok := cutDewPoint(trimmed); ok {
		tK, err := ParseTemperature(rest)
		if err != nil {
			return Amount{}, &BlendError{Err: ErrSyntax, Detail: fmt.Sprintf("amount %s: a dew point wants a temperature with a unit after dew, e.g. dew -40C: %s", model.Quote(s), model.UserMessage(err))}
		}
		return Amount{DewPointTemp, tK}, nil
	}
	// The unit keeps its case for pressureUnit, which must tell MPa from mPa.
	x, typedUnit, err := splitNumber(trimmed)
	unit := strings.ToLower(typedUnit)
	if err != nil {
		return Amount{}, &BlendError{Err: ErrSyntax, Detail: fmt.Sprintf("amount %s: %v; want %s", model.Quote(s), err, amountForms)}
	}
	if x < 0 {
		return Amount{}, &BlendError{Err: ErrNegative, Detail: fmt.Sprintf("%s; amounts must be 0 or more", model.Quote(s))}
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
	case "ppt", "pptv":
		// Parts per trillion to a gas analyst, per thousand to others:
		// neither is guessed.
		return Amount{}, &BlendError{Err: ErrSyntax, Detail: fmt.Sprintf("amount %s: ppt reads as parts per trillion or per thousand; write ppb for the one (1 ppt = 0.001 ppb) or %% for the other (1 ppt = 0.1 %%)", model.Quote(s))}
	default:
		if why := ambiguousPressureUnit(typedUnit); why != "" {
			return Amount{}, &BlendError{Err: ErrSyntax, Detail: fmt.Sprintf("amount %s: %s", model.Quote(s), why)}
		}
		size, gauge, ok := pressureUnit(typedUnit)
		if !ok || gauge {
			why := "unknown unit"
			if gauge {
				why = "a partial pressure must be absolute, not gauge"
			}
			return Amount{}, &BlendError{Err: ErrSyntax, Detail: fmt.Sprintf("amount %s: %s %s; want %s", model.Quote(s), why, model.Quote(typedUnit), amountForms)}
		}
		a = Amount{PartialPres, x * size}
		if math.IsInf(a.Value, 0) {
			return Amount{}, &BlendError{Err: ErrSyntax, Detail: fmt.Sprintf("amount %s is too large to compute with; want %s", model.Quote(s), amountForms)}
		}
	}
	if (a.Basis == MoleFraction || a.Basis == MassFraction) && a.Value > 1+1e-12 {
		detail := fmt.Sprintf("%s alone is more than 100 %%", model.Quote(s))
		if unit == "" && x <= 100 {
			detail += fmt.Sprintf("; a bare number is a mole fraction (%s for %s %%): write %s%% for a percentage",
				strconv.FormatFloat(x/100, 'g', -1, 64), strconv.FormatFloat(x, 'g', -1, 64), strconv.FormatFloat(x, 'g', -1, 64))
		}
		return Amount{}, &BlendError{Err: ErrOver100, Detail: detail}
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
		if it.Amount.Basis == PartialPres || it.Amount.Basis == DewPointTemp {
			return true
		}
	}
	return false
}

// SumPartialPa returns the sum of the partial pressures given, and whether
// every amount is a partial pressure (so that the sum is the total). A
// dew point is not counted: its pressure needs the species, so a blend
// with one needs its total pressure given.
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

// balanceMin is the smallest share a balance species may get: anything
// below is the rounding of amounts that already make 100 %.
const balanceMin = 1e-12

// lookup finds what each item stands for in cat: a species, or a named
// mixture's components.
func (b *Blend) lookup(cat *model.Catalogue) ([]itemParts, error) {
	out := make([]itemParts, len(b.Items))
	for i, it := range b.Items {
		parts, missing, ok := partsOf(cat, it.Key)
		if !ok {
			detail := cat.UnknownHint(it.Key)
			if missing != "" {
				detail = fmt.Sprintf("%s is a named mixture whose component %s is not in the catalogue", model.Printable(it.Key), missing)
			}
			if detail == "" {
				detail = "not in the catalogue"
			}
			return nil, &BlendError{Text: b.Text, Token: it.Key, Offset: it.Offset, Index: it.Index, Origin: it.Origin, Err: ErrUnknownSpecies, Detail: detail}
		}
		out[i] = parts
	}
	return out, nil
}

// Resolve looks the species up in cat and turns the amounts into mole
// fractions at total pressure presPa (used only by partial pressures).
// Species listed more than once, on their own or in a named mixture
// (air), are merged; species of zero amount are dropped.
func (b *Blend) Resolve(cat *model.Catalogue, presPa float64) (*Mixture, error) {
	type entry struct {
		itemParts
		item Item
	}
	resolved, err := b.lookup(cat)
	if err != nil {
		return nil, err
	}
	entries := make([]entry, len(b.Items))
	for i, it := range b.Items {
		entries[i] = entry{resolved[i], it}
	}
	whole := func(err error, detail string) error {
		return &BlendError{Text: b.Text, Offset: -1, Index: -1, Err: err, Detail: detail}
	}
	// A dew point is the species' saturation pressure at that
	// temperature: from here on it is a partial pressure.
	for i, e := range entries {
		if e.item.Amount.Basis != DewPointTemp {
			continue
		}
		pa, err := dewPointPa(e.itemParts, e.item.Amount.Value)
		if err != nil {
			it := e.item
			return nil, &BlendError{Text: b.Text, Token: it.Key, Offset: it.Offset, Index: it.Index, Origin: it.Origin, Err: ErrNoDewPoint, Detail: err.Error()}
		}
		entries[i].item.Amount = Amount{PartialPres, pa}
	}

	// Mole-fraction items (X), mass-fraction items (W) and the balance:
	// closed-form solution of Σx = 1 with wᵢ = xᵢMᵢ/M̄.
	var sumX, sumXM, sumW, sumWOverM float64
	bal := -1
	for i, e := range entries {
		m := e.molarMassKgPerMol
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
		mb := entries[bal].molarMassKgPerMol
		denom := 1 - sumW + sumWOverM*mb
		molarMass = (sumXM + (1-sumX)*mb) / denom
		xBal := 1 - sumX - molarMass*sumWOverM
		if xBal < -sumTolerance {
			return nil, whole(ErrOver100, fmt.Sprintf("nothing is left for the balance %s", model.Printable(entries[bal].item.Key)))
		}
		// A balance that gets nothing would vanish from the blend
		// without a word; the user meant it to be there.
		if xBal <= balanceMin {
			return nil, whole(ErrBalanceEmpty, fmt.Sprintf("the other amounts already make 100 %%, so %s would get nothing; lower them or remove %s",
				model.Printable(entries[bal].item.Key), model.Printable(entries[bal].item.Key)))
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

	// Mole fraction of each entry, shared among its parts; NewMixture
	// merges repeated species.
	comps := make([]Component, 0, len(entries))
	items := make([]ItemShare, len(entries))
	for i, e := range entries {
		var x float64
		a := e.item.Amount
		switch a.Basis {
		case MoleFraction:
			x = a.Value
		case PartialPres:
			x = a.Value / presPa
		case MassFraction:
			x = a.Value * molarMass / e.molarMassKgPerMol
		case Balance:
			x = math.Max(0, 1-sumX-molarMass*sumWOverM)
		}
		items[i] = ItemShare{Key: e.item.Key, X: x, Named: e.named, Parts: e.parts}
		for _, part := range e.parts {
			comps = append(comps, Component{Species: part.Species, X: x * part.X})
		}
	}
	m, err := NewMixture(comps)
	if err != nil {
		return nil, err
	}
	m.Items = items
	return m, nil
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
			return nil, model.KindErrorf("mixtures", ErrNotFinite, "%s: %v (x = %g)", model.Printable(c.Species.Formula), ErrNotFinite, c.X)
		}
		if c.X < 0 {
			return nil, model.KindErrorf("mixtures", ErrNegative, "%s: %v (x = %g)", model.Printable(c.Species.Formula), ErrNegative, c.X)
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
		return nil, model.KindErrorf("mixtures", ErrNotFinite, "the amounts add up to more than a float can hold")
	}
	if len(kept) == 0 {
		return nil, model.KindErrorf("mixtures", ErrEmptyBlend, "%v: every amount is zero", ErrEmptyBlend)
	}
	m := &Mixture{Components: kept}
	for i := range kept {
		kept[i].X /= total
		m.MolarMassKgPerMol += kept[i].X * kept[i].Species.MolarMassKgPerMol
	}
	for i := range kept {
		kept[i].MassFrac = kept[i].X * kept[i].Species.MolarMassKgPerMol / m.MolarMassKgPerMol
	}
	m.prepare()
	return m, nil
}
