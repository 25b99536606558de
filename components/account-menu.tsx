"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { ConfirmButton } from "@/components/ui/confirm-button";
import { callApi } from "@/components/forms/call-api";
import { forgetThisPhone } from "@/components/offline/kept-rigs";
import { useQueuedWrites } from "@/components/offline/use-offline";

export function AccountMenu({ name, role }: { name: string; role: string | null }) {
  const router = useRouter();
  const queued = useQueuedWrites().items ?? [];
  async function signOut() {
    // The next person to sign in on this phone reads nothing of this member's crew.
    await forgetThisPhone().catch(() => undefined);
    await callApi("POST", "/api/auth/sign-out");
    router.replace("/sign-in");
    router.refresh();
  }
  return (
    <div className="flex min-w-0 items-center gap-2 md:flex-col md:items-stretch">
      <Link href="/account" className="min-h-target min-w-0 truncate content-center text-sm font-semibold text-ink-800">
        {name}
        {role ? <span className="ml-1 font-normal text-ink-500">({role})</span> : null}
      </Link>
      {queued.length ? (
        <ConfirmButton
          tone="quiet"
          title="Sign out and lose the writes on this phone?"
          description={`${queued.length} ${queued.length === 1 ? "write" : "writes"} made on this phone (${queued.map((w) => w.what).join("; ")}) did not reach the crew. Signing out discards them with everything this phone keeps for offline use.`}
          confirmLabel="Sign out and discard them"
          onConfirm={signOut}
        >
          Sign out
        </ConfirmButton>
      ) : (
        <Button tone="quiet" className="whitespace-nowrap px-3 text-sm" onClick={signOut}>
          Sign out
        </Button>
      )}
    </div>
  );
}
