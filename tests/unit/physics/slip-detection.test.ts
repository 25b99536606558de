import { describe, expect, it } from "vitest";
import { detectSlip, RigInputError } from "../../../physics";
import { refusalOf } from "./fixtures";

/** Small deterministic generator (mulberry32) for reproducible noise. */
function noise(seed: number) {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296 - 0.5;
  };
}

/** A slow pull at `rate` N/s with ±amplitude noise; at `onset` N the device slips and the force falls by `fall`, then the pull goes on. */
function trace(onset: number | null, amplitude: number, seed: number) {
  const rand = noise(seed);
  const time: number[] = [];
  const force: number[] = [];
  let base = 0;
  let slipped = false;
  for (let i = 0; i < 20000; i++) {
    const t = i * 0.01;
    base += 2; // 200 N/s
    if (onset !== null && !slipped && base >= onset) {
      slipped = true;
      base -= 800;
    }
    time.push(t);
    force.push(base + 2 * amplitude * rand());
  }
  return { time, force };
}

describe("detectSlip", () => {
  it.each([
    [6000, 20, 1],
    [12500, 50, 2],
    [3100, 5, 3],
  ])("finds a known onset at %s N through noise within 1 %", (onset, amplitude, seed) => {
    const result = detectSlip(trace(onset, amplitude, seed), 300);
    expect(result.kind).toBe("slipped");
    expect(Math.abs(result.forceN - onset) / onset).toBeLessThan(0.01);
  });

  it("reports held-to the maximum when the trace never drops", () => {
    const t = trace(null, 20, 4);
    const result = detectSlip(t, 300);
    expect(result.kind).toBe("held");
    expect(result.forceN).toBe(Math.max(...t.force));
  });

  it("ignores the release after the pull ends", () => {
    const time = [0, 1, 2, 3, 4];
    const force = [0, 1000, 2000, 3000, 0];
    expect(detectSlip({ time, force }, 500, 3).kind).toBe("held");
    expect(detectSlip({ time, force }, 500).kind).toBe("slipped");
  });

  it("rejects bad traces", () => {
    expect(() => detectSlip({ time: [0, 0], force: [1, 2] }, 10)).toThrow(RigInputError);
    expect(() => detectSlip({ time: [0, 1], force: [1, NaN] }, 10)).toThrow(RigInputError);
    expect(() => detectSlip({ time: [0, 1], force: [1] }, 10)).toThrow(RigInputError);
    expect(() => detectSlip({ time: [0, 1], force: [1, 2] }, 0)).toThrow(RigInputError);
  });

  // The refusals' own words (the product's, written for this engine): the field, what was given and what is allowed.
  it("says which sample or setting is wrong, what it was and what is allowed", () => {
    expect(refusalOf(() => detectSlip({ time: [0], force: [1] }, 10))).toMatchObject({
      field: "trace",
      given: '"1 times and 1 forces"',
      allowed: "at least two samples, as many times as forces",
    });
    expect(refusalOf(() => detectSlip({ time: [0, 1], force: [1] }, 10))).toMatchObject({ field: "trace", given: '"2 times and 1 forces"' });
    expect(refusalOf(() => detectSlip({ time: [0, 1], force: [1, 2] }, -5))).toMatchObject({ field: "drop", given: "-5", allowed: "a drop > 0 N" });
    expect(refusalOf(() => detectSlip({ time: [0, 1], force: [1, 2] }, 10, NaN))).toMatchObject({
      field: "pullEndS",
      given: "NaN",
      allowed: "a time in seconds",
    });
    expect(refusalOf(() => detectSlip({ time: [0, 2, 1], force: [1, 2, 3] }, 10))).toMatchObject({
      field: "trace.time.2",
      given: "1",
      allowed: "finite times, strictly increasing",
    });
    expect(refusalOf(() => detectSlip({ time: [0, 1], force: [1, Infinity] }, 10))).toMatchObject({
      field: "trace.force.1",
      given: "Infinity",
      allowed: "a finite force in N",
    });
  });
});
