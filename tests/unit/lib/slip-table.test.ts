import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { buildSlipTable, cellKey, isCorrection, slipTableCsv, toSlipResults, type SlipTableTest } from "@/lib/slip-table";
import { checkBrake } from "@/physics";

const test = (id: string, deviceId: string, d: number, result: "slipped" | "held", forceN: number): SlipTableTest => ({
  id,
  deviceId,
  deviceName: deviceId === "a" ? "Alpha cam" : "Beta grip",
  ropeDiameterMm: d,
  result,
  forceN,
});

describe("buildSlipTable", () => {
  const tests = [
    test("1", "a", 10.5, "slipped", 7400),
    test("2", "a", 10.5, "slipped", 7900),
    test("3", "a", 10.5, "held", 9000),
    test("4", "a", 11, "held", 6000),
    test("5", "b", 11, "held", 5000),
    test("6", "b", 11, "held", 5500),
  ];
  const table = buildSlipTable(tests);
  const cell = (device: string, d: number) => table.cells.find((c) => cellKey(c.deviceId, c.ropeDiameterMm) === cellKey(device, d))!;

  it("gives the lowest slip, the count and the spread of the slips", () => {
    expect(cell("a", 10.5)).toMatchObject({ tests: 3, slips: 2, lowestSlipN: 7400, spreadN: 500, highestHeldN: 9000 });
  });

  it("never turns held-to results into a slip load: they stay a lower bound", () => {
    expect(cell("b", 11)).toMatchObject({ tests: 2, slips: 0, lowestSlipN: null, spreadN: null, highestHeldN: 5500 });
    expect(cell("a", 11).lowestSlipN).toBeNull();
  });

  it("lists devices by name and diameters in order", () => {
    expect(table.devices.map((d) => d.name)).toEqual(["Alpha cam", "Beta grip"]);
    expect(table.diameters).toEqual([10.5, 11]);
  });

  // Cross-check against the engine's brake check, which the planner uses on the same results.
  it("agrees with the engine's brake check on the governing load of every cell", () => {
    const results = toSlipResults(tests);
    for (const c of table.cells) {
      const name = table.devices.find((d) => d.id === c.deviceId)!.name;
      const check = checkBrake(name, c.ropeDiameterMm, results, 1000, 1, 1);
      expect(check.governingLoad).toBe(c.lowestSlipN ?? c.highestHeldN);
      expect(check.lowerBoundOnly).toBe(c.lowestSlipN === null);
    }
  });

  // Independent model: for random benches, the lowest slip is the minimum of the slipped forces of that cell.
  it("matches a brute-force minimum and maximum over random benches", () => {
    const arbitraryTest = fc.record({
      deviceId: fc.constantFrom("a", "b"),
      d: fc.constantFrom(9.5, 10, 11),
      result: fc.constantFrom("slipped" as const, "held" as const),
      forceN: fc.integer({ min: 100, max: 50000 }),
    });
    fc.assert(
      fc.property(fc.array(arbitraryTest, { maxLength: 30 }), (rows) => {
        const built = buildSlipTable(rows.map((r, i) => test(String(i), r.deviceId, r.d, r.result, r.forceN)));
        for (const c of built.cells) {
          const mine = rows.filter((r) => r.deviceId === c.deviceId && r.d === c.ropeDiameterMm);
          const slips = mine.filter((r) => r.result === "slipped").map((r) => r.forceN);
          const held = mine.filter((r) => r.result === "held").map((r) => r.forceN);
          expect(c.tests).toBe(mine.length);
          expect(c.lowestSlipN).toBe(slips.length ? Math.min(...slips) : null);
          expect(c.spreadN).toBe(slips.length > 1 ? Math.max(...slips) - Math.min(...slips) : null);
          expect(c.highestHeldN).toBe(held.length ? Math.max(...held) : null);
        }
      }),
    );
  });

  it("exports one CSV row per cell, with held-only cells giving their bound and no slip load", () => {
    expect(slipTableCsv(table, "si").split("\r\n")).toEqual([
      "device,rope_diameter_mm,tests,slips,lowest_slip_kN,slip_spread_kN,held_to_at_least_kN",
      '"Alpha cam",10.5,3,2,7.40,0.50,9.00',
      '"Alpha cam",11.0,1,0,,,6.00',
      '"Beta grip",11.0,2,0,,,5.50',
      "",
    ]);
  });

  it("exports a US crew's table in whole lbf, cut down, with the unit in each force column's name", () => {
    // 1 lbf = 4.448 221 615 260 5 N (NIST SP 811, appendix B), worked out here apart from the app's converter.
    const lbf = (newtons: number) => String(Math.floor(newtons / 4.4482216152605));
    expect(slipTableCsv(table, "us").split("\r\n")).toEqual([
      "device,rope_diameter_mm,tests,slips,lowest_slip_lbf,slip_spread_lbf,held_to_at_least_lbf",
      `"Alpha cam",10.5,3,2,${lbf(7400)},${lbf(500)},${lbf(9000)}`,
      `"Alpha cam",11.0,1,0,,,${lbf(6000)}`,
      `"Beta grip",11.0,2,0,,,${lbf(5500)}`,
      "",
    ]);
    expect(lbf(7400)).toBe("1663");
  });
});

describe("isCorrection", () => {
  it("treats unit-conversion rounding as a confirmation and anything more as a correction", () => {
    expect(isCorrection({ kind: "slipped", forceN: 8000 }, "slipped", 8000.4)).toBe(false);
    expect(isCorrection({ kind: "slipped", forceN: 8000 }, "slipped", 8100)).toBe(true);
    expect(isCorrection({ kind: "held", forceN: 8000 }, "slipped", 8000)).toBe(true);
    expect(isCorrection(null, "slipped", 8000)).toBe(false);
  });
});
