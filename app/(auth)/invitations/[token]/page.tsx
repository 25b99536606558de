import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { invitationByTokenHash } from "@/db/invitations";
import { getCurrentSession } from "@/lib/auth/session";
import { hashToken } from "@/lib/tokens";
import { INVITATION_REFUSALS, invitationProblem } from "@/lib/invitation-state";
import { buttonClasses } from "@/components/ui/button";
import { AcceptInvitation } from "@/components/crew/accept-invitation";

export const metadata: Metadata = { title: "Invitation" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = await invitationByTokenHash(hashToken(token));
  const signedIn = await getCurrentSession();
  const here = `/invitations/${token}`;

  const problem = invitationProblem(invitation);
  // A link Spanwright never sent names nothing: a real 404 (not-found.tsx beside this page says what to do).
  if (problem === "unknown") notFound();
  if (problem || !invitation) {
    return (
      <>
        <h1 className="mb-2 text-xl">This invitation cannot be used</h1>
        <p role="alert">{INVITATION_REFUSALS[problem ?? "unknown"].message}</p>
      </>
    );
  }
  return (
    <>
      <h1 className="mb-2 text-xl">Join {invitation.crewName}</h1>
      <p className="mb-4 text-ink-700">
        You are invited as <strong>{invitation.role}</strong>. The invitation is for <strong>{invitation.email}</strong>.
      </p>
      {!signedIn ? (
        <div className="flex flex-col gap-3">
          <Link className={buttonClasses("primary")} href={`/sign-up?next=${encodeURIComponent(here)}`}>
            Create an account with {invitation.email}
          </Link>
          <Link className={buttonClasses("secondary")} href={`/sign-in?next=${encodeURIComponent(here)}`}>
            Sign in
          </Link>
        </div>
      ) : signedIn.user.email !== invitation.email ? (
        <p role="alert">
          You are signed in as {signedIn.user.email}. Sign out and sign in with {invitation.email} to accept.
        </p>
      ) : (
        <AcceptInvitation token={token} crewName={invitation.crewName} />
      )}
    </>
  );
}
