"use client";

import Link from "next/link";
import { useState } from "react";
import { ResetPasswordSchema } from "@/lib/validations/account";
import { useApiForm } from "@/components/forms/use-api-form";
import { FormError } from "@/components/forms/form-error";
import { NewPasswordField } from "@/components/auth/new-password-field";
import { Button } from "@/components/ui/button";

export function ResetPasswordForm({ token }: { token: string }) {
  const [done, setDone] = useState<string | null>(null);
  const { form, submit, formError } = useApiForm(ResetPasswordSchema, {
    url: "/api/auth/reset-password",
    defaultValues: { token, password: "" },
    onSuccess: (body) => setDone(String(body.message)),
  });
  if (done)
    return (
      <p role="status">
        {done} <Link href="/sign-in">Sign in</Link>
      </p>
    );
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      <FormError message={formError ?? form.formState.errors.token?.message ?? null} />
      <input type="hidden" {...form.register("token")} />
      <NewPasswordField label="New password" error={form.formState.errors.password?.message} {...form.register("password")} />
      <Button type="submit" className="w-full" disabled={form.formState.isSubmitting}>
        Save the new password
      </Button>
    </form>
  );
}
