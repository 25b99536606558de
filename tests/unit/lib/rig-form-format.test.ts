import { capacityText, factorText, loadText, roundTowards } from "@/physics";
import { describe, expect, it } from "vitest";
import { formatDepth, formatDistance } from "@/lib/rig-form/format";

describe("figures are rounded only in the safe direction", () => {
  it("never rounds a failing factor or a margin up (the brief's example: 2.99 stays below 3)", () => {
    expect(factorText(2.999)).toBe("2.99");
    expect(factorText(2.9999999, 1)).toBe("2.9");
    expect(factorText(3)).toBe("3.00");
  });

  it("is not pushed a whole step by float noise", () => {
    // 4.39 * 100 is 438.99999999999994 in binary floating point; 0.1 + 0.2 is 0.30000000000000004.
    expect(roundTowards(4.39, 2, "up")).toBe(4.39);
    expect(roundTowards(0.1 + 0.2, 2, "up")).toBe(0.3);
    expect(roundTowards(0.29, 2, "down")).toBe(0.29);
  });

  it("rounds loads and sags up, capacities down", () => {
    expect(loadText(4384, "si")).toBe("4.39 kN");
    expect(capacityText(4389, "si")).toBe("4.38 kN");
    expect(formatDepth(5.381, "si")).toBe("5.39 m");
    // 1000 N = 224.81 lbf (NIST SP 811: 1 lbf = 4.448 221 615 260 5 N)
    expect(loadText(1000, "us")).toBe("225 lbf");
    expect(capacityText(1000, "us")).toBe("224 lbf");
    // 5.381 m = 17.654 ft (1 ft = 0.3048 m exactly, NIST SP 811)
    expect(formatDepth(5.381, "us")).toBe("17.7 ft");
  });

  it("gives positions to the nearest step", () => {
    expect(formatDistance(60, "si")).toBe("60.00 m");
    expect(formatDistance(60, "us")).toBe("196.9 ft"); // 60 m = 196.85 ft (1 ft = 0.3048 m exactly, NIST SP 811)
  });
});
