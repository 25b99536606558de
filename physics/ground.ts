import { RigInputError } from "./rig-input-error";

/** A point of the ground under the line: horizontal distance from anchor A and height relative to A (negative below), m. */
export interface GroundPoint {
  xM: number;
  heightM: number;
}

/** Checks a ground profile against the span: points in order from A, each within the span. */
export function checkGround(points: readonly GroundPoint[], span: number): readonly GroundPoint[] {
  points.forEach((p, i) => {
    if (p.xM > span) throw new RigInputError(`ground.points.${i}.xM`, p.xM, `a distance from anchor A from 0 m to the span, ${span} m`);
    if (i > 0 && !(p.xM > points[i - 1].xM)) {
      throw new RigInputError(`ground.points.${i}.xM`, p.xM, `farther from A than the point before (${points[i - 1].xM} m): points in order from A`);
    }
  });
  return points;
}

/** The ground's height at x: linear between points, level beyond the first and the last. */
export function groundHeightAt(points: readonly GroundPoint[], x: number): number {
  if (x <= points[0].xM) return points[0].heightM;
  for (let i = 1; i < points.length; i++) {
    const b = points[i];
    if (x <= b.xM) {
      const a = points[i - 1];
      return a.heightM + ((b.heightM - a.heightM) * (x - a.xM)) / (b.xM - a.xM);
    }
  }
  return points[points.length - 1].heightM;
}
