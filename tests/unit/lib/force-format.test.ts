import { describe, expect, it } from "vitest";
import { forceDigits, forceIn, formatForce } from "@/lib/force-format";

describe("formatForce", () => {
  it("shows whole newtons in plain digits, never in exponent form", () => {
    expect(formatForce(12345, "N")).toBe("12345 N");
    expect(formatForce(5000, "N")).toBe("5000 N");
  });

  it("cuts a load down at the shown precision and never rounds it up (a slip load is a capacity)", () => {
    expect(formatForce(4309.9, "kN")).toBe("4.30 kN");
    expect(formatForce(12345.9, "N")).toBe("12345 N");
    expect(forceIn(4309.9, "kN")).toBe(4.3);
  });

  it("keeps an exact value exact through the binary fraction", () => {
    expect(formatForce(4300, "kN")).toBe("4.30 kN");
    expect(formatForce(1150, "kN")).toBe("1.15 kN");
    expect(formatForce(290, "kN")).toBe("0.29 kN");
    expect(forceDigits(5000, "kN")).toBe("5.00");
  });

  // NIST SP 811 (2008), appendix B: 1 lbf = 4.448 221 615 260 5 N; 1 kgf = 9.806 65 N.
  it("converts with the NIST SP 811 factors", () => {
    expect(formatForce(4.4482216152605 * 2000, "lbf")).toBe("2000 lbf");
    expect(formatForce(9.80665 * 500, "kgf")).toBe("500 kgf");
  });
});
