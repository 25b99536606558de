// Invented demo gear for the tests (no real products): a stretchy and a stiff webbing.
import { createStretchCurve, RigInputError, STANDARD_GRAVITY, type Line, type StretchPoint } from "../../../physics";

export const STRETCHY: StretchPoint[] = [
  { tensionKN: 0, elongationPct: 0 },
  { tensionKN: 1, elongationPct: 1.5 },
  { tensionKN: 3, elongationPct: 3.4 },
  { tensionKN: 6, elongationPct: 5.2 },
  { tensionKN: 10, elongationPct: 7 },
];

export const STIFF: StretchPoint[] = [
  { tensionKN: 0, elongationPct: 0 },
  { tensionKN: 2, elongationPct: 0.35 },
  { tensionKN: 5, elongationPct: 0.7 },
  { tensionKN: 10, elongationPct: 1.1 },
];

export function demoLine(span: number, rise: number, massPerMetre: number, points: StretchPoint[]): Line {
  return { span, rise, weight: massPerMetre * STANDARD_GRAVITY, curve: createStretchCurve(points) };
}

export const MBS = 30000;

export function relative(a: number, b: number): number {
  return Math.abs(a - b) / Math.abs(b);
}

/** The RigInputError a call raises (any other error, or none, fails the test). */
export function refusalOf(call: () => unknown): RigInputError {
  try {
    call();
  } catch (error) {
    if (error instanceof RigInputError) return error;
    throw error;
  }
  throw new Error("expected a RigInputError");
}
