"use client";

import { useRouter } from "next/navigation";
import { createCrewSchema } from "@/lib/validations/crew";
import { useApiForm } from "@/components/forms/use-api-form";
import { FormError } from "@/components/forms/form-error";
import { Field } from "@/components/ui/field";
import { Button } from "@/components/ui/button";

export function CreateCrewForm() {
  const router = useRouter();
  const { form, submit, formError } = useApiForm(createCrewSchema, {
    url: "/api/crews",
    onSuccess: () => {
      router.replace("/crew");
      router.refresh();
    },
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
