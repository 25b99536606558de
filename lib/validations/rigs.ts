import { z } from "zod";

// The shared schemas of rigs: the planner, the rigs list and the route handlers read these. A rig's
// inputs themselves are checked by the engine's own schema when the server evaluates them.

export const REVISION_STATES = ["draft", "in_review", "signed_off", "superseded"] as const;
export type RevisionState = (typeof REVISION_STATES)[number];
export const REVISION_STATE_LABELS: Record<RevisionState, string> = {
  draft: "Draft",
  in_review: "In review",
  signed_off: "Signed off",
  superseded: "Superseded",
};

/** A revision as lists show it. */
export interface RevisionMeta {
  id: string;
  number: number;
  state: RevisionState;
  basedOnId: string | null;
  engineVersion: string;
  spanM: number;
  mainlineName: string;
  authorId: string | null;
  authorName: string | null;
  createdAt: string;
}

const rigName = z.string({ error: "Name the rig." }).trim().min(1, "Name the rig.").max(120, "Rig name: at most 120 characters.");
const inputs = z.record(z.string(), z.unknown(), { error: "The rig's inputs are missing." });
const siteId = z.uuid({ error: "Site: choose one of the crew's sites, or none." }).nullable();

export const NewRigSchema = z.object({ name: rigName, siteId: siteId.default(null), inputs });
export type NewRig = z.output<typeof NewRigSchema>;

export const NewRevisionSchema = z.object({
  basedOnRevisionId: z.uuid({ error: "The revision this one is based on is missing: reload the rig." }),
  name: rigName,
  siteId: siteId.default(null),
  inputs,
});
export type NewRevisionBody = z.output<typeof NewRevisionSchema>;

export const RIG_SORTS = ["updated", "name", "span"] as const;
export const RIG_SORT_LABELS: Record<(typeof RIG_SORTS)[number], string> = { updated: "Last saved first", name: "Name", span: "Longest span first" };
export const RIG_PAGE_SIZE = 20;

const optionalNumber = (label: string) =>
  z
    .string()
    .optional()
    .transform((text, ctx) => {
      if (text === undefined || text.trim() === "") return undefined;
      const value = Number(text);
      if (!Number.isFinite(value) || value < 0) {
        ctx.addIssue({ code: "custom", message: `${label}: a distance of 0 m or more.` });
        return z.NEVER;
      }
      return value;
    });

/** The rigs list's query string: search, filters, sort and page. Spans are in metres. */
export const RigListQuerySchema = z.object({
  q: z.string().trim().max(120, "Search: at most 120 characters.").optional(),
  siteId: z.uuid({ error: "Site: choose one of the crew's sites." }).optional(),
  state: z.enum(REVISION_STATES, { error: `State: one of ${REVISION_STATES.join(", ")}.` }).optional(),
  mainline: z.string().trim().max(120, "Mainline: at most 120 characters.").optional(),
  spanMinM: optionalNumber("Shortest span"),
  spanMaxM: optionalNumber("Longest span"),
  startedBy: z.string().max(64, "Started by: choose a person of the crew.").optional(),
  sort: z.enum(RIG_SORTS, { error: `Sort: one of ${RIG_SORTS.join(", ")}.` }).default("updated"),
  page: z.coerce
    .number({ error: "Page: a whole number from 1." })
    .int("Page: a whole number from 1.")
    .min(1, "Page: a whole number from 1.")
    .max(10_000, "Page: at most 10 000.")
    .default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(RIG_PAGE_SIZE),
});
export type RigListQuery = z.output<typeof RigListQuerySchema>;
