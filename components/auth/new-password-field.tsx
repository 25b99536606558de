import { forwardRef } from "react";
import { Field, type FieldProps } from "@/components/ui/field";
import { PASSWORD_MIN } from "@/lib/validations/account";

/** A password being chosen: hidden, left to the browser's password manager, with the rule beside it. */
export const NewPasswordField = forwardRef<HTMLInputElement, Omit<FieldProps, "type" | "autoComplete" | "hint">>(function NewPasswordField(props, ref) {
  return <Field ref={ref} type="password" autoComplete="new-password" hint={`At least ${PASSWORD_MIN} characters.`} {...props} />;
});
