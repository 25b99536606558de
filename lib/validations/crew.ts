import { z } from "zod";
import { ROLES } from "@/lib/roles";
import { email } from "./account";

export const RoleSchema = z.enum(ROLES, { error: `Choose a role: ${ROLES.join(", ")}.` });

export const CreateCrewSchema = z.object({
  name: z.string({ error: "Name the crew." }).trim().min(2, { error: "Use at least 2 characters." }).max(80, { error: "Use at most 80 characters." }),
});

export const SwitchCrewSchema = z.object({ crewId: z.string({ error: "Choose a crew." }).min(1, { error: "Choose a crew." }) });

export const InviteSchema = z.object({ email, role: RoleSchema });

export const ChangeRoleSchema = z.object({ role: RoleSchema });

const INCOMPLETE_INVITATION = "The invitation link is incomplete: open the link from the e-mail again.";
export const AcceptInvitationSchema = z.object({
  token: z.string({ error: INCOMPLETE_INVITATION }).min(20, INCOMPLETE_INVITATION).max(200, INCOMPLETE_INVITATION),
});

export const SAFETY_FACTOR_CLASSES = ["webbing", "rope", "anchor", "connector", "sling", "pulley", "brake"] as const;
export type SafetyFactorClass = (typeof SAFETY_FACTOR_CLASSES)[number];

/** Each minimum's label on the settings form; its messages name it so. */
export const SAFETY_FACTOR_LABELS: Record<SafetyFactorClass, string> = {
  webbing: "Webbing (mainline and backup)",
  rope: "Rope",
  anchor: "Anchors",
  connector: "Connectors and shackles",
  sling: "Slings",
  pulley: "Pulleys",
  brake: "Brake",
};

// Below 1.5 a factor no longer leaves room for wear and dynamic loads; above 20 it is a typo (common practice, no source).
const FACTOR_RANGE = { min: 1.5, max: 20 };
const factor = (label: string) => {
  const allowed = `a minimum safety factor from ${FACTOR_RANGE.min} to ${FACTOR_RANGE.max}`;
  return z
    .number({ error: `${label}: enter ${allowed}.` })
    .min(FACTOR_RANGE.min, {
      error: `${label}: the minimum safety factor must be at least ${FACTOR_RANGE.min} (allowed ${FACTOR_RANGE.min}–${FACTOR_RANGE.max}).`,
    })
    .max(FACTOR_RANGE.max, {
      error: `${label}: the minimum safety factor must be at most ${FACTOR_RANGE.max} (allowed ${FACTOR_RANGE.min}–${FACTOR_RANGE.max}).`,
    });
};

/** The minimum clearance's label on the settings form. */
export const MINIMUM_CLEARANCE_LABEL = "Minimum clearance below a fall";
const CLEARANCE_ALLOWED = `${MINIMUM_CLEARANCE_LABEL}: from 0 m to 100 m.`;

export const CrewSettingsSchema = z.object({
  units: z.enum(["si", "us"], { error: "Choose SI or US units." }),
  minSafetyFactors: z.object(
    Object.fromEntries(SAFETY_FACTOR_CLASSES.map((c) => [c, factor(SAFETY_FACTOR_LABELS[c])])) as Record<SafetyFactorClass, z.ZodNumber>,
    {
      error: "Give a minimum safety factor for each kind of gear.",
    },
  ),
  /** Between the walker's lowest point after a fall and the ground, m (stored in SI, shown in the crew's units). */
  minClearanceM: z.number({ error: CLEARANCE_ALLOWED }).min(0, CLEARANCE_ALLOWED).max(100, CLEARANCE_ALLOWED),
  allowSelfSignOff: z.boolean({ error: "Choose yes or no." }),
});

export type CrewSettings = z.infer<typeof CrewSettingsSchema>;
