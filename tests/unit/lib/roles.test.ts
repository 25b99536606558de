import { describe, expect, it } from "vitest";
import { can, PERMISSIONS, ROLES } from "@/lib/roles";
import { RoleSchema } from "@/lib/validations/crew";

describe("the role table", () => {
  it("orders roles from member to owner, each able to do all the one below may", () => {
    expect(ROLES).toEqual(["member", "rigger", "lead", "owner"]);
    for (const action of Object.keys(PERMISSIONS) as (keyof typeof PERMISSIONS)[]) {
      const allowed = ROLES.map((r) => can(r, action));
      expect(allowed).toEqual([...allowed].sort());
    }
  });
  it("lets only owners invite and change roles, leads change settings", () => {
    expect(can("lead", "crew.invite")).toBe(false);
    expect(can("owner", "crew.roles")).toBe(true);
    expect(can("rigger", "crew.settings")).toBe(false);
    expect(can("lead", "crew.settings")).toBe(true);
  });
  it("knows a role that does not exist", () => {
    expect(RoleSchema.safeParse("captain").success).toBe(false);
    expect(RoleSchema.safeParse("rigger").success).toBe(true);
  });
});
