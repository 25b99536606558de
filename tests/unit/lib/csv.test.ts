import { describe, expect, it } from "vitest";
import { csvText } from "@/lib/csv";

// RFC 4180 quoting, and OWASP's CSV-injection advice (from memory): a leading = + - @ tab or CR is neutralised.
describe("csvText", () => {
  it("quotes and doubles quotes", () => {
    expect(csvText('Cam "A"')).toBe('"Cam ""A"""');
  });

  it("keeps a formula from running by a leading apostrophe, leaving other text as typed", () => {
    for (const formula of ["=1+1", "+1", "-2+3", "@SUM(A1)", "\tx", "\rx"]) expect(csvText(formula)).toBe(`"'${formula}"`);
    expect(csvText("Brake 2000")).toBe('"Brake 2000"');
  });
});
