"use client";

import { CreateCrewSchema } from "@/lib/validations/crew";
import { useApiForm } from "@/components/forms/use-api-form";
import { useGoTo } from "@/components/forms/use-go-to";
import { FormError } from "@/components/forms/form-error";
import { Field } from "@/components/ui/field";
import { Button } from "@/components/ui/button";

export function CreateCrewForm() {
  const goTo = useGoTo("/crew");
  const { form, submit, formError } = useApiForm(CreateCrewSchema, {
    url: "/api/crews",
    onSuccess: goTo,
  });
  return (
    <form onSubmit={submit} noValidate className="max-w-md space-y-4">
      <FormError message={formError} />
      <Field label="Crew name" error={form.formState.errors.name?.message} {...form.register("name")} />
      <Button type="submit" disabled={form.formState.isSubmitting}>
        Create crew
      </Button>
    </form>
  );
}
