/**
 * Median time per call: batches sized to take about `batchMs` each, the median of the
 * batch means. Medians over batches ride out GC pauses and the other core's noise.
 */
export function measure(fn: () => unknown, { batches = 31, batchMs = 20, warmupMs = 500 } = {}): number {
  let sink: unknown;
  // Warm up long enough for the optimising compiler to settle: the first few hundred
  // milliseconds of a fresh function run several times slower than its steady state.
  const warmEnd = performance.now() + warmupMs;
  while (performance.now() < warmEnd) sink = fn();
  // Size the batch.
  let n = 1;
  for (;;) {
    const t0 = performance.now();
    for (let i = 0; i < n; i++) sink = fn();
    const dt = performance.now() - t0;
    if (dt > batchMs / 4) {
      n = Math.max(1, Math.round((n * batchMs) / dt));
      break;
    }
    n *= 2;
  }
  const means: number[] = [];
  for (let b = 0; b < batches; b++) {
    const t0 = performance.now();
    for (let i = 0; i < n; i++) sink = fn();
    means.push(((performance.now() - t0) * 1000) / n); // µs per call
  }
  if (sink === Symbol.for('never')) console.log(sink);
  means.sort((a, b) => a - b);
  return means[Math.floor(means.length / 2)]!;
}

export const fmt = (us: number) => (us >= 1000 ? `${(us / 1000).toFixed(2)} ms` : `${us.toFixed(2)} µs`);
