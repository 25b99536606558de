"use client";

import { Button } from "@/components/ui/button";
import { Field, FieldFrame, controlClasses } from "@/components/ui/field";
import { GearItemEditSchema, GearItemSchema, type GearItemInput } from "@/lib/validations/kit";
import { FormError } from "./form-error";
import { useApiForm } from "./use-api-form";

const today = () => new Date().toISOString().slice(0, 10);

/** Adds an item of a model, or edits one when `item` is given. */
export function ItemForm({ modelId, item }: { modelId: string; item?: { id: string; label: string; inServiceSince: string; notes: string } }) {
  const { form, onSubmit, serverError } = useApiForm<GearItemInput>({
    schema: item ? GearItemEditSchema : GearItemSchema,
    defaultValues: item ? { modelId, label: item.label, inServiceSince: item.inServiceSince, notes: item.notes } : { modelId, label: "", inServiceSince: today(), notes: "" },
    url: item ? `/api/kit/items/${item.id}` : "/api/kit/items",
    method: item ? "PATCH" : "POST",
    saved: item ? "Item saved" : "Item added",
  });
  const { register, formState } = form;
  const { errors, isSubmitting } = formState;
  const prefix = item ? "edit-item" : "new-item";
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <Field label="Serial or label" hint="What is written or marked on the item." error={errors.label?.message} {...register("label")} />
      <Field label="In service since" type="date" error={errors.inServiceSince?.message} {...register("inServiceSince")} />
      <FieldFrame id={`${prefix}-notes`} label="Notes" error={errors.notes?.message}>
        <textarea id={`${prefix}-notes`} rows={2} className={`${controlClasses} py-2`} {...register("notes")} />
      </FieldFrame>
      <FormError message={serverError} />
      <Button type="submit" disabled={isSubmitting}>
        {item ? "Save item" : "Add item"}
      </Button>
    </form>
  );
}
