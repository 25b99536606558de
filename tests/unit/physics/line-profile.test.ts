import { describe, expect, it } from "vitest";
import {
  createStretchCurve,
  lengthForPretension,
  lineProfile,
  pointAtArc,
  sagAt,
  solveLine,
  STANDARD_GRAVITY,
  type Line,
  type LineSolution,
} from "../../../physics";
import { demoLine, MBS, STIFF, STRETCHY } from "./fixtures";
import { arcPointBySimpson } from "./reference/simpson-line";

// The drawn shape of the line (physics/line-profile.ts) against an independent model: the elastic cable's equations
// integrated by Simpson's rule in the test (tests/unit/physics/reference/simpson-line.ts), and for a line too stiff to
// stretch, the catenary's closed form. Lines of our own invention: a park line, a steep line whose tension crosses the
// stretchy curve's 3 kN point, and a long highline dropping 20 m, each with an 80 kg walker.
const WALKER = 80 * STANDARD_GRAVITY;
const cases = [
  { name: "a 25 m park line", span: 25, rise: 0, mass: 0.06, points: STRETCHY, pretension: 2000, walkerAt: 0.4 },
  { name: "a 60 m line rising 36 m", span: 60, rise: 36, mass: 0.06, points: STRETCHY, pretension: 2800, walkerAt: 0.3 },
  { name: "a 500 m highline dropping 20 m", span: 500, rise: -20, mass: 0.09, points: STIFF, pretension: 6000, walkerAt: 0.5 },
];

/** The line of a case and its equilibrium with the walker standing at the case's place (or a given load and place). */
function solvedCase(c: (typeof cases)[number], force = WALKER, x = c.walkerAt * c.span): { line: Line; solution: LineSolution } {
  const line = demoLine(c.span, c.rise, c.mass, c.points);
  const length = lengthForPretension(line, c.pretension, "a", MBS).variables.length;
  return { line, solution: solveLine(line, length, { force, x }, MBS) };
}

/** Closeness of the engine's closed forms to the quadrature: Simpson's error here is far below 1e-10 of the span. */
function expectSamePoint(actual: { x: number; y: number }, expected: { x: number; y: number }, span: number) {
  expect(Math.abs(actual.x - expected.x)).toBeLessThan(1e-10 * span);
  expect(Math.abs(actual.y - expected.y)).toBeLessThan(1e-10 * span);
}

describe.each(cases)("the drawn shape of $name", (c) => {
  it("has 101 points evenly along the unstretched arc, the walker's point in its place between two of them, from A to B", () => {
    const { line, solution } = solvedCase(c);
    const v = solution.variables;
    const points = lineProfile(line, v);
    // The walker stands strictly between sample k (at arc k·L/100) and sample k + 1: its point comes right after sample k.
    const k = Math.floor(v.loadArc / (v.length / 100));
    expect(v.loadArc).toBeGreaterThan((k * v.length) / 100);
    expect(points).toHaveLength(102);
    expect(points[k + 1]).toEqual({ x: solution.loadX, y: solution.loadY });
    const samples = [...points.slice(0, k + 1), ...points.slice(k + 2)];
    samples.forEach((point, i) => expectSamePoint(point, arcPointBySimpson(line, v, (v.length * i) / 100), c.span));
    expect(points[0]).toEqual({ x: 0, y: 0 });
    // B sits at (span, rise) up to the equilibrium solve's own tolerance.
    expect(Math.abs(points[101].x - c.span)).toBeLessThan(1e-9 * c.span);
    expect(Math.abs(points[101].y - c.rise)).toBeLessThan(1e-9 * c.span);
    for (let i = 1; i < points.length; i++) expect(points[i].x).toBeGreaterThan(points[i - 1].x);
  });

  it("draws as many points as asked, evenly along the arc, and adds none for a load of 0 N between two of them", () => {
    // With no load the walker's place is still solved for: at 40.3 % of the span it falls between two samples.
    const { line, solution } = solvedCase(c, 0, 0.403 * c.span);
    const v = solution.variables;
    expect(Number.isInteger(v.loadArc / (v.length / 100))).toBe(false);
    const points = lineProfile(line, v);
    expect(points).toHaveLength(101);
    points.forEach((point, i) => expectSamePoint(point, arcPointBySimpson(line, v, (v.length * i) / 100), c.span));
    const five = lineProfile(line, v, 5);
    expect(five).toHaveLength(5);
    five.forEach((point, i) => expectSamePoint(point, arcPointBySimpson(line, v, (v.length * i) / 4), c.span));
  });

  it("adds no point for a load that sits exactly on a sample", () => {
    // lineProfile draws whatever state it is given: this one, built by hand, puts the walker on sample 40 exactly.
    const { line, solution } = solvedCase(c);
    const v = { ...solution.variables, loadArc: (solution.variables.length * 40) / 100 };
    const points = lineProfile(line, v);
    expect(points).toHaveLength(101);
    points.forEach((point, i) => expectSamePoint(point, arcPointBySimpson(line, v, (v.length * i) / 100), c.span));
  });

  it("puts each arc at the quadrature's place, either side of the walker, at the walker and at the anchors", () => {
    const { line, solution } = solvedCase(c);
    const v = solution.variables;
    for (const fraction of [0.05, 0.29, 0.31, 0.49, 0.51, 0.77, 0.98]) {
      expectSamePoint(pointAtArc(line, v, fraction * v.length), arcPointBySimpson(line, v, fraction * v.length), c.span);
    }
    // The walker's point is where solveLine reports it, and where the model puts it.
    const atWalker = pointAtArc(line, v, v.loadArc);
    expect(atWalker).toEqual({ x: solution.loadX, y: solution.loadY });
    expectSamePoint(atWalker, arcPointBySimpson(line, v, v.loadArc), c.span);
    expect(pointAtArc(line, v, 0)).toEqual({ x: 0, y: 0 });
    expectSamePoint(pointAtArc(line, v, v.length), { x: c.span, y: c.rise }, c.span);
  });

  it("measures the drop below the chord A–B as the quadrature does, and none at the anchors or beyond them", () => {
    const { line, solution } = solvedCase(c);
    const v = solution.variables;
    for (const fraction of [0.02, 0.25, 0.5, 0.75, 0.97]) {
      const { x, y } = arcPointBySimpson(line, v, fraction * v.length);
      expect(Math.abs(sagAt(line, v, x) - ((c.rise * x) / c.span - y))).toBeLessThan(1e-10 * c.span);
    }
    // The anchors lie on the chord; past them there is no line to drop below it.
    for (const x of [0, c.span, -1, c.span + 1]) expect(sagAt(line, v, x)).toBe(0);
  });

  it("gives at mid-span the sag solveLine reports for a load of 0 N standing there", () => {
    const { line, solution } = solvedCase(c, 0, c.span / 2);
    expect(Math.abs(sagAt(line, solution.variables, c.span / 2) - solution.loadSag)).toBeLessThan(1e-10 * c.span);
  });
});

describe("the drawn shape of a line too stiff to stretch", () => {
  // Inextensible catenary between supports at different heights (Irvine, Cable Structures, 1981, ch. 1):
  // y = a·[cosh((x − x0)/a) − cosh(x0/a)], with a = H/w from √(L² − h²) = 2a·sinh(D/2a) and x0 = D/2 − a·atanh(h/L).
  // A strain of 1e-9 at 10 kN (EA = 1e13 N) moves the shape by far less than the 1e-7 checked.
  const D = 100;
  const h = 30;
  const L = 110;
  const w = 0.8;
  let lo = 1;
  let hi = 1e6;
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (2 * mid * Math.sinh(D / (2 * mid)) > Math.sqrt(L * L - h * h)) lo = mid;
    else hi = mid;
  }
  const a = (lo + hi) / 2;
  const x0 = D / 2 - a * Math.atanh(h / L);
  const catenaryY = (x: number) => a * (Math.cosh((x - x0) / a) - Math.cosh(x0 / a));

  it("lies on the catenary: every drawn point, and the sag at a tenth, a quarter, half and three quarters of the span", () => {
    const curve = createStretchCurve([
      { tensionKN: 0, elongationPct: 0 },
      { tensionKN: 10, elongationPct: 1e-7 },
    ]);
    const line: Line = { span: D, rise: h, weight: w, curve };
    const { variables } = solveLine(line, L, { force: 0, x: D / 2 }, 1e6);
    expect(Math.abs(variables.H / (w * a) - 1)).toBeLessThan(1e-7);
    for (const { x, y } of lineProfile(line, variables)) expect(Math.abs(y - catenaryY(x))).toBeLessThan(1e-7 * D);
    for (const x of [10, 25, 50, 75]) expect(Math.abs(sagAt(line, variables, x) - ((h * x) / D - catenaryY(x)))).toBeLessThan(1e-7 * D);
  });
});
