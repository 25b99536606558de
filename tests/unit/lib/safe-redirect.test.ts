import { describe, expect, it } from "vitest";
import { safeNext } from "@/lib/safe-redirect";

// Open-redirect cases from the OWASP Unvalidated Redirects cheat sheet.
describe("safeNext", () => {
  it("keeps a path on this site", () => {
    expect(safeNext("/crew?tab=people#x")).toBe("/crew?tab=people#x");
  });
  it.each(["//evil.example", "/\\evil.example", "https://evil.example/", "javascript:alert(1)", "evil", "", undefined, 42])("refuses %s", (next) => {
    expect(safeNext(next)).toBe("/rigs");
  });
});
