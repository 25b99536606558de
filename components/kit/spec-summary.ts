import { capacityDigits, capacityText } from "@/physics";
import { efficiencyDigits, efficiencyText, asGiven, massPerLengthDigits, massPerLengthText, millimetresText } from "@/lib/figures";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { CONSTRUCTION_LABELS, SPEC_KEYS, keptMeasure, measureLabel, type GearKind, type GearSpecs, type MeasureKey } from "@/lib/validations/kit";

/** A spec as the crew reads it: "30.00 kN" or "6744 lbf" (an MBS is a capacity, cut down), "0.52 oz/ft", "93 %", "25 mm". */
export function specText(key: MeasureKey, kept: number, units: UnitSystem): string {
  if (key === "mbsKN") return capacityText(kept * 1000, units);
  if (key === "massPerMetreG") return massPerLengthText(kept, units);
  if (key === "efficiency") return efficiencyText(kept);
  return millimetresText(kept);
}

/** What an input box shows for a kept spec: the digits of `specText` (SI values as given). */
export function specDigits(key: MeasureKey, kept: number, units: UnitSystem): string {
  if (key === "mbsKN") return units === "us" ? capacityDigits(kept * 1000, units) : asGiven(kept);
  if (key === "massPerMetreG") return massPerLengthDigits(kept, units);
  if (key === "efficiency") return efficiencyDigits(kept);
  return asGiven(kept);
}

/** What a person typed in a spec's box, as the value the Kit keeps. */
export const specFromShown = (key: MeasureKey, shown: number, units: UnitSystem) => keptMeasure(key, shown, units);

/** A model's specs, in the order its kind's form asks for them (the database keeps no order). */
export const specEntries = (kind: GearKind, specs: GearSpecs) =>
  SPEC_KEYS[kind].filter((key) => key in specs).map((key) => [key, (specs as Record<string, unknown>)[key]] as const);

/** How a rope's construction reads. */
export const constructionText = (value: unknown) => CONSTRUCTION_LABELS[value as keyof typeof CONSTRUCTION_LABELS] ?? String(value);

/** A model's specs in one line: "Width 25 mm · Mass per metre 48 g/m · MBS 32.00 kN · 5 stretch points". */
export function specSummary(kind: GearKind, specs: GearSpecs, units: UnitSystem): string {
  const parts: string[] = [];
  for (const [key, value] of specEntries(kind, specs)) {
    if (key === "construction") parts.push(constructionText(value));
    else if (key === "stretchPoints") parts.push(`${(value as unknown[]).length} stretch points`);
    else if (typeof value === "number") parts.push(`${measureLabel(key as MeasureKey, units)} ${specText(key as MeasureKey, value, units)}`);
  }
  return parts.join(" · ");
}
