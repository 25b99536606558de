import { checkNumber } from "./check-number";
import { solveEquilibrium } from "./equilibrium";
import { segmentEnds, type Line, type LineVariables } from "./line-equations";
import { RigInputError } from "./rig-input-error";
import { shallowCableGuess } from "./shallow-cable";
import { strainAt } from "./stretch-curve";

/** Longest span the engine accepts, m. */
export const MAX_SPAN = 3000;

/** A concentrated vertical load on the line (the walker). */
export interface PointLoad {
  /** Downward force, N. */
  force: number;
  /** Horizontal distance from anchor A, m (0 … span). */
  x: number;
}

/** Equilibrium of the line and the figures that follow from it. SI units. */
export interface LineSolution {
  variables: LineVariables;
  /** Tension where the line meets anchor A and anchor B, N. */
  tensionA: number;
  tensionB: number;
  /** Highest tension anywhere in the line (always at an anchor), N. */
  maxTension: number;
  /** Position of the load point, m (y up from A). */
  loadX: number;
  loadY: number;
  /** Drop of the load point below the straight chord A–B, m. */
  loadSag: number;
  /** Stretched length A→B, m, and elongation over the unstretched length (fraction). */
  stretchedLength: number;
  elongation: number;
  /** True if some tension lies beyond the last measured point of the stretch curve. */
  extrapolated: boolean;
  iterations: number;
}

/** Checks the line description, raising a RigInputError for what the engine cannot take. */
export function checkLine(line: Line): void {
  checkNumber("span", line.span, (v) => v > 0 && v <= MAX_SPAN, `a horizontal span > 0 m and ≤ ${MAX_SPAN} m`);
  checkNumber("heightDifference", line.rise, (v) => Math.abs(v) <= line.span, "a height difference no larger than the span (|h| ≤ D)");
  checkNumber("weightPerMetre", line.weight, (v) => v > 0, "a weight per metre > 0 N/m (the mass per metre must be > 0)");
}

/** Summarises an equilibrium state into tensions, sag and elongation. */
export function describeEquilibrium(line: Line, v: LineVariables, iterations: number): LineSolution {
  const w = line.weight;
  const { Ve, i0, im, ip, ie } = segmentEnds(line, v);
  const loadX = (im.Gx - i0.Gx) / w;
  const loadY = (im.Gy - i0.Gy) / w;
  const tensionA = Math.hypot(v.H, v.VA);
  const tensionB = Math.hypot(v.H, Ve);
  const maxTension = Math.max(tensionA, tensionB);
  const stretchedLength = (im.S - i0.S + ie.S - ip.S) / w;
  return {
    variables: v,
    tensionA,
    tensionB,
    maxTension,
    loadX,
    loadY,
    loadSag: (line.rise * loadX) / line.span - loadY,
    stretchedLength,
    elongation: stretchedLength / v.length - 1,
    extrapolated: maxTension > line.curve.lastMeasuredTension,
    iterations,
  };
}

/** Shortest unstretched length that reaches the anchors without stretching past the breaking strength. */
export function shortestLength(line: Line, breakingStrength: number): number {
  return Math.hypot(line.span, line.rise) / (1 + strainAt(line.curve, breakingStrength));
}

/**
 * Exact equilibrium of an elastic catenary of unstretched length L with one point load at a given
 * horizontal position (Irvine & Sinclair 1976), on the nonlinear stretch curve.
 * `start` (e.g. the neighbouring solution of a sweep) speeds convergence; it does not change the answer.
 */
export function solveLine(line: Line, length: number, load: PointLoad, breakingStrength: number, start?: LineVariables): LineSolution {
  checkLine(line);
  checkNumber("walker.load", load.force, (v) => v >= 0, "a load ≥ 0 N");
  checkNumber("walker.position", load.x, (v) => v >= 0 && v <= line.span, `a position from 0 to the span, ${line.span} m`);
  checkNumber("breakingStrength", breakingStrength, (v) => v > 0, "a breaking strength > 0 N");
  const minimum = shortestLength(line, breakingStrength);
  if (!(length >= minimum) || !Number.isFinite(length)) {
    throw new RigInputError(
      "unstretchedLength",
      length,
      `at least ${minimum.toFixed(3)} m: any shorter and the line would stretch past its breaking strength just to reach the anchors`,
    );
  }
  const guess = start ? { ...start, length, load: load.force } : shallowCableGuess(line, length, load.force, load.x);
  const { variables, iterations } = solveEquilibrium(
    line,
    guess,
    ["H", "VA", "loadArc"],
    [{ kind: "span" }, { kind: "rise" }, { kind: "loadX", x: load.x }],
    "line equilibrium",
  );
  return describeEquilibrium(line, variables, iterations);
}
