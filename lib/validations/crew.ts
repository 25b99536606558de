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

export const AcceptInvitationSchema = z.object({ token: z.string({ error: "The invitation link is incomplete." }).min(20).max(200) });

// Below 1.5 a factor no longer leaves room for wear and dynamic loads; above 20 it is a typo.
const factor = z
  .number({ error: "Enter a number." })
  .min(1.5, { error: "A minimum safety factor must be at least 1.5." })
  .max(20, { error: "A minimum safety factor must be at most 20." });

export const SAFETY_FACTOR_CLASSES = ["webbing", "rope", "anchor", "connector", "sling", "pulley", "brake"] as const;
export type SafetyFactorClass = (typeof SAFETY_FACTOR_CLASSES)[number];

export const CrewSettingsSchema = z.object({
  units: z.enum(["si", "us"], { error: "Choose SI or US units." }),
  minSafetyFactors: z.object(Object.fromEntries(SAFETY_FACTOR_CLASSES.map((c) => [c, factor])) as Record<SafetyFactorClass, typeof factor>),
  allowSelfSignOff: z.boolean({ error: "Choose yes or no." }),
});

export type CrewSettings = z.infer<typeof CrewSettingsSchema>;
