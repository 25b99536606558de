"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ConfirmButton } from "@/components/ui/confirm-button";
import { callApi } from "@/components/forms/call-api";
import { FormError } from "@/components/forms/form-error";

/** Archive or bring back a site; delete it only while no rig stands on it. */
export function SiteActions({ siteId, archived, rigCount }: { siteId: string; archived: boolean; rigCount: number }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const act = async (answer: ReturnType<typeof callApi>, then: () => void) => {
    const result = await answer;
    if (!result.ok) return setError(result.error);
    setError(null);
    then();
  };
  return (
    <div className="flex flex-wrap gap-2">
      <Button tone="secondary" onClick={() => act(callApi("POST", `/api/sites/${siteId}/archive`, { archived: !archived }), () => router.refresh())}>
        {archived ? "Bring the site back" : "Archive the site"}
      </Button>
      {rigCount === 0 ? (
        <ConfirmButton
          title="Delete this site?"
          description="The site, its ground and its photos are deleted. No rig stands on it."
          confirmLabel="Delete the site"
          onConfirm={() => act(callApi("DELETE", `/api/sites/${siteId}`), () => router.push("/sites"))}
        >
          Delete
        </ConfirmButton>
      ) : null}
      <FormError message={error} />
    </div>
  );
}
