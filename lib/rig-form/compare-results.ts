/** One figure where two results disagree: its path in the result (e.g. `anchors.a.leg`) and both values. */
export interface Difference {
  path: string;
  browser: unknown;
  server: unknown;
}

/**
 * Every place two JSON results differ, compared exactly. Arrays and objects are walked; a missing
 * key counts as a difference.
 */
export function compareResults(browser: unknown, server: unknown, path = ""): Difference[] {
  if (Object.is(browser, server)) return [];
  if (typeof browser === "object" && typeof server === "object" && browser !== null && server !== null && Array.isArray(browser) === Array.isArray(server)) {
    const a = browser as Record<string, unknown>;
    const b = server as Record<string, unknown>;
    const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])];
    return keys.flatMap((key) => compareResults(a[key], b[key], path ? `${path}.${key}` : key));
  }
  return [{ path: path || "(the whole result)", browser, server }];
}

/**
 * How far apart two figures may be and still be the same answer: a billionth of the figure, or of 1 (N, m,
 * J) for figures near zero such as the sag with the walker at an anchor. Browsers and the server run
 * different JavaScript engines whose Math.asinh, exp, log and pow may differ in the last bit; the solver
 * then settles some 1e-13 apart. Either is far below any digit shown (a hundredth of a kN or a metre).
 */
export const SAME_FIGURE = 1e-9;

export interface Agreement {
  /** Every figure identical to the bit. */
  exact: boolean;
  /** Every figure within SAME_FIGURE of the other, every text identical. */
  agrees: boolean;
  /** Largest difference between two figures as a share of the figure (or of 1 near zero), 0 when exact. */
  largestRelative: number;
  /** Differences that make the results disagree. */
  disagreements: Difference[];
}

// Solver step counts are not figures: a last-bit difference can cost one more Newton step.
const isStepCount = (path: string) => path === "iterations" || path.endsWith(".iterations");

function relative(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b), 1);
}

/** Judges the browser's result against the server's: exactly the same, the same to within SAME_FIGURE, or different. */
export function judgeAgreement(browser: unknown, server: unknown): Agreement {
  const differences = compareResults(browser, server);
  let largestRelative = 0;
  const disagreements = differences.filter((d) => {
    if (isStepCount(d.path)) return false;
    if (typeof d.browser !== "number" || typeof d.server !== "number") return true;
    const r = relative(d.browser, d.server);
    largestRelative = Math.max(largestRelative, r);
    return !(r <= SAME_FIGURE);
  });
  return { exact: differences.length === 0, agrees: disagreements.length === 0, largestRelative, disagreements };
}
