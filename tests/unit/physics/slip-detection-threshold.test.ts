import { describe, expect, it } from "vitest";
import { detectSlip, RigInputError } from "../../../physics";

// Hand-worked traces, small enough to follow sample by sample. The rule they check is the definition in
// physics/slip-detection.ts: the onset is the running maximum (where it was first reached) at the first sample
// that falls MORE than `drop` below it, among the samples up to and including `pullEndS`.
// All figures are whole newtons and seconds (exact in binary), so "just below" and "just above" mean 1 N or 1 ms.

/** A pull to 3000 N at t = 3 s, then one sample `fall` N lower at t = 4 s, then the pull goes on to 3500 N. */
const fallAfterPeak = (fall: number) => ({ time: [0, 1, 2, 3, 4, 5], force: [0, 1000, 2000, 3000, 3000 - fall, 3500] });

describe("detectSlip's drop threshold", () => {
  it("a fall of exactly the drop is not a slip: the pull goes on and the device held to the maximum", () => {
    // Hand-worked: 3000 − 2500 = 500, not more than 500; the trace's maximum is 3500 N at t = 5 s.
    expect(detectSlip(fallAfterPeak(500), 500)).toEqual({ kind: "held", forceN: 3500, timeS: 5, index: 5 });
  });

  it("a fall 1 N more than the drop is a slip at the running maximum before it", () => {
    // Hand-worked: 3000 − 2499 = 501 > 500: slipped at 3000 N, reached at t = 3 s (sample 3).
    expect(detectSlip(fallAfterPeak(501), 500)).toEqual({ kind: "slipped", forceN: 3000, timeS: 3, index: 3 });
  });

  it("a fall 1 N less than the drop is not a slip", () => {
    expect(detectSlip(fallAfterPeak(499), 500).kind).toBe("held"); // hand-worked: 499 < 500
  });

  it("the same fall is a slip for a drop threshold 1 N below it and not for one 1 N above it", () => {
    expect(detectSlip(fallAfterPeak(800), 799).kind).toBe("slipped"); // 800 > 799
    expect(detectSlip(fallAfterPeak(800), 801).kind).toBe("held"); // 800 < 801
  });

  it("measures the fall from the running maximum, not from the sample before", () => {
    // Two steps of 300 N: neither is more than 500 below its neighbour, but 3000 − 2400 = 600 > 500 (hand-worked).
    const trace = { time: [0, 1, 2, 3, 4], force: [0, 3000, 2700, 2400, 4000] };
    expect(detectSlip(trace, 500)).toEqual({ kind: "slipped", forceN: 3000, timeS: 1, index: 1 });
  });

  it("dates the onset where the maximum was first reached, on a flat top", () => {
    // 3000 N at t = 1 s and again at t = 2 s: the running maximum was reached at t = 1 s (hand-worked).
    const trace = { time: [0, 1, 2, 3], force: [0, 3000, 3000, 2000] };
    expect(detectSlip(trace, 500)).toEqual({ kind: "slipped", forceN: 3000, timeS: 1, index: 1 });
    // A trace that starts at its maximum: the onset is the first sample.
    expect(detectSlip({ time: [10, 11], force: [3000, 2000] }, 500)).toEqual({ kind: "slipped", forceN: 3000, timeS: 10, index: 0 });
  });

  it("holds to a maximum reached at the first sample, and works on negative forces (a zeroed load cell's offset)", () => {
    expect(detectSlip({ time: [0, 1, 2], force: [-20, -30, -25] }, 50)).toEqual({ kind: "held", forceN: -20, timeS: 0, index: 0 });
  });
});

describe("detectSlip's pullEndS", () => {
  const trace = { time: [0, 1, 2, 3, 4], force: [0, 1000, 2000, 3000, 100] };

  it("keeps a sample at exactly pullEndS and drops the first one after it", () => {
    // The fall to 100 N is at t = 4 s: with the pull ending at 4 s it counts, ending 1 ms earlier it does not (hand-worked).
    expect(detectSlip(trace, 500, 4)).toEqual({ kind: "slipped", forceN: 3000, timeS: 3, index: 3 });
    expect(detectSlip(trace, 500, 3.999)).toEqual({ kind: "held", forceN: 3000, timeS: 3, index: 3 });
  });

  it("also stops the running maximum at pullEndS", () => {
    // Ending at t = 2 s: the maximum held to is 2000 N at t = 2 s, not the later 3000 N (hand-worked).
    expect(detectSlip(trace, 500, 2)).toEqual({ kind: "held", forceN: 2000, timeS: 2, index: 2 });
    expect(detectSlip(trace, 500, 2.5)).toEqual({ kind: "held", forceN: 2000, timeS: 2, index: 2 });
  });

  it("without pullEndS reads the whole trace", () => {
    expect(detectSlip(trace, 500).kind).toBe("slipped");
  });

  it("refuses a pullEndS that is not a finite time, naming the field", () => {
    for (const bad of [NaN, Infinity]) expect(() => detectSlip(trace, 500, bad)).toThrow(expect.objectContaining({ field: "pullEndS" }));
  });
});

describe("detectSlip's trace checks", () => {
  it("accepts the shortest trace, two samples", () => {
    expect(detectSlip({ time: [0, 1], force: [2000, 1000] }, 500).kind).toBe("slipped"); // 1000 > 500
  });

  it.each([
    ["one sample", { time: [0], force: [1] }, "trace"],
    ["more forces than times", { time: [0, 1], force: [1, 2, 3] }, "trace"],
    ["a time going back", { time: [0, 2, 1], force: [1, 2, 3] }, "trace.time.2"],
    ["an infinite time", { time: [0, Infinity], force: [1, 2] }, "trace.time.1"],
    ["a NaN time", { time: [0, NaN], force: [1, 2] }, "trace.time.1"],
    ["an infinite force", { time: [0, 1], force: [1, -Infinity] }, "trace.force.1"],
  ])("refuses %s, naming the sample", (_, trace, field) => {
    expect(() => detectSlip(trace, 10)).toThrow(RigInputError);
    expect(() => detectSlip(trace, 10)).toThrow(expect.objectContaining({ field }));
  });

  it("refuses a drop that is not above zero", () => {
    for (const bad of [0, -1, NaN]) expect(() => detectSlip({ time: [0, 1], force: [1, 2] }, bad)).toThrow(expect.objectContaining({ field: "drop" }));
  });

  it("checks the first sample past pullEndS, the one that ends the reading", () => {
    expect(() => detectSlip({ time: [0, 1, 2], force: [1, 2, NaN] }, 10, 1)).toThrow(expect.objectContaining({ field: "trace.force.2" }));
  });
});
