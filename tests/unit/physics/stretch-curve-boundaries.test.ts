import { beforeEach, describe, expect, it } from "vitest";
import { createStretchCurve, pieceAt, strainAt, tensionAtStrain, type StretchCurve } from "../../../physics";
import { STIFF, STRETCHY } from "./fixtures";

// Around each measured point (T_k, ε_k) the curve switches piece: piece k holds on [T_k, T_k+1] (physics/stretch-curve.ts),
// so a tension just below T_k is on the piece from T_k−1 and one just above on the piece to T_k+1. Each expected
// strain comes from an independent model in this test: linear interpolation between the two measured points around
// the tension (or the last two, past the last point), in kN and %, worked from the points as given.

type Point = { tensionKN: number; elongationPct: number };

/** Independent model: the measured points' linear interpolant, carried on with the last piece past the last point. */
function interpolatedStrain(points: readonly Point[], tensionN: number): number {
  const kN = tensionN / 1000;
  let k = 0;
  while (k < points.length - 2 && kN > points[k + 1].tensionKN) k++;
  const [p, q] = [points[k], points[k + 1]];
  return (p.elongationPct + ((q.elongationPct - p.elongationPct) * (kN - p.tensionKN)) / (q.tensionKN - p.tensionKN)) / 100;
}

/** Independent model: the inverse of the interpolant, tension (N) at a strain (fraction). */
function interpolatedTension(points: readonly Point[], strain: number): number {
  const pct = strain * 100;
  let k = 0;
  while (k < points.length - 2 && pct > points[k + 1].elongationPct) k++;
  const [p, q] = [points[k], points[k + 1]];
  return (p.tensionKN + ((q.tensionKN - p.tensionKN) * (pct - p.elongationPct)) / (q.elongationPct - p.elongationPct)) * 1000;
}

// A tension step well above rounding (1e-16 × 10 kN) and small enough to stay within a piece; 1 N and 1 mN both checked.
const STEPS_N = [1, 1e-3];

describe.each([
  ["stretchy", STRETCHY],
  ["stiff", STIFF],
])("the %s curve around each measured point", (_, points) => {
  // Built in each test (not in the describe body), so mutation testing sees which tests run it.
  let curve: StretchCurve;
  beforeEach(() => {
    curve = createStretchCurve(points);
  });
  const inner = points.slice(1, -1).map((p, i) => ({ k: i + 1, tension: p.tensionKN * 1000, strain: p.elongationPct / 100 }));
  const last = points.length - 1;

  it("puts a measured tension on the piece that starts there, and a tension just below it on the piece before", () => {
    expect(pieceAt(curve, 0)).toBe(0);
    for (const { k, tension } of inner) {
      expect(pieceAt(curve, tension)).toBe(k);
      for (const step of STEPS_N) {
        expect(pieceAt(curve, tension - step)).toBe(k - 1);
        expect(pieceAt(curve, tension + step)).toBe(k);
      }
    }
    // The last measured point ends the last piece, which carries on past it.
    expect(pieceAt(curve, points[last].tensionKN * 1000)).toBe(last - 1);
    expect(pieceAt(curve, points[last].tensionKN * 1000 + 1)).toBe(last - 1);
    // Below zero (never asked by the solver) stays on the first piece.
    expect(pieceAt(curve, -1)).toBe(0);
  });

  it("gives each piece's own strain just below and just above each measured point (independent interpolation in this test)", () => {
    for (const { tension, strain } of inner) {
      expect(strainAt(curve, tension)).toBeCloseTo(strain, 15);
      for (const step of STEPS_N) {
        for (const T of [tension - step, tension + step]) expect(strainAt(curve, T)).toBeCloseTo(interpolatedStrain(points, T), 15);
      }
    }
  });

  it("has the stiffness of the piece on each side of a measured point (independent interpolation in this test)", () => {
    // Slopes of the secants just below and just above: the two pieces' slopes, which differ at every measured point.
    for (const { tension } of inner) {
      const below = (strainAt(curve, tension) - strainAt(curve, tension - 1)) / 1;
      const above = (strainAt(curve, tension + 1) - strainAt(curve, tension)) / 1;
      const modelBelow = interpolatedStrain(points, tension) - interpolatedStrain(points, tension - 1);
      const modelAbove = interpolatedStrain(points, tension + 1) - interpolatedStrain(points, tension);
      expect(below).toBeCloseTo(modelBelow, 12);
      expect(above).toBeCloseTo(modelAbove, 12);
      expect(Math.abs(below - above)).toBeGreaterThan(1e-8);
    }
  });

  it("inverts strain to tension on the right piece just below and just above each measured strain (independent inverse in this test)", () => {
    for (const { tension, strain } of inner) {
      expect(tensionAtStrain(curve, strain)).toBeCloseTo(tension, 6);
      for (const step of [1e-5, 1e-7]) {
        for (const e of [strain - step, strain + step]) expect(tensionAtStrain(curve, e)).toBeCloseTo(interpolatedTension(points, e), 6);
      }
    }
    expect(tensionAtStrain(curve, 0)).toBe(0);
  });

  it("past the last measured point follows the last piece, and a tension there is beyond what was measured", () => {
    const lastT = points[last].tensionKN * 1000;
    expect(curve.lastMeasuredTension).toBe(lastT);
    for (const T of [lastT - 1, lastT, lastT + 1, 2 * lastT]) expect(strainAt(curve, T)).toBeCloseTo(interpolatedStrain(points, T), 15);
    const lastStrain = points[last].elongationPct / 100;
    expect(tensionAtStrain(curve, lastStrain + 0.01)).toBeCloseTo(interpolatedTension(points, lastStrain + 0.01), 6);
  });
});

describe("a two-point curve (one piece)", () => {
  const points = [
    { tensionKN: 0, elongationPct: 0 },
    { tensionKN: 4, elongationPct: 2 },
  ];
  let curve: StretchCurve;
  beforeEach(() => {
    curve = createStretchCurve(points);
  });

  it("is linear through the origin on both sides of its one measured point", () => {
    // 2 % at 4 kN: 0.5 % per kN (hand calculation)
    for (const T of [0, 1000, 4000, 8000]) expect(strainAt(curve, T)).toBeCloseTo((0.5 * T) / 1000 / 100, 15);
    expect(pieceAt(curve, 4000)).toBe(0);
    expect(tensionAtStrain(curve, 0.04)).toBeCloseTo(8000, 8);
  });
});
