"use client";

import { useRouter } from "next/navigation";
import { Table } from "@/components/ui/table";
import { Button } from "@/components/ui/button";
import { useToast } from "@/components/ui/toast";
import { callApi } from "@/components/forms/call-api";

export interface InvitationRow {
  id: string;
  email: string;
  role: string;
  expiresAt: string;
}

export function InvitationsList({ invitations }: { invitations: InvitationRow[] }) {
  const router = useRouter();
  const notify = useToast();
  async function revoke(invitation: InvitationRow) {
    const result = await callApi("DELETE", `/api/crew/invitations/${invitation.id}`);
    notify(
      result.ok ? { title: `Invitation to ${invitation.email} withdrawn`, tone: "ok" } : { title: "Not withdrawn", description: result.error, tone: "danger" },
    );
    router.refresh();
  }
  return (
    <Table
      caption="Open invitations"
      rows={invitations}
      rowKey={(i) => i.id}
      columns={[
        { key: "email", header: "E-mail", cell: (i) => i.email },
        { key: "role", header: "Role", cell: (i) => i.role },
        {
          key: "expires",
          header: "Valid until",
          cell: (i) => new Date(i.expiresAt).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" }),
        },
        {
          key: "actions",
          header: "Actions",
          cell: (i) => (
            <Button tone="secondary" onClick={() => revoke(i)} aria-label={`Withdraw the invitation to ${i.email}`}>
              Withdraw
            </Button>
          ),
        },
      ]}
    />
  );
}
