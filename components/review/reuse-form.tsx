"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { FormError } from "@/components/forms/form-error";
import { callApi } from "@/components/forms/call-api";

/** "Use this rig": a new rig from the signed-off revision, for another site or another day. */
export function ReuseForm({
  rigId,
  revisionId,
  rigName,
  sites,
  siteId,
}: {
  rigId: string;
  revisionId: string;
  rigName: string;
  sites: { id: string; name: string }[];
  siteId: string | null;
}) {
  const router = useRouter();
  const [name, setName] = useState(`${rigName} (again)`);
  const [site, setSite] = useState(siteId ?? "");
  const [errors, setErrors] = useState<{ form: string | null; fields: Record<string, string> }>({ form: null, fields: {} });
  const [busy, setBusy] = useState(false);
  return (
    <form
      className="grid gap-3 sm:grid-cols-[1fr_1fr_auto] sm:items-end"
      onSubmit={async (e) => {
        e.preventDefault();
        setBusy(true);
        const answer = await callApi("POST", `/api/rigs/${rigId}/revisions/${revisionId}/reuse`, { name, siteId: site || null });
        setBusy(false);
        if (!answer.ok) return setErrors({ form: answer.error, fields: answer.fieldErrors });
        router.push(`/rigs/${(answer.body.rig as { id: string }).id}`);
      }}
    >
      <Field label="Name of the new rig" value={name} onChange={(e) => setName(e.target.value)} error={errors.fields.name} maxLength={120} />
      <Select
        label="Site of the new rig"
        value={site}
        onChange={(e) => setSite(e.target.value)}
        error={errors.fields.siteId}
        options={[{ value: "", label: "Free span (the same span as signed)" }, ...sites.map((s) => ({ value: s.id, label: s.name }))]}
      />
      <Button type="submit" disabled={busy}>
        Use this rig
      </Button>
      <div className="sm:col-span-3">
        <FormError message={errors.form} />
      </div>
    </form>
  );
}
