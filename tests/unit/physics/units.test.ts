import { unit } from "mathjs";
import { describe, expect, it } from "vitest";
import { fromKilograms, fromMetres, fromNewtons, STANDARD_GRAVITY, toKilograms, toMetres, toNewtons } from "../../../physics";

describe("units", () => {
  it("uses the NIST SP 811 definitions of lbf and standard gravity", () => {
    // NIST SP 811 (2008), appendix B.8: 1 lbf = 4.448 221 615 260 5 N; standard gravity 9.806 65 m/s²
    expect(toNewtons(1, "lbf")).toBe(4.4482216152605);
    expect(STANDARD_GRAVITY).toBe(9.80665);
    expect(toNewtons(1, "kgf")).toBe(9.80665);
    // NIST SP 811: 1 ft = 0.3048 m, 1 lb = 0.453 592 37 kg (exact)
    expect(toMetres(1, "ft")).toBe(0.3048);
    expect(toKilograms(1, "lb")).toBe(0.45359237);
  });

  it("agrees with mathjs units (a general-purpose reference library)", () => {
    for (const [value, u] of [
      [3.2, "kN"],
      [750, "lbf"],
      [120, "kgf"],
      [5, "N"],
    ] as const) {
      expect(toNewtons(value, u)).toBeCloseTo(unit(value, u).toNumber("N"), 9);
    }
    expect(toMetres(400, "ft")).toBeCloseTo(unit(400, "ft").toNumber("m"), 12);
    expect(toKilograms(176, "lb")).toBeCloseTo(unit(176, "lb").toNumber("kg"), 12);
  });

  it("round-trips each conversion", () => {
    expect(fromNewtons(toNewtons(2.5, "kN"), "kN")).toBeCloseTo(2.5, 14);
    expect(fromNewtons(toNewtons(900, "lbf"), "lbf")).toBeCloseTo(900, 10);
    expect(fromMetres(toMetres(328, "ft"), "ft")).toBeCloseTo(328, 10);
    expect(fromKilograms(toKilograms(180, "lb"), "lb")).toBeCloseTo(180, 10);
  });
});
