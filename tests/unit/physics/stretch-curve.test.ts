import { beforeEach, describe, expect, it } from "vitest";
import { createStretchCurve, pieceAt, RigInputError, strainAt, tensionAtStrain, type StretchCurve, type StretchPoint } from "../../../physics";
import { refusalOf, STRETCHY } from "./fixtures";

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

// The curve's refusals word for word (the product's own words), each at the edge it guards, under the field name given.
describe("createStretchCurve's refusals at their edges", () => {
  const refusal = (points: unknown, field?: string) => {
    const { field: named, allowed } = refusalOf(() => createStretchCurve(points as StretchPoint[], field));
    return { field: named, allowed };
  };
  const origin = { tensionKN: 0, elongationPct: 0 };

  it("needs a list of two points or more", () => {
    for (const bad of [[origin], "0,0;1,1", null]) {
      expect(refusal(bad, "backup.stretchPoints")).toEqual({ field: "backup.stretchPoints", allowed: "at least two points, the first at 0 kN and 0 %" });
    }
  });

  it("needs finite numbers of 0 or more in each point, and a point to be there at all", () => {
    const finite = { allowed: "a finite number ≥ 0" };
    expect(refusal([origin, { tensionKN: 1, elongationPct: Infinity }])).toEqual({ field: "stretchPoints.1.elongationPct", ...finite });
    expect(refusal([origin, { tensionKN: 1, elongationPct: -0.1 }])).toEqual({ field: "stretchPoints.1.elongationPct", ...finite });
    expect(refusal([origin, { tensionKN: "1", elongationPct: 1 }])).toEqual({ field: "stretchPoints.1.tensionKN", ...finite });
    expect(refusal([origin, null])).toEqual({ field: "stretchPoints.1.tensionKN", ...finite });
  });

  it("starts at the origin in both tension and elongation", () => {
    const atOrigin = { allowed: "the curve starts at the origin: 0 kN, 0 %" };
    expect(
      refusal([
        { tensionKN: 0, elongationPct: 0.1 },
        { tensionKN: 1, elongationPct: 1 },
      ]),
    ).toEqual({ field: "stretchPoints.0", ...atOrigin });
    expect(
      refusal([
        { tensionKN: 0.1, elongationPct: 0 },
        { tensionKN: 1, elongationPct: 1 },
      ]),
    ).toEqual({ field: "stretchPoints.0", ...atOrigin });
  });

  it("rises strictly in tension and in elongation: an equal value is refused, naming the one before", () => {
    expect(refusal([origin, { tensionKN: 2, elongationPct: 1 }, { tensionKN: 2, elongationPct: 2 }])).toEqual({
      field: "stretchPoints.2.tensionKN",
      allowed: "more than the previous point's 2 kN (tensions strictly increasing)",
    });
    expect(refusal([origin, { tensionKN: 2, elongationPct: 1.5 }, { tensionKN: 3, elongationPct: 1.5 }])).toEqual({
      field: "stretchPoints.2.elongationPct",
      allowed: "more than the previous point's 1.5 % (elongation strictly increasing)",
    });
  });

  it("keeps each piece's start, strain, slope and intercept, in newtons and fractions (worked by hand)", () => {
    // 0–2 kN to 1.6 %: slope 0.016 / 2000 N = 8e-6 /N; 2–4 kN to 2.6 %: 0.01 / 2000 = 5e-6 /N, intercept 0.016 − 5e-6 × 2000 = 0.006.
    const curve = createStretchCurve([origin, { tensionKN: 2, elongationPct: 1.6 }, { tensionKN: 4, elongationPct: 2.6 }]);
    expect(curve.tensions).toEqual([0, 2000]);
    expect(curve.strains).toEqual([0, 0.016]);
    expect(curve.slopes[0]).toBeCloseTo(8e-6, 18);
    expect(curve.slopes[1]).toBeCloseTo(5e-6, 18);
    expect(curve.intercepts[0]).toBe(0);
    expect(curve.intercepts[1]).toBeCloseTo(0.006, 15);
    expect(curve.lastMeasuredTension).toBe(4000);
  });
});
