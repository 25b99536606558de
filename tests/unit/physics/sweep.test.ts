import { describe, expect, it } from "vitest";
import { lengthForPretension, solveLine, STANDARD_GRAVITY, sweepWalker } from "../../../physics";
import { demoLine, MBS, relative, STRETCHY } from "./fixtures";

// The sweep: the walker at evenly spaced positions from anchor A to anchor B, each equilibrium the same as one solved on
// its own from the shallow-cable estimate (the sweep only starts each solve from its neighbours), and its worst cases
// the highest of each column. A line rising 6 m over 80 m, so A's and B's worst positions differ.
describe("sweepWalker", () => {
  const line = demoLine(80, 6, 0.05, STRETCHY);
  const length = lengthForPretension(line, 2000, "a", MBS).variables.length;
  const load = 80 * STANDARD_GRAVITY;

  it("places 101 positions evenly from A to B, or as many as asked", () => {
    const sweep = sweepWalker(line, length, load, MBS);
    expect(sweep.points).toHaveLength(101);
    sweep.points.forEach((p, i) => expect(p.x).toBeCloseTo((80 * i) / 100, 12));
    const five = sweepWalker(line, length, load, MBS, 5);
    expect(five.points.map((p) => p.x)).toEqual([0, 20, 40, 60, 80]);
  });

  it("equals each position solved on its own, to 1e-9", () => {
    const sweep = sweepWalker(line, length, load, MBS, 21);
    for (const p of sweep.points) {
      const alone = solveLine(line, length, { force: load, x: p.x }, MBS);
      expect(relative(p.tensionA, alone.tensionA)).toBeLessThan(1e-9);
      expect(relative(p.tensionB, alone.tensionB)).toBeLessThan(1e-9);
      expect(Math.abs(p.sag - alone.loadSag)).toBeLessThan(1e-9);
    }
  });

  it("names the position that loads each anchor most, and the deepest sag", () => {
    const sweep = sweepWalker(line, length, load, MBS, 41);
    const highest = (key: "tensionA" | "tensionB" | "sag") => Math.max(...sweep.points.map((p) => p[key]));
    expect(sweep.worstTensionA.tensionA).toBe(highest("tensionA"));
    expect(sweep.worstTensionB.tensionB).toBe(highest("tensionB"));
    expect(sweep.deepestSag.sag).toBe(highest("sag"));
    // On a line rising towards B the two anchors are loaded most with the walker at different places (40 m and 42 m here).
    expect(sweep.worstTensionA.x).not.toBe(sweep.worstTensionB.x);
    expect(sweep.points.indexOf(sweep.worstTensionA)).toBeGreaterThanOrEqual(0);
  });
});
