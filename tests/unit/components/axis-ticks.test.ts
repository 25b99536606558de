import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { axisTicks } from "@/components/charts/scale";

const texts = (min: number, max: number, count?: number) => axisTicks(min, max, count).map((t) => t.text);

describe("axis ticks", () => {
  // Round steps of 1, 2 or 5 times a power of ten (common practice of chart axes, no source); the lists are written out by hand.
  it("steps by 1, 2 or 5 times a power of ten, each tick with the decimals its step needs", () => {
    expect(texts(0, 60)).toEqual(["0", "20", "40", "60"]);
    expect(texts(0, 9.9)).toEqual(["0", "2", "4", "6", "8"]);
    expect(texts(0, 1)).toEqual(["0.0", "0.2", "0.4", "0.6", "0.8", "1.0"]);
    expect(texts(0, 0.35, 7)).toEqual(["0.00", "0.05", "0.10", "0.15", "0.20", "0.25", "0.30", "0.35"]);
    expect(texts(7400, 9900)).toEqual(["7500", "8000", "8500", "9000", "9500"]);
  });

  it("never shows -0 or float noise", () => {
    expect(texts(-0.004, 0.9)).toEqual(["0.0", "0.2", "0.4", "0.6", "0.8"]);
    expect(axisTicks(-0.004, 0.9)[0].value).toBe(0);
    expect(Object.is(axisTicks(-0.004, 0.9)[0].value, -0)).toBe(false);
    expect(axisTicks(0, 0.35, 7).map((t) => t.value)).toContain(0.3);
    expect(axisTicks(-1.5, 1.5, 6).map((t) => t.text)).toEqual(["-1.5", "-1.0", "-0.5", "0.0", "0.5", "1.0", "1.5"]);
  });

  it("gives one tick for an empty range and none for a range that is not a number", () => {
    expect(axisTicks(5, 5)).toEqual([{ value: 5, text: "5" }]);
    expect(axisTicks(Number.NaN, 1)).toEqual([]);
  });

  it("for any range: ticks inside it, evenly spaced to the digit, each text reading as its value", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.double({ min: 1e-3, max: 1e6, noNaN: true }), (min, width) => {
        const ticks = axisTicks(min, min + width);
        expect(ticks.length).toBeGreaterThanOrEqual(2);
        expect(ticks.length).toBeLessThanOrEqual(11);
        const decimals = ticks[0].text.split(".")[1]?.length ?? 0;
        // The texts as integers of the last decimal: equal gaps, checked exactly with BigInt (no float in the check).
        const scaled = ticks.map((t) => BigInt(t.text.replace(".", "")));
        const gaps = scaled.slice(1).map((s, i) => s - scaled[i]);
        expect(new Set(gaps.map(String)).size).toBe(1);
        for (const t of ticks) {
          expect(t.text.split(".")[1]?.length ?? 0).toBe(decimals);
          expect(t.text.startsWith("-0") && Number(t.text) === 0).toBe(false);
          expect(Number(t.text)).toBe(t.value);
          expect(t.value).toBeGreaterThanOrEqual(min - width * 1e-9);
          expect(t.value).toBeLessThanOrEqual(min + width + width * 1e-9);
        }
      }),
    );
  });
});
