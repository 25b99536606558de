/** A benchmark a *.bench.ts module exports: `run` is timed, `batch` calls per sample. */
export interface Benchmark {
  name: string;
  goal: string;
  run: () => unknown;
  batch?: number;
  samples?: number;
}

/** A derived row: how many times faster benchmark `fast` is than benchmark `slow`. */
export interface Ratio {
  name: string;
  goal: string;
  fast: string;
  slow: string;
}
