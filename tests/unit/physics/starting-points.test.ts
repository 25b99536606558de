import { describe, expect, it } from "vitest";
import type { LineVariables } from "../../../physics";
import { nearestHints } from "../../../physics/nearest-hint";
import { sweepStart } from "../../../physics/sweep";

// Where the engine starts a solve from: starting points never change a figure (warm-start.test.ts and sweep.test.ts
// hold the results to solves started from nothing), so these check that each start is the one it is meant to be.
describe("the sweep's next start", () => {
  const state = (t: number): LineVariables => ({ H: 1000 + 20 * t + 3 * t * t, VA: -50 + 4 * t - t * t, loadArc: 10 + 2 * t, load: 785, length: 120 });

  it("continues the quadratic through the last three evenly spaced solutions exactly (finite differences: f(3) = 3f(2) − 3f(1) + f(0))", () => {
    const next = sweepStart([state(2), state(1), state(0)])!;
    expect(next.H).toBeCloseTo(state(3).H, 9);
    expect(next.VA).toBeCloseTo(state(3).VA, 9);
    expect(next.loadArc).toBeCloseTo(state(3).loadArc, 9);
    expect(next).toMatchObject({ load: 785, length: 120 });
  });

  it("continues the line through two, takes the one there is, and has none to give before the first solve", () => {
    // Through two: 2f(1) − f(0), exact for the linear loadArc, one γ short for the quadratic H (2·1023 − 1000 = 1046 against 1046 + 6).
    const two = sweepStart([state(1), state(0)])!;
    expect(two.loadArc).toBe(state(2).loadArc);
    expect(two.H).toBe(1046);
    expect(two.VA).toBe(2 * state(1).VA - state(0).VA);
    expect(sweepStart([state(4)])).toEqual(state(4));
    expect(sweepStart([])).toBeUndefined();
  });
});

describe("the nearest kept start", () => {
  it("gives the hint kept nearest to a position, the first kept on a tie, and nothing before any is kept", () => {
    const hints = nearestHints<string>();
    expect(hints.nearest(10)).toBeUndefined();
    hints.add(10, "ten");
    expect(hints.nearest(90)).toBe("ten");
    hints.add(50, "fifty");
    hints.add(30, "thirty");
    expect(hints.nearest(12)).toBe("ten");
    expect(hints.nearest(42)).toBe("fifty");
    expect(hints.nearest(38)).toBe("thirty");
    // 20 is as far from 10 as from 30: the one kept first.
    expect(hints.nearest(20)).toBe("ten");
    expect(hints.nearest(40)).toBe("fifty");
  });
});
