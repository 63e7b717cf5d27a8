package safety

import (
	"strings"
	"unicode/utf8"

	"zmix/model"
)

// Amount is a released quantity of gas as typed: an amount of substance,
// a mass, or a gas volume at a stated temperature and pressure.
type Amount struct {
	Value float64
	Unit  AmountUnit
	Text  string
}

// AmountUnit is one unit of a released amount.
type AmountUnit struct {
	Name string
	// Exactly one of these is set: mol per unit, kg per unit, or m³ per
	// unit of gas at (TempK, PresPa).
	Mol, Kg, M3   float64
	TempK, PresPa float64
}

const (
	cubicFootM3 = 0.3048 * 0.3048 * 0.3048 // exact
	poundKg     = 0.45359237               // exact
	psiPa       = poundKg * 9.80665 / (0.0254 * 0.0254)
)

// amountUnits are the accepted units, by lower-case spelling. Standard
// volumes carry the reference their names define: normal (0 °C, 1 atm)
// for Nm3 and the standard litre, 15 °C (ISO 13443) for Sm3, 60 °F and
// 14.696 psia for scf. A plain m3 or L is gas at the room's 20 °C and 1 atm.
var amountUnits = map[string]AmountUnit{
	"mol":  {Name: "mol", Mol: 1},
	"kmol": {Name: "kmol", Mol: 1000},
	"kg":   {Name: "kg", Kg: 1},
	"g":    {Name: "g", Kg: 1e-3},
	"lb":   {Name: "lb", Kg: poundKg},
	"nm3":  {Name: "Nm3", M3: 1, TempK: model.ZeroCelsiusK, PresPa: model.StdPressureAtmPa},
	"sl":   {Name: "SL", M3: 1e-3, TempK: model.ZeroCelsiusK, PresPa: model.StdPressureAtmPa},
	"sm3":  {Name: "Sm3", M3: 1, TempK: model.ZeroCelsiusK + 15, PresPa: model.StdPressureAtmPa},
	"scf":  {Name: "scf", M3: cubicFootM3, TempK: (60 + 459.67) * 5 / 9, PresPa: 14.696 * psiPa},
	"m3":   {Name: "m3", M3: 1, TempK: RoomTempK, PresPa: RoomPresPa},
	"l":    {Name: "L", M3: 1e-3, TempK: RoomTempK, PresPa: RoomPresPa},
}

// AmountUnits lists the accepted units, for messages and help.
const AmountUnits = "mol, kmol; kg, g, lb; standard Nm3, SL (0 °C), Sm3 (15 °C), scf (60 °F); m3, L as gas at 20 °C and 1 atm"

// maxAmountChars bounds the text parsed, before any work.
const maxAmountChars = 200

// ParseAmount reads a released amount: "2 Nm3", "5 kg", "300 scf".
func ParseAmount(s string) (Amount, error) {
	if n := utf8.RuneCountInString(s); n > maxAmountChars {
		return Amount{}, model.Errorf("safety", "an amount of %d characters; want at most %d", n, maxAmountChars)
	}
	text := strings.TrimSpace(s)
	x, rest, err := model.LeadingNumber(text)
	unit := strings.TrimSpace(rest)
	if err != nil {
		return Amount{}, model.Errorf("safety", "amount %s: want a number and a unit (%s), e.g. 2 Nm3", model.Quote(s), AmountUnits)
	}
	u, ok := amountUnits[strings.ToLower(strings.NewReplacer("³", "3", "^3", "3", " ", "").Replace(unit))]
	if !ok {
		if unit == "" {
			return Amount{}, model.Errorf("safety", "amount %s has no unit; want one of %s", model.Quote(s), AmountUnits)
		}
		return Amount{}, model.Errorf("safety", "amount %s: unknown unit %s; want %s", model.Quote(s), model.Quote(unit), AmountUnits)
	}
	if !(x > 0) || x > 1e12 {
		return Amount{}, model.Errorf("safety", "amount %s: want an amount above zero and at most 1e12 %s", model.Quote(s), u.Name)
	}
	return Amount{Value: x, Unit: u, Text: text}, nil
}

// Mol is the amount in mol, for a blend of molar mass molarMassKgPerMol;
// gas volumes are taken as ideal gas at their reference.
func (a Amount) Mol(molarMassKgPerMol float64) float64 {
	u := a.Unit
	switch {
	case u.Mol > 0:
		return a.Value * u.Mol
	case u.Kg > 0:
		return a.Value * u.Kg / molarMassKgPerMol
	}
	return a.Value * u.M3 * u.PresPa / (model.GasConstant * u.TempK)
}
