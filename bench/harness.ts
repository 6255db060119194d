/** A named benchmark: `run` is timed; `floor`, when given, is timed the same way for the ratio. */
export interface Benchmark {
  name: string;
  /**
   * Work to time (may be async: it is awaited inside the timing). Its result is kept so the engine cannot drop the
   * call.
   */
  run: () => unknown;
  /** A lower-bound loop over the same data; the printed ratio is run / floor. */
  floor?: () => unknown;
  /**
   * A ratio measured apart from `run`: median time of `slow` over median time of `fast` (e.g. a
   * dense solve over the sparse one on the same system). Printed as `ratio=` when there is no floor.
   */
  compare?: { slow: () => unknown; fast: () => unknown; runs?: number; warmUps?: number };
  /** Timed runs after warm-up. @default 15 */
  runs?: number;
  /** Untimed warm-up runs. @default 3 */
  warmUps?: number;
  /**
   * For a benchmark that measures itself (a load run): returns its figures, printed after the name
   * in order (`median_ms` first); `run` and `floor` are then not timed.
   */
  measure?: () => Promise<Record<string, number>>;
  /** Cleans up what the benchmark made (database rows, servers), after the last run. */
  teardown?: () => Promise<void> | void;
}

// Results go to an exported sink so the engine cannot prove them dead and skip the work.
export const benchSink: { last: unknown } = { last: undefined };

const isThenable = (v: unknown): v is PromiseLike<unknown> =>
  typeof (v as { then?: unknown } | null)?.then === 'function';

/** Median wall time of `fn` in milliseconds (awaiting it when it returns a promise). */
export async function medianMs(fn: () => unknown, runs: number, warmUps: number): Promise<number> {
  const once = async () => {
    const r = fn();
    benchSink.last = isThenable(r) ? await r : r;
  };
  for (let i = 0; i < warmUps; i++) await once();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    await once();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  const mid = times.length >> 1;
  return times.length % 2 === 1 ? times[mid] : (times[mid - 1] + times[mid]) / 2;
}

/** Runs one benchmark and returns its `BENCH` line. */
export async function runBenchmark(benchmark: Benchmark): Promise<string> {
  if (benchmark.measure) {
    try {
      const figures = await benchmark.measure();
      return `BENCH ${benchmark.name} ${Object.entries(figures)
        .map(([k, v]) => `${k}=${Number.isInteger(v) ? v : v.toFixed(3)}`)
        .join(' ')}`;
    } finally {
      await benchmark.teardown?.();
    }
  }
  const runs = benchmark.runs ?? 15;
  const warmUps = benchmark.warmUps ?? 3;
  try {
    const median = await medianMs(benchmark.run, runs, warmUps);
    let line = `BENCH ${benchmark.name} median_ms=${median.toFixed(3)}`;
    if (benchmark.floor) {
      const floor = await medianMs(benchmark.floor, runs, warmUps);
      line += ` ratio=${(median / floor).toFixed(1)}`;
    } else if (benchmark.compare) {
      const { slow, fast, runs: compareRuns = 3, warmUps: compareWarmUps = 1 } = benchmark.compare;
      const slowMs = await medianMs(slow, compareRuns, compareWarmUps);
      const fastMs = await medianMs(fast, Math.max(compareRuns, 15), Math.max(compareWarmUps, 3));
      line += ` ratio=${(slowMs / fastMs).toFixed(1)}`;
    }
    return line;
  } finally {
    await benchmark.teardown?.();
  }
}
