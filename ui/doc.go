// Package ui is zmix's keyboard workbench: a bubbletea program in which a
// blend is put together, its conditions set, and its properties read as
// they respond to every edit. It only shows and edits; every figure comes
// from packages model and mixtures, the same code as the commands.
//
// # Panes
//
//	1 Recipe      species and amounts as typed (mol %, ppm, wt %, fraction,
//	              partial pressure, bal), with the catalogue search
//	2 Setpoint    temperature and pressure with units, P° (1 bar or 1 atm),
//	              pressures shown as absolute or gauge
//	3 Properties  the readout of the state command: M, ρ, Cp, Cv, γ, c, H,
//	              U, S, G, A per mole and per kg, the mixing entropy, and a
//	              line per species at its partial pressure
//	4 Sweep       a sweep of T or P and its plot (sweep*.go, plot*.go)
//	5 Anatomy     one species taken apart: translation, rotation, vibration
//	              and electronic shares of S and Cp, its characteristic
//	              temperatures and the model's validity notes
//
// Every pane satisfies one interface (panes.go): size, update, view, key
// help, title, whether it is editing, sync and scroll marks. The root holds
// them in one list, in Tab order, and only paneSpecs, the registrations,
// names their types. Abilities only some panes have (a state of their own
// to save, a sweep to export, a one-line headline, a preferred height) are
// small interfaces the root looks for. The root itself is split by
// concern: root.go routes, prompts.go, autosave.go, overlay.go, view.go.
//
// A safety strip with the blend's hazard classes and the line that defers
// to site codes, data sheets and licensed practice stays on screen while
// any caution applies. The model's validity cautions (a species near
// condensing, real-gas effects) head it as a MODEL CAUTION line, stand as
// lines in Properties and are in full in the ! overlay.
//
// Pressures are shown in the unit of the pressure typed (a sweep's axis:
// of the range typed) and in the reading chosen with "show P as",
// absolute or gauge (mixtures.PressureUnit, report.PressureIn). Text is
// wrapped or shortened between words, never cut mid-word; ASCII mode
// (report.ToASCII) spells out every glyph the workbench draws.
//
// # Conventions
//
// The text the user typed is the document (type bench). What the panes
// compute from, Inputs, changes only when all of the text resolves; a
// typing slip is shown in place with its error and the last valid state
// stays in force. Inputs carry a generation number, so that results of
// background work (the sweep) that arrive late are dropped.
//
// The S and Cp shares of the Anatomy pane are those of package model's
// factor terms: S_f = R(ln q_f + U_f) and Cv_f = R·Cv_f; the R of
// Cp − Cv (the P dV work at constant pressure) is shown with translation.
//
// # Files
//
// Saving, opening and exporting propose the folder last used, else the
// blend file's, else $XDG_DATA_HOME/zmix (default ~/.local/share/zmix),
// made on the first write there.
//
// The workbench state (everything as typed, in blend-file form, the sweep
// settings, the pane, the path of the blend file in use) is written
// atomically, mode 0600, to $XDG_STATE_HOME/zmix/state.json (default
// ~/.local/state/zmix) after every change that alters it, and read back on
// the next start. A state file that cannot be read, is not a regular
// file, is larger than 2 MiB or breaks the limits of a blend file is
// renamed state.json.corrupt-TIME (-2, -3 … if that name is taken).
// Temporary files of a write that a kill interrupted are removed at start.
//
// Each state file has an advisory lock (flock on state.lock). A second
// workbench on the same directory starts from the first one's state and
// saves to state-2.json (up to state-9.json), saying so on the status
// line; with every one taken it opens read-only. SIGHUP, SIGTERM and
// SIGINT are caught before any other work, and save and quit. A panic
// saves the state and writes crash-TIME.txt in the same directory; Run
// returns an error that names it.
//
// Text from a file or the state (names, notes, species, amounts, paths,
// error lines) goes through model.Printable before it is drawn, and View
// turns any other control byte into "?".
//
// View is pure and cheap: panes render their lines when their data or size
// changes, and View only frames them and drops colour codes that change
// nothing (compactSGR). Focus shows in the tab row and a bracketed title,
// so that moving it redraws a few rows, not two frames. Nothing ticks: no
// cursor blinks, no timers, so an idle workbench writes nothing to the
// terminal.
package ui
