import { describe, expect, it } from "vitest";
import { anchorLoads, RigInputError } from "../../../physics";

describe("anchorLoads", () => {
  it.each([
    // sling-angle tables of rigging practice: load on each leg as a share of the line tension
    [120, 1.0],
    [90, 0.7071],
    [60, 0.5774],
    [0, 0.5],
  ])("a %s° bridle puts %s of the load on each leg (sling-angle tables)", (angle, share) => {
    const loads = anchorLoads({ kind: "bridle", includedAngleDeg: angle }, 10000);
    expect(loads.leg / 10000).toBeCloseTo(share, 4);
    expect(loads.masterPoint).toBe(10000);
    expect(loads.legs).toBe(2);
  });

  it("a single point carries the line tension", () => {
    expect(anchorLoads({ kind: "single" }, 8000)).toEqual({ masterPoint: 8000, leg: 8000, legs: 1 });
  });

  it("rejects an angle of 180° or more", () => {
    expect(() => anchorLoads({ kind: "bridle", includedAngleDeg: 180 }, 1)).toThrow(RigInputError);
  });
});
