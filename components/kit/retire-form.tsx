"use client";

import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { RetirementSchema, type RetirementInput } from "@/lib/validations/kit";
import { FormError } from "./form-error";
import { useApiForm } from "./use-api-form";

/** Retires a model or an item: from then on no new plan may use it. Its history stays. */
export function RetireForm({ url, what }: { url: string; what: string }) {
  const { form, onSubmit, serverError } = useApiForm<RetirementInput>({
    schema: RetirementSchema,
    defaultValues: { retiredOn: new Date().toISOString().slice(0, 10), reason: "" },
    url,
    method: "POST",
    saved: `${what} retired`,
  });
  const { register, formState } = form;
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <p className="text-ink-600">A retired {what.toLowerCase()} cannot be put in a new plan. Its record and history are kept.</p>
      <Field label="Retired on" type="date" error={formState.errors.retiredOn?.message} {...register("retiredOn")} />
      <Field label="Why" hint="For example: core shot, failed inspection, lost, past its service life." error={formState.errors.reason?.message} {...register("reason")} />
      <FormError message={serverError} />
      <Button type="submit" tone="danger" disabled={formState.isSubmitting}>
        Retire {what.toLowerCase()}
      </Button>
    </form>
  );
}
