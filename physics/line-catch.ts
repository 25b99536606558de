import { leashFallPeak, type LeashFallPeak } from "./leash-fall";
import type { Line, LineVariables } from "./line-equations";
import { lineForceDeflection } from "./line-force-deflection";
import { describeEquilibrium, type LineSolution } from "./solve-line";

/** Where a neighbouring catch ended, to start the next one from: it saves iterations, never changes the answer. */
export interface CatchHint {
  x: number;
  unloaded: LineVariables;
  deflection: number;
}

/** A fall caught by the line at one position: the energy balance's peak and the line's state at it. */
export interface LineCatch extends LeashFallPeak {
  x: number;
  /** The free fall before the line takes the load, m. */
  fallHeight: number;
  /** Height of the unloaded line at x, m (y up from A). */
  unloadedY: number;
  /** The line holding the peak load at x; its iterations are those of every equilibrium solved for the catch. */
  caught: LineSolution;
  /** Equilibria solved for the catch (the unloaded line's included). */
  solves: number;
  hint: CatchHint;
}

/**
 * A walker of `mass` falling freely onto the line at x (leash-fall.ts, line-force-deflection.ts); the free
 * fall may depend on the unloaded line's height there (a backup's catch does).
 */
export function catchOnLine(
  line: Line,
  length: number,
  x: number,
  breakingStrength: number,
  mass: number,
  fallHeight: (unloadedY: number) => number,
  hint?: CatchHint,
): LineCatch {
  const forceDeflection = lineForceDeflection(line, length, x, breakingStrength, hint);
  const freeFall = fallHeight(forceDeflection.unloadedY);
  // A taut line's stiffness under a point load goes as 1 / (x(D − x)), and a hard fall's deflection as the
  // root of the compliance: the neighbour's deflection scaled so (a guess only).
  const shape = (at: number) => Math.sqrt(at * (line.span - at));
  const guess = hint && hint.x > 0 && hint.x < line.span ? (hint.deflection * shape(x)) / shape(hint.x) : undefined;
  const peak = leashFallPeak(mass, freeFall, forceDeflection.state, guess);
  const loaded = forceDeflection.variablesAt(peak.deflection);
  const { solves, iterations } = forceDeflection.effort();
  return {
    ...peak,
    x,
    fallHeight: freeFall,
    unloadedY: forceDeflection.unloadedY,
    caught: describeEquilibrium(line, loaded, iterations),
    solves,
    hint: { x, unloaded: forceDeflection.unloaded, deflection: peak.deflection },
  };
}
