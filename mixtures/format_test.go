package mixtures

import (
	"math"
	"testing"
)

func TestFormatSig(t *testing.T) {
	tests := []struct {
		x    float64
		n    int
		want string
	}{
		{1.18385, 5, "1.1839"},
		{101325, 6, "101325"},
		{0.2095, 4, "0.2095"},
		{0.0005, 4, "0.0005000"},
		{4e-7, 4, "4.000e-07"},
		{-50.7539, 5, "-50.754"},
		{0, 4, "0.000"},
		{9.99996, 5, "10.000"}, // the carry keeps five figures
		{-13.0114, 5, "-13.011"},
		{1234567, 4, "1234567"},
		{2.5e7, 3, "2.50e+07"},
		{29.1234, 5, "29.123"},
		{0.000523, 4, "0.0005230"},
		{2.5e-7, 3, "2.50e-07"},
		{math.Inf(1), 4, "n/a"},
		{math.NaN(), 4, "n/a"},
		{math.Inf(-1), 4, "n/a"},
	}
	for _, tt := range tests {
		if got := FormatSig(tt.x, tt.n); got != tt.want {
			t.Errorf("FormatSig(%g, %d) = %q, want %q", tt.x, tt.n, got, tt.want)
		}
	}
}
