import { describe, expect, it } from "vitest";
import { catchOnLine, createStretchCurve, lengthForPretension, STANDARD_GRAVITY, type CatchHint, type Line } from "@/physics";

// Starting a catch from its neighbour's solution (as the search for the lowest clearance over the span does)
// saves iterations and must never change the answer: each warm-started catch equals the same catch solved
// from nothing, to the energy balance's own stopping rule (residual within 1e-9 of the energy, leash-fall.ts).
const line: Line = {
  span: 120,
  rise: 2.5,
  weight: 0.045 * STANDARD_GRAVITY,
  curve: createStretchCurve([
    { tensionKN: 0, elongationPct: 0 },
    { tensionKN: 2, elongationPct: 1.6 },
    { tensionKN: 4, elongationPct: 2.6 },
    { tensionKN: 10, elongationPct: 4.8 },
  ]),
};
const mbs = 32_000;
const length = lengthForPretension(line, 3000, "a", mbs).variables.length;
const fall = () => 2.4;

describe("warm-started catches", () => {
  it("equal cold ones at every position along the span, walked in either direction", () => {
    const positions = Array.from({ length: 23 }, (_, i) => 1 + (i * (line.span - 2)) / 22);
    for (const order of [positions, [...positions].reverse()]) {
      let hint: CatchHint | undefined;
      for (const x of order) {
        const warm = catchOnLine(line, length, x, mbs, 80, fall, hint);
        const cold = catchOnLine(line, length, x, mbs, 80, fall);
        expect(warm.deflection).toBeCloseTo(cold.deflection, 6);
        expect(Math.abs(warm.peakLoad - cold.peakLoad) / cold.peakLoad).toBeLessThan(1e-6);
        expect(Math.abs(warm.caught.tensionA - cold.caught.tensionA) / cold.caught.tensionA).toBeLessThan(1e-6);
        hint = warm.hint;
      }
    }
  });
});

// What the starting points are for: fewer equilibria solved and fewer Newton steps each, figures unchanged. The
// bounds are the design's own speed claims (physics/README.md, "Speed"), set between what the engine does (engine
// 1.1.0: 268 of 394 equilibria, 1.55 steps a solve) and what it would do without each starting point (306 of 394
// without the neighbour's deflection scaled to the new position; 3.1 steps a solve from the nearest state alone).
describe("what warm starts save", () => {
  const walk = () => {
    const positions = Array.from({ length: 23 }, (_, i) => 1 + (i * (line.span - 2)) / 22);
    const totals = { warm: { solves: 0, iterations: 0 }, cold: { solves: 0, iterations: 0 } };
    let hint: CatchHint | undefined;
    for (const x of positions) {
      const warm = catchOnLine(line, length, x, mbs, 80, fall, hint);
      const cold = catchOnLine(line, length, x, mbs, 80, fall);
      totals.warm.solves += warm.solves;
      totals.warm.iterations += warm.caught.iterations;
      totals.cold.solves += cold.solves;
      totals.cold.iterations += cold.caught.iterations;
      hint = warm.hint;
    }
    return totals;
  };

  it("a catch started from its neighbour solves at most 72 % of the equilibria one started from nothing does", () => {
    const { warm, cold } = walk();
    expect(warm.solves / cold.solves).toBeLessThanOrEqual(0.72);
  });

  it("each solve on the load path starts from the cubic through its neighbours: under 2 Newton steps a solve", () => {
    const { warm, cold } = walk();
    expect(warm.iterations / warm.solves).toBeLessThan(2);
    expect(cold.iterations / cold.solves).toBeLessThan(2);
  });
});
