import { z } from "zod";

// The shared schemas of the Kit: the forms and the route handlers validate with these same objects.

export const GEAR_KINDS = ["webbing", "rope", "brake", "line_grip", "pulley", "connector", "sling", "other"] as const;
export type GearKind = (typeof GEAR_KINDS)[number];

export const GEAR_KIND_LABELS: Record<GearKind, string> = {
  webbing: "Webbing",
  rope: "Rope",
  brake: "Brake (progress capture)",
  line_grip: "Line grip",
  pulley: "Pulley",
  connector: "Connector or shackle",
  sling: "Sling",
  other: "Other",
};

/** Kinds a slip test can be run on. */
export const SLIP_DEVICE_KINDS = ["brake", "line_grip"] as const satisfies readonly GearKind[];

/**
 * Every measured spec with its label, unit and the range a real piece of slackline gear falls in.
 * The ranges are generous bounds to catch a wrong unit (common practice, no source), not gear ratings.
 */
export const MEASURES = {
  widthMm: { label: "Width", unit: "mm", min: 10, max: 60 },
  diameterMm: { label: "Diameter", unit: "mm", min: 3, max: 25 },
  massPerMetreG: { label: "Mass per metre", unit: "g/m", min: 5, max: 1000 },
  mbsKN: { label: "MBS", unit: "kN", min: 0.5, max: 300 },
  minRopeMm: { label: "Smallest rope diameter", unit: "mm", min: 3, max: 25 },
  maxRopeMm: { label: "Largest rope diameter", unit: "mm", min: 3, max: 25 },
  sheaveDiameterMm: { label: "Sheave diameter", unit: "mm", min: 10, max: 200 },
  efficiency: { label: "Efficiency", unit: "", min: 0.5, max: 1 },
} as const;
export type MeasureKey = keyof typeof MEASURES;

/** "25 mm", or the bare number for a measure without a unit (a pulley's efficiency). */
export const withUnit = (key: MeasureKey, value: number | string) => `${value}${MEASURES[key].unit ? ` ${MEASURES[key].unit}` : ""}`;
const rangeText = (key: MeasureKey) => withUnit(key, `${MEASURES[key].min}–${MEASURES[key].max}`);

function measure(key: MeasureKey) {
  const { label, min, max } = MEASURES[key];
  return z
    .number({ error: (issue) => (issue.input === undefined ? `${label} is required (${rangeText(key)}).` : `${label} must be a number (${rangeText(key)}).`) })
    .min(min, `${label} must be at least ${withUnit(key, min)} (allowed ${rangeText(key)}).`)
    .max(max, `${label} must be at most ${withUnit(key, max)} (allowed ${rangeText(key)}).`);
}

const stretchPoint = z.object({
  tensionKN: z.number({ error: "Tension must be a number in kN." }).min(0, "Tension cannot be negative.").max(300, "Tension must be at most 300 kN."),
  elongationPct: z.number({ error: "Elongation must be a number in %." }).min(0, "Elongation cannot be negative.").max(60, "Elongation must be at most 60 %."),
});
export type StretchPointInput = z.infer<typeof stretchPoint>;

// The engine's stretch curve starts at the origin and rises in both tension and elongation.
const stretchPoints = z
  .array(stretchPoint)
  .min(2, "Give at least two stretch points: the origin (0 kN, 0 %) and one measured point.")
  .max(30, "Give at most 30 stretch points.")
  .superRefine((points, ctx) => {
    if (points[0] && (points[0].tensionKN !== 0 || points[0].elongationPct !== 0)) {
      ctx.addIssue({ code: "custom", path: [0, "tensionKN"], message: "The first stretch point is the origin: 0 kN at 0 %." });
    }
    for (let i = 1; i < points.length; i++) {
      if (!(points[i].tensionKN > points[i - 1].tensionKN)) {
        ctx.addIssue({ code: "custom", path: [i, "tensionKN"], message: `Tension must rise from point to point (more than ${points[i - 1].tensionKN} kN).` });
      }
      if (!(points[i].elongationPct > points[i - 1].elongationPct)) {
        ctx.addIssue({
          code: "custom",
          path: [i, "elongationPct"],
          message: `Elongation must rise from point to point (more than ${points[i - 1].elongationPct} %).`,
        });
      }
    }
  });

const ropeRange = <T extends { minRopeMm: number; maxRopeMm: number }>(specs: T, ctx: z.RefinementCtx) => {
  if (specs.minRopeMm > specs.maxRopeMm) {
    ctx.addIssue({ code: "custom", path: ["maxRopeMm"], message: "The largest rope diameter cannot be below the smallest." });
  }
};

export const SPEC_SCHEMAS = {
  webbing: z.object({ widthMm: measure("widthMm"), massPerMetreG: measure("massPerMetreG"), mbsKN: measure("mbsKN"), stretchPoints }),
  rope: z.object({
    diameterMm: measure("diameterMm"),
    construction: z.enum(["static", "dynamic"], { error: "Choose static or dynamic." }),
    mbsKN: measure("mbsKN"),
    massPerMetreG: measure("massPerMetreG"),
    stretchPoints,
  }),
  brake: z.object({ minRopeMm: measure("minRopeMm"), maxRopeMm: measure("maxRopeMm"), mbsKN: measure("mbsKN") }).superRefine(ropeRange),
  line_grip: z.object({ minRopeMm: measure("minRopeMm"), maxRopeMm: measure("maxRopeMm"), mbsKN: measure("mbsKN") }).superRefine(ropeRange),
  pulley: z.object({ sheaveDiameterMm: measure("sheaveDiameterMm"), efficiency: measure("efficiency"), mbsKN: measure("mbsKN") }),
  connector: z.object({ mbsKN: measure("mbsKN") }),
  sling: z.object({ mbsKN: measure("mbsKN") }),
  other: z.object({ mbsKN: measure("mbsKN").optional() }),
} satisfies Record<GearKind, z.ZodType>;

const name = z.string().trim().min(1, "Give the model a name.").max(80, "A name has at most 80 characters.");
const notes = z.string().trim().max(2000, "Notes have at most 2000 characters.").default("");

const modelOf = <K extends GearKind>(kind: K) => z.object({ kind: z.literal(kind), name, notes, specs: SPEC_SCHEMAS[kind] });

export const GearModelSchema = z.discriminatedUnion(
  "kind",
  [modelOf("webbing"), modelOf("rope"), modelOf("brake"), modelOf("line_grip"), modelOf("pulley"), modelOf("connector"), modelOf("sling"), modelOf("other")],
  { error: `Choose a kind of gear: ${GEAR_KINDS.join(", ")}.` },
);
export type GearModelInput = z.input<typeof GearModelSchema>;
export type GearModel = z.output<typeof GearModelSchema>;
export type GearSpecs<K extends GearKind = GearKind> = z.output<(typeof SPEC_SCHEMAS)[K]>;

/** A calendar date as the browser's date input gives it, not in the future. */
export const pastDate = (label: string) =>
  z.iso.date({ error: `${label} must be a date (YYYY-MM-DD).` }).refine((d) => d <= new Date().toISOString().slice(0, 10), `${label} cannot be in the future.`);

export const GearItemSchema = z.object({
  modelId: z.uuid({ error: "Choose the gear model this item is." }),
  label: z.string().trim().min(1, "Give the serial number or a label you can read on the item.").max(60, "A serial or label has at most 60 characters."),
  inServiceSince: pastDate("In service since"),
  notes,
});
export type GearItemInput = z.input<typeof GearItemSchema>;
export type GearItem = z.output<typeof GearItemSchema>;

export const GearItemEditSchema = GearItemSchema.omit({ modelId: true });
export type GearItemEditInput = z.input<typeof GearItemEditSchema>;
export type GearItemEdit = z.output<typeof GearItemEditSchema>;

export const RetirementSchema = z.object({
  retiredOn: pastDate("Retired on"),
  reason: z
    .string()
    .trim()
    .min(3, "Say why it was retired (for example: core shot, failed inspection, lost).")
    .max(500, "A reason has at most 500 characters."),
});
export type RetirementInput = z.input<typeof RetirementSchema>;
export type Retirement = z.output<typeof RetirementSchema>;

export const INSPECTION_RESULTS = ["pass", "watch", "fail"] as const;
export const INSPECTION_RESULT_LABELS: Record<(typeof INSPECTION_RESULTS)[number], string> = {
  pass: "Pass: fit for use",
  watch: "Watch: usable, check again soon",
  fail: "Fail: do not use",
};

export const InspectionSchema = z.object({
  inspectedOn: pastDate("Inspected on"),
  result: z.enum(INSPECTION_RESULTS, { error: "Choose pass, watch or fail." }),
  notes,
});
export type InspectionInput = z.input<typeof InspectionSchema>;
export type Inspection = z.output<typeof InspectionSchema>;
