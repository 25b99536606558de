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
