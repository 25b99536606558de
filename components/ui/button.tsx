import { forwardRef, type ButtonHTMLAttributes } from "react";
import { classNames } from "@/lib/class-names";

export type ButtonTone = "primary" | "secondary" | "danger" | "quiet";

const tones: Record<ButtonTone, string> = {
  primary: "bg-spruce-700 text-white hover:bg-spruce-800 disabled:bg-ink-300",
  secondary: "bg-white text-ink-900 border-2 border-ink-300 hover:border-ink-500 disabled:text-ink-400",
  danger: "bg-danger-600 text-white hover:bg-danger-700 disabled:bg-ink-300",
  quiet: "bg-transparent text-ink-700 hover:bg-ink-100",
};

/** The look of a button, for links that act as buttons too. */
export function buttonClasses(tone: ButtonTone = "primary", extra?: string): string {
  return classNames(
    "inline-flex min-h-target items-center justify-center gap-2 rounded-control px-5 font-semibold no-underline hover:no-underline transition-colors disabled:cursor-not-allowed",
    tones[tone],
    extra,
  );
}

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  tone?: ButtonTone;
}

export const Button = forwardRef<HTMLButtonElement, ButtonProps>(function Button({ tone = "primary", className, type = "button", ...props }, ref) {
  return <button ref={ref} type={type} className={buttonClasses(tone, className)} {...props} />;
});
