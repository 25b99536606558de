import { forwardRef, useId, type ReactNode, type SelectHTMLAttributes } from "react";
import { classNames } from "@/lib/class-names";
import { FieldFrame, controlClasses, describedBy } from "./field";

export interface SelectOption {
  value: string;
  label: string;
  disabled?: boolean;
}

export interface SelectProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  options: SelectOption[];
  hint?: ReactNode;
  error?: string;
}

// A native select: the phone's own picker is the easiest to use with cold hands.
export const Select = forwardRef<HTMLSelectElement, SelectProps>(function Select({ label, options, hint, error, id, className, ...props }, ref) {
  const generated = useId();
  const fieldId = id ?? generated;
  return (
    <FieldFrame id={fieldId} label={label} hint={hint} error={error}>
      <select ref={ref} id={fieldId} {...describedBy(fieldId, error, hint)} className={classNames(controlClasses, "pr-8", className)} {...props}>
        {options.map((o) => (
          <option key={o.value} value={o.value} disabled={o.disabled}>
            {o.label}
          </option>
        ))}
      </select>
    </FieldFrame>
  );
});
