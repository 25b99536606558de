"use client";

import { useState } from "react";
import { ForgotPasswordSchema } from "@/lib/validations/account";
import { useApiForm } from "@/components/forms/use-api-form";
import { FormError } from "@/components/forms/form-error";
import { Field } from "@/components/ui/field";
import { Button } from "@/components/ui/button";

export function ForgotPasswordForm() {
  const [sent, setSent] = useState<string | null>(null);
  const { form, submit, formError } = useApiForm(ForgotPasswordSchema, {
    url: "/api/auth/forgot-password",
    onSuccess: (body) => setSent(String(body.message)),
  });
  if (sent) return <p role="status">{sent}</p>;
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      <FormError message={formError} />
      <Field label="E-mail" type="email" autoComplete="email" error={form.formState.errors.email?.message} {...form.register("email")} />
      <Button type="submit" className="w-full" disabled={form.formState.isSubmitting}>
        Send me a link
      </Button>
    </form>
  );
}
