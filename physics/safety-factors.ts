import { atTwelveDigits, factorText } from "./display";

/** Kinds of component the crew sets a minimum safety factor for. */
export const COMPONENT_CATEGORIES = ["webbing", "connector", "sling", "anchor", "other"] as const;
export type ComponentCategory = (typeof COMPONENT_CATEGORIES)[number];

/** Crew minimums: 3 for everything (common practice, no source); the crew sets its own. */
export const DEFAULT_MINIMUM_FACTORS: Record<ComponentCategory, number> = { webbing: 3, connector: 3, sling: 3, anchor: 3, other: 3 };

export interface LoadedComponent {
  name: string;
  category: ComponentCategory;
  /** Where it sits: anchor "a", "b", the line itself, or the backup (loaded when it catches a fall). */
  location: "a" | "b" | "line" | "backup";
  /** Minimum breaking strength, N. */
  mbs: number;
  /** Peak load the component sees, N. */
  peakLoad: number;
}

export interface SafetyFactor extends LoadedComponent {
  /** MBS / peak load, unrounded. */
  factor: number;
  /** Factor rounded down to two decimals for display: a failing factor is never rounded up. */
  shown: string;
  minimum: number;
  passes: boolean;
}

/** MBS over peak load for every component, against the crew's minimum for its category. */
export function safetyFactors(components: readonly LoadedComponent[], minimums: Record<ComponentCategory, number>): SafetyFactor[] {
  return components.map((c) => {
    const factor = c.mbs / c.peakLoad;
    const minimum = minimums[c.category];
    // Read as it is shown (to 12 digits), so a factor that reads 3.00 never fails a minimum of 3, nor one that reads 2.99 pass it.
    return { ...c, factor, shown: factorText(factor), minimum, passes: atTwelveDigits(factor) >= minimum };
  });
}
