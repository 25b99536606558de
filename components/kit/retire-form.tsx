"use client";

import { useRouter } from "next/navigation";
import { FormError } from "@/components/forms/form-error";
import { useApiForm } from "@/components/forms/use-api-form";
import { useToast } from "@/components/ui/toast";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { RetirementSchema } from "@/lib/validations/kit";

/** Retires a model or an item: from then on no new plan may use it. Its history stays. */
export function RetireForm({ url, what }: { url: string; what: string }) {
  const router = useRouter();
  const notify = useToast();
  const defaultValues = { retiredOn: new Date().toISOString().slice(0, 10), reason: "" };
  const { form, submit, formError } = useApiForm(RetirementSchema, {
    defaultValues,
    url,
    onSuccess: () => {
      notify({ title: `${what} retired`, tone: "ok" });
      form.reset(defaultValues);
      router.refresh();
    },
  });
  const { register, formState } = form;
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      <p className="text-ink-600">A retired {what.toLowerCase()} cannot be put in a new plan. Its record and history are kept.</p>
      <Field label="Retired on" type="date" error={formState.errors.retiredOn?.message} {...register("retiredOn")} />
      <Field
        label="Why"
        hint="For example: core shot, failed inspection, lost, past its service life."
        error={formState.errors.reason?.message}
        {...register("reason")}
      />
      <FormError message={formError} />
      <Button type="submit" tone="danger" disabled={formState.isSubmitting}>
        Retire {what.toLowerCase()}
      </Button>
    </form>
  );
}
