"use client";

import { when } from "@/lib/when";
import { useRouter } from "next/navigation";
import { Table } from "@/components/ui/table";
import { Button } from "@/components/ui/button";
import { ConfirmButton } from "@/components/ui/confirm-button";
import { useToast } from "@/components/ui/toast";
import { callApi } from "@/components/forms/call-api";

export interface SessionItem {
  handle: string;
  createdAt: string;
  /** The browser and system, in words ("Safari 17 on an iPhone (iOS 17.4)"). */
  device: string;
  current: boolean;
}

export function SessionsList({ sessions }: { sessions: SessionItem[] }) {
  const router = useRouter();
  const notify = useToast();
  async function signOut(method: "POST" | "DELETE", path: string, leaving: boolean) {
    const result = await callApi(method, path);
    if (!result.ok) return notify({ title: "Not signed out", description: result.error, tone: "danger" });
    if (leaving) router.replace("/sign-in");
    router.refresh();
  }
  return (
    <div className="space-y-4">
      <Table
        caption="Devices signed in to your account"
        rows={sessions}
        rowKey={(s) => s.handle}
        columns={[
          {
            key: "device",
            header: "Device",
            wrap: true,
            cell: (s) => (
              <>
                {s.device}
                {s.current ? <strong> (this device)</strong> : null}
              </>
            ),
          },
          { key: "since", header: "Signed in", cell: (s) => when(s.createdAt) },
          {
            key: "actions",
            header: "Actions",
            cell: (s) => (
              <Button tone="secondary" onClick={() => signOut("DELETE", `/api/account/sessions/${s.handle}`, s.current)}>
                Sign out
              </Button>
            ),
          },
        ]}
      />
      <ConfirmButton
        title="Sign out of every device?"
        description="Every browser signed in to your account, this one included, will need your password again."
        confirmLabel="Sign out everywhere"
        onConfirm={() => signOut("POST", "/api/auth/sign-out-everywhere", true)}
      >
        Sign out of every device
      </ConfirmButton>
    </div>
  );
}
