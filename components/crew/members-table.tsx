"use client";

import { useRouter } from "next/navigation";
import { ROLES, type Role } from "@/lib/roles";
import { Table } from "@/components/ui/table";
import { Button } from "@/components/ui/button";
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
            canManage ? (
              <select aria-label={`Role of ${m.name}`} className={`${controlClasses} min-w-32`} value={m.role} onChange={(e) => act("PATCH", m, { role: e.target.value as Role })}>
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
          cell: (m) =>
            m.userId === selfId ? (
              <Button tone="secondary" onClick={() => act("DELETE", m)}>
                Leave crew
              </Button>
            ) : canManage ? (
              <Button tone="danger" onClick={() => act("DELETE", m)} aria-label={`Remove ${m.name}`}>
                Remove
              </Button>
            ) : null,
        },
      ]}
    />
  );
}
