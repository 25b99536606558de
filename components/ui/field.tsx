import { forwardRef, useId, type InputHTMLAttributes, type ReactNode, type TextareaHTMLAttributes } from "react";
import { classNames } from "@/lib/class-names";

export const controlClasses =
  "block w-full min-h-target rounded-control border-2 border-ink-300 bg-white px-3 text-base text-ink-900 placeholder:text-ink-400 focus:border-spruce-600 aria-[invalid=true]:border-danger-600";

interface FieldFrameProps {
  id: string;
  label: string;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
}

/** Label above, control, then the hint or the error: the error is announced and tied to the control. */
export function FieldFrame({ id, label, hint, error, children }: FieldFrameProps) {
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-ink-800">
        {label}
      </label>
      {children}
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-sm font-medium text-danger-700">
          {error}
        </p>
      ) : hint ? (
        <p id={`${id}-hint`} className="text-sm text-ink-500">
          {hint}
        </p>
      ) : null}
    </div>
  );
}

/** The ARIA wiring that ties a control to its error or, failing that, its hint. */
export function describedBy(id: string, error?: string, hint?: ReactNode) {
  return {
    "aria-invalid": error ? true : undefined,
    "aria-describedby": error ? `${id}-error` : hint ? `${id}-hint` : undefined,
  } as const;
}

// A box whose figure comes from elsewhere (the Kit, the site) looks it: dashed and shaded.
const READ_ONLY = "read-only:border-dashed read-only:bg-ink-50";

export interface FieldProps extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  hint?: ReactNode;
  error?: string;
}

export const Field = forwardRef<HTMLInputElement, FieldProps>(function Field({ label, hint, error, id, className, ...props }, ref) {
  const generated = useId();
  const fieldId = id ?? generated;
  return (
    <FieldFrame id={fieldId} label={label} hint={hint} error={error}>
      <input ref={ref} id={fieldId} {...describedBy(fieldId, error, hint)} className={classNames(controlClasses, READ_ONLY, className)} {...props} />
    </FieldFrame>
  );
});

export interface TextAreaProps extends TextareaHTMLAttributes<HTMLTextAreaElement> {
  label: string;
  hint?: ReactNode;
  error?: string;
}

export const TextArea = forwardRef<HTMLTextAreaElement, TextAreaProps>(function TextArea({ label, hint, error, id, className, rows = 3, ...props }, ref) {
  const generated = useId();
  const fieldId = id ?? generated;
  return (
    <FieldFrame id={fieldId} label={label} hint={hint} error={error}>
      <textarea
        ref={ref}
        id={fieldId}
        rows={rows}
        {...describedBy(fieldId, error, hint)}
        className={classNames(controlClasses, "py-2", className)}
        {...props}
      />
    </FieldFrame>
  );
});
