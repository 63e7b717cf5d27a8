package model

import (
	"errors"
	"io/fs"
	"math"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
)

func TestErrorf(t *testing.T) {
	kind := errors.New("bad thing")
	inner := KindErrorf("model", kind, "value %s is too big", strconv.Quote("9e999"))
	outer := Errorf("mixtures", "--temp: %w", inner)
	if got, want := outer.Error(), `mixtures: --temp: value "9e999" is too big`; got != want {
		t.Errorf("Error() = %q, want %q", got, want)
	}
	if got, want := UserMessage(outer), `--temp: value "9e999" is too big`; got != want {
		t.Errorf("UserMessage = %q, want %q", got, want)
	}
	if !errors.Is(outer, kind) {
		t.Errorf("errors.Is(outer, kind) = false, want true through %%w")
	}
	var e *Error
	if !errors.As(outer, &e) || e.Pkg != "mixtures" {
		t.Errorf("errors.As = %v, want the outer *Error", e)
	}
	if got, want := UserMessage(errors.New("a\nb")), "a b"; got != want {
		t.Errorf("UserMessage(plain) = %q, want %q", got, want)
	}
	if UserMessage(nil) != "" {
		t.Errorf("UserMessage(nil) not empty")
	}
}

// TestModelErrorsAreTyped: the errors model returns match their kind with
// errors.Is, read "model: …" in logs, and give a person the line without
// the prefix; a species file's error names its place and is printable.
func TestModelErrorsAreTyped(t *testing.T) {
	tests := []struct {
		name string
		err  error
		kind error
		user string // the whole UserMessage
	}{
		{"T = 0", CheckConditions(0, 1e5), ErrTemperature, "temperature must be a finite number above 0 K (got 0 K)"},
		{"T too high", CheckConditions(2e6, 1e5), ErrTemperature, "temperature must be from 0.001 K to 1000000 K (got 2e+06 K)"},
		{"P NaN", CheckConditions(300, math.NaN()), ErrPressure, "pressure must be a finite number above 0 Pa (got NaN Pa)"},
	}
	for _, tt := range tests {
		if !errors.Is(tt.err, tt.kind) {
			t.Errorf("%s: errors.Is(%v, %v) = false", tt.name, tt.err, tt.kind)
		}
		if got := UserMessage(tt.err); got != tt.user {
			t.Errorf("%s: UserMessage = %q, want %q", tt.name, got, tt.user)
		}
		if got, want := tt.err.Error(), "model: "+tt.user; got != want {
			t.Errorf("%s: Error() = %q, want %q", tt.name, got, want)
		}
	}
	if errors.Is(CheckConditions(0, 1e5), ErrPressure) {
		t.Errorf("a temperature error matches ErrPressure")
	}

	_, err := ParseCatalogue("site\x1b[2J.cat", strings.NewReader("[Ar]\nname = argon\nrotor = atom\ndHf0_kJ = zero\n"))
	var ce *CatalogueError
	if !errors.As(err, &ce) {
		t.Fatalf("ParseCatalogue: %v, want a *CatalogueError", err)
	}
	if got, want := UserMessage(err), `site\x1b[2J.cat:4: field "dHf0_kJ": "zero" is not a number; want an enthalpy of formation from -10000 to 10000 kJ/mol`; got != want {
		t.Errorf("CatalogueError UserMessage = %q, want %q", got, want)
	}

	_, err = Builtin().WithFile(filepath.Join(t.TempDir(), "no\x1bsuch.cat"))
	var pe *fs.PathError
	if !errors.As(err, &pe) || !errors.Is(err, fs.ErrNotExist) {
		t.Errorf("WithFile(absent) error %v, want a *fs.PathError for a missing file", err)
	}
	if msg := UserMessage(err); Printable(msg) != msg || strings.HasPrefix(msg, "model: ") || !strings.Contains(msg, `no\x1bsuch.cat`) {
		t.Errorf("WithFile(absent) message %q, want a printable line naming the file, without prefix", msg)
	}
}
