package mixtures

import (
	"errors"
	"reflect"
	"testing"
)

// Normalising is exact arithmetic on the typed amounts, so the expected
// texts are worked by hand.
func TestNormaliseAmounts(t *testing.T) {
	cases := []struct {
		name string
		in   []string
		want []string
		err  error
	}{
		{"percent", []string{"30%", "30%"}, []string{"50%", "50%"}, nil},
		{"already whole, units kept", []string{"0.5", "25%", "250000 ppm"}, []string{"0.5", "25%", "250000 ppm"}, nil},
		{"units scaled, spacing kept", []string{"0.3", "10 %", "100000ppm"}, []string{"0.6", "20 %", "200000ppm"}, nil},
		{"mass basis", []string{"20 wt%", "20 wt%"}, []string{"50 wt%", "50 wt%"}, nil},
		{"thirds", []string{"1%", "1%", "1%"}, []string{"33.3333%", "33.3333%", "33.3333%"}, nil},
		{"balance present", []string{"10%", "bal"}, nil, ErrNormaliseBalance},
		{"mixed bases", []string{"10%", "20 wt%"}, nil, ErrNormaliseMixed},
		{"partial pressure", []string{"0.2 bar", "0.8 bar"}, nil, ErrNormalisePartial},
		{"all zero", []string{"0%", "0"}, nil, ErrNormaliseEmpty},
		{"none", nil, nil, ErrNormaliseEmpty},
		{"bad entry", []string{"10%", "x"}, nil, ErrSyntax},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			got, err := NormaliseAmounts(c.in)
			if !errors.Is(err, c.err) || (c.err == nil && err != nil) {
				t.Fatalf("NormaliseAmounts(%q) error %v, want %v", c.in, err, c.err)
			}
			if !reflect.DeepEqual(got, c.want) {
				t.Errorf("NormaliseAmounts(%q) = %q, want %q", c.in, got, c.want)
			}
		})
	}
}
