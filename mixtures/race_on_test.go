//go:build race

package mixtures

// raceEnabled says the race detector is on, which slows code tenfold:
// the few checks of elapsed time skip themselves then.
const raceEnabled = true
