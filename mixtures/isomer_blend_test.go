package mixtures

import (
	"errors"
	"math"
	"strings"
	"testing"

	"zmix/model"
)

// TestIsomerBlendText: blend text names isomers by their prefixed formulas,
// and a bare formula that only isomers carry is one clear line naming
// them.
func TestIsomerBlendText(t *testing.T) {
	cat := model.Builtin()
	b, err := ParseBlend("n-C4H10 2%, i-C4H10 1%, N2 bal")
	if err != nil {
		t.Fatal(err)
	}
	m, err := b.Resolve(cat, 101325)
	if err != nil {
		t.Fatalf("butanes by isomer prefix: %v", err)
	}
	want := map[string]float64{"n-C4H10": 0.02, "i-C4H10": 0.01, "N2": 0.97}
	if len(m.Components) != 3 {
		t.Fatalf("%d components, want 3", len(m.Components))
	}
	for _, c := range m.Components {
		if math.Abs(c.X-want[c.Species.Formula]) > 1e-12 {
			t.Errorf("%s: x = %g, want %g", c.Species.Formula, c.X, want[c.Species.Formula])
		}
	}
	b, err = ParseBlend("C4H10 2%, N2 bal")
	if err != nil {
		t.Fatal(err)
	}
	_, err = b.Resolve(cat, 101325)
	var be *BlendError
	if !errors.As(err, &be) || !errors.Is(err, ErrUnknownSpecies) || be.Index != 0 {
		t.Fatalf("bare C4H10: error %v; want an unknown-species error on item 0", err)
	}
	msg := model.UserMessage(err)
	for _, part := range []string{`"C4H10"`, "n-C4H10 (n-butane)", "i-C4H10 (isobutane)"} {
		if !strings.Contains(msg, part) || strings.Contains(msg, "\n") {
			t.Errorf("bare C4H10: message %q lacks %q or is not one line", msg, part)
		}
	}
}
