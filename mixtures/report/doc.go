// Package report is zmix's one presentation layer: how every figure of the
// engine is written, for the commands and the workbench alike.
//
// It holds exactly one of each of these, tested once here:
//
//   - Number, Short and Fixed: the number formatter. Non-finite values
//     are written "n/a" (callers refuse them before, through
//     mixtures.FirstNonFinite); a value that rounds to zero carries no
//     sign ("0.000", never "-0.000"); a fixed-decimal figure too wide to
//     read (|x| ≥ 1e9) switches to exponent form.
//   - ToASCII and ASCIIWriter: the transliteration for ASCII mode
//     (γ → gamma, J/(mol·K) → J/(mol.K), P° → P0); anything left over
//     becomes "?", so ASCII mode never sends a byte above 127.
//   - Pressure: the pressure formatter, in the unit and view (absolute or
//     gauge) the user chose.
//   - Wrap: the word wrapper, linear in its input and safe for any width.
//   - Table: aligned text columns.
//
// On top of these sit the readouts: the state text, JSON and CSV; the
// sweep writers, which stream row by row as the engine computes; and the
// catalogue listings. Each reads the quantity table of package mixtures,
// so a new row there appears in every output. The process results of
// package mixtures/process are written the same way, from the figure
// descriptions each result carries (WriteProcessText, WriteProcessJSON).
package report
