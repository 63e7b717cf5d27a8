package mixtures

import (
	"bytes"
	"encoding/json"
	"fmt"
	"os"
	"path/filepath"
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

// LoadBlendFile reads and checks a blend file.
func LoadBlendFile(path string) (*BlendFile, error) {
	data, err := os.ReadFile(path)
	if err != nil {
		return nil, fmt.Errorf("mixtures: blend file: %w", err)
	}
	var f BlendFile
	dec := json.NewDecoder(bytes.NewReader(data))
	dec.DisallowUnknownFields()
	if err := dec.Decode(&f); err != nil {
		return nil, fmt.Errorf("mixtures: blend file %s: %v (want the JSON written by zmix, format %q)", path, jsonErrorLine(data, err), BlendFormat)
	}
	if f.Format != BlendFormat {
		return nil, fmt.Errorf("mixtures: blend file %s: format %q; want %q", path, f.Format, BlendFormat)
	}
	if len(f.Components) == 0 {
		return nil, fmt.Errorf("mixtures: blend file %s: no components", path)
	}
	if _, err := f.Parse(); err != nil {
		return nil, fmt.Errorf("mixtures: blend file %s: %w", path, err)
	}
	if f.Temperature != "" {
		if _, err := ParseTemperature(f.Temperature); err != nil {
			return nil, fmt.Errorf("mixtures: blend file %s: %w", path, err)
		}
	}
	if f.Pressure != "" {
		if _, err := ParsePressure(f.Pressure); err != nil {
			return nil, fmt.Errorf("mixtures: blend file %s: %w", path, err)
		}
	}
	if _, err := StdPressureFromText(f.StandardPressure); err != nil {
		return nil, fmt.Errorf("mixtures: blend file %s: %w", path, err)
	}
	return &f, nil
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

// jsonErrorLine adds the line number to a JSON syntax error.
func jsonErrorLine(data []byte, err error) string {
	var off int64 = -1
	switch e := err.(type) {
	case *json.SyntaxError:
		off = e.Offset
	case *json.UnmarshalTypeError:
		off = e.Offset
	}
	if off < 0 || off > int64(len(data)) {
		return err.Error()
	}
	line := 1 + bytes.Count(data[:off], []byte("\n"))
	return fmt.Sprintf("line %d: %v", line, err)
}

// Save writes the blend file atomically.
func (f *BlendFile) Save(path string) error {
	f.Format = BlendFormat
	data, err := json.MarshalIndent(f, "", "  ")
	if err != nil {
		return fmt.Errorf("mixtures: %w", err)
	}
	return WriteFileAtomic(path, append(data, '\n'), 0o644)
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
