import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { MembersTable } from "@/components/crew/members-table";
import { InviteForm } from "@/components/crew/invite-form";
import { InvitationsList } from "@/components/crew/invitations-list";
import { EmptyState } from "@/components/ui/empty-state";
import { authorizePage } from "@/lib/authz";
import { can, withArticle } from "@/lib/roles";
import { membersOf } from "@/db/crews";
import { openInvitationsOf } from "@/db/invitations";

export const metadata: Metadata = { title: "Crew" };

export default async function CrewPage() {
  const context = await authorizePage("crew.read", "/crew");
  const canInvite = can(context.role, "crew.invite");
  const [members, invitations] = await Promise.all([membersOf(context.crew.id), canInvite ? openInvitationsOf(context.crew.id) : []]);
  return (
    <>
      <PageHeader
        title={context.crew.name}
        lead={`You are ${withArticle(context.role)} of this crew.`}
        actions={
          <>
            <Link href="/crew/settings">Crew settings</Link>
            <Link href="/crew/checklist">On-site checklist</Link>
          </>
        }
      />
      <section aria-labelledby="people" className="space-y-3">
        <h2 id="people">People</h2>
        <MembersTable members={members} selfId={context.user.id} canManage={can(context.role, "crew.roles")} />
      </section>
      {canInvite ? (
        <section aria-labelledby="invite" className="mt-8 space-y-3">
          <h2 id="invite">Invite someone</h2>
          <p className="text-ink-600">They get an e-mail with a link that works once, for 7 days.</p>
          <InviteForm />
          <h3 className="pt-4 font-semibold">Open invitations</h3>
          {invitations.length ? (
            <InvitationsList invitations={invitations.map((i) => ({ id: i.id, email: i.email, role: i.role, expiresAt: i.expiresAt.toISOString() }))} />
          ) : (
            <EmptyState title="No open invitations" />
          )}
        </section>
      ) : null}
    </>
  );
}
