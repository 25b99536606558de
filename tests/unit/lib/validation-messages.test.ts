import { messageInUnits } from "@/lib/rig-form/quantities";
import { describe, expect, it } from "vitest";
import type { ZodType } from "zod";
import * as account from "@/lib/validations/account";
import * as crew from "@/lib/validations/crew";
import * as kit from "@/lib/validations/kit";
import * as slip from "@/lib/validations/slip-tests";
import { fieldErrorsOf, invalidInput } from "@/lib/http-errors";
import { rigInputProblem } from "@/lib/planner/problems";
import example from "@/physics/examples/quarry-highline.json";
import { evaluateRig, RigInputError } from "@/physics";

// Every message a schema gives is read by a person beside the field it names: it names the field as the form
// labels it, says what is allowed, and never falls back to the library's own words, a field path or a raw value.
const LIBRARY_WORDS = /Invalid input|expected \w+, received|Too (small|big)|Unrecognized|Invalid (option|string|uuid|date)|got (null|undefined)/;
const RAW = /\bundefined\b|\bnull\b|\bNaN\b|\[object Object\]|specs\.[a-z]|stretchPoints|[a-z]+[A-Z][a-z]+(Mm|KN|G|Pct|Id)\b/;
const BAD_VALUES = [undefined, null, 42, -1, 0, Number.NaN, "", "x", "2999-01-01", true, {}, [], [{}]];

const SCHEMAS: Record<string, ZodType> = {
  ...Object.fromEntries(Object.entries({ ...account, ...crew, ...slip, ...kit }).filter(([name]) => name.endsWith("Schema") && name !== "GearModelSchema")),
  "GearModelSchema.si": kit.GearModelSchema.si,
  "GearModelSchema.us": kit.GearModelSchema.us,
} as Record<string, ZodType>;

const VALID_SPECS: Record<kit.GearKind, Record<string, unknown>> = {
  webbing: {
    widthMm: 25,
    massPerMetreG: 48,
    mbsKN: 32,
    stretchPoints: [
      { tensionKN: 0, elongationPct: 0 },
      { tensionKN: 5, elongationPct: 4 },
    ],
  },
  rope: {
    diameterMm: 11,
    construction: "static",
    mbsKN: 30,
    massPerMetreG: 78,
    stretchPoints: [
      { tensionKN: 0, elongationPct: 0 },
      { tensionKN: 1, elongationPct: 1 },
    ],
  },
  brake: { minRopeMm: 9, maxRopeMm: 12, mbsKN: 22 },
  line_grip: { minRopeMm: 9, maxRopeMm: 12, mbsKN: 15 },
  pulley: { sheaveDiameterMm: 50, efficiency: 0.93, mbsKN: 36 },
  connector: { mbsKN: 60 },
  sling: { mbsKN: 40 },
  other: {},
};

/** Every message the schema gives for a body with `bad` at `path` (dotted), the rest of the body left as `base`. */
function messagesAt(schema: ZodType, base: Record<string, unknown>, path: string, bad: unknown): string[] {
  const body = structuredClone(base);
  const keys = path.split(".");
  let node: Record<string, unknown> = body;
  for (const key of keys.slice(0, -1)) node = (node[key] ??= {}) as Record<string, unknown>;
  node[keys[keys.length - 1]] = bad;
  const result = schema.safeParse(body);
  return result.success ? [] : result.error.issues.map((i) => i.message);
}

function pathsOf(value: unknown, prefix = ""): string[] {
  if (value === null || typeof value !== "object") return [prefix];
  return Object.entries(value).flatMap(([key, inner]) => [
    prefix + key,
    ...(typeof inner === "object" && inner !== null ? pathsOf(inner, `${prefix}${key}.`) : []),
  ]);
}

describe("every message of every form's schema", () => {
  const FIELDS = [
    "email",
    "password",
    "name",
    "token",
    "role",
    "crewId",
    "currentPassword",
    "newPassword",
    "units",
    "minSafetyFactors",
    "minSafetyFactors.webbing",
    "allowSelfSignOff",
    "label",
    "modelId",
    "inServiceSince",
    "notes",
    "retiredOn",
    "reason",
    "inspectedOn",
    "result",
    "deviceModelId",
    "ropeModelId",
    "ropeDiameterMm",
    "force",
    "forceUnit",
    "testedOn",
    "traceUploadId",
    "unit",
    "drop",
    "pullEndS",
  ];
  for (const [name, schema] of Object.entries(SCHEMAS)) {
    it(`${name}: plain words for every bad value of every field`, () => {
      const seen: string[] = [];
      for (const field of FIELDS) for (const bad of BAD_VALUES) seen.push(...messagesAt(schema, {}, field, bad));
      for (const bad of BAD_VALUES) {
        const whole = schema.safeParse(bad);
        if (!whole.success) seen.push(...Object.values(fieldErrorsOf(whole.error)));
      }
      expect(seen.filter((m) => LIBRARY_WORDS.test(m) || RAW.test(m))).toEqual([]);
    });
  }

  for (const units of ["si", "us"] as const) {
    it(`GearModelSchema.${units}: plain words for every bad value at every spec of every kind`, () => {
      const seen: string[] = [];
      for (const kind of kit.GEAR_KINDS) {
        const base = { kind, name: "Test gear", notes: "", specs: VALID_SPECS[kind] };
        for (const path of ["kind", "name", "notes", "specs", ...pathsOf(VALID_SPECS[kind], "specs.")]) {
          for (const bad of BAD_VALUES) seen.push(...messagesAt(kit.GearModelSchema[units], base, path, bad));
        }
      }
      expect(seen.filter((m) => LIBRARY_WORDS.test(m) || RAW.test(m))).toEqual([]);
    });
  }
});

describe("the Kit's messages in the crew's units", () => {
  const model = (units: "si" | "us", specs: Record<string, unknown>) =>
    kit.GearModelSchema[units].safeParse({ kind: "webbing", name: "Test webbing", specs: { ...VALID_SPECS.webbing, ...specs } });
  const first = (result: ReturnType<typeof model>, path: string) => (result.success ? undefined : fieldErrorsOf(result.error)[path]);

  it("names the field as its form labels it and gives the range in SI", () => {
    expect(first(model("si", { widthMm: 2500 }), "specs.widthMm")).toBe("Width must be at most 60 mm (allowed 10–60 mm).");
    expect(first(model("si", { mbsKN: undefined }), "specs.mbsKN")).toBe("MBS is required (0.5–300 kN).");
    expect(first(model("si", { massPerMetreG: "heavy" }), "specs.massPerMetreG")).toBe("Mass per metre must be a number (5–1000 g/m).");
  });

  // 300 kN = 67 443.1 lbf; 0.5 kN = 112.4 lbf (1 lbf = 4.448 221 615 260 5 N, NIST SP 811); 1000 g/m = 10.752 oz/ft and
  // 5 g/m = 0.053 76 oz/ft (1 oz = 28.349 523 125 g, 1 ft = 0.3048 m, NIST SP 811). Limits are rounded inward to three figures.
  it("gives a US crew its limits in lbf and oz/ft, rounded inward so that every value it allows is allowed", () => {
    expect(first(model("us", { mbsKN: 400 }), "specs.mbsKN")).toBe("MBS must be at most 67400 lbf (allowed 113–67400 lbf).");
    expect(first(model("us", { massPerMetreG: 2000 }), "specs.massPerMetreG")).toBe("Mass per foot must be at most 10.7 oz/ft (allowed 0.0538–10.7 oz/ft).");
  });

  it("words the stretch points' rules in the crew's force unit", () => {
    const falling = [
      { tensionKN: 0, elongationPct: 0 },
      { tensionKN: 2, elongationPct: 2 },
      { tensionKN: 1, elongationPct: 3 },
    ];
    expect(first(model("si", { stretchPoints: falling }), "specs.stretchPoints.2.tensionKN")).toBe("Tension must rise from point to point (more than 2 kN).");
    // 2 kN = 449.6 lbf: the previous point as the crew reads it, in whole lbf.
    expect(first(model("us", { stretchPoints: falling }), "specs.stretchPoints.2.tensionKN")).toBe(
      "Tension must rise from point to point (more than 450 lbf).",
    );
    expect(first(model("us", { stretchPoints: [{ tensionKN: 1, elongationPct: 1 }, falling[1]] }), "specs.stretchPoints.0.tensionKN")).toBe(
      "The first stretch point is the origin: 0 lbf at 0 %.",
    );
  });

  it("shows a pulley's efficiency in per cent", () => {
    const pulley = kit.GearModelSchema.si.safeParse({ kind: "pulley", name: "Test", specs: { ...VALID_SPECS.pulley, efficiency: 92 } });
    expect(pulley.success ? null : fieldErrorsOf(pulley.error)["specs.efficiency"]).toBe("Efficiency must be at most 100 % (allowed 50–100 %).");
  });

  it("keeps a value in the unit the crew reads it in exactly as typed (no conversion noise)", () => {
    for (const value of [0.1, 39, 48.3, 1000]) expect(kit.keptMeasure("massPerMetreG", value, "si")).toBe(value);
    // 7194 lbf typed by a US crew is kept as 32.000… kN (NIST SP 811 factor), and reads 7194 lbf again.
    expect(kit.shownMeasure("mbsKN", kit.keptMeasure("mbsKN", 7194, "us"), "us")).toBeCloseTo(7194, 9);
  });
});

describe("other forms' messages", () => {
  it("names the crew's safety-factor field as the settings form labels it", () => {
    const result = crew.CrewSettingsSchema.safeParse({
      units: "si",
      minSafetyFactors: { webbing: 0.5, rope: 3, anchor: 3, connector: 3, sling: 3, pulley: 3, brake: "three" },
      minClearanceM: -1,
      allowSelfSignOff: false,
    });
    const errors = result.success ? {} : fieldErrorsOf(result.error);
    expect(errors.minClearanceM).toBe("Minimum clearance below a fall: from 0 m to 100 m.");
    // The settings form shows it in the crew's units (100 m = 328.084 ft, NIST SP 811: 1 ft = 0.3048 m).
    expect(messageInUnits(errors.minClearanceM, "length", "us")).toBe("Minimum clearance below a fall: from 0 ft to 328.084 ft.");
    expect(errors["minSafetyFactors.webbing"]).toBe("Webbing (mainline and backup): the minimum safety factor must be at least 1.5 (allowed 1.5–20).");
    expect(errors["minSafetyFactors.brake"]).toBe("Brake: enter a minimum safety factor from 1.5 to 20.");
  });

  it("refuses an item label that is missing or too long, naming the field", () => {
    const result = kit.GearItemSchema.safeParse({ modelId: "x", label: "y".repeat(61), inServiceSince: "2026-01-01" });
    const errors = result.success ? {} : fieldErrorsOf(result.error);
    expect(errors.label).toBe("Serial or label: at most 60 characters.");
    expect(errors.modelId).toBe("Choose the gear model this item is.");
    expect(kit.duplicateLabelMessage("TW-01")).toMatch(/already labelled "TW-01"/);
  });

  it("says why a body that is no form at all was refused, with the schema's words and no field path", () => {
    const notAnObject = account.SignInSchema.safeParse(42);
    expect(notAnObject.success ? null : invalidInput(notAnObject.error).message).toBe("Nothing was saved. Send the form's fields as a JSON object.");
    const badFields = account.SignUpSchema.safeParse({ name: "", email: "not-mail", password: "short" });
    expect(badFields.success ? null : invalidInput(badFields.error).message).toBe(
      "Nothing was saved. Enter your name. That is not an e-mail address: use the form name@example.org. Use at least 10 characters.",
    );
  });
});

describe("the engine's refusals as the planner shows them", () => {
  // Every field of a worked rig given every bad value, and the engine's own cross-field refusals; the sentence beside
  // the field names it as the form labels it, in the crew's units, never by its path, an SI amount or the library's words.
  const PATH = /\b[a-z]+(\.[a-z]+|\.\d+)*\.[a-z]+[A-Z]\w*|[a-z]+[A-Z][a-z]+(M|N|Kg|KN|Mm|Deg|Fraction|Pct|Id)\b/;
  const SI_AMOUNT = /\d ?(N|kN|m|kg|kg\/m)(?![A-Za-z/])/;
  const refusalOf = (input: unknown) => {
    try {
      evaluateRig(input);
    } catch (error) {
      if (error instanceof RigInputError) return error;
    }
    return null;
  };
  const cases: unknown[] = [];
  for (const path of pathsOf(example)) {
    for (const bad of BAD_VALUES) {
      const body = structuredClone(example) as Record<string, unknown>;
      const keys = path.split(".");
      let node = body;
      for (const key of keys.slice(0, -1)) node = node[key] as Record<string, unknown>;
      node[keys[keys.length - 1]] = bad;
      cases.push(body);
    }
  }
  // Refusals that compare two fields: a height difference beyond the span, a pretension at the MBS, a fall at an anchor.
  cases.push({ ...example, heightDifferenceM: example.spanM + 1 });
  cases.push({ ...example, pretension: { ...example.pretension, forceN: example.mainline.mbsN } });
  cases.push({ ...example, leashFall: { ...example.leashFall, positionFraction: 0 } });

  for (const units of ["si", "us"] as const) {
    it(`${units.toUpperCase()}: every refusal in the form's words`, () => {
      const refusals = cases.map(refusalOf).filter((e): e is RigInputError => e !== null);
      expect(refusals.length).toBeGreaterThan(100);
      const bad = refusals
        .map((e) => rigInputProblem(e, units).sentence)
        .filter((s) => LIBRARY_WORDS.test(s) || RAW.test(s) || PATH.test(s) || (units === "us" && SI_AMOUNT.test(s)));
      expect([...new Set(bad)]).toEqual([]);
    });
  }

  it("says what is allowed in the crew's units (hand-worked: 0.5 of a 200 m span is 100 m = 328.084 ft, 1 ft = 0.3048 m, NIST SP 811)", () => {
    const error = refusalOf({ ...example, heightDifferenceM: example.spanM + 1 })!;
    expect(rigInputProblem(error, "si").sentence).toBe(
      `Height of B above A: allowed is a height difference no larger than the span (|h| ≤ ${example.spanM} m).`,
    );
    expect(rigInputProblem(error, "us").sentence).toMatch(
      /^Height of B above A: allowed is a height difference no larger than the span \(\|h\| ≤ [\d.]+ ft\)\.$/,
    );
  });
});
