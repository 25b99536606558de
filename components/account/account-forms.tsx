"use client";

import { useRouter } from "next/navigation";
import { ChangePasswordSchema, ProfileSchema } from "@/lib/validations/account";
import { useApiForm } from "@/components/forms/use-api-form";
import { FormError } from "@/components/forms/form-error";
import { Field } from "@/components/ui/field";
import { NewPasswordField } from "@/components/auth/new-password-field";
import { Button } from "@/components/ui/button";
import { useToast } from "@/components/ui/toast";

export function ProfileForm({ name, email }: { name: string; email: string }) {
  const router = useRouter();
  const notify = useToast();
  const { form, submit, formError } = useApiForm(ProfileSchema, {
    url: "/api/account",
    method: "PATCH",
    defaultValues: { name, email, currentPassword: "" },
    // Sent only when the e-mail changes: a rename needs no password.
    toBody: (values) => (values.email === email ? { name: values.name, email: values.email } : values),
    onSuccess: (body) => {
      if (body.pendingEmail) {
        notify({
          title: "Confirm the new e-mail",
          description: `A link was sent to ${String(body.pendingEmail)}. Your account keeps ${email} until you open it (within one hour).`,
          tone: "ok",
        });
        form.reset({ name: form.getValues("name"), email, currentPassword: "" });
      } else notify({ title: "Profile saved", tone: "ok" });
      router.refresh();
    },
  });
  return (
    <form onSubmit={submit} noValidate className="max-w-md space-y-4">
      <FormError message={formError} />
      <Field label="Name" autoComplete="name" error={form.formState.errors.name?.message} {...form.register("name")} />
      <Field label="E-mail" type="email" autoComplete="email" error={form.formState.errors.email?.message} {...form.register("email")} />
      <Field
        label="Current password"
        type="password"
        autoComplete="current-password"
        hint="Needed only to change the e-mail. A link goes to the new address, and the change is made when it is opened."
        error={form.formState.errors.currentPassword?.message}
        {...form.register("currentPassword")}
      />
      <Button type="submit" disabled={form.formState.isSubmitting}>
        Save profile
      </Button>
    </form>
  );
}

export function PasswordForm() {
  const notify = useToast();
  const { form, submit, formError } = useApiForm(ChangePasswordSchema, {
    url: "/api/account/password",
    defaultValues: { currentPassword: "", newPassword: "" },
    onSuccess: () => {
      notify({ title: "Password changed", description: "Every other device was signed out.", tone: "ok" });
      form.reset();
    },
  });
  return (
    <form onSubmit={submit} noValidate className="max-w-md space-y-4">
      <FormError message={formError} />
      <Field
        label="Current password"
        type="password"
        autoComplete="current-password"
        error={form.formState.errors.currentPassword?.message}
        {...form.register("currentPassword")}
      />
      <NewPasswordField label="New password" error={form.formState.errors.newPassword?.message} {...form.register("newPassword")} />
      <Button type="submit" disabled={form.formState.isSubmitting}>
        Change password
      </Button>
    </form>
  );
}
