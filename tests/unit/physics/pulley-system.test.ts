import { describe, expect, it } from "vitest";
import { analysePulleySystem, RigInputError } from "../../../physics";
import { refusalOf } from "./fixtures";

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

// The edges of what a pulley system may be (the product's own limits, common practice, no source): each limit
// itself is allowed and the step past it refused, naming the field and what is allowed.
describe("analysePulleySystem at the edges of its inputs", () => {
  const system = (stages: unknown, sheaveEfficiency: number, brake: { on: "tail" } | { on: "stage"; stage: number } = { on: "tail" }) =>
    ({ stages, sheaveEfficiency, brake }) as Parameters<typeof analysePulleySystem>[0];

  it("takes 1:1 and 20:1 stages, refuses 0:1, 21:1, a fraction and no list", () => {
    expect(analysePulleySystem(system([1], 0.9), 1000, 500)).toMatchObject({
      idealAdvantage: 1,
      haulingAdvantage: 1,
      brakeAdvantage: 1,
      haulForce: 1000,
      peopleNeeded: 2,
    });
    expect(analysePulleySystem(system([20], 1), 1000, 500).idealAdvantage).toBe(20);
    for (const bad of [0, 21, 2.5]) {
      const error = refusalOf(() => analysePulleySystem(system([3, bad], 0.9), 1000, 500));
      expect(error).toMatchObject({ field: "tensioning.stages.1.ratio", allowed: "a whole number from 1 to 20 (n of an n:1 stage)" });
    }
    expect(refusalOf(() => analysePulleySystem(system("3:1", 0.9), 1000, 500))).toMatchObject({ field: "tensioning.stages", allowed: "at least one stage" });
  });

  it("takes a sheave efficiency above 0 up to 1, refuses 0 and above 1", () => {
    expect(analysePulleySystem(system([2], 1), 1000, 500).haulingAdvantage).toBe(2);
    expect(analysePulleySystem(system([2], 0.01), 1000, 500).haulingAdvantage).toBeCloseTo(1.01, 12);
    for (const bad of [0, 1.0001]) {
      expect(refusalOf(() => analysePulleySystem(system([2], bad), 1000, 500))).toMatchObject({
        field: "tensioning.sheaveEfficiency",
        allowed: "a fraction > 0 and ≤ 1",
      });
    }
  });

  it("puts the brake on any stage from 0 to the last, and on the tail above them all", () => {
    expect(analysePulleySystem(system([5, 3, 2], 1, { on: "stage", stage: 1 }), 3000, 500).brakeAdvantage).toBe(15);
    expect(analysePulleySystem(system([5, 3, 2], 1, { on: "stage", stage: 2 }), 3000, 500).brakeAdvantage).toBe(30);
    expect(analysePulleySystem(system([5, 3, 2], 1), 3000, 500).brakeAdvantage).toBe(30);
    for (const bad of [-1, 3, 0.5]) {
      expect(refusalOf(() => analysePulleySystem(system([5, 3, 2], 1, { on: "stage", stage: bad }), 3000, 500))).toMatchObject({
        field: "tensioning.brake.stage",
        allowed: "a stage index from 0 (the stage on the line) to 2",
      });
    }
  });

  it("needs a pull per person above 0 N, and rounds the crew up: 1000 N at 500 N each is 2, at 499 N each 3", () => {
    expect(analysePulleySystem(system([1], 1), 1000, 499).peopleNeeded).toBe(3);
    expect(refusalOf(() => analysePulleySystem(system([1], 1), 1000, 0))).toMatchObject({
      field: "tensioning.pullPerPersonN",
      allowed: "a pull per person > 0 N",
    });
  });

  it("multiplies the hauling advantage of compound stages: 3:1 on 2:1 at e = 0.9 is (1 + 0.9 + 0.81)(1 + 0.9)", () => {
    // 6000 N / 5.149 = 1165.3 N, at 500 N each: 3 people.
    const a = analysePulleySystem(system([3, 2], 0.9), 6000, 500);
    expect(a.haulingAdvantage).toBeCloseTo(2.71 * 1.9, 12);
    expect(a.haulForce).toBeCloseTo(6000 / (2.71 * 1.9), 9);
    expect(a.peopleNeeded).toBe(3);
  });
});
