"use client";

import { useRouter } from "next/navigation";
import { FormError } from "@/components/forms/form-error";
import { useApiForm } from "@/components/forms/use-api-form";
import { useToast } from "@/components/ui/toast";
import { Button } from "@/components/ui/button";
import { Field, FieldFrame, controlClasses } from "@/components/ui/field";
import { GearItemEditSchema } from "@/lib/validations/kit";

const today = () => new Date().toISOString().slice(0, 10);

/** Adds an item of a model, or edits one when `item` is given. */
export function ItemForm({ modelId, item }: { modelId: string; item?: { id: string; label: string; inServiceSince: string; notes: string } }) {
  const router = useRouter();
  const notify = useToast();
  const defaultValues = item
    ? { label: item.label, inServiceSince: item.inServiceSince, notes: item.notes }
    : { label: "", inServiceSince: today(), notes: "" };
  // The fields shown are the item's own; a new item is sent with its model, which the server checks.
  const { form, submit, formError } = useApiForm(GearItemEditSchema, {
    defaultValues,
    url: item ? `/api/kit/items/${item.id}` : "/api/kit/items",
    method: item ? "PATCH" : "POST",
    toBody: (values) => (item ? values : { ...values, modelId }),
    onSuccess: (_body, values) => {
      notify({ title: item ? "Item saved" : "Item added", tone: "ok" });
      form.reset(item ? values : defaultValues);
      router.refresh();
    },
  });
  const { register, formState } = form;
  const { errors, isSubmitting } = formState;
  const prefix = item ? "edit-item" : "new-item";
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      <Field label="Serial or label" hint="What is written or marked on the item." error={errors.label?.message} {...register("label")} />
      <Field label="In service since" type="date" error={errors.inServiceSince?.message} {...register("inServiceSince")} />
      <FieldFrame id={`${prefix}-notes`} label="Notes" error={errors.notes?.message}>
        <textarea id={`${prefix}-notes`} rows={2} className={`${controlClasses} py-2`} {...register("notes")} />
      </FieldFrame>
      <FormError message={formError} />
      <Button type="submit" disabled={isSubmitting}>
        {item ? "Save item" : "Add item"}
      </Button>
    </form>
  );
}
