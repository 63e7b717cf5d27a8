package ui

import (
	"context"
	"errors"

	tea "github.com/charmbracelet/bubbletea"

	"zmix/mixtures"
	"zmix/mixtures/report"
)

// A sweep is computed by a chain of commands, one chunk of grid points
// each. Every chunk returns a sweepProgressMsg; Update then asks for the
// next chunk, so progress shows between chunks and typing is never
// blocked, without a goroutine of our own. Each message carries the
// generation it was started for: a newer request makes it stale, and a
// stale message is dropped and ends its chain.

// sweepChunkWork is about how many species states one chunk computes
// (some tens of milliseconds), so a chunk holds sweepChunkWork/k points of
// a k-species blend, and never more than sweepChunkPoints: any sweep
// longer than that shows its progress.
const (
	sweepChunkWork   = 1 << 16
	sweepChunkPoints = 1 << 14
)

// sweepReleaseValues is the size, in values kept, from which a result is
// released when the next sweep starts, its storage passed on to it: two
// tables of a 200 000-point sweep would hold some 150 MB together, and
// Go would keep that much for a while after. Smaller results stay on
// screen until the next one is done.
var sweepReleaseValues = 4 << 20 // a variable only so that tests can lower it

// sweepKey is everything a sweep result depends on. Equal keys give
// equal results, so a request equal to the shown result is not rerun.
type sweepKey struct {
	mix         *mixtures.Mixture
	sweep       mixtures.Sweep
	fixedTempK  float64 // T held during a pressure sweep (else 0)
	fixedPresPa float64 // P held during a temperature sweep (else 0)
	opts        mixtures.Options
}

// sweepJob is one sweep in progress. Only the command computing its next
// chunk writes to it; Update reads it once that command has returned.
type sweepJob struct {
	key   sweepKey
	res   *mixtures.SweepTable
	chunk int
	state mixtures.State // reused from point to point
}

// sweepProgressMsg reports a chunk done: done of total points are
// computed. It ends the chain when done == total or err is set.
type sweepProgressMsg struct {
	gen         uint64
	job         *sweepJob
	done, total int
	err         error
}

// sweepStartCmd checks the sweep, lays out its grid and computes the
// first chunk. reuse, when not nil, is a released result whose storage
// the new one takes over.
func sweepStartCmd(gen uint64, key sweepKey, reuse *mixtures.SweepTable) tea.Cmd {
	return func() tea.Msg {
		if key.mix == nil || len(key.mix.Components) == 0 {
			return sweepProgressMsg{gen: gen, err: errors.New("no blend to sweep")}
		}
		if err := key.mix.CheckSweep(key.sweep, key.fixedTempK, key.fixedPresPa); err != nil {
			return sweepProgressMsg{gen: gen, err: err}
		}
		job := &sweepJob{
			key:   key,
			res:   reuse.Reuse(key.sweep, sweepColumns(key.mix)),
			chunk: min(sweepChunkPoints, max(64, sweepChunkWork/len(key.mix.Components))),
		}
		return job.compute(gen, 0)
	}
}

// sweepNextCmd computes the chunk of job that starts at point from.
func sweepNextCmd(gen uint64, job *sweepJob, from int) tea.Cmd {
	return func() tea.Msg { return job.compute(gen, from) }
}

// compute fills points [from, from+chunk) with the engine's StreamSpan,
// keeping only the table's columns, so the result equals the engine's
// Tabulate point for point.
func (j *sweepJob) compute(gen uint64, from int) sweepProgressMsg {
	n := j.res.Len()
	to := min(from+j.chunk, n)
	err := j.key.mix.StreamSpan(context.Background(), j.key.sweep, from, to, j.key.fixedTempK, j.key.fixedPresPa, j.key.opts, &j.state, j.res.Record)
	if err != nil {
		return sweepProgressMsg{gen: gen, err: err}
	}
	return sweepProgressMsg{gen: gen, job: j, done: to, total: n}
}

// source is the sweep of the key, for an export that computes it again
// and writes every figure of every point without keeping them.
func (k *sweepKey) source() *report.SweepSource {
	return &report.SweepSource{Mix: k.mix, Sweep: k.sweep, FixedTempK: k.fixedTempK, FixedPresPa: k.fixedPresPa, Opts: k.opts}
}
