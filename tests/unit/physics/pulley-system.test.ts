import { describe, expect, it } from "vitest";
import { analysePulleySystem, RigInputError } from "../../../physics";

describe("analysePulleySystem", () => {
  // Hauling MA 1 + e + e² for a 3:1 with sheave efficiency e: common practice in rope-rescue training, no single
  // published source named here; ideal MA of a simple n:1 is n (any statics text on pulleys). People needed:
  // 3000 N / 2.7664 = 1084 N at 300 N each → 4 (worked by hand).
  it("a 3:1 with 92 % sheaves hauls at 2.77:1 (1 + e + e²)", () => {
    const a = analysePulleySystem({ stages: [3], sheaveEfficiency: 0.92, brake: { on: "tail" } }, 3000, 300);
    expect(a.idealAdvantage).toBe(3);
    expect(a.haulingAdvantage).toBeCloseTo(1 + 0.92 + 0.92 ** 2, 12);
    expect(a.haulingAdvantage.toFixed(2)).toBe("2.77");
    expect(a.haulForce).toBeCloseTo(3000 / 2.7664, 6);
    expect(a.peopleNeeded).toBe(4);
  });

  it("compound 3:1 on 3:1 is 9:1 ideal; tail force × ideal MA = line tension held (common practice, no source)", () => {
    const a = analysePulleySystem({ stages: [3, 3], sheaveEfficiency: 1, brake: { on: "tail" } }, 4500, 400);
    expect(a.idealAdvantage).toBe(9);
    expect(a.haulingAdvantage).toBe(9);
    expect(a.brakeAdvantage).toBe(9);
    expect((4500 / a.brakeAdvantage) * a.idealAdvantage).toBeCloseTo(4500, 9);
  });

  // The force on a rope between stages is the line tension over the advantage between it and the line (statics of an ideal pulley system; common practice, no source for the product's stage numbering).
  it("a brake on the inner stage sees the line tension over that stage's advantage only", () => {
    const a = analysePulleySystem({ stages: [5, 3], sheaveEfficiency: 0.9, brake: { on: "stage", stage: 0 } }, 5000, 400);
    expect(a.brakeAdvantage).toBe(5);
    expect(a.idealAdvantage).toBe(15);
  });

  it("rejects impossible systems, naming the field", () => {
    expect(() => analysePulleySystem({ stages: [], sheaveEfficiency: 0.9, brake: { on: "tail" } }, 1, 1)).toThrow(RigInputError);
    expect(() => analysePulleySystem({ stages: [2.5], sheaveEfficiency: 0.9, brake: { on: "tail" } }, 1, 1)).toThrow(
      expect.objectContaining({ field: "tensioning.stages.0.ratio" }),
    );
    expect(() => analysePulleySystem({ stages: [3], sheaveEfficiency: 1.2, brake: { on: "tail" } }, 1, 1)).toThrow(
      expect.objectContaining({ field: "tensioning.sheaveEfficiency" }),
    );
    expect(() => analysePulleySystem({ stages: [3], sheaveEfficiency: 0.9, brake: { on: "stage", stage: 2 } }, 1, 1)).toThrow(
      expect.objectContaining({ field: "tensioning.brake.stage" }),
    );
  });
});
