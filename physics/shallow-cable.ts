import { bracketedRoot } from "./bracketed-root";
import type { Line, LineVariables } from "./line-equations";
import { strainAt } from "./stretch-curve";

/**
 * Starting estimates from the shallow-cable theory (Irvine 1981, ch. 3): the line hangs like a
 * beam's bending-moment diagram divided by H, and its extra length over the chord is ∫Q²dx / (2H²),
 * Q being the shear of a simply supported beam under the same loads. Only a start for Newton.
 */
function shearSquaredIntegral(span: number, weight: number, load: number, loadX: number): number {
  const q = weight;
  const reactionA = (q * span) / 2 + (load * (span - loadX)) / span;
  // ∫ of a linear function from q1 to q2 over a length Δ, squared: Δ(q1² + q1q2 + q2²)/3
  const piece = (q1: number, q2: number, d: number) => (d * (q1 * q1 + q1 * q2 + q2 * q2)) / 3;
  const beforeLoad = reactionA - q * loadX;
  return piece(reactionA, beforeLoad, loadX) + piece(beforeLoad - load, reactionA - load - q * span, span - loadX);
}

/** Weight per horizontal metre when a line of unstretched length L hangs over span D. */
function weightPerSpanMetre(line: Line, length: number): number {
  return (line.weight * length) / line.span;
}

/** Estimate for a line of known unstretched length carrying a point load at horizontal position loadX. */
export function shallowCableGuess(line: Line, length: number, load: number, loadX: number): LineVariables {
  const chord = Math.hypot(line.span, line.rise);
  const q = weightPerSpanMetre(line, length);
  const shear2 = shearSquaredIntegral(line.span, q, load, loadX);
  const mismatch = (logH: number) => {
    const H = Math.exp(logH);
    return length * (1 + strainAt(line.curve, (H * chord) / line.span)) - chord - shear2 / (2 * H * H);
  };
  const H = Math.exp(bracketedRoot(mismatch, Math.log(1e-6), Math.log(1e12), "starting estimate of the horizontal tension", 1e-6));
  const reactionA = (q * line.span) / 2 + (load * (line.span - loadX)) / line.span;
  return { H, VA: (H * line.rise) / line.span - reactionA, loadArc: (length * loadX) / line.span, load, length };
}

/** Estimate for an unloaded line whose tension at one anchor is known. */
export function pretensionGuess(line: Line, tension: number): LineVariables {
  const chord = Math.hypot(line.span, line.rise);
  const H = (tension * line.span) / chord;
  let length = chord / (1 + strainAt(line.curve, tension));
  for (let i = 0; i < 3; i++) {
    const shear2 = shearSquaredIntegral(line.span, weightPerSpanMetre(line, length), 0, 0);
    length = (chord + shear2 / (2 * H * H)) / (1 + strainAt(line.curve, tension));
  }
  const reactionA = (weightPerSpanMetre(line, length) * line.span) / 2;
  return { H, VA: (H * line.rise) / line.span - reactionA, loadArc: 0, load: 0, length };
}
