"use client";

import { useRouter } from "next/navigation";
import { ROLES, type Role } from "@/lib/roles";
import { Table } from "@/components/ui/table";
import { ConfirmButton } from "@/components/ui/confirm-button";
import { controlClasses } from "@/components/ui/field";
import { useToast } from "@/components/ui/toast";
import { callApi } from "@/components/forms/call-api";

export interface MemberRow {
  userId: string;
  name: string;
  email: string;
  role: Role;
}

export function MembersTable({ members, selfId, canManage }: { members: MemberRow[]; selfId: string; canManage: boolean }) {
  const router = useRouter();
  const notify = useToast();
  // The crew must keep an owner: its only owner can neither leave nor step down, and is told why up front.
  const onlyOwner = members.filter((m) => m.role === "owner").length === 1 ? members.find((m) => m.role === "owner")!.userId : null;
  async function act(method: "PATCH" | "DELETE", member: MemberRow, body?: { role: Role }) {
    const result = await callApi(method, `/api/crew/members/${member.userId}`, body);
    if (!result.ok) return notify({ title: "Not changed", description: result.error, tone: "danger" });
    notify({ title: body ? `${member.name} is now ${body.role}` : member.userId === selfId ? "You left the crew" : `${member.name} was removed`, tone: "ok" });
    router.refresh();
  }
  return (
    <Table
      caption="People in this crew"
      rows={members}
      rowKey={(m) => m.userId}
      columns={[
        { key: "name", header: "Name", cell: (m) => <span className="font-semibold">{m.name}</span> },
        { key: "email", header: "E-mail", cell: (m) => m.email },
        {
          key: "role",
          header: "Role",
          cell: (m) =>
            canManage && m.userId !== onlyOwner ? (
              <select
                aria-label={`Role of ${m.name}`}
                className={`${controlClasses} min-w-32`}
                value={m.role}
                onChange={(e) => act("PATCH", m, { role: e.target.value as Role })}
              >
                {ROLES.map((r) => (
                  <option key={r} value={r}>
                    {r}
                  </option>
                ))}
              </select>
            ) : (
              m.role
            ),
        },
        {
          key: "actions",
          header: "Actions",
          wrap: true,
          cell: (m) =>
            m.userId === onlyOwner && m.userId === selfId ? (
              <span className="text-sm text-ink-600">You are the crew&apos;s only owner: make someone else an owner before you leave or step down.</span>
            ) : m.userId === selfId ? (
              <ConfirmButton
                tone="secondary"
                title="Leave this crew?"
                description="You will no longer see its rigs, kit or slip tests. An owner can invite you again."
                confirmLabel="Leave crew"
                onConfirm={() => act("DELETE", m)}
              >
                Leave crew
              </ConfirmButton>
            ) : canManage ? (
              <ConfirmButton
                ariaLabel={`Remove ${m.name}`}
                title={`Remove ${m.name}?`}
                description={`${m.name} will no longer see this crew's rigs, kit or slip tests. An owner can invite them again.`}
                confirmLabel="Remove"
                onConfirm={() => act("DELETE", m)}
              >
                Remove
              </ConfirmButton>
            ) : null,
        },
      ]}
    />
  );
}
