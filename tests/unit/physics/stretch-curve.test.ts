import { beforeEach, describe, expect, it } from "vitest";
import { createStretchCurve, pieceAt, RigInputError, strainAt, tensionAtStrain, type StretchCurve } from "../../../physics";
import { STRETCHY } from "./fixtures";

describe("createStretchCurve / strainAt", () => {
  // Built in each test, not once in the describe body, so mutation testing sees which tests run it.
  let curve: StretchCurve;
  beforeEach(() => {
    curve = createStretchCurve(STRETCHY);
  });

  it("passes through every measured point and interpolates linearly between them", () => {
    for (const p of STRETCHY) expect(strainAt(curve, p.tensionKN * 1000)).toBeCloseTo(p.elongationPct / 100, 14);
    // Midway between 1 kN / 1.5 % and 3 kN / 3.4 %: 2 kN gives 2.45 % (hand calculation)
    expect(strainAt(curve, 2000)).toBeCloseTo(0.0245, 14);
  });

  it("extrapolates with the last measured stiffness and says where measurement stops", () => {
    // last piece: 6 kN → 5.2 %, 10 kN → 7 %: 0.45 % per kN, so 12 kN gives 7.9 %
    expect(strainAt(curve, 12000)).toBeCloseTo(0.079, 14);
    expect(curve.lastMeasuredTension).toBe(10000);
  });

  it("inverts strain back to tension and finds the piece for a tension", () => {
    for (const T of [0, 500, 2500, 7000, 14000]) expect(tensionAtStrain(curve, strainAt(curve, T))).toBeCloseTo(T, 8);
    expect(pieceAt(curve, 2500)).toBe(1);
    expect(pieceAt(curve, 50000)).toBe(3);
  });

  it.each([
    ["fewer than two points", [{ tensionKN: 0, elongationPct: 0 }], "stretchPoints"],
    [
      "not through the origin",
      [
        { tensionKN: 1, elongationPct: 1 },
        { tensionKN: 2, elongationPct: 2 },
      ],
      "stretchPoints.0",
    ],
    [
      "tension not increasing",
      [
        { tensionKN: 0, elongationPct: 0 },
        { tensionKN: 2, elongationPct: 1 },
        { tensionKN: 2, elongationPct: 2 },
      ],
      "stretchPoints.2.tensionKN",
    ],
    [
      "elongation not increasing",
      [
        { tensionKN: 0, elongationPct: 0 },
        { tensionKN: 2, elongationPct: 1 },
        { tensionKN: 3, elongationPct: 0.5 },
      ],
      "stretchPoints.2.elongationPct",
    ],
    [
      "a negative value",
      [
        { tensionKN: 0, elongationPct: 0 },
        { tensionKN: -2, elongationPct: 1 },
      ],
      "stretchPoints.1.tensionKN",
    ],
    [
      "NaN",
      [
        { tensionKN: 0, elongationPct: 0 },
        { tensionKN: NaN, elongationPct: 1 },
      ],
      "stretchPoints.1.tensionKN",
    ],
  ])("rejects a curve with %s, naming the field", (_, points, field) => {
    expect(() => createStretchCurve(points)).toThrow(RigInputError);
    expect(() => createStretchCurve(points)).toThrow(expect.objectContaining({ field, allowed: expect.stringMatching(/.{6,}/) }));
  });
});
