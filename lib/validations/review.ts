import { z } from "zod";
import { formatQuantity } from "@/lib/rig-form/format";
import type { UnitSystem } from "@/lib/rig-form/quantities";

// The bodies of the review steps, the checklist and the load-cell readings, with messages in the form's words.

const note = (label: string) =>
  z
    .string({ error: `${label}: text.` })
    .trim()
    .max(2000, `${label}: at most 2000 characters.`);

export const ReviewStepSchema = z.discriminatedUnion(
  "step",
  [
    z.object({ step: z.literal("submit"), note: note("Note for the reviewer").default("") }),
    z.object({
      step: z.literal("return"),
      note: note("Comments for the rigger").min(1, "Comments for the rigger: say what should change before it is signed off."),
    }),
    z.object({
      step: z.literal("sign"),
      confirm: z.literal(true, { error: "Confirm the statement: tick the box to sign off." }),
      note: note("Note").default(""),
    }),
  ],
  { error: 'Step: one of "submit", "return" or "sign".' },
);
export type ReviewStepBody = z.output<typeof ReviewStepSchema>;

export const ReuseSchema = z.object({
  name: z.string({ error: "Name the new rig." }).trim().min(1, "Name the new rig.").max(120, "Rig name: at most 120 characters."),
  siteId: z.uuid({ error: "Site: choose one of the crew's sites, or none." }).nullable().default(null),
});

const idempotencyKey = z.uuid({ error: "The write's key must be a uuid; the app makes one for each write." }).optional();

export const ChecklistTemplateSchema = z.object({
  items: z
    .array(
      z.object({
        id: z.uuid({ error: "Each item keeps the id the page gave it." }).optional(),
        text: z
          .string({ error: "Checklist item: text." })
          .trim()
          .min(1, "Checklist item: write what to check, or remove the item.")
          .max(300, "Checklist item: at most 300 characters."),
      }),
      { error: "Send the checklist's items as a list." },
    )
    .max(100, "The checklist: at most 100 items."),
});

export const StartChecklistSchema = z.object({ idempotencyKey });

export const TickSchema = z.object({
  itemId: z.uuid({ error: "Choose an item of this checklist." }),
  checked: z.boolean({ error: "Ticked: yes or no." }),
  idempotencyKey,
});

// A slackline load cell reads up to some tens of kN (common practice, no source): a reading outside these
// bounds is a slip of the unit or the finger, not a tension.
const LIMITS = { force: { min: 50, max: 100_000 }, mass: { min: 1, max: 300 } } as const;

const between = (label: string, kind: "force" | "mass", units: UnitSystem) => {
  const { min, max } = LIMITS[kind];
  const allowed = `${label}: from ${formatQuantity(min, kind, units, "down")} to ${formatQuantity(max, kind, units, "down")}, the range of a load cell on a slackline.`;
  return z.number({ error: `${label}: a number.` }).refine((v) => Number.isFinite(v) && v >= min && v <= max, allowed);
};

/** A load-cell reading as the form sends it (SI), with messages in the crew's units and the form's words. */
export function readingSchema(units: UnitSystem) {
  const common = {
    anchor: z.enum(["a", "b"], { error: "Read at: anchor A or anchor B." }),
    measuredN: between("Tension read", "force", units),
    note: z.string({ error: "Note: text." }).trim().max(500, "Note: at most 500 characters.").default(""),
    idempotencyKey,
  };
  return z.discriminatedUnion(
    "kind",
    [
      z.object({
        kind: z.literal("pretension"),
        ...common,
        sagM: z.number({ error: "Sag measured at mid-span: a number." }).positive("Sag measured at mid-span: more than 0."),
      }),
      z.object({
        kind: z.literal("walker"),
        ...common,
        walkerMassKg: between("Walker's mass", "mass", units),
        walkerPositionM: z.number({ error: "Walker's distance from anchor A: a number." }).positive("Walker's distance from anchor A: more than 0."),
      }),
    ],
    { error: "What was read: the pretension with nobody on the line, or the tension with a walker." },
  );
}
export type ReadingBody = z.output<ReturnType<typeof readingSchema>>;
