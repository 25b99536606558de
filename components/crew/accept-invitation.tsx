"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/forms/form-error";
import { callApi } from "@/components/forms/call-api";

export function AcceptInvitation({ token, crewName }: { token: string; crewName: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function accept() {
    setBusy(true);
    setError(null);
    const result = await callApi("POST", "/api/invitations/accept", { token });
    if (result.ok) {
      router.replace("/crew");
      router.refresh();
      return;
    }
    setError(result.error);
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
