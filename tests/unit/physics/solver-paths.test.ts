import { describe, expect, it } from "vitest";
import {
  bracketedRoot,
  catchOnLine,
  leashFallPeak,
  lengthForPretension,
  lineEquations,
  lineForceDeflection,
  newtonSolve,
  solveEquilibrium,
  solveLine,
  STANDARD_GRAVITY,
  VARIABLE_NAMES,
  type CatchHint,
  type LineEquation,
  type LineVariables,
  type LoadPathState,
} from "../../../physics";
import { demoLine, MBS, relative, STIFF, STRETCHY } from "./fixtures";

// The way each solver gets to its answer, on problems whose answers are known by hand or in closed form: the
// steps a solver promises in its comments (doubling, bisection, how it gives up) and that the answer never depends
// on the path. The counts of trials are the solvers' own stated bounds, met by the engine with a margin.

describe("the leash fall's energy balance, on load paths written in the test", () => {
  const mass = 80;
  const mg = mass * STANDARD_GRAVITY;
  /** A load path whose every trial deflection is kept, in the order the solver asks for them. */
  const recorded = (path: (u: number) => LoadPathState) => {
    const trials: number[] = [];
    return { trials, stateAt: (u: number) => (trials.push(u), path(u)) };
  };
  /** A linear spring P = k·u, work k·u²/2, with whatever else the load path reports. */
  const spring =
    (k: number, reports: Partial<LoadPathState> = {}) =>
    (u: number): LoadPathState => ({ u, load: k * u, work: (k * u * u) / 2, ...reports });
  // m·g·(h + δ) = k·δ²/2 (work–energy for a mass dropped onto a spring, e.g. Meriam & Kraige, Dynamics).
  const springRoot = (k: number, h: number) => (mg + Math.sqrt(mg ** 2 + 2 * k * mg * h)) / k;

  it("doubles the trial deflection while the line holds less than the walker's weight (no Newton step there)", () => {
    // A soft line, 500 N/m: at 1.2 m it holds 600 N, under m·g = 785 N.
    const { trials, stateAt } = recorded(spring(500));
    const peak = leashFallPeak(mass, 2, stateAt, 1.2);
    expect(trials.slice(0, 2)).toEqual([1.2, 2.4]);
    expect(relative(peak.deflection, springRoot(500, 2))).toBeLessThan(1e-9);
  });

  it("below the root a trial is at most double the one before, even where P barely exceeds m·g for a long way", () => {
    // A line that gives at 101 % of the walker's weight and stiffens at 10 N/m: from below, Newton's step would leap
    // tens of metres past the root. m·g·(h + δ) = 1.01·m·g·δ + k·δ²/2 gives δ in closed form.
    const k = 10;
    const h = 2;
    const { trials, stateAt } = recorded((u) => ({
      u,
      load: 1.01 * mg + k * u,
      work: 1.01 * mg * u + (k * u * u) / 2,
      slope: 1.01 * mg + k * u,
      stiffness: k,
    }));
    const peak = leashFallPeak(mass, h, stateAt);
    const root = (-0.01 * mg + Math.sqrt((0.01 * mg) ** 2 + 2 * k * mg * h)) / k;
    expect(relative(peak.deflection, root)).toBeLessThan(1e-9);
    for (let i = 1; i < trials.length && trials[i - 1] < root; i++) expect(trials[i]).toBeLessThanOrEqual(2 * trials[i - 1]);
  });

  // LoadPathState: the slope and stiffness a load path reports "never change the root". Where they are wrong the
  // Newton and Halley steps leave the bracket, or Halley's factor leaves (0.5, 2), and the search falls back on
  // doubling and bisection: no more trials than doubling up to the root from the start, then halving the bracket
  // to its 1e-10 width (34 halvings), and two to spare.
  const wrongReports: [string, Partial<LoadPathState>][] = [
    ["an infinite slope (a Newton step of zero)", { slope: Infinity }],
    ["a slope one newton over the weight (a Newton step far out of the bracket)", { slope: mg + 1 }],
    ["a negative slope", { slope: -1 }],
    ["a stiffness of the wrong sign and size", { stiffness: -1e9 }],
    ["a stiffness far too large", { stiffness: 1e9 }],
  ];
  it.each(wrongReports)("a load path reporting %s still gives the closed-form root, within bisection's effort", (_, reports) => {
    const k = 20_000;
    const h = 2;
    const root = springRoot(k, h);
    for (const guess of [undefined, 0.01, 0.3, 5]) {
      const { trials, stateAt } = recorded(spring(k, reports));
      const peak = leashFallPeak(mass, h, stateAt, guess);
      expect(relative(peak.deflection, root)).toBeLessThan(1e-9);
      const start = guess ?? h;
      expect(trials.length).toBeLessThanOrEqual(2 + Math.ceil(Math.abs(Math.log2(start / root))) + Math.ceil(Math.log2(1e10)));
    }
  });

  it("stops when the bracket is 1e-10 of the deflection wide, where no deflection balances the energy to 1e-9", () => {
    // A spring of 2000 N/m that meets a rigid stop at 0.3 m (10²⁴ N/m beyond): one step in the last digit of δ
    // changes the work by a thousand times the residual's tolerance, so only the bracket's width can end the search.
    const k = 2000;
    const stop = 0.3;
    const rigid = 1e24;
    const h = 2;
    const stateAt = (u: number): LoadPathState =>
      u <= stop
        ? { u, load: k * u, work: (k * u * u) / 2, stiffness: k }
        : { u, load: k * stop + rigid * (u - stop), work: (k * stop * stop) / 2 + k * stop * (u - stop) + (rigid * (u - stop) ** 2) / 2, stiffness: rigid };
    // Past the stop, m·g·(h + a + s) = k·a²/2 + k·a·s + K·s²/2: a quadratic in s (the stable root of the two).
    const b = k * stop - mg;
    const c = (k * stop * stop) / 2 - mg * (h + stop);
    const root = stop + (-2 * c) / (b + Math.sqrt(b * b - 2 * rigid * c));
    const peak = leashFallPeak(mass, h, stateAt);
    expect(Math.abs(peak.deflection - root)).toBeLessThanOrEqual(1e-10 * root);
  });

  it("gives up after 200 steps from its start when the work never catches up (a line giving at half the weight)", () => {
    // P = m·g/2 for ever: the imbalance m·g·(h + u) − m·g·u/2 only grows, and the trial doubles 200 times from h.
    const h = 2;
    const { trials, stateAt } = recorded((u) => ({ u, load: mg / 2, work: (mg / 2) * u }));
    const last = h * 2 ** 200;
    const residual = (mg * (h + last) - (mg / 2) * last) / (mg * (h + last));
    expect(() => leashFallPeak(mass, h, stateAt)).toThrow(
      expect.objectContaining({
        name: "SolveError",
        message: "leash fall energy balance did not converge after 200 iterations (scaled residual 5.00e-1)",
        iterations: 200,
        residual: expect.closeTo(residual, 12),
      }),
    );
    expect(trials.length).toBe(201);
    expect(trials[200]).toBe(last);
  });
});

describe("newtonSolve's edges", () => {
  /** x − 1 with its exact slope. */
  const linear = { evaluate: (x: number[]) => ({ residual: [x[0] - 1], jacobian: [[1]] }), isValid: () => true };

  it("answers in an array of its own: editing the answer leaves the caller's start alone", () => {
    const start = [1];
    const { x, iterations } = newtonSolve(linear, start, { what: "root at the start" });
    expect(iterations).toBe(0);
    x[0] = 7;
    expect(start).toEqual([1]);
  });

  it("a residual exactly at the tolerance is not yet under it: one more step", () => {
    // From 1.5 the residual is 0.5 (exact in binary); the step lands on the root 1.
    expect(newtonSolve(linear, [1.5], { what: "edge", tolerance: 0.5 })).toMatchObject({ x: [1], iterations: 1 });
  });

  it("gives up on a step after 40 halvings (a step of 2⁻⁴⁰ of itself is no step)", () => {
    // f(x) = x from 1: the full step is −1; only trials within 2⁻⁴⁰ of the start lie in the domain, and the solver stops
    // one halving short of them.
    let trials = 0;
    const fenced = {
      evaluate: (x: number[]) => ({ residual: [x[0]], jacobian: [[1]] }),
      isValid: (x: number[]) => (trials++, x[0] >= 1 - 2 ** -40),
    };
    expect(() => newtonSolve(fenced, [1], { what: "fenced in" })).toThrow(
      expect.objectContaining({ name: "SolveError", message: "fenced in could not reduce the residual after 0 iterations (scaled residual 1.00e+0)" }),
    );
    expect(trials).toBe(40);
  });
});

describe("bracketedRoot's edges", () => {
  it("stops once the bracket is no wider than the tolerance times its larger end", () => {
    // x² − 2 on [0, 2]: the first secant point is 1 (by hand: 2 − 2·2/4), f(1) = −1, and the bracket [1, 2] is
    // exactly ½ × 2 wide: with a tolerance of ½ that is the answer.
    expect(bracketedRoot((x) => x * x - 2, 0, 2, "edge", 0.5)).toBe(1);
  });

  it("gives up after its 200 steps, as its message says, where the root cannot be pinned to the tolerance asked", () => {
    // A step from −1 to 1 at ½ has no root, and a tolerance of 0 asks for a bracket of width 0: the two ends
    // evaluated first, then 200 secant points.
    let calls = 0;
    const step = (x: number) => (calls++, x < 0.5 ? -1 : 1);
    expect(() => bracketedRoot(step, 0, 1, "step", 0)).toThrow(
      expect.objectContaining({ name: "SolveError", message: "step did not converge after 200 iterations (scaled residual 1.00e+0)" }),
    );
    expect(calls).toBe(202);
  });

  it("refuses a function that never changes sign, however small its values", () => {
    // 10⁻²⁰⁰ squared underflows to 0; a product of the ends' values must not be read as a sign change.
    expect(() => bracketedRoot(() => 1e-200, 0, 1, "tiny")).toThrow(
      expect.objectContaining({ name: "SolveError", message: "tiny found no sign change on [0, 1] (scaled residual 1.00e-200)" }),
    );
  });
});

describe("lineEquations' Jacobian", () => {
  // The Jacobian the Newton solves use, against central differences of the residuals (step 1e-6 of each variable's
  // size; their error, of order step², is far below the 1e-6 allowed). A state whose tensions (2.06 kN to 4.06 kN)
  // stay clear of the stretch curve's points, where the residuals have kinks.
  const line = demoLine(60, 1, 0.06, STRETCHY);
  const v: LineVariables = { H: 2000, VA: -500, loadArc: 20, load: 4000, length: 60 };
  const equations: LineEquation[] = [
    { kind: "span" },
    { kind: "rise" },
    { kind: "loadX", x: 20 },
    { kind: "loadY", y: -1 },
    { kind: "tension", anchor: "a", tension: 2100 },
    { kind: "tension", anchor: "b", tension: 4100 },
  ];

  it("matches central differences of the residuals, for every kind of condition", () => {
    const { jacobian } = lineEquations(line, v, equations);
    VARIABLE_NAMES.forEach((name, column) => {
      const step = 1e-6 * Math.abs(v[name]);
      const at = (delta: number) => lineEquations(line, { ...v, [name]: v[name] + delta }, equations).residual;
      const [plus, minus] = [at(step), at(-step)];
      equations.forEach((_, row) => {
        const difference = (plus[row] - minus[row]) / (2 * step);
        const size = Math.max(...jacobian[row].map((d, j) => Math.abs(d * v[VARIABLE_NAMES[j]])));
        expect(Math.abs(jacobian[row][column] - difference) * Math.abs(v[name])).toBeLessThan(1e-6 * size);
      });
    });
  });
});

describe("a catch's hint", () => {
  // The hint scales the neighbour's deflection by √(x(D − x)), which vanishes at the anchors: a hint from there is
  // no guide and must be ignored, never divided by.
  const line = demoLine(80, 1.5, 0.05, STRETCHY);
  const length = lengthForPretension(line, 2500, "a", MBS).variables.length;
  const fall = () => 2;

  it("from an anchor leaves the catch what it is without a hint", () => {
    const cold = catchOnLine(line, length, 30, MBS, 80, fall);
    const neighbour = catchOnLine(line, length, 25, MBS, 80, fall).hint;
    for (const x of [0, line.span]) {
      const hint: CatchHint = { ...neighbour, x };
      const warm = catchOnLine(line, length, 30, MBS, 80, fall, hint);
      expect(relative(warm.deflection, cold.deflection)).toBeLessThan(1e-6);
      expect(relative(warm.peakLoad, cold.peakLoad)).toBeLessThan(1e-6);
    }
  });
});

describe("solveEquilibrium at a target off the unloaded line", () => {
  const line = demoLine(60, 1, 0.06, STRETCHY);
  const length = lengthForPretension(line, 2500, "a", MBS).variables.length;
  const unloaded = solveLine(line, length, { force: 0, x: 20 }, MBS);
  const unknowns = ["H", "VA", "loadArc", "load"] as const;
  const heldAt = (y: number): LineEquation[] => [{ kind: "span" }, { kind: "rise" }, { kind: "loadX", x: 20 }, { kind: "loadY", y }];

  it("moves with the target as re-solving a little above and below it says (central differences), for the unknowns only", () => {
    const y = unloaded.loadY - 0.5;
    const { sensitivity } = solveEquilibrium(line, unloaded.variables, unknowns, heldAt(y), "test", 3);
    const step = 1e-4;
    const [above, below] = [y + step, y - step].map((target) => solveEquilibrium(line, unloaded.variables, unknowns, heldAt(target), "test").variables);
    expect(Object.keys(sensitivity!).sort()).toEqual([...unknowns].sort());
    for (const name of unknowns) {
      const difference = (above[name] - below[name]) / (2 * step);
      expect(Math.abs(sensitivity![name]! - difference)).toBeLessThan(1e-5 * Math.abs(difference));
    }
  });

  it("never pushes the line up: a height above the unloaded line, reachable only by a negative load, is refused", () => {
    expect(() => solveEquilibrium(line, unloaded.variables, unknowns, heldAt(unloaded.loadY + 0.5), "pushed up")).toThrow(
      expect.objectContaining({ name: "SolveError", message: expect.stringMatching(/^pushed up could not reduce the residual /) }),
    );
  });
});

describe("the line's force–deflection path", () => {
  const line = demoLine(60, 1, 0.06, STRETCHY);
  const length = lengthForPretension(line, 2500, "a", MBS).variables.length;

  it("reports the slope of its work and of its load as central differences of them find (LoadPathState)", () => {
    // 2 m from an anchor the work's slope differs from P by up to 3e-3 (the energy released under the sliding load
    // point, line-force-deflection.ts); the differences, noisy at some 1e-7 from the solves' own tolerance, resolve it.
    const path = lineForceDeflection(line, length, 2, MBS);
    for (const u of [0.8, 1.5]) {
      const step = 1e-4;
      const [plus, minus, at] = [path.state(u + step), path.state(u - step), path.state(u)];
      const workSlope = (plus.work - minus.work) / (2 * step);
      const loadSlope = (plus.load - minus.load) / (2 * step);
      expect(Math.abs(at.slope! - workSlope)).toBeLessThan(2e-6 * at.load);
      expect(Math.abs(at.stiffness! - loadSlope)).toBeLessThan(1e-5 * Math.abs(loadSlope));
    }
  });

  it("starts each solve on the path from the cubic through its neighbours: under 1.9 Newton steps a solve", () => {
    // The design's claim (physics/README.md, "Speed"): about 1.4 steps a solve from the cubic Hermite through the
    // solved states on either side, 2.3 from the nearest state's tangent alone. The engine takes 1.66 and 1.78 on
    // these two rigs (catches at eleven positions each, from nothing); a start off the cubic takes over 2.
    let solves = 0;
    let iterations = 0;
    for (const [span, points] of [
      [60, STRETCHY],
      [150, STIFF],
    ] as const) {
      const rig = demoLine(span, 1, 0.06, points);
      const rigLength = lengthForPretension(rig, 2500, "a", MBS).variables.length;
      for (let i = 1; i < 12; i++) {
        const caught = catchOnLine(rig, rigLength, (i * span) / 12, MBS, 80, () => 2);
        solves += caught.solves;
        iterations += caught.caught.iterations;
      }
    }
    expect(iterations / solves).toBeLessThan(1.9);
  });

  it("counts the equilibria it solves: the unloaded line twice (the second for its tangent), then one a new node", () => {
    const path = lineForceDeflection(line, length, 20, MBS);
    expect(path.effort().solves).toBe(2);
    const first = path.effort().iterations;
    expect(first).toBeGreaterThan(0);
    // The work at u needs the states at u/3, 2u/3 and u (the cubic rule); at 3u/2 the state at u is already known.
    path.state(1);
    expect(path.effort().solves).toBe(5);
    path.state(1.5);
    expect(path.effort().solves).toBe(7);
    path.state(1);
    expect(path.effort().solves).toBe(7);
    expect(path.effort().iterations).toBeGreaterThan(first);
  });
});
