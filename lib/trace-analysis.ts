import { ENGINE_VERSION, detectSlip, forceText, type ForceUnit, type SlipOnset } from "@/physics";
import { RequestError } from "./http-errors";
import { benchRangeIn, BENCH_FORCE_RANGE_N } from "./validations/slip-tests";
import type { ParsedTrace } from "./trace-csv";

/** What the server found in a trace: kept with the upload, shown to the tester, copied onto the slip test. */
export interface TraceAnalysis {
  rows: number;
  durationS: number;
  peakN: number;
  unit: ForceUnit;
  dropN: number;
  /** When the pull ended, as the tester gave it; drops after it (the release) are not slips. */
  pullEndS: number | null;
  timeColumn: string;
  forceColumn: string;
  onset: SlipOnset;
  engineVersion: string;
  /** At most CHART_POINTS samples, each bucket's lowest and highest kept so drops stay visible. */
  chart: { time: number[]; force: number[] };
}

export const CHART_POINTS = 1600;

/** Min–max decimation: in each bucket keep its lowest and highest sample (in time order), and always the onset. */
export function decimate(time: ArrayLike<number>, force: ArrayLike<number>, points: number, keep: number): { time: number[]; force: number[] } {
  const n = time.length;
  if (n <= points) return { time: Array.from(time), force: Array.from(force) };
  const buckets = Math.floor(points / 2);
  const chosen: number[] = [];
  for (let b = 0; b < buckets; b++) {
    const start = Math.floor((b * n) / buckets);
    const end = Math.floor(((b + 1) * n) / buckets);
    let lo = start;
    let hi = start;
    for (let i = start; i < end; i++) {
      if (force[i] < force[lo]) lo = i;
      if (force[i] > force[hi]) hi = i;
    }
    if (keep >= start && keep < end) chosen.push(...[lo, hi, keep].sort((a, b) => a - b));
    else chosen.push(Math.min(lo, hi), Math.max(lo, hi));
  }
  const unique = chosen.filter((index, i) => i === 0 || index !== chosen[i - 1]);
  return { time: unique.map((i) => time[i]), force: unique.map((i) => force[i]) };
}

/** Runs the engine's slip detection on a parsed trace and refuses a trace whose peak no bench could reach. */
export function analyseTrace(trace: ParsedTrace, unit: ForceUnit, dropN: number, pullEndS?: number): TraceAnalysis {
  let peak = -Infinity;
  for (const f of trace.force) if (f > peak) peak = f;
  if (peak < BENCH_FORCE_RANGE_N.min || peak > BENCH_FORCE_RANGE_N.max) {
    throw new RequestError(
      422,
      `The trace peaks at ${forceText(peak, unit, "down")}, outside what a slip bench measures (${benchRangeIn(unit)}): check the unit you chose.`,
    );
  }
  const onset = detectSlip(trace, dropN, pullEndS);
  const n = trace.time.length;
  return {
    rows: n,
    durationS: trace.time[n - 1] - trace.time[0],
    peakN: peak,
    unit,
    dropN,
    pullEndS: pullEndS ?? null,
    timeColumn: trace.timeColumn,
    forceColumn: trace.forceColumn,
    onset,
    engineVersion: ENGINE_VERSION,
    chart: decimate(trace.time, trace.force, CHART_POINTS, onset.index),
  };
}
