package model

import (
	"errors"
	"strconv"
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
