import { describe, expect, it, vi } from "vitest";
import { isUuid, rowId } from "@/lib/validations/ids";
import { crewRowOrNotFound } from "@/lib/authz";

// RFC 9562, section 4: the variant bits (10xx) sit in the first digit of the fourth group.
const ROW = "3f2b8c1e-7a4d-4c2e-9b1f-0d6e5a4c3b2a";

describe("ids", () => {
  it("takes a uuid and refuses what only looks like one", () => {
    expect(isUuid(ROW)).toBe(true);
    expect(isUuid("3f2b8c1e-7a4d-4c2e-cb1f-0d6e5a4c3b2a")).toBe(false);
    expect(isUuid("not-a-row")).toBe(false);
    expect(isUuid(undefined)).toBe(false);
  });

  it("answers 404 for a URL id that is no uuid", () => {
    expect(rowId(ROW, "item")).toBe(ROW);
    expect(() => rowId("1 OR 1=1", "item")).toThrow("No such item in this crew.");
  });

  it("finds the crew's row, and shows the not-found page without a look-up for a bad id", async () => {
    const find = vi.fn(async (crewId: string, id: string) => (id === ROW ? { crewId, id } : null));
    await expect(crewRowOrNotFound(find, "crew", ROW)).resolves.toEqual({ crewId: "crew", id: ROW });
    await expect(crewRowOrNotFound(find, "crew", "7a4d")).rejects.toThrow("NEXT_HTTP_ERROR_FALLBACK;404");
    expect(find).toHaveBeenCalledTimes(1);
    await expect(crewRowOrNotFound(find, "crew", "4c2e8c1e-7a4d-4c2e-9b1f-0d6e5a4c3b2a")).rejects.toThrow("NEXT_HTTP_ERROR_FALLBACK;404");
  });
});
