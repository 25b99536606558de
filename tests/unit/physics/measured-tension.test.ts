import { describe, expect, it } from "vitest";
import example from "../../../physics/examples/quarry-highline.json";
import { evaluateRig, STANDARD_GRAVITY, tensionForSag, tensionWithWalker } from "../../../physics";
import { refusalOf, relative } from "./fixtures";

// A level line so stiff it does not stretch, and without a backup's weight: the inextensible catenary.
const stiffLevel = {
  ...example,
  heightDifferenceM: 0,
  backup: undefined,
  mainline: {
    ...example.mainline,
    stretchPoints: [
      { tensionKN: 0, elongationPct: 0 },
      { tensionKN: 30, elongationPct: 0.00001 },
    ],
  },
};

describe("the tension a load cell should read", () => {
  it("for a measured sag on an inextensible level line: the catenary's T = w·a·cosh(D/2a) with d = a·(cosh(D/2a) − 1) (Irvine, Cable Structures, 1981, §1) to 1e-5", () => {
    const w = stiffLevel.mainline.massPerMetreKg * STANDARD_GRAVITY;
    const D = stiffLevel.spanM;
    for (const d of [0.8, 2.5, 6]) {
      let lo = 1;
      let hi = 1e8;
      for (let i = 0; i < 200; i++) {
        const a = (lo + hi) / 2;
        if (a * (Math.cosh(D / (2 * a)) - 1) > d) lo = a;
        else hi = a;
      }
      const expected = w * lo * Math.cosh(D / (2 * lo));
      expect(relative(tensionForSag(stiffLevel, d, "b"), expected)).toBeLessThan(1e-5);
    }
  });

  it("gives back the plan's pretension for the plan's own unloaded sag (the same equilibrium both ways) to 1e-7", () => {
    const result = evaluateRig(example);
    expect(relative(tensionForSag(example, result.unloaded.midSpanSagM, "b"), example.pretension.forceN)).toBeLessThan(1e-7);
    expect(relative(tensionForSag(example, result.unloaded.midSpanSagM, "a"), result.unloaded.tensionAN)).toBeLessThan(1e-7);
  });

  it("with a walker: the whole-rig evaluation's walking tension for the same mass and position to 1e-9", () => {
    const result = evaluateRig({ ...example, walker: { massKg: 82, positionM: 40 } });
    expect(relative(tensionWithWalker(example, 82, 40, "a"), result.walker.tensionAN)).toBeLessThan(1e-9);
    expect(relative(tensionWithWalker(example, 82, 40, "b"), result.walker.tensionBN)).toBeLessThan(1e-9);
  });

  it("refuses a sag too small for the line to hold, naming the sag and the least it can hold", () => {
    const refused = refusalOf(() => tensionForSag(example, 0.001, "b"));
    expect(refused).toMatchObject({ field: "sagM", given: "0.001" });
    const least = /^a sag above (\d+\.\d{3}) m: any less and the line would be tighter than its MBS$/.exec(refused.allowed);
    expect(least).not.toBeNull();
    // The least sag is rounded up, so it is held, below the MBS; 2 mm less is refused.
    const sag = Number(least![1]);
    expect(tensionForSag(example, sag, "b")).toBeLessThan(example.mainline.mbsN);
    expect(refusalOf(() => tensionForSag(example, sag - 0.002, "b")).field).toBe("sagM");
  });
});
