"use client";

import Link from "next/link";
import { useState } from "react";
import { ConfirmEmailSchema } from "@/lib/validations/account";
import { useApiForm } from "@/components/forms/use-api-form";
import { FormError } from "@/components/forms/form-error";
import { Button } from "@/components/ui/button";

// A button, not a change on opening the page: mail scanners that open links must not confirm anything.
export function ConfirmEmailForm({ token }: { token: string }) {
  const [done, setDone] = useState<string | null>(null);
  const { form, submit, formError } = useApiForm(ConfirmEmailSchema, {
    url: "/api/account/email",
    defaultValues: { token },
    onSuccess: (body) => setDone(String(body.message)),
  });
  if (done)
    return (
      <p role="status">
        {done} <Link href="/account">Go to your account</Link>
      </p>
    );
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      <FormError message={formError ?? form.formState.errors.token?.message ?? null} />
      <input type="hidden" {...form.register("token")} />
      <p>Sign in with this address from now on?</p>
      <Button type="submit" className="w-full" disabled={form.formState.isSubmitting}>
        Confirm the new e-mail
      </Button>
    </form>
  );
}
