import { brentMinimum } from "./brent-minimum";

/**
 * The trade's rule of thumb for how high to rig a highline: at least a third of its length plus 3 m above
 * the ground, or a fall held only by the backup may reach it. The length is taken as the span.
 */
export const RULE_OF_THUMB = {
  source: "Swiss Slackline Association, “Highlining – the 10 most important points”, 2014",
  heightAboveGroundM: (spanM: number) => spanM / 3 + 3,
} as const;

/** Crew minimum clearance when the crew has set none: 2 m (common practice, no source). */
export const DEFAULT_MINIMUM_CLEARANCE_M = 2;

/** Fall positions worked out exactly before the search, as shares of the span (denser near the anchors, where an edge is usually closest). */
const SCAN = [0.02, 0.1, 0.25, 0.5, 0.75, 0.9, 0.98];
/** Fall positions searched: from 1 % to 99 % of the span (the line cannot deflect at an anchor). */
const FIRST = 0.01;
const LAST = 0.99;
/** Step of the search over the interpolated lowest point, share of the span. */
const SEARCH_STEP = 0.005;
/** How closely the exact search pins the lowest clearance's position, share of the span (12 cm on 120 m). */
const EXACT_TOLERANCE = 0.001;
/**
 * How far the guide may be off the exact lowest point, share of the span: measured against exact catches every 1 % of
 * lines of 20 to 500 m (pretensions of 1 to 8 kN, B up to 60 m above or below A), it was off by 0.15 to 0.67 %, the
 * most on a short slack line beside an anchor and beside the scan position where the lowest point turns; 2 % leaves
 * three times that.
 */
export const GUIDE_ALLOWANCE = 0.02;

export interface LowestClearance {
  clearanceM: number;
  positionM: number;
}

/**
 * Piecewise cubic Hermite interpolation that keeps monotone data monotone (Fritsch & Carlson, "Monotone piecewise
 * cubic interpolation", SIAM J. Numer. Anal. 17, 1980): at an inner point the slope is the weighted harmonic mean
 * of the secants either side (Fritsch & Butland 1984), zero where the data turn; at an end, its interval's secant.
 */
export function monotoneCubic(xs: readonly number[], ys: readonly number[]): (x: number) => number {
  const n = xs.length;
  const h = xs.slice(1).map((x, i) => x - xs[i]);
  const d = h.map((hi, i) => (ys[i + 1] - ys[i]) / hi);
  const m = xs.map((_, i) => {
    if (i === 0) return d[0];
    if (i === n - 1) return d[n - 2];
    if (d[i - 1] * d[i] <= 0) return 0;
    const w1 = 2 * h[i] + h[i - 1];
    const w2 = h[i] + 2 * h[i - 1];
    return (w1 + w2) / (w1 / d[i - 1] + w2 / d[i]);
  });
  return (x: number) => {
    let i = 0;
    while (i < n - 2 && x > xs[i + 1]) i++;
    const t = (x - xs[i]) / h[i];
    const t2 = t * t;
    const t3 = t2 * t;
    return (2 * t3 - 3 * t2 + 1) * ys[i] + (t3 - 2 * t2 + t) * h[i] * m[i] + (-2 * t3 + 3 * t2) * ys[i + 1] + (t3 - t2) * h[i] * m[i + 1];
  };
}

/**
 * The lowest clearance of a fall over positions along the span, and where. `lowestPointAt(x)` is the
 * walker's lowest point after a fall at x, worked out exactly (a whole catch each), so it is called at few
 * positions: at the scan above, in order along the span; then its monotone interpolation through those and
 * the anchors (where the walker hangs `hangAtAnchors` below each anchor) is searched against the ground at
 * every half per cent of the span and at every ground point for the most likely position. That position is
 * worked out exactly, and so is a search by Brent's method between the scan positions either side of it: the
 * interpolation places a low point only at a scan position or a ground point (it never overshoots), while on
 * a line with a height difference the real one lies between them. Every other low place of the interpolation
 * within GUIDE_ALLOWANCE of the lowest exact clearance found is then worked out exactly, and searched around
 * where it is lower still. The answer is the lowest exact clearance found: a figure of a real fall position,
 * never an interpolated one.
 */
export function lowestClearance(
  span: number,
  rise: number,
  hangAtAnchors: number,
  groundAt: (x: number) => number,
  groundXs: readonly number[],
  lowestPointAt: (x: number) => number,
): LowestClearance {
  const exact = new Map<number, number>();
  let result: LowestClearance = { clearanceM: Infinity, positionM: NaN };
  const clearanceAt = (x: number) => {
    let c = exact.get(x);
    if (c === undefined) {
      c = lowestPointAt(x) - groundAt(x);
      exact.set(x, c);
      if (c < result.clearanceM) result = { clearanceM: c, positionM: x };
    }
    return c;
  };
  const scanXs = SCAN.map((f) => f * span);
  const scanLowest = scanXs.map((x) => clearanceAt(x) + groundAt(x));
  const knots = [0, ...scanXs, span];
  const estimate = monotoneCubic(knots, [-hangAtAnchors, ...scanLowest, rise - hangAtAnchors]);
  const candidates = [...groundXs.filter((x) => x > FIRST * span && x < LAST * span)];
  const steps = Math.round((LAST - FIRST) / SEARCH_STEP);
  for (let i = 0; i <= steps; i++) candidates.push((FIRST + i * SEARCH_STEP) * span);
  // Worked out exactly, then searched by Brent's method between the scan positions either side of the one nearest
  // it: the real low point lies there.
  const searchAround = (start: number) => {
    clearanceAt(start);
    const nearest = knots.reduce((k, x, i) => (Math.abs(x - start) < Math.abs(knots[k] - start) ? i : k), 1);
    const k = Math.min(Math.max(nearest, 1), knots.length - 2);
    const lo = Math.max(knots[k - 1], FIRST * span);
    const hi = Math.min(knots[k + 1], LAST * span);
    brentMinimum(clearanceAt, lo, hi, EXACT_TOLERANCE * span, start > lo && start < hi ? start : undefined);
  };
  const alongSpan = [...new Set(candidates)].sort((a, b) => a - b);
  const values = alongSpan.map((x) => estimate(x) - groundAt(x));
  // The guide's low places, lowest first: each no higher than its neighbours along the span (a first or last
  // position has one: the comparison with the missing one is false). The lowest is the guide's best.
  const [best, ...others] = alongSpan
    .map((x, i) => ({ x, value: values[i] }))
    .filter(({ value }, i) => !(value > values[i - 1]) && !(value > values[i + 1]))
    .sort((a, b) => a.value - b.value);
  searchAround(best.x);
  // The guide can rank two low places wrongly (two rocks, or a rock and a ledge): every other one that it puts within
  // GUIDE_ALLOWANCE of the lowest exact clearance so far is worked out exactly too, and searched around where it is
  // lower still.
  for (const { x, value } of others) {
    if (value - GUIDE_ALLOWANCE * span >= result.clearanceM) break;
    // A place already worked out is no lower than the lowest so far, so it is not searched again.
    const lowestSoFar = result.clearanceM;
    if (clearanceAt(x) < lowestSoFar) searchAround(x);
  }
  return result;
}
