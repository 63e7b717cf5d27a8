package mixtures

import (
	"zmix/model"

	"errors"
	"strconv"
	"strings"
)

// Errors of NormaliseAmounts.
var (
	ErrNormaliseBalance = errors.New("normalise: a balance species already closes the blend to 100 %")
	ErrNormaliseMixed   = errors.New("normalise: the amounts mix mole and mass bases")
	ErrNormalisePartial = errors.New("normalise: partial pressures are absolute amounts and cannot be scaled")
	ErrNormaliseEmpty   = errors.New("normalise: every amount is zero")
)

// NormaliseAmounts scales amounts written in blend syntax so that they sum
// to 100 %, each keeping its own unit: "30%" and "0.5" become "37.5%" and
// "0.625". All must be on one basis (moles or mass), with no balance and
// no partial pressure. Bad amounts return their parse error.
func NormaliseAmounts(amounts []string) ([]string, error) {
	if len(amounts) == 0 {
		return nil, ErrNormaliseEmpty
	}
	var sum float64
	basis := Basis(-1)
	for _, text := range amounts {
		a, err := ParseAmount(text)
		if err != nil {
			return nil, err
		}
		switch a.Basis {
		case Balance:
			return nil, ErrNormaliseBalance
		case PartialPres, DewPointTemp:
			return nil, ErrNormalisePartial
		}
		if basis >= 0 && a.Basis != basis {
			return nil, ErrNormaliseMixed
		}
		basis = a.Basis
		sum += a.Value
	}
	if !(sum > 0) {
		return nil, ErrNormaliseEmpty
	}
	out := make([]string, len(amounts))
	for i, text := range amounts {
		scaled, err := scaleAmountText(text, 1/sum)
		if err != nil {
			return nil, err
		}
		out[i] = scaled
	}
	return out, nil
}

// scaleAmountText multiplies the number that leads an amount by k and
// keeps the unit text after it as typed. Every fraction unit is a pure
// scale, so this scales the amount.
func scaleAmountText(text string, k float64) (string, error) {
	x, unit, err := model.LeadingNumber(strings.TrimSpace(text))
	if err != nil {
		return "", model.KindErrorf("mixtures", ErrValue, "amount %s: %v", model.Quote(text), err)
	}
	return strconv.FormatFloat(x*k, 'g', 6, 64) + unit, nil
}
