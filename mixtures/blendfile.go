package mixtures

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"reflect"
	"strconv"
	"strings"
)

// BlendFormat is the format tag every blend file carries.
const BlendFormat = "zmix-blend/1"

// BlendFile is the saved form of a blend and its conditions. Amounts and
// conditions are kept as the user wrote them, so nothing typed is lost or
// rounded on a save and load.
type BlendFile struct {
	Format     string          `json:"format"`
	Name       string          `json:"name,omitempty"`
	Note       string          `json:"note,omitempty"`
	Components []FileComponent `json:"components"`
	// Temperature and Pressure are values with units, e.g. "25 C", "2 barg".
	Temperature string `json:"temperature,omitempty"`
	Pressure    string `json:"pressure,omitempty"`
	// StandardPressure is "1 bar" (the default) or "1 atm".
	StandardPressure string `json:"standard_pressure,omitempty"`
}

// FileComponent is one species and its amount in blend syntax ("2%", "bal").
type FileComponent struct {
	Species string `json:"species"`
	Amount  string `json:"amount"`
}

// BlendText joins the components back into blend text.
func (f *BlendFile) BlendText() string {
	parts := make([]string, len(f.Components))
	for i, c := range f.Components {
		parts[i] = c.Species + " " + c.Amount
	}
	return strings.Join(parts, ", ")
}

// FileFromBlend builds the saved form of a parsed blend.
func FileFromBlend(b *Blend) *BlendFile {
	f := &BlendFile{Format: BlendFormat}
	for _, it := range b.Items {
		f.Components = append(f.Components, FileComponent{Species: it.Key, Amount: it.Text})
	}
	return f
}

// Parse checks the file's blend text and returns it parsed.
func (f *BlendFile) Parse() (*Blend, error) { return ParseBlend(f.BlendText()) }

// LoadBlendFile reads and checks a blend file. Errors name the file and,
// where the fault is on one line, the line: "blend file b.json:5: …".
func LoadBlendFile(path string) (*BlendFile, error) {
	data, err := os.ReadFile(path)
	if err != nil {
		return nil, fmt.Errorf("mixtures: blend file: %w", err)
	}
	return parseBlendFile(path, data)
}

// parseBlendFile decodes and checks the contents of the blend file path.
func parseBlendFile(path string, data []byte) (*BlendFile, error) {
	f, line, err := decodeBlendFile(data)
	if err == nil {
		if field, comp, cerr := f.check(); cerr != nil {
			err, line = cerr, fieldLine(data, field, comp)
		}
	}
	if err != nil {
		return nil, blendFileError(path, line, err)
	}
	return f, nil
}

func blendFileError(path string, line int, err error) error {
	if line > 0 {
		return fmt.Errorf("mixtures: blend file %s:%d: %w", path, line, err)
	}
	return fmt.Errorf("mixtures: blend file %s: %w", path, err)
}

// decodeBlendFile decodes the JSON of a blend file, with the line of a
// fault (0 if it has none).
func decodeBlendFile(data []byte) (*BlendFile, int, error) {
	if len(bytes.TrimSpace(data)) == 0 {
		return nil, 0, fmt.Errorf("the file is empty; want the JSON written by zmix, format %q", BlendFormat)
	}
	var f BlendFile
	dec := json.NewDecoder(bytes.NewReader(data))
	dec.DisallowUnknownFields()
	if err := dec.Decode(&f); err != nil {
		line, msg := jsonErrorLine(data, err)
		return nil, line, fmt.Errorf("%s (want the JSON written by zmix, format %q)", msg, BlendFormat)
	}
	rest := bytes.TrimLeft(data[dec.InputOffset():], " \t\r\n")
	if len(rest) > 0 {
		return nil, lineAt(data, len(data)-len(rest)), errors.New("unexpected data after the blend object (a file holds one blend)")
	}
	return &f, 0, nil
}

// check validates a decoded file the way LoadBlendFile and Save need it.
// On failure it names the JSON field at fault and, for a component, its
// index (−1 for the field as a whole), so that the caller can give the
// line.
func (f *BlendFile) check() (field string, comp int, err error) {
	if f.Format != BlendFormat {
		return "format", -1, fmt.Errorf("format %q; want %q", f.Format, BlendFormat)
	}
	if len(f.Components) == 0 {
		return "components", -1, errors.New(`no components; want a list of {"species": "N2", "amount": "bal"}`)
	}
	// Each component must stay one item when joined into blend text.
	for i, c := range f.Components {
		if c.Species == "" || strings.ContainsAny(c.Species, " \t,;\n") {
			return "components", i, fmt.Errorf("species %q; want one formula or name such as N2, with no spaces or separators", c.Species)
		}
		if strings.ContainsAny(c.Amount, ",;\n") {
			return "components", i, fmt.Errorf("%s amount %q holds a separator (, ; or a new line); want one amount such as 21%% or bal", c.Species, c.Amount)
		}
	}
	if _, err := f.Parse(); err != nil {
		return "components", f.componentAt(err), err
	}
	if f.Temperature != "" {
		if _, err := ParseTemperature(f.Temperature); err != nil {
			return "temperature", -1, err
		}
	}
	if f.Pressure != "" {
		if _, err := ParsePressure(f.Pressure); err != nil {
			return "pressure", -1, err
		}
	}
	if _, err := StdPressureFromText(f.StandardPressure); err != nil {
		return "standard_pressure", -1, err
	}
	return "", -1, nil
}

// componentAt returns the index of the component a blend error points at,
// or −1 if it concerns the blend as a whole.
func (f *BlendFile) componentAt(err error) int {
	var be *BlendError
	if !errors.As(err, &be) || be.Offset < 0 {
		return -1
	}
	start := 0
	for i, c := range f.Components {
		end := start + len(c.Species) + 1 + len(c.Amount) // as BlendText joins them
		if be.Offset < end {
			return i
		}
		start = end + len(", ")
	}
	return -1
}

// StdPressureFromText reads "1 bar" or "1 atm" (empty means 1 bar).
func StdPressureFromText(s string) (float64, error) {
	switch strings.ToLower(strings.TrimSpace(s)) {
	case "", "1 bar", "bar", "1bar":
		return 1e5, nil
	case "1 atm", "atm", "1atm":
		return 101325, nil
	}
	return 0, fmt.Errorf("%w: standard pressure %q; want 1 bar or 1 atm", ErrValue, s)
}

// lineAt returns the 1-based line of byte offset off in data.
func lineAt(data []byte, off int) int {
	off = max(0, min(off, len(data)))
	return 1 + bytes.Count(data[:off], []byte("\n"))
}

// jsonErrorLine returns the line of a JSON decoding error and a message
// in plain words.
func jsonErrorLine(data []byte, err error) (int, string) {
	var syn *json.SyntaxError
	var typ *json.UnmarshalTypeError
	switch {
	case errors.As(err, &syn):
		// Offset counts the bytes read, the bad one included.
		return lineAt(data, int(syn.Offset)-1), err.Error()
	case errors.As(err, &typ):
		want := map[reflect.Kind]string{reflect.String: "text in quotes", reflect.Slice: "list [...]", reflect.Struct: "object {...}"}[typ.Type.Kind()]
		if want == "" {
			want = typ.Type.String()
		}
		return lineAt(data, int(typ.Offset)-1), fmt.Sprintf("field %q holds a %s; want %s", typ.Field, typ.Value, want)
	case errors.Is(err, io.ErrUnexpectedEOF):
		end := len(bytes.TrimRight(data, " \t\r\n"))
		return lineAt(data, end), "the file is cut short (JSON ends in the middle)"
	}
	// DisallowUnknownFields reports `json: unknown field "name"` with no
	// offset; the field's key gives the line.
	if name, ok := strings.CutPrefix(err.Error(), "json: unknown field "); ok {
		if key, uerr := strconv.Unquote(name); uerr == nil {
			if off := keyOffset(data, key, -1); off >= 0 {
				return lineAt(data, off), fmt.Sprintf("unknown field %q", key)
			}
		}
	}
	return 0, err.Error()
}

// fieldLine returns the line of a top-level field of a blend file, or of
// element comp of its array when comp ≥ 0; 0 if it cannot be found.
func fieldLine(data []byte, field string, comp int) int {
	if off := keyOffset(data, field, comp); off >= 0 {
		return lineAt(data, off)
	}
	return 0
}

// keyOffset walks the JSON tokens of data and returns the byte offset of
// the key field of the top-level object (any depth when it is not found
// there, for unknown fields inside components), or with elem ≥ 0, of
// element elem of the array that key holds. It returns −1 if not found.
func keyOffset(data []byte, field string, elem int) int {
	type frame struct {
		object  bool
		wantKey bool   // an object's next string is a key
		key     string // the key whose value is being read
		target  bool   // this is the array of field at the top level
		n       int    // elements seen in an array
	}
	dec := json.NewDecoder(bytes.NewReader(data))
	var stack []frame
	nested := -1 // offset of field found below the top level
	for {
		off := int(dec.InputOffset())
		tok, err := dec.Token()
		if err != nil {
			return nested
		}
		// The token starts after any separators that precede it.
		for off < len(data) && strings.IndexByte(" \t\r\n,:", data[off]) >= 0 {
			off++
		}
		var top *frame
		if len(stack) > 0 {
			top = &stack[len(stack)-1]
		}
		if top != nil && top.object && top.wantKey {
			if key, ok := tok.(string); ok {
				top.wantKey, top.key = false, key
				if key == field {
					if len(stack) == 1 && elem < 0 {
						return off
					}
					if len(stack) > 1 && nested < 0 {
						nested = off
					}
				}
				continue
			}
		}
		if top != nil && !top.object && top.target {
			if top.n == elem && tok != json.Delim(']') {
				return off
			}
			top.n++
		}
		switch tok {
		case json.Delim('{'), json.Delim('['):
			target := tok == json.Delim('[') && len(stack) == 1 && top.key == field
			stack = append(stack, frame{object: tok == json.Delim('{'), wantKey: true, target: target})
			continue
		case json.Delim('}'), json.Delim(']'):
			stack = stack[:len(stack)-1]
		}
		if len(stack) > 0 && stack[len(stack)-1].object {
			stack[len(stack)-1].wantKey = true
		}
	}
}

// Save checks the blend file, so that a file that could not be loaded
// again is never written, then writes it atomically.
func (f *BlendFile) Save(path string) error {
	f.Format = BlendFormat
	if _, _, err := f.check(); err != nil {
		return fmt.Errorf("mixtures: blend file %s not saved: %w", path, err)
	}
	var buf bytes.Buffer
	enc := json.NewEncoder(&buf)
	enc.SetIndent("", "  ")
	enc.SetEscapeHTML(false) // the file is for people: keep <, > and & as typed
	if err := enc.Encode(f); err != nil {
		return fmt.Errorf("mixtures: %w", err)
	}
	return WriteFileAtomic(path, buf.Bytes(), 0o644)
}

// WriteFileAtomic writes data to a temporary file in the same directory,
// syncs it and renames it over path, so that a crash leaves either the
// old file or the new one, never half of one.
func WriteFileAtomic(path string, data []byte, perm os.FileMode) error {
	dir := filepath.Dir(path)
	tmp, err := os.CreateTemp(dir, "."+filepath.Base(path)+".tmp-*")
	if err != nil {
		return fmt.Errorf("mixtures: write %s: %w", path, err)
	}
	name := tmp.Name()
	fail := func(err error) error {
		tmp.Close()
		os.Remove(name)
		return fmt.Errorf("mixtures: write %s: %w", path, err)
	}
	if _, err := tmp.Write(data); err != nil {
		return fail(err)
	}
	if err := tmp.Chmod(perm); err != nil {
		return fail(err)
	}
	if err := tmp.Sync(); err != nil {
		return fail(err)
	}
	if err := tmp.Close(); err != nil {
		os.Remove(name)
		return fmt.Errorf("mixtures: write %s: %w", path, err)
	}
	if err := os.Rename(name, path); err != nil {
		os.Remove(name)
		return fmt.Errorf("mixtures: write %s: %w", path, err)
	}
	if d, err := os.Open(dir); err == nil {
		d.Sync() // make the rename itself durable; not all systems allow it
		d.Close()
	}
	return nil
}
