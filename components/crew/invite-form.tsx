"use client";

import { useRouter } from "next/navigation";
import { ROLES } from "@/lib/roles";
import { InviteSchema } from "@/lib/validations/crew";
import { useApiForm } from "@/components/forms/use-api-form";
import { FormError } from "@/components/forms/form-error";
import { Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { Button } from "@/components/ui/button";
import { useToast } from "@/components/ui/toast";

export function InviteForm() {
  const router = useRouter();
  const notify = useToast();
  const { form, submit, formError } = useApiForm(InviteSchema, {
    url: "/api/crew/invitations",
    defaultValues: { email: "", role: "member" },
    onSuccess: () => {
      notify({ title: "Invitation sent", description: `An e-mail is on its way to ${form.getValues("email")}.`, tone: "ok" });
      form.reset({ email: "", role: form.getValues("role") });
      router.refresh();
    },
  });
  return (
    <form onSubmit={submit} noValidate className="grid gap-4 sm:grid-cols-[2fr_1fr_auto] sm:items-end">
      <div className="sm:col-span-3">
        <FormError message={formError} />
      </div>
      <Field label="E-mail to invite" type="email" error={form.formState.errors.email?.message} {...form.register("email")} />
      <Select label="Role" options={ROLES.map((r) => ({ value: r, label: r }))} error={form.formState.errors.role?.message} {...form.register("role")} />
      <Button type="submit" disabled={form.formState.isSubmitting}>
        Send invitation
      </Button>
    </form>
  );
}
