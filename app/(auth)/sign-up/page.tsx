import type { Metadata } from "next";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { safeNext } from "@/lib/safe-redirect";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({ searchParams }: { searchParams: Promise<{ next?: string }> }) {
  const { next } = await searchParams;
  return (
    <>
      <h1 className="mb-4 text-xl">Create an account</h1>
      <SignUpForm next={safeNext(next, "/crews/new")} />
    </>
  );
}
