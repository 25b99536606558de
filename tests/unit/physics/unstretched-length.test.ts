import { describe, expect, it } from "vitest";
import { lengthForPretension, solveLine } from "../../../physics";
import { demoLine, MBS, refusalOf, relative, STRETCHY } from "./fixtures";

const line = demoLine(60, 2, 0.06, STRETCHY);

describe("the unstretched length for a pretension", () => {
  // Independent check: the line solved back from the length found (solveLine, its own equations) reads the
  // pretension at the anchor it was stated for.
  it("gives the length at which the stated anchor reads the pretension", () => {
    for (const anchor of ["a", "b"] as const) {
      const { variables } = lengthForPretension(line, 4000, anchor, MBS);
      const back = solveLine(line, variables.length, { force: 0, x: line.span / 2 }, MBS);
      expect(relative(anchor === "a" ? back.tensionA : back.tensionB, 4000)).toBeLessThan(1e-9);
    }
  });

  // The refusals' own words (the product's, written for this engine), at and either side of each edge.
  it("refuses a breaking strength that is not above 0 N", () => {
    for (const mbs of [0, -1, NaN]) {
      expect(refusalOf(() => lengthForPretension(line, 4000, "a", mbs))).toMatchObject({
        field: "breakingStrength",
        given: String(mbs),
        allowed: "a breaking strength > 0 N",
      });
    }
  });

  it("refuses a pretension that is not above 0 N or not below the breaking strength", () => {
    for (const pretension of [0, -10, MBS, MBS + 1]) {
      expect(refusalOf(() => lengthForPretension(line, pretension, "a", MBS))).toMatchObject({
        field: "pretension",
        given: String(pretension),
        allowed: `a tension > 0 N and below the line's breaking strength, ${MBS} N`,
      });
    }
    expect(lengthForPretension(line, MBS - 1, "a", MBS).variables.length).toBeGreaterThan(0);
  });
});
