"use client";

import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { useToast } from "@/components/ui/toast";
import { callApi } from "@/components/forms/call-api";
import { FormError } from "@/components/forms/form-error";
import type { UploadOwner } from "@/db/uploads";

const ACCEPT = { photo: "image/jpeg,image/png,image/webp", manual: "application/pdf" } as const;
const HINT = { photo: "A JPEG, PNG or WebP image, at most 15 MiB.", manual: "A PDF, at most 30 MiB." } as const;

/** Uploads a photo (of an item, a model or a site) or a manual (of a model). */
export function FileUploadForm({ purpose, owner }: { purpose: "photo" | "manual"; owner: UploadOwner }) {
  const router = useRouter();
  const notify = useToast();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function upload(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = event.currentTarget;
    const data = new FormData(form);
    if (!(data.get("file") instanceof File) || (data.get("file") as File).size === 0) return setError("Choose a file first.");
    for (const [key, value] of Object.entries(owner)) data.set(key, value);
    setBusy(true);
    setError(null);
    const answer = await callApi("POST", `/api/uploads?purpose=${purpose}`, data);
    setBusy(false);
    if (!answer.ok) return setError(answer.error);
    form.reset();
    notify({ title: purpose === "photo" ? "Photo added" : "Manual added", tone: "ok" });
    router.refresh();
  }

  return (
    <form onSubmit={upload} className="space-y-3">
      <Field label={purpose === "photo" ? "Photo" : "Manual (PDF)"} name="file" type="file" accept={ACCEPT[purpose]} hint={HINT[purpose]} className="py-2" />
      <FormError message={error} />
      <Button type="submit" tone="secondary" disabled={busy}>
        {busy ? "Uploading…" : purpose === "photo" ? "Upload photo" : "Upload manual"}
      </Button>
    </form>
  );
}
