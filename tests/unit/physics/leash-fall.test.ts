import { describe, expect, it } from "vitest";
import { leashFallPeak, lengthForPretension, lineForceDeflection, RigInputError, solveLine, STANDARD_GRAVITY } from "../../../physics";
import { demoLine, MBS, relative, STIFF, STRETCHY } from "./fixtures";

/** A linear spring P = k·u as a load path: load and the work k·u²/2. */
const spring = (k: number) => (u: number) => ({ u, load: k * u, work: (k * u * u) / 2 });

describe("leashFallPeak", () => {
  it("on a linear spring gives F = mg(1 + √(1 + 2kh/(mg))) (dynamics texts, mass dropped onto a spring) within 0.1 %", () => {
    for (const [m, h, k] of [
      [80, 2, 2000],
      [60, 0.5, 15000],
      [100, 3, 600],
    ]) {
      const peak = leashFallPeak(m, h, spring(k));
      const mg = m * STANDARD_GRAVITY;
      expect(relative(peak.peakLoad, mg * (1 + Math.sqrt(1 + (2 * k * h) / mg)))).toBeLessThan(1e-3);
      // energy balanced at the peak
      expect(relative(peak.energyStored, peak.energyIn)).toBeLessThan(1e-9);
    }
  });

  it("with no free fall the peak is twice the static load (suddenly applied load)", () => {
    const peak = leashFallPeak(70, 0, spring(3000));
    expect(relative(peak.peakLoad, 2 * 70 * STANDARD_GRAVITY)).toBeLessThan(1e-9);
  });

  it("rejects a mass ≤ 0 and a negative fall", () => {
    expect(() => leashFallPeak(0, 1, spring(1))).toThrow(RigInputError);
    expect(() => leashFallPeak(70, -1, spring(1))).toThrow(RigInputError);
  });
});

describe("lineForceDeflection", () => {
  it("is the load whose static solve deflects the line by u below its unloaded shape", () => {
    const line = demoLine(60, 1, 0.06, STRETCHY);
    const length = lengthForPretension(line, 2500, "a", MBS).variables.length;
    const P = lineForceDeflection(line, length, 20, MBS).load;
    const unloaded = solveLine(line, length, { force: 0, x: 20 }, MBS);
    for (const u of [0.3, 1.5, 3]) {
      const loaded = solveLine(line, length, { force: P(u), x: 20 }, MBS);
      expect(unloaded.loadY - loaded.loadY).toBeCloseTo(u, 8);
    }
    expect(P(0)).toBe(0);
  });
});

/**
 * An independent model written for this test: the same energy balance m·g·(h_f + δ) = ∫₀^δ P du,
 * with the work summed by the trapezoid rule over 4000 equal steps of P(u) (a dense quadrature, error
 * near 1e-7 here) and δ interpolated in the step where the balance changes sign.
 */
function denseFallPeak(mass: number, fallHeight: number, load: (u: number) => number, upTo: number): { peakLoad: number; deflection: number } {
  const weight = mass * STANDARD_GRAVITY;
  const steps = 4000;
  const h = upTo / steps;
  let work = 0;
  let previous = load(0);
  for (let i = 1; i <= steps; i++) {
    const current = load(i * h);
    const nextWork = work + (h * (previous + current)) / 2;
    const before = work - weight * (fallHeight + (i - 1) * h);
    const after = nextWork - weight * (fallHeight + i * h);
    if (before <= 0 && after > 0) {
      const deflection = (i - 1) * h - (h * before) / (after - before);
      return { peakLoad: load(deflection), deflection };
    }
    work = nextWork;
    previous = current;
  }
  throw new Error("dense reference: no energy balance below the given deflection");
}

describe("leash fall on a real line against a dense quadrature (independent model written in the test)", () => {
  const cases = [
    { name: "25 m park line", span: 25, rise: 0.8, mass: 0.06, pretension: 2000, points: STRETCHY, fraction: 0.5, fall: 2.2 },
    { name: "25 m park line, stiff curve", span: 25, rise: 0.8, mass: 0.06, pretension: 2000, points: STIFF, fraction: 0.1, fall: 4 },
    { name: "150 m longline", span: 150, rise: 3, mass: 0.05, pretension: 4000, points: STRETCHY, fraction: 0.3, fall: 2.2 },
    { name: "500 m highline", span: 500, rise: 10, mass: 0.09, pretension: 6000, points: STIFF, fraction: 0.5, fall: 4 },
  ];
  for (const c of cases) {
    it(`${c.name}, fall at ${c.fraction * 100} %: peak load and deflection within 0.1 %`, () => {
      const line = demoLine(c.span, c.rise, c.mass, c.points);
      const length = lengthForPretension(line, c.pretension, "a", MBS).variables.length;
      const x = c.fraction * c.span;
      const forceDeflection = lineForceDeflection(line, length, x, MBS);
      const engine = leashFallPeak(80, c.fall, forceDeflection.state);
      const dense = denseFallPeak(80, c.fall, lineForceDeflection(line, length, x, MBS).load, 1.5 * engine.deflection);
      expect(relative(engine.peakLoad, dense.peakLoad)).toBeLessThan(1e-3);
      expect(relative(engine.deflection, dense.deflection)).toBeLessThan(1e-3);
      expect(relative(engine.energyStored, engine.energyIn)).toBeLessThan(1e-9);
    });
  }
});

// The energy balance's steps on a linear spring P = k·u, work k·u²/2, whose root is known in closed form:
// m·g·(h + δ) = k·δ²/2 gives δ = (m·g + √((m·g)² + 2·k·m·g·h)) / k (Meriam & Kraige, work–energy for a mass dropped on
// a spring). Halley's steps (with dP/du) need fewer trials than Newton's (slope only), from any start: the counts
// are the design's claim of cubic against quadratic convergence, measured on this case.
describe("the energy balance's steps", () => {
  const k = 20_000;
  const mass = 80;
  const h = 2;
  const mg = mass * STANDARD_GRAVITY;
  const root = (mg + Math.sqrt(mg ** 2 + 2 * k * mg * h)) / k;
  const trials = (withSlope: boolean, withStiffness: boolean, guess?: number) => {
    let calls = 0;
    const peak = leashFallPeak(
      mass,
      h,
      (u) => {
        calls++;
        return { u, load: k * u, work: (k * u * u) / 2, ...(withSlope ? { slope: k * u } : {}), ...(withStiffness ? { stiffness: k } : {}) };
      },
      guess,
    );
    expect(peak.deflection).toBeCloseTo(root, 9);
    expect(peak.peakLoad).toBeCloseTo(k * root, 4);
    return calls;
  };

  it("reach the closed-form root from any start, Halley's in fewer trials than Newton's", () => {
    expect(trials(true, true, 0.3)).toBe(4);
    expect(trials(true, false, 0.3)).toBe(5);
    expect(trials(false, false, 0.3)).toBe(5);
    expect(trials(true, true)).toBe(5);
    expect(trials(true, false)).toBe(7);
    expect(trials(true, true, 3)).toBe(6);
    expect(trials(true, false, 3)).toBe(8);
    // A start at or below zero is no start: the fall height is tried first.
    expect(trials(true, true, 0)).toBe(trials(true, true));
    expect(trials(true, true, -1)).toBe(trials(true, true));
  });

  it("refuses a mass of 0 and a fall past 100 m, and takes a fall of 0 m and of 100 m", () => {
    const spring = (u: number) => ({ u, load: k * u, work: (k * u * u) / 2 });
    expect(() => leashFallPeak(0, 1, spring)).toThrow(expect.objectContaining({ field: "leashFall.mass", allowed: "a mass > 0 kg" }));
    expect(() => leashFallPeak(80, 100.01, spring)).toThrow(
      expect.objectContaining({ field: "leashFall.fallHeight", allowed: "a free-fall height from 0 m to 100 m" }),
    );
    expect(() => leashFallPeak(80, -0.01, spring)).toThrow(expect.objectContaining({ field: "leashFall.fallHeight" }));
    // A walker lowered onto the line (h = 0) stretches it twice the static deflection: δ = 2·m·g/k.
    expect(leashFallPeak(80, 0, spring).deflection).toBeCloseTo((2 * mg) / k, 9);
    expect(leashFallPeak(80, 100, spring).deflection).toBeCloseTo((mg + Math.sqrt(mg ** 2 + 2 * k * mg * 100)) / k, 9);
  });
});
