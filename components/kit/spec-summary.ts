import { MEASURES, withUnit, type GearSpecs, type MeasureKey } from "@/lib/validations/kit";

/** A model's specs in one line, each with its unit: "Width 25 mm · MBS 30 kN · 2 stretch points". */
export function specSummary(specs: GearSpecs): string {
  const parts: string[] = [];
  for (const [key, value] of Object.entries(specs)) {
    if (key === "construction") parts.push(String(value));
    else if (key === "stretchPoints") parts.push(`${(value as unknown[]).length} stretch points`);
    else if (typeof value === "number") parts.push(`${MEASURES[key as MeasureKey].label} ${withUnit(key as MeasureKey, value)}`);
  }
  return parts.join(" · ");
}
