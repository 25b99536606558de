import { z } from "zod";

// The bodies of the review steps, the checklist and the load-cell readings, with messages in the form's words.

const note = (label: string) => z.string({ error: `${label}: text.` }).trim().max(2000, `${label}: at most 2000 characters.`);

export const ReviewStepSchema = z.discriminatedUnion(
  "step",
  [
    z.object({ step: z.literal("submit"), note: note("Note for the reviewer").default("") }),
    z.object({ step: z.literal("return"), note: note("Comments for the rigger").min(1, "Comments for the rigger: say what should change before it is signed off.") }),
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
