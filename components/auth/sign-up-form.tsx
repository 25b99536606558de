"use client";

import Link from "next/link";
import { SignUpSchema } from "@/lib/validations/account";
import { useApiForm } from "@/components/forms/use-api-form";
import { useGoTo } from "@/components/forms/use-go-to";
import { FormError } from "@/components/forms/form-error";
import { Field } from "@/components/ui/field";
import { NewPasswordField } from "@/components/auth/new-password-field";
import { Button } from "@/components/ui/button";

export function SignUpForm({ next }: { next: string }) {
  const goTo = useGoTo(next);
  const { form, submit, formError } = useApiForm(SignUpSchema, {
    url: "/api/auth/sign-up",
    onSuccess: goTo,
  });
  const { errors, isSubmitting } = form.formState;
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      <FormError message={formError} />
      <Field label="Your name" autoComplete="name" error={errors.name?.message} {...form.register("name")} />
      <Field label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <NewPasswordField label="Password" error={errors.password?.message} {...form.register("password")} />
      <Button type="submit" className="w-full" disabled={isSubmitting}>
        Create account
      </Button>
      <p className="text-sm">
        Have an account already? <Link href={`/sign-in?next=${encodeURIComponent(next)}`}>Sign in</Link>
      </p>
    </form>
  );
}
