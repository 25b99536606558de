import { describe, expect, it } from "vitest";
import { INVITATION_DAYS, INVITATION_REFUSALS, invitationProblem } from "@/lib/invitation-state";

const now = new Date("2026-12-01T12:00:00Z");
const open = { revokedAt: null, acceptedAt: null, expiresAt: new Date("2026-12-02T12:00:00Z") };

describe("invitationProblem", () => {
  it("finds nothing wrong with an open invitation before it expires", () => {
    expect(invitationProblem(open, now)).toBeNull();
  });
  it("names the first reason an invitation can no longer be used", () => {
    expect(invitationProblem(null, now)).toBe("unknown");
    expect(invitationProblem({ ...open, revokedAt: now, acceptedAt: now }, now)).toBe("revoked");
    expect(invitationProblem({ ...open, acceptedAt: now }, now)).toBe("used");
    expect(invitationProblem({ ...open, expiresAt: now }, now)).toBe("expired");
  });
  it("tells the invitee how long a link lasts", () => {
    expect(INVITATION_REFUSALS.expired.message).toContain(`${INVITATION_DAYS} days`);
  });
});
