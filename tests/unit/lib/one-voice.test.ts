import { describe, expect, it } from "vitest";
import example from "@/physics/examples/quarry-highline.json";
import {
  anchorWarnings,
  capacityText,
  checkBrake,
  evaluateRig,
  factorText,
  loadText,
  safetyFactors,
  DEFAULT_MINIMUM_FACTORS,
  type DisplayUnits,
} from "@/physics";
import { specDigits, specText } from "@/components/kit/spec-summary";
import { capacityInUnit, inputFigureDigits, stretchTensionText, massPerLengthText } from "@/lib/figures";
import { forceUnitOf } from "@/physics";
import { formatClearance, formatDepth, formatQuantity } from "@/lib/rig-form/format";
import { labelOf } from "@/lib/planner/fields";
import { rigCardContent } from "@/lib/rig-card/content";
import { slipTableCsv } from "@/lib/slip-table";

// One figure, one text: the same force fed through every path that shows it (the engine's brake sentence and
// warnings, the rig page, the planner's generic formatter, the Kit, the Slip bench, the CSV, the rig card) reads
// alike, loads rounded up and capacities cut down. Every expected text is hand-worked: 1 kN = 1000 N, and
// 1 lbf = 4.448 221 615 260 5 N by definition (NIST SP 811, appendix B), so e.g. 1150 N ÷ 4.448 221 615 260 5 = 258.53 lbf.
const LBF = 4.4482216152605;

interface Case {
  why: string;
  newtons: number;
  si: { load: string; capacity: string };
  us: { load: string; capacity: string };
}

const CASES: Case[] = [
  { why: "1150 N = 1.15 kN exactly (258.53 lbf)", newtons: 1150, si: { load: "1.15 kN", capacity: "1.15 kN" }, us: { load: "259 lbf", capacity: "258 lbf" } },
  { why: "2450 N = 2.45 kN exactly (550.78 lbf)", newtons: 2450, si: { load: "2.45 kN", capacity: "2.45 kN" }, us: { load: "551 lbf", capacity: "550 lbf" } },
  { why: "2000 N = 2.00 kN = 449.618 lbf", newtons: 2000, si: { load: "2.00 kN", capacity: "2.00 kN" }, us: { load: "450 lbf", capacity: "449 lbf" } },
  {
    why: "1150.01 N, just above a step (1.15001 kN)",
    newtons: 1150.01,
    si: { load: "1.16 kN", capacity: "1.15 kN" },
    us: { load: "259 lbf", capacity: "258 lbf" },
  },
  {
    why: "1149.99 N, just below a step (1.14999 kN)",
    newtons: 1149.99,
    si: { load: "1.15 kN", capacity: "1.14 kN" },
    us: { load: "259 lbf", capacity: "258 lbf" },
  },
  {
    why: "2000 lbf exactly, stored in newtons (8896.443 N)",
    newtons: 2000 * LBF,
    si: { load: "8.90 kN", capacity: "8.89 kN" },
    us: { load: "2000 lbf", capacity: "2000 lbf" },
  },
  {
    why: "2000 lbf + 0.01 N (2000.0022 lbf)",
    newtons: 2000 * LBF + 0.01,
    si: { load: "8.90 kN", capacity: "8.89 kN" },
    us: { load: "2001 lbf", capacity: "2000 lbf" },
  },
  {
    why: "2000 lbf − 0.01 N (1999.9978 lbf)",
    newtons: 2000 * LBF - 0.01,
    si: { load: "8.90 kN", capacity: "8.89 kN" },
    us: { load: "2000 lbf", capacity: "1999 lbf" },
  },
];

const digitsOf = (text: string) => text.split(" ")[0];
const base = evaluateRig(example);

/** The rig card's rows for a result whose brake figures are `newtons`. */
function cardRows(newtons: number, units: DisplayUnits) {
  const result = { ...base, brake: { ...base.brake, brakeForce: newtons, highestLineTensionHeld: newtons, lowerBoundOnly: false } };
  const revision = { number: 1, state: "draft" as const, authorName: "Sol Varga", createdAt: "2026-12-01T09:30:00.000Z", engineVersion: result.engineVersion };
  const content = rigCardContent({
    rigName: "Foxglove gap",
    siteName: null,
    revision: { ...revision, inputs: example as Record<string, unknown>, result },
    signOff: null,
    standing: null,
    units,
    rigUrl: "http://127.0.0.1:3000/rigs/r",
  });
  return Object.fromEntries(content.sections.flatMap((s) => s.rows.map((r) => [r.label, r.value])));
}

describe("one way to show a force, through every path", () => {
  for (const c of CASES) {
    for (const units of ["si", "us"] as const) {
      const { load, capacity } = c[units];
      it(`${c.why}, ${units.toUpperCase()}: a load reads ${load}, a capacity ${capacity}`, () => {
        const v = c.newtons;
        // The formatters themselves: the engine's (rig page) and the planner's generic one (rig card, readings).
        expect(loadText(v, units)).toBe(load);
        expect(formatQuantity(v, "force", units, "up")).toBe(load);
        expect(capacityText(v, units)).toBe(capacity);
        expect(formatQuantity(v, "force", units, "down")).toBe(capacity);
        // The engine's brake sentence: v at the brake (slip far above), then v as the lowest measured slip.
        const asLoad = checkBrake(
          "Toothed cam brake",
          11,
          [{ device: "Toothed cam brake", ropeDiameterMm: 11, result: "slipped", forceN: v * 10 }],
          v,
          1,
          1.5,
          units,
        );
        expect(asLoad.message).toContain(`holds: ${load} at the brake`);
        const asCapacity = checkBrake(
          "Toothed cam brake",
          11,
          [{ device: "Toothed cam brake", ropeDiameterMm: 11, result: "slipped", forceN: v }],
          v / 2,
          1,
          1.5,
          units,
        );
        expect(asCapacity.message).toContain(`lowest measured slip of ${capacity}`);
        // The engine's warning on a wide bridle: v on each leg.
        expect(anchorWarnings("a", { kind: "bridle", includedAngleDeg: 100 }, 1, { masterPoint: 1.5 * v, leg: v, legs: 2 }, units)[0]).toContain(
          `puts ${load} on each leg`,
        );
        // The Kit (an MBS kept in kN) and the Slip bench (a slip load as recorded, in the crew's unit).
        expect(specText("mbsKN", v / 1000, units)).toBe(capacity);
        expect(capacityInUnit(v, forceUnitOf(units))).toBe(capacity);
        // The planner's box filled from the Kit reads as the Kit's own box: cut down in lbf, as given in kN.
        expect(inputFigureDigits(v, "force", units)).toBe(specDigits("mbsKN", v / 1000, units));
        if (units === "us") expect(inputFigureDigits(v, "force", units)).toBe(digitsOf(capacity));
        // The slip table's CSV: the lowest slip's digits, unit in the header.
        const csv = slipTableCsv(
          {
            devices: [{ id: "d", name: "Toothed cam brake" }],
            diameters: [11],
            cells: [{ deviceId: "d", ropeDiameterMm: 11, tests: 1, slips: 1, lowestSlipN: v, spreadN: null, highestHeldN: null }],
          },
          units,
        );
        expect(csv.split("\r\n")[1].split(",")[4]).toBe(digitsOf(capacity));
        // The rig card (PDF and print page).
        const rows = cardRows(v, units);
        expect(rows["Force at the brake at peak tension"]).toBe(load);
        expect(rows["Highest line tension the brake holds"]).toBe(capacity);
      });
    }
  }

  it("words the engine's sentences in the crew's units, its figures staying in newtons", () => {
    const us = evaluateRig(example, { units: "us" });
    expect(us.brake.brakeForce).toBe(base.brake.brakeForce);
    expect(us.brake.message).toContain(loadText(us.brake.brakeForce, "us"));
    expect(us.brake.message).not.toMatch(/kN/);
    expect(base.brake.message).toContain(loadText(base.brake.brakeForce, "si"));
  });
});

describe("one way to show a factor, a length and a stretch point", () => {
  // MBS 3450 N over 1150 N is 3 (hand-worked); 3449.99 N over 1150 N is 2.99999 (hand-worked).
  const factor = (mbs: number) =>
    safetyFactors([{ name: "Tubular webbing", category: "webbing", location: "line", mbs, peakLoad: 1150 }], DEFAULT_MINIMUM_FACTORS)[0];
  it("cuts a factor down, and the check reads it as it is shown", () => {
    expect(factor(3450).shown).toBe("3.00");
    expect(factor(3449.99).shown).toBe("2.99");
    expect(factorText(3449.99 / 1150)).toBe("2.99");
    const minimum = DEFAULT_MINIMUM_FACTORS.webbing;
    for (const mbs of [3450, 3449.99, minimum * 1150, minimum * 1150 - 0.01]) {
      const f = factor(mbs);
      expect(f.passes).toBe(Number(f.shown) >= minimum);
    }
  });

  it("rounds a sag up and a clearance down, in metres or feet", () => {
    // 1.15 m ÷ 0.3048 m/ft = 3.773 ft (1 ft = 0.3048 m exactly, NIST SP 811).
    expect(formatDepth(1.15, "si")).toBe("1.15 m");
    expect(formatClearance(1.15, "si")).toBe("1.15 m");
    expect(formatDepth(1.15, "us")).toBe("3.8 ft");
    expect(formatClearance(1.15, "us")).toBe("3.7 ft");
  });

  it("shows a stretch point to the nearest pound-force, never 449.618 lbf, wherever it appears", () => {
    // 2 kN = 2000 ÷ 4.448 221 615 260 5 = 449.618 lbf (NIST SP 811).
    expect(stretchTensionText(2, "us")).toBe("450 lbf");
    expect(inputFigureDigits(2, "stretchTension", "us")).toBe("450");
    expect(stretchTensionText(2, "si")).toBe("2 kN");
  });

  it("names a mass per length by the crew's units", () => {
    // 48 g/m = 0.048 kg/m × 2.20462 lb/kg × 16 oz/lb × 0.3048 m/ft = 0.516 oz/ft (NIST SP 811 factors).
    expect(massPerLengthText(48, "us")).toBe("0.52 oz/ft");
    expect(inputFigureDigits(0.048, "massPerLength", "us")).toBe("0.52");
    expect(labelOf("mainline.massPerMetreKg", "us")).toBe("Mainline mass per foot");
    expect(labelOf("mainline.massPerMetreKg", "si")).toBe("Mainline mass per metre");
  });
});
