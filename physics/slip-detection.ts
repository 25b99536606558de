import { checkNumber } from "./check-number";
import { RigInputError } from "./rig-input-error";

/** A load-cell trace of a slow pull: time (s) and force (N), sample by sample. */
export interface Trace {
  time: ArrayLike<number>;
  force: ArrayLike<number>;
}

export type SlipOnset = { kind: "slipped"; forceN: number; timeS: number; index: number } | { kind: "held"; forceN: number; timeS: number; index: number };

/**
 * Slip onset: the running maximum at the first sample that falls more than `drop` (N) below it,
 * while the pull goes on (up to `pullEndS`, by default the whole trace: trim the release off or give
 * its time). No such drop: the device held to the trace's maximum, a lower bound on its slip load.
 */
export function detectSlip(trace: Trace, drop: number, pullEndS?: number): SlipOnset {
  const { time, force } = trace;
  const n = time.length;
  if (n < 2 || force.length !== n) throw new RigInputError("trace", `${n} times and ${force.length} forces`, "at least two samples, as many times as forces");
  checkNumber("drop", drop, (v) => v > 0, "a drop > 0 N");
  const end = pullEndS === undefined ? Infinity : checkNumber("pullEndS", pullEndS, () => true, "a time in seconds");
  let maxForce = -Infinity;
  let maxIndex = 0;
  let previousTime = -Infinity;
  for (let i = 0; i < n; i++) {
    const t = time[i];
    const f = force[i];
    if (!(t > previousTime) || !Number.isFinite(t)) throw new RigInputError(`trace.time.${i}`, t, "finite times, strictly increasing");
    if (!Number.isFinite(f)) throw new RigInputError(`trace.force.${i}`, f, "a finite force in N");
    previousTime = t;
    if (t > end) break;
    if (f > maxForce) {
      maxForce = f;
      maxIndex = i;
    } else if (maxForce - f > drop) {
      return { kind: "slipped", forceN: maxForce, timeS: time[maxIndex], index: maxIndex };
    }
  }
  return { kind: "held", forceN: maxForce, timeS: time[maxIndex], index: maxIndex };
}
