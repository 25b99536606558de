"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/forms/form-error";

export function AcceptInvitation({ token, crewName }: { token: string; crewName: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function accept() {
    setBusy(true);
    setError(null);
    const response = await fetch("/api/invitations/accept", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ token }) });
    if (response.ok) {
      router.replace("/crew");
      router.refresh();
      return;
    }
    const body = await response.json().catch(() => ({}));
    setError(body.error ?? `The server answered ${response.status}.`);
    setBusy(false);
  }
  return (
    <div className="space-y-4">
      <FormError message={error} />
      <Button className="w-full" onClick={accept} disabled={busy}>
        Join {crewName}
      </Button>
    </div>
  );
}
