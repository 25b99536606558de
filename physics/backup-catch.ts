import { fixedDigits } from "./display";
import type { Line } from "./line-equations";
import { RigInputError } from "./rig-input-error";
import type { RigInput } from "./rig-schema";
import { shortestLength } from "./solve-line";
import { createStretchCurve } from "./stretch-curve";
import { STANDARD_GRAVITY } from "./units";

// When the mainline fails with the walker standing on it, the leash ring drops onto the backup, which then
// catches the walker alone. The broken mainline's weight is not carried by the backup (its ends hang from
// the anchors); the ring slides freely, so the walker is caught where the fall began.

/** Why the backup's catch cannot be worked out, or null when it can (it needs the backup's stretch points and slack). */
export function backupCatchMissing(rig: RigInput): string | null {
  if (!rig.backup) return "No backup given: its catch is not worked out.";
  if (!rig.backup.stretchPoints) return "No stretch points for the backup: its catch is not worked out.";
  if (rig.backup.slackM === undefined) return "No slack given for the backup (its length over the mainline's): its catch is not worked out.";
  return null;
}

/** The backup as a line of its own once the mainline has failed: its own weight, curve and length (the mainline's + slack). */
export function backupLine(rig: RigInput, mainLength: number): { name: string; line: Line; length: number; mbs: number; slack: number } | null {
  const b = rig.backup;
  if (!b?.stretchPoints || b.slackM === undefined) return null;
  const line: Line = {
    span: rig.spanM,
    rise: rig.heightDifferenceM,
    weight: b.massPerMetreKg * STANDARD_GRAVITY,
    curve: createStretchCurve(b.stretchPoints, "backup.stretchPoints"),
  };
  const length = mainLength + b.slackM;
  const shortest = shortestLength(line, b.mbsN);
  if (length < shortest) {
    throw new RigInputError(
      "backup.slackM",
      b.slackM,
      `a slack of at least ${fixedDigits(shortest - mainLength, 3, "up")} m: any less and the backup alone would stretch past its MBS to reach the anchors`,
    );
  }
  return { name: b.name, line, length, mbs: b.mbsN, slack: b.slackM };
}

/**
 * The walker's free fall before the backup takes the load: h_f = harness height + leash length (`leashFall`,
 * the leash fall's own free fall) + max(0, y_main − y_backup), the ring's drop from the mainline under the
 * walker to the unloaded backup. A backup hanging above the ring (y_backup ≥ y_main) catches at once.
 */
export function backupFreeFall(leashFall: number, mainlineY: number, backupY: number, slack: number): number {
  const freeFall = leashFall + Math.max(0, mainlineY - backupY);
  if (freeFall > 100) throw new RigInputError("backup.slackM", slack, "a slack that keeps the fall onto the backup within 100 m");
  return freeFall;
}
