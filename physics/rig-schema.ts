import { z } from "zod";
import { DEFAULT_MINIMUM_CLEARANCE_M } from "./clearance";
import { COMPONENT_CATEGORIES, DEFAULT_MINIMUM_FACTORS } from "./safety-factors";
import { MAX_SPAN } from "./solve-line";

// Every message is the "allowed" half of the error the user sees.
const number = (allowed: string) => z.number({ error: allowed });
const positive = (allowed: string) => number(allowed).gt(0, allowed);
const name = (what: string) =>
  z
    .string({ error: `${what} (text)` })
    .trim()
    .min(1, `${what} (text)`)
    .max(200, `${what} (text of at most 200 characters)`);

const stretchPoint = z.object({
  tensionKN: number("a tension ≥ 0 kN").gte(0, "a tension ≥ 0 kN"),
  elongationPct: number("an elongation ≥ 0 %").gte(0, "an elongation ≥ 0 %"),
});

/** Longest lists the engine takes: a ground profile sketched from measured heights, a stretch test's points. */
export const MAX_GROUND_POINTS = 200;
export const MAX_STRETCH_POINTS = 50;

const stretchPoints = z
  .array(stretchPoint, { error: "a list of { tensionKN, elongationPct } points" })
  .min(2, "at least two points, the first at 0 kN and 0 %")
  .max(MAX_STRETCH_POINTS, `at most ${MAX_STRETCH_POINTS} points`);

/** How far the walker's lowest point (the feet) hangs below the harness tie-in when caught: 1.2 m for an adult (a value from memory). */
export const DEFAULT_HANG_BELOW_TIE_IN_M = 1.2;

const component = z.object({
  name: name("a component name"),
  category: z.enum(COMPONENT_CATEGORIES, { error: `one of ${COMPONENT_CATEGORIES.join(", ")}` }),
  mbsN: positive("a minimum breaking strength > 0 N"),
  /** "line": carries the full line tension (master point, line lock, shackle); "leg": one bridle leg (or the single point). */
  carries: z.enum(["line", "leg"], { error: '"line" or "leg"' }),
});

const anchor = z.object({
  layout: z.discriminatedUnion(
    "kind",
    [
      z.object({ kind: z.literal("single") }),
      z.object({
        kind: z.literal("bridle"),
        includedAngleDeg: number("an included angle ≥ 0° and < 180°").gte(0, "an included angle ≥ 0° and < 180°").lt(180, "an included angle ≥ 0° and < 180°"),
      }),
    ],
    { error: "a single anchor point, or a bridle with its included angle" },
  ),
  components: z.array(component, { error: "a list of components" }).max(20, "at most 20 components").default([]),
});

const minimum = (category: keyof typeof DEFAULT_MINIMUM_FACTORS) => positive("a minimum safety factor > 0").default(DEFAULT_MINIMUM_FACTORS[category]);

/** The inputs of one rig, SI units throughout (N, m, kg) except the stretch points (kN, %), as measured. */
export const RigInputSchema = z.object({
  name: z.string().max(200, "a rig name of at most 200 characters").optional(),
  spanM: positive(`a horizontal span > 0 m and ≤ ${MAX_SPAN} m`).lte(MAX_SPAN, `a horizontal span > 0 m and ≤ ${MAX_SPAN} m`),
  /** Height of anchor B above anchor A, m (negative if B is lower). */
  heightDifferenceM: number("a height difference in m (B above A positive)").default(0),
  mainline: z.object({
    name: name("a webbing name"),
    massPerMetreKg: positive("a mass per metre > 0 kg/m"),
    mbsN: positive("a minimum breaking strength > 0 N"),
    stretchPoints,
  }),
  /**
   * A backup that rides along adds its weight; it carries no tension until the mainline fails. With its
   * stretch points and slack (its unstretched length is the mainline's plus the slack) the engine works out
   * how it catches a fall when the mainline fails.
   */
  backup: z
    .object({
      name: name("a webbing name"),
      massPerMetreKg: positive("a mass per metre > 0 kg/m"),
      mbsN: positive("a minimum breaking strength > 0 N"),
      ridesAlong: z.boolean({ error: "true or false" }),
      // An empty list is no curve (the form's table for a backup left empty).
      stretchPoints: z.preprocess((v) => (Array.isArray(v) && v.length === 0 ? undefined : v), stretchPoints.optional()),
      slackM: number("a slack from 0 m to 100 m (the backup's length over the mainline's)")
        .gte(0, "a slack from 0 m to 100 m (the backup's length over the mainline's)")
        .lte(100, "a slack from 0 m to 100 m (the backup's length over the mainline's)")
        .optional(),
    })
    .optional(),
  /** The ground under the line: distance from A and height relative to A (negative below), linear between points, level beyond the ends. */
  ground: z
    .object({
      points: z
        .array(
          z.object({
            xM: number("a distance from anchor A ≥ 0 m, within the span").gte(0, "a distance from anchor A ≥ 0 m, within the span"),
            heightM: number("a height relative to anchor A in m (negative below A)"),
          }),
          { error: "a list of { xM, heightM } points" },
        )
        .min(1, "at least one point")
        .max(MAX_GROUND_POINTS, `at most ${MAX_GROUND_POINTS} points`),
    })
    .optional(),
  /** Pretension read at one anchor with nobody on the line. */
  pretension: z.object({
    forceN: positive("a pretension > 0 N, below the mainline's MBS"),
    readAt: z.enum(["a", "b"], { error: '"a" or "b"' }),
  }),
  walker: z.object({
    massKg: positive("a mass > 0 kg"),
    /** Horizontal position from anchor A: a fraction of the span, or metres (give one; default mid-span). */
    positionFraction: number("a fraction of the span from 0 to 1")
      .gte(0, "a fraction of the span from 0 to 1")
      .lte(1, "a fraction of the span from 0 to 1")
      .optional(),
    positionM: number("a distance from anchor A ≥ 0 m, within the span").gte(0, "a distance from anchor A ≥ 0 m, within the span").optional(),
  }),
  leashFall: z.object({
    leashLengthM: number("a leash length ≥ 0 m").gte(0, "a leash length ≥ 0 m").optional(),
    harnessHeightM: number("a harness height above the line ≥ 0 m").gte(0, "a harness height above the line ≥ 0 m").optional(),
    /** Free fall before the line takes the load; default leash length + harness height. */
    fallHeightM: number("a free-fall height from 0 m to 100 m")
      .gte(0, "a free-fall height from 0 m to 100 m")
      .lte(100, "a free-fall height from 0 m to 100 m")
      .optional(),
    /** How far the walker's lowest point hangs below the harness tie-in when caught. */
    hangBelowTieInM: number("a height from 0 m to 5 m")
      .gte(0, "a height from 0 m to 5 m")
      .lte(5, "a height from 0 m to 5 m")
      .default(DEFAULT_HANG_BELOW_TIE_IN_M),
    /** Fall position as a fraction of the span from A; default the walker's position. */
    positionFraction: number("a fraction of the span from 0 to 1")
      .gte(0, "a fraction of the span from 0 to 1")
      .lte(1, "a fraction of the span from 0 to 1")
      .optional(),
  }),
  anchors: z.object({ a: anchor, b: anchor }),
  tensioning: z.object({
    /** Stage 0 pulls on the line; each further stage hauls the previous stage's tail. */
    stages: z
      .array(
        z.object({
          ratio: number("a whole number from 1 to 20")
            .int("a whole number from 1 to 20")
            .gte(1, "a whole number from 1 to 20")
            .lte(20, "a whole number from 1 to 20"),
        }),
      )
      .min(1, "at least one stage")
      .max(8, "at most 8 stages"),
    sheaveEfficiency: positive("a sheave efficiency > 0 and ≤ 1").lte(1, "a sheave efficiency > 0 and ≤ 1"),
    brake: z.discriminatedUnion(
      "on",
      [
        z.object({ on: z.literal("tail") }),
        z.object({ on: z.literal("stage"), stage: number("a stage index (0 = the stage on the line)").int("a whole stage index").gte(0, "a stage index ≥ 0") }),
      ],
      { error: '{ "on": "tail" } or { "on": "stage", "stage": index }' },
    ),
    pullPerPersonN: positive("a pull per person > 0 N"),
  }),
  brake: z.object({
    device: name("a brake device name"),
    ropeDiameterMm: positive("a rope diameter > 0 mm"),
  }),
  /** The crew's slip bench: "held" means the test stopped without a slip, so forceN is only a lower bound. */
  slipBench: z
    .array(
      z.object({
        device: name("a device name"),
        ropeDiameterMm: positive("a rope diameter > 0 mm"),
        result: z.enum(["slipped", "held"], { error: '"slipped" or "held"' }),
        forceN: positive("a force > 0 N"),
      }),
    )
    .max(200, "at most 200 slip results")
    .default([]),
  /** The crew's minimum brake margin (lowest slip ÷ force at the brake); default common practice, no source. */
  minimumBrakeMargin: positive("a minimum brake margin > 0").default(DEFAULT_MINIMUM_FACTORS.other),
  /** The crew's minimum clearance between the walker's lowest point and the ground after a fall, m. */
  minimumClearanceM: number("a minimum clearance from 0 m to 100 m")
    .gte(0, "a minimum clearance from 0 m to 100 m")
    .lte(100, "a minimum clearance from 0 m to 100 m")
    .default(DEFAULT_MINIMUM_CLEARANCE_M),
  /** The crew's minimum safety factors; defaults are common practice, no source. */
  minimumSafetyFactors: z
    .object({ webbing: minimum("webbing"), connector: minimum("connector"), sling: minimum("sling"), anchor: minimum("anchor"), other: minimum("other") })
    .prefault({}),
});

/** What the app sends (defaults optional). */
export type RigInputDraft = z.input<typeof RigInputSchema>;
/** Validated inputs, defaults filled in. */
export type RigInput = z.output<typeof RigInputSchema>;
