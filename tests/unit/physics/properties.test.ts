import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { lengthForPretension, solveLine, STANDARD_GRAVITY } from "../../../physics";
import { demoLine, MBS, STIFF, STRETCHY } from "./fixtures";

// Property tests (fast-check), kept to a modest number of runs. The properties come from physical
// reasoning, not an outside table: a tighter or more heavily loaded cable pulls harder (statics of a
// cable under a point load, T = W / (2 sin θ) with θ shrinking as pretension grows), and a level line
// is symmetric about mid-span.
const rig = fc.record({
  span: fc.double({ min: 10, max: 800, noNaN: true }),
  riseShare: fc.double({ min: -0.05, max: 0.05, noNaN: true }),
  pretension: fc.double({ min: 800, max: 8000, noNaN: true }),
  mass: fc.double({ min: 40, max: 120, noNaN: true }),
  fraction: fc.double({ min: 0.02, max: 0.98, noNaN: true }),
  stiff: fc.boolean(),
});

type Rig = { span: number; riseShare: number; pretension: number; mass: number; fraction: number; stiff: boolean };

function walkerOn(r: Rig, rise = r.riseShare * r.span) {
  const line = demoLine(r.span, rise, 0.06, r.stiff ? STIFF : STRETCHY);
  const length = lengthForPretension(line, r.pretension, "a", MBS).variables.length;
  return { line, length, solve: (mass: number, x: number) => solveLine(line, length, { force: mass * STANDARD_GRAVITY, x }, MBS) };
}

describe("line properties", () => {
  it("tension rises and sag falls with pretension", () => {
    fc.assert(
      fc.property(rig, (r) => {
        const low = walkerOn(r).solve(r.mass, r.fraction * r.span);
        const high = walkerOn({ ...r, pretension: r.pretension * 1.2 }).solve(r.mass, r.fraction * r.span);
        return high.maxTension > low.maxTension && high.loadSag < low.loadSag;
      }),
      { numRuns: 40 },
    );
  });

  it("tension rises with walker mass", () => {
    fc.assert(
      fc.property(rig, (r) => {
        const w = walkerOn(r);
        return w.solve(r.mass * 1.1, r.fraction * r.span).maxTension > w.solve(r.mass, r.fraction * r.span).maxTension;
      }),
      { numRuns: 40 },
    );
  });

  it("mirrored positions mirror the results when the anchors are level", () => {
    fc.assert(
      fc.property(rig, (r) => {
        const w = walkerOn(r, 0);
        const left = w.solve(r.mass, r.fraction * r.span);
        const right = w.solve(r.mass, (1 - r.fraction) * r.span);
        // The solver's 1e-11 tolerance on geometry is amplified by EA/T in the tensions.
        expect(Math.abs(left.tensionA - right.tensionB) / right.tensionB).toBeLessThan(1e-7);
        expect(Math.abs(left.loadSag - right.loadSag) / right.loadSag).toBeLessThan(1e-7);
      }),
      { numRuns: 40 },
    );
  });

  it("never returns NaN", () => {
    fc.assert(
      fc.property(rig, (r) => {
        const s = walkerOn(r).solve(r.mass, r.fraction * r.span);
        return [s.tensionA, s.tensionB, s.loadSag, s.elongation, s.variables.H, s.variables.VA].every(Number.isFinite);
      }),
      { numRuns: 40 },
    );
  });
});
