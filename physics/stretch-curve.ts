import { RigInputError } from "./rig-input-error";

/** One measured point of a webbing's stretch test. */
export interface StretchPoint {
  /** Line tension, kN. */
  tensionKN: number;
  /** Elongation at that tension, % of the unstretched length. */
  elongationPct: number;
}

/**
 * Strain against tension, piecewise linear between measured points (monotone by construction).
 * Piece k holds for tension in [tensions[k], tensions[k+1]] with strain = intercepts[k] + slopes[k]·T;
 * the last piece carries on past the last measured point with the last measured stiffness.
 */
export interface StretchCurve {
  /** Piece start tensions, N; tensions[0] = 0. */
  tensions: number[];
  /** Strain (fraction) at each piece start. */
  strains: number[];
  /** Strain = intercept + slope·T on each piece (slope in 1/N). */
  intercepts: number[];
  slopes: number[];
  /** Highest measured tension, N: beyond it the curve is extrapolated. */
  lastMeasuredTension: number;
}

/** Builds a stretch curve from measured points; rejects curves that are not through the origin or not increasing. */
export function createStretchCurve(points: readonly StretchPoint[], field = "stretchPoints"): StretchCurve {
  if (!Array.isArray(points) || points.length < 2) {
    throw new RigInputError(field, points, "at least two points, the first at 0 kN and 0 %");
  }
  points.forEach((p, i) => {
    for (const key of ["tensionKN", "elongationPct"] as const) {
      const v = p?.[key];
      if (typeof v !== "number" || !Number.isFinite(v) || v < 0) {
        throw new RigInputError(`${field}.${i}.${key}`, v, "a finite number ≥ 0");
      }
    }
  });
  if (points[0].tensionKN !== 0 || points[0].elongationPct !== 0) {
    throw new RigInputError(`${field}.0`, points[0], "the curve starts at the origin: 0 kN, 0 %");
  }
  for (let i = 1; i < points.length; i++) {
    if (!(points[i].tensionKN > points[i - 1].tensionKN)) {
      throw new RigInputError(
        `${field}.${i}.tensionKN`,
        points[i].tensionKN,
        `more than the previous point's ${points[i - 1].tensionKN} kN (tensions strictly increasing)`,
      );
    }
    if (!(points[i].elongationPct > points[i - 1].elongationPct)) {
      throw new RigInputError(
        `${field}.${i}.elongationPct`,
        points[i].elongationPct,
        `more than the previous point's ${points[i - 1].elongationPct} % (elongation strictly increasing)`,
      );
    }
  }
  const tensions = points.map((p) => p.tensionKN * 1000);
  const strains = points.map((p) => p.elongationPct / 100);
  const slopes: number[] = [];
  const intercepts: number[] = [];
  for (let k = 0; k < points.length - 1; k++) {
    const slope = (strains[k + 1] - strains[k]) / (tensions[k + 1] - tensions[k]);
    slopes.push(slope);
    intercepts.push(strains[k] - slope * tensions[k]);
  }
  return {
    tensions: tensions.slice(0, -1),
    strains: strains.slice(0, -1),
    intercepts,
    slopes,
    lastMeasuredTension: tensions[tensions.length - 1],
  };
}

/** Index of the piece that holds tension T (N). */
export function pieceAt(curve: StretchCurve, tension: number): number {
  let k = curve.tensions.length - 1;
  while (k > 0 && curve.tensions[k] > tension) k--;
  return k;
}

/** Strain (fraction) at tension T (N). */
export function strainAt(curve: StretchCurve, tension: number): number {
  const k = pieceAt(curve, tension);
  return curve.intercepts[k] + curve.slopes[k] * tension;
}

/** Tension (N) at strain ε: the inverse of strainAt. */
export function tensionAtStrain(curve: StretchCurve, strain: number): number {
  let k = curve.strains.length - 1;
  while (k > 0 && curve.strains[k] > strain) k--;
  return (strain - curve.intercepts[k]) / curve.slopes[k];
}
