import { describe, expect, it } from "vitest";
import { createStretchCurve, lengthForPretension, RigInputError, sagAt, shortestLength, solveLine, STANDARD_GRAVITY, type Line } from "../../../physics";
import { demoLine, MBS, relative, STIFF, STRETCHY } from "./fixtures";
import { relaxManyNodeLine, RELAXATION_TOLERANCE } from "../../bench/dynamic-relaxation-line";
import { manyNodeLine, solveManyNodeLine, type ManyNodeLine } from "./reference/many-node-line";

/** A linear stretch law ε = T / EA, written as a two-point curve (the last slope carries on). */
function linearLine(span: number, rise: number, weight: number, EA: number): Line {
  return {
    span,
    rise,
    weight,
    curve: createStretchCurve([
      { tensionKN: 0, elongationPct: 0 },
      { tensionKN: 10, elongationPct: (100 * 10000) / EA },
    ]),
  };
}

/** 2 × 2 Newton with a finite-difference Jacobian, for the closed forms below. */
function solve2(f: (p: [number, number]) => [number, number], start: [number, number]): [number, number] {
  let p = start;
  for (let i = 0; i < 100; i++) {
    const r = f(p);
    if (Math.hypot(r[0], r[1]) < 1e-13) break;
    const h0 = 1e-7 * Math.max(1, Math.abs(p[0]));
    const h1 = 1e-7 * Math.max(1, Math.abs(p[1]));
    const a = f([p[0] + h0, p[1]]);
    const b = f([p[0], p[1] + h1]);
    const j = [
      [(a[0] - r[0]) / h0, (b[0] - r[0]) / h1],
      [(a[1] - r[1]) / h0, (b[1] - r[1]) / h1],
    ];
    const det = j[0][0] * j[1][1] - j[0][1] * j[1][0];
    p = [p[0] - (j[1][1] * r[0] - j[0][1] * r[1]) / det, p[1] - (-j[1][0] * r[0] + j[0][0] * r[1]) / det];
  }
  return p;
}

describe("solveLine against published closed forms", () => {
  it("inextensible limit, mid-span point load: T = W / (2 sin θ) (any statics text) within 0.1 %", () => {
    const line = linearLine(25, 0, 1e-3, 1e13);
    const W = 80 * STANDARD_GRAVITY;
    const L = 25.5;
    const s = solveLine(line, L, { force: W, x: 12.5 }, 1e9);
    const theta = Math.acos(25 / L); // each half of an inextensible line is L/2 long
    expect(relative(s.tensionA, W / (2 * Math.sin(theta)))).toBeLessThan(1e-3);
    expect(relative(s.tensionB, W / (2 * Math.sin(theta)))).toBeLessThan(1e-3);
  });

  it("self-weight, small sag: H = wD²/(8d) (statics texts, parabolic cable) within 0.5 % for d/D < 0.05", () => {
    const w = 0.5 * STANDARD_GRAVITY;
    for (const L of [25.02, 25.05, 25.12]) {
      const line = linearLine(25, 0, w, 1e13);
      const s = solveLine(line, L, { force: 0, x: 12.5 }, 1e9);
      const d = sagAt(line, s.variables, 12.5);
      expect(d / 25).toBeLessThan(0.05);
      // load per horizontal metre q = wL/D
      expect(relative(s.variables.H, (((w * L) / 25) * 25 ** 2) / (8 * d))).toBeLessThan(5e-3);
    }
  });

  it("inextensible catenary: matches the cosh solution L = 2a·sinh(D/2a), H = w·a to 1e-6", () => {
    const w = 0.8;
    const D = 100;
    for (const L of [100.5, 104, 130]) {
      const line = linearLine(D, 0, w, 1e14);
      const s = solveLine(line, L, { force: 0, x: D / 2 }, 1e12);
      let lo = 1;
      let hi = 1e7;
      for (let i = 0; i < 200; i++) {
        const a = (lo + hi) / 2;
        if (2 * a * Math.sinh(D / (2 * a)) > L) lo = a;
        else hi = a;
      }
      const a = (lo + hi) / 2;
      expect(relative(s.variables.H, w * a)).toBeLessThan(1e-6);
      expect(relative(sagAt(line, s.variables, D / 2), a * (Math.cosh(D / (2 * a)) - 1))).toBeLessThan(1e-6);
    }
  });

  it("linear elastic catenary with a height difference: Irvine's closed form (Cable Structures, 1981, §2.2) to 1e-6", () => {
    // Irvine's elastic catenary in Lagrangian form, y up, V(s) = VA + w·s:
    // x(s) = H·s/EA + (H/w)[asinh(V(s)/H) − asinh(VA/H)]
    // y(s) = (VA·s + w·s²/2)/EA + (H/w)[√(1 + (V(s)/H)²) − √(1 + (VA/H)²)]
    for (const [D, h, w, EA, L] of [
      [25, 1, 0.6, 2e5, 24.7],
      [150, 4, 0.5, 1e5, 148],
      [500, -12, 0.9, 3e5, 498],
    ]) {
      const x = (H: number, VA: number) => (H * L) / EA + (H / w) * (Math.asinh((VA + w * L) / H) - Math.asinh(VA / H));
      const y = (H: number, VA: number) => (VA * L + (w * L * L) / 2) / EA + (H / w) * (Math.hypot(1, (VA + w * L) / H) - Math.hypot(1, VA / H));
      const [H, VA] = solve2(([H, VA]) => [x(H, VA) - D, y(H, VA) - h], [EA * (D / L - 1) + 100, (-w * L) / 2]);
      const s = solveLine(linearLine(D, h, w, EA), L, { force: 0, x: D / 2 }, 1e9);
      expect(relative(s.variables.H, H)).toBeLessThan(1e-6);
      expect(relative(s.variables.VA, VA)).toBeLessThan(1e-6);
    }
  });
});

describe("solveLine against an independent many-node model (400 elements), solved two ways", () => {
  const cases = [
    { name: "25 m park line", span: 25, rise: 0.8, mass: 0.06, pretension: 2000 },
    { name: "150 m longline", span: 150, rise: 3, mass: 0.05, pretension: 4000 },
    { name: "500 m highline", span: 500, rise: 10, mass: 0.09, pretension: 6000 },
  ];
  // Newton on node positions (tests/unit/physics/reference), and dynamic relaxation run to the
  // tolerance the bench times it at (tests/bench/dynamic-relaxation-line.ts).
  const solvers = [
    // Newton converges fully, so it must agree far closer than the required 0.2 % (measured: ≤ 1.1e-5).
    { method: "Newton", fractions: [0.1, 0.5], agreement: 1e-4, solve: (model: ManyNodeLine) => solveManyNodeLine(model) },
    { method: "dynamic relaxation", fractions: [0.5], agreement: 2e-3, solve: (model: ManyNodeLine) => relaxManyNodeLine(model, RELAXATION_TOLERANCE) },
  ];
  for (const { method, fractions, agreement, solve } of solvers) {
    for (const c of cases) {
      for (const [curveName, points] of [
        ["stretchy", STRETCHY],
        ["stiff", STIFF],
      ] as const) {
        for (const fraction of fractions) {
          it(`${method}: ${c.name}, ${curveName} curve, walker at ${fraction * 100} %: anchor tensions and sag within ${agreement * 100} %`, () => {
            const line = demoLine(c.span, c.rise, c.mass, points);
            const length = lengthForPretension(line, c.pretension, "a", MBS).variables.length;
            const walker = 80 * STANDARD_GRAVITY;
            const model = solve(manyNodeLine(line, length, [...points], walker, fraction, 400));
            const s = solveLine(line, length, { force: walker, x: model.walkerX }, MBS);
            const modelSag = (c.rise * model.walkerX) / c.span - model.walkerY;
            expect(relative(s.tensionA, model.tensionA)).toBeLessThan(agreement);
            expect(relative(s.tensionB, model.tensionB)).toBeLessThan(agreement);
            expect(relative(s.loadSag, modelSag)).toBeLessThan(agreement);
          });
        }
      }
    }
  }
});

describe("solveLine input checks", () => {
  const line = demoLine(25, 0, 0.06, STRETCHY);
  it("rejects a line too short to reach the anchors without breaking", () => {
    expect(() => solveLine(line, 0.9 * shortestLength(line, MBS), { force: 700, x: 10 }, MBS)).toThrow(RigInputError);
  });
  it.each([
    ["span", { ...line, span: 0 }],
    ["span", { ...line, span: 5000 }],
    ["span", { ...line, span: NaN }],
    ["weightPerMetre", { ...line, weight: 0 }],
    ["heightDifference", { ...line, rise: 40 }],
  ])("rejects a bad %s", (field, bad) => {
    expect(() => solveLine(bad, 24.8, { force: 700, x: 10 }, MBS)).toThrow(expect.objectContaining({ field }));
  });
  it("rejects a walker off the span", () => {
    expect(() => solveLine(line, 24.8, { force: 700, x: 26 }, MBS)).toThrow(expect.objectContaining({ field: "walker.position" }));
  });
  it("flags tensions beyond the measured curve", () => {
    const s = solveLine(line, 23.2, { force: 700, x: 10 }, MBS);
    expect(s.maxTension).toBeGreaterThan(10000);
    expect(s.extrapolated).toBe(true);
  });
});
