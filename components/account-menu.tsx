"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { callApi } from "@/components/forms/call-api";

export function AccountMenu({ name, role }: { name: string; role: string | null }) {
  const router = useRouter();
  async function signOut() {
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
      <Button tone="quiet" className="whitespace-nowrap px-3 text-sm" onClick={signOut}>
        Sign out
      </Button>
    </div>
  );
}
