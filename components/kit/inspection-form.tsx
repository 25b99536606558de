"use client";

import { useRouter } from "next/navigation";
import { FormError } from "@/components/forms/form-error";
import { useApiForm } from "@/components/forms/use-api-form";
import { useToast } from "@/components/ui/toast";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { INSPECTION_RESULTS, INSPECTION_RESULT_LABELS, InspectionSchema } from "@/lib/validations/kit";

export function InspectionForm({ itemId }: { itemId: string }) {
  const router = useRouter();
  const notify = useToast();
  const defaultValues = { inspectedOn: new Date().toISOString().slice(0, 10), result: "pass", notes: "" } as const;
  const { form, submit, formError } = useApiForm(InspectionSchema, {
    defaultValues,
    url: `/api/kit/items/${itemId}/inspections`,
    onSuccess: () => {
      notify({ title: "Inspection recorded", tone: "ok" });
      form.reset(defaultValues);
      router.refresh();
    },
  });
  const { register, formState } = form;
  return (
    <form onSubmit={submit} noValidate className="grid gap-4 md:grid-cols-3">
      <Field label="Inspected on" type="date" error={formState.errors.inspectedOn?.message} {...register("inspectedOn")} />
      <Select
        label="Result"
        options={INSPECTION_RESULTS.map((r) => ({ value: r, label: INSPECTION_RESULT_LABELS[r] }))}
        error={formState.errors.result?.message}
        {...register("result")}
      />
      <Field label="Notes" hint="What you saw: wear, cuts, glazing, deformation." error={formState.errors.notes?.message} {...register("notes")} />
      <div className="md:col-span-3">
        <FormError message={formError} />
        <Button type="submit" disabled={formState.isSubmitting}>
          Record inspection
        </Button>
      </div>
    </form>
  );
}
