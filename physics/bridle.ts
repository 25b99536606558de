import { checkNumber } from "./check-number";
import { figureText, loadText, type DisplayUnits } from "./display";

/** How an anchor takes the line: straight onto one point, or through a two-leg bridle to a master point. */
export type AnchorLayout = { kind: "single" } | { kind: "bridle"; includedAngleDeg: number };

export interface AnchorLoads {
  /** Load at the master point (or the single anchor point), N: the line tension. */
  masterPoint: number;
  /** Load in each leg, N (the line tension itself for a single point). */
  leg: number;
  legs: 1 | 2;
}

/** Leg and master-point loads for a line tension T. */
export function anchorLoads(layout: AnchorLayout, tension: number, field = "anchor"): AnchorLoads {
  if (layout.kind === "single") return { masterPoint: tension, leg: tension, legs: 1 };
  const angle = checkNumber(`${field}.includedAngleDeg`, layout.includedAngleDeg, (v) => v >= 0 && v < 180, "an included angle ≥ 0° and < 180°");
  // Two symmetric legs at an included angle α: leg = T / (2 cos(α/2)) (statics; the sling-angle tables of rigging practice)
  return { masterPoint: tension, leg: tension / (2 * Math.cos(((angle / 2) * Math.PI) / 180)), legs: 2 };
}

// Past 90° the leg load climbs steeply (1/(2 cos(α/2)): 0.71 of the line tension at 90°, all of it at 120°,
// nearly twice it at 150°), so the crew is told from there on; the trade keeps bridles narrower (common practice, no source).
const WIDE_BRIDLE_DEG = 90;
const LINE_TENSION_ON_EACH_LEG_DEG = 120;

/** What the crew should know about one anchor: a load path with nothing in it to check, or a wide bridle. */
export function anchorWarnings(side: "a" | "b", layout: AnchorLayout, componentCount: number, loads: AnchorLoads, units: DisplayUnits): string[] {
  const warnings: string[] = [];
  if (componentCount === 0) {
    warnings.push(
      `Anchor ${side} has no component in its load path: nothing there is checked against its MBS. Add the slings, shackles, master point and anchor points it is rigged with.`,
    );
  }
  if (layout.kind === "bridle" && layout.includedAngleDeg > WIDE_BRIDLE_DEG) {
    const each = `${loadText(loads.leg, units)} on each leg (${figureText((loads.leg / loads.masterPoint) * 100, "%", "up")} of the line tension)`;
    warnings.push(
      layout.includedAngleDeg > LINE_TENSION_ON_EACH_LEG_DEG
        ? `Anchor ${side}: a bridle angle of ${layout.includedAngleDeg}° puts more than the line tension on each leg, ${each}.`
        : `Anchor ${side}: a bridle angle of ${layout.includedAngleDeg}° puts ${each}; past 90° the load on each leg climbs steeply, to the whole line tension at 120°.`,
    );
  }
  return warnings;
}
