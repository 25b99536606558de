import { describe, expect, it } from "vitest";
import { lengthForPretension, shortestLength, solveLine, STANDARD_GRAVITY, type Line, type LineSolution } from "../../../physics";
import { demoLine, MBS, relative, STIFF, STRETCHY } from "./fixtures";
import { arcPointBySimpson } from "./reference/simpson-line";

// The stretched length solveLine reports is ∫₀ᴸ (1 + ε(T(s))) ds over the unstretched length, with T(s) = √(H² + V(s)²)
// and V(s) = VA + w·s (+ the walker's load past the walker): here integrated by Simpson's rule in the test
// (tests/unit/physics/reference/simpson-line.ts), from the equilibrium's H, VA and walker's arc. Its elongation is that
// length over the unstretched one, less one. Simpson's error on these integrands is below 1e-12 of the length.
const WALKER = 80 * STANDARD_GRAVITY;

/** The stretched length and elongation of a solved line, checked against the quadrature. */
function expectStretchAsIntegrated(line: Line, solution: LineSolution) {
  const v = solution.variables;
  const { stretched } = arcPointBySimpson(line, v, v.length);
  expect(relative(solution.stretchedLength, stretched)).toBeLessThan(1e-11);
  expect(Math.abs(solution.elongation - (stretched / v.length - 1))).toBeLessThan(1e-11);
}

describe("the stretched length and elongation solveLine reports", () => {
  // Lines of our own invention. The engine integrates in closed form from T = H up to each end's tension, piece by piece
  // of the stretch curve; the 1 km line sits across one of the stiff curve's measured points (see the next test).
  it.each([
    { name: "a 25 m park line, walker at 40 %", span: 25, rise: 0, mass: 0.06, points: STRETCHY, pretension: 2000, walkerAt: 0.4 },
    { name: "a 60 m line rising 36 m, walker at 30 %", span: 60, rise: 36, mass: 0.06, points: STRETCHY, pretension: 2800, walkerAt: 0.3 },
    { name: "a 500 m highline dropping 20 m, walker at mid-span", span: 500, rise: -20, mass: 0.09, points: STIFF, pretension: 6000, walkerAt: 0.5 },
    { name: "a 1 km line at 5.03 kN, walker at mid-span", span: 1000, rise: 0, mass: 0.12, points: STIFF, pretension: 5030, walkerAt: 0.5 },
  ])("for $name: as integrated along the line, with and without the walker", (c) => {
    const line = demoLine(c.span, c.rise, c.mass, c.points);
    const unloaded = lengthForPretension(line, c.pretension, "a", MBS);
    expectStretchAsIntegrated(line, unloaded);
    const loaded = solveLine(line, unloaded.variables.length, { force: WALKER, x: c.walkerAt * c.span }, MBS);
    expectStretchAsIntegrated(line, loaded);
    // The walker pulls the line tighter, so it stretches more.
    expect(loaded.stretchedLength).toBeGreaterThan(unloaded.stretchedLength);
  });

  it("the 1 km line at 5.03 kN, unloaded, crosses the stiff curve's 5 kN point: below it at the low point, above at both anchors", () => {
    // The low point's tension is H (V = 0 there); its own weight, some 590 N each side, adds some 35 N by the anchors.
    const unloaded = lengthForPretension(demoLine(1000, 0, 0.12, STIFF), 5030, "a", MBS);
    expect(unloaded.variables.H).toBeLessThan(5000);
    expect(Math.min(unloaded.tensionA, unloaded.tensionB)).toBeGreaterThan(5000);
  });

  it("for a tight line of almost no weight: the chord, and the stiff curve's 0.35 % at 2 kN, read from its points", () => {
    // Unstretched 25 m / 1.0035: reaching the 25 m chord takes a strain of 0.35 %, which the stiff curve (fixtures.ts)
    // reaches at 2 kN. With 1e-5 kg/m the line hangs some micrometres below the chord, so all three hold to 1e-9.
    const line = demoLine(25, 0, 1e-5, STIFF);
    const solution = solveLine(line, 25 / 1.0035, { force: 0, x: 12.5 }, MBS);
    expect(relative(solution.maxTension, 2000)).toBeLessThan(1e-9);
    expect(relative(solution.stretchedLength, 25)).toBeLessThan(1e-9);
    expect(Math.abs(solution.elongation - 0.0035)).toBeLessThan(1e-9);
  });
});

describe("solveLine at the very limits of what it accepts", () => {
  // The limits are the product's own (common practice, no source): a span up to and including 3000 m, a height
  // difference up to and including the span, an unstretched length down to and including the shortest one. Each is
  // solved, not refused, and its stretched length is still the integral along the line.
  it("a span of exactly 3000 m", () => {
    const line = demoLine(3000, 0, 0.09, STIFF);
    const length = lengthForPretension(line, 10000, "a", MBS).variables.length;
    expectStretchAsIntegrated(line, solveLine(line, length, { force: WALKER, x: 1000 }, MBS));
  });

  it.each([50, -50])("a height difference of %s m on a 50 m span (45°), up and down", (rise) => {
    const line = demoLine(50, rise, 0.06, STRETCHY);
    const length = lengthForPretension(line, 3000, "a", MBS).variables.length;
    expectStretchAsIntegrated(line, solveLine(line, length, { force: WALKER, x: 20 }, MBS));
  });

  it("the shortest unstretched length: stretched to the chord at the breaking strength, so its own weight pulls it past", () => {
    const line = demoLine(25, 1, 0.06, STRETCHY);
    const solution = solveLine(line, shortestLength(line, MBS), { force: 0, x: 12.5 }, MBS);
    expectStretchAsIntegrated(line, solution);
    // A line with weight hangs below the chord, so it is longer than the chord and carries more than the breaking strength.
    expect(solution.stretchedLength).toBeGreaterThan(Math.hypot(25, 1));
    expect(solution.maxTension).toBeGreaterThan(MBS);
  });
});
