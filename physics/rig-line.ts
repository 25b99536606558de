import type { Line } from "./line-equations";
import type { RigInput } from "./rig-schema";
import { createStretchCurve } from "./stretch-curve";
import { STANDARD_GRAVITY } from "./units";

/** The mainline of a rig as the equations see it: span, rise, weight per metre (with a backup riding along) and stretch curve. */
export function rigLine(rig: RigInput): Line {
  const backupMass = rig.backup?.ridesAlong ? rig.backup.massPerMetreKg : 0;
  return {
    span: rig.spanM,
    rise: rig.heightDifferenceM,
    weight: (rig.mainline.massPerMetreKg + backupMass) * STANDARD_GRAVITY,
    curve: createStretchCurve(rig.mainline.stretchPoints, "mainline.stretchPoints"),
  };
}
