"use client";

import Link from "next/link";
import { SignInSchema } from "@/lib/validations/account";
import { useApiForm } from "@/components/forms/use-api-form";
import { useGoTo } from "@/components/forms/use-go-to";
import { FormError } from "@/components/forms/form-error";
import { Field } from "@/components/ui/field";
import { Button } from "@/components/ui/button";

export function SignInForm({ next }: { next: string }) {
  const goTo = useGoTo(next);
  const { form, submit, formError } = useApiForm(SignInSchema, {
    url: "/api/auth/sign-in",
    onSuccess: goTo,
  });
  const { errors, isSubmitting } = form.formState;
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      <FormError message={formError} />
      <Field label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <Field label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...form.register("password")} />
      <Button type="submit" className="w-full" disabled={isSubmitting}>
        Sign in
      </Button>
      <p className="flex justify-between text-sm">
        <Link href="/forgot-password">Forgot your password?</Link>
        <Link href={`/sign-up?next=${encodeURIComponent(next)}`}>Create an account</Link>
      </p>
    </form>
  );
}
