import { describe, expect, it } from "vitest";
import { createStretchCurve, lengthForPretension, solveLine, STANDARD_GRAVITY, type Line } from "../../../physics";
import { pretensionGuess, shallowCableGuess } from "../../../physics/shallow-cable";

// The solver's starting estimates come from the shallow-cable theory (Irvine, Cable Structures, 1981, ch. 3), which
// approximates the exact elastic catenary of a taut line: checked against the exact equilibrium the engine then
// solves, on a park line, a highline and a long line with a drop. The tolerances are the theory's own order of error
// for these sags (a few tenths of a per cent in H, and in where along the line the walker stands).
const curve = createStretchCurve([
  { tensionKN: 0, elongationPct: 0 },
  { tensionKN: 2, elongationPct: 1.6 },
  { tensionKN: 4, elongationPct: 2.6 },
  { tensionKN: 10, elongationPct: 4.8 },
]);
const lines: [string, Line, number][] = [
  ["a 25 m park line at 1.5 kN", { span: 25, rise: 0, weight: 0.05 * STANDARD_GRAVITY, curve }, 1500],
  ["a 120 m highline at 3.5 kN", { span: 120, rise: 2.5, weight: 0.05 * STANDARD_GRAVITY, curve }, 3500],
  ["a 500 m line dropping 20 m at 6 kN", { span: 500, rise: -20, weight: 0.05 * STANDARD_GRAVITY, curve }, 6000],
];
const MBS = 32_000;

describe("the shallow-cable starting estimates", () => {
  it.each(lines)("for the pretension of %s: H within 0.2 %, the length within 5e-5, VA within 1e-4 of H", (_, line, tension) => {
    const exact = lengthForPretension(line, tension, "a", MBS).variables;
    const guess = pretensionGuess(line, tension);
    expect(Math.abs(guess.H / exact.H - 1)).toBeLessThan(2e-3);
    expect(Math.abs(guess.length / exact.length - 1)).toBeLessThan(5e-5);
    expect(Math.abs(guess.VA - exact.VA) / exact.H).toBeLessThan(1e-4);
    expect(guess).toMatchObject({ loadArc: 0, load: 0 });
  });

  it.each(lines)(
    "for a walker of 80 kg on %s, unloaded, at 30 % and at mid-span: H within 1 %, VA within 2e-4 of H, the arc within 1.5 %",
    (_, line, tension) => {
      const length = lengthForPretension(line, tension, "a", MBS).variables.length;
      for (const [load, x] of [
        [0, line.span / 2],
        [80 * STANDARD_GRAVITY, 0.3 * line.span],
        [80 * STANDARD_GRAVITY, 0.5 * line.span],
      ]) {
        const exact = solveLine(line, length, { force: load, x }, MBS);
        const guess = shallowCableGuess(line, length, load, x);
        expect(Math.abs(guess.H / exact.variables.H - 1)).toBeLessThan(1e-2);
        expect(Math.abs(guess.VA - exact.variables.VA) / exact.variables.H).toBeLessThan(2e-4);
        expect(Math.abs(guess.loadArc - exact.variables.loadArc) / length).toBeLessThan(1.5e-2);
        expect(guess).toMatchObject({ load, length });
        // From an estimate this close Newton needs at most three steps (engine 1.1.0 takes one to three).
        expect(exact.iterations).toBeLessThanOrEqual(3);
      }
    },
  );
});

// What solveLine takes: the product's own limits (common practice, no source), each at its edge and a step past it.
describe("solveLine's inputs at their edges", () => {
  const line = lines[1][1];
  const length = lengthForPretension(line, 3500, "a", MBS).variables.length;
  const refused = (run: () => unknown) => {
    try {
      run();
    } catch (error) {
      const { field, allowed } = error as { field: string; allowed: string };
      return { field, allowed };
    }
    throw new Error("expected a refusal");
  };

  it("a span above 0 m and up to 3000 m, a height difference up to the span, a weight above 0", () => {
    expect(refused(() => solveLine({ ...line, span: 3000.5 }, length, { force: 0, x: 0 }, MBS))).toEqual({
      field: "span",
      allowed: "a horizontal span > 0 m and ≤ 3000 m",
    });
    expect(refused(() => solveLine({ ...line, span: 0 }, length, { force: 0, x: 0 }, MBS)).field).toBe("span");
    expect(refused(() => solveLine({ ...line, rise: -120.5 }, length, { force: 0, x: 0 }, MBS))).toEqual({
      field: "heightDifference",
      allowed: "a height difference no larger than the span (|h| ≤ D)",
    });
    expect(refused(() => solveLine({ ...line, weight: 0 }, length, { force: 0, x: 0 }, MBS))).toEqual({
      field: "weightPerMetre",
      allowed: "a weight per metre > 0 N/m (the mass per metre must be > 0)",
    });
  });

  it("a load of 0 N or more, anywhere from anchor A to anchor B, a breaking strength above 0", () => {
    expect(solveLine(line, length, { force: 0, x: 0 }, MBS).loadSag).toBe(0);
    expect(solveLine(line, length, { force: 500, x: 120 }, MBS).loadSag).toBeCloseTo(0, 8);
    expect(refused(() => solveLine(line, length, { force: -1, x: 60 }, MBS))).toEqual({ field: "walker.load", allowed: "a load ≥ 0 N" });
    expect(refused(() => solveLine(line, length, { force: 500, x: 120.01 }, MBS))).toEqual({
      field: "walker.position",
      allowed: "a position from 0 to the span, 120 m",
    });
    expect(refused(() => solveLine(line, length, { force: 500, x: -0.01 }, MBS)).field).toBe("walker.position");
    expect(refused(() => solveLine(line, length, { force: 500, x: 60 }, 0))).toEqual({ field: "breakingStrength", allowed: "a breaking strength > 0 N" });
  });

  it("an unstretched length long enough to reach the anchors below the breaking strength: the chord over 1 + the strain at it", () => {
    // 32 kN is past the curve's last point (10 kN at 4.8 %): its last piece carries on, 2.2 % over 6 kN, so 4.8 + 22 × 2.2 / 6 = 12.87 %.
    const chord = Math.hypot(120, 2.5);
    const shortest = chord / (1 + 0.048 + (22 * (4.8 - 2.6)) / 6 / 100);
    expect(refused(() => solveLine(line, shortest - 0.001, { force: 0, x: 60 }, MBS))).toEqual({
      field: "unstretchedLength",
      allowed: `at least ${shortest.toFixed(3)} m: any shorter and the line would stretch past its breaking strength just to reach the anchors`,
    });
    expect(refused(() => solveLine(line, Number.POSITIVE_INFINITY, { force: 0, x: 60 }, MBS)).field).toBe("unstretchedLength");
  });
});
