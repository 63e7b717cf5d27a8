package mixtures

import (
	"bufio"
	"bytes"
	"io/fs"
	"math/rand/v2"
	"unicode/utf8"

	"encoding/json"
	"errors"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"reflect"
	"strconv"
	"strings"
	"zmix/model"
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

// Items returns the components as blend items, in order.
func (f *BlendFile) Items() []BlendItem {
	items := make([]BlendItem, len(f.Components))
	for i, c := range f.Components {
		items[i] = BlendItem{Species: c.Species, Amount: c.Amount}
	}
	return items
}

// Parse checks the file's components and returns them as a blend.
func (f *BlendFile) Parse() (*Blend, error) { return NewBlend(f.Items()) }

// Limits of a blend file: a file that breaks them is refused at once, so
// that no corrupt or hostile file can make zmix work for long.
const (
	MaxBlendFileBytes = 1 << 20
	MaxNameChars      = 200
	MaxNoteChars      = 4096
	MaxBlendItems     = 1000
)

// LoadBlendFile reads and checks a blend file. Errors name the file and,
// where the fault is on one line, the line: "blend file b.json:5: …".
func LoadBlendFile(path string) (*BlendFile, error) {
	f, _, err := ReadBlendFile(path)
	return f, err
}

// ReadBlendFile is LoadBlendFile that also returns the file's blend, whose
// items carry their origin ("b.json:5"), so that an error found later,
// such as an unknown species when the blend is resolved, names the file
// and line.
func ReadBlendFile(path string) (*BlendFile, *Blend, error) {
	data, err := readCapped(path, MaxBlendFileBytes)
	if err != nil {
		return nil, nil, err
	}
	f, err := parseBlendFile(path, data)
	if err != nil {
		return nil, nil, err
	}
	items := f.Items()
	_, elems := keyOffsets(data, "components")
	for i := range items {
		if i < len(elems) {
			items[i].Origin = path + ":" + strconv.Itoa(lineAt(data, elems[i]))
		} else {
			items[i].Origin = path
		}
	}
	b, err := NewBlend(items)
	if err != nil { // check passed, so this is not expected
		return nil, nil, blendFileError(path, 0, err)
	}
	return f, b, nil
}

// readCapped reads a file of at most limit bytes, refusing a larger one
// before reading it.
func readCapped(path string, limit int64) ([]byte, error) {
	fh, err := os.Open(path)
	if err != nil {
		return nil, model.Errorf("mixtures", "blend file: %w", err)
	}
	defer fh.Close()
	if st, err := fh.Stat(); err == nil && !st.Mode().IsRegular() {
		return nil, model.KindErrorf("mixtures", ErrNotRegular, "blend file %s: not a regular file; want a blend file written by zmix", model.Printable(path))
	}
	data, err := io.ReadAll(io.LimitReader(fh, limit+1))
	if err != nil {
		return nil, model.Errorf("mixtures", "blend file: %w", err)
	}
	if int64(len(data)) > limit {
		return nil, model.KindErrorf("mixtures", ErrTooLong, "blend file %s: larger than %d KB; a blend file is small JSON written by zmix", model.Printable(path), limit>>10)
	}
	return data, nil
}

// parseBlendFile decodes and checks the contents of the blend file path.
func parseBlendFile(path string, data []byte) (*BlendFile, error) {
	if len(data) > MaxBlendFileBytes {
		return nil, blendFileError(path, 0, model.KindErrorf("", ErrTooLong, "larger than %d KB; a blend file is small JSON written by zmix", MaxBlendFileBytes>>10))
	}
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
		return model.Errorf("mixtures", "blend file %s:%d: %w", model.Printable(path), line, err)
	}
	return model.Errorf("mixtures", "blend file %s: %w", model.Printable(path), err)
}

// decodeBlendFile decodes the JSON of a blend file, with the line of a
// fault (0 if it has none).
func decodeBlendFile(data []byte) (*BlendFile, int, error) {
	if len(bytes.TrimSpace(data)) == 0 {
		return nil, 0, model.Errorf("", "the file is empty; want the JSON written by zmix, format %q", BlendFormat)
	}
	var f BlendFile
	dec := json.NewDecoder(bytes.NewReader(data))
	dec.DisallowUnknownFields()
	if err := dec.Decode(&f); err != nil {
		line, msg := jsonErrorLine(data, err)
		return nil, line, model.Errorf("", "%s (want the JSON written by zmix, format %q)", msg, BlendFormat)
	}
	rest := bytes.TrimLeft(data[dec.InputOffset():], " \t\r\n")
	if len(rest) > 0 {
		return nil, lineAt(data, len(data)-len(rest)), model.Errorf("", "unexpected data after the blend object (a file holds one blend)")
	}
	return &f, 0, nil
}

// check validates a decoded file the way LoadBlendFile and Save need it.
// On failure it names the JSON field at fault and, for a component, its
// index (−1 for the field as a whole), so that the caller can give the
// line.
func (f *BlendFile) check() (field string, comp int, err error) {
	if f.Format != BlendFormat {
		return "format", -1, model.Errorf("", "format %s; want %q", model.Quote(f.Format), BlendFormat)
	}
	if n := utf8.RuneCountInString(f.Name); n > MaxNameChars {
		return "name", -1, model.KindErrorf("", ErrTooLong, "a name of %d characters; want at most %d", n, MaxNameChars)
	}
	if n := utf8.RuneCountInString(f.Note); n > MaxNoteChars {
		return "note", -1, model.KindErrorf("", ErrTooLong, "a note of %d characters; want at most %d", n, MaxNoteChars)
	}
	if len(f.Components) == 0 {
		return "components", -1, model.Errorf("", `no components; want a list of {"species": "N2", "amount": "bal"}`)
	}
	if len(f.Components) > MaxBlendItems {
		return "components", -1, model.KindErrorf("", ErrTooLong, "%d components; want at most %d", len(f.Components), MaxBlendItems)
	}
	for i, c := range f.Components {
		if utf8.RuneCountInString(c.Species) > MaxSpeciesChars || utf8.RuneCountInString(c.Amount) > MaxAmountChars {
			break // NewBlend says which, below
		}
		if c.Species == "" || strings.ContainsAny(c.Species, " \t,;\n") {
			return "components", i, model.Errorf("", "species %s; want one formula or name such as N2, with no spaces or separators", model.Quote(c.Species))
		}
		if strings.ContainsAny(c.Amount, ",;\n") {
			return "components", i, model.Errorf("", "%s amount %s holds a separator (, ; or a new line); want one amount such as 21%% or bal, with a decimal point", model.Printable(c.Species), model.Quote(c.Amount))
		}
	}
	if _, err := f.Parse(); err != nil {
		var be *BlendError
		if errors.As(err, &be) {
			return "components", be.Index, err
		}
		return "components", -1, err
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
	if _, err := ParseStdPressure(f.StandardPressure); err != nil {
		return "standard_pressure", -1, err
	}
	return "", -1, nil
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
			if off := keyOffset(data, key); off >= 0 {
				return lineAt(data, off), fmt.Sprintf("unknown field %q", key)
			}
		}
	}
	return 0, err.Error()
}

// fieldLine returns the line of a top-level field of a blend file, or of
// element comp of its array when comp ≥ 0; 0 if it cannot be found.
func fieldLine(data []byte, field string, comp int) int {
	key, elems := keyOffsets(data, field)
	off := key
	if comp >= 0 {
		off = -1
		if comp < len(elems) {
			off = elems[comp]
		}
	}
	if off >= 0 {
		return lineAt(data, off)
	}
	return 0
}

// keyOffset returns the byte offset of the key field, as keyOffsets does.
func keyOffset(data []byte, field string) int {
	key, _ := keyOffsets(data, field)
	return key
}

// keyOffsets walks the JSON tokens of data once and returns the byte
// offset of the key field of the top-level object (at any depth when it
// is not found there, for unknown fields inside components), and the
// offset of each element of the array that key holds at the top level.
// A key not found gives −1.
func keyOffsets(data []byte, field string) (key int, elems []int) {
	type frame struct {
		object  bool
		wantKey bool   // an object's next string is a key
		key     string // the key whose value is being read
		target  bool   // this is the array of field at the top level
	}
	dec := json.NewDecoder(bytes.NewReader(data))
	var stack []frame
	key, nested := -1, -1 // offset of field at the top level, and below it
	done := func() (int, []int) {
		if key < 0 {
			key = nested
		}
		return key, elems
	}
	for {
		off := int(dec.InputOffset())
		tok, err := dec.Token()
		if err != nil {
			return done()
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
			if k, ok := tok.(string); ok {
				top.wantKey, top.key = false, k
				if k == field {
					if len(stack) == 1 && key < 0 {
						key = off
					}
					if len(stack) > 1 && nested < 0 {
						nested = off
					}
				}
				continue
			}
		}
		if top != nil && !top.object && top.target && tok != json.Delim(']') {
			elems = append(elems, off)
		}
		switch tok {
		case json.Delim('{'), json.Delim('['):
			target := tok == json.Delim('[') && len(stack) == 1 && top.key == field
			stack = append(stack, frame{object: tok == json.Delim('{'), wantKey: true, target: target})
			continue
		case json.Delim('}'), json.Delim(']'):
			if len(stack) == 0 {
				return done()
			}
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
		return model.Errorf("mixtures", "blend file %s not saved: %w", model.Printable(path), err)
	}
	var buf bytes.Buffer
	enc := json.NewEncoder(&buf)
	enc.SetIndent("", "  ")
	enc.SetEscapeHTML(false) // the file is for people: keep <, > and & as typed
	if err := enc.Encode(f); err != nil {
		return model.Errorf("mixtures", "%w", err)
	}
	return WriteFileAtomic(path, buf.Bytes(), 0o666)
}

// ErrNotRegular is the kind of error for a path that is not a regular
// file (a directory, device, pipe or socket), which zmix never replaces.
var ErrNotRegular = errors.New("not a regular file")

// WriteFileAtomic writes data to a temporary file in the same directory,
// syncs it and renames it over path, so that a crash leaves either the
// old file or the new one, never half of one.
//
// A new file gets perm masked by the umask (0o666 for files people keep,
// 0o600 for private state); a file replaced keeps its own permissions.
// Only a regular file is ever replaced. A symbolic link is written
// through: the regular file it points to is replaced and the link kept,
// as an editor does; a link to nothing, or to anything else, is refused.
// Errors name path as the user gave it, never the temporary file.
func WriteFileAtomic(path string, data []byte, perm os.FileMode) error {
	return WriteFileAtomicFunc(path, perm, func(w io.Writer) error {
		_, err := w.Write(data)
		return err
	})
}

// WriteFileAtomicFunc is WriteFileAtomic for output that is written as it
// is made (a long sweep), through a buffered writer.
func WriteFileAtomicFunc(path string, perm os.FileMode, write func(io.Writer) error) error {
	fail := func(err error) error {
		var pe *os.PathError
		var le *os.LinkError
		switch {
		case errors.As(err, &pe):
			err = pe.Err
		case errors.As(err, &le):
			err = le.Err
		}
		return model.Errorf("mixtures", "write %s: %w", model.Printable(path), err)
	}
	target, mode, err := writeTarget(path)
	if err != nil {
		return err
	}
	if mode != 0 {
		perm = mode
	}
	dir := filepath.Dir(target)
	var tmp *os.File
	var name string
	for range 100 {
		name = filepath.Join(dir, "."+filepath.Base(target)+".tmp-"+strconv.FormatUint(rand.Uint64(), 36))
		tmp, err = os.OpenFile(name, os.O_WRONLY|os.O_CREATE|os.O_EXCL, perm)
		if !errors.Is(err, fs.ErrExist) {
			break
		}
	}
	if err != nil {
		return fail(err)
	}
	abandon := func(err error) error {
		tmp.Close()
		os.Remove(name)
		return fail(err)
	}
	bw := bufio.NewWriterSize(tmp, 64<<10)
	if err := write(bw); err != nil {
		return abandon(err)
	}
	if err := bw.Flush(); err != nil {
		return abandon(err)
	}
	if mode != 0 {
		// OpenFile's perm was masked by the umask; a replaced file keeps
		// exactly the permissions it had.
		if err := tmp.Chmod(mode); err != nil {
			return abandon(err)
		}
	}
	if err := tmp.Sync(); err != nil {
		return abandon(err)
	}
	if err := tmp.Close(); err != nil {
		os.Remove(name)
		return fail(err)
	}
	if err := os.Rename(name, target); err != nil {
		os.Remove(name)
		return fail(err)
	}
	if d, err := os.Open(dir); err == nil {
		d.Sync() // make the rename itself durable; not all systems allow it
		d.Close()
	}
	return nil
}

// CheckWriteTarget reports whether WriteFileAtomic would refuse path (not
// a regular file, a link to nothing, another user's file), so that a
// caller can say so before asking whether to replace it.
func CheckWriteTarget(path string) error {
	_, _, err := writeTarget(path)
	return err
}

// writeTarget returns the file a write to path replaces, following a
// symbolic link, and the permissions of that file (0 when it does not
// exist yet). Anything but a regular file is refused.
func writeTarget(path string) (string, os.FileMode, error) {
	refuse := func(format string, args ...any) error {
		return model.KindErrorf("mixtures", ErrNotRegular, "write %s: "+format, append([]any{model.Printable(path)}, args...)...)
	}
	lst, err := os.Lstat(path)
	if errors.Is(err, fs.ErrNotExist) {
		return path, 0, nil
	}
	if err != nil {
		return "", 0, model.Errorf("mixtures", "write %s: %w", model.Printable(path), unwrapPath(err))
	}
	target := path
	st := lst
	if lst.Mode()&fs.ModeSymlink != 0 {
		if target, err = filepath.EvalSymlinks(path); err != nil {
			return "", 0, refuse("a symbolic link to nothing that can be written; give the path of a regular file")
		}
		if st, err = os.Stat(target); err != nil {
			return "", 0, model.Errorf("mixtures", "write %s: %w", model.Printable(path), unwrapPath(err))
		}
	}
	if !st.Mode().IsRegular() {
		what := "not a regular file"
		switch {
		case st.IsDir():
			what = "a directory"
		case st.Mode()&fs.ModeDevice != 0:
			what = "a device"
		case st.Mode()&fs.ModeNamedPipe != 0:
			what = "a named pipe"
		case st.Mode()&fs.ModeSocket != 0:
			what = "a socket"
		}
		return "", 0, refuse("it is %s, which zmix never replaces; give the path of a regular file", what)
	}
	if owner, ok := fileOwner(st); ok && owner != os.Getuid() {
		return "", 0, refuse("the file belongs to another user; save under another name")
	}
	return target, st.Mode().Perm(), nil
}

func unwrapPath(err error) error {
	var pe *os.PathError
	if errors.As(err, &pe) {
		return pe.Err
	}
	return err
}
