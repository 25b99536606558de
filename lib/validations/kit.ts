import { z } from "zod";
import { fromShown, toShown, unitLabel, type QuantityKind, type UnitSystem } from "@/lib/rig-form/quantities";
import { stretchTensionText } from "@/lib/figures";

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
 * Every measured spec with its label, the unit it is kept in, and the range a real piece of slackline gear
 * falls in. The ranges are generous bounds to catch a wrong unit (common practice, no source), not gear
 * ratings. `quantity` says how a kept value is shown to a crew in US units (lib/rig-form/quantities):
 * forces kept in kN go to lbf, mass per metre (kept in g/m) to oz/ft, an efficiency to per cent; rope and
 * webbing sizes stay in millimetres, as the trade gives them everywhere.
 */
export const MEASURES = {
  widthMm: { label: "Width", unit: "mm", min: 10, max: 60, quantity: "plain", perSI: 1 },
  diameterMm: { label: "Diameter", unit: "mm", min: 3, max: 25, quantity: "plain", perSI: 1 },
  massPerMetreG: { label: "Mass per metre", unit: "g/m", min: 5, max: 1000, quantity: "massPerLength", perSI: 1000 },
  mbsKN: { label: "MBS", unit: "kN", min: 0.5, max: 300, quantity: "stretchTension", perSI: 1 },
  minRopeMm: { label: "Smallest rope diameter", unit: "mm", min: 3, max: 25, quantity: "plain", perSI: 1 },
  maxRopeMm: { label: "Largest rope diameter", unit: "mm", min: 3, max: 25, quantity: "plain", perSI: 1 },
  sheaveDiameterMm: { label: "Sheave diameter", unit: "mm", min: 10, max: 200, quantity: "plain", perSI: 1 },
  efficiency: { label: "Efficiency", unit: "", min: 0.5, max: 1, quantity: "fraction", perSI: 1 },
} as const satisfies Record<string, { label: string; unit: string; min: number; max: number; quantity: QuantityKind; perSI: number }>;
export type MeasureKey = keyof typeof MEASURES;

/** A spec's label as the form shows it to the crew: "Mass per foot" where a US crew reads ounces per foot. */
export const measureLabel = (key: MeasureKey, units: UnitSystem) => (key === "massPerMetreG" && units === "us" ? "Mass per foot" : MEASURES[key].label);

/** The unit a spec is shown in: "mm", "kN" or "lbf", "g/m" or "oz/ft", "%". */
export const measureUnit = (key: MeasureKey, units: UnitSystem) =>
  MEASURES[key].quantity === "plain" ? MEASURES[key].unit : unitLabel(MEASURES[key].quantity, units);

// A spec the crew reads in the unit it is kept in passes through untouched, so no conversion adds float noise to it.
const keptAsShown = (key: MeasureKey, units: UnitSystem) =>
  MEASURES[key].quantity === "plain" || unitLabel(MEASURES[key].quantity, units) === MEASURES[key].unit;

/** A kept spec value as the number the crew reads, and back. */
export const shownMeasure = (key: MeasureKey, kept: number, units: UnitSystem) =>
  keptAsShown(key, units) ? kept : toShown(kept / MEASURES[key].perSI, MEASURES[key].quantity, units);
export const keptMeasure = (key: MeasureKey, shown: number, units: UnitSystem) =>
  keptAsShown(key, units) ? shown : fromShown(shown, MEASURES[key].quantity, units) * MEASURES[key].perSI;

/**
 * A limit in the crew's units, rounded inward (a lower bound up, an upper one down) to three figures, so
 * that every value the message allows is allowed: "at most 67400 lbf" for 300 kN.
 */
function shownLimit(key: MeasureKey, kept: number, units: UnitSystem, side: "min" | "max"): string {
  const exact = shownMeasure(key, kept, units);
  if (exact === 0) return "0";
  const step = 10 ** (Math.floor(Math.log10(Math.abs(exact))) - 2);
  const rounded = (side === "min" ? Math.ceil(exact / step - 1e-9) : Math.floor(exact / step + 1e-9)) * step;
  return String(Number(rounded.toPrecision(3)));
}

const withShownUnit = (key: MeasureKey, units: UnitSystem, amount: string) => {
  const unit = measureUnit(key, units);
  return unit ? `${amount}${unit === "%" ? " %" : ` ${unit}`}` : amount;
};

/** "0.5–300 kN", "112–67400 lbf": the allowed range in the crew's units. */
export const measureRange = (key: MeasureKey, units: UnitSystem) =>
  withShownUnit(key, units, `${shownLimit(key, MEASURES[key].min, units, "min")}–${shownLimit(key, MEASURES[key].max, units, "max")}`);

function measure(key: MeasureKey, units: UnitSystem) {
  const { min, max } = MEASURES[key];
  const label = measureLabel(key, units);
  const range = measureRange(key, units);
  return z
    .number({
      error: (issue) => (issue.input === undefined || issue.input === null ? `${label} is required (${range}).` : `${label} must be a number (${range}).`),
    })
    .min(min, `${label} must be at least ${withShownUnit(key, units, shownLimit(key, min, units, "min"))} (allowed ${range}).`)
    .max(max, `${label} must be at most ${withShownUnit(key, units, shownLimit(key, max, units, "max"))} (allowed ${range}).`);
}

const STRETCH_TENSION_MAX_KN = 300;
const STRETCH_ELONGATION_MAX_PCT = 60;

function stretchPoints(units: UnitSystem) {
  const unit = unitLabel("stretchTension", units);
  const point = z.object(
    {
      tensionKN: z
        .number({ error: `Tension must be a number in ${unit}.` })
        .min(0, "Tension cannot be negative.")
        .max(STRETCH_TENSION_MAX_KN, `Tension must be at most ${stretchTensionText(STRETCH_TENSION_MAX_KN, units)}.`),
      elongationPct: z
        .number({ error: "Elongation must be a number in %." })
        .min(0, "Elongation cannot be negative.")
        .max(STRETCH_ELONGATION_MAX_PCT, `Elongation must be at most ${STRETCH_ELONGATION_MAX_PCT} %.`),
    },
    { error: "Give each stretch point a tension and an elongation." },
  );
  // The engine's stretch curve starts at the origin and rises in both tension and elongation.
  return z
    .array(point, { error: `Give the stretch points: the origin (0 ${unit}, 0 %) and at least one measured point.` })
    .min(2, `Give at least two stretch points: the origin (0 ${unit}, 0 %) and one measured point.`)
    .max(30, "Give at most 30 stretch points.")
    .superRefine((points, ctx) => {
      if (points[0] && (points[0].tensionKN !== 0 || points[0].elongationPct !== 0)) {
        ctx.addIssue({ code: "custom", path: [0, "tensionKN"], message: `The first stretch point is the origin: 0 ${unit} at 0 %.` });
      }
      for (let i = 1; i < points.length; i++) {
        if (!(points[i].tensionKN > points[i - 1].tensionKN)) {
          ctx.addIssue({
            code: "custom",
            path: [i, "tensionKN"],
            message: `Tension must rise from point to point (more than ${stretchTensionText(points[i - 1].tensionKN, units)}).`,
          });
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
}
export type StretchPointInput = { tensionKN: number; elongationPct: number };

export const CONSTRUCTIONS = ["static", "dynamic"] as const;
export const CONSTRUCTION_LABELS: Record<(typeof CONSTRUCTIONS)[number], string> = { static: "Static (low stretch)", dynamic: "Dynamic (climbing rope)" };

const ropeRange = <T extends { minRopeMm: number; maxRopeMm: number }>(specs: T, ctx: z.RefinementCtx) => {
  if (specs.minRopeMm > specs.maxRopeMm) {
    ctx.addIssue({ code: "custom", path: ["maxRopeMm"], message: "The largest rope diameter cannot be below the smallest." });
  }
};

const SPECS_ERROR = { error: "Give the model's specs." };

function specSchemas(units: UnitSystem) {
  const m = (key: MeasureKey) => measure(key, units);
  return {
    webbing: z.object({ widthMm: m("widthMm"), massPerMetreG: m("massPerMetreG"), mbsKN: m("mbsKN"), stretchPoints: stretchPoints(units) }, SPECS_ERROR),
    rope: z.object(
      {
        diameterMm: m("diameterMm"),
        construction: z.enum(CONSTRUCTIONS, { error: "Choose the construction: static or dynamic." }),
        mbsKN: m("mbsKN"),
        massPerMetreG: m("massPerMetreG"),
        stretchPoints: stretchPoints(units),
      },
      SPECS_ERROR,
    ),
    brake: z.object({ minRopeMm: m("minRopeMm"), maxRopeMm: m("maxRopeMm"), mbsKN: m("mbsKN") }, SPECS_ERROR).superRefine(ropeRange),
    line_grip: z.object({ minRopeMm: m("minRopeMm"), maxRopeMm: m("maxRopeMm"), mbsKN: m("mbsKN") }, SPECS_ERROR).superRefine(ropeRange),
    pulley: z.object({ sheaveDiameterMm: m("sheaveDiameterMm"), efficiency: m("efficiency"), mbsKN: m("mbsKN") }, SPECS_ERROR),
    connector: z.object({ mbsKN: m("mbsKN") }, SPECS_ERROR),
    sling: z.object({ mbsKN: m("mbsKN") }, SPECS_ERROR),
    other: z.object({ mbsKN: m("mbsKN").optional() }, SPECS_ERROR),
  } satisfies Record<GearKind, z.ZodType>;
}

/** The specs each kind records, in the order the form and the spec table show them. */
export const SPEC_KEYS = Object.fromEntries(Object.entries(specSchemas("si")).map(([kind, schema]) => [kind, Object.keys(schema.shape)])) as Record<
  GearKind,
  string[]
>;

/** Text a person types: trimmed, required or not, with its length limit, every message naming the field. */
export const text = (label: string, max: number, required: string | null) => {
  const base = z.string({ error: required ?? `${label} must be text.` }).trim();
  const limited = (required ? base.min(1, required) : base).max(max, `${label}: at most ${max} characters.`);
  return limited;
};
/** Optional notes: a missing or null value is none. */
export const notes = (label = "Notes") => z.preprocess((v) => v ?? "", text(label, 2000, null));

function gearModelSchema(units: UnitSystem) {
  const specs = specSchemas(units);
  const modelOf = <K extends GearKind>(kind: K) =>
    z.object({ kind: z.literal(kind), name: text("Name", 80, "Give the model a name."), notes: notes(), specs: specs[kind] as (typeof specs)[K] });
  return z.discriminatedUnion(
    "kind",
    [modelOf("webbing"), modelOf("rope"), modelOf("brake"), modelOf("line_grip"), modelOf("pulley"), modelOf("connector"), modelOf("sling"), modelOf("other")],
    { error: `Choose a kind of gear: ${GEAR_KINDS.map((k) => GEAR_KIND_LABELS[k].toLowerCase()).join(", ")}.` },
  );
}

/** A gear model as the Kit keeps it (specs in mm, g/m, kN), with its messages in the crew's units. */
export const GearModelSchema = { si: gearModelSchema("si"), us: gearModelSchema("us") } as const;
export type GearModelInput = z.input<(typeof GearModelSchema)["si"]>;
export type GearModel = z.output<(typeof GearModelSchema)["si"]>;
export type GearSpecs<K extends GearKind = GearKind> = z.output<ReturnType<typeof specSchemas>[K]>;

/** No gear in service or test was recorded before this; earlier dates are typing slips (and year 0 does not exist). */
export const EARLIEST_DATE = "1900-01-01";

/** A calendar date as the browser's date input gives it, from EARLIEST_DATE up to today. */
export const pastDate = (label: string) =>
  z.iso
    .date({ error: `${label} must be a date (YYYY-MM-DD).` })
    .refine((d) => d >= EARLIEST_DATE, `${label} must be on or after ${EARLIEST_DATE}.`)
    .refine((d) => d <= new Date().toISOString().slice(0, 10), `${label} cannot be in the future.`);

export const GearItemSchema = z.object({
  modelId: z.uuid({ error: "Choose the gear model this item is." }),
  label: text("Serial or label", 60, "Give the serial number or a label you can read on the item."),
  inServiceSince: pastDate("In service since"),
  notes: notes(),
});
export type GearItemInput = z.input<typeof GearItemSchema>;
export type GearItem = z.output<typeof GearItemSchema>;

export const GearItemEditSchema = GearItemSchema.omit({ modelId: true });

/** The refusal of a second item with the same label in one model: labels tell the pieces apart. */
export const duplicateLabelMessage = (label: string) =>
  `Another item of this model is already labelled "${label}": give each item its own serial or label (a letter or number more will do).`;
export type GearItemEditInput = z.input<typeof GearItemEditSchema>;
export type GearItemEdit = z.output<typeof GearItemEditSchema>;

export const RetirementSchema = z.object({
  retiredOn: pastDate("Retired on"),
  reason: text("Why", 500, "Say why it was retired (for example: core shot, failed inspection, lost).").refine(
    (reason) => reason.length >= 3,
    "Say why it was retired in a few words (for example: core shot, failed inspection, lost).",
  ),
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
  notes: notes(),
});
export type InspectionInput = z.input<typeof InspectionSchema>;
export type Inspection = z.output<typeof InspectionSchema>;
