import { RigInputError } from "./rig-input-error";

/** Returns value if it is a finite number meeting the rule; otherwise raises a RigInputError saying what is allowed. */
export function checkNumber(field: string, value: unknown, rule: (v: number) => boolean, allowed: string): number {
  if (typeof value !== "number" || !Number.isFinite(value) || !rule(value)) throw new RigInputError(field, value, allowed);
  return value;
}
