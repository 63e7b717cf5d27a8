package report

import (
	"context"
	"runtime"
	"sync"

	"zmix/mixtures"
)

// SweepSource is a sweep to write: the mixture, the grid and the fixed
// conditions. The writers compute it themselves, in chunks of points on
// every core, and write the chunks in grid order as they are done, so a
// long sweep is neither held in memory nor bound to one core.
type SweepSource struct {
	Mix         *mixtures.Mixture
	Sweep       mixtures.Sweep
	FixedTempK  float64 // held during a pressure sweep
	FixedPresPa float64 // held during a temperature sweep
	Opts        mixtures.Options
}

// chunkPoints is the points one worker computes and formats at a time:
// large enough that handing out chunks costs nothing, small enough that
// the chunks in flight hold a few megabytes at most.
const chunkPoints = 512

// Each calls fn for every point in grid order, on one core: for callers
// that keep something from each point.
func (src *SweepSource) Each(ctx context.Context, fn func(i int, s *mixtures.State) error) error {
	return src.Mix.Stream(ctx, src.Sweep, src.FixedTempK, src.FixedPresPa, src.Opts,
		func(i int, _ float64, s *mixtures.State) error { return fn(i, s) })
}

// inChunks computes the sweep in chunks of points on every core: work
// turns the points [from, to) into a value (formatted rows, column widths),
// and use takes the values one by one in grid order. At most twice as many
// chunks as workers are in flight, so memory stays bounded whatever the
// number of points. The whole grid is checked before any work starts.
func inChunks[T any](ctx context.Context, src *SweepSource, work func(from, to int, s *mixtures.State) (T, error), use func(T) error) error {
	sw := src.Sweep
	if err := src.Mix.CheckSweep(sw, src.FixedTempK, src.FixedPresPa); err != nil {
		return err
	}
	chunks := (sw.Steps + chunkPoints - 1) / chunkPoints
	workers := max(1, min(runtime.GOMAXPROCS(0), chunks))
	ctx, cancel := context.WithCancel(ctx)
	defer cancel()

	type result struct {
		val T
		err error
	}
	results := make([]chan result, chunks)
	for c := range results {
		results[c] = make(chan result, 1) // a worker never waits on the writer
	}
	inFlight := make(chan struct{}, 2*workers)
	jobs := make(chan int)
	var wg sync.WaitGroup
	for range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			var s mixtures.State
			for c := range jobs {
				from, to := c*chunkPoints, min((c+1)*chunkPoints, sw.Steps)
				val, err := work(from, to, &s)
				results[c] <- result{val, err}
			}
		}()
	}
	go func() {
		defer close(jobs)
		for c := range chunks {
			select {
			case inFlight <- struct{}{}:
			case <-ctx.Done():
				return
			}
			select {
			case jobs <- c:
			case <-ctx.Done():
				return
			}
		}
	}()
	var err error
	for c := range chunks {
		r := <-results[c]
		if err = r.err; err == nil {
			err = use(r.val)
		}
		<-inFlight
		if err != nil {
			break
		}
	}
	cancel()
	wg.Wait()
	return err
}

// span computes the points [from, to) of the sweep into s, calling fn for
// each.
func (src *SweepSource) span(ctx context.Context, from, to int, s *mixtures.State, fn func(i int, s *mixtures.State) error) error {
	return src.Mix.StreamSpan(ctx, src.Sweep, from, to, src.FixedTempK, src.FixedPresPa, src.Opts, s,
		func(i int, _ float64, s *mixtures.State) error { return fn(i, s) })
}

// chunkBufs recycles the byte buffers of formatted chunks: a chunk's rows
// are a few hundred kilobytes, and growing a fresh buffer for each chunk
// was a fifth of a sweep's time.
var chunkBufs = sync.Pool{New: func() any { return new([]byte) }}

func getChunkBuf() []byte { return (*chunkBufs.Get().(*[]byte))[:0] }

func putChunkBuf(b []byte) { chunkBufs.Put(&b) }
