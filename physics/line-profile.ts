import { bracketedRoot } from "./bracketed-root";
import { lineIntegrals } from "./line-integrals";
import { segmentEnds, type Line, type LineVariables } from "./line-equations";

/** Position (m, y up from A) of the point at unstretched arc s from A. */
export function pointAtArc(line: Line, v: LineVariables, s: number): { x: number; y: number } {
  const w = line.weight;
  const { Vp, i0, im, ip } = segmentEnds(line, v);
  if (s <= v.loadArc) {
    const i = lineIntegrals(line.curve, v.H, v.VA + w * s);
    return { x: (i.Gx - i0.Gx) / w, y: (i.Gy - i0.Gy) / w };
  }
  const i = lineIntegrals(line.curve, v.H, Vp + w * (s - v.loadArc));
  return { x: (im.Gx - i0.Gx + i.Gx - ip.Gx) / w, y: (im.Gy - i0.Gy + i.Gy - ip.Gy) / w };
}

/** Drop of the line below the straight chord A–B at horizontal position x (m). */
export function sagAt(line: Line, v: LineVariables, x: number): number {
  if (x <= 0 || x >= line.span) return 0;
  // x(s) rises monotonically along the line, so the arc at x is bracketed by the two anchors.
  const s = bracketedRoot((arc) => pointAtArc(line, v, arc).x - x, 0, v.length, "position along the line", 1e-14);
  return (line.rise * x) / line.span - pointAtArc(line, v, s).y;
}

/** Points of the line for drawing, evenly spaced along the unstretched arc, plus the load point. */
export function lineProfile(line: Line, v: LineVariables, count = 101): { x: number; y: number }[] {
  const points: { x: number; y: number }[] = [];
  for (let i = 0; i < count; i++) {
    const s = (v.length * i) / (count - 1);
    const next = (v.length * (i + 1)) / (count - 1);
    points.push(pointAtArc(line, v, s));
    if (v.load > 0 && v.loadArc > s && v.loadArc < next) points.push(pointAtArc(line, v, v.loadArc));
  }
  return points;
}
