import type { Metadata } from "next";
import { ForgotPasswordForm } from "@/components/auth/forgot-password-form";

export const metadata: Metadata = { title: "Forgot your password" };

export default function ForgotPasswordPage() {
  return (
    <>
      <h1 className="mb-2 text-xl">Forgot your password?</h1>
      <p className="mb-4 text-ink-600">We will e-mail you a link to choose a new one. It works once, for one hour.</p>
      <ForgotPasswordForm />
    </>
  );
}
