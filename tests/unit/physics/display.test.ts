import { describe, expect, it } from "vitest";
import { cutDown, roundUp } from "../../../physics/display";

// The project's rule for shown figures (design brief: a failing factor is never rounded up); the
// cases are worked by hand.
describe("figures in messages", () => {
  it("rounds a load up", () => {
    expect(roundUp(3.891)).toBe("3.90");
    expect(roundUp(3.9)).toBe("3.90");
  });
  it("cuts a capacity or factor down, so 2.999 never reads as 3.00", () => {
    expect(cutDown(2.999)).toBe("2.99");
    expect(cutDown(3.17999)).toBe("3.17");
    expect(cutDown(3 - Number.EPSILON * 2)).toBe("2.99");
  });
});
