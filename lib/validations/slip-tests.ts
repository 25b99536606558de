import { z } from "zod";
import { fromNewtons, toNewtons, type ForceUnit } from "@/physics";
import { notes, pastDate } from "./kit";

// The shared schemas of the Slip bench: the forms and the route handlers validate with these.

export const FORCE_UNITS = ["N", "kN", "lbf", "kgf"] as const satisfies readonly ForceUnit[];
export const SLIP_RESULTS = ["slipped", "held"] as const;
export type SlipOutcome = (typeof SLIP_RESULTS)[number];
/** How a result reads before its force, everywhere it is written: "slipped at 7.40 kN", "held to 9.00 kN". */
export const SLIP_RESULT_WORDS: Record<SlipOutcome, string> = { slipped: "slipped at", held: "held to" };
/** The result as the form offers it. */
export const SLIP_RESULT_LABELS: Record<SlipOutcome, string> = { slipped: "Slipped at", held: "Held to (no slip)" };
/** A result with its force: "slipped at 7.40 kN"; `capital` for the start of a sentence. */
export function slipResultText(result: SlipOutcome, force: string, capital = false): string {
  const words = SLIP_RESULT_WORDS[result];
  return `${capital ? words[0].toUpperCase() + words.slice(1) : words} ${force}`;
}

/**
 * The forces a slip bench for slackline brakes and line grips measures: 0.1 kN to 50 kN (common practice,
 * no source). A value outside is almost always a wrong unit, so it is refused, not clamped.
 */
export const BENCH_FORCE_RANGE_N = { min: 100, max: 50_000 } as const;

const rangeIn = (range: { min: number; max: number }, unit: ForceUnit) => {
  const show = (n: number) => Number(fromNewtons(n, unit).toPrecision(3)).toString();
  return `${show(range.min)}–${show(range.max)} ${unit}`;
};

/** "0.1–50 kN", "22–11 240 lbf"…: the bench's range in the unit the tester works in. */
export const benchRangeIn = (unit: ForceUnit) => rangeIn(BENCH_FORCE_RANGE_N, unit);

/** The falls that may count as a slip: 5 N (above a load cell's noise) to 5 kN (common practice, no source). */
const SLIP_FALL_RANGE_N = { min: 5, max: 5000 } as const;

/** Null when a force in N is one the bench can measure; else the message saying what is allowed. */
export function benchForceProblem(forceN: number, given: string, unit: ForceUnit): string | null {
  if (forceN >= BENCH_FORCE_RANGE_N.min && forceN <= BENCH_FORCE_RANGE_N.max) return null;
  return `${given} is outside what a slip bench measures (${benchRangeIn(unit)}): check the unit.`;
}

const forceUnit = z.enum(FORCE_UNITS, { error: `Choose the force unit: ${FORCE_UNITS.join(", ")}.` });

export const SlipTestSchema = z
  .object({
    deviceModelId: z.uuid({ error: "Choose the device tested (a brake or line grip from the Kit)." }),
    ropeModelId: z.uuid({ error: "Choose a rope from the Kit, or none." }).optional(),
    ropeDiameterMm: z
      .number({ error: "Rope diameter must be a number in mm (3–25 mm)." })
      .min(3, "Rope diameter must be at least 3 mm.")
      .max(25, "Rope diameter must be at most 25 mm.")
      .refine((d) => Math.abs(d * 10 - Math.round(d * 10)) < 1e-9, "Give the rope diameter to a tenth of a millimetre at most."),
    result: z.enum(SLIP_RESULTS, { error: "Choose slipped or held." }),
    force: z.number({ error: "Force must be a number." }).positive("Force must be more than zero."),
    forceUnit,
    testedOn: pastDate("Tested on"),
    notes: notes(),
    traceUploadId: z.uuid({ error: "The trace reference is not valid: upload the trace again." }).optional(),
  })
  .superRefine((test, ctx) => {
    const problem = benchForceProblem(toNewtons(test.force, test.forceUnit), `${test.force} ${test.forceUnit}`, test.forceUnit);
    if (problem) ctx.addIssue({ code: "custom", path: ["force"], message: problem });
  });
export type SlipTestInput = z.input<typeof SlipTestSchema>;
export type SlipTest = z.output<typeof SlipTestSchema>;

/**
 * How a trace is to be read: the force unit of its force column, the drop that counts as a slip (in
 * that unit), and when the pull ended, so that the release after it is not taken for a slip.
 */
export const TraceOptionsSchema = z
  .object({
    unit: forceUnit,
    drop: z.number({ error: "Fall that counts as a slip: enter a number." }).positive("Fall that counts as a slip: it must be more than zero."),
    pullEndS: z
      .number({ error: "Pull ended at: enter a number of seconds, or leave it blank." })
      .positive("Pull ended at: it must be more than 0 s.")
      .optional(),
  })
  .superRefine((options, ctx) => {
    const dropN = toNewtons(options.drop, options.unit);
    if (dropN < SLIP_FALL_RANGE_N.min || dropN > SLIP_FALL_RANGE_N.max) {
      ctx.addIssue({
        code: "custom",
        path: ["drop"],
        message: `Fall that counts as a slip: ${options.drop} ${options.unit} is outside ${rangeIn(SLIP_FALL_RANGE_N, options.unit)}, where it would catch noise or miss a slip; check the unit.`,
      });
    }
  });
export type TraceOptions = z.output<typeof TraceOptionsSchema>;

/** The default drop, 200 N, in each unit (a few times a bench load cell's noise: common practice, no source). */
export const DEFAULT_DROP: Record<ForceUnit, number> = { N: 200, kN: 0.2, lbf: 45, kgf: 20 };
