// Unit definitions: NIST SP 811 (2008), appendix B.
/** Standard acceleration of gravity, m/s² (NIST SP 811). */
export const STANDARD_GRAVITY = 9.80665;

const NEWTONS_PER = { N: 1, kN: 1000, lbf: 4.4482216152605, kgf: STANDARD_GRAVITY } as const;
const METRES_PER = { m: 1, ft: 0.3048 } as const;
const KILOGRAMS_PER = { kg: 1, lb: 0.45359237 } as const;

export type ForceUnit = keyof typeof NEWTONS_PER;
export type LengthUnit = keyof typeof METRES_PER;
export type MassUnit = keyof typeof KILOGRAMS_PER;

/** Converts a force to newtons. */
export function toNewtons(value: number, unit: ForceUnit): number {
  return value * NEWTONS_PER[unit];
}

/** Converts newtons to the given force unit. */
export function fromNewtons(newtons: number, unit: ForceUnit): number {
  return newtons / NEWTONS_PER[unit];
}

/** Converts a length to metres. */
export function toMetres(value: number, unit: LengthUnit): number {
  return value * METRES_PER[unit];
}

/** Converts metres to the given length unit. */
export function fromMetres(metres: number, unit: LengthUnit): number {
  return metres / METRES_PER[unit];
}

/** Converts a mass to kilograms. */
export function toKilograms(value: number, unit: MassUnit): number {
  return value * KILOGRAMS_PER[unit];
}

/** Converts kilograms to the given mass unit. */
export function fromKilograms(kilograms: number, unit: MassUnit): number {
  return kilograms / KILOGRAMS_PER[unit];
}
