import { describe, expect, it } from "vitest";
import { unit } from "mathjs";
import { fromShown, inputText, messageInUnits, parseTyped, toShown, unitLabel } from "@/lib/rig-form/quantities";

// Reference for every conversion: mathjs units (a general-purpose library from the registry), whose
// definitions follow NIST SP 811 (1 lbf = 4.448 221 615 260 5 N, 1 ft = 0.3048 m, 1 lb = 0.453 592 37 kg).
const mathjs = (value: number, from: string, to: string) => unit(value, from).toNumber(to);

describe("the form's values shown in the crew's units", () => {
  it("shows forces in kN (SI) and lbf (US); NIST SP 811 via mathjs", () => {
    expect(unitLabel("force", "si")).toBe("kN");
    expect(toShown(3500, "force", "si")).toBeCloseTo(3.5, 12);
    expect(unitLabel("force", "us")).toBe("lbf");
    expect(toShown(3500, "force", "us")).toBeCloseTo(mathjs(3500, "N", "lbf"), 9);
  });

  it("shows stretch-point tensions (kept in kN) in lbf for a US crew; NIST SP 811 via mathjs", () => {
    expect(toShown(2, "stretchTension", "si")).toBe(2);
    expect(toShown(2, "stretchTension", "us")).toBeCloseTo(mathjs(2, "kN", "lbf"), 9);
  });

  it("shows lengths, masses and webbing mass per length; NIST SP 811 via mathjs", () => {
    expect(toShown(120, "length", "us")).toBeCloseTo(mathjs(120, "m", "ft"), 9);
    expect(toShown(75, "mass", "us")).toBeCloseTo(mathjs(75, "kg", "lb"), 9);
    expect(toShown(0.045, "massPerLength", "si")).toBeCloseTo(45, 12);
    expect(unitLabel("massPerLength", "us")).toBe("oz/ft");
    expect(toShown(0.045, "massPerLength", "us")).toBeCloseTo(unit(0.045, "kg/m").toNumber("oz/ft"), 9);
  });

  it("shows fractions as per cent and leaves plain numbers alone", () => {
    expect(toShown(0.92, "fraction", "us")).toBeCloseTo(92, 12);
    expect(toShown(11, "plain", "us")).toBe(11);
    expect(unitLabel("plain", "si")).toBe("");
  });

  it("takes back what it shows, for every kind and both unit systems", () => {
    for (const units of ["si", "us"] as const) {
      for (const kind of ["force", "stretchTension", "length", "mass", "massPerLength", "fraction", "plain"] as const) {
        expect(fromShown(toShown(1234.5, kind, units), kind, units)).toBeCloseTo(1234.5, 9);
      }
    }
  });
});

describe("what a person types", () => {
  it("becomes SI; a decimal comma is accepted", () => {
    expect(parseTyped("3,5", "force", "si", false)).toBeCloseTo(3500, 9);
    expect(parseTyped(" 787 ", "force", "us", false)).toBeCloseTo(mathjs(787, "lbf", "N"), 9);
  });

  it("is NaN when blank or not a number (the schema then says what is allowed), undefined when the field may be left out", () => {
    expect(parseTyped("", "length", "si", false)).toBeNaN();
    expect(parseTyped("abc", "length", "si", true)).toBeNaN();
    expect(parseTyped("  ", "length", "si", true)).toBeUndefined();
  });

  it("is shown back without float noise", () => {
    expect(inputText(3500, "force", "si")).toBe("3.5");
    expect(inputText(0.045, "massPerLength", "si")).toBe("45");
    expect(inputText(120, "length", "us")).toBe("393.701");
    expect(inputText(undefined, "length", "us")).toBe("");
    expect(inputText(Number.NaN, "length", "us")).toBe("");
  });
});

describe("messages in the crew's units", () => {
  it("rewrites SI limits into SI display units and US units", () => {
    expect(messageInUnits("a pretension > 0 N and below the mainline's MBS, 32000 N", "force", "si")).toBe(
      "a pretension > 0 kN and below the mainline's MBS, 32 kN",
    );
    expect(messageInUnits("a horizontal span > 0 m and ≤ 3000 m", "length", "us")).toBe("a horizontal span > 0 ft and ≤ 9842.52 ft");
    // 4000 N / 4.448 221 615 260 5 N/lbf (NIST SP 811) = 899.2358 lbf, shown to six figures
    expect(messageInUnits("more than the previous point's 4 kN (tensions strictly increasing)", "stretchTension", "us")).toBe(
      "more than the previous point's 899.236 lbf (tensions strictly increasing)",
    );
    expect(messageInUnits("a mass per metre > 0 kg/m", "massPerLength", "si")).toBe("a mass per metre > 0 g/m");
  });

  it("leaves millimetres, degrees and plain numbers alone", () => {
    expect(messageInUnits("a rope diameter > 0 mm", "plain", "us")).toBe("a rope diameter > 0 mm");
    expect(messageInUnits("an included angle ≥ 0° and < 180°", "plain", "us")).toBe("an included angle ≥ 0° and < 180°");
    expect(messageInUnits("a whole number from 1 to 20", "plain", "us")).toBe("a whole number from 1 to 20");
  });

  it("writes a fraction field's limits as per cent", () => {
    expect(messageInUnits("a fraction of the span from 0 to 1", "fraction", "si")).toBe("a fraction of the span from 0 % to 100 %");
    expect(messageInUnits("a sheave efficiency > 0 and ≤ 1", "fraction", "us")).toBe("a sheave efficiency > 0 % and ≤ 100 %");
  });
});
