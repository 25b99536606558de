"use client";

import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { INSPECTION_RESULTS, INSPECTION_RESULT_LABELS, InspectionSchema, type InspectionInput } from "@/lib/validations/kit";
import { FormError } from "./form-error";
import { useApiForm } from "./use-api-form";

export function InspectionForm({ itemId }: { itemId: string }) {
  const { form, onSubmit, serverError } = useApiForm<InspectionInput>({
    schema: InspectionSchema,
    defaultValues: { inspectedOn: new Date().toISOString().slice(0, 10), result: "pass", notes: "" },
    url: `/api/kit/items/${itemId}/inspections`,
    method: "POST",
    saved: "Inspection recorded",
  });
  const { register, formState } = form;
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4 md:grid-cols-3">
      <Field label="Inspected on" type="date" error={formState.errors.inspectedOn?.message} {...register("inspectedOn")} />
      <Select label="Result" options={INSPECTION_RESULTS.map((r) => ({ value: r, label: INSPECTION_RESULT_LABELS[r] }))} error={formState.errors.result?.message} {...register("result")} />
      <Field label="Notes" hint="What you saw: wear, cuts, glazing, deformation." error={formState.errors.notes?.message} {...register("notes")} />
      <div className="md:col-span-3">
        <FormError message={serverError} />
        <Button type="submit" disabled={formState.isSubmitting}>
          Record inspection
        </Button>
      </div>
    </form>
  );
}
