"use client";

import { useRouter } from "next/navigation";
import { ConfirmButton } from "@/components/ui/confirm-button";
import { useToast } from "@/components/ui/toast";
import { callApi } from "@/components/forms/call-api";

/** Removes a photo or a manual after asking once. */
export function RemoveFileButton({ id, fileName }: { id: string; fileName: string }) {
  const router = useRouter();
  const notify = useToast();
  return (
    <ConfirmButton
      tone="secondary"
      ariaLabel={`Remove ${fileName}`}
      title={`Remove ${fileName}?`}
      description="The file is deleted for the whole crew; the gear's record stays."
      confirmLabel="Remove file"
      onConfirm={async () => {
        const answer = await callApi("DELETE", `/api/uploads/${id}`);
        notify(answer.ok ? { title: `${fileName} removed`, tone: "ok" } : { title: "Not removed", description: answer.error, tone: "danger" });
        router.refresh();
      }}
    >
      Remove
    </ConfirmButton>
  );
}
