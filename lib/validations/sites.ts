import { z } from "zod";
import { MAX_SPAN } from "@/physics";

// The shared schema of a site: the form and the route handlers validate with it. Lengths are in
// metres (the form converts the crew's units at its edge); messages quote SI amounts, which the
// form's quantity fields rewrite into the crew's units.

export const MEASUREMENT_METHODS = ["laser", "tape", "map", "estimate"] as const;
export type MeasurementMethod = (typeof MEASUREMENT_METHODS)[number];
export const MEASUREMENT_LABELS: Record<MeasurementMethod, string> = {
  laser: "Laser rangefinder",
  tape: "Tape",
  map: "Map or aerial image",
  estimate: "Estimate by eye",
};

export const ANCHOR_KINDS = ["tree", "bolts", "rock", "structure", "other"] as const;
export type AnchorKind = (typeof ANCHOR_KINDS)[number];
export const ANCHOR_KIND_LABELS: Record<AnchorKind, string> = {
  tree: "Tree",
  bolts: "Bolts",
  rock: "Natural rock (boulder, horn, thread)",
  structure: "Structure (post, beam, building)",
  other: "Other",
};

/** At most this many ground points: a profile sketched from a few measured heights, not a survey. */
export const MAX_GROUND_POINTS = 50;

const metres = (label: string) => z.number({ error: `${label}: enter a number.` }).refine(Number.isFinite, `${label}: enter a number.`);
const notes = (label: string) =>
  z
    .string({ error: `${label}: text.` })
    .trim()
    .max(4000, `${label}: at most 4000 characters.`)
    .default("");

const anchorBase = { notes: notes("Anchor notes") };
export const SiteAnchorSchema = z.discriminatedUnion(
  "kind",
  [
    z.object({
      kind: z.literal("tree"),
      trunkDiameterCm: z
        .number({ error: "Trunk diameter: enter a number of centimetres." })
        .min(5, "Trunk diameter: at least 5 cm.")
        .max(500, "Trunk diameter: at most 500 cm."),
      ...anchorBase,
    }),
    z.object({
      kind: z.literal("bolts"),
      boltCount: z
        .number({ error: "Number of bolts: enter a whole number." })
        .int("Number of bolts: a whole number.")
        .min(1, "Number of bolts: at least 1.")
        .max(12, "Number of bolts: at most 12."),
      boltSizeMm: z
        .number({ error: "Bolt diameter: enter a number of millimetres." })
        .min(6, "Bolt diameter: at least 6 mm.")
        .max(30, "Bolt diameter: at most 30 mm."),
      ...anchorBase,
    }),
    z.object({ kind: z.literal("rock"), ...anchorBase }),
    z.object({ kind: z.literal("structure"), ...anchorBase }),
    z.object({ kind: z.literal("other"), ...anchorBase }),
  ],
  { error: `Anchor kind: choose ${ANCHOR_KINDS.join(", ")}.` },
);
export type SiteAnchor = z.output<typeof SiteAnchorSchema>;

const groundPoint = z.object({ xM: metres("Distance from A"), heightM: metres("Ground height") });

/** The ground under the line: not measured, one height below anchor A over level ground, or a profile from A. */
export const SiteGroundSchema = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("none") }),
    z.object({
      kind: z.literal("level"),
      heightAboveGroundM: metres("Height of anchor A above the ground").refine((h) => h > 0, "Height of anchor A above the ground: more than 0 m."),
    }),
    z.object({
      kind: z.literal("profile"),
      points: z
        .array(groundPoint, { error: "Ground profile: a list of points." })
        .min(1, "Ground profile: give at least one point.")
        .max(MAX_GROUND_POINTS, `Ground profile: at most ${MAX_GROUND_POINTS} points.`),
    }),
  ],
  { error: "Ground: choose not measured, level ground or a profile." },
);
export type SiteGround = z.output<typeof SiteGroundSchema>;

export const SiteSchema = z
  .object({
    name: z.string({ error: "Name the site." }).trim().min(1, "Name the site.").max(120, "Site name: at most 120 characters."),
    accessNotes: notes("Access notes"),
    spanM: metres("Horizontal span").refine((v) => v > 0 && v <= MAX_SPAN, `Horizontal span: more than 0 m and at most ${MAX_SPAN} m.`),
    heightDifferenceM: metres("Height of B above A"),
    measuredBy: z.enum(MEASUREMENT_METHODS, { error: "How it was measured: choose one." }),
    uncertaintyM: metres("Uncertainty").refine((v) => v >= 0 && v <= 100, "Uncertainty: from 0 m to 100 m."),
    ground: SiteGroundSchema,
    anchors: z.object({ a: SiteAnchorSchema, b: SiteAnchorSchema }),
    // Both coordinates left blank is no coordinates.
    coordinates: z.preprocess(
      (v) => (v && typeof v === "object" && Object.values(v).every((part) => part === undefined || part === null || part === "") ? null : v),
      z
        .object({
          latitude: z.number({ error: "Latitude: enter a number of degrees." }).min(-90, "Latitude: from -90° to 90°.").max(90, "Latitude: from -90° to 90°."),
          longitude: z
            .number({ error: "Longitude: enter a number of degrees." })
            .min(-180, "Longitude: from -180° to 180°.")
            .max(180, "Longitude: from -180° to 180°."),
        })
        .nullable()
        .default(null),
    ),
  })
  .superRefine((site, ctx) => {
    if (Math.abs(site.heightDifferenceM) > site.spanM) {
      ctx.addIssue({ code: "custom", path: ["heightDifferenceM"], message: `Height of B above A: no more than the span (${site.spanM} m) either way.` });
    }
    if (site.ground.kind !== "profile") return;
    const points = site.ground.points;
    points.forEach((p, i) => {
      if (p.xM < 0 || p.xM > site.spanM) {
        ctx.addIssue({ code: "custom", path: ["ground", "points", i, "xM"], message: `Distance from A: from 0 m to the span, ${site.spanM} m.` });
      }
      if (i > 0 && !(p.xM > points[i - 1].xM)) {
        ctx.addIssue({
          code: "custom",
          path: ["ground", "points", i, "xM"],
          message: `Distance from A: farther than the point before (${points[i - 1].xM} m).`,
        });
      }
    });
  });
export type SiteInput = z.input<typeof SiteSchema>;
export type Site = z.output<typeof SiteSchema>;

/** The ground as the engine takes it: points from A, heights relative to A, level beyond the ends; null when not measured. */
export function engineGround(ground: SiteGround): { points: { xM: number; heightM: number }[] } | null {
  if (ground.kind === "none") return null;
  if (ground.kind === "level") return { points: [{ xM: 0, heightM: -ground.heightAboveGroundM }] };
  return { points: ground.points.map((p) => ({ xM: p.xM, heightM: p.heightM })) };
}
