// Why an invitation can no longer be used, worked out once for the invitation page and the accept route.
export const INVITATION_DAYS = 7;

export type InvitationProblem = "unknown" | "revoked" | "used" | "expired";

export interface InvitationDates {
  revokedAt: Date | null;
  acceptedAt: Date | null;
  expiresAt: Date;
}

export function invitationProblem(invitation: InvitationDates | null, now = new Date()): InvitationProblem | null {
  if (!invitation) return "unknown";
  if (invitation.revokedAt) return "revoked";
  if (invitation.acceptedAt) return "used";
  if (invitation.expiresAt <= now) return "expired";
  return null;
}

export const INVITATION_REFUSALS: Record<InvitationProblem | "wrong_email" | "last_owner", { status: 404 | 409 | 410 | 422; message: string }> = {
  unknown: { status: 404, message: "This invitation link is not valid: ask the crew's owner for a new one." },
  revoked: { status: 410, message: "This invitation was withdrawn: ask the crew's owner for a new one." },
  used: { status: 410, message: "This invitation has been used already." },
  expired: { status: 410, message: `This invitation is more than ${INVITATION_DAYS} days old: ask the crew's owner for a new one.` },
  wrong_email: { status: 422, message: "This invitation is for another e-mail address: sign in with the address it was sent to." },
  last_owner: {
    status: 409,
    message: "You are this crew's only owner, and this invitation would make you less: the crew must keep an owner. Make someone else an owner first.",
  },
};
